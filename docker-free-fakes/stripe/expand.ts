// `expand[]`: replace an id with the object it names, dotted paths going deeper
// (`payment_intent.latest_charge`), `data.` reaching into list items. Only the fields Stripe
// documents as expandable are, so a typo fails loudly instead of silently returning an id.
import type { FakeState } from './state';
import { StripeFakeError } from './stripe-error';

type Json = Record<string, unknown>;

const EXPANDABLE: Record<string, readonly string[]> = {
  'checkout.session': ['customer', 'payment_intent', 'line_items'],
  payment_intent: ['customer', 'latest_charge', 'payment_method', 'on_behalf_of'],
  charge: ['customer', 'payment_intent', 'balance_transaction', 'payment_method', 'transfer', 'on_behalf_of', 'refunds'],
  refund: ['charge', 'payment_intent', 'balance_transaction'],
  transfer: ['destination', 'balance_transaction', 'source_transaction'],
  balance_transaction: ['source'],
  item: ['price'],
  price: ['product'],
};

// source: Stripe API reference, "Expanding responses" (at most four levels), from memory
const MAX_LEVELS = 4;

export function expandObject(state: FakeState, object: Json, paths: readonly string[]): Json {
  for (const path of paths) {
    const segments = path.split('.');
    if (object.object === 'list') {
      if (segments[0] !== 'data' || segments.length < 2) throw cannotExpand(path);
      const items = object.data as Json[];
      for (const item of items) expandPath(state, item, segments.slice(1), path);
    } else {
      expandPath(state, object, segments, path);
    }
  }
  return object;
}

function expandPath(state: FakeState, object: Json, segments: string[], fullPath: string): void {
  if (segments.length > MAX_LEVELS) {
    throw StripeFakeError.invalidRequest(`You cannot expand more than ${MAX_LEVELS} levels of a property. Property: ${fullPath}`, {
      param: 'expand',
    });
  }
  const [field, ...rest] = segments;
  const allowed = EXPANDABLE[String(object.object)] ?? [];
  if (!allowed.includes(field)) throw cannotExpand(fullPath);

  let value = object[field];
  if (typeof value === 'string') {
    const found = state.findById(value);
    if (!found) throw cannotExpand(fullPath);
    value = structuredClone(found) as unknown as Json;
    object[field] = value;
  } else if (value === undefined) {
    value = includable(state, object, field);
    if (value === undefined) throw cannotExpand(fullPath);
    object[field] = value;
  }
  if (rest.length > 0 && value !== null && typeof value === 'object') {
    const target = value as Json;
    if (target.object === 'list') {
      if (rest[0] !== 'data' || rest.length < 2) throw cannotExpand(fullPath);
      for (const item of target.data as Json[]) expandPath(state, item, rest.slice(1), fullPath);
    } else {
      expandPath(state, target, rest, fullPath);
    }
  }
}

/** Properties that exist only when asked for (Stripe calls them "includable"). */
function includable(state: FakeState, object: Json, field: string): Json | undefined {
  if (object.object === 'checkout.session' && field === 'line_items') {
    const id = String(object.id);
    const items = state.sessionLineItems.get(id) ?? [];
    return {
      object: 'list',
      data: structuredClone(items),
      has_more: false,
      url: `/v1/checkout/sessions/${id}/line_items`,
    };
  }
  if (object.object === 'charge' && field === 'refunds') {
    const id = String(object.id);
    const refunds = [...state.refunds.values()].filter((r) => r.charge === id).reverse();
    return { object: 'list', data: structuredClone(refunds), has_more: false, url: `/v1/charges/${id}/refunds` };
  }
  return undefined;
}

function cannotExpand(path: string): StripeFakeError {
  return StripeFakeError.invalidRequest(`This property cannot be expanded (${path}).`, { param: 'expand' });
}
