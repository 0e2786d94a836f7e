/** Configuration of the accounts work (secrets, URLs, production requirements) and the demo accounts. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { loadConfig, ROOT } from '../../server/config';
import { readDemoAccounts, RefusedInProduction, seedDemoAccounts } from '../../server/db/seed-accounts';
import { verifyPassword } from '../../server/auth/passwords';
import { User } from '../../server/models';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { CONTENT_DIR } from '../support/app';

describe('loadConfig', () => {
  const saved = { ...process.env };
  let dataDir: string;
  beforeEach(() => {
    dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-config-'));
    for (const k of ['NODE_ENV', 'SESSION_SECRET', 'SMTP_URL', 'SMTP_PORT', 'PUBLIC_URL', 'PORT', 'MAIL_FROM', 'TRUST_PROXY', 'DB_PASSWORD']) delete process.env[k];
    process.env.DATA_DIR = dataDir;
  });
  afterEach(() => {
    process.env = { ...saved };
    fs.rmSync(dataDir, { recursive: true, force: true });
  });

  it('generates the session secret once in development and keeps it in DATA_DIR/session-secret', () => {
    const first = loadConfig();
    const file = path.join(dataDir, 'session-secret');
    expect(first.sessionSecret).toEqual([fs.readFileSync(file, 'utf8').trim()]);
    expect(first.sessionSecret[0].length).toBeGreaterThanOrEqual(43);
    expect(fs.statSync(file).mode & 0o777).toBe(0o600);
    expect(loadConfig().sessionSecret).toEqual(first.sessionSecret);
  });

  it('has development defaults: PUBLIC_URL from PORT, the fake SMTP on a free port, loopback proxies', () => {
    process.env.PORT = '8181';
    const c = loadConfig();
    expect(c.publicUrl).toBe('http://127.0.0.1:8181');
    expect([c.smtpUrl, c.smtpPort]).toEqual([null, 0]);
    expect(c.mailFrom).toMatch(/@example\.org>$/);
    expect(c.trustProxy).toBe('loopback');
  });

  it('takes SESSION_SECRET (several, comma-separated, for rotation), PUBLIC_URL, SMTP_URL, SMTP_PORT', () => {
    process.env.SESSION_SECRET = `${'a'.repeat(32)}, ${'b'.repeat(32)}`;
    process.env.PUBLIC_URL = 'https://counterweight.example.org/';
    process.env.SMTP_URL = 'smtps://user:pw@mail.example.org:465';
    process.env.SMTP_PORT = '2526';
    const c = loadConfig();
    expect(c.sessionSecret).toEqual(['a'.repeat(32), 'b'.repeat(32)]);
    expect(c.publicUrl).toBe('https://counterweight.example.org');
    expect(c.smtpUrl).toBe('smtps://user:pw@mail.example.org:465');
    expect(c.smtpPort).toBe(2526);
    expect(fs.existsSync(path.join(dataDir, 'session-secret'))).toBe(false);
  });

  it('refuses to start in production without SESSION_SECRET or SMTP_URL, and bad values anywhere', () => {
    process.env.NODE_ENV = 'production';
    expect(() => loadConfig()).toThrow(/SESSION_SECRET is required/);
    process.env.SESSION_SECRET = 's'.repeat(40);
    expect(() => loadConfig()).toThrow(/SMTP_URL is required/);
    process.env.SMTP_URL = 'smtp://mail.example.org:587';
    expect(loadConfig().env).toBe('production');
    process.env.SESSION_SECRET = 'short';
    expect(() => loadConfig()).toThrow(/at least 32/);
    process.env.SESSION_SECRET = 's'.repeat(40);
    process.env.PUBLIC_URL = 'counterweight.example.org';
    expect(() => loadConfig()).toThrow(/PUBLIC_URL/);
    delete process.env.PUBLIC_URL;
    process.env.TRUST_PROXY = 'true';
    expect(() => loadConfig()).toThrow(/TRUST_PROXY/);
  });
});

describe('the demo accounts', () => {
  let t: TestDatabase;
  beforeAll(async () => {
    t = await createTestDatabase();
  });
  afterAll(() => t.drop());

  it('are refused in production, even into an empty users table', async () => {
    await expect(seedDemoAccounts(t.sequelize, CONTENT_DIR, 'production')).rejects.toBeInstanceOf(RefusedInProduction);
    await expect(seedDemoAccounts(t.sequelize, CONTENT_DIR, 'production')).rejects.toThrow(/NODE_ENV=production/);
    expect(await User.count()).toBe(0);
  });

  it('are the five of the contract: an admin, two editors, a moderator and a contributor at example.org', () => {
    const demo = readDemoAccounts(CONTENT_DIR);
    expect(demo.password).toBe('counterweight-demo-2026');
    expect(demo.accounts.map((a) => [a.email, a.displayName, a.role])).toEqual([
      ['admin@example.org', 'Ada Okonkwo', 'admin'],
      ['editor.one@example.org', 'Bruno Salazar', 'editor'],
      ['editor.two@example.org', 'Chiara Lindqvist', 'editor'],
      ['moderator@example.org', 'Dmitri Havel', 'moderator'],
      ['contributor@example.org', 'Esther Mbeki', 'contributor'],
    ]);
  });

  it('are seeded, verified, into an empty users table only', async () => {
    const seeded = await seedDemoAccounts(t.sequelize, CONTENT_DIR, 'development');
    expect(seeded?.accounts).toHaveLength(5);
    const users = await User.findAll({ order: [['id', 'ASC']] });
    expect(users.map((u) => [u.email, u.role, u.emailVerifiedAt !== null])).toEqual(
      seeded!.accounts.map((a) => [a.email, a.role, true]),
    );
    expect(await verifyPassword(users[0].passwordHash, 'counterweight-demo-2026')).toBe(true);
    expect(await seedDemoAccounts(t.sequelize, CONTENT_DIR, 'development')).toBeNull();
    expect(await User.count()).toBe(5);
  });

  it('are listed in the README with their password', () => {
    const readme = fs.readFileSync(path.join(ROOT, 'README.md'), 'utf8');
    const demo = readDemoAccounts(CONTENT_DIR);
    expect(readme).toContain(demo.password);
    for (const a of demo.accounts) {
      expect(readme).toContain(a.email);
      expect(readme).toContain(a.displayName);
    }
  });
});
