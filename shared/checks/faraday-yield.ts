import { CAUTION_CHEMICALS, CAUTION_HYDROGEN, CAUTION_MAINS } from './cautions';
import { CheckRangeError } from './errors';
import { fmt, fmtQ } from './format';
import { faradayMoles, idealGasVolume } from './formulas';
import { readInputs } from './inputs';
import { constantSeries, linspace, mapSeries } from './series';
import type { CheckDefinition, CheckInputSpec, CheckOutput } from './types';

/**
 * The least voltage (V) across a cell that splits liquid water into hydrogen and oxygen at 25 °C and
 * standard pressures: the standard potential of the oxygen electrode, 1.229 V (Bard, Parsons and
 * Jordan, Standard Potentials in Aqueous Solution, 1985). It falls slowly as the cell warms.
 */
export const WATER_SPLITTING_VOLTAGE = 1.229;

/** Electrons per molecule of hydrogen: 2 H⁺ + 2 e⁻ → H₂ (or 2 H₂O + 2 e⁻ → H₂ + 2 OH⁻). */
const Z_HYDROGEN = 2;

const inputs: CheckInputSpec[] = [
  {
    name: 'I',
    label: 'Current through the cells (0 = not stated)',
    unit: 'A',
    default: '20 A',
    min: 0,
    max: 1e7,
    help: 'The current through each cell; in a stack of cells in series the same current flows through every one. Leave 0 when the claim gives only an electrical power.',
  },
  {
    name: 'cells',
    label: 'Cells in series',
    unit: '',
    default: '1',
    min: 1,
    max: 1e5,
    integer: true,
    help: 'Each cell in series splits water with the same current, so a stack of N cells makes N times the gas of one, and needs N times the voltage.',
  },
  {
    name: 'P',
    label: 'Electrical power (0 = not stated)',
    unit: 'W',
    displayUnit: 'W',
    default: '0 W',
    min: 0,
    max: 1e12,
    help:
      'With no current stated, the most gas the power can make: every cell at the least voltage that splits water, ' +
      `${WATER_SPLITTING_VOLTAGE} V at 25 °C. With a current too, the power is checked against that least voltage.`,
  },
  {
    name: 'gas',
    label: 'Gas counted (1 = hydrogen only, 1.5 = oxyhydrogen mixture, 0.5 = oxygen only)',
    unit: '',
    default: '1.5',
    min: 0.5,
    max: 1.5,
    help: 'Moles of gas counted for each mole of hydrogen: a cell that does not separate the gases gives two volumes of hydrogen and one of oxygen, 1.5 times the hydrogen.',
    presets: [
      { label: 'Oxyhydrogen mixture (2 H₂ + O₂)', value: '1.5' },
      { label: 'Hydrogen only', value: '1' },
      { label: 'Oxygen only', value: '0.5' },
    ],
  },
  {
    name: 'T',
    label: 'Gas temperature',
    unit: 'K',
    default: '25 degC',
    min: 1,
    max: 5000,
    help: 'The temperature at which the claimed volume is stated (type "0 degC" for gas volumes at 0 °C).',
  },
  {
    name: 'p',
    label: 'Gas pressure',
    unit: 'Pa',
    displayUnit: 'kPa',
    default: '101.325 kPa',
    min: 1,
    max: 1e9,
    help: 'The absolute pressure at which the claimed volume is stated; 101.325 kPa is one standard atmosphere.',
  },
  {
    name: 'flow_claimed',
    label: 'Claimed gas flow',
    unit: 'm^3 / s',
    displayUnit: 'L / min',
    default: '1 L / minute',
    min: 0,
    max: 1e6,
    help: 'The volume of gas per unit time the claim reports, e.g. "1.5 L / min" or "90 L / h".',
  },
];

/** A gas flow in litres per minute, for the words. */
const lpm = (q: number) => `${fmt(q * 60_000)} L/min`;

const GAS_WORDS: Record<string, string> = { '1': 'hydrogen', '1.5': 'oxyhydrogen mixture', '0.5': 'oxygen' };

/**
 * Gas from an electrolyser against Faraday's law of electrolysis: every molecule of hydrogen takes
 * two electrons through the circuit, so a current I through N cells in series gives N·I/(2F) moles
 * of hydrogen per second, and with the oxygen, 1.5 times that of mixed gas; the ideal-gas law turns
 * moles into a volume at the stated temperature and pressure.
 */
