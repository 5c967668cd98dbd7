import pg from 'pg';
process.env.DATABASE_URL = 'postgres://postgres@127.0.0.1:54349/drabyard_bench';
process.env.NODE_ENV = 'test';
process.env.SESSION_SECRET = 'bench-session-secret-0123456789';
const { withStatementLog, search } = await import('../server/services/search');
const { searchQuery } = await import('../shared/schemas/search');
const { closeDb } = await import('../server/db/client');
const c = new pg.Client({ connectionString: process.env.DATABASE_URL });
await c.connect();
const q = process.argv[2];
const { statements } = await withStatementLog(() => search(searchQuery.parse({ q })));
for (const st of statements) {
  if (process.argv[3] && !st.sql.includes(process.argv[3])) continue;
  const plan = await c.query({ text: `EXPLAIN (ANALYZE, BUFFERS) ${st.sql}`, values: st.params as unknown[] });
  console.log(`--- ${st.ms.toFixed(2)} ms`);
  for (const r of plan.rows) console.log(r['QUERY PLAN']);
}
await c.end(); await closeDb();
