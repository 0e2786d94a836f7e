import fc from 'fast-check';
import { create, all, type Unit } from 'mathjs';
import * as cautionTexts from './cautions';
import { C_LIGHT, E_CHARGE, M_ELECTRON } from './constants';
import { CheckRangeError, checkList, checks, isCheckRangeError, validateCheckInputs } from './index';
import { CHECK_NAMES, type CheckDefinition, type CheckResult } from './types';

const math = create(all);

/** A typed quantity ("1 mN", "0.45", "50 uT") in the SI unit `unit`, through mathjs. */
function toSI(text: string, unit: string): number {
  const v = math.evaluate(text) as number | Unit;
  if (typeof v === 'number') return v;
  return unit === '' ? (v.toNumber() as number) : v.toNumber(unit);
}

function defaults(def: CheckDefinition): Record<string, number> {
  return Object.fromEntries(def.inputs.map((i) => [i.name, toSI(i.default, i.unit)]));
}

function run(name: keyof typeof checks, over: Record<string, number> = {}): CheckResult {
  const def = checks[name];
  return def.run({ ...defaults(def), ...over });
}

const out = (r: CheckResult) => Object.fromEntries(r.outputs.map((o) => [o.name, o.si]));

function fieldOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    if (isCheckRangeError(e)) return e.field;
    throw e;
  }
  return undefined;
}

