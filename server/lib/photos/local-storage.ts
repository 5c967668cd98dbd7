/**
 * Photo storage in a local folder (default `.data/media`), served by the app under `/media/<key>`.
 * The content type is not stored: keys end in their extension (".webp") and the static handler serves by it.
 */
import { randomBytes } from 'node:crypto';
import { mkdir, readFile, rename, rm, unlink, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { assertContentType, assertValidPhotoKey, InvalidPhotoKeyError, type PhotoStorage } from './storage';

export const DEFAULT_MEDIA_DIR = '.data/media';
export const DEFAULT_MEDIA_URL_BASE = '/media';

export interface LocalPhotoStorageOptions {
  /** Folder to store in; relative paths resolve against the working directory. */
  rootDir?: string;
  /** URL prefix the folder is served under. */
  urlBase?: string;
}

function isErrno(err: unknown, ...codes: string[]): boolean {
  return err instanceof Error && 'code' in err && codes.includes(String((err as NodeJS.ErrnoException).code));
}

export class LocalPhotoStorage implements PhotoStorage {
  readonly rootDir: string;
  readonly urlBase: string;

  constructor(options: LocalPhotoStorageOptions = {}) {
    this.rootDir = path.resolve(options.rootDir ?? DEFAULT_MEDIA_DIR);
    this.urlBase = (options.urlBase ?? DEFAULT_MEDIA_URL_BASE).replace(/\/+$/, '');
  }

  /** Absolute path for a key; validated twice (key shape, then the resolved path) so nothing escapes the root. */
  pathFor(key: string): string {
    assertValidPhotoKey(key);
    const full = path.resolve(this.rootDir, ...key.split('/'));
    if (!full.startsWith(this.rootDir + path.sep)) throw new InvalidPhotoKeyError(key, 'resolves outside the media folder');
    return full;
  }

  async put(key: string, buffer: Buffer, contentType: string): Promise<void> {
    assertContentType(contentType);
    if (!Buffer.isBuffer(buffer)) throw new TypeError('put needs a Buffer');
    const full = this.pathFor(key);
    await mkdir(path.dirname(full), { recursive: true });
    // Write then rename, so a reader never sees half a file.
    const temp = `${full}.${randomBytes(6).toString('hex')}.tmp`;
    try {
      await writeFile(temp, buffer);
      await rename(temp, full);
    } catch (err) {
      await rm(temp, { force: true });
      throw err;
    }
  }

  async get(key: string): Promise<Buffer | null> {
    const full = this.pathFor(key);
    try {
      return await readFile(full);
    } catch (err) {
      if (isErrno(err, 'ENOENT', 'ENOTDIR', 'EISDIR')) return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    const full = this.pathFor(key);
    try {
      await unlink(full);
    } catch (err) {
      if (!isErrno(err, 'ENOENT', 'ENOTDIR')) throw err;
    }
  }

  url(key: string): string {
    assertValidPhotoKey(key);
    return `${this.urlBase}/${key}`;
  }
}
