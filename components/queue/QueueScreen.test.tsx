import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { QueueResponse } from '@/shared/submissions/types';
import { correction, moderator, contributor, session, sighting, summaryOf } from '../submissions/fixtures';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { QueueScreen } from './QueueScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

beforeEach(() => setWindowWidth(390));

const counts = { open: 1, claimed: 1, waiting: 0, sighting: 1, correction: 1 };
const held = correction({ status: 'claimed', claimedBy: { id: moderator.id, displayName: moderator.displayName } });
const all: QueueResponse = { items: [summaryOf(sighting()), summaryOf(held)], total: 2, counts };

describe('QueueScreen', () => {
  it('is for moderators and admins only', async () => {
    mockFetch(session(contributor));
    renderWithProviders(<QueueScreen />);
    expect((await screen.findByTestId('role-required')).textContent).toContain('Moderators and admins only');
  });

  it('lists the open items oldest first with their count, and filters them', async () => {
    const asked: string[] = [];
    mockFetch({
      ...session(moderator),
      '/api/queue': () => (asked.push('all'), jsonResponse(200, all)),
      '/api/queue?kind=correction': () => (asked.push('correction'), jsonResponse(200, { items: [summaryOf(held)], total: 1, counts })),
      '/api/queue?kind=correction&mine=1': () => (asked.push('mine'), jsonResponse(200, { items: [summaryOf(held)], total: 1, counts })),
    });
    renderWithProviders(<QueueScreen />);
    expect((await screen.findByTestId('queue-count')).textContent).toBe('2 items waiting');
    const rows = screen.getAllByRole('listitem').map((li) => li.getAttribute('data-testid'));
    expect(rows).toEqual(['queue-item-41', 'queue-item-42']);
    const first = screen.getByTestId('queue-item-41').textContent!;
    expect(first).toContain('SIGHTING');
    expect(first).toContain('by Ines Okonkwo');
    expect(first).toContain('1 attachment');
    expect(screen.getByTestId('queue-item-41-link').getAttribute('href')).toBe('/queue/41');
    expect(screen.getByTestId('queue-item-42-holder').textContent).toBe('In your hands');
    expect(screen.getByTestId('queue-filter-sighting').textContent).toBe('Sightings (1)');

    fireEvent.click(screen.getByTestId('queue-filter-correction'));
    await waitFor(() => expect(screen.getByTestId('queue-count').textContent).toBe('1 item match'));
    fireEvent.click(screen.getByTestId('queue-filter-mine'));
    await waitFor(() => expect(asked).toContain('mine'));
    expect(screen.getByTestId('queue-filter-mine').getAttribute('aria-checked')).toBe('true');
    expect(screen.queryByTestId('queue-item-41')).toBeNull();
  });

  it('says what to do when nothing waits', async () => {
    mockFetch({ ...session(moderator), '/api/queue': () => jsonResponse(200, { items: [], total: 0, counts: { open: 0, claimed: 0, waiting: 0, sighting: 0, correction: 0 } }) });
    renderWithProviders(<QueueScreen />);
    expect((await screen.findByTestId('queue-empty')).textContent).toContain('The queue is empty.');
  });
});
