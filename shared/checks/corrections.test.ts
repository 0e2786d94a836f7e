/**
 * Issue 12, corrections 2, 3, 4, 6, 9 and 10 on the check kit's side, each against an outside
 * reference. Every test here fails on the code before the correction; the comment at each says how.
 */
import { checks } from './index';
import { CheckInputError, runCheck } from './run';
import * as f from './formulas';
import { ROCKET_AGREEMENT_X, ROCKET_FORMS_AGREE } from './rocket-equation';

// c = 299 792 458 m/s exactly (BIPM SI Brochure, 9th ed., 2019, the defining constants).
const c = 299_792_458;
// g0 = 9.806 65 m/s² exactly (3rd CGPM 1901; NIST SP 811 (2008), App. B).
const g0 = 9.80665;

const outputs = (r: { outputs: { name: string; si: number }[] }) => Object.fromEntries(r.outputs.map((o) => [o.name, o.si]));

function inputError(fn: () => unknown): Record<string, string> {
  try {
    fn();
  } catch (e) {
    if (e instanceof CheckInputError) return e.fields;
    throw e;
  }
  throw new Error('expected a CheckInputError');
}

describe('correction 2: under a sideways push the speed rises and v_z falls', () => {
  // Relativistic momentum p = γ m v and energy E = γ m c² (Jackson, Classical Electrodynamics, 3rd ed.,
  // ch. 11 — from memory): with p_z fixed, v_z = p_z/(γ m) falls as γ rises, while the speed
  // |v| = c √(1 − 1/γ²) rises with γ.
  test('the summary says the speed rises and that v_z is the velocity component along the original axis (the old text said the speed falls)', () => {
    const s = checks['sideways-beam'].summary;
    expect(s).not.toMatch(/speed along its path, v_z, falls/);
    expect(s).toMatch(/γ rises, and so does its speed/);
    expect(s).toMatch(/v_z, the component of its velocity along the original axis/);
  });

  test('a run reports the speed rising while v_z falls and p_z stays (the old outputs had no speed)', () => {
    const r = runCheck('sideways-beam', { steps: '2000', particles: '2' });
    const o = outputs(r);
    expect(o.gamma_end).toBeGreaterThan(o.gamma_start);
    expect(o.speed_end).toBeGreaterThan(o.speed_start);
    expect(o.vz_end).toBeLessThan(o.vz_start);
    expect(Math.abs(o.pz_end - o.pz_start)).toBeLessThanOrEqual(1e-9 * Math.abs(o.pz_start));
    // The speed follows from γ alone: |v| = c √(1 − 1/γ²) (independent of the kit's formula).
    expect(o.speed_start / (c * Math.sqrt(1 - 1 / o.gamma_start ** 2)) - 1).toBeCloseTo(0, 12);
    expect(o.speed_end / (c * Math.sqrt(1 - 1 / o.gamma_end ** 2)) - 1).toBeCloseTo(0, 12);
    expect(r.verdict.message).toMatch(/so the speed rose from .* while v_z, the velocity along the original axis, went from/);
  });
});

