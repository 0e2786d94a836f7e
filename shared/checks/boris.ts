/**
 * The relativistic Boris pusher on typed arrays, for many particles of one species at once.
 *
 * State: positions x (m) and momenta per unit mass u = γv (m/s), three Float64Array entries per
 * particle. One step of length Δt (the standard scheme, J. P. Boris, "Relativistic plasma simulation —
 * optimization of a hybrid code", Proc. Fourth Conf. on Numerical Simulation of Plasmas, NRL,
 * Washington DC, 1970, pp. 3–67 (page range from memory); and C. K. Birdsall & A. B. Langdon, Plasma Physics via Computer
 * Simulation, McGraw-Hill 1985 / IOP 1991, ch. 4 (§4-3, §4-4, the v × B rotation) and ch. 15 (relativistic form) — section numbers from memory):
 *
 *   u⁻ = uⁿ + (qΔt/2m) E                       half electric kick
 *   γ⁻ = √(1 + |u⁻|²/c²)
 *   t  = (qΔt / 2γ⁻m) B,   s = 2t/(1 + |t|²)
 *   u′ = u⁻ + u⁻ × t,      u⁺ = u⁻ + u′ × s     magnetic rotation (|u⁺| = |u⁻| exactly in exact arithmetic)
 *   uⁿ⁺¹ = u⁺ + (qΔt/2m) E                     second half kick
 *   xⁿ⁺¹ = xⁿ + Δt uⁿ⁺¹/γⁿ⁺¹
 *
 * Fields (BorisFields) are the sum of
 *  (a) a uniform E and a uniform B;
 *  (b) the *steered sideways field*: a transverse E of fixed magnitude `sideE` pointing along the
 *      particle's own transverse momentum (u_x, u_y)/|u_⊥| taken at the start of the step, signed with
 *      the charge so that the push q E is along the transverse motion for either sign of charge
 *      (along +x while u_⊥ = 0). It always does positive work, so γ rises, and its z component is
 *      exactly zero by construction. It is a model field (not a solution of Maxwell's equations),
 *      chosen because it pushes sideways and only sideways, every step;
 *  (c) a rotating transverse E of amplitude `rotE`: (cos(ωt+φ), sin(ωt+φ), 0)·rotE, evaluated at the
 *      middle of the step; also exactly zero along z.
 * With E_z = 0 and B along z only, every sub-step of the scheme adds exactly zero to u_z (the z
 * component of u⁻ × t is u_x·0 − u_y·0 = 0 and likewise for u′ × s), so p_z = m u_z is conserved to
 * the last bit while γ rises and v_z = u_z/γ falls. A transverse B (B_x, B_y ≠ 0) does push along z
 * (q v × B has a z component), and so does E_z: the change of p_z then equals q E_z t plus the
 * magnetic part.
 *
 * The inner loop allocates nothing: all state lives in the beam's typed arrays.
 */
import { C_LIGHT } from './constants';

export type Vec3 = readonly [number, number, number];

export interface BorisFields {
  /** Uniform electric field, V/m. */
  E?: Vec3;
  /** Uniform magnetic field, T. */
  B?: Vec3;
  /** Magnitude (V/m) of the steered sideways field (b above); 0 or absent for none. */
  sideE?: number;
  /** Amplitude (V/m) of the rotating transverse field (c above); 0 or absent for none. */
  rotE?: number;
  /** Angular frequency (rad/s) of the rotating field. */
  rotOmega?: number;
  /** Phase (rad) of the rotating field at t = 0. */
  rotPhase?: number;
}

/** Many particles of one species: charge q (C), mass m (kg), positions x (m), momenta per mass u = γv (m/s). */
export interface Beam {
  readonly count: number;
  readonly charge: number;
  readonly mass: number;
  /** x, y, z of particle i at 3i, 3i+1, 3i+2. */
  readonly x: Float64Array;
  /** u = γv of particle i at 3i, 3i+1, 3i+2. */
  readonly u: Float64Array;
  /** Time of the state, s. */
  time: number;
}

const INV_C2 = 1 / (C_LIGHT * C_LIGHT);

export function createBeam(count: number, charge: number, mass: number): Beam {
  if (!Number.isInteger(count) || count < 1) throw new RangeError('A beam needs at least one particle.');
  if (!(mass > 0)) throw new RangeError('The particle mass must be more than zero.');
  return { count, charge, mass, x: new Float64Array(3 * count), u: new Float64Array(3 * count), time: 0 };
}

/** Lorentz factor of u = γv: √(1 + |u|²/c²). */
export function gammaOfU(ux: number, uy: number, uz: number): number {
  return Math.sqrt(1 + (ux * ux + uy * uy + uz * uz) * INV_C2);
}

