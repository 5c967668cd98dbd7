import { afterEach, describe, expect, it } from 'vitest';
import { clearReadCaches, readCache } from './read-cache';

describe('read cache', () => {
  afterEach(() => {
    delete process.env.READ_CACHE;
  });

  it('when enabled, then a second read is served from memory until the caches are cleared', async () => {
    process.env.READ_CACHE = 'on';
    const c = readCache<{ n: number }>({ max: 10, ttlMs: 60_000 });
    let loads = 0;
    const load = async () => ({ n: ++loads });
    expect((await c.get('a', load)).n).toBe(1);
    expect((await c.get('a', load)).n).toBe(1);
    clearReadCaches();
    expect((await c.get('a', load)).n).toBe(2);
  });

  it('when switched off, then every read loads', async () => {
    process.env.READ_CACHE = 'off';
    const c = readCache<{ n: number }>({ max: 10, ttlMs: 60_000 });
    let loads = 0;
    await c.get('a', async () => ({ n: ++loads }));
    await c.get('a', async () => ({ n: ++loads }));
    expect(loads).toBe(2);
  });
});
