import { PDFDocument, StandardFonts } from 'pdf-lib';
import { compareWithReading } from '@shared/lab-report/compare-reading';
import { analysisColumns } from '../lots/analysis-record';
import { labReportPdf } from '../../../tests/support/lab-report-pdf';
import { makeJpeg } from '../../../tests/support/upload-fixtures';
import { readingSummary, readLabReportPdf } from './report-reading';

// Real PDFs through pdfjs-dist: an invented two-column lab report, layouts drawn with pdf-lib, a scan with no text.
describe('readLabReportPdf', () => {
  // An alfalfa analysis in the range of the domain brief's worked legume (§3): DM 88, CP 20, ADF 30, NDF 40.
  // Nitrate, mould and toxins below the caution levels the lot page reads them against (OMAFRA, FDA).
  const { columns } = analysisColumns({ forageClass: 'legume', basis: 'dm', dryMatterPct: 88, crudeProteinPct: 20, adfPct: 30, ndfPct: 40, ndfd48Pct: 45, fatPct: 2.5, ashPct: 10, wscPct: 9, starchPct: 2, calciumPct: 1.4, phosphorusPct: 0.28, nitrateNo3PctDm: 0.35, mouldCfuPerG: 12_000, aflatoxinPpb: 4, donPpm: 0.5, fumonisinPpm: 0.2 });
  const demo = () => labReportPdf(columns);

  it('recognises every value of a two-column lab report, nitrate, mould count and mycotoxins included', async () => {
    const reading = await readLabReportPdf(await demo());
    expect(reading.status).toBe('read');
    const rows = compareWithReading(columns, reading);
    const by = Object.fromEntries(rows.map((r) => [r.field, r]));
    for (const field of ['dryMatterPct', 'crudeProteinPct', 'adfPct', 'ndfPct', 'ndfd48Pct', 'fatPct', 'ashPct', 'wscPct', 'starchPct', 'calciumPct', 'phosphorusPct', 'nitrateNo3PctDm', 'mouldCfuPerG', 'aflatoxinPpb', 'donPpm', 'fumonisinPpm'] as const) {
      expect([field, by[field]?.status]).toEqual([field, 'match']);
    }
  }, 30_000);

  it('flags a value typed differently from the report', async () => {
    const reading = await readLabReportPdf(await demo());
    const rows = compareWithReading({ ...columns, adfPct: 27 }, reading);
    expect(rows.find((r) => r.field === 'adfPct')).toMatchObject({ status: 'mismatch', entered: 27, read: 30 });
    expect(rows.filter((r) => r.status === 'mismatch')).toHaveLength(1);
  }, 30_000);

  it('reads a one-value-a-line report drawn with pdf-lib, basis stated in a heading', async () => {
    const pdf = await drawPdf((line) => {
      line('Invented Valley Forage Testing - results, dry matter basis', 60);
      ['Dry matter  89.1 % as fed', 'Crude protein (CP)  18.2 %', 'ADF  32.4 %', 'NDF  41.7 %', 'Ash  9.5 %', 'Potassium (K)  2.40 %'].forEach((t) => line(t, 60));
    });
    const reading = await readLabReportPdf(pdf);
    expect(reading).toMatchObject({ status: 'read', basisStated: true, values: { dryMatterPct: { asFed: 89.1 }, crudeProteinPct: { dm: 18.2 }, adfPct: { dm: 32.4 }, ndfPct: { dm: 41.7 }, ashPct: { dm: 9.5 }, potassiumPct: { dm: 2.4 } } });
  }, 30_000);

  it('reads a table whose numbers are separate runs placed under As fed and Dry matter headings', async () => {
    const pdf = await drawPdf((_line, at) => {
      at('Nutrient', 60, 700); at('As fed', 260, 700); at('Dry matter', 360, 700);
      at('Dry matter, %', 60, 680); at('90.0', 262, 680);
      at('Crude protein, %', 60, 660); at('16.2', 262, 660); at('18.0', 370, 660);
      at('Starch, %', 60, 640); at('2.1', 372, 640);
    });
    const reading = await readLabReportPdf(pdf);
    expect(reading).toMatchObject({ status: 'read', values: { dryMatterPct: { asFed: 90 }, crudeProteinPct: { asFed: 16.2, dm: 18 }, starchPct: { asFed: null, dm: 2.1 } } });
  }, 30_000);

  it('says plainly that a scanned report (an image, no text) cannot be read', async () => {
    const doc = await PDFDocument.create();
    const page = doc.addPage([612, 792]);
    const image = await doc.embedJpg(await makeJpeg(600, 800));
    page.drawImage(image, { x: 0, y: 0, width: 612, height: 792 });
    const reading = await readLabReportPdf(Buffer.from(await doc.save()));
    expect(reading).toEqual({ status: 'no_text' });
    expect(readingSummary(reading)).toMatch(/no text layer.*scan/);
  }, 30_000);

  it('reports a broken file as unreadable instead of failing', async () => {
    const reading = await readLabReportPdf(Buffer.from('%PDF-1.4\nnot really a pdf\n%%EOF'));
    expect(reading.status).toBe('unreadable');
  }, 30_000);
});

type Draw = (line: (text: string, x: number) => void, at: (text: string, x: number, y: number) => void) => void;
async function drawPdf(draw: Draw): Promise<Buffer> {
  const doc = await PDFDocument.create();
  const font = await doc.embedFont(StandardFonts.Helvetica);
  const page = doc.addPage([612, 792]);
  let y = 740;
  draw(
    (text, x) => {
      page.drawText(text, { x, y, size: 11, font });
      y -= 16;
    },
    (text, x, yy) => page.drawText(text, { x, y: yy, size: 11, font }),
  );
  return Buffer.from(await doc.save());
}
