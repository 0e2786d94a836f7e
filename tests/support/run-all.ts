/**
 * The test run behind `npm test`:
 *  1. start a throwaway MariaDB in a temporary datadir on a free port (removed afterwards);
 *  2. build the web app when dist/ is missing or older than its sources (the browser tests and the
 *     `npm start` test serve it);
 *  3. run the jest projects, passing on our arguments: those without a browser on two workers, then the
 *     browser tests on one (tests/support/phases.ts says why);
 *  4. stop MariaDB, remove its datadir, print one closing line `N passed, N failed`.
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildWeb, webBuildIsStale } from '../../server/build';
import { ROOT } from '../../server/config';
import { ensureMariaDbInstalled, freePort, MariaDbServer } from '../../server/db/mariadb';
import { selectedProjects, testPhases } from './phases';

const say = (m: string) => console.log(`[test] ${m}`);

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

    const env: NodeJS.ProcessEnv = {
      ...process.env,
      NODE_ENV: 'test' as const,
      CW_TEST_DB_SOCKET: db.socket,
      CW_TEST_DB_PORT: String(db.port),
      CW_MARIADBD: bins.mariadbd,
      CW_INSTALL_DB: bins.installDb,
    };
    const phases = testPhases(args);
    const totals = { passed: 0, failed: 0, files: 0 };
    code = 0;
    for (const phase of phases) {
      const results = path.join(outDir, `jest-results-${phase.name}.json`);
      fs.rmSync(results, { force: true });
      if (phases.length > 1) say(`jest: ${phase.name} (${phase.workers} worker${phase.workers === 1 ? '' : 's'})`);
      const c = await new Promise<number>((resolve) => {
        const jest = spawn(process.execPath, [path.join(ROOT, 'node_modules/jest/bin/jest.js'), '--json', `--outputFile=${results}`, ...phase.args], { cwd: ROOT, stdio: 'inherit', env });
        jest.on('exit', (x) => resolve(x ?? 1));
      });
      try {
        const r = JSON.parse(fs.readFileSync(results, 'utf8'));
        totals.passed += r.numPassedTests;
        totals.failed += r.numFailedTests;
        totals.files += r.numTotalTestSuites;
      } catch {
        console.log(`\n[test] jest wrote no results file for ${phase.name}; see its output above.`);
      }
      if (c !== 0) code = c;
    }
    // (Each phase passes with no tests, as a pattern may match files of one phase only; none at all is a failure.)
    if (phases.length > 1 && totals.files === 0) {
      console.log('\n[test] no test file matched.');
      code = 1;
    }
    console.log(`\ntests: ${totals.passed} passed, ${totals.failed} failed`);
  } catch (err) {
    console.error(`[test] ${(err as Error).stack ?? err}`);
    code = 1;
  } finally {
    await cleanup();
  }
  process.exit(code);
}

void main();
