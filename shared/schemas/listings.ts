import { z } from 'zod';
import { cleanQueryText } from './text';

/*
 * Listing inputs shared by the seller's form (react-hook-form resolver) and the server's validation.
 * The code lists repeat server/domain/conditions.ts and listing-states.ts, because shared/ imports zod only;
 * a unit test beside this file checks that the two stay equal.
 */

export const listingConditionCodes = ['nos', 'nors', 'used_original', 'rebuilt', 'reproduction', 'core'] as const;
export const usedGradeCodes = ['ready', 'honest', 'weathered', 'hard_used', 'donor'] as const;
export const rubberUseCodes = ['serviceable', 'display_only'] as const;
export const listingStateCodes = ['draft', 'submitted', 'approved', 'changes_requested', 'rejected', 'sold_out', 'withdrawn'] as const;
export const descriptionFormats = ['plain', 'markdown'] as const;
export type ListingStateCode = (typeof listingStateCodes)[number];

/** Hard limits; the photo ones match server/lib/photos/pipeline.ts. */
export const LISTING_LIMITS = {
  titleMax: 140,
  descriptionMax: 10_000,
  /** An unidentified part is described in words: this many characters at least, so an administrator can link it. */
  unidentifiedDescriptionMin: 20,
  quantityMax: 9_999,
  /** $1,000,000.00 */
  priceCentsMax: 100_000_000,
  weightGramsMax: 5_000_000,
  dimensionMmMax: 20_000,
  photosMax: 12,
  photoBytesMax: 15 * 1024 * 1024,
  importRowsMax: 1_000,
  importBytesMax: 2 * 1024 * 1024,
} as const;

const L = LISTING_LIMITS;
const cents = z.number().int('Give the price in whole cents').min(1, 'The price must be at least 1 cent').max(L.priceCentsMax);
const grams = z.number().int().min(0).max(L.weightGramsMax);
const mm = z.number().int().min(0).max(L.dimensionMmMax);

const listingFields = {
  /** A catalog part picked by number search; null for an unidentified part described in words. */
  partId: z.uuid('Not a valid part id').nullable(),
  title: z.string().trim().min(3, 'Give a title of at least 3 characters').max(L.titleMax),
  condition: z.enum(listingConditionCodes),
  /** Required for used originals, refused for every other condition. */
  usedGrade: z.enum(usedGradeCodes).nullable(),
  /** For hydraulic brake rubber: old rubber may only be offered as display / authenticity only. */
  rubberUse: z.enum(rubberUseCodes).nullable(),
  makersMarks: z.boolean(),
  quantity: z.number().int().min(0).max(L.quantityMax),
  priceCents: cents,
  /** Omitted or null: taken from the catalog part (0 for an unidentified part). */
  weightGrams: grams.nullable(),
  lengthMm: mm.nullable(),
  widthMm: mm.nullable(),
  heightMm: mm.nullable(),
  shippingProfileId: z.uuid('Not a valid shipping profile id').nullable(),
  description: z.string().max(L.descriptionMax),
  descriptionFormat: z.enum(descriptionFormats),
};

function gradeRule(v: { condition?: string; usedGrade?: string | null }, ctx: z.RefinementCtx) {
  if (v.condition === undefined) return;
  if (v.condition === 'used_original' && v.usedGrade == null) {
    ctx.addIssue({ code: 'custom', path: ['usedGrade'], message: 'Used originals need a grade' });
  }
  if (v.condition !== 'used_original' && v.usedGrade != null) {
    ctx.addIssue({ code: 'custom', path: ['usedGrade'], message: 'Grades apply only to used originals' });
  }
}

export const createListingInput = z
  .object({
    ...listingFields,
    partId: listingFields.partId.default(null),
    usedGrade: listingFields.usedGrade.default(null),
    rubberUse: listingFields.rubberUse.default(null),
    makersMarks: listingFields.makersMarks.default(false),
    quantity: z.number().int().min(1, 'List at least one').max(L.quantityMax),
    weightGrams: listingFields.weightGrams.optional(),
    lengthMm: listingFields.lengthMm.optional(),
    widthMm: listingFields.widthMm.optional(),
    heightMm: listingFields.heightMm.optional(),
    shippingProfileId: listingFields.shippingProfileId.default(null),
    description: listingFields.description.default(''),
    descriptionFormat: listingFields.descriptionFormat.default('plain'),
  })
  .strict()
  .superRefine((v, ctx) => {
    gradeRule(v, ctx);
    if (v.partId === null && v.description.trim().length < L.unidentifiedDescriptionMin) {
      ctx.addIssue({
        code: 'custom',
        path: ['description'],
        message: `Pick the part from the catalog, or describe it in at least ${L.unidentifiedDescriptionMin} characters (markings, size, where it came from)`,
      });
    }
  });
export type CreateListingInput = z.input<typeof createListingInput>;
export type CreateListing = z.output<typeof createListingInput>;

/** Partial edit; the grade rule is checked on the merged listing by the server (condition and grade may change apart). */
export const updateListingInput = z
  .object(listingFields)
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type UpdateListingInput = z.input<typeof updateListingInput>;
export type UpdateListing = z.output<typeof updateListingInput>;

export const myListingsSorts = ['updated', '-updated', 'created', '-created', 'price', '-price', 'title', '-title', 'quantity', '-quantity'] as const;
export const myListingsQuery = z.object({
  state: z.enum(listingStateCodes).optional(),
  q: z.string().max(100).transform(cleanQueryText).optional(),
  sort: z.enum(myListingsSorts).default('-updated'),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});

