import cluster from 'node:cluster';
import type { Server } from 'node:http';
import { createApp } from './app';
import { startCacheChannel } from './db/cache-channel';
import { closeDb } from './db/client';
import { env } from './env';
import { startStockSweeper } from './jobs/stock-sweeper';
import { startJobs, stopJobs } from './jobs/queue';
import { logger } from './lib/logger';
import { clearReadCaches, setCacheBroadcast } from './lib/read-cache';
import { closeMailer } from './lib/mailer';

const e = env();
const clustered = e.WEB_CONCURRENCY > 1;

/** Background work (the job queue, the stock sweeper) runs in one process only: alone, or the cluster's primary. */
function startBackground() {
  const sweeper = startStockSweeper(e.STOCK_SWEEP_SECONDS * 1000);
  startJobs().catch((err) => logger.error({ err }, 'background jobs did not start'));
  return async () => {
    await sweeper.stop().catch(() => {});
    await stopJobs().catch(() => {});
  };
}

/** Catalog edits in any HTTP process clear the read caches of all of them (LISTEN/NOTIFY, server/db/cache-channel.ts). */
function shareCacheClearing() {
  const channel = startCacheChannel({ url: e.DATABASE_URL, onRemoteClear: () => clearReadCaches({ fromElsewhere: true }) }).then(
    (c) => (setCacheBroadcast(() => c.notify()), c),
    (err: unknown) => {
      logger.warn({ err }, 'cache channel did not start; other processes see catalog edits when their cache entries expire');
      return null;
    },
  );
  return async () => {
    setCacheBroadcast(null);
    await (await channel)?.stop();
  };
}

function serveHttp(onListening: () => void) {
  const server: Server = createApp(e).listen(e.PORT, e.HOST, onListening);
  const stopChannel = shareCacheClearing();
  return (done: () => void) => {
    server.close(() => void stopChannel().finally(done));
    server.closeIdleConnections();
  };
}

/** The last steps of stopping, in every process: background work (where it runs), database, mail, exit. */
async function finish(stopBackground: (() => Promise<void>) | null, say: boolean) {
  await stopBackground?.();
  await closeDb().catch(() => {});
  closeMailer();
  if (say) logger.info('stopped');
  process.exit(0);
}

let closing = false;
function onSignals(shutdown: (signal: string) => Promise<void>) {
  const once = (signal: string) => {
    if (closing) return;
    closing = true;
    const force = setTimeout(() => process.exit(1), 10_000);
    force.unref();
    void shutdown(signal);
  };
  process.on('SIGINT', () => once('SIGINT'));
  process.on('SIGTERM', () => once('SIGTERM'));
}

if (clustered && cluster.isPrimary) {
  // Primary: forks the HTTP workers (they share the port), restarts one that dies, runs the background work.
  const stopBackground = startBackground();
  let up = 0;
  const fork = () =>
    cluster.fork().on('listening', () => {
      if (++up === e.WEB_CONCURRENCY) logger.info(`Drabyard is up at ${e.APP_ORIGIN} (listening on ${e.HOST}:${e.PORT}, ${e.WEB_CONCURRENCY} processes)`);
    });
  for (let i = 0; i < e.WEB_CONCURRENCY; i++) fork();
  cluster.on('exit', (worker, code, signal) => {
    if (closing) return;
    logger.error({ pid: worker.process.pid, code, signal }, 'an HTTP process ended; starting another');
    fork();
  });
  onSignals(async (signal) => {
    logger.info({ signal }, 'shutting down: finishing open requests');
    const workers = Object.values(cluster.workers ?? {});
    await Promise.all(workers.map((w) => new Promise<void>((resolve) => (w ? (w.once('exit', () => resolve()), w.kill('SIGTERM')) : resolve()))));
    await finish(stopBackground, true);
  });
} else {
  const stopBackground = clustered ? null : startBackground();
  const close = serveHttp(() => {
    if (!clustered) logger.info(`Drabyard is up at ${e.APP_ORIGIN} (listening on ${e.HOST}:${e.PORT})`);
  });
  onSignals(async (signal) => {
    if (!clustered) logger.info({ signal }, 'shutting down: finishing open requests');
    close(() => void finish(stopBackground, !clustered));
  });
  if (clustered) {
    // A worker whose primary is gone (killed) has nobody to answer to: it stops too.
    process.on('disconnect', () => process.exit(0));
  }
}
