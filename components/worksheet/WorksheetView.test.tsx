import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { worksheetSchema, type Worksheet } from '@/shared/worksheet/schema';
import { setPathname } from '../testing/expoRouter';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { WorksheetScreen } from './WorksheetScreen';
import { WorksheetView } from './WorksheetView';

const mockSetParams = jest.fn();
jest.mock('expo-router', () => ({
  ...jest.requireActual('../testing/expoRouter'),
  router: { setParams: (params: unknown) => mockSetParams(params) },
}));

// c = 299 792 458 m/s exactly (BIPM SI Brochure, 9th ed., 2019).
const c = 299_792_458;

/** A small worksheet of our own: the photon bound by hand, with one deliberate slip of dimension. */
const sheet: Worksheet = worksheetSchema.parse({
  name: 'photon-sheet',
  title: 'Photon bound by hand',
  summary: 'The photon-rocket bound, worked as steps.',
  inputs: [
    { name: 'P', label: 'Radiated power', unit: 'kW', default: '1 kW' },
    { name: 'F', label: 'Claimed thrust', unit: 'mN', default: '1 mN' },
  ],
  steps: [
    { name: 'F_bound', label: 'Photon bound', expression: 'P / c', unit: 'uN' },
    { name: 'ratio', label: 'Claim over bound', expression: 'F / F_bound' },
    { name: 'slip', label: 'A slip', expression: 'P + F' },
  ],
  checks: [
    {
      name: 'within',
      label: 'Within the bound',
      condition: 'F <= F_bound',
      holds: 'Within the bound: {ratio} of it',
      fails: 'The claim is {ratio} times the bound',
    },
  ],
  plots: [
    {
      name: 'bound_sweep',
      label: 'Bound against power',
      sweep: { input: 'P', from: '1 W', to: '1 MW', points: 7, scale: 'log' },
      series: ['F_bound'],
      yScale: 'log',
    },
  ],
});

const si = (testID: string) => Number(screen.getByTestId(testID).getAttribute('data-si'));
const relClose = (a: number, b: number) => Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));
const type = (testID: string, text: string) => fireEvent.change(screen.getByTestId(testID), { target: { value: text } });

beforeEach(() => {
  mockSetParams.mockClear();
  setWindowWidth(390);
});

