import { randomUUID } from 'node:crypto';
import type { ReportReading } from '@shared/contracts/report-reading';
import type { ApiDeps } from '../../api-deps';
import { storedFiles } from '../../db/schema';
import type { LotRow } from '../selling/lot-access';
import { LotStepsService } from '../selling/lot-steps.service';
import { sniffPdf } from './file-sniff';
import { displayName, sha256 } from './photo-upload';
import { readLabReportPdf } from './report-reading';
import { writeThenRecord } from './write-then-record';

/** Stores a lab report PDF (checked by content) with the values read from its text, and links it to the lot's current analysis. */
export async function attachLabReport(deps: Pick<ApiDeps, 'db' | 'storage' | 'clock'>, lot: LotRow, ownerId: number, file: Express.Multer.File): Promise<{ id: number; originalName: string; sizeBytes: number; reading: ReportReading | null }> {
  const name = displayName(file);
  await sniffPdf(file.buffer, name);
  const key = `reports/${lot.id}/${randomUUID()}.pdf`;
  const steps = new LotStepsService(deps.db, deps.clock);
  // Read before storing, so the reading lands in the same transaction as the file's row.
  const reading = await readLabReportPdf(file.buffer);
  return writeThenRecord(deps.storage, [{ key, data: file.buffer }], () =>
    deps.db.transaction(async (tx) => {
      const [row] = await tx
        .insert(storedFiles)
        .values({ ownerId, storageKey: key, originalName: name, mimeType: 'application/pdf', sizeBytes: file.size, sha256: sha256(file.buffer), reading })
        .returning({ id: storedFiles.id, originalName: storedFiles.originalName, sizeBytes: storedFiles.sizeBytes, reading: storedFiles.reading });
      await steps.attachReport(tx, lot, row!.id);
      return row!;
    }),
  );
}
