/**
 * The words of the starter library (issue 12, "Sources and wording"): what a reader sees in content/
 * never says a citation or a figure is "from memory" (doubts live in editor-only YAML comments), the
 * section on what can mimic an effect describes measurement artifacts and accuses no one, no text
 * anywhere insinuates fraud, and every entry's cautions defer to local codes and licensed practice.
 *
 * "Reader-visible" is every string value of the YAML (front matter, worksheets, taxonomy, synonyms,
 * demo data) and the Markdown body of an entry; YAML comments are not, since the loader drops them.
 * The files are read here with Node's fs and split without the entry loader, so that a malformed file
 * fails its own test in load.test.ts rather than this one.
 */
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { parse as parseYaml } from 'yaml';
import { BODY_SECTIONS } from './schema';

const ROOT = join(__dirname, '..', '..', 'content');

interface Text {
  /** File relative to content/, then the YAML path of the value or the body. */
  where: string;
  text: string;
}

function filesUnder(dir: string): string[] {
  return readdirSync(dir)
    .sort()
    .flatMap((name) => {
      const full = join(dir, name);
      if (statSync(full).isDirectory()) return filesUnder(full);
      return /\.(md|ya?ml)$/.test(name) ? [full] : [];
    });
}

/** Every string value in a parsed YAML document, with its path. */
function strings(value: unknown, where: string, out: Text[]): Text[] {
  if (typeof value === 'string') out.push({ where, text: value });
  else if (Array.isArray(value)) value.forEach((v, i) => strings(v, `${where}.${i}`, out));
  else if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) strings(v, `${where}.${k}`, out);
  }
  return out;
}

/** Splits an entry file into its front matter (YAML text) and its Markdown body. */
function splitEntry(source: string): { front: string; body: string } {
  const m = /^---\r?\n([\s\S]*?)\r?\n---[ \t]*(?:\r?\n|$)([\s\S]*)$/.exec(source);
  return m ? { front: m[1], body: m[2] } : { front: '', body: source };
}

/** The reader-visible texts of one file of content/ (name relative to content/, for messages). */
function readerTexts(name: string, source: string): Text[] {
  if (name.endsWith('.md')) {
    const { front, body } = splitEntry(source);
    return [...strings(parseYaml(front), `${name}:front`, []), { where: `${name}:body`, text: body }];
  }
  return strings(parseYaml(source), name, []);
}

