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

/**
 * Folded keys one edit away from `folded` (a dropped, doubled-up, swapped or mistyped character), each folded
 * again so leading zeros match the stored form. Bounded: keys longer than 24 characters get none.
 */
export function nearFoldedKeys(folded: string): string[] {
  if (folded.length < 4 || folded.length > 24) return [];
  const out = new Set<string>();
  const n = folded.length;
  for (let i = 0; i < n; i++) out.add(folded.slice(0, i) + folded.slice(i + 1));
  for (let i = 0; i < n - 1; i++) out.add(folded.slice(0, i) + folded[i + 1] + folded[i] + folded.slice(i + 2));
  for (let i = 0; i < n; i++) for (const c of FOLDED_ALPHABET) if (c !== folded[i]) out.add(folded.slice(0, i) + c + folded.slice(i + 1));
  for (let i = 0; i <= n; i++) for (const c of FOLDED_ALPHABET) out.add(folded.slice(0, i) + c + folded.slice(i));
  const result = new Set<string>();
  for (const k of out) {
    const f = foldKey(k);
    if (f !== folded && f.length >= 3) result.add(f);
  }
  return [...result];
}
