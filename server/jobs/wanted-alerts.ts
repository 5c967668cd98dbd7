/**
 * Workers of the wanted-alert queues. A thrown error fails the job and pg-boss retries it with backoff
 * (retry limits in boss.ts); both handlers are safe to run again.
 */
import type PgBoss from 'pg-boss';
import { logger } from '../lib/logger';
import { mailHit, matchListing, type AlertMailJob, type AlertMatchJob } from '../services/wanted-alerts';
import { QUEUES } from './boss';

export async function handleAlertMatch(jobs: ReadonlyArray<PgBoss.Job<AlertMatchJob>>): Promise<void> {
  for (const job of jobs) await matchListing(job.data.listingId);
}

export async function handleAlertMail(jobs: ReadonlyArray<PgBoss.Job<AlertMailJob>>): Promise<void> {
  for (const job of jobs) {
    const outcome = await mailHit(job.data);
    logger.debug({ jobId: job.id, outcome }, 'wanted alert mail');
  }
}

/** Starts this process's workers for the wanted-alert queues; returns their worker ids. */
export async function workWantedAlerts(boss: PgBoss, opts: { pollingIntervalSeconds?: number } = {}): Promise<string[]> {
  const pollingIntervalSeconds = opts.pollingIntervalSeconds ?? 2;
  return Promise.all([
    boss.work<AlertMatchJob>(QUEUES.alertMatch, { pollingIntervalSeconds }, handleAlertMatch),
    boss.work<AlertMailJob>(QUEUES.alertMail, { pollingIntervalSeconds }, handleAlertMail),
  ]);
}
