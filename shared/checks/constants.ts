/**
 * Physical constants used by the check kit, in SI: taken from the one vetted table that worksheet
 * expressions use (shared/worksheet/constants.ts, where each value's source is named), so the kit
 * and the worksheets can never disagree.
 */
import { getConstant } from '../worksheet/constants';

const value = (name: string): number => {
  const k = getConstant(name);
  if (!k) throw new Error(`constant ${name} is missing from the vetted table`);
  return k.value;
};

/** Speed of light in vacuum, m/s (exact; SI Brochure, 9th ed.). */
export const C_LIGHT = value('c');
/** Elementary charge, C (exact; SI Brochure, 9th ed.). */
export const E_CHARGE = value('e');
/** Electron mass, kg (CODATA 2022). */
export const M_ELECTRON = value('m_e');
/** Proton mass, kg (CODATA 2022). */
export const M_PROTON = value('m_p');
/** Standard acceleration of gravity, m/s² (exact by definition, 3rd CGPM 1901). */
export const G0 = value('g0');

/**
 * A typical magnitude of the Earth's magnetic field at the surface, T. Not a constant of nature and
 * not in the vetted table. From memory: the geomagnetic field at ground level spans roughly
 * 25–65 µT (NOAA/BGS World Magnetic Model maps); 50 µT is the usual round figure for mid latitudes.
 */
export const EARTH_FIELD_TYPICAL = 50e-6;
