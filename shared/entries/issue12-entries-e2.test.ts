/**
 * Worked numbers and verdicts for five entries of issue 12 (mass-modulation drives, converters beyond
 * their limits, cells that never need charging, sorting demons and loops, faster than light): each
 * worksheet is run at its defaults and at an invented claim's figures, and its steps are compared with
 * hand calculations from the textbook formulas named beside them.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { evaluateWorksheetWithKit } from '../compute';
import { parseEntryFile } from './load';
import type { EntryFile } from './schema';

const DIR = join(__dirname, '..', '..', 'content', 'entries');
const C = 299792458; // m/s, exact (BIPM SI Brochure, 9th ed., 2019, Table 1)
const KB = 1.380649e-23; // J/K, exact (SI Brochure 2019)
const NA = 6.02214076e23; // 1/mol, exact (SI Brochure 2019)
const R = KB * NA; // J/(mol K)
const G0 = 9.80665; // m/s², exact (3rd CGPM 1901; NIST SP 811 App. B)
// The electronvolt, exact: e × 1 V = 1.602176634e-19 J (SI Brochure 2019), as worksheets read "eV"
// (shared/worksheet/math.ts).
const EV = 1.602176634e-19;

const entry = (slug: string): EntryFile => parseEntryFile(readFileSync(join(DIR, `${slug}.md`), 'utf8'), `${slug}.md`);

function run(slug: string, ws: string, values: Record<string, string> = {}) {
  const w = entry(slug).worksheets.find((x) => x.name === ws);
  if (!w) throw new Error(`no worksheet ${ws} in ${slug}`);
  const r = evaluateWorksheetWithKit(w, values);
  const step = (name: string) => {
    const s = r.steps.find((x) => x.name === name);
    if (!s?.value) throw new Error(`step ${name}: ${s?.error?.message ?? 'missing'}`);
    return s.value.si;
  };
  const holds = (name: string) => {
    const c = r.checks.find((x) => x.name === name);
    if (!c || c.holds === undefined) throw new Error(`check ${name}: ${c?.error?.message ?? 'missing'}`);
    return c.holds;
  };
  return { r, step, holds };
}

const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('mass-modulation drives', () => {
  test('P/c and ΔE/c² at the defaults (photon momentum p = E/c; Einstein 1905, Δm = ΔE/c²)', () => {
    const { step, holds } = run('mass-modulation-drive', 'mass-modulation-bounds');
    expect(rel(step('F_photon'), 50 / C)).toBeLessThan(1e-12);
    expect(rel(step('dm'), 0.1 / C ** 2)).toBeLessThan(1e-12);
    // Peak force of the mass change: Δm x0 (2π f)² with x0 = 1 µm, f = 35 kHz.
    expect(rel(step('F_mass'), (0.1 / C ** 2) * 1e-6 * (2 * Math.PI * 35e3) ** 2)).toBeLessThan(1e-12);
    // Break-even speed P/F for 2 µN and 50 W: 2.5e7 m/s.
    expect(rel(step('v_break'), 50 / 2e-6)).toBeLessThan(1e-12);
    expect(holds('within_photon_bound')).toBe(false);
    expect(holds('within_mass_energy_scale')).toBe(false);
  });

  test('a thrust below P/c passes the photon check and a thrust above it fails', () => {
    expect(run('mass-modulation-drive', 'mass-modulation-bounds', { F_claimed: '0.1 uN' }).holds('within_photon_bound')).toBe(true);
    expect(run('mass-modulation-drive', 'mass-modulation-bounds', { F_claimed: '0.2 uN' }).holds('within_photon_bound')).toBe(false);
  });
});

describe('converters beyond their limits', () => {
  // The Landsberg formula 1 − 4/3 x + 1/3 x⁴ is written from memory; the paper's title, journal and year were
  // checked, its equation number was not.
  test('Landsberg and Carnot limits for a 5800 K sun and a 25 °C cell (Landsberg and Tonge 1980)', () => {
    const { step } = run('converter-beyond-limit', 'solar-cell-limits');
    const x = 298.15 / 5800;
    expect(rel(step('eta_landsberg'), 1 - (4 / 3) * x + x ** 4 / 3)).toBeLessThan(1e-12);
    expect(step('eta_landsberg')).toBeCloseTo(0.9315, 4);
    expect(rel(step('eta_carnot'), 1 - x)).toBeLessThan(1e-12);
  });

  test('verdicts: 44 % passes Landsberg but not one junction at 30 %; 96 % fails Landsberg; 1.3 V fails a 1.1 eV gap', () => {
    const d = run('converter-beyond-limit', 'solar-cell-limits');
    expect(d.step('eta')).toBeCloseTo(1.1 / (1000 * 25e-4), 12);
    expect(d.holds('within_landsberg')).toBe(true);
    expect(d.holds('within_detailed_balance')).toBe(false);
    const far = run('converter-beyond-limit', 'solar-cell-limits', { P_out: '2.4 W', V_oc: '1.3 V' });
    expect(far.holds('within_landsberg')).toBe(false);
    expect(far.holds('voltage_below_gap')).toBe(false);
    expect(rel(far.step('V_gap'), 1.1)).toBeLessThan(1e-6); // E_g/e for 1.1 eV is 1.1 V whichever eV value is used
    // A claimed 25 % single-junction cell passes both.
    const fine = run('converter-beyond-limit', 'solar-cell-limits', { P_out: '0.625 W' });
    expect(fine.holds('within_landsberg')).toBe(true);
    expect(fine.holds('within_detailed_balance')).toBe(true);
  });

  // The generator formula is the standard constant-property result, written from memory.
  test('thermoelectric: η_C (√(1+ZT) − 1)/(√(1+ZT) + Tc/Th) at ZT = 1, 250 °C / 50 °C (Goldsmid, Introduction to Thermoelectricity)', () => {
    const { step, holds } = run('converter-beyond-limit', 'thermoelectric-limits');
    const th = 523.15;
    const tc = 323.15;
    const etaC = 1 - tc / th;
    const m = Math.SQRT2;
    expect(rel(step('eta_te'), (etaC * (m - 1)) / (m + tc / th))).toBeLessThan(1e-12);
    expect(step('eta_te')).toBeCloseTo(0.0779, 4);
    expect(holds('within_carnot')).toBe(true);
    expect(holds('within_figure_of_merit')).toBe(false);
    // As ZT grows the limit approaches Carnot but stays below it.
    const big = run('converter-beyond-limit', 'thermoelectric-limits', { ZT: '1e6' });
    expect(big.step('eta_te')).toBeLessThan(etaC);
    expect(big.step('eta_te') / etaC).toBeGreaterThan(0.99);
    // 50 W from 200 W between 100 °C and 20 °C is beyond Carnot (21.4 %).
    expect(run('converter-beyond-limit', 'thermoelectric-limits', { T_hot: '100 degC', T_cold: '20 degC', P_el: '50 W' }).holds('within_carnot')).toBe(false);
  });
});

describe('cells that never need charging', () => {
  test('stored energy m e and the running time (first law)', () => {
    const { step, holds } = run('endless-battery', 'stored-energy-budget');
    expect(rel(step('E_stored'), 0.05 * 250 * 3600)).toBeLessThan(1e-12); // 12.5 Wh in joules
    expect(rel(step('t_max'), (0.05 * 250 * 3600) / 0.5)).toBeLessThan(1e-12);
    expect(holds('within_store')).toBe(false);
    expect(run('endless-battery', 'stored-energy-budget', { t_claim: '1 day' }).holds('within_store')).toBe(true);
  });

  test('37 GBq (1 Ci, 12th CGPM 1964) at 17 keV per decay gives 0.1 mW; decay law A = A0 2^(−t/T½) (Krane)', () => {
    const { step, holds } = run('endless-battery', 'radioisotope-power-budget');
    const p = 37e9 * 17e3 * EV;
    expect(rel(step('P_decay'), p)).toBeLessThan(1e-6);
    expect(rel(step('fraction_left'), 2 ** (-20 / 100))).toBeLessThan(1e-12);
    expect(rel(step('P_max_end'), p * 2 ** -0.2)).toBeLessThan(1e-6);
    // Energy over the life: P0 T½ (1 − 2^(−t/T½)) / ln 2, with the Julian year of 365.25 days.
    const year = 365.25 * 86400;
    expect(rel(step('E_source'), (p * 100 * year * (1 - 2 ** -0.2)) / Math.LN2)).toBeLessThan(1e-6);
    expect(holds('power_within_source')).toBe(false);
    expect(holds('power_lasts_the_claimed_life')).toBe(false);
    const ok = run('endless-battery', 'radioisotope-power-budget', { P_claim: '50 uW' });
    expect(ok.holds('power_within_source')).toBe(true);
    expect(ok.holds('power_lasts_the_claimed_life')).toBe(true);
    // 90 µW is within the source now but not after 20 years (87.7 µW left).
    const fades = run('endless-battery', 'radioisotope-power-budget', { P_claim: '90 uW' });
    expect(fades.holds('power_within_source')).toBe(true);
    expect(fades.holds('power_lasts_the_claimed_life')).toBe(false);
  });
});

describe('sorting demons and loops', () => {
  test('k_B T ln 2 per bit at 20 °C (Szilard 1929; Landauer 1961) and nothing left at one temperature', () => {
    const { step, holds } = run('demon-loop', 'demon-information-ledger');
    expect(rel(step('W_bit'), KB * 293.15 * Math.LN2)).toBeLessThan(1e-12);
    expect(rel(step('W_bit'), 2.8054e-21)).toBeLessThan(1e-4); // hand calculation: 1.380649e-23 × 293.15 × 0.693147
    expect(step('P_net')).toBe(0);
    expect(holds('within_information')).toBe(false);
    expect(holds('within_net_after_reset')).toBe(false);
    expect(run('demon-loop', 'demon-information-ledger', { P_claim: '0 W' }).holds('within_net_after_reset')).toBe(true);
  });

  test('a memory reset at a colder temperature leaves the Carnot share 1 − T_mem/T', () => {
    const { step } = run('demon-loop', 'demon-information-ledger', { T_mem: '-50 degC' });
    expect(rel(step('P_net') / step('P_info'), 1 - 223.15 / 293.15)).toBeLessThan(1e-9);
  });

  test('osmotic pressure c R T (van \'t Hoff; Atkins) and the mixing store n R T ln 2 for equal volumes', () => {
    const { step, holds } = run('demon-loop', 'osmotic-store');
    const pi = 1000 * R * 293.15; // 1 mol/L = 1000 mol/m³
    expect(rel(step('Pi_osm'), pi)).toBeLessThan(1e-12);
    expect(rel(step('h_max'), pi / (1000 * G0))).toBeLessThan(1e-12);
    expect(rel(step('W_max'), 10 * R * 293.15 * Math.LN2)).toBeLessThan(1e-12);
    expect(holds('within_mixing_store')).toBe(false);
    expect(run('demon-loop', 'osmotic-store', { t_run: '1 hour' }).holds('within_mixing_store')).toBe(true);
  });
});

describe('faster than light', () => {
  test('Δt′ = γ (Δt − β d / c) (Lorentz transformation; Taylor and Wheeler) at the defaults', () => {
    const { step, holds } = run('faster-than-light', 'signal-order');
    const gamma = 1 / Math.sqrt(1 - 0.8 ** 2);
    expect(rel(step('t_obs'), gamma * (2e-3 - (0.8 * 1e6) / C))).toBeLessThan(1e-12);
    expect(step('t_obs')).toBeLessThan(0);
    expect(rel(step('beta_crit'), C / (1e6 / 2e-3))).toBeLessThan(1e-12);
    expect(holds('not_faster_than_light')).toBe(false);
    expect(holds('order_kept_for_observer')).toBe(false);
  });

  test('the order flips exactly at β = c/u, and never for a signal slower than light', () => {
    const crit = C / (1e6 / 2e-3); // 0.5996
    expect(run('faster-than-light', 'signal-order', { beta_obs: String(crit - 0.001) }).holds('order_kept_for_observer')).toBe(true);
    expect(run('faster-than-light', 'signal-order', { beta_obs: String(crit + 0.001) }).holds('order_kept_for_observer')).toBe(false);
    for (const b of ['0', '0.5', '0.99', '0.999999']) {
      const slow = run('faster-than-light', 'signal-order', { t_claim: '3.5 ms', beta_obs: b });
      expect(slow.holds('not_faster_than_light')).toBe(true);
      expect(slow.holds('order_kept_for_observer')).toBe(true);
    }
  });

  test('kinetic energy (γ − 1) m c² at 0.5 c, above the Newtonian ½ m v²', () => {
    const { step, holds } = run('faster-than-light', 'energy-to-approach-light', { v_claim: '0.5' });
    expect(rel(step('KE'), (2 / Math.sqrt(3) - 1) * 1000 * C ** 2)).toBeLessThan(1e-9);
    expect(step('KE')).toBeGreaterThan(step('KE_newton'));
    expect(holds('below_light_speed')).toBe(true);
    expect(holds('energy_within_supply')).toBe(false);
    expect(run('faster-than-light', 'energy-to-approach-light').holds('below_light_speed')).toBe(false);
  });
});
