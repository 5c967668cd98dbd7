// Fictional test data for the seller desk.
import type { DeskListing, MyListingsReply } from '../api/seller-types';

export function deskListing(n: number, over: Partial<DeskListing> = {}): DeskListing {
  return {
    id: `5555555${n}-5555-4555-8555-555555555555`,
    state: 'approved',
    partId: null,
    part: { id: 'p1', name: 'Pedal pad (fictional)', primaryNumber: `FX-20${n}` },
    title: `Pedal pad, lot ${n}`,
    condition: 'reproduction',
    conditionLabel: 'Reproduction',
    quantity: n,
    priceCents: 1000 * n,
    currency: 'USD',
    photos: [],
    flags: [],
    updatedAt: '2025-03-02T10:00:00.000Z',
    ...over,
  };
}

export function deskReply(listings: DeskListing[]): MyListingsReply {
  return {
    listings,
    counts: { draft: 1, submitted: 2, approved: listings.length, changes_requested: 0, rejected: 0, sold_out: 1, withdrawn: 0 },
    total: listings.length,
    page: 1,
    pageSize: 50,
  };
}
