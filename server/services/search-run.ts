/**
 * Runs search statements through the shared pool, optionally logging each one (text, parameters, time):
 * the benchmark uses the log to EXPLAIN the slowest statements.
 */
import { AsyncLocalStorage } from 'node:async_hooks';
import type { SQL } from 'drizzle-orm';
import { PgDialect } from 'drizzle-orm/pg-core';
import { getDb } from '../db/client';

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

export async function run<T extends Record<string, unknown>>(query: SQL): Promise<T[]> {
  const log = statementLog.getStore();
  const t = log ? performance.now() : 0;
  const r = await getDb().execute<T>(query);
  if (log) {
    const q = dialect.sqlToQuery(query);
    log.push({ sql: q.sql, params: q.params, ms: performance.now() - t });
  }
  return r.rows as T[];
}