describe('the kit', () => {
  test('every check, in the order of CHECK_NAMES, keyed by their names', () => {
    expect(checkList.map((c) => c.name)).toEqual([...CHECK_NAMES]);
    for (const name of CHECK_NAMES) expect(checks[name].name).toBe(name);
  });

  describe.each(checkList.map((c) => [c.name, c] as const))('%s', (_name, def) => {
    test('input specs: unique names, defaults and display units in mathjs syntax, defaults within bounds', () => {
      const names = def.inputs.map((i) => i.name);
      expect(new Set(names).size).toBe(names.length);
      for (const spec of def.inputs) {
        const v = toSI(spec.default, spec.unit);
        expect(Number.isFinite(v)).toBe(true);
        if (spec.min !== undefined) expect(v).toBeGreaterThanOrEqual(spec.min);
        if (spec.max !== undefined) expect(v).toBeLessThanOrEqual(spec.max);
        if (spec.integer) expect(Number.isInteger(v)).toBe(true);
        if (spec.unit !== '') {
          expect(math.unit(1, spec.displayUnit ?? spec.unit).equalBase(math.unit(1, spec.unit))).toBe(true);
        }
        for (const p of spec.presets ?? []) expect(Number.isFinite(toSI(p.value, spec.unit))).toBe(true);
      }
      expect(def.title.length).toBeGreaterThan(5);
      expect(def.summary.length).toBeGreaterThan(50);
      expect(def.condition.length).toBeGreaterThan(5);
    });

    test('runs on its defaults: finite outputs, words with numbers, plots of matching lengths', () => {
      const r = def.run(defaults(def));
      expect(r.check).toBe(def.name);
      for (const o of r.outputs) {
        expect([o.name, Number.isFinite(o.si)]).toEqual([o.name, true]);
        if (o.unit !== '') expect(() => math.unit(1, o.unit)).not.toThrow();
        if (o.displayUnit) expect(math.unit(1, o.displayUnit).equalBase(math.unit(1, o.unit))).toBe(true);
      }
      expect(r.verdict.message).toMatch(/\d/);
      expect(r.verdict.message).not.toMatch(/NaN|undefined|Infinity|\bnull\b(?! run)/);
      // the library judges claims, never people (DESIGN.md §8)
      expect(r.verdict.message).not.toMatch(/fraud|dishonest|liar|scam/i);
      for (const p of r.plots) {
        if (p.kind === 'line') {
          expect(p.x.values.length).toBeGreaterThan(1);
          expect(p.x.values.length).toBeLessThanOrEqual(2001);
          for (const s of p.series) expect(s.values.length).toBe(p.x.values.length);
        } else {
          for (const b of p.bars) expect(Number.isFinite(b.si)).toBe(true);
          if (p.yScale === 'log') for (const b of p.bars) expect(b.si).toBeGreaterThan(0);
        }
      }
      // survives JSON for the API
      expect(JSON.parse(JSON.stringify(r.outputs))).toEqual(r.outputs);
    });

    test('a missing or out-of-range input is a CheckRangeError naming the field', () => {
      const si = defaults(def);
      const first = def.inputs[0];
      const { [first.name]: _drop, ...rest } = si;
      expect(fieldOf(() => def.run(rest))).toBe(first.name);
      const bounded = def.inputs.find((i) => i.max !== undefined)!;
      expect(fieldOf(() => def.run({ ...si, [bounded.name]: bounded.max! * 2 + 1 }))).toBe(bounded.name);
      expect(fieldOf(() => def.run({ ...si, [first.name]: Number.NaN }))).toBe(first.name);
    });
  });

  test('cautions where the work can hurt', () => {
    const of = (name: keyof typeof checks) => checks[name].cautions.join(' ');
    expect(of('artifact-budget')).toMatch(/high voltage/i);
    expect(of('artifact-budget')).toMatch(/RF/);
    expect(of('artifact-budget')).toMatch(/vacuum/i);
    expect(of('sideways-beam')).toMatch(/high voltage/i);
    expect(of('sideways-beam')).toMatch(/ionizing radiation/i);
    expect(of('sideways-beam')).toMatch(/vacuum/i);
    expect(of('momentum-ledger')).toMatch(/rotating|reciprocating/i);
    // radiation-only thrusters: microwave cavities, lasers, the supplies that drive them, test chambers
    expect(of('photon-bound')).toMatch(/microwave/i);
    expect(of('photon-bound')).toMatch(/laser/i);
    expect(of('photon-bound')).toMatch(/high voltage/i);
    expect(of('photon-bound')).toMatch(/vacuum/i);
    // heat engines, heat pumps and refrigerators: hot parts and working fluids, pressure, mains
    expect(of('carnot')).toMatch(/refrigerant/i);
    expect(of('carnot')).toMatch(/pressure/i);
    expect(of('carnot')).toMatch(/mains/i);
    // "free energy" circuits and generators: mains, pulsed high voltage, spark gaps (ozone, RF), batteries, rotors
    expect(of('first-law')).toMatch(/mains/i);
    expect(of('first-law')).toMatch(/high voltage/i);
    expect(of('first-law')).toMatch(/spark gap/i);
    expect(of('first-law')).toMatch(/ozone/i);
    expect(of('first-law')).toMatch(/batter/i);
    expect(of('first-law')).toMatch(/rotating/i);
    // craft that carry propellant
    expect(of('rocket-equation')).toMatch(/propellant/i);
    expect(of('rocket-equation')).toMatch(/pressure/i);
    // pure kinematics: nothing to build
    expect(checks['break-even-speed'].cautions).toEqual([]);
    expect(checks['light-speed'].cautions).toEqual([]);
  });

  test('a check that names a hazard in its title or summary carries the caution for it', () => {
    // hazard named in the check's words -> what its cautions must mention (DESIGN.md §8, issue 12)
    const rules: [RegExp, RegExp][] = [
      [/electroly|hydrogen/i, /hydrogen/i],
      [/microwave|\bRF\b|resonant cavit/i, /microwave|\bRF\b/i],
      [/spark gap/i, /spark gap/i],
      [/neutron|gamma|x-ray|ionizing|charged particle|particle beam/i, /ionizing radiation/i],
      [/heat engine|heat pump|refrigerat/i, /pressure/i],
      [/rocket equation|carry propellant/i, /propellant/i],
    ];
    for (const c of checkList) {
      const words = `${c.title} ${c.summary}`;
      const cautions = c.cautions.join(' ');
      for (const [hazard, caution] of rules) {
        if (hazard.test(words)) expect([c.name, cautions]).toEqual([c.name, expect.stringMatching(caution)]);
      }
    }
  });

  test('cautions are worded once, in cautions.ts, and defer to local codes and licensed practice', () => {
    const texts = Object.entries(cautionTexts).filter(([name]) => name.startsWith('CAUTION_'));
    expect(texts.length).toBeGreaterThanOrEqual(12);
    for (const [name, text] of texts) {
      expect([name, text]).toEqual([name, expect.stringMatching(/\blocal\b/i)]);
      expect([name, text]).toEqual([name, expect.stringMatching(/licensed/i)]);
    }
    const worded = new Set(texts.map(([, text]) => text));
    for (const c of checkList) {
      for (const text of c.cautions) expect([c.name, worded.has(text)]).toEqual([c.name, true]);
      expect(new Set(c.cautions).size).toBe(c.cautions.length);
    }
  });

  test('validateCheckInputs: integers, bounds, missing fields', () => {
    const def = checks['momentum-ledger'];
    const si = defaults(def);
    expect(fieldOf(() => validateCheckInputs(def.inputs, { ...si, cycles: 2.5 }))).toBe('cycles');
    expect(validateCheckInputs(def.inputs, { ...si, extra: 1 })).toEqual(si);
    const e = new CheckRangeError('x', 'message');
    expect(e).toBeInstanceOf(Error);
    expect(e.name).toBe('CheckRangeError');
  });
});

