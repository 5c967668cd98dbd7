// `npm run bench:load`: the app under load on this machine. Provisions its own database (drabyard_load on the
// private bench cluster) with the demo data, starts the app as `npm start` runs it (production, one HTTP process
// per core) with the mail and Stripe stand-ins, and then:
//   1. a per-endpoint sample, sequential (what each costs alone);
//   2. a warm-up of the paced mix, not measured (BENCH_WARMUP_SECONDS, 15);
//   3. the target run: 200 autocannon connections of mixed browsing, search and part pages for 60 s
//      (BENCH_SECONDS) offering 560 req/s in all (BENCH_RATE), spread evenly over time, while 20 buyers check out
//      over and over (BENCH_CHECKOUT_BUYERS); throughput, p50/p95/p99 and errors against the targets;
//   4. a saturation run for the record (BENCH_SATURATION_SECONDS, 20): every connection asks again as soon as it
//      is answered, which finds the ceiling (latency there is queueing: Little's law);
//   5. a race of 200 buyers for a listing of 5 units.
// BENCH_APP_NODE_ARGS="--cpu-prof --cpu-prof-dir=DIR" profiles the app; BENCH_TIMELINE=1 prints latency per 2 s.
// Everything stays on loopback; every loop is bounded in time. All data is the fictional demo seed.
import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import { Agent, request as httpRequest } from 'node:http';
import { createRequire } from 'node:module';
import { createServer } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { startMailFake } from '../docker-free-fakes/mail/mail-fake';
import { startStripeFake } from '../docker-free-fakes/stripe/app';
import { runMigrations } from '../server/db/migrate';
import { ensureCluster, ensureDatabase } from './postgres';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const say = (m: string) => console.log(`[bench:load] ${m}`);

const SECONDS = Number(process.env.BENCH_SECONDS ?? 60);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 200);
/** Buyers checking out alongside the load (BENCH_CHECKOUT_BUYERS, to see what they cost). */
const CHECKOUT_BUYERS = Number(process.env.BENCH_CHECKOUT_BUYERS ?? 20);
const RACE_BUYERS = 200;
const RACE_UNITS = 5;
const TARGET = { rps: 500, p95Ms: 100, errors: 0 };
/** Requests per second the cannon offers in the target run (BENCH_RATE): a margin above TARGET.rps. */
const RATE = Number(process.env.BENCH_RATE ?? 560);
/** Length of the closed-loop run that finds the ceiling (0 skips it). */
/** autocannon instances a paced run is spread over (see runLoad). */
const STAGGER = 20;
/** Untimed warm-up before the measured runs (BENCH_WARMUP_SECONDS). */
const WARMUP_SECONDS = Number(process.env.BENCH_WARMUP_SECONDS ?? 15);
const SATURATION_SECONDS = Number(process.env.BENCH_SATURATION_SECONDS ?? 20);

// autocannon ships no type declarations: the part we use, typed here.
interface CannonRequest {
  method?: string;
  path?: string;
  headers?: Record<string, string>;
  setupRequest?: (req: CannonRequest, context: Record<string, unknown>) => CannonRequest;
  onResponse?: (status: number, body: string, context: Record<string, unknown>) => void;
}
interface CannonResult {
  requests: { average: number; total: number };
  throughput: { average: number };
  errors: number;
  timeouts: number;
  non2xx: number;
  duration: number;
  statusCodeStats?: Record<string, { count: number }>;
}
interface CannonInstance {
  on(event: 'response', fn: (client: unknown, status: number, bytes: number, ms: number) => void): void;
  on(event: 'done', fn: (r: CannonResult) => void): void;
  stop(): void;
}
type Cannon = (opts: Record<string, unknown>, cb: (err: Error | null, r: CannonResult) => void) => CannonInstance;
const autocannon = createRequire(import.meta.url)('autocannon') as Cannon;

// ---------------------------------------------------------------------------------------------------------
// small HTTP client (keep-alive, cookies by hand)
// ---------------------------------------------------------------------------------------------------------

const agent = new Agent({ keepAlive: true, maxSockets: 400 });
let base = { port: 0, origin: '' };

interface Reply {
  status: number;
  body: string;
  ms: number;
  cookie?: string;
}

