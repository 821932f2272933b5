import type Stripe from 'stripe';
import type { Db } from '../../server/db/client';
import { farms, orderLines, orders, users } from '../../server/db/schema';
import { createGrower, createLot } from './fixtures';
import { uniqueEmail } from './test-api';
import { hashPassword } from '../../server/features/auth/password';

/** A grower whose farm has a connected account at the payment provider (set-up finished unless `ready` is false). */
export async function growerWithPayouts(db: Db, stripe: Stripe, ready = true) {
  const grower = await createGrower(db);
  const account = await stripe.accounts.create({ type: 'express', email: grower.email });
  if (ready) {
    const link = await stripe.accountLinks.create({ account: account.id, type: 'account_onboarding', return_url: 'http://127.0.0.1/done', refresh_url: 'http://127.0.0.1/again' });
    await fetch(link.url, { redirect: 'manual' });
  }
  await finishPayoutSetup(db, grower.farm.id, account.id, ready);
  return { ...grower, accountId: account.id };
}

export async function finishPayoutSetup(db: Db, farmId: number, accountId: string, ready: boolean) {
  const { eq } = await import('drizzle-orm');
  await db.update(farms).set({ payoutAccountId: accountId, payoutsEnabled: ready }).where(eq(farms.id, farmId));
}

let buyerId: number | undefined;
async function fixtureBuyer(db: Db): Promise<number> {
  if (buyerId) return buyerId;
  const [u] = await db.insert(users).values({ email: uniqueEmail('buyer'), displayName: 'Fixture buyer', role: 'buyer', passwordHash: await hashPassword('fixture-password') }).returning();
  buyerId = u!.id;
  return buyerId;
}

/**
 * An order paid through the provider (so the platform's balance holds the money and refunds work), then
 * delivered: `completed` (accepted), or still `delivered` with the given acceptance date.
 */
export async function deliveredOrder(
  db: Db,
  stripe: Stripe,
  farmId: number,
  opts: { goodsCents: number; freightCents?: number; feeCents?: number; status?: 'completed' | 'delivered'; deliveredAt: Date; acceptBy: Date; buyerId?: number },
) {
  const lot = await createLot(db, farmId, { title: `Payout lot ${farmId}` });
  const freight = opts.freightCents ?? 0;
  const fee = opts.feeCents ?? Math.round(opts.goodsCents * 0.03);
  const total = opts.goodsCents + freight + fee;
  const intent = await stripe.paymentIntents.create({ amount: total, currency: 'usd' });
  await stripe.paymentIntents.confirm(intent.id, { payment_method: 'pm_card_visa' });
  const [order] = await db
    .insert(orders)
    .values({
      buyerId: opts.buyerId ?? (await fixtureBuyer(db)),
      farmId,
      status: opts.status ?? 'completed',
      freightCents: freight,
      platformFeeCents: fee,
      platformFeeBps: 300,
      totalCents: total,
      method: 'pickup',
      paymentIntentId: intent.id,
      paidAt: opts.deliveredAt,
      deliveredAt: opts.deliveredAt,
      acceptBy: opts.acceptBy,
    })
    .returning();
  await db.insert(orderLines).values({ orderId: order!.id, lotId: lot.id, bales: 20, tons: 1.2, priceCentsPerTon: 25000, goodsCents: opts.goodsCents });
  return order!;
}

/** The platform's available balance at the provider, in cents. */
export async function platformBalance(stripe: Stripe): Promise<number> {
  const balance = await stripe.balance.retrieve();
  return balance.available.reduce((s, a) => s + a.amount, 0);
}
