// CLI: `tsx docker-free-fakes/stripe/server.ts` (npm run fake:stripe). Listens on 127.0.0.1.
import { startStripeFake } from './app';

function readPort(value: string | undefined): number {
  if (value === undefined || value === '') return 12111;
  const port = Number(value);
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new Error(`STRIPE_FAKE_PORT must be an integer between 0 and 65535, got "${value}"`);
  }
  return port;
}

function readDelays(value: string | undefined): number[] | undefined {
  if (!value) return undefined;
  const delays = value.split(',').map((part) => Number(part.trim()));
  if (delays.some((d) => !Number.isFinite(d) || d < 0)) {
    throw new Error(`STRIPE_FAKE_RETRY_DELAYS_MS must be comma-separated milliseconds, got "${value}"`);
  }
  return delays;
}

async function main(): Promise<void> {
  const fake = await startStripeFake({
    port: readPort(process.env.STRIPE_FAKE_PORT),
    host: '127.0.0.1',
    webhookUrl: process.env.STRIPE_WEBHOOK_URL || undefined,
    webhookSecret: process.env.STRIPE_WEBHOOK_SECRET || 'whsec_drabyard_local',
    publicBaseUrl: process.env.STRIPE_FAKE_PUBLIC_URL || undefined,
    retryDelaysMs: readDelays(process.env.STRIPE_FAKE_RETRY_DELAYS_MS),
    log: (line) => console.log(line),
  });
  console.log(`stripe fake listening on ${fake.url} (webhooks -> ${process.env.STRIPE_WEBHOOK_URL || 'none'})`);

  let closing = false;
  const shutdown = (signal: string): void => {
    if (closing) return;
    closing = true;
    fake.close().then(
      () => process.exit(0),
      (err: unknown) => {
        console.error(`stripe fake: error while closing after ${signal}:`, err);
        process.exit(1);
      },
    );
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error('stripe fake failed to start:', err instanceof Error ? err.message : err);
  process.exit(1);
});
