/**
 * Typed quantities: what a reader types into a worksheet input ("0.25 lbf", "1.5 hp", "450 degC",
 * "3 kWh", "2.5e-3 N", "0.8") and how computed values are shown ("1.33 mN", "4.2 GW", "3.4 × 10^5").
 *
 * Rules for typed quantities (parseQuantity):
 *  - One number, then optionally a unit expression: "2.5e-3 N", "3.4 × 10^5 W", "9.81 m/s^2",
 *    "1 kWh", "450 degC" (also "450 °C"), "80 %". Nothing else: no arithmetic, no function calls and
 *    no constants (write "299792458 m/s", not "1 c"). Units are mathjs's (lbf, hp, BTU, psi, inch,
 *    lbm, degF, kWh, …) and PS, the metric horsepower (math.ts); in a typed quantity "h" is the hour.
 *  - Thousands separators are refused with a message that says how to write the number ("1,200 W"
 *    → write 1200 W): a comma may be a decimal mark in the writer's locale, and a guess could be
 *    off by a factor of a thousand. Spaces inside a number ("1 200 W") are refused the same way.
 *  - A bare number takes the unit asked for: parseQuantity("2", "mN") is 2 mN = 0.002 (N).
 *  - The result is the value in the coherent SI unit of `unit`'s dimension, whatever prefix or
 *    offset `unit` itself has: parseQuantity("1 kN", "mN") is 1000 (N); parseQuantity("450 degC",
 *    "K") is 723.15 (K).
 *
 * The display strings formatQuantity makes are accepted back by parseQuantity (µ, Ω, °C, ×, 10^n).
 *
 * Differences: an input that is a temperature difference (a rise, a ΔT) is read with
 * { difference: true }. Then a unit with an offset counts only its size, as the SI Brochure (9th ed.,
 * 2.3.1) has it for Celsius: "2 degC" is 2 K (not 275.15 K), "3.6 degF" is 2 K, "2 K" is 2 K; and
 * formatQuantity / toQuantityValue with the same option show the value without the offset.
 */
import { MAX_QUANTITY_LENGTH } from './schema';
import type { QuantityValue } from './types';
import {
  QuantityError,
  asDifference,
  describeDims,
  formatAuto,
  formatIn,
  normaliseText,
  sameDims,
  siUnitFor,
  toSI,
  unitInfo,
  type UnitInfo,
} from './units';

export { QuantityError };

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/;
const TIMES_TEN = /^\s*(?:[x×*])\s*10\s*\^\s*([+-]?\d+)/;

function quote(text: string): string {
  return `"${text}"`;
}

function mismatch(typed: string, got: UnitInfo, want: UnitInfo): QuantityError {
  return new QuantityError('dimension', `${quote(typed)} is ${describeDims(got.dims)}, but this needs ${describeDims(want.dims)}`);
}

/** How a typed value is read: as a value on its unit's scale (the default) or as a difference. */
export interface QuantityOptions {
  /** A difference (a temperature rise, a ΔT): units with an offset (degC, degF) count only their size. */
  difference?: boolean;
}

function targetInfo(unit: string): UnitInfo {
  try {
    return unitInfo(unit);
  } catch (err) {
    if (err instanceof QuantityError) throw new QuantityError(err.kind, `the unit asked for, ${quote(unit)}, cannot be used: ${err.message}`);
    throw err;
  }
}

/**
 * Parses a typed quantity and returns its value in the coherent SI unit of `unit`'s dimension.
 * Throws QuantityError (kind syntax, unknown_symbol, dimension, refused or value) with a message in
 * plain words.
 */
