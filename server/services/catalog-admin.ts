import { and, eq, notExists, sql } from 'drizzle-orm';
import type { z } from 'zod';
import type { createAssemblyInput, createLineInput, CreatePartInput, createSupersessionInput, partNumberInput, updateAssemblyInput, updateLineInput, updatePartInput } from '../../shared/schemas/catalog';
import type { SessionUser } from '../auth/require-role';
import { getDb, type Db } from '../db/client';
import { assemblies, bomLines, partNumbers, parts, supersessions, systems, vehicleModels } from '../db/schema/index';
import { overlappingApplicability } from '../domain/applicability';
import { parseNsn } from '../domain/nsn';
import { parsePartNumber } from '../domain/part-number';
import { safetyClassFor, validateSpecs } from '../domain/standards/part-specs';
import { findLoops } from '../domain/supersession';
import { AppError, invalidState, notFound } from '../errors';
import { audit } from '../lib/audit';
import { primaryNumbers } from './catalog';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function fieldError(field: string, message: string, status = 400) {
  return new AppError(status, 'validation_failed', message, { fieldErrors: { [field]: [message] } });
}

/** The keys stored for a number; NSNs are checked and stored in their printed 4-2-3-4 form. */
function numberRow(partId: string, n: z.infer<typeof partNumberInput>, field = 'numbers') {
  let printed = n.number;
  if (n.kind === 'nsn') {
    const nsn = parseNsn(n.number);
    if (!nsn.ok) throw fieldError(field, nsn.error.message);
    printed = nsn.value.formatted;
  }
  const keys = parsePartNumber(printed);
  if (!keys.ok) throw fieldError(field, keys.error.message);
  return { partId, printed: keys.value.display, key: keys.value.key, folded: keys.value.folded, kind: n.kind };
}

function checkSpecs(category: string, specs: unknown) {
  const r = validateSpecs(category, specs);
  if (!r.ok) throw new AppError(400, 'validation_failed', 'The specifications do not fit this category', { fieldErrors: Object.fromEntries(r.errors.map((e) => [`specs.${e.path}`, [e.message]])) });
  return r.value;
}

/** A part given by id or by a number it carries; a number on several parts must be given by id. */
export async function findPartRef(tx: Tx | Db, ref: string, field: string): Promise<string> {
  if (UUID.test(ref)) {
    const [p] = await tx.select({ id: parts.id }).from(parts).where(eq(parts.id, ref));
    if (!p) throw fieldError(field, `No part with id ${ref}`, 404);
    return p.id;
  }
  const keys = parsePartNumber(ref);
  if (!keys.ok) throw fieldError(field, keys.error.message);
  const rows = await tx.selectDistinct({ partId: partNumbers.partId }).from(partNumbers).where(eq(partNumbers.key, keys.value.key));
  if (rows.length === 0) throw fieldError(field, `No part carries the number ${ref}`, 404);
  if (rows.length > 1) throw new AppError(409, 'conflict', `The number ${ref} is on ${rows.length} parts; give the part id instead`, { partIds: rows.map((r) => r.partId) });
  return rows[0].partId;
}

export async function createPart(admin: SessionUser, input: CreatePartInput) {
  const specs = checkSpecs(input.category, input.specs);
  return getDb().transaction(async (tx) => {
    const [p] = await tx
      .insert(parts)
      .values({
        name: input.name,
        description: input.description,
        category: input.category,
        specs,
        safetyClass: input.safetyClass ?? safetyClassFor(input.category),
        restricted: input.restricted ?? false,
        weightGrams: input.weightGrams ?? 0,
        lengthMm: input.lengthMm ?? 0,
        widthMm: input.widthMm ?? 0,
        heightMm: input.heightMm ?? 0,
      })
      .returning();
    const rows = input.numbers.map((n, i) => numberRow(p.id, n, `numbers.${i}.number`));
    const numbers = await tx.insert(partNumbers).values(rows).onConflictDoNothing().returning();
    await audit(tx, { actorId: admin.id, action: 'part.create', entityType: 'part', entityId: p.id, after: { ...p, numbers } });
    return { ...p, numbers };
  });
}

export async function updatePart(admin: SessionUser, id: string, input: z.infer<typeof updatePartInput>) {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(parts).where(eq(parts.id, id)).for('update');
    if (!before) throw notFound('Part');
    const category = input.category ?? before.category;
    const specs = input.specs !== undefined || input.category !== undefined ? checkSpecs(category, input.specs ?? before.specs) : undefined;
    const [after] = await tx.update(parts).set({ ...input, ...(specs ? { specs } : {}) }).where(eq(parts.id, id)).returning();
    await audit(tx, { actorId: admin.id, action: 'part.update', entityType: 'part', entityId: id, before, after });
    return after;
  });
}

