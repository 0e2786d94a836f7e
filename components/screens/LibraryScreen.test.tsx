import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { useState } from 'react';
import type { TaxonomyResponse } from '@/shared/api-types';
import type { SearchResponse } from '@/shared/api-types';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { LibraryScreen, type LibrarySearch } from './LibraryScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

const taxonomy: TaxonomyResponse = {
  laws: [
    {
      slug: 'energy',
      name: 'Conservation of energy (first law)',
      quantity: 'energy',
      symmetry: 'translation in time',
      summary: 'Energy is neither made nor destroyed.',
      position: 1,
    },
    {
      slug: 'linear-momentum',
      name: 'Conservation of linear momentum',
      quantity: 'linear momentum',
      symmetry: 'translation in space',
      summary: 'A closed system cannot change its own total momentum.',
      position: 0,
    },
    {
      slug: 'entropy',
      name: 'Second law of thermodynamics',
      quantity: 'entropy',
      symmetry: null,
      summary: 'No heat engine beats Carnot.',
      position: 2,
    },
  ],
  classes: [
    { slug: 'propellant-free-thrust', name: 'Propellant-free thrust', parentSlug: null, summary: 'A sealed device said to push itself.', position: 0 },
    { slug: 'internal-mass-motion', name: 'Thrust from masses moving inside', parentSlug: 'propellant-free-thrust', summary: 'Weights shuttled inside a frame.', position: 1 },
    { slug: 'over-unity', name: 'More energy out than in', parentSlug: null, summary: 'Machines of the first kind.', position: 2 },
  ],
};

const noEntries = { '/api/entries?limit=20': () => jsonResponse(200, { entries: [], total: 0 }) };

const entry = (slug: string, title: string, laws: string[], mechanismClass: string, version: number) => ({
  slug,
  title,
  version,
  publishedAt: '2026-03-02T09:00:00.000Z',
  laws,
  mechanismClass,
  inBrief: `Why *${title.toLowerCase()}* cannot work.`,
  // As the server renders it (shared/markdown.ts).
  inBriefHtml: `<p>Why <em>${title.toLowerCase()}</em> cannot work.</p>`,
});
const allEntries = [
  entry('shuttling-weights', 'Shuttling weights', ['linear-momentum'], 'internal-mass-motion', 3),
  entry('wheel-of-weights', 'A wheel of weights', ['energy'], 'over-unity', 1),
];

