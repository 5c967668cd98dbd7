/**
 * Seller listings: create, edit, photos, submit, withdraw; the seller's dashboard; the public listing page.
 * Every state change goes through the domain's `transition` and is written to listing_events and the audit log
 * in the same transaction.
 */
import { and, asc, count, desc, eq, ilike, inArray, or, type SQL } from 'drizzle-orm';
import type { CreateListing, UpdateListing } from '../../shared/schemas/listings';
import type { z } from 'zod';
import type { myListingsQuery } from '../../shared/schemas/listings';
import type { SessionUser } from '../auth/require-role';
import { getDb, type Db } from '../db/client';
import { listingEvents, listings, parts, sellerProfiles, shippingProfiles, users } from '../db/schema/index';
import type { Caution } from '../domain/cautions';
import { checkConditionGrade, conditions, rubberUses, usedGrades } from '../domain/conditions';
import { allowedActions, transition, type ListingAction, type ListingActor, type ListingState } from '../domain/listing-states';
import { AppError, forbidden, invalidState, notFound } from '../errors';
import { audit } from '../lib/audit';
import { readCache } from '../lib/read-cache';
import { getPart, primaryNumbers, setLiveListingCounter } from './catalog';
import { inferDescriptionFormat, renderDescription } from './listing-description';
import { flagsOf, refreshFlags, type FlagDto } from './listing-flags';
import { onListingLive } from './wanted-alerts';
import {
  allKeysOf,
  deleteKeys,
  deletePhotoRow,
  insertPhotoRows,
  photoDto,
  photosOf,
  processBatch,
  reorderPhotos,
  storeBatch,
  type PhotoDto,
  type Tx,
  type UploadFile,
} from './listing-photos';
import type { Listing, PartSummary, SellerCard } from '../../shared/schemas/listing-replies';

export type ListingRow = typeof listings.$inferSelect;
type PartRow = typeof parts.$inferSelect;
type Conn = Db | Tx;

/** States anyone may see; every other state only its seller and administrators. */
export const PUBLIC_STATES: readonly ListingState[] = ['approved', 'sold_out'];

// Part pages count live listings through the catalog service.
setLiveListingCounter(async (partId) => {
  const [{ n }] = await getDb().select({ n: count() }).from(listings).where(and(eq(listings.partId, partId), eq(listings.state, 'approved')));
  return n;
});

// --- transitions and audit ----------------------------------------------------------------------------

/** Applies a domain action or throws 409 with the domain's reason. */
export function nextState(state: ListingState, action: ListingAction, actor: ListingActor): ListingState {
  const r = transition(state, action, actor);
  if (!r.ok) {
    if (r.error.code === 'forbidden_actor') throw forbidden(r.error.message);
    throw invalidState(r.error.message, { state, action: action.type });
  }
  return r.state;
}

/** Writes one event row and one audit row for a change of `before` into `after`. */
export async function recordChange(
  tx: Tx,
  e: { before: ListingRow | null; after: ListingRow; action: string; actorId: string | null; message?: string | null },
) {
  await tx.insert(listingEvents).values({
    listingId: e.after.id,
    actorId: e.actorId,
    action: e.action,
    fromState: e.before?.state ?? null,
    toState: e.after.state,
    message: e.message ?? null,
  });
  const strip = (r: ListingRow | null) => (r ? { ...r, descriptionHtml: undefined } : null);
  await audit(tx, { actorId: e.actorId, action: `listing.${e.action}`, entityType: 'listing', entityId: e.after.id, before: strip(e.before), after: strip(e.after) });
}

/** Timestamps that go with entering a state. */
export function stateStamps(to: ListingState, from: ListingState): Partial<ListingRow> {
  if (to === 'submitted' && from !== 'submitted') return { state: to, submittedAt: new Date() };
  if (to === 'approved' && from === 'submitted') return { state: to, approvedAt: new Date() };
  return { state: to };
}

export async function lockListing(tx: Tx, id: string): Promise<ListingRow> {
  const [row] = await tx.select().from(listings).where(eq(listings.id, id)).for('update');
  if (!row) throw notFound('Listing');
  return row;
}

/** The seller's own listing, locked; another seller gets 404 for a private listing and 403 for a public one. */
async function lockOwned(tx: Tx, user: SessionUser, id: string): Promise<ListingRow> {
  const row = await lockListing(tx, id);
  if (row.sellerId !== user.id) {
    if (PUBLIC_STATES.includes(row.state)) throw forbidden('This is not your listing');
    throw notFound('Listing');
  }
  return row;
}

