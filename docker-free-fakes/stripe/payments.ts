// Payment intents and charges (read side) and refunds.
import { addBalanceTransaction } from './balance';
import { type ApiHandler, mustFind, render } from './context';
import { newId, nowSeconds } from './ids';
import { paginate } from './list';
import { stripeAmountText } from './money';
import { bool, checkParams, createMetadata, EXPAND, int, LIST_PARAMS, metadata, oneOf, str } from './params';
import type { FakeState } from './state';
import { StripeFakeError } from './stripe-error';
import type { Charge, Metadata, Refund } from './types';

export const retrievePaymentIntent: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, { expand: EXPAND, client_secret: str() }) as { expand?: string[] };
  return render(state, mustFind(state.paymentIntents, path.id, 'payment_intent'), p.expand);
};

export const listPaymentIntents: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, { ...LIST_PARAMS, customer: str() }) as { customer?: string; expand?: string[] };
  const items = [...state.paymentIntents.values()].filter((pi) => p.customer === undefined || pi.customer === p.customer);
  return render(state, paginate(items, p, '/v1/payment_intents', 'payment_intent'), p.expand);
};

export const retrieveCharge: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, { expand: EXPAND }) as { expand?: string[] };
  return render(state, mustFind(state.charges, path.id, 'charge'), p.expand);
};

export const listCharges: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, { ...LIST_PARAMS, customer: str(), payment_intent: str(), transfer_group: str() }) as {
    customer?: string;
    payment_intent?: string;
    transfer_group?: string;
    expand?: string[];
  };
  const items = [...state.charges.values()].filter(
    (c) =>
      (p.customer === undefined || c.customer === p.customer) &&
      (p.payment_intent === undefined || c.payment_intent === p.payment_intent) &&
      (p.transfer_group === undefined || c.transfer_group === p.transfer_group),
  );
  return render(state, paginate(items, p, '/v1/charges', 'charge'), p.expand);
};

interface RefundParams {
  payment_intent?: string;
  charge?: string;
  amount?: number;
  metadata?: Metadata;
  reason?: string;
  reverse_transfer?: boolean;
  refund_application_fee?: boolean;
  expand?: string[];
}

export const createRefund: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, {
    payment_intent: str(),
    charge: str(),
    amount: int({ min: 1 }),
    metadata: metadata(),
    reason: oneOf(['duplicate', 'fraudulent', 'requested_by_customer']),
    reverse_transfer: bool(),
    refund_application_fee: bool(),
    expand: EXPAND,
  }) as RefundParams;
  if (p.reverse_transfer || p.refund_application_fee) {
    throw StripeFakeError.notEmulated('Reversing transfers or application fees on refund', p.reverse_transfer ? 'reverse_transfer' : 'refund_application_fee');
  }
  const charge = chargeToRefund(state, p);
  const left = charge.amount - charge.amount_refunded;
  if (left <= 0) {
    throw StripeFakeError.invalidRequest(`Charge ${charge.id} has already been refunded.`, { code: 'charge_already_refunded' });
  }
  const amount = p.amount ?? left;
  if (amount > left) {
    throw StripeFakeError.invalidRequest(
      `Refund amount (${stripeAmountText(amount, charge.currency)}) is greater than unrefunded amount on charge (${stripeAmountText(left, charge.currency)})`,
      { code: 'amount_too_large', param: 'amount' },
    );
  }
  const id = newId('re');
  const txn = addBalanceTransaction(state, { amount: -amount, currency: charge.currency, type: 'refund', source: id, description: 'REFUND FOR CHARGE' });
  const refund: Refund = {
    id,
    object: 'refund',
    amount,
    balance_transaction: txn.id,
    charge: charge.id,
    created: nowSeconds(),
    currency: charge.currency,
    metadata: createMetadata(p.metadata),
    payment_intent: charge.payment_intent,
    reason: p.reason ?? null,
    receipt_number: null,
    status: 'succeeded',
  };
  state.refunds.set(id, refund);
  const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded === charge.amount;
  state.emit('refund.created', refund);
  state.emit('charge.refunded', charge, { previousAttributes: previous });
  return render(state, refund, p.expand);
};

function chargeToRefund(state: FakeState, p: RefundParams): Charge {
  if (p.payment_intent && p.charge) {
    throw StripeFakeError.invalidRequest('You may only specify one of these parameters: charge, payment_intent.');
  }
  if (p.charge) {
    const charge = state.charges.get(p.charge);
    if (!charge) throw StripeFakeError.noSuchReferenced('charge', p.charge, 'charge');
    if (charge.status !== 'succeeded') throw StripeFakeError.invalidRequest(`Charge ${charge.id} did not succeed and cannot be refunded.`, { param: 'charge' });
    return charge;
  }
  if (p.payment_intent) {
    const intent = state.paymentIntents.get(p.payment_intent);
    if (!intent) throw StripeFakeError.noSuchReferenced('payment_intent', p.payment_intent, 'payment_intent');
    const charge = intent.latest_charge ? state.charges.get(intent.latest_charge) : undefined;
    if (intent.status !== 'succeeded' || !charge || charge.status !== 'succeeded') {
      throw StripeFakeError.invalidRequest(`This PaymentIntent (${intent.id}) does not have a successful charge to refund.`, {
        code: 'charge_not_refundable',
        param: 'payment_intent',
      });
    }
    return charge;
  }
  throw StripeFakeError.invalidRequest('One of the following params should be provided for this request: payment_intent or charge.', {
    code: 'parameter_missing',
  });
}

export const retrieveRefund: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, { expand: EXPAND }) as { expand?: string[] };
  return render(state, mustFind(state.refunds, path.id, 'refund'), p.expand);
};

export const listRefunds: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, { ...LIST_PARAMS, charge: str(), payment_intent: str() }) as {
    charge?: string;
    payment_intent?: string;
    expand?: string[];
  };
  const items = [...state.refunds.values()].filter(
    (r) => (p.charge === undefined || r.charge === p.charge) && (p.payment_intent === undefined || r.payment_intent === p.payment_intent),
  );
  return render(state, paginate(items, p, '/v1/refunds', 'refund'), p.expand);
};
