import { describe, expect, it } from 'vitest';
import { foldKey } from '../domain/part-number';
import { correctableWords, keyDeletions, nearFoldedKeys, nearLookupKeys, parseTextQuery } from './search-text';

describe('parseTextQuery', () => {
  it('when the query holds tsquery operators and quotes, then they only separate words', () => {
    const chunks = parseTextQuery(`"rear" & !axle | (brake:*) <-> line`);
    expect(chunks.flatMap((c) => c.words)).toEqual(['rear', 'axle', 'brake', 'line']);
    expect(chunks.every((c) => c.key === null)).toBe(true);
  });

  it('when a chunk has a digit, then it also carries the number keys from the domain functions', () => {
    const [c] = parseTextQuery('KV-2O41-b');
    expect(c.words).toEqual(['kv', '2o41', 'b']);
    expect(c.key).toBe('kv2o41b');
    expect(c.folded).toBe(foldKey('KV2O41B').toLowerCase());
  });

  it('when the query is long, then at most eight chunks are kept and only plain words are corrected', () => {
    expect(parseTextQuery('a b c d e f g h i j k').length).toBe(8);
    expect(correctableWords(parseTextQuery('brke 12ab of line'))).toEqual(['brke', 'line']);
  });
});

describe('nearFoldedKeys', () => {
  it('when a key has one wrong, missing, extra or swapped character, then the right key is among its neighbours', () => {
    const right = foldKey('QX4410B7');
    for (const typo of ['QX4410B8', 'QX440B7', 'QX44100B7', 'QX4140B7']) expect(nearFoldedKeys(foldKey(typo)), typo).toContain(right);
  });

  it('when a digit is mistyped among digits or a character dropped, then the likely neighbours already hold the right key', () => {
    const right = foldKey('QX4410B7');
    for (const typo of ['QX4470B7', 'QX440B7', 'QX4140B7', 'QX44100B7']) expect(nearFoldedKeys(foldKey(typo), 'likely'), typo).toContain(right);
    // A letter typed for a digit is one edit away too, but only among the rest.
    expect(nearFoldedKeys(foldKey('QX44K0B7'), 'likely')).not.toContain(right);
    expect(nearFoldedKeys(foldKey('QX44K0B7'), 'rest')).toContain(right);
  });

  it('when split into likely and rest, then the two parts share nothing and together are all the neighbours', () => {
    for (const k of [foldKey('KV20417C'), foldKey('2530001234567')]) {
      const likely = nearFoldedKeys(k, 'likely');
      const rest = nearFoldedKeys(k, 'rest');
      expect(likely.filter((x) => rest.includes(x))).toEqual([]);
      expect(new Set([...likely, ...rest])).toEqual(new Set(nearFoldedKeys(k)));
    }
    // A run of digits: about a third of the neighbours are the likely ones.
    const digitsOnly = foldKey('2530001234567');
    expect(nearFoldedKeys(digitsOnly, 'likely').length * 2).toBeLessThan(nearFoldedKeys(digitsOnly, 'rest').length);
  });

  it('when a key is very short or very long, then no neighbours are tried', () => {
    expect(nearFoldedKeys('A1')).toEqual([]);
    expect(nearFoldedKeys('1'.repeat(30))).toEqual([]);
  });
});

describe('nearLookupKeys', () => {
  // Deterministic pseudo-random keys (mulberry32), shaped like the catalog's: letters, digits, leading zeros.
  const rng = (seed: number) => () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const next = rng(42);
  const pick = (s: string) => s[Math.floor(next() * s.length)];
  const randomKey = () => {
    const shape = ['LL000000L', '0000000000000', '00LL000', '0L0L0L'][Math.floor(next() * 4)];
    return foldKey([...shape].map((c) => (c === 'L' ? pick('ABCDEFGHJKLMNPQRSTUVWXYZ') : pick('0012345678'))).join(''));
  };

  it('when a key is one edit from the typed one, then the two share a lookup key (symmetric deletion finds every neighbour)', () => {
    for (let i = 0; i < 150; i++) {
      const typed = randomKey();
      const lookup = new Set(nearLookupKeys(typed));
      for (const near of nearFoldedKeys(typed)) {
        expect(keyDeletions(near).some((d) => lookup.has(d)), `${typed} -> ${near}`).toBe(true);
      }
    }
  });

  it('when an edit leaves leading zeros, then the neighbour it folds to is still found', () => {
    // Dropping the A leaves 00523, which folds to 523; swapping 10 to 01 folds 01234 to 1234.
    for (const [typed, near] of [['A00523', '523'], ['B07341', '7341'], ['10234', '1234']] as const) {
      expect(nearFoldedKeys(typed)).toContain(near);
      expect(keyDeletions(near).some((d) => nearLookupKeys(typed).includes(d)), typed).toBe(true);
    }
  });

  it('when a key is very short or very long, then nothing is looked up, as with nearFoldedKeys', () => {
    expect(nearLookupKeys('A12')).toEqual([]);
    expect(nearLookupKeys('1'.repeat(25))).toEqual([]);
    expect(keyDeletions('AAB')).toEqual(['AAB', 'AB', 'AA']);
  });
});