function call(method: string, p: string, opts: { body?: unknown; cookie?: string } = {}): Promise<Reply> {
  return new Promise((resolve, reject) => {
    const data = opts.body === undefined ? undefined : Buffer.from(JSON.stringify(opts.body));
    const started = performance.now();
    const req = httpRequest(
      {
        host: '127.0.0.1',
        port: base.port,
        method,
        path: p,
        agent,
        headers: {
          accept: 'application/json',
          origin: base.origin,
          ...(data ? { 'content-type': 'application/json', 'content-length': String(data.length) } : {}),
          ...(opts.cookie ? { cookie: opts.cookie } : {}),
        },
        timeout: 30_000,
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => {
          const set = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
          const cookie = set.map((c) => c.split(';')[0]).join('; ') || undefined;
          resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks).toString(), ms: performance.now() - started, cookie });
        });
      },
    );
    req.on('timeout', () => req.destroy(new Error('timeout')));
    req.on('error', reject);
    req.end(data);
  });
}

/** A buyer made through the API: registration signs in; returns the session cookie. */
async function newBuyer(tag: string): Promise<string> {
  const r = await call('POST', '/api/auth/register', { body: { email: `load-${tag}-${randomUUID().slice(0, 8)}@example.test`, password: 'correct-horse-battery', displayName: `Fictional load buyer ${tag}` } });
  if (r.status !== 201 || !r.cookie) throw new Error(`register failed: ${r.status} ${r.body}`);
  return r.cookie.split('; ').find((c) => c.startsWith('drabyard.sid='))!;
}

function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}
const fmt = (ms: number) => (Number.isFinite(ms) ? `${ms.toFixed(1)} ms` : 'n/a');

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

// ---------------------------------------------------------------------------------------------------------
// the run
// ---------------------------------------------------------------------------------------------------------

