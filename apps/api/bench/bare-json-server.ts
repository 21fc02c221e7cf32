/**
 * The yardstick of `pnpm bench`: a bare Express app that answers POST /echo
 * with the JSON body it was sent, started the same way as the API (node
 * --import tsx, one process, loopback). Nothing else: no auth, no logging.
 *   HOOPLINE_PORT=8181 node --import tsx bench/bare-json-server.ts
 */
import express from 'express';

const app = express();
app.disable('x-powered-by');
app.use(express.json({ limit: '1mb' }));
app.post('/echo', (req, res) => {
  res.json(req.body);
});
app.get('/api/health', (_req, res) => {
  res.json({ status: 'ok' });
});
const port = Number(process.env['HOOPLINE_PORT'] ?? 0);
app.listen(port, '127.0.0.1');
