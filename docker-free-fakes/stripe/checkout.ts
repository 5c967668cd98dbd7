// Checkout Sessions in `payment` mode: create, retrieve, list, line items, expire.
import { assertCanReceiveTransfers } from './connect';
import { type ApiHandler, mustFind, render } from './context';
import { newId, nowSeconds } from './ids';
import { paginate } from './list';
import { isCurrencyCode, minimumCharge, stripeAmountText } from './money';
import {
  arr,
  bool,
  checkParams,
  createMetadata,
  EXPAND,
  int,
  LIST_PARAMS,
  metadata,
  obj,
  oneOf,
  str,
  url,
} from './params';
import type { FakeState } from './state';
import { StripeFakeError } from './stripe-error';
import type { CheckoutSession, LineItem, Metadata, PaymentIntentData, Price, Product } from './types';

// source: Stripe API reference, Checkout Session `expires_at` (30 minutes to 24 hours after creation), from memory
const MIN_EXPIRY_SECONDS = 30 * 60;
const MAX_EXPIRY_SECONDS = 24 * 60 * 60;

const LINE_ITEM = obj({
  price: str(),
  price_data: obj({
    currency: str({ required: true }),
    unit_amount: int({ min: 0 }),
    unit_amount_decimal: str(),
    product: str(),
    product_data: obj({
      name: str({ required: true }),
      description: str(),
      images: arr(str(), { maxItems: 8 }),
      metadata: metadata(),
      tax_code: str(),
    }),
    tax_behavior: oneOf(['exclusive', 'inclusive', 'unspecified']),
  }),
  quantity: int({ min: 1 }),
});

const SESSION_FIELDS = {
  mode: oneOf(['payment', 'setup', 'subscription'], true),
  line_items: arr(LINE_ITEM, { maxItems: 100 }),
  success_url: url(true),
  cancel_url: url(),
  metadata: metadata(),
  customer: str(),
  customer_email: str(),
  customer_creation: oneOf(['always', 'if_required']),
  client_reference_id: str({ maxLength: 200 }),
  payment_method_types: arr(str()),
  locale: str(),
  submit_type: oneOf(['auto', 'book', 'donate', 'pay']),
  billing_address_collection: oneOf(['auto', 'required']),
  shipping_address_collection: obj({ allowed_countries: arr(str(), { required: true, maxItems: 250 }) }),
  allow_promotion_codes: bool(),
  expires_at: int(),
  ui_mode: oneOf(['hosted', 'embedded', 'custom']),
  payment_intent_data: obj({
    application_fee_amount: int({ min: 0 }),
    capture_method: oneOf(['automatic', 'automatic_async', 'manual']),
    description: str(),
    metadata: metadata(),
    on_behalf_of: str(),
    receipt_email: str(),
    statement_descriptor: str({ maxLength: 22 }),
    transfer_data: obj({ destination: str({ required: true }), amount: int({ min: 1 }) }),
    transfer_group: str(),
  }),
  expand: EXPAND,
};

interface LineItemParams {
  price?: string;
  price_data?: {
    currency: string;
    unit_amount?: number;
    unit_amount_decimal?: string;
    product?: string;
    product_data?: { name: string; description?: string; images?: string[]; metadata?: Metadata };
  };
  quantity?: number;
}

interface SessionParams {
  mode: string;
  line_items?: LineItemParams[];
  success_url: string;
  cancel_url?: string;
  metadata?: Metadata;
  customer?: string;
  customer_email?: string;
  customer_creation?: 'always' | 'if_required';
  client_reference_id?: string;
  payment_method_types?: string[];
  locale?: string;
  submit_type?: string;
  billing_address_collection?: string;
  shipping_address_collection?: { allowed_countries: string[] };
  allow_promotion_codes?: boolean;
  expires_at?: number;
  ui_mode?: string;
  payment_intent_data?: {
    application_fee_amount?: number;
    capture_method?: string;
    description?: string;
    metadata?: Metadata;
    on_behalf_of?: string;
    receipt_email?: string;
    statement_descriptor?: string;
    transfer_data?: { destination: string; amount?: number };
    transfer_group?: string;
  };
  expand?: string[];
}

