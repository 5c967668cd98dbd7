/**
 * Cotter pins.
 * source: ASME B18.8.1, via REFERENCES.md — nominal size, maximum shank diameter, recommended hole size.
 */
import { parseInches } from './unified-threads';

export const COTTER_PIN_SOURCE = 'ASME B18.8.1 (via REFERENCES.md)';

export interface CotterPinRow {
  nominal: string;
  nominalIn: number;
  shankMaxIn: number;
  recommendedHoleIn: number;
  source: string;
}

const row = (nominal: string, nominalIn: number, shankMaxIn: number, recommendedHoleIn: number): CotterPinRow => ({
  nominal,
  nominalIn,
  shankMaxIn,
  recommendedHoleIn,
  source: COTTER_PIN_SOURCE,
});

const table: readonly CotterPinRow[] = [
  row('1/16', 1 / 16, 0.06, 0.078),
  row('3/32', 3 / 32, 0.09, 0.109),
  row('1/8', 1 / 8, 0.12, 0.141),
  row('5/32', 5 / 32, 0.15, 0.172),
  row('3/16', 3 / 16, 0.176, 0.203),
  row('1/4', 1 / 4, 0.225, 0.266),
  row('5/16', 5 / 16, 0.28, 0.312),
  row('3/8', 3 / 8, 0.335, 0.375),
];

export const cotterPinNominals = ['1/16', '3/32', '1/8', '5/32', '3/16', '1/4', '5/16', '3/8'] as const;
export type CotterPinNominal = (typeof cotterPinNominals)[number];

/** The row for a nominal size ("1/8", 0.125, "1/8 in"); null when not in the table. */
export function cotterPin(nominal: string | number): CotterPinRow | null {
  const n = parseInches(nominal);
  if (n === null) return null;
  return table.find((r) => Math.abs(r.nominalIn - n) < 1e-6) ?? null;
}

/**
 * The largest pin whose recommended hole fits a measured hole (in): a hole drilled to 0.141 takes a 1/8 pin.
 * Null when the hole is smaller than the smallest recommended hole.
 */
export function cotterPinForHole(holeIn: number): CotterPinRow | null {
  if (!(holeIn > 0)) return null;
  let best: CotterPinRow | null = null;
  for (const r of table) if (r.recommendedHoleIn <= holeIn + 1e-9) best = r;
  return best;
}
