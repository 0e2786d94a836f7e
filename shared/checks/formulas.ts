/**
 * The numeric cores of the check kit, in SI. The checks call these, and kit-functions.ts exposes the
 * same functions to worksheets, so each formula is written once. Each throws CheckRangeError naming
 * the argument when its figures are outside the formula's domain.
 */
import { C_LIGHT, G0 } from './constants';
import { E_CHARGE, FARADAY, H_PLANCK, K_BOLTZMANN, N_AVOGADRO, R_GAS, SIGMA_SB, SUN_DILUTION } from './constants';
import { CheckRangeError } from './errors';
import { fmt } from './format';

function finite(field: string, v: number): void {
  if (typeof v !== 'number' || !Number.isFinite(v)) throw new CheckRangeError(field, `${field} must be a finite number.`);
}
function nonNegative(field: string, v: number): void {
  finite(field, v);
  if (v < 0) throw new CheckRangeError(field, `${field} must not be negative (got ${fmt(v)}).`);
}
function positive(field: string, v: number): void {
  finite(field, v);
  if (!(v > 0)) throw new CheckRangeError(field, `${field} must be more than zero (got ${fmt(v)}).`);
}

/** Largest thrust (N) of a device that emits only radiation, from the power P (W) it radiates: P/c. */
export function photonThrustBound(P: number): number {
  nonNegative('P', P);
  return P / C_LIGHT;
}

/** Speed (m/s) at which a constant thrust F (N) delivers kinetic power F·v equal to the input power P (W): P/F. */
export function breakEvenSpeed(P: number, F: number): number {
  nonNegative('P', P);
  positive('F', F);
  return P / F;
}

/** Mechanical power (W) a thrust F (N) delivers to a body moving at v (m/s) along it: F·v. */
export function kineticPower(F: number, v: number): number {
  finite('F', F);
  finite('v', v);
  return F * v;
}

/**
 * Both temperatures above zero and Tc ≤ Th. Tc = Th is allowed: a single reservoir, where a heat
 * engine can do no work (bound 0, the Kelvin–Planck statement) and moving heat needs no work in the
 * reversible limit (the COP bounds are infinite).
 */
function carnotTemperatures(Th: number, Tc: number): void {
  positive('Th', Th);
  positive('Tc', Tc);
  if (Tc > Th) {
    throw new CheckRangeError('Tc', `The cold temperature (${fmt(Tc)} K) must not be above the hot one (${fmt(Th)} K).`);
  }
}

/** Carnot's bound on the efficiency of a heat engine between Th and Tc (K): 1 − Tc/Th; 0 when Tc = Th. */
export function carnotEfficiency(Th: number, Tc: number): number {
  carnotTemperatures(Th, Tc);
  return 1 - Tc / Th;
}

/** Carnot's bound on a heat pump's heating COP (heat delivered at Th per unit work): Th/(Th − Tc); infinite when Tc = Th. */
export function carnotCopHeating(Th: number, Tc: number): number {
  carnotTemperatures(Th, Tc);
  return Tc === Th ? Number.POSITIVE_INFINITY : Th / (Th - Tc);
}

/** Carnot's bound on a refrigerator's cooling COP (heat drawn at Tc per unit work): Tc/(Th − Tc); infinite when Tc = Th. */
export function carnotCopCooling(Th: number, Tc: number): number {
  carnotTemperatures(Th, Tc);
  return Tc === Th ? Number.POSITIVE_INFINITY : Tc / (Th - Tc);
}

/** Exhaust speed (m/s) from a specific impulse Isp (s): Isp·g0. */
export function exhaustSpeedFromIsp(Isp: number): number {
  nonNegative('Isp', Isp);
  return Isp * G0;
}

/** Tsiolkovsky's ideal velocity change (m/s): v_e ln(m0/m1), for exhaust speed v_e and masses m0 ≥ m1 > 0. */
export function tsiolkovskyDv(v_e: number, m0: number, m1: number): number {
  nonNegative('v_e', v_e);
  positive('m1', m1);
  positive('m0', m0);
  if (m1 > m0) throw new CheckRangeError('m1', `The final mass (${fmt(m1)} kg) cannot exceed the starting mass (${fmt(m0)} kg).`);
  return v_e * Math.log(m0 / m1);
}

/**
 * The relativistic rocket equation (Ackeret 1946): the speed (m/s) gained from rest, relative to the
 * starting frame, by a rocket whose exhaust leaves at v_e (m/s, 0 ≤ v_e ≤ c, in the rocket's frame)
 * while its rest mass falls from m0 to m1: c·tanh((v_e/c)·ln(m0/m1)). Always below c; for a photon
 * exhaust (v_e = c) it gives m0/m1 = √((1 + β)/(1 − β)). It is always the correct form; Tsiolkovsky's
 * v_e ln(m0/m1) is its limit for v_e ln(m0/m1) ≪ c (see newtonianRocketExcess).
 */
