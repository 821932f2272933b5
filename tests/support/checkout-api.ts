import { holdSettings } from './settings-lock';
import { startStripeFake, startTestApi, type StripeFakeServer, type TestApi } from './test-api';

/**
 * A test API with its own Stripe fake, for checkout tests whose totals assume the default settings (platform
 * fee): the settings are held for reading until `close()`, so no other file changes them meanwhile.
 */
export async function startCheckoutApi(): Promise<{ t: TestApi; stripe: StripeFakeServer; close: () => Promise<void> }> {
  const releaseSettings = await holdSettings('read');
  const stripe = await startStripeFake();
  const t = await startTestApi({}, { stripe });
  return {
    t,
    stripe,
    close: async () => {
      await t.close();
      await stripe.close();
      await releaseSettings();
    },
  };
}
