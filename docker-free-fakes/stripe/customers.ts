import { type ApiHandler, mustFind, render } from './context';
import { newId, nowSeconds } from './ids';
import { paginate } from './list';
import { checkParams, createMetadata, EXPAND, LIST_PARAMS, mergeMetadata, metadata, obj, str, type ParamSpec } from './params';
import type { Address, Customer, Metadata } from './types';

const ADDRESS = obj({ city: str(), country: str(), line1: str(), line2: str(), postal_code: str(), state: str() });

const CUSTOMER_FIELDS: Record<string, ParamSpec> = {
  email: str({ maxLength: 512 }),
  name: str({ maxLength: 256 }),
  description: str({ maxLength: 350 }),
  phone: str({ maxLength: 20 }),
  address: ADDRESS,
  preferred_locales: { kind: 'array', of: str() },
  metadata: metadata(),
  expand: EXPAND,
};

interface CustomerParams {
  email?: string;
  name?: string;
  description?: string;
  phone?: string;
  address?: Partial<Address>;
  preferred_locales?: string[];
  metadata?: Metadata;
  expand?: string[];
}

function toAddress(given: Partial<Address> | undefined): Address | null {
  if (!given) return null;
  return {
    city: given.city ?? null,
    country: given.country ?? null,
    line1: given.line1 ?? null,
    line2: given.line2 ?? null,
    postal_code: given.postal_code ?? null,
    state: given.state ?? null,
  };
}

export const createCustomer: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, CUSTOMER_FIELDS) as CustomerParams;
  const customer: Customer = {
    id: newId('cus', 14),
    object: 'customer',
    address: toAddress(p.address),
    balance: 0,
    created: nowSeconds(),
    currency: null,
    default_source: null,
    delinquent: false,
    description: p.description ?? null,
    email: p.email ?? null,
    invoice_prefix: Math.random().toString(16).slice(2, 10).toUpperCase(),
    livemode: false,
    metadata: createMetadata(p.metadata),
    name: p.name ?? null,
    phone: p.phone ?? null,
    preferred_locales: p.preferred_locales ?? [],
    shipping: null,
    tax_exempt: 'none',
    test_clock: null,
  };
  state.customers.set(customer.id, customer);
  return render(state, customer, p.expand);
};

export const retrieveCustomer: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, { expand: EXPAND }) as { expand?: string[] };
  return render(state, mustFind(state.customers, path.id, 'customer'), p.expand);
};

export const updateCustomer: ApiHandler = ({ state, params, path }) => {
  const customer = mustFind(state.customers, path.id, 'customer');
  const p = checkParams(params, CUSTOMER_FIELDS) as CustomerParams;
  if (p.email !== undefined) customer.email = p.email;
  if (p.name !== undefined) customer.name = p.name;
  if (p.description !== undefined) customer.description = p.description;
  if (p.phone !== undefined) customer.phone = p.phone;
  if (p.address !== undefined) customer.address = toAddress(p.address);
  if (p.preferred_locales !== undefined) customer.preferred_locales = p.preferred_locales;
  customer.metadata = mergeMetadata(customer.metadata, p.metadata);
  return render(state, customer, p.expand);
};

export const listCustomers: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, { ...LIST_PARAMS, email: str() }) as { email?: string; expand?: string[] };
  const items = [...state.customers.values()].filter((c) => p.email === undefined || c.email === p.email);
  return render(state, paginate(items, p, '/v1/customers', 'customer'), p.expand);
};
