/**
 * CSV bulk import of listings: read the file (papaparse), map its columns to our fields (suggested from the
 * headers, adjustable by the seller), check every row and show its errors, then import the rows as drafts or
 * submitted listings in one transaction.
 */
import { and, eq, inArray, or } from 'drizzle-orm';
import Papa from 'papaparse';
import {
  createListingInput,
  importFields,
  LISTING_LIMITS,
  type CreateListing,
  type ImportField,
  type ImportMapping,
} from '../../shared/schemas/listings';
import type { SessionUser } from '../auth/require-role';
import { getDb } from '../db/client';
import { partNumbers, parts, shippingProfiles } from '../db/schema/index';
import { parsePartNumber } from '../domain/part-number';
import { AppError } from '../errors';
import { createListing, submitListing } from './listings';

export interface ParsedCsv {
  headers: string[];
  rows: Array<Record<string, string>>;
}

export function parseCsv(csv: string): ParsedCsv {
  const text = csv.replace(/^\uFEFF/, '');
  const r = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: 'greedy', transformHeader: (h) => h.trim() });
  const headers = (r.meta.fields ?? []).filter((h) => h !== '');
  if (headers.length === 0) throw new AppError(400, 'validation_failed', 'The CSV file has no header row', { fieldErrors: { csv: ['The first row must name the columns'] } });
  if (new Set(headers.map((h) => h.toLowerCase())).size !== headers.length) {
    throw new AppError(400, 'validation_failed', 'Two columns have the same name', { fieldErrors: { csv: ['Every column needs its own name'] } });
  }
  if (r.data.length > LISTING_LIMITS.importRowsMax) {
    throw new AppError(400, 'validation_failed', `At most ${LISTING_LIMITS.importRowsMax} rows can be imported at once; this file has ${r.data.length}`);
  }
  const fatal = r.errors.find((e) => e.type === 'Quotes');
  if (fatal) throw new AppError(400, 'validation_failed', `The CSV file is malformed near row ${(fatal.row ?? 0) + 2}: ${fatal.message}`);
  return { headers, rows: r.data.map((row) => Object.fromEntries(headers.map((h) => [h, String(row[h] ?? '').trim()]))) };
}

const squash = (s: string) => s.toLowerCase().replace(/[^a-z0-9]/g, '');

// Header words sellers commonly use for each field (our own list).
const SYNONYMS: Record<ImportField, string[]> = {
  part_number: ['partnumber', 'partno', 'pn', 'number', 'part', 'nsn', 'stocknumber'],
  title: ['title', 'name', 'item', 'itemname', 'listingtitle'],
  condition: ['condition', 'cond'],
  used_grade: ['usedgrade', 'grade'],
  rubber_use: ['rubberuse', 'rubber'],
  makers_marks: ['makersmarks', 'marks', 'markings', 'makermarks'],
  quantity: ['quantity', 'qty', 'stock', 'count'],
  price: ['price', 'priceusd', 'pricedollars', 'amount', 'each'],
  weight_grams: ['weightgrams', 'weightg', 'weight', 'grams'],
  length_mm: ['lengthmm', 'length'],
  width_mm: ['widthmm', 'width'],
  height_mm: ['heightmm', 'height'],
  shipping_profile: ['shippingprofile', 'shipping'],
  description: ['description', 'desc', 'details', 'notes'],
  description_format: ['descriptionformat', 'format'],
};

export function suggestMapping(headers: readonly string[]): Record<ImportField, string | null> {
  const used = new Set<string>();
  const out = {} as Record<ImportField, string | null>;
  for (const f of importFields) {
    const hit = headers.find((h) => !used.has(h) && SYNONYMS[f.name].includes(squash(h)));
    if (hit) used.add(hit);
    out[f.name] = hit ?? null;
  }
  return out;
}

function resolveMapping(headers: readonly string[], given: ImportMapping | undefined): Record<ImportField, string | null> {
  const mapping = { ...suggestMapping(headers), ...(given ?? {}) } as Record<ImportField, string | null>;
  const bad = Object.entries(mapping).filter(([, h]) => h !== null && !headers.includes(h));
  if (bad.length) {
    throw new AppError(400, 'validation_failed', `The mapping names columns the file does not have: ${bad.map(([, h]) => h).join(', ')}`, {
      fieldErrors: Object.fromEntries(bad.map(([f]) => [`mapping.${f}`, ['No such column in the file']])),
    });
  }
  const missing = importFields.filter((f) => f.required && !mapping[f.name]);
  if (missing.length) {
    throw new AppError(400, 'validation_failed', `Map a column to each required field: ${missing.map((f) => f.name).join(', ')}`, {
      fieldErrors: Object.fromEntries(missing.map((f) => [`mapping.${f.name}`, ['Required']])),
    });
  }
  return mapping;
}

