import { fireEvent, screen, within } from '@testing-library/react';
import type { TaxonomyResponse } from '@/shared/api-types';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { LibraryScreen } from './LibraryScreen';

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

describe('LibraryScreen', () => {
  it('has its heading, one search field and a word on what search needs', () => {
    mockFetch({ '/api/taxonomy': () => jsonResponse(200, taxonomy) });
    renderWithProviders(<LibraryScreen />);
    const root = screen.getByTestId('screen-library');
    expect(within(root).getByRole('heading', { level: 1 }).textContent).toBe('Library');
    expect(screen.getByLabelText('Search the library').tagName).toBe('INPUT');
    expect(screen.getByTestId('library-search-hint').textContent).toContain(
      'Search across entries comes with the published entries',
    );
  });

  it('shows progress, then the laws with their symmetry and the classes as a tree', async () => {
    const fetchMock = mockFetch({ '/api/taxonomy': () => jsonResponse(200, taxonomy) });
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
    mockFetch({ '/api/taxonomy': () => jsonResponse(200, { laws: [], classes: [] }) });
    renderWithProviders(<LibraryScreen />);
    expect((await screen.findByTestId('taxonomy-empty')).textContent).toContain('npm start loads the starter laws and classes');
    expect(screen.getByTestId('recent-empty').textContent).toContain('No entries are published yet.');
  });
});
