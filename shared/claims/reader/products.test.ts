/**
 * Powers and energies given through their factors, multiplied out (shared/claims/reader/products.ts).
 *
 * References: P = τω and ω = 2πn/60 (any mechanics textbook: shaft power from torque and speed);
 * P = ρgQH and P = QΔp (hydraulic power of a pump, any fluid-mechanics textbook); E = QV (charge times
 * voltage); NIST SP 811 (2008) Appendix B.8: foot pound-force = 1.355 818 J, US gallon = 3.785 412 E-03
 * m³, psi = 6.894 757 E+03 Pa; standard acceleration of gravity g_n = 9.806 65 m/s² (BIPM SI
 * Brochure, 9th ed.). Every text here is invented test data.
 */
import { runClaimChecks } from '../plan';
import { extractFigures } from '../reader';
import { expectRelClose, expectWellFormed, SEVEN } from './test-support';

const derivedOf = (text: string, kind: 'power' | 'energy') => {
  const f = extractFigures(text);
  expectWellFormed(text, f);
  return f.find((x) => x.kind === kind && x.derived);
};
const verdictOf = (text: string) => runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law')?.finding;

describe('a torque at a shaft speed is a power (P = τω)', () => {
  test("'2.4 N·m at 1,450 rpm'", () => {
    const p = derivedOf('On the rope brake the shaft of the Kestrel-2 engine gives 2.4 N·m at 1,450 rpm from 480 W of heat.', 'power');
    // 2.4 × 1450 × 2π / 60 = 364.424 748 … W (P = τω).
    expectRelClose(p!.si, (2.4 * 1450 * 2 * Math.PI) / 60, SEVEN);
    expect(p!.role).toBe('out');
  });
  test("'30 lb-ft at 2,000 rpm' is a torque in foot pounds, not a mass of 30 lb", () => {
    const text = 'The Larkspur hub motor delivers 30 lb-ft at 2,000 rpm.';
    const f = extractFigures(text);
    expect(f.some((x) => x.kind === 'mass')).toBe(false);
    // 30 × 1.355 818 N·m (SP 811 B.8) × 2000 × 2π / 60.
    expectRelClose(f.find((x) => x.kind === 'power')!.si, (30 * 1.355818 * 2000 * 2 * Math.PI) / 60, SEVEN);
  });
  test('in radians per second: 12 N·m at 150 rad/s is 1.8 kW', () => {
    expectRelClose(derivedOf('Torque 12 N·m at 150 rad/s on the Orrin test stand.', 'power')!.si, 1800, SEVEN);
  });
  test('a motor whose shaft gives more than its electrical input breaks the first law; one that gives less does not', () => {
    // 0.11 × 1900 × 2π/60 = 21.9 W out of 28.2 W in.
    expect(verdictOf('The Brindle motor draws 28.2 W; on a band brake it gives 0.11 N·m at 1,900 rpm.')).toBe('consistent');
    // 1.65 × 1850 × 2π/60 = 319.7 W out of 268.8 W in.
    expect(verdictOf('The Brindle motor draws 268.8 W; on a band brake it gives 1.65 N·m at 1,850 rpm.')).toBe('breaks');
  });
});

describe('an energy per cycle at a repetition rate is a power (P = E f)', () => {
  test("'420 J per discharge at 8 discharges a second' against 1.5 kW in", () => {
    const text = 'Each discharge cycle of the Quellin bank delivers 420 J to the load at 8 cycles per second; input from the mains 1.5 kW.';
    const p = derivedOf(text, 'power');
    expect(p!.si).toBeCloseTo(3360, 9); // 420 J × 8 /s
    expect(extractFigures(text).find((x) => x.kind === 'energy')?.role).toBe('aside');
    expect(verdictOf(text)).toBe('breaks');
  });
  test("'2 J per pulse at 50 Hz' is 100 W; per minute divides by sixty", () => {
    expect(derivedOf('The Ardent pulser gives 2 J per pulse at 50 Hz from a 250 W supply.', 'power')!.si).toBeCloseTo(100, 9);
    expect(derivedOf('The Ardent press gives 600 J per stroke at 30 strokes per minute.', 'power')!.si).toBeCloseTo(300, 9); // 600 × 30 / 60
  });
});

