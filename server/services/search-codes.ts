/**
 * Facet codes of the search rows (drizzle/0004_search.sql): code = (group << 24) | value number. Fixed lists
 * are numbered by position here and in the migration's seed rows; a test compares the two. Values that are
 * rows elsewhere (vehicles, systems, assemblies, sellers, countries) get their numbers from search_facet_refs.
 */
import { conditions, type Condition } from '../domain/conditions';
import { facetNames, priceBands, searchConditions, searchHitTypes, searchOriginalities, type FacetName } from '../../shared/schemas/search';

export const FACET_GROUP: Record<FacetName, number> = {
  type: 1,
  vehicle: 2,
  system: 3,
  assembly: 4,
  condition: 5,
  originality: 6,
  seller: 7,
  price: 8,
  shipsTo: 9,
  pickup: 10,
  hasPhotos: 11,
  inStock: 12,
};

export const facetOfGroup = new Map<number, FacetName>(facetNames.map((f) => [FACET_GROUP[f], f]));

export const groupOf = (code: number) => code >>> 24;
export const codeOf = (group: number, n: number) => ((group << 24) | n) >>> 0;

const BOOL = ['false', 'true'] as const;

/** Values of the fixed-list facets, in code order (must match the migration's seed rows). */
export const FIXED_VALUES: Partial<Record<FacetName, readonly string[]>> = {
  type: searchHitTypes,
  condition: searchConditions,
  originality: searchOriginalities,
  price: priceBands,
  pickup: BOOL,
  hasPhotos: BOOL,
  inStock: BOOL,
};

export function fixedCode(facet: FacetName, value: string): number {
  const values = FIXED_VALUES[facet];
  const i = values?.indexOf(value) ?? -1;
  if (!values || i < 0) throw new Error(`No fixed code for ${facet}=${value}`);
  return codeOf(FACET_GROUP[facet], i);
}

/**
 * Originality of a listing condition, from server/domain/conditions.ts: made by the original maker, made in
 * the period by another maker (NORS), or made today. The SQL function search_originality mirrors this.
 */
export function originalityOf(condition: Condition): (typeof searchOriginalities)[number] {
  const c = conditions[condition];
  if (c.original) return 'original';
  return c.periodManufacture ? 'period_replacement' : 'reproduction';
}

/** Price bands in cents, lower bound inclusive (mirrored by the SQL function search_price_band). */
export const PRICE_BANDS: ReadonlyArray<{ key: (typeof priceBands)[number]; label: string; min: number; max: number | null }> = [
  { key: 'under_10', label: 'Under $10', min: 0, max: 1000 },
  { key: '10_50', label: '$10 to $50', min: 1000, max: 5000 },
  { key: '50_200', label: '$50 to $200', min: 5000, max: 20000 },
  { key: '200_1000', label: '$200 to $1,000', min: 20000, max: 100000 },
  { key: 'over_1000', label: '$1,000 and over', min: 100000, max: null },
];

export function priceBandOf(cents: number): (typeof priceBands)[number] {
  return PRICE_BANDS.find((b) => cents >= b.min && (b.max === null || cents < b.max))!.key;
}

const ORIGINALITY_LABELS: Record<(typeof searchOriginalities)[number], string> = {
  original: 'Original maker',
  period_replacement: 'Period replacement (NORS)',
  reproduction: 'Reproduction',
};

// source: ISO 3166-1 alpha-2 short names, from memory; codes without a name here are shown as typed.
const COUNTRY_NAMES: Record<string, string> = {
  US: 'United States', CA: 'Canada', MX: 'Mexico', GB: 'United Kingdom', IE: 'Ireland', DE: 'Germany', FR: 'France',
  NL: 'Netherlands', BE: 'Belgium', LU: 'Luxembourg', DK: 'Denmark', NO: 'Norway', SE: 'Sweden', FI: 'Finland',
  PL: 'Poland', CZ: 'Czechia', AT: 'Austria', CH: 'Switzerland', IT: 'Italy', ES: 'Spain', PT: 'Portugal',
  AU: 'Australia', NZ: 'New Zealand', JP: 'Japan', ZA: 'South Africa',
};

/** Label of a fixed-list value or a country; null when the value is a row elsewhere (looked up in SQL). */
export function fixedLabel(facet: FacetName, value: string): string | null {
  switch (facet) {
    case 'type':
      return value === 'part' ? 'Catalog parts' : 'Listings';
    case 'condition':
      return conditions[value as Condition]?.label ?? value;
    case 'originality':
      return ORIGINALITY_LABELS[value as keyof typeof ORIGINALITY_LABELS] ?? value;
    case 'price':
      return PRICE_BANDS.find((b) => b.key === value)?.label ?? value;
    case 'pickup':
      return value === 'true' ? 'Pickup at shows' : 'No pickup';
    case 'hasPhotos':
      return value === 'true' ? 'With photos' : 'Without photos';
    case 'inStock':
      return value === 'true' ? 'In stock' : 'Out of stock';
    case 'shipsTo':
      return COUNTRY_NAMES[value] ?? value;
    default:
      return null;
  }
}
