// Browser tests: start the real app (built client + API) as its own process against the test database, and
// hand its address to the tests. The client build is made by `npm test` before vitest runs.
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import type { TestProject } from 'vitest/node';

let server: ChildProcess | undefined;

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

async function waitForHealth(url: string, ms: number) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      const r = await fetch(`${url}/api/health`);
      if (r.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`app did not become healthy at ${url}`);
}

export async function setup(project: TestProject) {
  const port = Number(process.env.E2E_PORT ?? 3100);
  const baseUrl = `http://localhost:${port}`;
  const root = path.resolve(import.meta.dirname, '../..');
  server = spawn(path.join(root, 'node_modules/.bin/tsx'), ['server/index.ts'], {
    cwd: root,
    stdio: ['ignore', 'inherit', 'inherit'],
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', APP_ORIGIN: baseUrl, NODE_ENV: 'test', LOG_LEVEL: process.env.E2E_LOG_LEVEL ?? 'warn' },
  });
  await waitForHealth(baseUrl, 60_000);
  project.provide('baseUrl', baseUrl);
}

export async function teardown() {
  if (server && server.exitCode === null) {
    server.kill('SIGTERM');
    await new Promise((r) => server!.once('exit', r));
  }
}
