// Orchestrates the three everyday commands. `start`: local PostgreSQL, migrations, demo seed, mail and Stripe
// stand-ins, client build, app on http://localhost:3000. `dev`: the same with Vite's dev server and the API in
// watch mode. `test`: a fresh test database, then typecheck, lint, build and every vitest project, ending with
// one plain summary line.
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { runMigrations } from '../server/db/migrate';
import { startMailFake, type MailFake } from '../docker-free-fakes/mail/mail-fake';
import { dropDatabase, ensureCluster, ensureDatabase, type Cluster } from './postgres';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const mode = process.argv[2] ?? 'start';
const bin = (name: string) => path.join(root, 'node_modules', '.bin', name);
const say = (m: string) => console.log(`[drabyard] ${m}`);

type StripeFake = { url: string; port: number; close: () => Promise<void> };

async function startStripe(port: number, webhookUrl: string, secret: string): Promise<StripeFake | null> {
  const modPath = path.join(root, 'docker-free-fakes', 'stripe', 'app.ts');
  if (!existsSync(modPath)) return null;
  const mod = (await import(modPath)) as { startStripeFake: (o: Record<string, unknown>) => Promise<StripeFake> };
  return mod.startStripeFake({ port, webhookUrl, webhookSecret: secret });
}

async function provision(kind: 'app' | 'test') {
  const test = kind === 'test';
  let cluster: Cluster | null = null;
  let databaseUrl: string;
  if (process.env.DATABASE_URL) {
    // A managed server or an existing cluster: same code path, no local cluster.
    databaseUrl = process.env.DATABASE_URL;
    if (test) {
      const u = new URL(databaseUrl);
      u.pathname = `/${u.pathname.slice(1)}_test_${process.pid}`;
      databaseUrl = u.toString();
    }
    say(`using DATABASE_URL (${new URL(databaseUrl).host})`);
  } else {
    const port = Number(test ? (process.env.DRABYARD_TEST_PG_PORT ?? 54339) : (process.env.DRABYARD_PG_PORT ?? 54329));
    cluster = await ensureCluster({ dataDir: path.join(root, '.data', test ? 'pg-test' : 'pg'), port, fast: test });
    // Each test run gets its own fresh database, so runs side by side never disturb each other.
    databaseUrl = cluster.adminUrl(test ? `drabyard_test_${process.pid}` : 'drabyard');
  }
  await ensureDatabase(databaseUrl, { fresh: test });
  await runMigrations(databaseUrl);
  say('migrations applied');
  return { cluster, databaseUrl };
}

/** Runs a step as a child process without blocking this process, which hosts the stand-ins meanwhile. */
function runStep(label: string, cmd: string, args: string[], env: NodeJS.ProcessEnv = process.env): Promise<boolean> {
  say(`${label}…`);
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd: root, stdio: 'inherit', env });
    child.on('exit', (code) => {
      if (code !== 0) say(`${label} FAILED (exit ${code})`);
      resolve(code === 0);
    });
  });
}

function seed(databaseUrl: string, extraEnv: NodeJS.ProcessEnv = {}) {
  return runStep('seeding demo data (idempotent)', bin('tsx'), [path.join(root, 'server', 'db', 'seed', 'index.ts')], { ...process.env, ...extraEnv, DATABASE_URL: databaseUrl });
}

/** SESSION_SECRET from the environment, or a random one kept in the git-ignored .data folder for this machine. */
function localSessionSecret(): string {
  if (process.env.SESSION_SECRET) return process.env.SESSION_SECRET;
  const file = path.join(root, '.data', 'session-secret');
  if (!existsSync(file)) {
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
  }
  return readFileSync(file, 'utf8').trim();
}

