// Connected accounts (marketplace sellers), onboarding links and transfers to them.
import { addBalanceTransaction, availableBalance } from './balance';
import { type ApiHandler, mustFind, render } from './context';
import { newId, nowSeconds } from './ids';
import { paginate } from './list';
import { isCurrencyCode, stripeAmountText } from './money';
import { bool, checkParams, createMetadata, EXPAND, int, LIST_PARAMS, mergeMetadata, metadata, obj, oneOf, str, url } from './params';
import type { FakeState } from './state';
import { StripeFakeError } from './stripe-error';
import type { Account, AccountLink, Metadata, Requirements, Transfer, TransferReversal } from './types';

// What onboarding would ask an individual seller for; cleared once onboarding is done.
const ONBOARDING_DUE = ['business_profile.url', 'business_type', 'external_account', 'tos_acceptance.date', 'tos_acceptance.ip'];

function openRequirements(): Requirements {
  return {
    alternatives: [],
    current_deadline: null,
    currently_due: [...ONBOARDING_DUE],
    disabled_reason: 'requirements.past_due',
    errors: [],
    eventually_due: [...ONBOARDING_DUE],
    past_due: [...ONBOARDING_DUE],
    pending_verification: [],
  };
}

const CAPABILITY = obj({ requested: bool() });
const BUSINESS_PROFILE = obj({ mcc: str(), name: str(), product_description: str(), support_email: str(), url: str() });

interface AccountParams {
  type?: Account['type'];
  email?: string;
  country?: string;
  business_type?: string;
  default_currency?: string;
  capabilities?: Record<string, { requested?: boolean }>;
  business_profile?: Partial<Account['business_profile']>;
  metadata?: Metadata;
  expand?: string[];
}

const CAPABILITY_NAMES = ['card_payments', 'transfers'] as const;

export const createAccount: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, {
    type: oneOf(['express', 'custom', 'standard'], true),
    email: str(),
    country: str(),
    business_type: oneOf(['individual', 'company', 'non_profit', 'government_entity']),
    default_currency: str(),
    capabilities: obj(Object.fromEntries(CAPABILITY_NAMES.map((name) => [name, CAPABILITY]))),
    business_profile: BUSINESS_PROFILE,
    metadata: metadata(),
    expand: EXPAND,
  }) as AccountParams;

  // Stripe wants capabilities requested explicitly for express/custom; we default to the two a
  // marketplace seller needs rather than fail, which is what Drabyard would request anyway.
  const requested = p.capabilities ? CAPABILITY_NAMES.filter((name) => p.capabilities?.[name]?.requested) : [...CAPABILITY_NAMES];
  const id = newId('acct', 16);
  const account: Account = {
    id,
    object: 'account',
    business_profile: {
      mcc: p.business_profile?.mcc ?? null,
      name: p.business_profile?.name ?? null,
      product_description: p.business_profile?.product_description ?? null,
      support_email: p.business_profile?.support_email ?? null,
      url: p.business_profile?.url ?? null,
    },
    business_type: p.business_type ?? null,
    capabilities: Object.fromEntries(requested.map((name) => [name, 'inactive' as const])),
    charges_enabled: false,
    country: (p.country ?? 'US').toUpperCase(),
    created: nowSeconds(),
    default_currency: (p.default_currency ?? 'usd').toLowerCase(),
    details_submitted: false,
    email: p.email ?? null,
    external_accounts: { object: 'list', data: [], has_more: false, total_count: 0, url: `/v1/accounts/${id}/external_accounts` },
    livemode: false,
    metadata: createMetadata(p.metadata),
    payouts_enabled: false,
    requirements: openRequirements(),
    tos_acceptance: { date: null },
    type: p.type ?? 'express',
  };
  state.accounts.set(account.id, account);
  return render(state, account, p.expand);
};

export const retrieveAccount: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, { expand: EXPAND }) as { expand?: string[] };
  return render(state, mustFind(state.accounts, path.id, 'account'), p.expand);
};

export const updateAccount: ApiHandler = ({ state, params, path }) => {
  const account = mustFind(state.accounts, path.id, 'account');
  const p = checkParams(params, { email: str(), business_profile: BUSINESS_PROFILE, metadata: metadata(), expand: EXPAND }) as AccountParams;
  const before = structuredClone(account);
  if (p.email !== undefined) account.email = p.email;
  if (p.business_profile) account.business_profile = { ...account.business_profile, ...p.business_profile };
  account.metadata = mergeMetadata(account.metadata, p.metadata);
  const previous = changedFields(before, account);
  if (Object.keys(previous).length > 0) state.emit('account.updated', account, { previousAttributes: previous, account: account.id });
  return render(state, account, p.expand);
};

export const listAccounts: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, LIST_PARAMS) as { expand?: string[] };
  return render(state, paginate([...state.accounts.values()], p, '/v1/accounts', 'account'), p.expand);
};