export function parseQuantity(input: string | { value: number; unit: string }, unit: string, opts: QuantityOptions = {}): number {
  const want = targetInfo(unit);
  const read = (info: UnitInfo) => (opts.difference ? asDifference(info) : info);
  if (typeof input === 'object' && input !== null) {
    if (typeof input.value !== 'number' || !Number.isFinite(input.value)) {
      throw new QuantityError('value', `${String(input.value)} is not a finite number`);
    }
    const got = unitInfo(input.unit ?? '');
    if (!sameDims(got.dims, want.dims)) throw mismatch(`${input.value} ${input.unit}`.trim(), got, want);
    return toSI(input.value, read(got));
  }
  if (typeof input !== 'string') throw new QuantityError('syntax', 'a value is needed, such as "0.25 lbf"');
  const typed = input.trim();
  if (typed === '') throw new QuantityError('syntax', 'a value is needed, such as "0.25 lbf"');
  if (typed.length > MAX_QUANTITY_LENGTH) {
    throw new QuantityError('refused', `the value is ${typed.length} characters long; the limit is ${MAX_QUANTITY_LENGTH}`);
  }
  const text = normaliseText(typed);

  const thousands = /^([+-]?\d{1,3}(?:,\d{3})+)(\.\d+)?(?![\d,])/.exec(text);
  if (thousands) {
    const plain = thousands[1].replace(/,/g, '') + (thousands[2] ?? '');
    throw new QuantityError(
      'syntax',
      `${quote(typed)} has a thousands separator; write the number without it (${plain}), and use a point for decimals`,
    );
  }
  if (/^[+-]?\d+,\d/.test(text)) {
    throw new QuantityError('syntax', `${quote(typed)} has a comma in the number; use a point for decimals (for example 0.25)`);
  }
  const m = NUMBER.exec(text);
  if (!m) {
    throw new QuantityError('syntax', `${quote(typed)} does not start with a number; write a number and then a unit, such as "0.25 lbf"`);
  }
  let numberText = m[0];
  let rest = text.slice(m[0].length);
  const ten = TIMES_TEN.exec(rest);
  if (ten) {
    const [mant, exp] = numberText.toLowerCase().split('e');
    numberText = `${mant}e${Number(exp ?? 0) + Number(ten[1])}`;
    rest = rest.slice(ten[0].length);
  }
  const n = Number(numberText);
  const unitText = rest.trim();
  if (unitText !== '' && rest[0] !== undefined && !/\s/.test(rest[0]) && /^[\d.,]/.test(rest)) {
    throw new QuantityError('syntax', `${quote(typed)} is not a number with a unit, such as "0.25 lbf"`);
  }
  if (/^[\d.]/.test(unitText)) {
    throw new QuantityError(
      'syntax',
      `${quote(typed)} has more than one number; write one number without spaces or thousands separators, then the unit`,
    );
  }
  if (/^,/.test(unitText)) {
    throw new QuantityError('syntax', `${quote(typed)} has a comma after the number; use a point for decimals and no thousands separators`);
  }
  let si: number;
  if (unitText === '') {
    si = toSI(n, read(want));
  } else {
    let got: UnitInfo;
    try {
      got = unitInfo(unitText);
    } catch (err) {
      if (err instanceof QuantityError) throw new QuantityError(err.kind, `${err.message} (in ${quote(typed)})`);
      throw err;
    }
    if (!sameDims(got.dims, want.dims)) throw mismatch(typed, got, want);
    si = toSI(n, read(got));
  }
  if (!Number.isFinite(si)) throw new QuantityError('value', `${quote(typed)} is too large to compute with`);
  return si;
}

/**
 * Shows a SI value of `unit`'s dimension: with a sensible SI prefix (0.00133 N → "1.33 mN",
 * 4.2e9 W → "4.2 GW"), or in opts.displayUnit ("lbf", "degC", "km/s"). Default 4 significant figures,
 * trailing zeros trimmed; very large or small numbers in scientific notation ("3.4 × 10^5");
 * NaN and infinities in words.
 */
export function formatQuantity(si: number, unit: string, opts: { displayUnit?: string; digits?: number } & QuantityOptions = {}): string {
  const digits = opts.digits ?? 4;
  const info = unitInfo(unit);
  if (opts.displayUnit !== undefined && opts.displayUnit !== null) {
    const shown = unitInfo(opts.displayUnit);
    if (!sameDims(shown.dims, info.dims)) {
      throw new QuantityError(
        'dimension',
        `${quote(opts.displayUnit)} is ${describeDims(shown.dims)}, but the value is ${describeDims(info.dims)}`,
      );
    }
    return formatIn(si, opts.difference ? asDifference(shown) : shown, digits);
  }
  return formatAuto(si, info.dims, digits);
}

/**
 * A QuantityValue: the SI value, the SI unit of its dimension (mathjs syntax) and a display string
 * (a difference shown without its unit's offset, e.g. 2 K in degC as "2 °C").
 */
export function toQuantityValue(si: number, unit: string, displayUnit?: string, opts: QuantityOptions = {}): QuantityValue {
  const info = unitInfo(unit);
  return { si, unit: siUnitFor(info.dims), display: formatQuantity(si, unit, { displayUnit, difference: opts.difference }) };
}

/** The kind of quantity and its dimension in SI base units, e.g. "a force (kg m s^-2)". */
export function describeDimension(unit: string): string {
  return describeDims(unitInfo(unit).dims);
}
