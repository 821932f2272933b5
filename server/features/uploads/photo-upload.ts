import { createHash, randomUUID } from 'node:crypto';
import { eq, sql } from 'drizzle-orm';
import type { PhotoView } from '@shared/contracts/lots';
import type { ApiDeps } from '../../api-deps';
import type { Db } from '../../db/client';
import { lots, photos, storedFiles, type PhotoVariant } from '../../db/schema';
import { HttpError } from '../../middleware/http-error';
import { photoView } from '../lots/lots.service';
import { renderPhotoVariants, type RenderedVariant } from '../photos/photo-variants';
import type { LotRow } from '../selling/lot-access';
import { sniffPhoto } from './file-sniff';
import { PHOTOS_PER_LOT } from './upload-limits';
import { writeThenRecord, type PendingFile } from './write-then-record';

interface Prepared {
  file: Express.Multer.File;
  id: string;
  originalKey: string;
  mimeType: string;
  width: number;
  height: number;
  variants: (RenderedVariant & { key: string })[];
}

/**
 * Adds photos to a lot. Every file is checked by content first (one bad file rejects the request before
 * anything is stored), then rendered to WebP variants (upright, metadata stripped), then the originals and
 * variants are written and the rows inserted in one transaction — all or nothing.
 */
export async function addLotPhotos(deps: Pick<ApiDeps, 'db' | 'storage'>, lot: LotRow, ownerId: number, files: Express.Multer.File[]): Promise<PhotoView[]> {
  const { db, storage } = deps;
  // A quick look first, so a request that cannot fit is refused before its photos are rendered.
  checkRoom(await photoTally(db, lot.id), files.length);

  const sniffed = [];
  for (const file of files) sniffed.push(await sniffPhoto(file.buffer, displayName(file)));

  const prepared: Prepared[] = [];
  for (const [i, file] of files.entries()) {
    const rendered = await renderPhotoVariants(file.buffer).catch(() => {
      throw new HttpError(400, 'image_unreadable', `“${displayName(file)}” looks like an image but could not be decoded (it may be cut short or damaged). Try exporting it again.`);
    });
    const id = randomUUID();
    prepared.push({
      file,
      id,
      originalKey: `private/originals/${id}.${sniffed[i]!.extension}`,
      mimeType: sniffed[i]!.mimeType,
      width: rendered.width,
      height: rendered.height,
      variants: rendered.variants.map((v) => ({ ...v, key: `photos/${id}/${v.width}.webp` })),
    });
  }

  const pending: PendingFile[] = prepared.flatMap((p) => [{ key: p.originalKey, data: p.file.buffer }, ...p.variants.map((v) => ({ key: v.key, data: v.data }))]);
  const rows = await writeThenRecord(storage, pending, () =>
    db.transaction(async (tx) => {
      // Parallel uploads to one lot queue on its row, so each counts the photos the others just added.
      await tx.select({ id: lots.id }).from(lots).where(eq(lots.id, lot.id)).for('update');
      const tally = await photoTally(tx, lot.id);
      checkRoom(tally, prepared.length);
      const { maxPosition, hasCover } = tally;
      const out = [];
      for (const [i, p] of prepared.entries()) {
        const [original] = await tx
          .insert(storedFiles)
          .values({ ownerId, storageKey: p.originalKey, originalName: displayName(p.file), mimeType: p.mimeType, sizeBytes: p.file.size, sha256: sha256(p.file.buffer) })
          .returning({ id: storedFiles.id });
        const variants: PhotoVariant[] = p.variants.map((v) => ({ width: v.width, height: v.height, format: v.format, key: v.key }));
        const [row] = await tx
          .insert(photos)
          .values({ lotId: lot.id, originalFileId: original!.id, position: maxPosition + 1 + i, isCover: !hasCover && i === 0, width: p.width, height: p.height, altText: `Photo of ${lot.title}`, variants })
          .returning();
        out.push(row!);
      }
      return out;
    }),
  );
  return rows.map(photoView);
}

interface PhotoTally {
  count: number;
  maxPosition: number;
  hasCover: boolean;
}

async function photoTally(db: Pick<Db, 'select'>, lotId: number): Promise<PhotoTally> {
  const [tally] = await db
    .select({
      count: sql<number>`count(*)`.mapWith(Number),
      maxPosition: sql<number>`coalesce(max(${photos.position}), -1)`.mapWith(Number),
      hasCover: sql<boolean>`coalesce(bool_or(${photos.isCover}), false)`,
    })
    .from(photos)
    .where(eq(photos.lotId, lotId));
  return tally!;
}

function checkRoom({ count }: PhotoTally, adding: number): void {
  if (count + adding > PHOTOS_PER_LOT) {
    throw new HttpError(400, 'too_many_photos', `A lot can have at most ${PHOTOS_PER_LOT} photos; it has ${count}. Remove some first.`);
  }
}

export function displayName(file: Express.Multer.File): string {
  // busboy hands over names as latin1; browsers send UTF-8.
  const name = Buffer.from(file.originalname, 'latin1').toString('utf8');
  return name.replace(/[\u0000-\u001f]/g, '').slice(0, 200) || 'upload';
}

export const sha256 = (data: Buffer) => createHash('sha256').update(data).digest('hex');
