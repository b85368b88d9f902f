// What a run simulates, frozen at start: the scenario's phases and matrices, the study area's
// grid, patch areas and states, and the start cover (the study area's, or drawn from the
// scenario's proportions). The fingerprint is the SHA-256 of all of it plus the run settings.
import { createHash } from 'node:crypto';
import { CoverStateRow, Scenario, ScenarioPhaseRow, StartCover, StudyArea } from '../models';
import { AppError, notFound } from '../http/errors';
import { statesChanged } from './scenarios';
import { assignByProportions } from '../../shared/cover/proportions';
import { createMatrix, MarkovInputError, type RunSpec } from '../../shared/markov';
import type { GridSpec } from '../../shared/geo';
import type { CoverState, RunInputsSummary } from '../../shared/schemas';

export type FrozenPhase = { fromStep: number; toStep: number | null; matrix: number[][] };

/** The JSON part of the frozen inputs (binary arrays are kept beside it). */
export type FrozenSpec = {
  version: 1;
  studyAreaName: string;
  scenarioName: string;
  grid: GridSpec;
  cellSizeM: number;
  patchCount: number;
  totalAreaM2: number;
  states: CoverState[];
  /** How the step-0 states were obtained, in words. */
  startCover: string;
  phases: FrozenPhase[];
};

export type FrozenInputs = { spec: FrozenSpec; areas: Float32Array; startStates: Uint8Array };

export type RunSettings = { steps: number; replicates: number; seed: string; shownReplicate: number };

export type ScenarioInputs = { scenario: Scenario; studyArea: StudyArea; frozen: FrozenInputs };

import { bytesOf, float32s, uint8s } from './stored-grid';

export { bytesOf, float32s, uint8s };

function startStatesOf(scenario: Scenario, studyArea: StudyArea, cover: StartCover | null): { states: Uint8Array; description: string } {
  const start = scenario.startCover;
  if (start.source === 'proportions') {
    const seed = start.seed ?? `scenario-${scenario.id}`;
    const shares = start.proportions.map((p) => `${(p * 100).toFixed(1)} %`).join(', ');
    return { states: assignByProportions(start.proportions, studyArea.patchCount, seed, start.method), description: `scenario proportions (${start.method}, seed ${seed}): ${shares}` };
  }
  if (!cover) throw new AppError(400, 'no_start_cover', 'The study area has no start cover yet: set one (proportions or a cover map) on the study area, or give the scenario proportions of its own.');
  const states = uint8s(cover.states);
  if (states.length !== studyArea.patchCount) throw new AppError(400, 'no_start_cover', 'The study area’s start cover no longer fits its patches: set the start cover again.');
  const how = cover.method === 'cover-map' ? `cover map ${cover.sourceName ?? ''}`.trim() : `study-area proportions (${cover.method}, seed ${cover.seed ?? '—'})`;
  return { states, description: `study area start cover: ${how}` };
}

/** Reads the scenario, its study area and start cover, and makes the frozen copy; 404 when the scenario does not exist. */
export async function loadScenarioInputs(scenarioId: number): Promise<ScenarioInputs> {
  const scenario = await Scenario.findByPk(scenarioId, { include: [{ model: ScenarioPhaseRow, as: 'phases' }], order: [[{ model: ScenarioPhaseRow, as: 'phases' }, 'position', 'ASC']] });
  if (!scenario) throw notFound('Scenario');
  const studyArea = await StudyArea.scope('withGrid').findByPk(scenario.studyAreaId, { include: [{ model: CoverStateRow, as: 'states' }], order: [[{ model: CoverStateRow, as: 'states' }, 'position', 'ASC']] });
  if (!studyArea) throw notFound('Scenario');
  const states = (studyArea.states ?? []).map((s) => ({ code: s.code, name: s.name, colour: s.colour }));
  if (scenario.stateCodes.join('\u0000') !== states.map((s) => s.code).join('\u0000')) throw statesChanged();
  const start = startStatesOf(scenario, studyArea, await StartCover.findByPk(studyArea.id));
  const phases = (scenario.phases ?? []).map((p) => ({ fromStep: p.fromStep, toStep: p.toStep, matrix: p.matrix }));
  const spec: FrozenSpec = {
    version: 1,
    studyAreaName: studyArea.name,
    scenarioName: scenario.name,
    grid: studyArea.gridSpec,
    cellSizeM: studyArea.cellSizeM,
    patchCount: studyArea.patchCount,
    totalAreaM2: studyArea.totalAreaM2,
    states,
    startCover: start.description,
    phases,
  };
  const frozen = { spec, areas: float32s(studyArea.patchAreas), startStates: start.states };
  kernelSpecOf(frozen, { steps: 1, replicates: 1, seed: 'check', shownReplicate: 0 });
  return { scenario, studyArea, frozen };
}

/** The engine's RunSpec for frozen inputs; a matrix the engine refuses becomes a 400 naming the phase. */
export function kernelSpecOf(frozen: FrozenInputs, settings: RunSettings): RunSpec {
  const codes = frozen.spec.states.map((s) => s.code);
  const phases = frozen.spec.phases.map((p, n) => {
    try {
      return { startStep: p.fromStep, matrix: createMatrix(codes, p.matrix) };
    } catch (err) {
      if (err instanceof MarkovInputError) throw new AppError(400, 'invalid_matrix', `Phase ${n + 1}'s matrix cannot be run: ${err.message}. Fix it in the scenario.`);
      throw err;
    }
  });
  if (phases.length === 0) throw new AppError(400, 'invalid_matrix', 'The scenario has no phase: give it a matrix first.');
  return {
    phases,
    steps: settings.steps,
    patchCount: frozen.spec.patchCount,
    initial: { kind: 'states', states: frozen.startStates },
    areas: frozen.areas,
    seed: settings.seed,
    replicates: settings.replicates,
    historyReplicate: settings.shownReplicate,
  };
}

/** JSON with object keys sorted at every level, so that equal inputs give equal text. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
    return `{${entries.sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** SHA-256 over the canonical JSON of spec and settings, then the patch areas and start states bytes. */
export function fingerprintOf(frozen: FrozenInputs, settings: RunSettings): string {
  return createHash('sha256')
    .update(canonicalJson({ spec: frozen.spec, settings }))
    .update(bytesOf(frozen.areas))
    .update(bytesOf(frozen.startStates))
    .digest('hex');
}

export function inputsSummaryOf(spec: FrozenSpec): RunInputsSummary {
  return {
    scenarioName: spec.scenarioName,
    studyAreaName: spec.studyAreaName,
    states: spec.states,
    patchCount: spec.patchCount,
    totalAreaM2: spec.totalAreaM2,
    cellSizeM: spec.cellSizeM,
    startCover: spec.startCover,
    phases: spec.phases,
  };
}
