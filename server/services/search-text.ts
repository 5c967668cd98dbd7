/**
 * Pure helpers of search: splitting a typed query into words and number-like chunks, and the near spellings
 * of a part number used before the (slower) trigram fallback.
 */
import { foldKey, looksLikePartNumber, parsePartNumber } from '../domain/part-number';

export const MAX_CHUNKS = 8;
const MAX_WORD = 40;

export interface QueryChunk {
  /** Lower-case words and digit runs of the chunk (what the text search config will stem). */
  words: string[];
  /** Keys of the chunk read as a part number (lower case, as the `simple` config stores them), when it has a digit. */
  key: string | null;
  folded: string | null;
}

/** Splits a query at white space into at most MAX_CHUNKS chunks; tsquery operators and quotes are just separators. */
export function parseTextQuery(q: string): QueryChunk[] {
  const chunks: QueryChunk[] = [];
  for (const raw of q.normalize('NFKC').split(/\s+/)) {
    if (chunks.length >= MAX_CHUNKS) break;
    const words = raw
      .toLowerCase()
      .split(/[^\p{L}\p{N}]+/u)
      .filter(Boolean)
      .map((w) => w.slice(0, MAX_WORD));
    if (words.length === 0) continue;
    let key: string | null = null;
    let folded: string | null = null;
    if (/\p{N}/u.test(raw)) {
      const p = parsePartNumber(raw);
      if (p.ok) {
        key = p.value.key.toLowerCase();
        folded = p.value.folded.toLowerCase();
      }
    }
    chunks.push({ words, key, folded });
  }
  return chunks;
}

/** Plain words (letters only, three or more) that may be corrected against the vocabulary. */
export function correctableWords(chunks: QueryChunk[]): string[] {
  const out = new Set<string>();
  for (const c of chunks) for (const w of c.words) if (w.length >= 3 && /^\p{L}+$/u.test(w)) out.add(w);
  return [...out];
}

export function isNumberQuery(q: string): boolean {
  return looksLikePartNumber(q);
}

// A folded key holds no letter O or I (they were folded to 0 and 1).
const FOLDED_ALPHABET = 'ABCDEFGHJKLMNPQRSTUVWXYZ0123456789';
const DIGITS = '0123456789';
const LETTERS = 'ABCDEFGHJKLMNPQRSTUVWXYZ';
const classOf = (c: string | undefined) => (c === undefined ? '' : /\d/.test(c) ? DIGITS : LETTERS);

/** A key and every string made by dropping one of its characters (the SQL function number_key_deletions). */
export function keyDeletions(k: string): string[] {
  const out = new Set([k]);
  for (let i = 0; i < k.length; i++) out.add(k.slice(0, i) + k.slice(i + 1));
  return [...out];
}

/**
 * What a typed folded key looks up in the deletions index (drizzle/0008_number_lookups.sql) to find every
 * key nearFoldedKeys would name: its deletions, and those folded again (an edit that leaves leading zeros folds
 * to a key more than one deletion away). Two keys one edit apart share a deletion (symmetric deletion: a
 * dropped or added character leaves the shorter key, a changed one the key without it, a swap the key without
 * either); candidates found this way are then checked against nearFoldedKeys. Empty where that gives none.
 */
export function nearLookupKeys(folded: string): string[] {
  if (folded.length < 4 || folded.length > 24) return [];
  const out = new Set<string>();
  for (const d of keyDeletions(folded)) {
    out.add(d);
    out.add(foldKey(d));
  }
  return [...out];
}

/**
 * Folded keys one edit away from `folded` (a dropped, doubled-up, swapped or mistyped character), each folded
 * again so leading zeros match the stored form. Bounded: keys longer than 24 characters get none.
 *
 * `likely` is the smaller set tried first: drops and swaps, and a digit mistyped or missed among digits, a
 * letter among letters (common practice, no published source: stamped and hand-copied numbers go wrong within a
 * run of digits far more often than across). `rest` is everything else one edit away; `all` is both.
 */
export function nearFoldedKeys(folded: string, which: 'likely' | 'rest' | 'all' = 'all'): string[] {
  if (folded.length < 4 || folded.length > 24) return [];
  const likely = new Set<string>();
  const other = new Set<string>();
  const n = folded.length;
  for (let i = 0; i < n; i++) likely.add(folded.slice(0, i) + folded.slice(i + 1));
  for (let i = 0; i < n - 1; i++) likely.add(folded.slice(0, i) + folded[i + 1] + folded[i] + folded.slice(i + 2));
  for (let i = 0; i < n; i++) {
    const same = classOf(folded[i]);
    for (const c of FOLDED_ALPHABET) if (c !== folded[i]) (same.includes(c) ? likely : other).add(folded.slice(0, i) + c + folded.slice(i + 1));
  }
  for (let i = 0; i <= n; i++) {
    const near = classOf(folded[i - 1]) + classOf(folded[i]);
    for (const c of FOLDED_ALPHABET) (near.includes(c) ? likely : other).add(folded.slice(0, i) + c + folded.slice(i));
  }
  const pick = which === 'likely' ? [likely] : which === 'rest' ? [other] : [likely, other];
  const result = new Set<string>();
  for (const set of pick)
    for (const k of set) {
      const f = foldKey(k);
      if (f !== folded && f.length >= 3) result.add(f);
    }
  // A key reached both ways (or folding to one reached the likely way) belongs to the likely part only.
  if (which === 'rest') for (const k of likely) result.delete(foldKey(k));
  return [...result];
}
