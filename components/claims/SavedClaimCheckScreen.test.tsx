import { fireEvent, screen, waitFor } from '@testing-library/react';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { savedDto, token } from './fixtures';
import { SavedClaimCheckScreen } from './SavedClaimCheckScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

const session = (user: unknown) => ({ '/api/session': () => jsonResponse(200, { user, csrfToken: 'csrf-9' }) });
const owner = { id: 7, email: 'contributor@example.org', displayName: 'Ines Okonkwo', role: 'contributor', emailVerified: true, createdAt: '2026-01-01T00:00:00.000Z' };
const notFound = () =>
  jsonResponse(404, { error: { code: 'not_found', message: 'There is no saved claim check at this link: it was deleted, or the link is mistyped.' } });

beforeEach(() => setWindowWidth(390));

describe('SavedClaimCheckScreen', () => {
  it('shows the saved result read only, with a way to open it in the claim check, and no Delete for others', async () => {
    mockFetch({ ...session(null), [`/api/claim-checks/saved/${token}`]: () => jsonResponse(200, { saved: savedDto(false) }) });
    renderWithProviders(<SavedClaimCheckScreen token={token} />);
    expect(await screen.findByTestId('claim-match-resonant-cavity-thruster')).toBeTruthy();
    expect(screen.getByTestId('claim-check-photon-bound-verdict').getAttribute('data-holds')).toBe('false');
    expect(screen.getByTestId('claim-figure-f2').textContent).toContain('889.6 mN');
    expect(screen.queryByTestId('claim-figure-f2-quantity')).toBeNull();
    expect(screen.queryByTestId('claim-rerun')).toBeNull();
    expect(screen.getByTestId('claim-paragraph').textContent).toContain('(saved)');
    expect(screen.getByTestId('claim-open').getAttribute('href')).toBe(`/check?from=${token}`);
    expect(screen.queryByTestId('claim-saved-delete')).toBeNull();
    expect(await screen.findByTestId('claim-sign-in-to-save')).toBeTruthy();
  });

  it('lets its owner delete it, after which the link answers not found', async () => {
    let gone = false;
    mockFetch({
      ...session(owner),
      [`/api/claim-checks/saved/${token}`]: (init) => {
        if (init?.method === 'DELETE') {
          gone = true;
          return { ok: true, status: 204, statusText: '', json: async () => undefined } as Response;
        }
        return gone ? notFound() : jsonResponse(200, { saved: savedDto(true) });
      },
      '/api/claim-checks/saved': () => jsonResponse(200, { saved: [] }),
    });
    const confirm = jest.spyOn(window, 'confirm').mockReturnValue(true);
    renderWithProviders(<SavedClaimCheckScreen token={token} />);
    fireEvent.click(await screen.findByTestId('claim-saved-delete'));
    expect(await screen.findByTestId('claim-saved-not-found')).toBeTruthy();
    expect(screen.getByTestId('claim-deleted').textContent).toContain('Deleted.');
    await waitFor(() => expect(gone).toBe(true));
    confirm.mockRestore();
  });

  it('says clearly when there is nothing at the link', async () => {
    mockFetch({ ...session(null), '/api/claim-checks/saved/nope-nope-nope-nope': notFound });
    renderWithProviders(<SavedClaimCheckScreen token="nope-nope-nope-nope" />);
    const notice = await screen.findByTestId('claim-saved-not-found');
    expect(notice.textContent).toContain('There is no saved claim check at this link.');
    expect(screen.getByTestId('screen-claim-saved-not-found')).toBeTruthy();
  });
});
