const formatters = new Map<string, Intl.NumberFormat>();

/** "$1,234.50" from 123450 cents. Display only: every amount is computed by the server, in integer cents. */
export function formatCents(cents: number, currency = 'USD'): string {
  let f = formatters.get(currency);
  if (!f) formatters.set(currency, (f = new Intl.NumberFormat('en-US', { style: 'currency', currency })));
  return f.format(cents / 100);
}
