/**
 * The paragraph of a claim check, in its four variants (issue 11, item 4). Inputs are built from the
 * real starter entries (content/entries/*.md, read with shared/entries/load.ts; law names from
 * content/taxonomy.yml) and from checks run with runCheck on invented claims; the claim texts are
 * invented. References are formatted by citation-js (the reference library) and checked against the
 * style manuals' visible rules (APA 7 §10.2 entry in a reference work; Vancouver/NLM "Citing
 * Medicine" ch. 24–25 "[cited …] Available from:"; Harvard (Cite Them Right) "Available at: …
 * (Accessed: …)"; from memory). Words of each practice: patent practice's "inoperable", "lack of
 * utility", "industrial applicability" (the trade's terms; from memory).
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { parse as parseYaml } from 'yaml';
import { runCheck } from '../checks/run';
import type { CheckName } from '../checks/types';
import { formatCitation, type CitationStyle, type CslItem } from '../entries/citations';
import { parseEntryFile } from '../entries/load';
import { wordCount, type EntryFile } from '../entries/schema';
import { buildParagraph, buildParagraphs, contentKeys, lawInProse, matchReply, PARAGRAPH_WORDS_MAX, resultSentence, type ParagraphEntry, type ParagraphsInput } from './paragraph';
import { readFigure } from './figures';
import { runClaimChecks } from './plan';
import { formatPrint } from './print';
import { PARAGRAPH_VARIANTS, type ClaimCheckNeed, type ClaimCheckRun, type ClaimParagraph, type Figure, type FigureInput, type ParagraphVariant } from './types';

// ---------------------------------------------------------------------------------------------
// The starter library as paragraph entries

const ROOT = join(__dirname, '..', '..', 'content');
const taxonomy = parseYaml(readFileSync(join(ROOT, 'taxonomy.yml'), 'utf8')) as { laws: { slug: string; name: string }[] };
const lawName = new Map(taxonomy.laws.map((l) => [l.slug, l.name]));
const starter = new Map<string, EntryFile>(
  readdirSync(join(ROOT, 'entries'))
    .filter((f) => f.endsWith('.md'))
    .sort()
    .map((f) => {
      const e = parseEntryFile(readFileSync(join(ROOT, 'entries', f), 'utf8'), f, { checkWorksheets: false });
      return [e.slug, e];
    }),
);
const slugs = [...starter.keys()];

const url = (slug: string, n: number) => `https://counterweight.example.org/entries/${slug}/v/${n}`;
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

function entry(slug: string, n = 2): ParagraphEntry {
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
function run(check: CheckName, inputs: Record<string, string>, law: string, sentence: (o: Record<string, number>) => string, title: string = check): ClaimCheckRun {
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
const RATIO_LBF = (0.2 * 4.4482216152605) / (1500 / 299792458);
const photon = run(
  'photon-bound',
  { F_claimed: '0.2 lbf', P: '1.5 kW' },
  'conservation of linear momentum',
  (o) => `The claimed thrust of 0.2 lbf is ${formatPrint(o.ratio, 3)} times the photon-rocket bound P/c for 1.5 kW.`,
  'Photon-rocket bound',
);
// A heat pump said to give a heating COP of 3.5 between 5 °C outside and 35 °C inside: the Carnot
// heating COP is Th/(Th − Tc) = 308.15 / 30 = 10.27 (textbook Carnot formula; by hand), so it is consistent.
const heatPump = run(
  'carnot',
  { Th: '35 degC', Tc: '5 degC', eta_claimed: '0', cop_heating_claimed: '3.5', cop_cooling_claimed: '0' },
  'the second law of thermodynamics',
  (o) => `The claimed heating COP of 3.5 is below the Carnot heating COP of ${formatPrint(o.cop_heating_max, 3)} for 35 °C and 5 °C.`,
  'Carnot bound',
);
// An engine said to be 80 % efficient between 400 K and 300 K: the Carnot efficiency is 1 − 300/400 = 0.25 (by hand).
const hotEngine = run(
  'carnot',
  { Th: '400 K', Tc: '300 K', eta_claimed: '0.8', cop_heating_claimed: '0', cop_cooling_claimed: '0' },
  'the second law of thermodynamics',
  (o) => `The claimed efficiency of 80 % is ${formatPrint(o.eta_ratio, 3)} times the Carnot efficiency of ${formatPrint(o.eta_max, 2)} for 400 K and 300 K.`,
  'Carnot bound',
);
// 1 kJ in, 1.3 kJ out: over unity by 1.3 (by hand).
const overUnity = run('first-law', { E_in: '1 kJ', W_out: '1.3 kJ', Q_out: '0 J' }, 'conservation of energy', () => 'The claimed output of 1.3 kJ for 1 kJ supplied is 1.30 times the input, 300 J more than was put in.', 'First-law balance');

const figures: Figure[] = [
  { id: 'f1', kind: 'thrust', quantity: '0.2 lbf', text: '0.2 lbf', start: 10, end: 17, si: 0.8896, unit: 'N', display: '889.6 mN', role: null },
  { id: 'f2', kind: 'power', quantity: '1.5 kW', text: '1.5 kW', start: 30, end: 36, si: 1500, unit: 'W', display: '1.5 kW', role: 'in' },
];
const massNeed: ClaimCheckNeed = { check: 'break-even-speed', title: 'Break-even speed', missing: ['the mass of the craft'], why: 'A thrust on a power.', uses: ['f1', 'f2'] };

const CAVITY_TEXT =
  'Our tapered copper resonator, fed with 1.5 kW of microwaves, produced 0.2 lbf of thrust on a torsion balance. Because the quality factor of the cavity is very high, it multiplies the thrust many times over.';

const input = (over: Partial<ParagraphsInput> = {}): ParagraphsInput => ({
  entries: [entry('resonant-cavity-thruster')],
  checks: [photon],
  needs: [],
  figures,
  text: CAVITY_TEXT,
  style: 'apa',
  ...over,
});

const all = (over: Partial<ParagraphsInput> = {}) => Object.values(buildParagraphs(input(over)));
const sentencesOf = (s: string) => s.split(/(?<=[.!?])\s+(?=[A-Z“])/).map((x) => x.trim());

// ---------------------------------------------------------------------------------------------

describe('the four variants', () => {
  const ps = buildParagraphs(input({ needs: [massNeed] }));

  it('are all there, each with its variant', () => {
    expect(Object.keys(ps).sort()).toEqual([...PARAGRAPH_VARIANTS].sort());
    for (const v of PARAGRAPH_VARIANTS) expect(ps[v].variant).toBe(v);
  });

  it('name the top entry with its title, version, permanent URL and reference [1], and the laws it rests on', () => {
    const cavity = starter.get('resonant-cavity-thruster') as EntryFile;
    for (const p of Object.values(ps)) {
      expect(p.body).toContain(`“${cavity.title}”, version 2 (${url('resonant-cavity-thruster', 2)}) [1]`);
      expect(p.references[0]).toMatchObject({ n: 1, id: 'resonant-cavity-thruster-v2', counterweight: true });
      // The entry's laws, by their taxonomy names, as they read in a sentence.
      expect(p.body).toContain('conservation of linear momentum');
      expect(p.body).toContain('conservation of energy');
    }
  });

  it('give the computed result with its number as in print', () => {
    for (const p of Object.values(ps)) {
      expect(p.body).toContain(`${formatPrint(RATIO_LBF, 3)} times the photon-rocket bound`);
      expect(p.body).toContain('1.78 × 10⁵');
      expect(p.body).not.toMatch(/\^|\de[+-]?\d/);
    }
  });

  it('speak in the wording of each practice', () => {
    expect(ps.referee.body).toMatch(/^The manuscript's central claim/);
    expect(ps.referee.body).toMatch(/the manuscript should report/);
    expect(ps.examiner.body).toMatch(/The invention as claimed would be inoperable/);
    expect(ps.examiner.body).toMatch(/lack utility \(industrial applicability\)/);
    expect(ps.examiner.body).toMatch(/conflicts with well-established laws of physics/);
    expect(ps.examiner.body).toMatch(/The applicant is asked to supply evidence, such as test data, that the device operates as claimed/);
    expect(ps.grant.body).toMatch(/feasibility of the proposed work/);
    expect(ps.grant.body).toMatch(/objectives do not appear achievable/);
    expect(ps.journalist.body).toMatch(/nothing can push itself along without pushing something else back/);
    expect(ps.journalist.body).toMatch(/no machine gives out more energy than it takes in/);
    // Four different paragraphs.
    expect(new Set(Object.values(ps).map((p) => p.body)).size).toBe(4);
  });

  it('list what the claimant should supply: the missing figure', () => {
    for (const p of Object.values(ps)) expect(p.body).toContain('the mass of the craft');
  });

  it('use up to two of the entry’s questions when there is room', () => {
    const cavity = starter.get('resonant-cavity-thruster') as EntryFile;
    const roomy = buildParagraphs(input({ text: 'A sealed resonator pushes on its mount.' }));
    for (const p of Object.values(roomy)) {
      const used = cavity.questionsToAsk.filter((q) => p.body.includes(q.replace(/\s+/g, ' ')));
      expect(used.length).toBeGreaterThanOrEqual(1);
      expect(used.length).toBeLessThanOrEqual(2);
      expect(used[0]).toBe(cavity.questionsToAsk[0]);
    }
    expect(roomy.journalist.body).toMatch(/Independent physicists would ask: Was the thrust measured in vacuum/);
  });
});

describe('references', () => {
  describe.each(['apa', 'vancouver', 'harvard'] as const)('in %s', (style: CitationStyle) => {
    // One short question, so that there is room for the related entry (the first part left out for length).
    const entries = [{ ...entry('resonant-cavity-thruster'), questions: ['Was it measured in vacuum?'] }, entry('sideways-beam-thruster')];
    const p = buildParagraph({ entries, checks: [photon], needs: [], figures, text: 'A sealed resonator.', style, variant: 'referee' });
    const cavity = entries[0];

    it('are numbered in order of first citation: the entry, two of its sources, the related entry', () => {
      expect(p.references.map((r) => [r.n, r.id, r.counterweight])).toEqual([
        [1, 'resonant-cavity-thruster-v2', true],
        [2, cavity.sources[0].id, false],
        [3, cavity.sources[1].id, false],
        [4, 'sideways-beam-thruster-v2', true],
      ]);
      expect(cavity.sources.length).toBeGreaterThan(2); // only two of them are cited
      expect(p.body).toContain('[2, 3]');
      // Every marker points at a listed reference, and every reference is cited.
      const cited = new Set<number>();
      for (const m of p.body.matchAll(/\[(\d+(?:, \d+)*)\]/g)) for (const k of m[1].split(', ')) cited.add(Number(k));
      expect([...cited].sort()).toEqual(p.references.map((r) => r.n));
    });

    it('are formatted by citation-js in the style', () => {
      expect(p.references.map((r) => r.text)).toEqual([cavity.item, cavity.sources[0], cavity.sources[1], entries[1].item].map((i) => formatCitation(i, style, 'text')));
      const cw = p.references[0].text;
      const title = cavity.match.title;
      if (style === 'apa') {
        expect(cw).toBe(`Quillfeather, A. (2026). ${title}. In Counterweight (Version 2). ${url('resonant-cavity-thruster', 2)}`);
      } else if (style === 'vancouver') {
        expect(cw).toBe(`Quillfeather A. ${title}. In: Counterweight [Internet]. 2026 [cited 2026 Dec 1]. Available from: ${url('resonant-cavity-thruster', 2)}`);
      } else {
        expect(cw).toMatch(/^Quillfeather, A\. \(2026\) .*Counterweight\. Available at: https:\/\/counterweight\.example\.org\/entries\/resonant-cavity-thruster\/v\/2 \(Accessed: .*2026\)\.$/);
      }
    });

    it('follow the body in the text to copy', () => {
      const lines = p.text.trimEnd().split('\n');
      expect(lines[0]).toBe(p.body);
      expect(lines[1]).toBe('');
      expect(lines[2]).toBe('References');
      expect(lines.slice(3)).toEqual(p.references.map((r) => `${r.n}. ${r.text}`));
    });
  });

  it('leave no number behind for a part left out for length', () => {
    // Many long results push the related entry out; its reference must go with it.
    const long = Array.from({ length: 6 }, (_, i) => ({ ...photon, sentence: `${photon.sentence} (run ${i + 1} of a long series with the same figures, repeated here to fill the paragraph to its limit)` }));
    for (const v of PARAGRAPH_VARIANTS) {
      const p = buildParagraph({ entries: [entry('resonant-cavity-thruster'), entry('internal-mass-drive')], checks: long, figures, style: 'apa', variant: v, text: CAVITY_TEXT });
      const cited = new Set<number>();
      for (const m of p.body.matchAll(/\[(\d+(?:, \d+)*)\]/g)) for (const k of m[1].split(', ')) cited.add(Number(k));
      expect([...cited].sort()).toEqual(p.references.map((r) => r.n));
      expect(wordCount(p.body)).toBeLessThanOrEqual(PARAGRAPH_WORDS_MAX);
    }
  });
});

describe('the claim’s own rejoinder', () => {
  /** Invented texts that raise one of an entry's replies in their own words, with that reply's start. */
  const raised: [slug: string, text: string, reply: string][] = [
    ['resonant-cavity-thruster', CAVITY_TEXT, 'A high Q factor'],
    ['resonant-cavity-thruster', 'The thrust we measure is tiny, only 4 µN, so it could hardly break a law of physics.', 'The measured thrust is tiny'],
    ['overbalanced-wheel', 'On the falling side each weight swings out further from the axle, so its torque is larger than on the rising side.', 'The weights on the descending side'],
    ['over-unity-circuit', 'With 12 V and 3 A at the output, the output voltage times the output current comes to more than the 20 W input power.', 'The output voltage times'],
    ['ambient-heat-engine', 'The module rectifies the random thermal motion of the air molecules, ratchet fashion, into a steady current.', 'Our device rectifies'],
    ['vacuum-energy-generator', 'The Casimir effect is a real, measured force, so the vacuum energy between the plates can do work.', 'The Casimir effect'],
    ['permanent-magnet-motor', 'A magnetic shield swings in at the sticky point and lets the rotor past it.', 'Our shielding or magnet gate'],
  ];

  it.each(raised)('%s: “%s” raises the reply and gets its answer', (slug, text, start) => {
    const e = entry(slug);
    const m = matchReply(text, e.replies);
    expect(m?.reply.startsWith(start)).toBe(true);
    const answer = (m as NonNullable<typeof m>).answer.replace(/\s+/g, ' ');
    const first = answer.split(/(?<=[.!?])\s+(?=[A-Z])/)[0];
    // The referee paragraph (no checks, so there is room) quotes the reply and answers it from the entry.
    const p = buildParagraph({ entries: [e], checks: [], figures: [], style: 'apa', text, variant: 'referee' });
    expect(p.body).toContain(`(“${m?.reply.replace(/[.;:,]+$/, '')}”)`);
    expect(p.body).toContain(first.replace(/[.!?]$/, ''));
  });

  it('is each entry’s own reply when the reply itself is pasted, for every reply of the starter library', () => {
    let n = 0;
    for (const slug of slugs) {
      const e = entry(slug);
      for (const r of e.replies) {
        expect(matchReply(r.reply, e.replies)?.reply).toBe(r.reply);
        n++;
      }
    }
    expect(n).toBeGreaterThanOrEqual(30);
  });

  it('is not raised by a text that only uses the subject’s common words', () => {
    const plainCavity = 'A tapered copper cavity fed with 700 W of microwaves produced 1.2 mN of thrust on a torsion balance in air.';
    expect(matchReply(plainCavity, entry('resonant-cavity-thruster').replies)).toBeNull();
    // Nor by the common words spread over a long text, sentences apart.
    const spread = 'The thrust was recorded. The tiny balance sat on a bench. ' + 'Nothing else changed. '.repeat(3) + 'A law of the lab: log everything. Measured twice.';
    expect(matchReply(spread, entry('resonant-cavity-thruster').replies)).toBeNull();
    for (const slug of slugs) expect(matchReply(entry(slug).match.title, entry(slug).replies)).toBeNull();
    const p = buildParagraph({ entries: [entry('resonant-cavity-thruster')], checks: [photon], figures, style: 'apa', text: plainCavity });
    expect(p.body).not.toMatch(/familiar point/);
  });

  it('reads the trade’s spellings of one idea alike (quality factor, Q factor, a lone Q)', () => {
    const q = contentKeys('the Q factor');
    expect(contentKeys('its quality factor')).toEqual(q);
    expect(contentKeys('its Q-factor')).toEqual(q);
    expect(contentKeys('a Q of 10⁵')).toEqual(q);
    expect(contentKeys('multiplies')).toEqual(contentKeys('multiplied'));
  });

  it('is not answered when the figures are consistent with the law', () => {
    for (const p of all({ entries: [entry('ambient-heat-engine')], checks: [heatPump], text: 'Our device rectifies the random thermal motion of molecules, like a ratchet.' })) {
      expect(p.body).not.toMatch(/familiar point|common reply|standard answer|does not overcome/);
    }
  });
});

