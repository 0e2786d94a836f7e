/**
 * Internal helpers for units and dimensions, shared by quantity.ts and evaluate.ts. The public API is
 * quantity.ts; nothing outside shared/worksheet should import this file.
 *
 * A unit is reduced to a UnitInfo: its dimension vector over mathjs's base dimensions and the affine
 * map to coherent SI, si = n * factor + offsetSI (offsetSI is non-zero only for degC and degF, exactly
 * as mathjs applies offsets: only to a single unit with power 1).
 */
import { unitSymbols, unitWords } from '../format/dimensions';
import { getConstant } from './constants';
import { Unit } from './math';
import type { EvaluationErrorKind } from './types';

/* eslint-disable @typescript-eslint/no-explicit-any */

/** An error with an evaluator kind, thrown by parseQuantity and friends (exported by quantity.ts). */
export class QuantityError extends Error {
  readonly kind: EvaluationErrorKind;
  constructor(kind: EvaluationErrorKind, message: string) {
    super(message);
    this.name = 'QuantityError';
    this.kind = kind;
    Object.setPrototypeOf(this, QuantityError.prototype);
  }
}

/** mathjs base dimensions, in mathjs's order. */
const BASE_ORDER = ['MASS', 'LENGTH', 'TIME', 'CURRENT', 'TEMPERATURE', 'LUMINOUS_INTENSITY', 'AMOUNT_OF_SUBSTANCE', 'ANGLE', 'BIT'];
const BASE_SYMBOL = ['kg', 'm', 's', 'A', 'K', 'cd', 'mol', 'rad', 'b'];
/** Order in which dimensions are written: kg m s A K mol cd rad b (SI Brochure order, mass first as in "kg m s^-2"). */
const WRITE_ORDER = [0, 1, 2, 3, 4, 6, 5, 7, 8];
const DIM_COUNT = BASE_ORDER.length;

export type Dims = readonly number[];

export const DIMENSIONLESS: Dims = Object.freeze(new Array(DIM_COUNT).fill(0));

export function sameDims(a: Dims, b: Dims): boolean {
  for (let i = 0; i < DIM_COUNT; i++) if (Math.abs((a[i] ?? 0) - (b[i] ?? 0)) > 1e-12) return false;
  return true;
}

export function isDimensionless(d: Dims): boolean {
  return sameDims(d, DIMENSIONLESS);
}

function fmtPower(p: number): string {
  const r = Math.round(p * 1e6) / 1e6;
  return String(r);
}

/** Dimension in coherent SI base units, e.g. "kg m s^-2"; "" for a pure number. */
export function dimString(d: Dims): string {
  const parts: string[] = [];
  for (const i of WRITE_ORDER) {
    const p = d[i] ?? 0;
    if (Math.abs(p) < 1e-12) continue;
    parts.push(p === 1 ? BASE_SYMBOL[i] : `${BASE_SYMBOL[i]}^${fmtPower(p)}`);
  }
  return parts.join(' ');
}

interface Named {
  /** Name of the kind of quantity, with its article. */
  name: string;
  /** SI unit in mathjs syntax (QuantityValue.unit). */
  si: string;
  /** Display: the prefixable base, what follows it, its scale relative to SI, the prefixes used. */
  base: string;
  tail: string;
  scale: number;
  prefixes: readonly string[];
  /** Display symbol for the base when different (ohm → Ω). */
  shown?: string;
}

const FULL = ['f', 'p', 'n', 'u', 'm', '', 'k', 'M', 'G', 'T', 'P', 'E'];
const SMALL = ['p', 'n', 'u', 'm', ''];
const NONE = [''];

const PREFIX_EXP: Record<string, number> = { f: -15, p: -12, n: -9, u: -6, m: -3, '': 0, k: 3, M: 6, G: 9, T: 12, P: 15, E: 18 };

function named(dims: string, name: string, si: string, base: string, tail = '', prefixes: readonly string[] = FULL, scale = 1, shown?: string) {
  return [dims, { name, si, base, tail, scale, prefixes, shown } satisfies Named] as const;
}

