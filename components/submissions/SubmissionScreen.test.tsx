import { fireEvent, screen, waitFor } from '@testing-library/react';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { contributor, moderator, session, sighting, submissionResponse } from './fixtures';
import { SubmissionScreen } from './SubmissionScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

beforeEach(() => setWindowWidth(390));

const mod = { id: moderator.id, displayName: moderator.displayName };

describe('SubmissionScreen', () => {
  it('shows what was sent as plain text, the attachments as downloads, and the history', async () => {
    mockFetch({ ...session(contributor), '/api/submissions/41': () => jsonResponse(200, submissionResponse(sighting())) });
    const { container } = renderWithProviders(<SubmissionScreen id={41} />);
    expect((await screen.findByTestId('submission-status')).textContent).toBe('Waiting for a moderator');
    // The submitter's words stay words: the <b> is shown, never made an element.
    expect(screen.getByTestId('submission-summary').textContent).toContain('claims <b>0.2 lbf</b> of thrust');
    expect(container.querySelector('[data-testid="submission-summary"] b')).toBeNull();
    const download = screen.getByTestId('attachment-5');
    expect(download.getAttribute('href')).toBe('/api/attachments/5');
    expect(download.hasAttribute('download')).toBe(true);
    expect(screen.getByTestId('submission-url').getAttribute('href')).toBe('https://news.example.org/cavity-drive');
    expect(screen.getByTestId('submission-figure-0').textContent).toContain('889.6 mN');
    expect(screen.getByTestId('submission-event-0').textContent).toContain('Sent in');
    expect(screen.queryByTestId('submission-answer')).toBeNull();
  });

  it('shows a rejection and its reason', async () => {
    const rejected = sighting({
      status: 'rejected',
      decision: 'reject',
      decisionNote: 'The same release was reported last week (item 12).',
      decidedBy: mod,
      decidedAt: '2026-03-02T10:00:00.000Z',
    });
    mockFetch({ ...session(contributor), '/api/submissions/41': () => jsonResponse(200, submissionResponse(rejected)) });
    renderWithProviders(<SubmissionScreen id={41} />);
    expect((await screen.findByTestId('submission-status')).textContent).toBe('Not taken');
    expect(screen.getByTestId('submission-decision').textContent).toContain(`Not taken by ${moderator.displayName}`);
    expect(screen.getByTestId('submission-decision-note').textContent).toContain('reported last week');
  });

  it('takes the answer to a question, after which it is back in the queue', async () => {
    let current = sighting({ status: 'waiting', decision: 'ask', decisionNote: 'Is there a recording of the balance?', decidedBy: mod });
    let sent: unknown;
    mockFetch({
      ...session(contributor),
      '/api/submissions/41': () => jsonResponse(200, submissionResponse(current)),
      '/api/submissions/41/answer': (init) => {
        sent = JSON.parse(String(init?.body));
        current = sighting({ status: 'open', events: [...current.events, { at: '2026-03-03T10:00:00.000Z', what: 'answered', by: { id: 7, displayName: 'Ines Okonkwo' }, note: 'Yes, at 0:42.' }] });
        return jsonResponse(200, submissionResponse(current));
      },
    });
    renderWithProviders(<SubmissionScreen id={41} />);
    expect((await screen.findByTestId('submission-status')).textContent).toBe('Waiting for your answer');
    expect(screen.getByTestId('submission-decision-note').textContent).toContain('recording of the balance');
    fireEvent.click(screen.getByTestId('submission-answer-send'));
    expect(screen.getByTestId('submission-answer-error').textContent).toBe('Write your answer first.');
    fireEvent.change(screen.getByTestId('submission-answer'), { target: { value: 'Yes, at 0:42.' } });
    fireEvent.click(screen.getByTestId('submission-answer-send'));
    await waitFor(() => expect(screen.getByTestId('submission-status').textContent).toBe('Waiting for a moderator'));
    expect(sent).toEqual({ message: 'Yes, at 0:42.' });
    expect(screen.getByTestId('submission-event-1').textContent).toContain('Yes, at 0:42.');
    expect(screen.queryByTestId('submission-answer')).toBeNull();
  });

  it('says so when the submission is not the viewer’s', async () => {
    mockFetch({
      ...session(contributor),
      '/api/submissions/9': () => jsonResponse(403, { error: { code: 'forbidden', message: 'Not yours.' } }),
    });
    renderWithProviders(<SubmissionScreen id={9} />);
    expect((await screen.findByTestId('submission-not-found')).textContent).toContain('not one of yours');
  });
});
