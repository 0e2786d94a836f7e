/**
 * Closed-system momentum ledger: a frame (mass M) and a slider (mass m) on a frictionless track in
 * the frame, driven against each other by an internal force that is asymmetric in time. Per cycle of
 * period T the frame gets a short hard push +F for the duty fraction d of the cycle and a long gentle
 * pull −F·d/(1 − d) for the rest (the slider gets the opposite): equal and opposite impulses, so the
 * net internal impulse per cycle is zero. (Steps are whole: the hard phase is n1 = round(d·n) of the n
 * steps per cycle and the gentle force is F·n1/(n − n1), so the impulses cancel in the discrete run too.)
 *
 * Two runs, time-stepped with semi-implicit (symplectic) Euler on momenta — p += f Δt, then
 * x += (p/mass) Δt — in Float64Arrays:
 *  1. frictionless support: the internal forces add to zero every step, so the total momentum and the
 *     centre-of-mass velocity stay constant to round-off;
 *  2. a table with Coulomb friction (static μs, kinetic μk, normal force (M + m) g0) under the frame:
 *     the hard push overcomes the static grip and the frame slides forward; the gentle return stays
 *     under it and the table holds the frame still. The frame creeps forward each cycle, pushed by the
 *     table — an external force that free space does not supply.
 * In both runs the slider's starting speed is set so that, over the run, it keeps pace with the frame
 * (no net travel along its track, as a real mechanism with end stops would). In run 1 the frame's
 * starting speed makes the total momentum exactly zero; in run 2 the frame starts at rest on the table.
 * (The frame's motion on the table does not depend on the slider's speed, only on the force profile,
 * so run 2 first steps the frame alone to find its mean speed.)
 */
import { CAUTION_ROTATING } from './cautions';
import { G0 } from './constants';
import { CheckRangeError } from './errors';
import { fmt, fmtQ } from './format';
import { readInputs, requirePositive } from './inputs';
import type { CheckDefinition, CheckInputSpec } from './types';

/** Frictionless runs hold when the total momentum drifts by at most this fraction of one stroke's impulse. */
export const LEDGER_TOLERANCE = 1e-9;
/** Most steps in one run (cycles × steps per cycle). */
export const LEDGER_MAX_STEPS = 2_000_000;

export interface LedgerParams {
  /** Frame mass, kg. */
  M: number;
  /** Slider mass, kg. */
  m: number;
  /** Hard forward push on the frame, N. */
  F_peak: number;
  /** Cycle period, s. */
  period: number;
  /** Fraction of the cycle taken by the hard push (0…1). */
  duty: number;
  mu_s: number;
  mu_k: number;
  cycles: number;
  steps_per_cycle: number;
  /** Most points per recorded series; default 2000. */
  maxPoints?: number;
}

export interface LedgerSeries {
  time: Float64Array;
  /** Momentum of the frame, the slider and their sum, kg m/s. */
  pFrame: Float64Array;
  pSlider: Float64Array;
  pTotal: Float64Array;
  /** Positions, m: the frame, and the centre of mass of frame and slider. */
  xFrame: Float64Array;
  xCom: Float64Array;
}

export interface LedgerResult {
  dt: number;
  /** Steps of the hard push per cycle, and of the gentle return. */
  n1: number;
  n2: number;
  /** The gentle return force on the frame (magnitude), N. */
  F_return: number;
  /** Impulse of one hard push, N s. */
  strokeImpulse: number;
  /** Static grip of the table μs (M + m) g0 and kinetic friction μk (M + m) g0, N. */
  grip: number;
  kineticFriction: number;
  frictionless: LedgerSeries & {
    /** Largest |P(t) − P(0)| over every step, kg m/s. */
    pDriftMax: number;
    /** Centre-of-mass position at the end minus at the start, m. */
    comDisplacement: number;
    /** Largest minus smallest position of the slider along the frame, m. */
    stroke: number;
  };
  friction: LedgerSeries & {
    /** Frame displacement over the run, m. */
    creep: number;
    /** Slider position along the frame at the end minus at the start, m (≈ 0 by the choice of its starting speed). */
    sliderTravel: number;
  };
}

function makeSeries(points: number): LedgerSeries {
  return {
    time: new Float64Array(points),
    pFrame: new Float64Array(points),
    pSlider: new Float64Array(points),
    pTotal: new Float64Array(points),
    xFrame: new Float64Array(points),
    xCom: new Float64Array(points),
  };
}

