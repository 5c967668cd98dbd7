/**
 * Bag-and-tag labels: a printable PDF of labels for an assembly's lines (part number, name, assembly, vehicle
 * serial, callout and a QR code to the part page). Sheet layouts are our own, sized in millimetres.
 * The QR code is drawn as vector squares so it stays sharp at any printer resolution.
 */
import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';
import type { LabelLayoutId } from '../../shared/schemas/garage';
import { env } from '../env';
import { AppError } from '../errors';
import { getAssembly } from './catalog';
import { assemblyOfVehicle, assemblyQueryFor, ownedVehicle } from './garage';

/** 1 mm in PDF points (1 pt = 1/72 in, 1 in = 25.4 mm exactly). */
export const MM = 72 / 25.4;

export interface LabelLayout {
  id: LabelLayoutId;
  name: string;
  /** Page size in mm. */
  pageWidth: number;
  pageHeight: number;
  columns: number;
  rows: number;
  labelWidth: number;
  labelHeight: number;
  /** Left and top edge of the first label, mm. */
  marginLeft: number;
  marginTop: number;
  gapX: number;
  gapY: number;
  /** Inner padding of each label, mm. */
  padding: number;
  /** Thin cut lines around each label, for plain paper. */
  cutLines: boolean;
}

// Sheet sizes: A4 210 x 297 mm (ISO 216), US Letter 8.5 x 11 in = 215.9 x 279.4 mm. Label grids are ours.
export const LABEL_LAYOUTS: Readonly<Record<LabelLayoutId, LabelLayout>> = {
  'tag-50x30': {
    id: 'tag-50x30',
    name: 'Tags 50 x 30 mm, 4 x 9 on A4',
    pageWidth: 210,
    pageHeight: 297,
    columns: 4,
    rows: 9,
    labelWidth: 50,
    labelHeight: 30,
    marginLeft: 5,
    marginTop: 13.5,
    gapX: 0,
    gapY: 0,
    padding: 2,
    cutLines: true,
  },
  'letter-3x10': {
    id: 'letter-3x10',
    name: 'Labels 66 x 25 mm, 3 x 10 on US Letter',
    pageWidth: 215.9,
    pageHeight: 279.4,
    columns: 3,
    rows: 10,
    labelWidth: 66,
    labelHeight: 25,
    marginLeft: 5.95,
    marginTop: 14.7,
    gapX: 3,
    gapY: 0,
    padding: 1.5,
    cutLines: false,
  },
  'strip-100x40': {
    id: 'strip-100x40',
    name: 'Strips 100 x 40 mm, 2 x 7 on A4',
    pageWidth: 210,
    pageHeight: 297,
    columns: 2,
    rows: 7,
    labelWidth: 100,
    labelHeight: 40,
    marginLeft: 3,
    marginTop: 8.5,
    gapX: 4,
    gapY: 0,
    padding: 3,
    cutLines: true,
  },
};

export interface LabelData {
  partId: string;
  partNumber: string;
  partName: string;
  assembly: string;
  serial: string;
  callout: string;
}

/** Where label `i` sits: page index and its box in mm from the page's top-left corner. */
export function labelCell(layout: LabelLayout, i: number) {
  const perPage = layout.columns * layout.rows;
  const page = Math.floor(i / perPage);
  const k = i % perPage;
  const col = k % layout.columns;
  const row = Math.floor(k / layout.columns);
  return {
    page,
    x: layout.marginLeft + col * (layout.labelWidth + layout.gapX),
    y: layout.marginTop + row * (layout.labelHeight + layout.gapY),
    width: layout.labelWidth,
    height: layout.labelHeight,
  };
}

/** The QR code's square within a label (mm, page coordinates), quiet zone included. */
export function qrBox(layout: LabelLayout, i: number) {
  const c = labelCell(layout, i);
  // At most 42% of the width, so the part number keeps room to print in a readable size.
  const side = Math.min(c.height - 2 * layout.padding, c.width * 0.42);
  return { page: c.page, x: c.x + layout.padding, y: c.y + (c.height - side) / 2, side };
}

export function partUrl(origin: string, partId: string): string {
  return `${origin.replace(/\/+$/, '')}/parts/${partId}`;
}

/** Quiet zone around the symbol, in modules; 4 is the standard's figure, 2 is what a small tag can spare. */
const QUIET_MODULES = 2;

