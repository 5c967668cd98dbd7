/**
 * Photo storage in any S3-compatible object store (AWS S3, or a self-hosted one reached by `endpoint` with
 * path-style addressing). The client is injectable so tests check the commands without a network.
 */
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { assertContentType, assertValidPhotoKey, type PhotoStorage } from './storage';

export type S3PhotoCommand = PutObjectCommand | GetObjectCommand | DeleteObjectCommand;

/** The one method of S3Client this storage uses. */
export interface S3CommandSender {
  send(command: S3PhotoCommand): Promise<unknown>;
}

export interface S3PhotoStorageOptions {
  bucket: string;
  region?: string;
  /** e.g. "http://127.0.0.1:9000" for a local object store; omit for AWS. */
  endpoint?: string;
  forcePathStyle?: boolean;
  credentials?: { accessKeyId: string; secretAccessKey: string; sessionToken?: string };
  /** Public URL prefix (a CDN, or the bucket's website address); derived from the endpoint when omitted. */
  publicBaseUrl?: string;
  /** Prepended to every key, e.g. "photos/" to share a bucket. */
  keyPrefix?: string;
  cacheControl?: string;
  client?: S3CommandSender;
}

// Keys are content-unique (a new upload gets a new key), so objects never change and may be cached forever.
export const DEFAULT_CACHE_CONTROL = 'public, max-age=31536000, immutable';

function isNotFound(err: unknown): boolean {
  if (typeof err !== 'object' || err === null) return false;
  const e = err as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e.name === 'NoSuchKey' || e.name === 'NotFound' || e.$metadata?.httpStatusCode === 404;
}

export class S3PhotoStorage implements PhotoStorage {
  readonly bucket: string;
  readonly region: string;
  private readonly client: S3CommandSender;
  private readonly options: S3PhotoStorageOptions;

  constructor(options: S3PhotoStorageOptions) {
    if (!options?.bucket || !/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/.test(options.bucket)) {
      throw new TypeError(`Invalid S3 bucket name: ${JSON.stringify(options?.bucket)}`);
    }
    if (options.keyPrefix !== undefined && options.keyPrefix !== '' && !/^([A-Za-z0-9_][A-Za-z0-9._-]*\/)+$/.test(options.keyPrefix)) {
      throw new TypeError(`Invalid S3 key prefix (safe segments ending in "/"): ${JSON.stringify(options.keyPrefix)}`);
    }
    this.options = options;
    this.bucket = options.bucket;
    this.region = options.region ?? 'us-east-1';
    this.client =
      options.client ??
      (new S3Client({
        region: this.region,
        endpoint: options.endpoint,
        forcePathStyle: options.forcePathStyle ?? false,
        credentials: options.credentials,
      }) as unknown as S3CommandSender);
  }

  private objectKey(key: string): string {
    assertValidPhotoKey(key);
    return `${this.options.keyPrefix ?? ''}${key}`;
  }

  async put(key: string, buffer: Buffer, contentType: string): Promise<void> {
    assertContentType(contentType);
    if (!Buffer.isBuffer(buffer)) throw new TypeError('put needs a Buffer');
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.bucket,
        Key: this.objectKey(key),
        Body: buffer,
        ContentType: contentType,
        ContentLength: buffer.length,
        CacheControl: this.options.cacheControl ?? DEFAULT_CACHE_CONTROL,
      }),
    );
  }

  async get(key: string): Promise<Buffer | null> {
    try {
      const out = (await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key) }))) as {
        Body?: { transformToByteArray(): Promise<Uint8Array> };
      };
      if (!out.Body) return null;
      return Buffer.from(await out.Body.transformToByteArray());
    } catch (err) {
      if (isNotFound(err)) return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key) }));
  }

  url(key: string): string {
    const objectKey = this.objectKey(key);
    if (this.options.publicBaseUrl) return `${this.options.publicBaseUrl.replace(/\/+$/, '')}/${objectKey}`;
    if (this.options.endpoint) {
      const endpoint = new URL(this.options.endpoint);
      const base = endpoint.origin + endpoint.pathname.replace(/\/+$/, '');
      if (this.options.forcePathStyle) return `${base}/${this.bucket}/${objectKey}`;
      return `${endpoint.protocol}//${this.bucket}.${endpoint.host}${endpoint.pathname.replace(/\/+$/, '')}/${objectKey}`;
    }
    return `https://${this.bucket}.s3.${this.region}.amazonaws.com/${objectKey}`;
  }
}
