export { formatCents } from '@/lib/money';

/**
 * "42.5", "$1,234.50" -> cents, exactly: digits are read as text so no floating point rounding creeps in.
 * Null when the text is not an amount in dollars with at most two decimals.
 */
export function parseDollarsToCents(text: string): number | null {
  const m = text.replace(/[\s,]/g, '').replace(/^\$/, '').match(/^(\d{1,9})(?:\.(\d{0,2}))?$/);
  if (!m) return null;
  return Number(m[1]) * 100 + Number((m[2] ?? '').padEnd(2, '0'));
}

/** 123450 -> "1234.50", for an input field. */
export function centsToDollarsText(cents: number): string {
  return `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, '0')}`;
}
