import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { AuditListResponse, OutboxResponse, UserDto, UserListResponse } from '@/shared/api-types';
import { forgetCsrfToken } from '../http/client';
import { setPathname } from '../testing/expoRouter';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { AuditScreen } from './AuditScreen';
import { OutboxScreen } from './OutboxScreen';
import { UsersScreen } from './UsersScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

// Invented people (DESIGN.md §7).
const ada: UserDto = {
  id: 1,
  email: 'admin@example.org',
  displayName: 'Ada Okonkwo',
  role: 'admin',
  verified: true,
  createdAt: '2026-01-02T09:00:00.000Z',
};
const farah: UserDto = {
  id: 12,
  email: 'new.referee@example.org',
  displayName: 'Farah Quintero',
  role: 'contributor',
  verified: true,
  createdAt: '2026-03-02T10:00:00.000Z',
};
const adminSession = () => jsonResponse(200, { user: ada, csrfToken: 'csrf-admin' });
const firstPage = '/api/admin/users?limit=25&offset=0';
const headersOf = (init?: RequestInit) => (init?.headers ?? {}) as Record<string, string>;

beforeEach(() => {
  forgetCsrfToken();
  setPathname('/admin');
});
afterEach(() => jest.restoreAllMocks());

describe('UsersScreen', () => {
  it('lists the users, one row each with a role picker', async () => {
    const list: UserListResponse = { users: [ada, farah], total: 2 };
    mockFetch({ '/api/session': adminSession, [firstPage]: () => jsonResponse(200, list) });
    renderWithProviders(<UsersScreen />);

    const row = await screen.findByTestId('user-row-new.referee@example.org');
    expect(row.textContent).toContain('Farah Quintero');
    expect(screen.getByTestId('user-row-admin@example.org').textContent).toContain('(you)');
    const picker = within(row).getByTestId('role-new.referee@example.org');
    expect(picker.getAttribute('role')).toBe('radiogroup');
    expect(within(picker).getByRole('radio', { name: 'contributor' }).getAttribute('aria-checked')).toBe('true');
    expect(screen.getByTestId('page-status').textContent).toBe('2 users');
  });

  it('changes a role with PATCH after the admin confirms, and shows the new role at once', async () => {
    let role: UserDto['role'] = 'contributor';
    const fetchMock = mockFetch({
      '/api/session': adminSession,
      [firstPage]: () => jsonResponse(200, { users: [ada, { ...farah, role }], total: 2 }),
      '/api/admin/users/12/role': (init) => {
        role = JSON.parse(String(init?.body)).role;
        return jsonResponse(200, { user: { ...farah, role } });
      },
      '/api/admin/audit?limit=50&offset=0': () => jsonResponse(200, { events: [], total: 0 }),
    });
    renderWithProviders(<UsersScreen />);

    fireEvent.click(await screen.findByTestId('role-new.referee@example.org-editor'));
    expect((await screen.findByTestId('confirm-dialog')).textContent).toContain('from contributor to editor');
    fireEvent.click(screen.getByTestId('confirm-dialog-accept'));
    expect((await screen.findByTestId('role-status-new.referee@example.org')).textContent).toBe('Role changed to editor.');

    const patches = fetchMock.mock.calls.filter(([path]) => path === '/api/admin/users/12/role');
    expect(patches).toHaveLength(1);
    const [, init] = patches[0];
    expect(init?.method).toBe('PATCH');
    expect(JSON.parse(String(init?.body))).toEqual({ role: 'editor' });
    expect(headersOf(init)['X-CSRF-Token']).toBe('csrf-admin');
    const picker = screen.getByTestId('role-new.referee@example.org');
    expect(within(picker).getByRole('radio', { name: 'editor' }).getAttribute('aria-checked')).toBe('true');
    expect(within(picker).getByRole('radio', { name: 'contributor' }).getAttribute('aria-checked')).toBe('false');
  });

  it('sends nothing when the admin thinks better of it', async () => {
    const fetchMock = mockFetch({ '/api/session': adminSession, [firstPage]: () => jsonResponse(200, { users: [farah], total: 1 }) });
    renderWithProviders(<UsersScreen />);
    fireEvent.click(await screen.findByTestId('role-new.referee@example.org-moderator'));
    fireEvent.click(await screen.findByTestId('confirm-dialog-cancel'));
    expect(fetchMock.mock.calls.map(([path]) => path)).not.toContain('/api/admin/users/12/role');
    const picker = screen.getByTestId('role-new.referee@example.org');
    expect(within(picker).getByRole('radio', { name: 'contributor' }).getAttribute('aria-checked')).toBe('true');
  });

  it("shows the server's refusal beside the picker", async () => {
    mockFetch({
      '/api/session': adminSession,
      [firstPage]: () => jsonResponse(200, { users: [ada], total: 1 }),
      '/api/admin/users/1/role': () =>
        jsonResponse(400, {
          error: {
            code: 'cannot_demote_self',
            message: 'You cannot take the admin role away from yourself.',
            fields: { 'body.role': 'another admin must make this change' },
          },
        }),
    });
    renderWithProviders(<UsersScreen />);
    fireEvent.click(await screen.findByTestId('role-admin@example.org-editor'));
    fireEvent.click(await screen.findByTestId('confirm-dialog-accept'));
    expect((await screen.findByTestId('error-role-admin@example.org')).textContent).toBe(
      'You cannot take the admin role away from yourself.',
    );
    const picker = screen.getByTestId('role-admin@example.org');
    expect(within(picker).getByRole('radio', { name: 'admin' }).getAttribute('aria-checked')).toBe('true');
  });

  it('searches by e-mail or name and filters by role, and says what to do when nobody matches', async () => {
    const fetchMock = mockFetch({
      '/api/session': adminSession,
      [firstPage]: () => jsonResponse(200, { users: [ada, farah], total: 2 }),
      '/api/admin/users?q=quintero&limit=25&offset=0': () => jsonResponse(200, { users: [farah], total: 1 }),
      '/api/admin/users?q=quintero&role=moderator&limit=25&offset=0': () => jsonResponse(200, { users: [], total: 0 }),
    });
    renderWithProviders(<UsersScreen />);
    await screen.findByTestId('user-row-admin@example.org');

    fireEvent.change(screen.getByTestId('field-q'), { target: { value: 'quintero' } });
    await waitFor(() => expect(screen.queryByTestId('user-row-admin@example.org')).toBeNull());
    expect(screen.getByTestId('user-row-new.referee@example.org')).toBeTruthy();

    fireEvent.click(screen.getByTestId('filter-role-moderator'));
    const empty = await screen.findByTestId('users-empty');
    expect(empty.textContent).toContain('No user with “quintero” in the e-mail address or name has the role moderator.');
    expect(empty.textContent).toContain('choose all roles');
    expect(fetchMock.mock.calls.map(([path]) => path)).toContain('/api/admin/users?q=quintero&role=moderator&limit=25&offset=0');
  });

  it('pages through a long list', async () => {
    const many = Array.from({ length: 25 }, (_, i) => ({ ...farah, id: 100 + i, email: `referee.${i}@example.org` }));
    mockFetch({
      '/api/session': adminSession,
      [firstPage]: () => jsonResponse(200, { users: many, total: 30 }),
      '/api/admin/users?limit=25&offset=25': () => jsonResponse(200, { users: [farah], total: 30 }),
    });
    renderWithProviders(<UsersScreen />);
    expect((await screen.findByTestId('page-status')).textContent).toBe('1–25 of 30 users');
    expect(screen.getByTestId('page-prev').getAttribute('aria-disabled')).toBe('true');
    fireEvent.click(screen.getByTestId('page-next'));
    await screen.findByTestId('user-row-new.referee@example.org');
    expect(screen.getByTestId('page-status').textContent).toBe('26–26 of 30 users');
  });

  it('tells anyone but an admin that the page is for admins only', async () => {
    mockFetch({ '/api/session': () => jsonResponse(200, { user: farah, csrfToken: 'csrf-c' }) });
    renderWithProviders(<UsersScreen />);
    expect((await screen.findByTestId('role-required')).textContent).toContain('Admins only');
    expect(screen.getByTestId('screen-admin')).toBeTruthy();
    expect(screen.queryByTestId('field-q')).toBeNull();
  });
});