describe('when the figures are consistent with the law', () => {
  const ps = all({ entries: [entry('ambient-heat-engine')], checks: [heatPump], text: 'A heat pump that is 350 % efficient, 5 °C outside and 35 °C inside.' });
  const ONE_CLASS_OF_IMPOSSIBLE = /conflicts? with|inoperable|lacks? utility|impossible|standard objection|cannot work|not (appear )?achievable|not feasible|unconfirmed claim|break(s)? (the|conservation)/i;

  it('says so, in those words, in every variant', () => {
    for (const p of ps) {
      expect(p.body).toContain('consistent with the second law of thermodynamics');
      expect(p.body).toContain(`Carnot heating COP of ${formatPrint(308.15 / 30, 3)}`);
    }
  });

  it('does not put the device in a class that cannot work', () => {
    for (const p of ps) expect(p.body).not.toMatch(ONE_CLASS_OF_IMPOSSIBLE);
  });

  it('names the law the same way however the planner spelt it', () => {
    const capital = { ...heatPump, law: 'Second law of thermodynamics' };
    for (const p of all({ entries: [entry('ambient-heat-engine')], checks: [capital] })) expect(p.body).toContain('consistent with the second law of thermodynamics');
    expect(lawInProse('Conservation of energy (first law)')).toBe('conservation of energy (first law)');
  });

  it('reports a mix of results as the one that breaks, with both sentences', () => {
    for (const p of all({ entries: [entry('ambient-heat-engine')], checks: [heatPump, hotEngine] })) {
      expect(p.body).toContain(heatPump.sentence.replace(/\.$/, ''));
      expect(p.body).toContain(hotEngine.sentence.replace(/\.$/, ''));
      // 0.8 / 0.25 = 3.2 (by hand)
      expect(p.body).toContain('3.20 times the Carnot efficiency of 0.25');
    }
    expect(buildParagraph({ ...input(), entries: [entry('ambient-heat-engine')], checks: [heatPump, hotEngine], variant: 'examiner' }).body).toMatch(/would be inoperable/);
  });
});