/** Sold out at zero stock, live again when restocked (the system's own actions). */
async function followStock(tx: Tx, row: ListingRow, actorId: string): Promise<ListingRow> {
  let action: 'sell_out' | 'restock' | null = null;
  if (row.state === 'approved' && row.quantity === 0) action = 'sell_out';
  if (row.state === 'sold_out' && row.quantity > 0) action = 'restock';
  if (!action) return row;
  const to = nextState(row.state, { type: action }, 'system');
  const [after] = await tx.update(listings).set({ state: to }).where(eq(listings.id, row.id)).returning();
  await recordChange(tx, { before: row, after, action, actorId });
  return after;
}

// --- validation helpers ---------------------------------------------------------------------------------

function fieldError(field: string, message: string, status = 400): AppError {
  return new AppError(status, 'validation_failed', message, { fieldErrors: { [field]: [message] } });
}

async function partOrThrow(conn: Conn, partId: string): Promise<PartRow> {
  const [p] = await conn.select().from(parts).where(eq(parts.id, partId));
  if (!p) throw fieldError('partId', 'No catalog part has this id');
  return p;
}

async function checkShippingProfile(conn: Conn, sellerId: string, profileId: string | null) {
  if (!profileId) return;
  const [p] = await conn.select({ id: shippingProfiles.id }).from(shippingProfiles).where(and(eq(shippingProfiles.id, profileId), eq(shippingProfiles.sellerId, sellerId)));
  if (!p) throw fieldError('shippingProfileId', 'Pick one of your own shipping profiles');
}

function checkGrade(condition: ListingRow['condition'], grade: ListingRow['usedGrade']) {
  const r = checkConditionGrade(condition, grade as never);
  if (!r.ok) throw fieldError('usedGrade', r.message);
}

function checkUnidentified(partId: string | null, description: string) {
  if (partId === null && description.trim().length < 20) {
    throw fieldError('description', 'Pick the part from the catalog, or describe it in at least 20 characters so it can be linked to the catalog');
  }
}

// --- create and edit ------------------------------------------------------------------------------------

export async function createListing(user: SessionUser, input: CreateListing, conn?: Tx): Promise<ListingRow> {
  const run = async (tx: Tx) => {
    const part = input.partId ? await partOrThrow(tx, input.partId) : null;
    await checkShippingProfile(tx, user.id, input.shippingProfileId);
    checkGrade(input.condition, input.usedGrade);
    const [row] = await tx
      .insert(listings)
      .values({
        sellerId: user.id,
        partId: part?.id ?? null,
        title: input.title,
        condition: input.condition,
        usedGrade: input.usedGrade,
        rubberUse: input.rubberUse,
        makersMarks: input.makersMarks,
        quantity: input.quantity,
        priceCents: input.priceCents,
        // Weight and dimensions default from the catalog part.
        weightGrams: input.weightGrams ?? part?.weightGrams ?? 0,
        lengthMm: input.lengthMm ?? part?.lengthMm ?? 0,
        widthMm: input.widthMm ?? part?.widthMm ?? 0,
        heightMm: input.heightMm ?? part?.heightMm ?? 0,
        shippingProfileId: input.shippingProfileId,
        descriptionMd: input.description,
        descriptionHtml: renderDescription(input.description, input.descriptionFormat),
        state: 'draft',
      })
      .returning();
    await recordChange(tx, { before: null, after: row, action: 'create', actorId: user.id });
    return row;
  };
  return conn ? run(conn) : getDb().transaction(run);
}

/** Domain field names for the review rule; weight, dimensions and the profile are shipping details. */
const REVIEW_FIELD: Record<keyof UpdateListing, string> = {
  partId: 'partId',
  title: 'title',
  condition: 'condition',
  usedGrade: 'usedGrade',
  rubberUse: 'rubberUse',
  makersMarks: 'makersMarks',
  quantity: 'quantity',
  priceCents: 'priceCents',
  weightGrams: 'shipping',
  lengthMm: 'shipping',
  widthMm: 'shipping',
  heightMm: 'shipping',
  shippingProfileId: 'shipping',
  description: 'description',
  descriptionFormat: 'description',
};

