// The compared runs travel in the address (?runs=3,5) so a link opens the same comparison.

export const COMPARE_LIMITS = { min: 2, max: 4 } as const;

/** Run ids from `?runs=`, in order, without repeats or anything that is not a whole number, at most four. */
export function parseRunIds(raw: string | string[] | undefined): number[] {
  const text = Array.isArray(raw) ? raw.join(',') : (raw ?? '');
  const ids: number[] = [];
  for (const part of text.split(',')) {
    const trimmed = part.trim();
    if (!/^\d+$/.test(trimmed)) continue;
    const id = Number(trimmed);
    if (!ids.includes(id) && ids.length < COMPARE_LIMITS.max) ids.push(id);
  }
  return ids;
}

/** Adds or removes one run, keeping the order in which runs were picked (the first is the reference). */
export function toggleRunId(ids: readonly number[], id: number): number[] {
  if (ids.includes(id)) return ids.filter((other) => other !== id);
  return ids.length < COMPARE_LIMITS.max ? [...ids, id] : [...ids];
}
