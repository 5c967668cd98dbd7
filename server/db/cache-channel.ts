/**
 * Tells the other app processes that the read caches are stale, through PostgreSQL's LISTEN/NOTIFY (every
 * process already talks to the database, so no other service is needed). Each process listens on one
 * connection of its own; a catalog edit clears its own caches and notifies, and every other process clears
 * its caches when the notice arrives. A process that loses its listening connection clears its caches when
 * it is back (it may have missed a notice) and keeps retrying with backoff meanwhile.
 */
import { randomUUID } from 'node:crypto';
import pg from 'pg';
import { logger } from '../lib/logger';

export const CACHE_CHANNEL = 'drabyard_read_caches';

export interface CacheChannel {
  /** Tells the others (never this process itself). */
  notify(): Promise<void>;
  stop(): Promise<void>;
}

export async function startCacheChannel(opts: { url: string; onRemoteClear: () => void; retryMs?: number; channel?: string }): Promise<CacheChannel> {
  const me = randomUUID();
  const name = opts.channel ?? CACHE_CHANNEL;
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`not a channel name: ${name}`);
  let client: pg.Client | null = null;
  let stopped = false;
  let retry: NodeJS.Timeout | undefined;
  const firstDelay = opts.retryMs ?? 500;
  let delay = firstDelay;

  const connect = async (): Promise<void> => {
    const c = new pg.Client({ connectionString: opts.url, application_name: `drabyard-cache-${name}`.slice(0, 63) });
    c.on('notification', (n) => {
      if (n.channel === name && n.payload !== me) opts.onRemoteClear();
    });
    c.on('error', (err) => logger.warn({ err }, 'cache channel connection failed; reconnecting'));
    c.on('end', () => {
      if (client === c) client = null;
      if (!stopped) schedule();
    });
    await c.connect();
    await c.query(`LISTEN ${name}`);
    client = c;
    delay = firstDelay;
  };
  const schedule = () => {
    if (stopped || retry) return;
    retry = setTimeout(() => {
      retry = undefined;
      connect()
        .then(() => opts.onRemoteClear()) // whatever was notified while away is covered by clearing now
        .catch((err: unknown) => {
          logger.warn({ err }, 'cache channel still down');
          delay = Math.min(delay * 2, 30_000);
          schedule();
        });
    }, delay);
    retry.unref();
  };

  await connect();
  return {
    async notify() {
      const c = client;
      if (!c) return; // the others clear when their own TTLs end; this process reconnects meanwhile
      await c.query('SELECT pg_notify($1, $2)', [name, me]);
    },
    async stop() {
      stopped = true;
      clearTimeout(retry);
      const c = client;
      client = null;
      await c?.end().catch(() => {});
    },
  };
}
