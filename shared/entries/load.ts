/**
 * Entries as files (DESIGN.md §7): content/entries/<slug>.md holds one entry — YAML front matter
 * between `---` lines, then a Markdown body whose level-2 headings are exactly the BODY_SECTIONS
 * titles (schema.ts), in that order. The long Markdown sections live in the body; everything else
 * (slug, title, laws, worksheets, sources, …) lives in the front matter.
 *
 *   const entry = parseEntryFile(text, 'photon-box.md');   // throws EntryFileError naming file and line
 *   const text2 = serializeEntryFile(entry);               // parse(serialize(x)) deep-equals x
 *
 * Pure TypeScript, no Node-only APIs: the caller reads and writes the files, so this module runs in
 * the browser too. The YAML is read with the `yaml` package and a LineCounter, so that every problem
 * carries the line of the file it was found on.
 */
import { Document, LineCounter, isMap, isNode, isScalar, parseDocument } from 'yaml';
import { kitFunctions } from '../checks/kit-functions';
import { validateWorksheet } from '../worksheet/evaluate';
import { BODY_SECTIONS, IN_BRIEF_MAX_WORDS, entryFileSchema, wordCount, type EntryFile } from './schema';

/** One problem in an entry file. */
export interface EntryFileProblem {
  /** The field, e.g. "inBrief", "sources.2.csl.title", "worksheets.0.steps.1.expression", "yaml", "body". */
  field: string;
  message: string;
  /** 1-based line in the file, when known. */
  line?: number;
}

/**
 * A malformed entry file. The message is `"<file>:<line>: <field>: <problem>"` for the first problem
 * (further problems, if any, follow on their own lines in the same form); `.line` and `.field` are
 * those of the first problem and `.problems` lists them all.
 */
export class EntryFileError extends Error {
  readonly fileName: string;
  readonly line?: number;
  readonly field?: string;
  readonly problems: EntryFileProblem[];
  constructor(fileName: string, problems: EntryFileProblem[]) {
    const list = problems.length ? problems : [{ field: 'file', message: 'malformed entry file' }];
    super(list.map((p) => `${fileName}${p.line ? `:${p.line}` : ''}: ${p.field}: ${p.message}`).join('\n'));
    this.name = 'EntryFileError';
    this.fileName = fileName;
    this.line = list[0].line;
    this.field = list[0].field;
    this.problems = list;
    Object.setPrototypeOf(this, EntryFileError.prototype);
  }
}

export interface ParseEntryOptions {
  /**
   * Also compile every worksheet and evaluate it at its defaults (syntax, unknown names, units,
   * dimension errors), with the check-kit functions available. Default true; the schema alone
   * (entryFileSchema) is checked either way.
   */
  checkWorksheets?: boolean;
}

type BodyKey = keyof typeof BODY_SECTIONS;
const BODY_KEYS = Object.keys(BODY_SECTIONS) as BodyKey[];
const TITLE_TO_KEY = new Map<string, BodyKey>(BODY_KEYS.map((k) => [BODY_SECTIONS[k], k]));
/** Sections the schema requires to be non-empty. */
const REQUIRED_SECTIONS: ReadonlySet<BodyKey> = new Set<BodyKey>(['inBrief', 'howItIsPitched', 'whyItFails']);

/** Front-matter keys, in the order serializeEntryFile writes them. */
const FRONT_MATTER_KEYS = [
  'slug',
  'title',
  'aliases',
  'mechanismClass',
  'laws',
  'author',
  'reviewer',
  'changeNote',
  'related',
  'questionsToAsk',
  'repliesAndAnswers',
  'worksheets',
  'sources',
] as const;

// Every field of the schema is either in the front matter or in the body (checked once, at load).
{
  const all = new Set<string>([...FRONT_MATTER_KEYS, ...BODY_KEYS]);
  const shape = Object.keys(entryFileSchema.shape);
  const missing = shape.filter((k) => !all.has(k));
  if (missing.length) throw new Error(`shared/entries/load.ts does not know where to put ${missing.join(', ')}`);
}

