// Downloads of a run and of its inputs: patch states at a step as GeoJSON, the patch history,
// area-share and comparison tables, a scenario phase's matrix and a survey's estimate as CSV.
// Every file is named after its study area and scenario; access is checked before anything is read.
import type { Response } from 'express';
import { StudyArea, type User } from '../models';
import { AppError, notFound } from '../http/errors';
import { analyzeChain, createMatrix, formatMatrixCsv } from '../../shared/markov';
import type { AreaUnit } from '../../shared/schemas';
import { fileSlug, streamPatches } from './exports';
import { streamCsv } from './downloads-csv';
import { runFrames } from './downloads-frames';
import { areaShareLines, compareLines, estimateLines, historyLines, type ComparedRun } from './downloads-tables';
import { runAccess, type RunAccess } from './runs';
import { requireSucceeded, runFrame, runSummary } from './runs-results';
import type { ScenarioAccess } from './scenarios';
import type { StudyAreaAccess } from './study-areas';
import type { SurveyAccess } from './surveys';

/** "<study-area>-<scenario>-run-<id>": the stem of every run download's file name. */
function runFileStem({ run }: RunAccess): string {
  return `${fileSlug(run.inputsSummary.studyAreaName)}-${fileSlug(run.inputsSummary.scenarioName)}-run-${run.id}`;
}

/** The run's study area, refused when its grid is no longer the one the run was made on. */
async function runStudyArea(access: RunAccess): Promise<StudyAreaAccess> {
  const studyArea = await StudyArea.findByPk(access.run.studyAreaId);
  if (!studyArea) throw notFound('Study area');
  if (studyArea.patchCount !== access.run.inputsSummary.patchCount) {
    throw new AppError(409, 'grid_changed', `The study area now has ${studyArea.patchCount} patches, not the ${access.run.inputsSummary.patchCount} run ${access.run.id} was made on: its maps cannot be drawn on the new grid.`);
  }
  return { studyArea, role: access.role };
}

/** Patch states of the shown replicate at `step`: one Feature per patch with its state, step and year. */
export async function streamStepPatches(res: Response, access: RunAccess, step: number): Promise<void> {
  const frame = await runFrame(access, step);
  const area = await runStudyArea(access);
  const { states } = access.run.inputsSummary;
  const year = step * access.run.yearsPerStep;
  await streamPatches(res, area, `${runFileStem(access)}-step-${step}.geojson`, (i, base) => ({
    ...base,
    stateCode: states[frame[i]].code,
    stateName: states[frame[i]].name,
    step,
    year,
  }));
}

/** Every patch's state at every step, long form; join on `patch` with the study area's patches.geojson. */
export async function streamHistory(res: Response, access: RunAccess): Promise<void> {
  const { run } = access;
  // Checked before the first line is written: once streaming has begun, no error answer can follow.
  requireSucceeded(access);
  await streamCsv(res, `${runFileStem(access)}-history.csv`, historyLines(runFrames(access), run.yearsPerStep, run.inputsSummary.states));
}

/** Long-run shares of the frozen last phase's matrix; null when the stationary distribution is not unique. */
function longRunShares({ run }: RunAccess): number[] | null {
  const { states, phases } = run.inputsSummary;
  return analyzeChain(createMatrix(states.map((s) => s.code), phases[phases.length - 1].matrix)).stationary;
}

export async function streamAreaShares(res: Response, access: RunAccess, unit: AreaUnit): Promise<void> {
  const summary = await runSummary(access);
  await streamCsv(res, `${runFileStem(access)}-area-shares-${unit}.csv`, areaShareLines(summary, unit, longRunShares(access)));
}

/** Two to four finished runs of one study area, in the order asked. */
export async function streamComparison(res: Response, area: StudyAreaAccess, user: User, runIds: readonly number[], unit: AreaUnit): Promise<void> {
  const runs: ComparedRun[] = [];
  for (const runId of runIds) {
    const access = await runAccess(runId, user);
    if (access.run.studyAreaId !== area.studyArea.id) throw new AppError(400, 'invalid_input', `Run ${runId} belongs to another study area; compare runs of ${area.studyArea.name} only.`);
    runs.push({ runId, scenarioName: access.run.inputsSummary.scenarioName, summary: await runSummary(access) });
  }
  await streamCsv(res, `${fileSlug(area.studyArea.name)}-compare-runs-${runIds.join('-')}-${unit}.csv`, compareLines(runs, unit));
}

/** One phase's matrix in the CLI's CSV form (row = from, column = to), states by code. */
export async function streamMatrix(res: Response, { scenario, area }: ScenarioAccess, index: number): Promise<void> {
  const phases = scenario.phases ?? [];
  if (index >= phases.length) throw new AppError(400, 'invalid_input', `Invalid path: phase index must be between 0 and ${phases.length - 1}; the scenario has ${phases.length} phase${phases.length === 1 ? '' : 's'}.`);
  const text = formatMatrixCsv(createMatrix(scenario.stateCodes, phases[index].matrix));
  await streamCsv(res, `${fileSlug(area.studyArea.name)}-${fileSlug(scenario.name)}-phase-${index}-matrix.csv`, [text]);
}

export async function streamEstimate(res: Response, { survey, area }: SurveyAccess): Promise<void> {
  await streamCsv(res, `${fileSlug(area.studyArea.name)}-${fileSlug(survey.name)}-estimate.csv`, estimateLines(survey.estimate));
}
