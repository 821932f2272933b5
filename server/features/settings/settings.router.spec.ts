import { and, eq } from 'drizzle-orm';
import { DEFAULT_SETTINGS } from '@shared/contracts/platform-settings';
import { auditEvents } from '../../db/schema';
import type { TestApi } from '../../../tests/support/test-api';
import { startAdminApi, type SignedInUser } from '../../../tests/support/start-admin-api';
import { holdSettings } from '../../../tests/support/settings-lock';
import { SettingsService } from './settings.service';

describe('platform settings (admin)', () => {
  let t: TestApi;
  let admin: SignedInUser;
  beforeAll(async () => {
    ({ t, admin } = await startAdminApi());
  });
  afterAll(() => t.close());

  it('are validated with clear messages', async () => {
    const current = (await admin.agent.get('/admin/settings')).body;
    const bad = await admin.agent.put('/admin/settings', { ...current, platformFeeBps: -5 });
    expect(bad.status).toBe(400);
    const windows = await admin.agent.put('/admin/settings', { ...current, acceptanceDays: 3, claimDays: 7 });
    expect(windows.status).toBe(400);
    expect(JSON.stringify(windows.body)).toMatch(/claim window cannot be longer/);
    const zero = await admin.agent.put('/admin/settings', { ...current, tolerances: { ...current.tolerances, adfPct: 0 } });
    expect(zero.status).toBe(400);
  });

  it('are changed, read back by the service every feature uses, and audited with before and after', async () => {
    const release = await holdSettings('change');
    try {
      const current = (await admin.agent.get('/admin/settings')).body;
      const next = { ...current, platformFeeBps: current.platformFeeBps + 50, tolerances: { ...current.tolerances, crudeProteinPct: 1.5 } };
      const res = await admin.agent.put('/admin/settings', next);
      expect(res.status).toBe(200);
      expect(await new SettingsService(t.deps.db, t.clock).current()).toEqual(next);
      const rows = await t.deps.db.select().from(auditEvents).where(and(eq(auditEvents.action, 'settings.changed'), eq(auditEvents.createdAt, t.clock.now())));
      expect(rows.at(-1)).toMatchObject({ before: { platformFeeBps: current.platformFeeBps }, after: { platformFeeBps: current.platformFeeBps + 50 } });
      await admin.agent.put('/admin/settings', DEFAULT_SETTINGS);
    } finally {
      await release();
    }
  });
});
