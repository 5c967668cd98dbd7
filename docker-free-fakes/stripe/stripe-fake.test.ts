import Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { type StripeFake, startStripeFake } from './app';
import { startWebhookReceiver, type WebhookReceiver } from './webhook-receiver';

const SECRET = 'whsec_test_secret_for_fake';
const KEY = 'sk_test_drabyard_unit';

let fake: StripeFake;
let receiver: WebhookReceiver;
let stripe: Stripe;

beforeEach(async () => {
  receiver = await startWebhookReceiver();
  fake = await startStripeFake({ webhookSecret: SECRET, webhookUrl: receiver.url, retryDelaysMs: [30, 60, 90, 120] });
  stripe = new Stripe(KEY, { host: '127.0.0.1', port: fake.port, protocol: 'http', maxNetworkRetries: 0 });
});

afterEach(async () => {
  await fake.close();
  await receiver.close();
});

// Fictional demo parts (invented names).
async function createSession(extra: Partial<Stripe.Checkout.SessionCreateParams> = {}): Promise<Stripe.Checkout.Session> {
  return stripe.checkout.sessions.create({
    mode: 'payment',
    success_url: 'http://127.0.0.1:5173/orders/done?session={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://127.0.0.1:5173/cart',
    line_items: [
      { price_data: { currency: 'usd', unit_amount: 4250, product_data: { name: 'Fictional Brakeworks wheel cylinder WC-118' } }, quantity: 2 },
      { price_data: { currency: 'usd', unit_amount: 1299, product_data: { name: 'Fictional Norrel hub seal kit' } }, quantity: 1 },
    ],
    metadata: { order_id: 'ord_demo_1' },
    payment_intent_data: { transfer_group: 'order_ord_demo_1', metadata: { order_id: 'ord_demo_1' } },
    ...extra,
  });
}

async function controlPay(sessionId: string, card: string): Promise<{ status: number; body: Record<string, unknown> }> {
  const res = await fetch(`${fake.url}/__control/checkout/sessions/${sessionId}/pay`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ card }),
  });
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

async function onboardThroughPage(accountId: string): Promise<string> {
  const link = await stripe.accountLinks.create({
    account: accountId,
    type: 'account_onboarding',
    refresh_url: 'http://127.0.0.1:5173/seller/onboarding/refresh',
    return_url: 'http://127.0.0.1:5173/seller/onboarding/done',
  });
  const page = await fetch(link.url);
  const html = await page.text();
  expect(html).toContain('Complete onboarding');
  const hidden = Object.fromEntries([...html.matchAll(/<input type="hidden" name="([^"]+)" value="([^"]*)">/g)].map((m) => [m[1], m[2].replace(/&amp;/g, '&')]));
  const action = /<form method="post" action="([^"]+)"/.exec(html)?.[1] ?? '';
  const posted = await fetch(`${fake.url}${action}`, { method: 'POST', body: new URLSearchParams(hidden), redirect: 'manual' });
  expect(posted.status).toBe(303);
  return posted.headers.get('location') ?? '';
}

describe('authentication', () => {
  it('when no API key is sent, then the answer is 401 with Stripe error JSON', async () => {
    const res = await fetch(`${fake.url}/v1/customers`, { method: 'POST' });
    expect(res.status).toBe(401);
    const body = (await res.json()) as { error: { type: string; message: string } };
    expect(body.error.type).toBe('invalid_request_error');
    expect(body.error.message).toMatch(/did not provide an API key/);
  });

  it('when a live key is used, then the SDK raises StripeAuthenticationError', async () => {
    const live = new Stripe('sk_live_notreal', { host: '127.0.0.1', port: fake.port, protocol: 'http' });
    await expect(live.customers.create({})).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
  });
});

describe('customers', () => {
  it('when a customer is created, then it can be retrieved with Stripe fields', async () => {
    const created = await stripe.customers.create({ email: 'restorer@example.test', name: 'Demo Restorer', metadata: { user_id: 'u_1' } });
    expect(created.id).toMatch(/^cus_/);
    expect(created).toMatchObject({ object: 'customer', livemode: false, email: 'restorer@example.test', metadata: { user_id: 'u_1' } });
    expect(Number.isInteger(created.created)).toBe(true);
    const fetched = await stripe.customers.retrieve(created.id);
    expect(fetched).toMatchObject({ id: created.id, name: 'Demo Restorer' });
  });
});