export async function deletePart(admin: SessionUser, id: string) {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(parts).where(eq(parts.id, id)).for('update');
    if (!before) throw notFound('Part');
    const [used] = await tx.select({ n: sql<number>`count(*)`.mapWith(Number) }).from(bomLines).where(eq(bomLines.partId, id));
    if (used.n > 0) throw invalidState(`The part is on ${used.n} bill-of-materials line(s); remove those lines first`);
    await tx.delete(parts).where(eq(parts.id, id));
    await audit(tx, { actorId: admin.id, action: 'part.delete', entityType: 'part', entityId: id, before });
  });
}

export async function addNumber(admin: SessionUser, partId: string, input: z.infer<typeof partNumberInput>) {
  return getDb().transaction(async (tx) => {
    const [p] = await tx.select({ id: parts.id }).from(parts).where(eq(parts.id, partId));
    if (!p) throw notFound('Part');
    const [row] = await tx.insert(partNumbers).values(numberRow(partId, input, 'number')).onConflictDoNothing().returning();
    if (!row) throw new AppError(409, 'conflict', 'The part already carries this number');
    await audit(tx, { actorId: admin.id, action: 'part_number.create', entityType: 'part', entityId: partId, after: row });
    return row;
  });
}

export async function deleteNumber(admin: SessionUser, partId: string, numberId: string) {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(partNumbers).where(and(eq(partNumbers.id, numberId), eq(partNumbers.partId, partId)));
    if (!before) throw notFound('Part number');
    const [{ n }] = await tx.select({ n: sql<number>`count(*)`.mapWith(Number) }).from(partNumbers).where(eq(partNumbers.partId, partId));
    if (n <= 1) throw invalidState('A part keeps at least one number');
    await tx.delete(partNumbers).where(eq(partNumbers.id, numberId));
    await audit(tx, { actorId: admin.id, action: 'part_number.delete', entityType: 'part', entityId: partId, before });
  });
}

export async function createSupersession(admin: SessionUser, input: z.infer<typeof createSupersessionInput>) {
  return getDb().transaction(async (tx) => {
    const fromPartId = await findPartRef(tx, input.from, 'from');
    const toPartId = await findPartRef(tx, input.to, 'to');
    if (fromPartId === toPartId) throw fieldError('to', 'A part cannot replace itself');
    const [row] = await tx
      .insert(supersessions)
      .values({ fromPartId, toPartId, interchange: input.interchange, note: input.note ?? null, quantity: input.quantity })
      .onConflictDoNothing()
      .returning();
    if (!row) throw new AppError(409, 'conflict', 'This supersession already exists');
    await audit(tx, { actorId: admin.id, action: 'supersession.create', entityType: 'supersession', entityId: row.id, after: row });
    return row;
  });
}

export async function deleteSupersession(admin: SessionUser, id: string) {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.delete(supersessions).where(eq(supersessions.id, id)).returning();
    if (!before) throw notFound('Supersession');
    await audit(tx, { actorId: admin.id, action: 'supersession.delete', entityType: 'supersession', entityId: id, before });
  });
}

export async function createAssembly(admin: SessionUser, input: z.infer<typeof createAssemblyInput>) {
  return getDb().transaction(async (tx) => {
    const [v] = await tx.select().from(vehicleModels).where(eq(vehicleModels.slug, input.vehicleSlug));
    if (!v) throw fieldError('vehicleSlug', 'No such vehicle model', 404);
    const [s] = await tx.select().from(systems).where(eq(systems.slug, input.systemSlug));
    if (!s) throw fieldError('systemSlug', 'No such system', 404);
    if (input.parentId) {
      const [parent] = await tx.select().from(assemblies).where(eq(assemblies.id, input.parentId));
      if (!parent || parent.vehicleId !== v.id) throw fieldError('parentId', 'The parent assembly must belong to the same vehicle');
    }
    const slug = `${v.slug}-${input.code.toLowerCase().replace(/[^a-z0-9]+/g, '-')}-${Date.now().toString(36)}`;
    const [row] = await tx
      .insert(assemblies)
      .values({ slug, vehicleId: v.id, systemId: s.id, parentId: input.parentId ?? null, code: input.code, name: input.name, description: input.description })
      .returning();
    await audit(tx, { actorId: admin.id, action: 'assembly.create', entityType: 'assembly', entityId: row.id, after: row });
    return row;
  });
}

export async function updateAssembly(admin: SessionUser, id: string, input: z.infer<typeof updateAssemblyInput>) {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(assemblies).where(eq(assemblies.id, id)).for('update');
    if (!before) throw notFound('Assembly');
    if (input.parentId === id) throw fieldError('parentId', 'An assembly cannot be its own parent');
    const [after] = await tx.update(assemblies).set(input).where(eq(assemblies.id, id)).returning();
    await audit(tx, { actorId: admin.id, action: 'assembly.update', entityType: 'assembly', entityId: id, before, after });
    return after;
  });
}

