// Estimation uncertainty: for phases whose matrix came from a survey, matrices drawn row by row
// from the Dirichlet posterior of the survey's counts, and the spread of their long-run shares.
import { randomBytes } from 'node:crypto';
import { Survey } from '../models';
import { classify, createStream, dirichletRowDraw, uniqueStationary } from '../../shared/markov';
import type { ScenarioUncertainty } from '../../shared/schemas';
import { stateCodes, stateNames, type ScenarioAccess } from './scenarios';

/** Symmetric Dirichlet prior per cell: ½ is the Jeffreys prior of a multinomial row. */
export const POSTERIOR_PRIOR = 0.5;
export const RANGE: [number, number] = [0.05, 0.95];

const METHOD =
  `Each row of the matrix is drawn from its posterior Dirichlet(n_i1 + ${POSTERIOR_PRIOR}, …, n_iK + ${POSTERIOR_PRIOR}): the survey's transition counts plus a Jeffreys prior of ${POSTERIOR_PRIOR} per cell. ` +
  'The long-run shares of every drawn matrix are computed, and their median and 5–95 % range reported.';

/** Quantile q of sorted values by linear interpolation between order statistics (Hyndman & Fan 1996, type 7). */
function quantile(sorted: readonly number[], q: number): number {
  const h = (sorted.length - 1) * q;
  const lo = Math.floor(h);
  return sorted[lo] + (h - lo) * (sorted[Math.min(lo + 1, sorted.length - 1)] - sorted[lo]);
}

type PhaseUncertainty = ScenarioUncertainty['phases'][number];

const sameMatrix = (a: readonly number[][], b: readonly (number | null)[][]): boolean =>
  a.every((row, i) => row.every((v, j) => b[i][j] !== null && Math.abs(v - (b[i][j] as number)) < 1e-12));

function phaseRanges(index: number, counts: readonly number[][], names: readonly string[], draws: number, seed: string): Pick<PhaseUncertainty, 'longRun' | 'drawsWithoutUniqueShares'> {
  const stream = createStream(seed, `posterior|phase ${index}`);
  const samples: number[][] = names.map(() => []);
  let withoutUnique = 0;
  for (let d = 0; d < draws; d++) {
    const rows = counts.map((row) => dirichletRowDraw(row, POSTERIOR_PRIOR, stream));
    const pi = uniqueStationary(rows, classify(rows));
    if (!pi) {
      withoutUnique++;
      continue;
    }
    pi.forEach((share, j) => samples[j].push(share));
  }
  if (samples[0].length === 0) return { longRun: null, drawsWithoutUniqueShares: withoutUnique };
  const longRun = names.map((state, j) => {
    const sorted = samples[j].sort((a, b) => a - b);
    return { state, median: quantile(sorted, 0.5), lower: quantile(sorted, RANGE[0]), upper: quantile(sorted, RANGE[1]) };
  });
  return { longRun, drawsWithoutUniqueShares: withoutUnique };
}

export async function scenarioUncertainty(access: ScenarioAccess, query: { draws: number; seed?: string }): Promise<ScenarioUncertainty> {
  const { scenario, area } = access;
  const seed = query.seed ?? randomBytes(6).toString('hex');
  const names = stateNames(area);
  const codes = stateCodes(area).join('\u0000');
  const rows = scenario.phases ?? [];
  const ids = rows.flatMap((p) => (p.surveyId === null ? [] : [p.surveyId]));
  const surveys = new Map((await Survey.findAll({ where: { id: ids } })).map((s) => [s.id, s]));
  const phases = rows.map((phase, index): PhaseUncertainty => {
    const none = (reason: string): PhaseUncertainty => ({ index, surveyId: phase.surveyId, longRun: null, reason, drawsWithoutUniqueShares: 0, matrixMatchesSurvey: false });
    const survey = phase.surveyId === null ? undefined : surveys.get(phase.surveyId);
    if (!survey) return none('This matrix was typed in, not taken from a survey: there are no counts to draw from.');
    if (survey.estimate.stateCodes.join('\u0000') !== codes) return none(`The survey "${survey.name}" was estimated for other cover states than the study area has now.`);
    const ranges = phaseRanges(index, survey.estimate.counts, names, query.draws, seed);
    return {
      index,
      surveyId: survey.id,
      ...ranges,
      reason: ranges.longRun ? null : 'No drawn matrix had a single set of long-run shares.',
      matrixMatchesSurvey: sameMatrix(phase.matrix, survey.estimate.matrix),
    };
  });
  return { scenarioId: scenario.id, prior: POSTERIOR_PRIOR, draws: query.draws, seed, quantiles: RANGE, phases, method: METHOD };
}
