import Stripe from 'stripe';
import type { Env } from '../../env';

/**
 * The real Stripe SDK. With STRIPE_API_HOST set, or the placeholder key, it talks to the local fake in
 * docker-local-fakes/stripe; with a real key and no host override it talks to Stripe itself.
 */
export function createStripeClient(env: Env): Stripe {
  const usesFake = Boolean(env.STRIPE_API_HOST) || env.STRIPE_SECRET_KEY.includes('local_fake');
  if (!usesFake) return new Stripe(env.STRIPE_SECRET_KEY);
  const [host, port] = (env.STRIPE_API_HOST ?? `127.0.0.1:${env.STRIPE_FAKE_PORT}`).split(':');
  return new Stripe(env.STRIPE_SECRET_KEY, {
    host,
    port: Number(port),
    protocol: 'http',
    maxNetworkRetries: 0,
    telemetry: false,
  });
}
