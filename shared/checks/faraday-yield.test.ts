/**
 * Faraday yield of electrolysis against outside references: the Faraday constant and the molar volume
 * of an ideal gas as CODATA 2018 prints them (both exact since the 2019 SI), mathjs's own CODATA
 * constants, and Faraday's law n = Q/(zF) as any electrochemistry text states it (e.g. Bard and
 * Faulkner, Electrochemical Methods, Wiley, 1980, ch. 1 — from memory).
 */
import { create, all, type Unit } from 'mathjs';
import { FARADAY, R_GAS } from './constants';
import { faradayYield, WATER_SPLITTING_VOLTAGE } from './faraday-yield';
import { faradayMoles, idealGasVolume } from './formulas';
import { CheckInputError, runCheck, type CheckRun } from './run';

const math = create(all);
const rel = (a: number, b: number) => Math.abs(a / b - 1);
const out = (r: CheckRun) => Object.fromEntries(r.outputs.map((o) => [o.name, o.si]));
const run = (inputs: Record<string, string>) => runCheck('faraday-yield', inputs);
function fields(fn: () => unknown): string[] {
  try {
    fn();
  } catch (e) {
    if (e instanceof CheckInputError) return Object.keys(e.fields);
    throw e;
  }
  return [];
}

// CODATA 2018 (exact): Faraday constant 96 485.332 12… C/mol; molar gas constant 8.314 462 618… J/(mol K);
// molar volume of an ideal gas at 273.15 K and 101.325 kPa 22.413 969 54… × 10^-3 m³/mol (from memory).
const F_CODATA = 96485.33212;
const VM_STP = 22.41396954e-3;
// L/min in m³/s.
const LPM = 1e-3 / 60;

describe('Faraday constant and gas constant', () => {
  test('F = e·N_A and R = k_B·N_A as CODATA 2018 prints them, and as mathjs has them', () => {
    expect(rel(FARADAY, F_CODATA)).toBeLessThan(1e-10);
    expect(rel(R_GAS, 8.314462618)).toBeLessThan(1e-10);
    expect(rel(FARADAY, (math.evaluate('faraday') as Unit).toNumber('C / mol'))).toBeLessThan(1e-12);
    expect(rel(idealGasVolume(1, 273.15, 101325), VM_STP)).toBeLessThan(1e-9);
    expect(rel(idealGasVolume(1, 273.15, 101325), (math.evaluate('molarVolume') as Unit).toNumber('m^3 / mol'))).toBeLessThan(1e-12);
  });
});

describe("Faraday's law n = I·t/(z·F)", () => {
  test('1 A for one hour gives 0.018 656 mol of hydrogen: 0.418 L at 0 °C and 1 atm', () => {
    // 3600 C / (2 × 96 485.332 12 C/mol) = 0.018 655 685 mol; × 22.413 97 L/mol = 0.418 15 L
    // ("about 0.418 L of hydrogen per ampere-hour" is the trade's figure, common practice).
    const n = faradayMoles(1, 3600, 2);
    expect(rel(n, 3600 / (2 * F_CODATA))).toBeLessThan(1e-10);
    expect(n).toBeCloseTo(0.0186557, 7);
    expect(idealGasVolume(n, 273.15, 101325) * 1000).toBeCloseTo(0.41815, 4);
  });
  test('oxygen takes four electrons a molecule: half the moles of hydrogen', () => {
    expect(faradayMoles(5, 100, 4) / faradayMoles(5, 100, 2)).toBe(0.5);
  });
});

