import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { SessionResponse } from '@/shared/api-types';
import type { CiteFormat } from '@/shared/api-types';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { loadDeferred } from '../lazy/deferred';
import { DiffView } from './DiffView';
import { EntryScreen } from './EntryScreen';
import { entryResponse, version1, version2 } from './fixtures';

jest.mock('expo-router', () => require('../testing/expoRouter'));
// The entry's worksheets, forms and versions come with the deferred part of the app
// (components/lazy/screens.tsx), which holds the sighting form and its file picker too.
jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn() }));
// Loaded once before the tests (requiring all of it takes a few seconds under jest), as a browser
// would have it after the first entry.
beforeAll(() => loadDeferred(), 60_000);

const reader: SessionResponse = { user: null, csrfToken: 'token-for-tests' };
const versions = {
  versions: [1, 2].map((number) => ({
    number,
    changeNote: `Note ${number}`,
    publishedAt: `2026-0${number}-10T09:00:00.000Z`,
    author: { displayName: 'Imre Castellanos' },
    reviewer: { displayName: 'Talia Verhoeven' },
  })),
};
const citeText: Record<CiteFormat, string> = {
  apa: 'Castellanos, I. (2026). Thrust from light kept in a box (Version 2). Counterweight.',
  vancouver: 'Castellanos I. Thrust from light kept in a box. Version 2. Counterweight; 2026.',
  harvard: 'Castellanos, I. (2026) Thrust from light kept in a box. Version 2. Counterweight.',
  bibtex: '@misc{light-in-a-box-v2, title = {Thrust from light kept in a box}}',
  ris: 'TY  - ELEC\nTI  - Thrust from light kept in a box\nER  - ',
  'csl-json': '[{"id":"light-in-a-box-v2","type":"webpage"}]',
};

function routes() {
  const cite = Object.fromEntries(
    Object.entries(citeText).map(([format, text]) => [
      `/api/entries/light-in-a-box/cite?format=${format}&version=2`,
      () => jsonResponse(200, { format, text, url: 'https://counterweight.example.org/entries/light-in-a-box/v/2', version: 2, date: '2026-02-10' }),
    ]),
  );
  return mockFetch({
    '/api/session': () => jsonResponse(200, reader),
    '/api/taxonomy': () =>
      jsonResponse(200, {
        laws: [{ slug: 'linear-momentum', name: 'Conservation of linear momentum', quantity: 'linear momentum', symmetry: 'translation in space', summary: '', position: 0 }],
        classes: [{ slug: 'enclosed-radiation', name: 'Radiation in a closed cavity', parentSlug: null, summary: '', position: 0 }],
      }),
    '/api/entries/light-in-a-box': () => jsonResponse(200, entryResponse(2, version2)),
    '/api/entries?limit=100': () =>
      jsonResponse(200, {
        total: 1,
        entries: [
          {
            slug: 'photon-rocket',
            title: 'A rocket that pushes with light',
            version: 1,
            publishedAt: '2026-01-10T09:00:00.000Z',
            laws: ['linear-momentum'],
            mechanismClass: 'enclosed-radiation',
            inBrief: 'Light carries momentum.',
          },
        ],
      }),
    '/api/entries/light-in-a-box/versions': () => jsonResponse(200, versions),
    '/api/entries/light-in-a-box/sightings': () => jsonResponse(200, { sightings: [] }),
    '/api/entries/light-in-a-box/versions/1': () => jsonResponse(200, entryResponse(1, version1)),
    '/api/entries/light-in-a-box/versions/2': () => jsonResponse(200, entryResponse(2, version2)),
    ...cite,
  });
}

beforeEach(() => setWindowWidth(390));

