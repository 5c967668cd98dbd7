import { describe, expect, it } from 'vitest';
import { allocateProportionally, cardProcessingEstimate, DEFAULT_FEE_TABLE, feeBpsFor, feeForLines, splitCheckout } from './fees';
import { seededRandom } from './sourcing-random';

describe('fee schedule', () => {
  it('when a category has its own rate, then it is used; otherwise the default', () => {
    expect(feeBpsFor('small_hardware')).toBe(1000);
    expect(feeBpsFor('heavy_bulky')).toBe(600);
    expect(feeBpsFor('brakes')).toBe(800);
    expect(feeBpsFor('toString')).toBe(800); // not fooled by inherited object keys
  });

  it('when the table has a rate over 100 %, then it throws', () => {
    expect(() => feeForLines([{ category: 'x', amountCents: 100 }], { defaultBps: 10_001, byCategory: {} })).toThrow(RangeError);
  });
});

describe('feeForLines', () => {
  it('when the exact fee has a fraction, then the total is rounded once and the leftover cent goes to the largest remainder', () => {
    // 1006 x 8 % = 80.48 each; total 160.96 -> 161; floors 80 + 80, the tie goes to the first line
    const lines = feeForLines([
      { category: 'brakes', amountCents: 1006 },
      { category: 'brakes', amountCents: 1006 },
    ]);
    expect(lines.map((l) => l.feeCents)).toEqual([81, 80]);
  });

  it('when the exact total is exactly half a cent, then it rounds up', () => {
    const table = { defaultBps: 5000, byCategory: {} };
    expect(feeForLines([{ category: 'x', amountCents: 1 }], table)[0].feeCents).toBe(1);
    expect(feeForLines([{ category: 'x', amountCents: 3 }], table)[0].feeCents).toBe(2); // 1.5 -> 2
  });

  it('when rounding per line would overcharge, then rounding the total does not', () => {
    // three lines of 6 cents at 10 %: 0.6 each, per-line rounding would give 3; the exact total 1.8 -> 2
    const lines = feeForLines(
      [0, 1, 2].map(() => ({ category: 'small_hardware', amountCents: 6 })),
      DEFAULT_FEE_TABLE,
    );
    expect(lines.reduce((a, l) => a + l.feeCents, 0)).toBe(2);
    expect(lines.map((l) => l.feeCents)).toEqual([1, 1, 0]);
  });
});