export const createCheckoutSession: ApiHandler = ({ state, params, publicBaseUrl }) => {
  const p = checkParams(params, SESSION_FIELDS) as unknown as SessionParams;
  if (p.mode !== 'payment') throw StripeFakeError.notEmulated(`mode=${p.mode}`, 'mode');
  if (p.ui_mode && p.ui_mode !== 'hosted') throw StripeFakeError.notEmulated(`ui_mode=${p.ui_mode}`, 'ui_mode');
  const pid = p.payment_intent_data ?? {};
  if (pid.capture_method === 'manual') throw StripeFakeError.notEmulated('Manual capture', 'payment_intent_data[capture_method]');
  if (p.customer && p.customer_email) {
    throw StripeFakeError.invalidRequest('You may only specify one of these parameters: customer, customer_email.');
  }
  if (p.customer && !state.customers.has(p.customer)) throw StripeFakeError.noSuchReferenced('customer', p.customer, 'customer');
  for (const type of p.payment_method_types ?? []) {
    if (type !== 'card') throw StripeFakeError.notEmulated(`payment_method_types=${type}`, 'payment_method_types');
  }
  if (!p.line_items || p.line_items.length === 0) {
    throw StripeFakeError.invalidParam('line_items', 'You must specify `line_items` in `payment` mode.', 'parameter_missing');
  }

  const created = nowSeconds();
  const lineItems = p.line_items.map((item, index) => buildLineItem(state, item, index, created));
  const currency = lineItems[0].currency;
  if (lineItems.some((li) => li.currency !== currency)) {
    throw StripeFakeError.invalidParam('line_items', 'All line items must use the same currency.');
  }
  const total = lineItems.reduce((sum, li) => sum + li.amount_total, 0);
  const minimum = minimumCharge(currency);
  if (total < minimum) {
    throw StripeFakeError.invalidRequest(
      `The Checkout Session's total amount due must add up to at least ${stripeAmountText(minimum, currency)} ${currency}`,
      { param: 'line_items' },
    );
  }

  if (pid.transfer_data) assertCanReceiveTransfers(state, pid.transfer_data.destination, 'payment_intent_data[transfer_data][destination]');
  if (pid.application_fee_amount !== undefined && !pid.transfer_data) {
    throw StripeFakeError.invalidParam(
      'payment_intent_data[application_fee_amount]',
      'Can only apply an application_fee_amount when the PaymentIntent is attempting a destination payment (using `transfer_data[destination]`).',
    );
  }
  if (pid.application_fee_amount !== undefined && pid.application_fee_amount > total) {
    throw StripeFakeError.invalidParam('payment_intent_data[application_fee_amount]', 'The application fee cannot exceed the amount of the payment.');
  }

  const shipping = p.shipping_address_collection;
  if (shipping) {
    if (shipping.allowed_countries.length === 0) {
      throw StripeFakeError.invalidParam('shipping_address_collection[allowed_countries]', 'You must specify at least one allowed country.');
    }
    const bad = shipping.allowed_countries.find((c) => !/^[A-Z]{2}$/.test(c));
    if (bad !== undefined) {
      throw StripeFakeError.invalidParam('shipping_address_collection[allowed_countries]', `Invalid country code: ${bad}. Use two-letter ISO 3166-1 codes.`);
    }
  }

  let expiresAt = created + MAX_EXPIRY_SECONDS;
  if (p.expires_at !== undefined) {
    if (p.expires_at < created + MIN_EXPIRY_SECONDS) {
      throw StripeFakeError.invalidParam('expires_at', 'The `expires_at` timestamp must be at least 30 minutes from Checkout Session creation.');
    }
    if (p.expires_at > created + MAX_EXPIRY_SECONDS) {
      throw StripeFakeError.invalidParam('expires_at', 'The `expires_at` timestamp must be less than 24 hours from Checkout Session creation.');
    }
    expiresAt = p.expires_at;
  }

  const id = newId('cs_test', 58);
  const session: CheckoutSession = {
    id,
    object: 'checkout.session',
    after_expiration: null,
    allow_promotion_codes: p.allow_promotion_codes ?? null,
    amount_subtotal: total,
    amount_total: total,
    automatic_tax: { enabled: false, liability: null, status: null },
    billing_address_collection: p.billing_address_collection ?? null,
    cancel_url: p.cancel_url ?? null,
    client_reference_id: p.client_reference_id ?? null,
    client_secret: null,
    created,
    currency,
    customer: p.customer ?? null,
    customer_creation: p.customer ? null : (p.customer_creation ?? 'if_required'),
    customer_details: null,
    customer_email: p.customer_email ?? null,
    collected_information: null,
    shipping_address_collection: shipping ? { allowed_countries: [...new Set(shipping.allowed_countries)] } : null,
    expires_at: expiresAt,
    invoice: null,
    livemode: false,
    locale: p.locale ?? null,
    metadata: createMetadata(p.metadata),
    mode: 'payment',
    payment_intent: null,
    payment_method_types: ['card'],
    payment_status: 'unpaid',
    status: 'open',
    submit_type: p.submit_type ?? null,
    success_url: p.success_url,
    total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
    ui_mode: 'hosted',
    url: `${publicBaseUrl}/pay/${id}`,
  };
  const intentData: PaymentIntentData = {
    application_fee_amount: pid.application_fee_amount ?? null,
    description: pid.description ?? null,
    metadata: createMetadata(pid.metadata),
    receipt_email: pid.receipt_email ?? null,
    statement_descriptor: pid.statement_descriptor ?? null,
    transfer_data: pid.transfer_data ?? null,
    transfer_group: pid.transfer_group ?? null,
    on_behalf_of: pid.on_behalf_of ?? null,
  };
  state.sessions.set(id, session);
  state.sessionLineItems.set(id, lineItems);
  state.sessionPaymentIntentData.set(id, intentData);
  return render(state, session, p.expand);
};