describe('correction 3: the relativistic rocket equation Δv = c·tanh((v_e/c) ln(m0/m1))', () => {
  // Ackeret's relativistic rocket (J. Ackeret, Helv. Phys. Acta 19, 1946 — from memory): rapidity
  // (v_e/c) ln(m0/m1), Δv = c tanh of it. Worked by hand: tanh(ln r) = (r² − 1)/(r² + 1), so a photon
  // exhaust (v_e = c) with mass ratio 2 gives 3/5 c and with mass ratio 4 gives 15/17 c; equivalently the
  // photon-rocket relation m0/m1 = √((1 + β)/(1 − β)) (√(1.6/0.4) = 2 for β = 0.6).
  test('photon exhaust: mass ratio 2 gives 0.6 c, mass ratio 4 gives 15/17 c', () => {
    expect(f.relativisticRocketDv(c, 2, 1) / c).toBeCloseTo(0.6, 14);
    expect(f.relativisticRocketDv(c, 4, 1) / c).toBeCloseTo(15 / 17, 14);
    expect(Math.sqrt((1 + 0.6) / (1 - 0.6))).toBeCloseTo(2, 14);
  });

  test('the check no longer passes a claim above c·tanh: 0.9 c from a photon exhaust at mass ratio 4 (Newtonian 1.386 c)', () => {
    // Old code: Δv = c ln 4 = 1.386 c, so a claimed 0.9 c "held"; the relativistic bound is 15/17 c = 0.882 c.
    const r = runCheck('rocket-equation', { v_e: `${c} m/s`, Isp: '0 s', m0: '4 kg', m1: '1 kg', dv_claimed: `${0.9 * c} m/s` });
    const o = outputs(r);
    expect(o.dv).toBeCloseTo(c * Math.log(4), 3); // the Newtonian output keeps its name and meaning
    expect(o.dv / c).toBeGreaterThan(1);
    expect(o.dv_relativistic / c).toBeCloseTo(15 / 17, 12);
    expect(o.dv_newtonian_excess).toBeCloseTo(Math.log(4) / (15 / 17) - 1, 12);
    expect(o.dv_ratio).toBeCloseTo(0.9 / Math.log(4), 12);
    expect(o.dv_relativistic_ratio).toBeCloseTo(0.9 / (15 / 17), 12);
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toContain('relativistic form');
    // It would need exp(atanh(0.9)) = √(1.9/0.1) = 4.359 at this exhaust speed (tanh(ln r) = 0.9).
    expect(r.verdict.message).toContain('mass ratio of 4.36');
  });

  test('a claimed Δv of c or more is out of reach whatever the figures', () => {
    const r = runCheck('rocket-equation', { v_e: `${c} m/s`, m0: '1000000 kg', m1: '1 kg', dv_claimed: `${1.2 * c} m/s` });
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toMatch(/out of reach of any rocket/);
  });

  test('the forms agree to 0.1 % below v_e ln(m0/m1) = 0.0548 c, computed from x/tanh x − 1 = 0.001', () => {
    // Series x/tanh x = 1 + x²/3 − x⁴/45 + … (e.g. Abramowitz & Stegun 4.5.67 for coth — from memory):
    // the threshold is close to √(3 × 0.001) = 0.05477.
    expect(ROCKET_FORMS_AGREE).toBe(0.001);
    expect(ROCKET_AGREEMENT_X).toBeCloseTo(Math.sqrt(3 * 0.001), 4);
    const x = ROCKET_AGREEMENT_X;
    expect(x / Math.tanh(x) - 1).toBeCloseTo(0.001, 12);
    // Just below: within 0.1 %; just above: beyond.
    const below = f.newtonianRocketExcess(0.999 * x * c, Math.E, 1);
    const above = f.newtonianRocketExcess(1.001 * x * c, Math.E, 1);
    expect(below).toBeLessThan(0.001);
    expect(above).toBeGreaterThan(0.001);
    // The texts say the same threshold: 0.0548 c, about 16 400 km/s.
    expect(checks['rocket-equation'].summary).toContain('0.0548 c (about 16 400 km/s)');
    expect(Math.round((x * c) / 1e5) * 100).toBe(16400); // km/s
  });

  test('at chemical exhaust speeds the verdicts and Newtonian figures are as before', () => {
    // Isp 300 s, mass ratio 4: Δv = 300 × 9.806 65 × ln 4 = 4078.47 m/s (our worked example).
    const r = runCheck('rocket-equation', { v_e: '0 m/s', Isp: '300 s', m0: '4000 kg', m1: '1000 kg', dv_claimed: '4078 m/s' });
    const o = outputs(r);
    expect(o.dv).toBeCloseTo(300 * g0 * Math.log(4), 6);
    expect(o.dv_relativistic / o.dv - 1).toBeCloseTo(-(((300 * g0 * Math.log(4)) / c) ** 2) / 3, 15); // about −6 × 10⁻¹¹
    expect(o.dv_newtonian_excess).toBeLessThan(1e-9);
    expect(r.verdict.holds).toBe(true);
    expect(runCheck('rocket-equation', { v_e: '0 m/s', Isp: '300 s', m0: '4000 kg', m1: '1000 kg', dv_claimed: '4079 m/s' }).verdict.holds).toBe(false);
  });
});

describe('correction 4: Carnot with Tc = Th is judged, not refused', () => {
  // Kelvin–Planck statement of the second law: no cyclic engine turns heat from a single reservoir into
  // work (e.g. Fermi, Thermodynamics, ch. III — from memory); Carnot's bounds 1 − Tc/Th → 0 and
  // Th/(Th − Tc), Tc/(Th − Tc) → ∞ as Tc → Th.
  test('the formulas: efficiency bound 0 and infinite COP bounds at Tc = Th (the old formulas threw)', () => {
    expect(f.carnotEfficiency(300, 300)).toBe(0);
    expect(f.carnotCopHeating(300, 300)).toBe(Number.POSITIVE_INFINITY);
    expect(f.carnotCopCooling(300, 300)).toBe(Number.POSITIVE_INFINITY);
    // The limit, approached: Tc = Th (1 − 10⁻⁶) gives a heating COP of 10⁶.
    expect(f.carnotCopHeating(300, 300 * (1 - 1e-6))).toBeCloseTo(1e6, 0);
  });

  test('an engine claim from one reservoir fails, with a bound of 0; COP claims are within Carnot', () => {
    const eng = runCheck('carnot', { Th: '300 K', Tc: '300 K', eta_claimed: '0.1' });
    expect(eng.verdict.holds).toBe(false);
    expect(outputs(eng).eta_max).toBe(0);
    expect(eng.verdict.message).toMatch(/single reservoir/);
    expect(eng.verdict.message).toMatch(/above the Carnot bound of 0/);
    // The infinite COP bounds are said in words, not sent as numbers JSON cannot carry.
    expect(eng.outputs.every((o) => Number.isFinite(o.si))).toBe(true);
    expect(eng.outputs.map((o) => o.name)).not.toContain('cop_heating_max');

    const pump = runCheck('carnot', { Th: '27 degC', Tc: '300.15 K', eta_claimed: '0', cop_heating_claimed: '8', cop_cooling_claimed: '7' });
    expect(pump.verdict.holds).toBe(true);
    expect(outputs(pump)).toMatchObject({ eta_max: 0, cop_heating_ratio: 0, cop_cooling_ratio: 0 });
    expect(pump.verdict.message).toMatch(/no finite COP bound/);
  });

  test('Tc above Th is still refused, naming the field Tc', () => {
    expect(Object.keys(inputError(() => runCheck('carnot', { Th: '300 K', Tc: '301 K' })))).toEqual(['inputs.Tc']);
  });
});

