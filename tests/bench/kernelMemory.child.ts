// Child process of kernel.bench.ts: peak resident memory of one run that keeps its history.
// Run alone so that the peak belongs to this run (N = 10⁶, T = 100, K = 5).
import { readFileSync } from 'node:fs';
import { createMatrix } from '../../shared/markov/matrix';
import { simulateRun } from '../../shared/markov/run';
import { BENCH_ROWS, BENCH_STATES } from './kernelSetup';

const patchCount = Number(process.argv[2] ?? 1_000_000);
const steps = Number(process.argv[3] ?? 100);
const matrix = createMatrix(BENCH_STATES, BENCH_ROWS);
const areas = new Float64Array(patchCount).fill(900);
const baseline = process.memoryUsage().rss;
const result = simulateRun({ phases: [{ startStep: 0, matrix }], steps, patchCount, replicates: 1, seed: 'memory', historyReplicate: 0, areas, initial: { kind: 'distribution', distribution: [0.2, 0.2, 0.2, 0.2, 0.2] } });
// VmHWM is this address space's own high-water mark. getrusage's maxRSS is not: it survives
// execve (getrusage(2)), so a child forked from a large parent reports the parent's peak.
const peakRssBytes = Number(/VmHWM:\s+(\d+) kB/.exec(readFileSync('/proc/self/status', 'utf8'))?.[1]) * 1024;
process.stdout.write(
  `${JSON.stringify({ peakRssBytes, baselineRssBytes: baseline, historyBytes: result.history?.byteLength ?? 0 })}\n`,
);
