import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, jsonb, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { users } from './auth';
import { parts } from './catalog';
import { usedGradeCodes } from '../../../shared/schemas/listings';
import { createdAt, id, ts, updatedAt } from './columns';

/** A seller's shop: shown on listings; the Stripe connected account is filled in at payout onboarding. */
export const sellerProfiles = pgTable('seller_profiles', {
  userId: uuid('user_id').primaryKey().references(() => users.id, { onDelete: 'cascade' }),
  shopName: text('shop_name').notNull(),
  location: text('location').notNull().default(''),
  country: text('country').notNull().default('US'),
  shipsTo: text('ships_to').array().notNull().default(sql`'{US}'::text[]`),
  pickupAtShows: boolean('pickup_at_shows').notNull().default(false),
  showsNote: text('shows_note').notNull().default(''),
  returnPolicy: text('return_policy').notNull().default(''),
  stripeAccountId: text('stripe_account_id'),
  payoutsEnabled: boolean('payouts_enabled').notNull().default(false),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

/** Shipping rules of a seller (validated by server/domain/shipping.ts's zod schema before they are stored). */
export const shippingProfiles = pgTable(
  'shipping_profiles',
  {
    id: id(),
    sellerId: uuid('seller_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    rules: jsonb('rules').notNull(),
    isDefault: boolean('is_default').notNull().default(false),
    createdAt: createdAt(),
  },
  (t) => [index('shipping_profiles_seller_idx').on(t.sellerId)],
);

export const listingStates = ['draft', 'submitted', 'approved', 'changes_requested', 'rejected', 'sold_out', 'withdrawn'] as const;
export const listingConditions = ['nos', 'nors', 'used_original', 'rebuilt', 'reproduction', 'core'] as const;

export const listings = pgTable(
  'listings',
  {
    id: id(),
    sellerId: uuid('seller_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    /** Null for an unidentified part described in words, until an administrator links it to the catalog. */
    partId: uuid('part_id').references(() => parts.id, { onDelete: 'set null' }),
    title: text('title').notNull(),
    condition: text('condition', { enum: listingConditions }).notNull(),
    usedGrade: text('used_grade', { enum: usedGradeCodes }),
    rubberUse: text('rubber_use', { enum: ['serviceable', 'display_only'] }),
    makersMarks: boolean('makers_marks').notNull().default(false),
    quantity: integer('quantity').notNull(),
    priceCents: integer('price_cents').notNull(),
    currency: text('currency').notNull().default('USD'),
    weightGrams: integer('weight_grams').notNull().default(0),
    lengthMm: integer('length_mm').notNull().default(0),
    widthMm: integer('width_mm').notNull().default(0),
    heightMm: integer('height_mm').notNull().default(0),
    shippingProfileId: uuid('shipping_profile_id').references(() => shippingProfiles.id, { onDelete: 'set null' }),
    descriptionMd: text('description_md').notNull().default(''),
    descriptionHtml: text('description_html').notNull().default(''),
    state: text('state', { enum: listingStates }).notNull().default('draft'),
    submittedAt: ts('submitted_at'),
    approvedAt: ts('approved_at'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('listings_seller_state_idx').on(t.sellerId, t.state),
    index('listings_part_state_idx').on(t.partId, t.state),
    index('listings_state_submitted_idx').on(t.state, t.submittedAt),
    check('listings_quantity_nonneg', sql`${t.quantity} >= 0`),
    check('listings_price_positive', sql`${t.priceCents} > 0`),
  ],
);

export const listingPhotos = pgTable(
  'listing_photos',
  {
    id: id(),
    listingId: uuid('listing_id').notNull().references(() => listings.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    thumbKey: text('thumb_key').notNull(),
    mediumKey: text('medium_key').notNull(),
    largeKey: text('large_key').notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    placeholderColor: text('placeholder_color').notNull(),
    dhash: text('dhash').notNull(),
    createdAt: createdAt(),
  },
  (t) => [index('listing_photos_listing_idx').on(t.listingId, t.position), index('listing_photos_dhash_idx').on(t.dhash)],
);

export const listingFlags = pgTable(
  'listing_flags',
  {
    id: id(),
    listingId: uuid('listing_id').notNull().references(() => listings.id, { onDelete: 'cascade' }),
    code: text('code').notNull(),
    severity: text('severity', { enum: ['block', 'review'] }).notNull(),
    message: text('message').notNull(),
    details: jsonb('details'),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('listing_flags_listing_code').on(t.listingId, t.code), index('listing_flags_code_idx').on(t.code)],
);

/** Every state change of a listing, with who made it and the message sent to the seller. */
export const listingEvents = pgTable(
  'listing_events',
  {
    id: id(),
    listingId: uuid('listing_id').notNull().references(() => listings.id, { onDelete: 'cascade' }),
    actorId: uuid('actor_id').references(() => users.id, { onDelete: 'set null' }),
    action: text('action').notNull(),
    fromState: text('from_state'),
    toState: text('to_state').notNull(),
    message: text('message'),
    at: createdAt(),
  },
  (t) => [index('listing_events_listing_idx').on(t.listingId, t.at)],
);
