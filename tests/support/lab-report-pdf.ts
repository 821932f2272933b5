import { labReportTableLines, type PrintedAnalysis } from '../../server/adapters/pdf/lab-report-table';
import { simplePdf } from './simple-pdf';

/** A test's lab report: an invented lab (no real one) printing `c` in the usual two-column table. */
export function labReportPdf(c: PrintedAnalysis): Promise<Buffer> {
  return simplePdf(['Invented Test Forage Lab - FORAGE ANALYSIS REPORT', 'Report T-1    Sample: hay, composite of cores', '', ...labReportTableLines(c)]);
}
