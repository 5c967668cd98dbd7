// A tiny webhook endpoint for tests: records every POST's raw body and headers, and can be told to
// fail the first N requests to exercise retries.
import { createServer, type IncomingHttpHeaders } from 'node:http';
import type { AddressInfo } from 'node:net';

export interface ReceivedWebhook {
  rawBody: string;
  signature: string;
  headers: IncomingHttpHeaders;
  /** The status this receiver answered with. */
  answered: number;
}

export interface WebhookReceiver {
  url: string;
  received: ReceivedWebhook[];
  /** Webhooks answered 2xx, parsed. */
  accepted(): { id: string; type: string; data: { object: Record<string, unknown> } }[];
  failNext(count: number, status?: number): void;
  waitFor(predicate: (hooks: ReceivedWebhook[]) => boolean, timeoutMs?: number): Promise<void>;
  close(): Promise<void>;
}

export async function startWebhookReceiver(): Promise<WebhookReceiver> {
  const received: ReceivedWebhook[] = [];
  let failures = 0;
  let failStatus = 500;
  const server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      const answered = failures > 0 ? failStatus : 200;
      if (failures > 0) failures -= 1;
      const signature = req.headers['stripe-signature'];
      received.push({ rawBody: Buffer.concat(chunks).toString('utf8'), signature: typeof signature === 'string' ? signature : '', headers: req.headers, answered });
      res.writeHead(answered, { 'Content-Type': 'application/json' });
      res.end(JSON.stringify({ received: answered === 200 }));
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}/webhooks/stripe`,
    received,
    accepted: () => received.filter((r) => r.answered === 200).map((r) => JSON.parse(r.rawBody) as { id: string; type: string; data: { object: Record<string, unknown> } }),
    failNext(count, status = 500) {
      failures = count;
      failStatus = status;
    },
    async waitFor(predicate, timeoutMs = 5000) {
      const deadline = Date.now() + timeoutMs;
      while (!predicate(received)) {
        if (Date.now() > deadline) throw new Error(`webhook receiver: condition not met within ${timeoutMs} ms (${received.length} received)`);
        await new Promise((r) => setTimeout(r, 20));
      }
    },
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
