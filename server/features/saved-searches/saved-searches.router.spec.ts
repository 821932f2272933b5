import { randomUUID } from 'node:crypto';
import { eq, inArray } from 'drizzle-orm';
import { savedSearches, users } from '../../db/schema';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { startTestApi, uniqueEmail, type TestApi } from '../../../tests/support/test-api';
import { alertSavedSearches } from './saved-search-alerts';

describe('saved searches', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  const signedInBuyer = async (role: 'buyer' | 'grower' = 'buyer') => {
    const agent = t.agent();
    const email = uniqueEmail(role);
    const res = await agent.post('/auth/sign-up', { email, password: 'a-long-password', displayName: 'Saver', role });
    expect(res.status).toBe(201);
    return { agent, email, userId: (await agent.get('/auth/me')).body.user.id as number };
  };

  it('saves, lists and deletes a buyer’s catalogue query, dropping paging', async () => {
    const { agent } = await signedInBuyer();
    const created = await agent.post('/saved-searches', { name: 'Rich alfalfa', query: { rfvMin: '150', forageType: 'alfalfa', page: '3', pageSize: '24', cpMin: '' } });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: 'Rich alfalfa', query: { rfvMin: '150', forageType: 'alfalfa' }, alerts: true, lastAlertedAt: null });
    const list = await agent.get('/saved-searches');
    expect(list.body.items.map((s: { id: number }) => s.id)).toEqual([created.body.id]);
    expect((await agent.delete(`/saved-searches/${created.body.id}`)).status).toBe(204);
    expect((await agent.get('/saved-searches')).body.items).toEqual([]);
    expect((await agent.delete(`/saved-searches/${created.body.id}`)).status).toBe(404);
  });

  it('rejects a query the catalogue would reject, naming the field', async () => {
    const { agent } = await signedInBuyer();
    const paths = async (query: Record<string, string>) => {
      const res = await agent.post('/saved-searches', { name: 'Bad', query });
      expect(res.status).toBe(400);
      return res.body.error.details.map((d: { path: string }) => d.path);
    };
    expect(await paths({ rfvMin: 'lots', forageType: 'straw' })).toEqual(expect.arrayContaining(['query.rfvMin', 'query.forageType']));
    expect(await paths({ radiusMi: '50' })).toEqual(['query.zip']);
  });

  it('refuses to save a search without any filter (it would alert on every lot)', async () => {
    const { agent } = await signedInBuyer();
    for (const query of [{}, { sort: 'price' }, { page: '2', cpMin: '' }]) {
      const res = await agent.post('/saved-searches', { name: 'Everything', query });
      expect(res.status).toBe(400);
      expect(res.body.error.details.map((d: { path: string }) => d.path)).toEqual(['query']);
    }
    expect((await agent.get('/saved-searches')).body.items).toEqual([]);
  });

  it('keeps each buyer’s searches private, and needs a signed-in buyer', async () => {
    const owner = await signedInBuyer();
    const other = await signedInBuyer();
    const created = await owner.agent.post('/saved-searches', { name: 'Mine', query: { forageType: 'teff' } });
    expect((await other.agent.get('/saved-searches')).body.items).toEqual([]);
    expect((await other.agent.delete(`/saved-searches/${created.body.id}`)).status).toBe(404);
    expect((await t.agent().get('/saved-searches')).status).toBe(401);
    const grower = await signedInBuyer('grower');
    expect((await grower.agent.get('/saved-searches')).status).toBe(403);
  });

  describe('alertSavedSearches', () => {
    it('e-mails owners whose saved query matches the newly listed lot, once per search, and stamps lastAlertedAt', async () => {
      const tag = `A${randomUUID().slice(0, 6)}`;
      const matcher = await signedInBuyer();
      const missed = await signedInBuyer();
      const muted = await signedInBuyer();
      const ok = await matcher.agent.post('/saved-searches', { name: 'Near rich hay', query: { q: tag, rfvMin: '140', zip: '66502', radiusMi: '50' } });
      await missed.agent.post('/saved-searches', { name: 'Protein 25+', query: { q: tag, cpMin: '25' } });
      const quiet = await muted.agent.post('/saved-searches', { name: 'Muted', query: { q: tag }, alerts: false });
      expect(quiet.body.alerts).toBe(false);
      // Alerts go to confirmed addresses only (tests/email-confirmation.spec.ts); here all three are confirmed.
      await t.deps.db.update(users).set({ emailVerifiedAt: t.clock.now() }).where(inArray(users.email, [matcher.email, missed.email, muted.email]));

      const grower = await createGrower(t.deps.db, '66502');
      const lot = await createLot(t.deps.db, grower.farm.id, { title: `${tag} fresh alfalfa`, analysis: { adfPct: 28, ndfPct: 36, crudeProteinPct: 22 } });
      t.mails.length = 0;

      const outcome = await alertSavedSearches(t.deps, lot.id);
      await t.drainJobs();

      // Other tests' searches may match too (a blank query matches every lot); ours must be exactly right.
      const missedId = (await missed.agent.get('/saved-searches')).body.items[0].id;
      expect(outcome.alerted).toContain(ok.body.id);
      expect(outcome.alerted).not.toContain(missedId);
      expect(outcome.alerted).not.toContain(quiet.body.id);
      const mine = t.mails.filter((m) => [matcher.email, missed.email, muted.email].includes(m.to) && m.subject.startsWith('New hay'));
      expect(mine).toHaveLength(1);
      expect(mine[0]!.to).toBe(matcher.email);
      expect(mine[0]!.subject).toContain('Near rich hay');
      expect(mine[0]!.text).toContain(`/hay/${lot.id}`);
      expect(mine[0]!.text).toMatch(/veterinarian or an equine nutritionist/);
      const [row] = await t.deps.db.select().from(savedSearches).where(eq(savedSearches.id, ok.body.id));
      expect(row!.lastAlertedAt).toBeInstanceOf(Date);
    });

    it('does nothing for a lot that is not listed', async () => {
      const tag = `N${randomUUID().slice(0, 6)}`;
      const buyer = await signedInBuyer();
      await buyer.agent.post('/saved-searches', { name: 'Anything', query: { q: tag } });
      const grower = await createGrower(t.deps.db, '66502');
      const lot = await createLot(t.deps.db, grower.farm.id, { title: `${tag} pending`, status: 'in_review' });
      t.mails.length = 0;
      expect((await alertSavedSearches(t.deps, lot.id)).alerted).toEqual([]);
      await t.drainJobs();
      expect(t.mails.filter((m) => m.to === buyer.email && m.subject.startsWith('New hay'))).toEqual([]);
    });
  });
});
