/**
 * The restorer's vehicles: add, edit, remove, and the progress of their teardown per system and assembly.
 * Only the owner sees a garage vehicle; anyone else gets 404 so its existence is not revealed.
 */
import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import type { CreateGarageVehicleInput, UpdateGarageVehicleInput } from '../../shared/schemas/garage';
import { getDb } from '../db/client';
import { assemblies, bomLines, garageVehicles, systems, teardownItems, teardownPhotos, vehicleModels, vehicleVariants } from '../db/schema/index';
import { ApplicabilityError, dateSpan, filterByApplicability, formatSerial, parseSerial, type VehicleFacts } from '../domain/applicability';
import type { TeardownStatus } from '../domain/needs';
import { AppError, notFound } from '../errors';
import { logger } from '../lib/logger';
import { createPhotoStorage } from '../lib/photos/create-photo-storage';
import type { PhotoStorage } from '../lib/photos/storage';
import { env } from '../env';

export type GarageVehicleRow = typeof garageVehicles.$inferSelect;
type ModelRow = typeof vehicleModels.$inferSelect;

let storage: PhotoStorage | undefined;

/** Teardown photos live in the same store as listing photos (local folder or S3), under their own prefix. */
export function photoStorage(): PhotoStorage {
  storage ??= createPhotoStorage({ ...process.env, ...env() });
  return storage;
}

/** Removes stored photo files; a failure is logged, not thrown (the rows are already gone). */
export async function deleteStoredPhotos(keys: readonly string[]) {
  for (const k of keys) {
    try {
      await photoStorage().delete(k);
    } catch (err) {
      logger.warn({ err, key: k }, 'could not delete a stored teardown photo');
    }
  }
}

function fieldError(field: string, message: string): AppError {
  return new AppError(400, 'validation_failed', message, { fieldErrors: { [field]: [message] } });
}

/** The vehicle if `userId` owns it; otherwise 404 (never 403). */
export async function ownedVehicle(userId: string, id: string): Promise<GarageVehicleRow> {
  const [row] = await getDb()
    .select()
    .from(garageVehicles)
    .where(and(eq(garageVehicles.id, id), eq(garageVehicles.ownerId, userId)));
  if (!row) throw notFound('Vehicle');
  return row;
}

/** The facts applicability is decided on. */
export function vehicleFacts(v: GarageVehicleRow): VehicleFacts {
  return { serial: v.serialNumber, buildDate: v.buildDate, variant: v.variant };
}

/** The query catalog.getAssembly takes for this vehicle. */
export function assemblyQueryFor(v: GarageVehicleRow) {
  return {
    serial: v.serialPrinted || undefined,
    buildDate: v.buildDate ?? undefined,
    variant: v.variant ?? undefined,
  };
}

async function checkFacts(model: ModelRow, facts: { serial?: string; buildDate?: string | null; variant?: string | null }) {
  const out: { serialPrinted?: string; serialNumber?: number; buildDate?: string | null; variant?: string | null } = {};
  if (facts.serial !== undefined) {
    const n = parseSerial(facts.serial);
    if (n === null) throw fieldError('serial', 'A serial number needs digits');
    if (n < model.serialFrom || n > model.serialTo) {
      throw fieldError(
        'serial',
        `${model.name} serials run from ${model.serialPrefix}${formatSerial(model.serialFrom)} to ${model.serialPrefix}${formatSerial(model.serialTo)}; check the data plate`,
      );
    }
    out.serialPrinted = facts.serial;
    out.serialNumber = n;
  }
  if (facts.buildDate !== undefined) {
    if (facts.buildDate) {
      try {
        const span = dateSpan(facts.buildDate);
        const year = Number(span.first.slice(0, 4));
        if (year < model.yearFrom || year > model.yearTo) {
          throw fieldError('buildDate', `${model.name} was built ${model.yearFrom}–${model.yearTo}`);
        }
      } catch (e) {
        if (e instanceof ApplicabilityError) throw fieldError('buildDate', e.message);
        throw e;
      }
    }
    out.buildDate = facts.buildDate || null;
  }
  if (facts.variant !== undefined) {
    if (facts.variant) {
      const variants = await getDb().select().from(vehicleVariants).where(eq(vehicleVariants.vehicleId, model.id));
      const hit = variants.find((x) => x.code.toUpperCase() === facts.variant!.toUpperCase());
      if (variants.length > 0 && !hit) {
        throw fieldError('variant', `Pick one of ${model.name}'s variants: ${variants.map((x) => x.code).join(', ')}`);
      }
      out.variant = hit?.code ?? facts.variant;
    } else out.variant = null;
  }
  return out;
}