/** |u| = γ|v| = c√(γ² − 1) for a Lorentz factor γ ≥ 1. */
export function uFromGamma(gamma: number): number {
  return C_LIGHT * Math.sqrt((gamma - 1) * (gamma + 1));
}

/**
 * Sets every particle moving at Lorentz factor γ0 at angle θ0 (rad) to the z axis, particle i with its
 * transverse momentum at azimuth 2πi/count (so a steered field spreads the beam into a ring), all
 * starting at the origin.
 */
export function launchAlongZ(beam: Beam, gamma0: number, theta0 = 0): void {
  const u = uFromGamma(gamma0);
  const uz = u * Math.cos(theta0);
  const up = u * Math.sin(theta0);
  for (let i = 0; i < beam.count; i++) {
    const phi = (2 * Math.PI * i) / beam.count;
    beam.u[3 * i] = up * Math.cos(phi);
    beam.u[3 * i + 1] = up * Math.sin(phi);
    beam.u[3 * i + 2] = uz;
    beam.x[3 * i] = 0;
    beam.x[3 * i + 1] = 0;
    beam.x[3 * i + 2] = 0;
  }
}

/**
 * Watches p_z against the impulse of the z force while the beam is pushed: the largest
 * |u_z − (u_z0 + (q E_z/m)(t − t0))| / scale over every particle and step.
 */
export interface PzTracker {
  /** u_z of each particle at t0. */
  readonly uz0: Float64Array;
  /** Per-particle scale for the relative drift (m/s). */
  readonly scale: Float64Array;
  readonly t0: number;
  /** du_z/dt from the uniform E_z: q E_z / m (m/s²). */
  readonly kz: number;
  maxRel: number;
}

/**
 * A tracker starting now. The scale of particle i is the larger of |u_z0| and |kz|·duration (the z
 * impulse over the run, per mass), or |u0| when both are zero, or 1 m/s for a particle at rest.
 */
export function createPzTracker(beam: Beam, fields: BorisFields, duration: number): PzTracker {
  const n = beam.count;
  const uz0 = new Float64Array(n);
  const scale = new Float64Array(n);
  const ez = fields.E ? fields.E[2] : 0;
  const kz = (beam.charge * ez) / beam.mass;
  for (let i = 0; i < n; i++) {
    const ux = beam.u[3 * i];
    const uy = beam.u[3 * i + 1];
    const uz = beam.u[3 * i + 2];
    uz0[i] = uz;
    let s = Math.max(Math.abs(uz), Math.abs(kz) * duration);
    if (s === 0) s = Math.sqrt(ux * ux + uy * uy);
    scale[i] = s > 0 ? s : 1;
  }
  return { uz0, scale, t0: beam.time, kz, maxRel: 0 };
}

/**
 * Advances the beam by `steps` Boris steps of length dt (s). Allocation-free. When a tracker is given,
 * it is updated after every step of every particle.
 */
