import { and, asc, eq } from 'drizzle-orm';
import type { PhotoOrder } from '@shared/contracts/selling';
import type { ApiDeps } from '../../api-deps';
import { photos, storedFiles } from '../../db/schema';
import { HttpError, notFound } from '../../middleware/http-error';
import { ownedLot } from '../selling/lot-access';

/** A grower arranging the photos of their lot: order, cover, removal. */
export class LotPhotosService {
  constructor(private readonly deps: Pick<ApiDeps, 'db' | 'storage' | 'logger'>) {}

  /** Puts the photos in the given order with the given cover; the order must name each photo exactly once. */
  async reorder(user: Express.User, lotId: number, input: PhotoOrder): Promise<void> {
    const { db } = this.deps;
    await ownedLot(db, lotId, user);
    await db.transaction(async (tx) => {
      const rows = await tx.select({ id: photos.id }).from(photos).where(eq(photos.lotId, lotId));
      const known = new Set(rows.map((r) => r.id));
      if (input.order.length !== known.size || input.order.some((p) => !known.has(p))) {
        throw new HttpError(400, 'photo_order_mismatch', 'The order must list each photo of this lot exactly once.');
      }
      // The cover flag is cleared first: one cover per lot is enforced by a unique index.
      await tx.update(photos).set({ isCover: false }).where(eq(photos.lotId, lotId));
      for (const [position, photoId] of input.order.entries()) {
        await tx.update(photos).set({ position, isCover: photoId === input.coverId }).where(eq(photos.id, photoId));
      }
    });
  }

  /** Removes a photo; when it was the cover, the first remaining photo becomes the cover. */
  async remove(user: Express.User, lotId: number, photoId: number): Promise<void> {
    const { db, storage, logger } = this.deps;
    await ownedLot(db, lotId, user);
    const removed = await db.transaction(async (tx) => {
      const [row] = await tx.delete(photos).where(and(eq(photos.id, photoId), eq(photos.lotId, lotId))).returning();
      if (!row) throw notFound('That photo');
      if (row.isCover) {
        const [next] = await tx.select({ id: photos.id }).from(photos).where(eq(photos.lotId, lotId)).orderBy(asc(photos.position), asc(photos.id)).limit(1);
        if (next) await tx.update(photos).set({ isCover: true }).where(eq(photos.id, next.id));
      }
      // The original (camera metadata, GPS) goes with the photo: its record here, its file below.
      const [original] = row.originalFileId ? await tx.delete(storedFiles).where(eq(storedFiles.id, row.originalFileId)).returning({ key: storedFiles.storageKey }) : [];
      return { variants: row.variants, originalKey: original?.key };
    });
    const keys = [...removed.variants.map((v) => v.key), ...(removed.originalKey ? [removed.originalKey] : [])];
    const results = await Promise.allSettled(keys.map((key) => storage.remove(key)));
    const failed = results.filter((r) => r.status === 'rejected').length;
    if (failed) logger.warn({ photoId, failed }, 'some photo files could not be removed');
  }
}
