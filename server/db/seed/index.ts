// Demo seed: fictional accounts and the fictional demo catalog. Idempotent: running it again changes nothing.
import { closeDb, getDb } from '../client';
import { seedAccounts } from './accounts';
import { seedCatalog } from './catalog';
import { seedListings } from './listings';

export async function seedDemo() {
  const db = getDb();
  const accounts = await seedAccounts(db);
  const catalog = await seedCatalog(db);
  const listings = await seedListings(db);
  return { accounts, catalog, listings };
}

const started = Date.now();
const r = await seedDemo();
await closeDb();
console.log(`[seed] demo data ready in ${Date.now() - started} ms (${JSON.stringify({ ...r.catalog, listings: r.listings.listings })})`);
