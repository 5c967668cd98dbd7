/**
 * The administrator's review queue: filter, decide (approve / request changes / reject), approve many unflagged
 * listings at once, and link an unidentified part to the catalog. The seller gets an e-mail at each decision.
 */
import { and, asc, desc, eq, exists, gte, inArray, lte, notExists, sql, type SQL } from 'drizzle-orm';
import type { z } from 'zod';
import type { adminListingsQuery, ListingDecisionInput } from '../../shared/schemas/listings';
import type { SessionUser } from '../auth/require-role';
import { getDb } from '../db/client';
import { listingFlags, listings, parts, sellerProfiles, users } from '../db/schema/index';
import { hasBlockingFlag } from '../domain/listing-flags';
import { env } from '../env';
import { AppError, forbidden, invalidState } from '../errors';
import { logger } from '../lib/logger';
import { composeMail, sendMail } from '../lib/mailer';
import { refreshFlags } from './listing-flags';
import { onListingLive } from './wanted-alerts';
import type { Tx } from './listing-photos';
import { lockListing, nextState, recordChange, stateStamps, toDto, toDtos, type ListingDto, type ListingRow } from './listings';

const DECISION_ACTION = { approve: 'approve', 'request-changes': 'request_changes', reject: 'reject' } as const;
type Decision = ListingDecisionInput['decision'];

/** When a listing started waiting: its submission for the review queue, otherwise its last change. */
const waitingSince = sql`coalesce(${listings.submittedAt}, ${listings.updatedAt})`;

export async function reviewQueue(q: z.infer<typeof adminListingsQuery>) {
  const db = getDb();
  const conds: SQL[] = [eq(listings.state, q.state)];
  if (q.sellerId) conds.push(eq(listings.sellerId, q.sellerId));
  const flagged = (code?: string) =>
    db
      .select({ one: sql`1` })
      .from(listingFlags)
      .where(and(eq(listingFlags.listingId, listings.id), code ? eq(listingFlags.code, code) : undefined));
  if (q.flag === 'none') conds.push(notExists(flagged()));
  else if (q.flag) conds.push(exists(flagged(q.flag)));
  const hoursAgo = (h: number) => new Date(Date.now() - h * 3_600_000);
  if (q.minAgeHours !== undefined) conds.push(lte(waitingSince, hoursAgo(q.minAgeHours)));
  if (q.maxAgeHours !== undefined) conds.push(gte(waitingSince, hoursAgo(q.maxAgeHours)));
  const rows = await db
    .select({ l: listings, displayName: users.displayName, email: users.email, shopName: sellerProfiles.shopName })
    .from(listings)
    .innerJoin(users, eq(users.id, listings.sellerId))
    .leftJoin(sellerProfiles, eq(sellerProfiles.userId, listings.sellerId))
    .where(and(...conds))
    .orderBy(q.sort === 'oldest' ? asc(waitingSince) : desc(waitingSince), asc(listings.id))
    .limit(q.limit);
  const dtos = await toDtos(
    rows.map((r) => r.l),
    { withFlags: true },
  );
  const now = Date.now();
  return {
    listings: dtos.map((d, i) => {
      const r = rows[i];
      const since = r.l.submittedAt ?? r.l.updatedAt;
      return {
        ...d,
        seller: { id: r.l.sellerId, displayName: r.displayName, email: r.email, shopName: r.shopName ?? r.displayName },
        waitingHours: Math.floor((now - since.getTime()) / 3_600_000),
      };
    }),
  };
}

interface Decided {
  listing: ListingRow;
  sellerEmail: string;
  sellerName: string;
}

async function decideIn(tx: Tx, admin: SessionUser, id: string, decision: Decision, message: string | null): Promise<Decided> {
  const before = await lockListing(tx, id);
  if (before.sellerId === admin.id) throw forbidden('Another administrator must review your own listing');
  const to = nextState(before.state, { type: DECISION_ACTION[decision] }, 'admin');
  if (decision === 'approve') {
    // Judged afresh: comparable prices and other sellers' photos may have changed since submission.
    const flags = await refreshFlags(tx, before);
    if (hasBlockingFlag(flags)) {
      throw invalidState('This listing has a blocking flag and cannot be approved; request changes or reject it', {
        flags: flags.filter((f) => f.severity === 'block').map((f) => ({ code: f.code, message: f.message })),
      });
    }
  }
  let [after] = await tx.update(listings).set(stateStamps(to, before.state)).where(eq(listings.id, id)).returning();
  await recordChange(tx, { before, after, action: DECISION_ACTION[decision], actorId: admin.id, message });
  if (after.state === 'approved' && after.quantity === 0) {
    const soldOut = nextState(after.state, { type: 'sell_out' }, 'system');
    const prev = after;
    [after] = await tx.update(listings).set({ state: soldOut }).where(eq(listings.id, id)).returning();
    await recordChange(tx, { before: prev, after, action: 'sell_out', actorId: admin.id });
  }
  const [u] = await tx.select({ email: users.email, displayName: users.displayName }).from(users).where(eq(users.id, before.sellerId));
  return { listing: after, sellerEmail: u.email, sellerName: u.displayName };
}

