import sharp from 'sharp';

/** Widths of the responsive WebP variants made for every photo. */
export const VARIANT_WIDTHS = [320, 800, 1600] as const;
/** Largest accepted image, in pixels (guards against decompression bombs): 50 megapixels. */
export const MAX_INPUT_PIXELS = 50_000_000;

export interface RenderedVariant {
  width: number;
  height: number;
  format: 'webp';
  data: Buffer;
}

/**
 * Makes the WebP variants of a photo: rotated upright from its EXIF orientation, metadata (GPS
 * included) stripped (sharp drops it unless asked to keep it), never enlarged past the original.
 */
export async function renderPhotoVariants(input: Buffer): Promise<{ width: number; height: number; variants: RenderedVariant[] }> {
  const base = sharp(input, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' }).rotate();
  // Upright size from the header (EXIF orientation applied): no need to decode the full image for it,
  // which took most of the time of a large photo.
  const meta = await sharp(input, { limitInputPixels: MAX_INPUT_PIXELS }).metadata();
  const info = meta.autoOrient ?? { width: meta.width, height: meta.height };
  const variants: RenderedVariant[] = [];
  for (const width of VARIANT_WIDTHS) {
    if (variants.length > 0 && width > info.width) break;
    const out = await base
      .clone()
      .resize({ width: Math.min(width, info.width), withoutEnlargement: true })
      .webp({ quality: 78 })
      .toBuffer({ resolveWithObject: true });
    variants.push({ width: out.info.width, height: out.info.height, format: 'webp', data: out.data });
  }
  return { width: info.width, height: info.height, variants };
}
