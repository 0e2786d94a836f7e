/**
 * The vetted table of physical constants that worksheet expressions can use (DESIGN.md §4).
 *
 * Names in expressions: c, h, e, k_B, N_A, G, m_e, m_p, g0, mu0, eps0.
 *
 *  - `e` is the ELEMENTARY CHARGE, as a physicist reads it. Euler's number is not available under a
 *    name in worksheets (mathjs's own `e` and `E` are shadowed or refused); write `exp(1)` or `exp(x)`.
 *  - `h` is the PLANCK CONSTANT. In expressions mathjs would otherwise read `h` as the hour; write
 *    `hour` (or `hr`) there. Typed quantities ("2 h" in an input box) take units only, no constants,
 *    so "2 h" in an input is still two hours.
 *  - Constants are read-only: expressions cannot assign to anything, and a worksheet may not name an
 *    input or a step after a constant.
 *
 * Sources:
 *  - c, h, e, k_B, N_A: exact defining constants of the SI, BIPM "The International System of Units (SI)",
 *    SI Brochure, 9th edition (2019), section 2.2, Table 1. Products of them are exact too: the
 *    Faraday constant F = e·N_A = 96 485.332 12… C/mol and the molar gas constant R = k_B·N_A =
 *    8.314 462 618… J/(mol K) (CODATA 2018 lists both as exact); the check kit derives them in
 *    shared/checks/constants.ts rather than naming them here, since F and R are common input names.
 *  - G, m_e, m_p, mu0, eps0: CODATA 2022 recommended values (NIST, physics.nist.gov/constants). These
 *    digits are from memory; before committing them they were compared with several independent
 *    public transcriptions of NIST's CODATA 2022 listing (allascii.txt), which agree digit for digit.
 *    They have not been read from the NIST site itself in this session.
 *  - g0: standard acceleration of gravity, exact by definition (3rd CGPM, 1901); NIST SP 330 (2019)
 *    and NIST SP 811 (2008), Appendix B.
 *
 * mathjs 15 ships its own physical constants (speedOfLight, planckConstant, elementaryCharge,
 * boltzmann, gravitationConstant, electronMass, protonMass, magneticConstant, electricConstant,
 * gravity). Ours agree with them exactly for c, h, e, k_B, G and g0. mathjs still carries the CODATA
 * 2018 values for the others; the differences are (ours − mathjs, relative):
 *   m_e   9.1093837139e-31 vs 9.1093837015e-31   (+1.4e-9)
 *   m_p   1.67262192595e-27 vs 1.67262192369e-27 (+1.4e-9)
 *   mu0   1.25663706127e-6 vs 1.25663706212e-6   (−6.8e-10)
 *   eps0  8.8541878188e-12 vs 8.8541878128e-12   (+6.8e-10)
 * all well inside what any worksheet here can resolve. constants.test.ts checks these relations.
 */

export interface PhysicalConstant {
  /** The name used in expressions. */
  name: string;
  /** How a page shows the symbol (Unicode). */
  symbol: string;
  label: string;
  /** Value in the coherent SI unit `unit`. */
  value: number;
  /** SI unit in mathjs syntax. */
  unit: string;
  /** True for values fixed by definition. */
  exact: boolean;
  /** Standard uncertainty in `unit` (absent for exact values). */
  uncertainty?: number;
  source: string;
}

const SI_BROCHURE = 'BIPM, The International System of Units (SI Brochure), 9th edition (2019), Table 1: exact defining constant';
const CODATA_2022 = 'CODATA 2022 recommended value (NIST, physics.nist.gov/constants)';

