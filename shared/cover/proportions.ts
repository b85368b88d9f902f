// Start cover by proportions: either each patch draws its state independently (seeded), or the
// counts are fixed by rounding the proportions and the states shuffled over the patches (seeded).
import seedrandom from 'seedrandom';

export type ProportionMode = 'random' | 'exact';

export class CoverInputError extends Error {}

/** Checks that proportions are finite, ≥ 0 and sum to 1 within 1e-6; says which one is wrong. */
export function checkProportions(proportions: readonly number[], names: readonly string[]): void {
  if (proportions.length !== names.length) {
    throw new CoverInputError(`give one proportion per cover state: ${names.length} states, ${proportions.length} proportions`);
  }
  proportions.forEach((p, i) => {
    if (!Number.isFinite(p) || p < 0) throw new CoverInputError(`the proportion of "${names[i]}" must be a number ≥ 0, got ${p}`);
  });
  const sum = proportions.reduce((a, b) => a + b, 0);
  if (Math.abs(sum - 1) > 1e-6) throw new CoverInputError(`the proportions must add up to 1 (100 %); they add up to ${sum.toFixed(6)}`);
}

/** Largest-remainder (Hamilton) rounding: integer counts summing to n, each within 1 of p·n (Balinski & Young, *Fair Representation*, 1982). */
export function roundedCounts(proportions: readonly number[], n: number): number[] {
  const quotas = proportions.map((p) => p * n);
  const counts = quotas.map(Math.floor);
  let left = n - counts.reduce((a, b) => a + b, 0);
  const byRemainder = quotas.map((q, i) => ({ i, r: q - Math.floor(q) })).sort((a, b) => b.r - a.r || a.i - b.i);
  for (const { i } of byRemainder) {
    if (left <= 0) break;
    counts[i] += 1;
    left -= 1;
  }
  return counts;
}

/** Fisher–Yates shuffle in place with a seeded generator (Knuth, TAOCP vol. 2, Algorithm P). */
function shuffle(states: Uint8Array, random: () => number): void {
  for (let i = states.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    const tmp = states[i];
    states[i] = states[j];
    states[j] = tmp;
  }
}

/** State index of every patch at step 0. */
export function assignByProportions(proportions: readonly number[], patchCount: number, seed: string, mode: ProportionMode): Uint8Array {
  const random = seedrandom(`start-cover:${seed}`);
  const states = new Uint8Array(patchCount);
  if (mode === 'exact') {
    let at = 0;
    roundedCounts(proportions, patchCount).forEach((count, state) => {
      states.fill(state, at, at + count);
      at += count;
    });
    shuffle(states, random);
    return states;
  }
  const cumulative: number[] = [];
  proportions.reduce((acc, p, i) => (cumulative[i] = acc + p), 0);
  for (let i = 0; i < patchCount; i++) {
    const u = random() * cumulative[cumulative.length - 1];
    let state = 0;
    while (state < cumulative.length - 1 && u >= cumulative[state]) state++;
    states[i] = state;
  }
  return states;
}
