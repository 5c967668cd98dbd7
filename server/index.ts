import type { Server } from 'node:http';
import { createApp } from './app';
import { closeDb } from './db/client';
import { env } from './env';
import { startStockSweeper } from './jobs/stock-sweeper';
import { startJobs, stopJobs } from './jobs/queue';
import { logger } from './lib/logger';
import { closeMailer } from './lib/mailer';

const e = env();
const app = createApp(e);
const sweeper = startStockSweeper(e.STOCK_SWEEP_SECONDS * 1000);
const server: Server = app.listen(e.PORT, e.HOST, () => {
  logger.info(`Drabyard is up at ${e.APP_ORIGIN} (listening on ${e.HOST}:${e.PORT})`);
});
startJobs().catch((err) => logger.error({ err }, 'background jobs did not start'));

let closing = false;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  logger.info({ signal }, 'shutting down: finishing open requests');
  const force = setTimeout(() => process.exit(1), 10_000);
  force.unref();
  server.close(async () => {
    await sweeper.stop().catch(() => {});
    await stopJobs().catch(() => {});
    await closeDb().catch(() => {});
    closeMailer();
    logger.info('stopped');
    process.exit(0);
  });
  server.closeIdleConnections();
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
