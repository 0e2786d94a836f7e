/**
 * The constants table against its sources, and against mathjs's own physical constants.
 */
import { all, create } from 'mathjs';
import { CONSTANTS, CONSTANT_NAMES, getConstant } from './constants';
import { evaluateWorksheet } from './evaluate';
import type { Worksheet } from './schema';

const k = (name: string) => {
  const c = getConstant(name);
  if (!c) throw new Error(`no constant ${name}`);
  return c;
};

describe('exact SI defining constants (BIPM SI Brochure, 9th edition, 2019, Table 1)', () => {
  test('values, units and exactness', () => {
    expect(k('c').value).toBe(299792458); // c = 299 792 458 m s^-1 exact
    expect(k('h').value).toBe(6.62607015e-34); // h = 6.626 070 15 × 10^-34 J s exact
    expect(k('e').value).toBe(1.602176634e-19); // e = 1.602 176 634 × 10^-19 C exact
    expect(k('k_B').value).toBe(1.380649e-23); // k = 1.380 649 × 10^-23 J K^-1 exact
    expect(k('N_A').value).toBe(6.02214076e23); // N_A = 6.022 140 76 × 10^23 mol^-1 exact
    for (const name of ['c', 'h', 'e', 'k_B', 'N_A']) {
      expect(k(name).exact).toBe(true);
      expect(k(name).source).toContain('SI Brochure), 9th edition (2019)');
    }
  });

  test('standard acceleration of gravity, exact by definition (3rd CGPM 1901; NIST SP 811 (2008) App. B)', () => {
    expect(k('g0').value).toBe(9.80665); // g_n = 9.806 65 m s^-2 exact
    expect(k('g0').exact).toBe(true);
  });
});

describe('CODATA 2022 recommended values', () => {
  test('values as printed (from memory, cross-checked against transcriptions of the NIST listing)', () => {
    expect(k('G').value).toBe(6.6743e-11); // 6.674 30(15) × 10^-11 m^3 kg^-1 s^-2
    expect(k('m_e').value).toBe(9.1093837139e-31); // 9.109 383 7139(28) × 10^-31 kg
    expect(k('m_p').value).toBe(1.67262192595e-27); // 1.672 621 925 95(52) × 10^-27 kg
    expect(k('mu0').value).toBe(1.25663706127e-6); // 1.256 637 061 27(20) × 10^-6 N A^-2
    expect(k('eps0').value).toBe(8.8541878188e-12); // 8.854 187 8188(14) × 10^-12 F m^-1
    for (const name of ['G', 'm_e', 'm_p', 'mu0', 'eps0']) expect(k(name).source).toContain('CODATA 2022');
  });

  test('ε0 μ0 c² = 1 (SI relation), within the printed digits of ε0 (1.6e-10 relative)', () => {
    const product = k('eps0').value * k('mu0').value * k('c').value ** 2;
    expect(Math.abs(product - 1)).toBeLessThan(1e-10);
  });

  test('μ0 = 2αh/(e²c) with α = 7.297 352 5643(11) × 10^-3 (CODATA 2022; from memory)', () => {
    const alpha = 7.2973525643e-3;
    const mu0 = (2 * alpha * k('h').value) / (k('e').value ** 2 * k('c').value);
    expect(Math.abs(mu0 / k('mu0').value - 1)).toBeLessThan(2e-10); // α printed to 11 digits
  });

  test('m_p / m_e = 1836.152 673 426(32) (CODATA 2022)', () => {
    expect(Math.abs(k('m_p').value / k('m_e').value / 1836.152673426 - 1)).toBeLessThan(1e-10);
  });
});

