/**
 * Listing photo upload pipeline: judge the type by its bytes, refuse oversized or broken images before
 * decoding them, apply the EXIF orientation, strip every piece of metadata (camera GPS included), and write
 * three WebP sizes plus a placeholder colour and a difference hash for the reuse check.
 *
 * Decisions:
 * - Only JPEG, PNG and WebP are accepted. HEIC is refused: the sharp build we ship decodes AVIF but not HEVC,
 *   and phones can export JPEG. SVG is never accepted (it is a document that can carry scripts, not a photo);
 *   file-type does not recognise text formats, so an SVG lands in 'unsupported_media' with other text.
 * - The file name and the declared MIME type are ignored: only the bytes count.
 * - Decoding uses failOn 'error' (not sharp's default 'warning'): truncated and broken data abort, while the
 *   harmless warnings many camera JPEGs raise (e.g. extra bytes before a marker) do not reject real photos.
 * - Animated images keep their first frame only.
 */
import { fileTypeFromBuffer } from 'file-type';
import sharp, { type Channels, type Metadata, type OutputInfo } from 'sharp';
import { computeDhash } from './dhash';

export const MAX_FILES = 12;
export const MAX_FILE_BYTES = 15 * 1024 * 1024;
/** 40 megapixels: above any phone or ordinary camera, well below what would exhaust memory when decoded. */
export const MAX_INPUT_PIXELS = 40_000_000;
/** Seconds one decode/encode step may take before it is abandoned. */
export const PROCESS_TIMEOUT_SECONDS = 30;

export const photoSizeNames = ['thumb', 'medium', 'large'] as const;
export type PhotoSizeName = (typeof photoSizeNames)[number];

/** Longest side in pixels for each stored size; smaller images are never upscaled. */
export const PHOTO_SIZES: Readonly<Record<PhotoSizeName, number>> = { thumb: 160, medium: 640, large: 1600 };

const acceptedTypes = {
  'image/jpeg': 'jpeg',
  'image/png': 'png',
  'image/webp': 'webp',
} as const;
export type PhotoSourceFormat = (typeof acceptedTypes)[keyof typeof acceptedTypes];
export const ACCEPTED_MIME_TYPES = Object.keys(acceptedTypes) as Array<keyof typeof acceptedTypes>;

export interface ProcessedSize {
  buffer: Buffer;
  width: number;
  height: number;
}

export interface ProcessedPhoto {
  sizes: Record<PhotoSizeName, ProcessedSize>;
  /** Most dominant colour, '#rrggbb', shown while the image loads. */
  placeholderColor: string;
  /** 64-bit difference hash as 16 hex characters. */
  dhash: string;
  originalFormat: PhotoSourceFormat;
  /** Upright dimensions of the upload, after EXIF orientation. */
  originalWidth: number;
  originalHeight: number;
}

export type PhotoErrorCode = 'payload_too_large' | 'unsupported_media' | 'image_too_large' | 'image_corrupt';

export type ProcessUploadResult = { ok: true; photo: ProcessedPhoto } | { ok: false; code: PhotoErrorCode; message: string };

export interface ProcessUploadOptions {
  maxFileBytes?: number;
  maxInputPixels?: number;
  sizes?: Readonly<Record<PhotoSizeName, number>>;
  /** WebP quality 1-100. */
  quality?: number;
}

function refuse(code: PhotoErrorCode, message: string): ProcessUploadResult {
  return { ok: false, code, message };
}

function toHexColour({ r, g, b }: { r: number; g: number; b: number }): string {
  return `#${[r, g, b].map((c) => Math.max(0, Math.min(255, Math.round(c))).toString(16).padStart(2, '0')).join('')}`;
}

