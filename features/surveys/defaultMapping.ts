import type { CoverState, StateMapping, SurveyInspection } from '@/shared/schemas';

import { namesState } from '../scenarios/matrix-editor/pasteBlock';

/**
 * The value mapping to start from: the server's suggestion for the column it guessed, else each
 * label matched to a state by code or name, else left out (null) for the person to choose.
 */
export function defaultMapping(inspection: SurveyInspection, stateColumn: string, states: readonly CoverState[]): StateMapping {
  const values = inspection.columns.find((column) => column.name === stateColumn)?.values ?? [];
  const suggested = stateColumn === inspection.guessedColumns.state ? inspection.suggestedMapping : {};
  return Object.fromEntries(
    values.map(({ value }) => [value, suggested[value] ?? states.find((state) => namesState(value, state))?.code ?? null]),
  );
}
