/** The check kit and the worksheet evaluator over HTTP (supertest against the real app). */
import request from 'supertest';
import { createApp } from '../../server/app';
import { CHECK_NAMES } from '../../shared/checks';
import { createTestDatabase, type TestDatabase } from '../support/db';

// The first computation in an app waits for a worker thread to load (seconds on a busy machine).
jest.setTimeout(60_000);

let t: TestDatabase;
let app: ReturnType<typeof createApp>;
beforeAll(async () => {
  t = await createTestDatabase();
  app = createApp({ sequelize: t.sequelize, version: 'test', jsonLimit: '64kb' });
});
afterAll(() => t.drop());

// The speed of light, exact by definition of the metre (BIPM, SI Brochure, 9th ed., 2019, Table 1).
const c = 299_792_458;
// 1 lbf = 4.448 222 N (NIST SP 811, 2008, Appendix B.8; exactly 0.45359237 kg × 9.80665 m/s²).
const lbf = 0.45359237 * 9.80665;
// 1 hp (550 ft·lbf/s) = 745.6999 W (NIST SP 811, 2008, Appendix B.8).
const hp = 550 * 0.3048 * lbf;

describe('POST /api/checks/:check', () => {
  it('lists the eight checks in order', async () => {
    const res = await request(app).get('/api/checks').expect(200);
    expect(res.body.checks.map((c: { name: string }) => c.name)).toEqual([...CHECK_NAMES]);
    for (const check of res.body.checks) expect(check.inputs.length).toBeGreaterThan(0);
  });

  it('runs the photon bound on typed imperial figures: F ≤ P/c', async () => {
    const res = await request(app)
      .post('/api/checks/photon-bound')
      .send({ inputs: { F_claimed: '0.2 lbf', P: '1.5 hp' } })
      .expect(200);
    const out = Object.fromEntries(res.body.outputs.map((o: { name: string; si: number }) => [o.name, o.si]));
    // The photon-rocket bound P/c (momentum flux of light, p = E/c: Griffiths, Introduction to Electrodynamics,
    // 4th ed., §8.2 — from memory) for 1.5 hp, and the claimed thrust over it.
    expect(out.F_bound).toBeCloseTo((1.5 * hp) / c, 15);
    expect(out.ratio).toBeCloseTo((0.2 * lbf) / ((1.5 * hp) / c), 3);
    expect(res.body.verdict.holds).toBe(false);
    expect(res.body.inputs.F_claimed.si).toBeCloseTo(0.2 * lbf, 12);
  });

  it('takes inputs as value and unit too, with the same result', async () => {
    const typed = await request(app).post('/api/checks/photon-bound').send({ inputs: { F_claimed: '3 uN', P: '1 kW' } });
    const split = await request(app)
      .post('/api/checks/photon-bound')
      .send({ inputs: { F_claimed: { value: 3, unit: 'uN' }, P: { value: 1, unit: 'kW' } } });
    expect(split.status).toBe(200);
    expect(split.body.outputs).toEqual(typed.body.outputs);
    // 1 kW of light gives P/c = 3.3356 µN, so 3 µN is within the bound.
    expect(split.body.verdict.holds).toBe(true);
  });

  it('sends plot series as plain arrays', async () => {
    const res = await request(app).post('/api/checks/sideways-beam').send({ inputs: { steps: '2000', particles: '2' } }).expect(200);
    const line = res.body.plots.find((p: { kind: string }) => p.kind === 'line');
    expect(Array.isArray(line.x.values)).toBe(true);
    expect(Array.isArray(line.series[0].values)).toBe(true);
    expect(line.series[0].values.length).toBe(line.x.values.length);
  });

  it('answers a wrong dimension with 400 naming the field and both dimensions', async () => {
    const res = await request(app).post('/api/checks/photon-bound').send({ inputs: { F_claimed: '3 kWh', P: '1 kW' } }).expect(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(Object.keys(res.body.error.fields)).toEqual(['body.inputs.F_claimed']);
    expect(res.body.error.fields['body.inputs.F_claimed']).toMatch(/energy/i);
    expect(res.body.error.fields['body.inputs.F_claimed']).toMatch(/force/i);
  });

  it('answers physically meaningless figures with 400 naming the field', async () => {
    const res = await request(app).post('/api/checks/carnot').send({ inputs: { Th: '300 K', Tc: '400 K' } }).expect(400);
    expect(Object.keys(res.body.error.fields)).toContain('body.inputs.Tc');
  });

  it('names unknown inputs, malformed bodies and unknown checks', async () => {
    const extra = await request(app).post('/api/checks/photon-bound').send({ inputs: { thrust: '1 N' } }).expect(400);
    expect(Object.keys(extra.body.error.fields)).toContain('body.inputs.thrust');
    const shape = await request(app).post('/api/checks/photon-bound').send({ inputs: { P: 5 } }).expect(400);
    expect(shape.body.error.code).toBe('validation_failed');
    expect(Object.keys(shape.body.error.fields)[0]).toMatch(/^body\.inputs\.P/);
    const unknown = await request(app).post('/api/checks/perpetual').send({}).expect(404);
    expect(unknown.body.error.code).toBe('unknown_check');
  });

  it('answers a body over the limit with 413', async () => {
    const res = await request(app)
      .post('/api/checks/photon-bound')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ inputs: { F_claimed: 'x'.repeat(70_000) } }))
      .expect(413);
    expect(res.body.error.code).toBe('body_too_large');
  });
});