async function mailDecision(d: Decided, decision: Decision, message: string | null) {
  const url = `${env().APP_ORIGIN}/seller/listings/${d.listing.id}/edit`;
  const title = `"${d.listing.title}"`;
  const mail =
    decision === 'approve'
      ? { subject: `Your listing is live: ${d.listing.title}`, paragraphs: [`Your listing ${title} was approved and buyers can see it now.`, ...(message ? [`Note from our team: ${message}`] : [])] }
      : decision === 'request-changes'
        ? {
            subject: `Changes requested: ${d.listing.title}`,
            paragraphs: [`Before your listing ${title} can go live, please change the following and submit it again.`, `From our team: ${message ?? ''}`],
          }
        : { subject: `Listing not approved: ${d.listing.title}`, paragraphs: [`We could not approve your listing ${title}.`, `Reason: ${message ?? ''}`] };
  try {
    await sendMail(composeMail({ to: d.sellerEmail, greeting: `Hello ${d.sellerName},`, ...mail, action: { label: 'Open the listing', url } }));
  } catch (err) {
    // The decision is recorded either way; a failed mail is logged, not turned into a failed decision.
    logger.error({ err, listingId: d.listing.id }, 'listing decision mail failed');
  }
}

export async function decide(admin: SessionUser, id: string, input: ListingDecisionInput): Promise<ListingDto> {
  const message = input.message?.trim() || null;
  const d = await getDb().transaction((tx) => decideIn(tx, admin, id, input.decision, message));
  await mailDecision(d, input.decision, message);
  if (d.listing.state === 'approved') await onListingLive(d.listing.id);
  return toDto(d.listing, { withFlags: true });
}

/** Approves every named listing that is waiting and carries no flag at all; the rest are reported back. */
export async function approveMany(admin: SessionUser, ids: string[]) {
  const unique = [...new Set(ids)];
  const rows = await getDb().select({ id: listings.id, state: listings.state }).from(listings).where(inArray(listings.id, unique));
  const known = new Map(rows.map((r) => [r.id, r.state]));
  const approved: Decided[] = [];
  const skipped: Array<{ id: string; reason: string }> = [];
  for (const id of unique) {
    if (!known.has(id)) {
      skipped.push({ id, reason: 'not_found' });
      continue;
    }
    if (known.get(id) !== 'submitted') {
      skipped.push({ id, reason: 'not_submitted' });
      continue;
    }
    try {
      // One transaction per listing: one bad listing must not undo the others.
      const d = await getDb().transaction(async (tx) => {
        const current = await lockListing(tx, id);
        const flags = current.state === 'submitted' ? await refreshFlags(tx, current) : [];
        if (flags.length) throw new AppError(409, 'invalid_state', 'flagged', { codes: flags.map((f) => f.code) });
        return decideIn(tx, admin, id, 'approve', null);
      });
      approved.push(d);
    } catch (err) {
      if (err instanceof AppError && err.status === 409) {
        skipped.push({ id, reason: err.message === 'flagged' ? 'flagged' : 'not_submitted' });
        continue;
      }
      throw err;
    }
  }
  for (const d of approved) {
    await mailDecision(d, 'approve', null);
    await onListingLive(d.listing.id);
  }
  return { approved: approved.map((d) => d.listing.id), skipped };
}

/** Links an unidentified listing (or a wrongly linked one) to a catalog part; flags are judged again in review. */
export async function linkPart(admin: SessionUser, id: string, partId: string): Promise<ListingDto> {
  const after = await getDb().transaction(async (tx) => {
    const before = await lockListing(tx, id);
    if (before.state === 'rejected') throw invalidState('A rejected listing cannot be changed');
    const [part] = await tx.select().from(parts).where(eq(parts.id, partId));
    if (!part) throw new AppError(400, 'validation_failed', 'No catalog part has this id', { fieldErrors: { partId: ['No catalog part has this id'] } });
    const set: Partial<ListingRow> = { partId: part.id };
    // An unidentified listing had no part to take its weight and size from.
    for (const k of ['weightGrams', 'lengthMm', 'widthMm', 'heightMm'] as const) if (before[k] === 0) set[k] = part[k];
    const [row] = await tx.update(listings).set(set).where(eq(listings.id, id)).returning();
    await recordChange(tx, { before, after: row, action: 'link_part', actorId: admin.id, message: `Linked to catalog part ${part.name}` });
    if (row.state === 'submitted') await refreshFlags(tx, row);
    return row;
  });
  return toDto(after, { withFlags: true });
}
