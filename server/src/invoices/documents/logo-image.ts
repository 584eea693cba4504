import sharp from 'sharp';
import { DomainError } from '../../common/errors/domain-error';

export const LOGO_MAX_BYTES = 2 * 1024 * 1024;
/** Wide enough for a sharp print at the size the invoice header shows it. */
export const LOGO_MAX_WIDTH = 600;
/** Guards against decompression bombs: a small file that unpacks into a huge picture. */
const LOGO_MAX_PIXELS = 25_000_000;
const ACCEPTED = new Set(['png', 'jpeg', 'webp']);

export const NOT_A_LOGO = 'The logo must be a PNG, JPEG or WebP image.';

const refuse = (message: string) => new DomainError('invalid_input', message, { logo: [message] });

/**
 * The logo as stored: what the bytes are is read by sharp (the upload's name and declared type are never trusted),
 * turned upright, at most LOGO_MAX_WIDTH wide, re-encoded as PNG without its metadata.
 */
export async function normaliseLogo(upload: Buffer): Promise<Buffer> {
  let format: string | undefined;
  try {
    format = (await sharp(upload, { limitInputPixels: LOGO_MAX_PIXELS }).metadata()).format;
  } catch {
    throw refuse(NOT_A_LOGO);
  }
  if (!format || !ACCEPTED.has(format)) throw refuse(NOT_A_LOGO);
  try {
    return await sharp(upload, { limitInputPixels: LOGO_MAX_PIXELS })
      .rotate()
      .resize({ width: LOGO_MAX_WIDTH, withoutEnlargement: true })
      .png()
      .toBuffer();
  } catch {
    // The header read fine but the pixels do not decode: a truncated or corrupt file.
    throw refuse(NOT_A_LOGO);
  }
}
