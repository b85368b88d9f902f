import type { CoverState } from '@/shared/schemas';

/** A first guess at the mapping: a map value that matches a state's code or name (any case) maps to it. */
export function guessMapping(values: ReadonlyArray<string>, states: ReadonlyArray<CoverState>): Record<string, string> {
  const mapping: Record<string, string> = {};
  for (const value of values) {
    const key = value.trim().toLowerCase();
    const match = states.find((s) => s.code.toLowerCase() === key || s.name.toLowerCase() === key);
    if (match) mapping[value] = match.code;
  }
  return mapping;
}

/** Map values left without a state: their patches get the fallback state. */
export function unmappedValues(values: ReadonlyArray<string>, mapping: Readonly<Record<string, string>>): string[] {
  return values.filter((value) => mapping[value] === undefined);
}