describe('with no match', () => {
  it('and no check, says so plainly in every variant, with no references', () => {
    for (const v of PARAGRAPH_VARIANTS) {
      for (const figs of [[], figures]) {
        const p = buildParagraph({ entries: [], checks: [], needs: [], figures: figs, text: 'A box that hums.', style: 'vancouver', variant: v });
        expect(p.body).toMatch(/^No entry of the Counterweight library matched/);
        expect(p.body).toMatch(figs.length ? /not enough for one of the standard checks/ : /no (figures|numbers) with units/);
        expect(p.references).toEqual([]);
        expect(p.text).toBe(`${p.body}\n`);
      }
    }
  });

  it('but a check that breaks, gives the result and the law it rests on', () => {
    for (const p of all({ entries: [], checks: [overUnity] })) {
      expect(p.body).toMatch(/No entry of the Counterweight library matched|would be inoperable/);
      expect(p.body).toContain('1.30 times the input');
      expect(p.body).toMatch(/conservation of energy/);
      expect(p.references).toEqual([]);
    }
  });

  it('and checks that need figures, lists them', () => {
    for (const p of all({ entries: [], checks: [], needs: [massNeed, { ...massNeed, check: 'first-law', title: 'First-law balance', missing: ['the energy put in'] }] })) {
      expect(p.body).toContain('the mass of the craft');
      expect(p.body).toContain('the energy put in');
    }
  });
});

