import Stripe from 'stripe';
import { loadEnv } from '../env';

/*
 * The one Stripe client of the app: the official SDK, configured only from the environment. With
 * STRIPE_API_HOST unset it talks to Stripe itself; with it set (npm start, tests) to the local stand-in.
 * The environment is read when the client is first needed, not at import, so a test can start its own
 * stand-in on port 0 and set STRIPE_API_* before the first call.
 */

let client: Stripe | undefined;

function stripeEnv() {
  return loadEnv(process.env);
}

export function getStripe(): Stripe {
  if (!client) {
    const e = stripeEnv();
    client = new Stripe(e.STRIPE_SECRET_KEY, {
      ...(e.STRIPE_API_HOST
        ? { host: e.STRIPE_API_HOST, port: e.STRIPE_API_PORT, protocol: e.STRIPE_API_PROTOCOL ?? 'https' }
        : {}),
      // Every POST we make carries an idempotency key, so the SDK's retries cannot double a charge or transfer.
      maxNetworkRetries: 2,
      timeout: 20_000,
      appInfo: { name: 'Drabyard' },
    });
  }
  return client;
}

/** The signing secret of our webhook endpoint, read per call (tests switch it). */
export function webhookSecret(): string {
  return stripeEnv().STRIPE_WEBHOOK_SECRET;
}

/** Forgets the client, so the next call reads the environment again (tests). */
export function resetStripeClient(): void {
  client = undefined;
}

/** A Stripe error with its HTTP status and code, or null for anything else. */
export function stripeErrorInfo(err: unknown): { status: number | undefined; code: string | undefined; message: string } | null {
  if (err instanceof Stripe.errors.StripeError) return { status: err.statusCode, code: err.code, message: err.message };
  return null;
}
