/** Reading a check's SI inputs against its specs: every field present, finite and inside its bounds. */
import { CheckRangeError } from './errors';
import { fmt } from './format';
import type { CheckInputSpec } from './types';

/**
 * Returns the inputs named by `specs` from `si`, or throws CheckRangeError naming the first field
 * that is missing, not a finite number, outside [min, max] or not a whole number where one is needed.
 * Keys in `si` that no spec names are ignored.
 */
export function readInputs(specs: readonly CheckInputSpec[], si: Record<string, number>): Record<string, number> {
  const out: Record<string, number> = {};
  for (const spec of specs) {
    const v = si[spec.name];
    if (v === undefined || v === null) throw new CheckRangeError(spec.name, `${spec.label}: a value is needed.`);
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      throw new CheckRangeError(spec.name, `${spec.label}: a finite number is needed.`);
    }
    const unit = spec.unit ? ` ${spec.unit}` : '';
    if (spec.min !== undefined && v < spec.min) {
      throw new CheckRangeError(spec.name, `${spec.label}: ${fmt(v)}${unit} is below the smallest allowed value, ${fmt(spec.min)}${unit}.`);
    }
    if (spec.max !== undefined && v > spec.max) {
      throw new CheckRangeError(spec.name, `${spec.label}: ${fmt(v)}${unit} is above the largest allowed value, ${fmt(spec.max)}${unit}.`);
    }
    if (spec.integer && !Number.isInteger(v)) {
      throw new CheckRangeError(spec.name, `${spec.label}: a whole number is needed (got ${v}).`);
    }
    out[spec.name] = v;
  }
  return out;
}

/** Throws CheckRangeError(field) unless v > 0 (the spec's inclusive min of 0 cannot say "more than zero"). */
export function requirePositive(field: string, label: string, v: number): void {
  if (!(v > 0)) throw new CheckRangeError(field, `${label} must be more than zero.`);
}
