import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import { getPool } from '../db/client';
import type { Env } from '../env';

export const SESSION_COOKIE = 'drabyard.sid';

export function sessionMiddleware(e: Env) {
  const PgStore = connectPgSimple(session);
  return session({
    name: SESSION_COOKIE,
    secret: e.SESSION_SECRET,
    store: new PgStore({ pool: getPool(), tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: e.TRUST_PROXY,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      // 'auto': Secure whenever the request came over HTTPS (directly or, with TRUST_PROXY, through a proxy).
      secure: 'auto',
      maxAge: 30 * 24 * 3600_000,
    },
  });
}
