/**
 * Inverted 45-degree flare fittings.
 * source: SAE J512 (fittings), flares per SAE J533, via REFERENCES.md. J512 inverted-flare seats assume
 * double-flared tubing (J512 scope). No double-flare rule was found in FMVSS 105/106: that steel brake lines
 * are double flared is common practice.
 */
import { formatInchFraction, parseInches } from './unified-threads';

export const FLARE_SOURCE = 'SAE J512, flares per SAE J533 (via REFERENCES.md)';
export const FLARE_ANGLE_DEG = 45;
/** source: SAE J512 scope, via REFERENCES.md */
export const INVERTED_FLARE_TUBE_FLARE = 'double' as const;

export type Confirmation = 'confirmed' | 'partly_confirmed';

export interface FlareNutThread {
  tubeOd: string;
  tubeOdIn: number;
  nutThread: string;
  confirmation: Confirmation;
  note: string | null;
  source: string;
}

const PARTLY = 'partly confirmed: thread series seen, pairing from memory';

const table: readonly FlareNutThread[] = [
  { tubeOd: '3/16', tubeOdIn: 3 / 16, nutThread: '3/8-24', confirmation: 'confirmed', note: null, source: FLARE_SOURCE },
  { tubeOd: '1/4', tubeOdIn: 1 / 4, nutThread: '7/16-24', confirmation: 'confirmed', note: null, source: FLARE_SOURCE },
  { tubeOd: '5/16', tubeOdIn: 5 / 16, nutThread: '1/2-20', confirmation: 'partly_confirmed', note: PARTLY, source: FLARE_SOURCE },
  { tubeOd: '3/8', tubeOdIn: 3 / 8, nutThread: '5/8-18', confirmation: 'partly_confirmed', note: PARTLY, source: FLARE_SOURCE },
];

/** Tube ODs we have a nut thread for. */
export const flareTubeSizes: readonly string[] = table.map((r) => r.tubeOd);

/** How close a measured OD must be to a nominal size (in): calipers on old tubing read a little off. */
export const TUBE_OD_TOLERANCE_IN = 0.005;

/** Inverted flare nut thread for a tube OD (0.1875, "3/16", "3/16 in"); null when not in our table. */
export function invertedFlareNutThread(tubeOd: string | number): FlareNutThread | null {
  const od = parseInches(tubeOd);
  if (od === null) return null;
  return table.find((r) => Math.abs(r.tubeOdIn - od) <= TUBE_OD_TOLERANCE_IN + 1e-9) ?? null;
}

/** Nominal fraction for a tube OD, e.g. 0.188 -> "3/16" (for labels). */
export function nominalTubeOd(tubeOd: string | number): string | null {
  const row = invertedFlareNutThread(tubeOd);
  if (row) return row.tubeOd;
  const od = parseInches(tubeOd);
  return od === null ? null : formatInchFraction(od);
}
