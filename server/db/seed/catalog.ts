// Inserts the fictional demo catalog (see catalog-data.ts). Idempotent: every row is matched on its stable
// key (slug, seed key, number, from/to pair); bill-of-materials lines are written only for assemblies that have none.
import { inArray, sql } from 'drizzle-orm';
import type { Db } from '../client';
import { assemblies, assemblyCallouts, bomLines, partNumbers, parts, supersessions, systems, vehicleModels, vehicleVariants } from '../schema/index';
import { parseNsn } from '../../domain/nsn';
import { partNumberKeys } from '../../domain/part-number';
import { buildDemoCatalog } from './catalog-data';

const chunk = <T>(xs: T[], n: number) => Array.from({ length: Math.ceil(xs.length / n) }, (_, i) => xs.slice(i * n, i * n + n));

export async function seedCatalog(db: Db) {
  const c = buildDemoCatalog();
  return db.transaction(async (tx) => {
    for (const s of c.systems) {
      await tx.insert(systems).values(s).onConflictDoUpdate({ target: systems.slug, set: { name: s.name, sortOrder: s.sortOrder } });
    }
    const sysId = new Map((await tx.select().from(systems)).map((s) => [s.slug, s.id]));
    for (const v of c.vehicles) {
      const { variants, ...row } = v;
      const [vr] = await tx.insert(vehicleModels).values(row).onConflictDoUpdate({ target: vehicleModels.slug, set: { name: row.name, description: row.description } }).returning();
      for (const x of variants) {
        await tx.insert(vehicleVariants).values({ vehicleId: vr.id, ...x }).onConflictDoNothing();
      }
    }
    const vehId = new Map((await tx.select().from(vehicleModels)).map((v) => [v.slug, v.id]));

    // Parents first: order assemblies so each parent is inserted before its children.
    const asmId = new Map<string, string>();
    const existing = await tx.select({ id: assemblies.id, slug: assemblies.slug }).from(assemblies);
    for (const a of existing) asmId.set(a.slug, a.id);
    const pending = [...c.assemblies];
    let sort = 0;
    while (pending.length) {
      const i = pending.findIndex((a) => !a.parentKey || asmId.has(a.parentKey));
      if (i < 0) throw new Error('demo catalog: an assembly names a parent that does not exist');
      const [a] = pending.splice(i, 1);
      const values = {
        slug: a.key,
        vehicleId: vehId.get(a.vehicleSlug)!,
        systemId: sysId.get(a.systemSlug)!,
        parentId: a.parentKey ? asmId.get(a.parentKey)! : null,
        code: a.code,
        name: a.name,
        description: a.description,
        diagramSvg: a.diagramSvg,
        sortOrder: sort++,
      };
      const [row] = await tx.insert(assemblies).values(values).onConflictDoUpdate({ target: assemblies.slug, set: { name: values.name, diagramSvg: values.diagramSvg, description: values.description } }).returning({ id: assemblies.id });
      asmId.set(a.key, row.id);
      if (a.callouts.length) {
        await tx
          .insert(assemblyCallouts)
          .values(a.callouts.map((co) => ({ assemblyId: row.id, callout: co.callout, x: co.x, y: co.y })))
          .onConflictDoUpdate({ target: [assemblyCallouts.assemblyId, assemblyCallouts.callout], set: { x: sql`excluded.x`, y: sql`excluded.y` } });
      }
    }

    const partId = new Map<string, string>();
    for (const batch of chunk(c.parts, 200)) {
      const rows = await tx
        .insert(parts)
        .values(batch.map(({ key, numbers: _n, restricted, ...p }) => ({ ...p, seedKey: key, restricted: restricted ?? false })))
        .onConflictDoUpdate({ target: parts.seedKey, set: { name: sql`excluded.name`, description: sql`excluded.description` } })
        .returning({ id: parts.id, seedKey: parts.seedKey });
      for (const r of rows) partId.set(r.seedKey!, r.id);
    }
    const numberRows = c.parts.flatMap((p) =>
      p.numbers.map((n) => {
        const nsn = n.kind === 'nsn' ? parseNsn(n.number) : null;
        const printed = nsn?.ok ? nsn.value.formatted : n.number;
        const k = partNumberKeys(printed);
        return { partId: partId.get(p.key)!, printed: k.display, key: k.key, folded: k.folded, kind: n.kind };
      }),
    );
    for (const batch of chunk(numberRows, 500)) await tx.insert(partNumbers).values(batch).onConflictDoNothing();

    const edgeRows = c.supersessions.map((s) => ({ fromPartId: partId.get(s.fromPartKey)!, toPartId: partId.get(s.toPartKey)!, interchange: s.interchange, note: s.note, quantity: s.quantity }));
    for (const batch of chunk(edgeRows, 500)) await tx.insert(supersessions).values(batch).onConflictDoNothing();

    const withLines = new Set(
      (await tx.selectDistinct({ id: bomLines.assemblyId }).from(bomLines).where(inArray(bomLines.assemblyId, [...asmId.values()]))).map((r) => r.id),
    );
    const lineRows = c.bomLines
      .filter((l) => !withLines.has(asmId.get(l.assemblyKey)!))
      .map((l, i) => ({
        assemblyId: asmId.get(l.assemblyKey)!,
        callout: l.callout,
        partId: partId.get(l.partKey)!,
        quantity: l.quantity,
        notes: l.notes,
        serialFrom: l.serialFrom,
        serialTo: l.serialTo,
        builtFrom: l.builtFrom,
        builtTo: l.builtTo,
        variants: l.variants,
        sortOrder: i,
      }));
    for (const batch of chunk(lineRows, 500)) await tx.insert(bomLines).values(batch);
    return { parts: c.parts.length, numbers: numberRows.length, supersessions: edgeRows.length, lines: lineRows.length };
  });
}
