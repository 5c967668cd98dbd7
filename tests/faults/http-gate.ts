import { createServer, request as httpRequest, type IncomingMessage, type Server, type ServerResponse } from 'node:http';

/*
 * A small HTTP forwarder on loopback that a test can make slow or failing: in front of the Stripe stand-in
 * (to hold a checkout between its stock reservation and its payment session) or in front of the app's
 * webhook (to fail deliveries). `rule` decides per request: forward, answer with a status, or wait first.
 */

export type GateDecision = { kind: 'forward'; delayMs?: number } | { kind: 'answer'; status: number; body?: string };

export interface HttpGate {
  port: number;
  url: string;
  setTarget(port: number): void;
  setRule(rule: (req: IncomingMessage, body: Buffer) => GateDecision): void;
  /** Requests seen, with what was decided. */
  seen(): Array<{ method: string; path: string; decision: GateDecision['kind']; status?: number }>;
  close(): Promise<void>;
}

export async function startHttpGate(targetPort: number): Promise<HttpGate> {
  let target = targetPort;
  let rule: (req: IncomingMessage, body: Buffer) => GateDecision = () => ({ kind: 'forward' });
  const log: Array<{ method: string; path: string; decision: GateDecision['kind']; status?: number }> = [];

  const server: Server = createServer((req: IncomingMessage, res: ServerResponse) => {
    // The caller went away before we answered (it gave up, or its process died).
    let gone = false;
    res.on('close', () => {
      if (!res.writableFinished) gone = true;
    });
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      const body = Buffer.concat(chunks);
      const d = rule(req, body);
      const entry: { method: string; path: string; decision: GateDecision['kind']; status?: number } = { method: req.method ?? 'GET', path: req.url ?? '/', decision: d.kind };
      log.push(entry);
      if (d.kind === 'answer') {
        entry.status = d.status;
        res.writeHead(d.status, { 'content-type': 'application/json' }).end(d.body ?? '{"error":"gate"}');
        return;
      }
      const forward = () => {
        // The caller gave up (or died) while we waited: nothing is forwarded, as a lost request would be.
        if (gone) return;
        const up = httpRequest(
          { host: '127.0.0.1', port: target, method: req.method, path: req.url, headers: { ...req.headers, host: `127.0.0.1:${target}` } },
          (upRes) => {
            entry.status = upRes.statusCode;
            res.writeHead(upRes.statusCode ?? 502, upRes.headers);
            upRes.pipe(res);
          },
        );
        up.on('error', () => {
          entry.status = 502;
          if (!res.headersSent) res.writeHead(502).end();
          else res.destroy();
        });
        up.end(body);
      };
      if (d.delayMs) setTimeout(forward, d.delayMs);
      else forward();
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
  const port = (server.address() as { port: number }).port;
  return {
    port,
    url: `http://127.0.0.1:${port}`,
    setTarget: (p) => {
      target = p;
    },
    setRule: (r) => {
      rule = r;
    },
    seen: () => log,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
