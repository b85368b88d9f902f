// `simulate`: seeded patch-by-patch simulation of a matrix; counts per state per step.
import { randomBytes } from 'node:crypto';
import { simulateRun, type RunSpec } from '../../shared/markov/run';
import { simulateRunParallel } from '../engine/parallel';
import { CliInputError, formatTable, integerOption, parseArgs, readInitialOption, readMatrixOption, requireOption } from './args';

export const summary =
  'simulate --matrix FILE.csv --patches N --steps T [--replicates R] [--seed S] [--initial p1,p2,…] [--workers W] [--json | --bench]';

function positive(name: string, value: number): number {
  if (value < 1) throw new CliInputError(`--${name} must be at least 1, got ${value}`);
  return value;
}

export async function run(argv: string[]): Promise<void> {
  const args = parseArgs(argv, ['json', 'bench', 'normalise']);
  const matrix = readMatrixOption(args);
  requireOption(args, 'patches');
  requireOption(args, 'steps');
  const k = matrix.states.length;
  const spec: RunSpec = {
    phases: [{ startStep: 0, matrix }],
    patchCount: positive('patches', integerOption(args, 'patches', 0)),
    steps: integerOption(args, 'steps', 0),
    replicates: positive('replicates', integerOption(args, 'replicates', 1)),
    seed: args.options.get('seed') ?? randomBytes(6).toString('hex'),
    initial: { kind: 'distribution', distribution: readInitialOption(args, matrix.states) ?? new Array<number>(k).fill(1 / k) },
    historyReplicate: null,
  };
  const workers = positive('workers', integerOption(args, 'workers', 1));
  const started = performance.now();
  const result = workers > 1 ? await simulateRunParallel(spec, workers) : simulateRun(spec);
  const seconds = (performance.now() - started) / 1000;
  if (args.flags.has('bench')) {
    const patchSteps = spec.patchCount * spec.steps * spec.replicates;
    process.stdout.write(`${JSON.stringify({ patchStepsPerSecond: Math.round(patchSteps / seconds) })}\n`);
    return;
  }
  const slots = spec.steps + 1;
  const stepCounts = (r: number): number[][] =>
    Array.from({ length: slots }, (_, s) => Array.from(result.counts.subarray((r * slots + s) * k, (r * slots + s + 1) * k)));
  const counts = stepCounts(0);
  const meanCounts = counts.map((row, s) =>
    row.map((_, j) => {
      let sum = 0;
      for (let r = 0; r < spec.replicates; r++) sum += result.counts[(r * slots + s) * k + j];
      return sum / spec.replicates;
    }),
  );
  if (args.flags.has('json')) {
    process.stdout.write(`${JSON.stringify({ states: matrix.states, seed: spec.seed, counts, meanCounts })}\n`);
    return;
  }
  const header = ['step', ...matrix.states];
  const lines = [
    `Seed ${spec.seed}; ${spec.patchCount} patches, ${spec.steps} steps, ${spec.replicates} replicate(s).`,
    '',
    'Patch counts, replicate 1:',
    formatTable(header, counts.map((row, s) => [String(s), ...row.map(String)])),
  ];
  if (spec.replicates > 1) {
    lines.push('', `Mean patch counts over ${spec.replicates} replicates:`);
    lines.push(formatTable(header, meanCounts.map((row, s) => [String(s), ...row.map((v) => v.toFixed(1))])));
  }
  process.stdout.write(`${lines.join('\n')}\n`);
}
