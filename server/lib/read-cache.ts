import { LRUCache } from 'lru-cache';

/**
 * Short-lived caches for public catalog reads (vehicles, assemblies, parts, number resolution). Catalog edits
 * clear them in this process; other app servers see changes within the TTL, which is short for that reason.
 */
const caches: Array<LRUCache<string, object>> = [];

/** Off in tests, where factories write straight to the database between reads; READ_CACHE=on forces it on. */
const enabled = () => process.env.READ_CACHE === 'on' || (process.env.NODE_ENV !== 'test' && process.env.READ_CACHE !== 'off');

export function readCache<T extends object>(opts: { max: number; ttlMs: number }) {
  const cache = new LRUCache<string, object>({ max: opts.max, ttl: opts.ttlMs });
  caches.push(cache);
  return {
    async get(key: string, load: () => Promise<T>): Promise<T> {
      if (!enabled()) return load();
      const hit = cache.get(key);
      if (hit) return hit as T;
      const value = await load();
      cache.set(key, value);
      return value;
    },
    /** Values for many keys: hits from the cache, the rest from one call of loadMissing (keys it omits stay uncached). */
    async getMany(keys: string[], loadMissing: (missing: string[]) => Promise<Map<string, T>>): Promise<Map<string, T>> {
      if (!enabled()) return loadMissing(keys);
      const out = new Map<string, T>();
      const missing: string[] = [];
      for (const k of keys) {
        const hit = cache.get(k);
        if (hit) out.set(k, hit as T);
        else missing.push(k);
      }
      if (missing.length) {
        for (const [k, v] of await loadMissing(missing)) {
          cache.set(k, v);
          out.set(k, v);
        }
      }
      return out;
    },
  };
}

export function clearReadCaches() {
  for (const c of caches) c.clear();
}
