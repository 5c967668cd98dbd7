import { describe, expect, it } from 'vitest';
import {
  allowedActions,
  editRequiresReview,
  isFinal,
  isLive,
  listingStates,
  transition,
  type ListingAction,
  type ListingActor,
  type ListingState,
} from './listing-states';

function next(state: ListingState, action: ListingAction | Exclude<ListingAction['type'], 'edit'>, actor: ListingActor) {
  const result = transition(state, action, actor);
  if (!result.ok) throw new Error(`unexpected error: ${result.error.code} ${result.error.message}`);
  return result.state;
}

describe('transition: the happy path', () => {
  it('when a seller submits a draft and an admin approves it, then it goes live', () => {
    const submitted = next('draft', 'submit', 'seller');
    expect(submitted).toBe('submitted');
    const approved = next(submitted, 'approve', 'admin');
    expect(approved).toBe('approved');
    expect(isLive(approved)).toBe(true);
  });

  it('when an admin requests changes and the seller resubmits, then it is back in review', () => {
    expect(next('submitted', 'request_changes', 'admin')).toBe('changes_requested');
    expect(next('changes_requested', 'submit', 'seller')).toBe('submitted');
  });

  it('when the system sells out and restocks a live listing, then it goes sold_out and back to approved', () => {
    expect(next('approved', 'sell_out', 'system')).toBe('sold_out');
    expect(next('sold_out', 'restock', 'system')).toBe('approved');
  });

  it('when a seller withdraws from any open state, then it is withdrawn', () => {
    for (const s of ['draft', 'submitted', 'approved', 'changes_requested', 'sold_out'] as const) {
      expect(next(s, 'withdraw', 'seller')).toBe('withdrawn');
    }
  });

  it('when a seller reopens a withdrawn listing, then it becomes a draft that needs review again', () => {
    expect(next('withdrawn', 'reopen', 'seller')).toBe('draft');
  });
});

describe('transition: refusals', () => {
  it('when a seller tries to approve, then the error says the actor is not allowed', () => {
    const result = transition('submitted', 'approve', 'seller');
    expect(result).toMatchObject({ ok: false, error: { code: 'forbidden_actor', state: 'submitted', action: 'approve' } });
  });

  it('when an admin approves a draft that was never submitted, then the transition is invalid', () => {
    expect(transition('draft', 'approve', 'admin')).toMatchObject({ ok: false, error: { code: 'invalid_transition' } });
  });

  it('when a seller tries to sell out a listing, then only the system may', () => {
    expect(transition('approved', 'sell_out', 'seller')).toMatchObject({ ok: false, error: { code: 'forbidden_actor' } });
  });

  it('when restocking a listing that is not sold out, then the transition is invalid', () => {
    expect(transition('approved', 'restock', 'system')).toMatchObject({ ok: false, error: { code: 'invalid_transition' } });
  });

  it('when anything is done to a rejected listing, then it stays final', () => {
    expect(isFinal('rejected')).toBe(true);
    for (const actor of ['seller', 'admin', 'system'] as const) expect(allowedActions('rejected', actor)).toEqual([]);
    expect(transition('rejected', 'submit', 'seller')).toMatchObject({ ok: false, error: { code: 'invalid_transition' } });
  });

  it('when an unknown action is given, then a typed unknown_action error comes back', () => {
    const result = transition('draft', { type: 'publish' } as unknown as ListingAction, 'seller');
    expect(result).toMatchObject({ ok: false, error: { code: 'unknown_action' } });
  });

  it('when the state itself is unknown, then a clear error is thrown', () => {
    expect(() => transition('live' as ListingState, 'submit', 'seller')).toThrow(/Unknown listing state/);
  });
});

describe('transition: admin take-down', () => {
  it('when an admin rejects a live or sold-out listing, then it is taken down as rejected', () => {
    expect(next('approved', 'reject', 'admin')).toBe('rejected');
    expect(next('sold_out', 'reject', 'admin')).toBe('rejected');
  });
});

describe('transition: edits', () => {
  it("when an approved listing's part, condition or photos change, then it goes back to review", () => {
    for (const field of ['partId', 'condition', 'photos']) {
      const result = transition('approved', { type: 'edit', changedFields: [field] }, 'seller');
      expect(result).toEqual({ ok: true, state: 'submitted', reviewRequired: true });
    }
  });

  it('when only quantity, price or description change, then it stays approved', () => {
    const result = transition('approved', { type: 'edit', changedFields: ['quantity', 'priceCents', 'description'] }, 'seller');
    expect(result).toEqual({ ok: true, state: 'approved', reviewRequired: false });
  });

  it('when a price change is mixed with a photo change, then review is needed', () => {
    expect(next('approved', { type: 'edit', changedFields: ['priceCents', 'photos'] }, 'seller')).toBe('submitted');
  });

  it('when a sold-out listing changes its condition, then it goes back to review; a price change keeps it sold out', () => {
    expect(next('sold_out', { type: 'edit', changedFields: ['condition'] }, 'seller')).toBe('submitted');
    expect(next('sold_out', { type: 'edit', changedFields: ['priceCents'] }, 'seller')).toBe('sold_out');
  });

  it('when a draft or changes-requested listing is edited, then its state does not change', () => {
    expect(next('draft', { type: 'edit', changedFields: ['photos'] }, 'seller')).toBe('draft');
    expect(next('changes_requested', { type: 'edit', changedFields: ['condition'] }, 'seller')).toBe('changes_requested');
  });

  it('when a withdrawn or rejected listing is edited, then the edit is refused', () => {
    expect(transition('withdrawn', { type: 'edit', changedFields: ['priceCents'] }, 'seller')).toMatchObject({ ok: false });
    expect(transition('rejected', { type: 'edit', changedFields: ['priceCents'] }, 'seller')).toMatchObject({ ok: false });
  });

  it('when an admin tries to edit through the seller path, then it is refused', () => {
    expect(transition('approved', { type: 'edit', changedFields: ['priceCents'] }, 'admin')).toMatchObject({
      ok: false,
      error: { code: 'forbidden_actor' },
    });
  });
});

describe('editRequiresReview', () => {
  it('when nothing changed, then no review is needed', () => {
    expect(editRequiresReview([])).toBe(false);
  });

  it('when a field unknown to the allowlist changes, then review is needed (safe by default)', () => {
    expect(editRequiresReview(['title'])).toBe(true);
    expect(editRequiresReview(['rubberUse'])).toBe(true);
    expect(editRequiresReview(['someFutureField'])).toBe(true);
  });

  it('when only stock and commercial fields change, then no review is needed', () => {
    expect(editRequiresReview(['quantity', 'priceCents', 'description', 'shipping', 'pickup'])).toBe(false);
  });
});

describe('allowedActions', () => {
  it('when listing actions per state, then every state has a defined answer for each actor', () => {
    expect(allowedActions('submitted', 'admin')).toEqual(['approve', 'request_changes', 'reject']);
    expect(allowedActions('draft', 'seller')).toEqual(['submit', 'withdraw', 'edit']);
    expect(allowedActions('approved', 'system')).toEqual(['sell_out']);
    for (const s of listingStates) expect(Array.isArray(allowedActions(s, 'seller'))).toBe(true);
  });
});