/** Runs both ledgers. Throws CheckRangeError for figures outside the model. */
export function runMomentumLedger(p: LedgerParams): LedgerResult {
  const { M, m, F_peak: Fh, period, duty, mu_s, mu_k } = p;
  const n = p.steps_per_cycle;
  const cycles = p.cycles;
  if (!(M > 0)) throw new CheckRangeError('M', 'The frame mass must be more than zero.');
  if (!(m > 0)) throw new CheckRangeError('m', 'The slider mass must be more than zero.');
  if (!(period > 0)) throw new CheckRangeError('period', 'The cycle period must be more than zero.');
  if (!(Fh >= 0)) throw new CheckRangeError('F_peak', 'The peak force must not be negative.');
  if (!Number.isInteger(n) || n < 2) throw new CheckRangeError('steps_per_cycle', 'At least 2 steps per cycle are needed.');
  if (!Number.isInteger(cycles) || cycles < 1) throw new CheckRangeError('cycles', 'At least one whole cycle is needed.');
  if (cycles * n > LEDGER_MAX_STEPS) {
    throw new CheckRangeError('steps_per_cycle', `Cycles × steps per cycle must be at most ${LEDGER_MAX_STEPS} (got ${cycles * n}).`);
  }
  if (!(mu_s >= 0)) throw new CheckRangeError('mu_s', 'The static friction coefficient must not be negative.');
  if (!(mu_k >= 0 && mu_k <= mu_s)) {
    throw new CheckRangeError('mu_k', 'The kinetic friction coefficient must be between 0 and the static one.');
  }
  const n1 = Math.min(n - 1, Math.max(1, Math.round(duty * n)));
  const n2 = n - n1;
  const dt = period / n;
  const Fg = (Fh * n1) / n2;
  const N = cycles * n;
  const maxPoints = Math.max(2, Math.floor(p.maxPoints ?? 2000));
  const stride = Math.max(1, Math.ceil(N / (maxPoints - 1)));
  const points = Math.ceil(N / stride) + 1;
  const Mt = M + m;
  const normal = Mt * G0;
  const grip = mu_s * normal;
  const kin = mu_k * normal;

  // Jbar: mean over the steps of the slider's accumulated impulse S_k = Σ_{j≤k} (−f_j) Δt.
  let S = 0;
  let sumS = 0;
  for (let k = 0; k < N; k++) {
    S -= (k % n < n1 ? Fh : -Fg) * dt;
    sumS += S;
  }
  const Jbar = sumS / N;

  // Run 1: frictionless. Momenta start at ±Jbar: zero total, no mean drift of either body.
  const fl = makeSeries(points);
  let pF = Jbar;
  let pS = -Jbar;
  let X = 0;
  let x = 0;
  const P0 = pF + pS;
  let pDriftMax = 0;
  let relMin = 0;
  let relMax = 0;
  let q = 0;
  const rec1 = (t: number): void => {
    fl.time[q] = t;
    fl.pFrame[q] = pF;
    fl.pSlider[q] = pS;
    fl.pTotal[q] = pF + pS;
    fl.xFrame[q] = X;
    fl.xCom[q] = (M * X + m * x) / Mt;
    q++;
  };
  rec1(0);
  const com0 = (M * X + m * x) / Mt;
  for (let k = 0; k < N; k++) {
    const f = k % n < n1 ? Fh : -Fg;
    pF += f * dt;
    pS -= f * dt;
    X += (pF / M) * dt;
    x += (pS / m) * dt;
    const d = Math.abs(pF + pS - P0);
    if (d > pDriftMax) pDriftMax = d;
    const rel = x - X;
    if (rel < relMin) relMin = rel;
    if (rel > relMax) relMax = rel;
    if ((k + 1) % stride === 0 || k + 1 === N) rec1((k + 1) * dt);
  }
  const comDisplacement = (M * X + m * x) / Mt - com0;

  // Run 2: on a table with Coulomb friction. Pass A steps the frame alone (its motion does not depend
  // on the slider) to find its mean speed; pass B steps both, the slider starting so it keeps pace.
  const stepFrame = (V: number, f: number): number => {
    if (V === 0) {
      if (Math.abs(f) <= grip) return 0; // held by static friction
      return ((f - Math.sign(f) * kin) / M) * dt;
    }
    const Vn = V + ((f - Math.sign(V) * kin) / M) * dt;
    return Vn * V <= 0 ? 0 : Vn; // friction stops it within the step (it does not reverse it)
  };
  let V = 0;
  X = 0;
  for (let k = 0; k < N; k++) {
    V = stepFrame(V, k % n < n1 ? Fh : -Fg);
    X += V * dt;
  }
  const meanV = X / (N * dt);
  const fr = makeSeries(points);
  V = 0;
  X = 0;
  x = 0;
  pS = m * meanV - Jbar;
  q = 0;
  const rec2 = (t: number): void => {
    fr.time[q] = t;
    fr.pFrame[q] = M * V;
    fr.pSlider[q] = pS;
    fr.pTotal[q] = M * V + pS;
    fr.xFrame[q] = X;
    fr.xCom[q] = (M * X + m * x) / Mt;
    q++;
  };
  rec2(0);
  for (let k = 0; k < N; k++) {
    const f = k % n < n1 ? Fh : -Fg;
    V = stepFrame(V, f);
    pS -= f * dt;
    X += V * dt;
    x += (pS / m) * dt;
    if ((k + 1) % stride === 0 || k + 1 === N) rec2((k + 1) * dt);
  }

  return {
    dt,
    n1,
    n2,
    F_return: Fg,
    strokeImpulse: Fh * n1 * dt,
    grip,
    kineticFriction: kin,
    frictionless: { ...fl, pDriftMax, comDisplacement, stroke: relMax - relMin },
    friction: { ...fr, creep: X, sliderTravel: x - X },
  };
}

