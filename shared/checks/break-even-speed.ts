import { C_LIGHT } from './constants';
import { breakEvenSpeed as breakEven, kineticPower, photonThrustBound } from './formulas';
import { fmt, fmtQ } from './format';
import { readInputs, requirePositive } from './inputs';
import { linspace, mapSeries, constantSeries } from './series';
import type { CheckDefinition, CheckInputSpec } from './types';

/** Julian year, s (IAU; 365.25 days of 86 400 s). */
const SECONDS_PER_YEAR = 365.25 * 86_400;

const inputs: CheckInputSpec[] = [
  { name: 'F', label: 'Claimed constant thrust', unit: 'N', displayUnit: 'mN', default: '1 mN', min: 0, max: 1e12 },
  { name: 'P', label: 'Input power', unit: 'W', displayUnit: 'kW', default: '1 kW', min: 0, max: 1e18 },
  {
    name: 'm',
    label: 'Mass of the craft',
    unit: 'kg',
    default: '1000 kg',
    min: 0,
    max: 1e12,
    help: 'Only used for the time to reach the break-even speed from rest.',
  },
  {
    name: 'v',
    label: 'Speed to test',
    unit: 'm / s',
    displayUnit: 'km / s',
    default: '30 km / s',
    min: 0,
    max: C_LIGHT,
    help:
      'Any speed the drive has relative to some inertial frame. 30 km/s is roughly the Earth\'s orbital speed ' +
      'about the Sun (29.8 km/s, from memory): a lab on Earth already moves that fast in the Sun\'s frame.',
  },
];

export const breakEvenSpeedCheck: CheckDefinition = {
  name: 'break-even-speed',
  title: 'Energy break-even speed of a constant-thrust drive',
  summary:
    'A drive that gives a constant thrust F for a constant input power P, whatever its speed, delivers kinetic ' +
    'power F·v to the craft. Beyond v = P/F that is more than it is fed. A propellant-free drive has no exhaust ' +
    'to define "its" speed, so the speed is relative to any inertial frame one likes: in a frame where it moves ' +
    'faster than P/F, it would be a perpetual-motion machine. Use it for claims of thrust per watt with no propellant.',
  condition: 'kinetic power F·v ≤ input power P at the speed tested (v ≤ P/F)',
  inputs,
  cautions: [],
  run(si) {
    const x = readInputs(inputs, si);
    requirePositive('F', 'The thrust', x.F);
    requirePositive('P', 'The input power', x.P);
    const vBe = breakEven(x.P, x.F);
    const tBe = (x.m * vBe) / x.F; // Newtonian, from rest: v = F t / m
    const kp = kineticPower(x.F, x.v);
    const ratio = kp / x.P;
    const holds = kp <= x.P;
    const bound = photonThrustBound(x.P);
    const beyondLight = vBe >= C_LIGHT;
    let message =
      `For ${fmtQ(x.F, 'N')} of thrust on ${fmtQ(x.P, 'W')}, the break-even speed is P/F = ${fmtQ(vBe, 'm / s')}` +
      (beyondLight ? ' (at or beyond the speed of light)' : '') +
      `. At ${fmtQ(x.v, 'm / s')} the thrust delivers ${fmtQ(kp, 'W')} of kinetic power, ${fmt(ratio)} of the input. `;
    if (beyondLight) {
      message +=
        `The thrust is within the photon-rocket bound (${fmtQ(bound, 'N')}), so no frame sees the drive gain ` +
        'energy faster than it is fed.';
    } else if (holds) {
      message +=
        'At this speed it does not yet gain energy faster than it is fed; but a propellant-free drive would do so ' +
        `in any frame where it moves faster than ${fmtQ(vBe, 'm / s')}` +
        (x.m > 0
          ? `, a speed it would itself reach from rest in ${fmtQ(tBe, 's')}` +
            (tBe >= 1e7 ? ` (about ${fmt(tBe / SECONDS_PER_YEAR)} years)` : '') +
            ` with ${fmtQ(x.m, 'kg')} aboard (Newtonian estimate).`
          : '.');
    } else {
      message +=
        `At this speed the drive would gain ${fmt(ratio)} times as much kinetic energy as it is fed: in this frame ` +
        'it would be a perpetual-motion machine. Either the thrust falls with speed (so it is pushing on something), ' +
        'or it carries propellant, or the thrust is not real.';
    }
    const vMax = Math.min(C_LIGHT, 2 * Math.max(vBe, x.v));
    const speeds = linspace(0, vMax, 101);
    return {
      check: 'break-even-speed',
      outputs: [
        { name: 'v_break_even', label: 'Break-even speed P/F', si: vBe, unit: 'm / s', displayUnit: 'km / s' },
        { name: 't_break_even', label: 'Time to reach it from rest (Newtonian)', si: tBe, unit: 's' },
        { name: 'kinetic_power', label: 'Kinetic power F·v at the speed tested', si: kp, unit: 'W' },
        { name: 'power_ratio', label: 'Kinetic power over input power', si: ratio, unit: '' },
      ],
      verdict: { holds, message },
      plots: [
        {
          kind: 'line',
          name: 'power-vs-speed',
          title: 'Kinetic power F·v and input power P against speed',
          x: { label: 'Speed', unit: 'm / s', values: speeds },
          series: [
            { name: 'kinetic_power', label: 'Kinetic power F·v', unit: 'W', values: mapSeries(speeds, (s) => kineticPower(x.F, s)) },
            { name: 'P', label: 'Input power P', unit: 'W', values: constantSeries(speeds.length, x.P) },
          ],
          yScale: 'linear',
        },
      ],
    };
  },
};
