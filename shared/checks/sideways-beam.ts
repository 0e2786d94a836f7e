/**
 * Relativistic beam under sideways forces only (DESIGN.md §4 item 6), integrated with the Boris pusher
 * (boris.ts). Particles start along z at Lorentz factor γ0 (at a small angle θ0, spread round in
 * azimuth) and are pushed by the steered sideways field of boris.ts — a transverse E of fixed
 * magnitude along each particle's own transverse motion, exactly zero along z — optionally in a
 * uniform B along z (which only turns them) and a uniform E_z (the one force along z).
 * γ rises, and with it the particle's speed; v_z = p_z/(γm), the velocity component along the original
 * axis, falls, while p_z changes only by the impulse q E_z t.
 */
import { runBoris, createBeam, launchAlongZ, uFromGamma, type BorisFields } from './boris';
import { CAUTION_HIGH_VOLTAGE, CAUTION_RADIATION, CAUTION_VACUUM } from './cautions';
import { C_LIGHT, E_CHARGE, M_ELECTRON, M_PROTON } from './constants';
import { CheckRangeError } from './errors';
import { gammaFromKineticEnergy, gyroFrequency } from './formulas';
import { fmt, fmtQ } from './format';
import { readInputs, requirePositive } from './inputs';
import type { CheckDefinition, CheckInputSpec } from './types';

/** p_z must follow p_z0 + q E_z t within this fraction (see createPzTracker in boris.ts for the scale). */
export const BEAM_TOLERANCE = 1e-9;
/** Most particle-steps in one check run (keeps a request under about a second). */
export const BEAM_MAX_PARTICLE_STEPS = 10_000_000;

const inputs: CheckInputSpec[] = [
  {
    name: 'm',
    label: 'Particle mass',
    unit: 'kg',
    default: `${M_ELECTRON} kg`,
    min: 1e-35,
    max: 1e-15,
    presets: [
      { label: 'electron (CODATA 2022)', value: `${M_ELECTRON} kg` },
      { label: 'proton (CODATA 2022)', value: `${M_PROTON} kg` },
    ],
  },
  {
    name: 'q',
    label: 'Particle charge',
    unit: 'C',
    default: `${-E_CHARGE} C`,
    min: -1e-15,
    max: 1e-15,
    presets: [
      { label: 'electron (−e)', value: `${-E_CHARGE} C` },
      { label: 'proton or positron (+e)', value: `${E_CHARGE} C` },
    ],
  },
  {
    name: 'gamma0',
    label: 'Starting Lorentz factor γ0',
    unit: '',
    default: '10',
    min: 1,
    max: 1e7,
    help: 'From a kinetic energy K: γ0 = 1 + K/(mc²) (kit function gamma_from_kinetic_energy); 10 for an electron is about 4.6 MeV.',
  },
  {
    name: 'K0',
    label: 'Starting kinetic energy (0 = use γ0)',
    unit: 'J',
    displayUnit: 'MeV',
    default: '0 MeV',
    min: 0,
    max: 1e-3,
    help: 'When more than zero, it sets the starting Lorentz factor, γ0 = 1 + K/(mc²), and the γ0 field is not used.',
  },
  {
    name: 'theta0',
    label: 'Starting angle to the z axis',
    unit: 'rad',
    displayUnit: 'deg',
    default: '0.5 deg',
    min: 0,
    max: Math.PI / 2,
    help: 'Particles start at this angle, spread round in azimuth, so the sideways field fans them out.',
  },
  {
    name: 'E_side',
    label: 'Sideways field strength',
    unit: 'V / m',
    displayUnit: 'MV / m',
    default: '1 MV / m',
    min: 0,
    max: 1e13,
    help: "Transverse, along each particle's own sideways motion; exactly zero along z.",
  },
  { name: 'B_z', label: 'Magnetic field along z', unit: 'T', default: '0 T', min: -1e4, max: 1e4, help: 'Turns the particles round z; no force along z.' },
  {
    name: 'E_z',
    label: 'Electric field along z',
    unit: 'V / m',
    displayUnit: 'MV / m',
    default: '0 V / m',
    min: -1e13,
    max: 1e13,
    help: 'The one force along z; p_z then changes by q E_z t.',
  },
  { name: 'duration', label: 'Duration', unit: 's', displayUnit: 'ns', default: '20 ns', min: 0, max: 1 },
  { name: 'steps', label: 'Time steps', unit: '', default: '10000', min: 10, max: 1_000_000, integer: true },
  { name: 'particles', label: 'Particles', unit: '', default: '8', min: 1, max: 10_000, integer: true },
];

