/**
 * The starter library in content/entries and its loader (shared/entries/load.ts): every file parses,
 * every worksheet runs at its defaults, files round-trip through serializeEntryFile, references
 * between entries and to the taxonomy resolve, and malformed files are refused with their name and
 * line. (Reading the files uses Node's fs in the test only; the loader itself stays pure.)
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { parse as parseYaml } from 'yaml';
import { evaluateWorksheetWithKit } from '../compute';
import { EntryFileError, parseEntryFile, serializeEntryFile } from './load';
import { BODY_SECTIONS, IN_BRIEF_MAX_WORDS, wordCount, type EntryFile } from './schema';

const ROOT = join(__dirname, '..', '..', 'content');
const DIR = join(ROOT, 'entries');
const files = readdirSync(DIR)
  .filter((f) => f.endsWith('.md'))
  .sort();
const texts = new Map(files.map((f) => [f, readFileSync(join(DIR, f), 'utf8')]));
const entries = new Map<string, EntryFile>(files.map((f) => [f, parseEntryFile(texts.get(f) as string, f)]));

const taxonomy = parseYaml(readFileSync(join(ROOT, 'taxonomy.yml'), 'utf8')) as {
  laws: { slug: string }[];
  classes: { slug: string }[];
};
const accounts = parseYaml(readFileSync(join(ROOT, 'demo', 'accounts.yml'), 'utf8')) as {
  accounts: { email: string; role: string }[];
};

/** Throws unless `fn` throws an EntryFileError; returns it. */
function refusal(fn: () => unknown): EntryFileError {
  try {
    fn();
  } catch (e) {
    if (e instanceof EntryFileError) return e;
    throw new Error(`expected an EntryFileError, got ${String(e)}`);
  }
  throw new Error('expected an EntryFileError, but the file was accepted');
}

