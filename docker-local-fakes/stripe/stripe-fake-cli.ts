import { createStripeFake } from './stripe-fake';

const port = Number(process.env['STRIPE_FAKE_PORT'] ?? 12111);
// Events go to the app's webhook endpoint, signed with the same secret the app verifies with.
const webhookUrl = process.env['STRIPE_WEBHOOK_URL'] ?? `http://127.0.0.1:${process.env['PORT'] ?? 4000}/api/payments/webhook`;
const fake = createStripeFake({ webhook: { url: webhookUrl, secret: process.env['STRIPE_WEBHOOK_SECRET'] ?? 'whsec_local_fake_secret' } });
const server = fake.listen(port, '127.0.0.1', () => {
  console.log(`[stripe-fake] listening on http://127.0.0.1:${port}; webhooks to ${webhookUrl}`);
});
const stop = () => {
  fake.stopWebhooks();
  server.close(() => process.exit(0));
};
process.once('SIGTERM', stop);
process.once('SIGINT', stop);
