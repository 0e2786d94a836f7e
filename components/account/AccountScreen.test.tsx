import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { UserDto } from '@/shared/api-types';
import { forgetCsrfToken } from '../http/client';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { AccountScreen } from './AccountScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });

// Invented person (DESIGN.md §7).
const dmitri: UserDto = {
  id: 4,
  email: 'moderator@example.org',
  displayName: 'Dmitri Havel',
  role: 'moderator',
  verified: true,
  createdAt: '2026-01-03T09:00:00.000Z',
};

beforeEach(() => forgetCsrfToken());

describe('AccountScreen', () => {
  it('tells a reader what an account adds and where to sign in or register', async () => {
    mockFetch({ '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'csrf-r' }) });
    renderWithProviders(<AccountScreen />);
    expect((await screen.findByTestId('account-sign-in')).getAttribute('href')).toBe('/sign-in');
    expect(screen.getByTestId('account-sign-up').getAttribute('href')).toBe('/sign-up');
    const root = screen.getByTestId('screen-account');
    expect(root.textContent).toContain('need no account');
    expect(root.textContent).toContain('sightings');
    expect(screen.queryByTestId('sign-out')).toBeNull();
  });

  it('shows the e-mail and role, renames at once, and signs out back to the reader view', async () => {
    let user: UserDto | null = dmitri;
    const fetchMock = mockFetch({
      '/api/session': () => jsonResponse(200, { user, csrfToken: 'csrf-m' }),
      '/api/account': (init) => jsonResponse(200, { user: { ...dmitri, displayName: JSON.parse(String(init?.body)).displayName } }),
      '/api/auth/sign-out': () => {
        user = null;
        return jsonResponse(204, undefined);
      },
    });
    renderWithProviders(<AccountScreen />);
    expect((await screen.findByTestId('account-role')).textContent).toBe('moderator');
    expect(screen.getByTestId('account-email').textContent).toBe('moderator@example.org');
    expect((screen.getByTestId('field-displayName') as HTMLInputElement).value).toBe('Dmitri Havel');

    const nameForm = screen.getByTestId('form-displayName');
    type('field-displayName', '  Dmitri A. Havel ');
    fireEvent.click(within(nameForm).getByTestId('submit'));
    expect((await screen.findByTestId('account-saved')).textContent).toContain('Dmitri A. Havel');
    const [, patch] = fetchMock.mock.calls.find(([path]) => path === '/api/account')!;
    expect(JSON.parse(String(patch?.body))).toEqual({ displayName: 'Dmitri A. Havel' });

    fireEvent.click(screen.getByTestId('sign-out'));
    expect(await screen.findByTestId('account-sign-in')).toBeTruthy();
    expect(screen.queryByTestId('account-role')).toBeNull();
  });

  it('puts a wrong current password beside its field', async () => {
    mockFetch({
      '/api/session': () => jsonResponse(200, { user: dmitri, csrfToken: 'csrf-p' }),
      '/api/account/password': () =>
        jsonResponse(400, {
          error: {
            code: 'wrong_password',
            message: 'The current password is not right, so the password was not changed.',
            fields: { 'body.currentPassword': 'this is not your current password' },
          },
        }),
    });
    renderWithProviders(<AccountScreen />);
    const form = await screen.findByTestId('form-password');
    type('field-currentPassword', 'guessing-at-it');
    type('field-newPassword', 'short');
    fireEvent.click(within(form).getByTestId('submit'));
    expect((await screen.findByTestId('error-newPassword')).textContent).toBe('at least 12 characters');

    type('field-newPassword', 'quiet-flywheel-harbour');
    fireEvent.click(within(form).getByTestId('submit'));
    await waitFor(() => expect(screen.getByTestId('error-currentPassword').textContent).toBe('this is not your current password'));
    expect(screen.queryByTestId('error-newPassword')).toBeNull();
    expect(within(form).queryByTestId('form-error')).toBeNull();
  });
});