const ATX_HEADING = /^ {0,3}(#{1,6})(?:[ \t]+(.*?))?(?:[ \t]+#+)?[ \t]*$/;
const FENCE = /^ {0,3}(`{3,}|~{3,})/;
const SETEXT_H2 = /^ {0,3}-+[ \t]*$/;

interface BodyLine {
  text: string;
  /** 1-based line in the file. */
  line: number;
}

interface Section {
  key: BodyKey;
  /** Line of the heading. */
  line: number;
  lines: BodyLine[];
}

/** Strips leading and trailing blank lines and trailing whitespace at the very end. */
function sectionText(lines: BodyLine[]): string {
  let a = 0;
  let b = lines.length;
  while (a < b && lines[a].text.trim() === '') a++;
  while (b > a && lines[b - 1].text.trim() === '') b--;
  return lines
    .slice(a, b)
    .map((l) => l.text)
    .join('\n')
    .replace(/\s+$/, '');
}

/**
 * Walks Markdown lines outside fenced code blocks and reports level-1/2 headings (ATX, and setext
 * level 2: a line of dashes right under paragraph text).
 */
function scanHeadings(lines: string[], onHeading: (index: number, level: number, title: string, setext: boolean) => void): void {
  let fence: string | null = null;
  let prevParagraph = false;
  lines.forEach((raw, i) => {
    const fm = FENCE.exec(raw);
    if (fence) {
      if (fm && fm[1][0] === fence[0] && fm[1].length >= fence.length && raw.trim() === fm[1]) fence = null;
      prevParagraph = false;
      return;
    }
    if (fm) {
      fence = fm[1];
      prevParagraph = false;
      return;
    }
    const h = ATX_HEADING.exec(raw);
    if (h) {
      if (h[1].length <= 2) onHeading(i, h[1].length, (h[2] ?? '').trim(), false);
      prevParagraph = false;
      return;
    }
    if (prevParagraph && SETEXT_H2.test(raw)) {
      onHeading(i, 2, lines[i - 1].trim(), true);
      prevParagraph = false;
      return;
    }
    const blank = raw.trim() === '';
    // Indented code (4+ spaces) after a blank line is not paragraph text; close enough for our files.
    prevParagraph = !blank && !/^ {4,}/.test(raw) && !/^ {0,3}([*_=-])\1*\s*$/.test(raw);
  });
}

function splitBody(bodyLines: BodyLine[], problems: EntryFileProblem[]): { sections: Section[]; lastLine: number } {
  const sections: Section[] = [];
  const texts = bodyLines.map((l) => l.text);
  const headingAt = new Map<number, { level: number; title: string; setext: boolean }>();
  scanHeadings(texts, (i, level, title, setext) => headingAt.set(i, { level, title, setext }));
  let current: Section | null = null;
  const seen = new Map<BodyKey, number>();
  let lastOrder = -1;
  let strayReported = false;
  /** After a refused heading, its text is not reported again as text outside a section. */
  let skipping = false;
  for (let i = 0; i < bodyLines.length; i++) {
    const bl = bodyLines[i];
    const h = headingAt.get(i);
    if (h) {
      if (h.setext) {
        problems.push({
          field: 'body',
          line: bl.line,
          message: 'a line of dashes under text makes a level-2 heading; use "## <section>" for a section, "###" for a sub-heading, or a blank line before "---" for a rule',
        });
        continue;
      }
      if (h.level === 1) {
        problems.push({ field: 'body', line: bl.line, message: `"# ${h.title}" is a level-1 heading; sections are level-2 headings ("## In brief" …)` });
        continue;
      }
      const key = TITLE_TO_KEY.get(h.title);
      if (!key) {
        const titles = BODY_KEYS.map((k) => `"${BODY_SECTIONS[k]}"`).join(', ');
        const near = BODY_KEYS.find((k) => BODY_SECTIONS[k].toLowerCase() === h.title.toLowerCase());
        problems.push({
          field: 'body',
          line: bl.line,
          message: near
            ? `unknown section heading "## ${h.title}"; write it as "## ${BODY_SECTIONS[near]}"`
            : `unknown section heading "## ${h.title}"; the sections are ${titles} (use "###" for a sub-heading)`,
        });
        current = null;
        skipping = true;
        continue;
      }
      if (seen.has(key)) {
        problems.push({ field: key, line: bl.line, message: `the section "## ${h.title}" appears twice (first on line ${seen.get(key)})` });
        current = null;
        skipping = true;
        continue;
      }
      const order = BODY_KEYS.indexOf(key);
      if (order < lastOrder) {
        problems.push({
          field: key,
          line: bl.line,
          message: `the section "## ${h.title}" is out of order; the order is ${BODY_KEYS.map((k) => `"${BODY_SECTIONS[k]}"`).join(', ')}`,
        });
      }
      lastOrder = Math.max(lastOrder, order);
      seen.set(key, bl.line);
      current = { key, line: bl.line, lines: [] };
      sections.push(current);
      continue;
    }
    if (current) current.lines.push(bl);
    else if (bl.text.trim() !== '' && !strayReported && !skipping) {
      strayReported = true;
      problems.push({ field: 'body', line: bl.line, message: 'text outside a section; every paragraph of the body belongs under a "## <section>" heading' });
    }
  }
  return { sections, lastLine: bodyLines.length ? bodyLines[bodyLines.length - 1].line : 1 };
}

function pathKey(path: readonly PropertyKey[]): string {
  return path.map((p) => String(p)).join('.');
}

/** Parses and validates one entry file. Throws EntryFileError naming the file, the field and the line. */
export function parseEntryFile(text: string, fileName: string, opts: ParseEntryOptions = {}): EntryFile {
  const src = text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
  const lines = src.split('\n');
  const fail = (problems: EntryFileProblem[]): never => {
    throw new EntryFileError(fileName, problems);
  };

  // ---- front matter
  if (lines[0]?.trimEnd() !== '---') {
    fail([{ field: 'front matter', line: 1, message: 'the file must begin with a "---" line, the YAML front matter and another "---" line' }]);
  }
  let close = -1;
  for (let i = 1; i < lines.length; i++) {
    if (lines[i].trimEnd() === '---' || lines[i].trimEnd() === '...') {
      close = i;
      break;
    }
  }
  if (close < 0) fail([{ field: 'front matter', line: 1, message: 'the front matter is not closed by a "---" line' }]);
  const yamlText = lines.slice(1, close).join('\n');
  /** File line of a front-matter offset: the YAML starts on line 2. */
  const lineCounter = new LineCounter();
  const doc = parseDocument(yamlText, { lineCounter, prettyErrors: false, uniqueKeys: true });
  const fileLine = (offset: number) => lineCounter.linePos(offset).line + 1;
  if (doc.errors.length > 0) {
    fail(
      doc.errors.map((e) => ({
        field: 'yaml',
        message: e.message.split('\n')[0],
        line: e.linePos?.[0]?.line !== undefined ? e.linePos[0].line + 1 : e.pos ? fileLine(e.pos[0]) : 2,
      })),
    );
  }
  if (!isMap(doc.contents)) {
    fail([{ field: 'front matter', line: 2, message: 'the front matter must be a YAML mapping of fields (slug:, title:, …)' }]);
  }
  /** The deepest node of the path that exists in the front matter (a missing field points at its parent). */
  const lineOf = (path: readonly PropertyKey[]): number | undefined => {
    const parts = path.map((p) => (typeof p === 'number' || /^\d+$/.test(String(p)) ? Number(p) : String(p)));
    for (let n = parts.length; n >= 0; n--) {
      const node = n === 0 ? doc.contents : doc.getIn(parts.slice(0, n), true);
      if (isNode(node) && node.range) return fileLine(node.range[0]);
    }
    return undefined;
  };

  const problems: EntryFileProblem[] = [];
  const fm = doc.toJS({ maxAliasCount: 50 }) as Record<string, unknown>;
  const known = new Set<string>(FRONT_MATTER_KEYS);
  if (isMap(doc.contents)) {
    for (const pair of doc.contents.items) {
      const key = isScalar(pair.key) ? String(pair.key.value) : String(pair.key);
      const at = isNode(pair.key) && pair.key.range ? fileLine(pair.key.range[0]) : undefined;
      if ((BODY_KEYS as string[]).includes(key)) {
        problems.push({ field: key, line: at, message: `this section belongs in the body, under "## ${BODY_SECTIONS[key as BodyKey]}"` });
      } else if (!known.has(key)) {
        problems.push({ field: key, line: at, message: `unknown field; the front matter has ${FRONT_MATTER_KEYS.join(', ')}` });
      }
    }
  }

  // ---- body
  const bodyLines: BodyLine[] = lines.slice(close + 1).map((t, i) => ({ text: t, line: close + 2 + i }));
  const { sections, lastLine } = splitBody(bodyLines, problems);
  const body: Partial<Record<BodyKey, string>> = {};
  for (const s of sections) body[s.key] = sectionText(s.lines);
  const headingLine = new Map(sections.map((s) => [s.key, s.line]));
  const lineForSection = (key: BodyKey): number => {
    const at = headingLine.get(key);
    if (at !== undefined) return at;
    // Where it should have been: the heading of the next section present, or the end of the file.
    const next = BODY_KEYS.slice(BODY_KEYS.indexOf(key) + 1).find((k) => headingLine.has(k));
    return next ? (headingLine.get(next) as number) : lastLine;
  };
  for (const key of BODY_KEYS) {
    if (!REQUIRED_SECTIONS.has(key)) continue;
    if (!headingLine.has(key)) {
      problems.push({ field: key, line: lineForSection(key), message: `the required section "## ${BODY_SECTIONS[key]}" is missing` });
    } else if ((body[key] ?? '') === '') {
      problems.push({ field: key, line: lineForSection(key), message: `the section "## ${BODY_SECTIONS[key]}" is empty` });
    }
  }
  if (body.inBrief !== undefined && wordCount(body.inBrief) > IN_BRIEF_MAX_WORDS) {
    problems.push({
      field: 'inBrief',
      line: lineForSection('inBrief'),
      message: `"In brief" has ${wordCount(body.inBrief)} words; at most ${IN_BRIEF_MAX_WORDS} are allowed`,
    });
  }
  if (problems.length) fail(problems);

  // ---- schema
  const candidate: Record<string, unknown> = { ...fm };
  for (const key of BODY_KEYS) if (body[key] !== undefined) candidate[key] = body[key];
  const parsed = entryFileSchema.safeParse(candidate);
  if (!parsed.success) {
    const seenFields = new Set<string>();
    for (const issue of parsed.error.issues) {
      const field = pathKey(issue.path) || 'front matter';
      if (seenFields.has(field)) continue;
      seenFields.add(field);
      const top = String(issue.path[0] ?? '');
      const line = (BODY_KEYS as string[]).includes(top) ? lineForSection(top as BodyKey) : lineOf(issue.path);
      problems.push({ field, line, message: issue.message });
    }
    fail(problems);
  }
  const entry = parsed.data as EntryFile;

  // ---- worksheets: compile and run at the defaults
  if (opts.checkWorksheets !== false) {
    entry.worksheets.forEach((ws, i) => {
      const r = validateWorksheet(ws, { functions: kitFunctions });
      if (r.ok) return;
      for (const [f, message] of Object.entries(r.fields)) {
        const rest = f.split('.').slice(1);
        problems.push({ field: ['worksheets', i, ...rest].join('.'), line: lineOf(['worksheets', i, ...rest]), message });
      }
    });
    const names = new Map<string, number>();
    entry.worksheets.forEach((ws, i) => {
      if (names.has(ws.name)) {
        problems.push({ field: `worksheets.${i}.name`, line: lineOf(['worksheets', i, 'name']), message: `"${ws.name}" is already the name of worksheet ${names.get(ws.name)}` });
      } else names.set(ws.name, i);
    });
    if (problems.length) fail(problems);
  }
  return entry;
}

/** Finds a line of section text that parseEntryFile would read as a heading (so it cannot round-trip). */
function headingProblem(text: string): string | undefined {
  let found: string | undefined;
  scanHeadings(text.split('\n'), (_i, level, title, setext) => {
    if (!found) found = setext ? `a line of dashes under "${title}" (a level-2 heading)` : `a level-${level} heading "${title}"`;
  });
  return found;
}

/**
 * Writes an entry in the file format parseEntryFile reads: front matter in a fixed key order, then
 * the body sections (empty optional sections are left out). Throws EntryFileError when a section's
 * text holds a level-1 or level-2 heading of its own, which would not read back as the same entry.
 */
export function serializeEntryFile(entry: EntryFile): string {
  const problems: EntryFileProblem[] = [];
  for (const key of BODY_KEYS) {
    const p = headingProblem(entry[key] ?? '');
    if (p) problems.push({ field: key, message: `the text holds ${p}; use "###" for sub-headings inside a section` });
  }
  if (problems.length) throw new EntryFileError(`${entry.slug}.md`, problems);

  const front: Record<string, unknown> = {};
  for (const key of FRONT_MATTER_KEYS) {
    const v = (entry as Record<string, unknown>)[key];
    if (v !== undefined) front[key] = v;
  }
  const doc = new Document(front);
  const yamlText = doc.toString({ lineWidth: 100, minContentWidth: 40 });
  const parts = ['---', yamlText.replace(/\n+$/, ''), '---', ''];
  for (const key of BODY_KEYS) {
    const text = (entry[key] ?? '').replace(/^(?:[ \t]*\n)+/, '').replace(/\s+$/, '');
    if (text === '' && !REQUIRED_SECTIONS.has(key)) continue;
    parts.push(`## ${BODY_SECTIONS[key]}`, '', text, '');
  }
  return parts.join('\n');
}
