import { sql } from 'drizzle-orm';
import { check, customType, index, json, jsonb, pgTable, text, timestamp, uniqueIndex, uuid, varchar } from 'drizzle-orm/pg-core';
import { createdAt, id, ts, updatedAt } from './columns';

const citext = customType<{ data: string }>({ dataType: () => 'citext' });

export const users = pgTable(
  'users',
  {
    id: id(),
    email: citext('email').notNull(),
    passwordHash: text('password_hash').notNull(),
    displayName: varchar('display_name', { length: 80 }).notNull(),
    roles: text('roles').array().notNull().default(sql`'{buyer}'::text[]`),
    emailVerifiedAt: ts('email_verified_at'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('users_email_key').on(t.email),
    check('users_roles_known', sql`${t.roles} <@ ARRAY['buyer','seller','admin']::text[]`),
  ],
);

/** Single-use, expiring tokens for e-mail verification and password reset; only a hash is stored. */
export const authTokens = pgTable(
  'auth_tokens',
  {
    id: id(),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    purpose: text('purpose', { enum: ['verify_email', 'reset_password'] }).notNull(),
    tokenHash: text('token_hash').notNull(),
    expiresAt: ts('expires_at').notNull(),
    usedAt: ts('used_at'),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('auth_tokens_hash_key').on(t.tokenHash), index('auth_tokens_user_idx').on(t.userId, t.purpose)],
);

/** Failed sign-ins, for throttling across every app server (kept in PostgreSQL, not in memory). */
export const loginFailures = pgTable(
  'login_failures',
  {
    id: id(),
    email: citext('email').notNull(),
    ip: text('ip').notNull(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('login_failures_email_idx').on(t.email, t.at), index('login_failures_ip_idx').on(t.ip, t.at)],
);

export const sellerApplications = pgTable(
  'seller_applications',
  {
    id: id(),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    businessName: varchar('business_name', { length: 120 }).notNull(),
    location: varchar('location', { length: 120 }).notNull(),
    whatTheySell: text('what_they_sell').notNull(),
    state: text('state', { enum: ['pending', 'approved', 'rejected'] }).notNull().default('pending'),
    decisionNote: text('decision_note'),
    decidedBy: uuid('decided_by').references(() => users.id),
    decidedAt: ts('decided_at'),
    createdAt: createdAt(),
  },
  (t) => [
    index('seller_applications_state_idx').on(t.state, t.createdAt),
    uniqueIndex('seller_applications_one_pending').on(t.userId).where(sql`${t.state} = 'pending'`),
  ],
);

/** express-session rows (connect-pg-simple's layout), created by our migrations rather than at run time. */
export const sessions = pgTable(
  'session',
  {
    sid: varchar('sid').primaryKey(),
    sess: json('sess').notNull(),
    expire: timestamp('expire', { precision: 6 }).notNull(),
  },
  (t) => [index('IDX_session_expire').on(t.expire)],
);

/** Who changed what, when: every administrative or catalog change writes one row. */
export const auditLog = pgTable(
  'audit_log',
  {
    id: id(),
    actorId: uuid('actor_id').references(() => users.id, { onDelete: 'set null' }),
    action: text('action').notNull(),
    entityType: text('entity_type').notNull(),
    entityId: text('entity_id').notNull(),
    before: jsonb('before'),
    after: jsonb('after'),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('audit_log_entity_idx').on(t.entityType, t.entityId, t.at), index('audit_log_actor_idx').on(t.actorId, t.at)],
);

