import { sql } from 'drizzle-orm';
import { type AnyPgColumn, boolean, check, date, index, integer, jsonb, pgTable, primaryKey, real, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, updatedAt } from './columns';

export const vehicleModels = pgTable('vehicle_models', {
  id: id(),
  slug: text('slug').notNull().unique(),
  maker: text('maker').notNull(),
  model: text('model').notNull(),
  name: text('name').notNull(),
  yearFrom: integer('year_from').notNull(),
  yearTo: integer('year_to').notNull(),
  serialPrefix: text('serial_prefix').notNull().default(''),
  serialFrom: integer('serial_from').notNull(),
  serialTo: integer('serial_to').notNull(),
  description: text('description').notNull().default(''),
  createdAt: createdAt(),
});

export const vehicleVariants = pgTable(
  'vehicle_variants',
  {
    id: id(),
    vehicleId: uuid('vehicle_id').notNull().references(() => vehicleModels.id, { onDelete: 'cascade' }),
    code: text('code').notNull(),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
  },
  (t) => [uniqueIndex('vehicle_variants_code_key').on(t.vehicleId, t.code)],
);

export const systems = pgTable('systems', {
  id: id(),
  slug: text('slug').notNull().unique(),
  name: text('name').notNull(),
  sortOrder: integer('sort_order').notNull().default(0),
});

export const assemblies = pgTable(
  'assemblies',
  {
    id: id(),
    /** Stable text key (seed and import use it to stay idempotent). */
    slug: text('slug').notNull().unique(),
    vehicleId: uuid('vehicle_id').notNull().references(() => vehicleModels.id, { onDelete: 'cascade' }),
    systemId: uuid('system_id').notNull().references(() => systems.id),
    parentId: uuid('parent_id').references((): AnyPgColumn => assemblies.id, { onDelete: 'cascade' }),
    code: text('code').notNull(),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
    diagramSvg: text('diagram_svg'),
    sortOrder: integer('sort_order').notNull().default(0),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('assemblies_vehicle_system_idx').on(t.vehicleId, t.systemId), index('assemblies_parent_idx').on(t.parentId)],
);

/** Where each callout sits on the assembly's exploded diagram (SVG user units). */
export const assemblyCallouts = pgTable(
  'assembly_callouts',
  {
    assemblyId: uuid('assembly_id').notNull().references(() => assemblies.id, { onDelete: 'cascade' }),
    callout: text('callout').notNull(),
    x: real('x').notNull(),
    y: real('y').notNull(),
  },
  (t) => [primaryKey({ columns: [t.assemblyId, t.callout] })],
);

export const safetyClasses = ['brake', 'steering', 'suspension', 'none'] as const;

export const parts = pgTable(
  'parts',
  {
    id: id(),
    seedKey: text('seed_key').unique(),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
    category: text('category').notNull(),
    specs: jsonb('specs').notNull().default({}),
    weightGrams: integer('weight_grams').notNull().default(0),
    lengthMm: integer('length_mm').notNull().default(0),
    widthMm: integer('width_mm').notNull().default(0),
    heightMm: integer('height_mm').notNull().default(0),
    safetyClass: text('safety_class', { enum: safetyClasses }).notNull().default('none'),
    restricted: boolean('restricted').notNull().default(false),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('parts_category_idx').on(t.category), check('parts_dims_nonneg', sql`${t.weightGrams} >= 0 and ${t.lengthMm} >= 0 and ${t.widthMm} >= 0 and ${t.heightMm} >= 0`)],
);

export const partNumberKinds = ['maker', 'ordnance', 'nsn', 'hardware_standard', 'vendor', 'reproduction'] as const;

/** Every number a part carries: printed form for display, normalised key and O/0 I/1-folded key for matching. */
export const partNumbers = pgTable(
  'part_numbers',
  {
    id: id(),
    partId: uuid('part_id').notNull().references(() => parts.id, { onDelete: 'cascade' }),
    printed: text('printed').notNull(),
    key: text('key').notNull(),
    folded: text('folded').notNull(),
    kind: text('kind', { enum: partNumberKinds }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('part_numbers_part_key_kind').on(t.partId, t.key, t.kind),
    index('part_numbers_key_idx').on(t.key),
    index('part_numbers_folded_idx').on(t.folded),
    index('part_numbers_key_prefix_idx').on(sql`${t.key} text_pattern_ops`),
    index('part_numbers_folded_trgm_idx').using('gin', sql`${t.folded} gin_trgm_ops`),
    // part_numbers_deletions_idx (GIN over number_key_deletions(folded), numbers one typo away) is a custom
    // migration, drizzle/0008_number_lookups.sql, as the function it indexes is.
  ],
);

export const interchanges = ['two_way', 'one_way', 'conditional'] as const;

/** "from is replaced by to". Several rows from one part form a kit; several rows into one part a consolidation. */
export const supersessions = pgTable(
  'supersessions',
  {
    id: id(),
    fromPartId: uuid('from_part_id').notNull().references(() => parts.id, { onDelete: 'cascade' }),
    toPartId: uuid('to_part_id').notNull().references(() => parts.id, { onDelete: 'cascade' }),
    interchange: text('interchange', { enum: interchanges }).notNull(),
    note: text('note'),
    quantity: integer('quantity').notNull().default(1),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('supersessions_from_to_key').on(t.fromPartId, t.toPartId),
    index('supersessions_to_idx').on(t.toPartId),
    check('supersessions_not_self', sql`${t.fromPartId} <> ${t.toPartId}`),
    check('supersessions_qty_positive', sql`${t.quantity} > 0`),
    check('supersessions_conditional_note', sql`${t.interchange} <> 'conditional' or ${t.note} is not null`),
  ],
);

/** A bill-of-materials line: callout on the diagram, part, quantity per assembly, and where it applies. */
export const bomLines = pgTable(
  'bom_lines',
  {
    id: id(),
    assemblyId: uuid('assembly_id').notNull().references(() => assemblies.id, { onDelete: 'cascade' }),
    callout: text('callout').notNull(),
    partId: uuid('part_id').notNull().references(() => parts.id),
    quantity: integer('quantity').notNull(),
    notes: text('notes'),
    serialFrom: integer('serial_from'),
    serialTo: integer('serial_to'),
    builtFrom: date('built_from'),
    builtTo: date('built_to'),
    variants: text('variants').array(),
    sortOrder: integer('sort_order').notNull().default(0),
  },
  (t) => [
    index('bom_lines_assembly_idx').on(t.assemblyId, t.sortOrder),
    index('bom_lines_part_idx').on(t.partId),
    check('bom_lines_qty_positive', sql`${t.quantity} > 0`),
    check('bom_lines_serial_order', sql`${t.serialFrom} is null or ${t.serialTo} is null or ${t.serialFrom} <= ${t.serialTo}`),
  ],
);
