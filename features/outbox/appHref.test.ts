import { appHref } from './appHref';

const origin = 'http://localhost:8081';

describe('appHref', () => {
  it('when a link points at one of our pages on another port, then its in-app path', () => {
    expect(appHref('http://localhost:8080/verify?token=abc', origin)).toBe('/verify?token=abc');
  });

  it('when a link is on this origin, then its in-app path', () => {
    expect(appHref('http://localhost:8081/team', origin)).toBe('/team');
  });

  it('when a link points elsewhere, then null', () => {
    expect(appHref('https://example.org/help', origin)).toBeNull();
  });

  it('when a link does not parse, then null', () => {
    expect(appHref('http://[not-a-host', origin)).toBeNull();
  });
});
