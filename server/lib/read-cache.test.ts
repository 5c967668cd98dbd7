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

  it('when many read one missing key at once, then it is loaded once and all get that value', async () => {
    process.env.READ_CACHE = 'on';
    const c = readCache<{ n: number }>({ max: 10, ttlMs: 60_000 });
    let loads = 0;
    const load = async () => {
      await new Promise((r) => setTimeout(r, 20));
      return { n: ++loads };
    };
    const got = await Promise.all(Array.from({ length: 50 }, () => c.get('popular', load)));
    expect(loads).toBe(1);
    expect(new Set(got.map((g) => g.n))).toEqual(new Set([1]));
  });

  it('when an entry has expired, then it is served once more while the fresh value loads', async () => {
    process.env.READ_CACHE = 'on';
    const c = readCache<{ n: number }>({ max: 10, ttlMs: 30 });
    let loads = 0;
    const load = async () => ({ n: ++loads });
    expect((await c.get('a', load)).n).toBe(1);
    await new Promise((r) => setTimeout(r, 60));
    expect((await c.get('a', load)).n).toBe(1);
    await new Promise((r) => setTimeout(r, 5));
    expect((await c.get('a', load)).n).toBe(2);
  });

  it('when a load fails, then the error reaches the caller and nothing is kept', async () => {
    process.env.READ_CACHE = 'on';
    const c = readCache<{ n: number }>({ max: 10, ttlMs: 60_000 });
    await expect(c.get('gone', async () => Promise.reject(new Error('not found')))).rejects.toThrow('not found');
    expect((await c.get('gone', async () => ({ n: 7 }))).n).toBe(7);
  });
});
