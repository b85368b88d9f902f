// The value-mapping step of a survey upload: the file's own state labels to the study area's
// cover states, every label accounted for.
import { AppError } from '../http/errors';
import { parseInput } from '../http/validate';
import { stateMappingSchema, type CoverState, type StateMapping } from '../../shared/schemas';

/** Label → state index, or null for labels whose records are left out. */
export type LabelMap = Map<string, number | null>;

export function parseStateMapping(json: string, states: readonly CoverState[]): { mapping: StateMapping; labels: LabelMap } {
  let raw: unknown;
  try {
    raw = JSON.parse(json);
  } catch {
    throw new AppError(400, 'invalid_mapping', 'mapping must be JSON: an object from the file\'s labels to state codes, e.g. {"sage": "SS", "not visited": null}.');
  }
  // JSON.parse keeps a "__proto__" key as an own property, but zod leaves it out of a record
  // unchecked (a prototype-pollution guard): refuse it rather than drop that label silently.
  if (typeof raw === 'object' && raw !== null && Object.hasOwn(raw, '__proto__')) {
    throw new AppError(400, 'invalid_mapping', 'The mapping has the label "__proto__", which cannot be used as a label: rename it in the file and in the mapping.');
  }
  const mapping = parseInput(stateMappingSchema, raw, 'body');
  const codes = states.map((s) => s.code);
  const unknown = Object.entries(mapping).filter(([, code]) => code !== null && !codes.includes(code));
  if (unknown.length > 0) {
    throw new AppError(
      400,
      'invalid_mapping',
      `The mapping names state code(s) this study area does not have: ${unknown.map(([label, code]) => `"${label}" → "${code}"`).join(', ')}. Use one of ${codes.join(', ')}, or null to leave the records out.`,
    );
  }
  return { mapping, labels: new Map(Object.entries(mapping).map(([label, code]) => [label, code === null ? null : codes.indexOf(code)])) };
}

/** Refuses labels found in the file (label → where it was first seen) that the mapping does not cover. */
export function requireAllMapped(found: ReadonlyMap<string, string>, labels: LabelMap, what: string): void {
  const missing = [...found].filter(([label]) => !labels.has(label));
  if (missing.length === 0) return;
  throw new AppError(
    400,
    'unmapped_labels',
    `${what} ${missing.length === 1 ? 'label is' : 'labels are'} not mapped: ${missing.map(([label, where]) => `"${label}" (first at ${where})`).join(', ')}. Map each to a state code, or to null to leave those records out.`,
    { unmapped: missing.map(([label]) => label) },
  );
}
