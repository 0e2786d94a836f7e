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
import request from 'supertest';
import { formatBibliography, formatCitation, parseCitations, toBibtex, toRis } from '../../shared/entries/citations';
import { startTestApp, type TestApp } from '../support/app';

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
    // Citing Medicine, 2nd ed., ch. 24 "Homepages/Web sites" and ch. 25 (parts): [Internet], [cited …], "Available from:".
    expect(van.body.text).toMatch(new RegExp(`^Salazar B\\. Wheels that are heavier on one side\\. In: Counterweight \\[Internet\\]\\. ${year} \\[cited \\d{4} [A-Z][a-z]{2} \\d{1,2}\\]\\. Available from: ${url.replace(/[./]/g, '\\$&')}$`));

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

    expect((await request(h.app).get('/api/entries/overbalanced-wheel-test/cite?format=chicago')).status).toBe(400);
    expect((await request(h.app).get('/api/entries/overbalanced-wheel-test/cite?version=9')).status).toBe(404);
  });
});
