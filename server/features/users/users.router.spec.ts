import { and, eq, sql } from 'drizzle-orm';
import { auditEvents, session } from '../../db/schema';
import type { TestApi } from '../../../tests/support/test-api';
import { startAdminApi, type SignedInUser } from '../../../tests/support/start-admin-api';
import { signedInUser } from '../../../tests/support/grower-lot';

describe('users (admin)', () => {
  let t: TestApi;
  let admin: SignedInUser;
  beforeAll(async () => {
    ({ t, admin } = await startAdminApi());
  });
  afterAll(() => t.close());

  const audit = (action: string, id: number) =>
    t.deps.db.select().from(auditEvents).where(and(eq(auditEvents.action, action), eq(auditEvents.entityId, String(id))));
  const sessionsOf = async (id: number) =>
    (await t.deps.db.select({ sid: session.sid }).from(session).where(sql`(${session.sess} -> 'passport' ->> 'user') = ${String(id)}`)).length;

  it('finds users by name or e-mail, and by role', async () => {
    const buyer = await signedInUser(t, 'buyer');
    const found = await admin.agent.get(`/admin/users?q=${encodeURIComponent(buyer.email)}`);
    expect(found.body.items).toEqual([expect.objectContaining({ email: buyer.email, role: 'buyer', suspendedAt: null })]);
    const growers = await admin.agent.get('/admin/users?role=grower&limit=200');
    expect(growers.body.items.every((u: { role: string }) => u.role === 'grower')).toBe(true);
    expect((await admin.agent.get('/admin/users?role=owner')).status).toBe(400);
  });

  it('suspends with a reason: sessions end at once, every request and sign-in are refused; reinstating lets the user back', async () => {
    const buyer = await signedInUser(t, 'buyer');
    expect((await buyer.agent.get('/auth/me')).body.user).not.toBeNull();
    const id = (await buyer.agent.get('/auth/me')).body.user.id as number;
    // A second device signed in too.
    const phone = t.agent();
    expect((await phone.post('/auth/sign-in', { email: buyer.email, password: 'fixture-password' })).status).toBe(200);
    expect(await sessionsOf(id)).toBe(2);

    expect((await admin.agent.post(`/admin/users/${id}/suspend`, { reason: 'no' })).status).toBe(400);
    const res = await admin.agent.post(`/admin/users/${id}/suspend`, { reason: 'Listed hay that was never for sale.' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ suspendedAt: t.clock.now().toISOString(), suspendedReason: 'Listed hay that was never for sale.' });
    expect(await sessionsOf(id)).toBe(0);
    expect((await buyer.agent.get('/auth/me')).body.user).toBeNull();
    expect((await phone.get('/saved-searches')).status).toBe(401);
    const again = await t.agent().post('/auth/sign-in', { email: buyer.email, password: 'fixture-password' });
    expect(again.status).toBe(401);
    expect(again.body.error.code).toBe('account_suspended');
    expect(await audit('user.suspended', id)).toEqual([expect.objectContaining({ before: { suspendedAt: null }, data: expect.objectContaining({ reason: 'Listed hay that was never for sale.', sessionsEnded: 2 }) })]);

    const back = await admin.agent.post(`/admin/users/${id}/reinstate`, { reason: 'Explained: a typing mistake.' });
    expect(back.body.suspendedAt).toBeNull();
    expect((await t.agent().post('/auth/sign-in', { email: buyer.email, password: 'fixture-password' })).status).toBe(200);
    expect(await audit('user.reinstated', id)).toHaveLength(1);
  }, 30_000);

  it('changes a role with a reason, audited before and after; an admin cannot change or suspend themself', async () => {
    const buyer = await signedInUser(t, 'buyer');
    const id = (await buyer.agent.get('/auth/me')).body.user.id as number;
    const res = await admin.agent.post(`/admin/users/${id}/role`, { role: 'grower', reason: 'Asked to sell their own hay.' });
    expect(res.body.role).toBe('grower');
    expect((await buyer.agent.get('/auth/me')).body.user.role).toBe('grower');
    expect(await audit('user.role_changed', id)).toEqual([expect.objectContaining({ before: { role: 'buyer' }, after: { role: 'grower' } })]);
    const self = (await admin.agent.get('/auth/me')).body.user.id as number;
    expect((await admin.agent.post(`/admin/users/${self}/suspend`, { reason: 'Trying to lock myself out.' })).status).toBe(409);
    expect((await admin.agent.post(`/admin/users/${self}/role`, { role: 'buyer', reason: 'Trying to demote myself.' })).status).toBe(409);
    expect((await admin.agent.post('/admin/users/999999999/suspend', { reason: 'Nobody by that id.' })).status).toBe(404);
  }, 30_000);
});