export const publicListingsQuery = z.object({
  /** One or more catalog part ids, comma separated. */
  partId: z
    .string()
    .transform((s) => s.split(',').map((x) => x.trim()).filter(Boolean))
    .pipe(z.array(z.uuid('Not a valid part id')).min(1).max(50)),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

export const photoOrderInput = z.object({ photoIds: z.array(z.uuid()).min(1).max(L.photosMax) });

// --- administrator --------------------------------------------------------------------------------

export const listingFlagCodes = ['rubber_brake_serviceable', 'rubber_rebuilt_confirm', 'restricted_category', 'price_outlier', 'photo_reused', 'new_seller'] as const;
export const listingDecisions = ['approve', 'request-changes', 'reject'] as const;

export const listingDecisionInput = z
  .object({
    decision: z.enum(listingDecisions),
    message: z.string().trim().max(2000).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.decision !== 'approve' && (v.message ?? '').length < 5) {
      ctx.addIssue({
        code: 'custom',
        path: ['message'],
        message: v.decision === 'reject' ? 'Give the seller the reason for rejecting' : 'Tell the seller what to change',
      });
    }
  });
export type ListingDecisionInput = z.infer<typeof listingDecisionInput>;

export const adminListingsQuery = z.object({
  state: z.enum(listingStateCodes).default('submitted'),
  /** Only listings carrying this flag; "none" for listings without any flag. */
  flag: z.union([z.enum(listingFlagCodes), z.literal('none')]).optional(),
  sellerId: z.uuid().optional(),
  /** Waiting at least this many hours (since submission, or last change for other states). */
  minAgeHours: z.coerce.number().int().min(0).max(100_000).optional(),
  maxAgeHours: z.coerce.number().int().min(0).max(100_000).optional(),
  sort: z.enum(['oldest', 'newest']).default('oldest'),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});

export const bulkApproveInput = z.object({ ids: z.array(z.uuid()).min(1).max(200) });
export const linkPartInput = z.object({ partId: z.uuid('Not a valid part id') });

// --- shop and shipping -----------------------------------------------------------------------------

const country = z.string().trim().toUpperCase().regex(/^[A-Z]{2}$/, 'Use a two-letter country code such as US');

export const shopProfileInput = z.object({
  shopName: z.string().trim().min(2).max(80),
  location: z.string().trim().max(120).default(''),
  country: country.default('US'),
  /** Countries the shop ships to (ISO 3166-1 alpha-2); may be empty for pickup only. */
  shipsTo: z.array(country).max(250).default(['US']),
  pickupAtShows: z.boolean().default(false),
  showsNote: z.string().trim().max(500).default(''),
  returnPolicy: z.string().trim().max(2000).default(''),
});
export type ShopProfileInput = z.input<typeof shopProfileInput>;

/** The rules themselves are validated by the server's shipping schema (server/domain/shipping.ts). */
export const shippingProfileInput = z.object({
  name: z.string().trim().min(2).max(80),
  rules: z.record(z.string(), z.unknown()),
  isDefault: z.boolean().default(false),
});
export const updateShippingProfileInput = z
  .object({ name: shippingProfileInput.shape.name, rules: shippingProfileInput.shape.rules, isDefault: z.boolean() })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });

// --- CSV bulk import -------------------------------------------------------------------------------

/** Our fields a CSV column can be mapped to, in template order. */
export const importFields = [
  { name: 'part_number', label: 'Part number (empty for an unidentified part)', required: false },
  { name: 'title', label: 'Title', required: true },
  { name: 'condition', label: 'Condition (nos, nors, used_original, rebuilt, reproduction, core)', required: true },
  { name: 'used_grade', label: 'Grade for used originals (ready, honest, weathered, hard_used, donor)', required: false },
  { name: 'rubber_use', label: 'Rubber use (serviceable, display_only)', required: false },
  { name: 'makers_marks', label: "Maker's marks present (yes/no)", required: false },
  { name: 'quantity', label: 'Quantity', required: true },
  { name: 'price', label: 'Price in dollars, e.g. 42.50', required: true },
  { name: 'weight_grams', label: 'Weight in grams (empty: from the part)', required: false },
  { name: 'length_mm', label: 'Length in mm', required: false },
  { name: 'width_mm', label: 'Width in mm', required: false },
  { name: 'height_mm', label: 'Height in mm', required: false },
  { name: 'shipping_profile', label: 'Shipping profile name (empty: your default)', required: false },
  { name: 'description', label: 'Description', required: false },
  { name: 'description_format', label: 'Description format (plain, markdown)', required: false },
] as const;
export type ImportField = (typeof importFields)[number]['name'];
export const importFieldNames = importFields.map((f) => f.name) as unknown as readonly [ImportField, ...ImportField[]];

/** Our field -> the CSV header it is read from (null: not mapped). Omitted fields keep the suggested mapping. */
export const importMapping = z.partialRecord(z.enum(importFieldNames), z.string().max(200).nullable());
export type ImportMapping = z.infer<typeof importMapping>;

export const importPreviewInput = z.object({
  csv: z.string().min(1, 'The CSV file is empty').max(L.importBytesMax, 'The CSV file may be at most 2 MB'),
  mapping: importMapping.optional(),
});
export const importCommitInput = importPreviewInput.extend({
  as: z.enum(['draft', 'submitted']).default('draft'),
  /** Import the valid rows and skip the others; otherwise any invalid row stops the whole import. */
  skipInvalid: z.boolean().default(false),
});
