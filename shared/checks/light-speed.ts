import { C_LIGHT } from './constants';
import { fmt, fmtQ } from './format';
import { readInputs } from './inputs';
import type { CheckDefinition, CheckInputSpec } from './types';

const inputs: CheckInputSpec[] = [
  {
    name: 'v',
    label: 'Stated speed',
    unit: 'm / s',
    displayUnit: 'km / s',
    default: '100000 km / s',
    min: 0,
    max: 1e30,
    help: 'Any speed the claim states for a body, a craft, its exhaust or a signal.',
  },
];

/**
 * A stated speed against the speed of light in vacuum (special relativity): no body with mass
 * reaches c, and no signal outruns it. A speed above c in a claim is a finding in itself, not an
 * input error.
 */
export const lightSpeed: CheckDefinition = {
  name: 'light-speed',
  title: 'A stated speed against the speed of light',
  summary:
    'No body with mass reaches the speed of light in vacuum, c = 299 792 458 m/s, and no signal or energy outruns it ' +
    '(special relativity, tested to high precision in particle accelerators). Use it for any claim that states the ' +
    'speed of a craft, a beam, an exhaust or a signal.',
  condition: 'stated speed < c',
  inputs,
  cautions: [],
  run(si) {
    const x = readInputs(inputs, si);
    const ratio = x.v / C_LIGHT;
    const holds = x.v < C_LIGHT;
    const message = holds
      ? `The stated speed, ${fmtQ(x.v, 'm / s')}, is ${fmt(ratio)} of the speed of light in vacuum (${fmtQ(C_LIGHT, 'm / s')}).`
      : `The stated speed, ${fmtQ(x.v, 'm / s')}, is ${fmt(ratio)} times the speed of light in vacuum (${fmtQ(C_LIGHT, 'm / s')}). ` +
        'No body with mass reaches c, and no signal or energy travels faster: the figure would need a new physics, or it ' +
        'is a misprint, a unit slip or a phase or group velocity that carries no signal.';
    return {
      check: 'light-speed',
      outputs: [
        { name: 'ratio', label: 'Stated speed over c', si: ratio, unit: '' },
        { name: 'c', label: 'Speed of light in vacuum', si: C_LIGHT, unit: 'm / s', displayUnit: 'km / s' },
      ],
      verdict: { holds, message },
      plots: [],
    };
  },
};
