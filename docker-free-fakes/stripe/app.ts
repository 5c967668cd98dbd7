// The local Stripe stand-in as a node:http server: the v1 API (for the official SDK), the hosted
// payment and onboarding pages, and `/__control/` endpoints for tests. `startStripeFake()` is the
// programmatic entry point; server.ts is the CLI around it.
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { payCheckoutSession, type PayInput, type PayOutcome, type ShippingInput } from './checkout-payment';
import { expireDueSessions, expireSession } from './checkout';
import { completeOnboarding } from './connect';
import { canonicalForm, type FormObject, parseFormEncoded } from './form-encoding';
import { newId } from './ids';
import { indexPage, notFoundPage, onboardingPage, payPage, type PayPageValues, sessionClosedPage } from './pages';
import { API_ROUTES, matchRoute } from './routes';
import { FakeState } from './state';
import { StripeFakeError } from './stripe-error';
import { DEFAULT_RETRY_DELAYS_MS, type Delivery, WebhookDispatcher } from './webhook-dispatcher';

export interface StripeFakeOptions {
  /** 0 (the default) picks a free port. */
  port?: number;
  /** Loopback only. */
  host?: string;
  webhookUrl?: string;
  webhookSecret: string;
  /** Base for `session.url` and onboarding links; defaults to the listening address. */
  publicBaseUrl?: string;
  /** Delays between delivery attempts; attempts = length + 1. */
  retryDelaysMs?: number[];
  /** How long one webhook POST may take before it counts as failed. */
  attemptTimeoutMs?: number;
  /** When set, only this secret key is accepted; otherwise any `sk_test_...` / `rk_test_...`. */
  apiKey?: string;
  /** How often open sessions past `expires_at` are expired; 0 turns the sweep off. */
  expirySweepMs?: number;
  log?: (line: string) => void;
}

export interface StripeFake {
  url: string;
  port: number;
  state: FakeState;
  close(): Promise<void>;
  setWebhookUrl(url: string | undefined): void;
  deliveries(): Delivery[];
  waitForDeliveries(timeoutMs?: number): Promise<void>;
  pauseDeliveries(): void;
  resumeDeliveries(): void;
  /** Empties all state and drops pending deliveries. */
  reset(): void;
  /** Pays a session as the hosted page would (no browser needed). */
  pay(sessionId: string, input: PayInput): PayOutcome;
}

const MAX_BODY_BYTES = 1024 * 1024;
const MAX_IDEMPOTENCY_KEYS = 20_000;
const LOOPBACK_HOSTS = new Set(['127.0.0.1', 'localhost', '::1']);

class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
  ) {
    super(message);
  }
}

