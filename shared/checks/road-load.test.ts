/**
 * Road load against outside references: the road-load equation of vehicle dynamics (Gillespie,
 * Fundamentals of Vehicle Dynamics, SAE, 1992, ch. 4 — aerodynamic drag ½ρC_dAV² and rolling
 * resistance f_r·W; from memory), the sea-level air density of the standard atmosphere (ISO 2533:1975:
 * 101 325 Pa, 288.15 K, M = 28.9644 kg/kmol, R* = 8.314 32 J/(mol K); from memory), g0 exact
 * (3rd CGPM 1901), and mathjs doing the same arithmetic on quantities with units.
 */
import fc from 'fast-check';
import { create, all, type Unit } from 'mathjs';
import { aerodynamicDrag, generatorDrag, roadLoad, rollingResistance } from './formulas';
import { roadLoadCheck } from './road-load';
import { CheckInputError, runCheck, type CheckRun } from './run';

const math = create(all);
const rel = (a: number, b: number) => Math.abs(a / b - 1);
const out = (r: CheckRun) => Object.fromEntries(r.outputs.map((o) => [o.name, o.si]));
const run = (inputs: Record<string, string>) => runCheck('road-load', inputs);

describe('road-load formulas', () => {
  test('the default air density is the ISO 2533 sea-level value, p0·M/(R*·T0) = 1.2250 kg/m³', () => {
    const rho0 = (101325 * 0.0289644) / (8.31432 * 288.15);
    expect(rho0).toBeCloseTo(1.225, 4);
    const spec = roadLoadCheck.inputs.find((i) => i.name === 'rho')!;
    expect(Number.parseFloat(spec.default)).toBeCloseTo(rho0, 4);
  });

  test('a 1500 kg car, C_d 0.30, A 2.2 m², C_rr 0.010 at 100 km/h: 311.9 N of drag, 147.1 N rolling, 12.75 kW', () => {
    // By hand: v = 27.777… m/s, v² = 771.60; ½ × 1.225 × 0.30 × 2.2 × 771.60 = 311.92 N;
    // 0.010 × 1500 × 9.806 65 = 147.10 N; (311.92 + 147.10) × 27.778 = 12 750.6 W; 459.02 N = 127.5 Wh/km.
    const v = 100 / 3.6;
    expect(aerodynamicDrag(1.225, 0.3, 2.2, v)).toBeCloseTo(311.921, 3);
    expect(rollingResistance(0.01, 1500)).toBeCloseTo(147.09975, 9);
    const F = roadLoad(1.225, 0.3, 2.2, v, 0.01, 1500);
    expect(F * v).toBeCloseTo(12750.58, 1);
    const ref = math.evaluate('(0.5 * 1.225 kg/m^3 * 0.30 * 2.2 m^2 * (100 km/h)^2 + 0.010 * 1500 kg * gravity) * 1 km') as Unit;
    expect(rel(F * 1000, ref.toNumber('J'))).toBeLessThan(1e-12);
    expect(ref.toNumber('W h')).toBeCloseTo(127.5, 1);
  });

  test('property: drag grows with the square of speed, rolling resistance not at all', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 100, noNaN: true }), fc.double({ min: 1.01, max: 10, noNaN: true }), (v, k) => {
        const a = aerodynamicDrag(1.2, 0.3, 2, v);
        const b = aerodynamicDrag(1.2, 0.3, 2, k * v);
        return rel(b, k * k * a) < 1e-12 && rollingResistance(0.01, 1000) === 0.01 * 1000 * 9.80665;
      }),
    );
  });

  test('a generator returning P at speed v drags with at least P/v, so it costs at least P', () => {
    expect(generatorDrag(5000, 25)).toBe(200);
    expect(generatorDrag(5000, 25) * 25).toBe(5000);
    expect(() => generatorDrag(5000, 0)).toThrow(/more than zero/);
  });
});

describe('road-load check', () => {
  const car = { m: '1500 kg', v: '100 km / h', Cd: '0.30', A: '2.2 m^2', Crr: '0.010', rho: '1.225 kg / m^3' };

  test('a car said to charge itself fully (net draw 0) breaks the balance; the generator adds P_gen/v of drag', () => {
    const r = run({ ...car, P_gen: '5 kW', P_net_claimed: '0 kW' });
    const o = out(r);
    expect(o.F_aero).toBeCloseTo(311.921, 3);
    expect(o.F_roll).toBeCloseTo(147.09975, 9);
    expect(o.F_road).toBeCloseTo(o.F_aero + o.F_roll, 9);
    expect(o.E_per_distance).toBe(o.F_road); // N = J/m
    expect(o.P_road).toBeCloseTo(12750.58, 1);
    expect(o.F_gen).toBeCloseTo(5000 / (100 / 3.6), 9); // 180 N
    expect(o.P_drive).toBeCloseTo(o.P_road + 5000, 6);
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toMatch(/^The claim has the vehicle draw nothing net from its battery or fuel at 100 km\/h, against the 12\.8 kW/);
    expect(r.verdict.message).toMatch(/adds at least 180 N of drag/);
    expect(r.outputs.find((x) => x.name === 'E_per_distance')?.displayUnit).toBe('W h / km');
  });

  test('a net draw at least the road-load power holds; a smaller one is the share it covers', () => {
    expect(run({ ...car, P_gen: '0 W', P_net_claimed: '13 kW' }).verdict.holds).toBe(true);
    const part = run({ ...car, P_gen: '0 W', P_net_claimed: '6 kW' });
    expect(part.verdict.holds).toBe(false);
    expect(out(part).net_ratio).toBeCloseTo(6000 / 12750.58, 5);
    expect(part.verdict.message).toMatch(/is 0\.471 of the 12\.8 kW/);
  });

  test('the plot draws road-load power against speed, with the generator and the claim', () => {
    const r = run({ ...car, P_gen: '5 kW' });
    const p = r.plots[0];
    expect(p.kind).toBe('line');
    if (p.kind === 'line') {
      expect(p.series.map((s) => s.name)).toEqual(['P_road', 'P_drive', 'P_net_claimed']);
      const mid = 50; // 101 points from 0 to 2v: the middle one is v
      expect(p.x.values[mid]).toBeCloseTo(100, 9);
      expect(p.series[0].values[mid]).toBeCloseTo(out(r).P_road / 1000, 9);
      expect(p.series[1].values[mid] - p.series[0].values[mid]).toBeCloseTo(5, 9);
    }
  });

  test('a speed of zero is refused, naming v; cautions cover vehicles', () => {
    try {
      run({ v: '0 km / h' });
      throw new Error('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(CheckInputError);
      expect(Object.keys((e as CheckInputError).fields)).toEqual(['inputs.v']);
    }
    expect(roadLoadCheck.cautions.join(' ')).toMatch(/traction batteries/);
  });
});
