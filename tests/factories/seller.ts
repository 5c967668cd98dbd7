import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { crc32, deflateSync } from 'node:zlib';
import { eq } from 'drizzle-orm';
import type { Express } from 'express';
import sharp from 'sharp';
import type { Agent } from 'supertest';
import { getDb } from '../../server/db/client';
import { listingPhotos } from '../../server/db/schema/index';
import { createPart } from './catalog';
import { ORIGIN, signedInAs } from './users';

/** A signed-in seller (buyer + seller roles, as an approved application leaves them). */
export async function signedInSeller(app: Express) {
  return signedInAs(app, ['buyer', 'seller']);
}

export async function signedInAdmin(app: Express) {
  return signedInAs(app, ['buyer', 'admin']);
}

export const baseListing = (over: Record<string, unknown> = {}) => ({
  title: 'Test listing, fictional',
  condition: 'reproduction',
  quantity: 2,
  priceCents: 2500,
  ...over,
});

/** Creates a listing through the API (a fresh catalog part unless partId is given) and returns its reply. */
export async function createListingVia(agent: Agent, over: Record<string, unknown> = {}) {
  const partId = 'partId' in over ? over.partId : (await createPart()).id;
  const r = await agent.post('/api/listings').set('Origin', ORIGIN).send(baseListing({ partId, ...over }));
  if (r.status !== 201) throw new Error(`create listing failed: ${r.status} ${JSON.stringify(r.body)}`);
  return r.body.listing as { id: string; state: string; partId: string | null; [k: string]: unknown };
}

export async function submitVia(agent: Agent, id: string) {
  const r = await agent.post(`/api/listings/${id}/submit`).set('Origin', ORIGIN).send({});
  if (r.status !== 200) throw new Error(`submit failed: ${r.status} ${JSON.stringify(r.body)}`);
  return r.body.listing;
}

export async function decideVia(admin: Agent, id: string, decision: 'approve' | 'request-changes' | 'reject', message?: string) {
  return admin.post(`/api/admin/listings/${id}/decision`).set('Origin', ORIGIN).send({ decision, ...(message ? { message } : {}) });
}

/** Draft -> submitted -> approved, for tests about live listings. */
export async function liveListingVia(seller: Agent, admin: Agent, over: Record<string, unknown> = {}) {
  const l = await createListingVia(seller, over);
  await submitVia(seller, l.id);
  const r = await decideVia(admin, l.id, 'approve');
  if (r.status !== 200) throw new Error(`approve failed: ${r.status} ${JSON.stringify(r.body)}`);
  return r.body.listing as { id: string; state: string; [k: string]: unknown };
}

// --- images (generated, never stored as fixtures) -------------------------------------------------

/** A per-seed picture with busy pixels, so seeds hash apart and JPEG data is long. */
export function noisy(width: number, height: number, seed = 1) {
  const data = Buffer.alloc(width * height * 3);
  let s = seed * 2654435761;
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      s = (s * 1103515245 + 12345) >>> 0;
      const i = (y * width + x) * 3;
      // Picture-scale waves (what the difference hash sees) plus per-pixel noise (what keeps JPEG data long).
      const wave = 128 + 100 * Math.sin(2 * Math.PI * (x / width) * (1 + (seed % 3)) + seed) * Math.cos(2 * Math.PI * (y / height) * (1 + ((seed >> 1) % 2)) + seed / 3);
      data[i] = Math.max(0, Math.min(255, wave + ((s >> 24) % 40)));
      data[i + 1] = Math.max(0, Math.min(255, 255 - wave));
      data[i + 2] = (s >> 16) & 0xff;
    }
  }
  return sharp(data, { raw: { width, height, channels: 3 } });
}

export const jpeg = (seed = 1, w = 640, h = 480) => noisy(w, h, seed).jpeg({ quality: 85 }).toBuffer();

/** A JPEG carrying camera EXIF with a GPS position (fictional). */
export function jpegWithGps(seed = 7) {
  return noisy(800, 600, seed)
    .jpeg()
    .withExif({
      IFD0: { Make: 'Fictional Camera Co', Model: 'Demo 1' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '41/1 30/1 1234/100', GPSLongitudeRef: 'W', GPSLongitude: '81/1 7/1 3900/100' },
    })
    .toBuffer();
}

/** A PNG header declaring width x height with one tiny compressed row: a decompression bomb by its header. */
export function pngHeaderOnly(width: number, height: number): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body) >>> 0);
    return Buffer.concat([len, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8;
  ihdr[9] = 2;
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(Buffer.alloc(1 + width * 3))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

export const SVG_WITH_SCRIPT = Buffer.from(
  '<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" width="100" height="100">' +
    '<script>fetch("http://127.0.0.1/steal")</script><rect width="100" height="100" fill="red"/></svg>',
);

// --- what is stored ---------------------------------------------------------------------------------

export const mediaDir = () => path.resolve(process.env.MEDIA_DIR ?? '.data/media');

/** Files stored for a listing in the local media folder. */
export function storedFiles(listingId: string): string[] {
  const dir = path.join(mediaDir(), 'listings', listingId);
  return existsSync(dir) ? readdirSync(dir).filter((f) => !f.endsWith('.tmp')) : [];
}

export async function photoRows(listingId: string) {
  return getDb().select().from(listingPhotos).where(eq(listingPhotos.listingId, listingId));
}
