import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { CLAIM_TEXT_MAX } from '@/shared/claims/types';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import type { ClaimCheckRequest } from './api';
import { ClaimCheckScreen } from './ClaimCheckScreen';
import { figure, figures, LBF, pitch, resultFor, savedDto, token } from './fixtures';

jest.mock('expo-router', () => require('../testing/expoRouter'));

// c = 299 792 458 m/s exactly (BIPM SI Brochure, 9th ed., 2019, the defining constants).
const c = 299_792_458;
const relClose = (a: number, b: number) => Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));
const si = (testID: string) => Number(screen.getByTestId(testID).getAttribute('data-si'));

const signedOut = { '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'csrf-1' }) };
const contributor = {
  id: 7,
  email: 'contributor@example.org',
  displayName: 'Ines Okonkwo',
  role: 'contributor',
  emailVerified: true,
  createdAt: '2026-01-01T00:00:00.000Z',
};
const signedIn = { '/api/session': () => jsonResponse(200, { user: contributor, csrfToken: 'csrf-2' }) };

const bodyOf = (init?: RequestInit) => JSON.parse(String(init?.body)) as ClaimCheckRequest;
const paste = (text: string) => fireEvent.change(screen.getByTestId('claim-text'), { target: { value: text } });
const headings = () => screen.getAllByRole('heading', { level: 2 }).map((h) => h.textContent);

beforeEach(() => setWindowWidth(390));

describe('ClaimCheckScreen', () => {
  it('counts the characters, and refuses a text over the limit before anything is sent', () => {
    const fetchMock = mockFetch(signedOut);
    renderWithProviders(<ClaimCheckScreen />);
    const run = screen.getByTestId('claim-run');
    expect(run.getAttribute('aria-disabled')).toBe('true');
    paste(pitch);
    expect(screen.getByTestId('claim-text-count').textContent).toBe(`${pitch.length} of 20,000 characters`);
    expect(run.getAttribute('aria-disabled')).not.toBe('true');

    paste('x'.repeat(CLAIM_TEXT_MAX + 12));
    expect(screen.getByTestId('claim-text-count').textContent).toBe('20,012 of 20,000 characters');
    expect(screen.getByTestId('claim-text-too-long').textContent).toContain('12 characters over the limit');
    expect(screen.getByTestId('claim-text').getAttribute('aria-invalid')).toBe('true');
    expect(run.getAttribute('aria-disabled')).toBe('true');
    fireEvent.click(run);
    expect(fetchMock.mock.calls.map(([p]) => String(p))).not.toContain('/api/claim-checks');
    expect(screen.getByTestId('claim-caution').textContent).toContain('not the people making it');
  });

  it('sends the pasted text and style, and shows the result in four parts', async () => {
    const fetchMock = mockFetch({ ...signedOut, '/api/claim-checks': (init) => jsonResponse(200, resultFor(figures, bodyOf(init).style)) });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    fireEvent.click(screen.getByTestId('claim-style-vancouver'));
    fireEvent.click(screen.getByTestId('claim-run'));

    await screen.findByTestId('claim-result');
    const call = fetchMock.mock.calls.find(([p]) => p === '/api/claim-checks')!;
    expect(call[1]?.method).toBe('POST');
    expect(bodyOf(call[1])).toEqual({ text: pitch, style: 'vancouver' });
    expect(headings()).toEqual(['Matching entries', 'Figures found', 'Checks run', 'Referee paragraph', 'Save and share']);
    expect(screen.getByTestId('claim-status').getAttribute('role')).toBe('status');
    expect(screen.getByTestId('claim-status').textContent).toBe('2 entries matched, 2 figures found, 2 checks run.');

    // Matching entries: the permanent version, the words that matched, best first.
    const match = screen.getByTestId('claim-match-resonant-cavity-thruster');
    expect(screen.getByTestId('claim-match-resonant-cavity-thruster-link').getAttribute('href')).toBe('/entries/resonant-cavity-thruster/v/1');
    expect(match.textContent).toContain('Version 1');
    expect(screen.getByTestId('claim-match-resonant-cavity-thruster-words').textContent).toBe('Words that matched: sealed, cavity, microwaves');
    const items = within(screen.getByTestId('claim-matches')).getAllByRole('listitem');
    expect(items.map((i) => i.getAttribute('data-testid'))).toEqual(['claim-match-resonant-cavity-thruster', 'claim-match-photon-rocket']);

    // Figures: as written, in SI, with kind and role.
    expect((screen.getByTestId('claim-figure-f2-quantity') as HTMLInputElement).value).toBe('0.2 lbf');
    expect(relClose(si('claim-figure-f2-si'), 0.2 * LBF)).toBe(true);
    expect(screen.getByTestId('claim-figure-f2-si').textContent).toBe('889.6 mN');
    expect(screen.getByTestId('claim-figure-f2').textContent).toContain('As written: 0.2 lbf');
    expect(screen.getByTestId('claim-figure-f2-kind-thrust').getAttribute('aria-checked')).toBe('true');
    expect(screen.getByTestId('claim-figure-f1-role-in').getAttribute('aria-checked')).toBe('true');

    // Checks run: why, outputs, verdict, assumptions, a link to explore.
    const photon = screen.getByTestId('claim-check-photon-bound');
    expect(photon.textContent).toContain('The text gives a thrust and the power that produces it.');
    expect(relClose(si('claim-check-photon-bound-output-F_bound'), 1500 / c)).toBe(true);
    expect(relClose(si('claim-check-photon-bound-output-ratio'), (0.2 * LBF) / (1500 / c))).toBe(true);
    expect(screen.getByTestId('claim-check-photon-bound-verdict').getAttribute('data-holds')).toBe('false');
    expect(screen.getByTestId('claim-check-photon-bound-explore').getAttribute('href')).toBe('/checks/photon-bound?F_claimed=0.2%20lbf&P=1.5%20kW');
    expect(screen.getByTestId('claim-check-break-even-speed').textContent).toContain('Assumed beyond the text');

    // The paragraph with its numbered references, and the notes.
    expect(screen.getByTestId('claim-paragraph').textContent).toContain('/entries/resonant-cavity-thruster/v/1');
    expect(screen.getByTestId('claim-reference-1').textContent).toBe('1. Counterweight. (2026). Thrust from microwaves in a closed cavity (Version 1).');
    expect(screen.getByTestId('claim-notes').textContent).toContain('Invented note');

    // Where in the text: each figure marked at its offsets.
    fireEvent.click(screen.getByTestId('claim-where-toggle'));
    expect(screen.getByTestId('claim-where').textContent).toBe(pitch.replace('1.5 kW', '1.5 kW [f1]').replace('0.2 lbf', '0.2 lbf [f2]'));
    expect(screen.getByTestId('claim-where-f2').textContent).toBe('0.2 lbf [f2]');
  });

  it('sends the fixed figures on a re-run, keeping the previous result in view until the new one arrives', async () => {
    let release: (r: Response) => void = () => undefined;
    const fetchMock = mockFetch({
      ...signedOut,
      '/api/claim-checks': (init) => {
        const body = bodyOf(init);
        if (!body.figures) return jsonResponse(200, resultFor(figures));
        return new Promise<Response>((resolve) => (release = resolve));
      },
    });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    fireEvent.click(screen.getByTestId('claim-run'));
    await screen.findByTestId('claim-figure-f2');

    // The thrust retyped (read live in SI), the power's role cleared, a figure added then removed, another added.
    fireEvent.change(screen.getByTestId('claim-figure-f2-quantity'), { target: { value: '20 mN' } });
    expect(relClose(si('claim-figure-f2-si'), 0.02)).toBe(true);
    expect(screen.getByTestId('claim-figures-edited')).toBeTruthy();
    fireEvent.click(screen.getByTestId('claim-figure-f1-role-none'));
    fireEvent.click(screen.getByTestId('claim-figure-add'));
    fireEvent.click(screen.getByTestId('claim-figure-new-1-remove'));
    fireEvent.click(screen.getByTestId('claim-figure-add'));
    fireEvent.click(screen.getByTestId('claim-figure-new-2-kind-mass'));
    fireEvent.change(screen.getByTestId('claim-figure-new-2-quantity'), { target: { value: '12 kg' } });
    // A unit of the wrong kind is marked at once, beside its figure.
    fireEvent.change(screen.getByTestId('claim-figure-new-2-quantity'), { target: { value: '12 W' } });
    expect(screen.getByTestId('claim-figure-new-2-error').textContent).toMatch(/"12 W" is/);
    fireEvent.change(screen.getByTestId('claim-figure-new-2-quantity'), { target: { value: '12 kg' } });
    expect(screen.queryByTestId('claim-figure-new-2-error')).toBeNull();

    fireEvent.click(screen.getByTestId('claim-rerun'));
    const calls = () => fetchMock.mock.calls.filter(([p]) => p === '/api/claim-checks');
    await waitFor(() => expect(calls()).toHaveLength(2));
    expect(bodyOf(calls()[1][1])).toEqual({
      text: pitch,
      style: 'apa',
      figures: [
        { kind: 'power', quantity: '1.5 kW', role: null, text: '1.5 kW', start: figures[0].start, end: figures[0].end },
        { kind: 'thrust', quantity: '20 mN', role: null, text: '0.2 lbf', start: figures[1].start, end: figures[1].end },
        { kind: 'mass', quantity: '12 kg', role: null },
      ],
    });
    // Still the previous result while the re-run is on its way, and a status that says so.
    expect(screen.getByTestId('claim-status').textContent).toContain('Re-running with 3 figures');
    expect(screen.getByTestId('claim-result').getAttribute('aria-busy')).toBe('true');
    expect(relClose(si('claim-check-photon-bound-output-ratio'), (0.2 * LBF) / (1500 / c))).toBe(true);

    const next = resultFor(
      [
        { ...figures[0], role: null },
        { ...figures[1], quantity: '20 mN', si: 0.02, display: '20 mN' },
        figure({ id: 'f3', kind: 'mass', quantity: '12 kg', si: 12, unit: 'kg', display: '12 kg' }),
      ],
      'apa',
      'second',
    );
    await act(async () => release(jsonResponse(200, next)));
    await waitFor(() => expect(relClose(si('claim-check-photon-bound-output-ratio'), 0.02 / (1500 / c))).toBe(true));
    expect(screen.getByTestId('claim-figure-f3')).toBeTruthy();
    expect(screen.queryByTestId('claim-figures-edited')).toBeNull();
    expect(screen.getByTestId('claim-paragraph').textContent).toContain('(second)');
  });

  it('copies the paragraph with its references and says so', async () => {
    const writeText = jest.fn().mockResolvedValue(undefined);
    Object.defineProperty(navigator, 'clipboard', { configurable: true, value: { writeText } });
    mockFetch({ ...signedOut, '/api/claim-checks': () => jsonResponse(200, resultFor(figures)) });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    fireEvent.click(screen.getByTestId('claim-run'));
    fireEvent.click(await screen.findByTestId('claim-copy'));
    await waitFor(() => expect(screen.getByTestId('claim-copy-status').textContent).toBe('Copied.'));
    expect(writeText).toHaveBeenCalledWith(resultFor(figures).paragraph.text);
    expect(writeText.mock.calls[0][0]).toContain('\n\nReferences\n1. ');

    writeText.mockRejectedValueOnce(new Error('denied'));
    fireEvent.click(screen.getByTestId('claim-copy'));
    await waitFor(() => expect(screen.getByTestId('claim-copy-status').textContent).toContain('select the paragraph above'));
  });

  it('offers saving only when signed in', async () => {
    mockFetch({ ...signedOut, '/api/claim-checks': () => jsonResponse(200, resultFor(figures)) });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    fireEvent.click(screen.getByTestId('claim-run'));
    await screen.findByTestId('claim-result');
    expect(screen.getByTestId('claim-sign-in-to-save').textContent).toBe('Sign in to save this check and share it by link.');
    expect(screen.getByTestId('claim-sign-in').getAttribute('href')).toBe('/sign-in?next=%2Fcheck');
    expect(screen.queryByTestId('claim-save')).toBeNull();
    expect(screen.queryByText('Your saved checks')).toBeNull();
  });

  it('saves with the CSRF token, shows the share link, and lists and deletes saved checks', async () => {
    let list = [{ token, url: `http://127.0.0.1:8080/check/${token}`, createdAt: '2026-05-04T10:00:00.000Z', preview: pitch, topMatch: 'Thrust from microwaves in a closed cavity' }];
    const fetchMock = mockFetch({
      ...signedIn,
      '/api/claim-checks': () => jsonResponse(200, resultFor(figures)),
      '/api/claim-checks/saved': (init) => (init?.method === 'POST' ? jsonResponse(201, { saved: savedDto(true) }) : jsonResponse(200, { saved: list })),
      [`/api/claim-checks/saved/${token}`]: (init) => {
        expect(init?.method).toBe('DELETE');
        list = [];
        return { ok: true, status: 204, statusText: '', json: async () => undefined } as Response;
      },
    });
    const confirm = jest.spyOn(window, 'confirm').mockReturnValue(true);
    renderWithProviders(<ClaimCheckScreen />);
    expect(await screen.findByTestId(`claim-saved-${token}`)).toBeTruthy();
    paste(pitch);
    fireEvent.click(screen.getByTestId('claim-run'));
    fireEvent.click(await screen.findByTestId('claim-save'));
    expect((await screen.findByTestId('claim-share-url')).textContent).toBe(`http://127.0.0.1:8080/check/${token}`);
    const save = fetchMock.mock.calls.find(([p, init]) => p === '/api/claim-checks/saved' && init?.method === 'POST')!;
    expect((save[1]?.headers as Record<string, string>)['X-CSRF-Token']).toBe('csrf-2');
    expect(bodyOf(save[1])).toEqual({ text: pitch, style: 'apa' });

    fireEvent.click(screen.getByTestId(`claim-saved-${token}-delete`));
    expect(confirm).toHaveBeenCalled();
    expect(await screen.findByTestId('claim-saved-none')).toBeTruthy();
    confirm.mockRestore();
  });

  it("shows the server's message for a text over the limit (413)", async () => {
    const message = 'The text is 20,001 characters long; the claim check takes at most 20,000.';
    mockFetch({
      ...signedOut,
      '/api/claim-checks': () => jsonResponse(413, { error: { code: 'text_too_long', message, fields: { 'body.text': 'at most 20000 characters' } } }),
    });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    fireEvent.click(screen.getByTestId('claim-run'));
    const notice = await screen.findByTestId('claim-error');
    expect(notice.getAttribute('role')).toBe('alert');
    expect(notice.textContent).toContain(message);
    expect(notice.textContent).toContain('text_too_long, HTTP 413');
    expect(screen.getByTestId('claim-text-error').textContent).toBe('at most 20000 characters');
  });

  it("puts the server's objection to a figure (400) beside that figure, and keeps the result", async () => {
    mockFetch({
      ...signedOut,
      '/api/claim-checks': (init) =>
        bodyOf(init).figures
          ? jsonResponse(400, {
              error: { code: 'invalid_figure', message: 'Check body.figures.1.quantity: an invented objection to "3 N".', fields: { 'body.figures.1.quantity': 'an invented objection to "3 N"' } },
            })
          : jsonResponse(200, resultFor(figures)),
    });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    fireEvent.click(screen.getByTestId('claim-run'));
    await screen.findByTestId('claim-figure-f2');
    // With the first figure removed, index 1 of what is sent is the added figure, not f2.
    fireEvent.click(screen.getByTestId('claim-figure-add'));
    fireEvent.change(screen.getByTestId('claim-figure-new-1-quantity'), { target: { value: '3 N' } });
    fireEvent.click(screen.getByTestId('claim-figure-f1-remove'));
    fireEvent.click(screen.getByTestId('claim-rerun'));
    const error = await screen.findByTestId('claim-figure-new-1-error');
    expect(error.textContent).toBe('an invented objection to "3 N"');
    expect(within(screen.getByTestId('claim-figure-new-1')).getByTestId('claim-figure-new-1-error')).toBeTruthy();
    expect(screen.queryByTestId('claim-figure-f2-error')).toBeNull();
    expect(screen.getByTestId('claim-error').textContent).toContain('invalid_figure, HTTP 400');
    expect(screen.getByTestId('claim-check-photon-bound')).toBeTruthy();
  });

  it('opens a saved check to re-run it', async () => {
    mockFetch({ ...signedOut, [`/api/claim-checks/saved/${token}`]: () => jsonResponse(200, { saved: savedDto(false) }) });
    renderWithProviders(<ClaimCheckScreen from={token} />);
    expect(await screen.findByTestId('claim-result')).toBeTruthy();
    expect((screen.getByTestId('claim-text') as HTMLTextAreaElement).value).toBe(pitch);
    expect(screen.getByTestId('claim-paragraph').textContent).toContain('(saved)');
  });
});
