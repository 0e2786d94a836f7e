/**
 * The claim matcher (server/search/claim-match.ts) over the starter entries in a real MariaDB:
 * each of the 36 invented claim texts (tests/fixtures/claim-texts.ts: an abstract, a press release
 * and a patent claim per entry, in other words than the entry's) ranks its entry first; the words
 * reported are the text's own and map to the matched terms; texts about nothing in the library
 * match nothing strongly; a text of the longest allowed length is taken.
 */
import { CLAIM_TEXT_MAX } from '../../shared/claims/types';
import { SearchIndex } from '../../server/search';
import { RELATIVE_FLOOR, matchClaim, type ClaimHit } from '../../server/search/claim-match';
import { fold, normaliseTerm } from '../../server/search/normalise';
import { claimTexts, unrelatedTexts } from '../fixtures/claim-texts';
import { startTestApp, type TestApp } from '../support/app';

jest.setTimeout(120_000);

let h: TestApp;
let index: SearchIndex;
beforeAll(async () => {
  h = await startTestApp({ starterEntries: true, searchRefreshMs: 0 });
  // The app keeps its index to itself; this one reads the same database the same way.
  index = new SearchIndex({ refreshMs: 0 });
  await index.ready();
});
afterAll(async () => {
  await index?.stop();
  await h?.close();
});

/** Offset of the first appearance of `word` as a whole word in `text` (-1 if none). */
const firstAt = (text: string, word: string) => {
  const esc = word.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  return text.search(new RegExp(`(?<![\\p{L}\\p{M}\\p{N}])${esc}(?![\\p{L}\\p{M}\\p{N}])`, 'u'));
};

describe('the fixtures', () => {
  it('hold three texts of 60–200 words, one of each kind, for every starter entry', () => {
    expect(index.size).toBe(12);
    const slugs = [...new Set(claimTexts.map((t) => t.slug))].sort();
    expect(slugs).toHaveLength(12);
    for (const slug of slugs) expect(claimTexts.filter((t) => t.slug === slug).map((t) => t.kind).sort()).toEqual(['abstract', 'patent', 'press']);
    for (const t of claimTexts) {
      const words = t.text.split(/\s+/).length;
      expect(words).toBeGreaterThanOrEqual(60);
      expect(words).toBeLessThanOrEqual(200);
    }
  });
});

describe('ranking (invented claim texts)', () => {
  it.each(claimTexts.map((t) => [t.slug, t.kind, t.text] as const))('%s (%s) ranks its entry first', (slug, _kind, text) => {
    const hits = matchClaim(index, text);
    expect(hits[0]?.entry.slug).toBe(slug);
    expect(hits[0].score).toBeGreaterThan(0);
    expect(hits[0].terms.length).toBeGreaterThan(0);
    expect(hits.length).toBeLessThanOrEqual(5);
  });
});

describe('hits', () => {
  const all = () => claimTexts.map((t) => ({ t, hits: matchClaim(index, t.text, { limit: 12 }) }));

  it('report words of the text as written, each once, in order of first appearance, that map to the matched terms', () => {
    for (const { t, hits } of all()) {
      for (const hit of hits) {
        expect(hit.words.length).toBeGreaterThan(0);
        const at = hit.words.map((w) => firstAt(t.text, w));
        expect(at.every((i) => i >= 0)).toBe(true);
        expect([...at].sort((a, b) => a - b)).toEqual(at);
        expect(new Set(hit.words.map(fold)).size).toBe(hit.words.length);
        // Each word's normalised form is a matched index term or (a prefix match) the start of one …
        for (const w of hit.words) {
          const n = normaliseTerm(w)!;
          expect(hit.terms.some((term) => term.startsWith(n))).toBe(true);
        }
        // … and each matched index term comes from one of the words.
        const norms = hit.words.map((w) => normaliseTerm(w)!);
        for (const term of hit.terms) expect(norms.some((n) => term.startsWith(n))).toBe(true);
      }
    }
  });

  it('come best first, none below the relative floor, at most `limit` of them, each entry once', () => {
    for (const { hits } of all()) {
      const scores = hits.map((x) => x.score);
      expect([...scores].sort((a, b) => b - a)).toEqual(scores);
      for (const s of scores) expect(s).toBeGreaterThanOrEqual(scores[0] * RELATIVE_FLOOR);
      expect(new Set(hits.map((x) => x.entry.slug)).size).toBe(hits.length);
    }
    const text = claimTexts[0].text;
    expect(matchClaim(index, text, { limit: 1 })).toHaveLength(1);
    expect(matchClaim(index, text, { limit: 0 })).toEqual([]);
    expect(matchClaim(index, text, { limit: 1 })[0].entry.slug).toBe(matchClaim(index, text)[0].entry.slug);
  });

  it('carry the indexed entry: title, version and the plain brief', () => {
    const [hit] = matchClaim(index, claimTexts.find((t) => t.slug === 'buoyancy-wheel')!.text);
    expect(hit.entry).toMatchObject({ slug: 'buoyancy-wheel', version: 1, title: expect.any(String), inBrief: expect.any(String) });
    expect(hit.entry.inBrief).not.toMatch(/[*_$`]/);
  });
});

describe('texts about nothing in the library', () => {
  const weakestTop = () => Math.min(...claimTexts.map((t) => matchClaim(index, t.text)[0]?.score ?? Infinity));

  it.each(unrelatedTexts.map((u) => [u.name, u.text] as const))('%s matches nothing, or only weakly', (_name, text) => {
    const hits: ClaimHit[] = matchClaim(index, text);
    // "Weakly": under half the score of the weakest top hit of the 36 claim texts (our own rule).
    const bar = weakestTop() / 2;
    for (const hit of hits) expect(hit.score).toBeLessThan(bar);
  });

  it('gives nothing for a text of figures and common words only', () => {
    expect(matchClaim(index, 'We say that it was 20 % and 1.5 kW, and then 300 K, or 0.2 lbf, as we had said it would be before.')).toEqual([]);
    expect(matchClaim(index, '')).toEqual([]);
  });
});

describe('long texts', () => {
  it(`takes ${CLAIM_TEXT_MAX} characters of mixed claims, with its terms capped`, () => {
    let text = '';
    for (let i = 0; text.length < CLAIM_TEXT_MAX; i++) text += `${claimTexts[i % claimTexts.length].text} `;
    text = text.slice(0, CLAIM_TEXT_MAX);
    const hits = matchClaim(index, text);
    expect(hits.length).toBeGreaterThan(0);
    expect(hits.length).toBeLessThanOrEqual(5);
    for (const hit of hits) for (const w of hit.words) expect(firstAt(text, w)).toBeGreaterThanOrEqual(0);
  });

  it('still finds the entry of one claim padded with unrelated sentences to the full length', () => {
    const claim = claimTexts.find((t) => t.slug === 'water-fuelled-engine' && t.kind === 'press')!.text;
    const filler = ` ${unrelatedTexts.map((u) => u.text).join(' ')}`;
    const text = (claim + filler.repeat(Math.ceil(CLAIM_TEXT_MAX / filler.length))).slice(0, CLAIM_TEXT_MAX);
    expect(matchClaim(index, text)[0]?.entry.slug).toBe('water-fuelled-engine');
  });
});
