// Delivers events to the configured webhook endpoint like Stripe does: a signed JSON POST, any
// non-2xx answer or network failure is retried with growing delays, a bounded number of times.
// Each event is delivered on its own chain, so one failing event does not hold up the others.
import { newId } from './ids';
import type { StripeEvent } from './types';
import { signatureHeader } from './webhook-signature';

export type DeliveryState = 'pending' | 'delivered' | 'failed';

export interface DeliveryAttempt {
  at: string;
  status: number | null;
  error: string | null;
  durationMs: number;
}

export interface Delivery {
  id: string;
  eventId: string;
  eventType: string;
  url: string;
  state: DeliveryState;
  attempts: DeliveryAttempt[];
  createdAt: string;
  deliveredAt: string | null;
  nextAttemptAt: string | null;
  /** True when the event was sent again on request (replay tests). */
  resend: boolean;
}

export interface DispatcherOptions {
  webhookUrl?: string;
  webhookSecret: string;
  /** Delays before attempt 2, 3, ...; attempts = delays + 1. */
  retryDelaysMs: readonly number[];
  attemptTimeoutMs: number;
  log: (line: string) => void;
}

export const DEFAULT_RETRY_DELAYS_MS: readonly number[] = [200, 500, 1000, 2000, 4000, 8000, 16000];

export class WebhookDispatcher {
  private webhookUrl: string | undefined;
  private readonly deliveries = new Map<string, Delivery>();
  private readonly bodies = new Map<string, string>();
  private readonly timers = new Map<string, NodeJS.Timeout>();
  private readonly inFlight = new Map<string, AbortController>();
  private readonly waiters = new Set<() => void>();
  private paused = false;
  private closed = false;

  constructor(private readonly options: DispatcherOptions) {
    this.webhookUrl = options.webhookUrl ? checkLoopbackUrl(options.webhookUrl) : undefined;
  }

  get url(): string | undefined {
    return this.webhookUrl;
  }

  get isPaused(): boolean {
    return this.paused;
  }

  setWebhookUrl(url: string | undefined): void {
    this.webhookUrl = url ? checkLoopbackUrl(url) : undefined;
  }

  /** Queues the event for the current endpoint; without an endpoint the event is only stored. */
  enqueue(event: StripeEvent, resend = false): Delivery | undefined {
    if (!this.webhookUrl || this.closed) return undefined;
    const delivery: Delivery = {
      id: newId('whdel'),
      eventId: event.id,
      eventType: event.type,
      url: this.webhookUrl,
      state: 'pending',
      attempts: [],
      createdAt: new Date().toISOString(),
      deliveredAt: null,
      nextAttemptAt: new Date().toISOString(),
      resend,
    };
    this.deliveries.set(delivery.id, delivery);
    // Stripe sends events pretty-printed; the signature covers exactly these bytes.
    this.bodies.set(delivery.id, JSON.stringify(event, null, 2));
    this.schedule(delivery, 0);
    return delivery;
  }

  list(): Delivery[] {
    return [...this.deliveries.values()].map((d) => structuredClone(d));
  }

  pause(): void {
    this.paused = true;
  }

  resume(): void {
    this.paused = false;
    for (const delivery of this.deliveries.values()) {
      if (delivery.state === 'pending' && !this.timers.has(delivery.id) && !this.inFlight.has(delivery.id)) {
        this.schedule(delivery, 0);
      }
    }
  }

  pendingCount(): number {
    return [...this.deliveries.values()].filter((d) => d.state === 'pending').length;
  }