describe('photon-bound', () => {
  test('1 mN on 1 kW is 299.79 times the bound (bound 3.3356 µN: P/c, Griffiths §9.2.3, from memory)', () => {
    const r = run('photon-bound', { F_claimed: 1e-3, P: 1000 });
    expect(out(r).F_bound).toBeCloseTo(3.33564095e-6, 13);
    expect(out(r).ratio).toBeCloseTo(299.792458, 6);
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toContain('3.34 µN');
    expect(r.plots[0]).toMatchObject({ kind: 'bars', name: 'thrust-vs-bound', yScale: 'log' });
  });
  test('a thrust within P/c holds', () => {
    expect(run('photon-bound', { F_claimed: 3e-6, P: 1000 }).verdict.holds).toBe(true);
  });
  test('property: the ratio scales linearly with the thrust and inversely with the power', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-9, max: 1e3, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e9, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        (F, P, k) => {
          const r1 = out(run('photon-bound', { F_claimed: F, P })).ratio;
          const r2 = out(run('photon-bound', { F_claimed: k * F, P })).ratio;
          const r3 = out(run('photon-bound', { F_claimed: F, P: k * P })).ratio;
          return Math.abs(r2 / (k * r1) - 1) < 1e-12 && Math.abs((r3 * k) / r1 - 1) < 1e-12;
        },
      ),
    );
  });
  test('zero power is refused, naming P', () => {
    expect(fieldOf(() => run('photon-bound', { P: 0 }))).toBe('P');
  });
});

describe('break-even-speed', () => {
  test('1 mN on 1 kW: 1000 km/s; 10^12 s from rest with 1000 kg; 3 % of the input at 30 km/s', () => {
    const o = out(run('break-even-speed', { F: 1e-3, P: 1000, m: 1000, v: 3e4 }));
    expect(o.v_break_even).toBeCloseTo(1e6, 6);
    expect(o.t_break_even).toBeCloseTo(1e12, 0); // t = m v / F, Newtonian
    expect(o.power_ratio).toBeCloseTo(0.03, 12);
  });
  test('beyond the break-even speed the drive fails the check', () => {
    const r = run('break-even-speed', { F: 1e-3, P: 1000, v: 2e6 });
    expect(r.verdict.holds).toBe(false);
    expect(out(r).power_ratio).toBeCloseTo(2, 12);
    expect(r.verdict.message).toMatch(/perpetual-motion/);
  });
  test('a drive at the photon bound breaks even only at the speed of light', () => {
    const r = run('break-even-speed', { F: 1000 / C_LIGHT, P: 1000, v: 0.99 * C_LIGHT });
    expect(out(r).v_break_even / C_LIGHT).toBeCloseTo(1, 12);
    expect(r.verdict.holds).toBe(true);
    expect(r.verdict.message).toMatch(/speed of light/);
  });
  test('the plot draws F·v and P against speed', () => {
    const p = run('break-even-speed').plots[0];
    expect(p.kind).toBe('line');
    if (p.kind === 'line') expect(p.series.map((s) => s.name)).toEqual(['kinetic_power', 'P']);
  });
});

