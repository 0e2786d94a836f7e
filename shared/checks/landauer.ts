import { E_CHARGE } from './constants';
import { CheckRangeError } from './errors';
import { fmt, fmtQ } from './format';
import { landauerBound } from './formulas';
import { readInputs, requirePositive } from './inputs';
import type { BarPlot, CheckDefinition, CheckInputSpec, CheckOutput } from './types';

const inputs: CheckInputSpec[] = [
  {
    name: 'T',
    label: 'Temperature of the surroundings that take the heat',
    unit: 'K',
    default: '300 K',
    min: 0,
    max: 1e6,
    help: 'The heat sink of the computer, or the bath of the demon; type "27 degC" for Celsius.',
  },
  {
    name: 'E_op',
    label: 'Claimed energy dissipated per operation (0 = not claimed)',
    unit: 'J',
    default: '1e-21 J',
    min: 0,
    max: 1,
    help: 'The heat (or energy drawn) for one logical operation, e.g. "0.5 zJ" or "1e-21 J".',
  },
  {
    name: 'bits',
    label: 'Bits erased per operation',
    unit: '',
    default: '1',
    min: 0,
    max: 1e15,
    help: 'An AND or a reset of one bit erases one bit; a logically reversible operation (NOT, a Toffoli gate) erases none, and then the bound sets no floor.',
  },
  {
    name: 'P',
    label: 'Claimed power of the computer (0 = not claimed)',
    unit: 'W',
    default: '0 W',
    min: 0,
    max: 1e12,
  },
  {
    name: 'rate',
    label: 'Bits erased per second at that power',
    unit: 'Hz',
    displayUnit: 'Hz',
    default: '0 Hz',
    min: 0,
    max: 1e40,
    help: 'Operations per second times bits erased per operation; type e.g. "1e18 Hz" for 10^18 erasures a second.',
  },
  {
    name: 'W_bit',
    label: 'Claimed work extracted per bit of information (a demon; 0 = not claimed)',
    unit: 'J',
    default: '0 J',
    min: 0,
    max: 1,
    help: 'For a device said to turn information about a system into work, e.g. a Szilard engine or a ratchet that sorts molecules.',
  },
];

const eVof = (E: number) => `${fmt(E / E_CHARGE)} eV`;

/**
 * Landauer's bound (R. Landauer, "Irreversibility and Heat Generation in the Computing Process",
 * IBM J. Res. Dev. 5(3), 183–191, 1961): erasing one bit of information gives off at least
 * k_B·T·ln 2 of heat to surroundings at T. Against a claimed energy per operation, a power at a rate
 * of erasures, or a demon's work per bit (which can be at most k_B·T·ln 2).
 */
