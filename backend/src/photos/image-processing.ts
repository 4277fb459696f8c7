import { sniffType } from '../imports/sniff';
import sharp from 'sharp';

/** Upload limits (our choices): 8 MB, and at most 40 megapixels so a small file cannot decode to gigabytes. */
export const PHOTO_LIMITS = Object.freeze({ maxBytes: 8 * 1024 * 1024, maxPixels: 40_000_000, maxEdge: 2560 });

const ACCEPTED = new Set([
  'image/jpeg',
  'image/png',
  'image/webp',
  'image/gif',
  'image/tiff',
  'image/avif',
  'image/heic',
]);

export class PhotoRejected extends Error {}

export interface ProcessedPhoto {
  bytes: Buffer;
  contentType: 'image/jpeg';
  width: number;
  height: number;
}

/**
 * Decide the type by the bytes (never the name or header), then re-encode: rotate by the EXIF
 * orientation, shrink to at most 2560 px, and write a fresh JPEG. sharp drops all metadata (EXIF with
 * GPS, XMP, IPTC) unless asked to keep it, which we never do.
 */
export async function processPhoto(input: Buffer): Promise<ProcessedPhoto> {
  if (input.length > PHOTO_LIMITS.maxBytes) throw new PhotoRejected('The image is larger than 8 MB.');
  const type = await sniffType(input);
  if (!type || !ACCEPTED.has(type.mime)) {
    throw new PhotoRejected(
      type
        ? `The file's content is ${type.mime}, not an image we accept (JPEG, PNG, WebP, GIF, TIFF, AVIF, HEIC).`
        : 'The file is not an image.',
    );
  }
  try {
    const { data, info } = await sharp(input, { limitInputPixels: PHOTO_LIMITS.maxPixels, failOn: 'error' })
      .rotate()
      .resize({ width: PHOTO_LIMITS.maxEdge, height: PHOTO_LIMITS.maxEdge, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 85, mozjpeg: true })
      .toBuffer({ resolveWithObject: true });
    return { bytes: data, contentType: 'image/jpeg', width: info.width, height: info.height };
  } catch {
    throw new PhotoRejected('The image could not be read (damaged, or too many pixels).');
  }
}
