import { eq, sql } from 'drizzle-orm';
import { messageThreads, orderLines, orders, photos, qualityClaims, savedSearches, users } from '../server/db/schema';
import { apiRoutes, type ApiRoute } from './support/api-routes';
import { createLot } from './support/fixtures';
import { ANALYSIS_STEP, completeLot, LOT_STEP, makePdf, PRICE_STEP, QUANTITY_STEP, SAMPLING_STEP, signedInGrower, signedInUser } from './support/grower-lot';
import { startTestApi, type TestApi } from './support/test-api';
import { plusDays } from '@shared/time/days';

/**
 * Who may call what, written down once from the roles the README describes (visitors browse, buyers buy,
 * growers sell their own lots, admins review and run the market). The routes themselves are read from the
 * assembled API, so a new route without a line here fails the first test.
 *
 * - `allow`: `anyone`, `signed-in`, or the roles that pass the role check (others: 401 signed out, 403 signed in).
 * - `on`: the fixture the path's ids name.
 * - `reach`: for a route about one resource, who may see that resource; everyone else who passed the role
 *   check gets 403 or 404, never 2xx.
 */
type Role = 'buyer' | 'grower' | 'admin';
type Party = 'buyer' | 'grower' | 'admin';
type Resource = 'draftLot' | 'listedLot' | 'order' | 'claim' | 'thread' | 'savedSearch' | 'none';
interface Rule {
  allow: 'anyone' | 'signed-in' | Role[];
  on?: Resource;
  reach?: Party[];
  /** A valid body, so a refusal is the access check's and not the body's validation. */
  body?: (ids: FixtureIds) => object;
  /** Sent as a multipart upload of a small PDF in this field instead of a JSON body. */
  pdf?: string;
  /** Signs the caller out: run after every other call. */
  endsSession?: true;
}
type FixtureIds = Record<Exclude<Resource, 'none'>, number> & { photo: number };

const ANYONE: Rule = { allow: 'anyone' };
const ADMIN: Rule = { allow: ['admin'] };
const GROWER: Rule = { allow: ['grower'] };
const BUYER: Rule = { allow: ['buyer'] };
const OWN_DRAFT: Rule = { allow: ['grower'], on: 'draftLot', reach: ['grower'] };
const ownDraftStep = (body: object): Rule => ({ ...OWN_DRAFT, body: () => body });
const WINDOW = () => ({ date: '2026-09-20' }); // a few days after the test date
const ORDER_PARTY: Rule = { allow: 'signed-in', on: 'order', reach: ['buyer', 'grower', 'admin'] };

const MESSAGE = { body: 'Can the load be picked up on a Saturday?' };

