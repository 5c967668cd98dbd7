// Shapes of the Stripe objects the stand-in keeps. Only the fields Drabyard reads or that Stripe
// always sends are modelled; everything is JSON-serialisable as stored.
export type Metadata = Record<string, string>;

export interface Address {
  city: string | null;
  country: string | null;
  line1: string | null;
  line2: string | null;
  postal_code: string | null;
  state: string | null;
}

export interface ShippingDetails {
  name: string;
  address: Address;
}

export interface Customer {
  id: string;
  object: 'customer';
  address: Address | null;
  balance: number;
  created: number;
  currency: string | null;
  default_source: null;
  delinquent: boolean;
  description: string | null;
  email: string | null;
  invoice_prefix: string;
  livemode: false;
  metadata: Metadata;
  name: string | null;
  phone: string | null;
  preferred_locales: string[];
  shipping: null;
  tax_exempt: 'none';
  test_clock: null;
}

export interface Price {
  id: string;
  object: 'price';
  active: boolean;
  billing_scheme: 'per_unit';
  created: number;
  currency: string;
  livemode: false;
  lookup_key: null;
  metadata: Metadata;
  nickname: null;
  product: string;
  recurring: null;
  tax_behavior: 'unspecified';
  type: 'one_time';
  unit_amount: number;
  unit_amount_decimal: string;
}

export interface Product {
  id: string;
  object: 'product';
  active: boolean;
  created: number;
  description: string | null;
  images: string[];
  livemode: false;
  metadata: Metadata;
  name: string;
  updated: number;
}

export interface LineItem {
  id: string;
  object: 'item';
  amount_discount: number;
  amount_subtotal: number;
  amount_tax: number;
  amount_total: number;
  currency: string;
  description: string;
  price: Price;
  quantity: number;
}

export type SessionStatus = 'open' | 'complete' | 'expired';

export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  after_expiration: null;
  allow_promotion_codes: boolean | null;
  amount_subtotal: number;
  amount_total: number;
  automatic_tax: { enabled: false; liability: null; status: null };
  billing_address_collection: string | null;
  cancel_url: string | null;
  client_reference_id: string | null;
  client_secret: null;
  created: number;
  currency: string;
  customer: string | null;
  customer_creation: 'always' | 'if_required' | null;
  customer_details: {
    address: Address | null;
    email: string | null;
    name: string | null;
    phone: string | null;
    tax_exempt: 'none';
    tax_ids: never[];
  } | null;
  customer_email: string | null;
  /** What the payment page collected beyond the card: the shipping address when asked for. */
  collected_information: { business_name: null; individual_name: null; shipping_details: ShippingDetails | null } | null;
  shipping_address_collection: { allowed_countries: string[] } | null;
  expires_at: number;
  invoice: null;
  livemode: false;
  locale: string | null;
  metadata: Metadata;
  mode: 'payment';
  payment_intent: string | null;
  payment_method_types: string[];
  payment_status: 'paid' | 'unpaid';
  status: SessionStatus;
  submit_type: string | null;
  success_url: string;
  total_details: { amount_discount: number; amount_shipping: number; amount_tax: number };
  ui_mode: 'hosted';
  url: string | null;
}

/** What the session keeps for the payment intent it creates on the first payment attempt. */
export interface PaymentIntentData {
  application_fee_amount: number | null;
  description: string | null;
  metadata: Metadata;
  receipt_email: string | null;
  statement_descriptor: string | null;
  transfer_data: { destination: string; amount?: number } | null;
  transfer_group: string | null;
  on_behalf_of: string | null;
}

export interface LastPaymentError {
  type: 'card_error';
  code: string;
  decline_code?: string;
  message: string;
  charge: string;
  payment_method: PaymentMethod;
  doc_url: string;
}

export interface PaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_capturable: number;
  amount_received: number;
  application_fee_amount: number | null;
  canceled_at: number | null;
  cancellation_reason: string | null;
  capture_method: 'automatic_async';
  client_secret: string;
  confirmation_method: 'automatic';
  created: number;
  currency: string;
  customer: string | null;
  description: string | null;
  last_payment_error: LastPaymentError | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  on_behalf_of: string | null;
  payment_method: string | null;
  payment_method_types: string[];
  receipt_email: string | null;
  statement_descriptor: string | null;
  status: 'requires_payment_method' | 'succeeded' | 'canceled';
  transfer_data: { destination: string; amount?: number } | null;
  transfer_group: string | null;
}

