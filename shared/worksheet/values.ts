/**
 * mathjs values as worksheets see them: what a value is (a unit, a list, a complex number), its SI
 * value, a fresh Unit for an SI value, and plain words for a value in messages.
 */
import type { MathType } from 'mathjs';
import { Unit } from './math';
import { describeDims, dimString, factorOf, isDimensionless, offsetOf, type Dims } from './units';

/* eslint-disable @typescript-eslint/no-explicit-any */

export function isUnitValue(x: unknown): x is { value: any; units: any[]; dimensions: number[] } {
  return !!x && typeof x === 'object' && (x as any).isUnit === true;
}

export function isMatrixValue(x: unknown): boolean {
  return Array.isArray(x) || (!!x && typeof x === 'object' && (x as any).isMatrix === true);
}

export function isComplexValue(x: unknown): boolean {
  return !!x && typeof x === 'object' && (x as any).isComplex === true;
}

/** The SI value of a mathjs Unit (offset units such as degC converted to kelvins). */
export function siOfUnit(u: any): number {
  const v = u.value === null || u.value === undefined ? factorOf(u) : u.value;
  if (typeof v !== 'number') return Number.NaN;
  return v + offsetOf(u);
}

const templates = new Map<string, any>();
const templatesByDims = new WeakMap<Dims, any>();

function templateFor(dims: Dims): any {
  let t = templatesByDims.get(dims);
  if (t) return t;
  const key = dimString(dims);
  t = templates.get(key);
  if (!t) {
    t = Unit.parse(key);
    templates.set(key, t);
  }
  templatesByDims.set(dims, t);
  return t;
}

/** A fresh mathjs Unit in the coherent SI unit of `dims` with SI value `si` (a number when dimensionless). */
export function makeUnit(si: number, dims: Dims): MathType | number {
  if (isDimensionless(dims)) return si;
  const t = templateFor(dims);
  // What Unit.prototype.clone does, without its generic deep copy.
  const u = Object.create(Object.getPrototypeOf(t));
  u.fixPrefix = t.fixPrefix;
  u.skipAutomaticSimplification = t.skipAutomaticSimplification;
  u.value = si;
  u.dimensions = t.dimensions.slice(0);
  u.units = t.units.map((p: any) => ({ unit: p.unit, prefix: p.prefix, power: p.power }));
  return u;
}

/** Plain words for a mathjs value: "a power (kg m^2 s^-3)", "a pure number", "a list of 3 values". */
export function describeValue(x: unknown): string {
  if (typeof x === 'number') return 'a pure number';
  if (isUnitValue(x)) return describeDims(x.dimensions);
  if (typeof x === 'boolean') return `the truth value ${x}`;
  if (isComplexValue(x)) return 'a complex number';
  if (isMatrixValue(x)) {
    const size = Array.isArray(x) ? x.length : (x as any).size().reduce((a: number, b: number) => a * b, 1);
    return `a list of ${size} values`;
  }
  if (typeof x === 'function') return 'a function';
  return 'a value that is not a quantity';
}