describe('carnot', () => {
  test('claims checked against η = 0.4, COP 2.5 and 1.5 at 500 K / 300 K (Çengel & Boles ch. 6, from memory)', () => {
    const none = { eta_claimed: 0, cop_heating_claimed: 0, cop_cooling_claimed: 0 };
    const eng = run('carnot', { ...none, eta_claimed: 0.45 });
    expect(eng.verdict.holds).toBe(false);
    expect(out(eng).eta_ratio).toBeCloseTo(1.125, 12);
    expect(run('carnot', { ...none, eta_claimed: 0.35 }).verdict.holds).toBe(true);
    expect(run('carnot', { ...none, cop_heating_claimed: 2.4 }).verdict.holds).toBe(true);
    expect(run('carnot', { ...none, cop_heating_claimed: 3 }).verdict.holds).toBe(false);
    expect(run('carnot', { ...none, cop_cooling_claimed: 1.6 }).verdict.holds).toBe(false);
    const nothing = run('carnot', none);
    expect(nothing.verdict.holds).toBe(true);
    expect(nothing.verdict.message).toMatch(/No efficiency or COP was claimed/);
    expect(out(nothing)).toMatchObject({ eta_max: expect.closeTo(0.4, 12), cop_heating_max: expect.closeTo(2.5, 12) });
  });
  test('Tc > Th and T ≤ 0 are refused with the field named (Tc = Th is judged: see corrections.test.ts)', () => {
    expect(fieldOf(() => run('carnot', { Th: 300, Tc: 300.001 }))).toBe('Tc');
    expect(fieldOf(() => run('carnot', { Th: 300, Tc: 400 }))).toBe('Tc');
    expect(fieldOf(() => run('carnot', { Th: 0 }))).toBe('Th');
    expect(fieldOf(() => run('carnot', { Tc: 0 }))).toBe('Tc');
    expect(fieldOf(() => run('carnot', { Th: -5 }))).toBe('Th');
  });
});

describe('first-law', () => {
  test('over-unity is flagged with the ratio; stored energy running down is counted as input', () => {
    const over = run('first-law', { E_in: 1000, W_out: 600, Q_out: 500, dE_stored: 0 });
    expect(over.verdict.holds).toBe(false);
    expect(out(over)).toMatchObject({ E_out: 1100, balance: -100, over_unity: expect.closeTo(1.1, 12) });
    const battery = run('first-law', { E_in: 1000, W_out: 600, Q_out: 500, dE_stored: -200 });
    expect(battery.verdict.holds).toBe(true);
    expect(out(battery).over_unity).toBeCloseTo(1100 / 1200, 12);
  });
  test('an exact balance holds within the stated round-off tolerance', () => {
    expect(run('first-law', { E_in: 0.3, W_out: 0.1, Q_out: 0.2, dE_stored: 0 }).verdict.holds).toBe(true);
    expect(run('first-law', { E_in: 1, W_out: 1 + 1e-6, Q_out: 0, dE_stored: 0 }).verdict.holds).toBe(false);
  });
  test('no net input but output: no ratio, a clear message', () => {
    const r = run('first-law', { E_in: 100, W_out: 10, Q_out: 0, dE_stored: 100 });
    expect(r.verdict.holds).toBe(false);
    expect(out(r).over_unity).toBeUndefined();
    expect(r.verdict.message).toMatch(/nothing net/);
  });
});

describe('sideways-beam', () => {
  test('defaults: γ rises, v_z falls, p_z stays within 1e-9', () => {
    const r = run('sideways-beam');
    const o = out(r);
    expect(r.verdict.holds).toBe(true);
    expect(o.gamma_start).toBeCloseTo(10, 9);
    expect(o.gamma_end).toBeGreaterThan(o.gamma_start * 1.2);
    expect(o.vz_end).toBeLessThan(o.vz_start * 0.9);
    expect(Math.abs(o.pz_end / o.pz_start - 1)).toBeLessThanOrEqual(1e-9);
    expect(o.pz_drift_rel).toBeLessThanOrEqual(1e-9);
    // p_z = γ m v_z at the start: γ = 10 electron at 0.5° to z (|p| = m_e c √(γ² − 1))
    expect(o.pz_start).toBeCloseTo(M_ELECTRON * C_LIGHT * Math.sqrt(99) * Math.cos((0.5 * Math.PI) / 180), 30);
    expect(r.plots.map((p) => p.name)).toEqual(['pz-vs-time', 'gamma-vs-time', 'vz-vs-time']);
  });
  test('with E_z the change of p_z is the impulse q E_z t', () => {
    const o = out(run('sideways-beam', { E_z: 2e5, B_z: 0.01 }));
    expect(o.z_impulse).toBeCloseTo(-E_CHARGE * 2e5 * 20e-9, 30);
    expect(Math.abs(o.pz_change - o.z_impulse) / Math.abs(o.pz_start)).toBeLessThanOrEqual(1e-9);
    expect(o.pz_drift_rel).toBeLessThanOrEqual(1e-9);
  });
  test('a kinetic energy sets γ0: an electron with K = m_e c² = 0.51099895069 MeV (CODATA 2022, from memory) has γ0 = 2', () => {
    const r = run('sideways-beam', { K0: 0.51099895069e6 * E_CHARGE, gamma0: 10 });
    expect(out(r).gamma_start).toBeCloseTo(2, 9);
    expect(r.verdict.message).toMatch(/γ0 = 2\.00000/);
  });
  test('limits name the field', () => {
    expect(fieldOf(() => run('sideways-beam', { q: 0 }))).toBe('q');
    expect(fieldOf(() => run('sideways-beam', { steps: 1_000_000, particles: 100 }))).toBe('steps');
  });
});