describe('splitCheckout', () => {
  it('when several sellers share a checkout, then each is paid items + shipping - fee and fees are on items only', () => {
    const split = splitCheckout([
      { sellerId: 'S-A', lines: [{ category: 'small_hardware', amountCents: 1999 }, { category: 'brakes', amountCents: 4550 }], shippingCents: 900 },
      { sellerId: 'S-B', lines: [{ category: 'heavy_bulky', amountCents: 32_500 }], shippingCents: 8500 },
    ]);
    const [a, b] = split.sellers;
    // S-A: 199.9 + 364 = 563.9 -> 564
    expect(a).toMatchObject({ itemsCents: 6549, shippingCents: 900, feeCents: 564, shareCents: 6549 + 900 - 564 });
    // S-B: 6 % of 32500 = 1950; shipping adds nothing
    expect(b).toMatchObject({ itemsCents: 32_500, shippingCents: 8500, feeCents: 1950 });
    expect(split.totals).toEqual({
      itemsCents: 39_049,
      shippingCents: 9400,
      chargeCents: 48_449,
      feeCents: 2514,
      shareCents: 48_449 - 2514,
    });
  });

  it('when checkouts are random, then shares plus fees equal the charge exactly and each fee is the rounded exact fee', () => {
    const rnd = seededRandom(7);
    const categories = ['small_hardware', 'heavy_bulky', 'brakes', 'electrical'];
    for (let n = 0; n < 500; n++) {
      const sellers = Array.from({ length: 1 + Math.floor(rnd() * 5) }, (_, s) => ({
        sellerId: `S-${s}`,
        shippingCents: Math.floor(rnd() * 5000),
        lines: Array.from({ length: 1 + Math.floor(rnd() * 6) }, () => ({
          category: categories[Math.floor(rnd() * categories.length)],
          amountCents: Math.floor(rnd() * 100_000),
        })),
      }));
      const split = splitCheckout(sellers);
      const shares = split.sellers.reduce((a, s) => a + s.shareCents, 0);
      expect(shares + split.totals.feeCents).toBe(split.totals.chargeCents);
      split.sellers.forEach((s, i) => {
        const exact = sellers[i].lines.reduce((a, l) => a + l.amountCents * feeBpsFor(l.category), 0) / 10_000;
        expect(s.feeCents).toBe(Math.floor(exact + 0.5));
        expect(s.lines.reduce((a, l) => a + l.feeCents, 0)).toBe(s.feeCents);
        s.lines.forEach((l) => expect(Math.abs(l.feeCents - (l.amountCents * l.feeBps) / 10_000)).toBeLessThan(1));
      });
    }
  });

  it('when a seller appears twice or an amount is not whole cents, then it throws', () => {
    expect(() =>
      splitCheckout([
        { sellerId: 'S-A', lines: [], shippingCents: 0 },
        { sellerId: 'S-A', lines: [], shippingCents: 0 },
      ]),
    ).toThrow(/twice/);
    expect(() => splitCheckout([{ sellerId: 'S-A', lines: [{ category: 'x', amountCents: 10.5 }], shippingCents: 0 }])).toThrow(/amountCents/);
    expect(() => splitCheckout([{ sellerId: 'S-A', lines: [], shippingCents: -1 }])).toThrow(/shippingCents/);
  });
});

describe('allocateProportionally', () => {
  it('when the total does not divide evenly, then the leftover cents go to the largest remainders, ties to the first', () => {
    expect(allocateProportionally(100, [1, 1, 1])).toEqual([34, 33, 33]);
    expect(allocateProportionally(1000, [2999, 7001])).toEqual([300, 700]);
    expect(allocateProportionally(10, [1, 2, 3, 4])).toEqual([1, 2, 3, 4]);
    expect(allocateProportionally(7, [5, 0, 5])).toEqual([4, 0, 3]);
  });

  it('when amounts are large, then the maths stays exact', () => {
    const parts = allocateProportionally(9_000_000_000_000, [3_000_000_000_001, 3_000_000_000_000, 2_999_999_999_999]);
    expect(parts.reduce((a, b) => a + b, 0)).toBe(9_000_000_000_000);
  });

  it('when random, then the parts add up exactly and each is within one cent of its exact share', () => {
    const rnd = seededRandom(11);
    for (let n = 0; n < 300; n++) {
      const weights = Array.from({ length: 1 + Math.floor(rnd() * 8) }, () => Math.floor(rnd() * 50_000));
      if (!weights.some((w) => w > 0)) weights[0] = 1;
      const total = Math.floor(rnd() * 200_000);
      const parts = allocateProportionally(total, weights);
      const sum = weights.reduce((a, b) => a + b, 0);
      expect(parts.reduce((a, b) => a + b, 0)).toBe(total);
      parts.forEach((p, i) => expect(Math.abs(p - (total * weights[i]) / sum)).toBeLessThan(1));
    }
  });

  it('when every weight is zero, then zero allocates to zeros and anything else throws', () => {
    expect(allocateProportionally(0, [0, 0])).toEqual([0, 0]);
    expect(() => allocateProportionally(5, [0, 0])).toThrow(/all zero/);
    expect(() => allocateProportionally(5, [1, -1])).toThrow(/weights\[1\]/);
  });
});

describe('cardProcessingEstimate', () => {
  it('when nothing is charged, then there is no processing cost', () => {
    expect(cardProcessingEstimate(0)).toBe(0);
  });

  it('when the amount is not whole cents, then it throws', () => {
    expect(() => cardProcessingEstimate(99.5)).toThrow(RangeError);
  });
});
