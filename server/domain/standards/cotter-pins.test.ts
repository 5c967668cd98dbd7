// source: ASME B18.8.1 cotter pin table, via ../shared REFERENCES.md (the reference rows are checked in tests/reference/cotter-pins.test.ts).
import { describe, expect, it } from 'vitest';
import { cotterPin, cotterPinForHole } from './cotter-pins';

describe('cotter pins', () => {
  it('when the nominal is typed as a fraction, decimal or with a unit, then the row is found', () => {
    for (const v of ['1/8', 0.125, '1/8 in', '.125']) expect(cotterPin(v)?.nominal, String(v)).toBe('1/8');
  });

  it('when the nominal is not in the table, then it is null', () => {
    expect(cotterPin('1/2')).toBeNull();
    expect(cotterPin('abc')).toBeNull();
  });

  it('when a hole is measured, then the largest pin whose recommended hole fits is chosen', () => {
    // Recommended holes from ASME B18.8.1 via REFERENCES.md: 1/8 -> 0.141, 5/32 -> 0.172.
    expect(cotterPinForHole(0.141)?.nominal).toBe('1/8');
    expect(cotterPinForHole(0.16)?.nominal).toBe('1/8');
    expect(cotterPinForHole(0.172)?.nominal).toBe('5/32');
    expect(cotterPinForHole(1)?.nominal).toBe('3/8');
  });

  it('when the hole is smaller than any recommended hole, then there is no pin', () => {
    expect(cotterPinForHole(0.05)).toBeNull();
    expect(cotterPinForHole(-1)).toBeNull();
  });
});