describe('correction 6: the artifact budget reads its temperature rise as a difference', () => {
  // A Celsius interval equals a kelvin interval (BIPM SI Brochure, 9th ed., 2.3.1); a Fahrenheit interval
  // is 5/9 K (NIST SP 811 (2008), App. B.9). The old code read "2 degC" as 275.15 K, so the thermal
  // drift came out 137.6 times too large.
  test('"2 degC", "2 K" and "3.6 degF" of rise give the same thermal drift, 2 µN at 1 µN/K', () => {
    for (const dT of ['2 degC', '2 K', '3.6 degF']) {
      const r = runCheck('artifact-budget', { dT, k_drift: '1 uN/K' });
      expect(r.inputs.dT.si).toBeCloseTo(2, 12);
      expect(outputs(r).F_thermal).toBeCloseTo(2e-6, 15);
    }
    expect(runCheck('artifact-budget', { dT: '2 degC' }).inputs.dT.display).toBe('2 K');
    expect(checks['artifact-budget'].inputs.find((i) => i.name === 'dT')?.kind).toBe('difference');
  });

  test('absolute temperatures elsewhere still read degC on the scale: 27 °C is 300.15 K for Carnot', () => {
    expect(runCheck('carnot', { Th: '127 degC', Tc: '27 degC' }).inputs.Tc.si).toBeCloseTo(300.15, 10);
  });
});

describe('correction 9: the recoil of radiation, collimated, Lambertian and isotropic', () => {
  // Lambert's cosine law: a flat diffuse emitter sends power dP ∝ cos θ dΩ; the momentum along the normal
  // is ∫cos θ dP / c, so f = ∫cos²θ sinθ dθ / ∫cosθ sinθ dθ over [0, π/2] = (1/3)/(1/2) = 2/3
  // (e.g. Modest, Radiative Heat Transfer — from memory). Integrated here numerically, independently.
  test('f = 2/3 for a Lambertian face, by numerical integration', () => {
    const n = 20000;
    let num = 0;
    let den = 0;
    for (let i = 0; i < n; i++) {
      const t = ((i + 0.5) / n) * (Math.PI / 2);
      num += Math.cos(t) ** 2 * Math.sin(t);
      den += Math.cos(t) * Math.sin(t);
    }
    expect(num / den).toBeCloseTo(2 / 3, 8);
    expect(f.radiationRecoilForce(1000, 2 / 3)).toBeCloseTo((2 / 3) * (1000 / c), 20); // 2.22 µN per kW
  });

  test('the help of the photon bound and of the asymmetry says 1, 2/3 and 0 (the old help said only "one collimated beam")', () => {
    const P = checks['photon-bound'].inputs.find((i) => i.name === 'P')?.help ?? '';
    expect(P).toMatch(/f = 1 for a collimated beam/);
    expect(P).toMatch(/2\/3 for a flat face radiating diffusely \(Lambertian/);
    expect(P).toMatch(/0 for emission that is the same in every direction/);
    const asym = checks['artifact-budget'].inputs.find((i) => i.name === 'f_asym')?.help ?? '';
    expect(asym).toMatch(/2\/3 for a single flat face radiating diffusely \(Lambertian\)/);
    expect(asym).toMatch(/0 for emission that is the same in every direction/);
    expect(asym).toMatch(/1 for a collimated beam/);
  });
});

describe('correction 10: metric horsepower in the checks', () => {
  // 1 PS = 735.498 75 W (NIST SP 811 (2008), App. B.8, horsepower, metric). Old code: "PS" was a
  // petasiemens to mathjs, so "100 PS" was refused as not a power.
  test('"100 PS" of input power gives a break-even speed P/F of 73.5 km/s at 1 N', () => {
    const r = runCheck('break-even-speed', { F: '1 N', P: '100 PS' });
    expect(r.inputs.P.si).toBeCloseTo(73549.875, 6);
    expect(outputs(r).v_break_even).toBeCloseTo(73549.875, 6);
  });
});
