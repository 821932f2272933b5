import { eq, sql } from 'drizzle-orm';
import { createDb, type Db } from '../../db/client';
import { auditEvents } from '../../db/schema';
import { recordAudit } from './audit-log';

// Drizzle wraps the driver's error; the cause is PostgreSQL's own (raised by the trigger, SQLSTATE 42501).
const REFUSED = { cause: { code: '42501', message: expect.stringMatching(/append-only/) } };

// The audit trail must be append-only in the database itself, whatever the application does.
describe('audit trail in PostgreSQL', () => {
  let db: Db;
  let id: number;

  beforeAll(async () => {
    db = createDb(process.env['TEST_DATABASE_URL']!, 2);
    const entityId = `append-only-${process.pid}-${Date.now()}`;
    await recordAudit(db, { actorId: null, action: 'test.recorded', entityType: 'test', entityId, before: { a: 1 }, after: { a: 2 }, at: new Date('2026-03-02T10:00:00Z') });
    [{ id }] = (await db.select({ id: auditEvents.id }).from(auditEvents).where(eq(auditEvents.entityId, entityId))) as [{ id: number }];
  });
  afterAll(() => db.$client.end());

  it('keeps who, what, when, before and after', async () => {
    const [row] = await db.select().from(auditEvents).where(eq(auditEvents.id, id));
    expect(row).toMatchObject({ action: 'test.recorded', before: { a: 1 }, after: { a: 2 } });
    expect(row!.createdAt.toISOString()).toBe('2026-03-02T10:00:00.000Z');
  });

  it('refuses an UPDATE', async () => {
    await expect(db.update(auditEvents).set({ action: 'rewritten' }).where(eq(auditEvents.id, id))).rejects.toMatchObject(REFUSED);
  });

  it('refuses a DELETE', async () => {
    await expect(db.delete(auditEvents).where(eq(auditEvents.id, id))).rejects.toMatchObject(REFUSED);
  });

  it('refuses a TRUNCATE', async () => {
    await expect(db.execute(sql`truncate audit_events`)).rejects.toMatchObject(REFUSED);
  });

  it('still has the row, unchanged', async () => {
    const [row] = await db.select().from(auditEvents).where(eq(auditEvents.id, id));
    expect(row!.action).toBe('test.recorded');
  });
});
