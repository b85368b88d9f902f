// Splits a run over worker_threads (node-only). Shards are block-aligned and merged in block order,
// so the result is byte-identical to simulateRun with any number of workers (shared/markov/run.ts).
import type { Worker } from 'node:worker_threads';
import { startThread } from './start-thread';
import type { ShardResult } from '../../shared/markov/kernel';
import { mergeShards, runTasks, type RunResult, type RunSpec } from '../../shared/markov/run';

export type ShardWorkerData = { spec: RunSpec; history: SharedArrayBuffer | null };
export type ShardTaskMessage = { replicate: number; start: number; end: number };

/** Started workers for one spec, reusable for several runs of it (a benchmark times only run()). */
export type ShardPool = { run: () => Promise<RunResult>; close: () => Promise<void> };

const workerFile = require.resolve('./shardWorker');

const startWorker = (workerData: ShardWorkerData): Worker => startThread(workerFile, { workerData });

/** Sends one task to a worker and waits for its result (or its failure). */
function runTask(worker: Worker, task: ShardTaskMessage): Promise<ShardResult> {
  return new Promise((resolve, reject) => {
    const settle = (): void => {
      worker.off('message', onResult);
      worker.off('error', reject);
      worker.off('exit', onExit);
    };
    const onResult = (result: ShardResult): void => {
      settle();
      resolve(result);
    };
    const onExit = (code: number): void => {
      settle();
      reject(new Error(`shard worker exited with code ${code}`));
    };
    worker.on('message', onResult);
    worker.once('error', reject);
    worker.once('exit', onExit);
    worker.postMessage(task);
  });
}

/**
 * Starts `workers` threads for the spec (shards per replicate = workers). Each run() hands the next
 * task to whichever worker is free; history, when kept, is written by the workers straight into one
 * SharedArrayBuffer, so run() only moves counts and totals.
 */
export function startShardPool(spec: RunSpec, workers: number): ShardPool {
  const history = spec.historyReplicate === null ? null : new SharedArrayBuffer((spec.steps + 1) * spec.patchCount);
  const tasksPerRun = runTasks(spec, workers).length;
  const threads = Array.from({ length: Math.min(workers, tasksPerRun) }, () => startWorker({ spec, history }));
  const run = async (): Promise<RunResult> => {
    const queue = runTasks(spec, workers);
    const results: ShardResult[] = [];
    await Promise.all(
      threads.map(async (worker) => {
        for (let task = queue.shift(); task; task = queue.shift()) results.push(await runTask(worker, task));
      }),
    );
    return mergeShards(spec, results, history ? new Uint8Array(history) : null);
  };
  const close = async (): Promise<void> => {
    await Promise.all(threads.map((worker) => worker.terminate()));
  };
  return { run, close };
}

/** One run on `workers` threads, started and stopped around it. */
export async function simulateRunParallel(spec: RunSpec, workers: number): Promise<RunResult> {
  const pool = startShardPool(spec, workers);
  try {
    return await pool.run();
  } finally {
    await pool.close();
  }
}
