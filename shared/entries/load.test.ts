/**
 * The starter library in content/entries and its loader (shared/entries/load.ts): every file parses,
 * every worksheet runs at its defaults, files round-trip through serializeEntryFile, references
 * between entries and to the taxonomy resolve (malformed files: parse.test.ts). (Reading the files
 * uses Node's fs in the test only; the loader itself stays pure.)
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { parse as parseYaml } from 'yaml';
import { evaluateWorksheetWithKit } from '../compute';
import { parseEntryFile, serializeEntryFile } from './load';
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
