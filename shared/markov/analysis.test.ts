import { analyzeChain } from './analysis';
import { createMatrix } from './matrix';

// Grinstead & Snell, Introduction to Probability (2nd rev. ed.), ch. 11. Values marked "from
// memory" are recalled from the book's worked examples; the others follow from them by hand.
const oz = createMatrix(['R', 'N', 'S'], [[0.5, 0.25, 0.25], [0.5, 0, 0.5], [0.25, 0.25, 0.5]]);

// Drunkard's walk on 0…4 with 0 and 4 absorbing (G&S ch. 11.2).
const drunkard = createMatrix(
  ['0', '1', '2', '3', '4'],
  [[1, 0, 0, 0, 0], [0.5, 0, 0.5, 0, 0], [0, 0.5, 0, 0.5, 0], [0, 0, 0.5, 0, 0.5], [0, 0, 0, 0, 1]],
);

describe('Land of Oz, a regular chain (G&S ch. 11.3, 11.5)', () => {
  const a = analyzeChain(oz);

  test('long-run shares π = (.4, .2, .4) (from memory)', () => {
    a.stationary?.forEach((v, i) => expect(v).toBeCloseTo([0.4, 0.2, 0.4][i], 12));
    expect(a.stationaryByClass).toHaveLength(1);
  });

  test('one closed aperiodic class, nothing transient or absorbing', () => {
    expect(a.classes).toEqual({ communicating: [['R', 'N', 'S']], closed: [['R', 'N', 'S']], transient: [] });
    expect(a.absorbing).toEqual([]);
    expect(a.period).toEqual([{ class: ['R', 'N', 'S'], period: 1 }]);
  });

  test('mean recurrence times 1/π = (2.5, 5, 2.5) and mean first passage M (from memory: R→N 4, R→S 10/3, N→R 8/3)', () => {
    a.meanRecurrence.forEach((v, i) => expect(v).toBeCloseTo([2.5, 5, 2.5][i], 10));
    const expected = [[0, 4, 10 / 3], [8 / 3, 0, 8 / 3], [10 / 3, 4, 0]];
    a.meanFirstPassage?.forEach((row, i) => row.forEach((v, j) => expect(v).toBeCloseTo(expected[i][j], 10)));
  });

  test('eigenvalues 1, 1/4, −1/4 (characteristic polynomial of P), so |λ₂| = 1/4 and damping ratio 4', () => {
    expect(a.lambda2Modulus).toBeCloseTo(0.25, 10);
    expect(a.dampingRatio).toBeCloseTo(4, 8);
  });

  test('P^6 rows agree with π to three decimals (from memory: G&S print P^6 ≈ (.4, .2, .4) in every row)', () => {
    const fromEach = ['R', 'N', 'S'].map((_, i) =>
      analyzeChain(oz, { initial: [0, 1, 2].map((j) => (i === j ? 1 : 0)), steps: [6] }).projection[0].distribution,
    );
    fromEach.forEach((row) => row.forEach((v, j) => expect(Math.abs(v - [0.4, 0.2, 0.4][j])).toBeLessThan(5e-4)));
  });

  test('mixing time is the first t whose worst-start total variation is below 1 %', () => {
    const t = a.mixingTime as number;
    const tv = (s: number): number =>
      Math.max(...[0, 1, 2].map((i) => {
        const x = analyzeChain(oz, { initial: [0, 1, 2].map((j) => (i === j ? 1 : 0)), steps: [s] }).projection[0].distribution;
        return x.reduce((sum, v, j) => sum + Math.abs(v - [0.4, 0.2, 0.4][j]), 0) / 2;
      }));
    expect(tv(t)).toBeLessThan(0.01);
    expect(tv(t - 1)).toBeGreaterThanOrEqual(0.01);
  });

  test('residence times 1/(1 − p_ii) = (2, 1, 2)', () => {
    expect(a.residenceSteps).toEqual([2, 1, 2]);
  });
});

describe("drunkard's walk, an absorbing chain (G&S ch. 11.2)", () => {
  const a = analyzeChain(drunkard);

  test('fundamental matrix N, expected steps t = (3, 4, 3) and absorption probabilities B (from memory)', () => {
    const absorption = a.absorption;
    expect(absorption).not.toBeNull();
    [0, 3, 4, 3, 0].forEach((v, i) => expect(absorption?.expectedSteps[i]).toBeCloseTo(v, 12));
    const b = [[1, 0], [3 / 4, 1 / 4], [1 / 2, 1 / 2], [1 / 4, 3 / 4], [0, 1]];
    b.forEach((row, i) => {
      expect(absorption?.probabilities[i][0]).toBeCloseTo(row[0], 12);
      expect(absorption?.probabilities[i][4]).toBeCloseTo(row[1], 12);
    });
  });

  test('two absorbing states: no unique π, one stationary distribution per closed class, |λ₂| = 1', () => {
    expect(a.stationary).toBeNull();
    expect(a.stationaryByClass.map((c) => c.class)).toEqual([['0'], ['4']]);
    expect(a.classes.transient).toEqual(['1', '2', '3']);
    expect(a.absorbing).toEqual(['0', '4']);
    expect(a.lambda2Modulus).toBe(1);
    expect(a.mixingTime).toBeNull();
    expect(a.meanFirstPassage).toBeNull();
  });
});

describe('periodic and reducible chains', () => {
  test('the two-state flip P = [[0,1],[1,0]] is ergodic, not regular: period 2, π = (½, ½) (G&S ch. 11.3, from memory)', () => {
    const a = analyzeChain(createMatrix(['A', 'B'], [[0, 1], [1, 0]]), { mixingLimit: 50 });
    expect(a.period).toEqual([{ class: ['A', 'B'], period: 2 }]);
    expect(a.stationary).toEqual([0.5, 0.5]);
    expect(a.lambda2Modulus).toBe(1);
    expect(a.mixingTime).toBeNull(); // worst start never mixes: "not within 50 steps"
    expect(a.meanFirstPassage).toEqual([[0, 1], [1, 0]]);
  });

  test('a 3-cycle has period 3; a transient state feeding one closed class still gives a unique π', () => {
    expect(analyzeChain(createMatrix(['A', 'B', 'C'], [[0, 1, 0], [0, 0, 1], [1, 0, 0]])).period[0].period).toBe(3);
    const a = analyzeChain(createMatrix(['T', 'A', 'B'], [[0.5, 0.25, 0.25], [0, 0.5, 0.5], [0, 0.2, 0.8]]));
    expect(a.classes.transient).toEqual(['T']);
    expect(a.stationary?.[0]).toBe(0);
    expect(a.stationary?.[1]).toBeCloseTo(2 / 7, 12); // π_A = 0.2 / (0.5 + 0.2)
    expect(a.meanRecurrence[0]).toBe(Infinity);
    expect(a.meanFirstPassage).toBeNull();
    expect(a.absorption).toBeNull();
  });
});
