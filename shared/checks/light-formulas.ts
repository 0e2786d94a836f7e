/**
 * The limits of converting light (blackbody or monochromatic) into work: Landsberg's bound, the
 * detailed-balance (Shockley–Queisser) limit and its best band gap, and the photon conversion bound.
 * Exported through formulas.ts with the rest of the kit's formulas.
 */
import { C_LIGHT, E_CHARGE, H_PLANCK, K_BOLTZMANN, SIGMA_SB, SUN_DILUTION } from './constants';
import { CheckRangeError } from './errors';
import { fmt } from './format';
import { nonNegative, positive } from './guards';

/**
 * Landsberg's bound on the efficiency of turning blackbody radiation at Ts (K) into work with a
 * converter at Ta (K): 1 − (4/3)·(Ta/Ts) + (1/3)·(Ta/Ts)⁴ (Landsberg and Tonge, J. Appl. Phys. 51, R1, 1980).
 */
export function landsbergEfficiency(Ts: number, Ta: number): number {
  positive('Ts', Ts);
  positive('Ta', Ta);
  if (Ta > Ts) throw new CheckRangeError('Ta', `The converter (${fmt(Ta)} K) must not be hotter than the source (${fmt(Ts)} K).`);
  const x = Ta / Ts;
  return 1 - (4 / 3) * x + (1 / 3) * x ** 4;
}

/**
 * Photon flux (1/(m² s)) that a black surface at temperature T (K) emits into a hemisphere at photon
 * energies above Eg (J), the radiation having chemical potential mu (J; 0 for thermal radiation, qV
 * for the light a cell at voltage V emits, mu < Eg): (2π/(h³c²))·∫ E²/(exp((E − mu)/kT) − 1) dE from
 * Eg up. Summed as the series Σ exp(−k(x − m))·(x²/k + 2x/k² + 2/k³), x = Eg/kT, m = mu/kT.
 */
export function photonFluxAbove(Eg: number, T: number, mu: number): number {
  const kT = K_BOLTZMANN * T;
  const x = Eg / kT;
  const d = (Eg - mu) / kT;
  let sum = 0;
  for (let k = 1; k <= 1_000_000; k++) {
    const term = Math.exp(-k * d) * ((x * x) / k + (2 * x) / (k * k) + 2 / (k * k * k));
    sum += term;
    if (term <= 1e-16 * sum) break;
  }
  return ((2 * Math.PI * kT ** 3) / (H_PLANCK ** 3 * C_LIGHT ** 2)) * sum;
}

/**
 * Shockley and Queisser's "ultimate efficiency" u (J. Appl. Phys. 32, 510, 1961): the share of a
 * blackbody's power at Ts (K) that photons above Eg (J) deliver when each gives exactly Eg.
 */
export function ultimateEfficiency(Eg: number, Ts: number): number {
  positive('Eg', Eg);
  positive('Ts', Ts);
  return (Eg * photonFluxAbove(Eg, Ts, 0)) / (SIGMA_SB * Ts ** 4);
}

export interface DetailedBalance {
  /** Efficiency at the maximum-power point. */
  eta: number;
  /** Voltage (V) and current density (A/m²) at the maximum-power point. */
  V: number;
  J: number;
  /** Short-circuit current density (A/m²). */
  J_sc: number;
}

/**
 * The detailed-balance limit of a single-junction converter (Shockley and Queisser 1961): a cell of
 * band gap Eg (J) at Ta (K) absorbs every photon above Eg from a blackbody sun at Ts (K) filling the
 * share `dilution`·X of its hemisphere (X the concentration) and from its surroundings, each absorbed
 * photon gives one electron, and the only loss is the light the cell must emit at voltage V, from
 * `faces` faces (1 with a perfect rear mirror, 2 as in the 1961 paper). The output power V·J(V) is
 * maximised over V.
 */
