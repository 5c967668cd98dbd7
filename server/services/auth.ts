import { createHash, randomBytes } from 'node:crypto';
import { hash, verify } from '@node-rs/argon2';
import { and, eq, gt, gte, isNull, sql } from 'drizzle-orm';
import type { LoginInput, RegisterInput, Role } from '../../shared/schemas/auth';
import type { SessionUser } from '../auth/require-role';
import { getDb } from '../db/client';
import { authTokens, loginFailures, users } from '../db/schema/index';
import { env } from '../env';
import { AppError } from '../errors';
import { composeMail, sendMail } from '../lib/mailer';

type UserRow = typeof users.$inferSelect;

const VERIFY_TTL_MS = 48 * 3600_000;
const RESET_TTL_MS = 3600_000;
// A fixed hash to verify against when the e-mail is unknown, so timing does not reveal which accounts exist.
let dummyHash: string | undefined;

export function toSessionUser(u: UserRow): SessionUser {
  return {
    id: u.id,
    email: u.email,
    displayName: u.displayName,
    roles: u.roles as Role[],
    emailVerified: u.emailVerifiedAt !== null,
  };
}

export function hashPassword(password: string) {
  return hash(password, { memoryCost: 19456, timeCost: 2, parallelism: 1 });
}

export async function findUserById(id: string): Promise<SessionUser | null> {
  const [u] = await getDb().select().from(users).where(eq(users.id, id));
  return u ? toSessionUser(u) : null;
}

function newToken() {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: createHash('sha256').update(token).digest('hex') };
}

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

async function issueToken(userId: string, purpose: 'verify_email' | 'reset_password') {
  const { token, tokenHash } = newToken();
  const ttl = purpose === 'verify_email' ? VERIFY_TTL_MS : RESET_TTL_MS;
  await getDb().insert(authTokens).values({ userId, purpose, tokenHash, expiresAt: new Date(Date.now() + ttl) });
  return token;
}

/** Marks a token used and returns its user, in one statement so a token works exactly once. */
async function consumeToken(token: string, purpose: 'verify_email' | 'reset_password'): Promise<string> {
  const [row] = await getDb()
    .update(authTokens)
    .set({ usedAt: new Date() })
    .where(and(eq(authTokens.tokenHash, hashToken(token)), eq(authTokens.purpose, purpose), isNull(authTokens.usedAt), gt(authTokens.expiresAt, new Date())))
    .returning({ userId: authTokens.userId });
  if (!row) throw new AppError(400, 'validation_failed', 'This link is invalid, already used or expired. Ask for a new one.');
  return row.userId;
}

async function sendVerification(user: { id: string; email: string; displayName: string }) {
  const token = await issueToken(user.id, 'verify_email');
  const url = `${env().APP_ORIGIN}/verify-email?token=${token}`;
  await sendMail(
    composeMail({
      to: user.email,
      subject: 'Confirm your e-mail address for Drabyard',
      greeting: `Hello ${user.displayName},`,
      paragraphs: ['Please confirm this address so sellers and buyers can reach you. The link works once and for 48 hours.'],
      action: { label: 'Confirm my address', url },
    }),
  );
}

export async function register(input: RegisterInput): Promise<SessionUser> {
  const db = getDb();
  const passwordHash = await hashPassword(input.password);
  const [row] = await db
    .insert(users)
    .values({ email: input.email, passwordHash, displayName: input.displayName })
    .onConflictDoNothing()
    .returning();
  if (!row) {
    throw new AppError(409, 'conflict', 'An account with this e-mail already exists. Sign in or reset your password.', {
      fieldErrors: { email: ['An account with this e-mail already exists'] },
    });
  }
  await sendVerification(row);
  return toSessionUser(row);
}

export async function resendVerification(userId: string) {
  const [u] = await getDb().select().from(users).where(eq(users.id, userId));
  if (!u || u.emailVerifiedAt) return;
  await sendVerification(u);
}

export async function verifyEmail(token: string): Promise<SessionUser> {
  const userId = await consumeToken(token, 'verify_email');
  const [u] = await getDb()
    .update(users)
    .set({ emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, now())` })
    .where(eq(users.id, userId))
    .returning();
  return toSessionUser(u);
}

export async function requestPasswordReset(email: string) {
  const [u] = await getDb().select().from(users).where(eq(users.email, email));
  if (!u) return; // same reply either way: no account discovery
  const token = await issueToken(u.id, 'reset_password');
  await sendMail(
    composeMail({
      to: u.email,
      subject: 'Reset your Drabyard password',
      greeting: `Hello ${u.displayName},`,
      paragraphs: ['Someone asked to reset the password of this account. If it was not you, ignore this mail.', 'The link works once and for one hour.'],
      action: { label: 'Choose a new password', url: `${env().APP_ORIGIN}/reset-password?token=${token}` },
    }),
  );
}

export async function resetPassword(token: string, password: string) {
  const userId = await consumeToken(token, 'reset_password');
  const passwordHash = await hashPassword(password);
  const db = getDb();
  await db.update(users).set({ passwordHash }).where(eq(users.id, userId));
  // A reset signs every other session out: a stolen session must not outlive the new password.
  await db.execute(sql`DELETE FROM "session" WHERE sess->'passport'->>'user' = ${userId}`);
  await db.delete(loginFailures).where(eq(loginFailures.email, (await db.select({ e: users.email }).from(users).where(eq(users.id, userId)))[0].e));
}

/** Checks e-mail and password, throttled per e-mail and per address in PostgreSQL. */
export async function authenticate(input: LoginInput, ip: string): Promise<SessionUser | null> {
  const db = getDb();
  const { LOGIN_MAX_FAILURES: max, LOGIN_MAX_FAILURES_PER_IP: maxIp, LOGIN_WINDOW_MINUTES: minutes } = env();
  const since = new Date(Date.now() - minutes * 60_000);
  const [{ byEmail, byIp }] = await db
    .select({
      byEmail: sql<number>`count(*) filter (where ${loginFailures.email} = ${input.email})`.mapWith(Number),
      byIp: sql<number>`count(*) filter (where ${loginFailures.ip} = ${ip})`.mapWith(Number),
    })
    .from(loginFailures)
    .where(and(gte(loginFailures.at, since), sql`(${loginFailures.email} = ${input.email} or ${loginFailures.ip} = ${ip})`));
  if (byEmail >= max || byIp >= maxIp) {
    throw new AppError(429, 'rate_limited', `Too many failed sign-ins. Try again in ${minutes} minutes or reset your password.`, undefined, {
      'Retry-After': String(minutes * 60),
    });
  }
  const [u] = await db.select().from(users).where(eq(users.email, input.email));
  dummyHash ??= await hashPassword('not-a-real-password-0000');
  const ok = await verify(u?.passwordHash ?? dummyHash, input.password).catch(() => false);
  if (!u || !ok) {
    await db.insert(loginFailures).values({ email: input.email, ip });
    return null;
  }
  await db.delete(loginFailures).where(eq(loginFailures.email, input.email));
  return toSessionUser(u);
}
