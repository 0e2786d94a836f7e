/**
 * Issue 12, corrections 1–10, as the starter library states them: the entries' texts and the
 * worksheets (in the entries and in content/worksheets), run with the check kit's functions. Each test
 * fails on the content before the correction; the comment at each says how. Values are checked against
 * outside references named beside them. (Reading the files uses Node's fs in the test only.)
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { checks } from '../checks';
import { runCheck } from '../checks/run';
import { compileWorksheetWithKit } from '../compute';
import { parseWorksheetYaml } from '../worksheet/load';
import { parseQuantity } from '../worksheet/quantity';
import type { Worksheet } from '../worksheet/schema';
import type { WorksheetResult } from '../worksheet/types';
import { parseEntryFile } from './load';
import type { EntryFile } from './schema';

const ROOT = join(__dirname, '..', '..', 'content');
const entry = (slug: string): EntryFile => parseEntryFile(readFileSync(join(ROOT, 'entries', `${slug}.md`), 'utf8'), `${slug}.md`);
const sheetFile = (name: string): Worksheet => parseWorksheetYaml(readFileSync(join(ROOT, 'worksheets', `${name}.yml`), 'utf8'), `${name}.yml`);
const sheetOf = (e: EntryFile, name: string): Worksheet => {
  const ws = e.worksheets.find((w) => w.name === name);
  if (!ws) throw new Error(`no worksheet ${name} in ${e.slug}`);
  return ws;
};
const run = (ws: Worksheet, values: Record<string, string> = {}): WorksheetResult => compileWorksheetWithKit(ws).evaluate(values);
const step = (r: WorksheetResult, name: string): number => {
  const s = r.steps.find((x) => x.name === name);
  if (!s?.value) throw new Error(`step ${name}: ${s?.error?.message ?? 'missing'}`);
  return s.value.si;
};
const check = (r: WorksheetResult, name: string) => {
  const c = r.checks.find((x) => x.name === name);
  if (!c || c.holds === undefined) throw new Error(`check ${name}: ${c?.error?.message ?? 'missing'}`);
  return c;
};
const label = (ws: Worksheet, name: string) => [...ws.inputs, ...ws.steps].find((x) => x.name === name)?.label ?? '';
const texts = (e: EntryFile) =>
  [e.inBrief, e.howItIsPitched, e.whyItFails, e.whatFakesTheEffect, ...e.questionsToAsk, ...e.repliesAndAnswers.flatMap((r) => [r.reply, r.answer])].join('\n');

// c = 299 792 458 m/s exactly (BIPM SI Brochure, 9th ed., 2019); g0 = 9.806 65 m/s² exactly (3rd CGPM 1901).
const c = 299_792_458;
const g0 = 9.80665;

describe('correction 1: a scale reads less than the weight only while the centre of mass accelerates downward', () => {
  // Newton's second law for the whole rig, N − M g = M a_cm (a_cm upward positive): the textbook
  // "apparent weight in an elevator" — a scale reads less in a lift accelerating downward (e.g.
  // Halliday, Resnick & Walker, Fundamentals of Physics, ch. 5 — from memory). The entry and its
  // worksheet said "upward" / "rise"; these tests fail on that text.
  const e = entry('gyroscopic-thruster');
  const ws = sheetOf(e, 'lift-and-centre-of-mass');

  test('the sign, worked from N − Mg = M a: a reading ΔW low means a_cm = −ΔW/M, downward', () => {
    const M = 5; // kg, the worksheet's default rig
    const dW = 0.5; // N below the weight
    const a = (M * g0 - dW - M * g0) / M; // (N − Mg)/M with N = Mg − ΔW
    expect(a).toBeCloseTo(-0.1, 15); // negative: downward
    // The worksheet's speed and distance are the magnitudes of that downward motion, from rest.
    const r = run(ws, { M: '5 kg', dW: '0.5 N', t: '60 s' });
    expect(step(r, 'dv_needed')).toBeCloseTo(Math.abs(a) * 60, 12); // 6 m/s
    expect(step(r, 'h_needed')).toBeCloseTo(0.5 * Math.abs(a) * 60 ** 2, 9); // 180 m
    expect(label(ws, 'dv_needed')).toMatch(/^Downward speed/);
    expect(label(ws, 'h_needed')).toMatch(/must fall/);
    expect(label(ws, 'h_travel')).toMatch(/free to fall/);
    expect(check(r, 'lift_within_travel').message).toMatch(/downward speed and fall 180 m/);
  });

  test('the text, replies and labels say downward, never that a lighter reading needs an upward acceleration', () => {
    const all = [texts(e), ws.summary ?? '', ...ws.inputs.map((i) => i.label), ...ws.steps.map((s) => s.label), ...ws.checks.flatMap((k) => [k.label, k.holds, k.fails])].join('\n');
    expect(all).not.toMatch(/accelerates upward|speeding up upward|of upward speed|must rise|free to rise|to rise \{h_needed\}/);
    expect(e.inBrief).toMatch(/centre of mass accelerates downward/);
    expect(e.repliesAndAnswers.map((x) => x.answer).join(' ')).toMatch(/only while the centre of mass accelerates downward/);
    expect(e.whyItFails).toMatch(/\\Delta W\\,t\/M\$ downward/);
  });
});

describe('correction 2: the speed rises under a sideways push; what falls is v_z', () => {
  // p_z = γ m v_z is unchanged with no force along z; |v| = c √(1 − 1/γ²) rises with γ (Jackson,
  // Classical Electrodynamics, 3rd ed., ch. 11 — from memory). m_e c² = 510.998 950 69 keV (CODATA 2022).
  const e = entry('sideways-beam-thruster');
  const ws = sheetOf(e, 'forward-momentum-under-sideways-push');
  const MEC2 = 510.99895069; // keV

  test('100 keV electrons given 50 keV sideways: the speed rises from 0.548 c to 0.634 c, v_z falls to 0.507 c', () => {
    const g0e = 1 + 100 / MEC2;
    const g1e = 1 + 150 / MEC2;
    const b0 = Math.sqrt(1 - 1 / g0e ** 2);
    const b1 = Math.sqrt(1 - 1 / g1e ** 2);
    const bz1 = (g0e * b0) / g1e; // p_z fixed
    expect([b0, b1, bz1].map((b) => Math.round(b * 1000) / 1000)).toEqual([0.548, 0.634, 0.507]);
    const r = run(ws, { K0: '100 keV', dK: '50 keV' });
    // To 10⁻⁶: mathjs's electronvolt (the "keV" typed here) is 1.602 176 565 × 10⁻¹⁹ J (CODATA 2010),
    // not the exact 1.602 176 634 × 10⁻¹⁹ J of the SI, a difference of 4 × 10⁻⁸.
    expect(step(r, 'v0') / (b0 * c) - 1).toBeCloseTo(0, 6);
    expect(step(r, 'v1') / (b1 * c) - 1).toBeCloseTo(0, 6);
    expect(step(r, 'v_z1') / (bz1 * c) - 1).toBeCloseTo(0, 6);
    expect(step(r, 'v1')).toBeGreaterThan(step(r, 'v0')); // the speed rises …
    expect(step(r, 'v_z1')).toBeLessThan(step(r, 'v0')); // … while v_z falls
    expect(check(r, 'p_z_unchanged').holds).toBe(true);
  });

  test('the texts name v_z as the velocity along the axis and say the speed rises (the old ones said the speed falls)', () => {
    const t = texts(e);
    expect(t).not.toMatch(/forward speed (must fall|drops)/);
    expect(e.inBrief).toMatch(/raises γ and the\s+speed, yet the velocity along the original axis, v_z, must fall/);
    expect(e.whyItFails).toMatch(/speed \$\|\\mathbf v\|\$ itself rises/);
    expect(label(ws, 'v1')).toMatch(/^Speed after the push/);
    expect(label(ws, 'v_z1')).toMatch(/^Velocity along the axis after the push/);
  });
});

describe('correction 3: the rocket-equation worksheet shows both forms and judges by the relativistic one', () => {
  // Ackeret's relativistic rocket, Δv = c tanh((v_e/c) ln(m0/m1)) (Helv. Phys. Acta 19, 1946 — from
  // memory); worked by hand: tanh(ln 4) = 15/17, and atanh(0.9) = ln √19, so 0.9 c needs e^{ln √19} = √19.
  const ws = sheetFile('rocket-equation');

  test('an exhaust at (nearly) c and mass ratio 4: the Newtonian 1.386 c against the relativistic 0.882 c', () => {
    const Isp = 30570323; // s, the input's largest value: v_e = Isp g0 = c (1 − 1.1 × 10⁻⁸)
    const ve = Isp * g0;
    const r = run(ws, { Isp: `${Isp} s`, m0: '4000 kg', m1: '1000 kg', dv_claimed: `${0.9 * c} m/s` });
    expect(r.ok).toBe(true);
    expect(step(r, 'dv')).toBeCloseTo(ve * Math.log(4), 3); // Newtonian, as before: above c
    expect(step(r, 'dv_rel') / c).toBeCloseTo(Math.tanh((ve / c) * Math.log(4)), 12);
    expect(step(r, 'dv_rel') / c).toBeCloseTo(15 / 17, 7);
    expect(step(r, 'ratio_needed_rel')).toBeCloseTo(Math.sqrt(19) ** (c / ve), 9); // ≈ √19 = 4.359
    // The old worksheet compared with the Newtonian Δv and passed 0.9 c; the relativistic bound fails it.
    expect(check(r, 'dv_within_reach').holds).toBe(false);
    expect(check(r, 'forms_agree').holds).toBe(false);
  });

  test('at the defaults (Isp 300 s) the forms agree and the Newtonian figures are unchanged', () => {
    const r = run(ws);
    const ve = 300 * g0;
    expect(step(r, 'dv')).toBeCloseTo(ve * Math.log(2.5), 9);
    expect(step(r, 'dv_newtonian_excess')).toBeLessThan(1e-9); // ≈ (Δv/c)²/3 = 2.7 × 10⁻¹¹
    expect(check(r, 'forms_agree').holds).toBe(true);
    expect(check(r, 'dv_within_reach').holds).toBe(false); // 5 km/s claimed against 2.70 km/s
    expect(ws.summary).toMatch(/0\.0548 c \(about 16 400 km\/s\)/);
  });

  test('a claimed Δv above c needs an infinite mass ratio, and fails', () => {
    const r = run(ws, { Isp: '30570323 s', dv_claimed: `${1.5 * c} m/s` });
    expect(step(r, 'ratio_needed_rel')).toBe(Number.POSITIVE_INFINITY);
    expect(check(r, 'dv_within_reach').holds).toBe(false);
  });
});

describe('corrections 4 and 5: the Carnot worksheet takes one reservoir and has the cooling bound', () => {
  // Carnot: COP_R = Tc/(Th − Tc) (e.g. Çengel & Boles, Thermodynamics: An Engineering Approach, ch. 6,
  // the reversed Carnot cycle — from memory). Worked: 300 K and 250 K give 250/50 = 5.
  const ws = sheetFile('carnot-limit');

  test('300 K and 250 K: cooling bound 5, heating bound 6; a cooling claim of 6 fails, a heating claim of 6 holds', () => {
    const cool = run(ws, { T_h: '300 K', T_c: '250 K', eta_claimed: '0 %', COP_claimed: '0', COP_cooling_claimed: '6' });
    expect(step(cool, 'COP_cooling_carnot')).toBeCloseTo(5, 12);
    expect(step(cool, 'COP_cooling_ratio')).toBeCloseTo(1.2, 12);
    expect(check(cool, 'refrigerator_within_carnot').holds).toBe(false);
    const heat = run(ws, { T_h: '300 K', T_c: '250 K', eta_claimed: '0 %', COP_claimed: '6', COP_cooling_claimed: '0' });
    expect(step(heat, 'COP_carnot')).toBeCloseTo(6, 12);
    expect(check(heat, 'heat_pump_within_carnot').holds).toBe(true);
    expect(check(heat, 'refrigerator_within_carnot').holds).toBe(true);
    expect(label(ws, 'COP_claimed')).toMatch(/heating COP/);
    expect(label(ws, 'COP_cooling_claimed')).toMatch(/cooling COP/);
  });

  test('both sides at 20 °C: the engine bound is 0 and a claimed efficiency fails; the sides are not "out of order"', () => {
    const r = run(ws, { T_h: '20 degC', T_c: '293.15 K', eta_claimed: '5 %' });
    expect(step(r, 'eta_carnot')).toBeCloseTo(0, 12);
    expect(check(r, 'reservoirs_ordered').holds).toBe(true);
    expect(check(r, 'engine_within_carnot').holds).toBe(false);
    expect(check(run(ws, { T_h: '10 degC', T_c: '20 degC' }), 'reservoirs_ordered').holds).toBe(false);
  });
});

describe('correction 6: the resonant-cavity artifact sheet reads its temperature rise as a difference', () => {
  // A Celsius interval is a kelvin interval (BIPM SI Brochure, 9th ed., 2.3.1); a Fahrenheit interval is
  // 5/9 K (NIST SP 811 (2008), App. B.9). The old sheet read "2 degC" as 275.15 K.
  const ws = sheetOf(entry('resonant-cavity-thruster'), 'thrust-stand-artifacts');

  test('"2 degC", "2 K" and "3.6 degF" of rise give the same thermal drift, 2 µN at 1 µN/K', () => {
    for (const dT of ['2 degC', '2 K', '3.6 degF']) {
      const r = run(ws, { dT, k_drift: '1 uN/K' });
      expect(step(r, 'F_drift')).toBeCloseTo(2e-6, 15);
    }
    expect(ws.inputs.find((i) => i.name === 'dT')?.kind).toBe('difference');
  });
});

describe('correction 7: one over-unity ratio, out/(in − stored), in the check and the worksheet', () => {
  // First law over a cycle: the net energy supplied is E_in − ΔE_stored (e.g. Çengel & Boles, ch. 2 —
  // from memory); 1 kWh = 3.6 MJ exactly (NIST SP 811 (2008), App. B.8). The old worksheet gave
  // E_out/E_in = 1.3 here, under the same name as the check's 1.3/1.4.
  const ws = sheetFile('over-unity-balance');

  test('1 kWh in, 1.3 kWh out, the store run down by 0.4 kWh: 1.3/1.4 in both', () => {
    const r = run(ws, { E_in: '1 kWh', E_out: '1.3 kWh', dE_stored: '-0.4 kWh' });
    const kit = runCheck('first-law', { E_in: '1 kWh', W_out: '1.3 kWh', Q_out: '0 kWh', dE_stored: '-0.4 kWh' });
    const kitRatio = kit.outputs.find((o) => o.name === 'over_unity')?.si;
    expect(step(r, 'over_unity')).toBeCloseTo(1.3 / 1.4, 12);
    expect(kitRatio).toBeCloseTo(1.3 / 1.4, 12);
    expect(step(r, 'over_unity')).toBeCloseTo(kitRatio as number, 14);
    expect(label(ws, 'over_unity')).toMatch(/E_out \/ \(E_in - dE_stored\)/);
    expect(checks['first-law'].summary).toMatch(/out over \(in − stored\)/);
  });
});

describe('correction 8: real power of an AC or pulsed supply is the mean of v·i', () => {
  // Active power is the mean of the instantaneous power v·i over whole periods (IEEE Std 1459-2010,
  // definitions of active power — from memory). Worked here: a pulse train, 12 V for a quarter of each
  // period and 0 V otherwise, driving 3 A while on (a resistive load). Real power = 0.25 × 36 W = 9 W;
  // mean V × mean I = 3 V × 0.75 A = 2.25 W; V_rms × I_rms = 6 V × 1.5 A = 9 W here, and never below it.
  test('the worked pulse train: mean(v·i) = 9 W, mean v × mean i = 2.25 W; with a steady voltage V × mean I is exact', () => {
    const n = 1000;
    const v = Array.from({ length: n }, (_, k) => (k < n / 4 ? 12 : 0));
    const i = v.map((x) => x / 4);
    const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
    const rms = (xs: number[]) => Math.sqrt(mean(xs.map((x) => x * x)));
    expect(mean(v.map((x, k) => x * i[k]))).toBeCloseTo(9, 12);
    expect(mean(v) * mean(i)).toBeCloseTo(2.25, 12);
    expect(rms(v) * rms(i)).toBeGreaterThanOrEqual(mean(v.map((x, k) => x * i[k])) - 1e-12);
    // Steady 12 V, any current waveform: mean(v·i) = 12 × mean(i).
    const iAny = Array.from({ length: n }, (_, k) => 2 + Math.sin((2 * Math.PI * k) / n) + (k % 7 === 0 ? 3 : 0));
    expect(mean(iAny.map((x) => 12 * x))).toBeCloseTo(12 * mean(iAny), 12);
  });

  test('the entry says so (the old text said volts times average amperes understates real power)', () => {
    const e = entry('water-fuelled-engine');
    expect(e.whatFakesTheEffect).not.toMatch(/volts times average amperes/);
    expect(e.whatFakesTheEffect).toMatch(/steady supply voltage V, V times the\s+mean current is exact/);
    expect(e.whatFakesTheEffect).toMatch(/real power is the mean of v·i over whole\s+cycles/);
    expect(e.whatFakesTheEffect).toMatch(/V_rms times I_rms is the apparent power/);
    const help = e.worksheets.flatMap((w) => w.inputs).find((x) => x.name === 'P_cell')?.help ?? '';
    expect(help).toMatch(/mean\s+of v·i/);
  });
});

describe('correction 9: radiation recoil, collimated 1, Lambertian face 2/3, isotropic 0', () => {
  // Lambert's cosine law gives f = ∫cos²θ sinθ dθ / ∫cosθ sinθ dθ = 2/3 on [0, π/2] (checked numerically
  // in shared/checks/corrections.test.ts). The old worksheet had no such step or help.
  const ws = sheetFile('photon-rocket-bound');

  test('the worksheet gives (2/3) P/c for a flat diffuse face: 2.22 µN for 1 kW', () => {
    const r = run(ws, { P: '1 kW' });
    expect(step(r, 'F_lambertian')).toBeCloseTo((2 / 3) * (1000 / c), 20);
    const help = ws.inputs.find((i) => i.name === 'P')?.help ?? '';
    expect(help).toMatch(/\(f = 1\)/);
    expect(help).toMatch(/f = 2\/3 for a flat face radiating diffusely \(Lambertian/);
    expect(help).toMatch(/0 for emission that is the same in every direction/);
  });
});

describe('correction 10: the artifact sheet uses the check kit\'s placeholders', () => {
  // The kit's defaults are the reference here (shared/checks/artifact-budget.ts); before the correction
  // the sheet had 20 µN/K, 500 m/s and 0.05 against the kit's 1 µN/K, 300 m/s and 0.1.
  const ws = sheetOf(entry('resonant-cavity-thruster'), 'thrust-stand-artifacts');
  const kit = checks['artifact-budget'].inputs;
  test.each([
    ['k_drift', 'k_drift'],
    ['v_gas', 'v_gas'],
    ['f_asym', 'f_asym'],
  ])('%s: the same default as the kit', (sheetName, kitName) => {
    const a = ws.inputs.find((i) => i.name === sheetName);
    const b = kit.find((i) => i.name === kitName);
    if (!a || !b) throw new Error(`missing ${sheetName}`);
    expect(parseQuantity(a.default, a.unit)).toBeCloseTo(parseQuantity(b.default, b.unit), 15);
  });

  test('the kit\'s gas speed follows kinetic theory: √(πkT/2m) for water vapour is 466 m/s at 300 K, 496 m/s at 340 K', () => {
    // Effusion: the mean normal velocity of molecules leaving a surface is √(πkT/(2m)) (kinetic theory of
    // gases, e.g. Reif, Fundamentals of Statistical and Thermal Physics, ch. 7 — from memory);
    // k = 1.380 649 × 10⁻²³ J/K exactly (SI Brochure, 9th ed.); m(H2O) = 18.015 u, u = 1.660 539 068 92 × 10⁻²⁷ kg (CODATA 2022).
    const k = 1.380649e-23;
    const m = 18.015 * 1.66053906892e-27;
    const v = (T: number) => Math.sqrt((Math.PI * k * T) / (2 * m));
    expect(v(300)).toBeCloseTo(466.4, 0);
    expect(v(340)).toBeCloseTo(496.5, 0);
    const kitV = parseQuantity(kit.find((i) => i.name === 'v_gas')!.default, 'm/s');
    expect(Math.abs(kitV - v(340)) / v(340)).toBeLessThan(0.01);
  });
});
