// Worker thread of the shard pool: computes the shards it is sent, one at a time.
import { parentPort } from 'node:worker_threads';
import { computeShard, type ShardInput } from './shard-compute';

export type ShardReply = { output?: ReturnType<typeof computeShard>; error?: { name: string; message: string } };

parentPort?.on('message', (input: ShardInput) => {
  try {
    const output = computeShard(input);
    const transfer = [output.counts.buffer, output.areaByBlock.buffer, ...(output.frames ?? []).map((f) => f.buffer)] as ArrayBuffer[];
    parentPort?.postMessage({ output } satisfies ShardReply, transfer);
  } catch (err) {
    const error = err instanceof Error ? { name: err.name, message: err.message } : { name: 'Error', message: String(err) };
    parentPort?.postMessage({ error } satisfies ShardReply);
  }
});
