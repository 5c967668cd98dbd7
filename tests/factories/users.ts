import { randomUUID } from 'node:crypto';
import type { Express } from 'express';
import request from 'supertest';
import { getDb } from '../../server/db/client';
import { users } from '../../server/db/schema/index';
import { hashPassword } from '../../server/services/auth';
import type { Role } from '../../shared/schemas/auth';

export const ORIGIN = 'http://localhost:3000';
export const TEST_PASSWORD = 'correct-horse-battery';
let cachedHash: string | undefined;

export function uniqueEmail(prefix = 'user') {
  return `${prefix}-${randomUUID().slice(0, 8)}@example.test`;
}

/** Inserts a user directly (fast path for tests that are not about registration). */
export async function createUser(opts: { roles?: Role[]; verified?: boolean; email?: string; displayName?: string } = {}) {
  cachedHash ??= await hashPassword(TEST_PASSWORD);
  const email = opts.email ?? uniqueEmail(opts.roles?.includes('admin') ? 'admin' : opts.roles?.includes('seller') ? 'seller' : 'buyer');
  const [u] = await getDb()
    .insert(users)
    .values({
      email,
      passwordHash: cachedHash,
      displayName: opts.displayName ?? 'Test Person',
      roles: opts.roles ?? ['buyer'],
      emailVerifiedAt: opts.verified === false ? null : new Date(),
    })
    .returning();
  return { ...u, password: TEST_PASSWORD };
}

/** A supertest agent signed in as the user; every request carries our Origin like the browser does. */
export async function signIn(app: Express, user: { email: string; password: string }) {
  const agent = request.agent(app);
  const r = await agent.post('/api/auth/login').set('Origin', ORIGIN).send({ email: user.email, password: user.password });
  if (r.status !== 200) throw new Error(`sign-in failed: ${r.status} ${JSON.stringify(r.body)}`);
  return agent;
}

export async function signedInAs(app: Express, roles: Role[] = ['buyer']) {
  const user = await createUser({ roles });
  const agent = await signIn(app, user);
  return { user, agent };
}
