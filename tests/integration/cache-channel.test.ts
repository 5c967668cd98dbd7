import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { afterEach, describe, expect, it } from 'vitest';
import { startCacheChannel, type CacheChannel } from '../../server/db/cache-channel';
import { getDb } from '../../server/db/client';
import { clearReadCaches, readCache, setCacheBroadcast } from '../../server/lib/read-cache';

const url = () => process.env.DATABASE_URL as string;
// A channel of this file's own: app processes other tests start in the same database use the real one.
const NAME = `test_caches_${randomUUID().replaceAll('-', '').slice(0, 12)}`;
const open: CacheChannel[] = [];
const channel = async (onRemoteClear: () => void) => {
  const c = await startCacheChannel({ url: url(), onRemoteClear, retryMs: 50, channel: NAME });
  open.push(c);
  return c;
};
const until = async (ok: () => boolean, ms = 5000) => {
  const end = Date.now() + ms;
  while (!ok() && Date.now() < end) await new Promise((r) => setTimeout(r, 20));
  return ok();
};

afterEach(async () => {
  setCacheBroadcast(null);
  await Promise.all(open.splice(0).map((c) => c.stop()));
});

describe('read caches across app processes', () => {
  it('when one process clears its caches, then the others are told and the teller is not', async () => {
    let a = 0;
    let b = 0;
    const ca = await channel(() => a++);
    await channel(() => b++);
    await ca.notify();
    expect(await until(() => b === 1)).toBe(true);
    await new Promise((r) => setTimeout(r, 100));
    expect(a).toBe(0);
  });

  it('when a catalog edit clears the caches here, then the notice goes out through the channel', async () => {
    let told = 0;
    const here = await channel(() => undefined);
    await channel(() => told++);
    setCacheBroadcast(() => here.notify());
    clearReadCaches();
    expect(await until(() => told === 1)).toBe(true);
    // A clear that came from elsewhere is not echoed back.
    clearReadCaches({ fromElsewhere: true });
    await new Promise((r) => setTimeout(r, 100));
    expect(told).toBe(1);
  });

  it('when the listening connection is lost, then the process clears its caches once back and hears notices again', async () => {
    let cleared = 0;
    const other = await channel(() => undefined);
    await channel(() => cleared++);
    const listeners = async () =>
      (await getDb().execute<{ pid: number }>(sql`SELECT pid FROM pg_stat_activity WHERE application_name = ${`drabyard-cache-${NAME}`}`)).rows;
    const before = await listeners();
    expect(before).toHaveLength(2);
    await getDb().execute(sql`SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = ${`drabyard-cache-${NAME}`}`);
    expect(await until(() => cleared >= 1)).toBe(true);
    // Both are back on new connections; the other's notice reaches this one again.
    for (let i = 0; i < 100; i++) {
      const now = await listeners();
      if (now.length === 2 && now.every((x) => !before.some((b) => b.pid === x.pid))) break;
      await new Promise((r) => setTimeout(r, 20));
    }
    const seen = cleared;
    await other.notify();
    expect(await until(() => cleared > seen)).toBe(true);
  });

  it('when caches are on, then a clear empties them so the next read loads afresh', async () => {
    const prev = process.env.READ_CACHE;
    process.env.READ_CACHE = 'on';
    try {
      const c = readCache<{ n: number }>({ max: 10, ttlMs: 60_000 });
      let loads = 0;
      const load = async () => ({ n: ++loads });
      expect((await c.get('k', load)).n).toBe(1);
      expect((await c.get('k', load)).n).toBe(1);
      clearReadCaches({ fromElsewhere: true });
      expect((await c.get('k', load)).n).toBe(2);
    } finally {
      process.env.READ_CACHE = prev;
    }
  });
});