describe('AuditScreen', () => {
  it('shows who did what, when, and before → after, newest first as sent', async () => {
    setPathname('/admin/audit');
    const log: AuditListResponse = {
      total: 2,
      events: [
        {
          id: 8,
          at: '2026-03-03T14:05:00.000Z',
          actor: { id: 1, displayName: 'Ada Okonkwo' },
          action: 'user.role_changed',
          subjectType: 'user',
          subjectId: '12',
          before: { role: 'contributor' },
          after: { role: 'editor' },
          sentence: [{ text: 'Ada Okonkwo' }, { text: ' ' }, { text: 'made Farah Nadeem an editor (before: a contributor)' }, { text: '.' }],
        },
        {
          id: 3,
          at: '2026-03-01T08:00:00.000Z',
          actor: null,
          action: 'entry.imported',
          subjectType: 'entry',
          subjectId: '1',
          before: null,
          after: { version: 1, draftId: 4 },
          sentence: [{ text: 'The system added version 1 of ' }, { text: 'Reactionless drives', title: true }, { text: ' from the starter library.' }],
        },
      ],
    };
    mockFetch({ '/api/session': adminSession, '/api/admin/audit?limit=50&offset=0': () => jsonResponse(200, log) });
    renderWithProviders(<AuditScreen />);
    const events = await screen.findAllByTestId('audit-event');
    expect(events).toHaveLength(2);
    expect(within(events[0]).getByTestId('audit-sentence').textContent).toBe('Ada Okonkwo made Farah Nadeem an editor (before: a contributor).');
    expect(within(events[0]).getByTestId('audit-change').textContent).toBe('role: contributor → editor');
    // The action's code never shows; a title is set apart (italics) from the rest of the sentence.
    expect(screen.queryByText(/user\.role_changed|entry\.imported/)).toBeNull();
    expect(within(events[1]).getByText('Reactionless drives')).toBeTruthy();
    expect(within(events[1]).getByTestId('audit-change').textContent).toBe('version: (none) → 1');
  });

  it('says what writes the first event when the log is empty', async () => {
    mockFetch({ '/api/session': adminSession, '/api/admin/audit?limit=50&offset=0': () => jsonResponse(200, { events: [], total: 0 }) });
    renderWithProviders(<AuditScreen />);
    expect((await screen.findByTestId('audit-empty')).textContent).toContain("Changing a user's role");
  });
});

