/**
 * Background jobs of this process: start the queue and its workers, stop them at shutdown.
 * Services enqueue through boss.ts (getBoss) without loading the workers.
 */
import { logger } from '../lib/logger';
import { getBoss, stopBoss } from './boss';
import { workWantedAlerts } from './wanted-alerts';

export { getBoss, QUEUES } from './boss';

let started = false;

/** Starts pg-boss (creating its schema on first run) and every worker. Calling it twice is a no-op. */
export async function startJobs(opts: { pollingIntervalSeconds?: number } = {}): Promise<void> {
  if (started) return;
  started = true;
  try {
    const boss = await getBoss();
    await workWantedAlerts(boss, opts);
    logger.info('background jobs started');
  } catch (err) {
    started = false;
    throw err;
  }
}

/** Stops the workers and the queue, letting running jobs finish (up to the timeout). */
export async function stopJobs(timeoutMs = 10_000): Promise<void> {
  started = false;
  await stopBoss(timeoutMs);
}
