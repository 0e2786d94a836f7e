import fc from 'fast-check';
import { C_LIGHT, E_CHARGE, EARTH_FIELD_TYPICAL, G0, M_ELECTRON, M_PROTON } from './constants';
import { CheckRangeError } from './errors';
import * as f from './formulas';

/** Relative difference. */
const rel = (a: number, b: number) => Math.abs(a / b - 1);

function fieldOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    if (e instanceof CheckRangeError) return e.field;
    throw e;
  }
  return undefined;
}

describe('constants', () => {
  test('exact SI values', () => {
    expect(C_LIGHT).toBe(299792458); // BIPM SI Brochure, 9th ed. (2019), Table 1
    expect(E_CHARGE).toBe(1.602176634e-19); // BIPM SI Brochure, 9th ed. (2019), Table 1
    expect(G0).toBe(9.80665); // 3rd CGPM (1901); NIST SP 811 (2008), App. B
  });
  test('electron and proton masses agree with CODATA charge-to-mass quotients', () => {
    // CODATA 2022: electron charge to mass quotient −e/m_e = −1.758 820 008 38(55) × 10^11 C/kg (from memory)
    expect(rel(E_CHARGE / M_ELECTRON, 1.75882000838e11)).toBeLessThan(1e-10);
    // CODATA 2022: proton charge to mass quotient e/m_p = 9.578 833 1430(30) × 10^7 C/kg (from memory)
    expect(rel(E_CHARGE / M_PROTON, 9.578833143e7)).toBeLessThan(1e-9);
    // CODATA 2022: electron mass energy equivalent in MeV 0.510 998 950 69(16) (from memory)
    expect(rel((M_ELECTRON * C_LIGHT * C_LIGHT) / E_CHARGE / 1e6, 0.51099895069)).toBeLessThan(1e-10);
  });
  test('the Earth-field default is within the surface range of the geomagnetic field', () => {
    // from memory: about 25–65 µT at the surface (NOAA/BGS World Magnetic Model)
    expect(EARTH_FIELD_TYPICAL).toBeGreaterThanOrEqual(25e-6);
    expect(EARTH_FIELD_TYPICAL).toBeLessThanOrEqual(65e-6);
  });
});

describe('photon-rocket bound F = P/c', () => {
  test('1 kW of light pushes with 3.3356 µN', () => {
    // Radiation of power P carries momentum at the rate P/c (Griffiths, Introduction to
    // Electrodynamics, 4th ed., §9.2.3, momentum of electromagnetic waves — from memory):
    // 1000 W / 299 792 458 m/s = 3.335 640 95 µN.
    expect(rel(f.photonThrustBound(1000), 3.33564095e-6)).toBeLessThan(1e-8);
  });
  test('negative power is refused, naming P', () => {
    expect(fieldOf(() => f.photonThrustBound(-1))).toBe('P');
  });
});

describe('break-even speed v = P/F', () => {
  test('1 kW and 1 mN break even at 1000 km/s; a photon rocket at c', () => {
    // Kinetic power of a force F on a body at speed v is F·v (any mechanics text, e.g. Halliday,
    // Resnick & Walker ch. 7, P = F·v — from memory); F·v = P at v = P/F.
    expect(f.breakEvenSpeed(1000, 1e-3)).toBe(1e6);
    expect(rel(f.breakEvenSpeed(1000, f.photonThrustBound(1000)), C_LIGHT)).toBeLessThan(1e-15);
    expect(f.kineticPower(1e-3, 3e4)).toBeCloseTo(30, 12);
  });
  test('zero thrust is refused, naming F', () => {
    expect(fieldOf(() => f.breakEvenSpeed(1000, 0))).toBe('F');
  });
});

