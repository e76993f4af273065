import crypto from 'node:crypto';
import sharp, { type Metadata } from 'sharp';
import { MENU_PHOTO_WIDTHS } from '@fryline/schemas';
import { AppError } from '../../lib/app-error.js';
import type { PhotoFileInput } from '../../db/queries/menu-photos.js';

type PhotoType = 'jpeg' | 'png' | 'webp';

/**
 * What the file's first bytes say it is: JPEG (FF D8 FF), PNG (the 8-byte
 * signature of RFC 2083 §3.1) or WebP (a RIFF container whose form type is
 * "WEBP"). The name and the browser's content type are never trusted.
 */
export function sniffImageType(bytes: Buffer): PhotoType | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'jpeg';
  if (bytes.length >= 8 && bytes.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'png';
  if (bytes.length >= 12 && bytes.toString('latin1', 0, 4) === 'RIFF' && bytes.toString('latin1', 8, 12) === 'WEBP') return 'webp';
  return null;
}

const unsupported = () =>
  new AppError('unsupported_type', 'This file is not a JPEG, PNG or WebP photo. Choose a photo saved in one of those formats.', 415);

/** Refuse images so large that decoding them would take the server's memory (about 40 megapixels). */
const MAX_PIXELS = 40_000_000;

export interface ProcessedPhoto {
  width: number;
  height: number;
  files: PhotoFileInput[];
}

/**
 * Turns an upload into the files we keep: turned upright as the camera
 * recorded, every piece of metadata (EXIF, GPS location, ICC, XMP) left
 * behind, and written as WebP at each width up to the photo's own (a
 * menu photo's widths unless others are given, as for the shop's logo).
 */
export async function processPhoto(bytes: Buffer, storedWidths: readonly number[] = MENU_PHOTO_WIDTHS): Promise<ProcessedPhoto> {
  const sniffed = sniffImageType(bytes);
  if (!sniffed) throw unsupported();
  let meta: Metadata;
  try {
    meta = await sharp(bytes, { limitInputPixels: MAX_PIXELS }).metadata();
  } catch {
    throw unsupported();
  }
  if (meta.format !== sniffed || !meta.width || !meta.height) throw unsupported();
  // EXIF orientations 5–8 turn the picture a quarter turn
  const turned = (meta.orientation ?? 1) >= 5;
  const width = turned ? meta.height : meta.width;
  const widths = [...new Set(storedWidths.map((w) => Math.min(w, width)))];
  const files: PhotoFileInput[] = [];
  try {
    for (const target of widths) {
      // sharp writes no metadata unless asked (withMetadata/keepExif), so EXIF and GPS stay behind
      const { data, info } = await sharp(bytes, { limitInputPixels: MAX_PIXELS })
        .rotate()
        .resize({ width: target, withoutEnlargement: true })
        .webp({ quality: 80 })
        .toBuffer({ resolveWithObject: true });
      files.push({
        width: info.width,
        height: info.height,
        hash: crypto.createHash('sha256').update(data).digest('hex').slice(0, 32),
        contentType: 'image/webp',
        bytes: data,
      });
    }
  } catch {
    throw new AppError('unreadable_image', 'This photo could not be read; it may be damaged. Try saving it again.', 415);
  }
  const largest = files[files.length - 1]!;
  return { width: largest.width, height: largest.height, files };
}
