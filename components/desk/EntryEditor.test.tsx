import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { SessionResponse } from '@/shared/api-types';
import type { DraftDto } from '@/shared/api-types';
import { version1 } from '../entry/fixtures';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { DeskScreen } from './DeskScreen';
import { EntryEditor } from './EntryEditor';

jest.mock('expo-router', () => ({ ...jest.requireActual('../testing/expoRouter'), router: { push: jest.fn(), replace: jest.fn() } }));

const editor = (role: 'editor' | 'contributor'): SessionResponse => ({
  user: { id: 3, email: 'imre.castellanos@example.org', displayName: 'Imre Castellanos', role, verified: true, createdAt: '2026-01-05T09:00:00.000Z' },
  csrfToken: 'token-for-tests',
});

const draft: DraftDto = {
  id: 5,
  slug: 'light-in-a-box',
  state: 'draft',
  lockVersion: 2,
  content: version1,
  author: { id: 3, displayName: 'Imre Castellanos' },
  reviewer: null,
  updatedAt: '2026-03-01T10:00:00.000Z',
  basedOn: null,
  reviewNote: null,
  entryStatus: 'draft',
};

const taxonomy = { laws: [], classes: [] };
const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });

// The editor renders every section: slow on a busy machine, so generous limits (no timing is tested).
jest.setTimeout(60_000);

beforeEach(() => setWindowWidth(390));