describe('the starter library', () => {
  test('has at least twelve entries, each named after its slug, slugs unique', () => {
    expect(files.length).toBeGreaterThanOrEqual(12);
    const slugs = [...entries.values()].map((e) => e.slug);
    expect(new Set(slugs).size).toBe(slugs.length);
    for (const [file, e] of entries) expect(`${e.slug}.md`).toBe(file);
  });

  test('covers the classes of mechanism the issue names', () => {
    const classes = new Set([...entries.values()].map((e) => e.mechanismClass));
    for (const c of [
      'internal-mass-motion',
      'enclosed-radiation',
      'sideways-beams',
      'gyroscopic-drive',
      'torque-free-spin',
      'overbalanced-wheel',
      'magnet-motor',
      'over-unity-circuit',
      'single-reservoir-engine',
      'vacuum-energy',
    ]) {
      expect(classes).toContain(c);
    }
    // Overbalanced and buoyancy wheels share a class: two entries.
    expect([...entries.values()].filter((e) => e.mechanismClass === 'overbalanced-wheel').length).toBeGreaterThanOrEqual(2);
  });

  test.each(files)('%s: laws and mechanism class exist in content/taxonomy.yml', (file) => {
    const e = entries.get(file) as EntryFile;
    const laws = new Set(taxonomy.laws.map((l) => l.slug));
    const classes = new Set(taxonomy.classes.map((c) => c.slug));
    expect(classes.has(e.mechanismClass)).toBe(true);
    expect(e.laws.length).toBeGreaterThan(0);
    for (const l of e.laws) expect(laws.has(l)).toBe(true);
  });

  test.each(files)('%s: related entries exist and are not the entry itself', (file) => {
    const e = entries.get(file) as EntryFile;
    const slugs = new Set([...entries.values()].map((x) => x.slug));
    expect(e.related.length).toBeGreaterThan(0);
    for (const r of e.related) {
      expect(slugs.has(r)).toBe(true);
      expect(r).not.toBe(e.slug);
    }
  });

  test.each(files)('%s: author and reviewer are two different demo editors', (file) => {
    const e = entries.get(file) as EntryFile;
    const editors = new Set(accounts.accounts.filter((a) => a.role === 'editor').map((a) => a.email));
    expect(editors.has(e.author)).toBe(true);
    expect(editors.has(e.reviewer)).toBe(true);
    expect(e.author).not.toBe(e.reviewer);
  });

  test('authorship alternates between the two editors', () => {
    const authors = new Set([...entries.values()].map((e) => e.author));
    expect(authors.size).toBe(2);
  });

  test.each(files)('%s: every section is filled in, In brief is short, 2–5 sources with notes', (file) => {
    const e = entries.get(file) as EntryFile;
    expect(wordCount(e.inBrief)).toBeLessThanOrEqual(IN_BRIEF_MAX_WORDS);
    for (const key of Object.keys(BODY_SECTIONS) as (keyof typeof BODY_SECTIONS)[]) expect(e[key].trim()).not.toBe('');
    expect(e.aliases.length).toBeGreaterThan(0);
    expect(e.repliesAndAnswers.length).toBeGreaterThan(0);
    expect(e.questionsToAsk.length).toBeGreaterThan(0);
    expect(e.sources.length).toBeGreaterThanOrEqual(2);
    expect(e.sources.length).toBeLessThanOrEqual(5);
    for (const s of e.sources) expect(s.note.trim()).not.toBe('');
    // Why it fails carries TeX math.
    expect(e.whyItFails).toMatch(/\$[^$]+\$/);
  });

  test.each(files)('%s: the text judges mechanisms, not people', (file) => {
    const text = (texts.get(file) as string).toLowerCase();
    for (const word of ['fraud', 'scam', 'liar', 'charlatan', 'hoax', 'swindl', 'crackpot', 'quack', 'con artist', 'snake oil', 'dishonest']) {
      expect({ file, word, found: text.includes(word) }).toEqual({ file, word, found: false });
    }
  });

  test.each(files)('%s: every worksheet evaluates at its defaults and every check gives a verdict', (file) => {
    const e = entries.get(file) as EntryFile;
    expect(e.worksheets.length).toBeGreaterThan(0);
    for (const ws of e.worksheets) {
      const r = evaluateWorksheetWithKit(ws);
      const errors = [...r.inputs, ...r.steps, ...r.checks].filter((x) => x.error).map((x) => x.error?.message);
      expect({ worksheet: ws.name, errors }).toEqual({ worksheet: ws.name, errors: [] });
      expect(r.ok).toBe(true);
      expect(ws.inputs.length).toBeGreaterThan(0);
      expect(r.checks.length).toBeGreaterThan(0);
      for (const c of r.checks) {
        expect(typeof c.holds).toBe('boolean');
        expect(c.message).toBeTruthy();
        // Every {name} quote was filled in with a value.
        expect(c.message).not.toMatch(/\{[A-Za-z][A-Za-z0-9_]*\}/);
      }
      for (const p of r.plots) {
        expect(p.error).toBeUndefined();
        for (const s of p.series) expect(s.values.some((v) => v !== null)).toBe(true);
      }
    }
  });

  test.each(files)('%s: parse → serialize → parse gives the same entry', (file) => {
    const e = entries.get(file) as EntryFile;
    const text = serializeEntryFile(e);
    const again = parseEntryFile(text, file);
    expect(again).toEqual(e);
    // And the written form is stable.
    expect(serializeEntryFile(again)).toBe(text);
  });
});

