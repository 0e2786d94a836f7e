/**
 * Citations: shared/entries/citations.ts (citation-js) against the reference-list rules of the APA
 * Publication Manual (7th ed.) and of Vancouver as NLM's Citing Medicine (2nd ed.) sets it out; the
 * parser for BibTeX, RIS and CSL-JSON, with a broken item reported by position and the others kept;
 * and the API: POST /api/citations/parse and GET /api/entries/:slug/cite.
 *
 * The two works cited are real (details from memory, checked against our own recollection of the
 * title pages): H. Bondi, "Negative mass in general relativity", Reviews of Modern Physics 29(3),
 * 423–428 (1957), doi 10.1103/RevModPhys.29.423; H. B. Callen, Thermodynamics and an Introduction to
 * Thermostatistics, 2nd ed., Wiley, New York (1985).
 *
 * Both manuals want article and book titles in sentence case; CSL styles print titles as they are
 * given (neither the APA nor the Vancouver CSL style recases them), so the items carry them in
 * sentence case, as an editor's pasted record should.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Cite } from '@citation-js/core';
import { JSDOM } from 'jsdom';
import request from 'supertest';
import { formatBibliography, formatCitation, parseCitations, toBibtex, toRis } from '../../shared/entries/citations';
import { ROOT } from '../../server/config';
import { demo, startTestApp, type TestApp } from '../support/app';
import { makeEditor, publishNewEntry, publishTwoAuthorEntry, startRevision, submitDraft, approveDraft } from '../support/workflow';

jest.setTimeout(120_000);

const article = {
  id: 'bondi1957',
  type: 'article-journal',
  title: 'Negative mass in general relativity',
  'container-title': 'Reviews of Modern Physics',
  'container-title-short': 'Rev Mod Phys',
  author: [{ family: 'Bondi', given: 'Hermann' }],
  issued: { 'date-parts': [[1957]] },
  volume: '29',
  issue: '3',
  page: '423-428',
  DOI: '10.1103/RevModPhys.29.423',
};

const book = {
  id: 'callen1985',
  type: 'book',
  title: 'Thermodynamics and an introduction to thermostatistics',
  author: [{ family: 'Callen', given: 'Herbert B.' }],
  issued: { 'date-parts': [[1985]] },
  edition: '2',
  publisher: 'Wiley',
  'publisher-place': 'New York',
};

describe('APA 7th edition', () => {
  it('formats a journal article as the manual’s reference example', () => {
    // APA Publication Manual, 7th ed. (2020), §10.1 "Periodicals", example 1 (journal article with a
    // DOI): Author, A. A. (Year). Title of article. Journal Name, volume(issue), pages. https://doi.org/…
    // — initials spaced, page range with an en dash (§6.6? common practice in the manual's examples), DOI as a URL.
    expect(formatCitation(article, 'apa', 'text')).toBe(
      'Bondi, H. (1957). Negative mass in general relativity. Reviews of Modern Physics, 29(3), 423–428. https://doi.org/10.1103/RevModPhys.29.423',
    );
    // Journal name and volume in italics (§9.25 / §10.1).
    expect(formatCitation(article, 'apa', 'html')).toContain('<i>Reviews of Modern Physics</i>, <i>29</i>(3), 423–428.');
  });

  it('formats a book as the manual’s reference example', () => {
    // APA 7th ed., §10.2 "Books and reference works", example 20 (authored book) and §9.29 (edition):
    // Author, A. A. (Year). Title of work: Subtitle (2nd ed.). Publisher. — no publisher location in APA 7.
    expect(formatCitation(book, 'apa', 'text')).toBe('Callen, H. B. (1985). Thermodynamics and an introduction to thermostatistics (2nd ed.). Wiley.');
    expect(formatCitation(book, 'apa', 'html')).toContain('<i>Thermodynamics and an introduction to thermostatistics</i> (2nd ed.)');
  });
});

describe('Vancouver (ICMJE; NLM Citing Medicine, 2nd ed.)', () => {
  it('formats a journal article as Citing Medicine’s chapter 1 examples', () => {
    // Citing Medicine, 2nd ed. (2007), ch. 1 "Journals", basic format: Author AA. Title of article.
    // Abbreviated journal title. Year;Volume(Issue):Pages. — family name then initials without
    // periods, NLM title abbreviation without periods, pages with repeated digits dropped and a
    // hyphen ("423-8").
    expect(formatCitation(article, 'vancouver', 'text')).toBe('Bondi H. Negative mass in general relativity. Rev Mod Phys. 1957;29(3):423-8.');
  });

  it('formats a book as Citing Medicine’s chapter 2 examples', () => {
    // Citing Medicine, 2nd ed., ch. 2 "Books", basic format: Author AA. Title of book. Edition.
    // Place of publication: Publisher; Year.
    expect(formatCitation(book, 'vancouver', 'text')).toBe('Callen HB. Thermodynamics and an introduction to thermostatistics. 2nd ed. New York: Wiley; 1985.');
  });

  it('numbers a reference list in the order given', () => {
    // ICMJE Recommendations (IV.A.3.g): references numbered consecutively in the order first cited.
    expect(formatBibliography([book, article], 'vancouver', 'text').split('\n')).toEqual([
      '1. Callen HB. Thermodynamics and an introduction to thermostatistics. 2nd ed. New York: Wiley; 1985.',
      '2. Bondi H. Negative mass in general relativity. Rev Mod Phys. 1957;29(3):423-8.',
    ]);
  });
});

describe('Harvard (Cite Them Right)', () => {
  it('puts author and year first, the year in brackets', () => {
    // Author-date: "Family, Initials. (Year) Title." — common practice for Harvard styles, no single manual checked here.
    expect(formatCitation(book, 'harvard', 'text')).toMatch(/^Callen, H\.B\. \(1985\) Thermodynamics and an introduction to thermostatistics\. 2nd ed.*New York: Wiley\.$/);
  });
});

describe('parsing pasted references', () => {
  it('reads BibTeX, keeping every good entry and reporting a broken one by its position', () => {
    const { items, problems } = parseCitations(`@article{bondi1957,
  author = {Bondi, Hermann}, title = {Negative mass in general relativity},
  journal = {Reviews of Modern Physics}, year = {1957}, volume = {29}, number = {3}, pages = {423--428},
  doi = {10.1103/RevModPhys.29.423}
}
@book{broken, title = {An unclosed title
@book{callen1985,
  author = {Callen, Herbert B.}, title = {Thermodynamics and an introduction to thermostatistics},
  edition = {2}, publisher = {Wiley}, address = {New York}, year = {1985}
}`);
    expect(items.map((i) => i.csl.id)).toEqual(['bondi1957', 'callen1985']);
    expect(items[0].csl).toMatchObject({ type: 'article-journal', 'container-title': 'Reviews of Modern Physics', page: '423-428', volume: '29', issue: '3', DOI: '10.1103/RevModPhys.29.423' });
    expect(items[1].csl).toMatchObject({ type: 'book', publisher: 'Wiley', 'publisher-place': 'New York', edition: '2' });
    expect(items.every((i) => i.note === '' && !('_graph' in i.csl))).toBe(true);
    expect(problems).toEqual([{ index: 1, input: expect.stringContaining('@book{broken'), reason: expect.any(String) }]);
  });

  it('reads RIS records, reporting one without a title', () => {
    const { items, problems } = parseCitations(
      'TY  - JOUR\nAU  - Bondi, Hermann\nTI  - Negative mass in general relativity\nT2  - Reviews of Modern Physics\nPY  - 1957\nVL  - 29\nIS  - 3\nSP  - 423\nEP  - 428\nER  - \n' +
        'TY  - BOOK\nAU  - Nobody, A.\nPY  - 2001\nER  - \n' +
        'TY  - BOOK\nAU  - Callen, Herbert B.\nTI  - Thermodynamics and an introduction to thermostatistics\nPB  - Wiley\nCY  - New York\nPY  - 1985\nER  - \n',
    );
    expect(items.map((i) => [i.csl.type, i.csl.title])).toEqual([
      ['article-journal', 'Negative mass in general relativity'],
      ['book', 'Thermodynamics and an introduction to thermostatistics'],
    ]);
    expect(items[0].csl).toMatchObject({ volume: '29', issue: '3', author: [{ family: 'Bondi', given: 'Hermann' }] });
    expect(problems.map((p) => [p.index, p.reason])).toEqual([[1, 'title: missing']]);
  });

  it('reads CSL-JSON, one item or a list, reporting items that are not CSL', () => {
    expect(parseCitations(JSON.stringify(article)).items[0].csl).toMatchObject({ id: 'bondi1957', title: article.title });
    const { items, problems } = parseCitations(JSON.stringify([article, { id: 'x', title: 'No type' }, 42, book]));
    expect(items.map((i) => i.csl.id)).toEqual(['bondi1957', 'callen1985']);
    expect(problems.map((p) => p.index)).toEqual([1, 2]);
    expect(parseCitations('[{"id": ').problems[0].reason).toMatch(/not valid JSON/);
    expect(parseCitations('just some words').problems[0].reason).toBe('not BibTeX, RIS or CSL-JSON');
  });

  it('writes BibTeX and RIS that read back as the same items', () => {
    const back = parseCitations(toBibtex([article, book])).items.map((i) => i.csl);
    expect(back.map((i) => [i.id, i.type, i.title, i.issued])).toEqual([article, book].map((i) => [i.id, i.type, i.title, i.issued]));
    expect(back[1]).toMatchObject({ publisher: 'Wiley', 'publisher-place': 'New York', edition: '2' });
    const ris = parseCitations(toRis([article, book])).items.map((i) => i.csl);
    expect(ris.map((i) => [i.type, i.title, i.author])).toEqual([article, book].map((i) => [i.type, i.title, i.author]));
  });
});

describe('the API', () => {
  let h: TestApp;
  beforeAll(async () => {
    h = await startTestApp({ taxonomy: true, publicUrl: 'https://counterweight.example.org' });
  });
  afterAll(() => h?.close());

  it('parses pasted text for an editor, and answers 400 naming body.text when nothing can be read', async () => {
    const editor = await h.signedIn('editor.one@example.org');
    const ok = await editor.post('/api/citations/parse', { text: `${JSON.stringify([article, { id: 'y' }])}` });
    expect(ok.status).toBe(200);
    expect(ok.body.items).toEqual([{ csl: expect.objectContaining({ id: 'bondi1957' }), note: '' }]);
    expect(ok.body.problems).toEqual([{ index: 1, input: '{"id":"y"}', reason: 'type: missing' }]);
    const bad = await editor.post('/api/citations/parse', { text: '@book{broken, title = {unclosed' });
    expect([bad.status, bad.body.error.code, Object.keys(bad.body.error.fields)]).toEqual([400, 'citation_unparseable', ['body.text']]);
    expect(bad.body.problems[0].index).toBe(0);
  });

  it('cites an entry version as an entry of the reference work, with its permanent URL, version and date', async () => {
    const one = await h.signedIn('editor.one@example.org');
    const two = await h.signedIn('editor.two@example.org');
    const created = await one.post('/api/drafts', {
      slug: 'overbalanced-wheel-test',
      content: {
        title: 'Wheels that are heavier on one side',
        mechanismClass: 'overbalanced-wheel',
        laws: ['energy'],
        inBrief: 'A wheel with shifting weights returns to the same state each turn, so it gains no energy.',
        howItIsPitched: 'Weights fall outward on one side and fold in on the other.',
        whyItFails: 'Gravity is conservative: the work over a closed path is zero.',
      },
    });
    expect(created.status).toBe(201);
    await one.post(`/api/drafts/${created.body.draft.id}/submit`, { lockVersion: 0 });
    const approved = await two.post(`/api/drafts/${created.body.draft.id}/approve`, { changeNote: 'First published version.' });
    expect(approved.status).toBe(200);
    const published = new Date(approved.body.version.publishedAt);
    const year = published.getUTCFullYear();
    const url = 'https://counterweight.example.org/entries/overbalanced-wheel-test/v/1';

    const apa = await request(h.app).get('/api/entries/overbalanced-wheel-test/cite?format=apa').expect(200);
    expect(apa.body).toMatchObject({ format: 'apa', url, version: 1, date: published.toISOString().slice(0, 10) });
    // APA 7th ed., §10.3 "Reference works", entry in a reference work without editor:
    // Author, A. A. (Year). Title of entry. In Title of reference work (version). URL
    expect(apa.body.text).toBe(`Salazar, B. (${year}). Wheels that are heavier on one side. In Counterweight (Version 1). ${url}`);
    expect(apa.body.html).toContain('<i>Counterweight</i>');

    const van = await request(h.app).get('/api/entries/overbalanced-wheel-test/cite?format=vancouver&version=1').expect(200);
    // Citing Medicine, 2nd ed., ch. 22 C "Contributions to Books on the Internet" (In: Title [Internet].
    // Edition. Publisher; date [cited …]. Available from: URL), the version in the edition's place.
    expect(van.body.text).toMatch(new RegExp(`^Salazar B\\. Wheels that are heavier on one side\\. In: Counterweight \\[Internet\\]\\. Version 1\\. Counterweight; ${year} \\[cited \\d{4} [A-Z][a-z]{2} \\d{1,2}\\]\\. Available from: ${url.replace(/[./]/g, '\\$&')}$`));

    const bib = await request(h.app).get('/api/entries/overbalanced-wheel-test/cite?format=bibtex').expect(200);
    expect(bib.body.text).toMatch(/^@misc\{overbalanced_wheel_test_v1,/);
    // Read as BibTeX fields (field = {value}, BibTeX's own syntax), not through our parser.
    expect(bib.body.text).toMatch(/^\s*title\s*=\s*\{Wheels that are heavier on one side\},?$/m);
    expect(bib.body.text).toMatch(new RegExp(`^\\s*url\\s*=\\s*\\{${url.replace(/[./]/g, '\\$&')}\\},?$`, 'm'));
    expect(bib.body.text).toMatch(/^\s*author\s*=\s*\{Salazar, Bruno\},?$/m);
    const ris = await request(h.app).get('/api/entries/overbalanced-wheel-test/cite?format=ris').expect(200);
    expect(ris.body.text).toMatch(/^TY {2}- /);
    expect(ris.body.text).toContain(url);
    const json = await request(h.app).get('/api/entries/overbalanced-wheel-test/cite?format=csl-json').expect(200);
    expect(JSON.parse(json.body.text)).toEqual([expect.objectContaining({ type: 'entry-encyclopedia', version: '1', URL: url, author: [{ given: 'Bruno', family: 'Salazar' }] })]);

    const chicago = await request(h.app).get('/api/entries/overbalanced-wheel-test/cite?format=chicago');
    expect([chicago.status, Object.keys(chicago.body.error.fields)]).toEqual([400, ['query.format']]);
    expect((await request(h.app).get('/api/entries/overbalanced-wheel-test/cite?version=9')).status).toBe(404);
  });
  describe('a version written by two editors', () => {
    // Editor A (the first demo editor) writes version 1, editor B (the contributor, made an editor)
    // writes version 2, and R (the second demo editor) reviews and publishes both; then A writes
    // version 3. Names as content/demo/accounts.yml gives them.
    const slug = 'two-author-wheel';
    const title = 'Wheels that carry their weights outward';
    const [aGiven, aFamily] = demo.editor.displayName.split(' ');
    const [bGiven, bFamily] = demo.contributor.displayName.split(' ');
    const reviewer = demo.editor2.displayName;
    let url2: string;
    let year: number;
    let published: string;
    const days: string[] = [];

    beforeAll(async () => {
      const admin = await h.signedIn(demo.admin.email);
      await makeEditor(admin, demo.contributor.email);
      const a = await h.signedIn(demo.editor.email);
      const b = await h.signedIn(demo.contributor.email);
      const r = await h.signedIn(demo.editor2.email);
      await publishTwoAuthorEntry(
        a,
        b,
        r,
        slug,
        {
          title,
          mechanismClass: 'overbalanced-wheel',
          laws: ['energy'],
          inBrief: 'Weights that swing outward on the way down come back in on the way up: one turn returns the wheel to where it began.',
          howItIsPitched: 'Hinged arms fall open on one side.',
          whyItFails: 'Gravity is conservative: the work over a closed path is zero.',
        },
        { inBrief: 'A wheel with hinged weights returns to the same state each turn, so it gains no energy from gravity.' },
      );
      url2 = `https://counterweight.example.org/entries/${slug}/v/2`;
      const v2 = await request(h.app).get(`/api/entries/${slug}/versions`).expect(200);
      published = v2.body.versions.find((v: { number: number }) => v.number === 2).publishedAt;
      year = new Date(published).getUTCFullYear();
      // The access date is the day of the request; a test that runs over midnight may see either day.
      days.push(new Date().toISOString().slice(0, 10));
    });
    const accessedDays = () => [...days, new Date().toISOString().slice(0, 10)];
    const cite = (format: string, version = 2) => request(h.app).get(`/api/entries/${slug}/cite?format=${format}&version=${version}`).set('Accept', 'application/json').expect(200);

    it('names both authors, in order of first contribution, and the reviewer apart', async () => {
      const res = await cite('apa');
      expect(res.body).toMatchObject({ authors: [demo.editor.displayName, demo.contributor.displayName], reviewer, version: 2, url: url2 });
      // Version 1 had one author only; its reviewer is the same editor.
      const one = await cite('apa', 1);
      expect([one.body.authors, one.body.reviewer]).toEqual([[demo.editor.displayName], reviewer]);
    });

    it('cites in APA 7 as an entry of an online reference work with a version', async () => {
      // APA Publication Manual, 7th ed., §10.2 (entry in a reference work: Author, A. A., & Author, B. B.
      // (Year). Title of entry. In Title of reference work (edition or version). URL); §9.8 (two
      // authors joined by ", &"); §9.29 (a publisher that is the same as the work is left out); no
      // retrieval date for a page that will not change (§9.16), which a version's permalink is.
      const res = await cite('apa');
      expect(res.body.text).toBe(`${aFamily}, ${aGiven[0]}., & ${bFamily}, ${bGiven[0]}. (${year}). ${title}. In Counterweight (Version 2). ${url2}`);
    });

    it('cites in Vancouver as Citing Medicine gives a contribution to a book on the Internet', async () => {
      // Citing Medicine, 2nd ed., ch. 22 C (Author AA, Author BB. Title of contribution. In: Title of
      // book [Internet]. Edition. Place: Publisher; Year [cited Year Mon Day]. Available from: URL);
      // authors as family name and initials without periods, separated by a comma (ch. 22, Author rules).
      const res = await cite('vancouver');
      const m = new RegExp(`^${aFamily} ${aGiven[0]}, ${bFamily} ${bGiven[0]}\\. ${title}\\. In: Counterweight \\[Internet\\]\\. Version 2\\. Counterweight; ${year} \\[cited (\\d{4}) ([A-Z][a-z]{2}) (\\d{1,2})\\]\\. Available from: (\\S+)$`).exec(res.body.text);
      expect(m).not.toBeNull();
      expect(m![4]).toBe(url2);
      const cited = new Date(`${m![2]} ${m![3]}, ${m![1]} UTC`).toISOString().slice(0, 10);
      expect(accessedDays()).toContain(cited);
    });

    it('cites in Harvard as Cite Them Right gives an entry of an online reference work', async () => {
      // Cite Them Right (Harvard): Author, A. and Author, B. (Year) 'Title of entry', in Title of work.
      // Edition. Available at: URL (Accessed: day month year) — single quotation marks, punctuation
      // outside them, the access date as "7 June 2025" (as in the manual's examples quoted by
      // university library guides, e.g. "(Accessed: 28 March 2024)").
      const res = await cite('harvard');
      const m = new RegExp(`^${aFamily}, ${aGiven[0]}\\. and ${bFamily}, ${bGiven[0]}\\. \\(${year}\\) ‘${title}’, in Counterweight\\. Version 2\\. Available at: (\\S+) \\(Accessed: (\\d{1,2}) ([A-Z][a-z]+) (\\d{4})\\)\\.$`).exec(res.body.text);
      expect(m).not.toBeNull();
      expect(m![1]).toBe(url2);
      expect(accessedDays()).toContain(new Date(`${m![3]} ${m![2]}, ${m![4]} UTC`).toISOString().slice(0, 10));
    });

    it('writes BibTeX with the standard fields of an online source, read back by citation-js', async () => {
      const res = await cite('bibtex');
      const text: string = res.body.text;
      expect(text).toMatch(/^@misc\{two_author_wheel_v2,$/m);
      // BibTeX fields read as BibTeX writes them (field = {value}); no free-text "accessed" note.
      const field = (name: string) => new RegExp(`^\\s*${name}\\s*=\\s*\\{(.*)\\},?$`, 'm').exec(text)?.[1];
      expect(field('author')).toBe(`${aFamily}, ${aGiven} and ${bFamily}, ${bGiven}`);
      expect(field('url')).toBe(url2);
      expect(accessedDays()).toContain(field('urldate'));
      expect(field('version')).toBe('2');
      expect(field('organization')).toBe('Counterweight');
      expect(field('year')).toBe(String(year));
      expect(field('note')).toBe(`Reviewed by ${reviewer}`);
      expect(text).not.toMatch(/accessed/i);
      // biblatex (the reader citation-js uses for both dialects of the fields) reads it back.
      const [back] = new Cite(text, { forceType: '@biblatex/text' }).data as Record<string, unknown>[];
      expect(back).toMatchObject({
        title,
        URL: url2,
        version: '2',
        publisher: 'Counterweight',
        author: [{ family: aFamily, given: aGiven }, { family: bFamily, given: bGiven }],
        issued: { 'date-parts': [[year, new Date(published).getUTCMonth() + 1]] },
        note: `Reviewed by ${reviewer}`,
      });
      expect(accessedDays()).toContain((back.accessed as { 'date-parts': number[][] })['date-parts'][0].map((p, i) => (i ? String(p).padStart(2, '0') : String(p))).join('-'));
    });

    it('writes RIS with the tags of the 2011 RIS specification for a web page', async () => {
      const res = await cite('ris');
      const tags: [string, string][] = (res.body.text as string)
        .split('\n')
        .filter((l) => /^[A-Z][A-Z0-9] {2}- /.test(l))
        .map((l) => [l.slice(0, 2), l.slice(6).trim()]);
      const all = (tag: string) => tags.filter(([t]) => t === tag).map(([, v]) => v);
      expect(tags[0]).toEqual(['TY', 'ELEC']);
      expect(tags[tags.length - 1]).toEqual(['ER', '']);
      expect(all('AU')).toEqual([`${aFamily}, ${aGiven}`, `${bFamily}, ${bGiven}`]);
      expect(all('TI')).toEqual([title]);
      expect(all('UR')).toEqual([url2]);
      expect(all('PB')).toEqual(['Counterweight']);
      expect(all('PY')).toEqual([String(year)]);
      expect(all('ET')).toEqual(['Version 2']);
      expect(all('N1')).toEqual([`Reviewed by ${reviewer}`]);
      // Y2, the access date, as YYYY/MM/DD/ (the specification's date form).
      expect(accessedDays().map((d) => `${d.replace(/-/g, '/')}/`)).toContain(all('Y2')[0]);
      // citation-js reads it as a web page by the same two authors.
      const [back] = new Cite(res.body.text, { forceType: '@ris/file' }).data as Record<string, unknown>[];
      expect(back).toMatchObject({ type: 'webpage', title, URL: url2, author: [{ family: aFamily, given: aGiven }, { family: bFamily, given: bGiven }] });
    });

    it('writes CSL-JSON with author, URL, accessed, version, publisher and issued', async () => {
      const res = await cite('csl-json');
      const [item] = JSON.parse(res.body.text);
      expect(item).toMatchObject({
        URL: url2,
        version: '2',
        publisher: 'Counterweight',
        author: [{ given: aGiven, family: aFamily }, { given: bGiven, family: bFamily }],
        issued: { 'date-parts': [published.slice(0, 10).split('-').map(Number)] },
        note: `Reviewed by ${reviewer}`,
      });
      expect(accessedDays()).toContain((item.accessed['date-parts'][0] as number[]).map((p, i) => (i ? String(p).padStart(2, '0') : String(p))).join('-'));
    });

    it('keeps each author once, where they first wrote, when an earlier author writes again', async () => {
      const a = await h.signedIn(demo.editor.email);
      const r = await h.signedIn(demo.editor2.email);
      await approveDraft(r, await submitDraft(a, await startRevision(a, slug)), 'Third version.');
      const three = await cite('csl-json', 3);
      expect(JSON.parse(three.body.text)[0].author).toEqual([{ given: aGiven, family: aFamily }, { given: bGiven, family: bFamily }]);
      expect((await cite('ris', 3)).body.text.match(/^AU {2}- .*$/gm)).toEqual([`AU  - ${aFamily}, ${aGiven}`, `AU  - ${bFamily}, ${bGiven}`]);
    });

    it('answers with the raw file and its media type when Accept asks for it, JSON otherwise', async () => {
      const base = `/api/entries/${slug}/cite?version=2`;
      const bib = await request(h.app).get(`${base}&format=bibtex`).set('Accept', 'application/x-bibtex').expect(200);
      expect(bib.headers['content-type']).toBe('application/x-bibtex; charset=utf-8');
      expect(bib.headers['content-disposition']).toBe(`attachment; filename="${slug}-v2.bib"`);
      expect(bib.headers.vary).toMatch(/Accept/);
      expect(bib.text).toBe((await cite('bibtex')).body.text);
      const textBib = await request(h.app).get(`${base}&format=bibtex`).set('Accept', 'text/x-bibtex').expect(200);
      expect(textBib.headers['content-type']).toBe('text/x-bibtex; charset=utf-8');
      // No format: the media type in Accept chooses it.
      const ris = await request(h.app).get(base).set('Accept', 'application/x-research-info-systems').expect(200);
      expect([ris.headers['content-type'], ris.headers['content-disposition']]).toEqual(['application/x-research-info-systems; charset=utf-8', `attachment; filename="${slug}-v2.ris"`]);
      expect(ris.text).toMatch(/^TY {2}- ELEC\n/);
      const csl = await request(h.app).get(`${base}&format=csl-json`).set('Accept', 'application/vnd.citationstyles.csl+json').buffer(true).parse((res, done) => {
        let data = '';
        res.on('data', (c: Buffer) => (data += c.toString()));
        res.on('end', () => done(null, data));
      }).expect(200);
      expect(csl.headers['content-type']).toBe('application/vnd.citationstyles.csl+json; charset=utf-8');
      expect(csl.headers['content-disposition']).toBe(`attachment; filename="${slug}-v2.json"`);
      expect(JSON.parse(csl.body as string)[0].URL).toBe(url2);
      // text/plain: the text of a style, as the JSON answer carries it.
      const plain = await request(h.app).get(`${base}&format=apa`).set('Accept', 'text/plain').expect(200);
      expect(plain.headers['content-type']).toBe('text/plain; charset=utf-8');
      expect(plain.text).toBe((await cite('apa')).body.text);
      // A plain link cannot set Accept: ?download=1.
      const dl = await request(h.app).get(`${base}&format=ris&download=1`).set('Accept', 'text/html,*/*;q=0.8').expect(200);
      expect([dl.headers['content-type'], dl.headers['content-disposition']]).toEqual(['application/x-research-info-systems; charset=utf-8', `attachment; filename="${slug}-v2.ris"`]);
      // JSON for */*, application/json and no Accept at all (the app's own requests).
      for (const accept of ['*/*', 'application/json', 'text/html,application/xhtml+xml,*/*;q=0.8']) {
        const res = await request(h.app).get(`${base}&format=bibtex`).set('Accept', accept).expect(200);
        expect([accept, res.headers['content-type']]).toEqual([accept, 'application/json; charset=utf-8']);
        expect(res.body.format).toBe('bibtex');
      }
      const none = await request(h.app).get(`${base}&format=ris`).unset('Accept').expect(200);
      expect(none.body.format).toBe('ris');
    });

    it('answers 406 naming headers.accept, and 400 naming the field for a bad query', async () => {
      const base = `/api/entries/${slug}/cite?version=2`;
      const wrong = await request(h.app).get(`${base}&format=ris`).set('Accept', 'application/x-bibtex');
      expect([wrong.status, wrong.body.error.code, Object.keys(wrong.body.error.fields)]).toEqual([406, 'not_acceptable', ['headers.accept']]);
      for (const [query, field] of [
        ['format=bibtexx', 'query.format'],
        ['format=apa&version=0', 'query.version'],
        ['format=apa&version=two', 'query.version'],
        ['format=ris&download=maybe', 'query.download'],
      ]) {
        const res = await request(h.app).get(`/api/entries/${slug}/cite?${query}`);
        expect([query, res.status, Object.keys(res.body.error?.fields ?? {})]).toEqual([query, 400, [field]]);
      }
    });
  });

  describe('link previews', () => {
    let site: TestApp;
    let dir: string;
    beforeAll(async () => {
      // A static directory like dist/: the page template with the preview tags (public/index.html,
      // with the title Expo writes in place of %WEB_TITLE%).
      dir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-static-'));
      fs.writeFileSync(path.join(dir, 'index.html'), fs.readFileSync(path.join(ROOT, 'public', 'index.html'), 'utf8').replace('%WEB_TITLE%', 'Counterweight'));
      site = await startTestApp({ taxonomy: true, publicUrl: 'https://counterweight.example.org', staticDir: dir });
      const a = await site.signedIn(demo.editor.email);
      const r = await site.signedIn(demo.editor2.email);
      await publishNewEntry(a, r, 'preview-wheel', {
        title: 'Wheels that never stop',
        mechanismClass: 'overbalanced-wheel',
        laws: ['energy'],
        inBrief: 'A wheel that *turns forever* gains nothing: each turn ends where it began.',
        howItIsPitched: 'Hinged arms.',
        whyItFails: 'Gravity is conservative.',
      });
      await publishNewEntry(a, r, 'preview-hostile', {
        title: '<script>window.__x=1</script> & "quoted" $& wheel',
        mechanismClass: 'overbalanced-wheel',
        laws: ['energy'],
        inBrief: 'Ends "here" </title><script>alert(1)</script> & there.',
        howItIsPitched: 'Hinged arms.',
        whyItFails: 'Gravity is conservative.',
      });
    });
    afterAll(async () => {
      await site?.close();
      if (dir) fs.rmSync(dir, { recursive: true, force: true });
    });

    // The document's head as an HTML parser reads it (jsdom, which jest's web tests run on; a crawler parses the same way).
    const head = (html: string) => {
      const doc = new JSDOM(html).window.document;
      const meta = (sel: string) => [...doc.querySelectorAll(sel)].map((m) => m.getAttribute('content') ?? m.getAttribute('href'));
      return {
        title: doc.title,
        description: meta('meta[name="description"]'),
        ogTitle: meta('meta[property="og:title"]'),
        ogDescription: meta('meta[property="og:description"]'),
        ogUrl: meta('meta[property="og:url"]'),
        canonical: meta('link[rel="canonical"]'),
        scripts: doc.querySelectorAll('script').length,
      };
    };

    it('puts the entry’s title and summary in the page of /entries/<slug> and /entries/<slug>/v/<n>', async () => {
      const latest = await request(site.app).get('/entries/preview-wheel').set('Accept', 'text/html').expect(200);
      expect(latest.headers['content-type']).toMatch(/^text\/html/);
      expect(head(latest.text)).toEqual({
        title: 'Wheels that never stop — Counterweight',
        description: ['A wheel that turns forever gains nothing: each turn ends where it began.'],
        ogTitle: ['Wheels that never stop — Counterweight'],
        ogDescription: ['A wheel that turns forever gains nothing: each turn ends where it began.'],
        ogUrl: ['https://counterweight.example.org/entries/preview-wheel'],
        canonical: ['https://counterweight.example.org/entries/preview-wheel'],
        scripts: 0,
      });
      const v1 = head((await request(site.app).get('/entries/preview-wheel/v/1').set('Accept', 'text/html').expect(200)).text);
      expect([v1.title, v1.ogUrl]).toEqual(['Wheels that never stop (version 1) — Counterweight', ['https://counterweight.example.org/entries/preview-wheel/v/1']]);
      // The rest of the page is the template's: the site name and the preview image stay.
      expect(latest.text).toContain('<meta property="og:site_name" content="Counterweight" />');
      expect(latest.text).toContain('<div id="root"></div>');
    });

    it('escapes what the entry says, so that no tag of it reaches the page', async () => {
      const res = await request(site.app).get('/entries/preview-hostile').set('Accept', 'text/html').expect(200);
      const got = head(res.text);
      expect(got.title).toBe('<script>window.__x=1</script> & "quoted" $& wheel — Counterweight');
      expect(got.description).toEqual(['Ends "here" </title><script>alert(1)</script> & there.']);
      expect(got.scripts).toBe(0);
      expect(res.text).not.toContain('<script>');
    });

    it('sends the plain page for an entry or version that does not exist', async () => {
      const template = fs.readFileSync(path.join(dir, 'index.html'), 'utf8');
      for (const p of ['/entries/no-such-entry', '/entries/preview-wheel/v/9', '/claim-check']) {
        const res = await request(site.app).get(p).set('Accept', 'text/html').expect(200);
        expect([p, res.text]).toEqual([p, template]);
      }
    });
  });
});