describe('OutboxScreen', () => {
  it('shows each caught message with its links as real anchors', async () => {
    setPathname('/admin/outbox');
    const origin = window.location.origin;
    const token = 'Qm9yaXMtcHVzaGVyLWFuZC1Ob2V0aGVyLXN5bW1ldHI';
    const outbox: OutboxResponse = {
      messages: [
        {
          id: 2,
          to: 'new.referee@example.org',
          from: 'Counterweight <no-reply@example.org>',
          subject: 'Confirm your e-mail address',
          text: `Hello Farah,\n\nOpen ${origin}/verify?token=${token}. The link works once, within 24 hours.\nHelp: https://help.example.org/accounts\n`,
          html: '<p>Hello Farah</p>',
          receivedAt: '2026-03-02T10:00:05.000Z',
        },
      ],
    };
    mockFetch({ '/api/session': adminSession, '/api/admin/outbox': () => jsonResponse(200, outbox) });
    renderWithProviders(<OutboxScreen />);

    const message = await screen.findByTestId('outbox-message');
    expect(message.textContent).toContain('Confirm your e-mail address');
    expect(message.textContent).toContain('new.referee@example.org');
    const links = within(message).getAllByRole('link');
    // A link to this app opens in it; the sentence's full stop stays outside the link.
    expect(links.map((a) => [a.tagName, a.getAttribute('href')])).toEqual([
      ['A', `/verify?token=${token}`],
      ['A', 'https://help.example.org/accounts'],
    ]);
    expect(links[0].textContent).toBe(`${origin}/verify?token=${token}`);
    expect(within(message).getByTestId('outbox-text').textContent).toContain('. The link works once');
  });

  it('says how mail gets there when nothing was caught yet', async () => {
    mockFetch({ '/api/session': adminSession, '/api/admin/outbox': () => jsonResponse(200, { messages: [] }) });
    renderWithProviders(<OutboxScreen />);
    expect((await screen.findByTestId('outbox-empty')).textContent).toContain('creates an account');
  });

  it('explains a server without an outbox (production answers 404)', async () => {
    mockFetch({
      '/api/session': adminSession,
      '/api/admin/outbox': () => jsonResponse(404, { error: { code: 'not_found', message: 'There is no API route GET /api/admin/outbox.' } }),
    });
    renderWithProviders(<OutboxScreen />);
    expect((await screen.findByTestId('outbox-off')).textContent).toContain('only in development');
  });
});
