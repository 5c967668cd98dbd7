// What happens when a payer submits a card on the hosted page (or a test pays through the control
// endpoint): a payment intent is made on the first attempt, each attempt makes a charge, and a
// successful one completes the session and fires the events Stripe fires, in Stripe's order.
import { addBalanceTransaction } from './balance';
import { type CardInput, checkCard } from './cards';
import { expireDueSessions } from './checkout';
import { assertCanReceiveTransfers, createTransferRecord } from './connect';
import { newId, nowSeconds } from './ids';
import { cardProcessingFee } from './money';
import type { FakeState } from './state';
import { type StripeErrorBody, StripeFakeError } from './stripe-error';
import type { Charge, CheckoutSession, Customer, PaymentIntent, PaymentMethod, ShippingDetails } from './types';

/** A shipping address as the payment page's fields give it (Stripe's address field names). */
export interface ShippingInput {
  name?: string;
  line1?: string;
  line2?: string;
  city?: string;
  state?: string;
  postal_code?: string;
  country?: string;
}

export interface PayInput extends CardInput {
  email?: string;
  name?: string;
  shipping?: ShippingInput;
}

/** The address a session asks for, checked as the page checks it; an error message names the first gap. */
export function checkShipping(session: CheckoutSession, input: ShippingInput | undefined): { ok: true; details: ShippingDetails | null } | { ok: false; message: string } {
  const allowed = session.shipping_address_collection?.allowed_countries;
  if (!allowed) return { ok: true, details: null };
  const v = (x: string | undefined) => x?.trim() ?? '';
  const country = v(input?.country).toUpperCase() || (allowed.length === 1 ? allowed[0] : '');
  const missing = [
    ['name', 'the name to ship to'],
    ['line1', 'the street address'],
    ['city', 'the city'],
    ['postal_code', 'the postal code'],
  ].find(([k]) => !v(input?.[k as keyof ShippingInput]));
  if (missing) return { ok: false, message: `Enter ${missing[1]}.` };
  if (!allowed.includes(country)) return { ok: false, message: `This shop does not ship to ${country || 'that country'}; choose one of ${allowed.join(', ')}.` };
  return {
    ok: true,
    details: {
      name: v(input?.name),
      address: { line1: v(input?.line1), line2: v(input?.line2) || null, city: v(input?.city), state: v(input?.state) || null, postal_code: v(input?.postal_code), country },
    },
  };
}

export type PayOutcome =
  | { kind: 'paid'; session: CheckoutSession; paymentIntent: PaymentIntent; charge: Charge; redirectUrl: string }
  | { kind: 'declined'; session: CheckoutSession; paymentIntent: PaymentIntent; charge: Charge; error: StripeErrorBody }
  /** Refused before any charge: malformed card details, or a destination that can no longer take transfers. */
  | { kind: 'rejected'; session: CheckoutSession; error: StripeErrorBody }
  | { kind: 'not_open'; session: CheckoutSession }
  | { kind: 'not_found' };