describe('WorksheetView', () => {
  it('evaluates every step, and shows a dimension error at the step that made it', () => {
    render(<WorksheetView worksheet={sheet} />);
    expect(relClose(si('step-F_bound'), 1000 / c)).toBe(true);
    expect(relClose(si('step-ratio'), 1e-3 / (1000 / c))).toBe(true);

    // The slip has no value, and its error stands in its own row, named by its label.
    expect(screen.queryByTestId('step-slip')).toBeNull();
    const error = screen.getByTestId('step-slip-error');
    expect(error.textContent).toMatch(/cannot add a power .* and a force/);
    const row = error.closest('[role="listitem"]') as HTMLElement;
    expect(within(row).getByText('A slip')).toBeTruthy();
    expect(within(row).queryByTestId('step-ratio')).toBeNull();
    expect(screen.getByTestId('worksheet-incomplete')).toBeTruthy();

    const check = screen.getByTestId('wcheck-within');
    expect(check.getAttribute('data-holds')).toBe('false');
    expect(check.textContent).toContain('Does not hold · Within the bound');
    expect(check.textContent).toContain('The claim is 299.8 times the bound');
  });

  it('re-evaluates as an input changes and reports the settled inputs', async () => {
    const onValuesChange = jest.fn();
    render(<WorksheetView worksheet={sheet} onValuesChange={onValuesChange} />);
    type('input-P', '2 kW');
    await waitFor(() => expect(relClose(si('step-F_bound'), 2000 / c)).toBe(true));
    expect(onValuesChange).toHaveBeenLastCalledWith({ P: '2 kW', F: '1 mN' });

    // Enough power for the claim to fit under the bound.
    type('input-P', '1 GW');
    await waitFor(() => expect(screen.getByTestId('wcheck-within').getAttribute('data-holds')).toBe('true'));
  });

  it('shows an input that cannot be read at its field', async () => {
    render(<WorksheetView worksheet={sheet} />);
    type('input-P', '2 kWh');
    const error = await screen.findByTestId('input-P-error');
    expect(error.textContent).toContain('is an energy');
    expect(within(error.parentElement!).getByTestId('input-P')).toBeTruthy();
    expect(screen.queryByTestId('input-F-error')).toBeNull();
    expect(screen.queryByTestId('step-F_bound')).toBeNull();
  });

  it('labels names, prints symbols and writes powers of ten as print does', async () => {
    render(<WorksheetView worksheet={sheet} />);
    // P / c for 1 kW is 3.336 µN (c exact, SI Brochure 9th ed.); typed as 1e-9 W the bound is below the
    // step's µN prefixes and shows in scientific form: 1e-9 / c = 3.336 × 10⁻¹⁸ N.
    type('input-P', '1e-9 W');
    await waitFor(() => expect(relClose(si('step-F_bound'), 1e-9 / c)).toBe(true));
    const value = screen.getByTestId('step-F_bound').textContent!;
    expect(value).not.toMatch(/\^|e-\d/);
    expect(value).toMatch(/× 10[⁰¹²³⁴⁵⁶⁷⁸⁹⁻]+/);
    // The step's row: its label, its name as a symbol (F with the subscript "bound"), the formula with symbols.
    const row = screen.getByTestId('step-F_bound').closest('[role="listitem"]') as HTMLElement;
    expect(within(row).getAllByLabelText('F bound').length).toBeGreaterThan(0);
    expect(row.textContent).toContain('Photon bound, Fbound');
    // The slip's message names the step by its label, with the dimensions in words.
    const slip = screen.getByTestId('step-slip-error').textContent!;
    expect(slip).toMatch(/^A slip \(slip\): cannot add a power \(watts\) and a force \(newtons\)/);
    expect(screen.getByLabelText('Radiated power, P')).toBeTruthy();
  });

  it('starts from the values it is given and plots its sweep', () => {
    render(<WorksheetView worksheet={sheet} initialValues={{ F: '1 uN' }} />);
    expect((screen.getByTestId('input-F') as HTMLInputElement).value).toBe('1 uN');
    expect((screen.getByTestId('input-P') as HTMLInputElement).value).toBe('1 kW');
    expect(screen.getByTestId('wcheck-within').getAttribute('data-holds')).toBe('true');
    const path = screen.getByTestId('plot-bound_sweep-series-F_bound');
    expect(path.getAttribute('d')!.match(/[\d.]+,[\d.]+/g)).toHaveLength(7);
  });
});

describe('WorksheetScreen', () => {
  it('fetches the worksheet, fills it from the address and keeps the permalink and address in step', async () => {
    setPathname('/worksheets/photon-sheet');
    mockFetch({ '/api/worksheets/photon-sheet': () => jsonResponse(200, { worksheet: sheet }) });
    renderWithProviders(<WorksheetScreen name="photon-sheet" query={{ P: '3 kW' }} />);
    expect(screen.getByTestId('worksheet-loading')).toBeTruthy();
    await screen.findByText('Photon bound by hand');
    expect(relClose(si('step-F_bound'), 3000 / c)).toBe(true);
    expect(screen.getByTestId('permalink-url').textContent).toBe('http://localhost/worksheets/photon-sheet?P=3%20kW&F=1%20mN');
    expect(mockSetParams).not.toHaveBeenCalled();

    type('input-F', '5 mN');
    await waitFor(() => expect(mockSetParams).toHaveBeenLastCalledWith({ P: '3 kW', F: '5 mN' }));
    expect(screen.getByTestId('permalink-url').textContent).toBe('http://localhost/worksheets/photon-sheet?P=3%20kW&F=5%20mN');
  });

  it('says so when there is no such worksheet', async () => {
    mockFetch({
      '/api/worksheets/nothing': () =>
        jsonResponse(404, { error: { code: 'unknown_worksheet', message: 'There is no starter worksheet "nothing".' } }),
    });
    renderWithProviders(<WorksheetScreen name="nothing" query={{}} />);
    expect((await screen.findByTestId('worksheet-not-found')).textContent).toContain('no starter worksheet called nothing');
    expect(screen.getByTestId('worksheet-back').getAttribute('href')).toBe('/checks');
  });
});
