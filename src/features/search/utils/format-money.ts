export { formatCents } from '@/lib/money';

/** Dollars typed in a price box ("12", "12.5", "$1,200") as whole cents; null when empty or not a price. */
export function parseDollars(text: string): number | null {
  const cleaned = text.replace(/[$,\s]/g, '');
  if (cleaned === '' || !/^\d{1,7}(\.\d{0,2})?$/.test(cleaned)) return null;
  return Math.round(Number(cleaned) * 100);
}

/** Cents as a plain dollar figure for a price box: 1250 -> "12.50", 1200 -> "12". */
export function centsToDollarText(cents: number | null): string {
  if (cents === null) return '';
  return cents % 100 === 0 ? String(cents / 100) : (cents / 100).toFixed(2);
}
