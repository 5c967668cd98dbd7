/**
 * The teardown checklist of one vehicle: per applicable bill-of-materials line a status, the usable pieces on
 * hand, a note, the wanted condition and photos; and the dated log of notes kept during the work.
 * A line nobody has touched has no row and reads as not inspected.
 */
import { randomUUID } from 'node:crypto';
import { and, asc, count, desc, eq, inArray } from 'drizzle-orm';
import type { LogEntryInput, TeardownUpdateInput } from '../../shared/schemas/garage';
import { getDb } from '../db/client';
import { bomLines, teardownItems, teardownLog, teardownPhotos, users } from '../db/schema/index';
import { neededForLine } from '../domain/needs';
import { AppError, notFound } from '../errors';
import { MAX_FILES, photoSizeNames, processUpload, type PhotoErrorCode, type ProcessedPhoto } from '../lib/photos/pipeline';
import { assertValidPhotoKey } from '../lib/photos/storage';
import { getAssembly, primaryNumbers } from './catalog';
import {
  applicableLines,
  assemblyOfVehicle,
  assemblyQueryFor,
  deleteStoredPhotos,
  ownedVehicle,
  photoStorage,
  vehicleProgress,
  type GarageVehicleRow,
} from './garage';

type ItemRow = typeof teardownItems.$inferSelect;
type PhotoRow = typeof teardownPhotos.$inferSelect;

export const MAX_PHOTOS_PER_LINE = MAX_FILES;

function photoDto(p: PhotoRow) {
  const s = photoStorage();
  return { id: p.id, placeholderColor: p.placeholderColor, urls: { thumb: s.url(p.thumbKey), medium: s.url(p.mediumKey), large: s.url(p.largeKey) } };
}

function teardownDto(item: ItemRow | undefined, photos: PhotoRow[]) {
  return {
    status: item?.status ?? 'not_inspected',
    usableOnHand: item?.usableOnHand ?? 0,
    note: item?.note ?? '',
    policy: item?.policy ?? 'any',
    updatedAt: item ? item.updatedAt.toISOString() : null,
    photos: photos.map(photoDto),
  };
}

async function photosByItem(itemIds: string[]): Promise<Map<string, PhotoRow[]>> {
  const out = new Map<string, PhotoRow[]>();
  if (!itemIds.length) return out;
  const rows = await getDb().select().from(teardownPhotos).where(inArray(teardownPhotos.teardownItemId, itemIds)).orderBy(asc(teardownPhotos.createdAt));
  for (const r of rows) {
    const list = out.get(r.teardownItemId) ?? [];
    list.push(r);
    out.set(r.teardownItemId, list);
  }
  return out;
}

/** The checklist of one assembly: the catalog's applicable lines for this vehicle, each with its teardown state. */
export async function getChecklist(userId: string, vehicleId: string, assemblyId: string) {
  const v = await ownedVehicle(userId, vehicleId);
  await assemblyOfVehicle(v, assemblyId);
  const view = await getAssembly(assemblyId, assemblyQueryFor(v));
  const lineIds = view.lines.map((l) => l.id);
  const items = lineIds.length
    ? await getDb()
        .select()
        .from(teardownItems)
        .where(and(eq(teardownItems.garageVehicleId, v.id), inArray(teardownItems.bomLineId, lineIds)))
    : [];
  const byLine = new Map(items.map((i) => [i.bomLineId, i]));
  const photos = await photosByItem(items.map((i) => i.id));
  const progress = await vehicleProgress(v);
  const asmProgress = progress.systems.flatMap((s) => s.assemblies).find((a) => a.id === assemblyId)?.progress;
  return {
    vehicleId: v.id,
    serial: v.serialPrinted,
    assembly: view.assembly,
    system: view.system,
    parent: view.parent,
    children: view.children,
    callouts: view.callouts,
    cautions: view.cautions,
    excluded: view.excluded,
    progress: asmProgress ?? { lines: 0, inspected: 0, percent: 0, byStatus: {} },
    vehicleProgress: progress.total,
    lines: view.lines.map((l) => {
      const item = byLine.get(l.id);
      const teardown = teardownDto(item, item ? (photos.get(item.id) ?? []) : []);
      return {
        ...l,
        teardown,
        needed: neededForLine({ lineId: l.id, partId: l.part.id, qtyPerAssembly: l.quantity, status: teardown.status, usableOnHand: teardown.usableOnHand }),
      };
    }),
  };
}

