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
  };
}

export function clearReadCaches() {
  for (const c of caches) c.clear();
}