/** Kinds of quantity a worksheet meets, by dimension. The first with a given dimension wins. */
const NAMED = new Map<string, Named>([
  named('kg', 'a mass', 'kg', 'g', '', ['p', 'n', 'u', 'm', '', 'k'], 1e-3),
  named('m', 'a length', 'm', 'm', '', ['p', 'n', 'u', 'm', '', 'k']),
  named('s', 'a time', 's', 's', '', SMALL),
  named('A', 'an electric current', 'A', 'A', '', ['p', 'n', 'u', 'm', '', 'k', 'M']),
  named('K', 'a temperature', 'K', 'K', '', ['n', 'u', 'm', '']),
  named('mol', 'an amount of substance', 'mol', 'mol', '', ['p', 'n', 'u', 'm', '', 'k']),
  named('cd', 'a luminous intensity', 'cd', 'cd', '', NONE),
  named('rad', 'an angle', 'rad', 'rad', '', ['u', 'm', '']),
  named('b', 'an amount of information', 'b', 'b', '', ['', 'k', 'M', 'G', 'T']),
  named('m^2', 'an area', 'm^2', 'm^2', '', NONE),
  named('m^3', 'a volume', 'm^3', 'm^3', '', NONE),
  named('m s^-1', 'a speed', 'm / s', 'm', '/s', ['u', 'm', '', 'k']),
  named('m s^-2', 'an acceleration', 'm / s^2', 'm/s^2', '', NONE),
  named('kg m s^-2', 'a force', 'N', 'N'),
  named('kg m^2 s^-2', 'an energy', 'J', 'J'),
  named('kg m^2 s^-3', 'a power', 'W', 'W'),
  named('kg m^-1 s^-2', 'a pressure', 'Pa', 'Pa'),
  named('kg m s^-1', 'a momentum', 'N s', 'N', ' s'),
  named('kg m^2 s^-1', 'an action or angular momentum', 'J s', 'J s', '', NONE),
  named('s^-1', 'a frequency', 'Hz', 'Hz', '', ['m', '', 'k', 'M', 'G', 'T', 'P']),
  named('s A', 'an electric charge', 'C', 'C'),
  named('kg m^2 s^-3 A^-1', 'a voltage', 'V', 'V'),
  named('kg m^2 s^-3 A^-2', 'an electrical resistance', 'ohm', 'ohm', '', FULL, 1, 'Ω'),
  named('kg^-1 m^-2 s^3 A^2', 'an electrical conductance', 'S', 'S'),
  named('kg^-1 m^-2 s^4 A^2', 'a capacitance', 'F', 'F'),
  named('kg m^2 s^-2 A^-2', 'an inductance', 'H', 'H'),
  named('kg s^-2 A^-1', 'a magnetic flux density', 'T', 'T'),
  named('kg m^2 s^-2 A^-1', 'a magnetic flux', 'Wb', 'Wb'),
  named('kg m s^-3 A^-1', 'an electric field strength', 'V / m', 'V', '/m'),
  named('kg m^-3', 'a mass density', 'kg / m^3', 'kg/m^3', '', NONE),
  named('kg s^-1', 'a mass flow rate', 'kg / s', 'g', '/s', ['u', 'm', '', 'k'], 1e-3),
  named('m^3 s^-1', 'a volume flow rate', 'm^3 / s', 'm^3/s', '', NONE),
  named('kg m^2 s^-2 K^-1', 'an entropy or heat capacity', 'J / K', 'J', '/K'),
  named('m^2 s^-2', 'an energy per mass', 'J / kg', 'J', '/kg'),
  named('m^2 s^-2 K^-1', 'a specific heat capacity', 'J / (kg K)', 'J/(kg K)', '', NONE),
  named('kg s^-3', 'an intensity (power per area)', 'W / m^2', 'W', '/m^2'),
  named('kg m^2 s^-3 K^-1', 'a thermal conductance', 'W / K', 'W', '/K'),
  named('kg m s^-3 K^-1', 'a thermal conductivity', 'W / (m K)', 'W/(m K)', '', NONE),
  named('kg m^-1 s^-1', 'a dynamic viscosity', 'Pa s', 'Pa s', '', NONE),
  named('rad s^-1', 'an angular velocity', 'rad / s', 'rad/s', '', NONE),
  named('kg m^2', 'a moment of inertia', 'kg m^2', 'kg m^2', '', NONE),
  named('kg^-1 m^-3 s^4 A^2', 'a permittivity', 'F / m', 'F/m', '', NONE),
  named('kg m s^-2 A^-2', 'a permeability', 'H / m', 'H/m', '', NONE),
  named('kg^-1 m^3 s^-2', 'a gravitational constant', 'm^3 kg^-1 s^-2', 'm^3/(kg s^2)', '', NONE),
  named('s A kg^-1', 'a charge per mass', 'C / kg', 'C/kg', '', NONE),
]);

const namedCache = new Map<number, Named | null>();

/** A number that identifies a dimension with small whole powers (-8 … 7), or -1. */
function dimsKey(d: Dims): number {
  let key = 0;
  for (let i = 0; i < DIM_COUNT; i++) {
    const p = d[i] ?? 0;
    if (p !== Math.round(p) || p < -8 || p > 7) return -1;
    key = key * 16 + (p + 8);
  }
  return key;
}

function namedFor(d: Dims): Named | undefined {
  const key = dimsKey(d);
  if (key < 0) return NAMED.get(dimString(d));
  let n = namedCache.get(key);
  if (n === undefined) {
    n = NAMED.get(dimString(d)) ?? null;
    namedCache.set(key, n);
  }
  return n ?? undefined;
}