describe('artifact-budget', () => {
  test('defaults: 10 µN on the leads (2 A × 10 cm × 50 µT), the sum against the claim', () => {
    const r = run('artifact-budget');
    const o = out(r);
    expect(o.F_lorentz).toBeCloseTo(1e-5, 15); // I L B (Griffiths §5.1.3, from memory)
    expect(o.F_radiation).toBeCloseTo((0.1 * 50) / C_LIGHT, 20); // f P / c
    expect(o.F_thermal).toBeCloseTo(2e-6, 15); // k ΔT (placeholder rule of thumb, common practice, no source)
    expect(o.F_outgassing).toBeCloseTo(5e-7, 18); // ṁ v: 1 µg/s × 500 m/s
    expect(o.F_artifacts).toBeCloseTo(o.F_lorentz + o.F_radiation + o.F_thermal + o.F_outgassing, 18);
    expect(r.verdict.holds).toBe(false); // 12.5 µN of artifacts against a 10 µN claim
    expect(o.F_artifacts_ratio).toBeCloseTo(1.2517, 4); // (10 + 0.0167 + 2 + 0.5) µN / 10 µN
    const bars = r.plots[0];
    expect(bars).toMatchObject({ kind: 'bars', yScale: 'log' });
  });
  test('a claim well above the artifacts holds; zero artifacts leave the log plot', () => {
    const r = run('artifact-budget', { F_claimed: 1e-3, I: 0 });
    expect(r.verdict.holds).toBe(true);
    const p = r.plots[0];
    if (p.kind === 'bars') expect(p.bars.map((b) => b.name)).not.toContain('F_lorentz');
  });
});

describe('rocket-equation', () => {
  test('Isp 300 s, mass ratio 4: 4078.47 m/s (our worked example of Sutton & Biblarz ch. 4, from memory)', () => {
    const r = run('rocket-equation', { v_e: 0, Isp: 300, m0: 4000, m1: 1000, dv_claimed: 5000 });
    const o = out(r);
    expect(o.dv).toBeCloseTo(4078.47, 2);
    expect(o.v_e_used).toBeCloseTo(2941.995, 6);
    expect(o.mass_ratio).toBe(4);
    expect(o.propellant_fraction).toBe(0.75);
    expect(r.verdict.holds).toBe(false);
    expect(run('rocket-equation', { v_e: 0, Isp: 300, m0: 4000, m1: 1000, dv_claimed: 4000 }).verdict.holds).toBe(true);
  });
  test('inconsistent or missing exhaust figures name the field', () => {
    expect(fieldOf(() => run('rocket-equation', { v_e: 3000, Isp: 450 }))).toBe('Isp');
    expect(fieldOf(() => run('rocket-equation', { v_e: 0, Isp: 0 }))).toBe('v_e');
    expect(fieldOf(() => run('rocket-equation', { m0: 100, m1: 200 }))).toBe('m1');
    // both given and agreeing is fine
    expect(out(run('rocket-equation', { v_e: 2942, Isp: 300 })).v_e_used).toBeCloseTo(2941.995, 6);
  });
});

describe('light-speed', () => {
  // c = 299 792 458 m/s exactly (SI Brochure, 9th ed., table 1).
  test('a speed above c is reported as such: 4.5e8 m/s is 1.5010 c', () => {
    const r = run('light-speed', { v: 4.5e8 });
    expect(out(r).ratio).toBeCloseTo(4.5e8 / 299_792_458, 12);
    expect(out(r).c).toBe(299_792_458);
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toMatch(/1\.50 times the speed of light/);
  });
  test('a speed below c holds, and c itself does not (no body with mass reaches it)', () => {
    expect(run('light-speed', { v: 0.2 * 299_792_458 }).verdict.holds).toBe(true);
    expect(run('light-speed', { v: 299_792_458 }).verdict.holds).toBe(false);
  });
});
