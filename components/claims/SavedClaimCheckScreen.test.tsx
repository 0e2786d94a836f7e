import { fireEvent, screen, waitFor } from '@testing-library/react';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { PARAGRAPH_VARIANT_LABEL } from '@/shared/claims/types';
import { formatQuantity } from '@/shared/worksheet/quantity';
import { LBF, token, savedResponse } from './fixtures';
import { SavedClaimCheckScreen } from './SavedClaimCheckScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

const session = (user: unknown) => ({ '/api/session': () => jsonResponse(200, { user, csrfToken: 'csrf-9' }) });
const owner = { id: 7, email: 'contributor@example.org', displayName: 'Ines Okonkwo', role: 'contributor', emailVerified: true, createdAt: '2026-01-01T00:00:00.000Z' };
const notFound = () =>
  jsonResponse(404, { error: { code: 'not_found', message: 'There is no saved claim check at this link: it was deleted, or the link is mistyped.' } });

beforeEach(() => setWindowWidth(390));

describe('SavedClaimCheckScreen', () => {
  it('shows the saved result read only, with a way to open it in the claim check, and no Delete for others', async () => {
    mockFetch({ ...session(null), [`/api/claim-checks/saved/${token}`]: () => jsonResponse(200, savedResponse(false, 'examiner')) });
    renderWithProviders(<SavedClaimCheckScreen token={token} />);
    expect(await screen.findByTestId('claim-match-resonant-cavity-thruster')).toBeTruthy();
    expect(screen.getByTestId('claim-check-photon-bound-finding').getAttribute('data-finding')).toBe('breaks');
    expect(screen.getByTestId('claim-check-photon-bound-finding-words').textContent).toBe('Breaks conservation of linear momentum');
    // The range with both ends, and the hedge said with the power.
    const [lo, hi] = [formatQuantity(0.1 * LBF, 'N'), formatQuantity(0.2 * LBF, 'N')];
    expect(screen.getByTestId('claim-figure-f2-value').textContent).toBe(`${lo.replace(' mN', '')}–${hi}`);
    expect(screen.getByTestId('claim-figure-f1-value').textContent).toBe('up to 1.5 kW');
    expect(screen.queryByTestId('claim-figure-f2-quantity')).toBeNull();
    expect(screen.getByTestId('claim-need-break-even-speed-missing').textContent).toContain('Needs a figure the text does not give: ');
    expect(screen.queryByTestId('claim-check-break-even-speed')).toBeNull();
    // The paragraph comes first, in the variant it was saved with; the others are at hand.
    expect(screen.getAllByRole('heading', { level: 2 })[0].textContent).toBe('Paragraph to paste');
    expect(screen.getByTestId('claim-paragraph-body').textContent).toContain(`(saved, ${PARAGRAPH_VARIANT_LABEL.examiner})`);
    fireEvent.click(screen.getByTestId('claim-variant-journalist'));
    expect(screen.getByTestId('claim-paragraph-body').textContent).toContain(`(saved, ${PARAGRAPH_VARIANT_LABEL.journalist})`);
    expect(screen.queryByTestId('claim-style')).toBeNull();
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
        return gone ? notFound() : jsonResponse(200, savedResponse(true));
      },
      '/api/claim-checks/saved': () => jsonResponse(200, { saved: [] }),
    });
    renderWithProviders(<SavedClaimCheckScreen token={token} />);
    fireEvent.click(await screen.findByTestId('claim-saved-delete'));
    fireEvent.click(await screen.findByTestId('confirm-dialog-accept'));
    expect(await screen.findByTestId('claim-saved-not-found')).toBeTruthy();
    expect(screen.getByTestId('claim-deleted').textContent).toContain('Deleted.');
    await waitFor(() => expect(gone).toBe(true));
  });

  it('says clearly when there is nothing at the link', async () => {
    mockFetch({ ...session(null), '/api/claim-checks/saved/nope-nope-nope-nope': notFound });
    renderWithProviders(<SavedClaimCheckScreen token="nope-nope-nope-nope" />);
    const notice = await screen.findByTestId('claim-saved-not-found');
    expect(notice.textContent).toContain('There is no saved claim check at this link.');
    expect(screen.getByTestId('screen-claim-saved-not-found')).toBeTruthy();
  });
});
