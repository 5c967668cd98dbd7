import { describe, expect, it } from 'vitest';
import { decodeCursor, encodeCursor, searchFingerprint } from './search-cursor';

const secret = 'test-secret-0123456789';

describe('search cursors', () => {
  it('when a cursor comes back unchanged, then it decodes to the same keyset position', () => {
    const search = searchFingerprint(['brake', 'relevance']);
    const state = { value: 0.123456789012345, docId: 42, mode: 's16' as const, search };
    expect(decodeCursor(encodeCursor(state, secret), secret, search)).toEqual(state);
  });

  it('when a cursor is changed, signed with another secret or used for another search, then it is refused with a 400', () => {
    const search = searchFingerprint(['brake']);
    const token = encodeCursor({ value: 10, docId: 1, mode: 'exact', search }, secret);
    const [body, mac] = token.split('.');
    const forged = Buffer.from(JSON.stringify([1, 10, 999, 'exact', search])).toString('base64url');
    for (const bad of [`${forged}.${mac}`, `${body}.${mac.slice(1)}x`, encodeCursor({ value: 10, docId: 1, mode: 'exact', search }, 'other-secret-0123456789')]) {
      expect(() => decodeCursor(bad, secret, search)).toThrow(expect.objectContaining({ status: 400 }));
    }
    expect(() => decodeCursor(token, secret, searchFingerprint(['clamp']))).toThrow(/different search/);
  });
});
