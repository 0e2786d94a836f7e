/**
 * The browser-test harness: the built web app (dist/) served by the real Express app on a fresh
 * test database, and Debian's Chromium driven through playwright-core.
 */
import fs from 'node:fs';
import type { Server } from 'node:http';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { createApp } from '../../server/app';
import { ROOT } from '../../server/config';
import { seedIfEmpty } from '../../server/db/seed';
import { createTestDatabase, type TestDatabase } from './db';

export const screenshotDir = path.join(ROOT, 'test-output', 'screenshots');

export interface Harness {
  base: string;
  browser: Browser;
  /** A new page in its own context at this viewport; page errors are collected in `problems`. */
  open(width: number, height: number): Promise<Page & { problems: string[] }>;
  close(): Promise<void>;
}

export async function startHarness(): Promise<Harness> {
  const dist = path.join(ROOT, 'dist');
  if (!fs.existsSync(path.join(dist, 'index.html'))) {
    throw new Error('dist/ is missing: run the browser tests through `npm test`, which builds the web app first.');
  }
  fs.mkdirSync(screenshotDir, { recursive: true });
  const t: TestDatabase = await createTestDatabase();
  await seedIfEmpty(t.sequelize, path.join(ROOT, 'content'));
  const app = createApp({ sequelize: t.sequelize, version: 'test', staticDir: dist });
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const base = `http://127.0.0.1:${(server.address() as { port: number }).port}`;
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
  return {
    base,
    browser,
    async open(width, height) {
      const context = await browser.newContext({ viewport: { width, height }, deviceScaleFactor: 1 });
      const page = (await context.newPage()) as Page & { problems: string[] };
      page.problems = [];
      page.on('pageerror', (e) => page.problems.push(e.message));
      return page;
    },
    async close() {
      await browser.close();
      await new Promise((r) => server.close(r));
      await t.drop();
    },
  };
}

export const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);
