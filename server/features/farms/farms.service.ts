import { eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { FarmProfile, FarmProfileInput } from '@shared/contracts/selling';
import type { Db } from '../../db/client';
import { farms } from '../../db/schema';
import { HttpError } from '../../middleware/http-error';
import { timeZoneForState } from '@shared/time/farm-time';
import { locateZip } from '../geo/geo';

type FarmRow = typeof farms.$inferSelect;

/**
 * Creates the grower's farm or updates it: the ZIP code decides city, state and coordinates, and a new farm
 * takes its state's main time zone unless one is given. The demo seed makes its farms through this too.
 */
export async function saveFarmProfile(db: Db, userId: number, input: FarmProfileInput): Promise<FarmRow> {
  const place = locateZip(input.zip);
  const columns = { ...input, city: place.city, state: place.state, latitude: place.latitude, longitude: place.longitude };
  const [existing] = await db.select().from(farms).where(eq(farms.ownerId, userId)).orderBy(farms.id).limit(1);
  if (existing) {
    // A farm keeps its time zone unless the grower chooses another.
    const [row] = await db.update(farms).set(columns).where(eq(farms.id, existing.id)).returning();
    return row!;
  }
  const [row] = await db.insert(farms).values({ ownerId: userId, ...columns, timeZone: input.timeZone ?? timeZoneForState(place.state) }).returning();
  return row!;
}

/** A grower's farm profile and payout account (a connected account at the payment provider). */
export class FarmsService {
  constructor(
    private readonly db: Db,
    private readonly stripe: Stripe,
  ) {}

  async mine(userId: number): Promise<FarmRow | null> {
    const [farm] = await this.db.select().from(farms).where(eq(farms.ownerId, userId)).orderBy(farms.id).limit(1);
    return farm ?? null;
  }

  /** Creates the farm or updates it; the ZIP code decides city, state and coordinates. */
  save(userId: number, input: FarmProfileInput): Promise<FarmRow> {
    return saveFarmProfile(this.db, userId, input);
  }

  /**
   * A link to the provider's onboarding for this farm's payout account (an Express account, made on first
   * use). Listing does not wait for it; payouts do.
   */
  async payoutLink(user: Express.User, publicUrl: string): Promise<{ url: string }> {
    const farm = await this.requireFarm(user.id);
    let accountId = farm.payoutAccountId;
    if (!accountId) {
      const account = await this.stripe.accounts.create({ type: 'express', email: user.email, metadata: { farmId: String(farm.id) } });
      accountId = account.id;
      await this.db.update(farms).set({ payoutAccountId: accountId }).where(eq(farms.id, farm.id));
    }
    const link = await this.stripe.accountLinks.create({
      account: accountId,
      type: 'account_onboarding',
      return_url: `${publicUrl}/selling/farm?payouts=returned`,
      refresh_url: `${publicUrl}/selling/farm?payouts=expired`,
    });
    return { url: link.url };
  }

  /** Asks the provider whether payouts are enabled now (after the grower comes back from onboarding). */
  async refreshPayouts(userId: number): Promise<FarmRow> {
    const farm = await this.requireFarm(userId);
    if (!farm.payoutAccountId) return farm;
    const account = await this.stripe.accounts.retrieve(farm.payoutAccountId);
    const [row] = await this.db.update(farms).set({ payoutsEnabled: Boolean(account.payouts_enabled) }).where(eq(farms.id, farm.id)).returning();
    return row!;
  }

  private async requireFarm(userId: number): Promise<FarmRow> {
    const farm = await this.mine(userId);
    if (!farm) throw new HttpError(409, 'farm_required', 'Save your farm profile first.');
    return farm;
  }
}

export function farmProfileView(farm: FarmRow): FarmProfile {
  return {
    id: farm.id,
    name: farm.name,
    addressLine: farm.addressLine,
    zip: farm.zip,
    city: farm.city,
    state: farm.state,
    latitude: farm.latitude,
    longitude: farm.longitude,
    deliveryRadiusMi: farm.deliveryRadiusMi,
    loadingFacilities: farm.loadingFacilities,
    pickupHours: farm.pickupHours,
    description: farm.description,
    timeZone: farm.timeZone,
    payouts: { state: farm.payoutsEnabled ? 'ready' : farm.payoutAccountId ? 'pending' : 'none' },
  };
}
