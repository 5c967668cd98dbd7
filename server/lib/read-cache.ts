import { LRUCache } from 'lru-cache';
import { logger } from './logger';

/**
 * Short-lived caches for public reads (catalog pages, number resolution, listing pages, searches). Catalog
 * edits clear them in this process and tell the other app processes to clear theirs (server/db/cache-channel.ts,
 * set up by server/index.ts); should a notice be lost, the short TTLs bound how stale an entry can get.
 *
 * Reads go through lru-cache's fetch(): concurrent misses of one key share a single load (no stampede when a
 * popular entry expires under load), and an expired entry is served while its fresh value loads.
 */
type Loader = () => Promise<object>;
const caches: Array<LRUCache<string, object, Loader>> = [];

/** Off in tests, where factories write straight to the database between reads; READ_CACHE=on forces it on. */
const enabled = () => process.env.READ_CACHE === 'on' || (process.env.NODE_ENV !== 'test' && process.env.READ_CACHE !== 'off');

export function readCache<T extends object>(opts: { max: number; ttlMs: number }) {
  const cache = new LRUCache<string, object, Loader>({
    max: opts.max,
    ttl: opts.ttlMs,
    allowStale: true,
    fetchMethod: (_key, _stale, { context }) => context(),
  });
  caches.push(cache);
  return {
    async get(key: string, load: () => Promise<T>): Promise<T> {
      if (!enabled()) return load();
      return (await cache.fetch(key, { context: load })) as T;
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

let tellOthers: (() => Promise<void>) | null = null;

/** Sets how other processes are told that the caches were cleared here (null: nobody to tell). */
export function setCacheBroadcast(fn: (() => Promise<void>) | null) {
  tellOthers = fn;
}

/** Clears every read cache of this process and, unless the notice came from elsewhere, tells the others. */
export function clearReadCaches(opts: { fromElsewhere?: boolean } = {}) {
  for (const c of caches) c.clear();
  if (!opts.fromElsewhere && tellOthers) void tellOthers().catch((err: unknown) => logger.warn({ err }, 'could not tell the other processes to clear their caches'));
}
