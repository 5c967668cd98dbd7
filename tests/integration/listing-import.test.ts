import { eq } from 'drizzle-orm';
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { getDb } from '../../server/db/client';
import { listings } from '../../server/db/schema/index';
import { createPart } from '../factories/catalog';
import { signedInSeller } from '../factories/seller';
import { ORIGIN, signedInAs } from '../factories/users';

const app = createApp();
type Seller = Awaited<ReturnType<typeof signedInSeller>>;

let part: Awaited<ReturnType<typeof createPart>>;
beforeAll(async () => {
  part = await createPart({ name: 'Import test part (fictional)' });
});

const csvOf = (rows: string[][]) => Papa.unparse(rows, { newline: '\n' });

async function sellerWithProfile(): Promise<Seller & { profileId: string }> {
  const s = await signedInSeller(app);
  const p = await s.agent.post('/api/me/shipping-profiles').set('Origin', ORIGIN).send({ name: 'Parcel', rules: { kind: 'flat_per_order', amountCents: 900, shipsTo: ['US'] } });
  return { ...s, profileId: p.body.profile.id };
}

describe('CSV bulk import', () => {
  it('when the template is downloaded, then it is a CSV with our column names and example rows', async () => {
    const s = await signedInSeller(app);
    const r = await s.agent.get('/api/me/listings/import/template');
    expect(r.status).toBe(200);
    expect(r.headers['content-type']).toMatch(/text\/csv/);
    expect(r.headers['content-disposition']).toMatch(/attachment/);
    const parsed = Papa.parse<string[]>(r.text.trim());
    expect(parsed.data[0]).toEqual(expect.arrayContaining(['part_number', 'title', 'condition', 'quantity', 'price']));
    expect(parsed.data.length).toBe(3);
  });

  it('when a file is previewed, then the columns are mapped from the headers and each row shows its errors', async () => {
    const s = await sellerWithProfile();
    const csv = csvOf([
      ['Part No', 'Title', 'Condition', 'Grade', 'Qty', 'Price', 'Notes'],
      [part.number, 'Good row', 'used original', 'honest', '2', '$1,234.50', ''],
      [part.number, 'Needs a grade', 'used_original', '', '1', '10', ''],
      ['NOPE-0000-ZZ', 'Unknown number', 'nos', '', '1', '10', ''],
      ['', 'Unidentified, described', 'nos', '', '1', '7.5', 'Brass tag stamped K7, 60 x 30 mm, from a box of brake parts'],
      ['', 'Unidentified, no words', 'nos', '', '1', '7.50', ''],
      [part.number, 'Bad price and quantity', 'mint', '', 'two', '12.345', ''],
    ]);
    const r = await s.agent.post('/api/me/listings/import/preview').set('Origin', ORIGIN).send({ csv });
    expect(r.status, JSON.stringify(r.body)).toBe(200);
    expect(r.body.mapping).toMatchObject({ part_number: 'Part No', title: 'Title', condition: 'Condition', used_grade: 'Grade', quantity: 'Qty', price: 'Price', description: 'Notes' });
    expect(r.body.summary).toEqual({ total: 6, valid: 2, invalid: 4 });
    const [good, grade, unknown, described, noWords, bad] = r.body.rows;
    expect(good).toMatchObject({ row: 2, errors: [], part: { id: part.id } });
    expect(grade.errors.map((e: { field: string }) => e.field)).toEqual(['used_grade']);
    expect(unknown.errors).toEqual([expect.objectContaining({ field: 'part_number', message: expect.stringMatching(/No catalog part/) })]);
    expect(described).toMatchObject({ errors: [], part: null });
    expect(noWords.errors.map((e: { field: string }) => e.field)).toEqual(['description']);
    expect(bad.errors.map((e: { field: string }) => e.field).sort()).toEqual(['condition', 'price', 'quantity']);
  });

  it('when the seller maps columns by hand, then the mapping is used; a mapping to a missing column is refused', async () => {
    const s = await sellerWithProfile();
    const csv = csvOf([
      ['Artikel', 'Bezeichnung', 'Zustand', 'Menge', 'Preis'],
      [part.number, 'Mapped by hand', 'reproduction', '3', '19.99'],
    ]);
    const mapping = { part_number: 'Artikel', title: 'Bezeichnung', condition: 'Zustand', quantity: 'Menge', price: 'Preis' };
    const unmapped = await s.agent.post('/api/me/listings/import/preview').set('Origin', ORIGIN).send({ csv });
    expect(unmapped.status).toBe(400);
    const r = await s.agent.post('/api/me/listings/import/preview').set('Origin', ORIGIN).send({ csv, mapping });
    expect(r.body.summary).toEqual({ total: 1, valid: 1, invalid: 0 });
    const wrong = await s.agent.post('/api/me/listings/import/preview').set('Origin', ORIGIN).send({ csv, mapping: { ...mapping, price: 'Kosten' } });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.details.fieldErrors['mapping.price']).toBeDefined();
  });

  it('when any row has errors, then nothing is imported unless the seller asks to skip them', async () => {
    const s = await sellerWithProfile();
    const csv = csvOf([
      ['part_number', 'title', 'condition', 'quantity', 'price'],
      [part.number, 'Imported one', 'reproduction', '3', '19.99'],
      [part.number, 'Broken one', 'reproduction', '0', 'free'],
    ]);
    const refused = await s.agent.post('/api/me/listings/import').set('Origin', ORIGIN).send({ csv });
    expect(refused.status).toBe(400);
    expect(refused.body.error.details.rows).toEqual([expect.objectContaining({ row: 3 })]);
    expect(await getDb().select().from(listings).where(eq(listings.sellerId, s.user.id))).toHaveLength(0);
    const ok = await s.agent.post('/api/me/listings/import').set('Origin', ORIGIN).send({ csv, skipInvalid: true });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ created: 1, as: 'draft', skipped: [expect.objectContaining({ row: 3 })] });
    const [row] = await getDb().select().from(listings).where(eq(listings.sellerId, s.user.id));
    // Weight from the part, the default shipping profile, dollars to exact cents.
    expect(row).toMatchObject({ state: 'draft', title: 'Imported one', priceCents: 1999, quantity: 3, weightGrams: 120, shippingProfileId: s.profileId, partId: part.id });
  });

  it('when rows are imported as submitted, then they wait for review with their flags', async () => {
    const s = await sellerWithProfile();
    const csv = csvOf([
      ['part_number', 'title', 'condition', 'quantity', 'price', 'shipping_profile'],
      [part.number, 'Straight to review', 'nos', '1', '40', 'parcel'],
    ]);
    const r = await s.agent.post('/api/me/listings/import').set('Origin', ORIGIN).send({ csv, as: 'submitted' });
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    const [row] = await getDb().select().from(listings).where(eq(listings.id, r.body.listingIds[0]));
    expect(row.state).toBe('submitted');
    const mine = await s.agent.get(`/api/listings/${row.id}`);
    expect(mine.body.listing.flags.map((f: { code: string }) => f.code)).toContain('new_seller');
  });

  it('when the file is uploaded as multipart, then it is read like the JSON body', async () => {
    const s = await sellerWithProfile();
    const csv = '\uFEFF' + csvOf([
      ['part_number', 'title', 'condition', 'quantity', 'price'],
      [part.number, 'From a file upload', 'core', '1', '5'],
    ]);
    const r = await s.agent
      .post('/api/me/listings/import/preview')
      .set('Origin', ORIGIN)
      .attach('file', Buffer.from(csv, 'utf8'), { filename: 'stock.csv', contentType: 'text/csv' })
      .field('mapping', JSON.stringify({}));
    expect(r.status, JSON.stringify(r.body)).toBe(200);
    expect(r.body.summary).toEqual({ total: 1, valid: 1, invalid: 0 });
    const two = await s.agent
      .post('/api/me/listings/import')
      .set('Origin', ORIGIN)
      .attach('file', Buffer.from(csv), 'a.csv')
      .attach('file', Buffer.from(csv), 'b.csv');
    expect(two.status).toBe(400);
  });

  it('when a buyer uses the import, then 403', async () => {
    const { agent } = await signedInAs(app, ['buyer']);
    expect((await agent.post('/api/me/listings/import/preview').set('Origin', ORIGIN).send({ csv: 'a,b\n1,2' })).status).toBe(403);
    expect((await agent.get('/api/me/listings/import/template')).status).toBe(403);
  });
});
