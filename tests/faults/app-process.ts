import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/*
 * The app as its own process (server/index.ts under tsx), for fault tests that kill it or cut what it
 * depends on. Listens on loopback only; its output is kept for the failure message.
 */

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

export interface AppProcess {
  port: number;
  url: string;
  child: ChildProcess;
  output(): string;
  /** SIGKILL: no shutdown hook runs, open transactions die with the connection. */
  kill(): Promise<void>;
  /** SIGTERM and wait for the clean exit. */
  stop(): Promise<void>;
}

const running = new Set<AppProcess>();

/** Stops every app process this test file started and has not stopped yet (for afterAll). */
export async function stopAllApps(): Promise<void> {
  await Promise.all([...running].map((a) => a.stop()));
}

/** A free loopback port (asked of the OS, then released for the child to take). */
export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

export async function startAppProcess(opts: { port?: number; env: Record<string, string>; readyTimeoutMs?: number }): Promise<AppProcess> {
  // A free port can be taken by another test between the probe and the app's listen: try again on a new one.
  for (let attempt = 1; ; attempt++) {
    try {
      return await startOnce(opts.port ?? (await freePort()), opts);
    } catch (err) {
      if (opts.port !== undefined || attempt >= 3 || !/EADDRINUSE/.test(String(err))) throw err;
    }
  }
}

async function startOnce(port: number, opts: { env: Record<string, string>; readyTimeoutMs?: number }): Promise<AppProcess> {
  // node with tsx's loader, not the tsx CLI: the CLI runs the app in a child of its own, so a SIGKILL sent to
  // it would leave the app itself running.
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'server', 'index.ts')], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      // info: the start-up line "listening on HOST:PORT" is how readiness is told apart from a port clash.
      LOG_LEVEL: 'info',
      HOST: '127.0.0.1',
      PORT: String(port),
      APP_ORIGIN: 'http://localhost:3000',
      STOCK_SWEEP_SECONDS: '0',
      ...opts.env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  const keep = (b: Buffer) => {
    out = (out + b.toString()).slice(-20_000);
  };
  child.stdout?.on('data', keep);
  child.stderr?.on('data', keep);
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  // Never outlive the test process, whatever happens to the test.
  const reap = () => child.kill('SIGKILL');
  process.once('exit', reap);
  void exited.then(() => process.removeListener('exit', reap));
  const url = `http://127.0.0.1:${port}`;

  const until = Date.now() + (opts.readyTimeoutMs ?? 30_000);
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the app exited at start (${child.exitCode}):\n${out}`);
    try {
      const r = await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(2000) });
      // Ready only when OUR child says it listens on this port: another process that grabbed the same free
      // port meanwhile would answer the health check too.
      if ((r.status === 200 || r.status === 503) && out.includes(`listening on 127.0.0.1:${port}`)) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > until) {
      child.kill('SIGKILL');
      throw new Error(`the app did not answer within ${opts.readyTimeoutMs ?? 30_000} ms:\n${out}`);
    }
    await new Promise((r) => setTimeout(r, 100));
  }

  const app: AppProcess = {
    port,
    url,
    child,
    output: () => out,
    async kill() {
      if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
      await exited;
    },
    async stop() {
      if (child.exitCode === null && child.signalCode === null) child.kill('SIGTERM');
      const force = setTimeout(() => child.kill('SIGKILL'), 12_000);
      await exited;
      clearTimeout(force);
    },
  };
  running.add(app);
  void exited.then(() => running.delete(app));
  return app;
}
