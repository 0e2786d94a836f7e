import { photonThrustBound } from './formulas';
import { CAUTION_HIGH_VOLTAGE, CAUTION_LASER, CAUTION_RF, CAUTION_VACUUM } from './cautions';
import { fmt, fmtQ } from './format';
import { readInputs, requirePositive } from './inputs';
import type { CheckDefinition, CheckInputSpec } from './types';

const inputs: CheckInputSpec[] = [
  {
    name: 'F_claimed',
    label: 'Claimed thrust',
    unit: 'N',
    displayUnit: 'mN',
    default: '1 mN',
    min: 0,
    max: 1e12,
    help: 'The steady thrust the claim reports, without propellant.',
  },
  {
    name: 'P',
    label: 'Power radiated (all the input power, at most)',
    unit: 'W',
    displayUnit: 'kW',
    default: '1 kW',
    min: 0,
    max: 1e18,
    help:
      'A device that only emits radiation can at best turn all its input power into one collimated beam, which ' +
      'pushes with P/c. Other patterns push less, f·P/c: f = 1 for a collimated beam, 2/3 for a flat face ' +
      'radiating diffusely (Lambertian, the rest of the device dark) and 0 for emission that is the same in every direction.',
  },
];

export const photonBound: CheckDefinition = {
  name: 'photon-bound',
  title: 'Propellant-free thrust against the photon-rocket bound',
  summary:
    'A device that throws out nothing but radiation gets its push from the momentum of that radiation, and ' +
    'light of power P carries momentum at the rate P/c. So the thrust can be at most P/c: about 3.3 µN per kilowatt, ' +
    'reached only by one collimated beam (a flat face radiating diffusely gets 2/3 of it, an even glow in every ' +
    'direction none). ' +
    'Use it for any "propellant-free" thruster whose only exhaust could be light, microwaves or heat.',
  condition: 'claimed thrust ≤ P/c',
  inputs,
  cautions: [CAUTION_HIGH_VOLTAGE, CAUTION_RF, CAUTION_LASER, CAUTION_VACUUM],
  run(si) {
    const v = readInputs(inputs, si);
    requirePositive('P', 'The radiated power', v.P);
    const F = v.F_claimed;
    const bound = photonThrustBound(v.P);
    const ratio = F / bound;
    const holds = F <= bound;
    const message = holds
      ? `The claimed thrust, ${fmtQ(F, 'N')}, is within the photon-rocket bound P/c = ${fmtQ(bound, 'N')} for ` +
        `${fmtQ(v.P, 'W')} (${fmt(ratio)} of it): radiation alone could account for it.`
      : `The claimed thrust, ${fmtQ(F, 'N')}, is ${fmt(ratio)} times the photon-rocket bound P/c = ${fmtQ(bound, 'N')} ` +
        `for ${fmtQ(v.P, 'W')}. A device that emits only radiation cannot push harder than its radiation carries ` +
        'momentum away; the rest would have to come from momentum exchanged with something else (propellant, ' +
        'the mount, the air, the leads) or from a measurement artifact.';
    return {
      check: 'photon-bound',
      outputs: [
        { name: 'F_bound', label: 'Photon-rocket bound P/c', si: bound, unit: 'N', displayUnit: 'uN' },
        { name: 'ratio', label: 'Claimed thrust over the bound', si: ratio, unit: '' },
      ],
      verdict: { holds, message },
      plots: [
        {
          kind: 'bars',
          name: 'thrust-vs-bound',
          title: 'Claimed thrust against the photon-rocket bound',
          unit: 'N',
          yScale: 'log',
          bars: [
            { name: 'F_claimed', label: 'Claimed thrust', si: F, role: 'claim' },
            { name: 'F_bound', label: 'Photon bound P/c', si: bound, role: 'bound' },
          ],
        },
      ],
    };
  },
};
