import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { computeDhash, hammingDistanceHex } from './dhash';

/** A smooth, structured test picture: soft waves, the kind of tonal layout a real photo has. */
function wavesRaw(width: number, height: number) {
  const data = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const v = 128 + 90 * Math.sin(x / 23) * Math.cos(y / 17);
      const i = (y * width + x) * 3;
      data[i] = v;
      data[i + 1] = v * 0.8;
      data[i + 2] = 255 - v;
    }
  }
  return sharp(data, { raw: { width, height, channels: 3 } });
}

/** A different picture: diagonal stripes and blocks. */
function stripesRaw(width: number, height: number) {
  const data = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const v = ((x + 2 * y) >> 4) % 3 === 0 ? 230 : (x >> 6) % 2 ? 30 : 140;
      data.fill(v, (y * width + x) * 3, (y * width + x) * 3 + 3);
    }
  }
  return sharp(data, { raw: { width, height, channels: 3 } });
}

/** An off-centre bright blob with a darker second blob: no left-right symmetry. */
function blobsRaw(width: number, height: number) {
  const data = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const a = 200 * Math.exp(-((x - 90) ** 2 + (y - 70) ** 2) / 3000);
      const b = 120 * Math.exp(-((x - 250) ** 2 + (y - 170) ** 2) / 9000);
      data.fill(Math.min(255, 30 + a + b + 40 * Math.sin(y / 11)), (y * width + x) * 3, (y * width + x) * 3 + 3);
    }
  }
  return sharp(data, { raw: { width, height, channels: 3 } });
}

describe('computeDhash', () => {
  it('when an image is hashed, then the result is 16 lower-case hex characters', async () => {
    const png = await wavesRaw(320, 240).png().toBuffer();
    expect(await computeDhash(png)).toMatch(/^[0-9a-f]{16}$/);
  });

  it('when the same image is hashed twice, then the distance is 0', async () => {
    const png = await wavesRaw(320, 240).png().toBuffer();
    expect(hammingDistanceHex(await computeDhash(png), await computeDhash(png))).toBe(0);
  });

  it('when the image is re-encoded as a smaller JPEG, then the distance stays small', async () => {
    const png = await wavesRaw(640, 480).png().toBuffer();
    const jpeg = await sharp(png).resize(200).jpeg({ quality: 60 }).toBuffer();
    expect(hammingDistanceHex(await computeDhash(png), await computeDhash(jpeg))).toBeLessThanOrEqual(6);
  });

  it('when the image is slightly brightened, then the distance is small', async () => {
    const png = await wavesRaw(320, 240).png().toBuffer();
    const brighter = await sharp(png).modulate({ brightness: 1.1 }).png().toBuffer();
    const d = hammingDistanceHex(await computeDhash(png), await computeDhash(brighter));
    expect(d).toBeLessThanOrEqual(6);
  });

  it('when two different images are hashed, then the distance is large', async () => {
    const a = await wavesRaw(320, 240).png().toBuffer();
    const b = await stripesRaw(320, 240).png().toBuffer();
    expect(hammingDistanceHex(await computeDhash(a), await computeDhash(b))).toBeGreaterThan(16);
  });

  it('when the image is mirrored, then the distance is large (dHash is direction-sensitive)', async () => {
    const a = await blobsRaw(320, 240).png().toBuffer();
    const mirrored = await sharp(a).flop().png().toBuffer();
    expect(hammingDistanceHex(await computeDhash(a), await computeDhash(mirrored))).toBeGreaterThan(16);
  });

  it('when raw pixels are passed with their layout, then the hash matches the encoded image', async () => {
    const { data, info } = await wavesRaw(320, 240).raw().toBuffer({ resolveWithObject: true });
    const png = await sharp(data, { raw: { width: info.width, height: info.height, channels: 3 } }).png().toBuffer();
    const fromRaw = await computeDhash(data, { raw: { width: info.width, height: info.height, channels: 3 } });
    expect(fromRaw).toBe(await computeDhash(png));
  });

  it('when a hash is malformed, then the distance function throws a clear error', () => {
    expect(() => hammingDistanceHex('xyz', '0000000000000000')).toThrow(/16 hex characters/);
  });
});
