// The baseline: a bare Express 5 route answering a 12-item JSON, the size of one catalogue page of stubs.
import express from 'express';

const items = Array.from({ length: 12 }, (_, i) => ({ id: i + 1, title: `Item ${i + 1}`, priceCentsPerTon: 20000 + i * 100, rfv: 150 + i }));
const app = express();
app.get('/items', (_req, res) => res.json({ items, total: items.length }));
const server = app.listen(Number(process.env.PORT), '127.0.0.1', () => process.send?.('ready'));
process.on('SIGTERM', () => server.close(() => process.exit(0)));
