import sharp from 'sharp';
import request from 'supertest';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import type { PhotoStorage } from '../../server/lib/photos/storage';
import { getPhotoStorage, setPhotoStorage } from '../../server/services/listing-photos';
import {
  createListingVia,
  jpeg,
  jpegWithGps,
  liveListingVia,
  noisy,
  photoRows,
  pngHeaderOnly,
  signedInAdmin,
  signedInSeller,
  storedFiles,
  SVG_WITH_SCRIPT,
} from '../factories/seller';
import { ORIGIN, signedInAs } from '../factories/users';

const app = createApp();
type Agent = Awaited<ReturnType<typeof signedInSeller>>['agent'];

let seller: Agent;
let admin: Agent;
beforeAll(async () => {
  seller = (await signedInSeller(app)).agent;
  admin = (await signedInAdmin(app)).agent;
});
afterEach(() => setPhotoStorage(undefined));

const upload = (agent: Agent, id: string, files: Array<{ buffer: Buffer; name: string; type?: string; field?: string }>) => {
  let r = agent.post(`/api/listings/${id}/photos`).set('Origin', ORIGIN);
  for (const f of files) r = r.attach(f.field ?? 'photos', f.buffer, { filename: f.name, contentType: f.type ?? 'image/jpeg' });
  return r;
};

/** Every refused upload: a clear 4xx with our error shape, and no file or row left behind. */
async function expectRefusedAndNothingStored(files: Parameters<typeof upload>[2], status: number) {
  const l = await createListingVia(seller);
  const r = await upload(seller, l.id, files);
  expect(r.status, JSON.stringify(r.body)).toBe(status);
  expect(r.body.error.code).toMatch(/^(validation_failed|payload_too_large|unsupported_media)$/);
  expect(r.body.error.message.length).toBeGreaterThan(10);
  expect(await photoRows(l.id)).toHaveLength(0);
  expect(storedFiles(l.id)).toEqual([]);
  return r;
}

