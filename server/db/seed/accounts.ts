import { sql } from 'drizzle-orm';
import type { Db } from '../client';
import { users } from '../schema/index';
import { hashPassword } from '../../services/auth';

/** Demo accounts (fictional people, password drabyard-demo). Created only by the demo seed, never by migrations. */
export const DEMO_PASSWORD = 'drabyard-demo';
export const DEMO_ACCOUNTS = [
  { email: 'admin@drabyard.test', displayName: 'Ada Quartermain (demo admin)', roles: ['buyer', 'admin'] },
  { email: 'seller@drabyard.test', displayName: 'Hollow Creek Salvage (demo seller)', roles: ['buyer', 'seller'], shop: { businessName: 'Hollow Creek Salvage', location: 'Marlow Flats, Ohio, US', whatTheySell: 'Used original brake and steering parts pulled from parts trucks; NOS hardware.' } },
  { email: 'seller2@drabyard.test', displayName: 'Bramble & Sons Reproductions (demo seller)', roles: ['buyer', 'seller'], shop: { businessName: 'Bramble & Sons Reproductions', location: 'Kettering Vale, Ontario, CA', whatTheySell: 'Reproduction hoses, lines, clamps and rebuilt cylinders.' } },
  { email: 'buyer@drabyard.test', displayName: 'Rowan Pike (demo restorer)', roles: ['buyer'] },
] as const;

export async function seedAccounts(db: Db) {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const ids: Record<string, string> = {};
  for (const a of DEMO_ACCOUNTS) {
    const [row] = await db
      .insert(users)
      .values({ email: a.email, displayName: a.displayName, passwordHash, roles: [...a.roles], emailVerifiedAt: new Date('2026-01-05T09:00:00Z') })
      .onConflictDoUpdate({ target: users.email, set: { roles: [...a.roles], displayName: a.displayName } })
      .returning({ id: users.id });
    ids[a.email] = row.id;
    if ('shop' in a) {
      await db.execute(sql`
        INSERT INTO seller_applications (user_id, business_name, location, what_they_sell, state, decided_at)
        SELECT ${row.id}, ${a.shop.businessName}, ${a.shop.location}, ${a.shop.whatTheySell}, 'approved', now()
        WHERE NOT EXISTS (SELECT 1 FROM seller_applications WHERE user_id = ${row.id})`);
    }
  }
  return ids;
}
