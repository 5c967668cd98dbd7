import { z } from 'zod';

export const partNumberKinds = ['maker', 'ordnance', 'nsn', 'hardware_standard', 'vendor', 'reproduction'] as const;
export const partNumberKindLabels: Record<(typeof partNumberKinds)[number], string> = {
  maker: "Maker's number",
  ordnance: 'Ordnance number',
  nsn: 'National Stock Number',
  hardware_standard: 'Hardware standard',
  vendor: "Vendor's number",
  reproduction: "Reproduction maker's number",
};
export const interchanges = ['two_way', 'one_way', 'conditional'] as const;
export const interchangeLabels: Record<(typeof interchanges)[number], string> = {
  two_way: 'two-way interchangeable',
  one_way: 'one-way: the newer part fits where the older did, not the reverse',
  conditional: 'fits only with another change',
};
export const safetyClasses = ['brake', 'steering', 'suspension', 'none'] as const;

export const uuidParam = z.object({ id: z.uuid('Not a valid id') });
export const slugParam = z.object({ slug: z.string().regex(/^[a-z0-9-]{1,80}$/, 'Not a valid slug') });

const optionalInt = z.coerce.number().int().min(0).max(99_999_999).optional();
const isoDate = z.string().regex(/^\d{4}(-\d{2}(-\d{2})?)?$/, 'Use YYYY, YYYY-MM or YYYY-MM-DD');

export const assemblyQuery = z.object({
  serial: z.string().trim().max(40).optional(),
  buildDate: isoDate.optional(),
  variant: z.string().trim().max(40).optional(),
});

export const resolveQuery = z.object({ number: z.string().trim().min(1, 'Type a part number').max(64, 'A part number is at most 64 characters') });

export const partNumberInput = z.object({
  number: z.string().trim().min(1).max(64),
  kind: z.enum(partNumberKinds),
});

const dims = {
  weightGrams: z.number().int().min(0).max(5_000_000).optional(),
  lengthMm: z.number().int().min(0).max(20_000).optional(),
  widthMm: z.number().int().min(0).max(20_000).optional(),
  heightMm: z.number().int().min(0).max(20_000).optional(),
};

export const createPartInput = z.object({
  name: z.string().trim().min(2).max(200),
  description: z.string().trim().max(5000).default(''),
  category: z.string().trim().min(2).max(40),
  specs: z.record(z.string(), z.unknown()).default({}),
  safetyClass: z.enum(safetyClasses).optional(),
  restricted: z.boolean().optional(),
  numbers: z.array(partNumberInput).min(1, 'A part needs at least one number').max(40),
  ...dims,
});
export type CreatePartInput = z.infer<typeof createPartInput>;

export const updatePartInput = z
  .object({
    name: z.string().trim().min(2).max(200),
    description: z.string().trim().max(5000),
    category: z.string().trim().min(2).max(40),
    specs: z.record(z.string(), z.unknown()),
    safetyClass: z.enum(safetyClasses),
    restricted: z.boolean(),
    ...dims,
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Change at least one field');

/** `from` and `to` are a part number as printed or a part id. */
export const createSupersessionInput = z.object({
  from: z.string().trim().min(1).max(64),
  to: z.string().trim().min(1).max(64),
  interchange: z.enum(interchanges),
  note: z.string().trim().max(500).optional(),
  quantity: z.number().int().min(1).max(100).default(1),
}).refine((v) => v.interchange !== 'conditional' || (v.note && v.note.length > 0), { message: 'A conditional interchange needs a note saying the condition', path: ['note'] });

export const createAssemblyInput = z.object({
  vehicleSlug: z.string().min(1).max(80),
  systemSlug: z.string().min(1).max(80),
  parentId: z.uuid().nullable().optional(),
  code: z.string().trim().min(1).max(40),
  name: z.string().trim().min(2).max(200),
  description: z.string().trim().max(5000).default(''),
});
export const updateAssemblyInput = z
  .object({ code: z.string().trim().min(1).max(40), name: z.string().trim().min(2).max(200), description: z.string().trim().max(5000), parentId: z.uuid().nullable() })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Change at least one field');

const lineFields = {
  callout: z.string().trim().min(1).max(12),
  part: z.string().trim().min(1).max(64),
  quantity: z.number().int().min(1).max(1000),
  notes: z.string().trim().max(500).nullable().optional(),
  serialFrom: optionalInt.nullable(),
  serialTo: optionalInt.nullable(),
  builtFrom: isoDate.nullable().optional(),
  builtTo: isoDate.nullable().optional(),
  variants: z.array(z.string().trim().min(1).max(40)).max(20).nullable().optional(),
};
export const createLineInput = z.object({ assemblyId: z.uuid(), ...lineFields });
export const updateLineInput = z
  .object(lineFields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Change at least one field');
