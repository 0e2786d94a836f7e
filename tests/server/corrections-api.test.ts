/**
 * Issue 12, corrections 4, 6 and 10 over HTTP (supertest against the real app and its MariaDB): a
 * single reservoir is judged with JSON-safe outputs, a temperature rise is read as a difference, and
 * metric horsepower is a power. On the code before the corrections the first answered 400, the second
 * computed with 275.15 K and the third answered 400 (mathjs read "PS" as a petasiemens).
 */
import request from 'supertest';
import { createApp } from '../../server/app';
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

const outputs = (body: { outputs: { name: string; si: number }[] }) => Object.fromEntries(body.outputs.map((o) => [o.name, o.si]));

it('Carnot with both reservoirs at 300 K: 200, efficiency bound 0, a claimed efficiency fails, every output a number', async () => {
  // Kelvin–Planck: no work from a single reservoir (e.g. Fermi, Thermodynamics, ch. III — from memory).
  const res = await request(app).post('/api/checks/carnot').send({ inputs: { Th: '300 K', Tc: '26.85 degC', eta_claimed: '0.05' } }).expect(200);
  expect(outputs(res.body).eta_max).toBe(0);
  expect(res.body.verdict.holds).toBe(false);
  for (const o of res.body.outputs) expect(typeof o.si).toBe('number'); // no infinity turned into null
  // Tc above Th stays a 400 naming the field.
  const bad = await request(app).post('/api/checks/carnot').send({ inputs: { Th: '300 K', Tc: '301 K' } }).expect(400);
  expect(Object.keys(bad.body.error.fields)).toEqual(['body.inputs.Tc']);
});

it('the artifact budget reads "3.6 degF" of rise as 2 K (NIST SP 811 (2008), B.9: 1 °F interval = 5/9 K)', async () => {
  const res = await request(app).post('/api/checks/artifact-budget').send({ inputs: { dT: '3.6 degF', k_drift: '1 uN/K' } }).expect(200);
  expect(res.body.inputs.dT.si).toBeCloseTo(2, 12);
  expect(outputs(res.body).F_thermal).toBeCloseTo(2e-6, 15);
  const list = await request(app).get('/api/checks').expect(200);
  const spec = list.body.checks.find((c: { name: string }) => c.name === 'artifact-budget').inputs.find((i: { name: string }) => i.name === 'dT');
  expect(spec.kind).toBe('difference');
});

it('a worksheet posted with a difference input is evaluated with it', async () => {
  const worksheet = {
    name: 'rise',
    title: 'A rise',
    inputs: [{ name: 'dT', label: 'Rise', unit: 'K', kind: 'difference', default: '2 degC' }],
    steps: [{ name: 'twice', label: 'Twice the rise', expression: '2 * dT', unit: 'K' }],
  };
  const res = await request(app).post('/api/worksheets/evaluate').send({ worksheet, values: { dT: '3.6 degF' } }).expect(200);
  expect(res.body.steps[0].value.si).toBeCloseTo(4, 12);
});

it('"100 PS" is 73 549.875 W (NIST SP 811 (2008), B.8: metric horsepower = 735.498 75 W)', async () => {
  const res = await request(app).post('/api/checks/break-even-speed').send({ inputs: { F: '1 N', P: '100 PS' } }).expect(200);
  expect(res.body.inputs.P.si).toBeCloseTo(73549.875, 6);
});
