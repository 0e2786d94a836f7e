import { CheckRangeError } from './errors';
import { exhaustSpeedFromIsp, tsiolkovskyDv } from './formulas';
import { CAUTION_PROPELLANTS, CAUTION_VACUUM } from './cautions';
import { fmt, fmtQ } from './format';
import { readInputs, requirePositive } from './inputs';
import { constantSeries, linspace, mapSeries } from './series';
import type { CheckDefinition, CheckInputSpec, CheckOutput, LinePlot } from './types';

/** When both v_e and Isp are given they must agree to within this fraction. */
export const EXHAUST_AGREEMENT = 0.005;

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
  title: 'Rocket equation (Tsiolkovsky)',
  summary:
    'A craft that pushes itself by throwing out propellant at exhaust speed v_e can change its speed by at most ' +
    'v_e ln(m0/m1), where m0 is its mass full and m1 empty (no gravity or drag losses counted, which only lower it). ' +
    'Use it for claims that do carry propellant, to see whether the stated propellant allows the stated velocity change.',
  condition: 'claimed Δv ≤ v_e ln(m0/m1)',
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
    const ratio = x.m0 / x.m1;
    const propFraction = 1 - x.m1 / x.m0;
    const outputs: CheckOutput[] = [
      { name: 'dv', label: 'Velocity change the propellant allows', si: dv, unit: 'm / s', displayUnit: 'km / s' },
      { name: 'v_e_used', label: 'Exhaust speed used', si: ve, unit: 'm / s', displayUnit: 'km / s' },
      { name: 'mass_ratio', label: 'Mass ratio m0/m1', si: ratio, unit: '' },
      { name: 'propellant_fraction', label: 'Propellant fraction 1 − m1/m0', si: propFraction, unit: '' },
    ];
    const base =
      `With an exhaust speed of ${fmtQ(ve, 'm / s')}` + (from === 'exhaust speed' ? '' : ` (from an ${from})`) +
      ` and a mass ratio of ${fmt(ratio)} (${fmt(propFraction * 100)} % propellant), the rocket equation allows ` +
      `Δv = ${fmtQ(dv, 'm / s')}`;
    let holds = true;
    let message: string;
    if (x.dv_claimed > 0) {
      holds = x.dv_claimed <= dv * (1 + 1e-12);
      const r = x.dv_claimed / dv;
      if (dv > 0) outputs.push({ name: 'dv_ratio', label: 'Claimed Δv over the Δv allowed', si: r, unit: '' });
      const needed = Math.exp(x.dv_claimed / ve);
      message = dv === 0
        ? `${base}: with no propellant spent, the claimed ${fmtQ(x.dv_claimed, 'm / s')} cannot come from the rocket ` +
          `effect; at this exhaust speed it would need a mass ratio of ${fmt(needed)}.`
        : holds
        ? `${base}; the claimed ${fmtQ(x.dv_claimed, 'm / s')} is within it (${fmt(r)} of it).`
        : `${base}; the claimed ${fmtQ(x.dv_claimed, 'm / s')} is ${fmt(r)} times that. It would need a mass ratio of ` +
          `${fmt(needed)} at this exhaust speed, or an exhaust speed of ${fmtQ(x.dv_claimed / Math.log(ratio), 'm / s')} ` +
          'at this mass ratio.';
    } else {
      message = `${base}. No velocity change was claimed.`;
    }
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
    if (x.dv_claimed > 0) {
      plot.series.push({ name: 'dv_claimed', label: 'Claimed Δv', unit: 'm / s', values: constantSeries(ratios.length, x.dv_claimed) });
    }
    return { check: 'rocket-equation', outputs, verdict: { holds, message }, plots: [plot] };
  },
};
