// `estimate`: transition counts, MLE matrix, intervals and tests from a survey's long table.
import { countTransitions, estimateMatrix, type Estimate } from '../../shared/markov/estimate';
import { parseObservationsCsv } from '../../shared/markov/observationsCsv';
import { CliInputError, formatNumber, formatTable, numberOption, parseArgs, readFileOption, withInputErrors } from './args';

export const summary =
  'estimate --observations FILE.csv [--plot-col plot --time-col time --state-col state] [--states a,b,c] [--step 1] [--confidence 0.95] [--json]';

function toJson(e: Estimate): Record<string, unknown> {
  return {
    states: e.states,
    counts: e.counts,
    matrix: e.matrix,
    lower: e.lower,
    upper: e.upper,
    simultaneous: e.simultaneous,
    confidenceLevel: e.confidenceLevel,
    pairsUsed: e.pairsUsed,
    pairsSkipped: e.pairsSkipped,
    tests: e.tests,
  };
}

function toText(e: Estimate): string {
  const pct = Math.round(e.confidenceLevel * 100);
  const out = [
    `${e.pairsUsed} transitions counted, ${e.pairsSkipped.length} pairs skipped.`,
    '',
    'Transition counts (row: from, column: to):',
    formatTable(['from \\ to', ...e.states, 'total'], e.counts.map((row, i) => [e.states[i], ...row.map(String), String(row.reduce((a, b) => a + b, 0))])),
    '',
    `Estimated matrix with ${pct} % Wilson intervals [and Goodman simultaneous intervals]:`,
    formatTable(
      ['from \\ to', ...e.states],
      e.matrix.map((row, i) => [
        e.states[i],
        ...row.map((p, j) =>
          p === null
            ? 'no data'
            : `${formatNumber(p, 3)} (${formatNumber(e.lower[i][j], 3)}–${formatNumber(e.upper[i][j], 3)}) [${formatNumber(e.simultaneous.lower[i][j], 3)}–${formatNumber(e.simultaneous.upper[i][j], 3)}]`,
        ),
      ]),
    ),
  ];
  if (e.rowsWithoutData.length) out.push('', `No transitions observed from: ${e.rowsWithoutData.join(', ')} (rows left empty, not filled).`);
  const test = (name: string, t: Estimate['tests']['independence']): string =>
    t ? `${name}: χ² = ${formatNumber(t.statistic, 2)}, dof ${t.dof}, p = ${t.pValue.toPrecision(3)}` : `${name}: not computable (too few periods or states with data)`;
  out.push('', test('Independence of successive states (order 0 vs 1)', e.tests.independence));
  out.push(test('Time-homogeneity across periods', e.tests.homogeneity));
  if (e.pairsSkipped.length) {
    out.push('', 'Skipped pairs:');
    const shown = e.pairsSkipped.slice(0, 20);
    shown.forEach((p) => out.push(`  plot ${p.plot}: ${p.fromTime} → ${p.toTime}: ${p.reason}`));
    if (e.pairsSkipped.length > shown.length) out.push(`  … and ${e.pairsSkipped.length - shown.length} more (see --json)`);
  }
  return out.join('\n');
}

export async function run(argv: string[]): Promise<void> {
  const args = parseArgs(argv, ['json']);
  const { path, text } = readFileOption(args, 'observations');
  const columns = {
    plot: args.options.get('plot-col') ?? 'plot',
    time: args.options.get('time-col') ?? 'time',
    state: args.options.get('state-col') ?? 'state',
  };
  const states = args.options.get('states')?.split(',').map((s) => s.trim());
  const step = numberOption(args, 'step', 1);
  const confidence = numberOption(args, 'confidence', 0.95);
  if (!(step > 0)) throw new CliInputError(`--step must be a positive number, got ${step}`);
  if (!(confidence > 0 && confidence < 1)) throw new CliInputError(`--confidence must be between 0 and 1, got ${confidence}`);
  const estimate = withInputErrors(path, () => estimateMatrix(countTransitions(parseObservationsCsv(text, columns), { states, step }), confidence));
  process.stdout.write(`${args.flags.has('json') ? JSON.stringify(toJson(estimate)) : toText(estimate)}\n`);
}