function changedFields(before: Account, after: Account): Record<string, unknown> {
  const previous: Record<string, unknown> = {};
  for (const key of Object.keys(after) as (keyof Account)[]) {
    if (JSON.stringify(before[key]) !== JSON.stringify(after[key])) previous[key] = before[key];
  }
  return previous;
}

/** What the onboarding page's "Complete onboarding" does. */
export function completeOnboarding(state: FakeState, accountId: string): Account {
  const account = mustFind(state.accounts, accountId, 'account');
  if (account.details_submitted && account.charges_enabled && account.payouts_enabled) return account;
  const before = structuredClone(account);
  account.charges_enabled = true;
  account.payouts_enabled = true;
  account.details_submitted = true;
  account.capabilities = Object.fromEntries(Object.keys(account.capabilities).map((name) => [name, 'active' as const]));
  account.requirements = { ...openRequirements(), currently_due: [], eventually_due: [], past_due: [], disabled_reason: null };
  account.tos_acceptance = { date: nowSeconds() };
  state.emit('account.updated', account, { previousAttributes: changedFields(before, account), account: account.id });
  return account;
}

// source: Stripe API reference, Account Links (links are short-lived, single use; 300 s), from memory
const ACCOUNT_LINK_TTL_SECONDS = 300;

export const createAccountLink: ApiHandler = ({ state, params, publicBaseUrl }) => {
  const p = checkParams(params, {
    account: str({ required: true }),
    type: oneOf(['account_onboarding', 'account_update'], true),
    refresh_url: url(true),
    return_url: url(true),
    collect: oneOf(['currently_due', 'eventually_due']),
    expand: EXPAND,
  }) as { account: string; type: string; refresh_url: string; return_url: string };
  if (!state.accounts.has(p.account)) throw StripeFakeError.noSuchReferenced('account', p.account, 'account');
  const created = nowSeconds();
  const token = newId('link', 20).slice(5);
  state.accountLinks.set(token, {
    token,
    account: p.account,
    returnUrl: p.return_url,
    refreshUrl: p.refresh_url,
    expiresAt: created + ACCOUNT_LINK_TTL_SECONDS,
    used: false,
  });
  const query = new URLSearchParams({ link: token, return_url: p.return_url, refresh_url: p.refresh_url });
  const link: AccountLink = {
    object: 'account_link',
    created,
    expires_at: created + ACCOUNT_LINK_TTL_SECONDS,
    url: `${publicBaseUrl}/connect/onboarding/${p.account}?${query.toString()}`,
  };
  return { body: { ...link } };
};

export interface NewTransfer {
  amount: number;
  currency: string;
  destination: string;
  transferGroup: string | null;
  sourceTransaction: string | null;
  description: string | null;
  metadata: Metadata;
  /** Param names for error messages (differ for destination charges). */
  destinationParam: string;
}

/** Checks that a connected account can receive transfers (Stripe's rule: transfers capability active). */
export function assertCanReceiveTransfers(state: FakeState, destination: string, param: string): Account {
  const account = state.accounts.get(destination);
  if (!account) throw StripeFakeError.noSuchReferenced('destination', destination, param);
  if (account.capabilities.transfers !== 'active' || !account.payouts_enabled) {
    throw new StripeFakeError(400, {
      type: 'invalid_request_error',
      code: 'insufficient_capabilities_for_transfer',
      message:
        'Your destination account needs to have at least one of the following capabilities enabled: transfers, crypto_transfers, legacy_payments',
      param,
    });
  }
  return account;
}

export function createTransferRecord(state: FakeState, input: NewTransfer): Transfer {
  assertCanReceiveTransfers(state, input.destination, input.destinationParam);
  if (input.sourceTransaction) {
    const charge = state.charges.get(input.sourceTransaction);
    if (!charge) throw StripeFakeError.noSuchReferenced('charge', input.sourceTransaction, 'source_transaction');
    if (charge.status !== 'succeeded') {
      throw StripeFakeError.invalidRequest(`The source_transaction ${charge.id} has not succeeded.`, { param: 'source_transaction' });
    }
    if (charge.currency !== input.currency) {
      throw StripeFakeError.invalidRequest(`The currency of source_transaction ${charge.id} must be the same as the transfer currency.`, {
        param: 'currency',
      });
    }
    const alreadyTransferred = [...state.transfers.values()]
      .filter((t) => t.source_transaction === charge.id)
      .reduce((sum, t) => sum + t.amount - t.amount_reversed, 0);
    const left = charge.amount - charge.amount_refunded - alreadyTransferred;
    if (input.amount > left) {
      throw new StripeFakeError(400, {
        type: 'invalid_request_error',
        code: 'balance_insufficient',
        message: `Transfer amount (${stripeAmountText(input.amount, input.currency)}) exceeds what is left of source_transaction ${charge.id} (${stripeAmountText(left, input.currency)}).`,
        param: 'amount',
      });
    }
  } else if (availableBalance(state, input.currency) < input.amount) {
    throw new StripeFakeError(400, {
      type: 'invalid_request_error',
      code: 'balance_insufficient',
      message: 'You have insufficient available funds in your Stripe account. Pay a checkout session with a test card first, or pass source_transaction.',
      param: 'amount',
    });
  }
  const id = newId('tr');
  const txn = addBalanceTransaction(state, { amount: -input.amount, currency: input.currency, type: 'transfer', source: id, description: input.description });
  const transfer: Transfer = {
    id,
    object: 'transfer',
    amount: input.amount,
    amount_reversed: 0,
    balance_transaction: txn.id,
    created: nowSeconds(),
    currency: input.currency,
    description: input.description,
    destination: input.destination,
    destination_payment: newId('py'),
    livemode: false,
    metadata: input.metadata,
    reversals: { object: 'list', data: [], has_more: false, total_count: 0, url: `/v1/transfers/${id}/reversals` },
    reversed: false,
    source_transaction: input.sourceTransaction,
    source_type: 'card',
    transfer_group: input.transferGroup,
  };
  state.transfers.set(id, transfer);
  state.emit('transfer.created', transfer);
  return transfer;
}

