import { asc, count, eq, inArray, or } from 'drizzle-orm';
import { z } from 'zod';
import type { assemblyQuery } from '../../shared/schemas/catalog';
import { getDb } from '../db/client';
import { assemblies, assemblyCallouts, bomLines, partNumbers, parts, systems, vehicleModels, vehicleVariants } from '../db/schema/index';
import { filterByApplicability, parseSerial } from '../domain/applicability';
import { cautionsFor } from '../domain/cautions';
import { parseNsn } from '../domain/nsn';
import { parsePartNumber, PartNumberError } from '../domain/part-number';
import { derivedSpecs } from '../domain/standards/part-specs';
import { fillersForPart, resolve, indexEdges } from '../domain/supersession';
import { AppError, notFound } from '../errors';
import { loadSubgraph } from './catalog-graph';
import { readCache } from '../lib/read-cache';

// Public reads are cached briefly; catalog edits clear the caches (see catalog-admin.ts).
const vehicleCache = readCache<Awaited<ReturnType<typeof loadVehicle>>>({ max: 200, ttlMs: 30_000 });
const assemblyCache = readCache<Awaited<ReturnType<typeof loadAssembly>>>({ max: 2000, ttlMs: 30_000 });
const partCache = readCache<Awaited<ReturnType<typeof loadPart>>>({ max: 5000, ttlMs: 5_000 });
const resolveCache = readCache<Awaited<ReturnType<typeof loadResolve>>>({ max: 5000, ttlMs: 30_000 });

type PartRow = typeof parts.$inferSelect;
type NumberRow = typeof partNumbers.$inferSelect;

/** Order in which a part's numbers are shown; the first is its headline number. */
const KIND_ORDER = ['maker', 'ordnance', 'nsn', 'hardware_standard', 'reproduction', 'vendor'];
const byKind = (a: { kind: string; printed: string }, b: { kind: string; printed: string }) =>
  KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) || a.printed.localeCompare(b.printed);

export async function primaryNumbers(partIds: string[]): Promise<Map<string, string>> {
  const out = new Map<string, string>();
  if (!partIds.length) return out;
  const rows = await getDb().select().from(partNumbers).where(inArray(partNumbers.partId, partIds));
  rows.sort(byKind);
  for (const r of rows) if (!out.has(r.partId)) out.set(r.partId, r.printed);
  return out;
}

export function partSummary(p: PartRow, primary: string | undefined) {
  return { id: p.id, name: p.name, category: p.category, safetyClass: p.safetyClass, primaryNumber: primary ?? null };
}

const vehicleListCache = readCache<Awaited<ReturnType<typeof loadVehicleList>>>({ max: 1, ttlMs: 30_000 });

export function listVehicles() {
  return vehicleListCache.get('all', loadVehicleList);
}

async function loadVehicleList() {
  const db = getDb();
  const rows = await db.select().from(vehicleModels).orderBy(asc(vehicleModels.name));
  const counts = await db.select({ vehicleId: assemblies.vehicleId, n: count() }).from(assemblies).groupBy(assemblies.vehicleId);
  const n = new Map(counts.map((c) => [c.vehicleId, c.n]));
  return rows.map((v) => ({ ...pickVehicle(v), assemblyCount: n.get(v.id) ?? 0 }));
}

const pickVehicle = (v: typeof vehicleModels.$inferSelect) => ({
  id: v.id,
  slug: v.slug,
  maker: v.maker,
  model: v.model,
  name: v.name,
  yearFrom: v.yearFrom,
  yearTo: v.yearTo,
  serialPrefix: v.serialPrefix,
  serialFrom: v.serialFrom,
  serialTo: v.serialTo,
  description: v.description,
});

export function getVehicle(slug: string) {
  return vehicleCache.get(slug, () => loadVehicle(slug));
}

async function loadVehicle(slug: string) {
  const db = getDb();
  const [v] = await db.select().from(vehicleModels).where(eq(vehicleModels.slug, slug));
  if (!v) throw notFound('Vehicle model');
  const [variants, asms, sys, lineCounts] = await Promise.all([
    db.select().from(vehicleVariants).where(eq(vehicleVariants.vehicleId, v.id)).orderBy(asc(vehicleVariants.code)),
    db.select().from(assemblies).where(eq(assemblies.vehicleId, v.id)).orderBy(asc(assemblies.sortOrder), asc(assemblies.code)),
    db.select().from(systems).orderBy(asc(systems.sortOrder)),
    db
      .select({ assemblyId: bomLines.assemblyId, n: count() })
      .from(bomLines)
      .innerJoin(assemblies, eq(assemblies.id, bomLines.assemblyId))
      .where(eq(assemblies.vehicleId, v.id))
      .groupBy(bomLines.assemblyId),
  ]);
  const lines = new Map(lineCounts.map((c) => [c.assemblyId, c.n]));
  type Node = { id: string; code: string; name: string; lineCount: number; hasDiagram: boolean; children: Node[] };
  const nodes = new Map<string, Node & { parentId: string | null; systemId: string }>();
  for (const a of asms) {
    nodes.set(a.id, { id: a.id, code: a.code, name: a.name, lineCount: lines.get(a.id) ?? 0, hasDiagram: !!a.diagramSvg, children: [], parentId: a.parentId, systemId: a.systemId });
  }
  const roots: Array<Node & { systemId: string }> = [];
  for (const n of nodes.values()) {
    const parent = n.parentId ? nodes.get(n.parentId) : undefined;
    if (parent) parent.children.push(n);
    else roots.push(n);
  }
  const strip = (n: Node): Node => ({ id: n.id, code: n.code, name: n.name, lineCount: n.lineCount, hasDiagram: n.hasDiagram, children: n.children.map(strip) });
  return {
    vehicle: pickVehicle(v),
    variants: variants.map((x) => ({ code: x.code, name: x.name, description: x.description })),
    systems: sys
      .map((s) => ({ slug: s.slug, name: s.name, assemblies: roots.filter((r) => r.systemId === s.id).map(strip) }))
      .filter((s) => s.assemblies.length > 0),
  };
}

