// All of the stand-in's data, in memory. One instance per running fake; `reset()` empties it.
import { newId, nowSeconds } from './ids';
import type {
  Account,
  AnyStripeObject,
  BalanceTransaction,
  Charge,
  CheckoutSession,
  Customer,
  LineItem,
  PaymentIntent,
  PaymentIntentData,
  PaymentMethod,
  Price,
  Product,
  Refund,
  StripeEvent,
  Transfer,
} from './types';

/** API version the installed stripe@23.1.0 SDK pins; echoed on events and responses. */
export const DEFAULT_API_VERSION = '2026-10-28.endive';

export interface AccountLinkRecord {
  token: string;
  account: string;
  returnUrl: string;
  refreshUrl: string;
  expiresAt: number;
  used: boolean;
}

export interface IdempotencyRecord {
  fingerprint: string;
  status: number;
  body: string;
}

export interface EventOptions {
  previousAttributes?: Record<string, unknown>;
  account?: string;
}

export interface RequestInfo {
  id: string | null;
  idempotencyKey: string | null;
}

export type EventListener = (event: StripeEvent) => void;

export class FakeState {
  readonly customers = new Map<string, Customer>();
  readonly products = new Map<string, Product>();
  readonly prices = new Map<string, Price>();
  readonly sessions = new Map<string, CheckoutSession>();
  readonly paymentIntents = new Map<string, PaymentIntent>();
  readonly paymentMethods = new Map<string, PaymentMethod>();
  readonly charges = new Map<string, Charge>();
  readonly refunds = new Map<string, Refund>();
  readonly accounts = new Map<string, Account>();
  readonly transfers = new Map<string, Transfer>();
  readonly balanceTransactions = new Map<string, BalanceTransaction>();
  readonly events = new Map<string, StripeEvent>();
  /** Side tables: what a session needs that is not part of its public object. */
  readonly sessionLineItems = new Map<string, LineItem[]>();
  readonly sessionPaymentIntentData = new Map<string, PaymentIntentData>();
  readonly accountLinks = new Map<string, AccountLinkRecord>();
  readonly idempotency = new Map<string, IdempotencyRecord>();

  apiVersion = DEFAULT_API_VERSION;
  /** The request being served, so events can carry `request.id` as Stripe's do. */
  currentRequest: RequestInfo = { id: null, idempotencyKey: null };
  private readonly listeners = new Set<EventListener>();

  onEvent(listener: EventListener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  emit(type: string, object: AnyStripeObject, options: EventOptions = {}): StripeEvent {
    const event: StripeEvent = {
      id: newId('evt'),
      object: 'event',
      ...(options.account ? { account: options.account } : {}),
      api_version: this.apiVersion,
      created: nowSeconds(),
      // A snapshot: later changes to the object must not leak into an already created event.
      data: {
        object: structuredClone(object) as unknown as Record<string, unknown>,
        ...(options.previousAttributes ? { previous_attributes: options.previousAttributes } : {}),
      },
      livemode: false,
      pending_webhooks: 0,
      request: { id: this.currentRequest.id, idempotency_key: this.currentRequest.idempotencyKey },
      type,
    };
    this.events.set(event.id, event);
    for (const listener of this.listeners) listener(event);
    return event;
  }

  /** Finds any stored object by id; the prefix tells which table. Used by `expand[]`. */
  findById(id: string): AnyStripeObject | undefined {
    const prefix = id.slice(0, id.indexOf('_') + 1);
    const tables: Record<string, Map<string, AnyStripeObject>> = {
      cus_: this.customers,
      prod_: this.products,
      price_: this.prices,
      cs_: this.sessions,
      pi_: this.paymentIntents,
      pm_: this.paymentMethods,
      ch_: this.charges,
      re_: this.refunds,
      acct_: this.accounts,
      tr_: this.transfers,
      txn_: this.balanceTransactions,
      evt_: this.events,
    };
    return tables[prefix]?.get(id);
  }

  reset(): void {
    for (const value of Object.values(this)) {
      if (value instanceof Map) value.clear();
    }
    this.currentRequest = { id: null, idempotencyKey: null };
  }
}