describe('results', () => {
  it('are built from the outputs, numbers as in print, when the planner gave no sentence', () => {
    const bare = { ...photon, sentence: '' };
    const s = resultSentence(bare);
    expect(s).toContain(`the claimed thrust over the bound is ${formatPrint(RATIO_LBF, 3)}`);
    expect(s).toContain('the figures break conservation of linear momentum');
    expect(s).not.toMatch(/\^|\de[+-]?\d/);
    const ok = resultSentence({ ...heatPump, sentence: '' });
    expect(ok).toContain('the figures are consistent with the second law of thermodynamics');
  });

  it('rewrite the “× 10^n” of an older sentence into superscripts', () => {
    const old = { ...photon, sentence: 'The claimed thrust is 1.778 × 10^5 times the bound of 5.003 × 10^-6 N' };
    const p = buildParagraph({ ...input(), checks: [old] });
    expect(p.body).toContain('1.778 × 10⁵ times the bound of 5.003 × 10⁻⁶ N, in conflict with conservation of linear momentum.');
    expect(p.body).not.toContain('^');
  });

  it('come one sentence each, breaking ones first', () => {
    const p = buildParagraph({ ...input(), entries: [entry('ambient-heat-engine')], checks: [heatPump, hotEngine], text: '' });
    const at = (r: ClaimCheckRun) => p.body.indexOf(r.sentence.replace(/\.$/, ''));
    expect(at(hotEngine)).toBeGreaterThan(0);
    expect(at(hotEngine)).toBeLessThan(at(heatPump));
    // Each names the law it was checked against.
    expect(p.body).toContain(`${hotEngine.sentence.replace(/\.$/, '')}, in conflict with the second law of thermodynamics.`);
    expect(p.body).toContain(`${heatPump.sentence.replace(/\.$/, '')}, consistent with the second law of thermodynamics.`);
  });
});