export async function processUpload(buffer: Buffer, opts: ProcessUploadOptions = {}): Promise<ProcessUploadResult> {
  if (!Buffer.isBuffer(buffer)) throw new TypeError('processUpload needs a Buffer');
  const maxFileBytes = opts.maxFileBytes ?? MAX_FILE_BYTES;
  const maxInputPixels = opts.maxInputPixels ?? MAX_INPUT_PIXELS;
  const sizes = opts.sizes ?? PHOTO_SIZES;
  const quality = opts.quality ?? 82;

  if (buffer.length === 0) return refuse('unsupported_media', 'The file is empty.');
  if (buffer.length > maxFileBytes) {
    return refuse('payload_too_large', `Photos may be at most ${Math.floor(maxFileBytes / (1024 * 1024))} MB.`);
  }

  const detected = await fileTypeFromBuffer(buffer);
  const format = detected ? acceptedTypes[detected.mime as keyof typeof acceptedTypes] : undefined;
  if (!format) {
    return refuse('unsupported_media', 'Photos must be JPEG, PNG or WebP images.');
  }

  // Header only: lets us refuse a decompression bomb by its declared size before any pixel is decoded.
  let meta: Metadata;
  try {
    meta = await sharp(buffer, { limitInputPixels: false }).metadata();
  } catch {
    return refuse('image_corrupt', 'The image could not be read; it may be damaged or incomplete.');
  }
  if (meta.format !== format) {
    // The magic bytes and the decoder disagree: a crafted or mislabelled file.
    return refuse('unsupported_media', 'Photos must be JPEG, PNG or WebP images.');
  }
  const width = meta.width ?? 0;
  const height = meta.pageHeight ?? meta.height ?? 0;
  if (width <= 0 || height <= 0) return refuse('image_corrupt', 'The image has no readable dimensions.');
  if (width * height > maxInputPixels) {
    return refuse(
      'image_too_large',
      `The image is ${width} x ${height} pixels; photos may have at most ${Math.round(maxInputPixels / 1_000_000)} megapixels.`,
    );
  }

  // One full decode: orient, convert to 8-bit sRGB, shrink to the largest size; every output comes from this.
  const largest = Math.max(...photoSizeNames.map((n) => sizes[n]));
  let base: { data: Buffer; info: OutputInfo };
  try {
    base = await sharp(buffer, { limitInputPixels: maxInputPixels, failOn: 'error', autoOrient: true })
      .timeout({ seconds: PROCESS_TIMEOUT_SECONDS })
      .resize({ width: largest, height: largest, fit: 'inside', withoutEnlargement: true })
      .toColourspace('srgb')
      .raw()
      .toBuffer({ resolveWithObject: true });
  } catch (err) {
    if (err instanceof Error && /pixel limit/i.test(err.message)) {
      return refuse('image_too_large', `Photos may have at most ${Math.round(maxInputPixels / 1_000_000)} megapixels.`);
    }
    return refuse('image_corrupt', 'The image could not be decoded; it may be damaged or incomplete.');
  }

  const raw = { width: base.info.width, height: base.info.height, channels: base.info.channels as Channels };
  const fromBase = () => sharp(base.data, { raw }).timeout({ seconds: PROCESS_TIMEOUT_SECONDS });

  const [outputs, stats, dhash] = await Promise.all([
    Promise.all(
      photoSizeNames.map(async (name) => {
        // No withMetadata()/keepExif(): sharp writes no EXIF, XMP or ICC unless asked, and raw input has none.
        const { data, info } = await fromBase()
          .resize({ width: sizes[name], height: sizes[name], fit: 'inside', withoutEnlargement: true })
          .webp({ quality })
          .toBuffer({ resolveWithObject: true });
        return [name, { buffer: data, width: info.width, height: info.height }] as const;
      }),
    ),
    fromBase().stats(),
    computeDhash(base.data, { raw }),
  ]);

  const upright = meta.autoOrient ?? { width, height };
  return {
    ok: true,
    photo: {
      sizes: Object.fromEntries(outputs) as Record<PhotoSizeName, ProcessedSize>,
      placeholderColor: toHexColour(stats.dominant),
      dhash,
      originalFormat: format,
      originalWidth: upright.width,
      originalHeight: upright.height,
    },
  };
}
