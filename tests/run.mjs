#!/usr/bin/env node
// `npm test`: install the npm packages when missing, then run tests/support/run-all.ts, which starts
// a throwaway MariaDB, builds the web app when stale, runs every jest project and cleans up.
// Arguments are passed on to jest, e.g. `npm test -- --selectProjects server`.
import { ensureDeps, runTs } from '../server/ensure-deps.mjs';

ensureDeps();
await runTs('tests/support/run-all.ts', process.argv.slice(2));