const POLICY: Record<string, Rule> = {
  'POST /payments/webhook': ANYONE, // the provider's signature is the credential
  'GET /health': ANYONE,
  'GET /auth/me': ANYONE,
  'POST /auth/sign-up': ANYONE,
  'POST /auth/sign-in': ANYONE,
  'POST /auth/sign-out': { allow: 'anyone', endsSession: true },
  // The signed token names the account, so opening the link needs no session.
  'POST /auth/confirm-email': { allow: 'anyone', body: () => ({ token: 'not-a-real-token' }) },
  'POST /auth/confirmation-link': { allow: 'signed-in' },
  'GET /lots/compare': ANYONE,
  'GET /lots': ANYONE,
  // A lot with the reviewer is its grower's and the admins' only; to anyone else it does not exist.
  'GET /lots/:id': { allow: 'anyone', on: 'draftLot', reach: ['grower', 'admin'] },
  'GET /admin/payouts/due': ADMIN,
  'GET /admin/payouts/batches': ADMIN,
  'POST /admin/payouts/batches': ADMIN,
  'GET /admin/payouts/batches/:id': ADMIN,
  'POST /admin/payouts/batches/:id/settle': ADMIN,
  'POST /admin/payouts/:id/retry': ADMIN,
  'GET /admin/payouts/statement.csv': ADMIN,
  'GET /admin/claims': ADMIN,
  'GET /admin/claims/:id': { allow: ['admin'], on: 'claim', reach: ['admin'] },
  'POST /admin/claims/:id/resolve': { allow: ['admin'], on: 'claim', reach: ['admin'] },
  'POST /claims': BUYER,
  // The order comes in the query (?orderId=), which this table cannot fill: its parties only, 404 to anyone else, is checked in claims.router.spec.
  'GET /claims': { allow: 'signed-in' },
  'POST /claims/:id/retest': { allow: ['buyer'], on: 'claim', reach: ['buyer'], pdf: 'report' },
  'GET /claims/:id': { allow: 'signed-in', on: 'claim', reach: ['buyer', 'grower', 'admin'] },
  // Runs after the buyer's retest upload above has gone through.
  'GET /claims/:id/retest': { allow: 'signed-in', on: 'claim', reach: ['buyer', 'grower', 'admin'] },
  'GET /admin/overview': ADMIN,
  'GET /admin/users': ADMIN,
  'POST /admin/users/:id/role': ADMIN,
  'POST /admin/users/:id/suspend': ADMIN,
  'POST /admin/users/:id/reinstate': ADMIN,
  'GET /admin/settings': ADMIN,
  'PUT /admin/settings': ADMIN,
  'GET /admin/audit': ADMIN,
  'GET /payouts/mine': GROWER,
  'GET /payouts/mine/statement.csv': GROWER,
  'POST /forage/evaluate': ANYONE,
  'GET /farms/mine': GROWER,
  'PUT /farms/mine': GROWER,
  'POST /farms/mine/payouts/link': GROWER,
  'POST /farms/mine/payouts/refresh': GROWER,
  'GET /selling/analysis-template.csv': GROWER,
  'GET /selling/lots': GROWER,
  'POST /selling/lots': GROWER,
  'GET /selling/lots/:id': OWN_DRAFT,
  'PUT /selling/lots/:id/lot': ownDraftStep(LOT_STEP),
  'PUT /selling/lots/:id/quantity': ownDraftStep(QUANTITY_STEP),
  'PUT /selling/lots/:id/sampling': ownDraftStep(SAMPLING_STEP),
  'PUT /selling/lots/:id/analysis': ownDraftStep(ANALYSIS_STEP),
  'PUT /selling/lots/:id/photos': OWN_DRAFT,
  'PUT /selling/lots/:id/price': ownDraftStep(PRICE_STEP),
  'PUT /selling/lots/:id/photo-order': { ...OWN_DRAFT, body: (ids) => ({ order: [ids.photo], coverId: ids.photo }) },
  'DELETE /selling/lots/:id/photos/:photoId': OWN_DRAFT,
  'POST /selling/lots/:id/submit': OWN_DRAFT,
  'POST /selling/lots/:id/withdraw': OWN_DRAFT,
  'POST /selling/lots/:id/relist': OWN_DRAFT,
  'POST /selling/lots/:id/copy': OWN_DRAFT,
  'POST /uploads/lots/:id/photos': OWN_DRAFT, // strangers are refused before the upload is read
  'POST /uploads/lots/:id/report': OWN_DRAFT,
  'POST /uploads/report-reading': GROWER,
  // The report of a lot still with the reviewer: its grower and admins only; never a visitor.
  'GET /uploads/lots/:id/report': { allow: 'signed-in', on: 'draftLot', reach: ['grower', 'admin'] },
  'GET /review/queue': ADMIN,
  'GET /review/lots/:id': { allow: ['admin'], on: 'draftLot', reach: ['admin'] },
  'POST /review/lots/:id/approve': { allow: ['admin'], on: 'draftLot', reach: ['admin'] },
  'POST /review/lots/:id/return': { allow: ['admin'], on: 'draftLot', reach: ['admin'] },
  'POST /planner/requirements': ANYONE,
  'POST /planner/herd-needs': ANYONE,
  'POST /planner/purchase-plan': ANYONE,
  'GET /saved-searches': BUYER,
  'POST /saved-searches': BUYER,
  'DELETE /saved-searches/:id': { allow: ['buyer'], on: 'savedSearch', reach: ['buyer'] },
  'GET /orders/quote': ANYONE,
  'POST /orders/quote-list': ANYONE,
  'GET /orders/lots/:lotId/open-days': { allow: 'anyone', on: 'listedLot' },
  'POST /orders': BUYER,
  'POST /orders/from-list': BUYER,
  'GET /orders/mine': BUYER,
  'GET /orders/incoming': GROWER,
  'GET /orders/:id': ORDER_PARTY,
  'POST /orders/:id/cancel': ORDER_PARTY,
  'PUT /orders/:id/window': { ...ORDER_PARTY, body: WINDOW },
  'POST /orders/:id/offer-window': { ...ORDER_PARTY, body: WINDOW },
  'POST /orders/:id/confirm-date': ORDER_PARTY,
  'POST /orders/:id/hand-over': { allow: ['grower', 'admin'], on: 'order', reach: ['grower', 'admin'] },
  'POST /orders/:id/accept': { allow: ['buyer'], on: 'order', reach: ['buyer'] },
  'GET /delivery-calendar': GROWER,
  'GET /delivery-calendar/settings': GROWER,
  'PUT /delivery-calendar/settings': GROWER,
  'GET /messages/threads': { allow: ['buyer', 'grower'] },
  'GET /messages/threads/:id': { allow: ['buyer', 'grower'], on: 'thread', reach: ['buyer', 'grower'] },
  'POST /messages/threads/:id': { allow: ['buyer', 'grower'], on: 'thread', reach: ['buyer', 'grower'], body: () => MESSAGE },
  // Only buyers open or read a conversation about a lot; the router refuses growers before the service.
  'GET /messages/lots/:lotId': { allow: ['buyer'], on: 'listedLot' },
  'POST /messages/lots/:lotId': { allow: ['buyer'], on: 'listedLot', body: () => MESSAGE },
  // An order's conversation: its buyer and grower write, admins read; anyone else is told the order does not exist.
  'GET /messages/orders/:orderId': ORDER_PARTY,
  'POST /messages/orders/:orderId': { allow: ['buyer', 'grower'], on: 'order', reach: ['buyer', 'grower'], body: () => MESSAGE },
};

