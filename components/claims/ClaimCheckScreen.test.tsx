import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { CLAIM_TEXT_MAX, PARAGRAPH_VARIANT_LABEL } from '@/shared/claims/types';
import { formatQuantity } from '@/shared/worksheet/quantity';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { colors } from '../theme';
import type { ClaimCheckRequest } from '@/shared/api-types';
import { ClaimCheckScreen, RERUN_DELAY_MS } from './ClaimCheckScreen';
import { figure, figures, heatPumpFigures, heatPumpText, LBF, pitch, resultFor, token, savedResponse } from './fixtures';

const mockPush = jest.fn();
jest.mock('expo-router', () => ({
  ...jest.requireActual('../testing/expoRouter'),
  router: { push: (href: string) => mockPush(href), replace: (href: string) => mockPush(href) },
}));

// c = 299 792 458 m/s exactly (BIPM SI Brochure, 9th ed., 2019, the defining constants).
const c = 299_792_458;
const relClose = (a: number, b: number) => Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));
const si = (testID: string, attr = 'data-si') => Number(screen.getByTestId(testID).getAttribute(attr));

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
const ctrlEnter = (mod: 'ctrlKey' | 'metaKey' = 'ctrlKey') => fireEvent.keyDown(screen.getByTestId('claim-text'), { key: 'Enter', [mod]: true });
/**
 * Lets time pass (the debounce of the figures) as a reader pausing would: the tests run on jest's fake
 * clock, so this moves it on by exactly `ms` (no real waiting, and a negative check after it is exact).
 */
const pause = (ms: number) =>
  act(async () => {
    jest.advanceTimersByTime(ms);
  });
const checkCalls = (fetchMock: jest.Mock) => fetchMock.mock.calls.filter(([p]) => p === '/api/claim-checks');
/** Answers the claim check from the request: the figures sent (read as the server would) or the pitch's own. */
const answer = (init?: RequestInit) => {
  const body = bodyOf(init);
  return jsonResponse(200, resultFor(figures, body.style, body.figures ? 'again' : 'first', body.variant));
};

// The figures' debounce runs on jest's fake clock (testing-library's waitFor moves it along too).
jest.setTimeout(30_000);

afterEach(() => {
  jest.useRealTimers();
});

beforeEach(() => {
  jest.useFakeTimers();
  setWindowWidth(390);
  mockPush.mockClear();
  window.sessionStorage.clear();
});