export function relativisticRocketDv(v_e: number, m0: number, m1: number): number {
  if (v_e > C_LIGHT) throw new CheckRangeError('v_e', `The exhaust speed (${fmt(v_e)} m/s) cannot exceed the speed of light.`);
  const newtonian = tsiolkovskyDv(v_e, m0, m1); // checks v_e, m0, m1
  return C_LIGHT * Math.tanh(newtonian / C_LIGHT);
}

/**
 * How much Tsiolkovsky's Newtonian Δv overstates the relativistic one, as a fraction:
 * x/tanh(x) − 1 with x = v_e ln(m0/m1)/c (0 when no propellant is spent). About x²/3 for small x.
 */
export function newtonianRocketExcess(v_e: number, m0: number, m1: number): number {
  const newtonian = tsiolkovskyDv(v_e, m0, m1);
  const x = newtonian / C_LIGHT;
  if (x === 0) return 0;
  // For small x, x/tanh(x) − 1 loses digits to cancellation: the series x²/3 − x⁴/45 + 2x⁶/945 instead.
  if (x < 1e-3) return (x * x) / 3 - (x ** 4) / 45 + (2 * x ** 6) / 945;
  return x / Math.tanh(x) - 1;
}

/**
 * The Newtonian Δv over c, x = v_e ln(m0/m1)/c, below which Tsiolkovsky's form agrees with the
 * relativistic one to within `fraction` (x/tanh(x) − 1 ≤ fraction), found by bisection:
 * 0.0548 for 0.1 % (about 16 400 km/s of v_e ln(m0/m1)).
 */
export function rocketAgreementLimit(fraction: number): number {
  positive('fraction', fraction);
  const excess = (x: number) => (x < 1e-3 ? (x * x) / 3 - (x ** 4) / 45 : x / Math.tanh(x) - 1);
  let lo = 0;
  let hi = 1;
  while (excess(hi) < fraction) hi *= 2;
  for (let i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
    const mid = (lo + hi) / 2;
    if (excess(mid) > fraction) hi = mid;
    else lo = mid;
  }
  return lo;
}

/**
 * Force (N) on a straight lead of length L (m) carrying current I (A) across a field B (T), at its
 * largest (lead perpendicular to the field): |I·L·B|.
 */
export function leadLorentzForce(I: number, L: number, B: number): number {
  finite('I', I);
  nonNegative('L', L);
  finite('B', B);
  return Math.abs(I * L * B);
}

/**
 * Recoil (N) of radiating power P (W) with a net asymmetry fraction f (0…1) in one direction: f·P/c.
 * f is 1 for a collimated beam, 2/3 for a flat face radiating diffusely (Lambertian: the mean of
 * cos θ over the emitted power, ∫cos²θ sinθ dθ / ∫cosθ sinθ dθ on [0, π/2]), 0 for isotropic emission.
 */
export function radiationRecoilForce(P: number, f: number): number {
  nonNegative('P', P);
  nonNegative('f', f);
  if (f > 1) throw new CheckRangeError('f', `The asymmetry fraction must be between 0 and 1 (got ${fmt(f)}).`);
  return (f * P) / C_LIGHT;
}

/** Apparent force (N) from a balance's thermal drift: sensitivity k (N/K) times temperature rise ΔT (K), |k·ΔT|. */
export function thermalDriftForce(k: number, dT: number): number {
  finite('k', k);
  finite('dT', dT);
  return Math.abs(k * dT);
}

/** Reaction force (N) of gas leaving at mass rate mdot (kg/s) and speed v (m/s), all one way: mdot·v. */
export function outgassingForce(mdot: number, v: number): number {
  nonNegative('mdot', mdot);
  nonNegative('v', v);
  return mdot * v;
}

/** Angular gyro-frequency (rad/s) of charge q (C) of mass m (kg) and Lorentz factor γ in field B (T): |q|B/(γm). */
export function gyroFrequency(q: number, B: number, m: number, gamma: number): number {
  finite('q', q);
  finite('B', B);
  positive('m', m);
  finite('gamma', gamma);
  if (gamma < 1) throw new CheckRangeError('gamma', `The Lorentz factor must be at least 1 (got ${fmt(gamma)}).`);
  return (Math.abs(q) * Math.abs(B)) / (gamma * m);
}

/** Gyro-radius (m) of a charge q (C) with momentum p_perp (kg m/s) across field B (T): p⊥/(|q|B). */
export function gyroRadius(p_perp: number, q: number, B: number): number {
  nonNegative('p_perp', p_perp);
  finite('q', q);
  finite('B', B);
  if (q === 0) throw new CheckRangeError('q', 'The charge must not be zero: a neutral particle does not gyrate.');
  if (B === 0) throw new CheckRangeError('B', 'The field must not be zero: in no field the orbit is straight.');
  return p_perp / (Math.abs(q) * Math.abs(B));
}