const inputs: CheckInputSpec[] = [
  { name: 'M', label: 'Frame mass', unit: 'kg', default: '1 kg', min: 0, max: 1e6 },
  { name: 'm', label: 'Slider mass', unit: 'kg', default: '0.25 kg', min: 0, max: 1e6 },
  {
    name: 'F_peak',
    label: 'Hard push on the frame',
    unit: 'N',
    default: '5 N',
    min: 0,
    max: 1e7,
    help: 'The short, hard forward push on the frame (the slider is thrown back just as hard).',
  },
  { name: 'period', label: 'Cycle period', unit: 's', displayUnit: 'ms', default: '0.5 s', min: 0, max: 1e4 },
  {
    name: 'duty',
    label: 'Fraction of the cycle taken by the hard push',
    unit: '',
    default: '0.1',
    min: 0.001,
    max: 0.999,
    help: 'The gentle return takes the rest of the cycle, with the same impulse the other way.',
  },
  { name: 'mu_s', label: 'Static friction coefficient, frame on table', unit: '', default: '0.3', min: 0, max: 10 },
  { name: 'mu_k', label: 'Kinetic friction coefficient, frame on table', unit: '', default: '0.25', min: 0, max: 10 },
  { name: 'cycles', label: 'Cycles', unit: '', default: '10', min: 1, max: 1000, integer: true },
  {
    name: 'steps_per_cycle',
    label: 'Time steps per cycle',
    unit: '',
    default: '2000',
    min: 20,
    max: 100_000,
    integer: true,
    help: `Cycles × steps per cycle is limited to ${LEDGER_MAX_STEPS}.`,
  },
];

