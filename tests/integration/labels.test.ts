import { execFile } from 'node:child_process';
import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import jsQR from 'jsqr';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { LABEL_LAYOUTS, labelCell, qrBox, renderLabels } from '../../server/services/labels';
import { labelLayoutIds, type LabelLayoutId } from '../../shared/schemas/garage';
import { addLine, createPart, createVehicleWithAssembly } from '../factories/catalog';
import { ORIGIN, signedInAs } from '../factories/users';

const run = promisify(execFile);
const app = createApp();
const DPI = 150;
let dir: string;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'drabyard-labels-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

/** Rasterises the PDF with Debian's pdftoppm and returns one PNG path per page, in order. */
async function rasterise(pdf: Buffer, name: string): Promise<string[]> {
  const file = path.join(dir, `${name}.pdf`);
  await writeFile(file, pdf);
  await run('pdftoppm', ['-png', '-r', String(DPI), file, path.join(dir, name)]);
  return (await readdir(dir)).filter((f) => f.startsWith(`${name}-`) && f.endsWith('.png')).sort().map((f) => path.join(dir, f));
}

/** Decodes the QR code of label `i` by cropping its square (plus a millimetre of margin) out of its page. */
async function decodeLabel(pages: string[], layoutId: LabelLayoutId, i: number): Promise<string | null> {
  const box = qrBox(LABEL_LAYOUTS[layoutId], i);
  const px = (mm: number) => Math.round((mm * DPI) / 25.4);
  const margin = 1;
  const { data, info } = await sharp(pages[box.page])
    .extract({ left: px(box.x - margin), top: px(box.y - margin), width: px(box.side + 2 * margin), height: px(box.side + 2 * margin) })
    .ensureAlpha()
    .raw()
    .toBuffer({ resolveWithObject: true });
  return jsQR(new Uint8ClampedArray(data.buffer, data.byteOffset, data.length), info.width, info.height)?.data ?? null;
}

async function setup(lineCount: number) {
  const { vehicle: model, assembly } = await createVehicleWithAssembly();
  const parts = [];
  const lines = [];
  for (let i = 0; i < lineCount; i++) {
    const p = await createPart({ name: `Fictional part ${i + 1} with a rather long descriptive name` });
    parts.push(p);
    lines.push(await addLine(assembly.id, p.id, { callout: String(i + 1), sortOrder: i }));
  }
  const { agent } = await signedInAs(app);
  const v = await agent.post('/api/garage/vehicles').set('Origin', ORIGIN).send({ vehicleSlug: model.slug, serial: 'TT-04411', originalityTarget: 'as_built' });
  expect(v.status).toBe(201);
  return { agent, vehicleId: v.body.vehicle.id as string, assembly, parts, lines };
}

describe('bag-and-tag labels', () => {
  it('when a layout is laid out, then every label and its QR square fit on the sheet without overlapping', async () => {
    for (const id of labelLayoutIds) {
      const l = LABEL_LAYOUTS[id];
      const perPage = l.columns * l.rows;
      const last = labelCell(l, perPage - 1);
      expect(last.page).toBe(0);
      expect(last.x + last.width).toBeLessThanOrEqual(l.pageWidth);
      expect(last.y + last.height).toBeLessThanOrEqual(l.pageHeight);
      expect(labelCell(l, perPage).page).toBe(1);
      const q = qrBox(l, 0);
      expect(l.labelWidth - q.side - 2 * l.padding).toBeGreaterThanOrEqual(20);
      // QR codes below about 15 mm get hard for phone cameras at arm's length (common practice, no published source).
      expect(q.side).toBeGreaterThanOrEqual(15);
      const empty = await renderLabels([], id, 'http://localhost:3000');
      expect(empty.subarray(0, 5).toString()).toBe('%PDF-');
    }
  });

  it('when tags are printed for an assembly, then each QR code decodes to its part page and the text is on the sheet', async () => {
    const { agent, vehicleId, assembly, parts } = await setup(5);
    const r = await agent.get(`/api/garage/vehicles/${vehicleId}/assemblies/${assembly.id}/labels.pdf?layout=tag-50x30`).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(r.status).toBe(200);
    expect(r.headers['content-type']).toBe('application/pdf');
    const pdf = r.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const pages = await rasterise(pdf, 'tags');
    expect(pages).toHaveLength(1);
    const meta = await sharp(pages[0]).metadata();
    // A4 at 150 dpi: 210 mm -> 1240.2 px wide (pdftoppm rounds up), so the page is sized in millimetres.
    expect(Math.abs(meta.width! - (210 * DPI) / 25.4)).toBeLessThan(1);
    for (let i = 0; i < parts.length; i++) {
      expect(await decodeLabel(pages, 'tag-50x30', i)).toBe(`http://localhost:3000/parts/${parts[i].id}`);
    }
    // pdftotext comes with pdftoppm (Debian's poppler-utils).
    const { stdout } = await run('pdftotext', ['-layout', path.join(dir, 'tags.pdf'), '-']);
    for (const p of parts) expect(stdout).toContain(p.number);
    expect(stdout).toContain('S/N TT-04411');
    expect(stdout).toContain('B-1');
  });

  it('when a sheet fills up, then labels run onto the next page and every code still decodes (US Letter, 3 x 10)', async () => {
    const { agent, vehicleId, assembly, parts } = await setup(32);
    const r = await agent.get(`/api/garage/vehicles/${vehicleId}/assemblies/${assembly.id}/labels.pdf?layout=letter-3x10`).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(r.status).toBe(200);
    const pages = await rasterise(r.body as Buffer, 'letter');
    expect(pages).toHaveLength(2);
    expect(Math.abs((await sharp(pages[0]).metadata()).height! - (279.4 * DPI) / 25.4)).toBeLessThan(1);
    const decoded = await Promise.all(parts.map((_, i) => decodeLabel(pages, 'letter-3x10', i)));
    expect(decoded).toEqual(parts.map((p) => `http://localhost:3000/parts/${p.id}`));
  });

  it('when chosen lines are printed on strips, then only those are labelled; an unknown layout or another line is refused', async () => {
    const { agent, vehicleId, assembly, parts, lines } = await setup(4);
    const url = `/api/garage/vehicles/${vehicleId}/assemblies/${assembly.id}/labels.pdf`;
    const r = await agent.get(`${url}?layout=strip-100x40&lines=${lines[3].id},${lines[1].id}`).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(r.status).toBe(200);
    const pages = await rasterise(r.body as Buffer, 'strips');
    // Lines keep the assembly's order, whatever order they were asked in.
    expect(await decodeLabel(pages, 'strip-100x40', 0)).toBe(`http://localhost:3000/parts/${parts[1].id}`);
    expect(await decodeLabel(pages, 'strip-100x40', 1)).toBe(`http://localhost:3000/parts/${parts[3].id}`);
    expect(await decodeLabel(pages, 'strip-100x40', 2)).toBeNull();
    expect((await agent.get(`${url}?layout=poster`)).status).toBe(400);
    const other = await createVehicleWithAssembly();
    const stray = await addLine(other.assembly.id, parts[0].id);
    expect((await agent.get(`${url}?lines=${stray.id}`)).status).toBe(400);
    const stranger = await signedInAs(app);
    expect((await stranger.agent.get(url)).status).toBe(404);
  });
});
