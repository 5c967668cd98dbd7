/**
 * Listing photos: a batch is all-or-nothing. Every file goes through the pipeline first; only when all pass
 * are they stored, and if storing or the database write fails, whatever was stored is deleted again.
 */
import { randomUUID } from 'node:crypto';
import { and, asc, count, eq, inArray } from 'drizzle-orm';
import type { Db } from '../db/client';
import { getDb } from '../db/client';
import { listingPhotos } from '../db/schema/index';
import { env } from '../env';
import { AppError, notFound } from '../errors';
import { logger } from '../lib/logger';
import { createPhotoStorage } from '../lib/photos/create-photo-storage';
import { MAX_FILES, processUpload, photoSizeNames, type PhotoErrorCode, type ProcessedPhoto } from '../lib/photos/pipeline';
import { photoKey, type PhotoStorage } from '../lib/photos/storage';
import type { ListingPhoto } from '../../shared/schemas/listing-replies';

type PhotoRow = typeof listingPhotos.$inferSelect;
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

let storage: PhotoStorage | undefined;

export function getPhotoStorage(): PhotoStorage {
  storage ??= createPhotoStorage({ ...process.env, ...env() });
  return storage;
}

/** Tests swap in a storage that fails on purpose; `undefined` goes back to the configured one. */
export function setPhotoStorage(s: PhotoStorage | undefined) {
  storage = s;
}

export type PhotoDto = ListingPhoto;

export function photoDto(p: PhotoRow): PhotoDto {
  const s = getPhotoStorage();
  return {
    id: p.id,
    position: p.position,
    width: p.width,
    height: p.height,
    placeholderColor: p.placeholderColor,
    urls: { thumb: s.url(p.thumbKey), medium: s.url(p.mediumKey), large: s.url(p.largeKey) },
  };
}

export async function photosOf(listingIds: string[], conn: Db | Tx = getDb()): Promise<Map<string, PhotoRow[]>> {
  const out = new Map<string, PhotoRow[]>();
  if (!listingIds.length) return out;
  const rows = await conn.select().from(listingPhotos).where(inArray(listingPhotos.listingId, listingIds)).orderBy(asc(listingPhotos.position));
  for (const r of rows) {
    const list = out.get(r.listingId) ?? [];
    list.push(r);
    out.set(r.listingId, list);
  }
  return out;
}

const STATUS: Record<PhotoErrorCode, { status: number; code: 'payload_too_large' | 'unsupported_media' | 'validation_failed' }> = {
  payload_too_large: { status: 413, code: 'payload_too_large' },
  image_too_large: { status: 413, code: 'payload_too_large' },
  unsupported_media: { status: 415, code: 'unsupported_media' },
  image_corrupt: { status: 400, code: 'validation_failed' },
};

export interface UploadFile {
  buffer: Buffer;
  originalname?: string;
}

/** Runs every file through the pipeline; throws one 4xx naming every refused file, or returns all processed. */
export async function processBatch(files: readonly UploadFile[]): Promise<ProcessedPhoto[]> {
  if (files.length === 0) throw new AppError(400, 'validation_failed', 'Attach at least one photo in the "photos" field');
  const processed: ProcessedPhoto[] = [];
  const refused: Array<{ index: number; name: string; code: PhotoErrorCode; message: string }> = [];
  // One at a time: each decode can hold tens of megabytes.
  for (const [index, f] of files.entries()) {
    const r = await processUpload(f.buffer);
    if (r.ok) processed.push(r.photo);
    else refused.push({ index, name: f.originalname ?? `file ${index + 1}`, code: r.code, message: r.message });
  }
  if (refused.length) {
    const first = STATUS[refused[0].code];
    const names = refused.map((x) => `${x.name}: ${x.message}`).join(' ');
    throw new AppError(first.status, first.code, `No photos were added. ${names}`, { files: refused });
  }
  return processed;
}

