/**
 * The test run behind `npm test`:
 *  1. start a throwaway MariaDB in a temporary datadir on a free port (removed afterwards);
 *  2. build the web app when dist/ is missing or older than its sources (the browser tests and the
 *     `npm start` test serve it);
 *  3. run every jest project, passing on our arguments;
 *  4. stop MariaDB, remove its datadir, print one closing line `N passed, N failed`.
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildWeb, webBuildIsStale } from '../../server/build';
import { ROOT } from '../../server/config';
import { ensureMariaDbInstalled, freePort, MariaDbServer } from '../../server/db/mariadb';

const say = (m: string) => console.log(`[test] ${m}`);

function selectedProjects(args: string[]): string[] | null {
  const i = args.indexOf('--selectProjects');
  if (i < 0) return null;
  const names: string[] = [];
  for (const a of args.slice(i + 1)) {
    if (a.startsWith('-')) break;
    names.push(a);
  }
  return names;
}

async function main() {
  const args = process.argv.slice(2);
  const outDir = path.join(ROOT, 'test-output');
  fs.mkdirSync(outDir, { recursive: true });

  const bins = ensureMariaDbInstalled(say);
  const db = new MariaDbServer({ baseDir: fs.mkdtempSync(path.join(os.tmpdir(), 'cw-test-db-')), port: await freePort() });
  let cleaned = false;
  const cleanup = async () => {
    if (cleaned) return;
    cleaned = true;
    await db.stop().catch(() => {});
    db.remove();
  };
  process.on('SIGINT', () => void cleanup().then(() => process.exit(130)));
  process.on('SIGTERM', () => void cleanup().then(() => process.exit(143)));

  let code = 1;
  try {
    db.initialise(bins.installDb);
    await db.start(bins.mariadbd);
    say(`throwaway MariaDB on 127.0.0.1:${db.port} in ${db.baseDir}`);

    const projects = selectedProjects(args);
    const needsWeb = !projects || projects.includes('browser') || projects.includes('server');
    const distDir = path.join(ROOT, 'dist');
    if (needsWeb && webBuildIsStale(ROOT, distDir)) buildWeb(ROOT, distDir, say);

    const results = path.join(outDir, 'jest-results.json');
    fs.rmSync(results, { force: true });
    code = await new Promise<number>((resolve) => {
      const jest = spawn(
        process.execPath,
        [path.join(ROOT, 'node_modules/jest/bin/jest.js'), '--json', `--outputFile=${results}`, ...args],
        {
          cwd: ROOT,
          stdio: 'inherit',
          env: {
            ...process.env,
            NODE_ENV: 'test',
            CW_TEST_DB_SOCKET: db.socket,
            CW_TEST_DB_PORT: String(db.port),
            CW_MARIADBD: bins.mariadbd,
            CW_INSTALL_DB: bins.installDb,
          },
        },
      );
      jest.on('exit', (c) => resolve(c ?? 1));
    });
    try {
      const r = JSON.parse(fs.readFileSync(results, 'utf8'));
      console.log(`\ntests: ${r.numPassedTests} passed, ${r.numFailedTests} failed`);
    } catch {
      console.log('\n[test] jest wrote no results file; see its output above.');
    }
  } catch (err) {
    console.error(`[test] ${(err as Error).stack ?? err}`);
    code = 1;
  } finally {
    await cleanup();
  }
  process.exit(code);
}

void main();
