/**
 * The bare comparison for `npm run bench:load`: Express and pg with nothing else, in its own
 * process like the app, answering the same 200 yards in one query. Prints its port when ready.
 * Expects DATABASE_URL and OPERATION_ID.
 */
import type { AddressInfo } from 'node:net';
import express from 'express';
import pg from 'pg';

const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 20 });
const app = express();
app.get('/yards', async (_req, res) => {
  const { rows } = await pool.query(
    `SELECT * FROM yards WHERE operation_id = $1 AND archived_at IS NULL ORDER BY name LIMIT 200`,
    [process.env.OPERATION_ID],
  );
  res.json({ items: rows, total: rows.length });
});
const server = app.listen(0, '127.0.0.1', () => {
  console.log(`bare-ready ${(server.address() as AddressInfo).port}`);
});
process.on('SIGTERM', () => server.close(() => void pool.end()));
