/**
 * Axes for the plots: a scale from data to pixels, and tick labels that stay short on a phone.
 * Linear axes that would need long numbers share one power of ten, named in the axis title
 * ("×10⁻²² kg m / s"); logarithmic axes run over whole decades and are labelled 10ⁿ.
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { superscript } from '@/shared/claims/print';

export type ScaleKind = 'linear' | 'log';

export interface Tick {
  value: number;
  label: string;
}

export interface Axis {
  kind: ScaleKind;
  /** Pixel position of a value; NaN for a value a log axis cannot show (zero or negative). */
  at(value: number): number;
  ticks: Tick[];
  /** The power of ten the tick labels are divided by, e.g. "×10⁻²²", or "" when none. */
  factor: string;
}

export function powerOfTen(exponent: number): string {
  return `10${superscript(exponent)}`;
}

/** Drops floating-point noise from a tick such as 0.30000000000000004. */
function tidy(value: number): number {
  return Number(value.toPrecision(10));
}

/** A typographic minus for negative numbers. */
function minus(text: string): string {
  return text.replace(/^-/, '−');
}

/**
 * A number in few characters: plain from 10⁻³ to 10⁵, otherwise as m×10ⁿ (or 10ⁿ when m is 1),
 * to `digits` significant figures.
 */
export function formatNumber(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const size = Math.abs(value);
  if (size >= 1e-3 && size < 1e5) return minus(String(Number(value.toPrecision(digits))));
  let exponent = Math.floor(Math.log10(size));
  let mantissa = Number((value / 10 ** exponent).toPrecision(digits));
  if (Math.abs(mantissa) >= 10) {
    mantissa /= 10;
    exponent += 1;
  }
  if (mantissa === 1) return powerOfTen(exponent);
  if (mantissa === -1) return `−${powerOfTen(exponent)}`;
  return `${minus(String(mantissa))}×${powerOfTen(exponent)}`;
}

/** The finite values of a series (positive ones only, for a log axis). */
export function finiteValues(values: ArrayLike<number | null>, positiveOnly = false): number[] {
  const out: number[] = [];
  for (let i = 0; i < values.length; i += 1) {
    const v = values[i];
    if (v !== null && Number.isFinite(v) && (!positiveOnly || v > 0)) out.push(v);
  }
  return out;
}

export function extent(values: number[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}

/**
 * A linear axis over the values, widened to round ticks when `nice` (value axes; an x axis keeps
 * the data's own ends). A series that does not change (to within rounding: a conserved quantity)
 * gets a band of ±50 % around its value, so that it is drawn flat rather than its rounding noise
 * blown up to the full height.
 */
function linearAxis(values: number[], range: [number, number], tickCount: number, nice = true): Axis {
  let [lo, hi] = values.length ? extent(values) : [0, 1];
  const size = Math.max(Math.abs(lo), Math.abs(hi));
  if (hi - lo <= 1e-9 * size || size === 0) {
    const pad = size === 0 ? 1 : size / 2;
    lo -= pad;
    hi += pad;
  }
  const scale = scaleLinear().domain([lo, hi]).range(range);
  if (nice) scale.nice(tickCount);
  const ticks = scale.ticks(tickCount).map(tidy);
  const biggest = Math.max(...ticks.map(Math.abs));
  const exponent = biggest > 0 && (biggest >= 1e5 || biggest < 1e-3) ? Math.floor(Math.log10(biggest)) : 0;
  return {
    kind: 'linear',
    at: (v) => scale(v),
    ticks: ticks.map((value) => ({ value, label: minus(String(tidy(value / 10 ** exponent))) })),
    factor: exponent === 0 ? '' : `×${powerOfTen(exponent)}`,
  };
}

/**
 * A logarithmic axis over whole decades, with at most `maxTicks` decade labels, one of them at each
 * end: when the decades must be thinned, the lower end is moved down to the next labelled decade.
 */
function logAxis(values: number[], range: [number, number], maxTicks: number): Axis {
  const positive = values.filter((v) => v > 0);
  const [lo, hi] = positive.length ? extent(positive) : [1, 10];
  const last = Math.max(Math.ceil(Math.log10(hi)), Math.floor(Math.log10(lo)) + 1);
  const span = last - Math.floor(Math.log10(lo));
  const step = Math.max(1, Math.ceil(span / Math.max(1, maxTicks - 1)));
  const first = last - Math.ceil(span / step) * step;
  const scale = scaleLog().domain([10 ** first, 10 ** last]).range(range);
  const ticks: Tick[] = [];
  for (let e = first; e <= last; e += step) ticks.push({ value: 10 ** e, label: powerOfTen(e) });
  return {
    kind: 'log',
    at: (v) => (v > 0 ? scale(v) : NaN),
    ticks,
    factor: '',
  };
}

export function makeAxis(kind: ScaleKind, values: number[], range: [number, number], tickCount: number, nice = true): Axis {
  return kind === 'log' ? logAxis(values, range, tickCount + 1) : linearAxis(values, range, tickCount, nice);
}

/** "Speed (×10⁸ m / s)", "γ", "Force (N), log scale"; without a label, "N, log scale". */
export function axisTitle(label: string, unit: string, axis: Axis): string {
  const scale = [axis.factor, unit].filter(Boolean).join(' ');
  const log = axis.kind === 'log' ? ', log scale' : '';
  if (!label) return `${scale || 'Pure number'}${log}`;
  return `${label}${scale ? ` (${scale})` : ''}${log}`;
}