function buildLineItem(state: FakeState, item: LineItemParams, index: number, created: number): LineItem {
  const at = `line_items[${index}]`;
  if (item.quantity === undefined) throw StripeFakeError.missingParam(`${at}[quantity]`);
  let price: Price;
  if (item.price !== undefined) {
    if (item.price_data) throw StripeFakeError.invalidRequest(`You may only specify one of these parameters: ${at}[price], ${at}[price_data].`);
    const known = state.prices.get(item.price);
    if (!known) throw StripeFakeError.noSuchReferenced('price', item.price, `${at}[price]`);
    price = known;
  } else if (item.price_data) {
    price = buildPrice(state, item.price_data, `${at}[price_data]`, created);
  } else {
    throw StripeFakeError.invalidParam(`${at}[price]`, `You must specify either \`price\` or \`price_data\` in ${at}.`, 'parameter_missing');
  }
  const amount = price.unit_amount * item.quantity;
  const product = state.products.get(price.product);
  return {
    id: newId('li'),
    object: 'item',
    amount_discount: 0,
    amount_subtotal: amount,
    amount_tax: 0,
    amount_total: amount,
    currency: price.currency,
    description: product?.name ?? '',
    price,
    quantity: item.quantity,
  };
}

function buildPrice(state: FakeState, data: NonNullable<LineItemParams['price_data']>, at: string, created: number): Price {
  const currency = data.currency.toLowerCase();
  if (!isCurrencyCode(currency)) throw StripeFakeError.invalidParam(`${at}[currency]`, `Invalid currency: ${data.currency}`);
  let unitAmount = data.unit_amount;
  if (unitAmount === undefined && data.unit_amount_decimal !== undefined) {
    if (!/^\d+$/.test(data.unit_amount_decimal)) {
      throw StripeFakeError.notEmulated('A fractional unit_amount_decimal', `${at}[unit_amount_decimal]`);
    }
    unitAmount = Number(data.unit_amount_decimal);
  }
  if (unitAmount === undefined) throw StripeFakeError.missingParam(`${at}[unit_amount]`);

  let productId: string;
  if (data.product !== undefined) {
    if (!state.products.has(data.product)) throw StripeFakeError.noSuchReferenced('product', data.product, `${at}[product]`);
    productId = data.product;
  } else if (data.product_data) {
    const product: Product = {
      id: newId('prod', 14),
      object: 'product',
      active: true,
      created,
      description: data.product_data.description ?? null,
      images: data.product_data.images ?? [],
      livemode: false,
      metadata: createMetadata(data.product_data.metadata),
      name: data.product_data.name,
      updated: created,
    };
    state.products.set(product.id, product);
    productId = product.id;
  } else {
    throw StripeFakeError.invalidParam(`${at}[product_data]`, 'You must specify either `product` or `product_data` when creating a price.', 'parameter_missing');
  }
  const price: Price = {
    id: newId('price'),
    object: 'price',
    active: false,
    billing_scheme: 'per_unit',
    created,
    currency,
    livemode: false,
    lookup_key: null,
    metadata: {},
    nickname: null,
    product: productId,
    recurring: null,
    tax_behavior: 'unspecified',
    type: 'one_time',
    unit_amount: unitAmount,
    unit_amount_decimal: String(unitAmount),
  };
  state.prices.set(price.id, price);
  return price;
}

