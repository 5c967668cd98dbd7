// The Stripe v1 endpoints the stand-in answers, as (method, path pattern, handler).
import { listBalanceTransactions, retrieveBalance, retrieveBalanceTransaction } from './balance';
import {
  createCheckoutSession,
  expireCheckoutSession,
  listCheckoutSessions,
  listSessionLineItems,
  retrieveCheckoutSession,
} from './checkout';
import { createAccount, createAccountLink, createTransfer, createTransferReversal, listAccounts, listTransferReversals, listTransfers, retrieveAccount, retrieveTransfer, updateAccount } from './connect';
import type { ApiHandler } from './context';
import { createCustomer, listCustomers, retrieveCustomer, updateCustomer } from './customers';
import { listEvents, retrieveEvent } from './events';
import { createRefund, listCharges, listPaymentIntents, listRefunds, retrieveCharge, retrievePaymentIntent, retrieveRefund } from './payments';

export interface Route {
  method: 'GET' | 'POST';
  pattern: RegExp;
  keys: string[];
  handler: ApiHandler;
}

function route(method: Route['method'], path: string, handler: ApiHandler): Route {
  const keys: string[] = [];
  const source = path.replace(/:([a-z_]+)/g, (_, key: string) => {
    keys.push(key);
    return '([^/]+)';
  });
  return { method, pattern: new RegExp(`^${source}$`), keys, handler };
}

export const API_ROUTES: readonly Route[] = [
  route('POST', '/v1/customers', createCustomer),
  route('GET', '/v1/customers', listCustomers),
  route('GET', '/v1/customers/:id', retrieveCustomer),
  route('POST', '/v1/customers/:id', updateCustomer),

  route('POST', '/v1/checkout/sessions', createCheckoutSession),
  route('GET', '/v1/checkout/sessions', listCheckoutSessions),
  route('GET', '/v1/checkout/sessions/:id', retrieveCheckoutSession),
  route('GET', '/v1/checkout/sessions/:id/line_items', listSessionLineItems),
  route('POST', '/v1/checkout/sessions/:id/expire', expireCheckoutSession),

  route('GET', '/v1/payment_intents', listPaymentIntents),
  route('GET', '/v1/payment_intents/:id', retrievePaymentIntent),
  route('GET', '/v1/charges', listCharges),
  route('GET', '/v1/charges/:id', retrieveCharge),
  route('POST', '/v1/refunds', createRefund),
  route('GET', '/v1/refunds', listRefunds),
  route('GET', '/v1/refunds/:id', retrieveRefund),

  route('POST', '/v1/accounts', createAccount),
  route('GET', '/v1/accounts', listAccounts),
  route('GET', '/v1/accounts/:id', retrieveAccount),
  route('POST', '/v1/accounts/:id', updateAccount),
  route('POST', '/v1/account_links', createAccountLink),
  route('POST', '/v1/transfers', createTransfer),
  route('GET', '/v1/transfers', listTransfers),
  route('GET', '/v1/transfers/:id', retrieveTransfer),
  route('POST', '/v1/transfers/:id/reversals', createTransferReversal),
  route('GET', '/v1/transfers/:id/reversals', listTransferReversals),

  route('GET', '/v1/balance', retrieveBalance),
  route('GET', '/v1/balance_transactions', listBalanceTransactions),
  route('GET', '/v1/balance_transactions/:id', retrieveBalanceTransaction),

  route('GET', '/v1/events', listEvents),
  route('GET', '/v1/events/:id', retrieveEvent),
];

export function matchRoute(routes: readonly Route[], method: string, pathname: string): { route: Route; path: Record<string, string> } | undefined {
  for (const candidate of routes) {
    if (candidate.method !== method) continue;
    const m = candidate.pattern.exec(pathname);
    if (!m) continue;
    const path: Record<string, string> = {};
    candidate.keys.forEach((key, i) => {
      path[key] = decodeURIComponent(m[i + 1]);
    });
    return { route: candidate, path };
  }
  return undefined;
}
