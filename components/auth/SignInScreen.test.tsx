import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { UserDto } from '@/shared/api-types';
import { forgetCsrfToken } from '../http/client';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { afterSignIn, SignInScreen } from './SignInScreen';

const mockReplace = jest.fn();
jest.mock('expo-router', () => ({
  ...jest.requireActual('../testing/expoRouter'),
  router: { replace: (href: string) => mockReplace(href) },
}));

const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });

// Invented person (DESIGN.md §7).
const esther: UserDto = {
  id: 5,
  email: 'esther.mbeki@example.org',
  displayName: 'Esther Mbeki',
  role: 'contributor',
  verified: true,
  createdAt: '2026-01-10T12:00:00.000Z',
};

const headersOf = (init?: RequestInit) => (init?.headers ?? {}) as Record<string, string>;

beforeEach(() => {
  forgetCsrfToken();
  mockReplace.mockClear();
});

describe('SignInScreen', () => {
  it('sends the CSRF token from the session, then goes back where the reader came from', async () => {
    let signedIn = false;
    const fetchMock = mockFetch({
      '/api/session': () => jsonResponse(200, { user: signedIn ? esther : null, csrfToken: 'csrf-7f3a' }),
      '/api/auth/sign-in': (init) => {
        if (headersOf(init)['X-CSRF-Token'] !== 'csrf-7f3a') {
          return jsonResponse(403, { error: { code: 'csrf_failed', message: 'No token.' } });
        }
        signedIn = true;
        return jsonResponse(200, { user: esther });
      },
    });
    renderWithProviders(<SignInScreen next="/admin/audit" />);
    type('field-email', ' Esther.Mbeki@example.org ');
    type('field-password', 'counterweight-demo-2026');
    fireEvent.click(screen.getByTestId('submit'));

    await waitFor(() => expect(mockReplace).toHaveBeenCalledWith('/admin/audit'));
    const signIn = fetchMock.mock.calls.filter(([path]) => path === '/api/auth/sign-in');
    expect(signIn).toHaveLength(1);
    const [, init] = signIn[0];
    expect(headersOf(init)['X-CSRF-Token']).toBe('csrf-7f3a');
    expect(init).toMatchObject({ method: 'POST', credentials: 'same-origin' });
    expect(JSON.parse(String(init?.body))).toEqual({ email: 'esther.mbeki@example.org', password: 'counterweight-demo-2026' });
    // The session is read first (for the token) and again once signed in.
    expect(fetchMock.mock.calls.map(([path]) => path).filter((path) => path === '/api/session').length).toBeGreaterThanOrEqual(2);
  });

  it('shows a wrong e-mail or password as the form error, not at a field', async () => {
    mockFetch({
      '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'csrf-1' }),
      '/api/auth/sign-in': () =>
        jsonResponse(401, { error: { code: 'bad_credentials', message: 'The e-mail address or the password is wrong.' } }),
    });
    renderWithProviders(<SignInScreen />);
    type('field-email', 'esther.mbeki@example.org');
    type('field-password', 'not-the-password');
    fireEvent.click(screen.getByTestId('submit'));

    const notice = await screen.findByTestId('form-error');
    expect(notice.textContent).toContain('The e-mail address or the password is wrong.');
    expect(screen.queryByTestId('error-email')).toBeNull();
    expect(screen.queryByTestId('error-password')).toBeNull();
    expect(screen.getByTestId('submit').getAttribute('aria-disabled')).toBeNull();
    expect(mockReplace).not.toHaveBeenCalled();
  });

  it('checks the fields with the shared schema before sending', async () => {
    const fetchMock = mockFetch({ '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'csrf-0' }) });
    renderWithProviders(<SignInScreen />);
    fireEvent.click(screen.getByTestId('submit'));
    expect((await screen.findByTestId('error-password')).textContent).toBe('a password is needed');
    expect(screen.getByTestId('error-email')).toBeTruthy();
    expect(fetchMock.mock.calls.map(([path]) => path)).not.toContain('/api/auth/sign-in');
  });

  it('offers to send the link again when the address is not verified yet', async () => {
    const fetchMock = mockFetch({
      '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'csrf-2' }),
      '/api/auth/sign-in': () =>
        jsonResponse(403, { error: { code: 'email_unverified', message: 'Confirm your e-mail address first.' } }),
      '/api/auth/resend-verification': () => jsonResponse(202, {}),
    });
    renderWithProviders(<SignInScreen email="esther.mbeki@example.org" />);
    expect((screen.getByTestId('field-email') as HTMLInputElement).value).toBe('esther.mbeki@example.org');
    type('field-password', 'counterweight-demo-2026');
    fireEvent.click(screen.getByTestId('submit'));

    expect((await screen.findByTestId('form-error')).textContent).toContain('Confirm your e-mail address first.');
    fireEvent.click(screen.getByTestId('resend'));
    await screen.findByTestId('resend-status');
    const [, init] = fetchMock.mock.calls.find(([path]) => path === '/api/auth/resend-verification')!;
    expect(JSON.parse(String(init?.body))).toEqual({ email: 'esther.mbeki@example.org' });
  });

  it('links to sign-up and to a forgotten password', () => {
    mockFetch({ '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'csrf-3' }) });
    renderWithProviders(<SignInScreen />);
    expect(screen.getByTestId('link-sign-up').getAttribute('href')).toBe('/sign-up');
    expect(screen.getByTestId('link-forgot').getAttribute('href')).toBe('/forgot');
  });
});

describe('afterSignIn', () => {
  it('returns to a page of the app, and never to another site', () => {
    expect(afterSignIn(undefined)).toBe('/account');
    expect(afterSignIn('/desk')).toBe('/desk');
    expect(afterSignIn('//elsewhere.example.org/')).toBe('/account');
    expect(afterSignIn('https://elsewhere.example.org/')).toBe('/account');
    expect(afterSignIn('/sign-in?next=/desk')).toBe('/account');
    // The query and hash of a page of the app are kept (the claim check comes back to the kept check).
    expect(afterSignIn('/check?resume=1')).toBe('/check?resume=1');
    expect(afterSignIn('/entries/a-slug/v/2#sources')).toBe('/entries/a-slug/v/2#sources');
    // Read as a browser reads it: a backslash is a slash, tabs and line breaks are dropped.
    expect(afterSignIn('/\\elsewhere.example.org/')).toBe('/account');
    expect(afterSignIn('/\t/elsewhere.example.org/')).toBe('/account');
    expect(afterSignIn('/\n/elsewhere.example.org/')).toBe('/account');
    expect(afterSignIn('javascript:alert(1)')).toBe('/account');
  });

  it('says it will return to the page the reader came from', () => {
    mockFetch({ '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'csrf-1' }) });
    renderWithProviders(<SignInScreen next="/check?resume=1" />);
    expect(screen.getByTestId('sign-in-returns').textContent).toContain('you go back to the page you came from');
  });

  it('says nothing of returning when it would go to the account', () => {
    mockFetch({ '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'csrf-1' }) });
    renderWithProviders(<SignInScreen next="//elsewhere.example.org/" />);
    expect(screen.queryByTestId('sign-in-returns')).toBeNull();
  });
});