describe('worksheets', () => {
  const worksheet = {
    name: 'photon-test',
    title: 'Photon bound, by hand',
    inputs: [
      { name: 'P', label: 'Power', unit: 'W', default: '1 kW' },
      { name: 'F', label: 'Claimed thrust', unit: 'N', default: '1 mN' },
    ],
    steps: [
      { name: 'F_max', label: 'Bound', expression: 'P / c', unit: 'uN' },
      { name: 'k', label: 'Ratio', expression: 'F / F_max' },
      { name: 'F_kit', label: 'Bound from the kit', expression: 'photon_thrust_bound(P)', unit: 'uN' },
    ],
    checks: [{ name: 'ok', label: 'Within the bound', condition: 'F <= F_max', holds: 'Within: {F_max}.', fails: 'Beyond: {k} times {F_max}.' }],
  };

  it('lists and serves the starter worksheets, each of which evaluates without error', async () => {
    const list = await request(app).get('/api/worksheets').expect(200);
    expect(list.body.worksheets.length).toBeGreaterThanOrEqual(5);
    for (const { name } of list.body.worksheets) {
      const one = await request(app).get(`/api/worksheets/${name}`).expect(200);
      const res = await request(app).post('/api/worksheets/evaluate').send({ worksheet: one.body.worksheet }).expect(200);
      expect(res.body.ok).toBe(true);
    }
    await request(app).get('/api/worksheets/no-such-sheet').expect(404);
  });

  it('evaluates a posted worksheet with the given values, kit functions included', async () => {
    const res = await request(app).post('/api/worksheets/evaluate').send({ worksheet, values: { P: '2 kW' } }).expect(200);
    const steps = Object.fromEntries(res.body.steps.map((s: { name: string; value: { si: number } }) => [s.name, s.value.si]));
    // P/c for 2 kW (c exact, SI Brochure as above); k is the 1 mN of the worksheet over that bound.
    expect(steps.F_max).toBeCloseTo(2000 / c, 15);
    expect(steps.F_kit).toBe(steps.F_max);
    expect(steps.k).toBeCloseTo(1e-3 / (2000 / c), 6);
    expect(res.body.checks[0].holds).toBe(false);
    expect(res.body.checks[0].message).toMatch(/Beyond/);
  });

  it('reports a dimension error at its step, not as a failed request', async () => {
    const bad = { ...worksheet, steps: [{ name: 'wrong', label: 'Wrong', expression: 'P + F' }] , checks: [] };
    const res = await request(app).post('/api/worksheets/evaluate').send({ worksheet: bad }).expect(200);
    expect(res.body.ok).toBe(false);
    expect(res.body.steps[0].error.kind).toBe('dimension');
    expect(res.body.steps[0].error.message).toMatch(/wrong/);
  });

  it('answers a malformed worksheet with 400 and the path of the offending field', async () => {
    const bad = { ...worksheet, steps: [{ name: '9lives', label: 'x', expression: '1' }] };
    const res = await request(app).post('/api/worksheets/evaluate').send({ worksheet: bad }).expect(400);
    expect(Object.keys(res.body.error.fields)).toContain('body.worksheet.steps.0.name');
  });

  it('refuses a hostile expression at its step and stays up', async () => {
    const hostile = { ...worksheet, steps: [{ name: 'x', label: 'x', expression: 'import({}, {override: true})' }], checks: [] };
    const res = await request(app).post('/api/worksheets/evaluate').send({ worksheet: hostile }).expect(200);
    expect(res.body.steps[0].error.kind).toBe('refused');
    await request(app).get('/api/health').expect(200);
  });
});
