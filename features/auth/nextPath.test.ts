import { safeNextPath } from './nextPath';

describe('safeNextPath', () => {
  it('when next is an in-app path, then it is kept with its query', () => {
    expect(safeNextPath('/invitation?token=abc&accept=1')).toBe('/invitation?token=abc&accept=1');
  });

  it('when next is missing, then the study-area list', () => {
    expect(safeNextPath(undefined)).toBe('/');
  });

  it('when next points off the site, then the study-area list', () => {
    for (const next of ['https://elsewhere.example', '//elsewhere.example', '/\\elsewhere.example', 'team']) {
      expect(safeNextPath(next)).toBe('/');
    }
  });

  it('when next is repeated, then the first one counts', () => {
    expect(safeNextPath(['/team', '/account'])).toBe('/team');
  });
});