export const retrieveCheckoutSession: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, { expand: EXPAND }) as { expand?: string[] };
  expireDueSessions(state);
  return render(state, mustFind(state.sessions, path.id, 'checkout.session'), p.expand);
};

export const listCheckoutSessions: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, {
    ...LIST_PARAMS,
    payment_intent: str(),
    customer: str(),
    status: oneOf(['open', 'complete', 'expired']),
  }) as { payment_intent?: string; customer?: string; status?: string; expand?: string[] };
  expireDueSessions(state);
  const items = [...state.sessions.values()].filter(
    (s) =>
      (p.payment_intent === undefined || s.payment_intent === p.payment_intent) &&
      (p.customer === undefined || s.customer === p.customer) &&
      (p.status === undefined || s.status === p.status),
  );
  return render(state, paginate(items, p, '/v1/checkout/sessions', 'checkout.session'), p.expand);
};

export const listSessionLineItems: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, LIST_PARAMS) as { expand?: string[] };
  mustFind(state.sessions, path.id, 'checkout.session');
  const items = state.sessionLineItems.get(path.id) ?? [];
  return render(state, paginate(items, p, `/v1/checkout/sessions/${path.id}/line_items`, 'line item', 'as_given'), p.expand);
};

export const expireCheckoutSession: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, { expand: EXPAND }) as { expand?: string[] };
  const session = mustFind(state.sessions, path.id, 'checkout.session');
  expireDueSessions(state);
  if (session.status !== 'open') {
    throw StripeFakeError.invalidRequest(`Only Checkout Sessions with a status in ["open"] can be expired. This session has status "${session.status}".`, {
      code: 'checkout_session_not_open',
    });
  }
  expireSession(state, session);
  return render(state, session, p.expand);
};

export function expireSession(state: FakeState, session: CheckoutSession): void {
  if (session.status !== 'open') return;
  session.status = 'expired';
  session.url = null;
  const intent = session.payment_intent ? state.paymentIntents.get(session.payment_intent) : undefined;
  if (intent && intent.status !== 'succeeded') {
    intent.status = 'canceled';
    intent.canceled_at = nowSeconds();
    intent.cancellation_reason = 'abandoned';
  }
  state.emit('checkout.session.expired', session);
}

/** Stripe expires sessions shortly after `expires_at`; we do it when next asked or by the sweep timer. */
export function expireDueSessions(state: FakeState): void {
  const now = nowSeconds();
  for (const session of state.sessions.values()) {
    if (session.status === 'open' && session.expires_at <= now) expireSession(state, session);
  }
}
