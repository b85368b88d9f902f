import type { CoverState, StateMapping, SurveyInspection } from '@/shared/schemas';

import { namesState } from '../scenarios/matrix-editor/pasteBlock';

/** Each label with a suggested state code, else the state it names by code or name, else left out (null). */
export function matchLabels(labels: readonly string[], states: readonly CoverState[], suggested: Readonly<StateMapping> = {}): StateMapping {
  return Object.fromEntries(labels.map((label) => [label, suggested[label] ?? states.find((state) => namesState(label, state))?.code ?? null]));
}

/**
 * The value mapping to start from: the server's suggestion for the column it guessed, else each
 * label matched to a state by code or name, else left out (null) for the person to choose.
 */
export function defaultMapping(inspection: SurveyInspection, stateColumn: string, states: readonly CoverState[]): StateMapping {
  const values = inspection.columns.find((column) => column.name === stateColumn)?.values ?? [];
  const suggested = stateColumn === inspection.guessedColumns.state ? inspection.suggestedMapping : {};
  return matchLabels(values.map(({ value }) => value), states, suggested);
}
