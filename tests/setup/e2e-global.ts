// Browser tests: start the real app (built client + API) as its own process against the test database, and
// hand its address to the tests. The client build is made by `npm test` before vitest runs.
import { spawn, type ChildProcess } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startStripeFake, type StripeFake } from '../../docker-free-fakes/stripe/app';

let server: ChildProcess | undefined;
let stripe: StripeFake | undefined;

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

async function freePort(): Promise<number> {
  const srv = net.createServer();
  await new Promise<void>((resolve) => srv.listen(0, '127.0.0.1', resolve));
  const { port } = srv.address() as net.AddressInfo;
  await new Promise((resolve) => srv.close(resolve));
  return port;
}

export async function setup(project: TestProject) {
  // A free port unless E2E_PORT says otherwise, so runs side by side never meet each other's server.
  const port = Number(process.env.E2E_PORT ?? (await freePort()));
  const baseUrl = `http://localhost:${port}`;
  const root = path.resolve(import.meta.dirname, '../..');
  // The Stripe stand-in on a free port: its payment page sends the browser back to the app, its webhooks
  // reach the app's endpoint signed with the same secret.
  const webhookSecret = process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_drabyard_test';
  stripe = await startStripeFake({ port: 0, webhookUrl: `${baseUrl}/api/webhooks/stripe`, webhookSecret });
  const stripeEnv = { STRIPE_API_HOST: '127.0.0.1', STRIPE_API_PORT: String(stripe.port), STRIPE_API_PROTOCOL: 'http', STRIPE_WEBHOOK_SECRET: webhookSecret };
  server = spawn(path.join(root, 'node_modules/.bin/tsx'), ['server/index.ts'], {
    cwd: root,
    stdio: ['ignore', 'inherit', 'inherit'],
    env: { ...process.env, ...stripeEnv, PORT: String(port), HOST: '127.0.0.1', APP_ORIGIN: baseUrl, NODE_ENV: 'test', LOG_LEVEL: process.env.E2E_LOG_LEVEL ?? 'warn' },
  });
  await waitForHealth(baseUrl, 60_000);
  project.provide('baseUrl', baseUrl);
}

export async function teardown() {
  if (server && server.exitCode === null) {
    server.kill('SIGTERM');
    await new Promise((r) => server!.once('exit', r));
  }
  await stripe?.close();
}