export const momentumLedger: CheckDefinition = {
  name: 'momentum-ledger',
  title: 'Closed-system momentum ledger (and why it creeps on a table)',
  summary:
    'An "inertial drive" throws a mass inside it one way hard and pulls it back gently. Inside a closed system ' +
    'the push and the pull are equal and opposite impulses, so the total momentum and the velocity of the centre ' +
    'of mass never change: on a frictionless support (or in space) the device only shakes. On a table it can ' +
    'creep, because the hard push breaks the grip of static friction while the gentle return does not: the ' +
    'table is pushing it. Use it for reactionless-drive claims demonstrated on tables, carts, pendulums or floats.',
  condition: `on a frictionless support the total momentum stays constant (within ${LEDGER_TOLERANCE} of one stroke's impulse)`,
  inputs,
  cautions: [CAUTION_ROTATING],
  run(si) {
    const x = readInputs(inputs, si);
    requirePositive('M', 'The frame mass', x.M);
    requirePositive('m', 'The slider mass', x.m);
    requirePositive('period', 'The cycle period', x.period);
    const r = runMomentumLedger({
      M: x.M,
      m: x.m,
      F_peak: x.F_peak,
      period: x.period,
      duty: x.duty,
      mu_s: x.mu_s,
      mu_k: x.mu_k,
      cycles: x.cycles,
      steps_per_cycle: x.steps_per_cycle,
    });
    const drift = r.frictionless.pDriftMax;
    const driftRel = r.strokeImpulse > 0 ? drift / r.strokeImpulse : 0;
    const holds = driftRel <= LEDGER_TOLERANCE;
    const creep = r.friction.creep;
    const cyc = x.cycles;
    let table: string;
    if (x.F_peak <= r.grip) {
      table =
        `On the table the hard push (${fmtQ(x.F_peak, 'N')}) never exceeds the static grip μs(M + m)g0 = ` +
        `${fmtQ(r.grip, 'N')}, so the frame does not move at all (creep ${fmtQ(creep, 'm')}).`;
    } else if (r.F_return <= r.grip) {
      table =
        `On the table the hard push (${fmtQ(x.F_peak, 'N')}) breaks the static grip μs(M + m)g0 = ${fmtQ(r.grip, 'N')} ` +
        `and the frame slides forward; the gentle return (${fmtQ(r.F_return, 'N')}) stays under the grip and the ` +
        `table holds the frame still. The frame creeps ${fmtQ(creep, 'm')} in ${cyc} cycles ` +
        `(${fmtQ(creep / cyc, 'm')} per cycle): the table's friction is the outside force that moves it. ` +
        'In free space there is no table, and no creep.';
    } else {
      table =
        `On the table both the hard push (${fmtQ(x.F_peak, 'N')}) and the return (${fmtQ(r.F_return, 'N')}) break ` +
        `the static grip (${fmtQ(r.grip, 'N')}); the frame slides both ways and ends ${fmtQ(creep, 'm')} from where ` +
        `it started after ${cyc} cycles. Whatever it does there, it does by pushing on the table.`;
    }
    const message =
      (holds
        ? `With no friction, over ${cyc} cycles the total momentum stayed constant ` +
          (drift === 0
            ? `exactly (to the last bit; one stroke's impulse is ${fmtQ(r.strokeImpulse, 'N s')})`
            : `to ${fmtQ(drift, 'kg m / s')} (${fmt(driftRel)} of one stroke's impulse, ${fmtQ(r.strokeImpulse, 'N s')}: round-off)`) +
          ` and the centre of mass ` +
          `moved ${fmtQ(r.frictionless.comDisplacement, 'm')}, while the slider swung through ${fmtQ(r.frictionless.stroke, 'm')}. ` +
          'The hard push and the gentle return are equal and opposite impulses, so the device only shakes in place. '
        : `With no friction the total momentum drifted by ${fmtQ(drift, 'kg m / s')}, ${fmt(driftRel)} of one stroke's ` +
          `impulse — more than the ${LEDGER_TOLERANCE} allowed; the run is not to be trusted. `) + table;
    const fl = r.frictionless;
    const fr = r.friction;
    return {
      check: 'momentum-ledger',
      outputs: [
        { name: 'p_drift', label: 'Largest drift of total momentum, frictionless', si: drift, unit: 'kg m / s' },
        { name: 'p_drift_rel', label: "Largest drift of total momentum over one stroke's impulse", si: driftRel, unit: '' },
        { name: 'com_displacement', label: 'Centre-of-mass displacement, frictionless', si: fl.comDisplacement, unit: 'm' },
        { name: 'stroke', label: 'Slider travel along the frame, frictionless', si: fl.stroke, unit: 'm' },
        { name: 'creep', label: 'Frame creep on the table over the run', si: creep, unit: 'm' },
        { name: 'creep_per_cycle', label: 'Frame creep per cycle', si: creep / cyc, unit: 'm' },
        { name: 'grip', label: 'Static grip of the table μs(M + m)g0', si: r.grip, unit: 'N' },
        { name: 'F_return', label: 'Gentle return force', si: r.F_return, unit: 'N' },
      ],
      verdict: { holds, message },
      plots: [
        {
          kind: 'line',
          name: 'momentum-frictionless',
          title: 'Momentum on a frictionless support',
          x: { label: 'Time', unit: 's', values: fl.time },
          series: [
            { name: 'p_total', label: 'Total momentum', unit: 'kg m / s', values: fl.pTotal },
            { name: 'p_frame', label: 'Frame momentum', unit: 'kg m / s', values: fl.pFrame },
            { name: 'p_slider', label: 'Slider momentum', unit: 'kg m / s', values: fl.pSlider },
          ],
          yScale: 'linear',
        },
        {
          kind: 'line',
          name: 'momentum-friction',
          title: 'Momentum on a table with friction',
          x: { label: 'Time', unit: 's', values: fr.time },
          series: [
            { name: 'p_total', label: 'Total momentum', unit: 'kg m / s', values: fr.pTotal },
            { name: 'p_frame', label: 'Frame momentum', unit: 'kg m / s', values: fr.pFrame },
            { name: 'p_slider', label: 'Slider momentum', unit: 'kg m / s', values: fr.pSlider },
          ],
          yScale: 'linear',
        },
        {
          kind: 'line',
          name: 'centre-of-mass',
          title: 'Centre of mass and frame position',
          x: { label: 'Time', unit: 's', values: fl.time },
          series: [
            { name: 'x_com_frictionless', label: 'Centre of mass, frictionless', unit: 'm', values: fl.xCom },
            { name: 'x_com_friction', label: 'Centre of mass, on the table', unit: 'm', values: fr.xCom },
            { name: 'x_frame_friction', label: 'Frame, on the table', unit: 'm', values: fr.xFrame },
          ],
          yScale: 'linear',
        },
      ],
    };
  },
};
