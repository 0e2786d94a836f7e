import { CAUTION_HYDROGEN, CAUTION_RADIOACTIVE } from './cautions';
import { E_CHARGE } from './constants';
import { fmt, fmtQ } from './format';
import { atomsInMass, isotropicFluenceRate, reactionRate } from './formulas';
import { readInputs } from './inputs';
import type { BarPlot, CheckDefinition, CheckInputSpec, CheckOutput } from './types';

const MeV = 1e6 * E_CHARGE;
const eV = E_CHARGE;

/**
 * Reactions a nuclear explanation of excess heat usually names. Q-values from the atomic masses of
 * the 2020 Atomic Mass Evaluation (AME2020): Q = (masses before − masses after)·c². What each
 * reaction gives off follows from its products; the neutron energies from sharing Q between two
 * bodies (momentum conservation, reactants nearly at rest).
 */
export const REACTIONS = [
  { label: 'D + D → ³He + n', Q: 3.269 * MeV, emits: { what: 'neutron', energy: '2.45 MeV' }, ash: 'helium-3' },
  { label: 'D + D → T + p', Q: 4.033 * MeV, emits: null, ash: 'tritium (radioactive hydrogen)' },
  { label: 'D + D → ⁴He + γ', Q: 23.85 * MeV, emits: { what: 'gamma ray', energy: '23.8 MeV' }, ash: 'helium-4' },
  { label: 'p + ⁷Li → 2 ⁴He', Q: 17.35 * MeV, emits: null, ash: 'helium-4 (two atoms per reaction)' },
  { label: 'D + T → ⁴He + n', Q: 17.59 * MeV, emits: { what: 'neutron', energy: '14.1 MeV' }, ash: 'helium-4' },
] as const;

type Reaction = (typeof REACTIONS)[number];

/** The named reaction whose Q-value is within 0.5 % of Q, if any. */
export function reactionFor(Q: number): Reaction | undefined {
  return REACTIONS.find((r) => Math.abs(Q / r.Q - 1) <= 0.005);
}

const inputs: CheckInputSpec[] = [
  {
    name: 'E_excess',
    label: 'Claimed excess energy (0 = not claimed)',
    unit: 'J',
    displayUnit: 'MJ',
    default: '1 MJ',
    min: 0,
    max: 1e25,
    help: 'The heat the claim reports beyond what was put in, over the whole run (e.g. "250 kJ", "4 MJ", "1.2 kWh").',
  },
  {
    name: 'mass',
    label: 'Mass of the active material',
    unit: 'kg',
    displayUnit: 'g',
    default: '1 g',
    min: 0,
    max: 1e9,
    help: 'The mass of the metal, powder or gas said to react, e.g. the nickel powder or the palladium cathode.',
  },
  {
    name: 'molar_mass',
    label: 'Molar mass of the active material',
    unit: 'kg / mol',
    displayUnit: 'g / mol',
    default: '58.6934 g / mol',
    min: 1e-4,
    max: 1,
    help: 'Standard atomic weights (IUPAC): nickel 58.6934, palladium 106.42, titanium 47.867, lithium 6.94, hydrogen 1.008 g/mol; deuterium 2.0141 g/mol.',
    presets: [
      { label: 'Nickel', value: '58.6934 g / mol' },
      { label: 'Palladium', value: '106.42 g / mol' },
      { label: 'Titanium', value: '47.867 g / mol' },
      { label: 'Lithium', value: '6.94 g / mol' },
      { label: 'Hydrogen', value: '1.008 g / mol' },
      { label: 'Deuterium', value: '2.0141 g / mol' },
    ],
  },
  {
    name: 'atoms',
    label: 'Number of atoms (instead of the mass; 0 = use the mass)',
    unit: '',
    default: '0',
    min: 0,
    max: 1e40,
    help: 'When the claim counts the atoms (or moles × 6.022 × 10^23) directly.',
  },
  {
    name: 'chem_max',
    label: 'Chemical scale: the most energy per atom chemistry gives',
    unit: 'J',
    displayUnit: 'eV',
    default: '10 eV',
    min: 1e-21,
    max: 1e-15,
    help:
      'Chemical reactions and stored chemical energy release a few electronvolts per atom at most: chemical bonds hold about ' +
      '1 to 10 eV (common practice, no source). 10 eV is generous to the claim.',
  },
  {
    name: 'P_excess',
    label: 'Claimed excess power (0 = not claimed)',
    unit: 'W',
    default: '10 W',
    min: 0,
    max: 1e15,
    help: 'The steady heat output the claim reports beyond the input.',
  },
  {
    name: 'Q',
    label: 'Energy per reaction (Q-value) of the proposed reaction',
    unit: 'J',
    displayUnit: 'MeV',
    default: '3.269 MeV',
    min: 1e-16,
    max: 1e-9,
    help: 'Q-values from the atomic masses of the 2020 Atomic Mass Evaluation (AME2020).',
    presets: REACTIONS.map((r) => ({ label: `${r.label} (${fmt(r.Q / MeV, 4)} MeV)`, value: `${fmt(r.Q / MeV, 4)} MeV` })),
  },
  {
    name: 'r',
    label: 'Distance from the cell to a detector (or a person)',
    unit: 'm',
    default: '1 m',
    min: 1e-3,
    max: 1e5,
    help: 'Where the emission is counted; the flux falls off with the square of the distance.',
  },
];

