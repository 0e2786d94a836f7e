import { firstLawBalance, overUnityRatio } from './formulas';
import { CAUTION_BATTERIES, CAUTION_HIGH_VOLTAGE, CAUTION_MAINS, CAUTION_ROTATING, CAUTION_SPARK_GAP } from './cautions';
import { fmt, fmtQ } from './format';
import { readInputs } from './inputs';
import type { CheckDefinition, CheckInputSpec, CheckOutput } from './types';

/**
 * Relative tolerance of the balance: out ≤ (in − Δstored) + FIRST_LAW_TOLERANCE × the largest of the
 * figures. It only absorbs round-off in the figures as typed; measurement uncertainty is the claim's to state.
 */
export const FIRST_LAW_TOLERANCE = 1e-9;

const energy = (name: string, label: string, def: string, help?: string, min: number | undefined = 0): CheckInputSpec => ({
  name,
  label,
  unit: 'J',
  displayUnit: 'kJ',
  default: def,
  min,
  max: 1e30,
  help,
});

const inputs: CheckInputSpec[] = [
  energy('E_in', 'Energy put in over the cycle', '1 kJ', 'All energy supplied: electrical, mechanical, chemical, heat taken in.'),
  energy('W_out', 'Work (or electrical energy) out', '0.6 kJ'),
  energy('Q_out', 'Heat out', '0.5 kJ', 'Heat rejected or delivered, including losses.'),
  {
    ...energy(
      'dE_stored',
      'Increase of stored energy over the cycle',
      '0 kJ',
      'Zero for a true cycle. Negative when a battery, flywheel, spring or fuel ran down during the test — that energy came from inside.',
      -1e30,
    ),
  },
];

export const firstLaw: CheckDefinition = {
  name: 'first-law',
  title: 'First-law balance of a claimed cycle',
  summary:
    'Over a cycle, the energy that comes out (work and heat) can be at most the energy put in less any increase of ' +
    'the energy stored inside. The over-unity ratio, out over (in − stored), cannot exceed 1. Use it for ' +
    'generators, motors and "free energy" devices with stated inputs and outputs.',
  condition: `energy out ≤ energy in − increase of stored energy (to ${FIRST_LAW_TOLERANCE} relative, round-off only)`,
  inputs,
  cautions: [CAUTION_MAINS, CAUTION_HIGH_VOLTAGE, CAUTION_SPARK_GAP, CAUTION_BATTERIES, CAUTION_ROTATING],
  run(si) {
    const x = readInputs(inputs, si);
    const out = x.W_out + x.Q_out;
    const net = x.E_in - x.dE_stored;
    const balance = firstLawBalance(x.E_in, out, x.dE_stored);
    const scale = Math.max(Math.abs(x.E_in), Math.abs(out), Math.abs(x.dE_stored));
    const holds = balance >= -FIRST_LAW_TOLERANCE * scale;
    const outputs: CheckOutput[] = [
      { name: 'E_out', label: 'Energy out (work + heat)', si: out, unit: 'J' },
      { name: 'E_net_in', label: 'Net energy supplied (in − stored)', si: net, unit: 'J' },
      { name: 'balance', label: 'Balance in − out − stored', si: balance, unit: 'J' },
    ];
    let ratioText = '';
    if (net > 0) {
      const r = overUnityRatio(x.E_in, out, x.dE_stored);
      outputs.push({ name: 'over_unity', label: 'Over-unity ratio out/(in − stored)', si: r, unit: '' });
      ratioText = ` (over-unity ratio ${fmt(r)})`;
    }
    const stored = x.dE_stored !== 0 ? ` after allowing ${fmtQ(x.dE_stored, 'J')} of change in stored energy` : '';
    let message: string;
    if (holds) {
      message =
        `Energy out, ${fmtQ(out, 'J')}, is within the net energy supplied, ${fmtQ(net, 'J')}${stored}${ratioText}; ` +
        `${fmtQ(Math.max(0, balance), 'J')} is unaccounted for and would be losses not listed.`;
    } else if (net > 0) {
      message =
        `Energy out, ${fmtQ(out, 'J')}, exceeds the net energy supplied, ${fmtQ(net, 'J')}${stored}${ratioText}: ` +
        `${fmtQ(-balance, 'J')} more comes out than goes in. That would break the first law; look for an input left ` +
        'out (a battery, the mains, heat from the room), stored energy running down, or a measurement artifact such ' +
        'as reading peak rather than average power or ignoring the phase between current and voltage.';
    } else {
      message =
        `The net energy supplied is ${fmtQ(net, 'J')}${stored}, yet ${fmtQ(out, 'J')} comes out. With nothing net ` +
        'going in, nothing can come out over a cycle; look for an input left out or stored energy running down.';
    }
    return {
      check: 'first-law',
      outputs,
      verdict: { holds, message },
      plots: [
        {
          kind: 'bars',
          name: 'energy-ledger',
          title: 'Energy ledger of the cycle',
          unit: 'J',
          yScale: 'linear',
          bars: [
            { name: 'E_net_in', label: 'Net energy supplied (in − stored)', si: net, role: 'bound' },
            { name: 'W_out', label: 'Work out', si: x.W_out, role: 'claim' },
            { name: 'Q_out', label: 'Heat out', si: x.Q_out, role: 'claim' },
            { name: 'E_out', label: 'Energy out in all', si: out, role: 'claim' },
          ],
        },
      ],
    };
  },
};