export async function modelById(id: string): Promise<ModelRow> {
  const [m] = await getDb().select().from(vehicleModels).where(eq(vehicleModels.id, id));
  if (!m) throw notFound('Vehicle model');
  return m;
}

export function vehicleDto(v: GarageVehicleRow, model: ModelRow) {
  return {
    id: v.id,
    nickname: v.nickname,
    serial: v.serialPrinted,
    serialNumber: v.serialNumber,
    buildDate: v.buildDate,
    variant: v.variant,
    originalityTarget: v.originalityTarget,
    model: { id: model.id, slug: model.slug, name: model.name, maker: model.maker, model: model.model },
    createdAt: v.createdAt.toISOString(),
    updatedAt: v.updatedAt.toISOString(),
  };
}
export type GarageVehicleDto = ReturnType<typeof vehicleDto>;

export async function createVehicle(userId: string, input: CreateGarageVehicleInput) {
  const [model] = await getDb().select().from(vehicleModels).where(eq(vehicleModels.slug, input.vehicleSlug));
  if (!model) throw fieldError('vehicleSlug', 'No vehicle model has this name');
  const facts = await checkFacts(model, { serial: input.serial, buildDate: input.buildDate ?? null, variant: input.variant ?? null });
  const [row] = await getDb()
    .insert(garageVehicles)
    .values({
      ownerId: userId,
      vehicleModelId: model.id,
      nickname: input.nickname,
      serialPrinted: facts.serialPrinted!,
      serialNumber: facts.serialNumber!,
      buildDate: facts.buildDate ?? null,
      variant: facts.variant ?? null,
      originalityTarget: input.originalityTarget,
    })
    .returning();
  return vehicleDto(row, model);
}

export async function updateVehicle(userId: string, id: string, input: UpdateGarageVehicleInput) {
  const v = await ownedVehicle(userId, id);
  const model = await modelById(v.vehicleModelId);
  const facts = await checkFacts(model, { serial: input.serial, buildDate: input.buildDate, variant: input.variant });
  const [row] = await getDb()
    .update(garageVehicles)
    .set({
      ...(input.nickname !== undefined ? { nickname: input.nickname } : {}),
      ...(input.originalityTarget !== undefined ? { originalityTarget: input.originalityTarget } : {}),
      ...facts,
    })
    .where(eq(garageVehicles.id, v.id))
    .returning();
  return vehicleDto(row, model);
}

export async function deleteVehicle(userId: string, id: string) {
  const v = await ownedVehicle(userId, id);
  // Photo files outlive the rows unless removed: collect their keys before the cascade deletes the rows.
  const photos = await getDb()
    .select({ thumbKey: teardownPhotos.thumbKey, mediumKey: teardownPhotos.mediumKey, largeKey: teardownPhotos.largeKey })
    .from(teardownPhotos)
    .innerJoin(teardownItems, eq(teardownItems.id, teardownPhotos.teardownItemId))
    .where(eq(teardownItems.garageVehicleId, v.id));
  await getDb().delete(garageVehicles).where(eq(garageVehicles.id, v.id));
  await deleteStoredPhotos(photos.flatMap((p) => [p.thumbKey, p.mediumKey, p.largeKey]));
}

export async function listVehicles(userId: string) {
  const rows = await getDb()
    .select({ v: garageVehicles, m: vehicleModels })
    .from(garageVehicles)
    .innerJoin(vehicleModels, eq(vehicleModels.id, garageVehicles.vehicleModelId))
    .where(eq(garageVehicles.ownerId, userId))
    .orderBy(desc(garageVehicles.createdAt));
  const progress = await Promise.all(rows.map((r) => vehicleProgress(r.v)));
  return rows.map((r, i) => ({ ...vehicleDto(r.v, r.m), progress: progress[i].total }));
}

// ---- applicable lines and progress ----

export interface ApplicableLine {
  id: string;
  assemblyId: string;
  callout: string;
  partId: string;
  quantity: number;
  notes: string | null;
  sortOrder: number;
  uncertain: string[] | null;
}

