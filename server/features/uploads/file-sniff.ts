import sharp, { type Metadata } from 'sharp';
import { HttpError } from '../../middleware/http-error';
import { MAX_INPUT_PIXELS } from '../photos/photo-variants';

/** Image formats accepted as photos, as sharp names them, with the MIME type stored for the original. */
const PHOTO_FORMATS: Record<string, string> = {
  jpeg: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
  heif: 'image/heic',
  avif: 'image/avif',
  tiff: 'image/tiff',
};

export interface SniffedPhoto {
  mimeType: string;
  extension: string;
  width: number;
  height: number;
}

/**
 * Decides from the bytes (sharp reads the header) whether an upload is a photo we accept; the file
 * name and the browser's stated type are ignored. Checks the pixel count before anything is decoded.
 */
export async function sniffPhoto(data: Buffer, name: string): Promise<SniffedPhoto> {
  let meta: Metadata;
  try {
    meta = await sharp(data, { limitInputPixels: false }).metadata();
  } catch {
    throw new HttpError(400, 'not_an_image', `“${name}” is not a photo we can read. Upload a JPEG, PNG, WebP or HEIC image.`, [{ path: 'photos', message: 'Not an image.' }]);
  }
  const mimeType = meta.format ? PHOTO_FORMATS[meta.format] : undefined;
  if (!mimeType || !meta.width || !meta.height) {
    throw new HttpError(400, 'unsupported_image', `“${name}” is a ${meta.format ?? 'kind of'} file we do not accept as a photo. Upload a JPEG, PNG, WebP or HEIC image.`);
  }
  if (meta.width * meta.height > MAX_INPUT_PIXELS) {
    const mp = ((meta.width * meta.height) / 1e6).toFixed(0);
    throw new HttpError(
      400,
      'image_too_many_pixels',
      `“${name}” is ${meta.width}×${meta.height} pixels (${mp} megapixels); the limit is ${MAX_INPUT_PIXELS / 1e6} megapixels. Resize it and try again.`,
    );
  }
  return { mimeType, extension: meta.format === 'jpeg' ? 'jpg' : meta.format!, width: meta.width, height: meta.height };
}

/**
 * A PDF starts with `%PDF-` (within the first 1,024 bytes, as readers allow) and ends with `%%EOF`
 * (possibly followed by whitespace or a short trailer of junk, as many generators leave).
 */
export function sniffPdf(data: Buffer, name: string): void {
  const head = data.subarray(0, 1024).toString('latin1');
  const tail = data.subarray(Math.max(0, data.length - 1024)).toString('latin1');
  if (!head.includes('%PDF-') || !tail.includes('%%EOF')) {
    throw new HttpError(400, 'not_a_pdf', `“${name}” is not a PDF file. Upload the lab report as the PDF the lab sent.`, [{ path: 'report', message: 'Not a PDF.' }]);
  }
}
