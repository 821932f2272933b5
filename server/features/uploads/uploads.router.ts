import { Router } from 'express';
import type { ApiDeps } from '../../api-deps';
import { idParams } from '../../middleware/id-params';
import { requireRole } from '../../middleware/require-role';
import { ownedLot } from '../selling/lot-access';
import { addLotPhotos } from './photo-upload';
import { openLabReport } from './report-download';
import { attachLabReport } from './report-upload';
import { readingSummary, readLabReportPdf } from './report-reading';
import { sniffPdf } from './file-sniff';
import { displayName } from './photo-upload';
import { prefillFromReading } from '@shared/lab-report/compare-reading';
import { acceptPhotos, acceptReport, filesOf } from './upload-limits';

/**
 * Bytes in and out: lot photos and the lab report PDF. Uploads are the owning grower's; the report is
 * served to its grower and admins, and — once an admin has verified it against the listing — to any
 * signed-in user (buyers checking the report before they pay). Visitors who are not signed in never get it.
 */
export function uploadsRouter(deps: ApiDeps): Router {
  const { db, storage } = deps;
  const router = Router();

  router.post('/lots/:id/photos', requireRole('grower'), async (req, res, next) => {
    // Ownership is checked before the body is read, so strangers' uploads are never buffered.
    const { id } = idParams(req.params, { id: 'That lot' });
    await ownedLot(db, id, req.user);
    acceptPhotos(req, res, next);
  }, async (req, res) => {
    const { id } = idParams(req.params, { id: 'That lot' });
    const { lot } = await ownedLot(db, id, req.user);
    const added = await addLotPhotos(deps, lot, req.user!.id, filesOf(req, 'photo'));
    res.status(201).json({ photos: added });
  });

  router.post('/lots/:id/report', requireRole('grower'), async (req, res, next) => {
    const { id } = idParams(req.params, { id: 'That lot' });
    await ownedLot(db, id, req.user);
    acceptReport(req, res, next);
  }, async (req, res) => {
    const { id } = idParams(req.params, { id: 'That lot' });
    const { lot } = await ownedLot(db, id, req.user);
    const [file] = filesOf(req, 'lab report PDF');
    const stored = await attachLabReport(deps, lot, req.user!.id, file!);
    res.status(201).json({ reportFile: { ...stored, url: `/api/uploads/lots/${id}/report` } });
  });

  // Reads a report without keeping it, so the lot form can fill in the values for the grower to confirm.
  router.post('/report-reading', requireRole('grower'), acceptReport, async (req, res) => {
    const [file] = filesOf(req, 'lab report PDF');
    await sniffPdf(file!.buffer, displayName(file!));
    const reading = await readLabReportPdf(file!.buffer);
    res.json({ reading, values: prefillFromReading(reading), summary: readingSummary(reading) });
  });

  router.get('/lots/:id/report', async (req, res) => {
    const { id } = idParams(req.params, { id: 'That lot' });
    const file = await openLabReport(deps, id, req.user);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Length', String(file.size));
    res.setHeader('Content-Disposition', `inline; filename="lab-report-lot-${id}.pdf"`);
    res.setHeader('Cache-Control', 'private, no-cache');
    res.setHeader('X-Content-Type-Options', 'nosniff');
    file.stream.pipe(res);
  });

  return router;
}
