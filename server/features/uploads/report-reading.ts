import type { ReportReading } from '@shared/contracts/report-reading';
import { readReportText } from '@shared/lab-report/read-report-text';
import { extractPdfText } from '../../adapters/pdf/pdf-text';

/** Reads the analysis values from a lab report PDF's text layer (never throws: an unreadable PDF says so). */
export async function readLabReportPdf(pdf: Buffer): Promise<ReportReading> {
  const text = await extractPdfText(pdf);
  if (!text.ok) {
    const message =
      text.reason === 'encrypted'
        ? 'The PDF is password-protected, so its text cannot be read.'
        : text.reason === 'timeout'
          ? 'Reading the PDF took too long.'
          : `The PDF's text could not be read (${text.message}).`;
    return { status: 'unreadable', message };
  }
  return readReportText(text.items);
}

/** What a reading means for the person who uploaded the report, in plain words. */
export function readingSummary(reading: ReportReading): string {
  switch (reading.status) {
    case 'read': {
      const n = Object.keys(reading.values).length;
      return `Read ${n} value${n === 1 ? '' : 's'} from the PDF. Check each one against the report before saving.${reading.basisStated ? '' : ' The report does not say which basis its numbers are on; dry matter was assumed.'}`;
    }
    case 'no_text':
      return 'This PDF has no text layer (it looks like a scan or a photo), so no values could be read from it. Type them from the report.';
    case 'no_values':
      return 'The PDF has text, but no analysis values were recognised in it. Type them from the report.';
    case 'unreadable':
      return `${reading.message} Type the values from the report.`;
  }
}
