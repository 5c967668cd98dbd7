/**
 * The one pg-boss instance of this process (jobs kept in PostgreSQL, schema 'pgboss', created by pg-boss on
 * first start). Queues are created before anything is sent. Kept apart from queue.ts so services can enqueue
 * without importing the workers (which import the services).
 */
import PgBoss from 'pg-boss';
import { logger } from '../lib/logger';

export const QUEUES = {
  /** A listing went live: match it against wanted alerts. */
  alertMatch: 'wanted-alerts.match',
  /** One alert hit: send its e-mail (retried on failure). */
  alertMail: 'wanted-alerts.mail',
} as const;
export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

/** Retries with exponential backoff; a job that still fails lands in the archive as failed, for inspection. */
const QUEUE_OPTIONS: Record<QueueName, Omit<PgBoss.Queue, 'name'>> = {
  // 'short': at most one queued match job per listing (singletonKey = listing id) while it waits.
  [QUEUES.alertMatch]: { policy: 'short', retryLimit: 5, retryDelay: 5, retryBackoff: true, expireInSeconds: 300 },
  [QUEUES.alertMail]: { policy: 'standard', retryLimit: 8, retryDelay: 10, retryBackoff: true, expireInSeconds: 120 },
};

let boss: PgBoss | undefined;
let starting: Promise<PgBoss> | undefined;

/** The started boss with every queue created; starts it on first use. */
export function getBoss(): Promise<PgBoss> {
  starting ??= (async () => {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error('DATABASE_URL is not set');
    const b = new PgBoss({ connectionString: url, schema: 'pgboss', max: 4, application_name: 'drabyard-jobs' });
    b.on('error', (err) => logger.error({ err }, 'job queue error'));
    await b.start();
    for (const [name, options] of Object.entries(QUEUE_OPTIONS)) {
      // Idempotent (ON CONFLICT DO NOTHING inside pg-boss), so several processes may start together.
      await b.createQueue(name, { name, ...options });
    }
    boss = b;
    return b;
  })().catch((err) => {
    starting = undefined;
    throw err;
  });
  return starting;
}

/** Stops the boss if this process started it (waits for running jobs, up to the timeout). */
export async function stopBoss(timeoutMs = 10_000): Promise<void> {
  const pending = starting;
  if (!pending) return;
  starting = undefined;
  const b = await pending.catch(() => undefined);
  boss = undefined;
  await b?.stop({ graceful: true, wait: true, timeout: timeoutMs });
}

/** The started boss, or undefined when nothing has started it (for best-effort calls). */
export function currentBoss(): PgBoss | undefined {
  return boss;
}
