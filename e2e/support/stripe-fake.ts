import { expect } from '@playwright/test';
import { stackPort } from './stack';

/** The local Stripe fake the e2e server pays through (started by `npm test` on STRIPE_FAKE_PORT, moved per app copy). */
function fakeBase(): string {
  return `http://127.0.0.1:${stackPort(process.env['STRIPE_FAKE_PORT'] ?? '12112')}`;
}

/** Reads an object from the fake's Stripe-shaped API, as the platform's own secret key would. */
export async function stripeGet<T>(path: string): Promise<T> {
  const res = await fetch(`${fakeBase()}${path}`, { headers: { Authorization: 'Bearer sk_test_e2e_reader' } });
  expect(res.ok, `Stripe fake ${path} answered ${res.status}`).toBe(true);
  return (await res.json()) as T;
}

/** The platform's available USD balance in cents (Stripe's balance object). */
export async function platformBalanceCents(): Promise<number> {
  const balance = await stripeGet<{ available: { amount: number; currency: string }[] }>('/v1/balance');
  return balance.available.filter((b) => b.currency === 'usd').reduce((s, b) => s + b.amount, 0);
}
