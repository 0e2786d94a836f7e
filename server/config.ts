/**
 * Configuration from the environment, with the defaults that `npm start` uses on one machine.
 * Every variable is listed in README.md.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

export const ROOT = path.resolve(__dirname, '..');

const int = (name: string, fallback: number): number => {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1 || n > 65535) throw new Error(`${name} must be a port number, got "${raw}"`);
  return n;
};

export interface Config {
  env: 'development' | 'production' | 'test';
  host: string;
  port: number;
  dataDir: string;
  /** true: we start and stop our own mariadbd under dataDir; false: DB_HOST/DB_PORT is run by someone else. */
  dbManaged: boolean;
  db: { host: string; port: number; name: string; user: string; password: string };
  staticDir: string;
  logLevel: string;
  version: string;
}

/** The app user's password: DB_PASSWORD, or one generated on first start and kept in the datadir. */
function dbPassword(dataDir: string): string {
  if (process.env.DB_PASSWORD) return process.env.DB_PASSWORD;
  const file = path.join(dataDir, 'db-password');
  try {
    return fs.readFileSync(file, 'utf8').trim();
  } catch {
    fs.mkdirSync(dataDir, { recursive: true });
    const pw = crypto.randomBytes(18).toString('base64url');
    fs.writeFileSync(file, pw + '\n', { mode: 0o600 });
    return pw;
  }
}

export function loadConfig(): Config {
  const env = (process.env.NODE_ENV ?? 'development') as Config['env'];
  const dataDir = path.resolve(ROOT, process.env.DATA_DIR ?? '.data');
  const dbManaged = (process.env.DB_MANAGED ?? '1') !== '0';
  return {
    env,
    host: process.env.HOST ?? '127.0.0.1',
    port: int('PORT', 8080),
    dataDir,
    dbManaged,
    db: {
      host: process.env.DB_HOST ?? '127.0.0.1',
      port: int('DB_PORT', 3307),
      name: process.env.DB_NAME ?? 'counterweight',
      user: process.env.DB_USER ?? 'counterweight',
      password: dbManaged ? dbPassword(dataDir) : (process.env.DB_PASSWORD ?? ''),
    },
    staticDir: path.resolve(ROOT, process.env.STATIC_DIR ?? 'dist'),
    logLevel: process.env.LOG_LEVEL ?? (env === 'test' ? 'silent' : 'info'),
    version: readVersion(),
  };
}

export function readVersion(): string {
  return JSON.parse(fs.readFileSync(path.join(ROOT, 'package.json'), 'utf8')).version as string;
}