describe('photo uploads', () => {
  it('when a JPEG with EXIF GPS is uploaded, then three WebP sizes are stored with every EXIF and GPS tag gone', async () => {
    const l = await createListingVia(seller);
    const original = await jpegWithGps();
    expect((await sharp(original).metadata()).exif).toBeDefined();
    const r = await upload(seller, l.id, [{ buffer: original, name: 'IMG_0001.jpg' }]);
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    expect(r.body.photos).toHaveLength(1);
    const photo = r.body.photos[0];
    expect(photo).toMatchObject({ position: 0, width: 800, height: 600, placeholderColor: expect.stringMatching(/^#[0-9a-f]{6}$/) });
    expect(storedFiles(l.id)).toHaveLength(3);
    const [row] = await photoRows(l.id);
    expect(row.dhash).toMatch(/^[0-9a-f]{16}$/);
    for (const url of Object.values(photo.urls) as string[]) {
      expect(url).toMatch(/^\/media\/listings\/.+\.webp$/);
      const file = await request(app).get(url).buffer(true).parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
      expect(file.status).toBe(200);
      const bytes = file.body as Buffer;
      const meta = await sharp(bytes).metadata();
      expect(meta.format).toBe('webp');
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(bytes.includes(Buffer.from('Fictional Camera Co'))).toBe(false);
      expect(bytes.includes(Buffer.from('Exif'))).toBe(false);
      // The GPS IFD pointer tag (0x8825) in either byte order.
      expect(bytes.includes(Buffer.from([0x88, 0x25, 0x00, 0x04])) || bytes.includes(Buffer.from([0x25, 0x88, 0x04, 0x00]))).toBe(false);
    }
  });

  it('when a text file is named .jpg, then 415 and nothing is stored', async () => {
    await expectRefusedAndNothingStored([{ buffer: Buffer.from('This is a note, not a photo.\n'), name: 'photo.jpg', type: 'image/jpeg' }], 415);
  });

  it('when a JPEG is truncated, then 400 and nothing is stored', async () => {
    const full = await jpeg(3, 640, 480);
    await expectRefusedAndNothingStored([{ buffer: full.subarray(0, Math.floor(full.length / 2)), name: 'cut.jpg' }], 400);
  });

  it('when a PNG declares 20,000 x 20,000 pixels, then 413 and nothing is stored', async () => {
    const r = await expectRefusedAndNothingStored([{ buffer: pngHeaderOnly(20_000, 20_000), name: 'bomb.png', type: 'image/png' }], 413);
    expect(r.body.error.message).toMatch(/20000 x 20000/);
  });

  it('when an SVG carries a script, then 415 and nothing is stored', async () => {
    await expectRefusedAndNothingStored([{ buffer: SVG_WITH_SCRIPT, name: 'drawing.svg', type: 'image/svg+xml' }], 415);
  });

  it('when a file is 16 MB, then 413 and nothing is stored', async () => {
    const big = Buffer.concat([await jpeg(4), Buffer.alloc(16 * 1024 * 1024 - 1000, 0x41)]);
    await expectRefusedAndNothingStored([{ buffer: big, name: 'huge.jpg' }], 413);
  });

  it('when 13 files are sent at once, then 400 and nothing is stored', async () => {
    const one = await jpeg(5, 120, 90);
    await expectRefusedAndNothingStored(Array.from({ length: 13 }, (_, i) => ({ buffer: one, name: `p${i}.jpg` })), 400);
  });

  it('when one file of a batch is bad, then none of the batch is stored and the bad file is named', async () => {
    const r = await expectRefusedAndNothingStored(
      [
        { buffer: await jpeg(6), name: 'good-1.jpg' },
        { buffer: Buffer.from('not an image'), name: 'notes.jpg' },
        { buffer: await jpeg(7), name: 'good-2.jpg' },
      ],
      415,
    );
    expect(r.body.error.details.files).toEqual([expect.objectContaining({ index: 1, name: 'notes.jpg', code: 'unsupported_media' })]);
  });

  it('when the files come in another field, then 400 and nothing is stored', async () => {
    await expectRefusedAndNothingStored([{ buffer: await jpeg(8), name: 'a.jpg', field: 'images' }], 400);
  });

  it('when no file is attached, then 400', async () => {
    const l = await createListingVia(seller);
    const r = await seller.post(`/api/listings/${l.id}/photos`).set('Origin', ORIGIN).send({});
    expect(r.status).toBe(400);
  });

  it('when storage fails half-way through a batch, then what was stored is deleted again', async () => {
    const real = getPhotoStorage();
    let puts = 0;
    const flaky: PhotoStorage = {
      put: async (key, buffer, type) => {
        if (++puts === 5) throw new Error('disk full (simulated)');
        await real.put(key, buffer, type);
      },
      get: (key) => real.get(key),
      delete: (key) => real.delete(key),
      url: (key) => real.url(key),
    };
    setPhotoStorage(flaky);
    const l = await createListingVia(seller);
    const r = await upload(seller, l.id, [
      { buffer: await jpeg(9), name: 'a.jpg' },
      { buffer: await jpeg(10), name: 'b.jpg' },
    ]);
    expect(r.status).toBe(500);
    expect(await photoRows(l.id)).toHaveLength(0);
    expect(storedFiles(l.id)).toEqual([]);
  });

  it('when a listing would pass 12 photos in total, then 400 and the new batch is not stored', async () => {
    const l = await createListingVia(seller);
    const small = await Promise.all(Array.from({ length: 10 }, (_, i) => noisy(80, 60, 20 + i).jpeg().toBuffer()));
    expect((await upload(seller, l.id, small.map((b, i) => ({ buffer: b, name: `s${i}.jpg` })))).status).toBe(201);
    const more = await upload(seller, l.id, [0, 1, 2].map((i) => ({ buffer: small[i], name: `m${i}.jpg` })));
    expect(more.status).toBe(400);
    expect(await photoRows(l.id)).toHaveLength(10);
    expect(storedFiles(l.id)).toHaveLength(30);
  });

  it("when another seller or a buyer uploads to a listing, then 404 and 403 before anything is read", async () => {
    const l = await createListingVia(seller);
    const other = await signedInSeller(app);
    const { agent: buyer } = await signedInAs(app, ['buyer']);
    expect((await upload(other.agent, l.id, [{ buffer: await jpeg(11), name: 'x.jpg' }])).status).toBe(404);
    expect((await upload(buyer, l.id, [{ buffer: await jpeg(11), name: 'x.jpg' }])).status).toBe(403);
    expect(storedFiles(l.id)).toEqual([]);
  });

  it('when photos change on an approved listing, then it goes back to review; removing a photo deletes its files', async () => {
    const s = await signedInSeller(app);
    const live = await liveListingVia(s.agent, admin);
    const r = await upload(s.agent, live.id, [{ buffer: await jpeg(12), name: 'new.jpg' }]);
    expect(r.status).toBe(201);
    expect(r.body.listing.state).toBe('submitted');
    const photoId = r.body.photos[0].id;
    const del = await s.agent.delete(`/api/listings/${live.id}/photos/${photoId}`).set('Origin', ORIGIN);
    expect(del.status).toBe(200);
    expect(storedFiles(live.id)).toEqual([]);
  });

  it("when a photo matches another seller's photo, then the listing is flagged for reuse", async () => {
    const a = await signedInSeller(app);
    const b = await signedInSeller(app);
    const picture = await jpeg(42, 640, 480);
    const la = await createListingVia(a.agent);
    await upload(a.agent, la.id, [{ buffer: picture, name: 'mine.jpg' }]);
    const lb = await createListingVia(b.agent);
    // Re-encoded smaller: the same picture to the difference hash.
    await upload(b.agent, lb.id, [{ buffer: await sharp(picture).resize(400).jpeg({ quality: 60 }).toBuffer(), name: 'copied.jpg' }]);
    const sub = await b.agent.post(`/api/listings/${lb.id}/submit`).set('Origin', ORIGIN).send({});
    const reused = sub.body.listing.flags.find((f: { code: string }) => f.code === 'photo_reused');
    expect(reused).toBeDefined();
    expect(reused.details.matches[0]).toMatchObject({ listingId: la.id });
  });

  it('when photos are reordered, then the order is kept', async () => {
    const l = await createListingVia(seller);
    const r = await upload(seller, l.id, [
      { buffer: await jpeg(30, 100, 80), name: 'a.jpg' },
      { buffer: await jpeg(31, 100, 80), name: 'b.jpg' },
    ]);
    const ids = r.body.photos.map((p: { id: string }) => p.id);
    const re = await seller.put(`/api/listings/${l.id}/photos/order`).set('Origin', ORIGIN).send({ photoIds: [ids[1], ids[0]] });
    expect(re.status).toBe(200);
    expect(re.body.photos.map((p: { id: string }) => p.id)).toEqual([ids[1], ids[0]]);
    expect((await seller.put(`/api/listings/${l.id}/photos/order`).set('Origin', ORIGIN).send({ photoIds: [ids[0]] })).status).toBe(400);
  });
});