describe('checkout sessions', () => {
  it('when a session with two line items is created, then totals, url and line items follow Stripe', async () => {
    const session = await createSession();
    expect(session.id).toMatch(/^cs_test_/);
    expect(session).toMatchObject({ object: 'checkout.session', status: 'open', payment_status: 'unpaid', amount_total: 9799, currency: 'usd' });
    expect(session.url).toBe(`${fake.url}/pay/${session.id}`);
    const items = await stripe.checkout.sessions.listLineItems(session.id);
    expect(items.object).toBe('list');
    expect(items.data.map((li) => [li.description, li.quantity, li.amount_total])).toEqual([
      ['Fictional Brakeworks wheel cylinder WC-118', 2, 8500],
      ['Fictional Norrel hub seal kit', 1, 1299],
    ]);
    const expanded = await stripe.checkout.sessions.retrieve(session.id, { expand: ['line_items'] });
    expect(expanded.line_items?.data).toHaveLength(2);
  });

  it('when paid with 4242 through the control endpoint, then a signed checkout.session.completed arrives', async () => {
    const session = await createSession();
    const paid = await controlPay(session.id, '4242 4242 4242 4242');
    expect(paid.status).toBe(200);
    expect(paid.body.redirect_url).toBe(`http://127.0.0.1:5173/orders/done?session=${session.id}`);

    await receiver.waitFor((hooks) => hooks.some((h) => h.rawBody.includes('"checkout.session.completed"')));
    const hook = receiver.received.find((h) => h.rawBody.includes('"checkout.session.completed"'));
    if (!hook) throw new Error('no webhook');
    const event = stripe.webhooks.constructEvent(hook.rawBody, hook.signature, SECRET);
    expect(event.id).toMatch(/^evt_/);
    expect(event.type).toBe('checkout.session.completed');
    const completed = event.data.object as Stripe.Checkout.Session;
    expect(completed).toMatchObject({ id: session.id, status: 'complete', payment_status: 'paid', metadata: { order_id: 'ord_demo_1' } });
    expect(completed.payment_intent).toMatch(/^pi_/);

    const tampered = hook.rawBody.replace('"amount_total": 9799', '"amount_total": 1');
    expect(tampered).not.toBe(hook.rawBody);
    expect(() => stripe.webhooks.constructEvent(tampered, hook.signature, SECRET)).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() => stripe.webhooks.constructEvent(hook.rawBody, hook.signature, 'whsec_wrong')).toThrow(Stripe.errors.StripeSignatureVerificationError);

    const intent = await stripe.paymentIntents.retrieve(String(completed.payment_intent));
    expect(intent).toMatchObject({ status: 'succeeded', amount: 9799, transfer_group: 'order_ord_demo_1', metadata: { order_id: 'ord_demo_1' } });
    const listed = await stripe.events.list({ type: 'checkout.session.completed' });
    expect(listed.data.map((e) => e.id)).toContain(event.id);
    expect((await stripe.events.retrieve(event.id)).type).toBe('checkout.session.completed');
  });

  it('when paid with 4000 0000 0000 0002, then it is declined, the session stays open and a later 4242 pays', async () => {
    const session = await createSession();
    const declined = await controlPay(session.id, '4000000000000002');
    expect(declined.status).toBe(402);
    expect(declined.body.error).toMatchObject({ type: 'card_error', code: 'card_declined', decline_code: 'generic_decline' });
    const still = await stripe.checkout.sessions.retrieve(session.id);
    expect(still).toMatchObject({ status: 'open', payment_status: 'unpaid' });
    await receiver.waitFor((hooks) => hooks.some((h) => h.rawBody.includes('"payment_intent.payment_failed"')));

    expect((await controlPay(session.id, '4242424242424242')).status).toBe(200);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('complete');
    expect((await controlPay(session.id, '4242424242424242')).status).toBe(409);
  });

  it('when expand[] names payment_intent and payment_intent.latest_charge, then the objects are inlined', async () => {
    const session = await createSession();
    await controlPay(session.id, '4242424242424242');
    const one = await stripe.checkout.sessions.retrieve(session.id, { expand: ['payment_intent'] });
    const intent = one.payment_intent as Stripe.PaymentIntent;
    expect(intent.object).toBe('payment_intent');
    expect(intent.latest_charge).toMatch(/^ch_/);
    const two = await stripe.checkout.sessions.retrieve(session.id, { expand: ['payment_intent.latest_charge'] });
    const charge = (two.payment_intent as Stripe.PaymentIntent).latest_charge as Stripe.Charge;
    expect(charge).toMatchObject({ object: 'charge', status: 'succeeded', amount: 9799, paid: true });
    expect(charge.payment_method_details?.card?.last4).toBe('4242');
    const raw = await fetch(`${fake.url}/v1/checkout/sessions/${session.id}?expand[]=payment_intent`, { headers: { Authorization: `Bearer ${KEY}` } });
    expect(((await raw.json()) as { payment_intent: { object: string } }).payment_intent.object).toBe('payment_intent');
    await expect(stripe.checkout.sessions.retrieve(session.id, { expand: ['nonsense'] })).rejects.toMatchObject({ statusCode: 400, param: 'expand' });
  });

  it('when a session is expired through the API, then checkout.session.expired fires and the page says so', async () => {
    const session = await createSession();
    const expired = await stripe.checkout.sessions.expire(session.id);
    expect(expired).toMatchObject({ status: 'expired', url: null });
    await receiver.waitFor((hooks) => hooks.some((h) => h.rawBody.includes('"checkout.session.expired"')));
    const page = await fetch(`${fake.url}/pay/${session.id}`);
    expect(page.status).toBe(410);
    expect(await page.text()).toContain('This payment session has expired');
    await expect(stripe.checkout.sessions.expire(session.id)).rejects.toMatchObject({ statusCode: 400 });

    const other = await createSession();
    const forced = await fetch(`${fake.url}/__control/checkout/sessions/${other.id}/expire`, { method: 'POST' });
    expect(((await forced.json()) as { status: string }).status).toBe('expired');
  });
});