describe('EntryScreen', () => {
  it('shows every section in reading order, with math set and the worksheet running', async () => {
    routes();
    renderWithProviders(<EntryScreen slug="light-in-a-box" />);
    await screen.findByRole('heading', { level: 1, name: 'Thrust from light kept in a box' });
    const root = screen.getByTestId('screen-entry');

    const order = Array.from(root.querySelectorAll('[data-testid^="entry-section-"]')).map((el) => el.getAttribute('data-testid'));
    expect(order).toEqual(
      ['inBrief', 'howItIsPitched', 'whyItFails', 'worksheets', 'whatFakesTheEffect', 'repliesAndAnswers', 'questionsToAsk', 'cautions', 'sources', 'related'].map(
        (field) => `entry-section-${field}`,
      ),
    );
    expect(screen.getByTestId('entry-section-inBrief').querySelector('.katex annotation')!.textContent).toBe('p = E/c');
    expect(screen.getByTestId('entry-version').textContent).toContain('Version 2');
    expect(screen.getByTestId('entry-version').textContent).toContain('vetted by Talia Verhoeven');
    expect((await screen.findByTestId('entry-law-linear-momentum')).textContent).toBe('Conservation of linear momentum');
    expect(screen.getByTestId('entry-cautions').textContent).toContain('local RF safety rules');
    // A caution is Markdown: the single newline in its source is a space inside one paragraph, not a line break.
    const caution = screen.getByTestId('entry-cautions').querySelector('.cw-md')!;
    expect(caution.querySelectorAll('p')).toHaveLength(1);
    expect(caution.querySelector('br')).toBeNull();
    expect(caution.querySelector('strong')!.textContent).toBe('burn');
    expect(screen.getByTestId('related-photon-rocket').getAttribute('href')).toBe('/entries/photon-rocket');
    // Related entries go by their titles (from the library's list), not by their addresses.
    await waitFor(() => expect(screen.getByTestId('related-photon-rocket').textContent).toBe('A rocket that pushes with light'));

    // Each counterpoint and its answer under our own two headings.
    const pair = screen.getByTestId('reply-1');
    expect(within(pair).getAllByRole('heading', { level: 3 }).map((h) => h.textContent)).toEqual(['Counterpoint', 'Why it does not hold']);
    expect(screen.getByTestId('entry-section-repliesAndAnswers').querySelector('h2')!.textContent).toBe('Counterpoints, answered');

    // The browser tab names the entry; the description for link previews is its brief in plain words.
    expect(document.title).toBe('Thrust from light kept in a box — Counterweight');
    expect(document.head.querySelector('meta[name="description"]')!.getAttribute('content')).toBe(
      'Light bouncing inside a closed box cannot push the box: its momentum p = E/c stays inside.',
    );

    // P / c for 1 kW: 1000 W / 299 792 458 m/s = 3.3356 uN (c exact, BIPM SI Brochure, 9th ed.).
    const sheet = await screen.findByTestId('worksheet-cavity-bound');
    const bound = within(sheet).getByTestId('step-F_bound');
    expect(Number(bound.getAttribute('data-si'))).toBeCloseTo(1000 / 299_792_458, 15);
    fireEvent.change(within(sheet).getByTestId('input-P'), { target: { value: '2 kW' } });
    await waitFor(() => expect(Number(within(sheet).getByTestId('step-F_bound').getAttribute('data-si'))).toBeCloseTo(2000 / 299_792_458, 15));
  });

  it('reads in one text column on a wide screen, with a table of contents beside it and a Cite action at the top', async () => {
    setWindowWidth(1280);
    routes();
    const scrolled: string[] = [];
    const scrollIntoView = jest.fn(function (this: HTMLElement) {
      scrolled.push(this.id);
    });
    Object.defineProperty(HTMLElement.prototype, 'scrollIntoView', { configurable: true, value: scrollIntoView });
    renderWithProviders(<EntryScreen slug="light-in-a-box" />);
    const sheets = await screen.findByTestId('entry-section-worksheets');
    const body = screen.getByTestId('entry-body');
    // The worksheets follow the reasoning they run the numbers of, and the sources close the text, in the one column.
    expect(sheets.parentElement).toBe(body);
    expect(screen.getByTestId('entry-section-whyItFails').nextElementSibling).toBe(sheets);
    expect(screen.getByTestId('entry-section-sources').parentElement).toBe(body);

    const toc = screen.getByTestId('entry-toc');
    expect(toc.getAttribute('role')).toBe('navigation');
    expect(within(toc).getAllByRole('link').map((a) => a.textContent)).toEqual([
      'In brief',
      'How it is pitched',
      'Why it fails',
      'Run the numbers',
      'Artifacts that can look like the effect',
      'Counterpoints, answered',
      'Questions to ask the claimant',
      'Cautions',
      'Sources',
      'Related entries',
      'Versions',
      'Cite this version',
    ]);
    expect(screen.queryByTestId('entry-jump')).toBeNull();

    fireEvent.click(within(toc).getByTestId('toc-sources'));
    expect(scrolled).toEqual(['section-sources']);
    expect(document.activeElement).toBe(document.getElementById('section-sources'));

    fireEvent.click(screen.getByTestId('entry-cite-action'));
    expect(scrolled).toEqual(['section-sources', 'section-cite']);
    expect(document.getElementById('section-cite')!.contains(await screen.findByTestId('cite-panel'))).toBe(true);
  });

  it('gives a phone one jump menu that opens the list of sections and goes to the one chosen', async () => {
    routes();
    const scrolled: string[] = [];
    Object.defineProperty(HTMLElement.prototype, 'scrollIntoView', {
      configurable: true,
      value: function (this: HTMLElement) {
        scrolled.push(this.id);
      },
    });
    renderWithProviders(<EntryScreen slug="light-in-a-box" />);
    const toggle = await screen.findByTestId('entry-jump-toggle');
    expect(screen.queryByTestId('entry-toc')).toBeNull();
    expect(screen.queryByTestId('entry-jump-list')).toBeNull();
    expect(toggle.getAttribute('aria-expanded')).toBe('false');

    fireEvent.click(toggle);
    expect(toggle.getAttribute('aria-expanded')).toBe('true');
    const list = screen.getByTestId('entry-jump-list');
    expect(within(list).getAllByRole('link')).toHaveLength(12);
    fireEvent.click(within(list).getByTestId('jump-questionsToAsk'));
    expect(scrolled).toEqual(['section-questionsToAsk']);
    expect(screen.queryByTestId('entry-jump-list')).toBeNull();
  });

  it('cites the version in each format, with its permanent address, and copies it', async () => {
    const fetchMock = routes();
    const writeText = jest.fn(async () => undefined);
    Object.defineProperty(navigator, 'clipboard', { configurable: true, value: { writeText } });
    renderWithProviders(<EntryScreen slug="light-in-a-box" />);

    const panel = await screen.findByTestId('cite-panel');
    expect((await within(panel).findByTestId('cite-text')).textContent).toBe(citeText.apa);
    expect(within(panel).getByTestId('cite-permalink').textContent).toContain('https://counterweight.example.org/entries/light-in-a-box/v/2');

    for (const format of ['bibtex', 'ris', 'csl-json', 'vancouver'] as const) {
      fireEvent.click(within(panel).getByTestId(`cite-format-${format}`));
      await waitFor(() => expect(within(panel).getByTestId('cite-text').textContent).toBe(citeText[format]));
      expect(fetchMock).toHaveBeenCalledWith(`/api/entries/light-in-a-box/cite?format=${format}&version=2`, expect.anything());
    }
    fireEvent.click(within(panel).getByTestId('cite-copy'));
    await waitFor(() => expect(within(panel).getByTestId('cite-copy-status').textContent).toBe('Copied.'));
    expect(writeText).toHaveBeenCalledWith(citeText.vancouver);
  });

  it('lists the versions and compares the shown one with the one before', async () => {
    routes();
    renderWithProviders(<EntryScreen slug="light-in-a-box" />);
    const list = await screen.findByTestId('versions-list');
    expect(within(list).getByTestId('version-link-1').getAttribute('href')).toBe('/entries/light-in-a-box/v/1');
    const diff = await screen.findByTestId('diff-view');
    expect(diff.textContent).toContain('From version 1 to version 2');
    expect(within(diff).getByTestId('diff-section-Why it fails')).toBeTruthy();
  });

  it('says so when the entry does not exist', async () => {
    mockFetch({
      '/api/entries/no-such-thing': () => jsonResponse(404, { error: { code: 'not_found', message: 'No such entry.' } }),
    });
    renderWithProviders(<EntryScreen slug="no-such-thing" />);
    expect((await screen.findByTestId('entry-not-found')).textContent).toContain('No published entry has the address');
  });
});

