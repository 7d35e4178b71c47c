// The database floor of the load and abuse benches: a plain node:http server whose every request runs one
// `SELECT id FROM parts WHERE id = ?` through the mariadb driver's own pool and answers the row as JSON.
// A request with a body is the floor of refusing one: read to its end, dropped, answered 413.
// Usage: primary-key-server.ts PORT PART_ID (the bench database comes from the environment).
import { createServer } from 'node:http';
import * as mariadb from 'mariadb';
import { getEnv } from '../../server/env';

const [port, partId] = process.argv.slice(2).map(Number);
const env = getEnv();
// The app's pool size, so both servers put the bench's connections onto as many database sessions.
const pool = mariadb.createPool({
  host: env.DB_HOST,
  port: env.DB_PORT,
  user: env.DB_USER,
  password: env.DB_PASSWORD,
  database: env.DB_NAME,
  connectionLimit: env.DB_POOL_MAX,
});

createServer((req, res) => {
  if (req.method === 'POST') {
    req.resume();
    req.on('end', () => res.writeHead(413, { 'content-type': 'application/json' }).end('{"error":{"code":"payload_too_large"}}'));
    return;
  }
  pool.query('SELECT id FROM parts WHERE id = ?', [partId]).then(
    (rows: Array<{ id: number }>) => {
      // A missing row answers 404, so the bench's every-response-2xx check catches a wrong id.
      res.writeHead(rows.length ? 200 : 404, { 'content-type': 'application/json' }).end(JSON.stringify(rows[0] ? { id: rows[0].id } : null));
    },
    (err: Error) => res.writeHead(500, { 'content-type': 'text/plain' }).end(err.message),
  );
}).listen(port, '127.0.0.1');