export interface CardDetails {
  brand: string;
  country: string;
  exp_month: number;
  exp_year: number;
  fingerprint: string;
  funding: string;
  last4: string;
}

export interface PaymentMethod {
  id: string;
  object: 'payment_method';
  billing_details: { address: Address | null; email: string | null; name: string | null; phone: string | null };
  card: CardDetails;
  created: number;
  customer: string | null;
  livemode: false;
  metadata: Metadata;
  type: 'card';
}

export interface Charge {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  application_fee_amount: number | null;
  balance_transaction: string | null;
  billing_details: PaymentMethod['billing_details'];
  captured: boolean;
  created: number;
  currency: string;
  customer: string | null;
  description: string | null;
  failure_code: string | null;
  failure_message: string | null;
  livemode: false;
  metadata: Metadata;
  on_behalf_of: string | null;
  outcome: {
    network_status: string;
    reason: string | null;
    risk_level: 'normal';
    seller_message: string;
    type: 'authorized' | 'issuer_declined';
  };
  paid: boolean;
  payment_intent: string;
  payment_method: string;
  payment_method_details: { card: CardDetails; type: 'card' };
  receipt_email: string | null;
  receipt_url: string | null;
  refunded: boolean;
  status: 'succeeded' | 'failed';
  transfer: string | null;
  transfer_data: { destination: string; amount?: number } | null;
  transfer_group: string | null;
}

export interface Refund {
  id: string;
  object: 'refund';
  amount: number;
  balance_transaction: string;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string | null;
  reason: string | null;
  receipt_number: null;
  status: 'succeeded';
}

export type CapabilityStatus = 'inactive' | 'pending' | 'active';

export interface Requirements {
  alternatives: never[];
  current_deadline: null;
  currently_due: string[];
  disabled_reason: string | null;
  errors: never[];
  eventually_due: string[];
  past_due: string[];
  pending_verification: string[];
}

export interface Account {
  id: string;
  object: 'account';
  business_profile: {
    mcc: string | null;
    name: string | null;
    product_description: string | null;
    support_email: string | null;
    url: string | null;
  };
  business_type: string | null;
  capabilities: Record<string, CapabilityStatus>;
  charges_enabled: boolean;
  country: string;
  created: number;
  default_currency: string;
  details_submitted: boolean;
  email: string | null;
  external_accounts: { object: 'list'; data: never[]; has_more: false; total_count: 0; url: string };
  livemode: false;
  metadata: Metadata;
  payouts_enabled: boolean;
  requirements: Requirements;
  tos_acceptance: { date: number | null };
  type: 'express' | 'custom' | 'standard';
}

export interface AccountLink {
  object: 'account_link';
  created: number;
  expires_at: number;
  url: string;
}

export interface Transfer {
  id: string;
  object: 'transfer';
  amount: number;
  amount_reversed: number;
  balance_transaction: string;
  created: number;
  currency: string;
  description: string | null;
  destination: string;
  destination_payment: string;
  livemode: false;
  metadata: Metadata;
  reversals: { object: 'list'; data: TransferReversal[]; has_more: false; total_count: number; url: string };
  reversed: boolean;
  source_transaction: string | null;
  source_type: 'card';
  transfer_group: string | null;
}

/** Money taken back from a connected account out of a transfer (POST /v1/transfers/:id/reversals). */
export interface TransferReversal {
  id: string;
  object: 'transfer_reversal';
  amount: number;
  balance_transaction: string;
  created: number;
  currency: string;
  destination_payment_refund: string;
  metadata: Metadata;
  source_refund: null;
  transfer: string;
}

export interface BalanceTransaction {
  id: string;
  object: 'balance_transaction';
  amount: number;
  available_on: number;
  created: number;
  currency: string;
  description: string | null;
  exchange_rate: null;
  fee: number;
  fee_details: { amount: number; application: null; currency: string; description: string; type: string }[];
  net: number;
  reporting_category: string;
  source: string;
  status: 'available';
  type: 'charge' | 'refund' | 'transfer' | 'transfer_refund';
}

export interface StripeEvent {
  id: string;
  object: 'event';
  account?: string;
  api_version: string;
  created: number;
  data: { object: Record<string, unknown>; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: string;
}

export type AnyStripeObject =
  | Customer
  | Product
  | Price
  | CheckoutSession
  | PaymentIntent
  | PaymentMethod
  | Charge
  | Refund
  | Account
  | Transfer
  | BalanceTransaction
  | StripeEvent;
