// A survey's estimate as stored and answered: the engine's estimate, with state codes, skipped
// pairs grouped by reason, and plain-language readings.
import { estimateMatrix, type Estimate, type TransitionCounts } from '../../shared/markov';
import type { SurveyEstimate } from '../../shared/schemas';
import { estimateReadings } from './survey-readings';

const SKIPPED_EXAMPLES = 20;

function groupSkipped(e: Estimate): SurveyEstimate['pairsSkipped'] {
  const byReason = new Map<string, number>();
  for (const pair of e.pairsSkipped) byReason.set(pair.reason, (byReason.get(pair.reason) ?? 0) + 1);
  return {
    total: e.pairsSkipped.length,
    byReason: [...byReason].map(([reason, count]) => ({ reason, count })).sort((a, b) => b.count - a.count),
    examples: e.pairsSkipped.slice(0, SKIPPED_EXAMPLES),
  };
}

/** Estimates the matrix from counts (shared/markov estimateMatrix) and adds what the API shows. */
export function surveyEstimate(counts: TransitionCounts, stateCodes: readonly string[], confidenceLevel: number, extraReadings: readonly string[] = []): SurveyEstimate {
  const e = estimateMatrix(counts, confidenceLevel);
  return {
    states: e.states,
    stateCodes: [...stateCodes],
    counts: e.counts,
    matrix: e.matrix,
    lower: e.lower,
    upper: e.upper,
    simultaneous: e.simultaneous,
    confidenceLevel: e.confidenceLevel,
    rowsWithoutData: e.rowsWithoutData,
    pairsUsed: e.pairsUsed,
    pairsSkipped: groupSkipped(e),
    tests: e.tests,
    readings: [...estimateReadings(e), ...extraReadings],
  };
}
