// Bytes kept in memory up to a total size, least recently used out first, for results that never
// change once written (a succeeded run's summary and maps). Callers asking for a key that is
// still loading share the one load.
export type ResultsCache = { get(key: string, load: () => Promise<Buffer>): Promise<Buffer> };

export function createResultsCache(maxBytes: number): ResultsCache {
  // A Map iterates in insertion order; re-inserting on every hit keeps the least recent first.
  const entries = new Map<string, Promise<Buffer>>();
  const sizes = new Map<string, number>();
  let bytes = 0;

  const evict = (): void => {
    for (const [key] of entries) {
      if (bytes <= maxBytes) return;
      const size = sizes.get(key);
      if (size === undefined) continue; // still loading
      entries.delete(key);
      sizes.delete(key);
      bytes -= size;
    }
  };

  return {
    get(key, load) {
      const hit = entries.get(key);
      if (hit) {
        entries.delete(key);
        entries.set(key, hit);
        return hit;
      }
      const loading = load();
      entries.set(key, loading);
      loading.then(
        (value) => {
          sizes.set(key, value.byteLength);
          bytes += value.byteLength;
          evict();
        },
        () => entries.delete(key),
      );
      return loading;
    },
  };
}