export async function startStripeFake(options: StripeFakeOptions): Promise<StripeFake> {
  if (!options.webhookSecret) throw new Error('startStripeFake: webhookSecret is required');
  const host = options.host ?? '127.0.0.1';
  if (!LOOPBACK_HOSTS.has(host)) throw new Error(`startStripeFake: host must be a loopback address, got ${host}`);
  const log = options.log ?? (() => undefined);
  const state = new FakeState();
  const dispatcher = new WebhookDispatcher({
    webhookUrl: options.webhookUrl,
    webhookSecret: options.webhookSecret,
    retryDelaysMs: options.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS,
    attemptTimeoutMs: options.attemptTimeoutMs ?? 5000,
    log,
  });
  state.onEvent((event) => {
    event.pending_webhooks = dispatcher.url ? 1 : 0;
    dispatcher.enqueue(event);
  });

  let publicBaseUrl = options.publicBaseUrl?.replace(/\/$/, '') ?? '';
  const server = createServer((req, res) => {
    handle(req, res).catch((err: unknown) => {
      log(`stripe fake: unexpected error ${err instanceof Error ? (err.stack ?? err.message) : String(err)}`);
      if (!res.headersSent) sendJson(res, 500, { error: { type: 'api_error', message: 'The local Stripe stand-in hit an internal error.' } });
      else res.end();
    });
  });

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const requestUrl = new URL(req.url ?? '/', 'http://stand-in.local');
    const pathname = requestUrl.pathname;
    const method = req.method ?? 'GET';
    let raw: string;
    try {
      raw = await readBody(req);
    } catch (err) {
      if (err instanceof HttpError) {
        sendJson(res, err.status, { error: { type: 'invalid_request_error', message: err.message } });
        return;
      }
      throw err;
    }
    if (pathname.startsWith('/v1/')) return handleApi(req, res, method, pathname, requestUrl.search.slice(1), raw);
    if (pathname.startsWith('/__control/')) return handleControl(req, res, method, pathname, requestUrl, raw);
    if (pathname.startsWith('/pay/')) return handlePayPage(res, method, decodeURIComponent(pathname.slice('/pay/'.length)), raw);
    if (pathname.startsWith('/connect/onboarding/')) {
      return handleOnboarding(res, method, decodeURIComponent(pathname.slice('/connect/onboarding/'.length)), requestUrl, raw);
    }
    if (pathname === '/' && method === 'GET') return sendHtml(res, 200, indexPage(publicBaseUrl));
    sendHtml(res, 404, notFoundPage(`Nothing lives at ${pathname}.`));
  }

  function handleApi(req: IncomingMessage, res: ServerResponse, method: string, pathname: string, query: string, raw: string): void {
    const requestId = newId('req', 14);
    const headers: Record<string, string> = {
      'Request-Id': requestId,
      'Stripe-Version': headerValue(req, 'stripe-version') ?? state.apiVersion,
    };
    const send = (status: number, body: unknown, extra: Record<string, string> = {}): void => sendJson(res, status, body, { ...headers, ...extra });
    const fail = (err: StripeFakeError): void => send(err.status, err.toJSON());

    const apiKey = authenticate(req, options.apiKey);
    if (apiKey instanceof StripeFakeError) return fail(apiKey);
    if (headerValue(req, 'stripe-account')) {
      return fail(StripeFakeError.notEmulated('Acting on behalf of a connected account (the Stripe-Account header)'));
    }
    const matched = matchRoute(API_ROUTES, method, pathname);
    if (!matched) {
      return fail(
        new StripeFakeError(404, {
          type: 'invalid_request_error',
          message: `Unrecognized request URL (${method}: ${pathname}). The local Stripe stand-in emulates only the endpoints listed in its README.`,
        }),
      );
    }
    let params: FormObject;
    try {
      params = parseFormEncoded(method === 'GET' ? query : raw);
    } catch (err) {
      if (err instanceof StripeFakeError) return fail(err);
      throw err;
    }

    const idempotencyKey = method === 'POST' ? headerValue(req, 'idempotency-key') : undefined;
    if (idempotencyKey !== undefined) headers['Idempotency-Key'] = idempotencyKey;
    const fingerprint = `${method} ${pathname} ${canonicalForm(params)}`;
    const storeKey = idempotencyKey !== undefined ? `${apiKey}\u0000${idempotencyKey}` : undefined;
    if (idempotencyKey !== undefined && storeKey !== undefined) {
      if (idempotencyKey.length > 255) {
        return fail(StripeFakeError.invalidRequest('Idempotency-Key must be at most 255 characters long.', { code: 'idempotency_key_in_use' }));
      }
      const previous = state.idempotency.get(storeKey);
      if (previous) {
        if (previous.fingerprint !== fingerprint) {
          return fail(
            new StripeFakeError(400, {
              type: 'idempotency_error',
              message: `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${idempotencyKey}' if you meant to execute a different request.`,
            }),
          );
        }
        res.writeHead(previous.status, { ...headers, 'Content-Type': 'application/json', 'Idempotent-Replayed': 'true' });
        res.end(previous.body);
        return;
      }
    }

    let status = 200;
    let body: unknown;
    let save = true;
    state.currentRequest = { id: requestId, idempotencyKey: idempotencyKey ?? null };
    try {
      const result = matched.route.handler({ state, params, path: matched.path, publicBaseUrl });
      status = result.status ?? 200;
      body = result.body;
    } catch (err) {
      if (!(err instanceof StripeFakeError)) throw err;
      status = err.status;
      body = err.toJSON();
      save = !err.beforeExecution;
    } finally {
      state.currentRequest = { id: null, idempotencyKey: null };
    }
    const text = JSON.stringify(body, null, 2);
    if (storeKey !== undefined && save) {
      state.idempotency.set(storeKey, { fingerprint, status, body: text });
      // The SDK keys every POST, so forget the oldest keys rather than grow without bound.
      if (state.idempotency.size > MAX_IDEMPOTENCY_KEYS) {
        const oldest = state.idempotency.keys().next().value;
        if (oldest !== undefined) state.idempotency.delete(oldest);
      }
    }
    res.writeHead(status, { ...headers, 'Content-Type': 'application/json' });
    res.end(text);
  }

  function handlePayPage(res: ServerResponse, method: string, sessionId: string, raw: string): void {
    expireDueSessions(state);
    const session = state.sessions.get(sessionId);
    if (!session) return sendHtml(res, 404, notFoundPage('No such payment session.'));
    const askEmail = !session.customer_email && !(session.customer && state.customers.get(session.customer)?.email);
    const lineItems = state.sessionLineItems.get(session.id) ?? [];
    if (method === 'GET') {
      if (session.status !== 'open') return sendHtml(res, session.status === 'expired' ? 410 : 200, sessionClosedPage(session));
      return sendHtml(res, 200, payPage(session, lineItems, { askEmail }));
    }
    if (method !== 'POST') return sendHtml(res, 405, notFoundPage('Use GET or POST on this page.'));
    const form = safeForm(raw);
    const input: PayInput = {
      number: field(form, 'card_number'),
      expiry: field(form, 'card_expiry'),
      cvc: field(form, 'card_cvc'),
      email: field(form, 'email') || undefined,
      name: field(form, 'name') || undefined,
      shipping: shippingFrom((k) => field(form, `shipping_${k}`)),
    };
    if (askEmail && !input.email) {
      return sendHtml(res, 400, payPage(session, lineItems, { askEmail, error: 'Enter your email address.', values: pageValues(input) }));
    }
    const outcome = payCheckoutSession(state, session.id, input);
    switch (outcome.kind) {
      case 'paid':
        res.writeHead(303, { Location: outcome.redirectUrl });
        res.end();
        return;
      case 'declined':
        return sendHtml(res, 402, payPage(session, lineItems, { askEmail, error: outcome.error.message, values: pageValues(input) }));
      case 'rejected':
        return sendHtml(res, 400, payPage(session, lineItems, { askEmail, error: outcome.error.message, values: pageValues(input) }));
      case 'not_open':
        return sendHtml(res, session.status === 'expired' ? 410 : 200, sessionClosedPage(session));
      case 'not_found':
        return sendHtml(res, 404, notFoundPage('No such payment session.'));
    }
  }

  function handleOnboarding(res: ServerResponse, method: string, accountId: string, requestUrl: URL, raw: string): void {
    const account = state.accounts.get(accountId);
    if (!account) return sendHtml(res, 404, notFoundPage('No such connected account.'));
    const values = method === 'POST' ? safeForm(raw) : formFromQuery(requestUrl);
    const token = field(values, 'link');
    const record = token ? state.accountLinks.get(token) : undefined;
    const returnUrl = record?.returnUrl ?? field(values, 'return_url');
    const refreshUrl = record?.refreshUrl ?? field(values, 'refresh_url');
    if (token) {
      // Account links are single-use and short-lived; a stale one sends the seller to refresh_url.
      const stale = !record || record.account !== accountId || record.used || record.expiresAt < Math.floor(Date.now() / 1000);
      if (stale) {
        if (refreshUrl && isHttpUrl(refreshUrl)) return redirect(res, refreshUrl);
        return sendHtml(res, 410, notFoundPage('This onboarding link has expired or was already used.'));
      }
    }
    if (method === 'GET') return sendHtml(res, 200, onboardingPage(account, { returnUrl, refreshUrl, link: token }));
    if (method !== 'POST') return sendHtml(res, 405, notFoundPage('Use GET or POST on this page.'));
    completeOnboarding(state, accountId);
    if (record) record.used = true;
    if (returnUrl && isHttpUrl(returnUrl)) return redirect(res, returnUrl);
    sendHtml(res, 200, onboardingPage(state.accounts.get(accountId) ?? account, { returnUrl: '', refreshUrl: '', link: '' }));
  }

  function handleControl(req: IncomingMessage, res: ServerResponse, method: string, pathname: string, requestUrl: URL, raw: string): void {
    const { route, id } = controlRoute(method, pathname);
    let body: Record<string, unknown>;
    try {
      body = controlBody(req, raw);
    } catch (err) {
      if (err instanceof StripeFakeError) return sendJson(res, err.status, err.toJSON());
      throw err;
    }
    switch (route) {
      case 'GET /health':
        return sendJson(res, 200, { ok: true, url: publicBaseUrl, webhook_url: dispatcher.url ?? null, paused: dispatcher.isPaused });
      case 'POST /reset':
        state.reset();
        dispatcher.reset();
        return sendJson(res, 200, { ok: true });
      case 'GET /deliveries': {
        const wantState = requestUrl.searchParams.get('state');
        const wantType = requestUrl.searchParams.get('type');
        const data = dispatcher.list().filter((d) => (!wantState || d.state === wantState) && (!wantType || d.eventType === wantType));
        return sendJson(res, 200, { object: 'list', data, paused: dispatcher.isPaused });
      }
      case 'POST /webhooks/pause':
        dispatcher.pause();
        return sendJson(res, 200, { paused: true });
      case 'POST /webhooks/resume':
        dispatcher.resume();
        return sendJson(res, 200, { paused: false });
      case 'POST /webhooks/url': {
        const url = typeof body.url === 'string' && body.url !== '' ? body.url : undefined;
        try {
          dispatcher.setWebhookUrl(url);
        } catch (err) {
          return sendJson(res, 400, { error: { type: 'invalid_request_error', message: (err as Error).message, param: 'url' } });
        }
        return sendJson(res, 200, { webhook_url: dispatcher.url ?? null });
      }
      case 'POST /webhooks/wait-idle': {
        const timeout = Number(body.timeout_ms ?? 10_000);
        dispatcher.waitForIdle(Number.isFinite(timeout) ? timeout : 10_000).then(
          () => sendJson(res, 200, { pending: 0 }),
          (err: Error) => sendJson(res, 504, { error: { type: 'api_error', message: err.message }, pending: dispatcher.pendingCount() }),
        );
        return;
      }
      case 'POST /events/:id/resend': {
        const event = state.events.get(id);
        if (!event) return sendJson(res, 404, StripeFakeError.noSuch('event', id).toJSON());
        const delivery = dispatcher.enqueue(event, true);
        if (!delivery) return sendJson(res, 409, { error: { type: 'invalid_request_error', message: 'No webhook URL is configured.' } });
        return sendJson(res, 200, delivery);
      }
      case 'POST /checkout/sessions/:id/expire': {
        const session = state.sessions.get(id);
        if (!session) return sendJson(res, 404, StripeFakeError.noSuch('checkout.session', id).toJSON());
        if (session.status === 'open') {
          session.expires_at = Math.min(session.expires_at, Math.floor(Date.now() / 1000));
          expireSession(state, session);
        }
        return sendJson(res, 200, structuredClone(session));
      }
      case 'POST /checkout/sessions/:id/pay':
        return sendControlPay(res, id, body);
      case 'POST /accounts/:id/onboard': {
        if (!state.accounts.has(id)) return sendJson(res, 404, StripeFakeError.noSuch('account', id).toJSON());
        return sendJson(res, 200, structuredClone(completeOnboarding(state, id)));
      }
      default:
        return sendJson(res, 404, { error: { type: 'invalid_request_error', message: `Unknown control endpoint: ${method} ${pathname}` } });
    }
  }

  function sendControlPay(res: ServerResponse, sessionId: string, body: Record<string, unknown>): void {
    const card = body.card ?? body.card_number;
    if (typeof card !== 'string' && typeof card !== 'number') {
      return sendJson(res, 400, StripeFakeError.missingParam('card').toJSON());
    }
    const outcome = payCheckoutSession(state, sessionId, {
      number: String(card),
      expiry: optionalString(body.expiry ?? body.card_expiry),
      cvc: optionalString(body.cvc ?? body.card_cvc),
      email: optionalString(body.email),
      name: optionalString(body.name),
      shipping: shippingFrom((k) => {
        const nested = body.shipping && typeof body.shipping === 'object' ? (body.shipping as Record<string, unknown>)[k] : undefined;
        return optionalString(nested ?? body[`shipping_${k}`]) ?? '';
      }),
    });
    switch (outcome.kind) {
      case 'paid':
        return sendJson(res, 200, {
          outcome: 'paid',
          redirect_url: outcome.redirectUrl,
          session: outcome.session,
          payment_intent: outcome.paymentIntent,
          charge: outcome.charge,
        });
      case 'declined':
        return sendJson(res, 402, {
          outcome: 'declined',
          error: outcome.error,
          session: outcome.session,
          payment_intent: outcome.paymentIntent,
          charge: outcome.charge,
        });
      case 'rejected':
        return sendJson(res, 400, { outcome: 'rejected', error: outcome.error, session: outcome.session });
      case 'not_open':
        return sendJson(res, 409, {
          outcome: 'not_open',
          error: { type: 'invalid_request_error', message: `This Checkout Session is ${outcome.session.status}.` },
          session: outcome.session,
        });
      case 'not_found':
        return sendJson(res, 404, StripeFakeError.noSuch('checkout.session', sessionId).toJSON());
    }
  }

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  const port = (server.address() as AddressInfo).port;
  const url = `http://${host.includes(':') ? `[${host}]` : host}:${port}`;
  if (!publicBaseUrl) publicBaseUrl = url;

  const sweepMs = options.expirySweepMs ?? 5000;
  const sweep = sweepMs > 0 ? setInterval(() => expireDueSessions(state), sweepMs) : undefined;
  sweep?.unref();

  return {
    url,
    port,
    state,
    close: () => closeServer(server, dispatcher, sweep),
    setWebhookUrl: (next) => dispatcher.setWebhookUrl(next),
    deliveries: () => dispatcher.list(),
    waitForDeliveries: (timeoutMs) => dispatcher.waitForIdle(timeoutMs),
    pauseDeliveries: () => dispatcher.pause(),
    resumeDeliveries: () => dispatcher.resume(),
    reset: () => {
      state.reset();
      dispatcher.reset();
    },
    pay: (sessionId, input) => payCheckoutSession(state, sessionId, input),
  };
}