export const landauer: CheckDefinition = {
  name: 'landauer',
  title: 'Computing and demons against Landauer’s bound',
  summary:
    'Erasing a bit of information gives off at least k_B·T·ln 2 of heat to the surroundings at temperature T (Landauer 1961): ' +
    'about 2.9 × 10^-21 J (0.018 eV) at 300 K. A computer that erases bits cannot use less per bit, and a "demon" that turns ' +
    'information into work gains at most k_B·T·ln 2 per bit, which the erasure of its memory then costs back. Use it for ' +
    'claims of ultra-low-energy computing and for Maxwell\'s-demon engines.',
  condition: 'claimed energy per operation ≥ bits × k_B·T·ln 2; claimed power ≥ erasures per second × k_B·T·ln 2; work per bit ≤ k_B·T·ln 2',
  inputs,
  cautions: [],
  run(si) {
    const x = readInputs(inputs, si);
    requirePositive('T', 'The temperature', x.T);
    if (x.P > 0 && !(x.rate > 0)) throw new CheckRangeError('rate', 'A claimed power needs the number of bits erased per second to compare with.');
    const E_min = landauerBound(x.T);
    const outputs: CheckOutput[] = [{ name: 'E_min', label: 'Landauer bound k_B·T·ln 2 per bit', si: E_min, unit: 'J', displayUnit: 'zJ' }];
    const parts: string[] = [];
    const findings: string[] = [];
    let holds = true;
    const bars: BarPlot = { kind: 'bars', name: 'energy-per-bit', title: 'Energy per bit against Landauer\'s bound', unit: 'J', yScale: 'log', bars: [] };
    bars.bars.push({ name: 'E_min', label: 'k_B·T·ln 2', si: E_min, role: 'bound' });

    if (x.E_op > 0) {
      if (x.bits > 0) {
        const floor = x.bits * E_min;
        const r = x.E_op / floor;
        outputs.push(
          { name: 'E_op_min', label: 'Least energy per operation', si: floor, unit: 'J', displayUnit: 'zJ' },
          { name: 'E_op_ratio', label: 'Claimed energy per operation over the bound', si: r, unit: '' },
        );
        bars.bars.push({ name: 'E_op_per_bit', label: 'Claimed energy per bit erased', si: x.E_op / x.bits, role: 'claim' });
        const ok = x.E_op >= floor * (1 - 1e-12);
        if (!ok) holds = false;
        const bitWords = Number.isInteger(x.bits) && x.bits < 1e6 ? `${x.bits} bit${x.bits === 1 ? '' : 's'}` : `${fmt(x.bits)} bits`;
        (ok ? parts : findings).push(
          ok
            ? `the claimed ${fmtQ(x.E_op, 'J')} per operation erasing ${bitWords} is ${fmt(r)} times the least it can be, ${fmtQ(floor, 'J')}`
            : `the claimed ${fmtQ(x.E_op, 'J')} per operation erasing ${bitWords} is ${fmt(r)} of the least it can be, ${fmtQ(floor, 'J')}`,
        );
      } else {
        parts.push(`an operation that erases no bit (logically reversible) has no floor from Landauer's bound, so the claimed ${fmtQ(x.E_op, 'J')} per operation is not limited by it`);
      }
    }
    if (x.P > 0) {
      const P_min = x.rate * E_min;
      const r = x.P / P_min;
      outputs.push(
        { name: 'P_min', label: 'Least power for the erasures', si: P_min, unit: 'W' },
        { name: 'P_ratio', label: 'Claimed power over the least power', si: r, unit: '' },
      );
      const ok = x.P >= P_min * (1 - 1e-12);
      if (!ok) holds = false;
      (ok ? parts : findings).push(
        ok
          ? `the claimed ${fmtQ(x.P, 'W')} for ${fmt(x.rate)} erasures a second is ${fmt(r)} times the least power they need, ${fmtQ(P_min, 'W')}`
          : `the claimed ${fmtQ(x.P, 'W')} for ${fmt(x.rate)} erasures a second is ${fmt(r)} of the least power they need, ${fmtQ(P_min, 'W')}`,
      );
    }
    if (x.W_bit > 0) {
      const r = x.W_bit / E_min;
      outputs.push({ name: 'W_ratio', label: 'Claimed work per bit over the bound', si: r, unit: '' });
      bars.bars.push({ name: 'W_bit', label: 'Claimed work per bit', si: x.W_bit, role: 'claim' });
      const ok = x.W_bit <= E_min * (1 + 1e-12);
      if (!ok) holds = false;
      (ok ? parts : findings).push(
        ok
          ? `the claimed work of ${fmtQ(x.W_bit, 'J')} per bit of information is within the most a bit can give, k_B·T·ln 2 (${fmt(r)} of it)`
          : `the claimed work of ${fmtQ(x.W_bit, 'J')} per bit of information is ${fmt(r)} times the most a bit can give, k_B·T·ln 2`,
      );
    }

    const head = `At ${fmtQ(x.T, 'K')}, erasing one bit gives off at least k_B·T·ln 2 = ${fmtQ(E_min, 'J')} (${eVof(E_min)})`;
    let message: string;
    if (findings.length) {
      message = `${head}: ${findings.join('; ')}.`;
      if (parts.length) message += ` For the rest, ${parts.join('; ')}.`;
      message +=
        ' Below the bound the second law would fail: the entropy of the erased information has to go to the surroundings as heat. ' +
        'Energy figures come out low when only the switching of one element is counted (not the clock, the supply, the readout ' +
        'and the error correction), when an operation is counted that erases nothing, or when the heat sink is colder than stated; ' +
        'a demon gains no net work once the erasure of its memory is counted.';
    } else if (parts.length) {
      message = `${head}: ${parts.join('; ')}.`;
    } else {
      message = `${head}. No energy per operation, power or work per bit was claimed.`;
    }
    return { check: 'landauer', outputs, verdict: { holds, message }, plots: bars.bars.length > 1 ? [bars] : [] };
  },
};