export const sidewaysBeam: CheckDefinition = {
  name: 'sideways-beam',
  title: 'Relativistic beam under sideways forces only',
  summary:
    'Push a fast charged particle sideways and it gains energy: its Lorentz factor γ rises, and so does its speed. ' +
    'What falls is v_z, the component of its velocity along the original axis, because the velocity turns sideways ' +
    'and p_z = γ m v_z stays fixed while γ grows. That can look like a "drag" or a longitudinal kick, but its ' +
    'momentum along z, p_z, does not change at all without a force along z. ' +
    'Integrated here with the Boris pusher for a small beam. Use it for claims that a sideways force on a beam ' +
    'or on moving charges yields a net push along the beam.',
  condition: `p_z changes only by the impulse of the force along z, q E_z t (within ${BEAM_TOLERANCE} relative)`,
  inputs,
  cautions: [CAUTION_HIGH_VOLTAGE, CAUTION_RADIATION, CAUTION_VACUUM],
  run(si) {
    const x = readInputs(inputs, si);
    requirePositive('duration', 'The duration', x.duration);
    if (x.q === 0) throw new CheckRangeError('q', 'The particle charge must not be zero: fields do not push a neutral particle.');
    if (x.steps * x.particles > BEAM_MAX_PARTICLE_STEPS) {
      throw new CheckRangeError('steps', `Steps × particles must be at most ${BEAM_MAX_PARTICLE_STEPS} (got ${x.steps * x.particles}).`);
    }
    const gammaStart = x.K0 > 0 ? gammaFromKineticEnergy(x.K0, x.m) : x.gamma0;
    const beam = createBeam(x.particles, x.q, x.m);
    launchAlongZ(beam, gammaStart, x.theta0);
    const fields: BorisFields = { E: [0, 0, x.E_z], B: [0, 0, x.B_z], sideE: x.E_side };
    const dt = x.duration / x.steps;
    const run = runBoris(beam, fields, { dt, steps: x.steps, maxPoints: 2000, reference: 0 });
    const last = run.time.length - 1;
    const g0 = run.gamma[0];
    const g1 = run.gamma[last];
    const vz0 = run.vz[0];
    const vz1 = run.vz[last];
    const pz0 = run.pz[0];
    const pz1 = run.pz[last];
    const impulse = run.zForce * x.duration + 0; // q E_z t (+ 0 turns −0 into 0 for a negative charge)
    const holds = run.pzDriftMaxRel <= BEAM_TOLERANCE;
    const omegaDt = x.B_z !== 0 ? gyroFrequency(x.q, x.B_z, x.m, Math.max(g0, g1)) * dt : 0;
    const beta = (v: number) => fmt(v / C_LIGHT, 6);
    /** Speed over c from the Lorentz factor: √(1 − 1/γ²), written (γ² − 1)/γ² to keep digits near γ = 1. */
    const betaOf = (g: number) => Math.sqrt((g - 1) * (g + 1)) / g;
    let message =
      (x.K0 > 0 ? `A kinetic energy of ${fmtQ(x.K0 / E_CHARGE, 'eV')} gives γ0 = ${fmt(gammaStart, 6)}. ` : '') +
      `Over ${fmtQ(x.duration, 's')} (${x.steps} Boris steps, ${x.particles} particles) the sideways field took γ from ` +
      `${fmt(g0, 6)} to ${fmt(g1, 6)}, so the speed rose from ${fmt(betaOf(g0), 6)} c to ${fmt(betaOf(g1), 6)} c, ` +
      `while v_z, the velocity along the original axis, went from ${beta(vz0)} c to ${beta(vz1)} c. ` +
      (x.E_z === 0
        ? `With no force along z, p_z = γ m v_z stayed at ${fmt(pz0, 6)} kg m/s ` +
          (run.pzDriftMaxRel === 0
            ? `exactly, to the last bit, for every particle at every step (tolerance ${BEAM_TOLERANCE}). `
            : `to ${fmt(run.pzDriftMaxRel)} relative (largest drift over every particle and step; tolerance ${BEAM_TOLERANCE}). `)
        : `p_z went from ${fmt(pz0, 6)} to ${fmt(pz1, 6)} kg m/s; the impulse of the z force q E_z t is ` +
          `${fmt(impulse, 6)} N s, matched to ${fmt(run.pzDriftMaxRel)} relative at every step (tolerance ${BEAM_TOLERANCE}). `) +
      (holds
        ? 'A falling v_z is not a push along z: the particle is as hard to stop along z as before; the energy went into sideways motion.'
        : 'That is outside the tolerance: the run is not to be trusted (a smaller time step or fewer steps may help).');
    if (omegaDt > 0.5) {
      message += ` The gyration is coarsely resolved (ω Δt = ${fmt(omegaDt)}): p_z is still kept, but the orbit's shape is not accurate.`;
    }
    const series = (name: string, label: string, unit: string, values: Float64Array) => ({ name, label, unit, values });
    const t = { label: 'Time', unit: 's', values: run.time };
    return {
      check: 'sideways-beam',
      outputs: [
        { name: 'gamma_start', label: 'γ at the start', si: g0, unit: '' },
        { name: 'gamma_end', label: 'γ at the end', si: g1, unit: '' },
        { name: 'vz_start', label: 'v_z at the start', si: vz0, unit: 'm / s', displayUnit: 'km / s' },
        { name: 'vz_end', label: 'v_z at the end', si: vz1, unit: 'm / s', displayUnit: 'km / s' },
        { name: 'pz_start', label: 'p_z at the start', si: pz0, unit: 'kg m / s' },
        { name: 'pz_end', label: 'p_z at the end', si: pz1, unit: 'kg m / s' },
        { name: 'pz_change', label: 'Change of p_z', si: pz1 - pz0, unit: 'kg m / s' },
        { name: 'z_impulse', label: 'Impulse of the z force q E_z t', si: impulse, unit: 'N s' },
        { name: 'pz_drift_rel', label: 'Largest relative departure of p_z from p_z0 + q E_z t', si: run.pzDriftMaxRel, unit: '' },
        { name: 'p_start', label: 'Starting momentum |p|', si: x.m * uFromGamma(gammaStart), unit: 'kg m / s' },
        { name: 'speed_start', label: 'Speed |v| at the start', si: C_LIGHT * betaOf(g0), unit: 'm / s', displayUnit: 'km / s' },
        { name: 'speed_end', label: 'Speed |v| at the end (it rises with γ)', si: C_LIGHT * betaOf(g1), unit: 'm / s', displayUnit: 'km / s' },
      ],
      verdict: { holds, message },
      plots: [
        {
          kind: 'line',
          name: 'pz-vs-time',
          title: 'Momentum along z, p_z = γ m v_z',
          x: t,
          series: [series('pz', 'p_z', 'kg m / s', run.pz)],
          yScale: 'linear',
        },
        {
          kind: 'line',
          name: 'gamma-vs-time',
          title: 'Lorentz factor γ',
          x: t,
          series: [series('gamma', 'γ', '', run.gamma)],
          yScale: 'linear',
        },
        {
          kind: 'line',
          name: 'vz-vs-time',
          title: 'Velocity along z, v_z',
          x: t,
          series: [series('vz', 'v_z', 'm / s', run.vz)],
          yScale: 'linear',
        },
      ],
    };
  },
};
