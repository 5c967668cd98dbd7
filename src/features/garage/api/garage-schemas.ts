import { z } from 'zod';
import { conditionPolicies, originalityTargets, teardownStatuses } from '@shared/schemas/garage';

/*
 * Reply shapes of the garage, alerts and notices API (server/services/{garage,teardown,needs-list,sourcing,
 * wanted-alerts,notices}.ts). Checked loosely: unknown keys are dropped, so the server may add fields.
 */

const statusEnum = z.enum(teardownStatuses);
const policyEnum = z.enum(conditionPolicies);

export const progressSchema = z.object({
  lines: z.number(),
  inspected: z.number(),
  percent: z.number(),
  byStatus: z.partialRecord(statusEnum, z.number()),
});
export type Progress = z.infer<typeof progressSchema>;

export const garageVehicleSchema = z.object({
  id: z.string(),
  nickname: z.string(),
  serial: z.string(),
  serialNumber: z.number(),
  buildDate: z.string().nullable(),
  variant: z.string().nullable(),
  originalityTarget: z.enum(originalityTargets),
  model: z.object({ id: z.string(), slug: z.string(), name: z.string(), maker: z.string(), model: z.string() }),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type GarageVehicle = z.infer<typeof garageVehicleSchema>;

export const vehicleListReply = z.object({ vehicles: z.array(garageVehicleSchema.extend({ progress: progressSchema })) });
export type GarageVehicleWithProgress = z.infer<typeof vehicleListReply>['vehicles'][number];

export const vehicleReply = z.object({ vehicle: garageVehicleSchema });

export const assemblyProgressSchema = z.object({
  id: z.string(),
  code: z.string(),
  name: z.string(),
  parentId: z.string().nullable(),
  progress: progressSchema,
});
export type AssemblyProgress = z.infer<typeof assemblyProgressSchema>;

export const vehicleDetailReply = z.object({
  vehicle: garageVehicleSchema,
  progress: progressSchema,
  systems: z.array(z.object({ slug: z.string(), name: z.string(), assemblies: z.array(assemblyProgressSchema), progress: progressSchema })),
});
export type GarageVehicleDetail = z.infer<typeof vehicleDetailReply>;

// ---- catalog models (for the add-vehicle form) ----

export const catalogModelSchema = z.object({
  id: z.string(),
  slug: z.string(),
  name: z.string(),
  maker: z.string(),
  model: z.string(),
  yearFrom: z.number(),
  yearTo: z.number(),
  serialPrefix: z.string(),
  serialFrom: z.number(),
  serialTo: z.number(),
});
export type CatalogModel = z.infer<typeof catalogModelSchema>;
export const catalogModelsReply = z.object({ vehicles: z.array(catalogModelSchema) });
export const catalogModelReply = z.object({
  vehicle: catalogModelSchema,
  variants: z.array(z.object({ code: z.string(), name: z.string(), description: z.string().nullable().optional() })),
});
export type CatalogModelDetail = z.infer<typeof catalogModelReply>;

// ---- checklist ----

export const partSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  category: z.string(),
  safetyClass: z.string(),
  primaryNumber: z.string().nullable(),
});
export type PartSummary = z.infer<typeof partSummarySchema>;

export const teardownPhotoSchema = z.object({
  id: z.string(),
  placeholderColor: z.string().nullable().optional(),
  urls: z.object({ thumb: z.string(), medium: z.string(), large: z.string() }),
});
export type TeardownPhoto = z.infer<typeof teardownPhotoSchema>;

export const teardownStateSchema = z.object({
  status: statusEnum,
  usableOnHand: z.number(),
  note: z.string(),
  policy: policyEnum,
  updatedAt: z.string().nullable(),
  photos: z.array(teardownPhotoSchema),
});
export type TeardownState = z.infer<typeof teardownStateSchema>;

const lineBase = z.object({
  id: z.string(),
  callout: z.string(),
  quantity: z.number(),
  notes: z.string().nullable(),
  part: partSummarySchema,
});

export const checklistLineSchema = lineBase.extend({
  uncertain: z.array(z.string()).nullable().optional(),
  teardown: teardownStateSchema,
  needed: z.number(),
});
export type ChecklistLine = z.infer<typeof checklistLineSchema>;

export const checklistReply = z.object({
  vehicleId: z.string(),
  serial: z.string(),
  assembly: z.object({ id: z.string(), code: z.string(), name: z.string(), description: z.string().nullable().optional() }),
  system: z.object({ slug: z.string(), name: z.string() }),
  parent: z.object({ id: z.string(), code: z.string(), name: z.string() }).nullable(),
  children: z.array(z.object({ id: z.string(), code: z.string(), name: z.string() })),
  cautions: z.array(z.object({ code: z.string(), text: z.string() })),
  excluded: z.array(z.object({ line: lineBase, reasons: z.array(z.string()) })),
  progress: progressSchema,
  vehicleProgress: progressSchema,
  lines: z.array(checklistLineSchema),
});
export type Checklist = z.infer<typeof checklistReply>;

export const teardownUpdateReply = z.object({ bomLineId: z.string(), teardown: teardownStateSchema, needed: z.number() });
export type TeardownUpdateReply = z.infer<typeof teardownUpdateReply>;