describe('EntryEditor', () => {
  it('counts the words of the in-brief as they are typed, and says when there are too many', () => {
    mockFetch({ '/api/session': () => jsonResponse(200, editor('editor')), '/api/taxonomy': () => jsonResponse(200, taxonomy) });
    renderWithProviders(<EntryEditor draft={draft} />);
    // "Light bouncing … stays inside." is 17 words counted by hand (the TeX "$p = E/c$" as 3).
    expect(screen.getByTestId('in-brief-count').textContent).toBe('17 of 120 words');
    type('editor-field-inBrief', Array.from({ length: 121 }, (_, i) => `word${i}`).join(' '));
    expect(screen.getByTestId('in-brief-count').textContent).toBe('121 of 120 words');
    // The problem shows once the field is left, in our words.
    expect(screen.queryByTestId('editor-error-inBrief')).toBeNull();
    fireEvent.blur(screen.getByTestId('editor-field-inBrief'));
    expect(screen.getByTestId('editor-error-inBrief').textContent).toBe('121 words: keep the brief to 120 words at most.');
  });

  it('previews the Markdown with the same pipeline readers get', async () => {
    mockFetch({ '/api/session': () => jsonResponse(200, editor('editor')), '/api/taxonomy': () => jsonResponse(200, taxonomy) });
    renderWithProviders(<EntryEditor draft={draft} />);
    type('editor-field-whyItFails', 'Momentum $p = mv$ is kept. <script>window.__pwned = 1</script>');
    // On a phone the preview is one tap away, in place of the fields.
    expect(screen.queryByTestId('editor-preview')).toBeNull();
    fireEvent.click(screen.getByTestId('editor-mode-preview'));
    expect(screen.getByTestId('editor-mode-preview').getAttribute('aria-selected')).toBe('true');
    expect(screen.queryByTestId('editor-field-whyItFails')).toBeNull();
    const preview = screen.getByTestId('editor-preview');
    await waitFor(() => expect(within(preview).getByTestId('entry-section-whyItFails').querySelector('.katex annotation')!.textContent).toBe('p = mv'));
    expect(preview.querySelector('script')).toBeNull();
  });

  it('puts the preview beside the fields on a wide screen', async () => {
    setWindowWidth(1366);
    mockFetch({ '/api/session': () => jsonResponse(200, editor('editor')), '/api/taxonomy': () => jsonResponse(200, taxonomy) });
    renderWithProviders(<EntryEditor draft={draft} />);
    const columns = screen.getByTestId('editor-columns');
    expect(within(columns).getByTestId('editor-field-title')).toBeTruthy();
    expect(within(columns).getByTestId('editor-preview')).toBeTruthy();
    expect(screen.queryByTestId('editor-mode')).toBeNull();
  });

  it('blocks "Send for review" while KaTeX cannot read a formula, naming the field and the line', async () => {
    mockFetch({ '/api/session': () => jsonResponse(200, editor('editor')), '/api/taxonomy': () => jsonResponse(200, taxonomy), '/api/drafts/5': (init) => jsonResponse(200, { draft: { ...draft, content: JSON.parse(String(init?.body)).content, lockVersion: 3 } }) });
    renderWithProviders(<EntryEditor draft={draft} />);
    expect(screen.queryByTestId('submit-blocked')).toBeNull();
    type('editor-field-whyItFails', 'Momentum is kept.\nSo $F = \\fra{P}{c}$ is the bound.');
    // KaTeX's own words for "\fra" (from katex.renderToString with throwOnError): an undefined control sequence.
    const blocked = await screen.findByTestId('submit-blocked', {}, { timeout: 3000 });
    expect(screen.getByTestId('submit-blocked-whyItFails').textContent).toBe('Why it fails, line 2: KaTeX says Undefined control sequence: \\fra.');
    expect(blocked.getAttribute('role')).toBe('alert');
    expect(screen.getByTestId('submit-review').getAttribute('aria-disabled')).toBe('true');
    expect(screen.getByTestId('submit-why').textContent).toContain('held until KaTeX can read every formula');
    type('editor-field-whyItFails', 'Momentum is kept.\nSo $F = \\frac{P}{c}$ is the bound.');
    await waitFor(() => expect(screen.queryByTestId('submit-blocked')).toBeNull(), { timeout: 3000 });
  });

  it('saves as the editor types, with the lock version it started from', async () => {
    const bodies: unknown[] = [];
    mockFetch({
      '/api/session': () => jsonResponse(200, editor('editor')),
      '/api/taxonomy': () => jsonResponse(200, taxonomy),
      '/api/drafts/5': (init) => {
        const body = JSON.parse(String(init?.body));
        bodies.push({ method: init?.method, ...body });
        return jsonResponse(200, { draft: { ...draft, content: body.content, lockVersion: body.lockVersion + 1 } });
      },
    });
    renderWithProviders(<EntryEditor draft={draft} />);
    type('editor-field-title', 'Thrust from light held in a box');
    await waitFor(() => expect(screen.getByTestId('save-status').textContent).toMatch(/^Saved /), { timeout: 3000 });
    expect(bodies).toEqual([expect.objectContaining({ method: 'PUT', lockVersion: 2, content: expect.objectContaining({ title: 'Thrust from light held in a box' }) })]);
  });

  it('edits the worksheets as a form and saves them in the shape the entry keeps', async () => {
    const bodies: { content: DraftDto['content'] }[] = [];
    mockFetch({
      '/api/session': () => jsonResponse(200, editor('editor')),
      '/api/taxonomy': () => jsonResponse(200, taxonomy),
      '/api/drafts/5': (init) => {
        const body = JSON.parse(String(init?.body));
        bodies.push(body);
        return jsonResponse(200, { draft: { ...draft, content: body.content, lockVersion: body.lockVersion + 1 } });
      },
    });
    renderWithProviders(<EntryEditor draft={draft} />);
    const form = screen.getByTestId('worksheet-editor');
    expect((within(form).getByTestId('editor-field-ws-0-step-0-expression') as HTMLInputElement).value).toBe('P / c');

    // A bad name is marked beside its field, and nothing is saved until it is fixed.
    type('editor-field-ws-0-name', 'Cavity Bound');
    expect(screen.getByTestId('editor-error-ws-0-name').textContent).toBe('Lower-case words joined by hyphens.');
    expect(screen.getByTestId('editor-error-worksheets').textContent).toBe('Not saved until this is fixed: Run the numbers, number 1, name: lower-case words joined by hyphens.');
    type('editor-field-ws-0-name', 'cavity-bound');
    expect(screen.queryByTestId('editor-error-worksheets')).toBeNull();

    type('editor-field-ws-0-step-0-expression', '2 * P / c');
    await waitFor(() => expect(screen.getByTestId('save-status').textContent).toMatch(/^Saved /), { timeout: 3000 });
    expect(bodies.at(-1)!.content.worksheets).toEqual([{ ...version1.worksheets[0], steps: [{ ...version1.worksheets[0].steps[0], expression: '2 * P / c' }] }]);
  });

  it('stops on a 409 edit_conflict and shows the other version with a choice, never overwriting it', async () => {
    const theirs: DraftDto = { ...draft, lockVersion: 3, content: { ...version1, title: 'Light in a sealed box' }, updatedAt: '2026-03-01T10:05:00.000Z' };
    const sent: unknown[] = [];
    mockFetch({
      '/api/session': () => jsonResponse(200, editor('editor')),
      '/api/taxonomy': () => jsonResponse(200, taxonomy),
      '/api/drafts/5': (init) => {
        const body = JSON.parse(String(init?.body));
        sent.push(body.lockVersion);
        if (body.lockVersion !== 3) {
          return jsonResponse(409, { draft: theirs, error: { code: 'edit_conflict', message: 'The draft was saved elsewhere.' } });
        }
        return jsonResponse(200, { draft: { ...theirs, content: body.content, lockVersion: 4 } });
      },
    });
    renderWithProviders(<EntryEditor draft={draft} />);
    type('editor-field-title', 'Thrust from light held in a box');

    const notice = await screen.findByTestId('edit-conflict', {}, { timeout: 3000 });
    expect(notice.getAttribute('role')).toBe('alert');
    expect(notice.textContent).toContain('saved somewhere else');
    // Their title "Light in a sealed box" against ours: the words only they have are struck through.
    const title = within(notice).getByTestId('diff-section-Title');
    expect(within(title).getAllByTestId('diff-removed').map((el) => el.textContent!.trim())).toContain('sealed');
    expect(sent).toEqual([2]);

    // Typing more does not save over the other version while the choice is open: on jest's fake clock,
    // well past the autosave's delay (800 ms), nothing is sent.
    jest.useFakeTimers();
    try {
      type('editor-field-howItIsPitched', 'A sealed copper cavity.');
      await act(async () => {
        jest.advanceTimersByTime(2000);
      });
      expect(sent).toEqual([2]);
    } finally {
      jest.useRealTimers();
    }

    fireEvent.click(within(notice).getByTestId('conflict-keep-mine'));
    await waitFor(() => expect(screen.getByTestId('save-status').textContent).toMatch(/^Saved /));
    expect(sent).toEqual([2, 3]);
    expect(screen.queryByTestId('edit-conflict')).toBeNull();
  });

  it('takes the other version when the editor chooses it', async () => {
    const theirs: DraftDto = { ...draft, lockVersion: 3, content: { ...version1, title: 'Light in a sealed box' } };
    mockFetch({
      '/api/session': () => jsonResponse(200, editor('editor')),
      '/api/taxonomy': () => jsonResponse(200, taxonomy),
      '/api/drafts/5': () => jsonResponse(409, { draft: theirs, error: { code: 'edit_conflict', message: 'Saved elsewhere.' } }),
    });
    renderWithProviders(<EntryEditor draft={draft} />);
    type('editor-field-title', 'Thrust from light held in a box');
    fireEvent.click(within(await screen.findByTestId('edit-conflict', {}, { timeout: 3000 })).getByTestId('conflict-take-theirs'));
    expect((screen.getByTestId('editor-field-title') as HTMLInputElement).value).toBe('Light in a sealed box');
    expect(screen.queryByTestId('edit-conflict')).toBeNull();
  });
});

