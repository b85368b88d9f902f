// Kernel throughput (N = 10⁶ patches, T = 100 steps, K = 5) beside NumPy and C references of the
// same loop, worker-thread scaling on two cores, and peak memory against the history buffer.
import { execFile, execFileSync } from 'node:child_process';
import { promisify } from 'node:util';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createMatrix } from '../../shared/markov/matrix';
import { planShards } from '../../shared/markov/kernel';
import { simulateRun, type RunSpec } from '../../shared/markov/run';
import { startShardPool } from '../../server/engine/parallel';
import { BENCH_ROWS, BENCH_STATES } from './kernelSetup';

const N = 1_000_000;
const T = 100;
const REPEATS = 5;

/** Patch-steps per second by wall clock and by the process's CPU time (the machine is shared). */
type Rate = { wall: number; cpu: number };
type ReferenceOutput = { patchStepsPerSecond: number; cpuPatchStepsPerSecond: number };
type Row = { name: string; rate: Rate; load: string };

const fmt = (rate: number): string => rate.toExponential(2);
const line = (text: string): void => {
  process.stdout.write(`${text}\n`);
};
/** The machine is shared: the 1-minute load average goes beside every figure. */
const load = (): string => `load ${readFileSync('/proc/loadavg', 'utf8').split(' ')[0]}`;
const cpuSeconds = (): number => {
  const { user, system } = process.cpuUsage();
  return (user + system) / 1e6;
};
const faster = (a: Rate, b: Rate): Rate => ({ wall: Math.max(a.wall, b.wall), cpu: Math.max(a.cpu, b.cpu) });

async function best(run: () => Promise<unknown> | unknown): Promise<Rate> {
  let rate: Rate = { wall: 0, cpu: 0 };
  for (let n = 0; n < REPEATS; n++) {
    const started = performance.now();
    const cpu = cpuSeconds();
    await run();
    rate = faster(rate, { wall: (N * T) / ((performance.now() - started) / 1000), cpu: (N * T) / (cpuSeconds() - cpu) });
  }
  return rate;
}

function external(command: string, args: string[]): Rate {
  let rate: Rate = { wall: 0, cpu: 0 };
  for (let n = 0; n < REPEATS; n++) {
    const out = JSON.parse(execFileSync(command, args).toString()) as ReferenceOutput;
    rate = faster(rate, { wall: out.patchStepsPerSecond, cpu: out.cpuPatchStepsPerSecond });
  }
  return rate;
}

/** A measurement with the load average right after it. */
async function measured(name: string, run: () => Promise<Rate> | Rate): Promise<Row> {
  const rate = await run();
  return { name, rate, load: load() };
}

const ratios = (ts: Rate, ref: Rate): string => `${(ts.wall / ref.wall).toFixed(2)} wall, ${(ts.cpu / ref.cpu).toFixed(2)} CPU`;

/** Patch-steps per second (wall clock) of a warmed-up pool of `workers` threads, timing run() only. */
async function pooled(spec: RunSpec, workers: number): Promise<number> {
  const pool = startShardPool(spec, workers);
  try {
    await pool.run();
    return (await best(() => pool.run())).wall;
  } finally {
    await pool.close();
  }
}

/** What the two cores give at all: the C loop as two processes at once, against one alone. */
async function hardwareScaling(binary: string): Promise<number> {
  const runC = async (): Promise<number> => (JSON.parse((await promisify(execFile)(binary, [String(N), String(T)])).stdout) as ReferenceOutput).patchStepsPerSecond;
  let one = 0;
  let two = 0;
  for (let n = 0; n < REPEATS; n++) {
    one = Math.max(one, await runC());
    two = Math.max(two, (await Promise.all([runC(), runC()])).reduce((a, b) => a + b));
  }
  return two / one;
}