function closeServer(server: Server, dispatcher: WebhookDispatcher, sweep: NodeJS.Timeout | undefined): Promise<void> {
  if (sweep) clearInterval(sweep);
  dispatcher.close();
  return new Promise((resolve, reject) => {
    server.close((err) => (err ? reject(err) : resolve()));
    server.closeAllConnections();
  });
}

/** Bearer (what the SDK sends) or Basic with the key as user name (what `curl -u sk_test_...:` sends). */
function authenticate(req: IncomingMessage, requiredKey: string | undefined): string | StripeFakeError {
  const header = headerValue(req, 'authorization');
  if (!header) {
    return new StripeFakeError(401, {
      type: 'invalid_request_error',
      message:
        "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY').",
    });
  }
  let key = '';
  const [scheme, value = ''] = header.split(/\s+/, 2);
  if (/^bearer$/i.test(scheme)) key = value.trim();
  else if (/^basic$/i.test(scheme)) key = Buffer.from(value, 'base64').toString('utf8').split(':')[0] ?? '';
  const masked = key.length > 8 ? `${key.slice(0, 8)}${'*'.repeat(Math.max(0, key.length - 12))}${key.slice(-4)}` : key;
  if (key.startsWith('sk_live_') || key.startsWith('rk_live_')) {
    return new StripeFakeError(401, {
      type: 'invalid_request_error',
      message: `Invalid API Key provided: ${masked}. The local Stripe stand-in accepts test-mode keys only.`,
    });
  }
  const wellFormed = /^(sk|rk)_test_[A-Za-z0-9_]+$/.test(key);
  if (!wellFormed || (requiredKey !== undefined && key !== requiredKey)) {
    return new StripeFakeError(401, { type: 'invalid_request_error', message: `Invalid API Key provided: ${masked || '(empty)'}` });
  }
  return key;
}

