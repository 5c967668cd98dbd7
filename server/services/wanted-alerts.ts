/**
 * Wanted alerts: a restorer watches a part number with a condition policy and a top price; when a matching
 * listing goes live they get an in-app notice and an e-mail, exactly once per alert and listing.
 *
 * Flow: listing approval calls onListingLive -> a 'match' job (pg-boss) -> matchListing finds the alerts, and
 * for each one, in ONE transaction, inserts alert_hits (its primary key is the exactly-once rule), the notice
 * and the 'mail' job. So a retried match job finds the hit and does nothing, and a hit never exists without
 * its mail job. The mail job is retried by pg-boss on SMTP failure.
 *
 * Matching is supersession-aware: an alert on part P matches a listing of part Q when Q fills a need for P
 * (fillersForPart: forward along any edge, backward only along a two-way one), never a one-way step backwards.
 */
import { and, count, desc, eq, inArray, ne, or } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/node-postgres';
import type { CreateAlertInput } from '../../shared/schemas/garage';
import { getDb, getPool } from '../db/client';
import * as schema from '../db/schema/index';
import { alertHits, listings, partNumbers, parts, sellerProfiles, users, wantedAlerts } from '../db/schema/index';
import { parsePartNumber } from '../domain/part-number';
import { POLICY_CONDITIONS, type SourcingPolicy } from '../domain/sourcing-plan';
import { fillersForPart, indexEdges } from '../domain/supersession';
import { env } from '../env';
import { AppError, notFound } from '../errors';
import { getBoss, QUEUES } from '../jobs/boss';
import { logger } from '../lib/logger';
import { composeMail, sendMail } from '../lib/mailer';
import { primaryNumbers } from './catalog';
import { loadSubgraph } from './catalog-graph';
import { createNotice } from './notices';

type AlertRow = typeof wantedAlerts.$inferSelect;
type ListingRow = typeof listings.$inferSelect;

export interface AlertMatchJob {
  listingId: string;
}
export interface AlertMailJob {
  alertId: string;
  listingId: string;
}

const POLICY_WORDS: Record<SourcingPolicy, string> = {
  originals_only: 'originals only',
  nos_only: 'NOS only',
  reproduction_ok: 'reproduction acceptable',
  any: 'any condition',
};

const CONDITION_WORDS: Record<ListingRow['condition'], string> = {
  nos: 'NOS',
  nors: 'NORS',
  used_original: 'used original',
  rebuilt: 'rebuilt',
  reproduction: 'reproduction',
  core: 'core',
};

const money = (cents: number) => `$${(cents / 100).toFixed(2)}`;

// ---- the call listing approval makes ----

/**
 * Queues the matching of a listing that just went live (approved, or restocked back to live). Cheap and safe
 * to call more than once: matching is exactly-once per alert and listing.
 */
export async function onListingLive(listingId: string): Promise<void> {
  const boss = await getBoss();
  await boss.send(QUEUES.alertMatch, { listingId } satisfies AlertMatchJob, { singletonKey: listingId });
}

// ---- matching ----

/** Whether a listing of `listingPart` at this price and condition answers the alert, given the fillers of the alert's part. */
export function alertAccepts(
  alert: Pick<AlertRow, 'policy' | 'maxPriceCents'>,
  listing: Pick<ListingRow, 'condition' | 'priceCents'>,
  unitsPerNeed: number,
): boolean {
  if (!POLICY_CONDITIONS[alert.policy].includes(listing.condition)) return false;
  // A replacement taking n pieces for one old piece costs n times the listing's price for the same need.
  return alert.maxPriceCents === null || listing.priceCents * unitsPerNeed <= alert.maxPriceCents;
}

