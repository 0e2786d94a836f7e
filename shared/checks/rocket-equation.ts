import { CheckRangeError } from './errors';
import { C_LIGHT } from './constants';
import { exhaustSpeedFromIsp, newtonianRocketExcess, relativisticRocketDv, rocketAgreementLimit, tsiolkovskyDv } from './formulas';
import { CAUTION_PROPELLANTS, CAUTION_VACUUM } from './cautions';
import { fmt, fmtQ } from './format';
import { readInputs, requirePositive } from './inputs';
import { constantSeries, linspace, mapSeries } from './series';
import type { CheckDefinition, CheckInputSpec, CheckOutput, LinePlot } from './types';

/** When both v_e and Isp are given they must agree to within this fraction. */
export const EXHAUST_AGREEMENT = 0.005;

/**
 * The verdict compares the claim with the relativistic Δv, which is always correct, to this relative
 * tolerance (round-off of typed figures only; it also covers the ~10⁻¹⁰ by which the two forms differ
 * at chemical exhaust speeds, so such verdicts are the same as Tsiolkovsky's).
 */
export const ROCKET_TOLERANCE = 1e-9;
/** The forms are said to agree when Tsiolkovsky's Δv overstates the relativistic one by at most this fraction. */
export const ROCKET_FORMS_AGREE = 0.001;
/** v_e ln(m0/m1) over c below which they agree to ROCKET_FORMS_AGREE: 0.0548 (computed, x/tanh x − 1 = 0.001). */
export const ROCKET_AGREEMENT_X = rocketAgreementLimit(ROCKET_FORMS_AGREE);

const inputs: CheckInputSpec[] = [
  {
    name: 'v_e',
    label: 'Effective exhaust speed (0 = give Isp instead)',
    unit: 'm / s',
    displayUnit: 'km / s',
    default: '3 km / s',
    min: 0,
    max: 299_792_458,
  },
  {
    name: 'Isp',
    label: 'Specific impulse (0 = give the exhaust speed instead)',
    unit: 's',
    default: '0 s',
    min: 0,
    max: 3e7,
    help: 'Isp in seconds; the exhaust speed is Isp·g0 with g0 = 9.80665 m/s².',
  },
  { name: 'm0', label: 'Starting mass (with propellant)', unit: 'kg', default: '1000 kg', min: 0, max: 1e12 },
  { name: 'm1', label: 'Final mass (propellant spent)', unit: 'kg', default: '300 kg', min: 0, max: 1e12 },
  {
    name: 'dv_claimed',
    label: 'Claimed velocity change (0 = not claimed)',
    unit: 'm / s',
    displayUnit: 'km / s',
    default: '4 km / s',
    min: 0,
    max: 1e9,
  },
];

