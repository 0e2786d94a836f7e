/**
 * The nuclear signature of excess heat against outside references: Q-values recomputed from atomic
 * masses (AME2020, Wang et al., Chinese Physics C 45, 030003, 2021 — the digits from memory) with
 * the atomic mass unit's energy equivalent 931.494 102 42 MeV (CODATA 2018, from memory); standard
 * atomic weights (IUPAC); the heat of combustion of hydrogen (CODATA Key Values for Thermodynamics,
 * 1989: ΔfH°(H2O, liquid) = −285.830 kJ/mol, from memory) as a chemical yardstick.
 */
import { E_CHARGE, N_AVOGADRO } from './constants';
import { atomsInMass, isotropicFluenceRate, reactionRate } from './formulas';
import { nuclearSignature, REACTIONS, reactionFor } from './nuclear-signature';
import { CheckInputError, runCheck, type CheckRun } from './run';

const rel = (a: number, b: number) => Math.abs(a / b - 1);
const out = (r: CheckRun) => Object.fromEntries(r.outputs.map((o) => [o.name, o.si]));
const run = (inputs: Record<string, string>) => runCheck('nuclear-signature', inputs);
const MeV = 1e6 * 1.602176634e-19; // e exact (SI Brochure, 9th ed.)

// Atomic masses in u (AME2020, from memory).
const u = {
  n: 1.00866491590,
  H1: 1.00782503190,
  H2: 2.01410177784,
  H3: 3.01604928132,
  He3: 3.01602932197,
  He4: 4.00260325413,
  Li7: 7.01600343426,
};
const uc2 = 931.49410242; // MeV

describe('Q-values of the presets from atomic masses', () => {
  const q = (before: number[], after: number[]) => (before.reduce((a, b) => a + b) - after.reduce((a, b) => a + b)) * uc2;
  test.each([
    ['D + D → ³He + n', q([u.H2, u.H2], [u.He3, u.n]), 3.269],
    ['D + D → T + p', q([u.H2, u.H2], [u.H3, u.H1]), 4.033],
    ['D + D → ⁴He + γ', q([u.H2, u.H2], [u.He4]), 23.85],
    ['p + ⁷Li → 2 ⁴He', q([u.H1, u.Li7], [u.He4, u.He4]), 17.35],
    ['D + T → ⁴He + n', q([u.H2, u.H3], [u.He4, u.n]), 17.59],
  ])('%s: %f MeV', (label, qMeV, preset) => {
    const r = REACTIONS.find((x) => x.label === label)!;
    expect(r.Q / MeV).toBeCloseTo(preset, 9);
    expect(rel(r.Q / MeV, qMeV)).toBeLessThan(5e-4); // the presets are rounded to four figures
    expect(reactionFor(qMeV * MeV)?.label).toBe(label);
  });
  test('neutron energies: Q shared by two bodies at rest, E_n = Q·m_rest/(m_n + m_rest)', () => {
    const dd = (3.2689 * u.He3) / (u.He3 + u.n);
    const dt = (17.589 * u.He4) / (u.He4 + u.n);
    expect(dd).toBeCloseTo(2.45, 2);
    expect(dt).toBeCloseTo(14.05, 1);
  });
  test('a Q-value that names no preset matches none', () => {
    expect(reactionFor(10 * MeV)).toBeUndefined();
  });
});

describe('formulas', () => {
  test('atoms in 1 g of nickel (58.6934 g/mol, IUPAC standard atomic weight): 1.026 × 10^22', () => {
    expect(rel(atomsInMass(1e-3, 58.6934e-3), (1e-3 * 6.02214076e23) / 58.6934e-3)).toBeLessThan(1e-14);
    expect(atomsInMass(1e-3, 58.6934e-3)).toBeCloseTo(1.02603e22, -18);
  });
  test('1 W of D + D → ³He + n is 1.909 × 10^12 reactions a second; at 1 m that is 1.52 × 10^7 per cm² per second', () => {
    // 1 J/s ÷ (3.269 MeV × 1.602 176 634 × 10^-13 J/MeV) = 1.9093 × 10^12 /s; ÷ (4π × 10^4 cm²) = 1.519 × 10^7 /(cm² s)
    const rate = reactionRate(1, 3.269 * MeV);
    expect(rate).toBeCloseTo(1.9093e12, -9);
    expect(isotropicFluenceRate(rate, 1) / 1e4).toBeCloseTo(rate / (4 * Math.PI * 1e4), 3);
    expect(isotropicFluenceRate(rate, 1) / 1e4).toBeCloseTo(1.519e7, -4);
    expect(isotropicFluenceRate(4 * Math.PI, 1)).toBeCloseTo(1, 14);
  });
});

