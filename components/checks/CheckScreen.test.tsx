import { act, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { checks } from '@/shared/checks';
import { setPathname } from '../testing/expoRouter';
import { CheckScreen } from './CheckScreen';

const mockSetParams = jest.fn();
jest.mock('expo-router', () => ({
  ...jest.requireActual('../testing/expoRouter'),
  router: { setParams: (params: unknown) => mockSetParams(params) },
}));

// Outside references, not the kit's own constants:
// c = 299 792 458 m/s exactly (BIPM SI Brochure, 9th ed., 2019, the defining constants).
const c = 299_792_458;
// 1 lbf = 0.453 592 37 kg × 9.806 65 m/s² exactly (NIST SP 811, 2008, B.8 and note on lbf).
const lbf = 0.45359237 * 9.80665;

const si = (testID: string) => Number(screen.getByTestId(testID).getAttribute('data-si'));
const relClose = (a: number, b: number) => Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));
const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });

beforeEach(() => {
  mockSetParams.mockClear();
  setPathname('/checks/photon-bound');
});

describe('CheckScreen, photon-rocket bound', () => {
  it('computes the bound and the verdict from typed figures, and updates when one changes', async () => {
    render(<CheckScreen name="photon-bound" query={{ F_claimed: '0.2 lbf', P: '1.5 kW' }} />);
    expect(screen.getByTestId('screen-check-photon-bound')).toBeTruthy();
    expect((screen.getByTestId('input-F_claimed') as HTMLInputElement).value).toBe('0.2 lbf');

    expect(relClose(si('output-F_bound'), 1500 / c)).toBe(true);
    expect(relClose(si('output-ratio'), (0.2 * lbf) / (1500 / c))).toBe(true);
    // 0.89 N against 5 µN: far beyond what radiation can do.
    expect(screen.getByTestId('verdict').getAttribute('data-holds')).toBe('false');
    expect(screen.getByTestId('verdict').textContent).toContain('Does not hold');
    expect(screen.getByTestId('verdict').textContent).toContain('claimed thrust ≤ P/c');

    // 300 TW radiated bounds the thrust at about 1 MN: now the claim is within it.
    type('input-P', '300 TW');
    await waitFor(() => expect(relClose(si('output-F_bound'), 3e14 / c)).toBe(true));
    expect(relClose(si('output-ratio'), (0.2 * lbf) / (3e14 / c))).toBe(true);
    expect(screen.getByTestId('verdict').getAttribute('data-holds')).toBe('true');
    expect(screen.getByTestId('verdict').textContent).toContain('Holds');
  });

  it('shows a bad unit at its field, and no verdict or figures that no longer apply', async () => {
    render(<CheckScreen name="photon-bound" query={{}} />);
    expect(screen.getByTestId('verdict')).toBeTruthy();
    type('input-F_claimed', '3 kWh');
    const error = await screen.findByTestId('input-F_claimed-error');
    expect(error.textContent).toMatch(/^Claimed thrust: .+/);
    // Beside its own field: in the same field group as the input, not in the other field's.
    const field = error.parentElement!;
    expect(within(field).getByTestId('input-F_claimed')).toBeTruthy();
    expect(within(field).queryByTestId('input-P')).toBeNull();
    expect(screen.getByTestId('input-F_claimed').getAttribute('aria-invalid')).toBe('true');
    expect(screen.queryByTestId('input-P-error')).toBeNull();
    expect(screen.queryByTestId('verdict')).toBeNull();
    expect(screen.queryByTestId('output-F_bound')).toBeNull();
    expect(screen.getByTestId('check-invalid').textContent).toContain('No result until the marked figures are put right.');

    type('input-F_claimed', '3 mN');
    await waitFor(() => expect(screen.queryByTestId('input-F_claimed-error')).toBeNull());
    expect(screen.getByTestId('verdict')).toBeTruthy();
  });

  it('carries the inputs in its permalink and in the address once the reader types', async () => {
    render(<CheckScreen name="photon-bound" query={{ F_claimed: '0.2 lbf', P: '1.5 kW' }} />);
    expect(screen.getByTestId('permalink-url').textContent).toBe(
      'http://localhost/checks/photon-bound?F_claimed=0.2%20lbf&P=1.5%20kW',
    );
    // Opening a link leaves the address as it is (the address follows the inputs in an effect, and
    // render has run every effect by the time it returns; one more act lets any pending update land).
    await act(async () => {});
    expect(mockSetParams).not.toHaveBeenCalled();

    type('input-P', '2 kW');
    await waitFor(() =>
      expect(screen.getByTestId('permalink-url').textContent).toBe(
        'http://localhost/checks/photon-bound?F_claimed=0.2%20lbf&P=2%20kW',
      ),
    );
    expect(mockSetParams).toHaveBeenLastCalledWith({ F_claimed: '0.2 lbf', P: '2 kW' });

    // An emptied field falls back to its default and drops out of the link.
    type('input-P', '');
    await waitFor(() => expect(mockSetParams).toHaveBeenLastCalledWith({ F_claimed: '0.2 lbf', P: undefined }));
    expect(screen.getByTestId('permalink-url').textContent).toBe('http://localhost/checks/photon-bound?F_claimed=0.2%20lbf');
    expect(relClose(si('output-F_bound'), 1000 / c)).toBe(true);
  });

  it('copies the permalink', async () => {
    const writeText = jest.fn(async () => undefined);
    Object.defineProperty(navigator, 'clipboard', { configurable: true, value: { writeText } });
    render(<CheckScreen name="photon-bound" query={{ P: '1.5 kW' }} />);
    fireEvent.click(screen.getByTestId('permalink'));
    await waitFor(() => expect(screen.getByTestId('permalink-status').textContent).toBe('Copied.'));
    expect(writeText).toHaveBeenCalledWith('http://localhost/checks/photon-bound?F_claimed=1%20mN&P=1.5%20kW');
  });
});

describe('CheckScreen, other checks', () => {
  it('shows the cautions of a check that has them, deferring to local codes and licensed practice', () => {
    const def = checks['artifact-budget'];
    render(<CheckScreen name="artifact-budget" query={{}} />);
    const notice = screen.getByTestId('check-cautions');
    for (const caution of def.cautions) expect(notice.textContent).toContain(caution);
    expect(notice.textContent).toContain('Local codes and licensed practice come first.');
  });

  it("has no cautions notice where a check has none (Landauer's bound is pen and paper)", () => {
    render(<CheckScreen name="landauer" query={{}} />);
    expect(screen.queryByTestId('check-cautions')).toBeNull();
  });

  it('says so for a name that is not a check, with a way back', () => {
    render(<CheckScreen name="perpetual-wheel" query={{}} />);
    const root = screen.getByTestId('screen-check-not-found');
    expect(root.textContent).toContain('The kit has no check called perpetual-wheel.');
    expect(screen.getByTestId('check-not-found-back').getAttribute('href')).toBe('/checks');
  });
});
