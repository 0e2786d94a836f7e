/**
 * Builds the web app with `expo export` when dist/ is missing or older than its sources, with a
 * readable log (see filterExportLog), then writes a brotli and a gzip copy beside each text file
 * (precompress), which the server sends as they are (server/app.ts, express-static-gzip).
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

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
  const kb = (n: number) => `${Math.round(n / 1024)} KB`;
  const c = precompress(distDir);
  log(`Precompressed ${c.files} files: ${kb(c.bytes)} → ${kb(c.br)} brotli, ${kb(c.gz)} gzip.`);
  log(`Web app built in ${((Date.now() - started) / 1000).toFixed(0)} s.`);
}

/** The files worth compressing: text formats (and TrueType, which is not compressed inside). */
export const COMPRESSIBLE = /\.(js|css|html|json|svg|ttf|woff2)$/;
/** Below this, a compressed copy saves less than the headers it costs. */
export const MIN_COMPRESS_BYTES = 1024;

function walk(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((d) => (d.isDirectory() ? walk(path.join(dir, d.name)) : [path.join(dir, d.name)]));
}

/**
 * Writes `<file>.br` (brotli, quality 11: the slowest and smallest, paid once at build) and
 * `<file>.gz` (gzip level 9) beside every compressible file of `distDir` of at least
 * MIN_COMPRESS_BYTES, unless the copy would not be smaller; drops copies whose original is gone.
 * Returns the files compressed and the bytes before and after.
 */
export function precompress(distDir: string): { files: number; bytes: number; br: number; gz: number } {
  const all = walk(distDir);
  const present = new Set(all);
  const totals = { files: 0, bytes: 0, br: 0, gz: 0 };
  for (const file of all) {
    if (/\.(br|gz)$/.test(file)) {
      if (!present.has(file.replace(/\.(br|gz)$/, ''))) fs.rmSync(file);
      continue;
    }
    if (!COMPRESSIBLE.test(file)) continue;
    const data = fs.readFileSync(file);
    if (data.length < MIN_COMPRESS_BYTES) continue;
    const br = zlib.brotliCompressSync(data, {
      params: {
        [zlib.constants.BROTLI_PARAM_QUALITY]: zlib.constants.BROTLI_MAX_QUALITY,
        [zlib.constants.BROTLI_PARAM_MODE]: /\.(ttf|woff2)$/.test(file) ? zlib.constants.BROTLI_MODE_GENERIC : zlib.constants.BROTLI_MODE_TEXT,
        [zlib.constants.BROTLI_PARAM_SIZE_HINT]: data.length,
      },
    });
    const gz = zlib.gzipSync(data, { level: 9 });
    let wrote = false;
    for (const [ext, out] of [['.br', br], ['.gz', gz]] as const) {
      if (out.length < data.length) {
        fs.writeFileSync(file + ext, out);
        wrote = true;
      } else {
        fs.rmSync(file + ext, { force: true });
      }
    }
    if (!wrote) continue;
    totals.files++;
    totals.bytes += data.length;
    totals.br += Math.min(br.length, data.length);
    totals.gz += Math.min(gz.length, data.length);
  }
  return totals;
}

// `npm run build:web`: build into dist/ now, stale or not, with the same readable log.
if (require.main === module) {
  const root = path.resolve(__dirname, '..');
  buildWeb(root, path.join(root, 'dist'));
}