async function main() {
  const pgPort = Number(process.env.DRABYARD_BENCH_PG_PORT ?? 54349);
  const cluster = await ensureCluster({ dataDir: path.join(root, '.data', 'pg-bench'), port: pgPort, fast: true });
  const url = cluster.adminUrl('drabyard_load');
  await ensureDatabase(url, { fresh: true });
  await runMigrations(url);
  say('migrated; seeding the demo data…');
  await new Promise<void>((resolve, reject) => {
    const s = spawn(path.join(root, 'node_modules', '.bin', 'tsx'), [path.join(root, 'server', 'db', 'seed', 'index.ts')], { cwd: root, env: { ...process.env, DATABASE_URL: url }, stdio: 'inherit' });
    s.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`seed exited ${code}`))));
  });

  const db = new pg.Client({ connectionString: url });
  await db.connect();

  const appPort = await freePort();
  base = { port: appPort, origin: `http://127.0.0.1:${appPort}` };
  const mail = await startMailFake({ smtpPort: 0, httpPort: 0, max: 1000 });
  const webhookSecret = `whsec_load_${randomUUID().replaceAll('-', '')}`;
  const stripe = await startStripeFake({ port: 0, webhookSecret, webhookUrl: `${base.origin}/api/webhooks/stripe`, expirySweepMs: 0 });

  let app: ChildProcess | undefined;
  const stopAll = async () => {
    if (app && app.exitCode === null && app.signalCode === null) {
      // A clean stop (the app finishes open requests; a --cpu-prof profile is written), then a hard one.
      const child = app;
      const exited = new Promise((r) => child.once('exit', r));
      child.kill('SIGTERM');
      await Promise.race([exited, new Promise((r) => setTimeout(r, 12_000))]);
      if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
    }
    await stripe.close().catch(() => {});
    await mail.close().catch(() => {});
    await db.end().catch(() => {});
    agent.destroy();
    if (cluster.startedByUs && !process.env.BENCH_KEEP_CLUSTER) cluster.stop();
  };
  process.once('SIGINT', () => void stopAll().then(() => process.exit(130)));

  try {
    // node with tsx's loader (what the tsx CLI runs, minus the CLI's own wrapper process), so the app is one
    // process to end, and node flags such as --cpu-prof can be given in BENCH_APP_NODE_ARGS.
    const nodeArgs = (process.env.BENCH_APP_NODE_ARGS ?? '').split(/\s+/).filter(Boolean);
    app = spawn(process.execPath, [...nodeArgs, '--import', 'tsx', path.join(root, 'server', 'index.ts')], {
      cwd: root,
      stdio: ['ignore', 'inherit', 'inherit'],
      env: {
        ...process.env,
        NODE_ENV: 'production',
        LOG_LEVEL: 'warn',
        // As npm start runs it: one HTTP process per core (BENCH_WEB_CONCURRENCY to compare).
        WEB_CONCURRENCY: process.env.BENCH_WEB_CONCURRENCY ?? String(os.availableParallelism()),
        HOST: '127.0.0.1',
        PORT: String(appPort),
        APP_ORIGIN: base.origin,
        DATABASE_URL: url,
        SESSION_SECRET: `bench-load-${randomUUID()}`,
        SMTP_URL: `smtp://127.0.0.1:${mail.smtpPort}`,
        STRIPE_API_HOST: '127.0.0.1',
        STRIPE_API_PORT: String(stripe.port),
        STRIPE_API_PROTOCOL: 'http',
        STRIPE_WEBHOOK_SECRET: webhookSecret,
        STOCK_SWEEP_SECONDS: '0',
        // Hundreds of buyers register from one address in a minute: the per-address sign-in throttle is not under test.
        LOGIN_MAX_FAILURES_PER_IP: '100000',
      },
    });
    const until = Date.now() + 60_000;
    for (;;) {
      if (app.exitCode !== null) throw new Error('the app exited at start');
      try {
        if ((await call('GET', '/api/health')).status === 200) break;
      } catch {
        /* not yet */
      }
      if (Date.now() > until) throw new Error('the app did not start within 60 s');
      await new Promise((r) => setTimeout(r, 200));
    }
    const shell = existsSync(path.join(root, 'dist', 'client', 'index.html'));
    say(`app up at ${base.origin} (NODE_ENV=production, pid ${app.pid})${shell ? '' : '; no client build, so the home shell is left out of the mix (run npm run build)'}`);

    // --- what to ask for: real ids of the seeded catalog ------------------------------------------------
    const q = async <T>(text: string) => (await db.query(text)).rows as T[];
    const slugs = (await q<{ slug: string }>('SELECT slug FROM vehicle_models ORDER BY slug')).map((r) => r.slug);
    const assemblies = (await q<{ id: string }>('SELECT id FROM assemblies ORDER BY id LIMIT 100')).map((r) => r.id);
    const partIds = (await q<{ id: string }>('SELECT DISTINCT part_id AS id FROM bom_lines ORDER BY 1 LIMIT 300')).map((r) => r.id);
    const numbers = (await q<{ printed: string }>("SELECT printed FROM part_numbers WHERE kind IN ('maker','ordnance') ORDER BY id LIMIT 300")).map((r) => r.printed);
    const listingIds = (await q<{ id: string }>("SELECT id FROM listings WHERE state = 'approved' ORDER BY id")).map((r) => r.id);
    const words = ['brake', 'master cylinder', 'bolt', 'gasket', 'seal', 'clutch', 'lamp', 'spring', 'bearing', 'hose', 'brake shoe', 'wheel cylinder', 'washer', 'filter', 'pump'];
    if (!slugs.length || !assemblies.length || !partIds.length || !listingIds.length) throw new Error('the seed left the catalog empty');
    const pick = <T>(xs: T[]) => xs[Math.floor(Math.random() * xs.length)];
    const kinds: Array<[string, number, () => string]> = [
      ...(shell ? ([['home shell', 1, () => '/']] as Array<[string, number, () => string]>) : []),
      ['vehicles', 1, () => '/api/vehicles'],
      ['vehicle', 1, () => `/api/vehicles/${pick(slugs)}`],
      ['assembly', 2, () => `/api/assemblies/${pick(assemblies)}`],
      ['part', 3, () => `/api/parts/${pick(partIds)}`],
      ['resolve', 2, () => `/api/parts/resolve?number=${encodeURIComponent(pick(numbers))}`],
      ['search', 3, () => `/api/search?q=${encodeURIComponent(pick(words))}`],
      ['listing', 2, () => `/api/listings/${pick(listingIds)}`],
    ];
    const wheel = kinds.flatMap(([name, w, make]) => Array.from({ length: w }, () => [name, make] as const));

    // --- per-endpoint sample, sequential, before the load (what each costs alone) -------------------------
    say('per-endpoint sample (sequential, 40 requests each, after a warm-up):');
    const sample: Record<string, number[]> = {};
    for (const [name, , make] of kinds) {
      for (let i = 0; i < 10; i++) await call('GET', make());
      const ms: number[] = [];
      for (let i = 0; i < 40; i++) {
        const r = await call('GET', make());
        if (r.status !== 200) throw new Error(`${name}: ${r.status} ${r.body.slice(0, 200)}`);
        ms.push(r.ms);
      }
      sample[name] = ms.sort((a, b) => a - b);
      console.log(`  ${name.padEnd(12)} p50 ${fmt(percentile(sample[name], 50)).padStart(9)}  p95 ${fmt(percentile(sample[name], 95)).padStart(9)}  max ${fmt(sample[name].at(-1)!).padStart(9)}`);
    }

    // --- checkout buyers and listings ----------------------------------------------------------------
    // A demo listing with plenty of stock for the repeated checkouts, and another with exactly 5 for the race.
    const [loadListing, raceListing] = listingIds;
    await db.query('UPDATE listings SET quantity = 1000000 WHERE id = $1', [loadListing]);
    await db.query('UPDATE listings SET quantity = $2 WHERE id = $1', [raceListing, RACE_UNITS]);
    say(`registering ${CHECKOUT_BUYERS} checkout buyers and ${RACE_BUYERS} race buyers through the API…`);
    const checkoutBuyers: string[] = [];
    for (let i = 0; i < CHECKOUT_BUYERS; i++) checkoutBuyers.push(await newBuyer(`co${i}`));
    const raceBuyers: string[] = [];
    for (let i = 0; i < RACE_BUYERS; i += 10) raceBuyers.push(...(await Promise.all(Array.from({ length: 10 }, (_, j) => newBuyer(`race${i + j}`)))));
    // Which destination the demo seller serves: a buyer of its own tries checkouts.
    const probeBuyer = await newBuyer('probe');
    const destinations = [{ country: 'US' }, { country: 'CA' }, { pickup: true }];
    let destination: unknown;
    for (const d of destinations) {
      await call('POST', '/api/cart/items', { cookie: probeBuyer, body: { listingId: loadListing, quantity: 1 } });
      const r = await call('POST', '/api/checkout', { cookie: probeBuyer, body: { destination: d } });
      if (r.status === 201) {
        destination = d;
        break;
      }
    }
    if (!destination) throw new Error('no destination the demo seller ships to');

    // --- the load -----------------------------------------------------------------------------------------
    interface LoadRun {
      rps: number;
      p50: number;
      p95: number;
      p99: number;
      errors: number;
      checkoutFailures: number;
    }
    /** One load run: the cannon (paced at `rate` requests per second in all, or as fast as answers come) with the checkouts alongside. */
    const runLoad = async (title: string, seconds: number, rate: number | null, quiet = false): Promise<LoadRun> => {
      if (!quiet) say(`${title}: ${CONNECTIONS} connections for ${seconds} s${rate ? ` offering ${rate} req/s` : ', each asking again as soon as it is answered'} over ${kinds.map((k) => k[0]).join(', ')}, with ${CHECKOUT_BUYERS} buyers checking out alongside…`);
      const latencies: number[] = [];
      const timeline: Array<[number, number]> = [];
      const perKind: Record<string, { n: number; bad: number; statuses: Record<number, number>; ms: number[] }> = {};
      for (const [name] of kinds) perKind[name] = { n: 0, bad: 0, statuses: {}, ms: [] };

      let loadRunning = true;
      const co = { ok: 0, refused: 0, failed: 0, ms: [] as number[], statuses: {} as Record<number, number> };
      const checkoutLoop = async (cookie: string) => {
        while (loadRunning) {
          try {
            const add = await call('POST', '/api/cart/items', { cookie, body: { listingId: loadListing, quantity: 1 } });
            const r = await call('POST', '/api/checkout', { cookie, body: { destination } });
            co.ms.push(r.ms);
            co.statuses[r.status] = (co.statuses[r.status] ?? 0) + 1;
            if (add.status >= 500) co.failed += 1;
            if (r.status === 201) co.ok += 1;
            else if (r.status === 409) co.refused += 1;
            else co.failed += 1;
          } catch {
            co.failed += 1;
          }
        }
      };

      // autocannon paces a rate per connection in whole seconds: each connection sends its share for the second
      // back to back when the second starts, so one instance offers its load in a burst every second. Paced runs
      // therefore use STAGGER instances of CONNECTIONS / STAGGER connections each, started evenly across one
      // second, so requests arrive spread out as a steady RATE would bring them (still CONNECTIONS in all).
      const instances = rate ? STAGGER : 1;
      const one = (i: number) =>
        new Promise<CannonResult>((resolve, reject) => {
          const instance = autocannon(
            {
              url: base.origin,
              connections: CONNECTIONS / instances,
              duration: seconds,
              ...(rate ? { overallRate: rate / instances } : {}),
              timeout: 10,
              headers: { accept: 'application/json' },
              requests: [
                {
                  method: 'GET',
                  setupRequest: (req: CannonRequest, context: Record<string, unknown>) => {
                    const [name, make] = pick(wheel);
                    context.kind = name;
                    context.sent = performance.now();
                    return { ...req, path: make() };
                  },
                  onResponse: (status: number, _body: string, context: Record<string, unknown>) => {
                    const k = perKind[context.kind as string];
                    if (!k) return;
                    k.n += 1;
                    k.ms.push(performance.now() - (context.sent as number));
                    k.statuses[status] = (k.statuses[status] ?? 0) + 1;
                    if (status < 200 || status >= 300) k.bad += 1;
                  },
                },
              ],
            },
            (err, r) => (err ? reject(err) : resolve(r)),
          );
          instance.on('response', (_c, _s, _b, ms) => {
            latencies.push(ms);
            timeline.push([performance.now(), ms]);
          });
          void i;
        });
      const cannon = Promise.all(
        Array.from({ length: instances }, (_, i) => new Promise<CannonResult>((resolve, reject) => setTimeout(() => one(i).then(resolve, reject), (i * 1000) / instances))),
      ).then((rs) => ({
        requests: { total: rs.reduce((a, r) => a + r.requests.total, 0), average: 0 },
        throughput: { average: rs.reduce((a, r) => a + r.throughput.average, 0) },
        errors: rs.reduce((a, r) => a + r.errors, 0),
        timeouts: rs.reduce((a, r) => a + r.timeouts, 0),
        non2xx: rs.reduce((a, r) => a + r.non2xx, 0),
        duration: seconds,
      }));
      // The checkouts run while the cannon does, and stop with it.
      const checkoutsStarted = checkoutBuyers.map((c) => checkoutLoop(c));
      const result = await cannon;
      loadRunning = false;
      await Promise.all(checkoutsStarted);

      latencies.sort((a, b) => a - b);
      if (process.env.BENCH_TIMELINE) {
        const t0 = timeline[0]?.[0] ?? 0;
        const byWindow = new Map<number, number[]>();
        for (const [t, ms] of timeline) byWindow.set(Math.floor((t - t0) / 2000), [...(byWindow.get(Math.floor((t - t0) / 2000)) ?? []), ms]);
        for (const [w, xs] of byWindow) console.log(`  t=${w * 2}s n=${xs.length} p50 ${fmt(percentile(xs.sort((a, b) => a - b), 50))} p95 ${fmt(percentile(xs, 95))}`);
      }
      const run: LoadRun = {
        rps: result.requests.total / seconds,
        p50: percentile(latencies, 50),
        p95: percentile(latencies, 95),
        p99: percentile(latencies, 99),
        errors: result.errors + result.timeouts + result.non2xx,
        checkoutFailures: co.failed,
      };
      co.ms.sort((a, b) => a - b);
      if (quiet) return run;
      const load = os.loadavg();

      console.log('');
      console.log(`${title} (${seconds} s, ${CONNECTIONS} connections${rate ? `, ${rate} req/s offered` : ''}, ${os.cpus().length} cores, load average ${load.map((x) => x.toFixed(2)).join(' ')}):`);
      console.log(`  requests        ${result.requests.total} (${run.rps.toFixed(0)} req/s, ${(result.throughput.average / 1024 / 1024).toFixed(2)} MB/s)`);
      console.log(`  latency         p50 ${fmt(run.p50)}  p95 ${fmt(run.p95)}  p99 ${fmt(run.p99)}  (${latencies.length} responses)`);
      console.log(`  errors          ${result.errors} connection errors, ${result.timeouts} timeouts, ${result.non2xx} non-2xx`);
      for (const [name] of kinds) {
        const k = perKind[name];
        k.ms.sort((a, b) => a - b);
        console.log(`    ${name.padEnd(12)} ${String(k.n).padStart(7)} answers, ${k.bad} not 2xx, p50 ${fmt(percentile(k.ms, 50)).padStart(9)}  p95 ${fmt(percentile(k.ms, 95)).padStart(9)} ${k.bad ? JSON.stringify(k.statuses) : ''}`);
      }
      console.log(
        `  checkouts       ${co.ok} started, ${co.refused} refused (409), ${co.failed} failed; p50 ${fmt(percentile(co.ms, 50))}  p95 ${fmt(percentile(co.ms, 95))}  p99 ${fmt(percentile(co.ms, 99))} ${JSON.stringify(co.statuses)}`,
      );
      return run;
    };

    // Warm-up, not measured: the same paced mix fills the caches, plans and JIT of fresh processes (the first
    // seconds of a cold start are slower than the steady state, as on any server after a deploy).
    if (WARMUP_SECONDS > 0) {
      say(`warm-up: the paced mix for ${WARMUP_SECONDS} s, not measured…`);
      await runLoad('Warm-up', WARMUP_SECONDS, RATE, true);
    }
    // The target: at RATE requests per second offered (a little above the 500 asked for), p95 within 100 ms.
    const target = await runLoad('Load', SECONDS, RATE);
    // For the record: how far one machine goes when every connection asks again at once (closed loop). Here
    // latency is the queue: 200 connections waiting on N req/s wait 200/N s on average (Little's law).
    const saturation = SATURATION_SECONDS > 0 ? await runLoad('Saturation', SATURATION_SECONDS, null) : null;

    const verdicts: Array<[string, boolean]> = [
      // Judged at the target load; the saturation run overloads the machine on purpose and is reported as is.
      [`no errors (${target.errors} + ${target.checkoutFailures} checkout failures${saturation ? `; for the record, at saturation ${saturation.errors} + ${saturation.checkoutFailures}` : ''})`, target.errors === TARGET.errors && target.checkoutFailures === 0],
      [`p95 ${fmt(target.p95)} <= ${TARGET.p95Ms} ms at ${target.rps.toFixed(0)} req/s`, target.p95 <= TARGET.p95Ms],
      [`throughput ${target.rps.toFixed(0)} req/s >= ${TARGET.rps}${saturation ? ` (at saturation ${saturation.rps.toFixed(0)} req/s, p95 ${fmt(saturation.p95)})` : ''}`, target.rps >= TARGET.rps],
    ];

    // --- the race ------------------------------------------------------------------------------------------
    say(`race: ${RACE_BUYERS} buyers, each with one unit of a listing of ${RACE_UNITS} in the cart, check out at once…`);
    for (let i = 0; i < raceBuyers.length; i += 20) {
      await Promise.all(
        raceBuyers.slice(i, i + 20).map(async (cookie) => {
          const r = await call('POST', '/api/cart/items', { cookie, body: { listingId: raceListing, quantity: 1 } });
          if (r.status !== 201) throw new Error(`race cart: ${r.status} ${r.body}`);
        }),
      );
    }
    const raceStarted = performance.now();
    const replies = await Promise.all(raceBuyers.map((cookie) => call('POST', '/api/checkout', { cookie, body: { destination } }).catch((e: Error) => ({ status: 0, body: e.message, ms: 0 }))));
    const raceMs = performance.now() - raceStarted;
    const won = replies.filter((r) => r.status === 201).length;
    const refused = replies.filter((r) => r.status === 409 && /none are left|only \d+ (is|are) left/.test(r.body)).length;
    const other = replies.filter((r) => r.status !== 201 && r.status !== 409);
    const held = (await db.query("SELECT coalesce(sum(quantity), 0)::int AS n FROM stock_reservations WHERE listing_id = $1 AND state = 'held'", [raceListing])).rows[0].n as number;
    const shelf = (await db.query('SELECT quantity FROM listings WHERE id = $1', [raceListing])).rows[0].quantity as number;
    console.log('');
    console.log(`Race (${raceMs.toFixed(0)} ms for all ${RACE_BUYERS}):`);
    console.log(`  orders          ${won} started (201), ${refused} refused with "none are left" (409), ${other.length} other ${other.length ? JSON.stringify(other.slice(0, 3).map((r) => [r.status, r.body.slice(0, 120)])) : ''}`);
    console.log(`  stock           ${held} units held for the ${won} orders, ${shelf} left on the shelf`);
    verdicts.push([`race: exactly ${RACE_UNITS} orders and ${RACE_BUYERS - RACE_UNITS} clear refusals (${won} / ${refused})`, won === RACE_UNITS && refused === RACE_BUYERS - RACE_UNITS && held === RACE_UNITS && shelf === 0]);

    console.log('');
    for (const [what, ok] of verdicts) console.log(`  ${ok ? 'PASS' : 'FAIL'}  ${what}`);
    if (!verdicts.every(([, ok]) => ok)) {
      const slow = Object.entries(sample).sort((a, b) => percentile(b[1], 95) - percentile(a[1], 95))[0];
      console.log(`  slowest endpoint alone: ${slow[0]} (p95 ${fmt(percentile(slow[1], 95))} sequential)`);
      process.exitCode = 1;
    }
  } finally {
    await stopAll();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