/** The text under one level-2 heading of an entry's body (empty when the section is absent). */
function section(body: string, title: string): string {
  const lines = body.split(/\r?\n/);
  const start = lines.findIndex((l) => l.trim() === `## ${title}`);
  if (start < 0) return '';
  const end = lines.findIndex((l, i) => i > start && /^##\s/.test(l));
  return lines.slice(start + 1, end < 0 ? undefined : end).join('\n');
}

const FROM_MEMORY = /from\s+memory/i;

/** Words that accuse people rather than describe a mechanism (the section on artifacts uses none). */
const ACCUSATION =
  /\b(fak(e|es|ed|ing|ery)|trick(s|ed|ery|ster)?|hoax(es|er)?|fraud(s|ster|ulent)?|decei(t|tful|ve|ved|ves|ving)|decept(ion|ive)|dishonest(y)?|liars?|scam(s|mer)?|swindl(e|er|ing)|cheat(s|ed|ing)?|con (man|artist)|sleight of hand|rigged|staged|hid(e|es|den|ing)|conceal(s|ed|ing|ment)?|secret(ly)?|edited (video|footage|recording)s?|doctored|manipulated (video|footage|data)|hidden (motor|drive|battery|batteries|wire|wires|magnet|supply|fuel))\b/i;

/** Words of accusation that have no place anywhere in the library, pitch quotes included. */
const ACCUSATION_ANYWHERE =
  /\b(fraud(s|ster|ulent)?|hoax(es|er)?|scam(s|mer)?|swindl(e|er|ing)|decei(t|tful|ve|ved|ves|ving)|decept(ion|ive)|dishonest(y)?|liars?|con (man|artist)|charlatan(s)?|quack(s|ery)?|edited (video|footage|recording)s?|doctored)\b/i;

const files = filesUnder(ROOT).map((full) => ({ name: relative(ROOT, full), source: readFileSync(full, 'utf8') }));
const entryFiles = files.filter((f) => f.name.startsWith('entries/') && f.name.endsWith('.md'));
const allTexts = files.flatMap((f) => readerTexts(f.name, f.source));

const offenders = (texts: Text[], pattern: RegExp) =>
  texts.filter((t) => pattern.test(t.text)).map((t) => `${t.where}: …${(pattern.exec(t.text) as RegExpExecArray)[0]}…`);

describe('the checker itself', () => {
  test('YAML comments are not reader-visible, values and the body are', () => {
    const source = [
      '---',
      'slug: example-entry',
      'sources:',
      '  - csl:',
      '      id: a-book-1999',
      '      publisher: Example Press # from memory',
      '    note: Chapter 3 (number from memory).',
      '---',
      '',
      '## In brief',
      '',
      'Text.',
    ].join('\n');
    const hits = offenders(readerTexts('entries/example-entry.md', source), FROM_MEMORY);
    expect(hits).toEqual(['entries/example-entry.md:front.sources.0.note: …from memory…']);
    expect(offenders(readerTexts('x.md', '---\nslug: x\n---\n\nA figure (from memory).\n'), FROM_MEMORY)).toHaveLength(1);
    expect(offenders(readerTexts('x.yml', '# from memory\nlabel: Density\n'), FROM_MEMORY)).toEqual([]);
    expect(offenders(readerTexts('x.yml', 'inputs:\n  - help: 998 kg/m³ (from memory)\n'), FROM_MEMORY)).toEqual([
      'x.yml.inputs.0.help: …from memory…',
    ]);
  });

  test('the sections are found by their headings, and accusing words are caught', () => {
    const body = `## In brief\n\nA fake.\n\n## ${BODY_SECTIONS.whatFakesTheEffect}\n\n- **Hidden drives** in the base.\n\n## Cautions\n\nFollow local codes.\n`;
    const artifacts = section(body, BODY_SECTIONS.whatFakesTheEffect);
    expect(artifacts).toContain('Hidden drives');
    expect(artifacts).not.toContain('A fake');
    expect(ACCUSATION.test(artifacts)).toBe(true);
    expect(ACCUSATION.test('- **Thermal drift** of the balance; **buoyancy** of warmed air; unmetered input.')).toBe(false);
    expect(ACCUSATION.test('Short or partial records that leave out the start.')).toBe(false);
    expect(ACCUSATION_ANYWHERE.test('the demonstration was a hoax')).toBe(true);
    expect(section(body, BODY_SECTIONS.cautions).trim()).toBe('Follow local codes.');
  });
});

describe('the library in content/', () => {
  test('there is something to check', () => {
    expect(entryFiles.length).toBeGreaterThanOrEqual(12);
    expect(files.some((f) => f.name === 'taxonomy.yml')).toBe(true);
    expect(files.some((f) => f.name.startsWith('worksheets/'))).toBe(true);
  });

  test('no reader-visible text says "from memory" (entries, citations, worksheets, taxonomy, demo)', () => {
    expect(offenders(allTexts, FROM_MEMORY)).toEqual([]);
  });

  test('the section on what can mimic an effect describes artifacts, with no words of accusation', () => {
    const found: string[] = [];
    for (const f of entryFiles) {
      const artifacts = section(splitEntry(f.source).body, BODY_SECTIONS.whatFakesTheEffect);
      const m = ACCUSATION.exec(artifacts);
      if (m) found.push(`${f.name}: …${m[0]}…`);
    }
    expect(found).toEqual([]);
  });

  test('no text anywhere insinuates fraud or deception', () => {
    expect(offenders(allTexts, ACCUSATION_ANYWHERE)).toEqual([]);
  });

  test("every entry's cautions defer to local codes and licensed practice", () => {
    const found: string[] = [];
    for (const f of entryFiles) {
      const cautions = section(splitEntry(f.source).body, BODY_SECTIONS.cautions);
      if (!/\blocal\b/i.test(cautions) || !/\blicensed\b/i.test(cautions)) found.push(f.name);
    }
    expect(found).toEqual([]);
  });
});