describe('faraday-yield check', () => {
  test('10 A through one cell, hydrogen at 0 °C and 101.325 kPa: 0.069 69 L/min; 0.07 L/min is just beyond it', () => {
    // 10 A / (2F) = 5.182 13 × 10^-5 mol/s; × 22.413 97 L/mol × 60 s = 0.069 691 L/min.
    const expected = (10 / (2 * F_CODATA)) * VM_STP;
    const base = { I: '10 A', cells: '1', gas: '1', T: '0 degC', p: '101.325 kPa' };
    const over = run({ ...base, flow_claimed: '0.07 L / min' });
    expect(rel(out(over).flow_max, expected)).toBeLessThan(1e-9);
    expect(out(over).flow_max / LPM).toBeCloseTo(0.069691, 5);
    expect(over.verdict.holds).toBe(false);
    expect(out(over).ratio).toBeCloseTo((0.07 * LPM) / expected, 9);
    expect(out(over).I_needed).toBeCloseTo((10 * 0.07 * LPM) / expected, 6);
    expect(over.verdict.message).toMatch(/^The claimed flow, 0\.0700 L\/min of hydrogen, is 1\.00 times Faraday's yield for 10\.0 A through one cell/);
    const within = run({ ...base, flow_claimed: '0.069 L / min' });
    expect(within.verdict.holds).toBe(true);
    expect(within.verdict.message).toMatch(/within Faraday's yield/);
  });

  test('cells in series multiply the gas; the mixture of a cell that keeps both gases is 1.5 times the hydrogen', () => {
    const one = out(run({ I: '20 A', cells: '1', gas: '1' })).flow_max;
    const stack = out(run({ I: '20 A', cells: '4', gas: '1.5' })).flow_max;
    expect(stack / one).toBeCloseTo(6, 12);
    const oxygen = out(run({ I: '20 A', cells: '1', gas: '0.5' })).flow_max;
    expect(oxygen / one).toBeCloseTo(0.5, 12);
  });

  test('the volume follows the ideal-gas law: at 80 °C it is 353.15/273.15 of the volume at 0 °C', () => {
    const cold = out(run({ T: '0 degC' })).flow_max;
    const warm = out(run({ T: '80 degC' })).flow_max;
    expect(warm / cold).toBeCloseTo(353.15 / 273.15, 12);
    const low = out(run({ p: '50 kPa' })).flow_max;
    expect(low / out(run({ p: '100 kPa' })).flow_max).toBeCloseTo(2, 12);
  });

  test('from a power alone: every cell at 1.229 V; 100 W gives at most 0.928 L/min of mixed gas at 25 °C', () => {
    // 1.229 V: standard potential of O2/H2O at 25 °C (Bard, Parsons and Jordan, Standard Potentials in
    // Aqueous Solution, Dekker, 1985 — from memory). H2 per second = P/(2F·1.229 V), whatever the number of cells.
    expect(WATER_SPLITTING_VOLTAGE).toBe(1.229);
    const r = run({ I: '0 A', P: '100 W', cells: '3', gas: '1.5', T: '25 degC', p: '101.325 kPa', flow_claimed: '2 L / min' });
    const nH2 = 100 / (2 * F_CODATA * 1.229);
    const expected = (nH2 * 1.5 * 8.314462618 * 298.15) / 101325;
    expect(rel(out(r).flow_max, expected)).toBeLessThan(1e-9);
    expect(out(r).flow_max / LPM).toBeCloseTo(0.92844, 4); // 4.216 55e-4 mol/s × 1.5 × 24.4654 L/mol × 60 s
    expect(out(r).I_used).toBeCloseTo(100 / (3 * 1.229), 9);
    expect(out(r).P_min).toBeUndefined();
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toMatch(/100 W with every one of 3 cells in series at 1\.229 V/);
  });

  test('a stated power below cells × 1.229 V × I is a finding of its own', () => {
    const short = run({ I: '20 A', cells: '3', P: '50 W', flow_claimed: '0.1 L / min' });
    expect(out(short).P_min).toBeCloseTo(3 * 1.229 * 20, 9);
    expect(short.verdict.holds).toBe(false);
    expect(short.verdict.message).toMatch(/stated power, 50\.0 W, is also 0\.678 of the least power/);
    const enough = run({ I: '20 A', cells: '3', P: '100 W', flow_claimed: '0.1 L / min' });
    expect(enough.verdict.holds).toBe(true);
    expect(enough.verdict.message).toMatch(/covers the least power/);
  });

  test('the plot draws the yield against the current, through the claimed flow', () => {
    const r = run({ I: '10 A', flow_claimed: '1 L / min' });
    const p = r.plots[0];
    expect(p.kind).toBe('line');
    if (p.kind === 'line') {
      expect(p.series.map((s) => s.name)).toEqual(['flow_max', 'flow_claimed']);
      const last = p.x.values.length - 1;
      // The line's slope is the yield per ampere, in L/min.
      expect(p.series[0].values[last] / p.x.values[last]).toBeCloseTo(out(r).flow_max / LPM / 10, 12);
      expect(p.x.values[last]).toBeGreaterThanOrEqual(out(r).I_needed);
    }
  });

  test('bad figures name their field', () => {
    expect(fields(() => run({ I: '0 A', P: '0 W' }))).toEqual(['inputs.I']);
    expect(fields(() => run({ gas: '2' }))).toEqual(['inputs.gas']);
    expect(fields(() => run({ cells: '2.5' }))).toEqual(['inputs.cells']);
    expect(fields(() => run({ flow_claimed: '3 kg' }))).toEqual(['inputs.flow_claimed']);
    expect(fields(() => run({ T: '0 K' }))).toEqual(['inputs.T']);
  });

  test('cautions: hydrogen, mains, chemicals', () => {
    const text = faradayYield.cautions.join(' ');
    expect(text).toMatch(/oxyhydrogen/i);
    expect(text).toMatch(/mains/i);
    expect(text).toMatch(/hydroxide/i);
  });
});