async function start(dev: boolean) {
  const { cluster, databaseUrl } = await provision('app');
  if (!(await seed(databaseUrl))) process.exit(1);
  const appPort = Number(process.env.PORT ?? 3000);
  const origin = process.env.APP_ORIGIN ?? `http://localhost:${dev ? (process.env.VITE_PORT ?? 5173) : appPort}`;
  const webhookSecret = process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_drabyard_local';
  let mail: MailFake | null = null;
  const env: NodeJS.ProcessEnv = { ...process.env, DATABASE_URL: databaseUrl, PORT: String(appPort), APP_ORIGIN: origin, SESSION_SECRET: localSessionSecret() };
  if (!process.env.SMTP_URL) {
    mail = await startMailFake({ smtpPort: Number(process.env.MAIL_FAKE_SMTP_PORT ?? 2525), httpPort: Number(process.env.MAIL_FAKE_HTTP_PORT ?? 8025) });
    env.SMTP_URL = `smtp://127.0.0.1:${mail.smtpPort}`;
    say(`mail stand-in: SMTP 127.0.0.1:${mail.smtpPort}, messages at ${mail.httpUrl}`);
  }
  let stripe: StripeFake | null = null;
  if (!process.env.STRIPE_API_HOST) {
    stripe = await startStripe(Number(process.env.STRIPE_FAKE_PORT ?? 12111), `http://127.0.0.1:${appPort}/api/webhooks/stripe`, webhookSecret);
    if (stripe) {
      Object.assign(env, { STRIPE_API_HOST: '127.0.0.1', STRIPE_API_PORT: String(stripe.port), STRIPE_API_PROTOCOL: 'http', STRIPE_WEBHOOK_SECRET: webhookSecret });
      say(`Stripe stand-in at ${stripe.url}`);
    }
  }
  const children: ChildProcess[] = [];
  if (dev) {
    env.EXTRA_ORIGINS = [origin, `http://localhost:${appPort}`].join(',');
    children.push(spawn(bin('tsx'), ['watch', '--clear-screen=false', 'server/index.ts'], { cwd: root, stdio: 'inherit', env }));
    children.push(spawn(bin('vite'), ['--host', '127.0.0.1'], { cwd: root, stdio: 'inherit', env }));
    say(`dev: open ${origin} (Vite with hot reload; API on :${appPort} in watch mode)`);
  } else {
    if (!(await runStep('building the client', bin('vite'), ['build', '--logLevel', 'warn']))) {
      await mail?.close();
      await stripe?.close();
      cluster?.stop();
      process.exit(1);
    }
    // One HTTP process per core (server/index.ts forks them; WEB_CONCURRENCY overrides).
    const webConcurrency = process.env.WEB_CONCURRENCY ?? String(os.availableParallelism());
    // node with tsx's loader (not the tsx command, whose signal relay may SIGKILL a primary still stopping its workers).
    children.push(spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { cwd: root, stdio: 'inherit', env: { ...env, NODE_ENV: process.env.NODE_ENV ?? 'production', WEB_CONCURRENCY: webConcurrency } }));
    say(`open ${origin} — demo accounts are listed in README.md (password drabyard-demo). Ctrl-C stops everything.`);
  }
  let stopping = false;
  const stopAll = async (code = 0) => {
    if (stopping) return;
    stopping = true;
    say('stopping…');
    for (const c of children) if (c.exitCode === null) c.kill('SIGTERM');
    await Promise.all(children.map((c) => (c.exitCode !== null ? null : new Promise((r) => c.once('exit', r)))));
    await mail?.close();
    await stripe?.close();
    cluster?.stop();
    process.exit(code);
  };
  for (const c of children) c.on('exit', (code) => void stopAll(code ?? 0));
  process.on('SIGINT', () => void stopAll(0));
  process.on('SIGTERM', () => void stopAll(0));
}

interface VitestJson {
  numPassedTests: number;
  numFailedTests: number;
  numPendingTests: number;
  numTodoTests: number;
  numTotalTests: number;
  success: boolean;
}

/** Browser tests need Debian's chromium, label tests poppler's pdftoppm: install them when missing (as root). */
async function ensureDebianTools() {
  const want: Array<[string, string]> = [['/usr/bin/chromium', 'chromium'], ['/usr/bin/pdftoppm', 'poppler-utils']];
  const missing = want.filter(([file]) => !existsSync(file)).map(([, pkg]) => pkg);
  if (!missing.length) return;
  if (process.getuid?.() !== 0) {
    say(`missing Debian packages: ${missing.join(' ')} — install them with: sudo apt-get install -y ${missing.join(' ')}`);
    return;
  }
  await runStep('apt-get update', 'apt-get', ['update', '-qq']);
  await runStep(`apt-get install ${missing.join(' ')}`, 'apt-get', ['install', '-y', '-qq', ...missing], { ...process.env, DEBIAN_FRONTEND: 'noninteractive' });
}

