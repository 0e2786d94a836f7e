/**
 * A dimension as words a reader knows: "a force (newtons)", "a power (watts)", "an energy
 * (joules)". The unit names are the SI's own: the seven base units of the SI Brochure, 9th ed.
 * (BIPM 2019), Table 2, and the derived units with special names and symbols of its Table 4. A
 * kind of quantity whose coherent unit has no special name shows that unit's symbol as print
 * writes it ("a speed (m/s)"), and a dimension with no name at all its base units, multiplied
 * with a half-high dot and raised with superscripts ("kg·m³·s⁻⁴", SI Brochure §5.4.6).
 *
 * Keys are dimensions as shared/worksheet/units.ts writes them (`dimString`: "kg m s^-2").
 * No imports beyond the superscript printer: units.ts reads this table.
 */
import { superscript } from '../claims/print';

/** Plural English names of the coherent SI units with a name of their own, by dimension. */
export const SI_UNIT_NAMES: Readonly<Record<string, string>> = Object.freeze({
  // SI Brochure 9th ed., Table 2 (base units).
  s: 'seconds',
  m: 'metres',
  kg: 'kilograms',
  A: 'amperes',
  K: 'kelvins',
  mol: 'moles',
  cd: 'candelas',
  // SI Brochure 9th ed., Table 4 (derived units with special names), those the worksheets meet.
  rad: 'radians',
  's^-1': 'hertz',
  'kg m s^-2': 'newtons',
  'kg m^-1 s^-2': 'pascals',
  'kg m^2 s^-2': 'joules',
  'kg m^2 s^-3': 'watts',
  's A': 'coulombs',
  'kg m^2 s^-3 A^-1': 'volts',
  'kg^-1 m^-2 s^4 A^2': 'farads',
  'kg m^2 s^-3 A^-2': 'ohms',
  'kg^-1 m^-2 s^3 A^2': 'siemens',
  'kg m^2 s^-2 A^-1': 'webers',
  'kg s^-2 A^-1': 'teslas',
  'kg m^2 s^-2 A^-2': 'henries',
});

/** Unit symbols for print: "kg m s^-2" → "kg·m·s⁻²", "m / s^2" → "m/s²", "J / (kg K)" → "J/(kg·K)". */
export function unitSymbols(units: string): string {
  return units
    .trim()
    .replace(/\s*\/\s*/g, '/')
    .replace(/\^\s*(?:\(\s*([+\-\u2212]?\d+)\s*\)|([+\-\u2212]?\d+))/g, (_m, inParens: string | undefined, bare: string | undefined) => superscript(inParens ?? bare ?? ''))
    .replace(/\s+/g, '·');
}

/**
 * What a kind of quantity is measured in, for a sentence: the SI unit's name where it has one
 * ("newtons"), else its symbol (`si`, mathjs syntax, e.g. "m / s"), else the base units of `dims`.
 */
export function unitWords(dims: string, si?: string): string {
  return SI_UNIT_NAMES[dims] ?? unitSymbols(si ?? dims);
}
