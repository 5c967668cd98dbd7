/**
 * Woodruff keys.
 * source: ASME B17.2-1967, via REFERENCES.md — key number: last two digits = nominal diameter in eighths of an
 * inch, the digits before = nominal width in thirty-seconds. Table rows confirmed in Shigley (Table 7-7), Mott
 * (Table 11-3, reprinted from B17.2) and Machinery's Handbook 31st ed., except where marked from memory.
 */
import { formatInchFraction } from './unified-threads';

export const WOODRUFF_SOURCE = 'ASME B17.2-1967 (via REFERENCES.md)';

export interface WoodruffNominal {
  keyNumber: string;
  widthIn: number;
  diameterIn: number;
  /** e.g. "5/32 x 5/8". */
  nominal: string;
  source: string;
}

export interface WoodruffRow {
  keyNumber: string;
  heightMaxIn: number;
  /** Null where the table row gives only a maximum. */
  heightMinIn: number | null;
  shaftKeyseatDepthIn: number;
  hubKeyseatDepthIn: number;
  lengthFIn: number;
  /** REFERENCES.md marks the 505 length as from memory. */
  lengthFromMemory: boolean;
}

const rows: readonly WoodruffRow[] = [
  { keyNumber: '202', heightMaxIn: 0.109, heightMinIn: 0.104, shaftKeyseatDepthIn: 0.0728, hubKeyseatDepthIn: 0.0372, lengthFIn: 0.248, lengthFromMemory: false },
  { keyNumber: '406', heightMaxIn: 0.313, heightMinIn: 0.308, shaftKeyseatDepthIn: 0.2455, hubKeyseatDepthIn: 0.0685, lengthFIn: 0.74, lengthFromMemory: false },
  { keyNumber: '505', heightMaxIn: 0.25, heightMinIn: 0.245, shaftKeyseatDepthIn: 0.1669, hubKeyseatDepthIn: 0.0841, lengthFIn: 0.612, lengthFromMemory: true },
  { keyNumber: '606', heightMaxIn: 0.313, heightMinIn: 0.308, shaftKeyseatDepthIn: 0.2143, hubKeyseatDepthIn: 0.0997, lengthFIn: 0.74, lengthFromMemory: false },
  { keyNumber: '608', heightMaxIn: 0.438, heightMinIn: 0.433, shaftKeyseatDepthIn: 0.3393, hubKeyseatDepthIn: 0.0997, lengthFIn: 0.992, lengthFromMemory: false },
  { keyNumber: '808', heightMaxIn: 0.438, heightMinIn: 0.433, shaftKeyseatDepthIn: 0.308, hubKeyseatDepthIn: 0.131, lengthFIn: 0.992, lengthFromMemory: false },
  { keyNumber: '810', heightMaxIn: 0.547, heightMinIn: null, shaftKeyseatDepthIn: 0.417, hubKeyseatDepthIn: 0.131, lengthFIn: 1.24, lengthFromMemory: false },
];

export const woodruffTableKeys: readonly string[] = rows.map((r) => r.keyNumber);

/** "505", "No. 505", "#505", 505 -> "505"; null when it is not a 3- or 4-digit key number. */
export function normalizeWoodruffKeyNumber(input: string | number): string | null {
  const s = String(input).trim().replace(/^(?:NO\.?|#)\s*/i, '');
  if (!/^\d{3,4}$/.test(s)) return null;
  const width = Number(s.slice(0, -2));
  const dia = Number(s.slice(-2));
  return width > 0 && dia > 0 ? String(Number(s)) : null;
}

/** Width and diameter from the key number rule; null when the number is not a key number. */
export function woodruffNominal(input: string | number): WoodruffNominal | null {
  const keyNumber = normalizeWoodruffKeyNumber(input);
  if (keyNumber === null) return null;
  // source: ASME B17.2-1967 numbering rule, via REFERENCES.md
  const widthIn = Number(keyNumber.slice(0, -2)) / 32;
  const diameterIn = Number(keyNumber.slice(-2)) / 8;
  return {
    keyNumber,
    widthIn,
    diameterIn,
    nominal: `${formatInchFraction(widthIn)} x ${formatInchFraction(diameterIn)}`,
    source: WOODRUFF_SOURCE,
  };
}

/** The published table row (height, keyseat depths, length) for the keys REFERENCES.md lists; else null. */
export function woodruffRow(input: string | number): WoodruffRow | null {
  const keyNumber = normalizeWoodruffKeyNumber(input);
  return rows.find((r) => r.keyNumber === keyNumber) ?? null;
}
