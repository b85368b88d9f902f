import { MAX_PHASES, type CoverState, type ScenarioBody, type ScenarioDetail } from '@/shared/schemas';

import { readNumber } from '../matrix-editor/cellCheck';
import { initialEditorState, matrixEditorReducer, type MatrixEditorAction, type MatrixEditorState } from '../matrix-editor/matrixEditorState';

/**
 * One phase being edited. Phases tile the steps by construction: a phase starts where the one
 * before ends, so only the end step of each phase but the last (open-ended) is typed.
 */
export type PhaseDraft = {
  key: number;
  endText: string;
  matrix: MatrixEditorState;
  survey: { id: number; name: string } | null;
};

export type StartCoverDraft = { source: 'study-area' } | { source: 'proportions'; method: 'random' | 'exact'; shares: string[] };

export type ScenarioForm = {
  name: string;
  notes: string;
  yearsText: string;
  startCover: StartCoverDraft;
  phases: PhaseDraft[];
  nextKey: number;
};

export type ScenarioFormAction =
  | { type: 'name'; text: string }
  | { type: 'notes'; text: string }
  | { type: 'years'; text: string }
  | { type: 'startSource'; source: StartCoverDraft['source'] }
  | { type: 'startMethod'; method: 'random' | 'exact' }
  | { type: 'startShare'; index: number; text: string }
  | { type: 'addPhase' }
  | { type: 'removePhase'; index: number }
  | { type: 'phaseEnd'; index: number; text: string }
  | { type: 'phaseMatrix'; index: number; action: MatrixEditorAction }
  /** The matrix stays; it is no longer shown as the survey's estimate (no uncertainty ranges). */
  | { type: 'unlinkSurvey'; index: number }
  | { type: 'reset'; form: ScenarioForm };

/** Steps a new phase lasts by default when one is added after it. */
export const DEFAULT_PHASE_LENGTH = 5;

const phaseDraft = (key: number, states: readonly CoverState[], rows: readonly (readonly number[])[] | null, endText = ''): PhaseDraft => ({
  key,
  endText,
  matrix: initialEditorState(states, rows),
  survey: null,
});

/** A new scenario: one phase where every state stays, the study area's start cover, 1 year per step. */
export function newScenarioForm(states: readonly CoverState[]): ScenarioForm {
  return { name: '', notes: '', yearsText: '1', startCover: { source: 'study-area' }, phases: [phaseDraft(0, states, null)], nextKey: 1 };
}

/** The editable form of a saved scenario. */
export function formFromScenario(scenario: ScenarioDetail, states: readonly CoverState[]): ScenarioForm {
  const { startCover } = scenario;
  return {
    name: scenario.name,
    notes: scenario.notes,
    yearsText: String(scenario.yearsPerStep),
    startCover:
      startCover.source === 'study-area'
        ? startCover
        : { source: 'proportions', method: startCover.method, shares: startCover.proportions.map(String) },
    phases: scenario.phases.map((phase, n) => ({
      ...phaseDraft(n, states, scenario.fitsStudyArea ? phase.matrix : null, phase.toStep === null ? '' : String(phase.toStep)),
      survey: phase.survey,
    })),
    nextKey: scenario.phases.length,
  };
}

/** First step of each phase: 0, then the end of the phase before (NaN while that end is not a number). */
export function phaseStarts(form: ScenarioForm): number[] {
  return form.phases.map((_, n) => (n === 0 ? 0 : readNumber(form.phases[n - 1].endText) ?? Number.NaN));
}

function addPhase(form: ScenarioForm): ScenarioForm {
  if (form.phases.length >= MAX_PHASES) return form;
  const last = form.phases[form.phases.length - 1];
  const start = phaseStarts(form)[form.phases.length - 1];
  const end = String((Number.isFinite(start) ? start : 0) + DEFAULT_PHASE_LENGTH);
  const copy: PhaseDraft = { key: form.nextKey, endText: '', matrix: { ...last.matrix, past: [], notice: null }, survey: last.survey };
  return { ...form, phases: [...form.phases.slice(0, -1), { ...last, endText: end }, copy], nextKey: form.nextKey + 1 };
}

