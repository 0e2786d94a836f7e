/**
 * The web app's fonts as WOFF2 subsets: copies the subsets we use from the installed @fontsource
 * packages into public/fonts/ (which `expo export` copies as is into dist/fonts/) under names that
 * carry a hash of their bytes, and writes the matching `@font-face` rules (`font-display: swap`,
 * so text is never hidden while a font loads) and `<link rel="preload">` tags into public/index.html
 * between the `cw-fonts` markers.
 *
 * Each weight is its own family, named as in components/theme.ts (`fonts`), as expo-font names them
 * on native. Subsets: latin, latin-ext and greek where the family has it (IBM Plex Mono has no
 * greek); the unicode-range of each is fontsource's own (its unicode.json), so the browser fetches
 * a subset only when the page holds one of its characters. µ, ×, ², ¹ are in latin; Ω, Δ, η in
 * greek. Characters in none of them (superscript minus ⁻, →, √, ≤) come from a system font.
 *
 * Run after updating a @fontsource package: `npx tsx scripts/web-fonts.ts`.
 * tests/server/web-fonts.test.ts fails while public/ is out of step with the installed packages.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

type Subset = 'latin' | 'latin-ext' | 'greek';

interface FamilySpec {
  family: string;
  pkg: string;
  weight: 400 | 600;
  subsets: Subset[];
  /** Preload the latin file: the body and heading faces, and the interface's sans. */
  preload: boolean;
}

/**
 * The families of components/theme.ts `fonts` (its names, written out: theme.ts imports react-native,
 * which a Node script cannot load), each weight a family of its own.
 */
const fonts = {
  sans: 'IBMPlexSans_400Regular',
  sansSemiBold: 'IBMPlexSans_600SemiBold',
  serif: 'SourceSerif4_400Regular',
  serifSemiBold: 'SourceSerif4_600SemiBold',
  mono: 'IBMPlexMono_400Regular',
};

export const FAMILIES: FamilySpec[] = [
  { family: fonts.serif, pkg: 'source-serif-4', weight: 400, subsets: ['latin', 'latin-ext', 'greek'], preload: true },
  { family: fonts.serifSemiBold, pkg: 'source-serif-4', weight: 600, subsets: ['latin', 'latin-ext', 'greek'], preload: true },
  { family: fonts.sans, pkg: 'ibm-plex-sans', weight: 400, subsets: ['latin', 'latin-ext', 'greek'], preload: true },
  { family: fonts.sansSemiBold, pkg: 'ibm-plex-sans', weight: 600, subsets: ['latin', 'latin-ext', 'greek'], preload: false },
  { family: fonts.mono, pkg: 'ibm-plex-mono', weight: 400, subsets: ['latin', 'latin-ext'], preload: false },
];

export interface FontFile {
  family: string;
  subset: Subset;
  /** Where the file comes from (in node_modules). */
  source: string;
  /** Its name in public/fonts/ and dist/fonts/: `<package>-<subset>-<weight>.<hash>.woff2`. */
  name: string;
  /** The page's URL of it. */
  url: string;
  unicodeRange: string;
  preload: boolean;
}

export const FONT_DIR = 'fonts';
const START = '<!-- cw-fonts:start -->';
const END = '<!-- cw-fonts:end -->';

/** The files the web app serves, from the packages installed under `root`. */
export function fontFiles(root: string): FontFile[] {
  return FAMILIES.flatMap((f) => {
    const pkgDir = path.join(root, 'node_modules', '@fontsource', f.pkg);
    const ranges = JSON.parse(fs.readFileSync(path.join(pkgDir, 'unicode.json'), 'utf8')) as Record<string, string>;
    return f.subsets.map((subset): FontFile => {
      const source = path.join(pkgDir, 'files', `${f.pkg}-${subset}-${f.weight}-normal.woff2`);
      const hash = crypto.createHash('sha256').update(fs.readFileSync(source)).digest('hex').slice(0, 10);
      const name = `${f.pkg}-${subset}-${f.weight}.${hash}.woff2`;
      if (!ranges[subset]) throw new Error(`@fontsource/${f.pkg} has no unicode-range for ${subset}`);
      return { family: f.family, subset, source, name, url: `/${FONT_DIR}/${name}`, unicodeRange: ranges[subset], preload: f.preload && subset === 'latin' };
    });
  });
}

/** The preload tags and the @font-face rules, as they stand in public/index.html. */
export function fontBlock(files: FontFile[]): string {
  const preloads = files.filter((f) => f.preload).map((f) => `<link rel="preload" href="${f.url}" as="font" type="font/woff2" crossorigin />`);
  const faces = files.map(
    (f) =>
      `@font-face{font-family:${f.family};font-style:normal;font-weight:400;font-display:swap;src:url(${f.url}) format('woff2');unicode-range:${f.unicodeRange}}`,
  );
  return [
    START,
    '    <!-- Written by scripts/web-fonts.ts: WOFF2 subsets of @fontsource, shown in a system font until they load (font-display: swap). -->',
    ...preloads.map((l) => `    ${l}`),
    '    <style id="cw-fonts">',
    ...faces.map((r) => `      ${r}`),
    '    </style>',
    `    ${END}`,
  ].join('\n');
}

/** public/index.html with the block between the markers replaced. */
export function withFontBlock(html: string, block: string): string {
  const a = html.indexOf(START);
  const b = html.indexOf(END);
  if (a < 0 || b < a) throw new Error(`public/index.html has no ${START} … ${END} markers`);
  return html.slice(0, a) + block + html.slice(b + END.length);
}

function main() {
  const root = path.resolve(__dirname, '..');
  const files = fontFiles(root);
  const dir = path.join(root, 'public', FONT_DIR);
  fs.mkdirSync(dir, { recursive: true });
  const wanted = new Set(files.map((f) => f.name));
  for (const name of fs.readdirSync(dir)) if (!wanted.has(name)) fs.rmSync(path.join(dir, name));
  for (const f of files) fs.copyFileSync(f.source, path.join(dir, f.name));
  const index = path.join(root, 'public', 'index.html');
  fs.writeFileSync(index, withFontBlock(fs.readFileSync(index, 'utf8'), fontBlock(files)));
  const bytes = files.reduce((n, f) => n + fs.statSync(f.source).size, 0);
  console.log(`${files.length} WOFF2 files (${Math.round(bytes / 1024)} KB) in public/${FONT_DIR}/, ${files.filter((f) => f.preload).length} preloaded`);
}

if (require.main === module) main();
