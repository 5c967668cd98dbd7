/**
 * Picks the photo storage from configuration: S3 when S3_BUCKET is set, the local folder otherwise.
 * Kept apart from storage.ts so the interface module imports neither implementation (no import cycle).
 */
import { LocalPhotoStorage } from './local-storage';
import { S3PhotoStorage, type S3CommandSender } from './s3-storage';
import type { PhotoStorage } from './storage';

export interface PhotoStorageEnv {
  S3_BUCKET?: string;
  S3_REGION?: string;
  S3_ENDPOINT?: string;
  S3_FORCE_PATH_STYLE?: string;
  S3_ACCESS_KEY_ID?: string;
  S3_SECRET_ACCESS_KEY?: string;
  S3_PUBLIC_BASE_URL?: string;
  S3_KEY_PREFIX?: string;
  MEDIA_DIR?: string;
  MEDIA_URL_BASE?: string;
}

function flag(value: string | undefined, name: string): boolean {
  if (value === undefined || value === '') return false;
  if (/^(1|true|yes)$/i.test(value)) return true;
  if (/^(0|false|no)$/i.test(value)) return false;
  throw new TypeError(`${name} must be true or false, got ${JSON.stringify(value)}`);
}

const blankToUndefined = (v: string | undefined) => (v === undefined || v.trim() === '' ? undefined : v.trim());

export function createPhotoStorage(env: PhotoStorageEnv = process.env, deps: { s3Client?: S3CommandSender } = {}): PhotoStorage {
  const bucket = blankToUndefined(env.S3_BUCKET);
  if (!bucket) {
    return new LocalPhotoStorage({ rootDir: blankToUndefined(env.MEDIA_DIR), urlBase: blankToUndefined(env.MEDIA_URL_BASE) });
  }
  const accessKeyId = blankToUndefined(env.S3_ACCESS_KEY_ID);
  const secretAccessKey = blankToUndefined(env.S3_SECRET_ACCESS_KEY);
  if (Boolean(accessKeyId) !== Boolean(secretAccessKey)) {
    throw new TypeError('Set both S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY, or neither (to use the SDK default credentials).');
  }
  return new S3PhotoStorage({
    bucket,
    region: blankToUndefined(env.S3_REGION),
    endpoint: blankToUndefined(env.S3_ENDPOINT),
    forcePathStyle: flag(env.S3_FORCE_PATH_STYLE, 'S3_FORCE_PATH_STYLE'),
    credentials: accessKeyId && secretAccessKey ? { accessKeyId, secretAccessKey } : undefined,
    publicBaseUrl: blankToUndefined(env.S3_PUBLIC_BASE_URL),
    keyPrefix: blankToUndefined(env.S3_KEY_PREFIX),
    client: deps.s3Client,
  });
}
