import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { UserDto } from '@/shared/api-types';
import { fieldErrors, signUpSchema } from '@/shared/schemas/auth';
import { forgetCsrfToken } from '../http/client';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { SignUpScreen } from './SignUpScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });

// Invented person and address (DESIGN.md §7: example.org only).
const farah = { email: 'Farah.Quintero@example.org', displayName: 'Farah Quintero', password: 'slow-orbit-lantern-42' };
const created: UserDto = {
  id: 41,
  email: 'farah.quintero@example.org',
  displayName: 'Farah Quintero',
  role: 'contributor',
  verified: false,
  createdAt: '2026-03-02T10:00:00.000Z',
};
const session = () => jsonResponse(200, { user: null, csrfToken: 'csrf-sign-up' });

function fill(values: { email: string; displayName: string; password: string }) {
  type('field-email', values.email);
  type('field-displayName', values.displayName);
  type('field-password', values.password);
}

/** The field group (label, input, hint, error) an element sits in. */
const groupOf = (testID: string) => screen.getByTestId(testID).parentElement!;

beforeEach(() => forgetCsrfToken());

describe('SignUpScreen', () => {
  it('states the password rule before anything goes wrong', () => {
    mockFetch({});
    renderWithProviders(<SignUpScreen />);
    expect(groupOf('field-password').textContent).toContain('At least 12 characters');
  });

  it("shows the shared schema's messages beside each field and sends nothing", async () => {
    const fetchMock = mockFetch({});
    renderWithProviders(<SignUpScreen />);
    const bad = { email: 'farah at example', displayName: 'F', password: 'eleven-char' };
    fill(bad);
    fireEvent.click(screen.getByTestId('submit'));

    // The expected messages come from the same schema the server validates with.
    const parsed = signUpSchema.safeParse(bad);
    expect(parsed.success).toBe(false);
    const expected = fieldErrors(parsed.error!);
    for (const field of ['email', 'displayName', 'password'] as const) {
      const error = await screen.findByTestId(`error-${field}`);
      expect(error.textContent).toBe(expected[field]);
      expect(within(error.parentElement!).getByTestId(`field-${field}`)).toBeTruthy();
      expect(screen.getByTestId(`field-${field}`).getAttribute('aria-invalid')).toBe('true');
    }
    expect(screen.getByTestId('error-password').textContent).toBe('at least 12 characters');
    expect(fetchMock).not.toHaveBeenCalled();
    expect(screen.queryByTestId('form-error')).toBeNull();
  });

  it("puts the server's 409 message beside the e-mail field", async () => {
    mockFetch({
      '/api/session': session,
      '/api/auth/sign-up': () =>
        jsonResponse(409, {
          error: {
            code: 'email_taken',
            message: 'An account with this e-mail address exists already.',
            fields: { 'body.email': 'an account with this address exists already' },
          },
        }),
    });
    renderWithProviders(<SignUpScreen />);
    fill(farah);
    fireEvent.click(screen.getByTestId('submit'));

    const error = await screen.findByTestId('error-email');
    expect(error.textContent).toBe('an account with this address exists already');
    expect(within(error.parentElement!).getByTestId('field-email')).toBeTruthy();
    expect(screen.queryByTestId('error-password')).toBeNull();
    expect(screen.queryByTestId('form-error')).toBeNull();
    // Typing a new address takes the message away.
    type('field-email', 'farah.q@example.org');
    expect(screen.queryByTestId('error-email')).toBeNull();
  });

  it('sends the body the schema made, shows progress, then says to check the mail, with a resend', async () => {
    let answer: (response: Response) => void = () => undefined;
    const fetchMock = mockFetch({
      '/api/session': session,
      '/api/auth/sign-up': () => new Promise<Response>((resolve) => (answer = resolve)),
      '/api/auth/resend-verification': () => jsonResponse(202, {}),
    });
    renderWithProviders(<SignUpScreen />);
    fill(farah);
    fireEvent.click(screen.getByTestId('submit'));

    const button = screen.getByTestId('submit');
    await waitFor(() => expect(button.getAttribute('aria-disabled')).toBe('true'));
    expect(button.textContent).toBe('Creating the account…');
    const [, init] = fetchMock.mock.calls.find(([path]) => path === '/api/auth/sign-up')!;
    // The schema trims and lowers the address; the password goes as typed.
    expect(JSON.parse(String(init?.body))).toEqual({ ...farah, email: 'farah.quintero@example.org' });

    answer(jsonResponse(201, { user: created }));
    const done = await screen.findByTestId('sign-up-done');
    expect(screen.getByTestId('screen-sign-up').textContent).toContain('Check your e-mail');
    expect(done.textContent).toContain('farah.quintero@example.org');
    expect(screen.queryByTestId('field-password')).toBeNull();

    fireEvent.click(screen.getByTestId('resend'));
    expect((await screen.findByTestId('resend-status')).textContent).toContain('a new link is on its way');
    const [, resend] = fetchMock.mock.calls.find(([path]) => path === '/api/auth/resend-verification')!;
    expect(JSON.parse(String(resend?.body))).toEqual({ email: 'farah.quintero@example.org' });
  });

  it('says so at the form when the server answers 429', async () => {
    mockFetch({
      '/api/session': session,
      '/api/auth/sign-up': () =>
        jsonResponse(429, { error: { code: 'rate_limited', message: 'Too many sign-ups from your network. Try again in about 40 minutes.' } }),
    });
    renderWithProviders(<SignUpScreen />);
    fill(farah);
    fireEvent.click(screen.getByTestId('submit'));
    const notice = await screen.findByTestId('form-error');
    expect(notice.getAttribute('role')).toBe('alert');
    expect(notice.textContent).toContain('Try again in about 40 minutes.');
  });
});
