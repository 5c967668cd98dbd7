/**
 * Where processed photos live. Two implementations: a local folder (development, single server) and any
 * S3-compatible object store (production). Keys are validated the same way for both, so a key that is safe
 * on one is safe on the other.
 */

export interface PhotoStorage {
  put(key: string, buffer: Buffer, contentType: string): Promise<void>;
  /** The stored bytes, or null when nothing is stored under the key. */
  get(key: string): Promise<Buffer | null>;
  /** Removes the object; removing a missing key is not an error. */
  delete(key: string): Promise<void>;
  /** Public URL the browser loads the photo from. */
  url(key: string): string;
}

export const MAX_PHOTO_KEY_LENGTH = 512;

// Each segment starts with a letter, digit or underscore, so '.', '..' and hidden files are impossible;
// no backslash, colon, NUL or percent sign can appear, so neither Windows paths nor URL escapes slip through.
const SEGMENT = /^[A-Za-z0-9_][A-Za-z0-9._-]*$/;

export class InvalidPhotoKeyError extends Error {
  readonly code = 'invalid_photo_key';
  constructor(key: unknown, reason: string) {
    super(`Invalid photo key ${JSON.stringify(typeof key === 'string' ? key.slice(0, 80) : key)}: ${reason}`);
    this.name = 'InvalidPhotoKeyError';
  }
}

/** Throws InvalidPhotoKeyError unless `key` is a relative path of safe segments, e.g. "listings/abc/1-large.webp". */
export function assertValidPhotoKey(key: string): void {
  if (typeof key !== 'string' || key.length === 0) throw new InvalidPhotoKeyError(key, 'must be a non-empty string');
  if (key.length > MAX_PHOTO_KEY_LENGTH) throw new InvalidPhotoKeyError(key, `must be at most ${MAX_PHOTO_KEY_LENGTH} characters`);
  for (const segment of key.split('/')) {
    if (segment === '') throw new InvalidPhotoKeyError(key, 'must not start or end with "/" or contain "//"');
    if (!SEGMENT.test(segment)) {
      throw new InvalidPhotoKeyError(key, 'segments may hold only letters, digits, ".", "_" and "-", and must not start with "." or "-"');
    }
  }
}

export function isValidPhotoKey(key: string): boolean {
  try {
    assertValidPhotoKey(key);
    return true;
  } catch {
    return false;
  }
}

export function assertContentType(contentType: string): void {
  if (typeof contentType !== 'string' || !/^[a-z]+\/[a-z0-9.+-]+$/i.test(contentType)) {
    throw new TypeError(`Invalid content type: ${JSON.stringify(contentType)}`);
  }
}

/** The storage key for one size of one listing photo. */
export function photoKey(listingId: string, photoId: string, size: string): string {
  const key = `listings/${listingId}/${photoId}-${size}.webp`;
  assertValidPhotoKey(key);
  return key;
}