describe('hosted payment page', () => {
  it('when the page is fetched, then it is a plain form with labelled card fields and a Pay button', async () => {
    const session = await createSession({ customer_email: 'buyer@example.test' });
    const res = await fetch(session.url ?? '');
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain('<title>Test payment — local stand-in</title>');
    for (const id of ['card-number', 'card-expiry', 'card-cvc']) {
      expect(html).toContain(`<label for="${id}">`);
      expect(html).toContain(`id="${id}"`);
    }
    expect(html).toMatch(/<button type="submit">Pay<\/button>/);
    expect(html).toContain('97.99 USD');
    expect(html).toContain('Fictional Norrel hub seal kit');
    expect(html).not.toContain('<script');
  });

  it('when the form is posted with 4242, then it redirects to success_url with the session id', async () => {
    const session = await createSession({ customer_email: 'buyer@example.test' });
    const body = new URLSearchParams({ card_number: '4242 4242 4242 4242', card_expiry: '12 / 34', card_cvc: '123' });
    const res = await fetch(`${fake.url}/pay/${session.id}`, { method: 'POST', body, redirect: 'manual' });
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe(`http://127.0.0.1:5173/orders/done?session=${session.id}`);
    const after = await stripe.checkout.sessions.retrieve(session.id);
    expect(after).toMatchObject({ status: 'complete', payment_status: 'paid', customer_details: { email: 'buyer@example.test' } });
    expect(await (await fetch(`${fake.url}/pay/${session.id}`)).text()).toContain('already been completed');
  });

  it('when the session collects a shipping address, then the page asks for it, refuses a gap and the completed session carries it', async () => {
    const session = await createSession({ customer_email: 'buyer@example.test', shipping_address_collection: { allowed_countries: ['CA'] } });
    expect(session.shipping_address_collection).toEqual({ allowed_countries: ['CA'] });
    expect(session.collected_information).toBeNull();
    const html = await (await fetch(session.url!)).text();
    for (const id of ['shipping-name', 'shipping-line1', 'shipping-city', 'shipping-postal_code', 'shipping-country']) expect(html).toContain(`id="${id}"`);
    expect(html).toContain('<option value="CA" selected>CA</option>');

    const card = { card_number: '4242 4242 4242 4242', card_expiry: '12 / 34', card_cvc: '123' };
    const address = { shipping_name: 'Ada Fenner', shipping_line1: '7 Tannery Row', shipping_city: 'Hollin Ford', shipping_postal_code: 'K0K 9Z9', shipping_country: 'CA' };
    const gap = await fetch(`${fake.url}/pay/${session.id}`, { method: 'POST', body: new URLSearchParams({ ...card, ...address, shipping_city: '' }), redirect: 'manual' });
    expect(gap.status).toBe(400);
    const page = await gap.text();
    expect(page).toMatch(/role="alert"[^>]*>Enter the city\./);
    expect(page).toContain('value="7 Tannery Row"'); // what was typed stays
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');

    const paid = await fetch(`${fake.url}/pay/${session.id}`, { method: 'POST', body: new URLSearchParams({ ...card, ...address }), redirect: 'manual' });
    expect(paid.status).toBe(303);
    const after = await stripe.checkout.sessions.retrieve(session.id);
    expect(after.collected_information?.shipping_details).toEqual({
      name: 'Ada Fenner',
      address: { line1: '7 Tannery Row', line2: null, city: 'Hollin Ford', state: null, postal_code: 'K0K 9Z9', country: 'CA' },
    });
  });

  it('when allowed countries are not two-letter codes, then creating the session is a 400 naming the parameter', async () => {
    const err = await createSession({ shipping_address_collection: { allowed_countries: ['Canada' as 'CA'] } }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect((err as Stripe.errors.StripeInvalidRequestError).param).toBe('shipping_address_collection[allowed_countries]');
  });

  it('when the form is posted with the decline card, then the page shows the decline and the session stays open', async () => {
    const session = await createSession({ customer_email: 'buyer@example.test' });
    const body = new URLSearchParams({ card_number: '4000 0000 0000 0002', card_expiry: '12/34', card_cvc: '123' });
    const res = await fetch(`${fake.url}/pay/${session.id}`, { method: 'POST', body, redirect: 'manual' });
    expect(res.status).toBe(402);
    expect(await res.text()).toMatch(/role="alert"[^>]*>Your card was declined\./);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });
});

describe('idempotency', () => {
  it('when the same key is sent with the same body, then the first response is replayed', async () => {
    const first = await stripe.customers.create({ email: 'same@example.test' }, { idempotencyKey: 'key-1' });
    const again = await stripe.customers.create({ email: 'same@example.test' }, { idempotencyKey: 'key-1' });
    expect(again.id).toBe(first.id);
    expect(again.lastResponse.headers['idempotent-replayed']).toBe('true');
    expect((await stripe.customers.list()).data).toHaveLength(1);
  });

  it('when the same key is sent with a different body, then a 400 idempotency_error comes back', async () => {
    await stripe.customers.create({ email: 'one@example.test' }, { idempotencyKey: 'key-2' });
    const err = await stripe.customers.create({ email: 'two@example.test' }, { idempotencyKey: 'key-2' }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect(err).toMatchObject({ statusCode: 400, type: 'StripeIdempotencyError' });
  });
});

describe('refunds', () => {
  it('when refunded partly then fully, then charge.refunded fires twice and a third refund is refused', async () => {
    const session = await createSession();
    const paid = await controlPay(session.id, '4242424242424242');
    const intentId = String((paid.body.payment_intent as { id: string }).id);

    const partial = await stripe.refunds.create({ payment_intent: intentId, amount: 1299, metadata: { reason_code: 'seal_kit_missing' } });
    expect(partial).toMatchObject({ object: 'refund', amount: 1299, status: 'succeeded', payment_intent: intentId });
    expect(partial.id).toMatch(/^re_/);
    const rest = await stripe.refunds.create({ charge: String(partial.charge) });
    expect(rest.amount).toBe(8500);
    expect(await stripe.refunds.retrieve(rest.id)).toMatchObject({ id: rest.id, amount: 8500 });

    await receiver.waitFor((hooks) => hooks.filter((h) => h.rawBody.includes('"charge.refunded"')).length === 2);
    // Like Stripe, delivery order is not guaranteed, so compare as a set.
    const refundedEvents = receiver.accepted().filter((e) => e.type === 'charge.refunded');
    const seen = refundedEvents.map((e) => [e.data.object.amount_refunded, e.data.object.refunded]).sort((a, b) => Number(a[0]) - Number(b[0]));
    expect(seen).toEqual([
      [1299, false],
      [9799, true],
    ]);
    await expect(stripe.refunds.create({ payment_intent: intentId })).rejects.toMatchObject({ statusCode: 400, code: 'charge_already_refunded' });
    await expect(stripe.refunds.create({ payment_intent: intentId, amount: 1 })).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
  });

  it('when a refund is larger than what is left, then amount_too_large comes back', async () => {
    const session = await createSession();
    const paid = await controlPay(session.id, '4242424242424242');
    const intentId = String((paid.body.payment_intent as { id: string }).id);
    await expect(stripe.refunds.create({ payment_intent: intentId, amount: 10_000 })).rejects.toMatchObject({ code: 'amount_too_large', param: 'amount' });
  });
});

describe('connected accounts and transfers', () => {
  it('when a transfer goes to an account before onboarding, then it is refused; after the onboarding page, it is made', async () => {
    const account = await stripe.accounts.create({ type: 'express', email: 'vendor@example.test', metadata: { vendor_id: 'v_1' } });
    expect(account.id).toMatch(/^acct_/);
    expect(account).toMatchObject({ charges_enabled: false, payouts_enabled: false, details_submitted: false });

    const session = await createSession();
    const paid = await controlPay(session.id, '4242424242424242');
    expect(paid.status).toBe(200);

    const refused = await stripe.transfers
      .create({ amount: 8000, currency: 'usd', destination: account.id, transfer_group: 'order_ord_demo_1' })
      .catch((e: unknown) => e);
    expect(refused).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(refused).toMatchObject({ statusCode: 400, code: 'insufficient_capabilities_for_transfer', param: 'destination' });

    expect(await onboardThroughPage(account.id)).toBe('http://127.0.0.1:5173/seller/onboarding/done');
    const onboarded = await stripe.accounts.retrieve(account.id);
    expect(onboarded).toMatchObject({ charges_enabled: true, payouts_enabled: true, details_submitted: true });
    await receiver.waitFor((hooks) => hooks.some((h) => h.rawBody.includes('"account.updated"')));

    const transfer = await stripe.transfers.create({
      amount: 8000,
      currency: 'usd',
      destination: account.id,
      transfer_group: 'order_ord_demo_1',
      metadata: { vendor_id: 'v_1' },
    });
    expect(transfer.id).toMatch(/^tr_/);
    expect(transfer).toMatchObject({ object: 'transfer', amount: 8000, destination: account.id, transfer_group: 'order_ord_demo_1' });
    const byGroup = await stripe.transfers.list({ transfer_group: 'order_ord_demo_1' });
    expect(byGroup.data.map((t) => t.id)).toEqual([transfer.id]);
    expect((await stripe.transfers.list({ transfer_group: 'other' })).data).toEqual([]);
    await receiver.waitFor((hooks) => hooks.some((h) => h.rawBody.includes('"transfer.created"')));

    // Reversals take money back, in parts, never more than is left.
    const part = await stripe.transfers.createReversal(transfer.id, { amount: 3000, metadata: { reason: 'refund' } });
    expect(part).toMatchObject({ object: 'transfer_reversal', amount: 3000, transfer: transfer.id, currency: 'usd' });
    await expect(stripe.transfers.createReversal(transfer.id, { amount: 5001 })).rejects.toMatchObject({ statusCode: 400, param: 'amount' });
    const rest = await stripe.transfers.createReversal(transfer.id);
    expect(rest.amount).toBe(5000);
    expect(await stripe.transfers.retrieve(transfer.id)).toMatchObject({ amount_reversed: 8000, reversed: true });
    expect((await stripe.transfers.listReversals(transfer.id)).data.map((x) => x.amount)).toEqual([5000, 3000]);
    await expect(stripe.transfers.createReversal(transfer.id, { amount: 1 })).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    await receiver.waitFor((hooks) => hooks.some((h) => h.rawBody.includes('"transfer.reversed"')));
  });

  it('when an account link was already used, then visiting it again sends the seller to refresh_url', async () => {
    const account = await stripe.accounts.create({ type: 'express', email: 'vendor2@example.test' });
    const link = await stripe.accountLinks.create({
      account: account.id,
      type: 'account_onboarding',
      refresh_url: 'http://127.0.0.1:5173/refresh',
      return_url: 'http://127.0.0.1:5173/done',
    });
    expect(link).toMatchObject({ object: 'account_link' });
    const token = new URL(link.url).searchParams.get('link') ?? '';
    await fetch(`${fake.url}/connect/onboarding/${account.id}`, { method: 'POST', body: new URLSearchParams({ link: token }), redirect: 'manual' });
    const reused = await fetch(link.url, { redirect: 'manual' });
    expect(reused.status).toBe(303);
    expect(reused.headers.get('location')).toBe('http://127.0.0.1:5173/refresh');
  });
});

describe('webhook delivery', () => {
  it('when the endpoint fails twice, then the event is retried and accepted exactly once', async () => {
    receiver.failNext(2, 503);
    const account = await stripe.accounts.create({ type: 'express' });
    await fetch(`${fake.url}/__control/accounts/${account.id}/onboard`, { method: 'POST' });
    await fake.waitForDeliveries(5000);
    expect(receiver.received.map((r) => r.answered)).toEqual([503, 503, 200]);
    expect(receiver.accepted().map((e) => e.type)).toEqual(['account.updated']);
    const [delivery] = fake.deliveries();
    expect(delivery).toMatchObject({ state: 'delivered', eventType: 'account.updated' });
    expect(delivery.attempts).toHaveLength(3);
    // Each attempt is signed anew, and every copy verifies.
    for (const hook of receiver.received) expect(stripe.webhooks.constructEvent(hook.rawBody, hook.signature, SECRET).type).toBe('account.updated');
  });

  it('when the endpoint never answers 2xx, then delivery stops after the bounded attempts', async () => {
    receiver.failNext(100);
    await stripe.accounts.create({ type: 'express' }).then((a) => fetch(`${fake.url}/__control/accounts/${a.id}/onboard`, { method: 'POST' }));
    await fake.waitForDeliveries(5000);
    const [delivery] = fake.deliveries();
    expect(delivery.state).toBe('failed');
    expect(delivery.attempts).toHaveLength(5); // 4 retry delays configured + the first attempt
  });

  it('when deliveries are paused, then nothing is sent until resumed; a resend delivers the same event again', async () => {
    await fetch(`${fake.url}/__control/webhooks/pause`, { method: 'POST' });
    const account = await stripe.accounts.create({ type: 'express' });
    await fetch(`${fake.url}/__control/accounts/${account.id}/onboard`, { method: 'POST' });
    await new Promise((r) => setTimeout(r, 100));
    expect(receiver.received).toHaveLength(0);
    const pending = (await (await fetch(`${fake.url}/__control/deliveries?state=pending`)).json()) as { data: { eventId: string }[] };
    expect(pending.data).toHaveLength(1);
    await fetch(`${fake.url}/__control/webhooks/resume`, { method: 'POST' });
    await fake.waitForDeliveries(5000);
    expect(receiver.accepted()).toHaveLength(1);

    const eventId = pending.data[0].eventId;
    const resend = await fetch(`${fake.url}/__control/events/${eventId}/resend`, { method: 'POST' });
    expect(resend.status).toBe(200);
    await fake.waitForDeliveries(5000);
    expect(receiver.accepted().map((e) => e.id)).toEqual([eventId, eventId]);
  });

  it('when the endpoint is unreachable, then attempts record the network error and stop at the bound', async () => {
    const gone = await startWebhookReceiver();
    await gone.close();
    fake.setWebhookUrl(gone.url);
    const account = await stripe.accounts.create({ type: 'express' });
    await fetch(`${fake.url}/__control/accounts/${account.id}/onboard`, { method: 'POST' });
    await fake.waitForDeliveries(5000);
    const [delivery] = fake.deliveries();
    expect(delivery.state).toBe('failed');
    expect(delivery.attempts).toHaveLength(5);
    expect(delivery.attempts.every((a) => a.status === null && typeof a.error === 'string')).toBe(true);
  });

  it('when the webhook URL is not on loopback, then it is refused', async () => {
    expect(() => fake.setWebhookUrl('http://192.0.2.10/hook')).toThrow(/loopback/);
  });

  it('when the state is reset, then objects and deliveries are gone', async () => {
    await stripe.customers.create({ email: 'gone@example.test' });
    const res = await fetch(`${fake.url}/__control/reset`, { method: 'POST' });
    expect(res.status).toBe(200);
    expect((await stripe.customers.list()).data).toEqual([]);
    expect(fake.deliveries()).toEqual([]);
  });
});

describe('error shapes', () => {
  it('when a required param is missing, then parameter_missing names it', async () => {
    const err = await stripe.checkout.sessions
      .create({ success_url: 'http://127.0.0.1/ok' } as Stripe.Checkout.SessionCreateParams)
      .catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(err).toMatchObject({ statusCode: 400, code: 'parameter_missing', param: 'mode', message: 'Missing required param: mode.' });
  });

  it('when a nested param is missing or an integer is malformed, then the bracketed path is named', async () => {
    await expect(
      createSession({ line_items: [{ price_data: { currency: 'usd', unit_amount: 500, product_data: { name: 'x' } } }] }),
    ).rejects.toMatchObject({ code: 'parameter_missing', param: 'line_items[0][quantity]' });
    const res = await fetch(`${fake.url}/v1/transfers`, {
      method: 'POST',
      headers: { Authorization: `Bearer ${KEY}`, 'Content-Type': 'application/x-www-form-urlencoded' },
      body: 'amount=12.5&currency=usd&destination=acct_x',
    });
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject({
      error: { type: 'invalid_request_error', code: 'parameter_invalid_integer', param: 'amount', message: 'Invalid integer: 12.5' },
    });
  });

  it('when an unknown param is sent, then parameter_unknown comes back', async () => {
    await expect(stripe.customers.create({ favourite_colour: 'olive drab' } as Stripe.CustomerCreateParams)).rejects.toMatchObject({
      statusCode: 400,
      code: 'parameter_unknown',
      param: 'favourite_colour',
    });
  });

  it('when an id does not exist, then 404 resource_missing comes back', async () => {
    for (const call of [
      () => stripe.customers.retrieve('cus_missing'),
      () => stripe.checkout.sessions.retrieve('cs_test_missing'),
      () => stripe.paymentIntents.retrieve('pi_missing'),
      () => stripe.charges.retrieve('ch_missing'),
      () => stripe.refunds.retrieve('re_missing'),
      () => stripe.accounts.retrieve('acct_missing'),
      () => stripe.transfers.retrieve('tr_missing'),
      () => stripe.events.retrieve('evt_missing'),
    ]) {
      await expect(call()).rejects.toMatchObject({ statusCode: 404, code: 'resource_missing', type: 'StripeInvalidRequestError' });
    }
  });

  it('when a referenced object does not exist, then 400 resource_missing names the param', async () => {
    await expect(createSession({ customer: 'cus_nobody' })).rejects.toMatchObject({ statusCode: 400, code: 'resource_missing', param: 'customer' });
    await expect(stripe.transfers.create({ amount: 100, currency: 'usd', destination: 'acct_nobody' })).rejects.toMatchObject({
      statusCode: 400,
      param: 'destination',
    });
  });

  it('when a declined card is used, then the control endpoint answers 402 with a card_error body', async () => {
    const session = await createSession();
    const declined = await controlPay(session.id, '4000000000009995');
    expect(declined.status).toBe(402);
    expect(declined.body.error).toMatchObject({ type: 'card_error', decline_code: 'insufficient_funds' });
  });

  it('when an unknown endpoint is called, then a 404 Stripe error comes back', async () => {
    const res = await fetch(`${fake.url}/v1/subscriptions`, { headers: { Authorization: `Bearer ${KEY}` } });
    expect(res.status).toBe(404);
    expect(((await res.json()) as { error: { message: string } }).error.message).toMatch(/^Unrecognized request URL \(GET: \/v1\/subscriptions\)/);
  });
});