describe('a charge at a voltage is an energy (E = QV)', () => {
  test("'3,000 mAh at 3.7 V' is 39.96 kJ (11.1 Wh)", () => {
    expect(derivedOf('The Tamsin cell delivered 3,000 mAh at 3.7 V on the discharge test.', 'energy')!.si).toBeCloseTo(3 * 3600 * 3.7, 6);
  });
  test("a battery's size ('48 V 14 Ah frame battery') is set aside, not read as what flows", () => {
    const text = 'Removable 48 V 14 Ah frame battery; controller limits the draw to 15 A at 48 V; motor rated 500 W.';
    const e = extractFigures(text).find((x) => x.kind === 'energy');
    expect(e?.si).toBeCloseTo(14 * 3600 * 48, 6);
    expect(e?.role).toBe('aside');
    expect(verdictOf(text)).toBe('consistent');
  });
});

describe('a flow against a head or a pressure is a hydraulic power', () => {
  test("a pump: '40 L/s against 12 m of head' is ρgQH, what the pump gives", () => {
    const p = derivedOf('The Corran pump moves 40 L/s against 12 m of head and draws 7.5 kW.', 'power');
    expectRelClose(p!.si, 1000 * 9.80665 * 0.04 * 12, SEVEN); // 4 707.192 W
    expect(p!.role).toBe('out');
    expect(verdictOf('The Corran pump moves 40 L/s against 12 m of head and draws 7.5 kW.')).toBe('consistent');
    expect(verdictOf('The Corran pump moves 40 L/s against 12 m of head and draws 3 kW.')).toBe('breaks');
  });
  test("a turbine: '50 L/s at a head of 4 m' is what it takes", () => {
    const p = derivedOf('The Ashby micro-turbine takes 50 L/s at a head of 4 m and makes 1.2 kW.', 'power');
    expectRelClose(p!.si, 1000 * 9.80665 * 0.05 * 4, SEVEN);
    expect(p!.role).toBe('in');
  });
  test("'10 gpm at 50 psi' is QΔp: 217.5 W (the fluid-power rule hp = gpm × psi / 1714 gives the same; from memory)", () => {
    const p = derivedOf('The Pellard hydraulic pump delivers 10 gpm at 50 psi.', 'power');
    expectRelClose(p!.si, ((10 * 3.785412e-3) / 60) * 50 * 6894.757, SEVEN);
    expectRelClose(p!.si, ((10 * 50) / 1714) * 745.6999, 1e-3);
  });
  test("'2 m³/h at 3 bar' is 166.7 W", () => {
    expectRelClose(derivedOf('The Wend booster pump gives 2 m³/h at 3 bar.', 'power')!.si, (2 / 3600) * 3e5, SEVEN);
  });
});

