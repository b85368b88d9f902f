// Splits a run over worker_threads (node-only). Shards are block-aligned and merged in block order,
// so the result is byte-identical to simulateRun with any number of workers (shared/markov/run.ts).
import { Worker } from 'node:worker_threads';
import type { ShardResult } from '../../shared/markov/kernel';
import { mergeShards, runTasks, type RunResult, type RunSpec } from '../../shared/markov/run';

export type ShardWorkerData = { spec: RunSpec; history: SharedArrayBuffer | null };
export type ShardTaskMessage = { replicate: number; start: number; end: number };

const workerFile = require.resolve('./shardWorker');

/** A worker on shardWorker; from TypeScript sources (tsx, jest) it first registers tsx's require hook. */
function startWorker(workerData: ShardWorkerData): Worker {
  if (!workerFile.endsWith('.ts')) return new Worker(workerFile, { workerData });
  const source = `require('tsx/cjs'); require(${JSON.stringify(workerFile)});`;
  return new Worker(source, { eval: true, workerData, execArgv: [] });
}

/**
 * Runs every shard of the run on `workers` threads (shards per replicate = workers; a free worker
 * takes the next task). History, when kept, is written by the workers straight into one
 * SharedArrayBuffer.
 */
export async function simulateRunParallel(spec: RunSpec, workers: number): Promise<RunResult> {
  const history = spec.historyReplicate === null ? null : new SharedArrayBuffer((spec.steps + 1) * spec.patchCount);
  const queue = runTasks(spec, workers);
  const results: ShardResult[] = [];
  const data: ShardWorkerData = { spec, history };
  const threads = Array.from({ length: Math.min(workers, queue.length) }, () => startWorker(data));
  try {
    await Promise.all(
      threads.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            const next = (): void => {
              const task = queue.shift();
              worker.postMessage(task ?? null);
              if (!task) resolve();
            };
            worker.on('message', (result: ShardResult) => {
              results.push(result);
              next();
            });
            worker.on('error', reject);
            worker.on('exit', (code) => {
              if (code !== 0) reject(new Error(`shard worker exited with code ${code}`));
            });
            next();
          }),
      ),
    );
  } finally {
    await Promise.all(threads.map((worker) => worker.terminate()));
  }
  return mergeShards(spec, results, history ? new Uint8Array(history) : null);
}