describe('ClaimCheckScreen', () => {
  it('counts the characters, says how to run it from the keyboard, and refuses a text over the limit before anything is sent', () => {
    const fetchMock = mockFetch(signedOut);
    renderWithProviders(<ClaimCheckScreen />);
    const run = screen.getByTestId('claim-run');
    expect(run.getAttribute('aria-disabled')).toBe('true');
    expect(screen.getByTestId('claim-text-hint').textContent).toBe('Ctrl+Enter (⌘+Enter on a Mac) runs the check from the text box.');
    expect(screen.getByTestId('claim-text').getAttribute('aria-describedby')).toContain(screen.getByTestId('claim-text-hint').id);
    paste(pitch);
    expect(screen.getByTestId('claim-text-count').textContent).toBe(`${pitch.length} of 20,000 characters`);
    expect(run.getAttribute('aria-disabled')).not.toBe('true');

    paste('x'.repeat(CLAIM_TEXT_MAX + 12));
    expect(screen.getByTestId('claim-text-count').textContent).toBe('20,012 of 20,000 characters');
    expect(screen.getByTestId('claim-text-too-long').textContent).toContain('12 characters over the limit');
    expect(screen.getByTestId('claim-text').getAttribute('aria-invalid')).toBe('true');
    expect(run.getAttribute('aria-disabled')).toBe('true');
    fireEvent.click(run);
    ctrlEnter();
    expect(checkCalls(fetchMock)).toHaveLength(0);
    expect(screen.getByTestId('claim-caution').textContent).toContain('not the people making it');
  });

  it('runs on Ctrl+Enter and on Cmd+Enter, not on Enter alone', async () => {
    const fetchMock = mockFetch({ ...signedOut, '/api/claim-checks': answer });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    fireEvent.keyDown(screen.getByTestId('claim-text'), { key: 'Enter' });
    expect(checkCalls(fetchMock)).toHaveLength(0);
    ctrlEnter();
    await screen.findByTestId('claim-result');
    expect(checkCalls(fetchMock)).toHaveLength(1);
    expect(bodyOf(checkCalls(fetchMock)[0][1])).toEqual({ text: pitch, style: 'apa', variant: 'referee' });
    await waitFor(() => expect(screen.getByTestId('claim-run').getAttribute('aria-busy')).toBeNull());
    ctrlEnter('metaKey');
    await waitFor(() => expect(checkCalls(fetchMock)).toHaveLength(2));
  });

  it('puts the paragraph first, then the entries, figures with range and hedge, findings in words, and what the text does not give', async () => {
    const fetchMock = mockFetch({ ...signedOut, '/api/claim-checks': answer });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    fireEvent.click(screen.getByTestId('claim-run'));
    await screen.findByTestId('claim-result');
    const call = checkCalls(fetchMock)[0];
    expect(call[1]?.method).toBe('POST');
    expect(headings()).toEqual([
      'Paragraph to paste',
      'Matching entries',
      'Figures found',
      'Checks run',
      'Needs a figure the text does not give',
      'Save and share',
    ]);
    expect(screen.getByTestId('claim-status').getAttribute('role')).toBe('status');
    expect(screen.getByTestId('claim-status').textContent).toBe(
      '2 entries matched, 2 figures found, 1 check run, 1 check needs a figure the text does not give.',
    );

    // The paragraph: the referee report to start with, its references, one copy button.
    expect(screen.getByTestId('claim-variant-referee').getAttribute('aria-checked')).toBe('true');
    expect(screen.getByTestId('claim-paragraph-body').textContent).toContain(`(first, ${PARAGRAPH_VARIANT_LABEL.referee})`);
    expect(screen.getByTestId('claim-paragraph').textContent).toContain('/entries/resonant-cavity-thruster/v/1');
    expect(screen.getByTestId('claim-reference-1').textContent).toBe('1. Counterweight. (2026). Thrust from microwaves in a closed cavity (Version 1).');
    expect(screen.getAllByRole('button').filter((b) => /^Copy/.test(b.textContent ?? ''))).toHaveLength(1);
    expect(screen.getByTestId('claim-notes').textContent).toContain('Invented note');

    // Matching entries: the permanent version, the words that matched, best first.
    expect(screen.getByTestId('claim-match-resonant-cavity-thruster-link').getAttribute('href')).toBe('/entries/resonant-cavity-thruster/v/1');
    expect(screen.getByTestId('claim-match-resonant-cavity-thruster-words').textContent).toBe('Words that matched: sealed, cavity, microwaves');
    const items = within(screen.getByTestId('claim-matches')).getAllByRole('listitem');
    expect(items.map((i) => i.getAttribute('data-testid'))).toEqual(['claim-match-resonant-cavity-thruster', 'claim-match-photon-rocket']);

    // Figures: as written, the range in SI with both ends, the hedge, kind and role.
    expect((screen.getByTestId('claim-figure-f2-quantity') as HTMLInputElement).value).toBe('0.1 lbf');
    expect((screen.getByTestId('claim-figure-f2-upper') as HTMLInputElement).value).toBe('0.2 lbf');
    expect(relClose(si('claim-figure-f2-si'), 0.1 * LBF)).toBe(true);
    expect(relClose(si('claim-figure-f2-si', 'data-upper-si'), 0.2 * LBF)).toBe(true);
    const [lo, hi] = [formatQuantity(0.1 * LBF, 'N'), formatQuantity(0.2 * LBF, 'N')];
    expect(lo.endsWith(' mN') && hi.endsWith(' mN')).toBe(true);
    expect(screen.getByTestId('claim-figure-f2-si').textContent).toBe(`${lo.replace(' mN', '')}–${hi}`);
    expect(figures[1].text).toMatch(/^0\.1–0\.2 lbf/);
    expect(screen.getByTestId('claim-figure-f2').textContent).toContain(`As written: ${figures[1].text}`);
    expect(screen.getByTestId('claim-figure-f2').textContent).toContain('Thrust (force) · a range');
    expect(screen.getByTestId('claim-figure-f1-hedge').textContent).toContain('Said as “up to”');
    expect(screen.getByTestId('claim-figure-f1-role-in').getAttribute('aria-checked')).toBe('true');

    // The check run: its finding in words, its sentence, the outputs, the range end used, a link.
    expect(screen.getByTestId('claim-check-photon-bound-finding-words').textContent).toBe('Breaks conservation of linear momentum');
    expect(screen.getByTestId('claim-check-photon-bound-finding').getAttribute('data-finding')).toBe('breaks');
    const ratio = (0.1 * LBF) / (1500 / c);
    expect(relClose(si('claim-check-photon-bound-output-F_bound'), 1500 / c)).toBe(true);
    expect(relClose(si('claim-check-photon-bound-output-ratio'), ratio)).toBe(true);
    const planned = resultFor(figures);
    // The planner's sentence, without the finding it opens with (the line above says it).
    const sentence = screen.getByTestId('claim-check-photon-bound-sentence').textContent!;
    expect(sentence.length).toBeGreaterThan(20);
    expect(planned.checks[0].sentence.toLowerCase()).toContain(sentence.toLowerCase());
    expect(sentence).not.toMatch(/^(Conflicts|Consistent) with/);
    expect(screen.getByTestId('claim-check-photon-bound-output-ratio').textContent).not.toContain('^');
    // The range end the planner used, said under the check.
    expect(screen.getByTestId('claim-check-photon-bound-assumptions').textContent).toContain('most favourable to the claim');
    expect(screen.getByTestId('claim-check-photon-bound-explore').getAttribute('href')).toBe('/checks/photon-bound?F_claimed=0.1%20lbf&P=1.5%20kW');

    // A check that needs a figure the text does not give: listed plainly, never run, no finding.
    const need = planned.needs.find((n) => n.check === 'break-even-speed')!;
    expect(need.missing.length).toBeGreaterThan(0);
    expect(screen.getByTestId('claim-need-break-even-speed-missing').textContent).toBe(
      `Needs a figure the text does not give: ${need.missing.join('; ')}.`,
    );
    expect(screen.queryByTestId('claim-check-break-even-speed')).toBeNull();

    // Where in the text: each figure marked at its offsets.
    fireEvent.click(screen.getByTestId('claim-where-toggle'));
    expect(screen.getByTestId('claim-where').textContent).toBe(pitch.replace('1.5 kW', '1.5 kW [f1]').replace(figures[1].text, `${figures[1].text} [f2]`));
  });

  it('tells a claim within its bound as consistent with the law, with the same neutral mark', async () => {
    mockFetch({ ...signedOut, '/api/claim-checks': () => jsonResponse(200, resultFor(heatPumpFigures, 'apa', 'first', 'referee', heatPumpText)) });
    renderWithProviders(<ClaimCheckScreen />);
    paste(heatPumpText);
    ctrlEnter();
    const finding = await screen.findByTestId('claim-check-carnot-finding');
    expect(screen.getByTestId('claim-check-carnot-finding-words').textContent).toBe('Consistent with the second law of thermodynamics');
    expect(finding.getAttribute('data-finding')).toBe('consistent');
    expect(finding.getAttribute('data-holds')).toBe('true');
    // Bound Th/(Th − Tc) = 308.15/30 ≈ 10.27 > 3.5 (the kit's own number is in the sentence).
    expect(relClose(si('claim-check-carnot-output-cop_heating_max'), 308.15 / 30)).toBe(true);
    expect(screen.getByTestId('claim-figure-f1-assumption').textContent).toContain(heatPumpFigures[0].assumption!);
    expect(heatPumpFigures[0].assumption).toContain('heating COP');
    // The mark is drawn in graphite, whatever the finding: no colour code.
    const strokes = Array.from(finding.querySelectorAll('[stroke]')).map((el) => el.getAttribute('stroke'));
    expect(strokes.length).toBeGreaterThan(0);
    expect(new Set(strokes)).toEqual(new Set([colors.ink]));
    expect(screen.queryByText('Needs a figure the text does not give')).toBeNull();
  });

  it('switches the variant at once from the result, copies the one shown, and re-runs for another reference style', async () => {
    const writeText = jest.fn().mockResolvedValue(undefined);
    Object.defineProperty(navigator, 'clipboard', { configurable: true, value: { writeText } });
    const fetchMock = mockFetch({ ...signedOut, '/api/claim-checks': answer });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    ctrlEnter();
    await screen.findByTestId('claim-result');

    fireEvent.click(screen.getByTestId('claim-variant-examiner'));
    expect(screen.getByTestId('claim-variant-examiner').getAttribute('aria-checked')).toBe('true');
    expect(screen.getByTestId('claim-paragraph-body').textContent).toContain(PARAGRAPH_VARIANT_LABEL.examiner);
    expect(screen.getByTestId('claim-paragraph').getAttribute('data-variant')).toBe('examiner');
    expect(checkCalls(fetchMock)).toHaveLength(1);

    fireEvent.click(screen.getByTestId('claim-copy'));
    await waitFor(() => expect(screen.getByTestId('claim-copy-status').textContent).toBe('Copied.'));
    const shown = resultFor(figures, 'apa', 'first');
    expect(writeText).toHaveBeenCalledWith(shown.paragraphs.examiner.text);
    expect(writeText.mock.calls[0][0]).toContain('\n\nReferences\n1. ');
    writeText.mockRejectedValueOnce(new Error('denied'));
    fireEvent.click(screen.getByTestId('claim-copy'));
    await waitFor(() => expect(screen.getByTestId('claim-copy-status').textContent).toContain('select the paragraph above'));

    fireEvent.click(screen.getByTestId('claim-style-vancouver'));
    await waitFor(() => expect(checkCalls(fetchMock)).toHaveLength(2));
    expect(bodyOf(checkCalls(fetchMock)[1][1])).toEqual({ text: pitch, style: 'vancouver', variant: 'examiner' });
    await waitFor(() => expect(screen.getByTestId('claim-paragraph').getAttribute('data-style')).toBe('vancouver'));
    expect(screen.getByTestId('claim-reference-1').textContent).toContain('[Version 1]');
    expect(screen.getByTestId('claim-paragraph').getAttribute('data-variant')).toBe('examiner');
  });

  it('re-runs by itself once the reader stops fixing a figure, keeping the previous result in view until the new one arrives', async () => {
    let release: (r: Response) => void = () => undefined;
    const fetchMock = mockFetch({
      ...signedOut,
      '/api/claim-checks': (init) => (bodyOf(init).figures ? new Promise<Response>((resolve) => (release = resolve)) : answer(init)),
    });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    ctrlEnter();
    await screen.findByTestId('claim-figure-f2');
    expect(screen.queryByTestId('claim-rerun')).toBeNull();

    // Several quick changes: the thrust retyped as a single value, the power's role cleared.
    fireEvent.change(screen.getByTestId('claim-figure-f2-quantity'), { target: { value: '2' } });
    fireEvent.change(screen.getByTestId('claim-figure-f2-quantity'), { target: { value: '20 mN' } });
    fireEvent.change(screen.getByTestId('claim-figure-f2-upper'), { target: { value: '' } });
    expect(relClose(si('claim-figure-f2-si'), 0.02)).toBe(true);
    expect(screen.getByTestId('claim-figure-f2-changed')).toBeTruthy();
    fireEvent.click(screen.getByTestId('claim-figure-f1-role-none'));
    expect(checkCalls(fetchMock)).toHaveLength(1);
    expect(screen.getByTestId('claim-status').textContent).toContain('as soon as you stop typing');

    // One request, after the pause, with the figures as fixed.
    await pause(RERUN_DELAY_MS + 150);
    await waitFor(() => expect(checkCalls(fetchMock)).toHaveLength(2));
    expect(bodyOf(checkCalls(fetchMock)[1][1])).toEqual({
      text: pitch,
      style: 'apa',
      variant: 'referee',
      figures: [
        { kind: 'power', quantity: '1.5 kW', role: null, text: '1.5 kW', start: figures[0].start, end: figures[0].end },
        { kind: 'thrust', quantity: '20 mN', role: null, text: figures[1].text, start: figures[1].start, end: figures[1].end },
      ],
    });
    expect(screen.getByTestId('claim-status').textContent).toContain('Running the checks again with 2 figures');
    expect(screen.getByTestId('claim-result').getAttribute('aria-busy')).toBe('true');
    expect(relClose(si('claim-check-photon-bound-output-ratio'), (0.1 * LBF) / (1500 / c))).toBe(true);

    const next = resultFor([{ ...figures[0], role: null }, figure({ id: 'f2', kind: 'thrust', quantity: '20 mN', si: 0.02, unit: 'N', text: figures[1].text, start: figures[1].start, end: figures[1].end })], 'apa', 'second');
    await act(async () => release(jsonResponse(200, next)));
    await waitFor(() => expect(relClose(si('claim-check-photon-bound-output-ratio'), 0.02 / (1500 / c))).toBe(true));
    expect(screen.queryByTestId('claim-figure-f2-changed')).toBeNull();
    expect(screen.getByTestId('claim-paragraph-body').textContent).toContain('(second,');
    // Nothing more is sent once the result is for the figures on screen.
    await pause(RERUN_DELAY_MS + 150);
    expect(checkCalls(fetchMock)).toHaveLength(2);
  });

  it('does not re-run the old figures while a new text is being checked', async () => {
    let release: (r: Response) => void = () => undefined;
    const other = `${pitch} It was also run for a week.`;
    const fetchMock = mockFetch({
      ...signedOut,
      '/api/claim-checks': (init) => (bodyOf(init).text === other ? new Promise<Response>((resolve) => (release = resolve)) : answer(init)),
    });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    ctrlEnter();
    await screen.findByTestId('claim-figure-f2');
    fireEvent.change(screen.getByTestId('claim-figure-f2-quantity'), { target: { value: '20 mN' } });
    paste(other);
    expect(screen.getByTestId('claim-text-changed')).toBeTruthy();
    ctrlEnter();
    await pause(RERUN_DELAY_MS + 150);
    expect(checkCalls(fetchMock).map(([, init]) => bodyOf(init))).toEqual([
      { text: pitch, style: 'apa', variant: 'referee' },
      { text: other, style: 'apa', variant: 'referee' },
    ]);
    expect(screen.getByTestId('claim-status').textContent).toContain('Checking the claim');
    await act(async () => release(jsonResponse(200, resultFor(figures, 'apa', 'other'))));
    await waitFor(() => expect(screen.getByTestId('claim-paragraph-body').textContent).toContain('(other,'));
    expect((screen.getByTestId('claim-figure-f2-quantity') as HTMLInputElement).value).toBe(figures[1].quantity);
    expect(screen.queryByTestId('claim-text-changed')).toBeNull();
    await pause(RERUN_DELAY_MS + 150);
    expect(checkCalls(fetchMock)).toHaveLength(2);
  });

  it('marks a figure that cannot be read at once and sends nothing until it is fixed; an added figure runs once typed', async () => {
    const fetchMock = mockFetch({ ...signedOut, '/api/claim-checks': answer });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    ctrlEnter();
    await screen.findByTestId('claim-figure-f2');

    // An upper end below the lower end, then a unit of the wrong kind: each said beside its field.
    fireEvent.change(screen.getByTestId('claim-figure-f2-upper'), { target: { value: '0.05 lbf' } });
    expect(screen.getByTestId('claim-figure-f2-upper-error').textContent).toMatch(/below the lower end.*swap them/);
    fireEvent.change(screen.getByTestId('claim-figure-f2-upper'), { target: { value: '0.3 lbf' } });
    fireEvent.change(screen.getByTestId('claim-figure-f2-quantity'), { target: { value: '12 W' } });
    expect(screen.getByTestId('claim-figure-f2-error').textContent).toMatch(/"12 W" is/);
    expect(screen.getByTestId('claim-figure-f2-quantity').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByTestId('claim-status').textContent).toContain('Fix the marked figure');
    await pause(RERUN_DELAY_MS + 150);
    expect(checkCalls(fetchMock)).toHaveLength(1);

    // Fixed: one request with both ends. Then a figure added by hand: nothing until it has a value.
    fireEvent.change(screen.getByTestId('claim-figure-f2-quantity'), { target: { value: '0.1 lbf' } });
    await pause(RERUN_DELAY_MS + 150);
    await waitFor(() => expect(checkCalls(fetchMock)).toHaveLength(2));
    expect(bodyOf(checkCalls(fetchMock)[1][1]).figures?.[1]).toMatchObject({ kind: 'thrust', quantity: '0.1 lbf', upper: '0.3 lbf' });
    await waitFor(() => expect(screen.getByTestId('claim-run').getAttribute('aria-busy')).toBeNull());

    fireEvent.click(screen.getByTestId('claim-figure-add'));
    expect(screen.queryByTestId('claim-figure-new-1-error')).toBeNull();
    fireEvent.click(screen.getByTestId('claim-figure-new-1-kind-mass'));
    expect(screen.getByTestId('claim-figure-new-1-role-wet')).toBeTruthy();
    await pause(RERUN_DELAY_MS + 150);
    expect(checkCalls(fetchMock)).toHaveLength(2);
    fireEvent.change(screen.getByTestId('claim-figure-new-1-quantity'), { target: { value: '12 kg' } });
    fireEvent.click(screen.getByTestId('claim-figure-new-1-role-dry'));
    await pause(RERUN_DELAY_MS + 150);
    await waitFor(() => expect(checkCalls(fetchMock)).toHaveLength(3));
    expect(bodyOf(checkCalls(fetchMock)[2][1]).figures?.[2]).toEqual({ kind: 'mass', quantity: '12 kg', role: 'dry' });

    // The kind of an extracted figure is changed behind "Change the kind".
    expect(screen.queryByTestId('claim-figure-f1-kind-energy')).toBeNull();
    fireEvent.click(screen.getByTestId('claim-figure-f1-kind-toggle'));
    fireEvent.click(screen.getByTestId('claim-figure-f1-kind-energy'));
    expect(screen.getByTestId('claim-figure-f1').textContent).toContain('Energy');
  });

  it("puts the server's objection to a figure (400) beside that figure and field, and keeps the result", async () => {
    mockFetch({
      ...signedOut,
      '/api/claim-checks': (init) =>
        bodyOf(init).figures
          ? jsonResponse(400, {
              error: {
                code: 'invalid_figure',
                message: 'Check body.figures.0.upper: an invented objection to "0.3 lbf".',
                fields: { 'body.figures.0.upper': 'an invented objection to "0.3 lbf"' },
              },
            })
          : answer(init),
    });
    renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    ctrlEnter();
    await screen.findByTestId('claim-figure-f2');
    // With the first figure removed, index 0 of what is sent is f2.
    fireEvent.click(screen.getByTestId('claim-figure-f1-remove'));
    fireEvent.change(screen.getByTestId('claim-figure-f2-upper'), { target: { value: '0.3 lbf' } });
    await pause(RERUN_DELAY_MS + 150);
    const error = await screen.findByTestId('claim-figure-f2-upper-error');
    expect(error.textContent).toBe('an invented objection to "0.3 lbf"');
    expect(within(screen.getByTestId('claim-figure-f2')).getByTestId('claim-figure-f2-upper-error')).toBeTruthy();
    expect(screen.queryByTestId('claim-figure-f2-error')).toBeNull();
    expect(screen.getByTestId('claim-error').textContent).toContain('invalid_figure, HTTP 400');
    expect(screen.getByTestId('claim-check-photon-bound')).toBeTruthy();
    // Retyped, the objection gives way to the live reading.
    fireEvent.change(screen.getByTestId('claim-figure-f2-upper'), { target: { value: '0.25 lbf' } });
    expect(screen.queryByTestId('claim-figure-f2-upper-error')).toBeNull();
  });

  it('signed out, Save keeps the check in this tab and goes to sign in; back signed in, the same check is there, saved, and forgotten', async () => {
    const first = mockFetch({ ...signedOut, '/api/claim-checks': answer });
    const view = renderWithProviders(<ClaimCheckScreen />);
    paste(pitch);
    ctrlEnter();
    await screen.findByTestId('claim-result');
    fireEvent.click(screen.getByTestId('claim-variant-grant'));
    // An unsent change of a figure is kept too.
    fireEvent.change(screen.getByTestId('claim-figure-f2-upper'), { target: { value: '0.25 lbf' } });
    expect(screen.getByTestId('claim-save').textContent).toBe('Sign in and save');
    fireEvent.click(screen.getByTestId('claim-save'));
    expect(mockPush).toHaveBeenCalledWith('/sign-in?next=%2Fcheck%3Fresume%3D1');
    const kept = window.sessionStorage.getItem('counterweight.claim-check.resume');
    expect(kept).toContain('Our sealed copper cavity');
    expect(checkCalls(first)).toHaveLength(1);
    view.unmount();

    const fetchMock = mockFetch({
      ...signedIn,
      '/api/claim-checks': answer,
      '/api/claim-checks/saved': (init) => (init?.method === 'POST' ? jsonResponse(201, savedResponse(true, 'grant')) : jsonResponse(200, { saved: [] })),
    });
    renderWithProviders(<ClaimCheckScreen resume />);
    expect((await screen.findByTestId('claim-resumed')).textContent).toContain('as you left it');
    expect((screen.getByTestId('claim-text') as HTMLTextAreaElement).value).toBe(pitch);
    expect(screen.getByTestId('claim-variant-grant').getAttribute('aria-checked')).toBe('true');
    expect(screen.getByTestId('claim-paragraph-body').textContent).toContain(`(first, ${PARAGRAPH_VARIANT_LABEL.grant})`);
    expect((screen.getByTestId('claim-figure-f2-upper') as HTMLInputElement).value).toBe('0.25 lbf');
    expect(screen.getByTestId('claim-check-photon-bound-finding-words').textContent).toBe('Breaks conservation of linear momentum');
    expect(screen.getByTestId('claim-save').textContent).toBe('Save and get a link');

    // The kept change of a figure runs the checks, as it would have before signing in.
    await pause(RERUN_DELAY_MS + 150);
    await waitFor(() => expect(checkCalls(fetchMock)).toHaveLength(1));
    const rerun = bodyOf(checkCalls(fetchMock)[0][1]);
    expect(rerun.figures?.[1]).toMatchObject({ kind: 'thrust', quantity: '0.1 lbf', upper: '0.25 lbf' });
    await waitFor(() => expect(screen.getByTestId('claim-paragraph-body').textContent).toContain(`(again, ${PARAGRAPH_VARIANT_LABEL.grant})`));

    fireEvent.click(screen.getByTestId('claim-save'));
    expect((await screen.findByTestId('claim-share-url')).textContent).toBe(`http://127.0.0.1:8080/check/${token}`);
    const save = fetchMock.mock.calls.find(([p, init]) => p === '/api/claim-checks/saved' && init?.method === 'POST')!;
    expect((save[1]?.headers as Record<string, string>)['X-CSRF-Token']).toBe('csrf-2');
    expect(bodyOf(save[1])).toEqual({ ...rerun, variant: 'grant' });
    expect(window.sessionStorage.getItem('counterweight.claim-check.resume')).toBeNull();
    expect(screen.queryByTestId('claim-resumed')).toBeNull();
  });

  it('says so when there is nothing to come back to', async () => {
    mockFetch(signedIn);
    window.sessionStorage.setItem('counterweight.claim-check.resume', '{"v":1,"text":42}');
    renderWithProviders(<ClaimCheckScreen resume />);
    expect((await screen.findByTestId('claim-resume-missing')).textContent).toContain('Paste the claim below');
    expect((screen.getByTestId('claim-text') as HTMLTextAreaElement).value).toBe('');
  });

  it('offers the way to saved checks to a reader before any result', async () => {
    mockFetch(signedOut);
    renderWithProviders(<ClaimCheckScreen />);
    expect(screen.getByTestId('claim-sign-in-to-save').textContent).toBe('Sign in to save this check and share it by link.');
    expect(screen.getByTestId('claim-sign-in').getAttribute('href')).toBe('/sign-in?next=%2Fcheck');
    expect(screen.queryByText('Your saved checks')).toBeNull();
  });

  it('lists and deletes saved checks when signed in', async () => {
    let list = [{ token, url: `http://127.0.0.1:8080/check/${token}`, createdAt: '2026-05-04T10:00:00.000Z', preview: pitch, topMatch: 'Thrust from microwaves in a closed cavity' }];
    mockFetch({
      ...signedIn,
      '/api/claim-checks/saved': () => jsonResponse(200, { saved: list }),
      [`/api/claim-checks/saved/${token}`]: (init) => {
        expect(init?.method).toBe('DELETE');
        list = [];
        return { ok: true, status: 204, statusText: '', json: async () => undefined } as Response;
      },
    });
    renderWithProviders(<ClaimCheckScreen />);
    expect(await screen.findByTestId(`claim-saved-${token}`)).toBeTruthy();
    fireEvent.click(screen.getByTestId(`claim-saved-${token}-delete`));
    fireEvent.click(await screen.findByTestId('confirm-dialog-accept'));
    expect(await screen.findByTestId('claim-saved-none')).toBeTruthy();
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

  it('opens a saved check to re-run it, in the variant it was saved with', async () => {
    mockFetch({ ...signedOut, [`/api/claim-checks/saved/${token}`]: () => jsonResponse(200, savedResponse(false, 'journalist')) });
    renderWithProviders(<ClaimCheckScreen from={token} />);
    expect(await screen.findByTestId('claim-result')).toBeTruthy();
    expect((screen.getByTestId('claim-text') as HTMLTextAreaElement).value).toBe(pitch);
    expect(screen.getByTestId('claim-variant-journalist').getAttribute('aria-checked')).toBe('true');
    expect(screen.getByTestId('claim-paragraph-body').textContent).toContain(`(saved, ${PARAGRAPH_VARIANT_LABEL.journalist})`);
  });
});
