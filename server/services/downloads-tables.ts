// The CSV tables of the downloads, as lines: pure functions of what is stored, so that each
// column's meaning is stated once, here.
import type { AreaUnit, CoverState, RunSummary, SurveyEstimate } from '../../shared/schemas';
import { csvRow, M2_PER_UNIT } from './downloads-csv';
import type { StepFrame } from './downloads-frames';

/** Rows of history written per piece: bounds the size of one write. */
const HISTORY_BATCH = 10_000;

/** Long patch history: patch, step, year, state code, step by step from the stored frames. */
export async function* historyLines(frames: AsyncIterable<StepFrame>, yearsPerStep: number, states: readonly CoverState[]): AsyncGenerator<string> {
  yield csvRow(['patch', 'step', 'year', 'state']);
  const codes = states.map((s) => s.code);
  for await (const { step, states: frame } of frames) {
    const year = step * yearsPerStep;
    for (let from = 0; from < frame.length; from += HISTORY_BATCH) {
      let piece = '';
      const to = Math.min(frame.length, from + HISTORY_BATCH);
      for (let i = from; i < to; i++) piece += csvRow([i, step, year, codes[frame[i]]]);
      yield piece;
    }
  }
}

/**
 * Area shares per step and state: mean, median, 5 % and 95 % over replicates of the area (in
 * `unit`) and of the area share, the expected path's share and the long-run share (empty when
 * the last phase has no unique stationary distribution).
 */
export function* areaShareLines(summary: RunSummary, unit: AreaUnit, longRun: readonly number[] | null): Generator<string> {
  const area = ['mean', 'median', 'p5', 'p95'].map((q) => `${q}_area_${unit}`);
  const share = ['mean', 'median', 'p5', 'p95'].map((q) => `${q}_share`);
  yield csvRow(['step', 'year', 'state', 'state_name', ...area, ...share, 'expected_share', 'long_run_share']);
  const perUnit = M2_PER_UNIT[unit];
  for (let step = 0; step <= summary.steps; step++) {
    for (const [j, state] of summary.states.entries()) {
      const a = summary.area[step][j];
      const s = summary.share[step][j];
      yield csvRow([step, step * summary.yearsPerStep, state.code, state.name, a.mean / perUnit, a.median / perUnit, a.p5 / perUnit, a.p95 / perUnit, s.mean, s.median, s.p5, s.p95, summary.expectedShare[step][j], longRun ? longRun[j] : null]);
    }
  }
}

export type ComparedRun = { runId: number; scenarioName: string; summary: RunSummary };

/** Several runs side by side in long form: median, 5 % and 95 % area (in `unit`) and median share. */
export function* compareLines(runs: readonly ComparedRun[], unit: AreaUnit): Generator<string> {
  yield csvRow(['run', 'scenario', 'step', 'year', 'state', `median_area_${unit}`, `p5_area_${unit}`, `p95_area_${unit}`, 'median_share']);
  const perUnit = M2_PER_UNIT[unit];
  for (const { runId, scenarioName, summary } of runs) {
    for (let step = 0; step <= summary.steps; step++) {
      for (const [j, state] of summary.states.entries()) {
        const a = summary.area[step][j];
        yield csvRow([runId, scenarioName, step, step * summary.yearsPerStep, state.code, a.median / perUnit, a.p5 / perUnit, a.p95 / perUnit, summary.share[step][j].median]);
      }
    }
  }
}

/**
 * A survey's estimate as a long table, one line per (from, to) cell: count, MLE p, Wilson
 * interval (lower, upper) and Goodman simultaneous interval (simLower, simUpper); empty for rows
 * without data. Then the chi-square tests and the confidence level, each under its own header.
 */
export function* estimateLines(e: SurveyEstimate): Generator<string> {
  yield csvRow(['from', 'to', 'count', 'p', 'lower', 'upper', 'simLower', 'simUpper']);
  for (const [i, from] of e.stateCodes.entries()) {
    for (const [j, to] of e.stateCodes.entries()) {
      yield csvRow([from, to, e.counts[i][j], e.matrix[i][j], e.lower[i][j], e.upper[i][j], e.simultaneous.lower[i][j], e.simultaneous.upper[i][j]]);
    }
  }
  yield '\n';
  yield csvRow(['test', 'statistic', 'dof', 'pValue']);
  for (const name of ['independence', 'homogeneity'] as const) {
    const test = e.tests[name];
    yield csvRow([name, test?.statistic ?? null, test?.dof ?? null, test?.pValue ?? null]);
  }
  yield '\n';
  yield csvRow(['setting', 'value']);
  yield csvRow(['confidenceLevel', e.confidenceLevel]);
  yield csvRow(['pairsUsed', e.pairsUsed]);
  yield csvRow(['rowsWithoutData', e.rowsWithoutData.join(' ')]);
}
