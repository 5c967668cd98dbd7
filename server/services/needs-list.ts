/**
 * A vehicle's needs list: the checklist lines marked replace, missing or wrong part (needed = quantity per
 * assembly - usable on hand, server/domain/needs.ts) plus wants added by hand. One entry per part and
 * condition policy, since the sourcing plan honours the policy per line.
 */
import Papa from 'papaparse';
import { and, asc, eq, inArray } from 'drizzle-orm';
import type { WantInput } from '../../shared/schemas/garage';
import { getDb } from '../db/client';
import { assemblies, parts, wants } from '../db/schema/index';
import { computeNeeds, type ManualWant, type TeardownLine } from '../domain/needs';
import type { SourcingPolicy } from '../domain/sourcing-plan';
import { AppError, notFound } from '../errors';
import { primaryNumbers } from './catalog';
import { applicableLines, ownedVehicle, statusesByLine, type GarageVehicleRow } from './garage';

export interface NeedEntry {
  /** Stable within one vehicle: `${partId}:${policy}`. */
  needId: string;
  part: { id: string; name: string; primaryNumber: string | null; category: string };
  policy: SourcingPolicy;
  quantity: number;
  sources: Array<
    | { kind: 'teardown'; bomLineId: string; assembly: { id: string; code: string; name: string }; callout: string; status: 'replace' | 'missing' | 'wrong_part'; quantity: number; note: string }
    | { kind: 'manual'; wantId: string; quantity: number; note: string }
  >;
}

/** The needs of one vehicle, ready for the list, the CSV and the sourcing plan. */
export async function needsOf(v: GarageVehicleRow): Promise<{ needs: NeedEntry[]; notInspected: number }> {
  const db = getDb();
  const [lines, items, wantRows] = await Promise.all([
    applicableLines(v),
    statusesByLine(v.id),
    db.select().from(wants).where(eq(wants.garageVehicleId, v.id)).orderBy(asc(wants.createdAt)),
  ]);
  const lineById = new Map(lines.map((l) => [l.id, l]));
  const wantById = new Map(wantRows.map((w) => [w.id, w]));
  const raw: Array<{ policy: SourcingPolicy; need: ReturnType<typeof computeNeeds>['needs'][number] }> = [];
  let notInspected = 0;
  // One pass per policy keeps the domain's per-part sums while never mixing two wanted conditions.
  for (const policy of ['originals_only', 'nos_only', 'reproduction_ok', 'any'] as const) {
    const teardownLines: TeardownLine[] = lines
      .filter((l) => (items.get(l.id)?.policy ?? 'any') === policy)
      .map((l) => {
        const item = items.get(l.id);
        return { lineId: l.id, partId: l.partId, qtyPerAssembly: l.quantity, status: item?.status ?? 'not_inspected', usableOnHand: item?.usableOnHand ?? 0 };
      });
    const manual: ManualWant[] = wantRows.filter((w) => w.policy === policy).map((w) => ({ partId: w.partId, quantity: w.quantity, wantId: w.id }));
    const result = computeNeeds(teardownLines, manual);
    notInspected += result.notInspectedLineIds.length;
    for (const need of result.needs) raw.push({ policy, need });
  }
  const partIds = [...new Set(raw.map((r) => r.need.partId))];
  const asmIds = [...new Set(lines.map((l) => l.assemblyId))];
  const [partRows, asmRows, numbers] = await Promise.all([
    partIds.length ? db.select().from(parts).where(inArray(parts.id, partIds)) : Promise.resolve([]),
    asmIds.length ? db.select({ id: assemblies.id, code: assemblies.code, name: assemblies.name }).from(assemblies).where(inArray(assemblies.id, asmIds)) : Promise.resolve([]),
    primaryNumbers(partIds),
  ]);
  const partById = new Map(partRows.map((p) => [p.id, p]));
  const asmById = new Map(asmRows.map((a) => [a.id, a]));
  const needs: NeedEntry[] = raw.map(({ policy, need }) => {
    const p = partById.get(need.partId)!;
    return {
      needId: `${need.partId}:${policy}`,
      part: { id: p.id, name: p.name, primaryNumber: numbers.get(p.id) ?? null, category: p.category },
      policy,
      quantity: need.quantity,
      sources: need.sources.map((s) => {
        if (s.kind === 'teardown') {
          const line = lineById.get(s.lineId)!;
          const a = asmById.get(line.assemblyId)!;
          return { kind: 'teardown' as const, bomLineId: s.lineId, assembly: a, callout: line.callout, status: s.status, quantity: s.quantity, note: items.get(s.lineId)?.note ?? '' };
        }
        return { kind: 'manual' as const, wantId: s.wantId!, quantity: s.quantity, note: wantById.get(s.wantId!)?.note ?? '' };
      }),
    };
  });
  needs.sort((a, b) => (a.part.primaryNumber ?? a.part.name).localeCompare(b.part.primaryNumber ?? b.part.name) || a.policy.localeCompare(b.policy));
  return { needs, notInspected };
}