/** The callers: the fixture's parties, a stranger of each kind, and an admin whose account was suspended. */
const CALLERS = ['anonymous', 'suspended admin', 'buyer', 'other buyer', 'grower', 'other grower', 'admin'] as const;
type Caller = (typeof CALLERS)[number];
const ROLE_OF: Record<Caller, Role | null> = { anonymous: null, 'suspended admin': null, buyer: 'buyer', 'other buyer': 'buyer', grower: 'grower', 'other grower': 'grower', admin: 'admin' };
const PARTY_OF: Partial<Record<Caller, Party>> = { buyer: 'buyer', grower: 'grower', admin: 'admin' };

/** What a caller must get: an exact refusal, or `through` (past every check: no 401/403, and no 404 for a resource it may reach). */
type Expected = { refused: number[] } | { through: 'any' | 'reaches' };
function expected(rule: Rule, caller: Caller): Expected {
  const role = ROLE_OF[caller];
  if (rule.allow !== 'anyone') {
    if (!role) return { refused: [401] };
    if (rule.allow !== 'signed-in' && !rule.allow.includes(role)) return { refused: [403] };
  }
  if (!rule.reach) return { through: 'any' };
  const party = PARTY_OF[caller];
  return party && rule.reach.includes(party) ? { through: 'reaches' } : { refused: [403, 404] };
}

const NO_SUCH_ID = 2_000_000_000;

