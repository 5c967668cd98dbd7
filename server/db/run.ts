/**
 * Runs raw statements through the shared pool, optionally logging each one (text, parameters, time): the
 * search benchmark uses the log to profile each step and to EXPLAIN the slowest statements.
 */
import { AsyncLocalStorage } from 'node:async_hooks';
import { createHash } from 'node:crypto';
import type { SQL } from 'drizzle-orm';
import { PgDialect } from 'drizzle-orm/pg-core';
import { getDb, getPool } from './client';

export interface LoggedStatement {
  sql: string;
  params: unknown[];
  ms: number;
}

const statementLog = new AsyncLocalStorage<LoggedStatement[]>();
const dialect = new PgDialect();

/** Runs fn and returns its result with every search statement it ran. */
export async function withStatementLog<T>(fn: () => Promise<T>): Promise<{ result: T; statements: LoggedStatement[] }> {
  const statements: LoggedStatement[] = [];
  const result = await statementLog.run(statements, fn);
  return { result, statements };
}

/**
 * Runs a statement. With `prepare`, it runs as a named prepared statement: each pooled connection parses and
 * plans it once (PostgreSQL then keeps a generic plan when that costs no more), which saves the planning time
 * of statements run on every search. Only for statements whose plan suits any parameters; the name carries a
 * hash of the text, so a statement built in more than one shape gets one name per shape.
 */
export async function run<T extends Record<string, unknown>>(query: SQL, opts: { prepare?: string } = {}): Promise<T[]> {
  const log = statementLog.getStore();
  const t = log ? performance.now() : 0;
  let rows: T[];
  let q: { sql: string; params: unknown[] } | undefined;
  if (opts.prepare) {
    q = dialect.sqlToQuery(query);
    const name = `${opts.prepare}_${createHash('sha1').update(q.sql).digest('hex').slice(0, 12)}`;
    rows = (await getPool().query<T>({ name, text: q.sql, values: q.params })).rows;
  } else {
    rows = (await getDb().execute<T>(query)).rows as T[];
  }
  if (log) {
    q ??= dialect.sqlToQuery(query);
    log.push({ sql: q.sql, params: q.params, ms: performance.now() - t });
  }
  return rows;
}
