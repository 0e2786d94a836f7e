import { fireEvent, screen, waitFor } from '@testing-library/react';
import { forgetCsrfToken } from '../http/client';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { ResetScreen } from './ResetScreen';
import { VerifyScreen } from './VerifyScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });
const session = () => jsonResponse(200, { user: null, csrfToken: 'csrf-links' });
// 43 base64url characters, the shape of the tokens in e-mailed links (shared/schemas/auth.ts).
const token = 'Qm9yaXMtcHVzaGVyLWFuZC1Ob2V0aGVyLXN5bW1ldHI';

beforeEach(() => forgetCsrfToken());

describe('ResetScreen', () => {
  it('wants the new password twice, and sends only the first with the token', async () => {
    const fetchMock = mockFetch({ '/api/session': session, '/api/auth/reset': () => jsonResponse(200, {}) });
    renderWithProviders(<ResetScreen token={token} />);
    type('field-password', 'tidal-brass-counterweight');
    type('field-password2', 'tidal-brass-counterwieght');
    fireEvent.click(screen.getByTestId('submit'));
    expect((await screen.findByTestId('error-password2')).textContent).toContain('the two passwords differ');
    expect(fetchMock.mock.calls.map(([path]) => path)).not.toContain('/api/auth/reset');

    type('field-password2', 'tidal-brass-counterweight');
    fireEvent.click(screen.getByTestId('submit'));
    expect((await screen.findByTestId('reset-done')).textContent).toContain('Every session of this account has been signed out');
    const [, init] = fetchMock.mock.calls.find(([path]) => path === '/api/auth/reset')!;
    expect(JSON.parse(String(init?.body))).toEqual({ token, password: 'tidal-brass-counterweight' });
  });

  it('says when the link has expired and where to get a new one', async () => {
    mockFetch({
      '/api/session': session,
      '/api/auth/reset': () =>
        jsonResponse(400, {
          error: {
            code: 'token_expired',
            message: 'This password-reset link has expired (links work for one hour). Ask for a new one.',
            fields: { 'body.token': 'this link has expired' },
          },
        }),
    });
    renderWithProviders(<ResetScreen token={token} />);
    type('field-password', 'tidal-brass-counterweight');
    type('field-password2', 'tidal-brass-counterweight');
    fireEvent.click(screen.getByTestId('submit'));
    const notice = await screen.findByTestId('form-error');
    expect(notice.textContent).toContain('This password-reset link has expired');
    expect(screen.getByTestId('reset-new-link').getAttribute('href')).toBe('/forgot');
  });

  it('refuses a cut-off link before showing the form', () => {
    mockFetch({});
    renderWithProviders(<ResetScreen token="abc" />);
    expect(screen.getByTestId('form-error').textContent).toContain('open it from the e-mail again');
    expect(screen.queryByTestId('field-password')).toBeNull();
    expect(screen.getByTestId('reset-new-link')).toBeTruthy();
  });
});

describe('VerifyScreen', () => {
  it('verifies once on opening, then offers sign-in with the address', async () => {
    const fetchMock = mockFetch({
      '/api/session': session,
      '/api/auth/verify': () =>
        jsonResponse(200, {
          user: { id: 9, email: 'farah.quintero@example.org', displayName: 'Farah Quintero', role: 'contributor', verified: true, createdAt: '2026-03-02T10:00:00.000Z' },
        }),
    });
    renderWithProviders(<VerifyScreen token={token} />);
    expect(screen.getByTestId('verify-pending')).toBeTruthy();
    expect((await screen.findByTestId('verify-done')).textContent).toContain('verified');
    expect(screen.getByTestId('verify-sign-in').getAttribute('href')).toBe('/sign-in?email=farah.quintero%40example.org');
    const verifies = fetchMock.mock.calls.filter(([path]) => path === '/api/auth/verify');
    expect(verifies).toHaveLength(1);
    expect(JSON.parse(String(verifies[0][1]?.body))).toEqual({ token });
  });

  it('says a used link is used, and offers a new one', async () => {
    const fetchMock = mockFetch({
      '/api/session': session,
      '/api/auth/verify': () =>
        jsonResponse(400, {
          error: { code: 'token_used', message: 'This confirmation link has been used already (each link works once).' },
        }),
      '/api/auth/resend-verification': () => jsonResponse(202, {}),
    });
    renderWithProviders(<VerifyScreen token={token} />);
    const notice = await screen.findByTestId('verify-error');
    expect(notice.textContent).toContain('This link has already been used.');
    expect(notice.textContent).toContain('each link works once');

    type('field-email', 'farah.quintero@example.org');
    fireEvent.click(screen.getByTestId('resend'));
    await screen.findByTestId('resend-status');
    await waitFor(() => expect(fetchMock.mock.calls.map(([path]) => path)).toContain('/api/auth/resend-verification'));
  });
});