describe('DiffView', () => {
  it('underlines added words and strikes removed ones, section by section', () => {
    renderWithProviders(<DiffView from={{ label: 'version 1', content: version1 }} to={{ label: 'version 2', content: version2 }} />);
    const why = screen.getByTestId('diff-section-Why it fails');
    const added = within(why).getAllByTestId('diff-added').map((el) => el.textContent!.trim());
    const removed = within(why).getAllByTestId('diff-removed').map((el) => el.textContent!.trim());
    expect(added).toEqual(['far', 'near']);
    expect(removed).toEqual(['opposite']);
    expect(within(why).getAllByTestId('diff-removed')[0].getAttribute('aria-label')).toBe('removed: opposite');

    const questions = screen.getByTestId('diff-section-Questions to ask the claimant');
    expect(within(questions).getByTestId('diff-added').textContent).toContain('What did a dummy load show?');
    expect(within(questions).queryByTestId('diff-removed')).toBeNull();
    expect(screen.queryByTestId('diff-section-Title')).toBeNull();
  });

  it('compares by whole words and numbers, and ignores where the source breaks its lines', () => {
    const before = { ...version1, whyItFails: 'The balance read 3.3 uN, with the\nsupply cables hanging free.' };
    const after = { ...version1, whyItFails: 'The balance read 3.34 uN, with the supply cables hanging free.' };
    renderWithProviders(<DiffView from={{ label: 'version 1', content: before }} to={{ label: 'version 2', content: after }} />);
    const why = screen.getByTestId('diff-section-Why it fails');
    // One number changed: one word struck, one added; the moved line break is not a change.
    expect(within(why).getAllByTestId('diff-removed').map((el) => el.textContent)).toEqual(['3.3']);
    expect(within(why).getAllByTestId('diff-added').map((el) => el.textContent)).toEqual(['3.34']);
    expect(why.textContent).toContain('with the supply cables');
  });

  it('says when only the line breaks of the source differ', () => {
    const rewrapped = { ...version1, whyItFails: version1.whyItFails.replace(/ /g, '\n') };
    renderWithProviders(<DiffView from={{ label: 'version 1', content: version1 }} to={{ label: 'version 2', content: rewrapped }} />);
    expect(screen.getByTestId('diff-none')).toBeTruthy();
  });

  it('says when nothing changed', () => {
    renderWithProviders(<DiffView from={{ label: 'version 1', content: version1 }} to={{ label: 'version 1', content: version1 }} />);
    expect(screen.getByTestId('diff-none').textContent).toContain('same text in every section');
  });
});
