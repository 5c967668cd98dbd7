import { describe, expect, it } from 'vitest';
import { cardProcessingEstimate } from '../../server/domain/fees';

// source: Card payments — Stripe's published pricing, via REFERENCES.md: standard US card fee 2.9 % + 30 cents
// per successful domestic card charge, +1.5 % for international cards. Rounding to the cent (half up) is ours.

describe('card processing estimate (Stripe\u2019s published pricing)', () => {
  it('when a domestic card pays $100.00, then the estimate is $3.20 (2.9 % + 30 c)', () => {
    expect(cardProcessingEstimate(10_000)).toBe(320);
  });

  it('when an international card pays $100.00, then 1.5 % more makes $4.70', () => {
    expect(cardProcessingEstimate(10_000, { international: true })).toBe(470);
  });

  it('when the percentage has a fraction of a cent, then it is rounded half up', () => {
    // 2.9 % of $17.24 = 49.996 c -> 50 c, + 30 c
    expect(cardProcessingEstimate(1724)).toBe(80);
    // 2.9 % of $0.50 = 1.45 c -> 1 c, + 30 c
    expect(cardProcessingEstimate(50)).toBe(31);
    // 2.9 % of $5.00 = 14.5 c exactly -> 15 c, + 30 c
    expect(cardProcessingEstimate(500)).toBe(45);
    // 2.9 % of $2.50 = 7.25 c -> 7 c; 4.4 % of $2.50 = 11 c
    expect(cardProcessingEstimate(250)).toBe(37);
    expect(cardProcessingEstimate(250, { international: true })).toBe(41);
  });
});
