#!/usr/bin/env node
// Renders the app's images from their sources in assets/src with Debian's Chromium (headless, no
// network): `node assets/render.mjs`. Writes
//   icon.png            1024 × 1024, the mark (app.json "icon")
//   favicon.png         48 × 48, the mark (app.json "web.favicon")
//   social-preview.png  1200 × 630, the mark with the name (the page's og:image), also copied to
//                       public/ so that the web export serves it at /social-preview.png
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const src = path.join(here, 'src');
const chromium = process.env.CHROMIUM ?? '/usr/bin/chromium';
const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-assets-'));

function shoot(url, out, width, height) {
  const r = spawnSync(
    chromium,
    [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--hide-scrollbars',
      '--force-device-scale-factor=1',
      `--user-data-dir=${path.join(tmp, 'profile')}`,
      `--window-size=${width},${height}`,
      `--screenshot=${out}`,
      url,
    ],
    { encoding: 'utf8' },
  );
  if (r.status !== 0 || !fs.existsSync(out)) throw new Error(`chromium could not render ${url}: ${r.stderr}`);
  console.log(`${path.relative(process.cwd(), out)} (${width} × ${height})`);
}

/** The mark scaled to size × size, through a page of that size. */
function mark(out, size) {
  const page = path.join(src, `.mark-${size}.html`);
  fs.writeFileSync(page, `<html><body style="margin:0;overflow:hidden"><img src="mark.svg" width="${size}" height="${size}" style="display:block"></body></html>`);
  try {
    shoot(`file://${page}`, out, size, size);
  } finally {
    fs.rmSync(page, { force: true });
  }
}

try {
  mark(path.join(here, 'icon.png'), 1024);
  mark(path.join(here, 'favicon.png'), 48);
  shoot(`file://${path.join(src, 'social-preview.html')}`, path.join(here, 'social-preview.png'), 1200, 630);
  fs.copyFileSync(path.join(here, 'social-preview.png'), path.join(here, '..', 'public', 'social-preview.png'));
} finally {
  fs.rmSync(tmp, { recursive: true, force: true });
}