export function getAssembly(id: string, q: z.infer<typeof assemblyQuery>) {
  return assemblyCache.get(JSON.stringify([id, q.serial ?? '', q.buildDate ?? '', q.variant ?? '']), () => loadAssembly(id, q));
}

async function loadAssembly(id: string, q: z.infer<typeof assemblyQuery>) {
  const db = getDb();
  const [a] = await db.select().from(assemblies).where(eq(assemblies.id, id));
  if (!a) throw notFound('Assembly');
  const [[v], [s], children, callouts, lineRows, parent] = await Promise.all([
    db.select().from(vehicleModels).where(eq(vehicleModels.id, a.vehicleId)),
    db.select().from(systems).where(eq(systems.id, a.systemId)),
    db.select({ id: assemblies.id, code: assemblies.code, name: assemblies.name }).from(assemblies).where(eq(assemblies.parentId, a.id)).orderBy(asc(assemblies.code)),
    db.select().from(assemblyCallouts).where(eq(assemblyCallouts.assemblyId, a.id)),
    db.select({ line: bomLines, part: parts }).from(bomLines).innerJoin(parts, eq(parts.id, bomLines.partId)).where(eq(bomLines.assemblyId, a.id)).orderBy(asc(bomLines.sortOrder)),
    a.parentId ? db.select({ id: assemblies.id, code: assemblies.code, name: assemblies.name }).from(assemblies).where(eq(assemblies.id, a.parentId)) : Promise.resolve([]),
  ]);
  const primary = await primaryNumbers(lineRows.map((r) => r.part.id));
  let serial: number | null = null;
  if (q.serial) {
    serial = parseSerial(q.serial);
    if (serial === null) throw new AppError(400, 'validation_failed', 'A serial number needs digits', { fieldErrors: { serial: ['A serial number needs digits'] } });
  }
  const lines = lineRows.map(({ line, part }) => ({
    id: line.id,
    callout: line.callout,
    quantity: line.quantity,
    notes: line.notes,
    part: partSummary(part, primary.get(part.id)),
    applicability: { serialFrom: line.serialFrom, serialTo: line.serialTo, builtFrom: line.builtFrom, builtTo: line.builtTo, variants: line.variants },
    assemblyId: a.id,
  }));
  const vehicleGiven = serial !== null || !!q.buildDate || !!q.variant;
  const filtered = vehicleGiven ? filterByApplicability(lines, { serial, buildDate: q.buildDate ?? null, variant: q.variant ?? null }) : null;
  const uncertain = new Map(filtered?.uncertain.map((u) => [u.line.id, u.notes]) ?? []);
  const strip = ({ assemblyId: _a, ...l }: (typeof lines)[number]) => l;
  const safety = [...new Set(lineRows.map((r) => r.part.safetyClass).filter((c) => c !== 'none'))];
  return {
    assembly: { id: a.id, code: a.code, name: a.name, description: a.description, diagramSvg: a.diagramSvg },
    vehicle: pickVehicle(v),
    system: { slug: s.slug, name: s.name },
    parent: parent[0] ?? null,
    children,
    callouts: callouts.map((c) => ({ callout: c.callout, x: c.x, y: c.y })),
    filter: vehicleGiven ? { serial, buildDate: q.buildDate ?? null, variant: q.variant ?? null } : null,
    lines: (filtered ? filtered.included : lines).map((l) => ({ ...strip(l), uncertain: uncertain.get(l.id) ?? null })),
    excluded: (filtered?.excluded ?? []).map((x) => ({ line: strip(x.line), reasons: x.reasons })),
    cautions: safety.length ? cautionsFor({ safetyClass: safety[0], category: 'assembly' }) : [],
  };
}