/** Active alerts (of other users than the seller) that this live listing answers, with units per need. */
export async function matchingAlerts(listing: ListingRow): Promise<AlertRow[]> {
  if (listing.state !== 'approved' || !listing.partId || listing.quantity <= 0) return [];
  const g = await loadSubgraph([listing.partId]);
  const partIds = g.partIds.length ? g.partIds : [listing.partId];
  const alerts = await getDb()
    .select()
    .from(wantedAlerts)
    .where(and(inArray(wantedAlerts.partId, partIds), eq(wantedAlerts.active, true), ne(wantedAlerts.userId, listing.sellerId)));
  if (!alerts.length) return [];
  const index = indexEdges(g.edges);
  const unitsFor = new Map<string, number | null>();
  for (const partId of new Set(alerts.map((a) => a.partId))) {
    const set = fillersForPart(partId, index).fillerSets.find(
      (s) => s.kitOf === null && s.parts.length === 1 && s.parts[0].partId === listing.partId,
    );
    unitsFor.set(partId, set ? set.parts[0].quantity : null);
  }
  return alerts.filter((a) => {
    const units = unitsFor.get(a.partId);
    return units != null && units <= listing.quantity && alertAccepts(a, listing, units);
  });
}

/**
 * Records the hits of one listing: per matching alert, the hit, the notice and the mail job commit together.
 * Returns the alerts newly hit (an alert already hit by this listing is skipped).
 */
export async function matchListing(listingId: string): Promise<string[]> {
  const [listing] = await getDb().select().from(listings).where(eq(listings.id, listingId));
  if (!listing) return [];
  const alerts = await matchingAlerts(listing);
  if (!alerts.length) return [];
  const boss = await getBoss();
  const numbers = await primaryNumbers([...new Set([listing.partId!, ...alerts.map((a) => a.partId)])]);
  const [shop] = await getDb()
    .select({ shopName: sellerProfiles.shopName, displayName: users.displayName })
    .from(users)
    .leftJoin(sellerProfiles, eq(sellerProfiles.userId, users.id))
    .where(eq(users.id, listing.sellerId));
  const seller = shop?.shopName ?? shop?.displayName ?? 'a seller';
  const hit: string[] = [];
  for (const alert of alerts) {
    // One client for the whole transaction, so pg-boss writes the mail job inside it too.
    const client = await getPool().connect();
    try {
      await client.query('BEGIN');
      const tx = drizzle(client, { schema });
      const inserted = await tx.insert(alertHits).values({ alertId: alert.id, listingId }).onConflictDoNothing().returning();
      if (inserted.length) {
        const watched = alert.numberPrinted || numbers.get(alert.partId) || 'a part you watch';
        const listedAs = numbers.get(listing.partId!);
        await createNotice(tx, {
          userId: alert.userId,
          kind: 'wanted_alert',
          title: `Wanted part listed: ${watched}`,
          body: `${listing.title} — ${CONDITION_WORDS[listing.condition]}, ${money(listing.priceCents)} from ${seller}${listedAs && listedAs !== watched ? ` (listed as ${listedAs})` : ''}.`,
          link: `/listings/${listingId}`,
        });
        await boss.send(QUEUES.alertMail, { alertId: alert.id, listingId } satisfies AlertMailJob, {
          db: { executeSql: (text: string, values: unknown[]) => client.query(text, values) },
        });
        hit.push(alert.id);
      }
      await client.query('COMMIT');
    } catch (err) {
      await client.query('ROLLBACK').catch(() => {});
      throw err;
    } finally {
      client.release();
    }
  }
  if (hit.length) logger.info({ listingId, alerts: hit.length }, 'wanted alerts hit');
  return hit;
}

/** Sends the e-mail of one hit. Throws on SMTP failure so pg-boss retries; a hit gone (alert deleted) is skipped. */
export async function mailHit(job: AlertMailJob): Promise<'sent' | 'skipped'> {
  const db = getDb();
  const [row] = await db
    .select({ alert: wantedAlerts, email: users.email, name: users.displayName, listing: listings })
    .from(alertHits)
    .innerJoin(wantedAlerts, eq(wantedAlerts.id, alertHits.alertId))
    .innerJoin(users, eq(users.id, wantedAlerts.userId))
    .innerJoin(listings, eq(listings.id, alertHits.listingId))
    .where(and(eq(alertHits.alertId, job.alertId), eq(alertHits.listingId, job.listingId)));
  if (!row || !row.alert.active) return 'skipped';
  const numbers = await primaryNumbers([row.listing.partId!, row.alert.partId]);
  const watched = row.alert.numberPrinted || numbers.get(row.alert.partId) || 'a part you watch';
  const listedAs = numbers.get(row.listing.partId!);
  const origin = env().APP_ORIGIN;
  await sendMail(
    composeMail({
      to: row.email,
      subject: `Wanted part listed: ${watched}`,
      greeting: `Hello ${row.name},`,
      paragraphs: [
        `A listing matching your wanted alert for ${watched} (${POLICY_WORDS[row.alert.policy]}${row.alert.maxPriceCents !== null ? `, up to ${money(row.alert.maxPriceCents)}` : ''}) is now live:`,
        `${row.listing.title} — ${CONDITION_WORDS[row.listing.condition]}, ${money(row.listing.priceCents)}${listedAs && listedAs !== watched ? `, listed as ${listedAs} (it replaces the number you watch)` : ''}.`,
        'You get this mail once per listing. Manage your alerts in your garage.',
      ],
      action: { label: 'See the listing', url: `${origin}/listings/${row.listing.id}` },
    }),
  );
  return 'sent';
}

