import { crc32, deflateSync } from 'node:zlib';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { MAX_FILE_BYTES, MAX_FILES, MAX_INPUT_PIXELS, PHOTO_SIZES, processUpload, type ProcessUploadResult } from './pipeline';

// Fixtures are generated here, not stored: each is a few lines of sharp.

/** Left half red, right half blue: shows which way a rotation went. */
async function halvesRaw(width: number, height: number) {
  const data = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const i = (y * width + x) * 3;
      if (x < width / 2) data[i] = 220;
      else data[i + 2] = 220;
    }
  }
  return sharp(data, { raw: { width, height, channels: 3 } });
}

/** Busy pixels so JPEG data is long and a truncation cuts the scan, not the header. */
function noisyRaw(width: number, height: number) {
  const data = Buffer.alloc(width * height * 3);
  for (let i = 0; i < data.length; i++) data[i] = (i * 7919 + (i >> 5) * 31) % 256;
  return sharp(data, { raw: { width, height, channels: 3 } });
}

function pngChunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

/** A PNG whose header declares width x height but holds almost no data: a decompression-bomb stand-in. */
function pngHeaderOnly(width: number, height: number): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // colour type: RGB
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', ihdr),
    pngChunk('IDAT', deflateSync(Buffer.alloc(1024))),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

function expectOk(result: ProcessUploadResult) {
  if (!result.ok) throw new Error(`expected success, got ${result.code}: ${result.message}`);
  return result.photo;
}

describe('limits', () => {
  it('when the limits are read, then they are 12 files of 15 MB and 40 megapixels', () => {
    expect(MAX_FILES).toBe(12);
    expect(MAX_FILE_BYTES).toBe(15 * 1024 * 1024);
    expect(MAX_INPUT_PIXELS).toBe(40_000_000);
  });
});

describe('processUpload: refusals', () => {
  it('when a text file is named .jpg, then it is unsupported media', async () => {
    const text = Buffer.from('This is not a photo, whatever its name (photo.jpg) says.\n');
    expect(await processUpload(text)).toMatchObject({ ok: false, code: 'unsupported_media' });
  });

  it('when an SVG carries a script, then it is unsupported media and never rasterised', async () => {
    const svg = Buffer.from(
      '<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" width="100" height="100">' +
        '<script>fetch("http://127.0.0.1/steal")</script><rect width="100" height="100" fill="red"/></svg>',
    );
    expect(await processUpload(svg)).toMatchObject({ ok: false, code: 'unsupported_media' });
  });

  it('when a GIF is uploaded, then it is unsupported media', async () => {
    const gif = await sharp({ create: { width: 20, height: 20, channels: 3, background: '#336699' } }).gif().toBuffer();
    expect(await processUpload(gif)).toMatchObject({ ok: false, code: 'unsupported_media' });
  });

  it('when the file is empty, then it is unsupported media', async () => {
    expect(await processUpload(Buffer.alloc(0))).toMatchObject({ ok: false, code: 'unsupported_media' });
  });

  it('when the file is over the byte limit, then it is refused as too large a payload', async () => {
    const png = await sharp({ create: { width: 64, height: 64, channels: 3, background: '#000' } }).png().toBuffer();
    expect(await processUpload(png, { maxFileBytes: 10 })).toMatchObject({ ok: false, code: 'payload_too_large' });
  });

  it('when a JPEG is truncated, then it is refused as corrupt', async () => {
    const jpeg = await noisyRaw(640, 480).jpeg({ quality: 90 }).toBuffer();
    const truncated = jpeg.subarray(0, Math.floor(jpeg.length / 2));
    expect(await processUpload(truncated)).toMatchObject({ ok: false, code: 'image_corrupt' });
  });

  it('when a PNG declares 20,000 x 20,000 pixels, then it is refused from its header, before decoding', async () => {
    const bomb = pngHeaderOnly(20_000, 20_000);
    expect(bomb.length).toBeLessThan(2000);
    expect((await sharp(bomb, { limitInputPixels: false }).metadata()).width).toBe(20_000);
    const started = performance.now();
    const result = await processUpload(bomb);
    expect(result).toMatchObject({ ok: false, code: 'image_too_large' });
    expect(result.ok ? '' : result.message).toMatch(/20000 x 20000/);
    expect(performance.now() - started).toBeLessThan(2000);
  });

  it('when a real image exceeds a lowered pixel limit, then it is refused as too large', async () => {
    const png = await sharp({ create: { width: 400, height: 300, channels: 3, background: '#777' } }).png().toBuffer();
    expect(await processUpload(png, { maxInputPixels: 100_000 })).toMatchObject({ ok: false, code: 'image_too_large' });
  });
});

