/**
 * The server survives the database going away and comes back by itself: health answers 503 with
 * db "down" while MariaDB is stopped, and ok again once it is restarted. This file runs its own
 * MariaDB (the shared test server must stay up for the other files).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import type { Sequelize } from 'sequelize';
import { createApp } from '../../server/app';
import { freePort, MariaDbServer } from '../../server/db/mariadb';
import { createSequelize } from '../../server/db/sequelize';
import { initModels } from '../../server/models';
import { migrateUp } from '../../server/db/migrate';

jest.setTimeout(120_000);

let server: MariaDbServer;
let sequelize: Sequelize;
let app: ReturnType<typeof createApp>;

beforeAll(async () => {
  server = new MariaDbServer({ baseDir: fs.mkdtempSync(path.join(os.tmpdir(), 'cw-outage-')), port: await freePort() });
  server.initialise(process.env.CW_INSTALL_DB ?? 'mariadb-install-db');
  await server.start(process.env.CW_MARIADBD);
  const db = { host: '127.0.0.1', port: server.port, name: 'outage', user: 'outage_app', password: 'outage-test-pw' };
  await server.provision({ database: db.name, user: db.user, password: db.password });
  sequelize = createSequelize(db);
  initModels(sequelize);
  await migrateUp(sequelize);
  app = createApp({ sequelize, version: 'test' });
});

afterAll(async () => {
  await sequelize?.close();
  await server?.stop();
  server?.remove();
});

async function healthUntil(status: number, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  let last: request.Response;
  do {
    last = await request(app).get('/api/health');
    if (last.status === status) return last;
    await new Promise((r) => setTimeout(r, 250));
  } while (Date.now() < deadline);
  return last;
}

it('answers 503 while MariaDB is down and ok again after it restarts', async () => {
  const up = await request(app).get('/api/health');
  expect(up.status).toBe(200);
  expect(up.body).toMatchObject({ status: 'ok', db: 'up' });

  await server.stop();
  const down = await request(app).get('/api/health');
  expect(down.status).toBe(503);
  expect(down.body).toEqual({ status: 'degraded', db: 'down', version: 'test' });
  // A data route answers in our error shape too, not a hang or a crash.
  const data = await request(app).get('/api/taxonomy');
  expect(data.status).toBe(503);
  expect(data.body.error.code).toBe('db_unavailable');

  await server.start(process.env.CW_MARIADBD);
  const back = await healthUntil(200, 20_000);
  expect(back.status).toBe(200);
  expect(back.body).toMatchObject({ status: 'ok', db: 'up' });
  await request(app).get('/api/taxonomy').expect(200);
});
