import { describe, expect, it } from 'vitest';
import { conditionCodes, rubberUseCodes, usedGradeCodes } from '../../server/domain/conditions';
import { flagCodes } from '../../server/domain/listing-flags';
import { listingStates } from '../../server/domain/listing-states';
import { MAX_FILE_BYTES, MAX_FILES } from '../../server/lib/photos/pipeline';
import {
  createListingInput,
  LISTING_LIMITS,
  listingConditionCodes,
  listingDecisionInput,
  listingFlagCodes,
  listingStateCodes,
  myListingsQuery,
  rubberUseCodes as sharedRubber,
  usedGradeCodes as sharedGrades,
} from './listings';

describe('shared listing schemas', () => {
  it('when the code lists are compared with the domain, then they are the same', () => {
    expect(listingConditionCodes).toEqual(conditionCodes);
    expect(sharedGrades).toEqual(usedGradeCodes);
    expect(sharedRubber).toEqual(rubberUseCodes);
    expect(listingStateCodes).toEqual(listingStates);
    expect(listingFlagCodes).toEqual(flagCodes);
    expect(LISTING_LIMITS.photosMax).toBe(MAX_FILES);
    expect(LISTING_LIMITS.photoBytesMax).toBe(MAX_FILE_BYTES);
  });

  it('when a used original has no grade, or another condition has one, then the grade field is named', () => {
    const base = { partId: null, title: 'A part', quantity: 1, priceCents: 100, description: 'Described well enough to be linked later.' };
    const used = createListingInput.safeParse({ ...base, condition: 'used_original' });
    expect(used.success).toBe(false);
    expect(used.error?.issues[0].path).toEqual(['usedGrade']);
    expect(createListingInput.safeParse({ ...base, condition: 'nos', usedGrade: 'ready' }).success).toBe(false);
    expect(createListingInput.safeParse({ ...base, condition: 'used_original', usedGrade: 'ready' }).success).toBe(true);
  });

  it('when an unknown field is sent, then it is refused rather than ignored', () => {
    expect(createListingInput.safeParse({ title: 'abc', condition: 'nos', quantity: 1, priceCents: 1, partId: null, description: 'x'.repeat(30), state: 'approved' }).success).toBe(false);
  });

  it('when a rejection or change request has no message, then it is refused; an approval needs none', () => {
    expect(listingDecisionInput.safeParse({ decision: 'reject' }).success).toBe(false);
    expect(listingDecisionInput.safeParse({ decision: 'request-changes', message: 'ok' }).success).toBe(false);
    expect(listingDecisionInput.safeParse({ decision: 'approve' }).success).toBe(true);
  });

  it("when a seller's own-listings search holds control or zero-width characters, then they become spaces", () => {
    const q = myListingsQuery.parse({ q: '  brake\u0000hose\u200b ' }).q;
    expect(q).toBe('brake hose');
  });
});
