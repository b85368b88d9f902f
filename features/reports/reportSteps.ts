/** The steps a report maps: the start, the middle (rounded down) and the last, each once. */
export function reportSteps(lastStep: number): number[] {
  return [...new Set([0, Math.floor(lastStep / 2), lastStep])];
}
