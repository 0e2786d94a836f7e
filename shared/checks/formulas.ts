/**
 * The numeric cores of the check kit, in SI. The checks call these, and kit-functions.ts exposes the
 * same functions to worksheets, so each formula is written once. Each throws CheckRangeError naming
 * the argument when its figures are outside the formula's domain (guards.ts). The limits of light
 * converters are in light-formulas.ts and exported from here too.
 */
import { C_LIGHT, G0 } from './constants';
import { FARADAY, K_BOLTZMANN, N_AVOGADRO, R_GAS } from './constants';
import { CheckRangeError } from './errors';
import { fmt } from './format';
import { finite, nonNegative, positive } from './guards';

// The limits of converting light into work (Landsberg, Shockley–Queisser, photon conversion).
export * from './light-formulas';

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

/** Landauer's bound (J): the least heat given off to surroundings at T (K) for each bit erased, k_B·T·ln 2. */
export function landauerBound(T: number): number {
  nonNegative('T', T);
  return K_BOLTZMANN * T * Math.LN2;
}
