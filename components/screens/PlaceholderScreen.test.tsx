import { render, screen, within } from '@testing-library/react';
import type { SessionResponse, UserDto } from '@/shared/api-types';
import { setPathname } from '../testing/expoRouter';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { NotFoundScreen } from './NotFoundScreen';
import { PlaceholderScreen } from './PlaceholderScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

const user = (role: UserDto['role']): UserDto => ({
  id: 7,
  email: 'bruno.salazar@example.org',
  displayName: 'Bruno Salazar',
  role,
  verified: true,
  createdAt: '2026-01-05T09:00:00.000Z',
});

function sessionOf(role: UserDto['role'] | null) {
  const session: SessionResponse = { user: role ? user(role) : null, csrfToken: 'token-for-tests' };
  mockFetch({ '/api/session': () => jsonResponse(200, session) });
}

describe('PlaceholderScreen', () => {
  it.each([
    ['check', 'Claim check', 'referee paragraph', null],
    ['queue', 'Queue', 'oldest first', 'moderator'],
  ] as const)('%s has its heading and says what will come there', async (section, title, words, role) => {
    sessionOf(role);
    renderWithProviders(<PlaceholderScreen section={section} />);
    const root = screen.getByTestId(`screen-${section}`);
    expect(within(root).getByRole('heading', { level: 1 }).textContent).toBe(title);
    expect(root.textContent).toContain(words);
    expect((await screen.findByTestId(`${section}-status`)).textContent).toContain('Not open yet');
  });

  it.each([['queue', 'editor', 'Moderators and admins only']] as const)('keeps %s from a %s, saying who it is for', async (section, role, words) => {
    sessionOf(role);
    renderWithProviders(<PlaceholderScreen section={section} />);
    const refusal = await screen.findByTestId('role-required');
    expect(refusal.textContent).toContain(words);
    expect(refusal.textContent).toContain(`whose role is ${role}`);
    expect(screen.queryByTestId(`${section}-status`)).toBeNull();
  });

  it('offers a reader the way to sign in and come back', async () => {
    setPathname('/queue');
    sessionOf(null);
    renderWithProviders(<PlaceholderScreen section="queue" />);
    await screen.findByTestId('role-required');
    expect(screen.getByTestId('role-sign-in').getAttribute('href')).toBe('/sign-in?next=%2Fqueue');
  });

  it('opens the Queue to an admin', async () => {
    sessionOf('admin');
    renderWithProviders(<PlaceholderScreen section="queue" />);
    expect(await screen.findByTestId('queue-status')).toBeTruthy();
  });
});

describe('NotFoundScreen', () => {
  it('names the missing address and links back to the Library', () => {
    setPathname('/no/such/page');
    render(<NotFoundScreen />);
    const root = screen.getByTestId('screen-not-found');
    expect(within(root).getByRole('heading', { level: 1 }).textContent).toBe('Page not found');
    expect(root.textContent).toContain('There is no page at /no/such/page.');
    expect(screen.getByTestId('not-found-home').getAttribute('href')).toBe('/');
    expect(screen.getByTestId('not-found-home').textContent).toBe('Back to the Library');
  });
});
