// `analyze`: long-run shares, structure, convergence, passage and absorption times of a matrix.
import { analyzeChain, DEFAULT_MIXING_LIMIT, DEFAULT_PROJECTION_STEPS, type ChainAnalysis } from '../../shared/markov/analysis';
import { formatNumber, formatTable, integerListOption, integerOption, parseArgs, readInitialOption, readMatrixOption } from './args';

export const summary =
  'analyze --matrix FILE.csv [--orientation rows|columns] [--normalise] [--initial p1,p2,…] [--steps 1,5,20,100] [--max-steps 10000] [--json]';

/** The JSON document of `analyze --json`: exactly these keys (Infinity becomes null). */
function toJson(a: ChainAnalysis): Record<string, unknown> {
  return {
    states: a.states,
    stationary: a.stationary,
    stationaryByClass: a.stationaryByClass,
    classes: a.classes,
    absorbing: a.absorbing,
    period: a.period,
    lambda2Modulus: a.lambda2Modulus,
    dampingRatio: a.dampingRatio,
    residenceSteps: a.residenceSteps,
    meanRecurrence: a.meanRecurrence,
    meanFirstPassage: a.meanFirstPassage,
    absorption: a.absorption,
    projection: a.projection,
    mixingTime: a.mixingTime,
  };
}

const list = (names: readonly string[]): string => (names.length ? names.join(', ') : 'none');

function toText(a: ChainAnalysis): string {
  const out: string[] = [];
  const perState = formatTable(
    ['state', 'long-run share', 'residence (steps)', 'mean recurrence (steps)'],
    a.states.map((s, i) => [s, formatNumber(a.stationary ? a.stationary[i] : null), formatNumber(a.residenceSteps[i], 2), formatNumber(a.meanRecurrence[i], 2)]),
  );
  out.push(perState, '');
  if (!a.stationary) {
    out.push('Long-run shares are not unique: there are several closed classes. One per closed class:');
    a.stationaryByClass.forEach((c) => out.push(`  {${c.class.join(', ')}}: ${c.distribution.map((v) => formatNumber(v)).join(', ')}`));
  }
  out.push(`Communicating classes: ${a.classes.communicating.map((c) => `{${c.join(', ')}}`).join(' ')}`);
  out.push(`Closed classes: ${a.classes.closed.map((c) => `{${c.join(', ')}}`).join(' ')}`);
  out.push(`Transient states: ${list(a.classes.transient)}`, `Absorbing states: ${list(a.absorbing)}`);
  a.period.forEach((p) => out.push(`Period of {${p.class.join(', ')}}: ${p.period}${p.period > 1 ? ' (periodic: shares oscillate)' : ''}`));
  out.push(`|λ2| = ${formatNumber(a.lambda2Modulus)}, damping ratio 1/|λ2| = ${formatNumber(a.dampingRatio)}`);
  if (a.mixingTime !== null) out.push(`Mixing time (TV < 1 %, ${a.mixingStart}): ${a.mixingTime} steps`);
  else if (a.stationary) out.push(`Mixing time (${a.mixingStart}): not within ${a.mixingLimit} steps`);
  else out.push('Mixing time: none (no unique long-run shares)');
  if (a.meanFirstPassage) {
    out.push('', 'Mean first-passage steps (row: from, column: to):');
    out.push(formatTable(['from \\ to', ...a.states], a.meanFirstPassage.map((row, i) => [a.states[i], ...row.map((v) => formatNumber(v, 2))])));
  }
  if (a.absorption) {
    const absorption = a.absorption;
    out.push('', 'Absorption (expected steps, probability of ending in each absorbing state):');
    out.push(
      formatTable(
        ['from', 'expected steps', ...a.absorbing],
        a.states.map((s, i) => [s, formatNumber(absorption.expectedSteps[i], 2), ...a.absorbing.map((t) => formatNumber(absorption.probabilities[i][a.states.indexOf(t)]))]),
      ),
    );
  }
  out.push('', 'Projection x_t = x_0 P^t:');
  out.push(formatTable(['t', ...a.states], a.projection.map((p) => [String(p.t), ...p.distribution.map((v) => formatNumber(v))])));
  return out.join('\n');
}

export async function run(argv: string[]): Promise<void> {
  const args = parseArgs(argv, ['json', 'normalise']);
  const matrix = readMatrixOption(args);
  const analysis = analyzeChain(matrix, {
    initial: readInitialOption(args, matrix.states),
    steps: integerListOption(args, 'steps') ?? DEFAULT_PROJECTION_STEPS,
    mixingLimit: integerOption(args, 'max-steps', DEFAULT_MIXING_LIMIT),
  });
  process.stdout.write(`${args.flags.has('json') ? JSON.stringify(toJson(analysis)) : toText(analysis)}\n`);
}
