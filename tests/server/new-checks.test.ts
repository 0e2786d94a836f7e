/**
 * The five checks added in issue 12 over HTTP (supertest against the real app on a real MariaDB):
 * listed with their inputs and cautions, run on typed figures with the numbers of their outside
 * references, and bad figures answered 400 naming the field.
 */
import { CHECK_NAMES } from '../../shared/checks';
import { startTestApp, type Client, type TestApp } from '../support/app';

// The first computation in an app waits for a worker thread to load (seconds on a busy machine).
jest.setTimeout(60_000);

let h: TestApp;
let c: Client;
beforeAll(async () => {
  h = await startTestApp({ demoAccounts: false });
  c = await h.client();
});
afterAll(() => h?.close());

const NEW = ['faraday-yield', 'nuclear-signature', 'road-load', 'light-converter-limits', 'landauer'];
const rel = (a: number, b: number) => Math.abs(a / b - 1);
type Out = { name: string; si: number; unit: string; display: string };
const out = (body: { outputs: Out[] }) => Object.fromEntries(body.outputs.map((o) => [o.name, o.si]));

// CODATA 2018 (exact in the SI since 2019): F = 96 485.332 12 C/mol, R = 8.314 462 618 J/(mol K),
// k_B = 1.380 649 × 10^-23 J/K (SI Brochure, 9th ed.).
const F = 96485.33212;
const R = 8.314462618;
const kB = 1.380649e-23;

