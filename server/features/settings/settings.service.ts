import { sql } from 'drizzle-orm';
import { DEFAULT_SETTINGS, PlatformSettingsSchema, type PlatformSettings } from '@shared/contracts/platform-settings';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { platformSettings } from '../../db/schema';
import { recordAudit } from '../audit/audit-log';

const KEY = 'platform';

/**
 * The one place the platform's settings are read and changed: fee, acceptance and claim windows,
 * analysis tolerances. Unset values fall back to the defaults; every change is validated and audited.
 */
export class SettingsService {
  constructor(private readonly db: Db, private readonly clock: Clock) {}

  async current(): Promise<PlatformSettings> {
    const [row] = await this.db.select({ value: platformSettings.value }).from(platformSettings).where(sql`${platformSettings.key} = ${KEY}`);
    if (!row) return DEFAULT_SETTINGS;
    const stored = row.value as Partial<PlatformSettings>;
    return { ...DEFAULT_SETTINGS, ...stored, tolerances: { ...DEFAULT_SETTINGS.tolerances, ...stored.tolerances } };
  }

  async update(adminId: number, input: unknown): Promise<PlatformSettings> {
    const next = PlatformSettingsSchema.parse(input);
    const now = this.clock.now();
    await this.db.transaction(async (tx) => {
      // Lock the row (or the insert slot) so two admins saving at once are recorded one after the other.
      await tx.execute(sql`select pg_advisory_xact_lock(hashtext('platform_settings'))`);
      const before = await new SettingsService(tx as unknown as Db, this.clock).current();
      await tx
        .insert(platformSettings)
        .values({ key: KEY, value: next, updatedBy: adminId, updatedAt: now })
        .onConflictDoUpdate({ target: platformSettings.key, set: { value: next, updatedBy: adminId, updatedAt: now } });
      const changed = changedKeys(before, next);
      await recordAudit(tx, {
        actorId: adminId,
        action: 'settings.changed',
        entityType: 'settings',
        entityId: KEY,
        before: pick(before, changed),
        after: pick(next, changed),
        at: now,
      });
    });
    return next;
  }
}

function changedKeys(a: PlatformSettings, b: PlatformSettings): (keyof PlatformSettings)[] {
  return (Object.keys(b) as (keyof PlatformSettings)[]).filter((k) => JSON.stringify(a[k]) !== JSON.stringify(b[k]));
}

function pick(s: PlatformSettings, keys: (keyof PlatformSettings)[]): Record<string, unknown> {
  return Object.fromEntries(keys.map((k) => [k, s[k]]));
}
