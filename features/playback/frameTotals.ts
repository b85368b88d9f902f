// What the legend shows for one step: the area and share of each state in the shown replicate.

export type StateTotal = { areaM2: number; share: number; patches: number };

/** Area (m²), share of the total area and patch count per state for one frame of patch states. */
export function frameTotals(states: Uint8Array, areas: Float32Array, stateCount: number): StateTotal[] {
  const area = new Float64Array(stateCount);
  const patches = new Array<number>(stateCount).fill(0);
  let total = 0;
  for (let i = 0; i < states.length; i++) {
    area[states[i]] += areas[i];
    patches[states[i]] += 1;
    total += areas[i];
  }
  return Array.from(area, (a, j) => ({ areaM2: a, share: total > 0 ? a / total : 0, patches: patches[j] }));
}
