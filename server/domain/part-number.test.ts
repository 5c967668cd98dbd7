import { describe, expect, it } from 'vitest';
import {
  alternateKeys,
  foldedKey,
  looksLikePartNumber,
  normalizePartNumber,
  parsePartNumber,
  partNumberKeys,
  partNumberKinds,
  PartNumberError,
} from './part-number';

// Part numbers here are invented for the tests.

describe('normalizePartNumber', () => {
  it('when a number has hyphens, spaces, slashes, dots and lower case, then the key is upper-case letters and digits', () => {
    expect(normalizePartNumber(' dy-41 2/7.b_x ')).toBe('DY4127BX');
  });

  it('when the same number is typed in different shapes, then all give one key', () => {
    const shapes = ['GX-70412', 'gx 70412', 'GX/70412', 'G.X.70412', 'gx_70412', 'GX--70412'];
    expect(new Set(shapes.map(normalizePartNumber))).toEqual(new Set(['GX70412']));
  });

  it('when full-width characters are pasted, then they become plain letters and digits', () => {
    expect(normalizePartNumber('ＧＸ－７０４')).toBe('GX704');
  });

  it('when the input has no letter or digit, then it throws an "empty" PartNumberError', () => {
    expect(() => normalizePartNumber(' -/. ')).toThrow(PartNumberError);
    try {
      normalizePartNumber('');
    } catch (e) {
      expect((e as PartNumberError).code).toBe('empty');
    }
  });

  it('when the input is longer than 64 characters, then it is rejected as too long', () => {
    const r = parsePartNumber('A'.repeat(65));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.code).toBe('too_long');
    expect(parsePartNumber('A'.repeat(64)).ok).toBe(true);
  });
});

describe('foldedKey and alternateKeys', () => {
  it('when letter O and letter I are typed for 0 and 1, then the folded key equals the digits one', () => {
    expect(foldedKey('GX-7O4I2')).toBe(foldedKey('GX-70412'));
    expect(foldedKey('GX-7O4I2')).toBe('GX70412'.replace(/O/g, '0'));
  });

  it('when digits were typed for letters, then folding catches it the other way too', () => {
    // The catalog holds "OIL-10" (letters); the restorer types "01L-1O".
    expect(foldedKey('01L-1O')).toBe(foldedKey('OIL-10'));
  });

  it('when leading zeros are added or dropped, then the folded key is the same', () => {
    expect(foldedKey('007412')).toBe(foldedKey('7412'));
    expect(foldedKey('0000')).toBe('0');
  });

  it('when folding changes nothing, then there is no alternate key', () => {
    expect(alternateKeys('GX-7412')).toEqual([]);
    expect(alternateKeys('GX-7O12')).toEqual(['GX7012']);
  });

  it('when keys are asked for, then display keeps the print with collapsed spaces', () => {
    expect(partNumberKeys('  GX   70412-b ')).toEqual({ display: 'GX 70412-b', key: 'GX70412B', folded: 'GX70412B' });
  });
});

describe('looksLikePartNumber', () => {
  it('when the query is a number in any common shape, then it looks like a part number', () => {
    for (const q of ['GX-70412', 'MS 35338-44', '5315-00-123-4567', 'NSN 5315 00 123 4567', 'AN960-416', '7412'])
      expect(looksLikePartNumber(q), q).toBe(true);
  });

  it('when the query is words, then it does not', () => {
    for (const q of ['brake hose', 'front brake hose 1943', 'wheel cylinder', 'x', '--', 'a b c d e 1'])
      expect(looksLikePartNumber(q), q).toBe(false);
  });
});

describe('partNumberKinds', () => {
  it('when listed, then the six kinds of number are there', () => {
    expect(partNumberKinds).toEqual(['maker', 'ordnance', 'nsn', 'hardware_standard', 'vendor', 'reproduction']);
  });
});
