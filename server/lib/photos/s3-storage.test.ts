import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { describe, expect, it } from 'vitest';
import { createPhotoStorage } from './create-photo-storage';
import { LocalPhotoStorage } from './local-storage';
import { S3PhotoStorage, type S3CommandSender, type S3PhotoCommand } from './s3-storage';
import { InvalidPhotoKeyError } from './storage';

function fakeClient(reply: (command: S3PhotoCommand) => unknown = () => ({})) {
  const sent: S3PhotoCommand[] = [];
  const client: S3CommandSender = {
    async send(command) {
      sent.push(command);
      return reply(command);
    },
  };
  return { client, sent };
}

describe('S3PhotoStorage commands', () => {
  it('when a photo is put, then a PutObjectCommand carries bucket, prefixed key, body, type and cache header', async () => {
    const { client, sent } = fakeClient();
    const storage = new S3PhotoStorage({ bucket: 'drabyard-media', keyPrefix: 'photos/', client });
    const body = Buffer.from('webp');
    await storage.put('listings/L1/p1-large.webp', body, 'image/webp');
    expect(sent).toHaveLength(1);
    expect(sent[0]).toBeInstanceOf(PutObjectCommand);
    expect(sent[0].input).toMatchObject({
      Bucket: 'drabyard-media',
      Key: 'photos/listings/L1/p1-large.webp',
      Body: body,
      ContentType: 'image/webp',
      ContentLength: 4,
      CacheControl: 'public, max-age=31536000, immutable',
    });
  });

  it('when a photo is fetched, then a GetObjectCommand is sent and the body comes back as a Buffer', async () => {
    const { client, sent } = fakeClient(() => ({ Body: { transformToByteArray: async () => new Uint8Array([1, 2, 3]) } }));
    const storage = new S3PhotoStorage({ bucket: 'drabyard-media', client });
    const got = await storage.get('a.webp');
    expect(sent[0]).toBeInstanceOf(GetObjectCommand);
    expect(sent[0].input).toEqual({ Bucket: 'drabyard-media', Key: 'a.webp' });
    expect(Buffer.isBuffer(got) && [...got]).toEqual([1, 2, 3]);
  });

  it('when the object does not exist, then get returns null', async () => {
    const { client } = fakeClient(() => {
      throw Object.assign(new Error('The specified key does not exist.'), { name: 'NoSuchKey', $metadata: { httpStatusCode: 404 } });
    });
    expect(await new S3PhotoStorage({ bucket: 'drabyard-media', client }).get('missing.webp')).toBeNull();
  });

  it('when S3 fails for another reason, then the error is passed on', async () => {
    const { client } = fakeClient(() => {
      throw Object.assign(new Error('Access Denied'), { name: 'AccessDenied', $metadata: { httpStatusCode: 403 } });
    });
    await expect(new S3PhotoStorage({ bucket: 'drabyard-media', client }).get('a.webp')).rejects.toThrow('Access Denied');
  });

  it('when a photo is deleted, then a DeleteObjectCommand is sent', async () => {
    const { client, sent } = fakeClient();
    await new S3PhotoStorage({ bucket: 'drabyard-media', client }).delete('a.webp');
    expect(sent[0]).toBeInstanceOf(DeleteObjectCommand);
    expect(sent[0].input).toEqual({ Bucket: 'drabyard-media', Key: 'a.webp' });
  });

  it('when a key tries path traversal, then no command is sent', async () => {
    const { client, sent } = fakeClient();
    const storage = new S3PhotoStorage({ bucket: 'drabyard-media', client });
    await expect(storage.put('../x.webp', Buffer.from('x'), 'image/webp')).rejects.toThrow(InvalidPhotoKeyError);
    await expect(storage.get('a/../../b')).rejects.toThrow(InvalidPhotoKeyError);
    expect(sent).toHaveLength(0);
  });

  it('when the bucket name is invalid, then construction fails clearly', () => {
    expect(() => new S3PhotoStorage({ bucket: 'Bad_Bucket!' })).toThrow(/bucket/);
  });
});

describe('S3PhotoStorage urls', () => {
  const { client } = fakeClient();

  it('when a public base URL is set, then URLs use it', () => {
    const s = new S3PhotoStorage({ bucket: 'drabyard-media', publicBaseUrl: 'https://cdn.example.test/', client });
    expect(s.url('a.webp')).toBe('https://cdn.example.test/a.webp');
  });

  it('when a path-style endpoint is set, then URLs put the bucket in the path', () => {
    const s = new S3PhotoStorage({ bucket: 'drabyard-media', endpoint: 'http://127.0.0.1:9000', forcePathStyle: true, client });
    expect(s.url('listings/a.webp')).toBe('http://127.0.0.1:9000/drabyard-media/listings/a.webp');
  });

  it('when a virtual-host endpoint is set, then URLs put the bucket in the host', () => {
    const s = new S3PhotoStorage({ bucket: 'drabyard-media', endpoint: 'https://objects.example.test', client });
    expect(s.url('a.webp')).toBe('https://drabyard-media.objects.example.test/a.webp');
  });

  it('when nothing else is set, then URLs are the AWS regional bucket address', () => {
    const s = new S3PhotoStorage({ bucket: 'drabyard-media', region: 'eu-west-1', client });
    expect(s.url('a.webp')).toBe('https://drabyard-media.s3.eu-west-1.amazonaws.com/a.webp');
  });
});

describe('createPhotoStorage', () => {
  it('when S3_BUCKET is not set, then local storage is used', () => {
    const s = createPhotoStorage({ MEDIA_DIR: '/tmp/drabyard-test-media' });
    expect(s).toBeInstanceOf(LocalPhotoStorage);
    expect((s as LocalPhotoStorage).rootDir).toBe('/tmp/drabyard-test-media');
  });

  it('when S3_BUCKET is set, then S3 storage is used with the endpoint and path style from the env', async () => {
    const { client, sent } = fakeClient();
    const s = createPhotoStorage(
      { S3_BUCKET: 'drabyard-media', S3_ENDPOINT: 'http://127.0.0.1:9000', S3_FORCE_PATH_STYLE: 'true', S3_REGION: 'us-east-1' },
      { s3Client: client },
    );
    expect(s).toBeInstanceOf(S3PhotoStorage);
    expect(s.url('a.webp')).toBe('http://127.0.0.1:9000/drabyard-media/a.webp');
    await s.delete('a.webp');
    expect(sent[0].input).toEqual({ Bucket: 'drabyard-media', Key: 'a.webp' });
  });

  it('when S3 is chosen without an injected client, then a real S3Client is built (no request is made)', () => {
    const s = createPhotoStorage({
      S3_BUCKET: 'drabyard-media',
      S3_ENDPOINT: 'http://127.0.0.1:9000',
      S3_ACCESS_KEY_ID: 'fictional-key',
      S3_SECRET_ACCESS_KEY: 'fictional-secret',
    });
    expect(s).toBeInstanceOf(S3PhotoStorage);
  });

  it('when only one of the two S3 credential variables is set, then a clear error is thrown', () => {
    expect(() => createPhotoStorage({ S3_BUCKET: 'drabyard-media', S3_ACCESS_KEY_ID: 'k' })).toThrow(/S3_SECRET_ACCESS_KEY/);
  });

  it('when S3_FORCE_PATH_STYLE is not a boolean word, then a clear error is thrown', () => {
    expect(() => createPhotoStorage({ S3_BUCKET: 'drabyard-media', S3_FORCE_PATH_STYLE: 'maybe' })).toThrow(/S3_FORCE_PATH_STYLE/);
  });
});