export async function updateListing(user: SessionUser, id: string, input: UpdateListing): Promise<ListingRow> {
  let wasSoldOut = false;
  const row = await getDb().transaction(async (tx) => {
    const before = await lockOwned(tx, user, id);
    wasSoldOut = before.state === 'sold_out';
    const set: Partial<typeof listings.$inferInsert> = {};
    const changed = new Set<string>();
    const mark = (k: keyof UpdateListing) => changed.add(REVIEW_FIELD[k]);

    if (input.partId !== undefined && input.partId !== before.partId) {
      const part = input.partId ? await partOrThrow(tx, input.partId) : null;
      set.partId = part?.id ?? null;
      mark('partId');
      // Dimensions still at the old part's defaults follow the new part unless given.
      const [old] = before.partId ? await tx.select().from(parts).where(eq(parts.id, before.partId)) : [];
      for (const k of ['weightGrams', 'lengthMm', 'widthMm', 'heightMm'] as const) {
        if (input[k] == null && part && (old ? before[k] === old[k] : before[k] === 0)) set[k] = part[k];
      }
    }
    for (const k of ['title', 'condition', 'usedGrade', 'rubberUse', 'makersMarks', 'quantity', 'priceCents', 'shippingProfileId'] as const) {
      if (input[k] !== undefined && input[k] !== before[k]) {
        (set as Record<string, unknown>)[k] = input[k];
        mark(k);
      }
    }
    for (const k of ['weightGrams', 'lengthMm', 'widthMm', 'heightMm'] as const) {
      if (input[k] != null && input[k] !== before[k]) {
        set[k] = input[k];
        mark(k);
      }
    }
    const format = input.descriptionFormat ?? inferDescriptionFormat(before.descriptionMd, before.descriptionHtml);
    if (input.description !== undefined || input.descriptionFormat !== undefined) {
      const text = input.description ?? before.descriptionMd;
      const html = renderDescription(text, format);
      if (text !== before.descriptionMd || html !== before.descriptionHtml) {
        set.descriptionMd = text;
        set.descriptionHtml = html;
        mark('description');
      }
    }
    if (set.shippingProfileId !== undefined) await checkShippingProfile(tx, user.id, set.shippingProfileId);
    const merged = { ...before, ...set } as ListingRow;
    if (set.condition !== undefined || set.usedGrade !== undefined) checkGrade(merged.condition, merged.usedGrade);
    if (set.partId !== undefined || set.descriptionMd !== undefined) checkUnidentified(merged.partId, merged.descriptionMd);
    if (changed.size === 0) return before;

    const to = nextState(before.state, { type: 'edit', changedFields: [...changed] }, 'seller');
    let after: ListingRow;
    [after] = await tx.update(listings).set({ ...set, ...stateStamps(to, before.state) }).where(eq(listings.id, id)).returning();
    await recordChange(tx, { before, after, action: to !== before.state ? 'edit_sent_to_review' : 'edit', actorId: user.id });
    after = await followStock(tx, after, user.id);
    if (after.state === 'submitted') await refreshFlags(tx, after);
    return after;
  });
  // Restocked: live again, so wanted alerts may match it now (queued after the commit).
  if (wasSoldOut && row.state === 'approved') await onListingLive(row.id);
  return row;
}

/** Deletes a draft that was never submitted, with its photos. */
export async function deleteDraft(user: SessionUser, id: string) {
  const keys = await getDb().transaction(async (tx) => {
    const row = await lockOwned(tx, user, id);
    if (row.state !== 'draft' || row.submittedAt) throw invalidState('Only a draft that was never submitted can be deleted; withdraw it instead');
    const k = await allKeysOf(tx, id);
    await audit(tx, { actorId: user.id, action: 'listing.delete', entityType: 'listing', entityId: id, before: { ...row, descriptionHtml: undefined } });
    await tx.delete(listings).where(eq(listings.id, id));
    return k;
  });
  await deleteKeys(keys);
}

// --- seller actions -----------------------------------------------------------------------------------

export async function submitListing(user: SessionUser, id: string, conn?: Tx): Promise<{ listing: ListingRow; flags: FlagDto[] }> {
  const run = async (tx: Tx) => {
    const before = await lockOwned(tx, user, id);
    const to = nextState(before.state, { type: 'submit' }, 'seller');
    if (before.quantity < 1) throw fieldError('quantity', 'List at least one before submitting');
    checkGrade(before.condition, before.usedGrade);
    checkUnidentified(before.partId, before.descriptionMd);
    const [after] = await tx.update(listings).set(stateStamps(to, before.state)).where(eq(listings.id, id)).returning();
    await recordChange(tx, { before, after, action: 'submit', actorId: user.id });
    const flags = await refreshFlags(tx, after);
    return { listing: after, flags: flags.map((f) => ({ ...f })) };
  };
  return conn ? run(conn) : getDb().transaction(run);
}