describe('with the planner’s own runs', () => {
  // Invented claims, their figures typed as a reader would fix them, run through the planner.
  const claims: { text: string; figures: FigureInput[]; entries: string[] }[] = [
    {
      text: CAVITY_TEXT,
      figures: [
        { kind: 'thrust', quantity: '0.2 lbf' },
        { kind: 'power', quantity: '1.5 kW', role: 'in' },
      ],
      entries: ['resonant-cavity-thruster', 'sideways-beam-thruster', 'internal-mass-drive'],
    },
    {
      text: 'Our heat pump is 350 % efficient, heating a house to 35 °C from 5 °C outside air.',
      figures: [
        { kind: 'cop', quantity: '3.5', role: 'heating' },
        { kind: 'temperature', quantity: '5 degC', role: 'cold' },
        { kind: 'temperature', quantity: '35 degC', role: 'hot' },
      ],
      entries: ['ambient-heat-engine'],
    },
    {
      text: 'The generator gives back 1.3 kWh for every 1 kWh it takes in. The output voltage times the output current is larger than the input power.',
      figures: [
        { kind: 'energy', quantity: '1 kWh', role: 'in' },
        { kind: 'energy', quantity: '1.3 kWh', role: 'out' },
      ],
      entries: ['over-unity-circuit', 'permanent-magnet-motor'],
    },
  ];

  it.each(claims.map((c) => [c.text.slice(0, 40), c] as const))('%s…: within the limit, numbers in print, one sentence per result', (_t, c) => {
    const figs = c.figures.map((f, i) => readFigure(f, `f${i + 1}`));
    const { checks, needs } = runClaimChecks(figs, { text: c.text });
    expect(checks.length).toBeGreaterThan(0);
    for (const p of Object.values(buildParagraphs({ entries: c.entries.map((s) => entry(s)), checks, needs, figures: figs, text: c.text, style: 'apa' }))) {
      expect(wordCount(p.body)).toBeLessThanOrEqual(PARAGRAPH_WORDS_MAX);
      // No caret power, no e-notation, no long whole number (177806 is printed 1.78 × 10⁵).
      expect(p.body).not.toMatch(/\^|\de[+-]?\d|\b\d{6,}\b/);
      // The finding is not said twice ("Conflicts with …: " is the paragraph's to say).
      expect(p.body).not.toMatch(/(Conflicts|Consistent) with [^:.]+: /);
      for (const r of checks) {
        const first = r.sentence.replace(/^(?:conflicts|consistent) with [^:]+:\s+/i, '').split(/(?<=[.!?])\s+(?=[A-Z])/)[0];
        // Its first sentence is there (up to the numbers put in print); the rest of a long verdict is not.
        expect(p.body).toContain(first.replace(/[.]$/, '').split(/\d{6,}/)[0]);
        const rest = r.sentence.split(/(?<=[.!?])\s+(?=[A-Z])/).slice(1).join(' ');
        if (wordCount(first) >= 8 && rest) expect(p.body).not.toContain(rest);
      }
    }
    if (c.text.startsWith('Our tapered')) expect(buildParagraph({ entries: [entry(c.entries[0])], checks, needs, figures: figs, text: c.text, style: 'apa' }).body).toContain('1.78 × 10⁵ times the photon-rocket bound');
  });
});

