import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { UserDto } from '@/shared/api-types';
import type { SynonymGroupDto } from '@/shared/api/synonyms';
import { forgetCsrfToken } from '../http/client';
import { setPathname } from '../testing/expoRouter';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { SynonymsScreen } from './SynonymsScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

// Invented people and words (DESIGN.md §7).
const bruno: UserDto = { id: 2, email: 'editor.one@example.org', displayName: 'Bruno Salazar', role: 'editor', verified: true, createdAt: '2026-01-02T09:00:00.000Z' };
const cavity: SynonymGroupDto = { id: 7, terms: ['resonator', 'cavity', 'frustum'], note: 'The closed vessel.', version: 1, updatedAt: '2026-03-01T10:00:00.000Z' };
const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });

beforeEach(() => {
  forgetCsrfToken();
  setPathname('/desk/synonyms');
});
afterEach(() => jest.restoreAllMocks());

describe('SynonymsScreen', () => {
  it('lists the groups and adds one, a line per word or phrase, showing a field error by its line', async () => {
    const groups = [cavity];
    let posts = 0;
    const fetchMock = mockFetch({
      '/api/session': () => jsonResponse(200, { user: bruno, csrfToken: 'csrf-editor' }),
      '/api/synonyms': (init) => {
        if (init?.method !== 'POST') return jsonResponse(200, { groups: [...groups] });
        posts += 1;
        const body = JSON.parse(String(init.body));
        if (posts === 1) {
          return jsonResponse(409, {
            error: { code: 'synonym_taken', message: 'Check body.terms.1: taken.', fields: { 'body.terms.1': '“Cavities” is already in another group' } },
          });
        }
        const group = { id: 8, terms: body.terms, note: body.note, version: 1, updatedAt: '2026-03-02T10:00:00.000Z' };
        groups.push(group);
        return jsonResponse(201, { group });
      },
    });
    renderWithProviders(<SynonymsScreen />);
    expect((await screen.findByTestId('synonyms-terms-7')).textContent).toBe('resonator · cavity · frustum');

    type('synonyms-new-terms', 'glimmer drive\n\n  Cavities  \n');
    fireEvent.click(screen.getByTestId('synonyms-new-save'));
    expect((await screen.findByText(/Line 2 \(“Cavities”\): “Cavities” is already in another group/)).textContent).toBeTruthy();

    type('synonyms-new-terms', 'glimmer drive\nshimmer drive');
    type('synonyms-new-note', 'Two invented names.');
    fireEvent.click(screen.getByTestId('synonyms-new-save'));
    expect((await screen.findByTestId('synonyms-terms-8')).textContent).toBe('glimmer drive · shimmer drive');
    expect(screen.getByTestId('synonyms-new-saved')).toBeTruthy();
    const sent = fetchMock.mock.calls.filter(([p, init]) => p === '/api/synonyms' && init?.method === 'POST').map(([, init]) => JSON.parse(String(init?.body)));
    expect(sent).toEqual([
      { terms: ['glimmer drive', 'Cavities'], note: null },
      { terms: ['glimmer drive', 'shimmer drive'], note: 'Two invented names.' },
    ]);
  });

  it('edits a group with the version it read, and keeps the lines typed when another editor changed it', async () => {
    let current = cavity;
    const puts: unknown[] = [];
    mockFetch({
      '/api/session': () => jsonResponse(200, { user: bruno, csrfToken: 'csrf-editor' }),
      '/api/synonyms': () => jsonResponse(200, { groups: [current] }),
      '/api/synonyms/7': (init) => {
        const body = JSON.parse(String(init?.body));
        puts.push(body);
        if (body.version !== 2) {
          current = { ...cavity, terms: ['resonator', 'cavity'], version: 2 };
          return jsonResponse(409, { error: { code: 'edit_conflict', message: 'Changed.', fields: { 'body.version': 'now 2' } }, group: current });
        }
        current = { ...current, terms: body.terms, version: 3 };
        return jsonResponse(200, { group: current });
      },
    });
    renderWithProviders(<SynonymsScreen />);
    fireEvent.click(await screen.findByTestId('synonyms-edit-open-7'));
    type('synonyms-edit-7-terms', 'resonator\ncavity\nfrustum\ntruncated cone');
    fireEvent.click(screen.getByTestId('synonyms-edit-7-save'));
    expect((await screen.findByTestId('synonyms-edit-7-conflict')).textContent).toContain('resonator · cavity');
    fireEvent.click(screen.getByTestId('synonyms-edit-7-save'));
    await waitFor(() => expect(screen.getByTestId('synonyms-terms-7').textContent).toBe('resonator · cavity · frustum · truncated cone'));
    expect(puts).toEqual([
      { terms: ['resonator', 'cavity', 'frustum', 'truncated cone'], note: 'The closed vessel.', version: 1 },
      { terms: ['resonator', 'cavity', 'frustum', 'truncated cone'], note: 'The closed vessel.', version: 2 },
    ]);
  });
});