/** "$1,234.50" -> 123450 cents, exactly (no floating point). */
export function parseDollars(s: string): number | null {
  const m = s.replace(/[\s,]/g, '').replace(/^\$/, '').match(/^(\d{1,9})(?:\.(\d{1,2}))?$/);
  if (!m) return null;
  return Number(m[1]) * 100 + Number((m[2] ?? '0').padEnd(2, '0'));
}

const parseIntCell = (s: string): number | null => (/^\d{1,9}$/.test(s) ? Number(s) : null);

function parseBool(s: string): boolean | null {
  if (s === '') return false;
  if (/^(y|yes|true|1|x)$/i.test(s)) return true;
  if (/^(n|no|false|0)$/i.test(s)) return false;
  return null;
}

export interface PreviewRow {
  /** Spreadsheet row number (the header is row 1). */
  row: number;
  values: Partial<Record<ImportField, string>>;
  part: { id: string; name: string } | null;
  errors: Array<{ field: ImportField | 'row'; message: string }>;
  input: CreateListing | null;
}

const inputFieldToImport: Record<string, ImportField> = {
  partId: 'part_number',
  title: 'title',
  condition: 'condition',
  usedGrade: 'used_grade',
  rubberUse: 'rubber_use',
  makersMarks: 'makers_marks',
  quantity: 'quantity',
  priceCents: 'price',
  weightGrams: 'weight_grams',
  lengthMm: 'length_mm',
  widthMm: 'width_mm',
  heightMm: 'height_mm',
  shippingProfileId: 'shipping_profile',
  description: 'description',
  descriptionFormat: 'description_format',
};

/** Exact number keys first, then the O/0 I/1-folded keys; a number naming two different parts is ambiguous. */
async function lookupNumbers(numbers: string[]) {
  const keys = new Map<string, { key: string; folded: string }>();
  for (const n of numbers) {
    const p = parsePartNumber(n);
    if (p.ok) keys.set(n, { key: p.value.key, folded: p.value.folded });
  }
  const all = [...keys.values()];
  const hits = all.length
    ? await getDb()
        .select({ partId: partNumbers.partId, key: partNumbers.key, folded: partNumbers.folded, name: parts.name })
        .from(partNumbers)
        .innerJoin(parts, eq(parts.id, partNumbers.partId))
        .where(or(inArray(partNumbers.key, all.map((k) => k.key)), inArray(partNumbers.folded, all.map((k) => k.folded))))
    : [];
  const out = new Map<string, { ok: true; id: string; name: string } | { ok: false; message: string }>();
  for (const n of numbers) {
    const k = keys.get(n);
    if (!k) {
      out.set(n, { ok: false, message: 'Not a part number' });
      continue;
    }
    const exact = new Map(hits.filter((h) => h.key === k.key).map((h) => [h.partId, h.name]));
    const folded = new Map(hits.filter((h) => h.folded === k.folded).map((h) => [h.partId, h.name]));
    const found = exact.size ? exact : folded;
    if (found.size === 1) {
      const [[id, name]] = [...found];
      out.set(n, { ok: true, id, name });
    } else if (found.size > 1) {
      out.set(n, { ok: false, message: `This number matches ${found.size} catalog parts; pick the part in the listing form instead` });
    } else {
      out.set(n, { ok: false, message: 'No catalog part has this number; leave it empty to list an unidentified part and describe it' });
    }
  }
  return out;
}

