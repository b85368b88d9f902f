import { useMemo } from 'react';

import type { CoverState } from '@/shared/schemas';

import { checkCell, checkRow, readNumber } from '../matrix-editor/cellCheck';
import type { MatrixReading } from '../matrix-editor/matrixEditorState';
import { phaseStarts, type ScenarioForm } from '../editor/scenarioFormState';
import { useScenarioAnalysis } from '../queries';
import { liveAnalysis, pathSteps, type AnalysisView } from './liveAnalysis';

export type AnalysisViewInput = {
  states: readonly CoverState[];
  form: ScenarioForm;
  readings: readonly MatrixReading[];
  studyAreaShares: number[] | null;
  totalAreaM2: number;
  /** The saved scenario, when the form shows one; its analysis comes from the server while unchanged. */
  savedId: number | null;
  dirty: boolean;
};

export type AnalysisViewResult = { view: AnalysisView | null; blockedBy: string[] };

function startShares(form: ScenarioForm, studyAreaShares: number[] | null, k: number): number[] | string {
  if (form.startCover.source === 'study-area') return studyAreaShares ?? new Array<number>(k).fill(1 / k);
  const row = checkRow(form.startCover.shares.map(checkCell));
  if (row.issue) return `Start shares: ${row.issue.toLowerCase()}`;
  return form.startCover.shares.map((text) => readNumber(text) ?? 0);
}

/** The server's analysis of the saved scenario while it is unchanged, else a live one from the browser. */
export function useAnalysisView(input: AnalysisViewInput): AnalysisViewResult {
  const { states, form, readings, studyAreaShares, totalAreaM2, savedId, dirty } = input;
  const steps = pathSteps(phaseStarts(form).filter(Number.isFinite));
  const server = useScenarioAnalysis(savedId ?? 0, steps, savedId !== null && !dirty);
  const live = useMemo((): AnalysisViewResult => {
    const starts = phaseStarts(form);
    const blockedBy = readings.flatMap((reading, n) => reading.problems.map((problem) => `Phase ${n + 1}: ${problem}`));
    const years = readNumber(form.yearsText);
    if (years === null || years <= 0) blockedBy.push('Years per step must be a number above 0');
    const ends = form.phases.map((phase, n) => (n === form.phases.length - 1 ? null : readNumber(phase.endText)));
    starts.forEach((start, n) => {
      const end = ends[n];
      if (!Number.isInteger(start) || (end !== null && !(Number.isInteger(end) && end > start))) {
        blockedBy.push(`Phase ${n + 1}: its step range is not a run of whole steps`);
      }
    });
    const start = startShares(form, studyAreaShares, states.length);
    if (typeof start === 'string') blockedBy.push(start);
    if (blockedBy.length > 0 || typeof start === 'string' || years === null) return { view: null, blockedBy };
    const view = liveAnalysis({
      names: states.map((state) => state.name),
      phases: form.phases.map((phase, n) => ({ fromStep: starts[n], toStep: ends[n], rows: readings[n].matrix ?? [], surveyId: phase.survey?.id ?? null })),
      start,
      yearsPerStep: years,
      totalAreaM2,
      steps,
    });
    return { view, blockedBy: [] };
  }, [form, readings, studyAreaShares, totalAreaM2, states, steps]);
  if (savedId !== null && !dirty && server.data) {
    const { expectedPath, phases, yearsPerStep, totalAreaM2: total } = server.data;
    return { view: { source: 'server', expectedPath, phases, yearsPerStep, totalAreaM2: total }, blockedBy: [] };
  }
  return live;
}
