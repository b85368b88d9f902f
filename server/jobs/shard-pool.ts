// A small pool of worker threads for shard computation, so that a process's event loop (the web
// server's, with the embedded worker) stays free while shards run.
import type { Worker } from 'node:worker_threads';
import { startThread } from '../engine/start-thread';
import { computeShard, type ShardInput, type ShardOutput } from './shard-compute';
import type { ShardReply } from './shard-thread';

export type ShardPool = { run(input: ShardInput): Promise<ShardOutput>; close(): Promise<void> };

/** A kernel error raised on a thread (bad input), carried back with its name. */
export class ShardComputeError extends Error {
  constructor(readonly kind: string, message: string) {
    super(message);
  }
}

const threadFile = require.resolve('./shard-thread');


type Slot = { worker: Worker; current: Pending | null };
type Pending = { input: ShardInput; resolve: (output: ShardOutput) => void; reject: (err: Error) => void };

export function createShardPool(size: number): ShardPool {
  const slots: Slot[] = [];
  const queue: Pending[] = [];

  function dispatch(): void {
    while (queue.length > 0 && slots.length < size && slots.every((slot) => slot.current)) slots.push(addSlot());
    for (const slot of slots) {
      if (slot.current || queue.length === 0) continue;
      slot.current = queue.shift()!;
      slot.worker.postMessage(slot.current.input);
    }
  }

  function addSlot(): Slot {
    const slot: Slot = { worker: startThread(threadFile), current: null };
    slot.worker.on('message', (reply: ShardReply) => {
      const pending = slot.current;
      slot.current = null;
      if (reply.output) pending?.resolve(reply.output);
      else pending?.reject(new ShardComputeError(reply.error?.name ?? 'Error', reply.error?.message ?? 'shard failed'));
      dispatch();
    });
    // A thread that dies fails its shard (pg-boss retries it) and is replaced.
    slot.worker.on('error', (err) => {
      slot.current?.reject(err);
      slots.splice(slots.indexOf(slot), 1);
      dispatch();
    });
    return slot;
  }

  // Threads start at once: loading the kernel on a thread takes a moment, paid before the first shard.
  for (let n = 0; n < size; n++) slots.push(addSlot());

  return {
    run(input) {
      return new Promise((resolve, reject) => {
        queue.push({ input, resolve, reject });
        dispatch();
      });
    },
    async close() {
      await Promise.all(slots.map((slot) => slot.worker.terminate()));
      slots.length = 0;
    },
  };
}

/** The same work on the calling thread, for runs executed at once (demo seed, scripts). */
export function inlineShardPool(): ShardPool {
  return {
    async run(input) {
      try {
        return computeShard(input);
      } catch (err) {
        throw err instanceof Error ? new ShardComputeError(err.name, err.message) : err;
      }
    },
    async close() {},
  };
}
