/**
 * The words of the paragraph of a claim check (issue 11, item 4): within the word limit for any
 * input, never the entry’s lay text, about the mechanism and never the people. Inputs are built from the
 * real starter entries and from checks run with runCheck on invented claims (test-support.ts); the
 * claim texts are invented.
 */
import fc from 'fast-check';
import type { CitationStyle } from '../../entries/citations';
import { wordCount } from '../../entries/schema';
import { buildParagraph, PARAGRAPH_WORDS_MAX } from '../paragraph';
import { formatPrint } from '../print';
import { PARAGRAPH_VARIANTS, type ClaimCheckNeed, type ClaimCheckRun } from '../types';
import { all, CAVITY_TEXT, entry, figures, heatPump, hotEngine, massNeed, overUnity, photon, RATIO_LBF, sentencesOf, slugs, starter } from './test-support';

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

  it(`stay within ${PARAGRAPH_WORDS_MAX} with one long result and three needs in an examiner's paragraph (a case fast-check found)`, () => {
    const p = buildParagraph({ entries: [entry('efficiency-above-100-percent')], checks: [longRun(1)], needs: longNeeds.slice(1), figures, text: CAVITY_TEXT, style: 'apa', variant: 'examiner' });
    expect(wordCount(p.body)).toBeLessThanOrEqual(PARAGRAPH_WORDS_MAX);
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
