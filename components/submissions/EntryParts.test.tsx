import { fireEvent, screen, waitFor } from '@testing-library/react';
import { QueryClient } from '@tanstack/react-query';
import { jsonResponse, mockFetch, renderWithClient, renderWithProviders, setWindowWidth } from '../testing/render';
import { ReportError, SeenInTheWild } from './EntryParts';
import { contributor, correction, session, submissionResponse } from './fixtures';

jest.mock('expo-router', () => require('../testing/expoRouter'));

beforeEach(() => setWindowWidth(390));

describe('SeenInTheWild', () => {
  it('is hidden while no sighting is linked', async () => {
    const fetchMock = mockFetch({ '/api/entries/light-in-a-box/sightings': () => jsonResponse(200, { sightings: [] }) });
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    const { container } = renderWithClient(client, <SeenInTheWild slug="light-in-a-box" />);
    // Once the list has arrived (the query has data and nothing is fetching), nothing is shown.
    await waitFor(() => expect(client.getQueryCache().getAll().some((q) => q.state.status === 'success')).toBe(true));
    await waitFor(() => expect(client.isFetching()).toBe(0));
    expect(fetchMock).toHaveBeenCalled();
    expect(container.textContent).toBe('');
  });

  it('lists the linked sightings with where they were seen', async () => {
    mockFetch({
      '/api/entries/light-in-a-box/sightings': () =>
        jsonResponse(200, {
          sightings: [
            { id: 3, title: 'Cavity drive in a trade leaflet', seenAtUrl: null, seenAtCitation: 'Invented Trade Leaflet, spring 2026, p. 4', summary: 'x', submittedAt: '2026-03-01T10:00:00.000Z', linkedAt: '2026-03-02T10:00:00.000Z' },
            { id: 2, title: 'Cavity drive on a blog', seenAtUrl: 'https://blog.example.org/drive', seenAtCitation: null, summary: 'y', submittedAt: '2026-02-01T10:00:00.000Z', linkedAt: '2026-02-02T10:00:00.000Z' },
          ],
        }),
    });
    renderWithProviders(<SeenInTheWild slug="light-in-a-box" />);
    expect(await screen.findByRole('heading', { name: 'Seen in the wild' })).toBeTruthy();
    expect(screen.getByTestId('entry-sighting-3').textContent).toContain('Invented Trade Leaflet');
    expect(screen.getByTestId('entry-sighting-2-url').getAttribute('href')).toBe('https://blog.example.org/drive');
  });
});

describe('ReportError', () => {
  it('asks a reader to sign in', async () => {
    mockFetch(session(null));
    renderWithProviders(<ReportError slug="light-in-a-box" version={2} title="Thrust from light kept in a box" />);
    fireEvent.click(await screen.findByTestId('correction-open'));
    expect((await screen.findByTestId('correction-sign-in-link')).getAttribute('href')).toBe('/sign-in?next=%2Fentries%2Flight-in-a-box%2Fv%2F2');
  });

  it('sends a correction against the version on screen', async () => {
    let sent: unknown;
    mockFetch({
      ...session({ ...contributor, verified: false }),
      '/api/corrections': (init) => {
        sent = JSON.parse(String(init?.body));
        return jsonResponse(201, submissionResponse(correction()));
      },
    });
    renderWithProviders(<ReportError slug="light-in-a-box" version={2} title="Thrust from light kept in a box" />);
    fireEvent.click(await screen.findByTestId('correction-open'));
    await screen.findByTestId('correction-form');
    expect(screen.getByTestId('correction-section-whyItFails').textContent).toBe('Why it fails');
    fireEvent.click(screen.getByTestId('correction-section-sources'));
    fireEvent.click(screen.getByTestId('correction-submit'));
    expect(screen.getByTestId('correction-wrong-error')).toBeTruthy();
    expect(sent).toBeUndefined();
    fireEvent.change(screen.getByTestId('correction-wrong'), { target: { value: 'Reference 2 gives the wrong year.' } });
    fireEvent.change(screen.getByTestId('correction-fix'), { target: { value: 'It appeared in 1968.' } });
    fireEvent.change(screen.getByTestId('correction-sources'), { target: { value: 'The journal’s own index.' } });
    fireEvent.click(screen.getByTestId('correction-submit'));
    expect((await screen.findByTestId('correction-done-link')).getAttribute('href')).toBe('/submissions/42');
    expect(sent).toEqual({
      entry: 'light-in-a-box',
      version: 2,
      section: 'sources',
      whatIsWrong: 'Reference 2 gives the wrong year.',
      suggestedFix: 'It appeared in 1968.',
      sources: 'The journal’s own index.',
    });
  });
});
