import { createStripeFake } from './stripe-fake';

const port = Number(process.env['STRIPE_FAKE_PORT'] ?? 12111);
const server = createStripeFake().listen(port, '127.0.0.1', () => {
  console.log(`[stripe-fake] listening on http://127.0.0.1:${port}`);
});
const stop = () => server.close(() => process.exit(0));
process.once('SIGTERM', stop);
process.once('SIGINT', stop);
