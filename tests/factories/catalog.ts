import { randomUUID } from 'node:crypto';
import { getDb } from '../../server/db/client';
import { assemblies, bomLines, partNumbers, parts, supersessions, systems, vehicleModels } from '../../server/db/schema/index';
import { partNumberKeys } from '../../server/domain/part-number';

const tag = () => randomUUID().slice(0, 6).toUpperCase();

/** A part with numbers; each call makes unique numbers (a per-call tag) unless given. */
export async function createPart(opts: { name?: string; category?: string; safetyClass?: 'brake' | 'steering' | 'suspension' | 'none'; numbers?: Array<{ number: string; kind?: 'maker' | 'ordnance' | 'nsn' | 'vendor' }> } = {}) {
  const t = tag();
  const [p] = await getDb()
    .insert(parts)
    .values({ name: opts.name ?? `Test part ${t}`, category: opts.category ?? 'generic', safetyClass: opts.safetyClass ?? 'none', weightGrams: 120, lengthMm: 100, widthMm: 50, heightMm: 20 })
    .returning();
  const nums = opts.numbers ?? [{ number: `TP-${t}`, kind: 'maker' as const }];
  const rows = nums.map((n) => {
    const k = partNumberKeys(n.number);
    return { partId: p.id, printed: k.display, key: k.key, folded: k.folded, kind: n.kind ?? 'maker' };
  });
  await getDb().insert(partNumbers).values(rows);
  return { ...p, number: rows[0].printed };
}

export async function supersede(from: { id: string }, to: { id: string }, interchange: 'two_way' | 'one_way' | 'conditional' = 'two_way', note: string | null = null, quantity = 1) {
  const [row] = await getDb().insert(supersessions).values({ fromPartId: from.id, toPartId: to.id, interchange, note: interchange === 'conditional' ? (note ?? 'with late bracket') : note, quantity }).returning();
  return row;
}

export async function createVehicleWithAssembly() {
  const t = tag().toLowerCase();
  const db = getDb();
  const [v] = await db.insert(vehicleModels).values({ slug: `test-${t}`, maker: 'Test Works', model: `T-${t}`, name: `Test truck ${t}`, yearFrom: 1950, yearTo: 1955, serialFrom: 1, serialTo: 20000 }).returning();
  const [s] = await db.select().from(systems).limit(1);
  const [a] = await db.insert(assemblies).values({ slug: `test-asm-${t}`, vehicleId: v.id, systemId: s.id, code: 'B-1', name: 'Test master cylinder' }).returning();
  return { vehicle: v, assembly: a };
}

export async function addLine(assemblyId: string, partId: string, extra: Partial<typeof bomLines.$inferInsert> = {}) {
  const [l] = await getDb().insert(bomLines).values({ assemblyId, partId, callout: '1', quantity: 1, ...extra }).returning();
  return l;
}