describe('worked numbers in the starter worksheets (hand calculations)', () => {
  const C = 299792458; // m/s, exact (BIPM SI Brochure, 9th ed., 2019)
  const G0 = 9.80665; // m/s², exact (3rd CGPM 1901; NIST SP 811 App. B)
  const step = (slug: string, ws: string, name: string, values: Record<string, string> = {}) => {
    const e = entries.get(`${slug}.md`) as EntryFile;
    const w = e.worksheets.find((x) => x.name === ws);
    if (!w) throw new Error(`no worksheet ${ws} in ${slug}`);
    const s = evaluateWorksheetWithKit(w, values).steps.find((x) => x.name === name);
    if (!s?.value) throw new Error(`step ${name}: ${s?.error?.message ?? 'missing'}`);
    return s.value.si;
  };

  test('cavity: P/c for 100 W is 333.6 nN (photon momentum p = E/c; Griffiths ch. 8–9, from memory)', () => {
    expect(step('resonant-cavity-thruster', 'cavity-photon-bound', 'F_bound') / (100 / C) - 1).toBeCloseTo(0, 12);
  });

  test('Casimir: 1 cm² at 100 nm gives π²ħc/(240 d⁴) ≈ 13 Pa (Casimir 1948; the 1.3 mN per cm² at 100 nm is a textbook figure, from memory)', () => {
    const hbar = 6.62607015e-34 / (2 * Math.PI); // J s (h exact, SI Brochure 2019)
    const p = step('vacuum-energy-generator', 'casimir-one-off-energy', 'p_end');
    expect(p / ((Math.PI ** 2 * hbar * C) / (240 * 1e-7 ** 4)) - 1).toBeCloseTo(0, 12);
    expect(p).toBeGreaterThan(12);
    expect(p).toBeLessThan(14);
  });

  test('buoyancy wheel: the work gained on the way round equals the work to insert the float, at any height', () => {
    for (const h of ['0.5 m', '3 m', '17 m']) {
      const gain = step('buoyancy-wheel', 'float-energy-balance', 'W_gain', { h_col: h });
      const cost = step('buoyancy-wheel', 'float-energy-balance', 'W_insert', { h_col: h });
      expect(gain / cost - 1).toBeCloseTo(0, 12);
    }
    // 2 L at 3 m in water: ρ g h V = 1000 × 9.80665 × 3 × 0.002 J.
    expect(step('buoyancy-wheel', 'float-energy-balance', 'W_insert')).toBeCloseTo(1000 * G0 * 3 * 0.002, 9);
  });

  test('sideways beam: p_z is unchanged while v_z falls (p_z = γ m v_z with F_z = 0; Jackson ch. 12, from memory)', () => {
    const pz0 = step('sideways-beam-thruster', 'forward-momentum-under-sideways-push', 'p_z');
    const pz1 = step('sideways-beam-thruster', 'forward-momentum-under-sideways-push', 'p_z1');
    const v0 = step('sideways-beam-thruster', 'forward-momentum-under-sideways-push', 'v0');
    const v1 = step('sideways-beam-thruster', 'forward-momentum-under-sideways-push', 'v_z1');
    expect(pz1 / pz0 - 1).toBeCloseTo(0, 12);
    expect(v1).toBeLessThan(v0);
    // 100 keV electron: γ = 1 + 100/510.999 (m_e c² = 0.51099895 MeV, CODATA 2018/2022), β ≈ 0.548.
    expect(v0 / C).toBeCloseTo(0.5482, 3);
  });

  test('water splitting: 1 L/min of 2:1 gas at 25 °C and 1 atm needs ≈ 107.7 W at 237.13 kJ/mol (ΔG°f of liquid water; Atkins, from memory)', () => {
    const R = 8.314462618; // J/(mol K), CODATA 2018 (exact: k_B N_A)
    const n = (101325 * (1e-3 / 60)) / (R * 298.15);
    expect(step('water-fuelled-engine', 'electrolysis-and-engine-loop', 'P_min') / ((2 / 3) * n * 237130) - 1).toBeCloseTo(0, 9);
  });

  test('single reservoir: the largest output is zero when source and sink are at one temperature', () => {
    expect(step('ambient-heat-engine', 'entropy-ledger', 'P_max')).toBe(0);
    // Between 20 °C and −20 °C, Carnot gives 1 − 253.15/293.15 of 1 kW (Fermi, Thermodynamics, ch. 4, from memory).
    expect(step('ambient-heat-engine', 'entropy-ledger', 'P_max', { T_sink: '-20 degC' })).toBeCloseTo(1000 * (1 - 253.15 / 293.15), 9);
  });
});

// ---------------------------------------------------------------------------------------------
// Malformed files