function headerValue(req: IncomingMessage, name: string): string | undefined {
  const value = req.headers[name];
  return Array.isArray(value) ? value[0] : value;
}

function readBody(req: IncomingMessage): Promise<string> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on('data', (chunk: Buffer) => {
      size += chunk.length;
      if (size > MAX_BODY_BYTES) {
        reject(new HttpError(413, `Request body larger than ${MAX_BODY_BYTES} bytes.`));
        req.destroy();
        return;
      }
      chunks.push(chunk);
    });
    req.on('end', () => resolve(Buffer.concat(chunks).toString('utf8')));
    req.on('error', reject);
  });
}

function sendJson(res: ServerResponse, status: number, body: unknown, headers: Record<string, string> = {}): void {
  res.writeHead(status, { ...headers, 'Content-Type': 'application/json' });
  res.end(JSON.stringify(body, null, 2));
}

function sendHtml(res: ServerResponse, status: number, html: string): void {
  res.writeHead(status, { 'Content-Type': 'text/html; charset=utf-8', 'Cache-Control': 'no-store' });
  res.end(html);
}

function redirect(res: ServerResponse, location: string): void {
  res.writeHead(303, { Location: location });
  res.end();
}

function safeForm(raw: string): FormObject {
  try {
    return parseFormEncoded(raw);
  } catch {
    return Object.create(null) as FormObject;
  }
}