export const faradayYield: CheckDefinition = {
  name: 'faraday-yield',
  title: 'Gas from electrolysis against Faraday’s law',
  summary:
    'Each molecule of hydrogen split from water takes two electrons through the circuit, so a current I through N cells ' +
    'in series makes at most N·I/(2F) moles of hydrogen per second (F = e·N_A, the Faraday constant), and the mixed ' +
    'gas of a cell that does not separate them is 1.5 times that. At 20 A one cell gives about 0.15 L/min of hydrogen at ' +
    '25 °C. Use it for any claim of a gas flow from an electrolyser, a "water fuel" cell or an oxyhydrogen generator.',
  condition: 'claimed gas flow ≤ cells·I/(2F) × gas factor × RT/p; electrical power ≥ cells × 1.229 V × I',
  inputs,
  cautions: [CAUTION_HYDROGEN, CAUTION_MAINS, CAUTION_CHEMICALS],
  run(si) {
    const x = readInputs(inputs, si);
    const fromPower = !(x.I > 0);
    if (fromPower && !(x.P > 0)) {
      throw new CheckRangeError('I', 'A current through the cells (or, failing that, an electrical power) is needed.');
    }
    // With only a power, the largest current it can drive through N cells at the least voltage each.
    const I = fromPower ? x.P / (x.cells * WATER_SPLITTING_VOLTAGE) : x.I;
    const n_h2 = x.cells * faradayMoles(I, 1, Z_HYDROGEN); // mol/s
    const n_gas = n_h2 * x.gas;
    const flowMax = idealGasVolume(n_gas, x.T, x.p); // m³/s
    const molarVolume = idealGasVolume(1, x.T, x.p);
    const ratio = x.flow_claimed / flowMax;
    const I_needed = ratio * I;
    const P_min = x.cells * WATER_SPLITTING_VOLTAGE * I;

    const outputs: CheckOutput[] = [
      { name: 'I_used', label: fromPower ? 'Largest current the power drives (1.229 V per cell)' : 'Current through the cells', si: I, unit: 'A' },
      { name: 'n_h2', label: "Hydrogen by Faraday's law", si: n_h2, unit: 'mol / s', displayUnit: 'mmol / s' },
      { name: 'molar_volume', label: 'Molar volume of an ideal gas at the stated temperature and pressure', si: molarVolume, unit: 'm^3 / mol', displayUnit: 'L / mol' },
      { name: 'flow_max', label: "Faraday's yield of the gas counted", si: flowMax, unit: 'm^3 / s', displayUnit: 'L / min' },
      { name: 'ratio', label: "Claimed flow over Faraday's yield", si: ratio, unit: '' },
      { name: 'I_needed', label: 'Current the claimed flow needs', si: I_needed, unit: 'A' },
    ];
    if (!fromPower) outputs.push({ name: 'P_min', label: 'Least electrical power at 1.229 V per cell', si: P_min, unit: 'W' });

    const what = GAS_WORDS[String(x.gas)] ?? `gas (${fmt(x.gas)} times the hydrogen in moles)`;
    const cellWords = x.cells === 1 ? 'one cell' : `${x.cells} cells in series`;
    const drive = fromPower
      ? `${fmtQ(x.P, 'W')} with every one of ${cellWords} at ${WATER_SPLITTING_VOLTAGE} V, the least voltage that splits water at 25 °C (${fmtQ(I, 'A')})`
      : `${fmtQ(I, 'A')} through ${cellWords}`;
    const state = `at ${fmtQ(x.T, 'K')} and ${fmt(x.p / 1000)} kPa`;
    const flowHolds = x.flow_claimed <= flowMax * (1 + 1e-9);
    const powerHolds = fromPower || !(x.P > 0) || x.P >= P_min * (1 - 1e-9);
    const holds = flowHolds && powerHolds;

    let message = flowHolds
      ? `The claimed flow, ${lpm(x.flow_claimed)} of ${what}, is within Faraday's yield for ${drive}: ${lpm(flowMax)} ${state} ` +
        `(${fmt(ratio)} of it).`
      : `The claimed flow, ${lpm(x.flow_claimed)} of ${what}, is ${fmt(ratio)} times Faraday's yield for ${drive}: ${lpm(flowMax)} ` +
        `${state}. Every molecule of hydrogen takes two electrons through the circuit, so that flow would need ` +
        `${fmtQ(I_needed, 'A')} through the same cells; more gas than the charge passed would break the accounting of charge. ` +
        'Gas volumes come out high when water vapour, entrained air or electrolyte mist is counted with the gas, when a flow ' +
        'meter calibrated for another gas is read directly, when the volume is taken at a temperature or pressure other than ' +
        'the one stated, or when the current of a pulsed supply is read on a meter that does not show its mean.';
    if (!powerHolds) {
      message +=
        ` The stated power, ${fmtQ(x.P, 'W')}, is also ${fmt(x.P / P_min)} of the least power that splitting water at this ` +
        `current needs, ${fmtQ(P_min, 'W')} (${WATER_SPLITTING_VOLTAGE} V per cell at 25 °C): the energy for the gas would be missing.`;
    } else if (!fromPower && x.P > 0) {
      message += ` The stated power, ${fmtQ(x.P, 'W')}, covers the least power water splitting needs at this current, ${fmtQ(P_min, 'W')}.`;
    }

    const Imax = Math.max(2 * I, 1.2 * I_needed);
    const currents = linspace(0, Imax, 101);
    const perAmp = flowMax / I; // m³/s per ampere
    return {
      check: 'faraday-yield',
      outputs,
      verdict: { holds, message },
      plots: [
        {
          kind: 'line',
          name: 'flow-vs-current',
          title: `Faraday's yield of ${what} against the current, ${cellWords}, ${state}`,
          x: { label: 'Current through the cells', unit: 'A', values: currents },
          series: [
            { name: 'flow_max', label: "Faraday's yield", unit: 'L/min', values: mapSeries(currents, (i) => i * perAmp * 60_000) },
            { name: 'flow_claimed', label: 'Claimed flow', unit: 'L/min', values: constantSeries(currents.length, x.flow_claimed * 60_000) },
          ],
          yScale: 'linear',
        },
      ],
    };
  },
};
