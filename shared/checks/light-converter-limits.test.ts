/**
 * Radiative limits of light converters against outside references:
 *  - Shockley and Queisser, "Detailed Balance Limit of Efficiency of p-n Junction Solar Cells",
 *    J. Appl. Phys. 32(3), 510–519 (1961): sun and cell blackbodies at 6000 K and 300 K, the maximum
 *    efficiency "30 % for an energy gap of 1.1 ev" (the abstract, as the publisher's record gives it);
 *    their "ultimate efficiency" peaks at 44 % near x_g = Eg/kTs = 2.2 (from memory).
 *  - Landsberg and Tonge, J. Appl. Phys. 51, R1 (1980): 1 − 4/3·x + 1/3·x⁴, x = Ta/Ts.
 *  - The detailed-balance limit at full concentration, about 40.7 % near 1.1 eV for a 6000 K sun and a
 *    300 K cell (Araújo and Martí, 1990s; from memory).
 *  - The Planck spectrum integrated numerically (Simpson's rule) as an independent check of the series;
 *    mathjs's stefanBoltzmann (CODATA 2018).
 */
import { create, all, type Unit } from 'mathjs';
import { E_CHARGE, H_PLANCK, K_BOLTZMANN, C_LIGHT, SIGMA_SB, SUN_DILUTION } from './constants';
import {
  bestBandGap,
  detailedBalanceLimit,
  landsbergEfficiency,
  photonConversionBound,
  photonFluxAbove,
  shockleyQueisserEfficiency,
  ultimateEfficiency,
} from './formulas';
import { lightConverterLimits, MAX_CONCENTRATION } from './light-converter-limits';
import { CheckInputError, runCheck, type CheckRun } from './run';

const math = create(all);
const eV = 1.602176634e-19;
const rel = (a: number, b: number) => Math.abs(a / b - 1);
const out = (r: CheckRun) => Object.fromEntries(r.outputs.map((o) => [o.name, o.si]));
const run = (inputs: Record<string, string>) => runCheck('light-converter-limits', inputs);

/** (2π/(h³c²)) ∫ E²/(exp((E − mu)/kT) − 1) dE from Eg to Eg + 60 kT, by Simpson's rule on 20 000 intervals. */
function simpsonFlux(Eg: number, T: number, mu: number): number {
  const kT = K_BOLTZMANN * T;
  const n = 20000;
  const top = Eg + 60 * kT;
  const h = (top - Eg) / n;
  const f = (E: number) => (E * E) / Math.expm1((E - mu) / kT);
  let s = f(Eg) + f(top);
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * f(Eg + i * h);
  return ((2 * Math.PI) / (H_PLANCK ** 3 * C_LIGHT ** 2)) * (s * h) / 3;
}

describe('blackbody sums', () => {
  test('the series for the photon flux agrees with Simpson integration of the Planck spectrum', () => {
    for (const [Eg, T, mu] of [
      [1.1 * eV, 6000, 0],
      [1.1 * eV, 300, 0],
      [1.1 * eV, 300, 0.9 * eV],
      [0.3 * eV, 5772, 0],
    ]) {
      expect(rel(photonFluxAbove(Eg, T, mu), simpsonFlux(Eg, T, mu))).toBeLessThan(1e-9);
    }
  });
  test('σ = 2π⁵k⁴/(15h³c²) is the Stefan–Boltzmann constant (CODATA 2018: 5.670 374 419… × 10^-8, exact)', () => {
    expect(rel(SIGMA_SB, 5.670374419e-8)).toBeLessThan(1e-9);
    expect(rel(SIGMA_SB, (math.evaluate('stefanBoltzmann') as Unit).toNumber('W / (m^2 K^4)'))).toBeLessThan(1e-12);
  });
  test('the sun fills 2.16 × 10^-5 of the sky: (695 700 km / 1 au)² (IAU 2015 B3, IAU 2012 B2)', () => {
    expect(rel(SUN_DILUTION, (695700 / 149597870.7) ** 2)).toBeLessThan(1e-14);
    expect(SUN_DILUTION).toBeCloseTo(2.1627e-5, 8);
    expect(MAX_CONCENTRATION).toBe(46238); // (149 597 870.7 / 695 700)² = 215.0322² = 46 238.9
  });
});