function formFromQuery(url: URL): FormObject {
  return safeForm(url.search.slice(1));
}

function field(form: FormObject, name: string): string {
  const value = form[name];
  return typeof value === 'string' ? value : '';
}

function pageValues(input: PayInput): PayPageValues {
  return { cardNumber: input.number, cardExpiry: input.expiry ?? '', email: input.email ?? '', name: input.name ?? '', shipping: input.shipping };
}

const SHIPPING_KEYS = ['name', 'line1', 'line2', 'city', 'state', 'postal_code', 'country'] as const;

/** A shipping address from named values (page fields or a control body); undefined when none was given. */
function shippingFrom(get: (key: (typeof SHIPPING_KEYS)[number]) => string): ShippingInput | undefined {
  const out: ShippingInput = {};
  for (const k of SHIPPING_KEYS) {
    const v = get(k);
    if (v) out[k] = v;
  }
  return Object.keys(out).length ? out : undefined;
}

function optionalString(value: unknown): string | undefined {
  if (typeof value === 'string' && value !== '') return value;
  if (typeof value === 'number') return String(value);
  return undefined;
}

function isHttpUrl(value: string): boolean {
  try {
    const parsed = new URL(value);
    return parsed.protocol === 'http:' || parsed.protocol === 'https:';
  } catch {
    return false;
  }
}