/** Stores the three sizes of each photo; on any failure removes what this call stored and rethrows. */
export async function storeBatch(listingId: string, photos: readonly ProcessedPhoto[]) {
  const s = getPhotoStorage();
  const stored: string[] = [];
  const rows: Array<Omit<PhotoRow, 'createdAt' | 'position'>> = [];
  try {
    for (const p of photos) {
      const id = randomUUID();
      const keys = Object.fromEntries(photoSizeNames.map((n) => [n, photoKey(listingId, id, n)])) as Record<(typeof photoSizeNames)[number], string>;
      for (const n of photoSizeNames) {
        await s.put(keys[n], p.sizes[n].buffer, 'image/webp');
        stored.push(keys[n]);
      }
      rows.push({
        id,
        listingId,
        thumbKey: keys.thumb,
        mediumKey: keys.medium,
        largeKey: keys.large,
        width: p.sizes.large.width,
        height: p.sizes.large.height,
        placeholderColor: p.placeholderColor,
        dhash: p.dhash,
      });
    }
  } catch (err) {
    await deleteKeys(stored);
    throw err;
  }
  return { rows, storedKeys: stored };
}

export async function deleteKeys(keys: readonly string[]) {
  const s = getPhotoStorage();
  for (const k of keys) {
    try {
      await s.delete(k);
    } catch (err) {
      // Left behind in storage, but never referenced: log it for the clean-up job rather than fail the request.
      logger.warn({ err, key: k }, 'could not delete a stored photo');
    }
  }
}

export const keysOf = (p: Pick<PhotoRow, 'thumbKey' | 'mediumKey' | 'largeKey'>) => [p.thumbKey, p.mediumKey, p.largeKey];

/**
 * Adds processed photos to a listing inside `tx` (the caller holds the listing row lock). The caller deletes
 * `storedKeys` if the transaction fails afterwards.
 */
export async function insertPhotoRows(tx: Tx, listingId: string, rows: Awaited<ReturnType<typeof storeBatch>>['rows']) {
  const [{ n }] = await tx.select({ n: count() }).from(listingPhotos).where(eq(listingPhotos.listingId, listingId));
  if (n + rows.length > MAX_FILES) {
    throw new AppError(400, 'validation_failed', `A listing may have at most ${MAX_FILES} photos; it has ${n}, so ${Math.max(0, MAX_FILES - n)} more can be added.`, {
      fieldErrors: { photos: [`At most ${MAX_FILES} photos per listing`] },
    });
  }
  const positions = await tx.select({ position: listingPhotos.position }).from(listingPhotos).where(eq(listingPhotos.listingId, listingId));
  const start = positions.reduce((m, r) => Math.max(m, r.position + 1), 0);
  await tx.insert(listingPhotos).values(rows.map((r, i) => ({ ...r, position: start + i })));
}

/** Removes one photo's row (inside `tx`) and returns its keys for deletion after commit. */
export async function deletePhotoRow(tx: Tx, listingId: string, photoId: string): Promise<string[]> {
  const [row] = await tx.delete(listingPhotos).where(and(eq(listingPhotos.id, photoId), eq(listingPhotos.listingId, listingId))).returning();
  if (!row) throw notFound('Photo');
  return keysOf(row);
}

/** Sets the order of a listing's photos; the list must name every photo once. */
export async function reorderPhotos(tx: Tx, listingId: string, photoIds: readonly string[]) {
  const rows = await tx.select({ id: listingPhotos.id }).from(listingPhotos).where(eq(listingPhotos.listingId, listingId));
  const have = new Set(rows.map((r) => r.id));
  if (photoIds.length !== have.size || new Set(photoIds).size !== photoIds.length || !photoIds.every((id) => have.has(id))) {
    throw new AppError(400, 'validation_failed', 'Name every photo of the listing exactly once', { fieldErrors: { photoIds: ['Name every photo exactly once'] } });
  }
  for (const [i, id] of photoIds.entries()) {
    await tx.update(listingPhotos).set({ position: i }).where(eq(listingPhotos.id, id));
  }
}

/** Keys of every photo of a listing (for deleting a draft). */
export async function allKeysOf(conn: Db | Tx, listingId: string): Promise<string[]> {
  const rows = await conn.select().from(listingPhotos).where(eq(listingPhotos.listingId, listingId));
  return rows.flatMap(keysOf);
}
