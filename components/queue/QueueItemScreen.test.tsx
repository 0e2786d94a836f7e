import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { SubmissionDto } from '@/shared/submissions/types';
import { contributor, correction, moderator, session, sighting, submissionResponse } from '../submissions/fixtures';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { QueueItemScreen } from './QueueItemScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

beforeEach(() => setWindowWidth(390));

const me = { id: moderator.id, displayName: moderator.displayName };
const other = { id: 11, displayName: 'Oona Lindqvist' };
const taxonomy = {
  laws: [],
  classes: [{ slug: 'reactionless-drives', name: 'Reactionless drives', parentSlug: null, summary: '', position: 0 }],
};
const searchResult = (slug: string, title: string) => ({ slug, title, version: 1, score: 1, terms: [], excerpt: title, laws: [], mechanismClass: 'x', inBrief: '' });

/** The item and its routes: claim, release and decide change `current` the way the server would. */
function serve(start: SubmissionDto, extra: Record<string, (init?: RequestInit) => Response> = {}) {
  let current = start;
  const decided: unknown[] = [];
  const fetchMock = mockFetch({
    ...session(moderator),
    [`/api/submissions/${start.id}`]: () => jsonResponse(200, submissionResponse(current)),
    [`/api/submissions/${start.id}/claim`]: () => {
      current = { ...current, status: 'claimed', claimedBy: me, updatedAt: '2026-03-01T11:00:00.000Z' };
      return jsonResponse(200, submissionResponse(current));
    },
    [`/api/submissions/${start.id}/release`]: () => {
      current = { ...current, status: 'open', claimedBy: null, updatedAt: '2026-03-01T12:00:00.000Z' };
      return jsonResponse(200, submissionResponse(current));
    },
    [`/api/submissions/${start.id}/decide`]: (init) => {
      const body = JSON.parse(String(init?.body));
      decided.push(body);
      const status = { accept: 'accepted', draft: 'drafted', ask: 'waiting', reject: 'rejected' }[body.decision as string] as SubmissionDto['status'];
      current = {
        ...current,
        status,
        claimedBy: null,
        decision: body.decision,
        decisionNote: body.note ?? null,
        decidedBy: me,
        decidedAt: '2026-03-01T13:00:00.000Z',
        linkedEntries: (body.entries ?? []).map((slug: string) => ({ slug, title: `Entry ${slug}` })),
      };
      return jsonResponse(200, submissionResponse(current));
    },
    '/api/taxonomy': () => jsonResponse(200, taxonomy),
    '/api/search?q=cavity&limit=8': () =>
      jsonResponse(200, {
        query: 'cavity',
        total: 2,
        results: [searchResult('resonant-cavity-thruster', 'Resonant-cavity thrusters'), searchResult('light-in-a-box', 'Thrust from light kept in a box')],
        facets: { laws: {}, mechanisms: {} },
      }),
    ...extra,
  });
  return { decided, fetchMock };
}

