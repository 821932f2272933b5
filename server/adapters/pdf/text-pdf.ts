import { PDFDocument, StandardFonts } from 'pdf-lib';

/**
 * A one-page US Letter PDF with lines of Helvetica text, made with pdf-lib: the demo's invented lab reports
 * and the test fixtures. Characters outside printable ASCII become "-" (the standard font's encoding is
 * narrower than Unicode).
 */
export async function textPdf(lines: string[], options: { fontSize?: number } = {}): Promise<Buffer> {
  const size = options.fontSize ?? 11;
  const doc = await PDFDocument.create();
  const font = await doc.embedFont(StandardFonts.Helvetica);
  const page = doc.addPage([612, 792]);
  lines.forEach((line, i) => {
    const text = line.replace(/[^\x20-\x7e]/g, '-');
    if (text.trim() !== '') page.drawText(text, { x: 64, y: 740 - i * Math.round(size * 1.5), size, font });
  });
  return Buffer.from(await doc.save());
}