/** The line if it applies to this vehicle; 404 when it is not a line of the model, 409 when it does not apply. */
async function applicableLine(v: GarageVehicleRow, bomLineId: string) {
  const [line] = await getDb().select().from(bomLines).where(eq(bomLines.id, bomLineId));
  if (!line) throw notFound('Checklist line');
  const lines = await applicableLines(v, [line.assemblyId]);
  const hit = lines.find((l) => l.id === bomLineId);
  if (!hit) {
    // Either another model's line or one excluded by serial, build date or variant.
    const other = await assemblyOfVehicle(v, line.assemblyId).catch(() => null);
    if (!other) throw notFound('Checklist line');
    throw new AppError(409, 'invalid_state', 'This line does not apply to this vehicle (serial, build date or variant)');
  }
  return hit;
}

async function ensureItem(vehicleId: string, bomLineId: string): Promise<ItemRow> {
  const db = getDb();
  await db.insert(teardownItems).values({ garageVehicleId: vehicleId, bomLineId }).onConflictDoNothing();
  const [row] = await db
    .select()
    .from(teardownItems)
    .where(and(eq(teardownItems.garageVehicleId, vehicleId), eq(teardownItems.bomLineId, bomLineId)));
  return row;
}

const STATUS_WORDS: Record<ItemRow['status'], string> = {
  not_inspected: 'not inspected',
  reuse: 'reuse as is',
  refurbish: 'clean and refurbish',
  replace: 'replace',
  missing: 'missing',
  wrong_part: 'wrong part found',
};

export async function updateItem(userId: string, vehicleId: string, bomLineId: string, input: TeardownUpdateInput) {
  const v = await ownedVehicle(userId, vehicleId);
  const line = await applicableLine(v, bomLineId);
  if (input.usableOnHand !== undefined && input.usableOnHand > line.quantity) {
    throw new AppError(400, 'validation_failed', `The assembly takes ${line.quantity} of this part; usable on hand can be at most ${line.quantity}`, {
      fieldErrors: { usableOnHand: [`At most ${line.quantity}`] },
    });
  }
  return getDb().transaction(async (tx) => {
    await tx.insert(teardownItems).values({ garageVehicleId: v.id, bomLineId }).onConflictDoNothing();
    const [before] = await tx
      .select()
      .from(teardownItems)
      .where(and(eq(teardownItems.garageVehicleId, v.id), eq(teardownItems.bomLineId, bomLineId)))
      .for('update');
    const [after] = await tx
      .update(teardownItems)
      .set({
        ...(input.status !== undefined ? { status: input.status } : {}),
        ...(input.usableOnHand !== undefined ? { usableOnHand: input.usableOnHand } : {}),
        ...(input.note !== undefined ? { note: input.note } : {}),
        ...(input.policy !== undefined ? { policy: input.policy } : {}),
      })
      .where(eq(teardownItems.id, before.id))
      .returning();
    // The log keeps the story of the teardown: each status change is written as a dated entry.
    if (after.status !== before.status) {
      const number = (await primaryNumbers([line.partId])).get(line.partId) ?? '';
      await tx.insert(teardownLog).values({
        garageVehicleId: v.id,
        teardownItemId: after.id,
        authorId: userId,
        text: `Callout ${line.callout}${number ? ` (${number})` : ''}: ${STATUS_WORDS[after.status]}${after.note && after.note !== before.note ? ` — ${after.note}` : ''}`,
      });
    }
    const photos = await tx.select().from(teardownPhotos).where(eq(teardownPhotos.teardownItemId, after.id));
    return {
      bomLineId,
      teardown: teardownDto(after, photos),
      needed: neededForLine({ lineId: line.id, partId: line.partId, qtyPerAssembly: line.quantity, status: after.status, usableOnHand: after.usableOnHand }),
    };
  });
}

// ---- photos ----

const PHOTO_STATUS: Record<PhotoErrorCode, { status: number; code: 'payload_too_large' | 'unsupported_media' | 'validation_failed' }> = {
  payload_too_large: { status: 413, code: 'payload_too_large' },
  image_too_large: { status: 413, code: 'payload_too_large' },
  unsupported_media: { status: 415, code: 'unsupported_media' },
  image_corrupt: { status: 400, code: 'validation_failed' },
};

