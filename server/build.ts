/**
 * Builds the web app with `expo export` when dist/ is missing or older than its sources, with a
 * readable log (see filterExportLog).
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const SOURCES = ['app', 'components', 'shared', 'assets', 'public', 'app.json', 'babel.config.js', 'package.json', 'package-lock.json'];

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

/**
 * The one known warning of the web export, told once instead of printed in full: Metro cannot
 * follow the font URLs in KaTeX's stylesheet ("Importing local resources in CSS is not supported
 * yet"), and prints the whole minified stylesheet as a code frame for each of its 60 URLs (about
 * 1.5 MB of log on a cold cache). Harmless: components/markdown/katexFonts.ts bundles those fonts.
 * Returns the log without those frames (and Babel's deprecation notice they set off) and how many
 * there were.
 */
export function filterExportLog(text: string): { text: string; katexUrls: number } {
  const out: string[] = [];
  let katexUrls = 0;
  let inFrame = false;
  for (const line of text.split('\n')) {
    if (/^Importing local resources in CSS is not supported yet\. \(node_modules\/katex\//.test(line)) {
      katexUrls++;
      inFrame = true;
      continue;
    }
    // The code frame under it: "> 1 | …", "    | ^", "  2 |".
    if (inFrame && /^(>|\s)\s*\d*\s*\|/.test(line)) continue;
    inFrame = false;
    if (katexUrls > 0 && /DeprecationWarning: Passing lineNumber and colNumber is deprecated to @babel\/code-frame|^\(Use `node --trace-deprecation/.test(line)) {
      continue;
    }
    out.push(line);
  }
  return { text: out.join('\n'), katexUrls };
}

export function buildWeb(root: string, distDir: string, log: (m: string) => void = console.log): void {
  log('Building the web app (expo export, about a minute on 2 cores)…');
  const started = Date.now();
  const r = spawnSync(
    process.execPath,
    [path.join(root, 'node_modules/expo/bin/cli'), 'export', '--platform', 'web', '--output-dir', distDir],
    {
      cwd: root,
      stdio: ['ignore', 'pipe', 'pipe'],
      encoding: 'utf8',
      maxBuffer: 256 * 1024 * 1024,
      env: { ...process.env, CI: '1', EXPO_NO_TELEMETRY: '1' },
    },
  );
  for (const [stream, text] of [
    [process.stdout, r.stdout],
    [process.stderr, r.stderr],
  ] as const) {
    const filtered = filterExportLog(text ?? '');
    if (filtered.text.trim()) stream.write(filtered.text.endsWith('\n') ? filtered.text : `${filtered.text}\n`);
    if (filtered.katexUrls) {
      log(`(${filtered.katexUrls} notices that Metro cannot follow the font URLs of katex.min.css left out: components/markdown/katexFonts.ts bundles those fonts.)`);
    }
  }
  if (r.error) throw r.error;
  if (r.status !== 0) throw new Error(`expo export failed with exit code ${r.status}`);
  log(`Web app built in ${((Date.now() - started) / 1000).toFixed(0)} s.`);
}

// `npm run build:web`: build into dist/ now, stale or not, with the same readable log.
if (require.main === module) {
  const root = path.resolve(__dirname, '..');
  buildWeb(root, path.join(root, 'dist'));
}