export function detailedBalanceLimit(Eg: number, Ts: number, Ta: number, X: number, dilution: number, faces: number): DetailedBalance {
  positive('Eg', Eg);
  positive('Ts', Ts);
  positive('Ta', Ta);
  positive('X', X);
  if (Ta >= Ts) throw new CheckRangeError('Ta', `The converter (${fmt(Ta)} K) must be cooler than the source (${fmt(Ts)} K).`);
  if (!(dilution > 0 && X * dilution <= 1)) {
    throw new CheckRangeError('X', `The concentration must be between 1 and ${fmt(1 / dilution)} (the sun then fills the whole view).`);
  }
  const q = E_CHARGE;
  const absorbed = X * dilution * photonFluxAbove(Eg, Ts, 0) + Math.max(0, faces - X * dilution) * photonFluxAbove(Eg, Ta, 0);
  const J = (V: number) => q * (absorbed - faces * photonFluxAbove(Eg, Ta, q * V));
  const J_sc = J(0);
  const P_in = X * dilution * SIGMA_SB * Ts ** 4;
  // The open-circuit voltage with Boltzmann statistics bounds the search; the emission with
  // Bose–Einstein statistics is a little larger, so the exact J is negative there.
  const J0 = q * faces * photonFluxAbove(Eg, Ta, 0);
  const kTa = K_BOLTZMANN * Ta;
  const Vhi = Math.min((Eg / q) * (1 - 1e-9), (kTa / q) * Math.log(1 + J_sc / J0) * 1.01);
  // Golden-section search for the largest V·J(V) on [0, Vhi] (the power is unimodal there).
  const g = (Math.sqrt(5) - 1) / 2;
  let a = 0;
  let b = Vhi;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let fc = c * J(c);
  let fd = d * J(d);
  for (let i = 0; i < 80 && b - a > 1e-12 * Vhi; i++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - g * (b - a);
      fc = c * J(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + g * (b - a);
      fd = d * J(d);
    }
  }
  const V = (a + b) / 2;
  const Jm = J(V);
  return { eta: (V * Jm) / P_in, V, J: Jm, J_sc };
}

/**
 * The Shockley–Queisser limit of a single-junction solar cell of band gap Eg (J) at Ta (K) under
 * sunlight taken as a blackbody at Ts (K), concentrated X times (1 = one sun), with a perfect rear
 * mirror (the cell emits from its front face only).
 */
export function shockleyQueisserEfficiency(Eg: number, Ts: number, Ta: number, X: number): number {
  return detailedBalanceLimit(Eg, Ts, Ta, X, SUN_DILUTION, 1).eta;
}

/**
 * The band gap (J) that gives the highest Shockley–Queisser efficiency for these conditions, to the
 * nearest meV, and the efficiency there: a scan of Eg/kTs from 0.4 to 6 in steps of 0.1, refined by a
 * golden-section search. The maximum is flat, so the last digits of an unrounded optimum would depend
 * on rounding in the arithmetic (browser and server would differ); a millielectronvolt changes the
 * efficiency by less than 10^-6 of itself.
 */
export function bestBandGap(Ts: number, Ta: number, X: number): { Eg: number; eta: number } {
  positive('Ts', Ts);
  const kTs = K_BOLTZMANN * Ts;
  const eta = (Eg: number) => shockleyQueisserEfficiency(Eg, Ts, Ta, X);
  let best = 0.4;
  let bestEta = -Infinity;
  for (let i = 0; i <= 56; i++) {
    const xg = 0.4 + 0.1 * i;
    const e = eta(xg * kTs);
    if (e > bestEta) {
      bestEta = e;
      best = xg;
    }
  }
  const g = (Math.sqrt(5) - 1) / 2;
  let a = Math.max(0.05, best - 0.1) * kTs;
  let b = (best + 0.1) * kTs;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let fc = eta(c);
  let fd = eta(d);
  for (let i = 0; i < 40; i++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - g * (b - a);
      fc = eta(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + g * (b - a);
      fd = eta(d);
    }
  }
  const meV = 1e-3 * E_CHARGE;
  const Eg = Math.round((a + b) / 2 / meV) * meV;
  return { Eg, eta: eta(Eg) };
}

/**
 * Largest power efficiency of a converter of light of photon energy E_photon (J) that gives QE
 * carriers per photon, each crossing a voltage V (V): QE·q·V/E_photon.
 */
export function photonConversionBound(QE: number, V: number, E_photon: number): number {
  nonNegative('QE', QE);
  nonNegative('V', V);
  positive('E_photon', E_photon);
  return (QE * E_CHARGE * V) / E_photon;
}
