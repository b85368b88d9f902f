import { guessMapping, unmappedValues } from './coverMapMapping';

const states = [
  { code: 'OW', name: 'Open water', colour: '#56B4E9' },
  { code: 'LM', name: 'Low marsh', colour: '#009E73' },
];

describe('cover-map mapping', () => {
  it('when map values match a code or a name in any case, then they map to that state; others stay unmapped', () => {
    const mapping = guessMapping(['ow', 'Low Marsh', 'Mudflat'], states);
    expect(mapping).toEqual({ ow: 'OW', 'Low Marsh': 'LM' });
    expect(unmappedValues(['ow', 'Low Marsh', 'Mudflat'], mapping)).toEqual(['Mudflat']);
  });
});