export async function deleteAssembly(admin: SessionUser, id: string) {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.delete(assemblies).where(eq(assemblies.id, id)).returning();
    if (!before) throw notFound('Assembly');
    await audit(tx, { actorId: admin.id, action: 'assembly.delete', entityType: 'assembly', entityId: id, before: { ...before, diagramSvg: before.diagramSvg ? '(svg)' : null } });
  });
}

export async function createLine(admin: SessionUser, input: z.infer<typeof createLineInput>) {
  return getDb().transaction(async (tx) => {
    const [a] = await tx.select({ id: assemblies.id }).from(assemblies).where(eq(assemblies.id, input.assemblyId));
    if (!a) throw fieldError('assemblyId', 'No such assembly', 404);
    const partId = await findPartRef(tx, input.part, 'part');
    const { part: _p, ...rest } = input;
    const [row] = await tx.insert(bomLines).values({ ...rest, partId, variants: rest.variants ?? null, notes: rest.notes ?? null, builtFrom: rest.builtFrom ?? null, builtTo: rest.builtTo ?? null }).returning();
    await audit(tx, { actorId: admin.id, action: 'bom_line.create', entityType: 'bom_line', entityId: row.id, after: row });
    return row;
  });
}

export async function updateLine(admin: SessionUser, id: string, input: z.infer<typeof updateLineInput>) {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(bomLines).where(eq(bomLines.id, id)).for('update');
    if (!before) throw notFound('Bill-of-materials line');
    const { part, ...rest } = input;
    const partId = part ? await findPartRef(tx, part, 'part') : undefined;
    const [after] = await tx.update(bomLines).set({ ...rest, ...(partId ? { partId } : {}) }).where(eq(bomLines.id, id)).returning();
    await audit(tx, { actorId: admin.id, action: 'bom_line.update', entityType: 'bom_line', entityId: id, before, after });
    return after;
  });
}

export async function deleteLine(admin: SessionUser, id: string) {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.delete(bomLines).where(eq(bomLines.id, id)).returning();
    if (!before) throw notFound('Bill-of-materials line');
    await audit(tx, { actorId: admin.id, action: 'bom_line.delete', entityType: 'bom_line', entityId: id, before });
  });
}

/** The administrator's data-quality report over the whole catalog. */
export async function dataQuality() {
  const db = getDb();
  const [edges, dupNumbers, orphanCount, orphans, lines] = await Promise.all([
    db.select().from(supersessions),
    db.execute<{ key: string; printed: string; part_ids: string[] }>(sql`
      SELECT key, min(printed) AS printed, array_agg(DISTINCT part_id) AS part_ids
      FROM part_numbers GROUP BY key HAVING count(DISTINCT part_id) > 1 ORDER BY key LIMIT 200`),
    db.select({ n: sql<number>`count(*)`.mapWith(Number) }).from(parts).where(notExists(db.select({ x: sql`1` }).from(bomLines).where(eq(bomLines.partId, parts.id)))),
    db.select({ id: parts.id, name: parts.name }).from(parts).where(notExists(db.select({ x: sql`1` }).from(bomLines).where(eq(bomLines.partId, parts.id)))).limit(100),
    db.select().from(bomLines),
  ]);
  const loops = findLoops(edges.map((e) => ({ fromPartId: e.fromPartId, toPartId: e.toPartId, interchange: e.interchange, note: e.note, quantity: e.quantity })));
  const loopPartIds = [...new Set(loops.flat())];
  const primary = await primaryNumbers([...loopPartIds, ...orphans.map((o) => o.id)]);
  const overlaps = overlappingApplicability(
    lines.map((l) => ({ id: l.id, assemblyId: l.assemblyId, callout: l.callout, applicability: { serialFrom: l.serialFrom, serialTo: l.serialTo, builtFrom: l.builtFrom, builtTo: l.builtTo, variants: l.variants } })),
  );
  return {
    loops: loops.map((cycle) => ({ partIds: cycle, numbers: cycle.map((id) => primary.get(id) ?? id), message: `Supersession loop: ${cycle.map((id) => primary.get(id) ?? id).join(' → ')} → back to the start` })),
    numbersOnSeveralParts: dupNumbers.rows.map((r) => ({ key: r.key, printed: r.printed, partIds: r.part_ids })),
    partsInNoAssembly: { count: orphanCount[0].n, sample: orphans.map((o) => ({ ...o, primaryNumber: primary.get(o.id) ?? null })) },
    overlappingLines: overlaps.map((o) => ({ assemblyId: o.lines[0].assemblyId, callout: o.callout, lineIds: o.lines.map((l) => l.id), message: o.message })),
  };
}