describe('words', () => {
  /** A run whose planner sentence is long (about 40 words), to fill the paragraph. */
  const longRun = (i: number): ClaimCheckRun => ({
    ...(i % 2 ? overUnity : photon),
    sentence: `Check ${i + 1}: with the text's own figures the claimed thrust of 0.2 lbf against 1.5 kW of input power comes to ${formatPrint(RATIO_LBF, 3)} times the photon-rocket bound P/c, and at that thrust per watt the device would outrun its own energy supply above the break-even speed.`,
  });
  const longNeeds: ClaimCheckNeed[] = [
    massNeed,
    { check: 'carnot', title: 'Carnot bound', missing: ['the temperature of the cold side', 'the temperature of the hot side'], why: '', uses: [] },
    { check: 'first-law', title: 'First-law balance', missing: ['the energy put in over a whole cycle'], why: '', uses: [] },
    { check: 'rocket-equation', title: 'Rocket equation', missing: ['the dry mass', 'the exhaust speed'], why: '', uses: [] },
  ];
  const texts = [CAVITY_TEXT, ...slugs.flatMap((s) => starter.get(s)?.repliesAndAnswers.map((r) => r.reply) ?? []), '', 'A box that hums.'];

  it(`stay within ${PARAGRAPH_WORDS_MAX} before the references, for the largest realistic inputs`, () => {
    // The longest titles, every reply raised, six long results, four needs, three entries.
    const byTitle = [...slugs].sort((a, b) => wordCount(starter.get(b)!.title) - wordCount(starter.get(a)!.title));
    for (const top of slugs) {
      const entries = [entry(top), ...byTitle.filter((s) => s !== top).slice(0, 2).map((s) => entry(s))];
      for (const text of [CAVITY_TEXT, entries[0].replies[0].reply]) {
        for (const checks of [Array.from({ length: 6 }, (_, i) => longRun(i)), [], [heatPump], [heatPump, hotEngine, overUnity]]) {
          for (const p of all({ entries, checks, needs: longNeeds, text })) {
            expect(wordCount(p.body)).toBeLessThanOrEqual(PARAGRAPH_WORDS_MAX);
            // Trimmed or not, it still names the entry and gives a result.
            expect(p.body).toContain(`“${entries[0].match.title}”`);
            if (checks.length) expect(p.body).toMatch(/Check 1:|Carnot|1\.30 times/);
          }
        }
      }
    }
  });

  it(`stay within ${PARAGRAPH_WORDS_MAX} for any mix of entries, results, needs and texts`, () => {
    const runs = [photon, heatPump, hotEngine, overUnity, longRun(0), longRun(1), { ...photon, sentence: '' }];
    fc.assert(
      fc.property(
        fc.subarray(slugs, { maxLength: 3 }),
        fc.subarray(runs, { maxLength: 6 }),
        fc.subarray(longNeeds),
        fc.constantFrom(...texts),
        fc.constantFrom(...PARAGRAPH_VARIANTS),
        fc.constantFrom<CitationStyle>('apa', 'vancouver', 'harvard'),
        (entries, checks, needs, text, variant, style) => {
          const p = buildParagraph({ entries: entries.map((s) => entry(s)), checks, needs, figures, text, style, variant });
          expect(wordCount(p.body)).toBeLessThanOrEqual(PARAGRAPH_WORDS_MAX);
          expect(p.body).not.toMatch(/\uE000|\uE001|\uE002|undefined|null|\s\s|\[\]|\^/);
        },
      ),
      { numRuns: 150 },
    );
  });

  it('never paste the entry’s lay “in brief” text', () => {
    for (const slug of slugs) {
      const inBrief = starter.get(slug)!.inBrief;
      for (const p of all({ entries: [entry(slug)], checks: [], text: inBrief })) {
        for (const s of sentencesOf(inBrief.replace(/\s+/g, ' '))) if (wordCount(s) >= 6) expect(p.body).not.toContain(s.replace(/[.!?]$/, ''));
      }
    }
  });

  it('are about the mechanism, never the people', () => {
    // Words of accusation, motive or insult (our list; DESIGN.md §8).
    const PEOPLE = /\b(fraud\w*|hoax\w*|scam\w*|swindl\w*|liars?|lying|lies|dishonest\w*|deceiv\w*|decepti\w*|deliberate\w*|cranks?|charlatan\w*|quacks?|incompeten\w*|ignoran\w*|motives?|greed\w*|con artists?|inventors?|you|your|the authors? (fail|failed|ignore|ignored|do not understand))\b/i;
    const PRIOR = [photon, heatPump, hotEngine, overUnity];
    for (const slug of slugs) {
      for (const checks of [[], [PRIOR[slugs.indexOf(slug) % 4]]]) {
        for (const text of [CAVITY_TEXT, ...entry(slug).replies.map((r) => r.reply)]) {
          for (const p of all({ entries: [entry(slug)], checks, text, needs: [massNeed] })) expect(p.body).not.toMatch(PEOPLE);
        }
      }
    }
  });
});

describe('the older call', () => {
  it('still works as the service calls it today: no variant, needs or text, entries without laws or replies, runs without a sentence', () => {
    const old = { ...photon } as Partial<ClaimCheckRun>;
    delete old.law;
    delete old.finding;
    delete old.sentence;
    const e = entry('resonant-cavity-thruster') as Partial<ParagraphEntry>;
    delete e.laws;
    delete e.replies;
    const p: ClaimParagraph = buildParagraph({ entries: [e as ParagraphEntry], checks: [old as ClaimCheckRun], figures, style: 'harvard' });
    expect(p.variant).toBe<ParagraphVariant>('referee');
    expect(p.body).toMatch(/^The manuscript's central claim/);
    // Built from the outputs: the ratio as in print, and the verdict read from verdict.holds.
    expect(p.body).toContain(`the claimed thrust over the bound is ${formatPrint(RATIO_LBF, 3)}`);
    expect(p.body).toMatch(/the figures break/);
    expect(wordCount(p.body)).toBeLessThanOrEqual(PARAGRAPH_WORDS_MAX);
  });
});