describe('authorization matrix: every API route × every kind of caller', () => {
  let t: TestApi;
  let routes: ApiRoute[];
  let agents: Record<Caller, ReturnType<TestApi['agent']>>;
  let ids: FixtureIds;

  beforeAll(async () => {
    t = await startTestApi();
    routes = apiRoutes(t.api);
    const grower = await signedInGrower(t);
    const otherGrower = await signedInGrower(t);
    const buyer = await signedInUser(t, 'buyer');
    const otherBuyer = await signedInUser(t, 'buyer');
    const admin = await signedInUser(t, 'admin');
    const suspended = await signedInUser(t, 'admin');
    // Suspended behind the session's back (no sign-out): every request must still be refused.
    await t.deps.db.update(users).set({ disabledAt: new Date(t.clock.now()), disabledReason: 'matrix test' }).where(eq(users.email, suspended.email));
    // Its CSRF token was bound to the session that just ended; the next page load hands out a visitor's one.
    await suspended.agent.get('/auth/me');
    agents = { anonymous: t.agent(), 'suspended admin': suspended.agent, buyer: buyer.agent, 'other buyer': otherBuyer.agent, grower: grower.agent, 'other grower': otherGrower.agent, admin: admin.agent };

    const draftLot = await completeLot(grower.agent);
    const submitted = await grower.agent.post(`/selling/lots/${draftLot}/submit`);
    if (submitted.status !== 200) throw new Error(`submit failed: ${JSON.stringify(submitted.body)}`);
    const [photo] = await t.deps.db.select({ id: photos.id }).from(photos).where(eq(photos.lotId, draftLot));
    const listedLot = await createLot(t.deps.db, grower.farm.id, { title: 'Matrix listed lot' });
    const buyerId = await userId(buyer.email);
    const now = t.clock.now();
    const [order] = await t.deps.db
      .insert(orders)
      .values({ buyerId, farmId: grower.farm.id, status: 'delivered', platformFeeBps: 300, platformFeeCents: 1080, totalCents: 37080, method: 'pickup', paidAt: now, deliveredAt: now, acceptBy: plusDays(now, 3) })
      .returning();
    await t.deps.db.insert(orderLines).values({ orderId: order!.id, lotId: listedLot.id, bales: 20, tons: 1.2, priceCentsPerTon: 30000, goodsCents: 36000 });
    const [claim] = await t.deps.db.insert(qualityClaims).values({ orderId: order!.id, openedBy: buyerId, reason: 'Bales were mouldy inside.' }).returning();
    const asked = await buyer.agent.post(`/messages/lots/${listedLot.id}`, { body: 'Is the second cutting still available?' });
    if (asked.status !== 201) throw new Error(`message failed: ${JSON.stringify(asked.body)}`);
    const [thread] = await t.deps.db.select({ id: messageThreads.id }).from(messageThreads).where(eq(messageThreads.buyerId, buyerId));
    const [saved] = await t.deps.db.insert(savedSearches).values({ userId: buyerId, name: 'Matrix search', query: { forageType: 'alfalfa' }, alerts: false }).returning();
    ids = { draftLot, listedLot: listedLot.id, order: order!.id, claim: claim!.id, thread: thread!.id, savedSearch: saved!.id, photo: photo!.id };
  }, 120_000);
  afterAll(() => t.close());

  async function userId(email: string): Promise<number> {
    const [row] = await t.deps.db.select({ id: users.id }).from(users).where(sql`${users.email} = ${email}`);
    return row!.id;
  }

  const key = (r: ApiRoute) => `${r.method.toUpperCase()} ${r.path}`;

  it('has a rule for every route the API answers, and no rule for a route that is gone', () => {
    expect(routes.length).toBeGreaterThanOrEqual(80);
    expect(routes.map(key).filter((k) => !POLICY[k])).toEqual([]);
    expect(Object.keys(POLICY).filter((k) => !routes.some((r) => key(r) === k))).toEqual([]);
  });

  it('answers each caller as the rule says: refusals first, then the calls that get through', async () => {
    const calls = routes.flatMap((route) => CALLERS.map((caller) => ({ route, caller, rule: POLICY[key(route)]!, want: expected(POLICY[key(route)]!, caller) })));
    // Refused calls change nothing, so they all run before any call that may change a lot's state.
    const order = (c: (typeof calls)[number]) => ('refused' in c.want ? 0 : c.rule.endsSession ? 2 : 1);
    calls.sort((a, b) => order(a) - order(b));
    const wrong: string[] = [];
    for (const c of calls) {
      const path = fill(c.route.path, c.rule.on ?? 'none');
      const status = (await send(agents[c.caller], c.route.method, path, c.rule)).status;
      const ok = 'refused' in c.want ? c.want.refused.includes(status) : status < 500 && status !== 401 && status !== 403 && !(c.want.through === 'reaches' && status === 404);
      if (!ok) wrong.push(`${key(c.route)} as ${c.caller}: ${status}, wanted ${'refused' in c.want ? c.want.refused.join(' or ') : 'to get through'}`);
    }
    expect(wrong).toEqual([]);
  }, 300_000);

  function fill(path: string, on: Resource): string {
    return path.replace(/:(\w+)/g, (_m, name: string) => {
      if (name === 'photoId') return String(ids.photo);
      if (name === 'lotId') return String(on === 'draftLot' ? ids.draftLot : ids.listedLot);
      return String(on === 'none' ? NO_SUCH_ID : ids[on]);
    });
  }

  async function send(agent: ReturnType<TestApi['agent']>, method: string, path: string, rule: Rule) {
    if (rule.pdf) {
      const token = await agent.token();
      return agent.raw.post(path).set('X-XSRF-TOKEN', token).attach(rule.pdf, await makePdf(), 'retest.pdf');
    }
    const body = rule.body?.(ids) ?? {};
    switch (method) {
      case 'get':
        return agent.get(path);
      case 'post':
        return agent.post(path, body);
      case 'put':
        return agent.put(path, body);
      case 'patch':
        return agent.patch(path, body);
      case 'delete':
        return agent.delete(path);
      default:
        throw new Error(`no call for ${method}`);
    }
  }
});