export async function getNeeds(userId: string, vehicleId: string) {
  const v = await ownedVehicle(userId, vehicleId);
  const { needs, notInspected } = await needsOf(v);
  return { vehicleId: v.id, serial: v.serialPrinted, needs, notInspectedLines: notInspected, totalUnits: needs.reduce((a, n) => a + n.quantity, 0) };
}

const POLICY_WORDS: Record<SourcingPolicy, string> = {
  originals_only: 'originals only',
  nos_only: 'NOS only',
  reproduction_ok: 'reproduction acceptable',
  any: 'any',
};

/** CSV of the needs list (RFC 4180 quoting by papaparse); one row per need. */
export async function needsCsv(userId: string, vehicleId: string): Promise<{ filename: string; csv: string }> {
  const { needs, serial } = await getNeeds(userId, vehicleId);
  const rows = needs.map((n) => ({
    part_number: n.part.primaryNumber ?? '',
    part_name: n.part.name,
    quantity: n.quantity,
    condition: POLICY_WORDS[n.policy],
    where: n.sources.map((s) => (s.kind === 'teardown' ? `${s.assembly.code} #${s.callout} (${s.status.replace('_', ' ')} ${s.quantity})` : `want ${s.quantity}`)).join('; '),
    notes: n.sources.map((s) => s.note).filter(Boolean).join('; '),
  }));
  const csv = Papa.unparse(rows, { columns: ['part_number', 'part_name', 'quantity', 'condition', 'where', 'notes'], newline: '\r\n' });
  const safe = serial.replace(/[^A-Za-z0-9-]/g, '') || 'vehicle';
  return { filename: `needs-${safe}.csv`, csv };
}

// ---- wants ----

export async function addWant(userId: string, vehicleId: string, input: WantInput) {
  const v = await ownedVehicle(userId, vehicleId);
  const [p] = await getDb().select({ id: parts.id }).from(parts).where(eq(parts.id, input.partId));
  if (!p) throw new AppError(400, 'validation_failed', 'No catalog part has this id', { fieldErrors: { partId: ['No catalog part has this id'] } });
  const [row] = await getDb()
    .insert(wants)
    .values({ garageVehicleId: v.id, partId: input.partId, quantity: input.quantity, policy: input.policy, note: input.note })
    .returning();
  return { id: row.id, partId: row.partId, quantity: row.quantity, policy: row.policy, note: row.note, createdAt: row.createdAt.toISOString() };
}

export async function deleteWant(userId: string, vehicleId: string, wantId: string) {
  const v = await ownedVehicle(userId, vehicleId);
  const [row] = await getDb()
    .delete(wants)
    .where(and(eq(wants.id, wantId), eq(wants.garageVehicleId, v.id)))
    .returning();
  if (!row) throw notFound('Want');
}
