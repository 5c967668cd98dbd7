/**
 * Opaque keyset cursors: base64url JSON of the last hit's sort key and id, signed with an HMAC so a changed
 * cursor is refused rather than trusted, and tied to the search it came from.
 */
import { createHash, createHmac, timingSafeEqual } from 'node:crypto';
import { AppError } from '../errors';

export type SampleMode = 'exact' | 's16' | 's128';

export interface CursorState {
  /** The sort key of the last hit: score (relevance), price in cents, or created time in epoch ms. */
  value: number;
  docId: number;
  /** How page one counted (kept so later pages rank the same candidate set). */
  mode: SampleMode;
  /** Fingerprint of the search (query, filters, sort) the cursor belongs to. */
  search: string;
}

const b64 = (b: Buffer) => b.toString('base64url');

export function searchFingerprint(parts: unknown): string {
  return b64(createHash('sha256').update(JSON.stringify(parts)).digest().subarray(0, 9));
}

function sign(secret: string, body: string) {
  return createHmac('sha256', `drabyard-search-cursor:${secret}`).update(body).digest().subarray(0, 16);
}

export function encodeCursor(state: CursorState, secret: string): string {
  const body = b64(Buffer.from(JSON.stringify([1, state.value, state.docId, state.mode, state.search])));
  return `${body}.${b64(sign(secret, body))}`;
}

const bad = (message: string) => new AppError(400, 'validation_failed', message, { fieldErrors: { cursor: [message] } });

export function decodeCursor(token: string, secret: string, search: string): CursorState {
  const [body, mac] = token.split('.');
  const expected = sign(secret, body ?? '');
  const given = Buffer.from(mac ?? '', 'base64url');
  if (!body || given.length !== expected.length || !timingSafeEqual(given, expected)) throw bad('This cursor is not valid (it was changed or is from another server)');
  let parsed: unknown;
  try {
    parsed = JSON.parse(Buffer.from(body, 'base64url').toString('utf8'));
  } catch {
    throw bad('This cursor is not valid');
  }
  if (!Array.isArray(parsed) || parsed.length !== 5 || parsed[0] !== 1) throw bad('This cursor is not valid');
  const [, value, docId, mode, fp] = parsed as [number, unknown, unknown, unknown, unknown];
  if (typeof value !== 'number' || !Number.isFinite(value) || !Number.isInteger(docId) || !['exact', 's16', 's128'].includes(mode as string) || typeof fp !== 'string') {
    throw bad('This cursor is not valid');
  }
  if (fp !== search) throw bad('This cursor belongs to a different search; start again from the first page');
  return { value, docId: docId as number, mode: mode as SampleMode, search: fp };
}