function teardownPhotoKey(vehicleId: string, itemId: string, photoId: string, size: string) {
  const key = `teardown/${vehicleId}/${itemId}/${photoId}-${size}.webp`;
  assertValidPhotoKey(key);
  return key;
}

/** All-or-nothing: every file passes the pipeline before any is stored; a failed write removes what was stored. */
export async function addPhotos(userId: string, vehicleId: string, bomLineId: string, files: ReadonlyArray<{ buffer: Buffer; originalname?: string }>) {
  const v = await ownedVehicle(userId, vehicleId);
  await applicableLine(v, bomLineId);
  if (files.length === 0) throw new AppError(400, 'validation_failed', 'Attach at least one photo in the "photos" field');
  const processed: ProcessedPhoto[] = [];
  const refused: Array<{ index: number; name: string; code: PhotoErrorCode; message: string }> = [];
  for (const [index, f] of files.entries()) {
    const r = await processUpload(f.buffer);
    if (r.ok) processed.push(r.photo);
    else refused.push({ index, name: f.originalname ?? `file ${index + 1}`, code: r.code, message: r.message });
  }
  if (refused.length) {
    const first = PHOTO_STATUS[refused[0].code];
    throw new AppError(first.status, first.code, `No photos were added. ${refused.map((x) => `${x.name}: ${x.message}`).join(' ')}`, { files: refused });
  }
  const item = await ensureItem(v.id, bomLineId);
  const [{ n }] = await getDb().select({ n: count() }).from(teardownPhotos).where(eq(teardownPhotos.teardownItemId, item.id));
  if (n + processed.length > MAX_PHOTOS_PER_LINE) {
    throw new AppError(400, 'validation_failed', `A checklist line may have at most ${MAX_PHOTOS_PER_LINE} photos; it has ${n}`, {
      fieldErrors: { photos: [`At most ${MAX_PHOTOS_PER_LINE} photos per line`] },
    });
  }
  const storage = photoStorage();
  const stored: string[] = [];
  const rows: Array<typeof teardownPhotos.$inferInsert> = [];
  try {
    for (const p of processed) {
      const id = randomUUID();
      const keys = Object.fromEntries(photoSizeNames.map((s) => [s, teardownPhotoKey(v.id, item.id, id, s)])) as Record<(typeof photoSizeNames)[number], string>;
      for (const s of photoSizeNames) {
        await storage.put(keys[s], p.sizes[s].buffer, 'image/webp');
        stored.push(keys[s]);
      }
      rows.push({ id, teardownItemId: item.id, thumbKey: keys.thumb, mediumKey: keys.medium, largeKey: keys.large, placeholderColor: p.placeholderColor });
    }
    const inserted = await getDb().insert(teardownPhotos).values(rows).returning();
    return { bomLineId, photos: inserted.map(photoDto) };
  } catch (err) {
    await deleteStoredPhotos(stored);
    throw err;
  }
}

// ---- log ----

export async function listLog(userId: string, vehicleId: string) {
  const v = await ownedVehicle(userId, vehicleId);
  const rows = await getDb()
    .select({ entry: teardownLog, bomLineId: teardownItems.bomLineId, author: users.displayName })
    .from(teardownLog)
    .leftJoin(teardownItems, eq(teardownItems.id, teardownLog.teardownItemId))
    .leftJoin(users, eq(users.id, teardownLog.authorId))
    .where(eq(teardownLog.garageVehicleId, v.id))
    .orderBy(desc(teardownLog.at), desc(teardownLog.id));
  return rows.map((r) => ({ id: r.entry.id, text: r.entry.text, at: r.entry.at.toISOString(), bomLineId: r.bomLineId ?? null, author: r.author ?? null }));
}

export async function addLogEntry(userId: string, vehicleId: string, input: LogEntryInput) {
  const v = await ownedVehicle(userId, vehicleId);
  let itemId: string | null = null;
  if (input.bomLineId) {
    await applicableLine(v, input.bomLineId);
    itemId = (await ensureItem(v.id, input.bomLineId)).id;
  }
  const [row] = await getDb().insert(teardownLog).values({ garageVehicleId: v.id, teardownItemId: itemId, authorId: userId, text: input.text }).returning();
  return { id: row.id, text: row.text, at: row.at.toISOString(), bomLineId: input.bomLineId ?? null };
}