/**
 * A dimension in words for a sentence: "a force (newtons)", "a speed (m/s)", "a pure number", and
 * "a quantity in kg⁻¹·m³·s⁻²" for one without a name (shared/format/dimensions.ts: SI unit names).
 */
export function describeDims(d: Dims): string {
  if (isDimensionless(d)) return 'a pure number';
  const n = namedFor(d);
  const ds = dimString(d);
  return n ? `${n.name} (${unitWords(ds, n.si)})` : `a quantity in ${unitSymbols(ds)}`;
}

/** The coherent SI unit for a dimension, in mathjs syntax: "N", "m / s", "" for a pure number. */
export function siUnitFor(d: Dims): string {
  if (isDimensionless(d)) return '';
  return namedFor(d)?.si ?? dimString(d);
}

export interface UnitInfo {
  /** The text it was parsed from (normalised). */
  text: string;
  dims: Dims;
  factor: number;
  offsetSI: number;
}

const SUPERSCRIPTS: Record<string, string> = {
  '⁰': '0',
  '¹': '1',
  '²': '2',
  '³': '3',
  '⁴': '4',
  '⁵': '5',
  '⁶': '6',
  '⁷': '7',
  '⁸': '8',
  '⁹': '9',
  '⁻': '-',
};

/** Turns the symbols people paste (µ, Ω, °C, ², ×, −, ·) into mathjs spelling. */
export function normaliseText(text: string): string {
  // Every symbol replaced below is outside ASCII.
  if (/^[\x20-\x7e]*$/.test(text)) return text;
  return text
    .replace(/[−–]/g, '-')
    .replace(/[µμ]/g, 'u')
    .replace(/Ω/g, 'ohm')
    .replace(/°\s*C/g, 'degC')
    .replace(/°\s*F/g, 'degF')
    .replace(/°/g, 'deg')
    .replace(/[·⋅]/g, ' ')
    .replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹⁻]+/g, (run) => '^' + [...run].map((ch) => SUPERSCRIPTS[ch]).join(''));
}

const unitCache = new Map<string, UnitInfo>();
const PERCENT: UnitInfo = Object.freeze({ text: '%', dims: DIMENSIONLESS, factor: 0.01, offsetSI: 0 });
const NO_UNIT: UnitInfo = Object.freeze({ text: '', dims: DIMENSIONLESS, factor: 1, offsetSI: 0 });

/** Factor of a valueless mathjs Unit to coherent SI (product of (unit value × prefix)^power). */
export function factorOf(u: any): number {
  let f = 1;
  for (const part of u.units) f *= Math.pow(part.unit.value * part.prefix.value, part.power);
  return f;
}

export function offsetOf(u: any): number {
  if (u.units.length === 1 && u.units[0].power === 1 && u.units[0].unit.offset) {
    return u.units[0].unit.value * u.units[0].unit.offset;
  }
  return 0;
}

/**
 * Parses a unit expression ("N", "km/s", "J/(kg K)", "degC", "%", "" for a pure number). Throws
 * QuantityError naming an unknown unit.
 */
export function unitInfo(raw: string): UnitInfo {
  const text = normaliseText(raw).trim();
  if (text === '') return NO_UNIT;
  if (text === '%' || text === 'percent') return PERCENT;
  const cached = unitCache.get(text);
  if (cached) return cached;
  let u: any;
  try {
    u = Unit.parse(text);
  } catch (err) {
    const m = /Unit "([^"]*)" not found/.exec((err as Error).message);
    if (m) {
      const k = getConstant(m[1]);
      if (k) {
        throw new QuantityError(
          'unknown_symbol',
          `"${m[1]}" is a constant (the ${k.label}), not a unit; typed values take units only`,
        );
      }
      throw new QuantityError('unknown_symbol', `"${m[1]}" is not a unit I know`);
    }
    throw new QuantityError('syntax', `"${raw}" is not a unit I can read`);
  }
  let factor = factorOf(u);
  if (u.value !== null && u.value !== undefined) {
    // Unit.parse reads a leading number ("1/s" is 1 × s^-1); only 1 is accepted in a unit.
    const n = Number(u.value) / factor;
    if (!(Math.abs(n - 1) < 1e-12)) throw new QuantityError('syntax', `"${raw}" has a number in it; a unit is needed here`);
    factor = Number(u.value);
  }
  const info: UnitInfo = Object.freeze({ text, dims: Object.freeze([...u.dimensions]) as Dims, factor, offsetSI: offsetOf(u) });
  if (unitCache.size > 2000) unitCache.clear();
  unitCache.set(text, info);
  return info;
}

/**
 * The same unit read as a difference: its size without its offset (a step of 1 degC is 1 K, of
 * 1 degF is 5/9 K; SI Brochure, 9th ed., 2.3.1). Units without an offset come back unchanged.
 */
