import { z } from 'zod';

/*
 * Requests of the restorer's garage: vehicles, teardown checklist, log, needs list, sourcing plan,
 * wanted alerts, notices and bag-and-tag labels. Money is integer cents.
 */

export const originalityTargets = ['as_built', 'period_correct', 'usable_driver'] as const;
export type OriginalityTarget = (typeof originalityTargets)[number];
export const originalityTargetLabels: Record<OriginalityTarget, string> = {
  as_built: 'As built',
  period_correct: 'Period-correct',
  usable_driver: 'Usable driver',
};

export const teardownStatuses = ['not_inspected', 'reuse', 'refurbish', 'replace', 'missing', 'wrong_part'] as const;
export type TeardownStatus = (typeof teardownStatuses)[number];
export const teardownStatusLabels: Record<TeardownStatus, string> = {
  not_inspected: 'Not inspected',
  reuse: 'Reuse as is',
  refurbish: 'Clean and refurbish',
  replace: 'Replace',
  missing: 'Missing',
  wrong_part: 'Wrong part found',
};

export const conditionPolicies = ['originals_only', 'nos_only', 'reproduction_ok', 'any'] as const;
export type ConditionPolicy = (typeof conditionPolicies)[number];
export const conditionPolicyLabels: Record<ConditionPolicy, string> = {
  originals_only: 'Originals only',
  nos_only: 'NOS only',
  reproduction_ok: 'Reproduction acceptable',
  any: 'Any condition',
};

const uuid = z.uuid('Not a valid id');
const isoDate = z.string().trim().regex(/^\d{4}(-\d{2}(-\d{2})?)?$/, 'Use YYYY, YYYY-MM or YYYY-MM-DD');
const countryCode = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{2}$/, 'Use a two-letter country code such as US');

export const garageVehicleParams = z.object({ id: uuid });
export const garageAssemblyParams = z.object({ id: uuid, assemblyId: uuid });
export const garageLineParams = z.object({ id: uuid, bomLineId: uuid });
export const garageWantParams = z.object({ id: uuid, wantId: uuid });

export const createGarageVehicleInput = z.object({
  vehicleSlug: z.string().trim().regex(/^[a-z0-9-]{1,80}$/, 'Pick a vehicle model'),
  nickname: z.string().trim().max(80).default(''),
  serial: z.string().trim().min(1, 'Enter the serial number as stamped').max(40),
  buildDate: isoDate.nullable().optional(),
  variant: z.string().trim().max(40).nullable().optional(),
  originalityTarget: z.enum(originalityTargets),
});
export type CreateGarageVehicleInput = z.infer<typeof createGarageVehicleInput>;

export const updateGarageVehicleInput = z
  .object({
    nickname: z.string().trim().max(80),
    serial: z.string().trim().min(1, 'Enter the serial number as stamped').max(40),
    buildDate: isoDate.nullable(),
    variant: z.string().trim().max(40).nullable(),
    originalityTarget: z.enum(originalityTargets),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Change at least one field');
export type UpdateGarageVehicleInput = z.infer<typeof updateGarageVehicleInput>;

export const teardownUpdateInput = z
  .object({
    status: z.enum(teardownStatuses),
    usableOnHand: z.number().int('Use a whole number').min(0).max(10_000),
    note: z.string().trim().max(2000),
    policy: z.enum(conditionPolicies),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Change at least one field');
export type TeardownUpdateInput = z.infer<typeof teardownUpdateInput>;

export const logEntryInput = z.object({
  text: z.string().trim().min(1, 'Write something').max(4000),
  /** Ties the note to one checklist line. */
  bomLineId: uuid.optional(),
});
export type LogEntryInput = z.infer<typeof logEntryInput>;

export const wantInput = z.object({
  partId: uuid,
  quantity: z.number().int('Use a whole number').min(1).max(10_000),
  policy: z.enum(conditionPolicies).default('any'),
  note: z.string().trim().max(500).default(''),
});
export type WantInput = z.infer<typeof wantInput>;

/** DELETE /wants takes the want's id in the body or the query. */
export const wantDeleteInput = z.object({ wantId: uuid });

export const needsQuery = z.object({ format: z.enum(['json', 'csv']).default('json') });

export const planDestination = z.union([z.object({ pickup: z.literal(true) }).strict(), z.object({ country: countryCode }).strict()]);
export type PlanDestination = z.infer<typeof planDestination>;
export const planInput = z.object({ destination: planDestination });
export type PlanInput = z.infer<typeof planInput>;

export const labelLayoutIds = ['tag-50x30', 'letter-3x10', 'strip-100x40'] as const;
export type LabelLayoutId = (typeof labelLayoutIds)[number];
export const labelsQuery = z.object({
  layout: z.enum(labelLayoutIds).default('tag-50x30'),
  /** Comma-separated bill-of-materials line ids; absent: every applicable line of the assembly. */
  lines: z
    .string()
    .trim()
    .optional()
    .transform((v) => (v ? v.split(',').map((s) => s.trim()).filter(Boolean) : undefined))
    .pipe(z.array(uuid).max(500).optional()),
});

export const createAlertInput = z
  .object({
    /** The part to watch, or a number as typed (resolved to exactly one part). */
    partId: uuid.optional(),
    number: z.string().trim().min(1).max(64).optional(),
    policy: z.enum(conditionPolicies).default('any'),
    maxPriceCents: z.number().int('Use whole cents').positive().max(100_000_000).nullable().default(null),
  })
  .refine((v) => (v.partId ? 1 : 0) + (v.number ? 1 : 0) === 1, { message: 'Give either partId or number', path: ['partId'] });
export type CreateAlertInput = z.infer<typeof createAlertInput>;

export const alertParams = z.object({ id: uuid });
export const noticeParams = z.object({ id: uuid });
export const noticesQuery = z.object({
  unread: z.enum(['1', 'true', '0', 'false']).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
