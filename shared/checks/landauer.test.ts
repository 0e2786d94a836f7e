/**
 * Landauer's bound against outside references: R. Landauer, "Irreversibility and Heat Generation in
 * the Computing Process", IBM J. Res. Dev. 5(3), 183–191 (1961) (details as IEEE Xplore lists them):
 * at least k·T·ln 2 of heat per bit erased; k_B exact (SI Brochure, 9th ed.); mathjs's boltzmann.
 */
import { create, all, type Unit } from 'mathjs';
import { landauerBound } from './formulas';
import { landauer } from './landauer';
import { CheckInputError, runCheck, type CheckRun } from './run';

const math = create(all);
const rel = (a: number, b: number) => Math.abs(a / b - 1);
const out = (r: CheckRun) => Object.fromEntries(r.outputs.map((o) => [o.name, o.si]));
const run = (inputs: Record<string, string>) => runCheck('landauer', inputs);
const none = { E_op: '0 J', P: '0 W', rate: '0 Hz', W_bit: '0 J' };

describe("Landauer's bound k_B·T·ln 2", () => {
  test('2.871 × 10^-21 J (0.0179 eV) at 300 K', () => {
    // 1.380 649 × 10^-23 J/K × 300 K × 0.693 147 18 = 2.870 979 × 10^-21 J
    expect(landauerBound(300)).toBeCloseTo(2.870979e-21, 26);
    expect(rel(landauerBound(300), (math.evaluate('boltzmann * 300 K * log(2)') as Unit).toNumber('J'))).toBeLessThan(1e-14);
    expect(landauerBound(300) / 1.602176634e-19).toBeCloseTo(0.01792, 5);
    expect(landauerBound(0)).toBe(0);
    expect(landauerBound(4.2) / landauerBound(300)).toBeCloseTo(4.2 / 300, 14);
  });
});

describe('landauer check', () => {
  test('1 zJ per one-bit operation at 300 K is 0.348 of the bound', () => {
    const r = run({ ...none, T: '300 K', E_op: '1 zJ', bits: '1' });
    expect(out(r).E_min).toBeCloseTo(2.870979e-21, 26);
    expect(out(r).E_op_ratio).toBeCloseTo(1e-21 / 2.870978885e-21, 9);
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toMatch(/^At 300 K, erasing one bit gives off at least k_B·T·ln 2 = 2\.87 zJ \(0\.0179 eV\): the claimed 1\.00 zJ per operation erasing 1 bit is 0\.348 of the least/);
  });

  test('an operation erasing 8 bits needs 8 times the bound; above it holds', () => {
    const r = run({ ...none, E_op: '1e-19 J', bits: '8' });
    expect(out(r).E_op_min).toBeCloseTo(8 * 2.870978885e-21, 28);
    expect(r.verdict.holds).toBe(true);
    expect(run({ ...none, E_op: '2e-20 J', bits: '8' }).verdict.holds).toBe(false);
  });

  test('a logically reversible operation (no bit erased) has no floor', () => {
    const r = run({ ...none, E_op: '1e-25 J', bits: '0' });
    expect(r.verdict.holds).toBe(true);
    expect(r.verdict.message).toMatch(/erases no bit/);
  });

  test('10^18 erasures a second at 300 K need at least 2.87 mW: 1 mW breaks the bound, 10 mW does not', () => {
    const r = run({ ...none, P: '1 mW', rate: '1e18 Hz' });
    expect(out(r).P_min).toBeCloseTo(2.870979e-3, 8);
    expect(r.verdict.holds).toBe(false);
    expect(run({ ...none, P: '10 mW', rate: '1e18 Hz' }).verdict.holds).toBe(true);
  });

  test('a demon: work per bit above k_B·T·ln 2 breaks the second law, at or below it does not', () => {
    const r = run({ ...none, W_bit: '1e-20 J' });
    expect(out(r).W_ratio).toBeCloseTo(1e-20 / 2.870978885e-21, 9);
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toMatch(/demon gains no net work/);
    expect(run({ ...none, W_bit: '2.8e-21 J' }).verdict.holds).toBe(true);
  });

  test('nothing claimed: the bound alone', () => {
    const r = run(none);
    expect(r.verdict.holds).toBe(true);
    expect(r.verdict.message).toMatch(/No energy per operation, power or work per bit was claimed/);
    expect(r.plots).toEqual([]);
  });

  test('a power without a rate, and a temperature of zero, name their field', () => {
    const field = (inputs: Record<string, string>) => {
      try {
        run(inputs);
      } catch (e) {
        if (e instanceof CheckInputError) return Object.keys(e.fields);
        throw e;
      }
      return [];
    };
    expect(field({ ...none, P: '1 W' })).toEqual(['inputs.rate']);
    expect(field({ T: '0 K' })).toEqual(['inputs.T']);
    expect(field({ bits: '-1' })).toEqual(['inputs.bits']);
    expect(landauer.cautions).toEqual([]);
  });
});