export const createTransfer: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, {
    amount: int({ required: true, min: 1 }),
    currency: str({ required: true }),
    destination: str({ required: true }),
    transfer_group: str(),
    source_transaction: str(),
    source_type: oneOf(['card', 'bank_account', 'fpx']),
    description: str(),
    metadata: metadata(),
    expand: EXPAND,
  }) as {
    amount: number;
    currency: string;
    destination: string;
    transfer_group?: string;
    source_transaction?: string;
    description?: string;
    metadata?: Metadata;
    expand?: string[];
  };
  const currency = p.currency.toLowerCase();
  if (!isCurrencyCode(currency)) throw StripeFakeError.invalidParam('currency', `Invalid currency: ${p.currency}`);
  const transfer = createTransferRecord(state, {
    amount: p.amount,
    currency,
    destination: p.destination,
    transferGroup: p.transfer_group ?? null,
    sourceTransaction: p.source_transaction ?? null,
    description: p.description ?? null,
    metadata: createMetadata(p.metadata),
    destinationParam: 'destination',
  });
  return render(state, transfer, p.expand);
};

export const retrieveTransfer: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, { expand: EXPAND }) as { expand?: string[] };
  return render(state, mustFind(state.transfers, path.id, 'transfer'), p.expand);
};

export const listTransfers: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, { ...LIST_PARAMS, transfer_group: str(), destination: str() }) as {
    transfer_group?: string;
    destination?: string;
    expand?: string[];
  };
  const items = [...state.transfers.values()].filter(
    (t) => (p.transfer_group === undefined || t.transfer_group === p.transfer_group) && (p.destination === undefined || t.destination === p.destination),
  );
  return render(state, paginate(items, p, '/v1/transfers', 'transfer'), p.expand);
};

/**
 * Takes money back from the connected account out of a transfer (all that is left when no amount is given).
 * The platform's balance grows by it; `transfer.reversed` fires, as Stripe fires it for partial reversals too.
 */
export const createTransferReversal: ApiHandler = ({ state, params, path }) => {
  const transfer = mustFind(state.transfers, path.id, 'transfer');
  const p = checkParams(params, { amount: int({ min: 1 }), description: str(), metadata: metadata(), refund_application_fee: bool(), expand: EXPAND }) as {
    amount?: number;
    metadata?: Metadata;
    expand?: string[];
  };
  const left = transfer.amount - transfer.amount_reversed;
  const amount = p.amount ?? left;
  if (left === 0) throw StripeFakeError.invalidRequest(`Transfer ${transfer.id} has already been fully reversed.`, { param: 'amount' });
  if (amount > left) {
    throw StripeFakeError.invalidParam('amount', `Reversal amount (${stripeAmountText(amount, transfer.currency)}) exceeds what is left of transfer ${transfer.id} (${stripeAmountText(left, transfer.currency)}).`);
  }
  const id = newId('trr');
  const txn = addBalanceTransaction(state, { amount, currency: transfer.currency, type: 'transfer_refund', source: id, description: `Reversal of ${transfer.id}` });
  const reversal: TransferReversal = {
    id,
    object: 'transfer_reversal',
    amount,
    balance_transaction: txn.id,
    created: nowSeconds(),
    currency: transfer.currency,
    destination_payment_refund: newId('pyr'),
    metadata: createMetadata(p.metadata),
    source_refund: null,
    transfer: transfer.id,
  };
  transfer.amount_reversed += amount;
  transfer.reversed = transfer.amount_reversed === transfer.amount;
  transfer.reversals.data.unshift(reversal);
  transfer.reversals.total_count = transfer.reversals.data.length;
  state.emit('transfer.reversed', transfer);
  return render(state, reversal, p.expand);
};

export const listTransferReversals: ApiHandler = ({ state, params, path }) => {
  const transfer = mustFind(state.transfers, path.id, 'transfer');
  const p = checkParams(params, { ...LIST_PARAMS }) as { expand?: string[] };
  return render(state, paginate([...transfer.reversals.data].reverse(), p, `/v1/transfers/${transfer.id}/reversals`, 'transfer reversal'), p.expand);
};