export async function sellerAction(user: SessionUser, id: string, action: 'withdraw' | 'reopen'): Promise<ListingRow> {
  return getDb().transaction(async (tx) => {
    const before = await lockOwned(tx, user, id);
    const to = nextState(before.state, { type: action }, 'seller');
    const [after] = await tx.update(listings).set(stateStamps(to, before.state)).where(eq(listings.id, id)).returning();
    await recordChange(tx, { before, after, action, actorId: user.id });
    return after;
  });
}

// --- photos -----------------------------------------------------------------------------------------

/** Checks the listing can take photos before the upload is read, so a refused request stores nothing. */
export async function assertCanAddPhotos(user: SessionUser, id: string) {
  await getDb().transaction(async (tx) => {
    const row = await lockOwned(tx, user, id);
    nextState(row.state, { type: 'edit', changedFields: ['photos'] }, 'seller');
  });
}

export async function addPhotos(user: SessionUser, id: string, files: readonly UploadFile[]): Promise<{ listing: ListingRow; photos: PhotoDto[] }> {
  await assertCanAddPhotos(user, id);
  const processed = await processBatch(files);
  const { rows, storedKeys } = await storeBatch(id, processed);
  try {
    return await getDb().transaction(async (tx) => {
      const before = await lockOwned(tx, user, id);
      const to = nextState(before.state, { type: 'edit', changedFields: ['photos'] }, 'seller');
      await insertPhotoRows(tx, id, rows);
      const after = await photosChanged(tx, user, before, to, 'photos_added');
      const photos = (await photosOf([id], tx)).get(id) ?? [];
      return { listing: after, photos: photos.map(photoDto) };
    });
  } catch (err) {
    await deleteKeys(storedKeys);
    throw err;
  }
}

async function photosChanged(tx: Tx, user: SessionUser, before: ListingRow, to: ListingState, action: string): Promise<ListingRow> {
  const [after] = await tx.update(listings).set({ ...stateStamps(to, before.state), updatedAt: new Date() }).where(eq(listings.id, before.id)).returning();
  await recordChange(tx, { before, after, action: to !== before.state ? `${action}_sent_to_review` : action, actorId: user.id });
  if (after.state === 'submitted') await refreshFlags(tx, after);
  return after;
}

export async function removePhoto(user: SessionUser, id: string, photoId: string): Promise<ListingRow> {
  const { after, keys } = await getDb().transaction(async (tx) => {
    const before = await lockOwned(tx, user, id);
    const to = nextState(before.state, { type: 'edit', changedFields: ['photos'] }, 'seller');
    const k = await deletePhotoRow(tx, id, photoId);
    return { after: await photosChanged(tx, user, before, to, 'photo_removed'), keys: k };
  });
  await deleteKeys(keys);
  return after;
}

/** Reordering changes which photo leads, not what is shown: it keeps a live listing live. */
export async function setPhotoOrder(user: SessionUser, id: string, photoIds: string[]): Promise<PhotoDto[]> {
  return getDb().transaction(async (tx) => {
    const row = await lockOwned(tx, user, id);
    nextState(row.state, { type: 'edit', changedFields: [] }, 'seller');
    await reorderPhotos(tx, id, photoIds);
    return ((await photosOf([id], tx)).get(id) ?? []).map(photoDto);
  });
}

// --- reading ----------------------------------------------------------------------------------------

export type { PartSummary };
/** A listing as the API returns it (shared/schemas/listing-replies.ts). */
export type ListingDto = Listing;

const iso = (d: Date | null) => (d ? d.toISOString() : null);

export function conditionLabel(l: Pick<ListingRow, 'condition' | 'usedGrade'>): string {
  const base = conditions[l.condition].label;
  return l.condition === 'used_original' && l.usedGrade ? `${base}: ${usedGrades[l.usedGrade as keyof typeof usedGrades]?.label ?? l.usedGrade}` : base;
}

