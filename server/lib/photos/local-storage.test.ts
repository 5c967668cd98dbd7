import { existsSync } from 'node:fs';
import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DEFAULT_MEDIA_DIR, LocalPhotoStorage } from './local-storage';
import { InvalidPhotoKeyError } from './storage';

let root: string;
let storage: LocalPhotoStorage;

beforeEach(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'drabyard-media-'));
  storage = new LocalPhotoStorage({ rootDir: path.join(root, 'media') });
});

afterEach(async () => {
  await rm(root, { recursive: true, force: true });
});

describe('LocalPhotoStorage', () => {
  it('when a photo is put, then get returns the same bytes and no temp file is left', async () => {
    await storage.put('listings/L1/p1-large.webp', Buffer.from('webp-bytes'), 'image/webp');
    expect((await storage.get('listings/L1/p1-large.webp'))?.toString()).toBe('webp-bytes');
    expect(await readdir(path.join(root, 'media', 'listings', 'L1'))).toEqual(['p1-large.webp']);
  });

  it('when a key is put twice, then the second write replaces the first', async () => {
    await storage.put('a.webp', Buffer.from('one'), 'image/webp');
    await storage.put('a.webp', Buffer.from('two'), 'image/webp');
    expect((await storage.get('a.webp'))?.toString()).toBe('two');
  });

  it('when nothing is stored under a key, then get returns null', async () => {
    expect(await storage.get('listings/none.webp')).toBeNull();
  });

  it('when a photo is deleted, then it is gone, and deleting it again is not an error', async () => {
    await storage.put('b.webp', Buffer.from('x'), 'image/webp');
    await storage.delete('b.webp');
    expect(await storage.get('b.webp')).toBeNull();
    await expect(storage.delete('b.webp')).resolves.toBeUndefined();
  });

  it('when a key tries path traversal, then every operation refuses it and nothing is written outside', async () => {
    await writeFile(path.join(root, 'secret.txt'), 'keep out');
    await expect(storage.put('../secret.txt', Buffer.from('x'), 'image/webp')).rejects.toThrow(InvalidPhotoKeyError);
    await expect(storage.get('../secret.txt')).rejects.toThrow(InvalidPhotoKeyError);
    await expect(storage.delete('../secret.txt')).rejects.toThrow(InvalidPhotoKeyError);
    expect(() => storage.url('../secret.txt')).toThrow(InvalidPhotoKeyError);
    expect(existsSync(path.join(root, 'secret.txt'))).toBe(true);
  });

  it('when the content type is malformed, then put refuses it', async () => {
    await expect(storage.put('c.webp', Buffer.from('x'), 'not a type')).rejects.toThrow(/content type/);
  });

  it('when a URL is asked for, then it is /media/<key> by default, or under the configured base', () => {
    expect(storage.url('listings/L1/p1-thumb.webp')).toBe('/media/listings/L1/p1-thumb.webp');
    expect(new LocalPhotoStorage({ rootDir: root, urlBase: '/files/' }).url('a.webp')).toBe('/files/a.webp');
  });

  it('when no folder is given, then it defaults to .data/media under the working directory', () => {
    expect(new LocalPhotoStorage().rootDir).toBe(path.resolve(DEFAULT_MEDIA_DIR));
  });
});
