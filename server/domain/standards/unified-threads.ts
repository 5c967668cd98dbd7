/**
 * Unified inch screw threads.
 * source: ASME B1.1, via REFERENCES.md — basic pitch diameter E = D - 0.649519 / n
 * (D major diameter in inches, n threads per inch).
 */

export const UNIFIED_THREAD_SOURCE = 'ASME B1.1 (via REFERENCES.md)';

/** Parses inches as printed: 0.1875, "3/16", "1-1/4", "1 1/4", '3/16"', "3/16 in". Null when it is not one. */
export function parseInches(value: string | number): number | null {
  if (typeof value === 'number') return Number.isFinite(value) && value > 0 ? value : null;
  const s = value
    .trim()
    .replace(/\s*(?:in\.?|inch(?:es)?|")$/i, '')
    .trim();
  let m = /^(\d+)[-\s]+(\d+)\/(\d+)$/.exec(s);
  if (m) {
    const den = Number(m[3]);
    return den > 0 ? Number(m[1]) + Number(m[2]) / den : null;
  }
  m = /^(\d+)\/(\d+)$/.exec(s);
  if (m) {
    const den = Number(m[2]);
    return den > 0 && Number(m[1]) > 0 ? Number(m[1]) / den : null;
  }
  if (/^(?:\d+\.?\d*|\.\d+)$/.test(s)) {
    const n = Number(s);
    return n > 0 ? n : null;
  }
  return null;
}

/** 0.15625 -> "5/32", 1.25 -> "1-1/4", 1 -> "1"; a decimal when no power-of-two fraction up to 1/64 fits. */
export function formatInchFraction(inches: number): string {
  const whole = Math.floor(inches + 1e-9);
  const rest = inches - whole;
  if (Math.abs(rest) < 1e-9) return String(whole);
  for (let den = 2; den <= 64; den *= 2) {
    const num = Math.round(rest * den);
    if (Math.abs(num / den - rest) < 1e-9) return whole > 0 ? `${whole}-${num}/${den}` : `${num}/${den}`;
  }
  return String(Number(inches.toFixed(4)));
}

/** Basic pitch diameter in inches (not rounded). source: ASME B1.1, via REFERENCES.md */
export function basicPitchDiameter(majorIn: number, tpi: number): number {
  if (!(majorIn > 0) || !(tpi > 0)) throw new RangeError('Major diameter and threads per inch must be positive.');
  return majorIn - 0.649519 / tpi;
}

/** Rounds to 4 decimals, as thread tables print inch figures. */
export const round4 = (x: number) => Math.round(x * 1e4) / 1e4;

export type ThreadSeries = 'UNC' | 'UNF' | 'UNEF' | 'UN' | 'UNS';

/**
 * Standard coarse/fine pitches per size, used to name the series when it is not typed and to catch a wrong
 * one. The 1/4 to 1/2 rows are in REFERENCES.md (ASME B1.1); the others are from memory.
 */
const standardPitches: Record<string, { UNC?: number; UNF?: number }> = {
  '#4': { UNC: 40, UNF: 48 },
  '#6': { UNC: 32, UNF: 40 },
  '#8': { UNC: 32, UNF: 36 },
  '#10': { UNC: 24, UNF: 32 },
  '#12': { UNC: 24, UNF: 28 },
  '1/4': { UNC: 20, UNF: 28 },
  '5/16': { UNC: 18, UNF: 24 },
  '3/8': { UNC: 16, UNF: 24 },
  '7/16': { UNC: 14, UNF: 20 },
  '1/2': { UNC: 13, UNF: 20 },
  '9/16': { UNC: 12, UNF: 18 },
  '5/8': { UNC: 11, UNF: 18 },
  '3/4': { UNC: 10, UNF: 16 },
  '7/8': { UNC: 9, UNF: 14 },
  '1': { UNC: 8, UNF: 12 },
};

export interface Thread {
  /** Normalised, e.g. "3/8-24 UNF", "#10-32 UNF". */
  designation: string;
  /** The size as typed in the designation: "3/8", "#10". */
  size: string;
  majorIn: number;
  tpi: number;
  series: ThreadSeries | null;
  /** Class of fit when typed, e.g. "2A". */
  fitClass: string | null;
  /** True for numbered sizes, whose major diameter comes from a formula recalled from memory. */
  majorFromMemory: boolean;
}

export type ThreadResult = { ok: true; value: Thread } | { ok: false; error: string };

const THREAD_RE = /^(?:(?:#|NO\.?\s*)(\d{1,2})|(\d+(?:[-\s]\d+\/\d+)?|\d+\/\d+|\d*\.\d+))\s*-\s*(\d{1,3})(?:\s*(UNC|UNF|UNEF|UNS|UN)(?:\s*-?\s*(\d[AB]))?)?$/i;

/** Parses "3/8-24 UNF", "1/4-20", "#10-32", "No. 10-24 UNC-2A", "1-8 UNC". */
export function parseThread(input: string): ThreadResult {
  const m = THREAD_RE.exec(input.trim().toUpperCase().replace(/\s+/g, ' '));
  if (!m) return { ok: false, error: `"${input}" is not a thread like 3/8-24 UNF, 1/4-20 or #10-32.` };
  const [, numbered, fraction, tpiText, seriesText, fit] = m;
  const tpi = Number(tpiText);
  if (tpi < 1) return { ok: false, error: 'Threads per inch must be at least 1.' };
  let size: string;
  let majorIn: number;
  if (numbered !== undefined) {
    const n = Number(numbered);
    if (n > 12) return { ok: false, error: `Numbered sizes run #0 to #12; #${n} is not one.` };
    size = `#${n}`;
    // Numbered sizes: D = 0.060 + 0.013 N (from memory; not in REFERENCES.md).
    majorIn = 0.06 + 0.013 * n;
  } else {
    const d = parseInches(fraction);
    if (d === null) return { ok: false, error: `"${fraction}" is not a size in inches.` };
    majorIn = d;
    size = fraction.includes('.') ? String(d) : formatInchFraction(d);
  }
  const std = standardPitches[size];
  const typed = (seriesText as ThreadSeries | undefined) ?? null;
  let series: ThreadSeries | null = typed;
  if (std && (typed === 'UNC' || typed === 'UNF') && std[typed] !== tpi) {
    return { ok: false, error: `${size}-${tpi} is not ${typed}: ${typed} for ${size} is ${std[typed]} threads per inch.` };
  }
  if (typed === null && std) series = std.UNC === tpi ? 'UNC' : std.UNF === tpi ? 'UNF' : null;
  return {
    ok: true,
    value: {
      designation: `${size}-${tpi}${series ? ` ${series}` : ''}`,
      size,
      majorIn,
      tpi,
      series,
      fitClass: fit ?? null,
      majorFromMemory: numbered !== undefined,
    },
  };
}

export interface ThreadFigures extends Thread {
  pitchIn: number;
  /** Basic pitch diameter, rounded to 4 decimals. */
  basicPitchDiameterIn: number;
  source: string;
}

/** The standard's figures for a thread; throws RangeError on a designation that does not parse. */
export function threadFigures(input: string): ThreadFigures {
  const r = parseThread(input);
  if (!r.ok) throw new RangeError(r.error);
  const t = r.value;
  return {
    ...t,
    pitchIn: 1 / t.tpi,
    basicPitchDiameterIn: round4(basicPitchDiameter(t.majorIn, t.tpi)),
    source: UNIFIED_THREAD_SOURCE,
  };
}
