import type { Destination } from '@shared/schemas/orders';

/** The `ship` search parameter of /cart: a two-letter country code, or "pickup". */
export const SHIP_PARAM = 'ship';

// US first: the marketplace charges in US dollars and most shops ship within North America.
export const DEFAULT_COUNTRY = 'US';

/** Countries offered in the picker (ISO 3166-1 alpha-2 codes); shops say themselves where they ship. */
export const countryChoices: ReadonlyArray<{ code: string; name: string }> = [
  { code: 'US', name: 'United States' },
  { code: 'CA', name: 'Canada' },
  { code: 'MX', name: 'Mexico' },
  { code: 'GB', name: 'United Kingdom' },
  { code: 'IE', name: 'Ireland' },
  { code: 'FR', name: 'France' },
  { code: 'BE', name: 'Belgium' },
  { code: 'NL', name: 'Netherlands' },
  { code: 'DE', name: 'Germany' },
  { code: 'NO', name: 'Norway' },
  { code: 'AU', name: 'Australia' },
  { code: 'NZ', name: 'New Zealand' },
];

/** Reads the destination from the search parameter; anything unknown falls back to the default country. */
export function destinationFromParam(value: string | null): Destination {
  if (value === 'pickup') return { pickup: true };
  const code = (value ?? '').trim().toUpperCase();
  return /^[A-Z]{2}$/.test(code) ? { country: code } : { country: DEFAULT_COUNTRY };
}

export function destinationToParam(destination: Destination): string {
  return 'pickup' in destination ? 'pickup' : destination.country;
}

/** A stable, short piece of a query key. */
export function destinationKey(destination: Destination | null): string {
  return destination ? destinationToParam(destination) : 'none';
}
