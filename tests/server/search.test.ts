/**
 * GET /api/search over the starter entries (supertest, real MariaDB): queries in other words than
 * the entries' own rank the intended entry first, misspellings still find it, filters and facets,
 * validation, the excerpt's escaping, and answers while the index builds. The query texts are
 * invented test data.
 */
import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { createApp, type AppLocals } from '../../server/app';
import { excerpt } from '../../server/search';
import { normaliseTerm, plainText } from '../../server/search/normalise';
import { CONTENT_DIR, startTestApp, type TestApp } from '../support/app';
import { until } from '../support/poll';

jest.setTimeout(120_000);

let h: TestApp;
beforeAll(async () => {
  h = await startTestApp({ starterEntries: true, searchRefreshMs: 0 });
});
afterAll(() => h?.close());

const search = (query: Record<string, string | number>) => h.client().then((c) => c.get('/api/search').query(query));

describe('ranking (invented test queries)', () => {
  it.each([
    ['sealed microwave resonator push', 'resonant-cavity-thruster'],
    ['wheel with weights that never stops', 'overbalanced-wheel'],
    ['engine running on ambient heat alone', 'ambient-heat-engine'],
    ['microwve cavty thrustr', 'resonant-cavity-thruster'],
    ['overbalansed wheal', 'overbalanced-wheel'],
  ])('"%s" ranks %s first', async (q, slug) => {
    const res = await search({ q });
    expect(res.status).toBe(200);
    expect(res.body.results[0]?.slug).toBe(slug);
    expect(res.body.results[0].score).toBeGreaterThan(0);
    expect(res.body.results[0].terms.length).toBeGreaterThan(0);
  });

  it('answers in the contract shape', async () => {
    const res = await search({ q: 'microwave cavity' });
    expect(res.body).toMatchObject({ query: 'microwave cavity', total: expect.any(Number), facets: { laws: expect.any(Object), mechanisms: expect.any(Object) } });
    const top = res.body.results[0];
    expect(top).toEqual({
      slug: 'resonant-cavity-thruster',
      title: expect.any(String),
      version: 1,
      score: expect.any(Number),
      terms: expect.arrayContaining(['cavity', 'microwav']),
      // The reader's own words, as typed (both normalise to a matched term).
      matched: expect.arrayContaining(['microwave', 'cavity']),
      excerpt: expect.stringContaining('<mark>'),
      laws: ['linear-momentum', 'energy'],
      mechanismClass: 'enclosed-radiation',
      inBrief: expect.any(String),
    });
    expect(top.inBrief).not.toMatch(/[*_$`]/);
    // A built index answers in full: no `partial` flag.
    expect(res.body).not.toHaveProperty('partial');
  });

  it('lists every published entry, newest first, for an empty query', async () => {
    const res = await search({ q: '', limit: 50 });
    // Every entry file of content/entries is published at start.
    const published = fs.readdirSync(path.join(CONTENT_DIR, 'entries')).filter((f) => f.endsWith('.md')).length;
    expect(published).toBeGreaterThanOrEqual(22);
    expect(res.body.total).toBe(published);
    expect(res.body.results).toHaveLength(published);
    expect(res.body.results.every((r: { score: number; terms: string[] }) => r.score === 0 && r.terms.length === 0)).toBe(true);
    const all = await (await h.client()).get('/api/entries?limit=100');
    expect(res.body.results.map((r: { slug: string }) => r.slug)).toEqual(all.body.entries.map((e: { slug: string }) => e.slug));
  });
});

describe('filters and facets', () => {
  it('filters by law and by mechanism class with its children; each facet ignores its own filter', async () => {
    const all = await search({ q: '', limit: 50 });
    const entropy = await search({ q: '', law: 'entropy', limit: 50 });
    expect(entropy.body.total).toBe(all.body.facets.laws.entropy);
    expect(entropy.body.results.every((r: { laws: string[] }) => r.laws.includes('entropy'))).toBe(true);
    // The law facet with a law chosen still counts every law (its own filter ignored) …
    expect(entropy.body.facets.laws).toEqual(all.body.facets.laws);
    // … while the mechanism facet counts only entries under that law.
    // (A class counts the entries of its children too: summed over the top classes, each entry once.)
    const tax = (await (await h.client()).get('/api/taxonomy')).body as { classes: { slug: string; parentSlug: string | null }[] };
    const tops = tax.classes.filter((c) => c.parentSlug === null).map((c) => c.slug);
    const sumTops = (o: Record<string, number>) => tops.reduce((a, slug) => a + (o[slug] ?? 0), 0);
    expect(sumTops(entropy.body.facets.mechanisms)).toBe(entropy.body.total);

    const parent = await search({ q: '', mechanism: 'propellant-free-thrust', limit: 50 });
    expect(parent.body.results.map((r: { slug: string }) => r.slug)).toContain('resonant-cavity-thruster');
    expect(parent.body.results.every((r: { mechanismClass: string }) => r.mechanismClass !== 'overbalanced-wheel')).toBe(true);
    expect(parent.body.facets.mechanisms).toEqual(all.body.facets.mechanisms);
  });

  it.each(['', 'energy', 'thrust'])('counts a parent class with its children, as its filter lists them (q = "%s")', async (q) => {
    const tax = (await (await h.client()).get('/api/taxonomy')).body as { classes: { slug: string; parentSlug: string | null }[] };
    const parents = tax.classes.filter((c) => tax.classes.some((d) => d.parentSlug === c.slug));
    expect(parents.length).toBeGreaterThan(0);
    const all = await search({ q, limit: 50 });
    // Every class's chip count is the total that choosing it gives.
    for (const c of tax.classes) {
      const chosen = await search({ q, mechanism: c.slug, limit: 50 });
      expect([c.slug, all.body.facets.mechanisms[c.slug] ?? 0]).toEqual([c.slug, chosen.body.total]);
    }
    // A parent holds more than its own entries whenever a child has some.
    const own = (slug: string) => all.body.results.filter((r: { mechanismClass: string }) => r.mechanismClass === slug).length;
    const grown = parents.filter((p) => (all.body.facets.mechanisms[p.slug] ?? 0) > own(p.slug));
    if (q === '') expect(grown.map((p) => p.slug)).toContain('propellant-free-thrust');
  });

  it('pages with limit and offset', async () => {
    const first = await search({ q: 'energy', limit: 2 });
    const second = await search({ q: 'energy', limit: 2, offset: 2 });
    expect(first.body.results).toHaveLength(2);
    expect(second.body.results[0].slug).not.toBe(first.body.results[0].slug);
    expect(second.body.total).toBe(first.body.total);
  });
});

describe('what counts as a match', () => {
  // Invented strings: keyboard runs, filler text, letters at random (from memory, no source).
  it.each(['xq zz', 'ab', 'zz', 'asdf qwerty', 'qwertyuiop', 'lorem ipsum dolor', 'hello world', 'pqrst', 'xkcdq vbnmz', 'mnbvcx lkjhgf', 'the of and'])(
    'answers "%s" with nothing, not with stray fragments or far-fetched typos',
    async (q) => {
      const res = await search({ q });
      expect(res.status).toBe(200);
      expect({ q, total: res.body.total, results: res.body.results }).toEqual({ q, total: 0, results: [] });
    },
  );

  it.each([
    // Two- and one-letter terms of the synonym table (content/synonyms.yml) and a three-letter one.
    ['RF', 'resonant-cavity-thruster'],
    ['rf', 'resonant-cavity-thruster'],
    ['Q factor', 'resonant-cavity-thruster'],
    ['COP', 'efficiency-above-100-percent'],
  ])('still finds the short term "%s" (%s)', async (q, slug) => {
    const res = await search({ q });
    expect(res.body.results.map((r: { slug: string }) => r.slug)).toContain(slug);
    for (const r of res.body.results) expect(r.matched.map((w: string) => w.toLowerCase())).toEqual(expect.arrayContaining(q.toLowerCase().split(' ')));
  });

  it('forgives two letters typed the wrong way round, as one slip', async () => {
    const res = await search({ q: 'wehel' });
    expect(res.body.results.map((r: { slug: string }) => r.slug)).toContain('overbalanced-wheel');
  });

  it.each([
    ['microwve cavty', ['microwve', 'cavty']],
    ['cavity microw', ['cavity', 'microw']],
    ['thrusters', ['thrusters']],
    ['overbalansed wheal', ['overbalansed', 'wheal']],
  ])('shows readers the words they typed or the entry writes, never stems ("%s")', async (q, typed) => {
    const res = await search({ q, limit: 50 });
    expect(res.body.total).toBeGreaterThan(0);
    const c = await h.client();
    const tax = (await c.get('/api/taxonomy')).body as { laws: { name: string }[]; classes: { name: string }[] };
    const names = JSON.stringify([...tax.laws, ...tax.classes].map((t) => t.name));
    for (const r of res.body.results as { slug: string; terms: string[]; matched: string[] }[]) {
      const entry = (await c.get(`/api/entries/${r.slug}`)).body;
      const text = JSON.stringify(entry) + names;
      expect(r.matched.length).toBeGreaterThan(0);
      for (const word of r.matched) {
        // Each shown word is a match of the index …
        expect(r.terms).toContain(normaliseTerm(word));
        // … and either typed by the reader or written so in the entry, its class or its laws (a
        // capital that only starts a sentence or a name dropped: "Overbalanced wheel" → "overbalanced").
        if (!typed.includes(word)) expect(text).toMatch(new RegExp(`(?<![\\p{L}])${word}(?![\\p{L}])`, word === word.toLowerCase() ? 'iu' : 'u'));
      }
    }
    // A stem that is not a word is never shown: "microwav", "overbalanc".
    const shown = res.body.results.flatMap((r: { matched: string[] }) => r.matched);
    expect(shown).not.toContain('microwav');
    expect(shown).not.toContain('overbalanc');
  });
});

describe('validation', () => {
  it('refuses a query over 500 characters, naming query.q', async () => {
    const res = await search({ q: 'x'.repeat(501) });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'validation_failed', fields: { 'query.q': expect.any(String) } });
    expect((await search({ q: 'wheel '.repeat(83).slice(0, 500) })).status).toBe(200);
  });

  it('refuses an unknown law or mechanism class, and a bad limit', async () => {
    const law = await search({ q: 'wheel', law: 'conservation-of-luck' });
    expect(law.status).toBe(400);
    expect(law.body.error.fields).toHaveProperty(['query.law']);
    const mech = await search({ q: 'wheel', mechanism: 'perpetual-gizmo' });
    expect(mech.status).toBe(400);
    expect(mech.body.error.fields).toHaveProperty(['query.mechanism']);
    const limit = await search({ q: 'wheel', limit: 51 });
    expect(limit.status).toBe(400);
    expect(limit.body.error.fields).toHaveProperty(['query.limit']);
  });
});

describe('excerpts and normalisation', () => {
  it('marks matched words and escapes everything else', () => {
    const text = 'A <script>alert("x")</script> cavity & a Cavity’s “wall” > 0';
    const out = excerpt(text, ['cavity']);
    expect(out).toBe('A &lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; <mark>cavity</mark> &amp; a <mark>Cavity’s</mark> “wall” &gt; 0');
  });

  it('excerpts from the API hold no HTML but the marks', async () => {
    const res = await search({ q: 'magnet motor energy', limit: 50 });
    for (const r of res.body.results) expect(r.excerpt.replace(/<\/?mark>/g, '')).not.toMatch(/[<>]/);
  });

  it('folds case, diacritics and light English suffixes alike (our own stemmer)', () => {
    expect(['Microwaves', 'microwave', 'microwaved'].map(normaliseTerm)).toEqual(['microwav', 'microwav', 'microwav']);
    expect(['cavities', 'cavity'].map(normaliseTerm)).toEqual(['cavity', 'cavity']);
    expect(['thrusters', 'thrusting', 'thrust'].map(normaliseTerm)).toEqual(['thrust', 'thrust', 'thrust']);
    expect(normaliseTerm('Carnot’s')).toBe(normaliseTerm('carnots'));
    expect(normaliseTerm('Émigré')).toBe(normaliseTerm('emigre'));
    expect(normaliseTerm('the')).toBeNull();
    expect(plainText('**Bold** $E = mc^2$ and [a link](https://x.org) $$\\int f$$')).toBe('Bold and a link');
  });
});

describe('while the index builds', () => {
  // A second app over the same database whose first build cannot read the entries yet: another
  // connection holds a write lock on the table. Searches are answered at once (searchWaitBelow 0:
  // never wait), flagged partial, in the usual shape; once the lock goes and the build ends, in full.
  const mariadb = require('mariadb') as { createConnection(opts: object): Promise<{ query(sql: string): Promise<unknown>; end(): Promise<void> }> };

  it('answers at once, flagged partial, and in full once built', async () => {
    const db = h.t.db;
    const locker = await mariadb.createConnection({ host: db.host, port: db.port, user: db.user, password: db.password, database: db.name });
    await locker.query('LOCK TABLES entries WRITE');
    const second = createApp({ sequelize: h.t.sequelize, version: 'test', env: 'test', sessionCleanupMs: 0, searchRefreshMs: 0, searchWaitBelow: 0 });
    try {
      for (const q of ['overbalanced wheel', '']) {
        const res = await request(second).get('/api/search').query({ q });
        expect(res.status).toBe(200);
        expect(res.body).toEqual({ query: q, total: 0, results: [], facets: { laws: {}, mechanisms: {} }, partial: true });
      }
      // A filter cannot be checked against a taxonomy not read yet: it is no error meanwhile.
      expect((await request(second).get('/api/search').query({ q: 'wheel', law: 'energy' })).status).toBe(200);
      await locker.query('UNLOCK TABLES');
      // Polled with a generous deadline, never timed.
      await until('the second app has built its index', async () => !(await request(second).get('/api/search').query({ q: 'wheel' })).body.partial, 60_000);
      const res = await request(second).get('/api/search').query({ q: 'overbalanced wheel' });
      expect(res.body.results[0].slug).toBe('overbalanced-wheel');
      expect(res.body).not.toHaveProperty('partial');
      const all = await request(h.app).get('/api/search').query({ q: '', limit: 50 });
      expect((await request(second).get('/api/search').query({ q: '', limit: 50 })).body).toEqual(all.body);
      expect((await request(second).get('/api/search').query({ q: 'wheel', law: 'conservation-of-luck' })).status).toBe(400);
    } finally {
      await locker.query('UNLOCK TABLES').catch(() => {});
      await locker.end();
      await (second.locals as unknown as AppLocals).close();
    }
  });
});
