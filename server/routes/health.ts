import { Router } from 'express';
import { getPool } from '../db/client';
import { publicRoute } from '../auth/require-role';

export const healthRouter = Router();

healthRouter.get('/', publicRoute, async (_req, res) => {
  let db = false;
  try {
    const r = await Promise.race([
      getPool().query('SELECT 1 AS ok'),
      new Promise<never>((_, reject) => setTimeout(() => reject(new Error('timeout')), 1500)),
    ]);
    db = r.rows[0]?.ok === 1;
  } catch {
    db = false;
  }
  res.status(db ? 200 : 503).json({ ok: db, db: db ? 'up' : 'down', ...(db ? {} : { message: 'The database is not reachable' }) });
});
