/**
 * The starter worksheets in content/worksheets: each is valid, and at its defaults (and at other
 * figures) gives the numbers of the textbook formula it implements, worked by hand here.
 * (Reading the files uses Node's fs in the test only; the evaluator itself stays pure.)
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { compileWorksheet } from './evaluate';
import { parseWorksheetYaml } from './load';
import type { Worksheet } from './schema';
import type { WorksheetResult } from './types';

const DIR = join(__dirname, '..', '..', 'content', 'worksheets');
const files = readdirSync(DIR).filter((f) => f.endsWith('.yml'));
const sheets = new Map<string, Worksheet>(files.map((f) => [f, parseWorksheetYaml(readFileSync(join(DIR, f), 'utf8'), f)]));

const C = 299792458; // m/s exact (BIPM SI Brochure, 9th ed., 2019)
const G0 = 9.80665; // m/s^2 exact (3rd CGPM 1901; NIST SP 811 App. B)
const KWH = 3.6e6; // J per kWh, exact (NIST SP 811 (2008) App. B.8)

function run(file: string, values: Record<string, string> = {}): WorksheetResult {
  const ws = sheets.get(file);
  if (!ws) throw new Error(`missing ${file}`);
  return compileWorksheet(ws).evaluate(values);
}
const step = (r: WorksheetResult, name: string) => {
  const s = r.steps.find((x) => x.name === name);
  if (!s?.value) throw new Error(`step ${name}: ${s?.error?.message ?? 'missing'}`);
  return s.value.si;
};
const check = (r: WorksheetResult, name: string) => r.checks.find((x) => x.name === name);

test('there are at least five starter worksheets, each valid, evaluating without error, named after its file', () => {
  expect(files.length).toBeGreaterThanOrEqual(5);
  for (const [file, ws] of sheets) {
    expect(`${ws.name}.yml`).toBe(file);
    const r = run(file);
    expect(r.ok).toBe(true);
    for (const p of r.plots) {
      expect(p.error).toBeUndefined();
      expect(p.series.every((s) => s.values.some((v) => v !== null))).toBe(true);
    }
  }
});

describe('photon-rocket-bound: F ≤ P/c (momentum of radiation p = E/c; e.g. Griffiths, Introduction to Electrodynamics, ch. 9 — from memory)', () => {
  test('defaults: 1 mN claimed from 1 kW', () => {
    const r = run('photon-rocket-bound.yml');
    expect(step(r, 'F_bound')).toBeCloseTo(3.3356409519815205e-6, 18); // 1000 / 299 792 458 N
    expect(step(r, 'ratio')).toBeCloseTo(299.792458, 9); // 0.001 × c / 1000
    expect(check(r, 'within_bound')?.holds).toBe(false);
    expect(check(r, 'within_bound')?.message).toContain('299.8 times the photon-rocket bound of 3.336 µN');
  });

  test('a laser pointer: 5 mW gives at most 16.7 pN; 10 pN claimed is within it', () => {
    const r = run('photon-rocket-bound.yml', { F: '10 pN', P: '5 mW' });
    expect(step(r, 'F_bound')).toBeCloseTo(0.005 / C, 20); // 1.6678 × 10^-11 N
    expect(check(r, 'within_bound')?.holds).toBe(true);
  });

  test('the plot of the bound is P/c at every power', () => {
    const p = run('photon-rocket-bound.yml').plots[0];
    expect(p.x.scale).toBe('log');
    p.x.values.forEach((x, i) => expect((p.series[0].values[i] as number) / (x / C) - 1).toBeCloseTo(0, 12));
  });
});

describe('break-even-speed: mechanical power P = F v (e.g. Halliday, Resnick & Walker, Fundamentals of Physics, "Power" — from memory)', () => {
  test('defaults: 1 mN from 1 kW at 10 km/s', () => {
    const r = run('break-even-speed.yml');
    expect(step(r, 'v_break_even')).toBeCloseTo(1000 / 0.001, 6); // P/F = 10^6 m/s
    expect(step(r, 'KE_rate')).toBeCloseTo(0.001 * 10000, 12); // F v = 10 W
    expect(step(r, 'surplus')).toBeCloseTo(10 - 1000, 9);
    expect(check(r, 'below_break_even')?.holds).toBe(true);
  });

  test('above the break-even speed the claim gains more than it is fed', () => {
    const r = run('break-even-speed.yml', { F: '0.1 N', P: '100 W', v: '2 km/s' });
    expect(step(r, 'v_break_even')).toBeCloseTo(1000, 9); // 100 W / 0.1 N
    expect(step(r, 'gain_over_input')).toBeCloseTo((0.1 * 2000) / 100, 12); // 2
    expect(check(r, 'below_break_even')?.holds).toBe(false);
  });
});

describe('carnot-limit: η ≤ 1 − Tc/Th, COP ≤ Th/(Th − Tc) (Carnot; e.g. Fermi, Thermodynamics, ch. 4 — from memory)', () => {
  test('defaults: 80 °C and 10 °C', () => {
    const r = run('carnot-limit.yml');
    const Th = 80 + 273.15; // K (NIST SP 811 B.9)
    const Tc = 10 + 273.15;
    expect(step(r, 'eta_carnot')).toBeCloseTo(1 - Tc / Th, 14); // 0.198 216…
    expect(step(r, 'eta_carnot')).toBeCloseTo(0.19821605550049556, 14); // 70 / 353.15, by hand
    expect(step(r, 'COP_carnot')).toBeCloseTo(5.045, 12); // 353.15 / 70
    expect(check(r, 'engine_within_carnot')?.holds).toBe(false); // 30 % > 19.8 %
    expect(check(r, 'heat_pump_within_carnot')?.holds).toBe(true); // 4.5 < 5.045
    expect(r.steps.find((s) => s.name === 'eta_carnot')?.value?.display).toBe('19.82 %');
  });

  test('a power-plant figure: 565 °C steam, 30 °C cooling water, 40 % claimed is within Carnot (63.8 %)', () => {
    const r = run('carnot-limit.yml', { T_h: '565 degC', T_c: '30 degC', eta_claimed: '40 %' });
    expect(step(r, 'eta_carnot')).toBeCloseTo(1 - 303.15 / 838.15, 14);
    expect(check(r, 'engine_within_carnot')?.holds).toBe(true);
  });

  test('Fahrenheit and kelvin inputs give the same limit', () => {
    const a = run('carnot-limit.yml', { T_h: '176 degF', T_c: '283.15 K' }); // 176 °F = 80 °C
    expect(step(a, 'eta_carnot')).toBeCloseTo(70 / 353.15, 12);
  });
});

describe('over-unity-balance: first law over a cycle, E_out ≤ E_in − ΔE_stored', () => {
  test('defaults: 1.3 kWh out for 1 kWh in over one hour', () => {
    const r = run('over-unity-balance.yml');
    expect(step(r, 'unaccounted')).toBeCloseTo(0.3 * KWH, 6); // 1.08 MJ
    expect(step(r, 'over_unity')).toBeCloseTo(1.3, 12);
    expect(step(r, 'P_surplus')).toBeCloseTo((0.3 * KWH) / 3600, 9); // 300 W
    expect(check(r, 'first_law')?.holds).toBe(false);
  });

  test('a drained store can cover the output; BTU and kWh mix', () => {
    const r = run('over-unity-balance.yml', { E_in: '1 kWh', E_out: '1.3 kWh', dE_stored: '-0.4 kWh' });
    expect(step(r, 'unaccounted')).toBeCloseTo(-0.1 * KWH, 6);
    expect(check(r, 'first_law')?.holds).toBe(true);
    const btu = run('over-unity-balance.yml', { E_in: '3412.14 BTU', E_out: '1 kWh' }); // 1 kWh ≈ 3412.14 BTU_IT (SP 811: 1055.056 J)
    expect(step(btu, 'over_unity')).toBeCloseTo(KWH / (3412.14 * 1055.05585262), 6);
  });
});

describe('rocket-equation: Δv = v_e ln(m0/m1), v_e = Isp g0 (Tsiolkovsky; e.g. Sutton & Biblarz, Rocket Propulsion Elements, ch. 4 — from memory)', () => {
  test('defaults: Isp 300 s, 1000 kg to 400 kg, 5 km/s claimed', () => {
    const r = run('rocket-equation.yml');
    const ve = 300 * G0; // 2941.995 m/s
    expect(step(r, 'v_e')).toBeCloseTo(ve, 9);
    expect(step(r, 'dv')).toBeCloseTo(ve * Math.log(2.5), 9);
    expect(step(r, 'dv')).toBeCloseTo(2695.722751720105, 6); // by hand: 2941.995 × 0.916 290 73
    expect(step(r, 'ratio_needed')).toBeCloseTo(Math.exp(5000 / ve), 9); // 5.4714
    expect(step(r, 'propellant_share_needed')).toBeCloseTo(1 - Math.exp(-5000 / ve), 12);
    expect(check(r, 'dv_within_reach')?.holds).toBe(false);
  });

  test('a mass ratio of e gives exactly one exhaust speed', () => {
    const r = run('rocket-equation.yml', { Isp: '450 s', m0: `${Math.E * 1000} kg`, m1: '1000 kg', dv_claimed: '4 km/s' });
    expect(step(r, 'dv')).toBeCloseTo(450 * G0, 6); // 4412.99 m/s
    expect(check(r, 'dv_within_reach')?.holds).toBe(true);
  });
});
