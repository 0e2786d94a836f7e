#!/usr/bin/env node
// `npm start` on a fresh clone: install the npm packages when node_modules is missing, then run the
// launcher (server/main.ts) under tsx. Plain Node on purpose: it runs before anything is installed.
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

if (!fs.existsSync(path.join(root, 'node_modules', '.bin', 'tsx'))) {
  console.log('[counterweight] node_modules is missing: running npm ci (a few minutes the first time)…');
  const r = spawnSync('npm', ['ci'], { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) {
    console.error('[counterweight] npm ci failed; see the messages above.');
    process.exit(r.status ?? 1);
  }
}

const child = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'server', 'main.ts')], {
  cwd: root,
  stdio: 'inherit',
});
// A Ctrl-C reaches the whole process group, the launcher included; a signal sent to us alone is
// passed on. Either way we wait for the launcher, which stops Express and then MariaDB.
for (const sig of ['SIGINT', 'SIGTERM']) {
  process.on(sig, () => {
    if (child.exitCode === null) child.kill(sig);
  });
}
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