function removePhase(form: ScenarioForm, index: number): ScenarioForm {
  if (form.phases.length <= 1) return form;
  const phases = form.phases.filter((_, n) => n !== index);
  // The new last phase runs to the end; a removed middle phase's steps go to the phase before it.
  const fixed = phases.map((phase, n) => (n === phases.length - 1 ? { ...phase, endText: '' } : n === index - 1 ? { ...phase, endText: form.phases[index].endText } : phase));
  return { ...form, phases: fixed };
}

const mapPhase = (form: ScenarioForm, index: number, change: (phase: PhaseDraft) => PhaseDraft): ScenarioForm => ({
  ...form,
  phases: form.phases.map((phase, n) => (n === index ? change(phase) : phase)),
});

export function scenarioFormReducer(form: ScenarioForm, action: ScenarioFormAction): ScenarioForm {
  switch (action.type) {
    case 'name':
      return { ...form, name: action.text };
    case 'notes':
      return { ...form, notes: action.text };
    case 'years':
      return { ...form, yearsText: action.text };
    case 'startSource':
      if (action.source === form.startCover.source) return form;
      return {
        ...form,
        startCover:
          action.source === 'study-area'
            ? { source: 'study-area' }
            : { source: 'proportions', method: 'random', shares: form.phases[0].matrix.states.map((_, __, all) => String(1 / all.length)) },
      };
    case 'startMethod':
      return form.startCover.source === 'proportions' ? { ...form, startCover: { ...form.startCover, method: action.method } } : form;
    case 'startShare':
      if (form.startCover.source !== 'proportions') return form;
      return { ...form, startCover: { ...form.startCover, shares: form.startCover.shares.map((s, i) => (i === action.index ? action.text : s)) } };
    case 'addPhase':
      return addPhase(form);
    case 'removePhase':
      return removePhase(form, action.index);
    case 'phaseEnd':
      return mapPhase(form, action.index, (phase) => ({ ...phase, endText: action.text }));
    case 'phaseMatrix':
      return mapPhase(form, action.index, (phase) => ({ ...phase, matrix: matrixEditorReducer(phase.matrix, action.action) }));
    case 'unlinkSurvey':
      return mapPhase(form, action.index, (phase) => ({ ...phase, survey: null }));
    case 'reset':
      return action.form;
  }
}

/** Problems the browser finds before sending; the server checks everything again and has the last word. */
export type FormProblems = { years?: string; startCover?: string; phases: Record<number, string[]> };

/**
 * The request body, or the problems that stop it being sent: entries that are not numbers and
 * end steps that are not whole numbers. Row sums and ranges are left to the server, whose
 * reasons are shown beside the fields.
 */
export function scenarioBody(form: ScenarioForm): { ok: true; body: ScenarioBody } | { ok: false; problems: FormProblems } {
  const problems: FormProblems = { phases: {} };
  const years = readNumber(form.yearsText);
  if (years === null) problems.years = 'Years per step must be a number, e.g. 1 or 0.5';
  const starts = phaseStarts(form);
  const phases = form.phases.map((phase, n) => {
    const list: string[] = [];
    const last = n === form.phases.length - 1;
    const end = last ? null : readNumber(phase.endText);
    if (!last && (end === null || !Number.isInteger(end))) list.push(`Phase ${n + 1} needs an end step (a whole number)`);
    const matrix = phase.matrix.cells.map((row) => row.map(readNumber));
    if (matrix.some((row) => row.some((v) => v === null))) list.push(`Phase ${n + 1}: every entry must be a number`);
    if (list.length > 0) problems.phases[n] = list;
    return { fromStep: starts[n], toStep: end, matrix: matrix.map((row) => row.map((v) => v ?? 0)), surveyId: phase.survey?.id ?? null };
  });
  let startCover: ScenarioBody['startCover'] = { source: 'study-area' };
  if (form.startCover.source === 'proportions') {
    const shares = form.startCover.shares.map(readNumber);
    if (shares.some((v) => v === null)) problems.startCover = 'Every start share must be a number from 0 to 1';
    startCover = { source: 'proportions', method: form.startCover.method, proportions: shares.map((v) => v ?? 0) };
  }
  if (problems.years || problems.startCover || Object.keys(problems.phases).length > 0) return { ok: false, problems };
  return { ok: true, body: { name: form.name, notes: form.notes, yearsPerStep: years ?? 1, startCover, phases } };
}