describe('Carnot bounds', () => {
  test('Th = 500 K, Tc = 300 K: η = 0.4, heating COP 2.5, cooling COP 1.5', () => {
    // η = 1 − Tc/Th (Fermi, Thermodynamics, Dover 1956, ch. IV; Çengel & Boles, Thermodynamics: An
    // Engineering Approach, ch. 6, the Carnot principles — from memory). COP_HP = 1/(1 − Tc/Th),
    // COP_R = 1/(Th/Tc − 1) (Çengel & Boles, ch. 6, reversed Carnot cycle — from memory).
    expect(f.carnotEfficiency(500, 300)).toBeCloseTo(0.4, 14);
    expect(f.carnotCopHeating(500, 300)).toBeCloseTo(2.5, 14);
    expect(f.carnotCopCooling(500, 300)).toBeCloseTo(1.5, 14);
  });
  test("Çengel & Boles' Carnot engine between 652 °C and 30 °C: 67.2 %", () => {
    // Worked example in Çengel & Boles, ch. 6 (a Carnot heat engine receiving 500 kJ per cycle from a
    // source at 652 °C, rejecting to a sink at 30 °C: η = 67.2 %, Q_L = 164 kJ) — from memory.
    const eta = f.carnotEfficiency(652 + 273.15, 30 + 273.15);
    expect(eta).toBeCloseTo(0.672, 3);
    expect(500 * (1 - eta)).toBeCloseTo(164, 0);
  });
  test('textbook identities: COP_HP = COP_R + 1 = 1/η (Çengel & Boles ch. 6, from memory)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1e4, noNaN: true }), fc.double({ min: 1e-6, max: 0.999999, noNaN: true }), (Th, frac) => {
        const Tc = Th * frac;
        fc.pre(Tc < Th);
        const eta = f.carnotEfficiency(Th, Tc);
        const h = f.carnotCopHeating(Th, Tc);
        const c = f.carnotCopCooling(Th, Tc);
        return rel(h, c + 1) < 1e-9 && rel(h, 1 / eta) < 1e-9;
      }),
    );
  });
  test("property: Carnot's bound never exceeds 1 and falls as Tc rises", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        fc.double({ min: 1e-6, max: 0.999, noNaN: true }),
        fc.double({ min: 1e-6, max: 0.999, noNaN: true }),
        (Th, a, b) => {
          fc.pre(a !== b);
          const [lo, hi] = a < b ? [a, b] : [b, a];
          const etaLo = f.carnotEfficiency(Th, lo * Th);
          const etaHi = f.carnotEfficiency(Th, hi * Th);
          // never increasing; strictly falling once the two cold temperatures differ beyond round-off
          const falls = hi - lo > 1e-12 ? etaHi < etaLo : etaHi <= etaLo;
          return etaLo < 1 && etaHi < 1 && etaHi > 0 && falls;
        },
      ),
    );
  });
  test('Tc > Th and T ≤ 0 are refused, naming the field (Tc = Th is one reservoir: see corrections.test.ts)', () => {
    expect(fieldOf(() => f.carnotEfficiency(300, 300.001))).toBe('Tc');
    expect(fieldOf(() => f.carnotCopHeating(300, 400))).toBe('Tc');
    expect(fieldOf(() => f.carnotCopCooling(0, -1))).toBe('Th');
    expect(fieldOf(() => f.carnotEfficiency(300, 0))).toBe('Tc');
  });
});

describe('Tsiolkovsky rocket equation Δv = v_e ln(m0/m1)', () => {
  test('worked examples', () => {
    // Δv = v_e ln(m0/m1), v_e = Isp g0 (Sutton & Biblarz, Rocket Propulsion Elements, ch. 4, the ideal
    // velocity increment — from memory). The numbers are our own worked examples, by hand:
    // Isp = 300 s, mass ratio 4: 300 × 9.80665 × ln 4 = 4078.47 m/s.
    expect(f.tsiolkovskyDv(f.exhaustSpeedFromIsp(300), 4000, 1000)).toBeCloseTo(4078.47, 2);
    // v_e = 4.4 km/s (about a hydrogen–oxygen engine in vacuum — from memory), mass ratio 10: 10.13 km/s.
    expect(f.tsiolkovskyDv(4400, 10, 1)).toBeCloseTo(10131.37, 1);
    // mass ratio e gives Δv = v_e exactly (definition of the natural logarithm)
    expect(f.tsiolkovskyDv(3000, Math.E, 1)).toBeCloseTo(3000, 10);
    expect(f.tsiolkovskyDv(3000, 5, 5)).toBe(0);
  });
  test('m1 > m0 and m1 = 0 are refused, naming m1', () => {
    expect(fieldOf(() => f.tsiolkovskyDv(3000, 1, 2))).toBe('m1');
    expect(fieldOf(() => f.tsiolkovskyDv(3000, 1, 0))).toBe('m1');
  });
});

