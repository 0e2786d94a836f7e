import { CAUTION_HIGH_VOLTAGE, CAUTION_RF, CAUTION_VACUUM } from './cautions';
import { leadLorentzForce, outgassingForce, radiationRecoilForce, thermalDriftForce } from './formulas';
import { fmt, fmtQ } from './format';
import { readInputs } from './inputs';
import type { BarPlot, CheckDefinition, CheckInputSpec } from './types';

const inputs: CheckInputSpec[] = [
  { name: 'F_claimed', label: 'Claimed thrust', unit: 'N', displayUnit: 'uN', default: '10 uN', min: 0, max: 1e12 },
  {
    name: 'I',
    label: 'Current in the supply leads',
    unit: 'A',
    default: '2 A',
    min: 0,
    max: 1e6,
  },
  {
    name: 'L',
    label: 'Length of lead that moves with the balance',
    unit: 'm',
    displayUnit: 'cm',
    default: '10 cm',
    min: 0,
    max: 1e4,
    help: 'The stretch of supply lead (or a current loop not cancelled by its return) that is carried on the balance arm.',
  },
  {
    name: 'B',
    label: 'Magnetic field at the leads',
    unit: 'T',
    displayUnit: 'uT',
    default: '50 uT', // EARTH_FIELD_TYPICAL (constants.ts)
    min: 0,
    max: 100,
    help:
      'The Earth\'s field is roughly 25–65 µT at the surface (from memory; NOAA/BGS World Magnetic Model); ' +
      'magnets, pumps and the device\'s own fields can be far larger.',
  },
  { name: 'P_heat', label: 'Waste heat radiated', unit: 'W', default: '50 W', min: 0, max: 1e12 },
  {
    name: 'f_asym',
    label: 'Net asymmetry of the radiated heat (0–1)',
    unit: '',
    default: '0.1',
    min: 0,
    max: 1,
    help:
      'The fraction of the radiated power that, on balance, leaves in one direction: 0 for emission that is the same ' +
      'in every direction, 2/3 for a single flat face radiating diffusely (Lambertian) and the rest of the device dark, ' +
      '1 for a collimated beam. 0.1 is only a placeholder for a device that glows more on one side; take it from the ' +
      'device\'s own temperatures and emissivities.',
  },
  {
    name: 'k_drift',
    label: 'Thermal drift of the balance per kelvin',
    unit: 'N / K',
    displayUnit: 'uN / K',
    default: '1 uN / K',
    min: 0,
    max: 1e6,
    help:
      'The apparent force the balance reads per kelvin of warming (from its calibration, or a null run with a dummy ' +
      'load). 1 µN/K is only a placeholder for a torsion balance (common practice, no source).',
  },
  {
    name: 'dT',
    label: 'Temperature rise during the run',
    unit: 'K',
    kind: 'difference',
    default: '2 K',
    min: 0,
    max: 1e4,
    help: 'A difference: "2 degC" of rise is 2 K, "3.6 degF" is 2 K.',
  },
  {
    name: 'mdot',
    label: 'Outgassing mass rate',
    unit: 'kg / s',
    displayUnit: 'ug / s',
    default: '1 ug / s',
    min: 0,
    max: 1e3,
    help: 'Gas evolved by warm parts in vacuum (adhesives, plastics, water).',
  },
  {
    name: 'v_gas',
    label: 'Speed of the outgassed molecules',
    unit: 'm / s',
    default: '500 m / s',
    min: 0,
    max: 1e5,
    help:
      'The mean speed away from the surface of the molecules leaving it, √(πkT/2m) by the kinetic theory of gases: ' +
      'about 470 m/s for water vapour, the commonest outgassed species, at 300 K and about 500 m/s at 340 K. Lighter gases ' +
      'and hotter parts are faster.',
  },
];