/** Worker scaling on the same spec: equal block-aligned shards, history in one SharedArrayBuffer. */
async function scaling(spec: RunSpec, binary: string): Promise<void> {
  const shards = planShards(spec.patchCount, 2).map(([from, to]) => to - from);
  const one = await pooled(spec, 1);
  const oneLoad = load();
  const two = await pooled(spec, 2);
  const twoLoad = load();
  const ceiling = await hardwareScaling(binary);
  line(`worker threads, wall clock (history kept in a SharedArrayBuffer; workers started and warmed up before timing; shards of ${shards.join(' and ')} patches):`);
  line(`  1 worker ${fmt(one)} (${oneLoad}), 2 workers ${fmt(two)} (${twoLoad}), scaling ${(two / one).toFixed(2)}× (target ≥ 1.8× on 2 cores; other sessions' load takes cores away)`);
  line(`  the cores themselves: two C processes at once give ${ceiling.toFixed(2)}× one (${load()}); threads reach ${((two / one / ceiling) * 100).toFixed(0)} % of that`);
}

export async function bench(): Promise<void> {
  const matrix = createMatrix(BENCH_STATES, BENCH_ROWS);
  const uniform = new Float64Array(N).fill(900);
  const spec: RunSpec = { phases: [{ startStep: 0, matrix }], steps: T, patchCount: N, replicates: 1, seed: 'bench', historyReplicate: null, areas: uniform, initial: { kind: 'distribution', distribution: [0.2, 0.2, 0.2, 0.2, 0.2] } };
  const varied = new Float64Array(N).map((_, i) => 850 + (i % 101));

  const reference = join(__dirname, 'reference');
  const binary = join(mkdtempSync(join(tmpdir(), 'patchcast-bench-')), 'kernel');
  execFileSync('gcc', ['-O3', '-o', binary, join(reference, 'kernel.c'), '-lm']);

  const js = await measured('TypeScript kernel, equal patch areas', () => best(() => simulateRun(spec)));
  const jsVaried = await measured('TypeScript kernel, every area differs', () => best(() => simulateRun({ ...spec, areas: varied })));
  const numpy = await measured('NumPy (lookup table, raw 32-bit draws)', () => external('/usr/bin/python3', [join(reference, 'kernel_numpy.py'), String(N), String(T)]));
  const c = await measured('C -O3 (same loop)', () => external(binary, [String(N), String(T)]));
  line(`one core, patch-steps/s (N=${N}, T=${T}, K=5; best of ${REPEATS}; by wall clock and by the process's own CPU time):`);
  for (const row of [js, jsVaried, numpy, c]) line(`  ${row.name.padEnd(40)} ${fmt(row.rate.wall)} wall  ${fmt(row.rate.cpu)} CPU  (${row.load})`);
  line(`  equal areas:  TS/NumPy ${ratios(js.rate, numpy.rate)} (target ≥ 1.0); TS/C ${ratios(js.rate, c.rate)} (target ≥ 0.4)`);
  line(`  varied areas: TS/NumPy ${ratios(jsVaried.rate, numpy.rate)}; TS/C ${ratios(jsVaried.rate, c.rate)}`);

  await scaling({ ...spec, historyReplicate: 0 }, binary);

  const child = join(__dirname, 'kernelMemory.child.ts');
  const memory = JSON.parse(execFileSync(process.execPath, ['--import', 'tsx', child, String(N), String(T)]).toString()) as {
    peakRssBytes: number;
    baselineRssBytes: number;
    historyBytes: number;
  };
  const mb = (bytes: number): string => `${(bytes / 2 ** 20).toFixed(0)} MiB`;
  line(
    `memory with history: history buffer ${mb(memory.historyBytes)}; the run's own peak (process peak RSS minus the ` +
      `${mb(memory.baselineRssBytes)} of Node, tsx and inputs before it) ${mb(memory.peakRssBytes - memory.baselineRssBytes)} ` +
      `(${((memory.peakRssBytes - memory.baselineRssBytes) / memory.historyBytes).toFixed(2)}×; target ≤ 1.5×); whole process ${mb(memory.peakRssBytes)} (${(memory.peakRssBytes / memory.historyBytes).toFixed(2)}×)`,
  );
}
