// The database floor: a bare node:http server doing one raw pg INSERT … RETURNING per request, on loopback.
// Started by the bench as a child process; it stops when the bench does (IPC disconnect) or after 15 minutes.
import http from 'node:http';
import pg from 'pg';

const port = Number(process.argv[2]);
const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 10 });
await pool.query(`CREATE TABLE IF NOT EXISTS bench_floor (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(), body jsonb NOT NULL, created_at timestamptz NOT NULL DEFAULT now())`);

const server = http.createServer((req, res) => {
  const chunks = [];
  req.on('data', (c) => chunks.push(c));
  req.on('end', async () => {
    try {
      const body = chunks.length ? Buffer.concat(chunks).toString('utf8') : '{}';
      const { rows } = await pool.query('INSERT INTO bench_floor (body) VALUES ($1) RETURNING id', [body]);
      res.writeHead(201, { 'content-type': 'application/json' });
      res.end(JSON.stringify({ id: rows[0].id }));
    } catch (error) {
      res.writeHead(500, { 'content-type': 'application/json' });
      res.end(JSON.stringify({ error: { message: String(error.message) } }));
    }
  });
});
server.listen(port, '127.0.0.1', () => process.send?.('ready'));

const stop = () => server.close(() => pool.end().finally(() => process.exit(0)));
process.on('disconnect', stop);
process.on('SIGTERM', stop);
setTimeout(stop, 15 * 60_000).unref();
