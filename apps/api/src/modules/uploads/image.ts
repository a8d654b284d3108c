import { fileTypeFromBuffer } from 'file-type';
import sharp, { type Metadata } from 'sharp';
import { AppError } from '../../errors/app-error';

/** Types accepted by content (magic bytes), never by file name or the client's Content-Type. */
export const ACCEPTED_IMAGE_MIME = ['image/jpeg', 'image/png', 'image/webp'] as const;
/** Largest upload, in bytes. */
export const MAX_IMAGE_BYTES = 8 * 1024 * 1024;
/** Largest decoded image accepted: 40 megapixels stops decompression bombs before decoding. */
export const MAX_INPUT_PIXELS = 40_000_000;
const MAX_SIDE_PX = 12_000;
const FULL_MAX_PX = 2000;
const THUMB_MAX_PX = 480;

export interface ProcessedImage {
  /** Re-encoded image (WebP), metadata (EXIF, GPS, ICC comments) stripped. */
  full: Buffer;
  /** Thumbnail (WebP), at most 480 px on its longer side. */
  thumb: Buffer;
  width: number;
  height: number;
  mime: 'image/webp';
}

const reject = (field: string, message: string, code: 'UNSUPPORTED_MEDIA' | 'VALIDATION_FAILED') =>
  new AppError(code, message, { [field]: message });

/**
 * Verifies an uploaded image by content (JPEG, PNG or WebP only), refuses oversized or huge-dimension input, and
 * re-encodes it with sharp (orientation applied, all metadata dropped) plus a thumbnail.
 * Throws AppError UNSUPPORTED_MEDIA / VALIDATION_FAILED / PAYLOAD_TOO_LARGE naming `field`.
 */
export async function processImage(
  buffer: Buffer,
  opts: { field?: string } = {},
): Promise<ProcessedImage> {
  const field = opts.field ?? 'image';
  if (buffer.length === 0) throw reject(field, 'The file is empty', 'VALIDATION_FAILED');
  if (buffer.length > MAX_IMAGE_BYTES)
    throw new AppError('PAYLOAD_TOO_LARGE', 'Images can be at most 8 MB', {
      [field]: 'Images can be at most 8 MB',
    });
  const type = await fileTypeFromBuffer(buffer);
  if (!type || !(ACCEPTED_IMAGE_MIME as readonly string[]).includes(type.mime))
    throw reject(field, 'Only JPEG, PNG or WebP images are accepted', 'UNSUPPORTED_MEDIA');

  const input = () => sharp(buffer, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' });
  let meta: Metadata;
  try {
    // Reading the header decodes no pixels, so the dimensions can be checked before any decoding starts.
    meta = await sharp(buffer, { limitInputPixels: false }).metadata();
  } catch {
    throw reject(field, 'The image could not be read', 'VALIDATION_FAILED');
  }
  const w = meta.width;
  const h = meta.height;
  if (!w || !h || w > MAX_SIDE_PX || h > MAX_SIDE_PX || w * h > MAX_INPUT_PIXELS)
    throw reject(
      field,
      'The image dimensions are too large (40 megapixels at most)',
      'VALIDATION_FAILED',
    );

  try {
    const full = await input()
      .autoOrient()
      .resize({ width: FULL_MAX_PX, height: FULL_MAX_PX, fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 82 })
      .toBuffer({ resolveWithObject: true });
    const thumb = await sharp(full.data)
      .resize({
        width: THUMB_MAX_PX,
        height: THUMB_MAX_PX,
        fit: 'inside',
        withoutEnlargement: true,
      })
      .webp({ quality: 75 })
      .toBuffer();
    return {
      full: full.data,
      thumb,
      width: full.info.width,
      height: full.info.height,
      mime: 'image/webp',
    };
  } catch {
    throw reject(field, 'The image could not be processed', 'VALIDATION_FAILED');
  }
}
