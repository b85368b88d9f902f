// Worker thread of the parallel kernel (node-only): runs the shard tasks it is sent, one at a time,
// until its pool terminates it.
import { parentPort, workerData } from 'node:worker_threads';
import { simulateShard } from '../../shared/markov/kernel';
import type { ShardTaskMessage, ShardWorkerData } from './parallel';

const data = workerData as ShardWorkerData;
const history = data.history ? new Uint8Array(data.history) : undefined;

parentPort?.on('message', (message: ShardTaskMessage) => {
  const result = simulateShard(data.spec, { seed: data.spec.seed, ...message }, message.replicate === data.spec.historyReplicate ? history : undefined);
  parentPort?.postMessage(result, [result.counts, result.areaByBlock, result.finalStates].map((a) => a.buffer as ArrayBuffer));
});