function groupNumbers(rows: NumberRow[]) {
  const sorted = [...rows].sort(byKind);
  const groups: Array<{ kind: string; numbers: Array<{ id: string; printed: string; key: string; nsn?: { fsc: string; supplyClass: string | null; country: string | null } }> }> = [];
  for (const n of sorted) {
    let g = groups.find((x) => x.kind === n.kind);
    if (!g) groups.push((g = { kind: n.kind, numbers: [] }));
    const nsn = n.kind === 'nsn' ? parseNsn(n.printed) : null;
    g.numbers.push({
      id: n.id,
      printed: n.printed,
      key: n.key,
      ...(nsn?.ok ? { nsn: { fsc: nsn.value.fsc, supplyClass: nsn.value.supplyClassName, country: nsn.value.country } } : {}),
    });
  }
  return groups;
}

/** The part's place in its supersession component, for the chain drawing. */
async function chainFor(partId: string) {
  const g = await loadSubgraph([partId]);
  const index = indexEdges(g.edges);
  const f = fillersForPart(partId, index);
  const forward = new Set<string>([partId]);
  const stack = [partId];
  while (stack.length) {
    const cur = stack.pop()!;
    for (const e of index.out.get(cur) ?? []) {
      if (forward.has(e.toPartId)) continue;
      forward.add(e.toPartId);
      stack.push(e.toPartId);
    }
  }
  const current = [...forward].filter((id) => !(index.out.get(id)?.length));
  const partRows = g.partIds.length ? await getDb().select().from(parts).where(inArray(parts.id, g.partIds)) : [];
  const primary = await primaryNumbers(g.partIds);
  return {
    parts: partRows.map((p) => partSummary(p, primary.get(p.id))),
    edges: g.edges,
    current: current.filter((id) => id !== partId || g.edges.length > 0),
    fillers: f.fillers,
    fillerSets: f.fillerSets,
    problems: f.problems,
  };
}

export function getPart(id: string) {
  return partCache.get(id, () => loadPart(id));
}

async function loadPart(id: string) {
  const db = getDb();
  const [p] = await db.select().from(parts).where(eq(parts.id, id));
  if (!p) throw notFound('Part');
  const [numbers, usedIn, chain] = await Promise.all([
    db.select().from(partNumbers).where(eq(partNumbers.partId, id)),
    db
      .select({ assemblyId: assemblies.id, code: assemblies.code, name: assemblies.name, callout: bomLines.callout, quantity: bomLines.quantity, vehicleSlug: vehicleModels.slug, vehicleName: vehicleModels.name })
      .from(bomLines)
      .innerJoin(assemblies, eq(assemblies.id, bomLines.assemblyId))
      .innerJoin(vehicleModels, eq(vehicleModels.id, assemblies.vehicleId))
      .where(eq(bomLines.partId, id))
      .limit(100),
    chainFor(id),
  ]);
  return {
    part: {
      id: p.id,
      name: p.name,
      description: p.description,
      category: p.category,
      specs: p.specs as Record<string, unknown>,
      derivedSpecs: derivedSpecs(p.category, p.specs),
      weightGrams: p.weightGrams,
      lengthMm: p.lengthMm,
      widthMm: p.widthMm,
      heightMm: p.heightMm,
      safetyClass: p.safetyClass,
      restricted: p.restricted,
    },
    numbers: groupNumbers(numbers),
    usedIn,
    chain,
    cautions: cautionsFor(p),
    liveListings: await liveListingCount(id),
  };
}

/** Replaced once listings exist; until then no part has live listings. */
export let liveListingCount: (partId: string) => Promise<number> = async () => 0;
export function setLiveListingCounter(fn: (partId: string) => Promise<number>) {
  liveListingCount = fn;
}

/** Number lookup: exact key first, then the O/0 I/1-folded key; then the supersession walk in the domain. */
export function resolveNumber(query: string) {
  return resolveCache.get(query.trim().toUpperCase(), () => loadResolve(query));
}

async function loadResolve(query: string) {
  const parsed = parsePartNumber(query);
  if (!parsed.ok) throw new AppError(400, 'validation_failed', parsed.error.message, { fieldErrors: { number: [parsed.error.message] } });
  const { key, folded } = parsed.value;
  const hits = await getDb()
    .selectDistinct({ partId: partNumbers.partId })
    .from(partNumbers)
    .where(or(eq(partNumbers.key, key), eq(partNumbers.folded, folded)));
  const g = await loadSubgraph(hits.map((h) => h.partId));
  let result;
  try {
    result = resolve({ query, numbers: g.numbers, edges: g.edges });
  } catch (e) {
    if (e instanceof PartNumberError) throw new AppError(400, 'validation_failed', e.message);
    throw e;
  }
  const partRows = g.partIds.length ? await getDb().select().from(parts).where(inArray(parts.id, g.partIds)) : [];
  const primary = await primaryNumbers(g.partIds);
  return { ...result, parts: partRows.map((p) => partSummary(p, primary.get(p.id))) };
}

export async function partExists(id: string) {
  const [r] = await getDb().select({ id: parts.id }).from(parts).where(eq(parts.id, id));
  return !!r;
}

