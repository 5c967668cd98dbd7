import { describe, expect, it } from 'vitest';
import { assertValidPhotoKey, InvalidPhotoKeyError, isValidPhotoKey, photoKey } from './storage';

describe('assertValidPhotoKey', () => {
  it('when a key is a relative path of safe segments, then it is accepted', () => {
    for (const key of ['a.webp', 'listings/L123/p1-large.webp', 'x/y/z_1.2-3.png']) {
      expect(isValidPhotoKey(key)).toBe(true);
    }
  });

  it('when a key tries to climb out or is absolute, then it is refused', () => {
    for (const key of ['../secret', 'listings/../../etc/passwd', '/etc/passwd', 'a/./b', 'a//b', 'a/', '..', '.hidden']) {
      expect(() => assertValidPhotoKey(key)).toThrow(InvalidPhotoKeyError);
    }
  });

  it('when a key holds backslashes, colons, NUL, percent escapes or spaces, then it is refused', () => {
    for (const key of ['a\\..\\b', 'C:/x', 'a\u0000b', 'a%2e%2e/b', 'a b', '-rf']) {
      expect(isValidPhotoKey(key)).toBe(false);
    }
  });

  it('when a key is empty or too long, then it is refused', () => {
    expect(isValidPhotoKey('')).toBe(false);
    expect(isValidPhotoKey('a'.repeat(513))).toBe(false);
  });

  it('when a photo key is built, then it has the listings/<listing>/<photo>-<size>.webp shape', () => {
    expect(photoKey('L1', 'P2', 'thumb')).toBe('listings/L1/P2-thumb.webp');
    expect(() => photoKey('../x', 'P2', 'thumb')).toThrow(InvalidPhotoKeyError);
  });
});
