// Worker threads on one of our modules, whether it runs compiled or from TypeScript sources.
import { Worker, type WorkerOptions } from 'node:worker_threads';

/** A thread on `file`; from TypeScript sources (tsx, jest) it first registers tsx's require hook. */
export function startThread(file: string, options: WorkerOptions = {}): Worker {
  if (!file.endsWith('.ts')) return new Worker(file, options);
  return new Worker(`require('tsx/cjs'); require(${JSON.stringify(file)});`, { ...options, eval: true, execArgv: [] });
}
