// Runs `npm ci` when node_modules is missing, so that `npm start` and `npm test` work on a fresh
// clone. Plain Node on purpose: it runs before anything is installed.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export function ensureDeps() {
  if (fs.existsSync(path.join(root, 'node_modules', '.bin', 'tsx'))) return;
  console.log('[counterweight] node_modules is missing: running npm ci (a few minutes the first time)…');
  const r = spawnSync('npm', ['ci'], { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) {
    console.error('[counterweight] npm ci failed; see the messages above.');
    process.exit(r.status ?? 1);
  }
}

/** Runs a TypeScript file under tsx in a child process, passing on SIGINT/SIGTERM, and exits with its code. */
export async function runTs(file, args = []) {
  const { spawn } = await import('node:child_process');
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(root, file), ...args], {
    cwd: root,
    stdio: 'inherit',
    // @aws-sdk/client-s3 is pinned to a release that supports Node 20 (package.json); its notice that
    // releases from 2027 on will need Node 22 does not apply to that pin and would only clutter the log.
    env: { AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true', ...process.env },
  });
  // A Ctrl-C reaches the whole process group, the child included; a signal sent to us alone is passed on.
  for (const sig of ['SIGINT', 'SIGTERM']) {
    process.on(sig, () => {
      if (child.exitCode === null) child.kill(sig);
    });
  }
  child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
}
