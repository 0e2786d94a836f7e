/**
 * Physical constants used by the check kit, in SI. Each names its source.
 * (The worksheet evaluator keeps its own vetted table for expressions; these are the same values.)
 */

/** Speed of light in vacuum, m/s. Exact by definition of the metre (BIPM, SI Brochure, 9th ed., 2019). */
export const C_LIGHT = 299_792_458;

/** Elementary charge, C. Exact since the 2019 SI redefinition (BIPM, SI Brochure, 9th ed.). */
export const E_CHARGE = 1.602_176_634e-19;

/**
 * Electron mass, kg. CODATA 2022 recommended value (NIST, physics.nist.gov/constants); from memory, the
 * same digits as the worksheet table (shared/worksheet/constants.ts). CODATA 2018 had 9.1093837015e-31.
 */
export const M_ELECTRON = 9.109_383_713_9e-31;

/** Proton mass, kg. CODATA 2022 recommended value (same source); from memory. CODATA 2018 had 1.67262192369e-27. */
export const M_PROTON = 1.672_621_925_95e-27;

/** Standard acceleration of gravity, m/s². Exact by convention (3rd CGPM, 1901; NIST SP 811 / SI Brochure). */
export const G0 = 9.806_65;

/**
 * A typical magnitude of the Earth's magnetic field at the surface, T. From memory: the geomagnetic
 * field at ground level spans roughly 25–65 µT (NOAA/BGS World Magnetic Model maps); 50 µT is the
 * usual round figure for mid latitudes.
 */
export const EARTH_FIELD_TYPICAL = 50e-6;