  /** Resolves once nothing is pending; rejects after `timeoutMs`. */
  waitForIdle(timeoutMs = 10_000): Promise<void> {
    if (this.pendingCount() === 0) return Promise.resolve();
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => {
        this.waiters.delete(check);
        reject(new Error(`webhook deliveries still pending after ${timeoutMs} ms`));
      }, timeoutMs);
      const check = (): void => {
        if (this.pendingCount() === 0) {
          clearTimeout(timer);
          this.waiters.delete(check);
          resolve();
        }
      };
      this.waiters.add(check);
    });
  }

  /** Drops every delivery and stops timers and requests in flight. */
  reset(): void {
    for (const timer of this.timers.values()) clearTimeout(timer);
    for (const controller of this.inFlight.values()) controller.abort();
    this.timers.clear();
    this.inFlight.clear();
    this.deliveries.clear();
    this.bodies.clear();
    this.paused = false;
    this.notify();
  }

  close(): void {
    this.closed = true;
    this.reset();
  }

  private schedule(delivery: Delivery, delayMs: number): void {
    delivery.nextAttemptAt = new Date(Date.now() + delayMs).toISOString();
    if (this.paused) return; // picked up again by resume()
    const timer = setTimeout(() => {
      this.timers.delete(delivery.id);
      void this.attempt(delivery);
    }, delayMs);
    timer.unref();
    this.timers.set(delivery.id, timer);
  }

  private async attempt(delivery: Delivery): Promise<void> {
    if (this.paused || this.closed || !this.deliveries.has(delivery.id)) return;
    const body = this.bodies.get(delivery.id) ?? '';
    const timestamp = Math.floor(Date.now() / 1000);
    const controller = new AbortController();
    const timeout = setTimeout(() => controller.abort(), this.options.attemptTimeoutMs);
    this.inFlight.set(delivery.id, controller);
    const started = Date.now();
    let status: number | null = null;
    let error: string | null = null;
    try {
      const response = await fetch(delivery.url, {
        method: 'POST',
        headers: {
          'Content-Type': 'application/json; charset=utf-8',
          'User-Agent': 'Stripe/1.0 (local stand-in)',
          // A fresh signature per attempt, as Stripe signs each attempt with its own timestamp.
          'Stripe-Signature': signatureHeader(body, this.options.webhookSecret, timestamp),
        },
        body,
        redirect: 'manual',
        signal: controller.signal,
      });
      status = response.status;
      await response.arrayBuffer().catch(() => undefined);
    } catch (err) {
      error = controller.signal.aborted ? 'timed out or aborted' : describeError(err);
    } finally {
      clearTimeout(timeout);
      this.inFlight.delete(delivery.id);
    }
    if (!this.deliveries.has(delivery.id)) return; // reset while in flight
    delivery.attempts.push({ at: new Date(started).toISOString(), status, error, durationMs: Date.now() - started });

    if (status !== null && status >= 200 && status < 300) {
      delivery.state = 'delivered';
      delivery.deliveredAt = new Date().toISOString();
      delivery.nextAttemptAt = null;
    } else {
      const retryIndex = delivery.attempts.length - 1;
      const delay = this.options.retryDelaysMs[retryIndex];
      if (delay === undefined) {
        delivery.state = 'failed';
        delivery.nextAttemptAt = null;
        this.options.log(`webhook ${delivery.eventType} ${delivery.eventId} failed after ${delivery.attempts.length} attempts`);
      } else {
        this.schedule(delivery, delay);
      }
    }
    this.notify();
  }

  private notify(): void {
    for (const waiter of [...this.waiters]) waiter();
  }
}

function describeError(err: unknown): string {
  if (err instanceof Error) {
    const cause = (err as Error & { cause?: unknown }).cause;
    return cause instanceof Error ? `${err.message}: ${cause.message}` : err.message;
  }
  return String(err);
}

/** The stand-in only ever talks to this machine (house rule: no network except loopback). */
export function checkLoopbackUrl(url: string): string {
  let parsed: URL;
  try {
    parsed = new URL(url);
  } catch {
    throw new Error(`webhook URL is not a valid URL: ${url}`);
  }
  const host = parsed.hostname.replace(/^\[|\]$/g, '');
  const loopback = host === 'localhost' || host === '::1' || /^127\.\d+\.\d+\.\d+$/.test(host);
  if (!loopback || (parsed.protocol !== 'http:' && parsed.protocol !== 'https:')) {
    throw new Error(`webhook URL must be http(s) on a loopback address (127.0.0.0/8, localhost, ::1): ${url}`);
  }
  return url;
}
