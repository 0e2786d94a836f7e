/** The new-entry screen of the Desk (app/desk/new.tsx renders NewEntryScreen). */
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { router } from 'expo-router';
import NewEntryRoute from '@/app/desk/new';
import { loadDeferred } from '../lazy/deferred';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';

jest.mock('expo-router', () => ({ ...jest.requireActual('../testing/expoRouter'), router: { push: jest.fn(), replace: jest.fn() } }));
// The route renders the screen from the deferred part of the app (components/lazy/screens.tsx), which
// holds the sighting form and its file picker too; loaded once before the tests.
jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn() }));
beforeAll(() => loadDeferred(), 60_000);

// An invented editor (DESIGN.md §7).
const sessionOf = (role: 'editor' | 'contributor' | null) => () =>
  jsonResponse(200, {
    user: role && { id: 3, email: 'imre.castellanos@example.org', displayName: 'Imre Castellanos', role, verified: true, createdAt: '2026-01-05T09:00:00.000Z' },
    csrfToken: 'csrf-new',
  });
// One class and one law, as GET /api/taxonomy answers (slugs of content/taxonomy.yml).
const taxonomy = {
  laws: [{ slug: 'linear-momentum', name: 'Conservation of linear momentum' }],
  classes: [{ slug: 'enclosed-radiation', name: 'Enclosed radiation', parent: null }],
};
const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });

// The editor renders every section and the live preview: slow on a busy machine, so generous limits (no timing is tested).
jest.setTimeout(60_000);

beforeEach(() => setWindowWidth(390));

describe('the new-entry screen', () => {
  it('creates the draft on the first save, once every required part is there, with the address typed', async () => {
    const created: { slug: string; content: Record<string, unknown> }[] = [];
    mockFetch({
      '/api/session': sessionOf('editor'),
      '/api/taxonomy': () => jsonResponse(200, taxonomy),
      '/api/drafts': (init) => {
        const body = JSON.parse(String(init?.body));
        created.push(body);
        return jsonResponse(201, {
          draft: { id: 21, slug: body.slug, state: 'draft', lockVersion: 0, content: body.content, author: { id: 3, displayName: 'Imre Castellanos' }, reviewer: null, updatedAt: '2026-03-02T09:00:00.000Z', basedOn: null, reviewNote: null, entryStatus: 'draft' },
        });
      },
    });
    renderWithProviders(<NewEntryRoute />);
    expect(await screen.findByTestId('entry-editor')).toBeTruthy();
    // Nothing typed yet: not saved, and it says why.
    expect(screen.getByTestId('save-status').textContent).toContain('once every required part is filled in');

    type('editor-field-title', 'Thrust from light in a sealed tin');
    type('editor-field-slug', 'light-in-a-sealed-tin');
    fireEvent.click(await screen.findByTestId('class-pick-enclosed-radiation'));
    fireEvent.click(screen.getByTestId('law-pick-linear-momentum'));
    type('editor-field-inBrief', 'Light held in a sealed tin pushes on every wall alike.');
    type('editor-field-howItIsPitched', 'The tin is said to push harder at one end.');
    // Still one part missing (why it fails): nothing sent.
    expect(created).toHaveLength(0);
    type('editor-field-whyItFails', 'The momentum of the light and the tin together is conserved.');

    await waitFor(() => expect(screen.getByTestId('save-status').textContent).toMatch(/^Saved /), { timeout: 30_000 });
    expect(created).toHaveLength(1);
    // The address becomes the draft's own, replacing /desk/new (no extra history entry).
    expect(router.replace).toHaveBeenCalledWith('/desk/drafts/21');
    expect(created[0].slug).toBe('light-in-a-sealed-tin');
    expect(created[0].content).toMatchObject({
      title: 'Thrust from light in a sealed tin',
      mechanismClass: 'enclosed-radiation',
      laws: ['linear-momentum'],
      whyItFails: 'The momentum of the light and the tin together is conserved.',
    });
  });

  it('names a malformed address beside its field', async () => {
    mockFetch({ '/api/session': sessionOf('editor'), '/api/taxonomy': () => jsonResponse(200, taxonomy) });
    renderWithProviders(<NewEntryRoute />);
    await screen.findByTestId('entry-editor');
    type('editor-field-slug', 'Light In A Tin');
    // Not while typing: once the field is left.
    expect(screen.queryByTestId('editor-error-slug')).toBeNull();
    fireEvent.blur(screen.getByTestId('editor-field-slug'));
    expect(screen.getByTestId('editor-error-slug').textContent).toBe('Lower-case words joined by hyphens.');
    // Our words, never zod's defaults ("Too small: expected string to have >=3 characters").
    type('editor-field-title', 'ab');
    fireEvent.blur(screen.getByTestId('editor-field-title'));
    expect(screen.getByTestId('editor-error-title').textContent).toBe('Give the title at least 3 characters.');
    expect(screen.getByTestId('entry-editor').textContent).not.toMatch(/expected|Too small|Invalid input|>=/);
  });

  it('lists what is missing when "Send for review" is pressed too early, each field by name', async () => {
    mockFetch({ '/api/session': sessionOf('editor'), '/api/taxonomy': () => jsonResponse(200, taxonomy) });
    renderWithProviders(<NewEntryRoute />);
    await screen.findByTestId('entry-editor');
    expect(screen.queryByTestId('editor-error-title')).toBeNull();
    fireEvent.click(screen.getByTestId('submit-review'));
    expect(screen.getByTestId('editor-error-title').textContent).toBe('Give the title at least 3 characters.');
    expect(screen.getByTestId('submit-missing-whyItFails').textContent).toBe('Why it fails: Write the technical objection.');
    expect(screen.getByTestId('submit-missing').textContent).not.toMatch(/expected|Too small|Invalid input|>=/);
  });

  it('is for editors and admins only: a contributor is told so, a reader is offered sign-in', async () => {
    mockFetch({ '/api/session': sessionOf('contributor') });
    const { unmount } = renderWithProviders(<NewEntryRoute />);
    expect((await screen.findByTestId('role-required')).textContent).toContain('Editors and admins only');
    expect(screen.queryByTestId('entry-editor')).toBeNull();
    unmount();

    mockFetch({ '/api/session': sessionOf(null) });
    renderWithProviders(<NewEntryRoute />);
    expect(await screen.findByTestId('role-sign-in')).toBeTruthy();
    expect(screen.queryByTestId('entry-editor')).toBeNull();
  });
});