describe('artifact forces', () => {
  test('Lorentz force on a lead F = I L B', () => {
    // F = I L × B on a straight wire (Griffiths, Introduction to Electrodynamics, §5.1.3 — from memory):
    // 1 A over 1 m across 50 µT is 50 µN.
    expect(f.leadLorentzForce(1, 1, 50e-6)).toBeCloseTo(50e-6, 18);
    expect(f.leadLorentzForce(-2, 0.5, 50e-6)).toBeCloseTo(50e-6, 18);
  });
  test('radiation recoil F = f P / c', () => {
    // as the photon bound, scaled by the net asymmetry: 100 W fully one way is 333.56 nN
    expect(rel(f.radiationRecoilForce(100, 1), 3.3356409519815204e-7)).toBeLessThan(1e-12);
    expect(rel(f.radiationRecoilForce(100, 0.1), 3.3356409519815205e-8)).toBeLessThan(1e-12);
    expect(fieldOf(() => f.radiationRecoilForce(100, 1.5))).toBe('f');
  });
  test('outgassing F = ṁ v and thermal drift k ΔT', () => {
    // momentum flux of a gas jet, ṁ v (the rocket thrust F = ṁ v_e, Sutton & Biblarz ch. 2 — from memory)
    expect(f.outgassingForce(1e-9, 300)).toBeCloseTo(3e-7, 20);
    expect(f.thermalDriftForce(1e-6, 2)).toBeCloseTo(2e-6, 20);
  });
});

describe('gyration', () => {
  test('gyro-frequency of an electron at rest-mass speed in 1 T is e/m_e', () => {
    // ω = |q|B/(γm) (Jackson, Classical Electrodynamics, 3rd ed., §12.2 — from memory); for γ = 1, B = 1 T
    // it is the CODATA 2022 electron charge-to-mass quotient, 1.758 820 008 38 × 10^11 s^-1 (from memory).
    expect(rel(f.gyroFrequency(-E_CHARGE, 1, M_ELECTRON, 1), 1.75882000838e11)).toBeLessThan(1e-10);
    expect(rel(f.gyroFrequency(E_CHARGE, 2, M_ELECTRON, 4), 1.75882000838e11 / 2)).toBeLessThan(1e-10);
  });
  test('gyro-radius from the magnetic rigidity Bρ [T m] = p [GeV/c] / 0.299 792 458', () => {
    // Magnetic rigidity (PDG Review of Particle Physics, kinematics / passage of particles — from memory).
    // p = m_e c = 0.510 998 95 MeV/c (CODATA, from memory) in 1 T: ρ = 0.51099895e-3 / 0.299792458 m.
    const p = M_ELECTRON * C_LIGHT;
    expect(rel(f.gyroRadius(p, -E_CHARGE, 1), 0.51099895e-3 / 0.299792458)).toBeLessThan(1e-8);
    expect(fieldOf(() => f.gyroRadius(p, 0, 1))).toBe('q');
    expect(fieldOf(() => f.gyroRadius(p, E_CHARGE, 0))).toBe('B');
  });
  test('Lorentz factor from kinetic energy: an electron with K = m_e c² has γ = 2', () => {
    // m_e c² = 0.510 998 950 69 MeV (CODATA 2022, from memory)
    const K = 0.51099895069e6 * E_CHARGE;
    expect(f.gammaFromKineticEnergy(K, M_ELECTRON)).toBeCloseTo(2, 9);
  });
});

describe('first law', () => {
  test('balance and over-unity ratio', () => {
    expect(f.firstLawBalance(1000, 1100, 0)).toBe(-100);
    expect(f.overUnityRatio(1000, 1100, 0)).toBeCloseTo(1.1, 14);
    // 200 J drawn from a battery inside (ΔE_stored = −200 J): the net supply is 1200 J
    expect(f.overUnityRatio(1000, 1100, -200)).toBeCloseTo(1100 / 1200, 14);
    expect(fieldOf(() => f.overUnityRatio(100, 50, 100))).toBe('E_in');
  });
});
