import { mkdtempSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { describe, expect, it } from 'vitest';
import { backup, restore } from '../../scripts/db-backup';
import { ensureDatabase } from '../../scripts/postgres';

describe('backup and restore', () => {
  it('when the test database is dumped and restored into a fresh database, then the rows come back the same', async () => {
    const src = process.env.DATABASE_URL!;
    const dir = mkdtempSync(path.join(os.tmpdir(), 'drabyard-backup-'));
    const file = path.join(dir, 'db.dump');
    const target = new URL(src);
    target.pathname = `/drabyard_restore_${process.pid}`;
    try {
      backup(src, file);
      expect(statSync(file).size).toBeGreaterThan(10_000);
      await ensureDatabase(target.toString(), { fresh: true });
      restore(target.toString(), file);
      const counts = async (url: string) => {
        const c = new pg.Client({ connectionString: url });
        await c.connect();
        const r = await c.query(`SELECT (SELECT count(*) FROM users) AS users, (SELECT count(*) FROM parts) AS parts, (SELECT count(*) FROM part_numbers) AS numbers, (SELECT count(*) FROM supersessions) AS edges`);
        await c.end();
        return r.rows[0];
      };
      const before = await counts(src);
      const after = await counts(target.toString());
      expect(Number(after.parts)).toBeGreaterThan(0);
      // other test files add rows meanwhile, so the restored copy can only be behind, never ahead
      expect(Number(after.parts)).toBeLessThanOrEqual(Number(before.parts));
      expect(Number(after.numbers)).toBeGreaterThan(0);
    } finally {
      const admin = new URL(src);
      admin.pathname = '/postgres';
      const c = new pg.Client({ connectionString: admin.toString() });
      await c.connect();
      await c.query(`DROP DATABASE IF EXISTS "drabyard_restore_${process.pid}" WITH (FORCE)`);
      await c.end();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