/** A count in words: "1.03 × 10^22". */
const count = (n: number) => fmt(n);

/**
 * Excess heat against the chemical scale, and what a nuclear explanation of it would have to show:
 * energy per atom of the material, and, for a proposed reaction, the reactions per second and the
 * neutrons or gamma rays they would give off.
 */
export const nuclearSignature: CheckDefinition = {
  name: 'nuclear-signature',
  title: 'Excess heat: chemical scale and nuclear signature',
  summary:
    'Chemistry releases a few electronvolts per atom; nuclear reactions release millions. Dividing a claimed excess ' +
    'energy by the number of atoms in the material tells which scale the claim is on. For a claimed power and a proposed ' +
    'reaction, P/Q gives the reactions per second a nuclear explanation needs, and with them the neutrons or gamma rays ' +
    '(or the helium and tritium) it would produce: 1 W of D + D fusion is about 2 × 10^12 reactions a second. Use it for ' +
    'claims of excess heat from metal–hydrogen cells and similar.',
  condition: 'energy per atom ≤ the chemical scale (10 eV by default); otherwise a nuclear explanation and its emission are required',
  inputs,
  cautions: [CAUTION_RADIOACTIVE, CAUTION_HYDROGEN],
  run(si) {
    const x = readInputs(inputs, si);
    const outputs: CheckOutput[] = [];
    const sentences: string[] = [];
    let holds = true;

    // Energy per atom.
    const atoms = x.atoms > 0 ? x.atoms : x.mass > 0 ? atomsInMass(x.mass, x.molar_mass) : 0;
    if (x.E_excess > 0 && atoms > 0) {
      const perAtom = x.E_excess / atoms;
      const ratio = perAtom / x.chem_max;
      outputs.push(
        { name: 'atoms_n', label: 'Atoms of active material', si: atoms, unit: '' },
        { name: 'E_per_atom', label: 'Excess energy per atom', si: perAtom, unit: 'J', displayUnit: 'eV' },
        { name: 'chem_ratio', label: 'Energy per atom over the chemical scale', si: ratio, unit: '' },
      );
      const source =
        x.atoms > 0
          ? `${count(atoms)} atoms`
          : `${count(atoms)} atoms (${fmtQ(x.mass * 1000, 'g')} at ${fmt(x.molar_mass * 1000, 4)} g/mol)`;
      holds = perAtom <= x.chem_max;
      sentences.push(
        holds
          ? `The claimed excess energy, ${fmtQ(x.E_excess, 'J')} from ${source}, is ${fmt(perAtom / eV)} eV per atom, ` +
              `within the chemical scale (${fmt(x.chem_max / eV)} eV per atom): a chemical source or stored chemical energy could account for it.`
          : `The claimed excess energy, ${fmtQ(x.E_excess, 'J')} from ${source}, is ${fmt(perAtom / eV)} eV per atom, ` +
              `${fmt(ratio)} times the most chemistry gives (${fmt(x.chem_max / eV)} eV per atom): no chemical reaction or ` +
              'stored chemical energy accounts for it, so either the excess is smaller than measured or a nuclear process supplies it.',
      );
    } else if (x.E_excess > 0) {
      sentences.push(`No mass or number of atoms was given, so the claimed ${fmtQ(x.E_excess, 'J')} cannot be put on the chemical scale.`);
    }

    // What a nuclear explanation would require.
    const reaction = reactionFor(x.Q);
    const name = reaction ? `${reaction.label} (Q = ${fmt(x.Q / MeV)} MeV)` : `a reaction with Q = ${fmt(x.Q / MeV)} MeV`;
    if (x.E_excess > 0) {
      const total = x.E_excess / x.Q;
      outputs.push({ name: 'reactions_total', label: 'Reactions the claimed energy needs', si: total, unit: '' });
      sentences.push(
        `Through ${name}, ${fmtQ(x.E_excess, 'J')} needs ${count(total)} reactions, leaving as many atoms of ` +
          `${reaction ? reaction.ash : 'reaction products'}.`,
      );
    }
    if (x.P_excess > 0) {
      const rate = reactionRate(x.P_excess, x.Q);
      outputs.push({ name: 'reaction_rate', label: 'Reactions per second the claimed power needs', si: rate, unit: 's^-1', displayUnit: 's^-1' });
      if (!reaction || reaction.emits) {
        const what = reaction?.emits ? `${reaction.emits.energy} ${reaction.emits.what}` : 'penetrating particle (neutron or gamma ray)';
        const flux = isotropicFluenceRate(rate, x.r);
        const perSecond = reaction?.emits ? `${reaction.emits.what[0].toUpperCase()}${reaction.emits.what.slice(1)}s per second` : 'Neutrons or gamma rays per second (one per reaction)';
        outputs.push(
          { name: 'emission_rate', label: perSecond, si: rate, unit: 's^-1', displayUnit: 's^-1' },
          { name: 'fluence_rate', label: `Flux at ${fmtQ(x.r, 'm')}`, si: flux, unit: 'm^-2 s^-1', displayUnit: 'cm^-2 s^-1' },
        );
        sentences.push(
          `A nuclear explanation of ${fmtQ(x.P_excess, 'W')} through ${name} requires ${count(rate)} reactions per second` +
            `${reaction ? `, each giving off one ${what}` : `; if each gave off one ${what}`}: ${count(rate)} per second, ` +
            `${count(flux / 1e4)} per cm² per second at ${fmtQ(x.r, 'm')}. That emission is what tells a nuclear source from ` +
            'a measurement error: calibrated neutron and gamma detectors, with background runs, would show it, and at this rate ' +
            'it would also be a hazard to people nearby.',
        );
      } else {
        const ashRate = reaction.label.startsWith('p + ⁷Li') ? 2 * rate : rate;
        outputs.push({ name: 'ash_rate', label: `Atoms of ${reaction.ash.replace(/ \(.*\)$/, '')} made per second`, si: ashRate, unit: 's^-1', displayUnit: 's^-1' });
        sentences.push(
          `A nuclear explanation of ${fmtQ(x.P_excess, 'W')} through ${name} requires ${count(rate)} reactions per second. ` +
            `Its products are charged and stop in the cell, so its signature is the ${reaction.ash} it leaves: ${count(ashRate)} ` +
            'atoms per second, which mass spectrometry (or, for tritium, its radioactivity) would find; side reactions of the ' +
            'same fuel usually give off some neutrons or gamma rays too.',
        );
      }
    }
    if (sentences.length === 0) {
      sentences.push(`No excess energy or power was claimed. ${name[0].toUpperCase()}${name.slice(1)} releases ${fmt(x.Q / x.chem_max)} times the chemical scale per reaction.`);
    } else if (!holds) {
      sentences.push(
        'Apparent excess heat also comes from calorimetry: a heat-loss calibration that drifts, input power of a pulsed or ' +
          'noisy supply read as its average voltage times average current, gases that recombine inside the cell, and heat ' +
          'stored earlier in the cell and released later.',
      );
    }
    outputs.push({ name: 'Q', label: 'Energy per reaction', si: x.Q, unit: 'J', displayUnit: 'MeV' });

    const perAtomOut = outputs.find((o) => o.name === 'E_per_atom');
    const bars: BarPlot = {
      kind: 'bars',
      name: 'energy-per-event',
      title: 'Energy per atom of the claim against the chemical scale and the energy of one reaction',
      unit: 'J',
      yScale: 'log',
      bars: [
        { name: 'chem_max', label: 'Chemical scale', si: x.chem_max, role: 'bound' },
        ...(perAtomOut ? [{ name: 'E_per_atom', label: 'Claimed energy per atom', si: perAtomOut.si, role: 'claim' as const }] : []),
        { name: 'Q', label: 'Energy per reaction', si: x.Q },
      ],
    };
    return { check: 'nuclear-signature', outputs, verdict: { holds, message: sentences.join(' ') }, plots: [bars] };
  },
};