/** A small valid entry; `lines` lets each test change one line and know its number. */
function fixture(): string[] {
  return [
    '---', // 1
    'slug: tiny-test-entry', // 2
    'title: A tiny test entry', // 3
    'mechanismClass: over-unity', // 4
    'laws: [energy]', // 5
    'author: editor.one@example.org', // 6
    'reviewer: editor.two@example.org', // 7
    'worksheets:', // 8
    '  - name: tiny', // 9
    '    title: Tiny', // 10
    '    inputs:', // 11
    '      - { name: P, label: Power, unit: W, default: 1 W }', // 12
    '    steps:', // 13
    '      - { name: E, label: Energy in an hour, expression: P * 1 hour, unit: J }', // 14
    '---', // 15
    '', // 16
    '## In brief', // 17
    '', // 18
    'Short and plain.', // 19
    '', // 20
    '## How it is pitched', // 21
    '', // 22
    'As a machine.', // 23
    '', // 24
    '## Why it fails', // 25
    '', // 26
    'Energy is conserved: $E_\\text{out} \\le E_\\text{in}$.', // 27
    '', // 28
  ];
}
const join_ = (lines: string[]) => lines.join('\n');

describe('parseEntryFile on malformed files', () => {
  test('the fixture itself is valid, with defaults filled in', () => {
    const e = parseEntryFile(join_(fixture()), 'tiny-test-entry.md');
    expect(e.slug).toBe('tiny-test-entry');
    expect(e.inBrief).toBe('Short and plain.');
    expect(e.whatFakesTheEffect).toBe('');
    expect(e.changeNote).toBe('First published version.');
    expect(parseEntryFile(serializeEntryFile(e), 'tiny-test-entry.md')).toEqual(e);
  });

  test('Windows line endings read the same', () => {
    expect(parseEntryFile(fixture().join('\r\n'), 'x.md')).toEqual(parseEntryFile(join_(fixture()), 'x.md'));
  });

  test('bad YAML is refused with the file name and the line', () => {
    const lines = fixture();
    lines[2] = 'title: [A tiny test entry'; // line 3: an unclosed flow sequence
    const err = refusal(() => parseEntryFile(join_(lines), 'bad-yaml.md'));
    expect(err.fileName).toBe('bad-yaml.md');
    expect(err.field).toBe('yaml');
    expect(err.line).toBeGreaterThanOrEqual(3);
    expect(err.line).toBeLessThanOrEqual(4);
    expect(err.message).toMatch(/^bad-yaml\.md:\d+: yaml: /);
  });

  test('a duplicate front-matter key is refused with its line', () => {
    const lines = fixture();
    lines.splice(3, 0, 'title: Another title'); // new line 4
    const err = refusal(() => parseEntryFile(join_(lines), 'dup.md'));
    expect(err.field).toBe('yaml');
    expect(err.line).toBe(4);
  });

  test('a file without front matter is refused at line 1', () => {
    const err = refusal(() => parseEntryFile('## In brief\n\nNo front matter.\n', 'bare.md'));
    expect(err.line).toBe(1);
    expect(err.field).toBe('front matter');
    expect(err.message).toMatch(/^bare\.md:1: front matter: /);
  });

  test('front matter that is never closed is refused', () => {
    const lines = fixture().slice(0, 14);
    const err = refusal(() => parseEntryFile(join_(lines), 'open.md'));
    expect(err.field).toBe('front matter');
    expect(err.message).toContain('not closed');
  });

  test('an unknown section heading is refused with its line', () => {
    const lines = fixture();
    lines.push('## Background', '', 'Some history.'); // line 29
    const err = refusal(() => parseEntryFile(join_(lines), 'unknown-heading.md'));
    expect(err.line).toBe(29);
    expect(err.field).toBe('body');
    expect(err.message).toBe(
      `unknown-heading.md:29: body: unknown section heading "## Background"; the sections are "In brief", "How it is pitched", "Why it fails", "Artifacts that can look like the effect", "Cautions" (use "###" for a sub-heading)`,
    );
  });

  test('a heading in the wrong case is refused with a hint', () => {
    const lines = fixture();
    lines[24] = '## Why It Fails'; // line 25
    const err = refusal(() => parseEntryFile(join_(lines), 'case.md'));
    expect(err.line).toBe(25);
    expect(err.message).toContain('write it as "## Why it fails"');
  });

  test('a missing In brief is refused, naming the field and where it belongs', () => {
    const lines = fixture();
    lines.splice(16, 4); // drop lines 17–20 ("## In brief" and its text); "How it is pitched" moves to line 17
    const err = refusal(() => parseEntryFile(join_(lines), 'no-brief.md'));
    expect(err.field).toBe('inBrief');
    expect(err.line).toBe(17);
    expect(err.message).toBe('no-brief.md:17: inBrief: the required section "## In brief" is missing');
  });

  test('an empty required section is refused at its heading', () => {
    const lines = fixture();
    lines[22] = ''; // line 23: the text of "How it is pitched"
    const err = refusal(() => parseEntryFile(join_(lines), 'empty.md'));
    expect(err.field).toBe('howItIsPitched');
    expect(err.line).toBe(21);
  });

  test('In brief over 120 words is refused at its heading', () => {
    const lines = fixture();
    lines[18] = Array.from({ length: IN_BRIEF_MAX_WORDS + 1 }, (_, i) => `word${i}`).join(' ');
    const err = refusal(() => parseEntryFile(join_(lines), 'long-brief.md'));
    expect(err.field).toBe('inBrief');
    expect(err.line).toBe(17);
    expect(err.message).toContain(`has ${IN_BRIEF_MAX_WORDS + 1} words; at most ${IN_BRIEF_MAX_WORDS}`);
    // Exactly 120 words is accepted.
    lines[18] = Array.from({ length: IN_BRIEF_MAX_WORDS }, (_, i) => `word${i}`).join(' ');
    expect(parseEntryFile(join_(lines), 'long-brief.md').inBrief.split(' ')).toHaveLength(IN_BRIEF_MAX_WORDS);
  });

  test('a bad slug is refused with the line of the slug', () => {
    const lines = fixture();
    lines[1] = 'slug: Tiny_Test Entry';
    const err = refusal(() => parseEntryFile(join_(lines), 'bad-slug.md'));
    expect(err.field).toBe('slug');
    expect(err.line).toBe(2);
    expect(err.message).toMatch(/^bad-slug\.md:2: slug: lower-case words joined by hyphens/);
  });

  test('a missing required field points at the front matter', () => {
    const lines = fixture();
    lines.splice(2, 1); // no title
    const err = refusal(() => parseEntryFile(join_(lines), 'no-title.md'));
    expect(err.field).toBe('title');
    expect(err.line).toBe(2);
  });

  test('an unknown front-matter field, or a body section in the front matter, is refused with its line', () => {
    const lines = fixture();
    lines.splice(3, 0, 'mechanismclass: over-unity'); // line 4: a typo
    let err = refusal(() => parseEntryFile(join_(lines), 'typo.md'));
    expect(err.field).toBe('mechanismclass');
    expect(err.line).toBe(4);
    const lines2 = fixture();
    lines2.splice(3, 0, 'inBrief: In the wrong place.');
    err = refusal(() => parseEntryFile(join_(lines2), 'misplaced.md'));
    expect(err.field).toBe('inBrief');
    expect(err.line).toBe(4);
    expect(err.message).toContain('belongs in the body');
  });

  test('a section twice, or out of order, is refused', () => {
    const twice = fixture();
    twice.push('## In brief', '', 'Again.'); // line 29
    let err = refusal(() => parseEntryFile(join_(twice), 'twice.md'));
    expect(err.line).toBe(29);
    expect(err.message).toContain('appears twice (first on line 17)');
    const order = fixture();
    order.push('## Cautions', '', 'Careful.', '', '## Artifacts that can look like the effect', '', 'Drift.'); // lines 29, 33
    err = refusal(() => parseEntryFile(join_(order), 'order.md'));
    expect(err.line).toBe(33);
    expect(err.message).toContain('out of order');
  });

  test('text before the first section is refused', () => {
    const lines = fixture();
    lines[15] = 'Stray paragraph.'; // line 16
    const err = refusal(() => parseEntryFile(join_(lines), 'stray.md'));
    expect(err.field).toBe('body');
    expect(err.line).toBe(16);
  });

  test('a level-1 heading or a dashed underline inside a section is refused', () => {
    const h1 = fixture();
    h1[22] = '# A title'; // line 23
    expect(refusal(() => parseEntryFile(join_(h1), 'h1.md')).line).toBe(23);
    const setext = fixture();
    setext.splice(23, 0, '---'); // line 24, right under "As a machine."
    expect(refusal(() => parseEntryFile(join_(setext), 'setext.md')).line).toBe(24);
  });

  test('headings inside fenced code and level-3 sub-headings stay in the section', () => {
    const lines = fixture();
    lines.splice(23, 0, '', '### A sub-heading', '', '```', '## not a heading', '```');
    const e = parseEntryFile(join_(lines), 'fenced.md');
    expect(e.howItIsPitched).toBe('As a machine.\n\n### A sub-heading\n\n```\n## not a heading\n```');
    expect(parseEntryFile(serializeEntryFile(e), 'fenced.md')).toEqual(e);
  });

  test('a worksheet that does not compile is refused at the line of its expression', () => {
    const lines = fixture();
    lines[13] = '      - { name: E, label: Energy in an hour, expression: P * 1 hour + 1 m, unit: J }'; // line 14
    const err = refusal(() => parseEntryFile(join_(lines), 'bad-sheet.md'));
    expect(err.field).toBe('worksheets.0.steps.0.expression');
    expect(err.line).toBe(14);
    expect(err.message).toMatch(/^bad-sheet\.md:14: worksheets\.0\.steps\.0\.expression: Step E: /);
    // The schema alone does not compile it.
    expect(parseEntryFile(join_(lines), 'bad-sheet.md', { checkWorksheets: false }).worksheets).toHaveLength(1);
  });

  test('a bad citation is refused at its line', () => {
    const lines = fixture();
    lines.splice(14, 0, 'sources:', '  - csl: { id: x, type: book }', '    note: no title'); // lines 15–17
    const err = refusal(() => parseEntryFile(join_(lines), 'bad-source.md'));
    expect(err.field).toBe('sources.0.csl.title');
    expect(err.line).toBe(16);
  });

  test('all problems are listed, the first one in the message head', () => {
    const lines = fixture();
    lines[1] = 'slug: Bad Slug';
    lines[6] = 'reviewer: not-an-address';
    const err = refusal(() => parseEntryFile(join_(lines), 'two.md'));
    expect(err.problems.map((p) => [p.field, p.line])).toEqual([
      ['slug', 2],
      ['reviewer', 7],
    ]);
    expect(err.message.split('\n')).toHaveLength(2);
  });
});