// ---- the restorer's alerts ----

async function partForNumber(number: string): Promise<string> {
  const parsed = parsePartNumber(number);
  const fail = (message: string) => new AppError(400, 'validation_failed', message, { fieldErrors: { number: [message] } });
  if (!parsed.ok) throw fail(parsed.error.message);
  const hits = await getDb()
    .selectDistinct({ partId: partNumbers.partId })
    .from(partNumbers)
    .where(or(eq(partNumbers.key, parsed.value.key), eq(partNumbers.folded, parsed.value.folded)));
  if (hits.length === 0) throw fail('No catalog part carries this number');
  if (hits.length > 1) {
    throw new AppError(400, 'validation_failed', 'Several parts carry this number; pick one', {
      fieldErrors: { number: ['Several parts carry this number; pick one'] },
      partIds: hits.map((h) => h.partId),
    });
  }
  return hits[0].partId;
}

function alertDto(a: AlertRow, part: { id: string; name: string; primaryNumber: string | null }, hits: number) {
  return {
    id: a.id,
    part,
    number: a.numberPrinted,
    policy: a.policy,
    maxPriceCents: a.maxPriceCents,
    active: a.active,
    hits,
    createdAt: a.createdAt.toISOString(),
  };
}

export async function createAlert(userId: string, input: CreateAlertInput) {
  let partId = input.partId;
  if (partId) {
    const [p] = await getDb().select({ id: parts.id }).from(parts).where(eq(parts.id, partId));
    if (!p) throw new AppError(400, 'validation_failed', 'No catalog part has this id', { fieldErrors: { partId: ['No catalog part has this id'] } });
  } else {
    partId = await partForNumber(input.number!);
  }
  const primary = (await primaryNumbers([partId])).get(partId) ?? '';
  const [row] = await getDb()
    .insert(wantedAlerts)
    .values({ userId, partId, numberPrinted: input.number ?? primary, policy: input.policy, maxPriceCents: input.maxPriceCents })
    .returning();
  const [p] = await getDb().select().from(parts).where(eq(parts.id, partId));
  return alertDto(row, { id: p.id, name: p.name, primaryNumber: primary || null }, 0);
}

export async function listAlerts(userId: string) {
  const db = getDb();
  const rows = await db.select({ alert: wantedAlerts, part: parts }).from(wantedAlerts).innerJoin(parts, eq(parts.id, wantedAlerts.partId)).where(eq(wantedAlerts.userId, userId)).orderBy(desc(wantedAlerts.createdAt));
  const ids = rows.map((r) => r.alert.id);
  const [hitCounts, numbers] = await Promise.all([
    ids.length ? db.select({ alertId: alertHits.alertId, n: count() }).from(alertHits).where(inArray(alertHits.alertId, ids)).groupBy(alertHits.alertId) : Promise.resolve([]),
    primaryNumbers([...new Set(rows.map((r) => r.part.id))]),
  ]);
  const hits = new Map(hitCounts.map((h) => [h.alertId, h.n]));
  return rows.map((r) => alertDto(r.alert, { id: r.part.id, name: r.part.name, primaryNumber: numbers.get(r.part.id) ?? null }, hits.get(r.alert.id) ?? 0));
}

export async function deleteAlert(userId: string, id: string) {
  const [row] = await getDb()
    .delete(wantedAlerts)
    .where(and(eq(wantedAlerts.id, id), eq(wantedAlerts.userId, userId)))
    .returning();
  if (!row) throw notFound('Alert');
}