describe('the five new checks over HTTP', () => {
  it('are listed after the first nine, fourteen in all, each with inputs, and cautions where work can hurt', async () => {
    const res = await c.get('/api/checks').expect(200);
    const names = res.body.checks.map((x: { name: string }) => x.name);
    expect(names).toEqual([...CHECK_NAMES]);
    expect(names).toHaveLength(14);
    expect(names.slice(9)).toEqual(NEW);
    const byName = Object.fromEntries(res.body.checks.map((x: { name: string }) => [x.name, x]));
    for (const n of NEW) expect(byName[n].inputs.length).toBeGreaterThan(0);
    expect(byName['faraday-yield'].cautions.join(' ')).toMatch(/oxyhydrogen/i);
    expect(byName['nuclear-signature'].cautions.join(' ')).toMatch(/ionizing radiation/i);
    expect(byName['road-load'].cautions.join(' ')).toMatch(/traction batteries/i);
    expect(byName['light-converter-limits'].cautions.join(' ')).toMatch(/laser/i);
  });

  it('faraday-yield: 10 A through two cells, mixed gas at 0 °C and 1 atm, against 0.2 L/min', async () => {
    const res = await c
      .post('/api/checks/faraday-yield', { inputs: { I: '10 A', cells: '2', gas: '1.5', T: '0 degC', p: '101.325 kPa', flow_claimed: '0.2 L / min' } })
      .expect(200);
    // 2 × 10 A / (2F) × 1.5 × R × 273.15 K / 101 325 Pa = 3.4845 × 10^-6 m³/s = 0.209 07 L/min.
    const expected = ((2 * 10) / (2 * F)) * 1.5 * ((R * 273.15) / 101325);
    expect(rel(out(res.body).flow_max, expected)).toBeLessThan(1e-9);
    expect(res.body.verdict.holds).toBe(true);
    expect(res.body.outputs.find((o: Out) => o.name === 'flow_max').display).toBe('0.2091 L / min');
  });

  it('nuclear-signature: 1 MJ from 1 g of palladium is 1.10 keV per atom; 1 W of D + D → ³He + n is 1.9 × 10^12 neutrons a second', async () => {
    const res = await c
      .post('/api/checks/nuclear-signature', { inputs: { E_excess: '1 MJ', mass: '1 g', molar_mass: '106.42 g / mol', P_excess: '1 W', Q: '3.269 MeV' } })
      .expect(200);
    const atoms = (1e-3 * 6.02214076e23) / 0.10642; // IUPAC standard atomic weight of Pd, 106.42
    expect(rel(out(res.body).E_per_atom, 1e6 / atoms)).toBeLessThan(1e-12);
    expect(out(res.body).E_per_atom / 1.602176634e-19).toBeCloseTo(1103.0, 1); // 1 MJ ÷ 5.6588 × 10^21 atoms
    expect(out(res.body).emission_rate).toBeCloseTo(1.9093e12, -9);
    expect(res.body.verdict.holds).toBe(false);
  });

  it('road-load: a 1200 kg car at 90 km/h said to draw nothing net', async () => {
    const res = await c
      .post('/api/checks/road-load', {
        inputs: { m: '1200 kg', v: '90 km / h', Cd: '0.32', A: '2.1 m^2', Crr: '0.012', rho: '1.225 kg / m^3', P_gen: '2 kW', P_net_claimed: '0 W' },
      })
      .expect(200);
    // ½ × 1.225 × 0.32 × 2.1 × 25² + 0.012 × 1200 × 9.806 65 = 257.25 + 141.22 = 398.47 N; × 25 m/s = 9.962 kW.
    const F_road = 0.5 * 1.225 * 0.32 * 2.1 * 25 * 25 + 0.012 * 1200 * 9.80665;
    expect(out(res.body).F_road).toBeCloseTo(F_road, 9);
    expect(out(res.body).P_road).toBeCloseTo(F_road * 25, 6);
    expect(out(res.body).F_gen).toBeCloseTo(80, 9); // 2 kW / 25 m/s
    expect(res.body.verdict.holds).toBe(false);
  });

  it('light-converter-limits: Landsberg 93.3 % for a 6000 K sun and a 300 K converter; 95 % from any converter is beyond it', async () => {
    const res = await c.post('/api/checks/light-converter-limits', { inputs: { eta_claimed: '95 %', junctions: '0', Ts: '6000 K', Ta: '300 K' } }).expect(200);
    // Landsberg efficiency 1 − (4/3)(Ta/Ts) + (1/3)(Ta/Ts)^4 with Ta/Ts = 300/6000 = 0.05
    // (P. T. Landsberg and G. Tonge, J. Appl. Phys., 1980 — from memory): 0.9333.
    expect(out(res.body).eta_landsberg).toBeCloseTo(1 - (4 / 3) * 0.05 + (1 / 3) * 0.05 ** 4, 12);
    expect(res.body.verdict.holds).toBe(false);
  });

  it('landauer: 10^18 erasures a second at 300 K need 2.87 mW', async () => {
    const res = await c.post('/api/checks/landauer', { inputs: { T: '300 K', E_op: '0 J', P: '1 mW', rate: '1e18 Hz' } }).expect(200);
    expect(rel(out(res.body).P_min, 1e18 * kB * 300 * Math.LN2)).toBeLessThan(1e-12);
    expect(res.body.verdict.holds).toBe(false);
  });

  it('bad figures are a 400 naming the field, never a 500', async () => {
    const cases: [string, Record<string, string>, string][] = [
      ['faraday-yield', { I: '0 A', P: '0 W' }, 'body.inputs.I'],
      ['faraday-yield', { flow_claimed: '3 kg' }, 'body.inputs.flow_claimed'],
      ['nuclear-signature', { Q: '0 MeV' }, 'body.inputs.Q'],
      ['road-load', { v: '0 km / h' }, 'body.inputs.v'],
      ['light-converter-limits', { Ta: '7000 K' }, 'body.inputs.Ta'],
      ['landauer', { P: '1 W', rate: '0 Hz' }, 'body.inputs.rate'],
    ];
    for (const [check, inputs, field] of cases) {
      const res = await c.post(`/api/checks/${check}`, { inputs });
      expect([check, res.status]).toEqual([check, 400]);
      expect(res.body.error.code).toBe('invalid_input');
      expect(Object.keys(res.body.error.fields)).toEqual([field]);
    }
  });
});