function drawQr(doc: PDFKit.PDFDocument, text: string, xPt: number, yPt: number, sidePt: number) {
  const qr = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const n = qr.modules.size;
  const unit = sidePt / (n + 2 * QUIET_MODULES);
  const ox = xPt + QUIET_MODULES * unit;
  const oy = yPt + QUIET_MODULES * unit;
  doc.save();
  doc.rect(xPt, yPt, sidePt, sidePt).fill('#ffffff');
  for (let r = 0; r < n; r++) {
    // One rectangle per run of dark modules keeps the file small.
    let c = 0;
    while (c < n) {
      if (!qr.modules.get(r, c)) {
        c++;
        continue;
      }
      const start = c;
      while (c < n && qr.modules.get(r, c)) c++;
      doc.rect(ox + start * unit, oy + r * unit, (c - start) * unit, unit);
    }
  }
  doc.fill('#000000');
  doc.restore();
}

/** Renders the labels in reading order, as many pages as needed. */
export function renderLabels(labels: readonly LabelData[], layoutId: LabelLayoutId, origin: string, title = 'Bag-and-tag labels'): Promise<Buffer> {
  const layout = LABEL_LAYOUTS[layoutId];
  if (!layout) throw new AppError(400, 'validation_failed', `Unknown label layout ${layoutId}`);
  const doc = new PDFDocument({ size: [layout.pageWidth * MM, layout.pageHeight * MM], margin: 0, autoFirstPage: false, info: { Title: title, Creator: 'Drabyard' } });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  let page = -1;
  labels.forEach((label, i) => {
    const cell = labelCell(layout, i);
    if (cell.page !== page) {
      doc.addPage({ size: [layout.pageWidth * MM, layout.pageHeight * MM], margin: 0 });
      page = cell.page;
    }
    const x = cell.x * MM;
    const y = cell.y * MM;
    const w = cell.width * MM;
    const h = cell.height * MM;
    if (layout.cutLines) doc.save().lineWidth(0.3).strokeColor('#bbbbbb').rect(x, y, w, h).stroke().restore();
    const q = qrBox(layout, i);
    drawQr(doc, partUrl(origin, label.partId), q.x * MM, q.y * MM, q.side * MM);
    const pad = layout.padding * MM;
    const tx = (q.x + q.side + 1.5) * MM;
    const tw = x + w - pad - tx;
    const big = Math.min(10, Math.max(7, h / 8));
    const small = big * 0.72;
    let ty = y + pad;
    const line = (text: string, font: string, size: number, maxLines = 1, minSize = size) => {
      doc.font(font).fontSize(size).fillColor('#000000');
      // A single line shrinks to fit before it is cut short: a part number must never lose characters.
      while (maxLines === 1 && size > minSize && doc.widthOfString(text) > tw) doc.fontSize((size -= 0.25));
      const height = doc.currentLineHeight(true) * maxLines;
      doc.text(text, tx, ty, { width: tw, height, ellipsis: true, lineBreak: maxLines > 1 });
      ty += Math.min(height, doc.heightOfString(text, { width: tw, lineBreak: maxLines > 1 }));
    };
    line(label.partNumber || '(no number)', 'Helvetica-Bold', big, 1, 4.5);
    line(label.partName, 'Helvetica', small, 2);
    ty += 1;
    line(`${label.assembly}  #${label.callout}`, 'Helvetica', small, 1, 4.5);
    line(`S/N ${label.serial}`, 'Helvetica', small, 1, 4.5);
  });
  if (labels.length === 0) doc.addPage({ size: [layout.pageWidth * MM, layout.pageHeight * MM], margin: 0 });
  doc.end();
  return done;
}

/** Labels for one assembly of one garage vehicle: every applicable line, or the chosen ones. */
export async function assemblyLabels(userId: string, vehicleId: string, assemblyId: string, opts: { layout: LabelLayoutId; lines?: string[] }) {
  const v = await ownedVehicle(userId, vehicleId);
  await assemblyOfVehicle(v, assemblyId);
  const view = await getAssembly(assemblyId, assemblyQueryFor(v));
  let lines = view.lines;
  if (opts.lines) {
    const wanted = new Set(opts.lines);
    lines = lines.filter((l) => wanted.has(l.id));
    if (lines.length !== wanted.size) {
      throw new AppError(400, 'validation_failed', 'Some lines are not applicable lines of this assembly', { fieldErrors: { lines: ['Pick lines of this assembly'] } });
    }
  }
  const labels: LabelData[] = lines.map((l) => ({
    partId: l.part.id,
    partNumber: l.part.primaryNumber ?? '',
    partName: l.part.name,
    assembly: `${view.assembly.code} ${view.assembly.name}`,
    serial: v.serialPrinted,
    callout: l.callout,
  }));
  const pdf = await renderLabels(labels, opts.layout, env().APP_ORIGIN, `Labels ${view.assembly.code} ${v.serialPrinted}`);
  const safe = `${view.assembly.code}-${v.serialPrinted}`.replace(/[^A-Za-z0-9-]/g, '') || 'labels';
  return { filename: `labels-${safe}.pdf`, pdf, count: labels.length };
}