describe('DeskScreen', () => {
  it('lists my drafts and those waiting for my review', async () => {
    mockFetch({
      '/api/session': () => jsonResponse(200, editor('editor')),
      '/api/desk': () =>
        jsonResponse(200, {
          mine: [{ id: 5, slug: 'light-in-a-box', title: 'Thrust from light kept in a box', state: 'draft', updatedAt: draft.updatedAt, author: { displayName: 'Imre Castellanos' }, lockVersion: 2 }],
          toReview: [],
          recent: [],
        }),
    });
    renderWithProviders(<DeskScreen />);
    const mine = await screen.findByTestId('desk-mine');
    expect(within(mine).getByTestId('draft-link-5').getAttribute('href')).toBe('/desk/drafts/5');
    expect(within(mine).getByTestId('draft-5').textContent).toContain('Being written');
    expect(screen.getByTestId('desk-review-empty').textContent).toContain('No other editor');
    expect(screen.getByTestId('new-entry')).toBeTruthy();
  });

  it('keeps the Desk from a contributor, saying who it is for', async () => {
    mockFetch({ '/api/session': () => jsonResponse(200, editor('contributor')) });
    renderWithProviders(<DeskScreen />);
    expect((await screen.findByTestId('role-required')).textContent).toContain('Editors and admins only');
    expect(screen.queryByTestId('new-entry')).toBeNull();
  });
});
