import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';

const migrationsFolder = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../drizzle');

/** Applies drizzle/ migrations; safe to run on every start (already applied ones are skipped). */
export async function runMigrations(databaseUrl: string) {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    // Serialise concurrent starts (several app servers) on one advisory lock.
    await client.query('SELECT pg_advisory_lock(727172)');
    await migrate(drizzle(client), { migrationsFolder });
    await client.query('SELECT pg_advisory_unlock(727172)');
  } finally {
    await client.end();
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error('DATABASE_URL is not set');
    process.exit(1);
  }
  await runMigrations(url);
  console.log('[migrate] up to date');
}
