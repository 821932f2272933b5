import { eq } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { farms, lots } from '../../db/schema';
import { forbidden, HttpError, notFound, unauthenticated } from '../../middleware/http-error';

export type LotRow = typeof lots.$inferSelect;
export type FarmRow = typeof farms.$inferSelect;

/** The lot and its farm, or 404. */
export async function findLotWithFarm(db: Db, lotId: number): Promise<{ lot: LotRow; farm: FarmRow }> {
  const [row] = await db.select({ lot: lots, farm: farms }).from(lots).innerJoin(farms, eq(farms.id, lots.farmId)).where(eq(lots.id, lotId));
  if (!row) throw notFound('That lot');
  return row;
}

/** The lot, when the signed-in user is the grower who owns it; 403 for anyone else (admins included: they review, not edit). */
export async function ownedLot(db: Db, lotId: number, user: Express.User | undefined): Promise<{ lot: LotRow; farm: FarmRow }> {
  if (!user) throw unauthenticated();
  const found = await findLotWithFarm(db, lotId);
  if (found.farm.ownerId !== user.id) throw forbidden('Only the grower who listed this lot can change it.');
  return found;
}

/** The grower's farm, or 409 telling them to set it up first. */
export async function farmOf(db: Db, userId: number): Promise<FarmRow> {
  const [farm] = await db.select().from(farms).where(eq(farms.ownerId, userId)).orderBy(farms.id).limit(1);
  if (!farm) throw new HttpError(409, 'farm_required', 'Set up your farm profile before listing a lot.');
  return farm;
}
