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

  /** The labels of the destinations in the bar itself (not those in the "More" list). */
  const barLabels = (bar: HTMLElement) =>
    Array.from(bar.children)
      .filter((el) => el.getAttribute('data-testid') !== 'nav-more-list')
      .map((el) => el.textContent);

  it.each([
    ['editor', ['Library', 'Claims', 'Kit', 'Desk', 'Account'], []],
    ['moderator', ['Library', 'Claims', 'Kit', 'Queue', 'Account'], []],
    ['admin', ['Library', 'Claims', 'Kit', 'Desk', 'More'], ['Queue', 'Admin', 'Account']],
  ] as const)('offers the signed-in %s the sections of that role, from the session, five at most in the bar', async (role, labels, more) => {
    mockFetch({
      '/api/health': () => jsonResponse(200, { status: 'ok', db: 'up', version: '0.1.0' }),
      '/api/session': () => jsonResponse(200, { user: { ...signedIn, role }, csrfToken: 'token-for-tests' }),
    });
    setWindowWidth(390);
    renderWithProviders(<Shell>{page}</Shell>);
    const bar = screen.getByTestId('nav-bar');
    await waitFor(() => expect(barLabels(bar)).toEqual(labels));
    const list = screen.queryByTestId('nav-more-list');
    expect(list ? within(list).getAllByRole('link', { hidden: true }).map((link) => link.textContent) : []).toEqual(more);
  });

  it('offers a reader Library, Claim check, Check kit and Account only', () => {
    setWindowWidth(390);
    renderWithProviders(<Shell>{page}</Shell>);
    expect(barLabels(screen.getByTestId('nav-bar'))).toEqual(['Library', 'Claims', 'Kit', 'Account']);
    expect(screen.queryByTestId('nav-more')).toBeNull();
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
