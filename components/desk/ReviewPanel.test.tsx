import { fireEvent, screen, waitFor } from '@testing-library/react';
import { router } from 'expo-router';
import { version1 } from '../entry/fixtures';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { ReviewPanel } from './ReviewPanel';

jest.mock('expo-router', () => ({ ...jest.requireActual('../testing/expoRouter'), router: { push: jest.fn(), replace: jest.fn() } }));

type Draft = Parameters<typeof ReviewPanel>[0]['draft'];

// An invented draft by an invented editor (DESIGN.md §7), in review.
const draft: Draft = {
  id: 11,
  slug: 'light-in-a-box',
  state: 'in_review',
  lockVersion: 4,
  content: version1,
  author: { id: 3, displayName: 'Imre Castellanos' },
  reviewer: null,
  updatedAt: '2026-03-01T10:00:00.000Z',
  basedOn: null,
  reviewNote: null,
  entryStatus: 'draft',
};
const session = () => jsonResponse(200, { user: null, csrfToken: 'csrf-review' });
const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });
const callsTo = (fetchMock: jest.Mock, path: string) => fetchMock.mock.calls.filter(([p]) => p === path);

beforeEach(() => jest.mocked(router.replace).mockClear());

describe('ReviewPanel', () => {
  it('wants a change note before approving, and sends nothing without one', async () => {
    const fetchMock = mockFetch({ '/api/session': session, '/api/drafts/11/approve': () => jsonResponse(200, {}) });
    renderWithProviders(<ReviewPanel draft={draft} />);
    type('editor-field-change-note', '   ');
    fireEvent.click(screen.getByTestId('approve'));
    expect((await screen.findByTestId('editor-error-change-note')).textContent).toBe('Say what this version changes.');
    expect(callsTo(fetchMock, '/api/drafts/11/approve')).toHaveLength(0);
    expect(router.replace).not.toHaveBeenCalled();
  });

  it('approves with the change note, trimmed, and opens the version just published', async () => {
    // The answer of an approval is the published version (GET /api/entries/:slug/versions/:n's shape).
    const published = { entry: { slug: 'light-in-a-box', status: 'published', title: version1.title, latestVersion: 1 }, version: { number: 1 } };
    const fetchMock = mockFetch({ '/api/session': session, '/api/drafts/11/approve': () => jsonResponse(200, published) });
    renderWithProviders(<ReviewPanel draft={draft} />);
    type('editor-field-change-note', '  First published version.  ');
    fireEvent.click(screen.getByTestId('approve'));
    await waitFor(() => expect(router.replace).toHaveBeenCalledWith('/entries/light-in-a-box/v/1'));
    const [[, init]] = callsTo(fetchMock, '/api/drafts/11/approve');
    expect(init?.method).toBe('POST');
    expect(JSON.parse(String(init?.body))).toEqual({ changeNote: 'First published version.' });
    expect((init?.headers as Record<string, string>)['X-CSRF-Token']).toBe('csrf-review');
  });

  it('says a new entry has nothing published to compare with', () => {
    mockFetch({ '/api/session': session });
    renderWithProviders(<ReviewPanel draft={draft} />);
    expect(screen.getByTestId('review-new-entry').textContent).toContain('A new entry');
    expect(screen.queryByTestId('diff-view')).toBeNull();
  });

  it('shows a revision’s changes against the published version before the approve button', async () => {
    const revision: Draft = { ...draft, basedOn: 2, content: { ...version1, title: 'Thrust from light sealed in a box' } };
    mockFetch({
      '/api/session': session,
      '/api/entries/light-in-a-box': () => jsonResponse(200, { entry: { slug: 'light-in-a-box', status: 'published', title: version1.title, latestVersion: 2 }, version: { number: 2, content: version1 } }),
    });
    renderWithProviders(<ReviewPanel draft={revision} />);
    const diff = await screen.findByTestId('diff-view');
    expect(diff.textContent).toContain('From version 2, as published to this draft');
    const title = screen.getByTestId('diff-section-Title');
    expect(title.textContent).toContain('sealed');
    // The changes come before the approve button in the panel (the reviewer reads them first).
    const panel = screen.getByTestId('review-panel');
    const order = Array.from(panel.querySelectorAll('[data-testid="diff-view"], [data-testid="approve"]')).map((el) => el.getAttribute('data-testid'));
    expect(order).toEqual(['diff-view', 'approve']);
  });

  it('wants a reason before sending back, then sends it and returns to the Desk', async () => {
    const fetchMock = mockFetch({ '/api/session': session, '/api/drafts/11/send-back': () => jsonResponse(200, { draft: { ...draft, state: 'draft' } }) });
    renderWithProviders(<ReviewPanel draft={draft} />);
    fireEvent.click(screen.getByTestId('send-back'));
    expect((await screen.findByTestId('editor-error-send-back-reason')).textContent).toBe('Tell the author what needs to change.');
    expect(callsTo(fetchMock, '/api/drafts/11/send-back')).toHaveLength(0);

    type('editor-field-send-back-reason', 'Add the upside-down run to the questions. ');
    fireEvent.click(screen.getByTestId('send-back'));
    await waitFor(() => expect(router.replace).toHaveBeenCalledWith('/desk'));
    const [[, init]] = callsTo(fetchMock, '/api/drafts/11/send-back');
    expect(JSON.parse(String(init?.body))).toEqual({ reason: 'Add the upside-down run to the questions.' });
    expect(callsTo(fetchMock, '/api/drafts/11/approve')).toHaveLength(0);
  });

  it('shows the server’s refusal in its words and stays on the draft', async () => {
    mockFetch({
      '/api/session': session,
      '/api/drafts/11/approve': () => jsonResponse(403, { error: { code: 'own_draft', message: 'You wrote this draft; another editor must review it.' } }),
    });
    renderWithProviders(<ReviewPanel draft={draft} />);
    type('editor-field-change-note', 'First published version.');
    fireEvent.click(screen.getByTestId('approve'));
    expect((await screen.findByTestId('review-error')).textContent).toContain('You wrote this draft; another editor must review it.');
    expect(router.replace).not.toHaveBeenCalled();
  });
});
