import { render, screen, within } from '@testing-library/react';
import { setWindowWidth } from '../testing/render';
import { formatNumber, powerOfTen } from './axes';
import { LinePlot, type LinePlotData } from './LinePlot';

/** Every coordinate pair in an SVG path, as numbers. */
function pathPoints(d: string): [number, number][] {
  return [...d.matchAll(/(-?[\d.]+(?:e-?\d+)?),(-?[\d.]+(?:e-?\d+)?)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}

const times = Float64Array.from({ length: 50 }, (_, i) => i * 1e-9);

/** Shaped like the sideways-beam check's plot: three quantities, three units, one time axis. */
const beam: LinePlotData = {
  name: 'beam',
  title: 'Beam under sideways forces',
  x: { label: 'Time', unit: 's', values: times },
  series: [
    { name: 'gamma', label: 'γ', unit: '', values: times.map((t) => 1 + t * 1e7) },
    { name: 'v_z', label: 'v_z', unit: 'm / s', values: times.map((t) => 2e8 - t * 1e15) },
    { name: 'p_z', label: 'p_z', unit: 'kg m / s', values: times.map(() => 2.7e-22) },
  ],
  yScale: 'linear',
};

beforeEach(() => setWindowWidth(390));

describe('LinePlot', () => {
  it('draws one path per series, one panel per unit, and a legend entry for each', () => {
    render(<LinePlot plot={beam} />);
    const plot = screen.getByTestId('plot-beam');
    for (const s of beam.series) {
      const path = screen.getByTestId(`plot-beam-series-${s.name}`);
      expect(path.tagName.toLowerCase()).toBe('path');
      expect(pathPoints(path.getAttribute('d')!)).toHaveLength(times.length);
    }
    expect(plot.querySelectorAll('path')).toHaveLength(3);
    // Each panel is titled by its series and unit; the time axis is shared and titled once.
    const texts = Array.from(plot.querySelectorAll('text')).map((t) => t.textContent);
    expect(texts).toContain('γ');
    expect(texts.some((t) => /^v_z \(×10⁸ m \/ s\)$/.test(t ?? ''))).toBe(true);
    expect(texts.some((t) => /^p_z \(×10⁻²² kg m \/ s\)$/.test(t ?? ''))).toBe(true);
    expect(texts.filter((t) => t?.startsWith('Time')).length).toBe(1);
    expect(within(plot).getByText('v_z (m / s)')).toBeTruthy();
    expect(within(plot).getByText('p_z (kg m / s)')).toBeTruthy();
  });

  it('draws a series that does not change as a flat line, not as magnified rounding noise', () => {
    const noisy: LinePlotData = {
      ...beam,
      name: 'flat',
      series: [{ name: 'p_z', label: 'p_z', unit: 'kg m / s', values: times.map((_, i) => 2.7e-22 * (1 + (i % 2) * 1e-15)) }],
    };
    render(<LinePlot plot={noisy} />);
    const ys = pathPoints(screen.getByTestId('plot-flat-series-p_z').getAttribute('d')!).map(([, y]) => y);
    expect(Math.max(...ys) - Math.min(...ys)).toBeLessThan(0.5);
  });

  it('shares one panel between series in the same unit', () => {
    const twoPowers: LinePlotData = {
      name: 'powers',
      title: 'Power against speed',
      x: { label: 'Speed', unit: 'm / s', values: [0, 1, 2, 3] },
      series: [
        { name: 'kinetic', label: 'Kinetic power', unit: 'W', values: [0, 10, 20, 30] },
        { name: 'input', label: 'Input power', unit: 'W', values: [15, 15, 15, 15] },
      ],
      yScale: 'linear',
    };
    render(<LinePlot plot={twoPowers} />);
    const texts = Array.from(screen.getByTestId('plot-powers').querySelectorAll('text')).map((t) => t.textContent);
    expect(texts).toContain('W');
    expect(screen.getByTestId('plot-powers').querySelectorAll('path')).toHaveLength(2);
  });

  it('puts values spanning fifteen decades on a log axis of decades, with gaps where a value cannot go', () => {
    const values = [1e-12, 1e-9, 0, 1e-6, 1e-3, 1, null, 1e3];
    const log: LinePlotData = {
      name: 'decades',
      title: 'Across many decades',
      x: { label: 'Step', unit: '', values: values.map((_, i) => i) },
      series: [{ name: 'f', label: 'Force', unit: 'N', values }],
      yScale: 'log',
    };
    render(<LinePlot plot={log} />);
    const plot = screen.getByTestId('plot-decades');
    const labels = Array.from(plot.querySelectorAll('text')).map((t) => t.textContent);
    expect(labels).toContain(powerOfTen(-12));
    expect(labels).toContain(powerOfTen(3));
    expect(labels).toContain('Force (N), log scale');

    const d = screen.getByTestId('plot-decades-series-f').getAttribute('d')!;
    expect(d).not.toMatch(/NaN|Infinity/);
    // Zero and the missing value break the line into three runs of the six positive points.
    expect(d.match(/M/g)).toHaveLength(3);
    const ys = pathPoints(d).map(([, y]) => y);
    expect(ys).toHaveLength(6);
    // Equal steps of three decades are equal steps on the page.
    const gaps = ys.slice(1).map((y, i) => ys[i] - y);
    expect(gaps[0]).toBeGreaterThan(0);
    for (const g of gaps) expect(g).toBeCloseTo(gaps[0], 6);
  });

  it('describes itself for readers who cannot see it', () => {
    render(<LinePlot plot={beam} />);
    const label = screen.getByTestId('plot-beam').getAttribute('aria-label')!;
    expect(label).toContain('Line plot of γ, v_z, p_z against Time');
    expect(label).toContain('one panel per unit');
    expect(label).toContain(`p_z goes from ${formatNumber(2.7e-22)} to ${formatNumber(2.7e-22)} kg m / s`);
    expect(screen.getByTestId('plot-beam').getAttribute('role')).toBe('img');
  });
});

describe('formatNumber', () => {
  it.each([
    [0, '0'],
    [1234, '1230'],
    [0.25, '0.25'],
    [-2, '−2'],
    [2.7e-22, '2.7×10⁻²²'],
    [1e9, '10⁹'],
    [9.9996e5, '10⁶'],
  ])('writes %p as %p', (value, text) => {
    expect(formatNumber(value)).toBe(text);
  });
});