describe('Landsberg, Carnot and Shockley–Queisser', () => {
  test('Landsberg: 93.33 % for 6000 K and 300 K, 93.06 % for 5760 K; 0 when the temperatures are equal', () => {
    // x = 0.05: 1 − 0.066 667 + 0.000 002 083 = 0.933 335; x = 300/5760 = 0.052 083: 0.930 558.
    expect(landsbergEfficiency(6000, 300)).toBeCloseTo(0.933335, 6);
    expect(landsbergEfficiency(5760, 300)).toBeCloseTo(0.930558, 6);
    expect(landsbergEfficiency(300, 300)).toBeCloseTo(0, 15);
    expect(() => landsbergEfficiency(300, 400)).toThrow();
  });

  test('the 1961 paper: 6000 K sun (f = 2.18 × 10^-5), cell emitting from both faces, 1.1 eV: 30 % (ours 29.4 %)', () => {
    const r = detailedBalanceLimit(1.1 * eV, 6000, 300, 1, 2.18e-5, 2);
    expect(Math.abs(r.eta - 0.3)).toBeLessThan(0.01);
    expect(r.V).toBeGreaterThan(0.7); // below the gap, as a working cell must be
    expect(r.V).toBeLessThan(1.1);
  });

  test("the ultimate efficiency peaks at 44 % near x_g = 2.2 (Shockley and Queisser's u)", () => {
    let best = 0;
    let at = 0;
    for (let xg = 1; xg <= 4; xg += 0.01) {
      const u = ultimateEfficiency(xg * K_BOLTZMANN * 6000, 6000);
      if (u > best) [best, at] = [u, xg];
    }
    expect(best).toBeGreaterThan(0.435);
    expect(best).toBeLessThan(0.445);
    expect(Math.abs(at - 2.2)).toBeLessThan(0.1);
  });

  test('full concentration, 6000 K sun, 300 K cell: about 40.7 % near 1.1 eV', () => {
    const b = bestBandGap(6000, 300, 1 / SUN_DILUTION);
    expect(Math.abs(b.eta - 0.407)).toBeLessThan(0.003);
    expect(Math.abs(b.Eg / eV - 1.1)).toBeLessThan(0.05);
  });

  test('one sun with a rear mirror: about 31 % near 1.3 eV; more light and a mirror only raise it', () => {
    const b = bestBandGap(6000, 300, 1);
    expect(b.eta).toBeGreaterThan(0.3);
    expect(b.eta).toBeLessThan(0.32);
    expect(Math.abs(b.Eg / eV - 1.3)).toBeLessThan(0.05);
    const oneFace = shockleyQueisserEfficiency(1.1 * eV, 6000, 300, 1);
    const twoFaces = detailedBalanceLimit(1.1 * eV, 6000, 300, 1, SUN_DILUTION, 2).eta;
    expect(oneFace).toBeGreaterThan(twoFaces);
    expect(shockleyQueisserEfficiency(1.1 * eV, 6000, 300, 100)).toBeGreaterThan(oneFace);
    // No single junction beats Landsberg or Carnot.
    expect(bestBandGap(6000, 300, 1 / SUN_DILUTION).eta).toBeLessThan(landsbergEfficiency(6000, 300));
  });

  test('QE·qV/E_photon: 0.9 × 1.0 V of 1.55 eV photons is 58.1 %', () => {
    expect(photonConversionBound(0.9, 1.0, 1.55 * eV)).toBeCloseTo(0.9 / 1.55, 9);
    expect(photonConversionBound(1, 1, E_CHARGE)).toBe(1);
  });
});

