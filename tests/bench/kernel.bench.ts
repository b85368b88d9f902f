// Kernel throughput (N = 10⁶ patches, T = 100 steps, K = 5) beside NumPy and C references of the
// same loop, worker-thread scaling on two cores, and peak memory against the history buffer.
import { execFileSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createMatrix } from '../../shared/markov/matrix';
import { simulateRun, type RunSpec } from '../../shared/markov/run';
import { simulateRunParallel } from '../../server/engine/parallel';
import { BENCH_ROWS, BENCH_STATES } from './kernelSetup';

const N = 1_000_000;
const T = 100;
const REPEATS = 3;

type Rate = { patchStepsPerSecond: number };

const fmt = (rate: number): string => rate.toExponential(2);
const line = (text: string): void => {
  process.stdout.write(`${text}\n`);
};

async function best(run: () => Promise<unknown> | unknown): Promise<number> {
  let rate = 0;
  for (let n = 0; n < REPEATS; n++) {
    const started = performance.now();
    await run();
    rate = Math.max(rate, (N * T) / ((performance.now() - started) / 1000));
  }
  return rate;
}

function external(command: string, args: string[]): number {
  let rate = 0;
  for (let n = 0; n < REPEATS; n++) rate = Math.max(rate, (JSON.parse(execFileSync(command, args).toString()) as Rate).patchStepsPerSecond);
  return rate;
}

export async function bench(): Promise<void> {
  const matrix = createMatrix(BENCH_STATES, BENCH_ROWS);
  const uniform = new Float64Array(N).fill(900);
  const spec: RunSpec = { phases: [{ startStep: 0, matrix }], steps: T, patchCount: N, replicates: 1, seed: 'bench', historyReplicate: null, areas: uniform, initial: { kind: 'distribution', distribution: [0.2, 0.2, 0.2, 0.2, 0.2] } };
  const varied = new Float64Array(N).map((_, i) => 850 + (i % 101));

  const reference = join(__dirname, 'reference');
  const binary = join(mkdtempSync(join(tmpdir(), 'patchcast-bench-')), 'kernel');
  execFileSync('gcc', ['-O3', '-o', binary, join(reference, 'kernel.c'), '-lm']);

  const js = await best(() => simulateRun(spec));
  const jsVaried = await best(() => simulateRun({ ...spec, areas: varied }));
  const numpy = external('/usr/bin/python3', [join(reference, 'kernel_numpy.py'), String(N), String(T)]);
  const c = external(binary, [String(N), String(T)]);
  line(`one core, patch-steps/s (N=${N}, T=${T}, K=5; best of ${REPEATS}):`);
  line(`  TypeScript kernel, equal patch areas   ${fmt(js)}`);
  line(`  TypeScript kernel, every area differs  ${fmt(jsVaried)}`);
  line(`  NumPy (lookup table, raw 32-bit draws) ${fmt(numpy)}`);
  line(`  C -O3 (same loop)                      ${fmt(c)}`);
  line(`  ratio TS/NumPy ${(js / numpy).toFixed(2)} (target ≥ 1.0), TS/C ${(js / c).toFixed(2)} (target ≥ 0.4); varied areas: ${(jsVaried / numpy).toFixed(2)}, ${(jsVaried / c).toFixed(2)}`);

  const one = await best(() => simulateRunParallel(spec, 1));
  const two = await best(() => simulateRunParallel(spec, 2));
  line(`worker threads: 1 worker ${fmt(one)}, 2 workers ${fmt(two)}, scaling ${(two / one).toFixed(2)}× (target ≥ 1.8× on 2 cores)`);

  const child = join(__dirname, 'kernelMemory.child.ts');
  const memory = JSON.parse(execFileSync(process.execPath, ['--import', 'tsx', child, String(N), String(T)]).toString()) as {
    peakRssBytes: number;
    baselineRssBytes: number;
    historyBytes: number;
  };
  const mb = (bytes: number): string => `${(bytes / 2 ** 20).toFixed(0)} MiB`;
  line(
    `memory with history: history buffer ${mb(memory.historyBytes)}, process peak RSS ${mb(memory.peakRssBytes)} ` +
      `(${(memory.peakRssBytes / memory.historyBytes).toFixed(2)}×), above the ${mb(memory.baselineRssBytes)} before the run: ` +
      `${mb(memory.peakRssBytes - memory.baselineRssBytes)} (${((memory.peakRssBytes - memory.baselineRssBytes) / memory.historyBytes).toFixed(2)}×; target ≤ 1.5×)`,
  );
}