/** Lorentz factor from kinetic energy K (J) and rest mass m (kg): 1 + K/(m c²). */
export function gammaFromKineticEnergy(K: number, m: number): number {
  nonNegative('K', K);
  positive('m', m);
  return 1 + K / (m * C_LIGHT * C_LIGHT);
}

/** First-law balance (J) of a cycle: energy in − energy out − increase of stored energy. */
export function firstLawBalance(E_in: number, E_out: number, dE_stored: number): number {
  finite('E_in', E_in);
  finite('E_out', E_out);
  finite('dE_stored', dE_stored);
  return E_in - E_out - dE_stored;
}

/** Over-unity ratio: energy out over the net energy supplied, E_out/(E_in − ΔE_stored). */
export function overUnityRatio(E_in: number, E_out: number, dE_stored: number): number {
  finite('E_in', E_in);
  finite('E_out', E_out);
  finite('dE_stored', dE_stored);
  const net = E_in - dE_stored;
  if (!(net > 0)) {
    throw new CheckRangeError('E_in', `The net energy supplied (E_in − ΔE_stored = ${fmt(net)} J) must be more than zero for a ratio.`);
  }
  return E_out / net;
}

// ——— Faraday yield, nuclear signature, road load, light converters, Landauer's bound ———

/**
 * Amount of substance (mol) that a current I (A) flowing for a time t (s) turns over at z electrons
 * per formula unit, through one cell: I·t/(z·F) (Faraday's law of electrolysis). Hydrogen from
 * water takes z = 2, oxygen z = 4.
 */
export function faradayMoles(I: number, t: number, z: number): number {
  nonNegative('I', I);
  nonNegative('t', t);
  positive('z', z);
  return (I * t) / (z * FARADAY);
}

/** Volume (m³) of n mol of an ideal gas at temperature T (K) and pressure p (Pa): n·R·T/p. */
export function idealGasVolume(n: number, T: number, p: number): number {
  nonNegative('n', n);
  positive('T', T);
  positive('p', p);
  return (n * R_GAS * T) / p;
}

/** Number of atoms in a mass m (kg) of an element of molar mass M (kg/mol): m·N_A/M. */
export function atomsInMass(m: number, M: number): number {
  nonNegative('m', m);
  positive('M', M);
  return (m * N_AVOGADRO) / M;
}

/** Reactions per second (1/s) that give a power P (W) when each releases an energy Q (J): P/Q. */
export function reactionRate(P: number, Q: number): number {
  nonNegative('P', P);
  positive('Q', Q);
  return P / Q;
}

/** Particles per square metre per second at a distance r (m) from a point source emitting S per second alike in all directions: S/(4πr²). */
export function isotropicFluenceRate(S: number, r: number): number {
  nonNegative('S', S);
  positive('r', r);
  return S / (4 * Math.PI * r * r);
}

/** Aerodynamic drag (N) of a body of drag coefficient Cd and frontal area A (m²) at speed v (m/s) in air of density rho (kg/m³): ½·ρ·Cd·A·v². */
export function aerodynamicDrag(rho: number, Cd: number, A: number, v: number): number {
  nonNegative('rho', rho);
  nonNegative('Cd', Cd);
  nonNegative('A', A);
  finite('v', v);
  return 0.5 * rho * Cd * A * v * v;
}

/** Rolling resistance (N) of a vehicle of mass m (kg) with rolling-resistance coefficient Crr on level ground: Crr·m·g0. */
export function rollingResistance(Crr: number, m: number): number {
  nonNegative('Crr', Crr);
  nonNegative('m', m);
  return Crr * m * G0;
}

/**
 * Road load (N) on level ground at a steady speed v (m/s): ½·ρ·Cd·A·v² + Crr·m·g0. A force is an
 * energy per distance: newtons are joules per metre.
 */
export function roadLoad(rho: number, Cd: number, A: number, v: number, Crr: number, m: number): number {
  return aerodynamicDrag(rho, Cd, A, v) + rollingResistance(Crr, m);
}

/**
 * Least drag (N) that an on-board generator delivering a power P_gen (W) adds to a vehicle moving
 * at v (m/s), when the power comes from the vehicle's own motion (wind, wheels): P_gen/v.
 */
export function generatorDrag(P_gen: number, v: number): number {
  nonNegative('P_gen', P_gen);
  positive('v', v);
  return P_gen / v;
}

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

/** Landauer's bound (J): the least heat given off to surroundings at T (K) for each bit erased, k_B·T·ln 2. */
export function landauerBound(T: number): number {
  nonNegative('T', T);
  return K_BOLTZMANN * T * Math.LN2;
}