describe('light-converter-limits check', () => {
  test('45 % from a single junction at one sun is beyond the limit at the best band gap', () => {
    const r = run({ eta_claimed: '0.45', junctions: '1', Eg: '0 eV', Ts: '6000 K', Ta: '300 K', X: '1' });
    const o = out(r);
    expect(o.eta_carnot).toBeCloseTo(0.95, 12);
    expect(o.eta_landsberg).toBeCloseTo(0.933335, 6);
    expect(o.eta_sq).toBeCloseTo(bestBandGap(6000, 300, 1).eta, 9);
    expect(o.ratio).toBeCloseTo(0.45 / o.eta_sq, 9);
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toMatch(/^The claimed efficiency, 45\.0 %, is 1\.45 times the Shockley–Queisser limit for a single-junction cell, 31\.0 % at the best band gap, 1\.31 eV/);
    expect(r.verdict.message).toMatch(/up to the Landsberg bound/);
    const p = r.plots[0];
    if (p.kind === 'line') {
      expect(Math.max(...Array.from(p.series[0].values))).toBeLessThanOrEqual(o.eta_sq + 1e-9);
      expect(Math.max(...Array.from(p.series[0].values))).toBeGreaterThan(o.eta_sq - 0.005);
    }
  });

  test('a stated band gap is used as given; 25 % at 1.12 eV holds', () => {
    const r = run({ eta_claimed: '0.25', Eg: '1.12 eV' });
    expect(out(r).Eg_used / eV).toBeCloseTo(1.12, 12); // typed eV is exact (shared/worksheet/math.ts)
    expect(r.verdict.holds).toBe(true);
  });

  test('several junctions or any converter answer to Landsberg: 45 % holds, 95 % does not', () => {
    expect(run({ eta_claimed: '0.45', junctions: '3' }).verdict.holds).toBe(true);
    const r = run({ eta_claimed: '0.95', junctions: '0' });
    expect(r.verdict.holds).toBe(false);
    expect(r.verdict.message).toMatch(/times the Landsberg bound for a converter of any kind, 93\.3 %/);
    expect(out(r).eta_sq).toBeUndefined();
  });

  test('light of one colour: 70 % from 1.55 eV photons at 1.0 V and QE 0.9 is beyond QE·qV/E_photon = 58 %', () => {
    const r = run({ eta_claimed: '0.7', E_photon: '1.55 eV', QE: '0.9', V: '1 V' });
    expect(out(r).eta_mono_bound).toBeCloseTo((0.9 * 1) / 1.55, 12); // QE·qV/E_photon = 0.9 × 1 eV / 1.55 eV
    expect(r.verdict.holds).toBe(false);
    expect(out(r).eta_landsberg).toBeUndefined();
    expect(run({ eta_claimed: '0.55', E_photon: '1.55 eV', QE: '0.9', V: '1 V' }).verdict.holds).toBe(true);
    // Without a voltage the bound is the quantum efficiency.
    expect(out(run({ eta_claimed: '0.5', E_photon: '1.55 eV', QE: '0.8' })).eta_mono_bound).toBe(0.8);
    // A quantum efficiency of zero gives no power at all: no ratio, a plain sentence.
    const dead = run({ eta_claimed: '0.2', E_photon: '1.55 eV', QE: '0' });
    expect(dead.verdict.holds).toBe(false);
    expect(out(dead).ratio).toBeUndefined();
    expect(dead.verdict.message).toMatch(/gives no power/);
  });

  test('an efficiency above 100 % is also said to break energy conservation', () => {
    expect(run({ eta_claimed: '1.2', junctions: '0' }).verdict.message).toMatch(/above 100 %/);
  });

  test('bad figures name their field', () => {
    const field = (inputs: Record<string, string>) => {
      try {
        run(inputs);
      } catch (e) {
        if (e instanceof CheckInputError) return Object.keys(e.fields);
        throw e;
      }
      return [];
    };
    expect(field({ Ta: '7000 K' })).toEqual(['inputs.Ta']);
    expect(field({ Eg: '0.01 eV' })).toEqual(['inputs.Eg']);
    expect(field({ X: '50000' })).toEqual(['inputs.X']);
    expect(field({ junctions: '1.5' })).toEqual(['inputs.junctions']);
    expect(lightConverterLimits.cautions.join(' ')).toMatch(/laser/i);
  });
});
