import { textPdf } from '../../server/adapters/pdf/text-pdf';

/** A one-page PDF with lines of text (pdf-lib), for test uploads and report reading. */
export function simplePdf(lines: string[], options: { fontSize?: number } = {}): Promise<Buffer> {
  return textPdf(lines, options);
}
