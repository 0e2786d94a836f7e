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

/** Planck constant, J s (exact; SI Brochure, 9th ed.). */
export const H_PLANCK = value('h');
/** Boltzmann constant, J/K (exact; SI Brochure, 9th ed.). */
export const K_BOLTZMANN = value('k_B');
/** Avogadro constant, 1/mol (exact; SI Brochure, 9th ed.). */
export const N_AVOGADRO = value('N_A');
/** Faraday constant, C/mol: e·N_A, exact in the SI (CODATA 2018 lists 96 485.332 12… C/mol, exact). */
export const FARADAY = E_CHARGE * N_AVOGADRO;
/** Molar gas constant, J/(mol K): k_B·N_A, exact in the SI (CODATA 2018 lists 8.314 462 618… J/(mol K), exact). */
export const R_GAS = K_BOLTZMANN * N_AVOGADRO;
/** Stefan–Boltzmann constant, W/(m² K⁴): 2π⁵k_B⁴/(15h³c²), exact in the SI (CODATA 2018: 5.670 374 419… × 10^-8). */
export const SIGMA_SB = (2 * Math.PI ** 5 * K_BOLTZMANN ** 4) / (15 * H_PLANCK ** 3 * C_LIGHT ** 2);

/**
 * The sun as seen from the Earth, for the radiative limits of solar converters. Not constants of
 * nature and not in the worksheet table: IAU 2015 Resolution B3 fixes the nominal solar radius at
 * exactly 695 700 km, and IAU 2012 Resolution B2 the astronomical unit at exactly 149 597 870 700 m.
 */
export const SUN_RADIUS_NOMINAL = 6.957e8;
export const ASTRONOMICAL_UNIT = 149_597_870_700;
/**
 * Dilution of sunlight at the Earth, (R_sun/AU)² ≈ 2.163 × 10^-5: the share of the sky's radiance
 * the sun's disc fills for a flat converter facing it (Shockley and Queisser 1961 used 2.18 × 10^-5).
 * 1/SUN_DILUTION ≈ 46 200 is the largest concentration of sunlight (the converter then sees the sun
 * all round).
 */
export const SUN_DILUTION = (SUN_RADIUS_NOMINAL / ASTRONOMICAL_UNIT) ** 2;
