import sharp from 'sharp';
import { simplePdf } from './simple-pdf';

/*
 * Upload fixtures made in memory (no binary files in the repository): used by the API tests and the
 * Playwright journeys.
 */

/** A JPEG drawn in memory (a few coloured bands), so no binary fixtures are needed. */
export async function makeJpeg(width = 1200, height = 800, seed = 0): Promise<Buffer> {
  const band = Math.max(1, Math.floor(height / 4));
  const composites = [0, 1, 2, 3].map((i) => ({
    input: { create: { width, height: band, channels: 3 as const, background: { r: (90 + 40 * i + seed * 13) % 256, g: 140 - 10 * i, b: 60 + 5 * i } } },
    top: i * band,
    left: 0,
  }));
  return sharp({ create: { width, height, channels: 3, background: { r: 200, g: 170, b: 90 } } })
    .composite(composites)
    .jpeg({ quality: 80 })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/** A small valid one-page PDF with one line of text. */
export function makePdf(text = 'Lab report'): Promise<Buffer> {
  return simplePdf([text], { fontSize: 18 });
}

/** A JPEG of random pixels: it barely compresses, so it is large enough to watch an upload progress. */
export async function makeNoisyJpeg(width = 1600, height = 1200, seed = 1): Promise<Buffer> {
  const pixels = Buffer.alloc(width * height * 3);
  let x = Math.imul(seed, 2654435761) >>> 0;
  for (let i = 0; i < pixels.length; i++) {
    x = (Math.imul(x, 1103515245) + 12345) >>> 0;
    pixels[i] = x >>> 24;
  }
  return sharp(pixels, { raw: { width, height, channels: 3 } }).jpeg({ quality: 92 }).toBuffer();
}
