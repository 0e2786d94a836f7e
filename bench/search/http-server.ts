/**
 * The real app for the HTTP part of `npm run bench:search`, in its own process (forked by
 * bench/search.ts) so that autocannon, in the parent, does not share its event loop. Reads the
 * bench database from CW_BENCH_DB (JSON: host, port, name, user, password), listens on
 * 127.0.0.1:0, tells the parent its port over IPC, and exits when the parent goes away.
 */
import crypto from 'node:crypto';
import http from 'node:http';
import { createApp, type AppLocals } from '../../server/app';
import { createSequelize } from '../../server/db/sequelize';
import { LIMIT_NAMES, type RateLimits } from '../../server/http/rate-limit';
import { initModels } from '../../server/models';

// The same high limits as tests/support/app.ts (HIGH_LIMITS); search and health have none anyway.
const HIGH_LIMITS = Object.fromEntries(LIMIT_NAMES.map((n) => [n, { limit: 100_000, windowMs: 60_000 }])) as RateLimits;

async function main() {
  const db = JSON.parse(process.env.CW_BENCH_DB ?? 'null');
  if (!db) throw new Error('CW_BENCH_DB is not set: this file is started by bench/search.ts');
  const sequelize = createSequelize(db);
  initModels(sequelize);
  const server = http.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const port = (server.address() as { port: number }).port;
  const app = createApp({
    sequelize,
    version: 'bench',
    env: 'production',
    sessionSecret: crypto.randomBytes(32).toString('base64url'),
    publicUrl: `http://127.0.0.1:${port}`,
    rateLimits: HIGH_LIMITS,
    sessionCleanupMs: 0,
    // The default watermark check (every 5 s), as in production.
  });
  server.on('request', app);
  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    server.closeAllConnections();
    server.close();
    await (app.locals as unknown as AppLocals).close().catch(() => {});
    await sequelize.close().catch(() => {});
    process.exit(0);
  };
  process.on('disconnect', () => void stop());
  process.on('SIGTERM', () => void stop());
  process.on('SIGINT', () => void stop());
  process.send?.({ port });
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