export function borisAdvance(beam: Beam, fields: BorisFields, dt: number, steps: number, tracker: PzTracker | null = null): void {
  const n = beam.count;
  const X = beam.x;
  const U = beam.u;
  const h = (beam.charge * dt) / (2 * beam.mass); // qΔt/2m
  const E = fields.E;
  const B = fields.B;
  const e0x = E ? E[0] : 0;
  const e0y = E ? E[1] : 0;
  const ez = E ? E[2] : 0;
  const bx = B ? B[0] : 0;
  const by = B ? B[1] : 0;
  const bz = B ? B[2] : 0;
  const hasB = bx !== 0 || by !== 0 || bz !== 0;
  const side = fields.sideE ? (beam.charge >= 0 ? fields.sideE : -fields.sideE) : 0;
  const rotE = fields.rotE ?? 0;
  const rotOmega = fields.rotOmega ?? 0;
  const rotPhase = fields.rotPhase ?? 0;
  const t0 = beam.time;
  const uz0 = tracker ? tracker.uz0 : null;
  const scale = tracker ? tracker.scale : null;
  const kz = tracker ? tracker.kz : 0;
  const tt0 = tracker ? tracker.t0 : 0;
  let maxRel = tracker ? tracker.maxRel : 0;

  for (let k = 0; k < steps; k++) {
    let ebx = e0x;
    let eby = e0y;
    if (rotE !== 0) {
      const ph = rotOmega * (t0 + (k + 0.5) * dt) + rotPhase;
      ebx += rotE * Math.cos(ph);
      eby += rotE * Math.sin(ph);
    }
    const tEnd = t0 + (k + 1) * dt;
    for (let i = 0, j = 0; i < n; i++, j += 3) {
      let ux = U[j];
      let uy = U[j + 1];
      let uz = U[j + 2];
      let ex = ebx;
      let ey = eby;
      if (side !== 0) {
        const up = Math.sqrt(ux * ux + uy * uy);
        if (up > 0) {
          ex += (side * ux) / up;
          ey += (side * uy) / up;
        } else {
          ex += side;
        }
      }
      // first half electric kick
      ux += h * ex;
      uy += h * ey;
      uz += h * ez;
      if (hasB) {
        const g = Math.sqrt(1 + (ux * ux + uy * uy + uz * uz) * INV_C2);
        const f = h / g;
        const tx = f * bx;
        const ty = f * by;
        const tz = f * bz;
        const s = 2 / (1 + tx * tx + ty * ty + tz * tz);
        const px = ux + (uy * tz - uz * ty);
        const py = uy + (uz * tx - ux * tz);
        const pz = uz + (ux * ty - uy * tx);
        const sx = s * tx;
        const sy = s * ty;
        const sz = s * tz;
        ux += py * sz - pz * sy;
        uy += pz * sx - px * sz;
        uz += px * sy - py * sx;
      }
      // second half electric kick
      ux += h * ex;
      uy += h * ey;
      uz += h * ez;
      const invG = 1 / Math.sqrt(1 + (ux * ux + uy * uy + uz * uz) * INV_C2);
      X[j] += dt * ux * invG;
      X[j + 1] += dt * uy * invG;
      X[j + 2] += dt * uz * invG;
      U[j] = ux;
      U[j + 1] = uy;
      U[j + 2] = uz;
      if (uz0 !== null && scale !== null) {
        const d = Math.abs(uz - (uz0[i] + kz * (tEnd - tt0))) / scale[i];
        if (d > maxRel) maxRel = d;
      }
    }
  }
  beam.time = t0 + steps * dt;
  if (tracker) tracker.maxRel = maxRel;
}

export interface BorisRunOptions {
  dt: number;
  steps: number;
  /** Most points per recorded series (≥ 2); default 2000. */
  maxPoints?: number;
  /** Index of the particle whose γ, v_z and p_z are recorded; default 0. */
  reference?: number;
}

export interface BorisRun {
  /** Recorded times (s), at most maxPoints, always including the start and the end. */
  time: Float64Array;
  /** γ, v_z (m/s) and p_z = γ m v_z (kg m/s) of the reference particle at those times. */
  gamma: Float64Array;
  vz: Float64Array;
  pz: Float64Array;
  /** Largest |p_z − p_z0 − q E_z (t − t0)| over every particle and step, relative (see createPzTracker). */
  pzDriftMaxRel: number;
  /** q E_z: the rate of change of p_z the uniform E_z alone would give (N). */
  zForce: number;
  steps: number;
  dt: number;
}

/** Pushes the beam, recording the reference particle (downsampled) and watching p_z at every step. */
export function runBoris(beam: Beam, fields: BorisFields, opts: BorisRunOptions): BorisRun {
  const { dt, steps } = opts;
  const maxPoints = Math.max(2, Math.floor(opts.maxPoints ?? 2000));
  const ref = opts.reference ?? 0;
  if (!(ref >= 0 && ref < beam.count)) throw new RangeError('The reference particle is not in the beam.');
  const stride = Math.max(1, Math.ceil(steps / (maxPoints - 1)));
  const points = Math.ceil(steps / stride) + 1;
  const time = new Float64Array(points);
  const gamma = new Float64Array(points);
  const vz = new Float64Array(points);
  const pz = new Float64Array(points);
  const m = beam.mass;
  const record = (p: number): void => {
    const ux = beam.u[3 * ref];
    const uy = beam.u[3 * ref + 1];
    const uz = beam.u[3 * ref + 2];
    const g = gammaOfU(ux, uy, uz);
    time[p] = beam.time;
    gamma[p] = g;
    vz[p] = uz / g;
    pz[p] = m * uz;
  };
  const tracker = createPzTracker(beam, fields, steps * dt);
  record(0);
  let done = 0;
  let p = 1;
  while (done < steps) {
    const k = Math.min(stride, steps - done);
    borisAdvance(beam, fields, dt, k, tracker);
    done += k;
    record(p++);
  }
  const ez = fields.E ? fields.E[2] : 0;
  return { time, gamma, vz, pz, pzDriftMaxRel: tracker.maxRel, zForce: beam.charge * ez, steps, dt };
}
