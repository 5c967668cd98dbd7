// Amounts are integer minor units throughout, as in Stripe's API.

// source: Stripe docs "Zero-decimal currencies", from memory
const ZERO_DECIMAL = new Set(['bif', 'clp', 'djf', 'gnf', 'jpy', 'kmf', 'krw', 'mga', 'pyg', 'rwf', 'ugx', 'vnd', 'vuv', 'xaf', 'xof', 'xpf']);

// source: Stripe docs "Minimum and maximum charge amounts", from memory (only the currencies we expect)
const MINIMUM_CHARGE: Record<string, number> = { usd: 50, eur: 50, gbp: 30, cad: 50, aud: 50 };

export function minimumCharge(currency: string): number {
  return MINIMUM_CHARGE[currency] ?? 1;
}

export function formatMoney(amount: number, currency: string): string {
  const code = currency.toUpperCase();
  if (ZERO_DECIMAL.has(currency)) return `${amount} ${code}`;
  const sign = amount < 0 ? '-' : '';
  const abs = Math.abs(amount);
  return `${sign}${Math.floor(abs / 100)}.${String(abs % 100).padStart(2, '0')} ${code}`;
}

/** `$12.34`-style figure Stripe puts in refund error messages. */
export function stripeAmountText(amount: number, currency: string): string {
  if (ZERO_DECIMAL.has(currency)) return `${amount}`;
  return `$${(amount / 100).toFixed(2)}`;
}

// source: Stripe's published US pricing, 2.9 % + 30 cents per successful domestic card charge, via REFERENCES.md
export function cardProcessingFee(amount: number): number {
  return Math.round((amount * 29) / 1000) + 30;
}

export function isCurrencyCode(value: string): boolean {
  return /^[a-z]{3}$/.test(value);
}
