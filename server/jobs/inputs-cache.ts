// Frozen run inputs by run id, kept for the few runs a worker is busy with: they never change.
import { RunInput } from '../models';
import { float32s, uint8s, type FrozenInputs } from '../services/runs-inputs';

export type InputsCache = { get(runId: number): Promise<FrozenInputs> };

export function createInputsCache(limit = 4): InputsCache {
  const cache = new Map<number, Promise<FrozenInputs>>();
  const load = async (runId: number): Promise<FrozenInputs> => {
    const row = await RunInput.findByPk(runId);
    if (!row) throw new Error(`run ${runId} has no frozen inputs`);
    return { spec: row.spec, areas: float32s(row.patchAreas), startStates: uint8s(row.startStates) };
  };
  return {
    get(runId) {
      const hit = cache.get(runId);
      if (hit) return hit;
      const loading = load(runId);
      loading.catch(() => cache.delete(runId));
      cache.set(runId, loading);
      if (cache.size > limit) cache.delete(cache.keys().next().value!);
      return loading;
    },
  };
}
