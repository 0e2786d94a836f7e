import { fireEvent, render, screen, within } from '@testing-library/react';
import { useState } from 'react';
import { worksheetSchema, type Worksheet } from '@/shared/worksheet/schema';
import { WorksheetEditor } from './WorksheetEditor';

const start: Worksheet = {
  name: 'cavity-bound',
  title: 'The photon bound',
  inputs: [{ name: 'P', label: 'Microwave power', unit: 'kW', default: '3 kW' }],
  steps: [{ name: 'F_bound', label: 'Most thrust light can give', expression: 'P / c', unit: 'uN' }],
  checks: [],
  plots: [],
};

/** The editor as the entry editor holds it: controlled, every emitted value recorded. */
function Harness({ initial, emitted }: { initial: Worksheet[]; emitted: Worksheet[][] }) {
  const [value, setValue] = useState(initial);
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

const field = (testID: string) => within(screen.getByTestId(testID)).getByTestId(`editor-field-${testID}`);
const type = (testID: string, text: string) => fireEvent.change(field(testID), { target: { value: text } });

describe('WorksheetEditor', () => {
  it('updates the live value when a step is added with an expression', () => {
    render(<Harness initial={[start]} emitted={[]} />);
    expect(screen.getByTestId('ws-0-step-0-value').textContent).toBe('= 10.01 µN');

    fireEvent.click(screen.getByTestId('ws-0-add-step'));
    type('ws-0-step-1-name', 'F_double');
    type('ws-0-step-1-label', 'Twice the bound');
    type('ws-0-step-1-expression', '2 * F_bound');
    type('ws-0-step-1-unit', 'uN');
    expect(screen.getByTestId('ws-0-step-1-value').textContent).toBe('= 20.01 µN');
    // 3 kW / c is 10.007 µN. The worksheet runs below with the new step.
    const run = screen.getByTestId('ws-0-run');
    expect(within(run).getByTestId('step-F_double').textContent).toBe('20.01 µN');

    type('ws-0-input-0-default', '6 kW');
    expect(screen.getByTestId('ws-0-step-1-value').textContent).toBe('= 40.03 µN');
  });

  it('shows a dimension error at that step', () => {
    render(<Harness initial={[start]} emitted={[]} />);
    fireEvent.click(screen.getByTestId('ws-0-add-step'));
    type('ws-0-step-1-name', 'nonsense');
    type('ws-0-step-1-label', 'Power plus thrust');
    type('ws-0-step-1-expression', 'P + F_bound');
    const readout = screen.getByTestId('ws-0-step-1-value');
    expect(readout.textContent).toContain('nonsense');
    expect(readout.textContent).toMatch(/dimension|cannot|unit/i);
    // The step before it still has its value, and the run below shows the error at the same step.
    expect(screen.getByTestId('ws-0-step-0-value').textContent).toMatch(/^= /);
    expect(within(screen.getByTestId('ws-0-run')).getByTestId('step-nonsense-error').textContent).toBe(readout.textContent);
  });

  it('shows the schema message beside a bad name', () => {
    render(<Harness initial={[start]} emitted={[]} />);
    type('ws-0-name', 'Cavity Bound');
    expect(within(screen.getByTestId('ws-0-name')).getByTestId('editor-error-ws-0-name').textContent).toBe('Lower-case words joined by hyphens.');
    expect(field('ws-0-name').getAttribute('aria-invalid')).toBe('true');

    type('ws-0-step-0-name', '2F');
    expect(within(screen.getByTestId('ws-0-step-0-name')).getByTestId('editor-error-ws-0-step-0-name').textContent).toMatch(/^A name of letters, digits and _/);
    // Nothing else is marked.
    expect(screen.queryByTestId('editor-error-ws-0-step-0-expression')).toBeNull();
    expect(screen.getByTestId('ws-0-not-run')).toBeTruthy();

    type('ws-0-step-0-name', 'F_bound');
    type('ws-0-name', 'cavity-bound');
    expect(screen.queryByTestId('editor-error-ws-0-name')).toBeNull();
    expect(screen.queryByTestId('ws-0-not-run')).toBeNull();
  });

  it('marks a duplicate name and an empty check at their fields, and keeps the steps running', () => {
    render(<Harness initial={[start]} emitted={[]} />);
    fireEvent.click(screen.getByTestId('ws-0-add-check'));
    expect(screen.getByTestId('editor-error-ws-0-check-0-name')).toBeTruthy();
    expect(screen.getByTestId('ws-0-step-0-value').textContent).toMatch(/^= /);
    type('ws-0-check-0-name', 'P');
    expect(screen.getByTestId('editor-error-ws-0-check-0-name').textContent).toBe('"P" is already used by inputs[0].');
  });

  it('emits the worksheet array: adds, edits, moves and removes', () => {
    const emitted: Worksheet[][] = [];
    render(<Harness initial={[]} emitted={emitted} />);
    fireEvent.click(screen.getByTestId('add-worksheet'));
    expect(emitted.at(-1)).toEqual([{ name: '', title: '', inputs: [], steps: [], checks: [], plots: [] }]);

    type('ws-0-name', 'speed');
    type('ws-0-title', 'How fast');
    fireEvent.click(screen.getByTestId('ws-0-add-input'));
    type('ws-0-input-0-name', 'd');
    type('ws-0-input-0-label', 'Distance');
    type('ws-0-input-0-unit', 'm');
    type('ws-0-input-0-default', '100 m');
    type('ws-0-input-0-help', 'Along the track.');
    fireEvent.click(screen.getByTestId('ws-0-add-step'));
    type('ws-0-step-0-name', 'v');
    type('ws-0-step-0-label', 'Speed');
    type('ws-0-step-0-expression', 'd / (10 s)');
    fireEvent.click(screen.getByTestId('ws-0-add-step'));
    type('ws-0-step-1-name', 'a');
    type('ws-0-step-1-label', 'Acceleration');
    type('ws-0-step-1-expression', 'v / (10 s)');
    type('ws-0-step-1-unit', 'm/s^2');
    type('ws-0-step-1-unit', ''); // an optional field left empty is left out
    fireEvent.click(screen.getByTestId('ws-0-step-1-up'));

    const last = emitted.at(-1)!;
    expect(last).toEqual([
      {
        name: 'speed',
        title: 'How fast',
        inputs: [{ name: 'd', label: 'Distance', unit: 'm', default: '100 m', help: 'Along the track.' }],
        steps: [
          { name: 'a', label: 'Acceleration', expression: 'v / (10 s)' },
          { name: 'v', label: 'Speed', expression: 'd / (10 s)' },
        ],
        checks: [],
        plots: [],
      },
    ]);
    expect(worksheetSchema.array().safeParse(last).success).toBe(true);

    fireEvent.click(screen.getByTestId('ws-0-step-0-remove'));
    expect(emitted.at(-1)![0].steps.map((s) => s.name)).toEqual(['v']);
    fireEvent.click(screen.getByTestId('ws-0-remove'));
    expect(emitted.at(-1)).toEqual([]);
  });

  it('keeps plots as JSON, checked against the schema', () => {
    const emitted: Worksheet[][] = [];
    render(<Harness initial={[start]} emitted={emitted} />);
    type('ws-0-plots', '[{');
    expect(screen.getByTestId('editor-error-ws-0-plots').textContent).toMatch(/^Not JSON/);
    expect(emitted).toEqual([]);
    const plot = { name: 'sweep', label: 'Bound against power', sweep: { input: 'Q', from: '1 kW', to: '10 kW', points: 5, scale: 'linear' }, series: ['F_bound'], yScale: 'linear' };
    type('ws-0-plots', JSON.stringify([plot]));
    expect(emitted.at(-1)![0].plots).toEqual([plot]);
    expect(screen.getByTestId('editor-error-ws-0-plots').textContent).toBe('plots[0].sweep.input: "Q" is not an input.');
  });
});
