import { checkPercents, initialPercents } from './proportions';

describe('start-cover percentages', () => {
  it('when there is no saved start cover, then equal shares', () => {
    expect(initialPercents(4, null)).toEqual(['25', '25', '25', '25']);
    expect(initialPercents(2, [0.375, 0.625])).toEqual(['37.5', '62.5']);
  });

  it('when the shares are 33.3, 33.3 and 33.4 %, then proportions that sum to exactly 1', () => {
    const check = checkPercents(['33.3', '33.3', '33.4']);
    expect(check.message).toBeNull();
    expect(check.proportions?.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
  });

  it('when the shares add up to 90 % or one is negative, then a message and nothing to send', () => {
    expect(checkPercents(['40', '50'])).toMatchObject({ sum: 90, proportions: null, message: expect.stringContaining('90.0 %') });
    expect(checkPercents(['-10', '110']).proportions).toBeNull();
  });
});
