/**
 * For the paragraph's tests only (the .test.ts files of shared/claims): the real starter entries as
 * paragraph entries (content/entries/*.md, read with shared/entries/load.ts; law names from
 * content/taxonomy.yml), checks run with runCheck on invented claims, and the inputs built from them.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { parse as parseYaml } from 'yaml';
import { runCheck } from '../../checks/run';
import type { CheckName } from '../../checks/types';
import type { CslItem } from '../../entries/citations';
import { parseEntryFile } from '../../entries/load';
import type { EntryFile } from '../../entries/schema';
import { formatPrint } from '../print';
import { buildParagraphs, type ParagraphEntry, type ParagraphsInput } from '../paragraph';
import type { ClaimCheckNeed, ClaimCheckRun, Figure } from '../types';

// ---------------------------------------------------------------------------------------------
// The starter library as paragraph entries

const ROOT = join(__dirname, '..', '..', '..', 'content');
const taxonomy = parseYaml(readFileSync(join(ROOT, 'taxonomy.yml'), 'utf8')) as { laws: { slug: string; name: string }[] };
const lawName = new Map(taxonomy.laws.map((l) => [l.slug, l.name]));
export const starter = new Map<string, EntryFile>(
  readdirSync(join(ROOT, 'entries'))
    .filter((f) => f.endsWith('.md'))
    .sort()
    .map((f) => {
      const e = parseEntryFile(readFileSync(join(ROOT, 'entries', f), 'utf8'), f, { checkWorksheets: false });
      return [e.slug, e];
    }),
);
export const slugs = [...starter.keys()];

export const url = (slug: string, n: number) => `https://counterweight.example.org/entries/${slug}/v/${n}`;
const entryItem = (slug: string, title: string, n = 2): CslItem => ({
  id: `${slug}-v${n}`,
  type: 'entry-encyclopedia',
  title,
  'container-title': 'Counterweight',
  version: String(n),
  author: [{ given: 'Ada', family: 'Quillfeather' }],
  issued: { 'date-parts': [[2026, 10, 4]] },
  accessed: { 'date-parts': [[2026, 12, 1]] },
  URL: url(slug, n),
});

export function entry(slug: string, n = 2): ParagraphEntry {
  const e = starter.get(slug);
  if (!e) throw new Error(`no starter entry ${slug}`);
  return {
    match: { slug, title: e.title, version: n, score: 10, terms: [], words: [], url: url(slug, n), inBrief: e.inBrief },
    item: entryItem(slug, e.title, n),
    sources: e.sources.map((s) => s.csl as CslItem),
    questions: e.questionsToAsk,
    laws: e.laws.map((l) => lawName.get(l) as string),
    replies: e.repliesAndAnswers,
  };
}

// ---------------------------------------------------------------------------------------------
// Checks run on invented claims

/** A run as the planner reports it: runCheck's outputs and verdict, with the law, finding and sentence. */
export function run(check: CheckName, inputs: Record<string, string>, law: string, sentence: (o: Record<string, number>) => string, title: string = check): ClaimCheckRun {
  const r = runCheck(check, inputs);
  const o = Object.fromEntries(r.outputs.map((x) => [x.name, x.si]));
  return {
    check,
    inputs,
    uses: [],
    why: 'The text gives the figures this check needs.',
    assumptions: [],
    title,
    outputs: r.outputs.map(({ name, label, si, unit, display }) => ({ name, label, si, unit, display })),
    verdict: r.verdict,
    inputsUsed: r.inputs,
    permalink: `/checks/${check}`,
    law,
    finding: r.verdict.holds ? 'consistent' : 'breaks',
    sentence: sentence(o),
  };
}

// 0.2 lbf against 1.5 kW: 0.2 lbf = 0.889 644 N (1 lbf = 4.448 222 N, NIST SP 811 B.8); P/c =
// 1500 W / 299 792 458 m/s (c exact, SI Brochure) = 5.003 µN; ratio 1.778 × 10⁵ (by hand).
export const RATIO_LBF = (0.2 * 4.4482216152605) / (1500 / 299792458);
export const photon = run(
  'photon-bound',
  { F_claimed: '0.2 lbf', P: '1.5 kW' },
  'conservation of linear momentum',
  (o) => `The claimed thrust of 0.2 lbf is ${formatPrint(o.ratio, 3)} times the photon-rocket bound P/c for 1.5 kW.`,
  'Photon-rocket bound',
);
// A heat pump said to give a heating COP of 3.5 between 5 °C outside and 35 °C inside: the Carnot
// heating COP is Th/(Th − Tc) = 308.15 / 30 = 10.27 (textbook Carnot formula; by hand), so it is consistent.
export const heatPump = run(
  'carnot',
  { Th: '35 degC', Tc: '5 degC', eta_claimed: '0', cop_heating_claimed: '3.5', cop_cooling_claimed: '0' },
  'the second law of thermodynamics',
  (o) => `The claimed heating COP of 3.5 is below the Carnot heating COP of ${formatPrint(o.cop_heating_max, 3)} for 35 °C and 5 °C.`,
  'Carnot bound',
);
// An engine said to be 80 % efficient between 400 K and 300 K: the Carnot efficiency is 1 − 300/400 = 0.25 (by hand).
export const hotEngine = run(
  'carnot',
  { Th: '400 K', Tc: '300 K', eta_claimed: '0.8', cop_heating_claimed: '0', cop_cooling_claimed: '0' },
  'the second law of thermodynamics',
  (o) => `The claimed efficiency of 80 % is ${formatPrint(o.eta_ratio, 3)} times the Carnot efficiency of ${formatPrint(o.eta_max, 2)} for 400 K and 300 K.`,
  'Carnot bound',
);
// 1 kJ in, 1.3 kJ out: over unity by 1.3 (by hand).
export const overUnity = run('first-law', { E_in: '1 kJ', W_out: '1.3 kJ', Q_out: '0 J' }, 'conservation of energy', () => 'The claimed output of 1.3 kJ for 1 kJ supplied is 1.30 times the input, 300 J more than was put in.', 'First-law balance');

export const figures: Figure[] = [
  { id: 'f1', kind: 'thrust', quantity: '0.2 lbf', text: '0.2 lbf', start: 10, end: 17, si: 0.8896, unit: 'N', display: '889.6 mN', role: null },
  { id: 'f2', kind: 'power', quantity: '1.5 kW', text: '1.5 kW', start: 30, end: 36, si: 1500, unit: 'W', display: '1.5 kW', role: 'in' },
];
export const massNeed: ClaimCheckNeed = { check: 'break-even-speed', title: 'Break-even speed', missing: ['the mass of the craft'], why: 'A thrust on a power.', uses: ['f1', 'f2'] };

export const CAVITY_TEXT =
  'Our tapered copper resonator, fed with 1.5 kW of microwaves, produced 0.2 lbf of thrust on a torsion balance. Because the quality factor of the cavity is very high, it multiplies the thrust many times over.';

export const input = (over: Partial<ParagraphsInput> = {}): ParagraphsInput => ({
  entries: [entry('resonant-cavity-thruster')],
  checks: [photon],
  needs: [],
  figures,
  text: CAVITY_TEXT,
  style: 'apa',
  ...over,
});

export const all = (over: Partial<ParagraphsInput> = {}) => Object.values(buildParagraphs(input(over)));
export const sentencesOf = (s: string) => s.split(/(?<=[.!?])\s+(?=[A-Z“])/).map((x) => x.trim());
