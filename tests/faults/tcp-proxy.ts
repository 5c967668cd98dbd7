import { createServer, connect, type Server, type Socket } from 'node:net';

/*
 * A TCP proxy in front of PostgreSQL that a test can cut and restore, so one app process sees its database
 * go away while the shared test cluster keeps serving every other test file.
 *   'refuse'    existing connections are reset and new ones refused (a stopped server: ECONNREFUSED)
 *   'blackhole' connections are accepted but nothing is forwarded (a hung network: connect timeouts)
 */

export type CutMode = 'refuse' | 'blackhole';

export interface TcpProxy {
  port: number;
  cut(mode?: CutMode): Promise<void>;
  restore(): Promise<void>;
  close(): Promise<void>;
  /** Connections forwarded since the start. */
  forwarded(): number;
}

export async function startTcpProxy(target: { host: string; port: number }): Promise<TcpProxy> {
  const live = new Set<Socket>();
  let mode: 'open' | CutMode = 'open';
  let count = 0;
  let server: Server | undefined;
  let port = 0;

  const onConnection = (client: Socket) => {
    live.add(client);
    client.on('close', () => live.delete(client));
    client.on('error', () => client.destroy());
    if (mode === 'blackhole') return; // accepted, never answered
    if (mode === 'refuse') return void client.destroy();
    count += 1;
    const upstream = connect(target.port, target.host);
    live.add(upstream);
    upstream.on('close', () => {
      live.delete(upstream);
      client.destroy();
    });
    upstream.on('error', () => upstream.destroy());
    client.on('close', () => upstream.destroy());
    client.pipe(upstream);
    upstream.pipe(client);
  };

  const listen = () =>
    new Promise<void>((resolve, reject) => {
      server = createServer(onConnection);
      server.once('error', reject);
      server.listen(port, '127.0.0.1', () => {
        port = (server!.address() as { port: number }).port;
        resolve();
      });
    });
  const unlisten = () =>
    new Promise<void>((resolve) => {
      if (!server) return resolve();
      server.close(() => resolve());
      server = undefined;
    });
  const dropAll = () => {
    for (const s of live) s.destroy();
    live.clear();
  };

  await listen();
  return {
    get port() {
      return port;
    },
    forwarded: () => count,
    async cut(m: CutMode = 'refuse') {
      mode = m;
      dropAll();
      // A stopped server refuses connections outright; a hung one keeps accepting them.
      if (m === 'refuse') await unlisten();
    },
    async restore() {
      dropAll();
      mode = 'open';
      if (!server) await listen();
    },
    async close() {
      dropAll();
      await unlisten();
    },
  };
}
