import { PDFDocument } from 'pdf-lib';
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
 * A PDF is accepted only if it parses as one: the `%PDF-` header and `%%EOF` marker are checked first
 * (cheap), then pdf-lib reads the cross-reference table, trailer and catalog and must find at least one
 * page. A file that merely wraps HTML or script between those two markers (a polyglot) has no document
 * structure and is refused. Encrypted PDFs are accepted here (their text is read later, or reported unreadable).
 */
export async function sniffPdf(data: Buffer, name: string): Promise<void> {
  const refuse = (message: string) =>
    new HttpError(400, 'not_a_pdf', `“${name}” ${message} Upload the lab report as the PDF the lab sent.`, [{ path: 'report', message: 'Not a PDF.' }]);
  const head = data.subarray(0, 1024).toString('latin1');
  const tail = data.subarray(Math.max(0, data.length - 1024)).toString('latin1');
  if (!head.includes('%PDF-') || !tail.includes('%%EOF')) throw refuse('is not a PDF file.');
  let pages = 0;
  try {
    const doc = await PDFDocument.load(data, { ignoreEncryption: true, updateMetadata: false, throwOnInvalidObject: true });
    pages = doc.getPageCount();
  } catch {
    throw refuse('is not a PDF we can open: its document structure is missing or damaged.');
  }
  if (pages < 1) throw refuse('has no pages.');
}
