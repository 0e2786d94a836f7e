#!/usr/bin/env node
// `npm test`: install the npm packages when missing, then run tests/support/run-all.ts, which starts
// a throwaway MariaDB, builds the web app when stale, runs every jest project and cleans up.
// Arguments are passed on to jest, e.g. `npm test -- --selectProjects server`.
// The whole suite (no arguments) runs the linter first (`npm run lint`, zero warnings allowed);
// a run of chosen files or projects does not, so that a single test file stays quick.
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { ensureDeps, root, runTs } from '../server/ensure-deps.mjs';

ensureDeps();
const args = process.argv.slice(2);
if (args.length === 0) {
  console.log('[test] npm run lint');
  const lint = spawnSync(process.execPath, [path.join(root, 'node_modules/eslint/bin/eslint.js'), '.', '--max-warnings', '0'], {
    cwd: root,
    stdio: 'inherit',
  });
  if (lint.status !== 0) {
    console.error('[test] the linter found problems (above); fix them, then run npm test again.');
    process.exit(lint.status ?? 1);
  }
}
await runTs('tests/support/run-all.ts', args);
