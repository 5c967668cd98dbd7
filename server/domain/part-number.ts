/**
 * Part-number keys. People type numbers in every shape (hyphens, spaces, slashes, lower case, letter O for
 * digit 0, letter I for 1, dropped leading zeros); we keep the number as printed for display and match on keys.
 *
 * - `key`: the primary key. Upper case, letters and digits only.
 * - `folded`: the confusion-folded key. Letter O -> 0, letter I -> 1, then leading zeros dropped. Two numbers
 *   whose folded keys are equal may be the same number typed differently; a match that holds only on the
 *   folded key is an "alternate" match, never an exact one.
 */

export const partNumberKinds = ['maker', 'ordnance', 'nsn', 'hardware_standard', 'vendor', 'reproduction'] as const;
export type PartNumberKind = (typeof partNumberKinds)[number];

/** Longest printed number we accept (after trimming): longer input is a sentence, not a number. */
export const PART_NUMBER_MAX_LENGTH = 64;

export type PartNumberErrorCode = 'empty' | 'too_long';

export class PartNumberError extends Error {
  override readonly name = 'PartNumberError';
  constructor(
    readonly code: PartNumberErrorCode,
    message: string,
  ) {
    super(message);
  }
}

export interface PartNumberKeys {
  /** As printed, trimmed, inner runs of white space collapsed to one space. */
  display: string;
  key: string;
  folded: string;
}

export type PartNumberResult = { ok: true; value: PartNumberKeys } | { ok: false; error: PartNumberError };

function toKey(printed: string): string {
  // NFKC turns full-width digits and letters (pasted from some spreadsheets) into plain ASCII ones.
  return printed.normalize('NFKC').toUpperCase().replace(/[^A-Z0-9]/g, '');
}

/** Folds an already-normalised key. Total: '' stays ''. */
export function foldKey(key: string): string {
  const swapped = key.replace(/O/g, '0').replace(/I/g, '1');
  // Leading zeros are often dropped or added when a number is retyped; keep at least one character.
  const trimmed = swapped.replace(/^0+/, '');
  return trimmed === '' && swapped !== '' ? '0' : trimmed;
}

/** Parses a printed number into its keys, as a result (no throw). */
export function parsePartNumber(printed: string): PartNumberResult {
  const display = printed.trim().replace(/\s+/g, ' ');
  if (display.length > PART_NUMBER_MAX_LENGTH) {
    return {
      ok: false,
      error: new PartNumberError(
        'too_long',
        `A part number is at most ${PART_NUMBER_MAX_LENGTH} characters; this one has ${display.length}.`,
      ),
    };
  }
  const key = toKey(display);
  if (key === '') {
    return { ok: false, error: new PartNumberError('empty', 'A part number needs at least one letter or digit.') };
  }
  return { ok: true, value: { display, key, folded: foldKey(key) } };
}

/** The keys of a printed number; throws PartNumberError on empty or too-long input. */
export function partNumberKeys(printed: string): PartNumberKeys {
  const r = parsePartNumber(printed);
  if (!r.ok) throw r.error;
  return r.value;
}

/** The primary key; throws PartNumberError on empty or too-long input. */
export function normalizePartNumber(printed: string): string {
  return partNumberKeys(printed).key;
}

/** The confusion-folded key of a printed number; throws PartNumberError on empty or too-long input. */
export function foldedKey(printed: string): string {
  return partNumberKeys(printed).folded;
}

/**
 * Keys other than the primary one under which this number may be matched. Today only the folded key
 * (empty when folding changes nothing): store `folded` beside `key` and compare folded to folded, which
 * catches O/0 and I/1 confusions in both directions without listing every spelling.
 */
export function alternateKeys(printed: string): string[] {
  const { key, folded } = partNumberKeys(printed);
  return folded === key ? [] : [folded];
}

/** Words that often stand before a number in a query ("NSN 5315-...", "MS 35338"). */
const NUMBER_PREFIX_WORDS = new Set(['NSN', 'NIIN', 'PN', 'P/N', 'PART', 'NO', 'NO.', '#']);

/**
 * Heuristic for search: does the query look like a part number rather than words? True when it has a digit,
 * is at most four tokens (not counting a prefix word such as NSN), is mostly letters and digits, and has no
 * token that reads as a word (four or more letters without a digit).
 */
export function looksLikePartNumber(q: string): boolean {
  const s = q.trim();
  if (s.length < 2 || s.length > PART_NUMBER_MAX_LENGTH) return false;
  if (!/[0-9]/.test(s)) return false;
  const tokens = s.split(/\s+/).filter((t) => !NUMBER_PREFIX_WORDS.has(t.toUpperCase()));
  if (tokens.length === 0 || tokens.length > 4) return false;
  const compact = s.replace(/\s+/g, '');
  const alnum = compact.replace(/[^A-Za-z0-9]/g, '').length;
  if (alnum / compact.length < 0.6) return false;
  for (const t of tokens) {
    if (!/[0-9]/.test(t) && /[A-Za-z]{4,}/.test(t)) return false;
  }
  return true;
}
