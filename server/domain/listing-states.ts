/**
 * The listing life cycle: draft -> submitted -> approved (live) / changes_requested / rejected,
 * then sold_out or withdrawn (source: /work/shared/DOMAIN.md, "The marketplace").
 *
 * Decisions:
 * - `rejected` is final. Rejection is for unsafe or dishonest listings; fixable problems go through
 *   `changes_requested`. A seller who still wants to sell the item creates a new listing, so the rejected
 *   one (and why it was rejected) stays on record untouched.
 * - `withdrawn` can be reopened by its seller (`reopen` -> draft), because a seller who pulled a listing
 *   (item sent to a show, found damaged) often wants it back; it must pass review again from draft.
 * - An administrator may also `reject` a live (approved or sold-out) listing: that is the take-down path for
 *   an unsafe listing found after approval.
 * - A seller may `withdraw` a sold-out listing they will not restock.
 * - Editing an approved or sold-out listing's review-relevant fields sends it back to `submitted`.
 *   Only the fields in `fieldsEditableWithoutReview` keep it live; any other field (including ones added later)
 *   needs review, so new fields are safe by default.
 */

export const listingStates = [
  'draft',
  'submitted',
  'approved',
  'changes_requested',
  'rejected',
  'sold_out',
  'withdrawn',
] as const;
export type ListingState = (typeof listingStates)[number];

export const listingActors = ['seller', 'admin', 'system'] as const;
export type ListingActor = (typeof listingActors)[number];

export const listingActionTypes = [
  'submit',
  'approve',
  'request_changes',
  'reject',
  'withdraw',
  'reopen',
  'sell_out',
  'restock',
  'edit',
] as const;
export type ListingActionType = (typeof listingActionTypes)[number];

/** Fields whose change keeps an approved listing live (stock and commercial details, not what is sold). */
export const fieldsEditableWithoutReview = ['quantity', 'priceCents', 'description', 'shipping', 'pickup'] as const;

/** Fields the lead's listing model is expected to use; others are accepted too and need review. */
export type ListingField =
  | 'partId'
  | 'condition'
  | 'usedGrade'
  | 'rubberUse'
  | 'photos'
  | 'title'
  | (typeof fieldsEditableWithoutReview)[number]
  | (string & {});

export type ListingAction =
  | { type: Exclude<ListingActionType, 'edit'> }
  | { type: 'edit'; changedFields: readonly ListingField[] };

export type TransitionErrorCode = 'unknown_action' | 'forbidden_actor' | 'invalid_transition';

export interface TransitionError {
  code: TransitionErrorCode;
  message: string;
  state: ListingState;
  action: ListingActionType;
  actor: ListingActor;
}

export type TransitionResult = { ok: true; state: ListingState; reviewRequired: boolean } | { ok: false; error: TransitionError };

interface Rule {
  actors: readonly ListingActor[];
  from: readonly ListingState[];
  /** Next state for the simple actions; `edit` is computed. */
  to?: ListingState;
}

const rules: Readonly<Record<ListingActionType, Rule>> = {
  submit: { actors: ['seller'], from: ['draft', 'changes_requested'], to: 'submitted' },
  approve: { actors: ['admin'], from: ['submitted'], to: 'approved' },
  request_changes: { actors: ['admin'], from: ['submitted'], to: 'changes_requested' },
  reject: { actors: ['admin'], from: ['submitted', 'approved', 'sold_out'], to: 'rejected' },
  withdraw: { actors: ['seller'], from: ['draft', 'submitted', 'approved', 'changes_requested', 'sold_out'], to: 'withdrawn' },
  reopen: { actors: ['seller'], from: ['withdrawn'], to: 'draft' },
  sell_out: { actors: ['system'], from: ['approved'], to: 'sold_out' },
  restock: { actors: ['system'], from: ['sold_out'], to: 'approved' },
  edit: { actors: ['seller'], from: ['draft', 'submitted', 'changes_requested', 'approved', 'sold_out'] },
};

export function isListingState(value: unknown): value is ListingState {
  return typeof value === 'string' && (listingStates as readonly string[]).includes(value);
}

/** A listing buyers can see and buy from. */
export function isLive(state: ListingState): boolean {
  return state === 'approved';
}

/** A state nothing can leave. */
export function isFinal(state: ListingState): boolean {
  return state === 'rejected';
}

/** True when any changed field is outside the short list that keeps a live listing approved. */
export function editRequiresReview(changedFields: readonly string[]): boolean {
  if (!Array.isArray(changedFields)) throw new TypeError('changedFields must be an array of field names');
  const keepsApproval = fieldsEditableWithoutReview as readonly string[];
  return changedFields.some((field) => !keepsApproval.includes(field));
}

function fail(code: TransitionErrorCode, message: string, state: ListingState, action: ListingActionType, actor: ListingActor): TransitionResult {
  return { ok: false, error: { code, message, state, action, actor } };
}

/**
 * The next state after `actor` performs `action` on a listing in `state`, or a typed error.
 * Simple actions may be passed as their name: `transition('draft', 'submit', 'seller')`.
 */
export function transition(
  state: ListingState,
  action: ListingAction | Exclude<ListingActionType, 'edit'>,
  actor: ListingActor,
): TransitionResult {
  if (!isListingState(state)) throw new TypeError(`Unknown listing state: ${JSON.stringify(state)}`);
  if (!(listingActors as readonly string[]).includes(actor)) throw new TypeError(`Unknown actor: ${JSON.stringify(actor)}`);
  const act: ListingAction = typeof action === 'string' ? { type: action } : action;
  const type = act?.type as ListingActionType;
  if (!(listingActionTypes as readonly string[]).includes(type)) {
    return fail('unknown_action', `Unknown listing action: ${JSON.stringify(type)}`, state, type, actor);
  }
  const rule = rules[type];
  if (!rule.actors.includes(actor)) {
    return fail('forbidden_actor', `Only ${rule.actors.join(' or ')} may ${type.replaceAll('_', ' ')} a listing.`, state, type, actor);
  }
  if (!rule.from.includes(state)) {
    return fail('invalid_transition', `A listing that is ${state.replaceAll('_', ' ')} cannot be given '${type}'.`, state, type, actor);
  }

  if (act.type === 'edit') {
    if (!Array.isArray(act.changedFields)) throw new TypeError('edit needs changedFields: an array of field names');
    // Drafts and listings already waiting on the seller or an admin stay where they are.
    if (state !== 'approved' && state !== 'sold_out') return { ok: true, state, reviewRequired: false };
    if (editRequiresReview(act.changedFields)) return { ok: true, state: 'submitted', reviewRequired: true };
    return { ok: true, state, reviewRequired: false };
  }
  const next = rule.to as ListingState;
  return { ok: true, state: next, reviewRequired: next === 'submitted' };
}

/** The actions `actor` may take on a listing in `state`, for showing buttons. */
export function allowedActions(state: ListingState, actor: ListingActor): ListingActionType[] {
  return listingActionTypes.filter((type) => rules[type].actors.includes(actor) && rules[type].from.includes(state));
}