export const artifactBudget: CheckDefinition = {
  name: 'artifact-budget',
  title: 'Artifact budget for a thrust measurement',
  summary:
    'Small thrusts on a balance are easily mimicked by ordinary forces: the Earth\'s magnetic field pushing on the ' +
    'supply current (I·L·B), waste heat radiated more one way than the other (f·P/c), the balance drifting as it ' +
    'warms, and gas boiling off warm parts (ṁ·v). Each is worked out here as a force to set against the claimed ' +
    'thrust. Use it for any thrust claim from a balance, pendulum or scale.',
  condition: 'the listed artifacts, all acting the same way, add up to less than the claimed thrust',
  inputs,
  cautions: [CAUTION_HIGH_VOLTAGE, CAUTION_RF, CAUTION_VACUUM],
  run(si) {
    const x = readInputs(inputs, si);
    const items = [
      { name: 'F_lorentz', short: 'Lorentz force on the leads', label: 'Lorentz force on the leads I·L·B', si: leadLorentzForce(x.I, x.L, x.B) },
      { name: 'F_radiation', short: 'recoil of radiated heat', label: 'Recoil of radiated heat f·P/c', si: radiationRecoilForce(x.P_heat, x.f_asym) },
      { name: 'F_thermal', short: 'thermal drift', label: 'Thermal drift of the balance', si: thermalDriftForce(x.k_drift, x.dT) },
      { name: 'F_outgassing', short: 'outgassing', label: 'Outgassing ṁ·v', si: outgassingForce(x.mdot, x.v_gas) },
    ];
    const sum = items.reduce((a, it) => a + it.si, 0);
    const F = x.F_claimed;
    const holds = sum < F;
    const outputs = [
      ...items.map((it) => ({ name: it.name, label: it.label, si: it.si, unit: 'N', displayUnit: 'uN' })),
      { name: 'F_artifacts', label: 'Sum of the artifacts', si: sum, unit: 'N', displayUnit: 'uN' },
      ...(F > 0
        ? [
            ...items.map((it) => ({ name: `${it.name}_ratio`, label: `${it.label} over the claim`, si: it.si / F, unit: '' })),
            { name: 'F_artifacts_ratio', label: 'Sum of the artifacts over the claim', si: sum / F, unit: '' },
          ]
        : []),
    ];
    const largest = items.reduce((a, b) => (b.si > a.si ? b : a));
    const list = items.map((it) => `${it.short} ${fmtQ(it.si, 'N')}`).join(', ');
    const message = holds
      ? `The listed artifacts (${list}) add up to ${fmtQ(sum, 'N')}, ${fmt(F > 0 ? sum / F : 0)} of the claimed ` +
        `${fmtQ(F, 'N')}. They cannot account for the whole reading on their own; the largest is the ` +
        `${largest.short}. Artifacts not listed (vibration, air currents, electrostatic forces, ` +
        'magnetic parts near the device) still need their own null tests.'
      : `The listed artifacts (${list}) add up to ${fmtQ(sum, 'N')}, ` +
        (F > 0 ? `${fmt(sum / F)} times the claimed ${fmtQ(F, 'N')}` : 'more than the claimed zero') +
        `. The reading could be explained by them; the largest is the ${largest.short}. ` +
        'Ask for null runs that separate each: current reversed or a dummy load, the device turned round, ' +
        'the same heating with the device off, and a long run in vacuum after bake-out.';
    // Log scale: zero forces have no place on it, so they are left out of the bars (they stay in the outputs).
    const plot: BarPlot = {
      kind: 'bars',
      name: 'thrust-vs-artifacts',
      title: 'Claimed thrust against the forces that fake it',
      unit: 'N',
      yScale: 'log',
      bars: [
        { name: 'F_claimed', label: 'Claimed thrust', si: F, role: 'claim' as const },
        ...items.map((it) => ({ name: it.name, label: it.label, si: it.si, role: 'artifact' as const })),
        { name: 'F_artifacts', label: 'Sum of the artifacts', si: sum, role: 'artifact' as const },
      ].filter((b) => b.si > 0),
    };
    return { check: 'artifact-budget', outputs, verdict: { holds, message }, plots: [plot] };
  },
};