export const CONSTANTS: readonly PhysicalConstant[] = Object.freeze([
  // c = 299 792 458 m/s, exact — SI Brochure 9th ed. (2019), Table 1.
  { name: 'c', symbol: 'c', label: 'speed of light in vacuum', value: 299792458, unit: 'm / s', exact: true, source: SI_BROCHURE },
  // h = 6.626 070 15 × 10^-34 J s, exact — SI Brochure 9th ed. (2019), Table 1.
  { name: 'h', symbol: 'h', label: 'Planck constant', value: 6.62607015e-34, unit: 'J s', exact: true, source: SI_BROCHURE },
  // e = 1.602 176 634 × 10^-19 C, exact — SI Brochure 9th ed. (2019), Table 1.
  { name: 'e', symbol: 'e', label: 'elementary charge', value: 1.602176634e-19, unit: 'C', exact: true, source: SI_BROCHURE },
  // k = 1.380 649 × 10^-23 J/K, exact — SI Brochure 9th ed. (2019), Table 1.
  { name: 'k_B', symbol: 'k_B', label: 'Boltzmann constant', value: 1.380649e-23, unit: 'J / K', exact: true, source: SI_BROCHURE },
  // N_A = 6.022 140 76 × 10^23 mol^-1, exact — SI Brochure 9th ed. (2019), Table 1.
  { name: 'N_A', symbol: 'N_A', label: 'Avogadro constant', value: 6.02214076e23, unit: 'mol^-1', exact: true, source: SI_BROCHURE },
  // G = 6.674 30(15) × 10^-11 m^3 kg^-1 s^-2 — CODATA 2022 (unchanged from 2018); from memory, cross-checked.
  {
    name: 'G',
    symbol: 'G',
    label: 'Newtonian constant of gravitation',
    value: 6.6743e-11,
    unit: 'm^3 kg^-1 s^-2',
    exact: false,
    uncertainty: 0.00015e-11,
    source: CODATA_2022,
  },
  // m_e = 9.109 383 7139(28) × 10^-31 kg — CODATA 2022; from memory, cross-checked.
  { name: 'm_e', symbol: 'mₑ', label: 'electron mass', value: 9.1093837139e-31, unit: 'kg', exact: false, uncertainty: 0.0000000028e-31, source: CODATA_2022 },
  // m_p = 1.672 621 925 95(52) × 10^-27 kg — CODATA 2022; from memory, cross-checked.
  { name: 'm_p', symbol: 'mₚ', label: 'proton mass', value: 1.67262192595e-27, unit: 'kg', exact: false, uncertainty: 0.00000000052e-27, source: CODATA_2022 },
  // g_n = 9.806 65 m/s^2, exact by definition (3rd CGPM 1901) — NIST SP 330 (2019); NIST SP 811 (2008) App. B.
  {
    name: 'g0',
    symbol: 'g₀',
    label: 'standard acceleration of gravity',
    value: 9.80665,
    unit: 'm / s^2',
    exact: true,
    source: 'Exact by definition (3rd CGPM, 1901); NIST SP 330 (2019) and NIST SP 811 (2008), Appendix B',
  },
  // μ0 = 1.256 637 061 27(20) × 10^-6 N A^-2 — CODATA 2022; from memory, cross-checked.
  {
    name: 'mu0',
    symbol: 'μ₀',
    label: 'vacuum magnetic permeability',
    value: 1.25663706127e-6,
    unit: 'N / A^2',
    exact: false,
    uncertainty: 0.0000000002e-6,
    source: CODATA_2022,
  },
  // ε0 = 8.854 187 8188(14) × 10^-12 F m^-1 — CODATA 2022; from memory, cross-checked.
  {
    name: 'eps0',
    symbol: 'ε₀',
    label: 'vacuum electric permittivity',
    value: 8.8541878188e-12,
    unit: 'F / m',
    exact: false,
    uncertainty: 0.0000000014e-12,
    source: CODATA_2022,
  },
] satisfies PhysicalConstant[]).map((k) => Object.freeze(k));

const byName = new Map(CONSTANTS.map((k) => [k.name, k]));

/** The names usable in expressions, in table order. */
export const CONSTANT_NAMES: readonly string[] = Object.freeze(CONSTANTS.map((k) => k.name));

export function getConstant(name: string): PhysicalConstant | undefined {
  return byName.get(name);
}

/**
 * mathjs's own names for these constants (and a few other names a reader may try), with the name to
 * use instead. Used for hints in unknown-symbol messages.
 */
export const CONSTANT_HINTS: Readonly<Record<string, string>> = Object.freeze({
  speedOfLight: 'c',
  planckConstant: 'h',
  elementaryCharge: 'e',
  boltzmann: 'k_B',
  k: 'k_B',
  kB: 'k_B',
  avogadro: 'N_A',
  NA: 'N_A',
  N_a: 'N_A',
  gravitationConstant: 'G',
  electronMass: 'm_e',
  me: 'm_e',
  protonMass: 'm_p',
  mp: 'm_p',
  gravity: 'g0',
  g_0: 'g0',
  g_n: 'g0',
  magneticConstant: 'mu0',
  vacuumPermeability: 'mu0',
  mu_0: 'mu0',
  electricConstant: 'eps0',
  vacuumPermittivity: 'eps0',
  epsilon0: 'eps0',
  eps_0: 'eps0',
  q_e: 'e',
});