describe('heads and speeds said in other words', () => {
  test("'2 N·m at 60 rpm to light the 10 W lamp': a 'to' before a verb is no speed range", () => {
    const text = 'The hand crank needs 2 N·m at 60 rpm to light the 10 W lamp.';
    // 2 × 60 × 2π / 60 = 12.566 W at the crank (P = τω), more than the lamp's 10 W.
    expectRelClose(derivedOf(text, 'power')!.si, 4 * Math.PI, SEVEN);
    expect(verdictOf(text)).toBe('consistent');
    // "40 N·m at 1,000 to 3,000 rpm" is still a range: no one working point, no product.
    expect(derivedOf('The Tarn motor gives 40 N·m at 1,000 to 3,000 rpm.', 'power')).toBeUndefined();
  });
  test("a height said after the flow: '40 L/s through 12 m', '0.5 L/s up 30 m', '20 L/s falling 4 m', 'a 4 m fall'", () => {
    expectRelClose(derivedOf('The Corran pump lifts 40 L/s through 12 m using 7.5 kW.', 'power')!.si, 1000 * 9.80665 * 0.04 * 12, SEVEN);
    expect(verdictOf('The Corran pump lifts 40 L/s through 12 m using 3 kW.')).toBe('breaks');
    expectRelClose(derivedOf('It lifts 3 L/s up 20 m on 800 W.', 'power')!.si, 1000 * 9.80665 * 0.003 * 20, SEVEN);
    const t = derivedOf('The Ashby wheel takes 20 L/s falling 4 m and gives 500 W.', 'power');
    expectRelClose(t!.si, 1000 * 9.80665 * 0.02 * 4, SEVEN); // 784.532 W
    expect(t!.role).toBe('in');
    expect(verdictOf('The Ashby wheel takes 20 L/s falling 4 m and gives 900 W.')).toBe('breaks');
    expect(verdictOf('The Ashby wheel takes 20 L/s from a 4 m fall and gives 500 W.')).toBe('consistent');
  });
  test("a plate's 'Flow 60 L/min, 12 m head' is two entries, not one working point", () => {
    expect(derivedOf('Flow 60 L/min, 12 m head, 150 W motor.', 'power')).toBeUndefined();
  });
  test('a hydraulic ram lifting water with no power runs on the fall of its drive water: no finding', () => {
    for (const text of ['The hydraulic ram lifts 0.5 L/s up 30 m with no power at all.', 'Our hydram lifts 0.5 L/s up 30 m with no electricity or fuel.']) {
      expect(verdictOf(text)).toBeUndefined();
    }
  });
});

describe('a stated power within 10 % of the product is the same flow said outright', () => {
  test("'20 N·m at 300 rpm … the display shows about 630 W' is one power, not an input beside an output", () => {
    const text = "The Halden gym bike's flywheel turns at 300 rpm against 20 N·m when you pedal hard; the display shows about 600 W.";
    const f = extractFigures(text);
    // 20 × 300 × 2π/60 = 628.3 W, within 10 % of 600 W.
    expect(f.find((x) => x.derived)?.role).toBe('aside');
    expect(verdictOf(text)).not.toBe('breaks');
  });
  test('but a power the words put on the other side is still compared', () => {
    // 1.65 × 1850 × 2π/60 = 319.7 W against 300 W drawn (within 10 %, but said to be drawn).
    expect(verdictOf('The Brindle motor draws 300 W; on a band brake it gives 1.65 N·m at 1,850 rpm.')).toBe('breaks');
  });
});

describe('a mass lifted at a speed is a power (P = m g v)', () => {
  test("'lifts 60 kg at 1 m/s' on roughly 750 W is within the first law; 'raises a 100 kg load at 1 m/s' on 500 W is not", () => {
    const text = 'The Marram hoist motor uses roughly 750 W and lifts 60 kg at 1 m/s.';
    // 60 kg × 9.80665 m/s² × 1 m/s = 588.399 W (g_n, SI Brochure).
    expectRelClose(derivedOf(text, 'power')!.si, 60 * 9.80665, SEVEN);
    expect(verdictOf(text)).toBe('consistent');
    expect(verdictOf('The Marram winch motor draws 500 W and raises a 100 kg load at 1 m/s.')).toBe('breaks');
  });
});

describe('a mass lifted through a height in a time is a power (P = m g h / t)', () => {
  test("'winds a two-kilogram bag of sand up one metre in one second' on 12 V and 3.5 A", () => {
    const text = 'The Pennock wiper-motor winch runs on twelve volts and takes three and a half amps, and it winds a two-kilogram bag of sand up one metre in one second.';
    // 2 kg × 9.80665 m/s² × 1 m ÷ 1 s = 19.6133 W, out of 12 V × 3.5 A = 42 W.
    expectRelClose(extractFigures(text).find((x) => x.derived?.startsWith('power = mass × g × height'))!.si, 2 * 9.80665, SEVEN);
    expect(verdictOf(text)).toBe('consistent');
  });
  test('and one that lifts more than its motor takes breaks the first law', () => {
    // 150 kg × 9.80665 × 2 m ÷ 3 s = 980.7 W out of 230 V × 2.1 A = 483 W.
    expect(verdictOf('The Gravel wheel raises a 150 kg load through 2 m in 3 seconds while its motor takes 2.1 A from the 230 V mains.')).toBe('breaks');
  });
});