const CONTROL_ROUTES: readonly [string, RegExp][] = [
  ['GET /health', /^\/__control\/health$/],
  ['POST /reset', /^\/__control\/reset$/],
  ['GET /deliveries', /^\/__control\/deliveries$/],
  ['POST /webhooks/pause', /^\/__control\/webhooks\/pause$/],
  ['POST /webhooks/resume', /^\/__control\/webhooks\/resume$/],
  ['POST /webhooks/url', /^\/__control\/webhooks\/url$/],
  ['POST /webhooks/wait-idle', /^\/__control\/webhooks\/wait-idle$/],
  ['POST /events/:id/resend', /^\/__control\/events\/([^/]+)\/resend$/],
  ['POST /checkout/sessions/:id/expire', /^\/__control\/checkout\/sessions\/([^/]+)\/expire$/],
  ['POST /checkout/sessions/:id/pay', /^\/__control\/checkout\/sessions\/([^/]+)\/pay$/],
  ['POST /accounts/:id/onboard', /^\/__control\/accounts\/([^/]+)\/onboard$/],
];

function controlRoute(method: string, pathname: string): { route: string; id: string } {
  for (const [name, pattern] of CONTROL_ROUTES) {
    if (!name.startsWith(`${method} `)) continue;
    const m = pattern.exec(pathname);
    if (m) return { route: name, id: m[1] ? decodeURIComponent(m[1]) : '' };
  }
  return { route: '', id: '' };
}

function controlBody(req: IncomingMessage, raw: string): Record<string, unknown> {
  if (raw.trim() === '') return {};
  const type = headerValue(req, 'content-type') ?? '';
  if (type.includes('application/json')) {
    try {
      const parsed: unknown = JSON.parse(raw);
      if (parsed && typeof parsed === 'object' && !Array.isArray(parsed)) return parsed as Record<string, unknown>;
    } catch {
      // fall through to the error below
    }
    throw StripeFakeError.invalidRequest('Control endpoints take a JSON object or a form-encoded body.');
  }
  return { ...parseFormEncoded(raw) };
}
