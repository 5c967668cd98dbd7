import { describe, expect, it } from 'vitest';
import { normalizeWoodruffKeyNumber, woodruffNominal, woodruffRow } from './woodruff-keys';

describe('woodruff keys', () => {
  it('when a key number is typed with a prefix or as a number, then it normalises', () => {
    expect(['505', 'No. 505', '#505', 505, ' no505 '].map(normalizeWoodruffKeyNumber)).toEqual(['505', '505', '505', '505', '505']);
  });

  it('when a key number has four digits, then the leading two are the width in 32nds', () => {
    // source: ASME B17.2-1967 numbering rule, via REFERENCES.md (1212 itself is not a REFERENCES.md row)
    expect(woodruffNominal('1212')).toMatchObject({ widthIn: 0.375, diameterIn: 1.5, nominal: '3/8 x 1-1/2' });
  });

  it('when a number is not a key number, then the lookups give null', () => {
    for (const v of ['50', '12345', '500', '005', 'abc', '']) expect(woodruffNominal(v), v).toBeNull();
  });

  it('when a key is valid but not among the table rows we hold, then the row is null', () => {
    expect(woodruffRow('1212')).toBeNull();
    expect(woodruffRow('No. 808')).not.toBeNull();
  });
});
