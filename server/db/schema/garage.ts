import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, pgTable, primaryKey, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { users } from './auth';
import { bomLines, parts, vehicleModels } from './catalog';
import { listings } from './listings';
import { createdAt, id, ts, updatedAt } from './columns';

export const originalityTargets = ['as_built', 'period_correct', 'usable_driver'] as const;
export const teardownStatuses = ['not_inspected', 'reuse', 'refurbish', 'replace', 'missing', 'wrong_part'] as const;
export const conditionPolicies = ['originals_only', 'nos_only', 'reproduction_ok', 'any'] as const;

/** A restorer's own vehicle: its serial, build date and variant filter the catalog to what applies. */
export const garageVehicles = pgTable(
  'garage_vehicles',
  {
    id: id(),
    ownerId: uuid('owner_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    vehicleModelId: uuid('vehicle_model_id').notNull().references(() => vehicleModels.id),
    nickname: text('nickname').notNull().default(''),
    serialPrinted: text('serial_printed').notNull().default(''),
    serialNumber: integer('serial_number'),
    buildDate: text('build_date'),
    variant: text('variant'),
    originalityTarget: text('originality_target', { enum: originalityTargets }).notNull().default('as_built'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('garage_vehicles_owner_idx').on(t.ownerId)],
);

/** One bill-of-materials line of one vehicle's teardown. */
export const teardownItems = pgTable(
  'teardown_items',
  {
    id: id(),
    garageVehicleId: uuid('garage_vehicle_id').notNull().references(() => garageVehicles.id, { onDelete: 'cascade' }),
    bomLineId: uuid('bom_line_id').notNull().references(() => bomLines.id, { onDelete: 'cascade' }),
    status: text('status', { enum: teardownStatuses }).notNull().default('not_inspected'),
    usableOnHand: integer('usable_on_hand').notNull().default(0),
    policy: text('policy', { enum: conditionPolicies }).notNull().default('any'),
    note: text('note').notNull().default(''),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('teardown_items_vehicle_line').on(t.garageVehicleId, t.bomLineId), check('teardown_usable_nonneg', sql`${t.usableOnHand} >= 0`)],
);

export const teardownPhotos = pgTable('teardown_photos', {
  id: id(),
  teardownItemId: uuid('teardown_item_id').notNull().references(() => teardownItems.id, { onDelete: 'cascade' }),
  thumbKey: text('thumb_key').notNull(),
  mediumKey: text('medium_key').notNull(),
  largeKey: text('large_key').notNull(),
  placeholderColor: text('placeholder_color').notNull(),
  createdAt: createdAt(),
});

/** The dated log of notes a restorer keeps during the teardown. */
export const teardownLog = pgTable(
  'teardown_log',
  {
    id: id(),
    garageVehicleId: uuid('garage_vehicle_id').notNull().references(() => garageVehicles.id, { onDelete: 'cascade' }),
    teardownItemId: uuid('teardown_item_id').references(() => teardownItems.id, { onDelete: 'set null' }),
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    text: text('text').notNull(),
    at: createdAt(),
  },
  (t) => [index('teardown_log_vehicle_idx').on(t.garageVehicleId, t.at)],
);

/** Wants added by hand to a vehicle's needs list. */
export const wants = pgTable('wants', {
  id: id(),
  garageVehicleId: uuid('garage_vehicle_id').notNull().references(() => garageVehicles.id, { onDelete: 'cascade' }),
  partId: uuid('part_id').notNull().references(() => parts.id),
  quantity: integer('quantity').notNull(),
  policy: text('policy', { enum: conditionPolicies }).notNull().default('any'),
  note: text('note').notNull().default(''),
  createdAt: createdAt(),
});

/** Watch a part number (supersession-aware) with a condition policy and a top price. */
export const wantedAlerts = pgTable(
  'wanted_alerts',
  {
    id: id(),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    partId: uuid('part_id').notNull().references(() => parts.id),
    numberPrinted: text('number_printed').notNull(),
    policy: text('policy', { enum: conditionPolicies }).notNull().default('any'),
    maxPriceCents: integer('max_price_cents'),
    active: boolean('active').notNull().default(true),
    createdAt: createdAt(),
  },
  (t) => [index('wanted_alerts_part_idx').on(t.partId).where(sql`${t.active}`), index('wanted_alerts_user_idx').on(t.userId)],
);

/** One row per alert and listing: the primary key makes "exactly once per listing" a database rule. */
export const alertHits = pgTable(
  'alert_hits',
  {
    alertId: uuid('alert_id').notNull().references(() => wantedAlerts.id, { onDelete: 'cascade' }),
    listingId: uuid('listing_id').notNull().references(() => listings.id, { onDelete: 'cascade' }),
    mailedAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.alertId, t.listingId] })],
);

export const notices = pgTable(
  'notices',
  {
    id: id(),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    kind: text('kind').notNull(),
    title: text('title').notNull(),
    body: text('body').notNull().default(''),
    link: text('link'),
    readAt: ts('read_at'),
    createdAt: createdAt(),
  },
  (t) => [index('notices_user_idx').on(t.userId, t.createdAt)],
);