describe('against mathjs 15 built-in physical constants', () => {
  const math = create(all);
  const si = (name: string) => (math as unknown as Record<string, { value: number }>)[name].value;

  test('exact constants and G agree exactly', () => {
    expect(si('speedOfLight')).toBe(k('c').value);
    expect(si('planckConstant')).toBe(k('h').value);
    expect(si('elementaryCharge')).toBe(k('e').value);
    expect(si('boltzmann')).toBe(k('k_B').value);
    expect(si('avogadro')).toBe(k('N_A').value);
    expect(si('gravitationConstant')).toBe(k('G').value);
    expect(si('gravity')).toBe(k('g0').value);
  });

  test('mathjs carries CODATA 2018 for the others: they differ from ours by about 1e-9, as documented', () => {
    const pairs: [string, string, number][] = [
      ['electronMass', 'm_e', 1.4e-9], // 2018: 9.109 383 7015 × 10^-31 kg
      ['protonMass', 'm_p', 1.4e-9], // 2018: 1.672 621 923 69 × 10^-27 kg
      ['magneticConstant', 'mu0', 6.8e-10], // 2018: 1.256 637 062 12 × 10^-6 N A^-2
      ['electricConstant', 'eps0', 6.8e-10], // 2018: 8.854 187 8128 × 10^-12 F m^-1
    ];
    for (const [mathName, ours, documented] of pairs) {
      const rel = Math.abs(k(ours).value / si(mathName) - 1);
      expect(rel).toBeGreaterThan(0);
      expect(Math.abs(rel - documented)).toBeLessThan(0.1e-9);
    }
  });
});

describe('constants in expressions', () => {
  const sheet = (expression: string, extra: Partial<Worksheet> = {}): Worksheet => ({
    name: 'k',
    title: 'constants',
    inputs: [],
    steps: [{ name: 'x', label: 'x', expression }],
    checks: [],
    plots: [],
    ...extra,
  });
  const run = (expression: string) => evaluateWorksheet(sheet(expression)).steps[0];

  test('every name in the table is usable, with its unit', () => {
    expect(CONSTANT_NAMES).toEqual(['c', 'h', 'e', 'k_B', 'N_A', 'G', 'm_e', 'm_p', 'g0', 'mu0', 'eps0']);
    for (const c of CONSTANTS) {
      const r = run(c.name);
      expect(r.error).toBeUndefined();
      expect(r.value?.si).toBe(c.value);
    }
    expect(run('c').value?.unit).toBe('m / s');
    expect(run('k_B').value?.unit).toBe('J / K');
  });

  test('e is the elementary charge; Euler\'s number is exp(1); E is refused with a hint', () => {
    expect(run('e').value?.si).toBe(1.602176634e-19);
    expect(run('e').value?.unit).toBe('C');
    expect(run('exp(1)').value?.si).toBeCloseTo(Math.E, 15);
    expect(run('E').error?.message).toContain("Euler's number write exp(1)");
  });

  test('N_A in expressions: e N_A is the Faraday constant 96 485.332 12 C/mol, k_B N_A the gas constant 8.314 462 618 J/(mol K) (CODATA 2018, both exact)', () => {
    expect(run('N_A').value?.unit).toBe('mol^-1');
    const F = run('e * N_A');
    expect(F.error).toBeUndefined();
    expect(Math.abs(F.value!.si / 96485.33212 - 1)).toBeLessThan(1e-10);
    const R = run('k_B * N_A');
    expect(Math.abs(R.value!.si / 8.314462618 - 1)).toBeLessThan(1e-10);
  });

  test('h is the Planck constant in expressions; hours are written hour', () => {
    expect(run('h').value?.si).toBe(6.62607015e-34);
    expect(run('2 hour').value?.si).toBe(7200);
  });

  test('derived relations computed in expressions: h c / e for 1 µm photons is 1.239 84 eV (common practice: hc ≈ 1239.84 eV nm)', () => {
    const r = run('h * c / (1 um) / e');
    // hc/e = 1.239 841 984… × 10^-6 V m, exact from the defining constants
    expect(r.value?.si).toBeCloseTo((6.62607015e-34 * 299792458) / 1e-6 / 1.602176634e-19, 12);
    expect(r.value?.si).toBeCloseTo(1.23984198, 7);
  });

  test('constants are read-only: assignment is refused, and inputs or steps cannot take their names', () => {
    expect(run('c = 3').error?.kind).toBe('refused');
    const named = evaluateWorksheet(
      sheet('1', { inputs: [{ name: 'c', label: 'c', unit: 'J/(kg K)', default: '4186 J/(kg K)' }] }),
    );
    expect(named.inputs[0].error?.message).toContain('"c" is the name of a constant (the speed of light in vacuum)');
    const step = evaluateWorksheet(sheet('1', { steps: [{ name: 'G', label: 'G', expression: '1' }] }));
    expect(step.steps[0].error?.message).toContain('"G" is the name of a constant');
  });
});
