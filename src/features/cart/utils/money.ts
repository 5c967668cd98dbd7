const usd = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' });

/** "$1,234.50" from 123450 cents. Display only: every amount is computed by the server. */
export function formatCents(cents: number): string {
  return usd.format(cents / 100);
}