/** Builds the reply shape for many listings with two queries for photos and parts (and one for flags). */
export async function toDtos(rows: ListingRow[], opts: { withFlags?: boolean; conn?: Conn } = {}): Promise<ListingDto[]> {
  const conn = opts.conn ?? getDb();
  const ids = rows.map((r) => r.id);
  const partIds = [...new Set(rows.map((r) => r.partId).filter((x): x is string => !!x))];
  const [photos, partRows, primary, flags] = await Promise.all([
    photosOf(ids, conn),
    partIds.length ? conn.select().from(parts).where(inArray(parts.id, partIds)) : Promise.resolve([] as PartRow[]),
    primaryNumbers(partIds),
    opts.withFlags ? flagsOf(conn, ids) : Promise.resolve(new Map<string, FlagDto[]>()),
  ]);
  const partById = new Map(partRows.map((p) => [p.id, p]));
  return rows.map((l) => {
    const p = l.partId ? partById.get(l.partId) : undefined;
    return {
      id: l.id,
      state: l.state,
      sellerId: l.sellerId,
      partId: l.partId,
      part: p ? { id: p.id, name: p.name, category: p.category, safetyClass: p.safetyClass, primaryNumber: primary.get(p.id) ?? null } : null,
      title: l.title,
      condition: l.condition,
      conditionLabel: conditionLabel(l),
      usedGrade: l.usedGrade,
      rubberUse: l.rubberUse,
      makersMarks: l.makersMarks,
      quantity: l.quantity,
      priceCents: l.priceCents,
      currency: l.currency,
      weightGrams: l.weightGrams,
      lengthMm: l.lengthMm,
      widthMm: l.widthMm,
      heightMm: l.heightMm,
      shippingProfileId: l.shippingProfileId,
      description: l.descriptionMd,
      descriptionFormat: inferDescriptionFormat(l.descriptionMd, l.descriptionHtml),
      descriptionHtml: l.descriptionHtml,
      photos: (photos.get(l.id) ?? []).map(photoDto),
      submittedAt: iso(l.submittedAt),
      approvedAt: iso(l.approvedAt),
      createdAt: l.createdAt.toISOString(),
      updatedAt: l.updatedAt.toISOString(),
      ...(opts.withFlags ? { flags: flags.get(l.id) ?? [] } : {}),
    };
  });
}

export async function toDto(row: ListingRow, opts: { withFlags?: boolean; conn?: Conn } = {}): Promise<ListingDto> {
  return (await toDtos([row], opts))[0];
}

export type { SellerCard };

export async function sellerCard(sellerId: string): Promise<SellerCard> {
  const db = getDb();
  const [[u], [shop], [{ n }]] = await Promise.all([
    db.select({ id: users.id, displayName: users.displayName, createdAt: users.createdAt }).from(users).where(eq(users.id, sellerId)),
    db.select().from(sellerProfiles).where(eq(sellerProfiles.userId, sellerId)),
    db.select({ n: count() }).from(listings).where(and(eq(listings.sellerId, sellerId), eq(listings.state, 'approved'))),
  ]);
  return {
    id: sellerId,
    displayName: u?.displayName ?? 'Former seller',
    shopName: shop?.shopName ?? u?.displayName ?? 'Former seller',
    location: shop?.location ?? '',
    country: shop?.country ?? '',
    shipsTo: shop?.shipsTo ?? [],
    pickupAtShows: shop?.pickupAtShows ?? false,
    showsNote: shop?.showsNote ?? '',
    returnPolicy: shop?.returnPolicy ?? '',
    liveListings: n,
    memberSince: (u?.createdAt ?? new Date()).toISOString(),
  };
}

/** Everything the public listing page shows. Private states are visible to their seller and administrators only. */
/**
 * Anonymous visitors share a briefly cached page (the busiest read of the shop); sellers and administrators
 * always read it fresh. Stock shown may lag a few seconds; checkout counts the real stock.
 */
const publicListingPages = readCache<Awaited<ReturnType<typeof loadListingPage>>>({ max: 5000, ttlMs: 5_000 });

export function getListingPage(id: string, viewer: SessionUser | undefined) {
  return viewer ? loadListingPage(id, viewer) : publicListingPages.get(id, () => loadListingPage(id, undefined));
}

