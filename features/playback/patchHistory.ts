// A patch's states through the run, from whichever frames are loaded.

/** State of patch `patch` at each step 0…steps; null where that step's frame is not loaded yet. */
export function patchStrip(patch: number, steps: number, frameAt: (step: number) => Uint8Array | undefined): (number | null)[] {
  return Array.from({ length: steps + 1 }, (_, step) => frameAt(step)?.[patch] ?? null);
}

/** Steps spent in each state over the known part of a strip. */
export function stepsInState(strip: readonly (number | null)[], stateCount: number): number[] {
  const counts = new Array<number>(stateCount).fill(0);
  for (const state of strip) if (state !== null && state < stateCount) counts[state] += 1;
  return counts;
}