describe('processUpload: output', () => {
  it('when a large JPEG is processed, then three WebP sizes come out with the longest sides 160, 640 and 1600', async () => {
    const jpeg = await noisyRaw(3000, 2000).jpeg().toBuffer();
    const photo = expectOk(await processUpload(jpeg));
    expect(photo.originalFormat).toBe('jpeg');
    expect(photo.sizes.thumb).toMatchObject({ width: 160, height: 107 });
    expect(photo.sizes.medium).toMatchObject({ width: 640, height: 427 });
    expect(photo.sizes.large).toMatchObject({ width: 1600, height: 1067 });
    for (const size of Object.values(photo.sizes)) {
      expect(await fileTypeFromBuffer(size.buffer)).toMatchObject({ mime: 'image/webp' });
      const meta = await sharp(size.buffer).metadata();
      expect(meta.format).toBe('webp');
      expect([meta.width, meta.height]).toEqual([size.width, size.height]);
    }
    expect(photo.dhash).toMatch(/^[0-9a-f]{16}$/);
    expect(PHOTO_SIZES).toEqual({ thumb: 160, medium: 640, large: 1600 });
  });

  it('when the image is smaller than a size, then it is never upscaled', async () => {
    const png = await sharp({ create: { width: 300, height: 200, channels: 3, background: '#446688' } }).png().toBuffer();
    const photo = expectOk(await processUpload(png));
    expect(photo.sizes.thumb).toMatchObject({ width: 160, height: 107 });
    expect(photo.sizes.medium).toMatchObject({ width: 300, height: 200 });
    expect(photo.sizes.large).toMatchObject({ width: 300, height: 200 });
  });

  it('when a JPEG has EXIF orientation 6, then the output is turned upright', async () => {
    const jpeg = await (await halvesRaw(400, 200)).jpeg().withMetadata({ orientation: 6 }).toBuffer();
    expect((await sharp(jpeg).metadata()).orientation).toBe(6);
    const photo = expectOk(await processUpload(jpeg));
    expect(photo.sizes.large).toMatchObject({ width: 200, height: 400 });
    expect([photo.originalWidth, photo.originalHeight]).toEqual([200, 400]);
    // Orientation 6 means "turn 90 degrees clockwise to view": the left (red) half ends up on top.
    const { data, info } = await sharp(photo.sizes.large.buffer).raw().toBuffer({ resolveWithObject: true });
    const at = (x: number, y: number) => {
      const i = (y * info.width + x) * info.channels;
      return { r: data[i], b: data[i + 2] };
    };
    expect(at(100, 50).r).toBeGreaterThan(150);
    expect(at(100, 50).b).toBeLessThan(80);
    expect(at(100, 350).b).toBeGreaterThan(150);
    expect(at(100, 350).r).toBeLessThan(80);
    expect((await sharp(photo.sizes.large.buffer).metadata()).orientation).toBeUndefined();
  });

  it('when a JPEG carries EXIF with GPS, then no size keeps any EXIF, XMP or ICC metadata', async () => {
    const jpeg = await noisyRaw(800, 600)
      .jpeg()
      .withExif({
        IFD0: { Make: 'Fictional Camera Co', Copyright: 'demo' },
        IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 1234/100', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 3900/100' },
      })
      .toBuffer();
    const inputMeta = await sharp(jpeg).metadata();
    expect(inputMeta.exif).toBeDefined();
    expect(inputMeta.exif?.includes(Buffer.from('Fictional Camera Co'))).toBe(true);
    // The GPS IFD pointer tag (0x8825) is present in the input, in either byte order.
    const gpsTag = [Buffer.from([0x88, 0x25]), Buffer.from([0x25, 0x88])];
    expect(gpsTag.some((t) => inputMeta.exif?.includes(t))).toBe(true);
    const photo = expectOk(await processUpload(jpeg));
    for (const size of Object.values(photo.sizes)) {
      const meta = await sharp(size.buffer).metadata();
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(meta.icc).toBeUndefined();
      expect(size.buffer.includes(Buffer.from('Fictional Camera Co'))).toBe(false);
      expect(size.buffer.includes(Buffer.from('Exif'))).toBe(false);
      expect(size.buffer.includes(Buffer.from('EXIF'))).toBe(false);
    }
  });

  it('when a solid-colour PNG is processed, then the placeholder colour is close to that colour', async () => {
    const png = await sharp({ create: { width: 120, height: 90, channels: 3, background: '#c04020' } }).png().toBuffer();
    const photo = expectOk(await processUpload(png));
    expect(photo.placeholderColor).toMatch(/^#[0-9a-f]{6}$/);
    const [r, g, b] = [1, 3, 5].map((i) => parseInt(photo.placeholderColor.slice(i, i + 2), 16));
    expect(Math.abs(r - 0xc0)).toBeLessThanOrEqual(16);
    expect(Math.abs(g - 0x40)).toBeLessThanOrEqual(16);
    expect(Math.abs(b - 0x20)).toBeLessThanOrEqual(16);
  });

  it('when a PNG has transparency, then the WebP keeps its alpha channel', async () => {
    const png = await sharp({ create: { width: 100, height: 100, channels: 4, background: { r: 10, g: 200, b: 10, alpha: 0.5 } } })
      .png()
      .toBuffer();
    const photo = expectOk(await processUpload(png));
    expect(photo.originalFormat).toBe('png');
    expect((await sharp(photo.sizes.medium.buffer).metadata()).hasAlpha).toBe(true);
  });

  it('when a WebP is uploaded, then it is accepted', async () => {
    const webp = await noisyRaw(200, 100).webp().toBuffer();
    expect(expectOk(await processUpload(webp)).originalFormat).toBe('webp');
  });

  it('when a 16-bit greyscale PNG is uploaded, then it comes out as ordinary sRGB WebP', async () => {
    const png = await noisyRaw(200, 100).greyscale().toColourspace('grey16').png().toBuffer();
    expect((await sharp(png).metadata()).depth).toBe('ushort');
    const photo = expectOk(await processUpload(png));
    const meta = await sharp(photo.sizes.large.buffer).metadata();
    expect(meta.format).toBe('webp');
    expect(meta.depth).toBe('uchar');
  });
});