describe('QueueItemScreen', () => {
  it('claims a sighting and accepts it onto entries found by searching the library', async () => {
    const { decided } = serve(sighting());
    renderWithProviders(<QueueItemScreen id={41} />);
    expect((await screen.findByTestId('item-status')).textContent).toBe('Not picked up yet');
    expect(screen.queryByTestId('item-decide-accept')).toBeNull();
    expect(screen.getByTestId('attachment-5').getAttribute('href')).toBe('/api/attachments/5');
    fireEvent.click(screen.getByTestId('item-claim'));
    await waitFor(() => expect(screen.getByTestId('item-status').textContent).toBe('In hand'));
    expect(screen.getByTestId('item-holder').textContent).toContain('It is in your hands');
    expect(screen.getByTestId('item-release')).toBeTruthy();

    fireEvent.click(screen.getByTestId('item-decide-accept'));
    fireEvent.click(screen.getByTestId('item-confirm'));
    expect(screen.getByTestId('item-entries-needed')).toBeTruthy();
    fireEvent.change(screen.getByTestId('item-entries-search'), { target: { value: 'cavity' } });
    fireEvent.click(await screen.findByTestId('item-entry-resonant-cavity-thruster'));
    expect(screen.getByTestId('item-entry-resonant-cavity-thruster').getAttribute('aria-checked')).toBe('true');
    expect(screen.getByTestId('item-entries-chosen').textContent).toContain('Resonant-cavity thrusters');
    fireEvent.click(screen.getByTestId('item-confirm'));
    await waitFor(() => expect(screen.getByTestId('item-status').textContent).toBe('Accepted'));
    expect(decided).toEqual([{ decision: 'accept', entries: ['resonant-cavity-thruster'] }]);
    expect(screen.getByTestId('submission-linked-resonant-cavity-thruster').getAttribute('href')).toBe('/entries/resonant-cavity-thruster');
    expect(screen.queryByTestId('item-claim')).toBeNull();
  });

  it('says in words that another moderator holds it when the claim loses the race', async () => {
    let claimedByOther = false;
    serve(sighting(), {
      '/api/submissions/41': () =>
        jsonResponse(200, submissionResponse(claimedByOther ? sighting({ status: 'claimed', claimedBy: other }) : sighting())),
      '/api/submissions/41/claim': () => {
        claimedByOther = true;
        return jsonResponse(409, { error: { code: 'claimed_by_other', message: 'Oona Lindqvist holds this submission.' } });
      },
    });
    renderWithProviders(<QueueItemScreen id={41} />);
    fireEvent.click(await screen.findByTestId('item-claim'));
    expect((await screen.findByTestId('item-action-error')).textContent).toContain('Another moderator has picked this item up');
    await waitFor(() => expect(screen.getByTestId('item-holder').textContent).toContain('Oona Lindqvist has it in hand'));
    expect(screen.queryByTestId('item-claim')).toBeNull();
    expect(screen.queryByTestId('item-release')).toBeNull();
    expect(screen.queryByTestId('item-decide-accept')).toBeNull();
  });

  it('shows a moderator that they cannot decide their own submission', async () => {
    serve(sighting({ submitter: me }));
    renderWithProviders(<QueueItemScreen id={41} />);
    expect((await screen.findByTestId('item-own')).textContent).toContain('never decides their own');
    expect(screen.queryByTestId('item-claim')).toBeNull();
  });

  it('asks the submitter for more, with the question required', async () => {
    const { decided } = serve(sighting({ status: 'claimed', claimedBy: me }));
    renderWithProviders(<QueueItemScreen id={41} />);
    fireEvent.click(await screen.findByTestId('item-decide-ask'));
    fireEvent.click(screen.getByTestId('item-confirm'));
    expect(screen.getByTestId('item-note-error').textContent).toBe('Write the question first.');
    fireEvent.change(screen.getByTestId('item-note'), { target: { value: 'Is there a recording of the balance?' } });
    fireEvent.click(screen.getByTestId('item-confirm'));
    await waitFor(() => expect(screen.getByTestId('item-status').textContent).toBe('Waiting for the submitter'));
    expect(decided).toEqual([{ decision: 'ask', note: 'Is there a recording of the balance?' }]);
    expect(screen.getByTestId('item-question').textContent).toContain('recording of the balance');
    expect(screen.getByTestId('item-claim')).toBeTruthy();
  });

  it('turns a sighting into a draft for an editor chosen from the list', async () => {
    const { decided } = serve(sighting({ status: 'claimed', claimedBy: me }), {
      '/api/queue/editors': () => jsonResponse(200, { editors: [{ id: 21, displayName: 'Imre Castellanos' }] }),
    });
    renderWithProviders(<QueueItemScreen id={41} />);
    fireEvent.click(await screen.findByTestId('item-decide-draft'));
    fireEvent.change(screen.getByTestId('item-draft-slug'), { target: { value: 'Cavity Drive' } });
    fireEvent.click(screen.getByTestId('item-confirm'));
    expect(screen.getByTestId('item-draft-slug-error')).toBeTruthy();
    fireEvent.change(screen.getByTestId('item-draft-slug'), { target: { value: 'sealed-cavity-drive' } });
    fireEvent.click(await screen.findByTestId('item-draft-class-reactionless-drives'));
    fireEvent.click(await screen.findByTestId('item-draft-editor-21'));
    fireEvent.click(screen.getByTestId('item-confirm'));
    await waitFor(() => expect(decided).toEqual([{ decision: 'draft', slug: 'sealed-cavity-drive', mechanismClass: 'reactionless-drives', editorId: 21 }]));
  });

  it('forwards an accepted correction without asking for entries, and offers no draft', async () => {
    const { decided } = serve(correction({ status: 'claimed', claimedBy: me }));
    renderWithProviders(<QueueItemScreen id={42} />);
    expect((await screen.findByTestId('submission-wrong')).textContent).toContain('P/2c');
    expect(screen.queryByTestId('item-decide-draft')).toBeNull();
    fireEvent.click(screen.getByTestId('item-decide-accept'));
    fireEvent.click(screen.getByTestId('item-confirm'));
    await waitFor(() => expect(decided).toEqual([{ decision: 'accept' }]));
  });

  it('keeps readers and contributors out', async () => {
    mockFetch(session(contributor));
    renderWithProviders(<QueueItemScreen id={41} />);
    expect(await screen.findByTestId('role-required')).toBeTruthy();
  });
});
