import { describe, expect, it } from 'vitest';
import { billableWeightGrams, dimensionalWeightKgMetric, dimensionalWeightLb, poundsToGramsCeil } from '../../server/domain/shipping';

// source: Parcel dimensional weight — carriers' published rules (third-party copies), via REFERENCES.md:
// DIM weight (lb) = L x W x H (in) / 139, each dimension rounded up to the next inch, result rounded up to the
// next whole pound; billable weight = max(actual, DIM). Retail / postal divisor 166. Metric: cm^3 / 5000 per kg.
// The expected values below are worked from that rule (the page gives the rule, not worked examples).

describe('dimensional weight (carriers\u2019 published rule)', () => {
  it('when a 12 x 12 x 12 in box ships, then the carrier divisor 139 gives 13 lb (1728 / 139 = 12.43, rounded up)', () => {
    expect(dimensionalWeightLb(12, 12, 12, 139)).toBe(13);
  });

  it('when the same box ships at retail, then divisor 166 gives 11 lb (1728 / 166 = 10.41, rounded up)', () => {
    expect(dimensionalWeightLb(12, 12, 12, 166)).toBe(11);
  });

  it('when a side is a fraction of an inch over, then it counts as the next whole inch', () => {
    // 12.1 x 12 x 12 -> 13 x 12 x 12 = 1872 / 139 = 13.47 -> 14 lb
    expect(dimensionalWeightLb(12.1, 12, 12)).toBe(14);
  });

  it('when the volume divides exactly, then no pound is added', () => {
    // 139 x 1 x 1 in = 139 in^3 -> exactly 1 lb
    expect(dimensionalWeightLb(139, 1, 1)).toBe(1);
  });

  it('when a box is metric, then cm^3 / 5000 gives kg', () => {
    expect(dimensionalWeightKgMetric(50, 40, 30, 5000)).toBe(12);
  });

  it('when actual weight exceeds DIM weight, then the actual weight is billable; otherwise the DIM weight', () => {
    // 12 in = 304.8 mm; 305 mm rounds up to 13 in: 13^3 = 2197 / 139 = 15.8 -> 16 lb
    expect(billableWeightGrams({ weightGrams: 2000, lengthMm: 305, widthMm: 305, heightMm: 305 })).toBe(poundsToGramsCeil(16));
    expect(billableWeightGrams({ weightGrams: 20_000, lengthMm: 305, widthMm: 305, heightMm: 305 })).toBe(20_000);
  });
});