describe('LibraryScreen', () => {
  it('has its heading, one search field and a word on how to search', () => {
    mockFetch({ '/api/taxonomy': () => jsonResponse(200, taxonomy), ...noEntries });
    renderWithProviders(<LibraryScreen />);
    const root = screen.getByTestId('screen-library');
    expect(within(root).getByRole('heading', { level: 1 }).textContent).toBe('Library');
    expect(screen.getByLabelText('Search the library').tagName).toBe('INPUT');
    expect(screen.getByTestId('library-search-hint').textContent).toContain('Results come as you type');
  });

  it('shows progress, then the laws with their symmetry and the classes as a tree', async () => {
    const fetchMock = mockFetch({ '/api/taxonomy': () => jsonResponse(200, taxonomy), ...noEntries });
    renderWithProviders(<LibraryScreen />);
    expect(screen.getByTestId('taxonomy-loading').textContent).toContain('Loading');

    const laws = await screen.findByTestId('law-list');
    expect(fetchMock).toHaveBeenCalledWith('/api/taxonomy', expect.objectContaining({ headers: { Accept: 'application/json' } }));
    expect(screen.queryByTestId('taxonomy-loading')).toBeNull();
    const items = within(laws).getAllByRole('listitem');
    expect(items.map((item) => item.getAttribute('data-testid'))).toEqual(['law-linear-momentum', 'law-energy', 'law-entropy']);
    expect(screen.getByTestId('law-energy').textContent).toContain('Symmetry: translation in time');
    expect(screen.getByTestId('law-entropy').textContent).toContain('Not tied to a symmetry');

    const parent = screen.getByTestId('class-propellant-free-thrust');
    expect(within(parent).getByTestId('class-internal-mass-motion').textContent).toContain('Thrust from masses moving inside');
    expect(screen.getByTestId('class-over-unity').textContent).toContain('More energy out than in');
  });

  it('says the server could not be reached when fetch fails, and retries on request', async () => {
    let reachable = false;
    mockFetch({
      ...noEntries,
      '/api/taxonomy': () => {
        if (!reachable) throw new TypeError('Failed to fetch');
        return jsonResponse(200, taxonomy);
      },
    });
    renderWithProviders(<LibraryScreen />);

    const notice = await screen.findByTestId('taxonomy-error');
    expect(notice.getAttribute('role')).toBe('alert');
    expect(notice.textContent).toContain("Counterweight's server could not be reached.");
    expect(notice.textContent).toContain('Check that npm start is running, then retry.');

    reachable = true;
    fireEvent.click(within(notice).getByRole('button', { name: 'Retry' }));
    expect(await screen.findByTestId('law-linear-momentum')).toBeTruthy();
    expect(screen.queryByTestId('taxonomy-error')).toBeNull();
  });

  it("passes on the server's own error message", async () => {
    mockFetch({
      ...noEntries,
      '/api/taxonomy': () =>
        jsonResponse(503, { error: { code: 'db_unavailable', message: 'The database cannot be reached right now. Try again in a moment.' } }),
    });
    renderWithProviders(<LibraryScreen />);
    const notice = await screen.findByTestId('taxonomy-error');
    expect(notice.textContent).toContain('The server could not send the conservation laws and mechanism classes.');
    expect(notice.textContent).toContain('The database cannot be reached right now.');
    expect(notice.textContent).toContain('db_unavailable, HTTP 503');
  });

  it('says what comes next when the taxonomy is empty', async () => {
    mockFetch({ '/api/taxonomy': () => jsonResponse(200, { laws: [], classes: [] }), ...noEntries });
    renderWithProviders(<LibraryScreen />);
    expect((await screen.findByTestId('taxonomy-empty')).textContent).toContain('npm start loads the starter laws and classes');
    expect((await screen.findByTestId('recent-empty')).textContent).toContain('No entries are published yet.');
  });

  it('lists published entries, newest revision first, each linking to its page, and filters them by law and class', async () => {
    const fetchMock = mockFetch({
      '/api/taxonomy': () => jsonResponse(200, taxonomy),
      '/api/entries?limit=20': () => jsonResponse(200, { entries: allEntries, total: 2 }),
      '/api/entries?law=energy&limit=20': () => jsonResponse(200, { entries: [allEntries[1]], total: 1 }),
      '/api/entries?law=energy&mechanism=internal-mass-motion&limit=20': () => jsonResponse(200, { entries: [], total: 0 }),
    });
    const onFiltersChange = jest.fn();
    renderWithProviders(<LibraryScreen onFiltersChange={onFiltersChange} />);

    const list = await screen.findByTestId('entry-list');
    expect(within(list).getAllByRole('listitem').map((item) => item.getAttribute('data-testid'))).toEqual([
      'entry-shuttling-weights',
      'entry-wheel-of-weights',
    ]);
    expect(screen.getByTestId('entry-link-shuttling-weights').getAttribute('href')).toBe('/entries/shuttling-weights');
    const row = screen.getByTestId('entry-shuttling-weights');
    expect(row.textContent).toContain('Version 3');
    expect(row.querySelector('em')!.textContent).toBe('shuttling weights');
    expect(await within(row).findByText('Conservation of linear momentum · Thrust from masses moving inside')).toBeTruthy();

    // On a phone the filters are folded behind one button below the list.
    expect(screen.queryByTestId('filter-law-energy')).toBeNull();
    fireEvent.click(screen.getByTestId('filters-toggle'));
    fireEvent.click(screen.getByTestId('filter-law-energy'));
    await waitFor(() => expect(screen.queryByTestId('entry-shuttling-weights')).toBeNull());
    expect(screen.getByTestId('entry-wheel-of-weights')).toBeTruthy();
    expect(fetchMock).toHaveBeenCalledWith('/api/entries?law=energy&limit=20', expect.anything());
    expect(onFiltersChange).toHaveBeenLastCalledWith({ law: 'energy' });

    fireEvent.click(screen.getByTestId('filter-mechanism-internal-mass-motion'));
    expect((await screen.findByTestId('entries-none')).textContent).toContain('No published entry matches these filters.');
    expect(onFiltersChange).toHaveBeenLastCalledWith({ law: 'energy', mechanism: 'internal-mass-motion' });
  });

  describe('search', () => {
    const hit = (slug: string, title: string, excerpt: string, terms: string[], matched: string[], laws = ['linear-momentum'], mechanismClass = 'internal-mass-motion') => ({
      slug,
      title,
      version: 2,
      score: 12.5,
      terms,
      matched,
      excerpt,
      laws,
      mechanismClass,
      inBrief: `Why ${title} cannot work.`,
    });
    const shuttle = hit(
      'shuttling-weights',
      'Shuttling weights',
      'Weights <mark>shuttled</mark> inside a sealed &amp; rigid <mark>frame</mark> cannot move its centre of mass &lt;at all&gt;.',
      ['shuttl', 'frame'],
      ['shuttling', 'frame'],
    );
    const wheel = hit('wheel-of-weights', 'A wheel of weights', 'A <mark>wheel</mark> of weights that turns forever.', ['wheel'], ['wheel'], ['energy'], 'over-unity');
    const answer = (query: string, results: ReturnType<typeof hit>[], facets: SearchResponse['facets'] = { laws: { 'linear-momentum': 1, energy: 1 }, mechanisms: { 'internal-mass-motion': 1, 'over-unity': 1 } }) =>
      jsonResponse(200, { query, total: results.length, results, facets });
    const base = { '/api/taxonomy': () => jsonResponse(200, taxonomy), '/api/entries?limit=20': () => jsonResponse(200, { entries: allEntries, total: 2 }) };
    const searchCalls = (fetchMock: jest.Mock) => fetchMock.mock.calls.map(([path]) => String(path)).filter((path) => path.startsWith('/api/search'));

    beforeEach(() => setWindowWidth(390));

    it('searches once the typing rests, and shows the count, the results and the matched words highlighted', async () => {
      const fetchMock = mockFetch({ ...base, '/api/search?q=shuttling+frame': () => answer('shuttling frame', [shuttle, wheel]) });
      renderWithProviders(<LibraryScreen />);
      expect(await screen.findByTestId('entry-list')).toBeTruthy();

      const input = screen.getByTestId('library-search');
      fireEvent.change(input, { target: { value: 'shu' } });
      fireEvent.change(input, { target: { value: 'shuttling' } });
      fireEvent.change(input, { target: { value: 'shuttling frame' } });
      expect(searchCalls(fetchMock)).toEqual([]);

      expect((await screen.findByTestId('search-count')).textContent).toBe('2 entries');
      expect(searchCalls(fetchMock)).toEqual(['/api/search?q=shuttling+frame']);
      expect(screen.queryByTestId('entry-list')).toBeNull();

      const row = screen.getByTestId('search-result-shuttling-weights');
      expect(screen.getByTestId('entry-link-shuttling-weights').getAttribute('href')).toBe('/entries/shuttling-weights');
      const marks = within(row).getAllByTestId('mark');
      expect(marks.map((m) => m.textContent)).toEqual(['shuttled', 'frame']);
      expect(screen.getByTestId('search-excerpt-shuttling-weights').textContent).toBe(
        'Weights shuttled inside a sealed & rigid frame cannot move its centre of mass <at all>.',
      );
      expect(row.querySelector('mark, script')).toBeNull();
      // The reader's words, never the index's stems.
      expect(row.textContent).toContain('Matched: shuttling, frame');
      expect(row.textContent).not.toContain('shuttl,');
      expect(await within(row).findByText('Conservation of linear momentum · Thrust from masses moving inside')).toBeTruthy();
      fireEvent.click(screen.getByTestId('filters-toggle'));
      expect(screen.getByTestId('filter-law-energy').textContent).toBe('Conservation of energy (first law) (1)');
      expect(screen.getByTestId('filter-law-entropy').textContent).toBe('Second law of thermodynamics (0)');

      // Emptying the field brings back the recently revised list.
      fireEvent.change(input, { target: { value: '' } });
      expect(await screen.findByTestId('entry-list')).toBeTruthy();
    });

    it('keeps the previous results while the next request is pending', async () => {
      let release: (response: Response) => void = () => undefined;
      mockFetch({
        ...base,
        '/api/search?q=wheel': () => answer('wheel', [wheel]),
        '/api/search?q=wheel+weights': () => new Promise<Response>((resolve) => (release = resolve)),
      });
      renderWithProviders(<LibraryScreen />);
      const input = screen.getByTestId('library-search');
      fireEvent.change(input, { target: { value: 'wheel' } });
      expect((await screen.findByTestId('search-count')).textContent).toBe('1 entry');

      fireEvent.change(input, { target: { value: 'wheel weights' } });
      await waitFor(() => expect(screen.getByTestId('search-count').textContent).toContain('searching…'));
      expect(screen.getByTestId('search-result-wheel-of-weights')).toBeTruthy();

      release(answer('wheel weights', [wheel, shuttle]));
      await waitFor(() => expect(screen.getByTestId('search-count').textContent).toBe('2 entries'));
      expect(screen.getByTestId('search-result-shuttling-weights')).toBeTruthy();
    });

    it('adds law= when a chip is chosen', async () => {
      const fetchMock = mockFetch({
        ...base,
        '/api/search?q=weights': () => answer('weights', [shuttle, wheel]),
        '/api/search?q=weights&law=energy': () => answer('weights', [wheel]),
      });
      const onFiltersChange = jest.fn();
      renderWithProviders(<LibraryScreen onFiltersChange={onFiltersChange} />);
      fireEvent.change(screen.getByTestId('library-search'), { target: { value: 'weights' } });
      expect((await screen.findByTestId('search-count')).textContent).toBe('2 entries');

      fireEvent.click(screen.getByTestId('filters-toggle'));
      fireEvent.click(screen.getByTestId('filter-law-energy'));
      await waitFor(() => expect(screen.getByTestId('search-count').textContent).toBe('1 entry'));
      expect(screen.queryByTestId('search-result-shuttling-weights')).toBeNull();
      expect(searchCalls(fetchMock)).toContain('/api/search?q=weights&law=energy');
      expect(onFiltersChange).toHaveBeenLastCalledWith({ law: 'energy' });
    });

    it('says when nothing matches, and searches for a suggestion when it is chosen', async () => {
      const fetchMock = mockFetch({
        ...base,
        '/api/search?q=zzyzx': () => answer('zzyzx', [], { laws: {}, mechanisms: {} }),
        '/api/search?q=magnet+motor': () => answer('magnet motor', [wheel]),
      });
      renderWithProviders(<LibraryScreen />);
      const input = screen.getByTestId('library-search') as HTMLInputElement;
      fireEvent.change(input, { target: { value: 'zzyzx' } });
      const empty = await screen.findByTestId('search-empty');
      expect(empty.textContent).toContain('Nothing in the library matches “zzyzx”.');
      expect(screen.getByTestId('search-count').textContent).toBe('0 entries');
      expect(screen.getByTestId('search-suggestion-0').textContent).toBe('sealed box that pushes itself');
      expect(screen.getByTestId('search-suggestion-2').textContent).toBe('heat engine on one reservoir');

      fireEvent.click(screen.getByTestId('search-suggestion-1'));
      expect(input.value).toBe('magnet motor');
      expect(await screen.findByTestId('search-result-wheel-of-weights')).toBeTruthy();
      expect(searchCalls(fetchMock)).toContain('/api/search?q=magnet+motor');
      expect(screen.queryByTestId('search-empty')).toBeNull();
    });

    it('moves through the results with the arrow keys on a wide screen and opens one with Enter', async () => {
      setWindowWidth(1280);
      mockFetch({ ...base, '/api/search?q=weights': () => answer('weights', [shuttle, wheel]) });
      const onOpenEntry = jest.fn();
      renderWithProviders(<LibraryScreen onOpenEntry={onOpenEntry} />);
      const input = screen.getByTestId('library-search');
      fireEvent.change(input, { target: { value: 'weights' } });
      await screen.findByTestId('search-result-wheel-of-weights');
      const selected = () =>
        ['shuttling-weights', 'wheel-of-weights'].filter((slug) => screen.getByTestId(`search-result-${slug}`).getAttribute('aria-selected') === 'true');

      expect(selected()).toEqual([]);
      fireEvent.keyDown(input, { key: 'ArrowDown' });
      expect(selected()).toEqual(['shuttling-weights']);
      fireEvent.keyDown(input, { key: 'ArrowDown' });
      fireEvent.keyDown(input, { key: 'ArrowDown' });
      expect(selected()).toEqual(['wheel-of-weights']);
      fireEvent.keyDown(input, { key: 'ArrowUp' });
      expect(selected()).toEqual(['shuttling-weights']);
      fireEvent.keyDown(input, { key: 'Enter' });
      expect(onOpenEntry).toHaveBeenCalledWith('shuttling-weights');
    });
    /** The screen as the route renders it: the address in state, written back as expo-router would. */
    function Routed({ start, onSearchChange }: { start: LibrarySearch; onSearchChange: jest.Mock }) {
      const [address, setAddress] = useState(start);
      navigate = setAddress;
      return (
        <LibraryScreen
          query={address.q}
          filters={{ law: address.law, mechanism: address.mechanism }}
          onSearchChange={(search, how) => {
            onSearchChange(search, how);
            setAddress(search);
          }}
        />
      );
    }
    let navigate: (address: LibrarySearch) => void = () => undefined;

    it('starts from the address, writes the settled query back once by replacing, and names it in the page title', async () => {
      const fetchMock = mockFetch({
        ...base,
        '/api/search?q=wheel': () => answer('wheel', [wheel]),
        '/api/search?q=wheel+weights': () => answer('wheel weights', [wheel, shuttle]),
      });
      const onSearchChange = jest.fn();
      renderWithProviders(<Routed start={{ q: 'wheel' }} onSearchChange={onSearchChange} />);
      expect((screen.getByTestId('library-search') as HTMLInputElement).value).toBe('wheel');
      expect(await screen.findByTestId('search-result-wheel-of-weights')).toBeTruthy();
      expect(document.title).toBe('“wheel” — Library — Counterweight');
      // Loading the address writes nothing back.
      expect(onSearchChange).not.toHaveBeenCalled();

      const input = screen.getByTestId('library-search');
      fireEvent.change(input, { target: { value: 'wheel w' } });
      fireEvent.change(input, { target: { value: 'wheel weights' } });
      expect(await screen.findByTestId('search-result-shuttling-weights')).toBeTruthy();
      expect(onSearchChange.mock.calls).toEqual([[{ q: 'wheel weights', law: undefined, mechanism: undefined }, 'replace']]);
      expect(searchCalls(fetchMock)).toEqual(['/api/search?q=wheel', '/api/search?q=wheel+weights']);
      await waitFor(() => expect(document.title).toBe('“wheel weights” — Library — Counterweight'));
    });

    it('follows the address when it changes from outside (Back, Forward), without writing it back', async () => {
      mockFetch({
        ...base,
        '/api/search?q=weights': () => answer('weights', [shuttle, wheel]),
        '/api/search?q=wheel&law=energy': () => answer('wheel', [wheel]),
      });
      const onSearchChange = jest.fn();
      renderWithProviders(<Routed start={{ q: 'weights' }} onSearchChange={onSearchChange} />);
      expect((await screen.findByTestId('search-count')).textContent).toBe('2 entries');

      act(() => navigate({ q: 'wheel', law: 'energy' }));
      expect((screen.getByTestId('library-search') as HTMLInputElement).value).toBe('wheel');
      await waitFor(() => expect(screen.getByTestId('search-count').textContent).toBe('1 entry'));
      expect(screen.getByTestId('filters-set').textContent).toContain('Conservation of energy (first law)');
      expect(screen.getByTestId('filters-toggle').textContent).toContain('Filters (1 set)');

      act(() => navigate({ q: '' }));
      expect(await screen.findByTestId('entry-list')).toBeTruthy();
      expect((screen.getByTestId('library-search') as HTMLInputElement).value).toBe('');
      expect(document.title).toBe('Library — Counterweight');
      expect(onSearchChange.mock.calls).toEqual([]);
    });

    it('adds a history entry when a filter is chosen, with the query as typed', async () => {
      mockFetch({
        ...base,
        '/api/search?q=weights': () => answer('weights', [shuttle, wheel]),
        '/api/search?q=weights&mechanism=over-unity': () => answer('weights', [wheel]),
      });
      const onSearchChange = jest.fn();
      renderWithProviders(<Routed start={{ q: 'weights' }} onSearchChange={onSearchChange} />);
      await screen.findByTestId('search-result-shuttling-weights');
      fireEvent.click(screen.getByTestId('filters-toggle'));
      fireEvent.click(screen.getByTestId('filter-mechanism-over-unity'));
      await waitFor(() => expect(screen.queryByTestId('search-result-shuttling-weights')).toBeNull());
      expect(onSearchChange.mock.calls).toEqual([[{ q: 'weights', law: undefined, mechanism: 'over-unity' }, 'push']]);
    });

    it('on a phone lists the results before the filters, folded behind one button that says how many are set', async () => {
      mockFetch({ ...base, '/api/search?q=weights&law=energy': () => answer('weights', [wheel]) });
      renderWithProviders(<LibraryScreen query="weights" filters={{ law: 'energy' }} />);
      const result = await screen.findByTestId('search-result-wheel-of-weights');
      const toggle = screen.getByTestId('filters-toggle');
      expect(toggle.getAttribute('aria-expanded')).toBe('false');
      expect(toggle.getAttribute('aria-label')).toBe('Filters, 1 set');
      expect(screen.queryByTestId('filter-chips')).toBeNull();
      // In document order the results come first.
      expect(result.compareDocumentPosition(toggle) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();

      fireEvent.click(toggle);
      expect(toggle.getAttribute('aria-expanded')).toBe('true');
      const chips = screen.getByTestId('filter-chips');
      expect(toggle.getAttribute('aria-controls')).toBe(chips.id);
      expect(within(chips).getByTestId('filter-law-energy').getAttribute('aria-checked')).toBe('true');
    });

    it('on a wide screen keeps the filters in view beside the results, with no button', async () => {
      setWindowWidth(1280);
      mockFetch({ ...base, '/api/search?q=weights': () => answer('weights', [shuttle, wheel]) });
      renderWithProviders(<LibraryScreen query="weights" />);
      await screen.findByTestId('search-result-wheel-of-weights');
      expect(screen.queryByTestId('filters-toggle')).toBeNull();
      expect(screen.getByTestId('filter-law-energy').textContent).toBe('Conservation of energy (first law) (1)');
      expect(screen.queryByTestId('filters-set')).toBeNull();
    });
  });
});
