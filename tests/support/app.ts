/**
 * The real app on a test database with its own fake SMTP server, and a small client that keeps the
 * session cookie and sends the CSRF token the way the web app does.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { createApp, type AppLocals, type AppOptions } from '../../server/app';
import { ROOT } from '../../server/config';
import { seedIfEmpty } from '../../server/db/seed';
import { readDemoAccounts, seedDemoAccounts } from '../../server/db/seed-accounts';
import { importEntriesIfEmpty } from '../../server/db/seed-entries';
import { LIMIT_NAMES, type RateLimits } from '../../server/http/rate-limit';
import { LocalStore, type ObjectStore } from '../../server/storage';
import { createTestDatabase, type TestDatabase } from './db';
import { startTestMail, type TestMail } from './mail';

export const CONTENT_DIR = path.join(ROOT, 'content');

/** The demo accounts of content/demo/accounts.yml, by role. */
export const demo = (() => {
  const file = readDemoAccounts(CONTENT_DIR);
  const byRole = (role: string) => file.accounts.find((a) => a.role === role)!;
  return {
    password: file.password,
    admin: byRole('admin'),
    editor: byRole('editor'),
    /** The second demo editor (each entry needs an author and a different reviewer). */
    editor2: file.accounts.filter((a) => a.role === 'editor')[1],
    moderator: byRole('moderator'),
    contributor: byRole('contributor'),
  };
})();

/** Limits no test reaches except the rate-limit tests, which set their own: every name of LIMIT_NAMES, the computation and claim-check limits (issue 13) included. */
export const HIGH_LIMITS: RateLimits = Object.fromEntries(LIMIT_NAMES.map((n) => [n, { limit: 100_000, windowMs: 60_000 }])) as RateLimits;

export interface TestApp {
  t: TestDatabase;
  mail: TestMail;
  app: ReturnType<typeof createApp>;
  /** Where this app keeps attachments. */
  store: ObjectStore;
  /** A client with a fresh session (and its CSRF token). */
  client(): Promise<Client>;
  /** A client signed in with these credentials (expects 200). */
  signedIn(email: string, password?: string): Promise<Client>;
  close(): Promise<void>;
}

export interface TestAppOptions extends Partial<AppOptions> {
  /** Seed the demo accounts (default true). */
  demoAccounts?: boolean;
  /** Load content/taxonomy.yml (default false). */
  taxonomy?: boolean;
  /** Import content/entries after the accounts (default false; implies the taxonomy). */
  starterEntries?: boolean;
}

export async function startTestApp(opts: TestAppOptions = {}): Promise<TestApp> {
  const { demoAccounts = true, taxonomy = false, starterEntries = false, ...appOpts } = opts;
  const t = await createTestDatabase();
  const mail = await startTestMail();
  if (taxonomy || starterEntries) await seedIfEmpty(t.sequelize, CONTENT_DIR);
  if (demoAccounts) await seedDemoAccounts(t.sequelize, CONTENT_DIR, 'development');
  if (starterEntries) await importEntriesIfEmpty(t.sequelize, CONTENT_DIR);
  // Attachments in a throwaway directory (a test may pass its own store, e.g. S3 on s3rver).
  const uploads = appOpts.store ? null : fs.mkdtempSync(path.join(os.tmpdir(), 'cw-uploads-'));
  const store = appOpts.store ?? new LocalStore(uploads!);
  // Computations get a generous time limit unless the test sets its own: on two busy cores the first
  // claim check of an app (a worker thread loading the reader) can pass the 2 s a server allows.
  const compute = { timeoutMs: 60_000, ...appOpts.compute };
  const app = createApp({ sequelize: t.sequelize, version: 'test', env: 'test', mailer: mail.mailer, rateLimits: HIGH_LIMITS, ...appOpts, compute, store });
  const client = () => Client.start(app);
  return {
    t,
    mail,
    app,
    client,
    async signedIn(email, password = demo.password) {
      const c = await client();
      const res = await c.post('/api/auth/sign-in', { email, password });
      if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}: ${JSON.stringify(res.body)}`);
      return c;
    },
    store,
    async close() {
      await (app.locals as unknown as AppLocals).close();
      await mail.stop();
      await t.drop();
      if (uploads) fs.rmSync(uploads, { recursive: true, force: true });
    },
  };
}

type Body = string | object | undefined;

/** A browser-like client: one cookie jar, and the CSRF token from GET /api/session on every write. */
export class Client {
  private constructor(
    readonly agent: ReturnType<typeof request.agent>,
    public csrf: string,
  ) {}

  static async start(app: Parameters<typeof request.agent>[0]): Promise<Client> {
    const agent = request.agent(app);
    const res = await agent.get('/api/session').expect(200);
    return new Client(agent, res.body.csrfToken);
  }

  /** Fetches the session again (the CSRF token may have changed). */
  async session() {
    const res = await this.agent.get('/api/session').expect(200);
    this.csrf = res.body.csrfToken;
    return res.body as { user: { id: number; email: string; role: string } | null; csrfToken: string };
  }

  get(path: string) {
    return this.agent.get(path);
  }

  put(path: string, body?: Body) {
    return this.send('put', path, body ?? {});
  }

  send(method: 'post' | 'patch' | 'put' | 'delete', path: string, body?: Body) {
    const req = this.agent[method](path).set('X-CSRF-Token', this.csrf);
    return body === undefined ? req : req.send(body);
  }

  post(path: string, body?: Body) {
    return this.send('post', path, body ?? {});
  }

  patch(path: string, body?: Body) {
    return this.send('patch', path, body ?? {});
  }

  /** The value of the cw.sid cookie in the jar. */
  sid(): string | undefined {
    const jar = (this.agent as unknown as { jar: { getCookie(name: string, access: object): { value: string } | undefined } }).jar;
    return jar.getCookie('cw.sid', { domain: '127.0.0.1', path: '/', secure: false, script: false })?.value;
  }
}
