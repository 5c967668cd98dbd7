export { formatCents } from '@/lib/money';

/**
 * Cents from a typed dollar amount such as "12", "12.5" or "1,234.50"; null when it is not one. Parsed as
 * text, not as a float, so "0.29" is 29 cents exactly.
 */
export function dollarsToCents(text: string): number | null {
  const m = /^(\d+)(?:\.(\d{1,2}))?$/.exec(text.trim().replace(/^\$/, '').replaceAll(',', ''));
  if (!m) return null;
  return Number(m[1]) * 100 + Number((m[2] ?? '').padEnd(2, '0'));
}
