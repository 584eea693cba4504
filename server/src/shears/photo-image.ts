import sharp from 'sharp';
import { DomainError } from '../common/errors/domain-error';
import type { PhotoContentType } from './entities/shear-photo.entity';

export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
/** Guards against decompression bombs: a small file that unpacks into billions of pixels. */
export const PHOTO_MAX_PIXELS = 40_000_000;
export const THUMBNAIL_SIZE = 320;

/** The formats sharp detects that Keenroute keeps, by sharp's name for them. */
const FORMATS: Readonly<Record<string, PhotoContentType>> = {
  jpeg: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
};

/** A stored file's extension comes from the detected format, never from the upload's name. */
export const PHOTO_EXTENSIONS: Readonly<Record<PhotoContentType, string>> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
};

export const NOT_AN_IMAGE = 'The file is not a JPEG, PNG or WebP image.';
export const TOO_MANY_PIXELS = `The image is too large: at most ${PHOTO_MAX_PIXELS / 1_000_000} megapixels.`;

export interface InspectedPhoto {
  contentType: PhotoContentType;
  /** As shown, after the EXIF orientation is applied. */
  width: number;
  height: number;
}

const refuse = (message: string) => new DomainError('invalid_input', message, { photo: [message] });

/** Reads what the bytes are; the upload's file name and declared type are never trusted. */
export async function inspectPhoto(buffer: Buffer): Promise<InspectedPhoto> {
  let metadata: sharp.Metadata;
  try {
    metadata = await sharp(buffer, { limitInputPixels: PHOTO_MAX_PIXELS }).metadata();
  } catch (error) {
    throw refuse(error instanceof Error && /pixel limit/i.test(error.message) ? TOO_MANY_PIXELS : NOT_AN_IMAGE);
  }
  const contentType = FORMATS[metadata.format];
  if (!contentType) throw refuse(NOT_AN_IMAGE);
  return { contentType, width: metadata.autoOrient.width, height: metadata.autoOrient.height };
}

/** A small WebP for lists: turned upright by its EXIF orientation, with every metadata tag (GPS too) left out. */
export async function makeThumbnail(buffer: Buffer): Promise<Buffer> {
  try {
    return await sharp(buffer, { limitInputPixels: PHOTO_MAX_PIXELS })
      .rotate()
      .resize(THUMBNAIL_SIZE, THUMBNAIL_SIZE, { fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 80 })
      .toBuffer();
  } catch {
    // The header read fine but the pixels do not decode: a truncated or corrupt file.
    throw refuse(NOT_AN_IMAGE);
  }
}

/**
 * The original as stored: turned upright and re-encoded at high quality without its metadata, so a phone photo's GPS
 * position and camera details never leave with the picture.
 */
export async function cleanOriginal(buffer: Buffer, contentType: PhotoContentType): Promise<Buffer> {
  const image = sharp(buffer, { limitInputPixels: PHOTO_MAX_PIXELS }).rotate();
  try {
    if (contentType === 'image/jpeg') return await image.jpeg({ quality: 92 }).toBuffer();
    if (contentType === 'image/png') return await image.png().toBuffer();
    return await image.webp({ quality: 92 }).toBuffer();
  } catch {
    throw refuse(NOT_AN_IMAGE);
  }
}
