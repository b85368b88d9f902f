// Plain-language readings of a survey's estimate: the two chi-square tests, rows without data,
// thin rows and pairs that were not counted.
import type { ChiSquareTest, Estimate } from '../../shared/markov';

/** Significance level at which a test is read as evidence. */
const ALPHA = 0.05;
/** Rows with fewer transitions than this are called thin. */
const THIN_ROW = 10;

const pText = (p: number): string => (p < 0.001 ? 'p < 0.001' : `p = ${Number(p.toPrecision(2))}`);

function independence(test: ChiSquareTest | null): string {
  if (!test) return 'Too few kinds of transitions were seen to test whether the next state depends on the current one.';
  if (test.pValue >= ALPHA) return `Successive states look independent (${pText(test.pValue)}): the next state does not seem to depend on the current one, so a Markov model adds little over fixed shares here.`;
  return `The next state depends on the current one (${pText(test.pValue)}), as a Markov model assumes.`;
}

function homogeneity(test: ChiSquareTest | null): string {
  if (!test) return 'Not enough periods to test whether transition rates changed over time.';
  if (test.pValue < ALPHA) return `Evidence that transition rates changed between periods (${pText(test.pValue)}): one stationary matrix may not describe every period; consider phases.`;
  return `No evidence that transition rates changed between periods (${pText(test.pValue)}): one stationary matrix is consistent with the data.`;
}

function gaps(e: Estimate): string[] {
  const totals = e.counts.map((row) => row.reduce((a, b) => a + b, 0));
  const empty = e.rowsWithoutData.map((s) => `No transitions out of '${s}' were observed: its row is left empty, and must be typed in before this estimate can be used.`);
  const thin = e.states.flatMap((s, i) => (totals[i] > 0 && totals[i] < THIN_ROW ? [`Only ${totals[i]} transition(s) out of '${s}' were observed: its row is uncertain (see the intervals).`] : []));
  return [...empty, ...thin];
}

function skipped(e: Estimate): string[] {
  const n = e.pairsSkipped.length;
  if (n === 0) return [];
  const reasons = [...new Set(e.pairsSkipped.map((p) => p.reason))];
  const listed = reasons.slice(0, 3).join('; ') + (reasons.length > 3 ? '; …' : '');
  return [`${n} pair(s) of successive records were not counted (${listed}); ${e.pairsUsed} were.`];
}

export function estimateReadings(e: Estimate): string[] {
  return [independence(e.tests.independence), homogeneity(e.tests.homogeneity), ...gaps(e), ...skipped(e)];
}
