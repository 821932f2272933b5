import { createGrower, createLot } from '../../../tests/support/fixtures';
import { startTestApi, uniqueEmail, type TestApi } from '../../../tests/support/test-api';
import { queueMessageNotice } from './message-notices';

describe('messages between buyers and growers', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  }, 30_000);
  afterAll(() => t.close());

  const signUp = async (role: 'buyer' | 'grower', displayName = 'Sam Buyer') => {
    const agent = t.agent();
    const email = uniqueEmail(role);
    const res = await agent.post('/auth/sign-up', { email, password: 'a-long-password', displayName, role });
    expect(res.status).toBe(201);
    return { agent, email };
  };
  const growerAgent = async (grower: { email: string; password: string }) => {
    const agent = t.agent();
    expect((await agent.post('/auth/sign-in', { email: grower.email, password: grower.password })).status).toBe(200);
    return agent;
  };

  it('a buyer asks about a listed lot, the grower is e-mailed with the lot’s facts and answers in the inbox', async () => {
    const grower = await createGrower(t.deps.db);
    const lot = await createLot(t.deps.db, grower.farm.id, { title: 'Second-cut alfalfa for messages' });
    const buyer = await signUp('buyer');
    t.mails.length = 0;

    const asked = await buyer.agent.post(`/messages/lots/${lot.id}`, { body: 'Can a semi reach the barn?' });
    expect(asked.status).toBe(201);
    expect(asked.body.messages).toEqual([expect.objectContaining({ mine: true, body: 'Can a semi reach the barn?' })]);

    await t.drainJobs();
    const notice = t.mails.find((m) => m.to === grower.email)!;
    expect(notice.subject).toContain('Second-cut alfalfa for messages');
    for (const part of [notice.text, notice.html!]) {
      expect(part).toContain('Can a semi reach the barn?');
      expect(part).toContain('RFV');
    }

    const growerSide = await growerAgent(grower);
    const inbox = await growerSide.get('/messages/threads');
    expect(inbox.body.items).toEqual([expect.objectContaining({ id: asked.body.id, lotId: lot.id, withName: 'Sam Buyer', unread: 1, lastMessage: 'Can a semi reach the barn?' })]);
    const answered = await growerSide.post(`/messages/threads/${asked.body.id}`, { body: 'Yes, the yard takes a 53 ft trailer.' });
    expect(answered.status).toBe(201);
    expect((await growerSide.get('/messages/threads')).body.items[0].unread).toBe(0);

    await t.drainJobs();
    expect(t.mails.some((m) => m.to === buyer.email && m.text.includes('53 ft trailer'))).toBe(true);
    const buyerThread = await buyer.agent.get(`/messages/lots/${lot.id}`);
    expect(buyerThread.body.thread.messages.map((m: { mine: boolean }) => m.mine)).toEqual([true, false]);
    expect(buyerThread.body.thread.withName).toBe(grower.farm.name);
  });

  it('keeps a thread to its two people and refuses empty, overlong or misdirected messages', async () => {
    const grower = await createGrower(t.deps.db);
    const lot = await createLot(t.deps.db, grower.farm.id, { title: 'Private lot talk' });
    const draft = await createLot(t.deps.db, grower.farm.id, { title: 'Not listed yet', status: 'draft' });
    const buyer = await signUp('buyer');
    const stranger = await signUp('buyer');
    const thread = (await buyer.agent.post(`/messages/lots/${lot.id}`, { body: 'Hello' })).body;

    expect((await stranger.agent.get(`/messages/threads/${thread.id}`)).status).toBe(404);
    expect((await stranger.agent.post(`/messages/threads/${thread.id}`, { body: 'Me too' })).status).toBe(404);
    expect((await buyer.agent.post(`/messages/lots/${lot.id}`, { body: '   ' })).status).toBe(400);
    expect((await buyer.agent.post(`/messages/lots/${lot.id}`, { body: 'x'.repeat(2001) })).status).toBe(400);
    expect((await buyer.agent.post(`/messages/lots/${draft.id}`, { body: 'Hello' })).status).toBe(404);
    expect((await buyer.agent.post('/messages/lots/abc', { body: 'Hello' })).status).toBe(400);
    expect((await t.agent().get('/messages/threads')).status).toBe(401);
    // Growers answer; they do not open threads on lots.
    const growerSide = await growerAgent(grower);
    expect((await growerSide.post(`/messages/lots/${lot.id}`, { body: 'Hi' })).status).toBe(403);
    // The router refuses them before reading the request: a bad body or lot id still answers 403, not 400.
    expect((await growerSide.post(`/messages/lots/${lot.id}`, {})).status).toBe(403);
    expect((await growerSide.post('/messages/lots/abc', { body: 'Hi' })).status).toBe(403);
    expect((await growerSide.get(`/messages/lots/${lot.id}`)).status).toBe(403);
  });

  it('two first messages at once share one thread (unique per buyer and lot, checked in PostgreSQL)', async () => {
    const grower = await createGrower(t.deps.db);
    const lot = await createLot(t.deps.db, grower.farm.id, { title: 'Race lot' });
    const buyer = await signUp('buyer');
    const [a, b] = await Promise.all([
      buyer.agent.post(`/messages/lots/${lot.id}`, { body: 'First' }),
      buyer.agent.post(`/messages/lots/${lot.id}`, { body: 'Second' }),
    ]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).toBe(b.body.id);
    expect((await buyer.agent.get('/messages/threads')).body.items.filter((i: { lotId: number }) => i.lotId === lot.id)).toHaveLength(1);
  });

  it('sends each notice once, even when the job runs again', async () => {
    const grower = await createGrower(t.deps.db);
    const lot = await createLot(t.deps.db, grower.farm.id, { title: 'Notice once' });
    const buyer = await signUp('buyer');
    const thread = (await buyer.agent.post(`/messages/lots/${lot.id}`, { body: 'Once only' })).body;
    expect(await queueMessageNotice(t.deps, thread.messages[0].id)).toBe('already-queued');
    await t.drainJobs();
    expect(t.mails.filter((m) => m.to === grower.email)).toHaveLength(1);
  });
});
