import { describe, expect, it } from 'vitest';
import { centsToDollarsText, formatCents, parseDollarsToCents } from './money';

describe('money', () => {
  it('when a dollar amount is typed in any usual shape, then it becomes exact cents', () => {
    expect(parseDollarsToCents('42.5')).toBe(4250);
    expect(parseDollarsToCents('$1,234.50')).toBe(123450);
    expect(parseDollarsToCents('0.07')).toBe(7);
    expect(parseDollarsToCents('19.')).toBe(1900);
    // 0.1 + 0.2 style drift cannot happen: 1.15 is 115 cents, not 114.99...
    expect(parseDollarsToCents('1.15')).toBe(115);
  });

  it('when the text is not an amount, then null', () => {
    for (const bad of ['', 'abc', '1.234', '-3', '1e3']) expect(parseDollarsToCents(bad)).toBeNull();
  });

  it('when cents are shown, then they read as dollars', () => {
    expect(formatCents(123450)).toBe('$1,234.50');
    expect(centsToDollarsText(4205)).toBe('42.05');
  });
});