async function test() {
  const started = Date.now();
  await ensureDebianTools();
  const { cluster, databaseUrl } = await provision('test');
  // Demo photos go where the test app serves media from.
  const mediaDir = path.join(root, '.data', `media-test-${process.pid}`);
  rmSync(mediaDir, { recursive: true, force: true });
  if (!(await seed(databaseUrl, { MEDIA_DIR: mediaDir }))) {
    cluster?.stop();
    process.exit(1);
  }
  const mail = await startMailFake({ smtpPort: 0, httpPort: 0 });
  const webhookSecret = 'whsec_drabyard_test';
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: 'test',
    LOG_LEVEL: process.env.LOG_LEVEL ?? 'silent',
    DATABASE_URL: databaseUrl,
    SMTP_URL: `smtp://127.0.0.1:${mail.smtpPort}`,
    MAIL_FAKE_URL: mail.httpUrl,
    STRIPE_WEBHOOK_SECRET: webhookSecret,
    APP_ORIGIN: 'http://localhost:3000',
    MEDIA_DIR: mediaDir,
  };
  const artifacts = path.join(root, 'tests', '.artifacts');
  mkdirSync(artifacts, { recursive: true });
  const checks: Array<[string, boolean]> = [];
  // DRABYARD_QUICK=1 skips the static checks while iterating locally; CI never sets it.
  if (!process.env.DRABYARD_QUICK) {
    checks.push(['typecheck', await runStep('typecheck', bin('tsc'), ['--noEmit', '-p', 'tsconfig.json'], env)]);
    checks.push(['lint', await runStep('lint', bin('eslint'), ['-c', 'scripts/eslint.config.js', '.', '--max-warnings=0'], env)]);
    // The client is always built for production (NODE_ENV=test would bundle React's development build).
    checks.push(['build', await runStep('client build', bin('vite'), ['build', '--logLevel', 'warn'], { ...env, NODE_ENV: 'production' })]);
    checks.push(['page weight', await runStep('page-weight budget', bin('tsx'), ['scripts/check-bundle.ts'], env)]);
  }
  const report = path.join(artifacts, 'vitest.json');
  rmSync(report, { force: true });
  const extra = process.argv.slice(3);
  await runStep('vitest (unit, component, integration, e2e)', bin('vitest'), ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...extra], env);
  await mail.close();
  rmSync(mediaDir, { recursive: true, force: true });
  const { othersRunning } = await dropDatabase(databaseUrl);
  if (othersRunning === 0) cluster?.stop();
  let passed = 0;
  let failed = 0;
  let skipped = 0;
  if (existsSync(report)) {
    const r = JSON.parse(readFileSync(report, 'utf8')) as VitestJson;
    passed = r.numPassedTests;
    failed = r.numFailedTests;
    skipped = r.numPendingTests + r.numTodoTests;
    // A file that failed to load has no test results; count it as a failure so it cannot hide.
    if (!r.success && failed === 0) failed = 1;
  } else {
    failed += 1;
  }
  const failedChecks = checks.filter(([, ok]) => !ok).map(([n]) => n);
  failed += failedChecks.length;
  passed += checks.length - failedChecks.length;
  if (failedChecks.length) say(`failed checks: ${failedChecks.join(', ')}`);
  say(`finished in ${Math.round((Date.now() - started) / 1000)} s (typecheck, lint, build and page weight count as one test each)`);
  console.log(`tests: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
  process.exit(failed === 0 && passed > 0 ? 0 : 1);
}

if (mode === 'start') await start(false);
else if (mode === 'dev') await start(true);
else if (mode === 'test') await test();
else {
  console.error(`unknown mode ${mode}: use start, dev or test`);
  process.exit(2);
}