export function payCheckoutSession(state: FakeState, sessionId: string, input: PayInput): PayOutcome {
  expireDueSessions(state);
  const session = state.sessions.get(sessionId);
  if (!session) return { kind: 'not_found' };
  if (session.status !== 'open') return { kind: 'not_open', session };

  const checked = checkCard(input);
  if (!checked.ok) {
    // Stripe's own page rejects these before any charge exists.
    return { kind: 'rejected', session, error: { type: 'card_error', code: checked.error.code, message: checked.error.message } };
  }
  const shipping = checkShipping(session, input.shipping);
  if (!shipping.ok) return { kind: 'rejected', session, error: { type: 'invalid_request_error', code: 'shipping_address_invalid', message: shipping.message } };
  const destination = state.sessionPaymentIntentData.get(session.id)?.transfer_data?.destination;
  if (destination) {
    try {
      assertCanReceiveTransfers(state, destination, 'payment_intent_data[transfer_data][destination]');
    } catch (err) {
      if (err instanceof StripeFakeError) return { kind: 'rejected', session, error: err.body };
      throw err;
    }
  }
  const email = input.email?.trim() || session.customer_email || customerEmail(state, session.customer) || null;
  const customerId = session.customer ?? (session.customer_creation === 'always' ? createCustomerFor(state, email, input.name) : null);
  const intent = intentFor(state, session, customerId, email);
  const created = nowSeconds();

  const paymentMethod: PaymentMethod = {
    id: newId('pm'),
    object: 'payment_method',
    billing_details: { address: null, email, name: input.name?.trim() || null, phone: null },
    card: checked.card,
    created,
    customer: customerId,
    livemode: false,
    metadata: {},
    type: 'card',
  };
  state.paymentMethods.set(paymentMethod.id, paymentMethod);

  const declined = checked.decline;
  const charge: Charge = {
    id: newId('ch'),
    object: 'charge',
    amount: intent.amount,
    amount_captured: declined ? 0 : intent.amount,
    amount_refunded: 0,
    application_fee_amount: intent.application_fee_amount,
    balance_transaction: null,
    billing_details: paymentMethod.billing_details,
    captured: !declined,
    created,
    currency: intent.currency,
    customer: customerId,
    description: intent.description,
    failure_code: declined ? declined.code : null,
    failure_message: declined ? declined.message : null,
    livemode: false,
    metadata: { ...intent.metadata },
    on_behalf_of: intent.on_behalf_of,
    outcome: declined
      ? {
          network_status: 'declined_by_network',
          reason: declined.declineCode ?? declined.code,
          risk_level: 'normal',
          seller_message: 'The bank did not return any further details with this decline.',
          type: 'issuer_declined',
        }
      : { network_status: 'approved_by_network', reason: null, risk_level: 'normal', seller_message: 'Payment complete.', type: 'authorized' },
    paid: !declined,
    payment_intent: intent.id,
    payment_method: paymentMethod.id,
    payment_method_details: { card: checked.card, type: 'card' },
    receipt_email: intent.receipt_email,
    receipt_url: null,
    refunded: false,
    status: declined ? 'failed' : 'succeeded',
    transfer: null,
    transfer_data: intent.transfer_data,
    transfer_group: intent.transfer_group,
  };
  state.charges.set(charge.id, charge);
  intent.latest_charge = charge.id;
  intent.payment_method = paymentMethod.id;

  if (declined) {
    const error: StripeErrorBody = {
      type: 'card_error',
      code: declined.code,
      ...(declined.declineCode ? { decline_code: declined.declineCode } : {}),
      message: declined.message,
      charge: charge.id,
    };
    intent.status = 'requires_payment_method';
    intent.last_payment_error = {
      type: 'card_error',
      code: declined.code,
      ...(declined.declineCode ? { decline_code: declined.declineCode } : {}),
      message: declined.message,
      charge: charge.id,
      payment_method: paymentMethod,
      doc_url: `https://stripe.com/docs/error-codes/${declined.code.replace(/_/g, '-')}`,
    };
    state.emit('charge.failed', charge);
    state.emit('payment_intent.payment_failed', intent);
    return { kind: 'declined', session, paymentIntent: intent, charge, error };
  }

  const txn = addBalanceTransaction(state, {
    amount: charge.amount,
    currency: charge.currency,
    fee: cardProcessingFee(charge.amount),
    type: 'charge',
    source: charge.id,
    description: intent.description,
  });
  charge.balance_transaction = txn.id;
  intent.status = 'succeeded';
  intent.amount_received = intent.amount;
  intent.last_payment_error = null;

  session.status = 'complete';
  session.payment_status = 'paid';
  session.url = null;
  session.customer = customerId;
  session.customer_details = { address: null, email, name: paymentMethod.billing_details.name, phone: null, tax_exempt: 'none', tax_ids: [] };
  if (shipping.details) session.collected_information = { business_name: null, individual_name: null, shipping_details: shipping.details };

  state.emit('charge.succeeded', charge);
  state.emit('payment_intent.succeeded', intent);

  // Destination charge: Stripe moves the seller's share to the connected account right away.
  if (intent.transfer_data) {
    const transfer = createTransferRecord(state, {
      amount: intent.transfer_data.amount ?? intent.amount - (intent.application_fee_amount ?? 0),
      currency: intent.currency,
      destination: intent.transfer_data.destination,
      transferGroup: intent.transfer_group ?? `group_${intent.id}`,
      sourceTransaction: charge.id,
      description: null,
      metadata: {},
      destinationParam: 'payment_intent_data[transfer_data][destination]',
    });
    charge.transfer = transfer.id;
  }

  state.emit('checkout.session.completed', session);
  return {
    kind: 'paid',
    session,
    paymentIntent: intent,
    charge,
    redirectUrl: session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id),
  };
}

function intentFor(state: FakeState, session: CheckoutSession, customerId: string | null, email: string | null): PaymentIntent {
  const existing = session.payment_intent ? state.paymentIntents.get(session.payment_intent) : undefined;
  if (existing) {
    existing.customer = customerId;
    return existing;
  }
  const data = state.sessionPaymentIntentData.get(session.id);
  const id = newId('pi');
  const intent: PaymentIntent = {
    id,
    object: 'payment_intent',
    amount: session.amount_total,
    amount_capturable: 0,
    amount_received: 0,
    application_fee_amount: data?.application_fee_amount ?? null,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: 'automatic_async',
    client_secret: `${id}_secret_${newId('x', 25).slice(2)}`,
    confirmation_method: 'automatic',
    created: nowSeconds(),
    currency: session.currency,
    customer: customerId,
    description: data?.description ?? null,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: { ...(data?.metadata ?? {}) },
    on_behalf_of: data?.on_behalf_of ?? null,
    payment_method: null,
    payment_method_types: ['card'],
    receipt_email: data?.receipt_email ?? email,
    statement_descriptor: data?.statement_descriptor ?? null,
    status: 'requires_payment_method',
    transfer_data: data?.transfer_data ?? null,
    transfer_group: data?.transfer_group ?? null,
  };
  state.paymentIntents.set(id, intent);
  session.payment_intent = id;
  return intent;
}

function customerEmail(state: FakeState, customerId: string | null): string | null {
  return customerId ? (state.customers.get(customerId)?.email ?? null) : null;
}

function createCustomerFor(state: FakeState, email: string | null, name: string | undefined): string {
  const customer: Customer = {
    id: newId('cus', 14),
    object: 'customer',
    address: null,
    balance: 0,
    created: nowSeconds(),
    currency: null,
    default_source: null,
    delinquent: false,
    description: null,
    email,
    invoice_prefix: Math.random().toString(16).slice(2, 10).toUpperCase(),
    livemode: false,
    metadata: {},
    name: name?.trim() || null,
    phone: null,
    preferred_locales: [],
    shipping: null,
    tax_exempt: 'none',
    test_clock: null,
  };
  state.customers.set(customer.id, customer);
  return customer.id;
}
