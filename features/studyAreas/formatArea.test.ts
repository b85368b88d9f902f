import { formatArea, formatBytes, formatCount, formatDifference, formatPercent } from './formatArea';

describe('formatArea', () => {
  it('when an area is given in m², then hectares at 10,000 m² each, grouped, with the unit', () => {
    expect(formatArea(35_120_000, 'ha')).toBe('3,512 ha');
    expect(formatArea(964_000, 'ha')).toBe('96.4 ha');
    expect(formatArea(2_500, 'ha')).toBe('0.25 ha');
  });

  it('when the unit is acres, then international acres of 4,046.8564224 m² (NIST Handbook 44)', () => {
    // 1 km² = 247.105 381 467 acres.
    expect(formatArea(1_000_000, 'acres')).toBe('247.1 acres');
    expect(formatArea(4_046.8564224, 'acres')).toBe('1.00 acres');
    expect(formatArea(35_120_000, 'acres')).toBe('8,678 acres');
  });
});

describe('number formats', () => {
  it('when counts, shares and sizes are shown, then grouped figures with their units', () => {
    expect(formatCount(250_000)).toBe('250,000');
    expect(formatPercent(0.375)).toBe('37.5 %');
    expect(formatBytes(18_200)).toBe('18.2 kB');
    expect(formatBytes(1_400_000)).toBe('1.4 MB');
    expect(formatDifference(1_000_400, 1_000_000)).toBe('+0.040 %');
    expect(formatDifference(988_000, 1_000_000)).toBe('−1.200 %');
    expect(formatDifference(999_999.99, 1_000_000)).toBe('±0.000 %');
  });
});
