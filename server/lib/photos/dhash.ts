/**
 * Difference hash (dHash): shrink to 9x8 greyscale and record, for each of the 8 rows, whether each pixel is
 * brighter than its right-hand neighbour: 64 bits, robust to resizing, re-encoding and small brightness changes.
 * Common practice, no published standard.
 */
import sharp, { type SharpOptions } from 'sharp';
import { hammingDistance64 } from '../../domain/listing-flags';

const HASH_WIDTH = 9;
const HASH_HEIGHT = 8;

/**
 * The 64-bit difference hash of an image, as 16 lower-case hex characters (bit 63 = row 0, column 0).
 * `options` are passed to sharp, e.g. `{raw: {width, height, channels}}` for already-decoded pixels.
 */
export async function computeDhash(input: Buffer, options: SharpOptions = {}): Promise<string> {
  const sharpOptions: SharpOptions = options.raw ? options : { autoOrient: true, ...options };
  const { data, info } = await sharp(input, sharpOptions)
    // Transparent areas count as white, so a cut-out part photo hashes like the same part on a white sheet.
    .flatten({ background: '#ffffff' })
    .greyscale()
    .resize(HASH_WIDTH, HASH_HEIGHT, { fit: 'fill' })
    .raw()
    .toBuffer({ resolveWithObject: true });
  const step = info.channels;
  const px = (x: number, y: number) => data[(y * HASH_WIDTH + x) * step];
  let hash = 0n;
  for (let y = 0; y < HASH_HEIGHT; y++) {
    for (let x = 0; x < HASH_WIDTH - 1; x++) {
      hash = (hash << 1n) | (px(x, y) > px(x + 1, y) ? 1n : 0n);
    }
  }
  return hash.toString(16).padStart(16, '0');
}

/** Differing bits between two 16-hex-character hashes (0 = same picture, 64 = opposite). */
export function hammingDistanceHex(a: string, b: string): number {
  return hammingDistance64(a, b);
}
