import { render, screen } from '@testing-library/react';
import type { BarPlot as BarPlotData } from '@/shared/checks/types';
import { formatQuantity } from '@/shared/worksheet/quantity';
import { setWindowWidth } from '../testing/render';
import { colors } from '../theme';
import { powerOfTen } from './axes';
import { BarPlot } from './BarPlot';

const rect = (id: string) => screen.getByTestId(id);
const widthOf = (id: string) => Number(rect(id).getAttribute('width'));
const xOf = (id: string) => Number(rect(id).getAttribute('x'));

/** Shaped like the artifact budget: a claim, a bound and artifacts nine decades apart. */
const forces: BarPlotData = {
  kind: 'bars',
  name: 'forces',
  title: 'Claimed thrust against the forces that fake it',
  unit: 'N',
  yScale: 'log',
  bars: [
    { name: 'claim', label: 'Claimed thrust', si: 1e-3, role: 'claim' },
    { name: 'bound', label: 'Photon bound', si: 1e-9, role: 'bound' },
    { name: 'heat', label: 'Recoil of radiated heat', si: 1e-12, role: 'artifact' },
  ],
};

beforeEach(() => setWindowWidth(390));

describe('BarPlot', () => {
  it('draws one bar per figure, each labelled with its value', () => {
    render(<BarPlot plot={forces} />);
    const plot = screen.getByTestId('plot-forces');
    expect(plot.querySelectorAll('rect')).toHaveLength(3);
    for (const bar of forces.bars) {
      expect(rect(`plot-forces-bar-${bar.name}`).tagName.toLowerCase()).toBe('rect');
      expect(screen.getByTestId(`plot-forces-value-${bar.name}`).textContent).toBe(formatQuantity(bar.si, 'N'));
      expect(plot.textContent).toContain(bar.label);
    }
  });

  it('colours by role from the theme: teal claim, brass bound, graphite artifacts', () => {
    render(<BarPlot plot={forces} />);
    expect(rect('plot-forces-bar-claim').getAttribute('fill')).toBe(colors.teal);
    expect(rect('plot-forces-bar-bound').getAttribute('fill')).toBe(colors.brass);
    expect(rect('plot-forces-bar-heat').getAttribute('fill')).toBe(colors.inkMuted);
  });

  it('on a log scale, makes lengths proportional to decades across nine of them', () => {
    render(<BarPlot plot={forces} />);
    // The axis starts at 10⁻¹², so the 10⁻⁹ bar spans 3 decades and the 10⁻³ bar 9.
    expect(widthOf('plot-forces-bar-claim') / widthOf('plot-forces-bar-bound')).toBeCloseTo(3, 6);
    expect(xOf('plot-forces-bar-claim')).toBe(xOf('plot-forces-bar-bound'));
    const ticks = Array.from(screen.getByTestId('plot-forces').querySelectorAll('text')).map((t) => t.textContent);
    expect(ticks).toContain(powerOfTen(-12));
    expect(ticks).toContain(powerOfTen(-3));
    expect(ticks).toContain('N, log scale');
  });

  it('names a zero on a log scale but does not draw it', () => {
    render(<BarPlot plot={{ ...forces, bars: [...forces.bars, { name: 'none', label: 'Outgassing', si: 0, role: 'artifact' }] }} />);
    expect(screen.getByTestId('plot-forces').querySelectorAll('rect')).toHaveLength(3);
    expect(screen.queryByTestId('plot-forces-bar-none')).toBeNull();
    expect(screen.getByTestId('plot-forces-value-none').textContent).toContain('not drawn');
  });

  it('on a linear scale, starts bars at zero and draws a negative one to the left', () => {
    const energy: BarPlotData = {
      kind: 'bars',
      name: 'ledger',
      title: 'Energy over one cycle',
      unit: 'J',
      yScale: 'linear',
      bars: [
        { name: 'in', label: 'In', si: 100 },
        { name: 'out', label: 'Out', si: 50 },
        { name: 'stored', label: 'Stored', si: -25 },
      ],
    };
    render(<BarPlot plot={energy} />);
    expect(widthOf('plot-ledger-bar-in') / widthOf('plot-ledger-bar-out')).toBeCloseTo(2, 6);
    expect(widthOf('plot-ledger-bar-out') / widthOf('plot-ledger-bar-stored')).toBeCloseTo(2, 6);
    const zero = xOf('plot-ledger-bar-in');
    expect(xOf('plot-ledger-bar-out')).toBe(zero);
    expect(xOf('plot-ledger-bar-stored') + widthOf('plot-ledger-bar-stored')).toBeCloseTo(zero, 6);
  });

  it('says what it shows in its accessible label', () => {
    render(<BarPlot plot={forces} />);
    const label = screen.getByTestId('plot-forces').getAttribute('aria-label')!;
    expect(label).toContain('Bars on a logarithmic scale');
    expect(label).toContain(`Claimed thrust ${formatQuantity(1e-3, 'N')} (the claim)`);
    expect(label).toContain(`Photon bound ${formatQuantity(1e-9, 'N')} (the bound)`);
  });
});
