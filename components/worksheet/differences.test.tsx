/**
 * Issue 12, correction 6 on the screens: where a reader types a temperature difference (a rise, a ΔT),
 * "2 degC" is read as 2 K, not 275.15 K — on a check's screen, in a worksheet, and in the worksheet
 * editor, which lets an editor mark an input as a difference. On the code before the correction the
 * check screen read "2 degC" of rise as 275.15 K (a thermal drift 137.6 times too large), and neither
 * the hint nor the editor knew of differences.
 */
import { fireEvent, render, screen, within } from '@testing-library/react';
import { useState } from 'react';
import { CheckScreen } from '../checks/CheckScreen';
import { WorksheetEditor } from '../desk/WorksheetEditor';
import { setPathname } from '../testing/expoRouter';
import { worksheetSchema, type Worksheet } from '@/shared/worksheet/schema';
import { WorksheetView } from './WorksheetView';

jest.mock('expo-router', () => ({
  ...jest.requireActual('../testing/expoRouter'),
  router: { setParams: () => undefined },
}));

// A Celsius interval equals a kelvin interval (BIPM SI Brochure, 9th ed., 2019, 2.3.1); a Fahrenheit
// interval is 5/9 K (NIST SP 811 (2008), App. B.9), so 3.6 °F of rise is 2 K.
const si = (testID: string) => Number(screen.getByTestId(testID).getAttribute('data-si'));

describe('a check screen with a temperature rise', () => {
  beforeEach(() => setPathname('/checks/artifact-budget'));

  it.each(['2 degC', '2 K', '3.6 degF'])('reads %s of rise as 2 K: 2 µN of drift at 1 µN/K', (dT) => {
    render(<CheckScreen name="artifact-budget" query={{ dT, k_drift: '1 uN/K' }} />);
    expect(si('output-F_thermal')).toBeCloseTo(2e-6, 15);
    if (dT !== '2 K') expect(screen.getByTestId('input-dT-reading').textContent).toBe('Read as 2 K');
  });

  it('says in the hint that °C and °F count only their size there, and not for an absolute temperature', () => {
    render(<CheckScreen name="artifact-budget" query={{}} />);
    const hint = (name: string) =>
      screen
        .getByTestId(`input-${name}`)
        .getAttribute('aria-describedby')!
        .split(' ')
        .map((id) => document.getElementById(id)?.textContent)
        .join(' ');
    expect(hint('dT')).toContain('A difference: °C and °F count only their size (2 °C of rise is 2 K, 3.6 °F is 2 K).');
    expect(hint('I')).not.toContain('A difference');
  });
});

describe('a worksheet with a difference input', () => {
  const sheet: Worksheet = worksheetSchema.parse({
    name: 'warming',
    title: 'Warming of a balance',
    inputs: [
      { name: 'dT', label: 'Temperature rise', unit: 'degC', kind: 'difference', default: '2 degC' },
      { name: 'k', label: 'Drift per kelvin', unit: 'uN/K', default: '1 uN/K' },
    ],
    steps: [{ name: 'F', label: 'Apparent force', expression: 'k * dT', unit: 'uN' }],
  });

  it('computes with 2 K for "2 degC" and "3.6 degF", and the hint says it is a difference', () => {
    render(<WorksheetView worksheet={sheet} initialValues={{ dT: '3.6 degF' }} />);
    expect(si('step-F')).toBeCloseTo(2e-6, 15);
    expect(screen.getByTestId('input-dT-reading').textContent).toBe('Read as 2 °C');
    const described = screen.getByTestId('input-dT').getAttribute('aria-describedby')!;
    expect(described.split(' ').map((id) => document.getElementById(id)?.textContent).join(' ')).toContain('A difference');
  });
});

describe('the worksheet editor', () => {
  function Harness({ emitted }: { emitted: Worksheet[][] }) {
    const [value, setValue] = useState<Worksheet[]>([
      {
        name: 'warming',
        title: 'Warming',
        inputs: [{ name: 'dT', label: 'Temperature rise', unit: 'degC', default: '2 degC' }],
        steps: [{ name: 'dT_K', label: 'Rise in kelvins', expression: 'dT', unit: 'K' }],
        checks: [],
        plots: [],
      },
    ]);
    return (
      <WorksheetEditor
        value={value}
        onChange={(next) => {
          emitted.push(next);
          setValue(next);
        }}
      />
    );
  }

  it('marks an input as a difference: the step then reads 2 K instead of 275.1 K, and an unknown kind is refused', () => {
    const emitted: Worksheet[][] = [];
    render(<Harness emitted={emitted} />);
    const kind = within(screen.getByTestId('ws-0-input-0-kind')).getByTestId('editor-field-ws-0-input-0-kind');
    expect(screen.getByTestId('ws-0-step-0-value').textContent).toBe('= 275.1 K');
    fireEvent.change(kind, { target: { value: 'difference' } });
    expect(emitted.at(-1)?.[0].inputs[0].kind).toBe('difference');
    expect(screen.getByTestId('ws-0-step-0-value').textContent).toBe('= 2 K');
    fireEvent.change(kind, { target: { value: 'rise' } });
    expect(within(screen.getByTestId('ws-0-input-0-kind')).getByText('Either "absolute" or "difference" (for a rise or a ΔT).')).toBeTruthy();
  });
});