async function loadListingPage(id: string, viewer: SessionUser | undefined) {
  const db = getDb();
  const [row] = await db.select().from(listings).where(eq(listings.id, id));
  if (!row) throw notFound('Listing');
  const isOwner = !!viewer && viewer.id === row.sellerId;
  const isAdmin = !!viewer && viewer.roles.includes('admin');
  if (!PUBLIC_STATES.includes(row.state) && !isOwner && !isAdmin) throw notFound('Listing');

  const privileged = isOwner || isAdmin;
  const [listing, seller, partPage, shipping, events] = await Promise.all([
    toDto(row, { withFlags: privileged }),
    sellerCard(row.sellerId),
    row.partId ? getPart(row.partId).catch(() => null) : Promise.resolve(null),
    row.shippingProfileId
      ? db.select({ id: shippingProfiles.id, name: shippingProfiles.name, rules: shippingProfiles.rules }).from(shippingProfiles).where(eq(shippingProfiles.id, row.shippingProfileId))
      : Promise.resolve([]),
    privileged ? db.select().from(listingEvents).where(eq(listingEvents.listingId, id)).orderBy(asc(listingEvents.at)) : Promise.resolve([]),
  ]);
  const grade = row.usedGrade ? usedGrades[row.usedGrade as keyof typeof usedGrades] : null;
  const cautions: Caution[] = partPage ? [...partPage.cautions] : [];
  if (row.rubberUse === 'display_only') cautions.unshift({ code: 'display_only', text: rubberUses.display_only.explanation });
  return {
    listing,
    condition: {
      code: row.condition,
      label: conditions[row.condition].label,
      shortLabel: conditions[row.condition].shortLabel,
      explanation: conditions[row.condition].explanation,
      grade: grade ? { code: grade.code, rank: grade.rank, label: grade.label, explanation: grade.explanation } : null,
      rubberUse: row.rubberUse ? { code: row.rubberUse, label: rubberUses[row.rubberUse].label, explanation: rubberUses[row.rubberUse].explanation } : null,
    },
    seller,
    part: partPage ? { part: partPage.part, numbers: partPage.numbers, chain: partPage.chain } : null,
    cautions,
    shipping: shipping[0] ?? null,
    viewer: {
      isOwner,
      isAdmin,
      allowedActions: isOwner ? allowedActions(row.state, 'seller') : isAdmin ? allowedActions(row.state, 'admin') : [],
    },
    ...(privileged
      ? { events: events.map((e) => ({ action: e.action, fromState: e.fromState, toState: e.toState, message: e.message, actorId: e.actorId, at: e.at.toISOString() })) }
      : {}),
  };
}

const SORTS: Record<z.infer<typeof myListingsQuery>['sort'], SQL> = {
  updated: asc(listings.updatedAt),
  '-updated': desc(listings.updatedAt),
  created: asc(listings.createdAt),
  '-created': desc(listings.createdAt),
  price: asc(listings.priceCents),
  '-price': desc(listings.priceCents),
  title: asc(listings.title),
  '-title': desc(listings.title),
  quantity: asc(listings.quantity),
  '-quantity': desc(listings.quantity),
};

/** The seller's dashboard: one page of their listings plus counts by state. */
export async function myListings(user: SessionUser, q: z.infer<typeof myListingsQuery>) {
  const db = getDb();
  const conds: SQL[] = [eq(listings.sellerId, user.id)];
  if (q.state) conds.push(eq(listings.state, q.state));
  if (q.q) {
    const like = `%${q.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    conds.push(or(ilike(listings.title, like), ilike(listings.descriptionMd, like))!);
  }
  const where = and(...conds);
  const [rows, [{ total }], byState] = await Promise.all([
    db.select().from(listings).where(where).orderBy(SORTS[q.sort], asc(listings.id)).limit(q.pageSize).offset((q.page - 1) * q.pageSize),
    db.select({ total: count() }).from(listings).where(where),
    db.select({ state: listings.state, n: count() }).from(listings).where(eq(listings.sellerId, user.id)).groupBy(listings.state),
  ]);
  const counts = Object.fromEntries(['draft', 'submitted', 'approved', 'changes_requested', 'rejected', 'sold_out', 'withdrawn'].map((s) => [s, 0])) as Record<ListingState, number>;
  for (const r of byState) counts[r.state] = r.n;
  return { listings: await toDtos(rows, { withFlags: true }), counts, total, page: q.page, pageSize: q.pageSize };
}

/** Live listings of some catalog parts, cheapest first (for part pages and the sourcing planner). */
export async function liveListingsForParts(partIds: string[], limit: number) {
  const rows = await getDb()
    .select()
    .from(listings)
    .where(and(inArray(listings.partId, partIds), eq(listings.state, 'approved')))
    .orderBy(asc(listings.priceCents), asc(listings.id))
    .limit(limit);
  return toDtos(rows);
}
