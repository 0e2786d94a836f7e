import { fireEvent, screen, waitFor } from '@testing-library/react';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { ForgotScreen } from './ForgotScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });
const session = () => jsonResponse(200, { user: null, csrfToken: 'csrf-forgot' });
const forgotCalls = (fetchMock: jest.Mock) => fetchMock.mock.calls.filter(([path]) => path === '/api/auth/forgot');

// Invented address (DESIGN.md §7).
const address = 'odile.fairweather@example.org';

describe('ForgotScreen', () => {
  it('sends the address, trimmed and in lower case, and says the same whether or not it has an account', async () => {
    // The server answers 202 with an empty body for any well-formed address (server/routes: POST /api/auth/forgot).
    const fetchMock = mockFetch({ '/api/session': session, '/api/auth/forgot': () => jsonResponse(202, {}) });
    renderWithProviders(<ForgotScreen />);
    expect(screen.queryByTestId('forgot-done')).toBeNull();
    type('field-email', '  Odile.Fairweather@Example.org ');
    fireEvent.click(screen.getByTestId('submit'));

    const done = await screen.findByTestId('forgot-done');
    expect(done.textContent).toContain('Look in your inbox.');
    expect(done.textContent).toContain('If an account uses Odile.Fairweather@Example.org');
    const calls = forgotCalls(fetchMock);
    expect(calls).toHaveLength(1);
    expect(JSON.parse(String(calls[0][1]?.body))).toEqual({ email: address });
    // The CSRF token comes from the session, as on every write.
    expect((calls[0][1]?.headers as Record<string, string>)['X-CSRF-Token']).toBe('csrf-forgot');
    // The button now offers to send it again, and does.
    expect(screen.getByTestId('submit').textContent).toContain('Send it again');
    fireEvent.click(screen.getByTestId('submit'));
    await waitFor(() => expect(forgotCalls(fetchMock)).toHaveLength(2));
  });

  it('names a malformed address beside its field and sends nothing', async () => {
    const fetchMock = mockFetch({ '/api/session': session, '/api/auth/forgot': () => jsonResponse(202, {}) });
    renderWithProviders(<ForgotScreen />);
    type('field-email', 'odile.fairweather');
    fireEvent.click(screen.getByTestId('submit'));
    // The message of emailSchema in shared/schemas/auth.ts.
    expect((await screen.findByTestId('error-email')).textContent).toContain('an e-mail address such as name@example.org');
    expect(forgotCalls(fetchMock)).toHaveLength(0);
    expect(screen.queryByTestId('forgot-done')).toBeNull();
  });

  it('shows the server’s refusal in its own words (too many requests), not the success notice', async () => {
    mockFetch({
      '/api/session': session,
      '/api/auth/forgot': () => jsonResponse(429, { error: { code: 'rate_limited', message: 'Too many requests for a new password. Try again in an hour.' } }),
    });
    renderWithProviders(<ForgotScreen />);
    type('field-email', address);
    fireEvent.click(screen.getByTestId('submit'));
    expect((await screen.findByTestId('form-error')).textContent).toContain('Too many requests for a new password. Try again in an hour.');
    expect(screen.queryByTestId('forgot-done')).toBeNull();
  });

  it('offers the way back to sign-in', () => {
    mockFetch({ '/api/session': session });
    renderWithProviders(<ForgotScreen />);
    expect(screen.getByTestId('link-sign-in').getAttribute('href')).toBe('/sign-in');
  });
});
