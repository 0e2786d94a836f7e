import { screen, waitFor, within } from '@testing-library/react';
import { Text } from 'react-native';
import type { UserDto } from '@/shared/api-types';
import { Navigation } from './nav/Navigation';
import { Shell } from './Shell';
import { setPathname } from './testing/expoRouter';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from './testing/render';

jest.mock('expo-router', () => require('./testing/expoRouter'));

const page = <Text>page</Text>;

// Invented user (DESIGN.md: example.org addresses); the role varies per test.
const signedIn: UserDto = {
  id: 3,
  email: 'chiara.lindqvist@example.org',
  displayName: 'Chiara Lindqvist',
  role: 'contributor',
  verified: true,
  createdAt: '2026-02-01T08:30:00.000Z',
};

beforeEach(() => {
  setPathname('/');
  mockFetch({ '/api/health': () => jsonResponse(200, { status: 'ok', db: 'up', version: '0.1.0' }) });
});

describe('Shell', () => {
  it('shows a bottom bar on a phone', () => {
    setWindowWidth(390);
    renderWithProviders(<Shell>{page}</Shell>);
    const bar = screen.getByTestId('nav-bar');
    expect(screen.queryByTestId('nav-rail')).toBeNull();
    expect(bar.tagName).toBe('NAV');
    expect(bar.getAttribute('aria-label')).toBe('Sections');
    expect(screen.getByText('page')).toBeTruthy();
  });

  it('shows a left rail with the product name from 960 px', () => {
    setWindowWidth(1280);
    renderWithProviders(<Shell>{page}</Shell>);
    const rail = screen.getByTestId('nav-rail');
    expect(screen.queryByTestId('nav-bar')).toBeNull();
    expect(within(rail).getByText('Counterweight')).toBeTruthy();
  });

  it('switches exactly at 960 px', () => {
    setWindowWidth(959);
    const { unmount } = renderWithProviders(<Shell>{page}</Shell>);
    expect(screen.getByTestId('nav-bar')).toBeTruthy();
    unmount();
    setWindowWidth(960);
    renderWithProviders(<Shell>{page}</Shell>);
    expect(screen.getByTestId('nav-rail')).toBeTruthy();
  });

  it.each([
    ['editor', ['Library', 'Claim check', 'Check kit', 'Desk', 'Account']],
    ['moderator', ['Library', 'Claim check', 'Check kit', 'Queue', 'Account']],
    ['admin', ['Library', 'Claim check', 'Check kit', 'Desk', 'Queue', 'Admin', 'Account']],
  ] as const)('offers the signed-in %s the sections of that role, from the session', async (role, labels) => {
    mockFetch({
      '/api/health': () => jsonResponse(200, { status: 'ok', db: 'up', version: '0.1.0' }),
      '/api/session': () => jsonResponse(200, { user: { ...signedIn, role }, csrfToken: 'token-for-tests' }),
    });
    setWindowWidth(390);
    renderWithProviders(<Shell>{page}</Shell>);
    const bar = screen.getByTestId('nav-bar');
    await waitFor(() => expect(within(bar).getAllByRole('link').map((link) => link.textContent)).toEqual(labels));
  });

  it('offers a reader Library, Claim check, Check kit and Account only', () => {
    setWindowWidth(390);
    renderWithProviders(<Shell>{page}</Shell>);
    const labels = within(screen.getByTestId('nav-bar'))
      .getAllByRole('link')
      .map((link) => link.textContent);
    expect(labels).toEqual(['Library', 'Claim check', 'Check kit', 'Account']);
  });

  it('carries the advice disclaimer and the server version in the footer', async () => {
    setWindowWidth(390);
    renderWithProviders(<Shell>{page}</Shell>);
    const footer = screen.getByTestId('footer');
    expect(footer.textContent).toContain('not legal, financial or investment advice');
    expect(await within(footer).findByText('Counterweight 0.1.0')).toBeTruthy();
    expect(screen.queryByTestId('db-down')).toBeNull();
  });

  it('says so when the database is down', async () => {
    mockFetch({ '/api/health': () => jsonResponse(503, { status: 'degraded', db: 'down', version: '0.1.0' }) });
    setWindowWidth(1280);
    renderWithProviders(<Shell>{page}</Shell>);
    expect((await screen.findByTestId('db-down')).textContent).toContain('The database is not answering.');
  });
});

describe('Navigation', () => {
  it.each([
    ['contributor', []],
    ['editor', ['nav-desk']],
    ['moderator', ['nav-queue']],
    ['admin', ['nav-desk', 'nav-queue', 'nav-admin']],
  ] as const)('offers the %s role its own sections and no others', (role, own) => {
    renderWithProviders(<Navigation variant="rail" role={role} />);
    for (const id of ['nav-desk', 'nav-queue', 'nav-admin']) {
      if ((own as readonly string[]).includes(id)) expect(screen.getByTestId(id)).toBeTruthy();
      else expect(screen.queryByTestId(id)).toBeNull();
    }
    for (const id of ['nav-library', 'nav-check', 'nav-checks', 'nav-account']) expect(screen.getByTestId(id)).toBeTruthy();
  });

  it('hides the role sections from a reader', () => {
    renderWithProviders(<Navigation variant="bar" role="reader" />);
    for (const id of ['nav-desk', 'nav-queue', 'nav-admin']) expect(screen.queryByTestId(id)).toBeNull();
  });

  it('links each item to its section', () => {
    renderWithProviders(<Navigation variant="bar" role="reader" />);
    expect(screen.getByTestId('nav-library').getAttribute('href')).toBe('/');
    expect(screen.getByTestId('nav-check').getAttribute('href')).toBe('/check');
    expect(screen.getByTestId('nav-account').getAttribute('href')).toBe('/account');
  });

  it.each(['bar', 'rail'] as const)('marks the active section as the current page in the %s', (variant) => {
    setPathname('/check');
    renderWithProviders(<Navigation variant={variant} role="reader" />);
    expect(screen.getByTestId('nav-check').getAttribute('aria-current')).toBe('page');
    expect(screen.getByTestId('nav-library').hasAttribute('aria-current')).toBe(false);
    expect(screen.getByTestId('nav-account').hasAttribute('aria-current')).toBe(false);
  });

  it('marks Library only on the home path and a section on its subpaths', () => {
    setPathname('/account/settings');
    renderWithProviders(<Navigation variant="bar" role="reader" />);
    expect(screen.getByTestId('nav-account').getAttribute('aria-current')).toBe('page');
    expect(screen.getByTestId('nav-library').hasAttribute('aria-current')).toBe(false);
  });
});
