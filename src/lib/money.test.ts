import { describe, expect, it } from 'vitest';
import { formatCents } from './money';

describe('formatCents', () => {
  it('when given integer cents, then it shows US dollars with grouping and two decimals', () => {
    expect(formatCents(123450)).toBe('$1,234.50');
    expect(formatCents(5)).toBe('$0.05');
    expect(formatCents(0)).toBe('$0.00');
  });
});
