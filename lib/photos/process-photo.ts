import 'server-only';
import sharp from 'sharp';

/**
 * Survey photos as stored: each upload is decoded (which is how a renamed non-image is caught —
 * by its content, never by its name or declared type), turned upright from the camera's
 * orientation tag, stripped of all metadata (EXIF, GPS location, maker notes, XMP) and written in
 * three sizes. Phones put the site's location in every photo; a report sold to strangers must not.
 */
export const PHOTO_VARIANTS = {
  // Evidence copy: full detail for a later dispute, capped at a size any screen or print needs.
  full: { longEdgePx: 4096, format: 'jpeg', quality: 90 },
  display: { longEdgePx: 1600, format: 'jpeg', quality: 82 },
  thumb: { longEdgePx: 320, format: 'webp', quality: 75 },
} as const;
export type PhotoVariant = keyof typeof PHOTO_VARIANTS;

// Formats a phone or camera produces and libvips decodes; anything else is refused.
const ACCEPTED_FORMATS = new Set(['jpeg', 'png', 'webp', 'heif', 'avif', 'tiff']);
// A 50-megapixel limit keeps a decompression bomb from exhausting the server.
const MAX_INPUT_PIXELS = 50_000_000;
// The same 16 MB the upload route allows; checked again here because the pipeline reads the file
// back from storage, where anything with the upload key could have put something larger.
export const MAX_PHOTO_BYTES = 16 * 1024 * 1024;

export class NotAPhotoError extends Error {
  constructor(message = 'This file is not a photo Waygrade can read. Take the photo again or choose a JPEG, PNG, WebP or HEIF image.') {
    super(message);
    this.name = 'NotAPhotoError';
  }
}

export interface ProcessedVariant {
  bytes: Buffer;
  contentType: string;
  extension: string;
  widthPx: number;
  heightPx: number;
}

export type ProcessedPhoto = Record<PhotoVariant, ProcessedVariant>;

type Decoded = { pixels: Buffer; width: number; height: number; channels: 1 | 2 | 3 | 4 };

/**
 * Decodes the photo once: turned upright from the camera's orientation tag (rotate() with no
 * angle) and brought down to the evidence copy's size. Every size is then made from these pixels,
 * so a 12-megapixel photo is decompressed once rather than once per size.
 */
async function decode(input: Uint8Array): Promise<Decoded> {
  const full = PHOTO_VARIANTS.full.longEdgePx;
  const { data, info } = await sharp(input, { failOn: 'error', limitInputPixels: MAX_INPUT_PIXELS })
    .rotate()
    .resize({ width: full, height: full, fit: 'inside', withoutEnlargement: true })
    .toColourspace('srgb')
    .raw({ depth: 'uchar' })
    .toBuffer({ resolveWithObject: true });
  return { pixels: data, width: info.width, height: info.height, channels: info.channels };
}

async function render(decoded: Decoded, variant: PhotoVariant): Promise<ProcessedVariant> {
  const spec = PHOTO_VARIANTS[variant];
  // Raw pixels carry no metadata at all, so nothing from the camera (EXIF, GPS, XMP) can survive.
  const pipeline = sharp(decoded.pixels, { raw: { width: decoded.width, height: decoded.height, channels: decoded.channels } }).resize({
    width: spec.longEdgePx,
    height: spec.longEdgePx,
    fit: 'inside',
    withoutEnlargement: true,
  });
  const encoded = spec.format === 'jpeg' ? pipeline.jpeg({ quality: spec.quality }) : pipeline.webp({ quality: spec.quality });
  const { data, info } = await encoded.toBuffer({ resolveWithObject: true });
  return {
    bytes: data,
    contentType: spec.format === 'jpeg' ? 'image/jpeg' : 'image/webp',
    extension: spec.format === 'jpeg' ? 'jpg' : 'webp',
    widthPx: info.width,
    heightPx: info.height,
  };
}

export class PhotoTooLargeError extends NotAPhotoError {
  constructor() {
    super(`This photo is larger than ${MAX_PHOTO_BYTES / 1024 / 1024} MB. Take it again at the phone's normal size.`);
    this.name = 'PhotoTooLargeError';
  }
}

export async function processPhoto(input: Uint8Array): Promise<ProcessedPhoto> {
  if (input.byteLength > MAX_PHOTO_BYTES) throw new PhotoTooLargeError();
  let format: string | undefined;
  try {
    format = (await sharp(input, { failOn: 'error', limitInputPixels: MAX_INPUT_PIXELS }).metadata()).format;
  } catch {
    throw new NotAPhotoError();
  }
  if (!format || !ACCEPTED_FORMATS.has(format)) throw new NotAPhotoError();
  try {
    const decoded = await decode(input);
    const [full, display, thumb] = await Promise.all([render(decoded, 'full'), render(decoded, 'display'), render(decoded, 'thumb')]);
    return { full, display, thumb };
  } catch {
    // The header looked like an image but the pixels do not decode: a damaged or disguised file.
    throw new NotAPhotoError();
  }
}
