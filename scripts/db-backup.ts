// `npm run db:backup [file]` and `npm run db:restore <file>`: pg_dump / pg_restore from Debian in the custom
// format, against DATABASE_URL or the local cluster that `npm start` uses.
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { ensureCluster, pgTool } from './postgres';

export function backup(databaseUrl: string, file: string) {
  mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  const r = spawnSync(pgTool('pg_dump'), ['--format=custom', '--no-owner', '--no-privileges', `--file=${file}`, databaseUrl], { stdio: ['ignore', 'inherit', 'pipe'] });
  if (r.status !== 0) throw new Error(`pg_dump failed: ${r.stderr.toString()}`);
  return file;
}

/** Restores into the database in the URL, replacing objects that exist (--clean --if-exists). */
export function restore(databaseUrl: string, file: string) {
  const r = spawnSync(pgTool('pg_restore'), ['--clean', '--if-exists', '--no-owner', '--no-privileges', '--exit-on-error', '--single-transaction', `--dbname=${databaseUrl}`, file], {
    stdio: ['ignore', 'inherit', 'pipe'],
  });
  if (r.status !== 0) throw new Error(`pg_restore failed: ${r.stderr.toString()}`);
}

async function main() {
  const [mode, fileArg] = process.argv.slice(2);
  let url = process.env.DATABASE_URL;
  if (!url) {
    const cluster = await ensureCluster({ dataDir: path.resolve('.data/pg'), port: Number(process.env.DRABYARD_PG_PORT ?? 54329) });
    url = cluster.adminUrl('drabyard');
  }
  if (mode === 'backup') {
    const file = fileArg ?? `.data/backups/drabyard-${new Date().toISOString().replace(/[:.]/g, '-')}.dump`;
    backup(url, file);
    console.log(`[backup] written ${file}`);
  } else if (mode === 'restore') {
    if (!fileArg) throw new Error('usage: npm run db:restore -- <file>');
    restore(url, fileArg);
    console.log(`[restore] ${fileArg} restored`);
  } else {
    throw new Error('usage: db-backup.ts backup [file] | restore <file>');
  }
}

if (process.argv[1]?.endsWith('db-backup.ts')) {
  main().catch((e) => {
    console.error(String(e instanceof Error ? e.message : e));
    process.exit(1);
  });
}
