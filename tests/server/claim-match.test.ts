/**
 * The claim matcher (server/search/claim-match.ts) over the starter entries in a real MariaDB:
 * each of the 36 invented claim texts (tests/fixtures/claim-texts.ts: an abstract, a press release
 * and a patent claim per entry, in other words than the entry's) ranks its entry first; the words
 * reported are the text's own and map to the matched terms; texts about nothing in the library
 * match nothing at all; a text of the longest allowed length is taken.
 *
 * Issue 11: paraphrases in the trade's other words rank their entry first through the synonym
 * groups (content/synonyms.yml), and not without them; a word weighs more than its synonym; the
 * mechanism classes the figures point to break near-ties and admit a hit one strong term short,
 * never one whose words do not match; accepted sightings teach the matcher (through the real
 * sighting, claim and decision routes), at once on this server and through the watermark on
 * another. The invented texts below are ours: invented devices and organisations, no real ones.
 */
import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { SIGNALLABLE_CLASSES } from '../../shared/claims/plan';
import { CLAIM_TEXT_MAX } from '../../shared/claims/types';
import { seedIfEmpty } from '../../server/db/seed';
import { SynonymGroup } from '../../server/models';
import { SearchIndex } from '../../server/search';
import {
  CLASS_BOOST,
  RELATIVE_FLOOR,
  claimCandidates,
  claimConcepts,
  matchClaim,
  strongNeeded,
  MIN_SCORE,
  MIN_STRONG_TERMS,
  MIN_STRONG_TERMS_SHORT,
  type ClaimHit,
} from '../../server/search/claim-match';
import { fold, normaliseTerm } from '../../server/search/normalise';
import { claimTexts, unrelatedTexts } from '../fixtures/claim-texts';
import { CONTENT_DIR, demo, startTestApp, type TestApp } from '../support/app';
import { until } from '../support/poll';

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
  it('hold three texts of 60–200 words, one of each kind, for each of the twelve first entries', () => {
    // Every entry in content/entries is published; the fixture texts cover the twelve first ones.
    expect(index.size).toBe(fs.readdirSync(path.join(CONTENT_DIR, 'entries')).filter((f) => f.endsWith('.md')).length);
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
        // Each word's normalised form is a matched index term or (a prefix match) the start of
        // one, unless it matched only through a synonym group (then it is listed in `synonyms`) …
        for (const w of hit.words) {
          const n = normaliseTerm(w);
          const direct = n !== null && hit.terms.some((term) => term.startsWith(n));
          expect({ w, direct, synonym: hit.synonyms.includes(w) }).toEqual({ w, direct: !hit.synonyms.includes(w), synonym: !direct });
        }
        // … and each matched index term comes from one of the words.
        const norms = hit.words.map((w) => normaliseTerm(w)).filter((n): n is string => n !== null);
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

/** More texts about nothing in the library (ours, invented): each must match no entry at all. */
const offTopic: { name: string; text: string }[] = [
  {
    name: 'a bread recipe',
    text:
      'Overnight country loaf. Mix 500 g of strong white flour with 350 g of lukewarm water and leave it to rest for half an hour. ' +
      'Add 10 g of salt and a spoon of sourdough starter, then fold the dough every thirty minutes for two hours. Shape it into ' +
      'a round, let it rise overnight in a floured basket in the fridge, and bake it in a hot covered pot for forty minutes, ' +
      'removing the lid for the last fifteen so the crust darkens.',
  },
  {
    name: 'a cycling race report',
    text:
      'The fourth stage ended in a bunch sprint after the breakaway was caught two kilometres from the line. The race leader ' +
      "stayed safely in the peloton and keeps the yellow jersey by eight seconds, while the climbers saved their legs for tomorrow's " +
      'mountain finish. Crosswinds split the field briefly on the coast road, and one rider abandoned after a crash at the feed zone.',
  },
  {
    name: 'an abstract on lawful battery chemistry',
    text:
      'We report a layered sodium manganese oxide cathode for sodium-ion batteries that retains 91 % of its capacity after 1,000 ' +
      'charge and discharge cycles at 1 C. Substituting a small fraction of the manganese with titanium suppresses the phase ' +
      'transition that cracks the particles, as in situ X-ray diffraction shows. Full cells with a hard-carbon anode deliver an ' +
      'energy density of 140 Wh/kg, and the coulombic efficiency exceeds 99.8 % after the first cycles. The electrolyte, a sodium ' +
      'salt in carbonate solvents, is unchanged from the common formulation.',
  },
  { name: 'a one-line football report', text: 'The striker scored twice in the second half as the home side moved up to third place.' },
  { name: 'a one-line recipe', text: 'Preheat the oven, whisk the eggs with sugar and fold in the flour before baking for twenty minutes.' },
  { name: 'a company result', text: 'The company reported higher quarterly revenue thanks to strong sales of its power tools.' },
  { name: 'a lawful cell', text: 'A lithium-ion cell stores 250 Wh/kg and keeps 80 % of its capacity after 1,500 cycles.' },
  { name: 'a lawful lift', text: 'The lift motor raises a 1,000 kg car by 30 m in 20 s, drawing 18 kW from the supply.' },
];

describe('texts about nothing in the library', () => {
  it.each(unrelatedTexts.map((u) => [u.name, u.text] as const))('%s matches nothing', (_name, text) => {
    expect(matchClaim(index, text)).toEqual([]);
  });

  it.each(offTopic.map((u) => [u.name, u.text] as const))('%s matches nothing', (_name, text) => {
    expect(matchClaim(index, text)).toEqual([]);
    // Not because nothing was reached: their words do touch entries, only too weakly.
    if (text.length > 300) expect(claimCandidates(index, text).length).toBeGreaterThan(0);
  });

  it('match nothing whatever class the figures point to, when they are longer than a sentence', () => {
    // (For a sentence, the class its figures point to may admit an entry on one strong word.)
    // The figures point to SIGNALLABLE_CLASSES only (each boosts the classes below it too).
    for (const { text } of [...unrelatedTexts, ...offTopic].filter((t) => t.text.length > 300)) {
      for (const c of SIGNALLABLE_CLASSES) expect(matchClaim(index, text, { classes: [c] })).toEqual([]);
    }
  });

  it('gives nothing for a text of figures and common words only', () => {
    expect(matchClaim(index, 'We say that it was 20 % and 1.5 kW, and then 300 K, or 0.2 lbf, as we had said it would be before.')).toEqual([]);
    expect(matchClaim(index, '')).toEqual([]);
  });

  it('leaves out words with digits, words under three letters and the common words of prose', () => {
    // "mN", "kW", "of", "it", "is" and "2.45" are in every claim; none of them may carry a match.
    expect(matchClaim(index, 'It is 2.45 mN at 1 kW, so it is on, or it is up; we do go by it.')).toEqual([]);
  });
});

describe('strong evidence', () => {
  it('needs more strong terms and weight for a long text than for a sentence', () => {
    // Rules of thumb (common practice, no source): see claim-match.ts.
    expect(strongNeeded(5).count).toBe(MIN_STRONG_TERMS_SHORT);
    expect(strongNeeded(200).count).toBe(MIN_STRONG_TERMS);
    expect(strongNeeded(200).weight).toBeGreaterThan(strongNeeded(10).weight);
    for (let t = 1; t < 200; t++) {
      expect(strongNeeded(t + 1).count).toBeGreaterThanOrEqual(strongNeeded(t).count);
      expect(strongNeeded(t, true).count).toBe(Math.max(1, strongNeeded(t).count - 1));
      expect(strongNeeded(t, true).weight).toBeLessThan(strongNeeded(t).weight);
    }
  });

  it('is met by every hit of the fixture texts', () => {
    for (const t of claimTexts) {
      for (const c of claimCandidates(index, t.text).filter((x) => x.passes)) {
        expect(c.strong.count).toBeGreaterThanOrEqual(c.needed.count);
        expect(c.strong.weight).toBeGreaterThanOrEqual(c.needed.weight);
      }
    }
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

/**
 * Paraphrases in the trade's other words (ours, invented). `through`: the text shares too few of
 * the entry's own words to be matched without the synonym groups.
 */
const paraphrases: { slug: string; through?: boolean; text: string }[] = [
  { slug: 'resonant-cavity-thruster', through: true, text: 'A frustum-shaped copper resonator fed by a klystron is offered as a reactionless space drive for small satellites.' },
  { slug: 'resonant-cavity-thruster', through: true, text: 'The inventors pump radio frequency power into a truncated cone and report a one-way force on the thrust stand, with no exhaust at all.' },
  { slug: 'water-fuelled-engine', text: 'Bolt on an HHO generator: oxyhydrogen from the electrolyser feeds the intake, and the makers promise double the miles per gallon from tap water.' },
  { slug: 'overbalanced-wheel', text: 'His gravity motor uses shifting weights on a rim and is said to run by itself, lighting a shed through a small dynamo.' },
  { slug: 'vacuum-energy-generator', text: 'The module harvests aether energy from vacuum fluctuations and keeps a phone charged with no battery and no fuel.' },
  { slug: 'ambient-heat-engine', through: true, text: 'An isothermal engine that draws environmental heat from the room and turns it into shaft work, with no cold side.' },
  { slug: 'gyroscopic-thruster', text: 'A pair of precessing gyrostats lets the drone hover: the rig weighs less on the scale while they run, the makers say, a kind of antigravity.' },
  { slug: 'internal-mass-drive', text: 'An inertial thruster with an eccentric weight swinging inside a sealed housing creeps forward across the lab bench.' },
  { slug: 'sideways-beam-thruster', text: 'An electron beam is bent by a sideways force and caught in a beam dump on board; the designers claim forward thrust from the lost axial speed.' },
  { slug: 'self-spinning-body', text: 'A self-rotating satellite that can spin itself up with an internal torque and keep turning after its wheel stops.' },
  { slug: 'permanent-magnet-motor', text: 'A magnet wheel of neodymium magnets on a stator ring keeps turning past the sticking point and lights a lamp without a supply.' },
  // (Not "it recharges itself": since issue 12 an entry of its own covers self-charging loops.)
  { slug: 'over-unity-circuit', through: true, text: 'A bifilar coil and a bank of supercapacitors make this overunity device self-sustaining: it keeps a lamp lit.' },
  { slug: 'buoyancy-wheel', text: 'Pontoons on a belt rise through a column of water by upthrust and come back down through the air, driving a generator forever.' },
];

describe('the trade’s synonyms', () => {
  it('are loaded from content/synonyms.yml into the index', () => {
    expect(index.synonyms.size).toBeGreaterThanOrEqual(40);
  });

  it.each(paraphrases.map((p) => [p.slug, p.text] as const))('a paraphrase of %s ranks it first', (slug, text) => {
    const [hit] = matchClaim(index, text);
    expect(hit?.entry.slug).toBe(slug);
  });

  it('report the words that matched through a group, as written', () => {
    for (const p of paraphrases.filter((x) => x.through)) {
      const [hit] = matchClaim(index, p.text);
      expect(hit.synonyms.length).toBeGreaterThan(0);
      for (const w of hit.synonyms) {
        expect(hit.words).toContain(w);
        expect(firstAt(p.text, w)).toBeGreaterThanOrEqual(0);
      }
    }
    const [cavity] = matchClaim(index, paraphrases[0].text);
    expect(cavity.synonyms).toEqual(expect.arrayContaining(['frustum', 'klystron', 'reactionless']));
  });

  it('find phrases of several words, the longest at each place', () => {
    const group = (t: string) => [...index.synonyms.groups].find(([, terms]) => terms.includes(t))![0];
    const found = (text: string) => claimConcepts(index, text).map((c) => c.term);
    // "reaction mass" (two words) is in the group of "propellant" …
    expect(found('It throws out no reaction mass at all.')).toContain(`⟨syn:${group('propellant')}⟩`);
    // … and "propellant-free" is its own group's phrase, not also the word "propellant".
    expect(found('A propellant-free drive.')).toEqual([`⟨syn:${group('propellant-free')}⟩`]);
    // Stop words inside a phrase are skipped on both sides; case, plurals and accents are folded.
    expect(found('PERPETUAL MOTION OF THE SECOND KIND')).toEqual([`⟨syn:${group('perpetual motion of the second kind')}⟩`]);
    expect(found('two Frustums')).toEqual([`⟨syn:${group('frustum')}⟩`]);
  });

  it('weigh a word of the text more than its synonym', () => {
    const own = 'A sealed copper cavity fed with microwaves pushes itself along with nothing leaving it.';
    const other = own.replace('cavity', 'frustum');
    const score = (text: string) => matchClaim(index, text).find((h) => h.entry.slug === 'resonant-cavity-thruster')?.score ?? 0;
    expect(score(other)).toBeGreaterThan(0);
    expect(score(own)).toBeGreaterThan(score(other));
    const frustumOnly = 'A sealed copper frustum fed with microwaves pushes itself along with nothing leaving it.';
    expect(matchClaim(index, frustumOnly)[0].synonyms).toEqual(['frustum']);
  });
});

describe('the classes the figures point to', () => {
  // Near a tie between two propellant-free entries (ours, invented).
  const tie = 'A sealed box with a microwave source and a weight sliding back and forth inside creeps across the table.';
  const slugs = (hits: ClaimHit[]) => hits.map((h) => h.entry.slug);

  it('leave the answer as it was when none are given (the signature is unchanged)', () => {
    for (const t of claimTexts.slice(0, 6)) {
      expect(matchClaim(index, t.text, { classes: [] })).toEqual(matchClaim(index, t.text));
      expect(matchClaim(index, t.text, { classes: ['no-such-class'] })).toEqual(matchClaim(index, t.text));
    }
  });

  it('break a near-tie towards the entry in the class signalled', () => {
    const plain = matchClaim(index, tie);
    expect(slugs(plain).slice(0, 2).sort()).toEqual(['internal-mass-drive', 'resonant-cavity-thruster']);
    expect(plain[1].score / plain[0].score).toBeGreaterThan(1 / (1 + CLASS_BOOST));
    expect(plain.every((h) => !h.classSignalled)).toBe(true);
    for (const [cls, slug] of [
      ['internal-mass-motion', 'internal-mass-drive'],
      ['enclosed-radiation', 'resonant-cavity-thruster'],
    ] as const) {
      const hits = matchClaim(index, tie, { classes: [cls] });
      expect(hits[0].entry.slug).toBe(slug);
      expect(hits[0].classSignalled).toBe(true);
      expect(hits[0].score).toBeCloseTo(plain.find((h) => h.entry.slug === slug)!.score * (1 + CLASS_BOOST), 9);
    }
  });

  it('boost the children of a class signalled, and only them', () => {
    const plain = matchClaim(index, tie);
    const boosted = matchClaim(index, tie, { classes: ['propellant-free-thrust'] });
    const under = index.classAndChildren('propellant-free-thrust');
    for (const h of boosted) {
      const before = plain.find((p) => p.entry.slug === h.entry.slug)!;
      expect(h.classSignalled).toBe(under.has(h.entry.mechanismClass!));
      expect(h.score).toBeCloseTo(before.score * (h.classSignalled ? 1 + CLASS_BOOST : 1), 9);
    }
    expect(boosted.filter((h) => h.classSignalled).length).toBeGreaterThanOrEqual(2);
  });

  it('admit a hit one strong term short, and never an entry whose words do not match', () => {
    // Among the fixture texts, an entry that one strong term too few keeps out (and nothing else).
    const found = claimTexts
      .flatMap((t) => claimCandidates(index, t.text).map((c) => ({ t, c })))
      .find(
        ({ t, c }) =>
          !c.passes &&
          c.strong.count === c.needed.count - 1 &&
          matchClaim(index, t.text, { limit: 12, classes: [c.hit.entry.mechanismClass!] }).some((h) => h.entry.slug === c.hit.entry.slug),
      );
    expect(found).toBeDefined();
    const { t, c } = found!;
    const slug = c.hit.entry.slug;
    expect(slugs(matchClaim(index, t.text, { limit: 12 }))).not.toContain(slug);
    const hits = matchClaim(index, t.text, { limit: 12, classes: [c.hit.entry.mechanismClass!] });
    expect(slugs(hits)).toContain(slug);
    expect(hits.find((h) => h.entry.slug === slug)!.classSignalled).toBe(true);
    const text = t.text;
    // Whatever class is signalled, a hit still rests on the text's own words: strong terms, and a
    // score of its own that the boost only multiplies (texts about nothing: see above).
    for (const t of [tie, text, ...paraphrases.map((p) => p.text)]) {
      for (const cls of index.classes.keys()) {
        const cands = claimCandidates(index, t, { classes: [cls] });
        for (const h of matchClaim(index, t, { limit: 12, classes: [cls] })) {
          const c = cands.find((x) => x.hit.entry.slug === h.entry.slug)!;
          expect(c.strong.count).toBeGreaterThanOrEqual(MIN_STRONG_TERMS_SHORT);
          expect(h.words.length).toBeGreaterThanOrEqual(MIN_STRONG_TERMS_SHORT);
          expect(c.raw * (1 + CLASS_BOOST)).toBeGreaterThanOrEqual(MIN_SCORE);
        }
      }
    }
  });
});

describe('accepted sightings teach the matcher', () => {
  // Ours, invented: a device name and wording the water-fuelled entry never uses.
  const sighting = {
    title: 'Tidewell booster sold to lorry fleets',
    seenAtUrl: 'https://fleet-news.example.org/tidewell-booster',
    summary:
      'A supplier offers the Tidewell booster, a dashboard unit that cracks tap water and feeds the result to the diesel intake of ' +
      'lorries, promising lower diesel bills for fleet operators.',
  };
  const text =
    'Fleet operators are fitting the Tidewell booster to their lorries: a dashboard unit cracks tap water for the diesel intake, ' +
    'and the supplier promises much lower diesel bills.';
  const slug = 'water-fuelled-engine';

  const submit = async () => {
    const contributor = await h.signedIn(demo.contributor.email);
    const res = await contributor.agent
      .post('/api/sightings')
      .set('X-CSRF-Token', contributor.csrf)
      .field('title', sighting.title)
      .field('seenAtUrl', sighting.seenAtUrl)
      .field('summary', sighting.summary);
    expect(res.status).toBe(201);
    return res.body.submission.id as number;
  };

  it('rank the entry first for a text close to a sighting only once it is accepted, here at once and elsewhere through the watermark', async () => {
    // Another app server's index, refreshed from the watermark.
    const other = new SearchIndex({ refreshMs: 100 });
    await other.ready();
    other.start();
    try {
      const before = matchClaim(index, text);
      expect(before[0]?.entry.slug).not.toBe(slug);
      const search = async () => (await request(h.app).get('/api/search?q=Tidewell').expect(200)).body.results.map((r: { slug: string }) => r.slug);
      expect(await search()).not.toContain(slug);

      const moderator = await h.signedIn(demo.moderator.email);
      // A rejected sighting teaches nothing.
      const rejected = await submit();
      expect((await moderator.post(`/api/submissions/${rejected}/claim`)).status).toBe(200);
      expect((await moderator.post(`/api/submissions/${rejected}/decide`, { decision: 'reject', note: 'Not a claim we can check.' })).status).toBe(200);
      expect(await search()).not.toContain(slug);

      const id = await submit();
      expect((await moderator.post(`/api/submissions/${id}/claim`)).status).toBe(200);
      const decided = await moderator.post(`/api/submissions/${id}/decide`, { decision: 'accept', entries: [slug] });
      expect(decided.status).toBe(200);
      // This app server's own index has it when the answer comes.
      expect(await search()).toContain(slug);
      // Another server's index follows the watermark.
      await until('the other index matches the text', async () => matchClaim(other, text)[0]?.entry.slug === slug);
      const [hit] = matchClaim(other, text);
      expect(hit.words).toEqual(expect.arrayContaining(['Tidewell', 'booster', 'lorries', 'diesel']));
      await index.rebuild();
      expect(matchClaim(index, text)[0]?.entry.slug).toBe(slug);
    } finally {
      await other.stop();
    }
  });
});

describe('without the synonym groups', () => {
  afterAll(async () => {
    // Back as they were: the starter groups go into the empty table again.
    await seedIfEmpty(h.t.sequelize, CONTENT_DIR);
    await index.rebuild();
  });

  it('the paraphrases that rest on them no longer rank their entry first', async () => {
    await SynonymGroup.destroy({ where: {} });
    await index.rebuild();
    expect(index.synonyms.size).toBe(0);
    for (const p of paraphrases.filter((x) => x.through)) expect(matchClaim(index, p.text)[0]?.entry.slug).not.toBe(p.slug);
    // The fixture texts do not need them.
    for (const t of claimTexts) expect(matchClaim(index, t.text)[0]?.entry.slug).toBe(t.slug);
  });
});