export async function checkRows(user: SessionUser, csv: string, given: ImportMapping | undefined) {
  const { headers, rows } = parseCsv(csv);
  const mapping = resolveMapping(headers, given);
  const cell = (row: Record<string, string>, f: ImportField) => (mapping[f] ? (row[mapping[f]!] ?? '') : '');

  const numbers = [...new Set(rows.map((r) => cell(r, 'part_number')).filter(Boolean))];
  const [found, profiles] = await Promise.all([
    lookupNumbers(numbers),
    getDb().select().from(shippingProfiles).where(and(eq(shippingProfiles.sellerId, user.id))),
  ]);
  const defaultProfile = profiles.find((p) => p.isDefault) ?? null;

  const out: PreviewRow[] = rows.map((row, i) => {
    const errors: PreviewRow['errors'] = [];
    const values = Object.fromEntries(importFields.filter((f) => mapping[f.name]).map((f) => [f.name, cell(row, f.name)])) as PreviewRow['values'];
    const err = (field: ImportField, message: string) => errors.push({ field, message });

    let part: PreviewRow['part'] = null;
    const number = cell(row, 'part_number');
    if (number) {
      const r = found.get(number)!;
      if (r.ok) part = { id: r.id, name: r.name };
      else err('part_number', r.message);
    }
    const price = parseDollars(cell(row, 'price'));
    if (price === null) err('price', 'Give the price in dollars, e.g. 42.50');
    const quantity = parseIntCell(cell(row, 'quantity'));
    if (quantity === null) err('quantity', 'Give a whole number');
    const makersMarks = parseBool(cell(row, 'makers_marks'));
    if (makersMarks === null) err('makers_marks', 'Use yes or no');
    const optionalInt = (f: ImportField) => {
      const v = cell(row, f);
      if (v === '') return undefined;
      const n = parseIntCell(v);
      if (n === null) err(f, 'Give a whole number');
      return n ?? undefined;
    };
    const profileName = cell(row, 'shipping_profile');
    let shippingProfileId: string | null = defaultProfile?.id ?? null;
    if (profileName) {
      const p = profiles.find((x) => x.name.toLowerCase() === profileName.toLowerCase());
      if (p) shippingProfileId = p.id;
      else err('shipping_profile', `You have no shipping profile named "${profileName}"`);
    }
    const lower = (f: ImportField) => cell(row, f).toLowerCase().replace(/[\s-]+/g, '_') || null;
    const candidate = {
      partId: part?.id ?? null,
      title: cell(row, 'title'),
      condition: lower('condition') ?? '',
      usedGrade: lower('used_grade'),
      rubberUse: lower('rubber_use'),
      makersMarks: makersMarks ?? false,
      quantity: quantity ?? 1,
      priceCents: price ?? 1,
      weightGrams: optionalInt('weight_grams'),
      lengthMm: optionalInt('length_mm'),
      widthMm: optionalInt('width_mm'),
      heightMm: optionalInt('height_mm'),
      shippingProfileId,
      description: cell(row, 'description'),
      descriptionFormat: lower('description_format') ?? 'plain',
    };
    const parsed = createListingInput.safeParse(candidate);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const field = inputFieldToImport[String(issue.path[0] ?? '')] ?? 'title';
        // A number that did not resolve already explains the missing part.
        if (field === 'description' && number && !part) continue;
        if (!errors.some((e) => e.field === field)) err(field, issue.message);
      }
    }
    return { row: i + 2, values, part, errors, input: errors.length === 0 && parsed.success ? parsed.data : null };
  });
  return { headers, mapping, rows: out };
}

export async function previewImport(user: SessionUser, input: { csv: string; mapping?: ImportMapping }) {
  const r = await checkRows(user, input.csv, input.mapping);
  const valid = r.rows.filter((x) => x.errors.length === 0).length;
  return {
    headers: r.headers,
    mapping: r.mapping,
    fields: importFields,
    rows: r.rows.map(({ input: _input, ...row }) => row),
    summary: { total: r.rows.length, valid, invalid: r.rows.length - valid },
  };
}

export async function commitImport(user: SessionUser, input: { csv: string; mapping?: ImportMapping; as: 'draft' | 'submitted'; skipInvalid: boolean }) {
  const r = await checkRows(user, input.csv, input.mapping);
  const invalid = r.rows.filter((x) => x.errors.length > 0);
  if (invalid.length && !input.skipInvalid) {
    throw new AppError(400, 'validation_failed', `${invalid.length} of ${r.rows.length} rows have errors; fix them or import only the valid rows`, {
      rows: invalid.map(({ row, errors }) => ({ row, errors })),
    });
  }
  const valid = r.rows.filter((x) => x.input);
  if (valid.length === 0) throw new AppError(400, 'validation_failed', 'No row can be imported');
  const ids = await getDb().transaction(async (tx) => {
    const created: string[] = [];
    for (const row of valid) {
      const l = await createListing(user, row.input!, tx);
      if (input.as === 'submitted') await submitListing(user, l.id, tx);
      created.push(l.id);
    }
    return created;
  });
  return { created: ids.length, listingIds: ids, as: input.as, skipped: invalid.map(({ row, errors }) => ({ row, errors })) };
}

/** The downloadable template: our column names and two fictional example rows. */
export function importTemplate(): string {
  const header = importFields.map((f) => f.name);
  const examples = [
    ['DEMO-1234', 'Wheel cylinder, front left (fictional example)', 'used_original', 'honest', 'display_only', 'yes', '1', '45.00', '', '', '', '', '', "Maker's script visible on the casting.", 'plain'],
    ['', 'Brass tag marked "K7" (unidentified, fictional example)', 'nos', '', '', 'yes', '3', '12.50', '20', '60', '30', '2', '', 'Stamped brass tag, 60 x 30 mm, found with brake parts; not in the catalog yet.', 'plain'],
  ];
  return Papa.unparse({ fields: header, data: examples }, { newline: '\r\n' }) + '\r\n';
}