describe('serializeEntryFile', () => {
  const base = () => parseEntryFile(join_(fixture()), 'tiny-test-entry.md');

  test('writes front matter then the body sections under their headings, leaving out empty optional ones', () => {
    const text = serializeEntryFile(base());
    expect(text.startsWith('---\nslug: tiny-test-entry\n')).toBe(true);
    expect(text).toContain('\n## In brief\n\nShort and plain.\n');
    expect(text).not.toContain('## Cautions');
    const withCautions = { ...base(), cautions: 'Mind the voltage.' };
    expect(parseEntryFile(serializeEntryFile(withCautions), 'x.md').cautions).toBe('Mind the voltage.');
  });

  test('refuses a section whose text holds a level-2 heading, which would not read back', () => {
    const err = refusal(() => serializeEntryFile({ ...base(), whyItFails: 'Text.\n\n## Extra\n\nMore.' }));
    expect(err.field).toBe('whyItFails');
    expect(err.fileName).toBe('tiny-test-entry.md');
  });

  test('keeps TeX, lists and YAML-special characters intact', () => {
    const e = {
      ...base(),
      title: 'A title: with a colon, # and "quotes"',
      whyItFails: '$$p_z = \\gamma m v_z$$\n\n- one: two\n- `code` & *emphasis*',
      questionsToAsk: ['- starts with a dash?', '{braces} and: colons'],
    };
    expect(parseEntryFile(serializeEntryFile(e), 'x.md')).toEqual(e);
  });
});
