/**
 * The paragraph of a claim check, in its four variants (issue 11, item 4). Inputs are built from the
 * real starter entries (content/entries/*.md, read with shared/entries/load.ts; law names from
 * content/taxonomy.yml) and from checks run with runCheck on invented claims; the claim texts are
 * invented. References are formatted by citation-js (the reference library) and checked against the
 * style manuals' visible rules (APA 7 §10.2 entry in a reference work; Vancouver/NLM "Citing
 * Medicine" ch. 24–25 "[cited …] Available from:"; Harvard (Cite Them Right) "Available at: …
 * (Accessed: …)"; from memory). Words of each practice: patent practice's "inoperable", "lack of
 * utility", "industrial applicability" (the trade's terms; from memory). *
 * The rejoinder and the word limit are tested in shared/claims/paragraph/ (replies, words).
 */
import { formatCitation, type CitationStyle } from '../entries/citations';
import { wordCount, type EntryFile } from '../entries/schema';
import { buildParagraph, buildParagraphs, lawInProse, PARAGRAPH_WORDS_MAX, resultSentence, type ParagraphEntry } from './paragraph';
import { readFigure } from './figures';
import { runClaimChecks } from './plan';
import { formatPrint } from './print';
import { PARAGRAPH_VARIANTS, type ClaimCheckRun, type ClaimParagraph, type FigureInput, type ParagraphVariant } from './types';
import { all, CAVITY_TEXT, entry, figures, heatPump, hotEngine, input, massNeed, overUnity, photon, RATIO_LBF, starter, url } from './paragraph/test-support';

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
        expect(cw).toBe(`Quillfeather A. ${title}. In: Counterweight [Internet]. Version 2. 2026 [cited 2026 Dec 1]. Available from: ${url('resonant-cavity-thruster', 2)}`);
      } else {
        expect(cw).toMatch(/^Quillfeather, A\. \(2026\) .*Counterweight\. Version 2\. Available at: https:\/\/counterweight\.example\.org\/entries\/resonant-cavity-thruster\/v\/2 \(Accessed: .*2026\)\.$/);
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
