// The platform's balance, kept as balance transactions. Simplification (documented in README): funds
// from a successful charge are available at once, where Stripe's test mode would hold them pending.
import { type ApiHandler, mustFind, render } from './context';
import { newId, nowSeconds } from './ids';
import { paginate } from './list';
import { checkParams, EXPAND, LIST_PARAMS, oneOf, str } from './params';
import type { FakeState } from './state';
import type { BalanceTransaction } from './types';

export interface NewBalanceTransaction {
  amount: number;
  currency: string;
  fee?: number;
  type: BalanceTransaction['type'];
  source: string;
  description?: string | null;
}

export function addBalanceTransaction(state: FakeState, input: NewBalanceTransaction): BalanceTransaction {
  const fee = input.fee ?? 0;
  const created = nowSeconds();
  const txn: BalanceTransaction = {
    id: newId('txn'),
    object: 'balance_transaction',
    amount: input.amount,
    available_on: created,
    created,
    currency: input.currency,
    description: input.description ?? null,
    exchange_rate: null,
    fee,
    fee_details: fee ? [{ amount: fee, application: null, currency: input.currency, description: 'Stripe processing fees', type: 'stripe_fee' }] : [],
    net: input.amount - fee,
    reporting_category: input.type,
    source: input.source,
    status: 'available',
    type: input.type,
  };
  state.balanceTransactions.set(txn.id, txn);
  return txn;
}

export function availableBalance(state: FakeState, currency: string): number {
  let sum = 0;
  for (const txn of state.balanceTransactions.values()) if (txn.currency === currency) sum += txn.net;
  return sum;
}

export const retrieveBalance: ApiHandler = ({ state, params }) => {
  checkParams(params, { expand: EXPAND });
  const currencies = new Set([...state.balanceTransactions.values()].map((t) => t.currency));
  if (currencies.size === 0) currencies.add('usd');
  const available = [...currencies].map((currency) => ({
    amount: availableBalance(state, currency),
    currency,
    source_types: { card: availableBalance(state, currency) },
  }));
  return {
    body: {
      object: 'balance',
      available,
      livemode: false,
      pending: available.map((a) => ({ amount: 0, currency: a.currency, source_types: { card: 0 } })),
    },
  };
};

export const retrieveBalanceTransaction: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, { expand: EXPAND }) as { expand?: string[] };
  return render(state, mustFind(state.balanceTransactions, path.id, 'balance transaction'), p.expand);
};

export const listBalanceTransactions: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, { ...LIST_PARAMS, source: str(), type: oneOf(['charge', 'refund', 'transfer', 'transfer_refund']), currency: str() }) as {
    source?: string;
    type?: string;
    currency?: string;
    expand?: string[];
  };
  const items = [...state.balanceTransactions.values()].filter(
    (t) => (p.source === undefined || t.source === p.source) && (p.type === undefined || t.type === p.type) && (p.currency === undefined || t.currency === p.currency),
  );
  return render(state, paginate(items, p, '/v1/balance_transactions', 'balance transaction'), p.expand);
};