export function asDifference(info: UnitInfo): UnitInfo {
  return info.offsetSI === 0 ? info : Object.freeze({ ...info, offsetSI: 0 });
}

export function toSI(n: number, info: UnitInfo): number {
  return n * info.factor + info.offsetSI;
}

export function fromSI(si: number, info: UnitInfo): number {
  return (si - info.offsetSI) / info.factor;
}

// ---------------------------------------------------------------------------------------------
// Formatting

/** "1.33", "0.00133", "3.4 × 10^5"; digits significant figures, trailing zeros trimmed. */
export function formatNumber(n: number, digits = 4, sciFrom = digits): string {
  if (Number.isNaN(n)) return 'not a number';
  if (n === Number.POSITIVE_INFINITY) return 'infinity';
  if (n === Number.NEGATIVE_INFINITY) return 'minus infinity';
  if (n === 0) return '0';
  const d = Math.min(Math.max(Math.round(digits), 1), 17);
  if (sciFrom <= d) {
    // Fast path: toPrecision is in fixed notation exactly when the exponent is in [-6, d).
    const s = n.toPrecision(d);
    if (s.indexOf('e') < 0 && Math.abs(Number(s)) >= 1e-3) return trimZeros(s);
  }
  const [mant, expText] = n.toExponential(d - 1).split('e');
  const exp = Number(expText);
  if (exp >= Math.max(sciFrom, d) || exp < -3) {
    return `${trimZeros(mant)} × 10^${exp}`;
  }
  const rounded = Number(`${mant}e${exp}`);
  return trimZeros(rounded.toFixed(Math.max(0, d - 1 - exp)));
}

function trimZeros(s: string): string {
  if (s.indexOf('.') < 0) return s;
  let end = s.length;
  while (s.charCodeAt(end - 1) === 48) end--;
  if (s.charCodeAt(end - 1) === 46) end--;
  return s.slice(0, end);
}

const prettyCache = new Map<string, string>();

/** degC → °C, degF → °F, and the micro prefix u → µ where mathjs reads it as micro (uN, us, um). */
function prettyUnit(text: string): string {
  const cached = prettyCache.get(text);
  if (cached !== undefined) return cached;
  const shown = text
    .replace(/degC/g, '°C')
    .replace(/degF/g, '°F')
    .replace(/[A-Za-z]+/g, (token) => {
      if (token.length < 2 || token[0] !== 'u') return token;
      try {
        const u: any = Unit.parse(token);
        return u.units.length === 1 && u.units[0].prefix.name === 'u' ? 'µ' + token.slice(1) : token;
      } catch {
        return token;
      }
    });
  if (prettyCache.size > 500) prettyCache.clear();
  prettyCache.set(text, shown);
  return shown;
}

/** Display a SI value of dimension `dims` with a prefix chosen for it, e.g. "1.33 mN". */
export function formatAuto(si: number, dims: Dims, digits = 4): string {
  if (!Number.isFinite(si)) return formatNumber(si, digits);
  if (isDimensionless(dims)) return formatNumber(si, digits);
  const n = namedFor(dims);
  if (!n) return `${formatNumber(si, digits)} ${dimString(dims)}`;
  const shown = n.shown ?? n.base;
  const value = si / n.scale;
  if (value === 0) return `0 ${n.scale === 1e-3 ? 'k' : ''}${shown}${n.tail}`;
  const d = Math.min(Math.max(Math.round(digits), 1), 17);
  const exp = Number(value.toExponential(d - 1).split('e')[1]);
  const first = n.prefixes[0];
  const last = n.prefixes[n.prefixes.length - 1];
  let chosen: string;
  if (exp < PREFIX_EXP[first] || exp >= PREFIX_EXP[last] + 3) {
    // Beyond the prefixes that read well: the SI unit itself, in scientific notation.
    chosen = n.scale === 1e-3 ? 'k' : '';
  } else {
    chosen = first;
    for (const p of n.prefixes) if (PREFIX_EXP[p] <= exp) chosen = p;
  }
  const mantissa = value / Math.pow(10, PREFIX_EXP[chosen]);
  return `${formatNumber(mantissa, d)} ${prefixSymbol(chosen)}${shown}${n.tail}`;
}

function prefixSymbol(p: string): string {
  return p === 'u' ? 'µ' : p;
}

/** Display a SI value in a given unit, e.g. formatIn(723.15, degC) → "450 °C". */
export function formatIn(si: number, info: UnitInfo, digits = 4): string {
  if (!Number.isFinite(si)) return formatNumber(si, digits);
  const n = fromSI(si, info);
  const num = formatNumber(n, digits);
  if (info.text === '') return num;
  if (info.text === '%') return `${num} %`;
  return `${num} ${prettyUnit(info.text)}`;
}
