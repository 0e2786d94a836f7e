/** Domain checks of the kit's formulas: each throws CheckRangeError naming the argument. */
import { CheckRangeError } from './errors';
import { fmt } from './format';

export function finite(field: string, v: number): void {
  if (typeof v !== 'number' || !Number.isFinite(v)) throw new CheckRangeError(field, `${field} must be a finite number.`);
}
export function nonNegative(field: string, v: number): void {
  finite(field, v);
  if (v < 0) throw new CheckRangeError(field, `${field} must not be negative (got ${fmt(v)}).`);
}
export function positive(field: string, v: number): void {
  finite(field, v);
  if (!(v > 0)) throw new CheckRangeError(field, `${field} must be more than zero (got ${fmt(v)}).`);
}
