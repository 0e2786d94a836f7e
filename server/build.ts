/** Builds the web app with `expo export` when dist/ is missing or older than its sources. */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const SOURCES = ['app', 'components', 'shared', 'assets', 'app.json', 'babel.config.js', 'package.json', 'package-lock.json'];

function newestMtime(p: string): number {
  let st: fs.Stats;
  try {
    st = fs.statSync(p);
  } catch {
    return 0;
  }
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const name of fs.readdirSync(p)) {
    if (name === 'node_modules' || name.startsWith('.')) continue;
    newest = Math.max(newest, newestMtime(path.join(p, name)));
  }
  return newest;
}

export function webBuildIsStale(root: string, distDir: string): boolean {
  let built: number;
  try {
    built = fs.statSync(path.join(distDir, 'index.html')).mtimeMs;
  } catch {
    return true;
  }
  return SOURCES.some((s) => newestMtime(path.join(root, s)) > built);
}

export function buildWeb(root: string, distDir: string, log: (m: string) => void = console.log): void {
  log('Building the web app (expo export, about a minute on 2 cores)…');
  const started = Date.now();
  const r = spawnSync(
    process.execPath,
    [path.join(root, 'node_modules/expo/bin/cli'), 'export', '--platform', 'web', '--output-dir', distDir],
    { cwd: root, stdio: ['ignore', 'inherit', 'inherit'], env: { ...process.env, CI: '1', EXPO_NO_TELEMETRY: '1' } },
  );
  if (r.status !== 0) throw new Error(`expo export failed with exit code ${r.status}`);
  log(`Web app built in ${((Date.now() - started) / 1000).toFixed(0)} s.`);
}
