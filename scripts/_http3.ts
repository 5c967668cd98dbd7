import { Agent, request } from 'node:http';
import type { AddressInfo } from 'node:net';
import express from 'express';
Object.assign(process.env, { DATABASE_URL: 'postgres://postgres@127.0.0.1:54349/drabyard_bench', LOG_LEVEL: 'silent', NODE_ENV: 'test', READ_CACHE: 'on', SESSION_SECRET: 'bench-session-secret-0123456789', APP_ORIGIN: 'http://localhost:3000' });
const { searchRouter } = await import('../server/routes/search');
const { createApp } = await import('../server/app');
const { search } = await import('../server/services/search');
const { searchQuery } = await import('../shared/schemas/search');
const server_ms: number[] = [];
const bare = express();
bare.use((req, res, next) => { const t = performance.now(); res.on('finish', () => server_ms.push(performance.now() - t)); next(); });
bare.use('/api/search', searchRouter);
{
  for (let i = 0; i < 100; i++) await search(searchQuery.parse({ q: 'KV-020760-D' }));
  const xs: number[] = [];
  for (let i = 0; i < 400; i++) { const t = performance.now(); await search(searchQuery.parse({ q: 'KV-020760-D' })); xs.push(performance.now() - t); }
  xs.sort((a, b) => a - b); console.log('service p50', xs[200].toFixed(2));
}
for (const [label, app] of [['bare', bare], ['full', createApp()], ['bare', bare], ['full', createApp()]] as const) {
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const port = (server.address() as AddressInfo).port;
  const agent = new Agent({ keepAlive: true, maxSockets: 1 });
  const get = (p: string) => new Promise<number>((res, rej) => { const rq = request({ host: '127.0.0.1', port, path: p, agent }, (r) => { let n = 0; r.on('data', (c) => (n += c.length)); r.on('end', () => res(n)); }); rq.on('error', rej); rq.end(); });
  const path = '/api/search?q=KV-020760-D';
  for (let i = 0; i < 100; i++) await get(path);
  const xs: number[] = []; const c0 = process.cpuUsage();
  for (let i = 0; i < 400; i++) { const t = performance.now(); await get(path); xs.push(performance.now() - t); }
  const c = process.cpuUsage(c0); xs.sort((a, b) => a - b);
  console.log(label, 'p50', xs[200].toFixed(2), 'p95', xs[380].toFixed(2), 'cpu', ((c.user + c.system) / 400 / 1000).toFixed(2));
  if (label === 'bare') { const ys = server_ms.slice(-400).sort((a, b) => a - b); console.log('  server-side p50', ys[200].toFixed(2)); }
  agent.destroy(); server.close();
}
process.exit(0);
