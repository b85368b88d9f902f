// autocannon in a process of its own (cannon.child.ts), so that the load generator's work runs on
// its own event loop and is not counted in the latency of the server under test.
import { fork } from 'node:child_process';
import path from 'node:path';
import type autocannon from 'autocannon';

export type CannonOptions = { durationSeconds: number; connections: number };
export type CannonFigures = { requests: number; p50Ms: number; p99Ms: number; errors: number; non2xx: number };
/** What the child is sent: one request list per connection. */
export type CannonJob = { url: string; options: CannonOptions; requests: autocannon.Request[][] };

/** Connection i sends requestsOf(i) over and over for the duration. */
export function cannon(url: string, options: CannonOptions, requestsOf: (connection: number) => autocannon.Request[]): Promise<CannonFigures> {
  const job: CannonJob = { url, options, requests: Array.from({ length: options.connections }, (_, i) => requestsOf(i)) };
  const child = fork(path.join(__dirname, 'cannon.child.ts'), { execArgv: ['--import', 'tsx'] });
  return new Promise((resolve, reject) => {
    child.once('message', (figures) => resolve(figures as CannonFigures));
    child.once('error', reject);
    child.once('exit', (code) => reject(new Error(`autocannon's process exited with ${code} before reporting`)));
    child.send(job);
  });
}
