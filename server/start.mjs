#!/usr/bin/env node
// `npm start`: install the npm packages when node_modules is missing, then run the launcher
// (server/main.ts), which stops Express and then MariaDB on Ctrl-C or SIGTERM.
import { ensureDeps, runTs } from './ensure-deps.mjs';

ensureDeps();
await runTs('server/main.ts');