describe('nuclear-signature check', () => {
  test('1 MJ from 1 g of nickel: 608 eV per atom, 60.8 times a 10 eV chemical scale', () => {
    const r = run({ E_excess: '1 MJ', mass: '1 g', molar_mass: '58.6934 g / mol', atoms: '0', chem_max: '10 eV', P_excess: '0 W' });
    const o = out(r);
    const atoms = (1e-3 * 6.02214076e23) / 58.6934e-3;
    expect(rel(o.atoms_n, atoms)).toBeLessThan(1e-12);
    expect(o.E_per_atom / E_CHARGE).toBeCloseTo(1e6 / atoms / 1.602176634e-19, 6); // 608.3 eV
    expect(o.E_per_atom / E_CHARGE).toBeCloseTo(608.3, 1);
    // "10 eV" parses at the exact electronvolt (shared/worksheet/math.ts).
    expect(o.chem_ratio).toBeCloseTo(60.83, 2);
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toMatch(/^The claimed excess energy, 1\.00 MJ from 1\.03 × 10\^22 atoms .* is 608 eV per atom, 60\.8 times the most chemistry gives/);
    expect(r.verdict.message).toMatch(/calorimetry/);
  });

  test('burning hydrogen is on the chemical scale: 285.83 kJ over the 3 atoms of a mole of water is 0.987 eV per atom', () => {
    const atoms = 3 * 6.02214076e23;
    const r = run({ E_excess: '285.83 kJ', atoms: String(atoms), P_excess: '0 W' });
    expect(out(r).E_per_atom / E_CHARGE).toBeCloseTo(285830 / atoms / 1.602176634e-19, 9);
    expect(out(r).E_per_atom / E_CHARGE).toBeCloseTo(0.9875, 3);
    expect(r.verdict.holds).toBe(true);
    expect(r.verdict.message).toMatch(/within the chemical scale/);
  });

  test('the number of atoms, when given, overrides the mass', () => {
    const r = run({ E_excess: '1 kJ', mass: '5 g', atoms: '1e20', P_excess: '0 W' });
    expect(out(r).atoms_n).toBe(1e20);
    expect(N_AVOGADRO).toBe(6.02214076e23);
  });

  test('10 W through D + D → ³He + n: 1.91 × 10^13 neutrons a second, 1.52 × 10^8 per cm² per second at 1 m', () => {
    const r = run({ E_excess: '0 J', P_excess: '10 W', Q: '3.269 MeV', r: '1 m' });
    const o = out(r);
    const q = 3.269 * 1.602176634e-13; // MeV exactly (SI Brochure 2019), as the typed input is read
    expect(rel(o.reaction_rate, 10 / q)).toBeLessThan(1e-12);
    expect(o.emission_rate).toBe(o.reaction_rate);
    expect(rel(o.fluence_rate, o.reaction_rate / (4 * Math.PI))).toBeLessThan(1e-12);
    expect(r.verdict.holds).toBe(true); // no energy per atom to judge
    expect(r.verdict.message).toMatch(/each giving off one 2\.45 MeV neutron: 1\.91 × 10\^13 per second, 1\.52 × 10\^8 per cm² per second at 1\.00 m/);
    expect(r.outputs.find((x) => x.name === 'fluence_rate')?.displayUnit).toBe('cm^-2 s^-1');
  });

  test('the flux falls with the square of the distance', () => {
    const near = out(run({ P_excess: '1 W', r: '0.5 m' })).fluence_rate;
    const far = out(run({ P_excess: '1 W', r: '5 m' })).fluence_rate;
    expect(near / far).toBeCloseTo(100, 9);
  });

  test('charged-product reactions are told by their ash: helium-4 from p + ⁷Li (two per reaction), tritium from D + D → T + p', () => {
    const li = run({ P_excess: '1 W', Q: '17.35 MeV' });
    expect(out(li).emission_rate).toBeUndefined();
    expect(out(li).ash_rate / out(li).reaction_rate).toBe(2);
    expect(li.verdict.message).toMatch(/helium-4/);
    const t = run({ P_excess: '1 W', Q: '4.033 MeV' });
    expect(out(t).ash_rate).toBe(out(t).reaction_rate);
    expect(t.verdict.message).toMatch(/tritium/);
  });

  test('an unnamed Q-value is described as one penetrating particle per reaction', () => {
    const r = run({ P_excess: '1 W', Q: '10 MeV' });
    expect(r.verdict.message).toMatch(/if each gave off one penetrating particle/);
    expect(out(r).reactions_total).toBeCloseTo(1e6 / (10 * 1.602176634e-13), -6); // 1 MeV = 1.602176634e-13 J exactly (SI Brochure 2019)
  });

  test('without a mass or a count of atoms the energy cannot be put on the scale', () => {
    const r = run({ E_excess: '1 MJ', mass: '0 g', atoms: '0', P_excess: '0 W' });
    expect(r.verdict.holds).toBe(true);
    expect(out(r).E_per_atom).toBeUndefined();
    expect(r.verdict.message).toMatch(/cannot be put on the chemical scale/);
  });

  test('the bar plot puts the claim between the chemical scale and the reaction', () => {
    const p = run({}).plots[0];
    expect(p.kind).toBe('bars');
    if (p.kind === 'bars') expect(p.bars.map((b) => b.name)).toEqual(['chem_max', 'E_per_atom', 'Q']);
  });

  test('bad figures name their field; cautions cover radiation', () => {
    const field = (inputs: Record<string, string>) => {
      try {
        run(inputs);
      } catch (e) {
        if (e instanceof CheckInputError) return Object.keys(e.fields);
        throw e;
      }
      return [];
    };
    expect(field({ molar_mass: '0 g / mol' })).toEqual(['inputs.molar_mass']);
    expect(field({ Q: '0 MeV' })).toEqual(['inputs.Q']);
    expect(field({ r: '0 m' })).toEqual(['inputs.r']);
    expect(nuclearSignature.cautions.join(' ')).toMatch(/ionizing radiation/i);
  });
});
