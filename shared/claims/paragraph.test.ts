/**
 * The referee paragraph: what it names, the order of its numbered references, and each reference
 * in the chosen style — formatted by citation-js (the reference library) and checked against the
 * style manuals' visible rules (APA 7 §10.2 entry in a reference work; Vancouver/NLM "Citing
 * Medicine" ch. 24–25 "[cited …] Available from:"; Harvard (Cite Them Right) "Available at: …
 * (Accessed: …)"; from memory). Entries and results below are invented test data.
 */
import { formatCitation, type CslItem } from '../entries/citations';
import { buildParagraph, type ParagraphEntry } from './paragraph';
import type { ClaimCheckRun, Figure } from './types';

const url = (slug: string) => `https://counterweight.example.org/entries/${slug}/v/2`;
const entryItem = (slug: string, title: string): CslItem => ({
  id: `${slug}-v2`,
  type: 'entry-encyclopedia',
  title,
  'container-title': 'Counterweight',
  version: '2',
  author: [{ given: 'Ada', family: 'Quillfeather' }],
  issued: { 'date-parts': [[2026, 10, 4]] },
  accessed: { 'date-parts': [[2026, 12, 1]] },
  URL: url(slug),
});
const book: CslItem = { id: 'textbook', type: 'book', title: 'Mechanics for engineers', author: [{ given: 'Imogen', family: 'Marsh' }], issued: { 'date-parts': [[1999]] }, publisher: 'Example Press' };
const article: CslItem = {
  id: 'paper',
  type: 'article-journal',
  title: 'On the momentum of light in cavities',
  author: [{ given: 'Tomas', family: 'Eld' }],
  issued: { 'date-parts': [[2004]] },
  'container-title': 'Journal of Invented Physics',
  volume: '12',
  page: '33-41',
};

const top: ParagraphEntry = {
  match: { slug: 'closed-cavity', title: 'Thrust from light trapped in a closed cavity', version: 2, score: 40, terms: ['cavity'], words: ['cavity'], url: url('closed-cavity'), inBrief: 'A closed box cannot push itself' },
  item: entryItem('closed-cavity', 'Thrust from light trapped in a closed cavity'),
  sources: [book, article, { ...book, id: 'third', title: 'Not cited: only two sources are' }],
  questions: ['Was the thrust measured in vacuum?', 'What did a dummy load give'],
};
const second: ParagraphEntry = {
  match: { slug: 'sideways-beam', title: 'Beams that push sideways', version: 2, score: 12, terms: ['beam'], words: ['beam'], url: url('sideways-beam'), inBrief: 'x' },
  item: entryItem('sideways-beam', 'Beams that push sideways'),
  sources: [article],
  questions: [],
};
const figures: Figure[] = [
  { id: 'f1', kind: 'thrust', quantity: '0.2 lbf', text: '0.2 lbf', start: 10, end: 17, si: 0.8896, unit: 'N', display: '889.6 mN', role: null },
  { id: 'f2', kind: 'power', quantity: '1.5 kW', text: '1.5 kW', start: 30, end: 36, si: 1500, unit: 'W', display: '1.5 kW', role: 'in' },
];
const check: ClaimCheckRun = {
  check: 'photon-bound',
  inputs: { F_claimed: '0.2 lbf', P: '1.5 kW' },
  uses: ['f1', 'f2'],
  why: 'w',
  assumptions: [],
  title: 'Photon-rocket bound',
  outputs: [],
  verdict: { holds: false, message: 'The claimed thrust is 177806 times the photon-rocket bound' },
  inputsUsed: {},
  permalink: '/checks/photon-bound?F_claimed=0.2%20lbf&P=1.5%20kW',
};

describe.each(['apa', 'vancouver', 'harvard'] as const)('in %s', (style) => {
  const p = buildParagraph({ entries: [top, second], checks: [check], figures, style });

  it('names the entries with their versions and permanent URLs, and the computed result', () => {
    expect(p.body).toContain('“Thrust from light trapped in a closed cavity”, version 2 (https://counterweight.example.org/entries/closed-cavity/v/2) [1]');
    expect(p.body).toContain('“Beams that push sideways”, version 2 (https://counterweight.example.org/entries/sideways-beam/v/2)');
    expect(p.body).toContain('177806 times the photon-rocket bound');
    expect(p.body).toContain('0.2 lbf = 889.6 mN');
    expect(p.body).toContain('Was the thrust measured in vacuum?');
  });

  it('numbers the references in order of first citation, entries and their sources', () => {
    expect(p.references.map((r) => [r.n, r.id, r.counterweight])).toEqual([
      [1, 'closed-cavity-v2', true],
      [2, 'textbook', false],
      [3, 'paper', false],
      [4, 'sideways-beam-v2', true],
    ]);
    expect(p.body).toContain('[2, 3]');
    expect(p.body).toContain('[4]');
    // Every marker points at a listed reference.
    for (const m of p.body.matchAll(/\[(\d+(?:, \d+)*)\]/g)) for (const k of m[1].split(', ')) expect(Number(k)).toBeLessThanOrEqual(p.references.length);
  });

  it('formats each reference with citation-js in the style', () => {
    expect(p.references.map((r) => r.text)).toEqual([top.item, book, article, second.item].map((i) => formatCitation(i, style, 'text')));
    const cw = p.references[0].text;
    if (style === 'apa') {
      expect(cw).toBe('Quillfeather, A. (2026). Thrust from light trapped in a closed cavity. In Counterweight (Version 2). https://counterweight.example.org/entries/closed-cavity/v/2');
      expect(p.references[1].text).toBe('Marsh, I. (1999). Mechanics for engineers. Example Press.');
    } else if (style === 'vancouver') {
      expect(cw).toMatch(/^Quillfeather A\. Thrust from light trapped in a closed cavity\. In: Counterweight \[Internet\]\. 2026 \[cited 2026 Dec 1\]\. Available from: https:\/\/counterweight\.example\.org\/entries\/closed-cavity\/v\/2$/);
      expect(p.references[2].text).toBe('Eld T. On the momentum of light in cavities. Journal of Invented Physics. 2004;12:33-41.');
    } else {
      expect(cw).toMatch(/^Quillfeather, A\. \(2026\) .*Counterweight\. Available at: https:\/\/counterweight\.example\.org\/entries\/closed-cavity\/v\/2 \(Accessed: .*2026\)\.$/);
    }
  });

  it('puts body, heading and numbered list in the text to copy', () => {
    const lines = p.text.trimEnd().split('\n');
    expect(lines[0]).toBe(p.body);
    expect(lines[2]).toBe('References');
    expect(lines.slice(3)).toEqual(p.references.map((r) => `${r.n}. ${r.text}`));
  });
});

it('speaks of the claim, not of people', () => {
  const p = buildParagraph({ entries: [top], checks: [check], figures, style: 'apa' });
  expect(p.body).not.toMatch(/\b(you|your|fraud|liar|crank|dishonest|incompetent|hoax)\b/i);
});

it('still gives a paragraph with no match and no figures', () => {
  const p = buildParagraph({ entries: [], checks: [], figures: [], style: 'vancouver' });
  expect(p.body).toMatch(/No entry of the Counterweight library matched/);
  expect(p.body).toMatch(/no figures with units/);
  expect(p.references).toEqual([]);
  expect(p.text).toBe(`${p.body}\n`);
});
