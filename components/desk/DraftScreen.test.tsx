import { fireEvent, screen, waitFor } from '@testing-library/react';
import { version1 } from '../entry/fixtures';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { DraftScreen } from './DraftScreen';
import type { ReviewPanel } from './ReviewPanel';

jest.mock('expo-router', () => ({ ...jest.requireActual('../testing/expoRouter'), router: { push: jest.fn(), replace: jest.fn() } }));

/** The draft as the screens take it (the type of the API contract, through the panel's props). */
type Draft = Parameters<typeof ReviewPanel>[0]['draft'];

// Invented people (DESIGN.md §7): the draft's author and another editor.
const author = { id: 3, email: 'imre.castellanos@example.org', displayName: 'Imre Castellanos' };
const other = { id: 4, email: 'wanjiru.okafor@example.org', displayName: 'Wanjiru Okafor' };
const sessionOf = (who: typeof author | null, role: 'editor' | 'contributor' = 'editor') => () =>
  jsonResponse(200, { user: who && { ...who, role, verified: true, createdAt: '2026-01-05T09:00:00.000Z' }, csrfToken: 'csrf-draft' });

const draftOf = (over: Partial<Draft> = {}): Draft => ({
  id: 7,
  slug: 'light-in-a-box',
  state: 'draft',
  lockVersion: 3,
  content: version1,
  author: { id: author.id, displayName: author.displayName },
  reviewer: null,
  updatedAt: '2026-03-01T10:00:00.000Z',
  basedOn: null,
  reviewNote: null,
  entryStatus: 'draft',
  ...over,
});
const taxonomy = { laws: [], classes: [] };

// The editor renders every section: slow on a busy machine, so a generous limit (no timing is tested).
jest.setTimeout(60_000);

beforeEach(() => setWindowWidth(390));

describe('DraftScreen', () => {
  it('gives the author the editor for a draft of their own', async () => {
    mockFetch({ '/api/session': sessionOf(author), '/api/drafts/7': () => jsonResponse(200, { draft: draftOf() }), '/api/taxonomy': () => jsonResponse(200, taxonomy) });
    renderWithProviders(<DraftScreen id={7} />);
    expect(await screen.findByTestId('entry-editor')).toBeTruthy();
    expect((screen.getByTestId('editor-field-title') as HTMLInputElement).value).toBe(version1.title);
    expect(screen.queryByTestId('review-panel')).toBeNull();
    expect(screen.getByTestId('draft-back').getAttribute('href')).toBe('/desk');
  });

  it('says where a published draft went, with a link to its version, rather than a bare "not found"', async () => {
    mockFetch({
      '/api/session': sessionOf(other),
      '/api/drafts/7': () =>
        jsonResponse(404, { error: { code: 'draft_published', message: 'Draft 7 is no longer open.' }, published: { slug: 'light-in-a-box', version: 2, title: version1.title } }),
    });
    renderWithProviders(<DraftScreen id={7} />);
    const notice = await screen.findByTestId('draft-published');
    expect(notice.textContent).toContain(`version 2 of “${version1.title}”`);
    expect(screen.getByTestId('draft-published-link').getAttribute('href')).toBe('/entries/light-in-a-box/v/2');
    expect(screen.queryByTestId('draft-not-found')).toBeNull();
  });

  it('gives another editor the review panel and the preview once the draft is in review', async () => {
    mockFetch({ '/api/session': sessionOf(other), '/api/drafts/7': () => jsonResponse(200, { draft: draftOf({ state: 'in_review' }) }) });
    renderWithProviders(<DraftScreen id={7} />);
    const panel = await screen.findByTestId('review-panel');
    expect(panel.textContent).toContain('Written by Imre Castellanos.');
    expect(screen.getByTestId('screen-draft').textContent).toContain('The draft as readers will see it');
    expect(screen.getByTestId('screen-draft').textContent).toContain(version1.title);
    expect(screen.queryByTestId('entry-editor')).toBeNull();
  });

  it('shows the author their own draft in review read-only, waiting for another editor', async () => {
    mockFetch({ '/api/session': sessionOf(author), '/api/drafts/7': () => jsonResponse(200, { draft: draftOf({ state: 'in_review' }) }) });
    renderWithProviders(<DraftScreen id={7} />);
    const notice = await screen.findByTestId('draft-read-only');
    expect(notice.textContent).toContain('Waiting for review');
    expect(screen.queryByTestId('review-panel')).toBeNull();
    expect(screen.queryByTestId('entry-editor')).toBeNull();
  });

  it('shows another editor a draft still being written read-only, naming its author', async () => {
    mockFetch({ '/api/session': sessionOf(other), '/api/drafts/7': () => jsonResponse(200, { draft: draftOf() }) });
    renderWithProviders(<DraftScreen id={7} />);
    const notice = await screen.findByTestId('draft-read-only');
    expect(notice.textContent).toContain("Imre Castellanos's draft");
    expect(notice.textContent).toContain('Only its author edits a draft.');
    expect(screen.queryByTestId('review-panel')).toBeNull();
    expect(screen.queryByTestId('entry-editor')).toBeNull();
  });

  it('says when there is no such draft (404)', async () => {
    mockFetch({
      '/api/session': sessionOf(author),
      '/api/drafts/7': () => jsonResponse(404, { error: { code: 'not_found', message: 'There is no draft 7.' } }),
    });
    renderWithProviders(<DraftScreen id={7} />);
    expect((await screen.findByTestId('draft-not-found')).textContent).toContain('There is no such draft.');
  });

  it('offers to try again when the draft cannot be fetched, and shows it when the retry succeeds', async () => {
    let calls = 0;
    mockFetch({
      '/api/session': sessionOf(other),
      '/api/drafts/7': () => (++calls === 1 ? jsonResponse(500, { error: { code: 'internal', message: 'Something went wrong on our side.' } }) : jsonResponse(200, { draft: draftOf({ state: 'in_review' }) })),
    });
    renderWithProviders(<DraftScreen id={7} />);
    expect((await screen.findByTestId('draft-error')).textContent).toContain('the draft');
    fireEvent.click(screen.getByTestId('draft-error-retry'));
    expect(await screen.findByTestId('review-panel')).toBeTruthy();
    await waitFor(() => expect(calls).toBe(2));
  });

  it('keeps the draft from a contributor and from a reader, who is offered sign-in', async () => {
    const fetchMock = mockFetch({ '/api/session': sessionOf(author, 'contributor'), '/api/drafts/7': () => jsonResponse(200, { draft: draftOf() }) });
    const { unmount } = renderWithProviders(<DraftScreen id={7} />);
    expect((await screen.findByTestId('role-required')).textContent).toContain('Editors and admins only');
    expect(fetchMock.mock.calls.map(([path]) => path)).not.toContain('/api/drafts/7');
    unmount();

    mockFetch({ '/api/session': sessionOf(null) });
    renderWithProviders(<DraftScreen id={7} />);
    expect(await screen.findByTestId('role-sign-in')).toBeTruthy();
  });
});