export const rocketEquation: CheckDefinition = {
  name: 'rocket-equation',
  title: 'Rocket equation (Tsiolkovsky, and its relativistic form)',
  summary:
    'A craft that pushes itself by throwing out propellant at exhaust speed v_e can change its speed by at most ' +
    'v_e ln(m0/m1), where m0 is its mass full and m1 empty (no gravity or drag losses counted, which only lower it). ' +
    'That is Tsiolkovsky\'s Newtonian form; the relativistic form c·tanh((v_e/c) ln(m0/m1)) is always correct and ' +
    'never reaches c. The two agree to 0.1 % while v_e ln(m0/m1) is below 0.0548 c (about 16 400 km/s), so for any ' +
    'chemical or electric rocket they are the same; for exhaust speeds near c only the relativistic one applies. ' +
    'Use it for claims that do carry propellant, to see whether the stated propellant allows the stated velocity change.',
  condition: 'claimed Δv ≤ c·tanh((v_e/c) ln(m0/m1)), which is v_e ln(m0/m1) to 0.1 % while that is below 0.0548 c',
  inputs,
  cautions: [CAUTION_PROPELLANTS, CAUTION_VACUUM],
  run(si) {
    const x = readInputs(inputs, si);
    requirePositive('m1', 'The final mass', x.m1);
    requirePositive('m0', 'The starting mass', x.m0);
    let ve = x.v_e;
    let from = 'exhaust speed';
    if (x.Isp > 0) {
      const fromIsp = exhaustSpeedFromIsp(x.Isp);
      if (x.v_e > 0 && Math.abs(x.v_e - fromIsp) > EXHAUST_AGREEMENT * fromIsp) {
        throw new CheckRangeError(
          'Isp',
          `The exhaust speed (${fmtQ(x.v_e, 'm / s')}) and the specific impulse (${fmt(x.Isp)} s, i.e. ` +
            `${fmtQ(fromIsp, 'm / s')}) disagree; give one of them and set the other to 0.`,
        );
      }
      ve = fromIsp;
      from = `Isp of ${fmt(x.Isp)} s`;
    } else if (!(x.v_e > 0)) {
      throw new CheckRangeError('v_e', 'Give an exhaust speed or a specific impulse (both are 0).');
    }
    const dv = tsiolkovskyDv(ve, x.m0, x.m1);
    const dvRel = relativisticRocketDv(ve, x.m0, x.m1);
    const excess = newtonianRocketExcess(ve, x.m0, x.m1);
    const formsDiffer = excess > ROCKET_FORMS_AGREE;
    const ratio = x.m0 / x.m1;
    const propFraction = 1 - x.m1 / x.m0;
    const outputs: CheckOutput[] = [
      { name: 'dv', label: 'Velocity change the propellant allows (Tsiolkovsky, Newtonian)', si: dv, unit: 'm / s', displayUnit: 'km / s' },
      { name: 'v_e_used', label: 'Exhaust speed used', si: ve, unit: 'm / s', displayUnit: 'km / s' },
      { name: 'mass_ratio', label: 'Mass ratio m0/m1', si: ratio, unit: '' },
      { name: 'propellant_fraction', label: 'Propellant fraction 1 − m1/m0', si: propFraction, unit: '' },
    ];
    const relativisticOutputs: CheckOutput[] = [
      {
        name: 'dv_relativistic',
        label: 'Velocity change the propellant allows, relativistic form c·tanh((v_e/c) ln(m0/m1))',
        si: dvRel,
        unit: 'm / s',
        displayUnit: 'km / s',
      },
      { name: 'dv_newtonian_excess', label: 'Newtonian Δv over the relativistic Δv, minus 1', si: excess, unit: '' },
    ];
    const allowed = formsDiffer
      ? `Δv = ${fmtQ(dvRel, 'm / s')} (${fmt(dvRel / C_LIGHT)} c) by the relativistic form c·tanh((v_e/c) ln(m0/m1)); ` +
        `Tsiolkovsky's Newtonian v_e ln(m0/m1) = ${fmtQ(dv, 'm / s')} overstates it by ${fmt(excess * 100)} %, as it does ` +
        `whenever v_e ln(m0/m1) is above ${fmt(ROCKET_AGREEMENT_X)} c`
      : `Δv = ${fmtQ(dv, 'm / s')}`;
    const base =
      `With an exhaust speed of ${fmtQ(ve, 'm / s')}` + (from === 'exhaust speed' ? '' : ` (from an ${from})`) +
      ` and a mass ratio of ${fmt(ratio)} (${fmt(propFraction * 100)} % propellant), the rocket equation allows ${allowed}`;
    let holds = true;
    let message: string;
    if (x.dv_claimed > 0) {
      holds = x.dv_claimed <= dvRel * (1 + ROCKET_TOLERANCE);
      const r = x.dv_claimed / dv;
      if (dv > 0) {
        outputs.push({ name: 'dv_ratio', label: 'Claimed Δv over the Δv allowed (Newtonian)', si: r, unit: '' });
        relativisticOutputs.push({ name: 'dv_relativistic_ratio', label: 'Claimed Δv over the Δv allowed (relativistic)', si: x.dv_claimed / dvRel, unit: '' });
      }
      const rRel = x.dv_claimed / dvRel;
      const reachable = x.dv_claimed < C_LIGHT;
      // What the claim would need, by the relativistic form (the Newtonian exp(Δv/v_e) to 10⁻¹⁰ at chemical speeds).
      const rapidity = reachable ? Math.atanh(x.dv_claimed / C_LIGHT) : Number.POSITIVE_INFINITY; // c·atanh(Δv/c) / c
      const needed = Math.exp((rapidity * C_LIGHT) / ve);
      const veNeeded = (rapidity * C_LIGHT) / Math.log(ratio);
      const beyondLight = reachable
        ? ''
        : ` A velocity change of c or more is out of reach of any rocket, whatever its exhaust speed and mass ratio: ` +
          'the relativistic form stays below c.';
      message = !reachable
        ? `${base}; the claimed ${fmtQ(x.dv_claimed, 'm / s')} is ${fmt(x.dv_claimed / C_LIGHT)} times the speed of light.${beyondLight}`
        : dv === 0
        ? `${base}: with no propellant spent, the claimed ${fmtQ(x.dv_claimed, 'm / s')} cannot come from the rocket ` +
          `effect; at this exhaust speed it would need a mass ratio of ${fmt(needed)}.`
        : holds
        ? `${base}; the claimed ${fmtQ(x.dv_claimed, 'm / s')} is within it (${fmt(rRel)} of it).`
        : `${base}; the claimed ${fmtQ(x.dv_claimed, 'm / s')} is ${fmt(rRel)} times that. It would need a mass ratio of ` +
          `${fmt(needed)} at this exhaust speed, or ` +
          (veNeeded <= C_LIGHT
            ? `an exhaust speed of ${fmtQ(veNeeded, 'm / s')} at this mass ratio.`
            : `an exhaust speed above the speed of light at this mass ratio, which no exhaust has.`);
    } else {
      message = `${base}. No velocity change was claimed.`;
    }
    outputs.push(...relativisticOutputs);
    const rMax = Math.max(10, 2 * ratio);
    const ratios = linspace(1, rMax, 101);
    const plot: LinePlot = {
      kind: 'line',
      name: 'dv-vs-mass-ratio',
      title: `Velocity change against mass ratio at ${fmtQ(ve, 'm / s')} exhaust speed`,
      x: { label: 'Mass ratio m0/m1', unit: '', values: ratios },
      series: [{ name: 'dv', label: 'Tsiolkovsky Δv', unit: 'm / s', values: mapSeries(ratios, (r) => tsiolkovskyDv(ve, r, 1)) }],
      yScale: 'linear',
    };
    if ((ve * Math.log(rMax)) / C_LIGHT > ROCKET_AGREEMENT_X) {
      // The forms part within the plotted range: show the relativistic one too.
      plot.series.push({
        name: 'dv_relativistic',
        label: 'Relativistic Δv',
        unit: 'm / s',
        values: mapSeries(ratios, (r) => relativisticRocketDv(ve, r, 1)),
      });
    }
    if (x.dv_claimed > 0) {
      plot.series.push({ name: 'dv_claimed', label: 'Claimed Δv', unit: 'm / s', values: constantSeries(ratios.length, x.dv_claimed) });
    }
    return { check: 'rocket-equation', outputs, verdict: { holds, message }, plots: [plot] };
  },
};
