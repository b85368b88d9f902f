import { createMatrix } from '../../../shared/markov/matrix';
import { simulateRun, type RunSpec } from '../../../shared/markov/run';
import { BLOCK_SIZE } from '../../../shared/markov/streams';
import { simulateRunParallel } from '../../../server/engine/parallel';

// Same seed, same result, however many workers (brief §6): worker_threads against one thread.
test('worker threads give byte-identical results to the single-thread run', async () => {
  const matrix = createMatrix(['A', 'B', 'C'], [[0.8, 0.1, 0.1], [0.2, 0.7, 0.1], [0.1, 0.3, 0.6]]);
  const patchCount = 5 * BLOCK_SIZE + 17;
  const areas = new Float64Array(patchCount).map((_, i) => 900 - (i % 13));
  const spec: RunSpec = { phases: [{ startStep: 0, matrix }], steps: 8, patchCount, replicates: 2, seed: 'threads', historyReplicate: 0, areas, initial: { kind: 'distribution', distribution: [0.5, 0.3, 0.2] } };
  const single = simulateRun(spec);
  const parallel = await simulateRunParallel(spec, 2);
  expect(Buffer.from(parallel.counts.buffer).equals(Buffer.from(single.counts.buffer))).toBe(true);
  expect(Buffer.from(parallel.areaTotals.buffer).equals(Buffer.from(single.areaTotals.buffer))).toBe(true);
  expect(Buffer.from(parallel.history as Uint8Array).equals(Buffer.from(single.history as Uint8Array))).toBe(true);
}, 30_000);