/** Every bill-of-materials line of the vehicle's model that applies to this vehicle (optionally some assemblies). */
export async function applicableLines(v: GarageVehicleRow, assemblyIds?: string[]): Promise<ApplicableLine[]> {
  const rows = await getDb()
    .select({ line: bomLines })
    .from(bomLines)
    .innerJoin(assemblies, eq(assemblies.id, bomLines.assemblyId))
    .where(and(eq(assemblies.vehicleId, v.vehicleModelId), assemblyIds ? inArray(bomLines.assemblyId, assemblyIds) : undefined))
    .orderBy(asc(bomLines.assemblyId), asc(bomLines.sortOrder), asc(bomLines.callout));
  const lines = rows.map(({ line }) => ({
    id: line.id,
    assemblyId: line.assemblyId,
    callout: line.callout,
    partId: line.partId,
    quantity: line.quantity,
    notes: line.notes,
    sortOrder: line.sortOrder,
    applicability: { serialFrom: line.serialFrom, serialTo: line.serialTo, builtFrom: line.builtFrom, builtTo: line.builtTo, variants: line.variants },
  }));
  const filtered = filterByApplicability(lines, vehicleFacts(v));
  const uncertain = new Map(filtered.uncertain.map((u) => [u.line.id, u.notes]));
  return filtered.included.map(({ applicability: _a, ...l }) => ({ ...l, uncertain: uncertain.get(l.id) ?? null }));
}

export type StatusCounts = Record<TeardownStatus, number>;
const emptyCounts = (): StatusCounts => ({ not_inspected: 0, reuse: 0, refurbish: 0, replace: 0, missing: 0, wrong_part: 0 });

export interface Progress {
  lines: number;
  inspected: number;
  /** Inspected lines as a whole percentage (0 when there are no lines). */
  percent: number;
  byStatus: StatusCounts;
}

function progressOf(statuses: TeardownStatus[]): Progress {
  const byStatus = emptyCounts();
  for (const s of statuses) byStatus[s]++;
  const inspected = statuses.length - byStatus.not_inspected;
  return { lines: statuses.length, inspected, percent: statuses.length === 0 ? 0 : Math.floor((inspected * 100) / statuses.length), byStatus };
}

/** Teardown status of each applicable line (lines never touched are not inspected). */
export async function statusesByLine(vehicleId: string): Promise<Map<string, typeof teardownItems.$inferSelect>> {
  const items = await getDb().select().from(teardownItems).where(eq(teardownItems.garageVehicleId, vehicleId));
  return new Map(items.map((i) => [i.bomLineId, i]));
}

/** Progress per assembly, per system and for the whole vehicle. */
export async function vehicleProgress(v: GarageVehicleRow) {
  const db = getDb();
  const [lines, items, asms, sys] = await Promise.all([
    applicableLines(v),
    statusesByLine(v.id),
    db.select().from(assemblies).where(eq(assemblies.vehicleId, v.vehicleModelId)).orderBy(asc(assemblies.sortOrder), asc(assemblies.code)),
    db.select().from(systems).orderBy(asc(systems.sortOrder)),
  ]);
  const byAssembly = new Map<string, TeardownStatus[]>();
  for (const l of lines) {
    const list = byAssembly.get(l.assemblyId) ?? [];
    list.push(items.get(l.id)?.status ?? 'not_inspected');
    byAssembly.set(l.assemblyId, list);
  }
  const systemsOut = sys
    .map((s) => {
      const own = asms.filter((a) => a.systemId === s.id);
      const assembliesOut = own.map((a) => ({
        id: a.id,
        code: a.code,
        name: a.name,
        parentId: a.parentId,
        progress: progressOf(byAssembly.get(a.id) ?? []),
      }));
      return { slug: s.slug, name: s.name, assemblies: assembliesOut, progress: progressOf(own.flatMap((a) => byAssembly.get(a.id) ?? [])) };
    })
    .filter((s) => s.assemblies.length > 0);
  return { systems: systemsOut, total: progressOf(lines.map((l) => items.get(l.id)?.status ?? 'not_inspected')) };
}

export async function getVehicle(userId: string, id: string) {
  const v = await ownedVehicle(userId, id);
  const model = await modelById(v.vehicleModelId);
  const progress = await vehicleProgress(v);
  return { vehicle: vehicleDto(v, model), progress: progress.total, systems: progress.systems };
}

/** The assembly if it belongs to the vehicle's model; 404 otherwise. */
export async function assemblyOfVehicle(v: GarageVehicleRow, assemblyId: string) {
  const [a] = await getDb()
    .select()
    .from(assemblies)
    .where(and(eq(assemblies.id, assemblyId), eq(assemblies.vehicleId, v.vehicleModelId)));
  if (!a) throw notFound('Assembly');
  return a;
}