export const photosReply = z.object({ bomLineId: z.string(), photos: z.array(teardownPhotoSchema) });

// ---- log ----

export const logEntrySchema = z.object({
  id: z.string(),
  text: z.string(),
  at: z.string(),
  bomLineId: z.string().nullable(),
  author: z.string().nullable().optional(),
});
export type LogEntry = z.infer<typeof logEntrySchema>;
export const logReply = z.object({ entries: z.array(logEntrySchema) });
export const logEntryReply = z.object({ entry: logEntrySchema });

// ---- needs ----

export const needSourceSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('teardown'),
    bomLineId: z.string(),
    assembly: z.object({ id: z.string(), code: z.string(), name: z.string() }),
    callout: z.string(),
    status: z.enum(['replace', 'missing', 'wrong_part']),
    quantity: z.number(),
    note: z.string(),
  }),
  z.object({ kind: z.literal('manual'), wantId: z.string(), quantity: z.number(), note: z.string() }),
]);
export type NeedSource = z.infer<typeof needSourceSchema>;

export const needSchema = z.object({
  needId: z.string(),
  part: z.object({ id: z.string(), name: z.string(), primaryNumber: z.string().nullable(), category: z.string() }),
  policy: policyEnum,
  quantity: z.number(),
  sources: z.array(needSourceSchema),
});
export type Need = z.infer<typeof needSchema>;

export const needsReply = z.object({
  vehicleId: z.string(),
  serial: z.string(),
  needs: z.array(needSchema),
  notInspectedLines: z.number(),
  totalUnits: z.number(),
});
export type NeedsList = z.infer<typeof needsReply>;

export const wantReply = z.object({
  want: z.object({ id: z.string(), partId: z.string(), quantity: z.number(), policy: policyEnum, note: z.string(), createdAt: z.string() }),
});

/** GET /api/parts/resolve, only what the want form needs. */
export const resolveReply = z.object({
  matches: z.array(z.object({ partId: z.string(), number: z.string(), matchedBy: z.string() })),
  parts: z.array(partSummarySchema),
});

// ---- sourcing plan ----

export const planItemSchema = z.object({
  needId: z.string(),
  listingId: z.string(),
  title: z.string(),
  condition: z.string(),
  partId: z.string().nullable(),
  partNumber: z.string().nullable(),
  forPart: z.object({ id: z.string(), primaryNumber: z.string().nullable(), name: z.string() }),
  substitute: z.object({ interchange: z.string(), conditions: z.array(z.string()) }).nullable(),
  quantity: z.number(),
  unitPriceCents: z.number(),
  lineCents: z.number(),
});
export type PlanItem = z.infer<typeof planItemSchema>;

export const unfilledSchema = z.object({
  needId: z.string(),
  part: z.object({ id: z.string(), name: z.string(), primaryNumber: z.string().nullable() }),
  policy: policyEnum,
  requested: z.number(),
  filled: z.number(),
  missing: z.number(),
  reason: z.string(),
  detail: z.string(),
});
export type UnfilledNeed = z.infer<typeof unfilledSchema>;

export const planReply = z.object({
  vehicleId: z.string(),
  plan: z.object({
    sellers: z.array(
      z.object({
        seller: z.object({ id: z.string(), name: z.string() }),
        items: z.array(planItemSchema),
        itemsCents: z.number(),
        shippingCents: z.number(),
        shipments: z.array(z.object({ profileName: z.string().nullable(), shippingCents: z.number(), explanation: z.string() })),
      }),
    ),
    itemsCents: z.number(),
    shippingCents: z.number(),
    totalCents: z.number(),
  }),
  unfilled: z.array(unfilledSchema),
  method: z.enum(['exact', 'heuristic']),
  optimal: z.boolean(),
  lowerBoundCents: z.number(),
  gapCents: z.number(),
  gapPercent: z.number(),
});
export type SourcingPlan = z.infer<typeof planReply>;

export const toCartReply = z.object({
  added: z.array(z.object({ listingId: z.string(), quantity: z.number() })),
  warnings: z.array(z.object({ code: z.string().optional(), message: z.string().optional() }).loose()),
  plan: planReply,
});
export type ToCartResult = z.infer<typeof toCartReply>;

// ---- alerts and notices ----

export const alertSchema = z.object({
  id: z.string(),
  part: z.object({ id: z.string(), name: z.string(), primaryNumber: z.string().nullable() }),
  number: z.string(),
  policy: policyEnum,
  maxPriceCents: z.number().nullable(),
  active: z.boolean(),
  hits: z.number(),
  createdAt: z.string(),
});
export type WantedAlert = z.infer<typeof alertSchema>;
export const alertsReply = z.object({ alerts: z.array(alertSchema) });
export const alertReply = z.object({ alert: alertSchema });

export const noticeSchema = z.object({
  id: z.string(),
  kind: z.string(),
  title: z.string(),
  body: z.string(),
  link: z.string().nullable(),
  read: z.boolean(),
  readAt: z.string().nullable(),
  createdAt: z.string(),
});
export type Notice = z.infer<typeof noticeSchema>;
export const noticesReply = z.object({ notices: z.array(noticeSchema), unreadCount: z.number() });
export type NoticesList = z.infer<typeof noticesReply>;
export const noticeReply = z.object({ notice: noticeSchema });
