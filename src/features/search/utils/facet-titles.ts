import type { FacetName } from '@shared/schemas/search';

/** Headings of the facet groups, also used on the active-filter chips. */
export const facetTitles: Record<FacetName, string> = {
  type: 'Show',
  vehicle: 'Vehicle model',
  system: 'System',
  assembly: 'Assembly',
  condition: 'Condition',
  originality: 'Originality',
  seller: 'Seller',
  price: 'Price',
  shipsTo: 'Ships to',
  pickup: 'Pickup',
  hasPhotos: 'Photos',
  inStock: 'Stock',
};
