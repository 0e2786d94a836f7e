import fc from 'fast-check';
import {
  borisAdvance,
  createBeam,
  createPzTracker,
  gammaOfU,
  launchAlongZ,
  runBoris,
  uFromGamma,
  type Beam,
  type BorisFields,
} from './boris';
import { C_LIGHT, E_CHARGE, M_ELECTRON, M_PROTON } from './constants';
import { gyroFrequency, gyroRadius } from './formulas';

/** A beam of one particle with the given u = γv (m/s). */
function single(q: number, m: number, u: [number, number, number]): Beam {
  const b = createBeam(1, q, m);
  b.u.set(u);
  return b;
}

/** Least-squares circle through points (Kåsa fit): x² + y² = 2ax + 2by + c. Returns the radius. */
function fitCircleRadius(xs: number[], ys: number[]): number {
  // Centre the data first for conditioning.
  const mx = xs.reduce((s, v) => s + v, 0) / xs.length;
  const my = ys.reduce((s, v) => s + v, 0) / ys.length;
  let Sxx = 0, Sxy = 0, Syy = 0, Sx = 0, Sy = 0, Sz = 0, Szx = 0, Szy = 0;
  const n = xs.length;
  for (let i = 0; i < n; i++) {
    const x = xs[i] - mx;
    const y = ys[i] - my;
    const z = x * x + y * y;
    Sxx += x * x; Sxy += x * y; Syy += y * y; Sx += x; Sy += y; Sz += z; Szx += z * x; Szy += z * y;
  }
  // Normal equations for [2a, 2b, c]: [[Sxx, Sxy, Sx], [Sxy, Syy, Sy], [Sx, Sy, n]] p = [Szx, Szy, Sz]
  const A = [
    [Sxx, Sxy, Sx, Szx],
    [Sxy, Syy, Sy, Szy],
    [Sx, Sy, n, Sz],
  ];
  for (let c = 0; c < 3; c++) {
    let piv = c;
    for (let r = c + 1; r < 3; r++) if (Math.abs(A[r][c]) > Math.abs(A[piv][c])) piv = r;
    [A[c], A[piv]] = [A[piv], A[c]];
    for (let r = 0; r < 3; r++) {
      if (r === c) continue;
      const f = A[r][c] / A[c][c];
      for (let k = c; k < 4; k++) A[r][k] -= f * A[c][k];
    }
  }
  const a = A[0][3] / A[0][0] / 2;
  const b = A[1][3] / A[1][1] / 2;
  const c = A[2][3] / A[2][2];
  return Math.sqrt(c + a * a + b * b);
}

/** Gyration of one particle in a uniform B along z: measured period and orbit radius. */
function measureGyration(q: number, m: number, gamma: number, pitch: number, B: number, stepsPerTurn: number, turns: number) {
  const u = uFromGamma(gamma);
  const uPerp = u * Math.sin(pitch);
  const beam = single(q, m, [uPerp, 0, u * Math.cos(pitch)]);
  const omega = gyroFrequency(q, B, m, gamma); // |q|B/(γm), the textbook value under test
  const dt = (2 * Math.PI) / omega / stepsPerTurn;
  const fields: BorisFields = { B: [0, 0, B] };
  const steps = stepsPerTurn * turns;
  const crossings: number[] = [];
  const xs: number[] = [];
  const ys: number[] = [];
  let prevUy = beam.u[1];
  for (let k = 1; k <= steps; k++) {
    borisAdvance(beam, fields, dt, 1);
    const uy = beam.u[1];
    if (prevUy < 0 && uy >= 0) {
      // linear interpolation of the upward zero crossing of u_y between steps k−1 and k
      crossings.push((k - 1 + -prevUy / (uy - prevUy)) * dt);
    }
    prevUy = uy;
    xs.push(beam.x[0]);
    ys.push(beam.x[1]);
  }
  const period = (crossings[crossings.length - 1] - crossings[0]) / (crossings.length - 1);
  return { period, radius: fitCircleRadius(xs, ys), omega, dt, pPerp: m * uPerp, gammaEnd: gammaOfU(beam.u[0], beam.u[1], beam.u[2]) };
}

describe('Boris pusher against the textbook gyration in a uniform magnetic field', () => {
  // Reference: a charge in a uniform static B gyrates at ω = |q|B/(γm) on a circle of radius
  // r = p⊥/(|q|B), with γ constant (Jackson, Classical Electrodynamics, 3rd ed., §12.2 — from memory;
  // SI form). The Boris rotation turns u by 2·atan(ωΔt/2) per step instead of ωΔt (Birdsall &
  // Langdon, ch. 4, §4-4 — from memory), so the measured period is longer by (ωΔt)²/12 to leading order and
  // the orbit's vertices sit on a circle larger by (ωΔt)²/8 (polygon with side v⊥Δt, turning 2·atan(ωΔt/2)).
  // Tolerances are twice those leading-order errors, plus round-off.
  const cases = [
    { name: 'electron, γ = 5, pitch 60°, 1 T', q: -E_CHARGE, m: M_ELECTRON, gamma: 5, pitch: Math.PI / 3, B: 1 },
    { name: 'proton, γ = 1.5, pitch 90°, 2 T', q: E_CHARGE, m: M_PROTON, gamma: 1.5, pitch: Math.PI / 2, B: 2 },
  ];
  for (const c of cases) {
    test(`${c.name}: period and radius within the stated Δt-dependent tolerance`, () => {
      const g = measureGyration(c.q, c.m, c.gamma, c.pitch, c.B, 400, 20);
      const wdt = g.omega * g.dt; // 2π/400
      const periodTextbook = (2 * Math.PI) / g.omega;
      const radiusTextbook = gyroRadius(g.pPerp, c.q, c.B);
      expect(Math.abs(g.period / periodTextbook - 1)).toBeLessThanOrEqual((wdt * wdt) / 6 + 1e-9);
      expect(Math.abs(g.radius / radiusTextbook - 1)).toBeLessThanOrEqual((wdt * wdt) / 4 + 1e-9);
      // The period error is the Boris phase error, not noise: it is positive and close to (ωΔt)²/12.
      expect(g.period / periodTextbook - 1).toBeGreaterThan(0.5 * ((wdt * wdt) / 12));
    });
  }

  test('the errors shrink as Δt² (second-order scheme): halving Δt cuts them about fourfold', () => {
    const c = cases[0];
    const coarse = measureGyration(c.q, c.m, c.gamma, c.pitch, c.B, 100, 20);
    const fine = measureGyration(c.q, c.m, c.gamma, c.pitch, c.B, 200, 20);
    const T = (2 * Math.PI) / coarse.omega;
    const r = gyroRadius(coarse.pPerp, c.q, c.B);
    const periodRatio = (coarse.period / T - 1) / (fine.period / T - 1);
    const radiusRatio = (coarse.radius / r - 1) / (fine.radius / r - 1);
    expect(periodRatio).toBeGreaterThan(3.5);
    expect(periodRatio).toBeLessThan(4.5);
    expect(radiusRatio).toBeGreaterThan(3.5);
    expect(radiusRatio).toBeLessThan(4.5);
  });

  test('a pure magnetic field does no work: γ constant to 1e-12 over 100,000 steps', () => {
    // Reference: the magnetic force q v × B is perpendicular to v, so it does no work (Jackson §12.2, from memory).
    const beam = createBeam(4, -E_CHARGE, M_ELECTRON);
    launchAlongZ(beam, 20, 0.7);
    const g0 = Array.from({ length: 4 }, (_, i) => gammaOfU(beam.u[3 * i], beam.u[3 * i + 1], beam.u[3 * i + 2]));
    const omega = gyroFrequency(-E_CHARGE, 3, M_ELECTRON, 20);
    borisAdvance(beam, { B: [0.4, -0.2, 3] }, 0.05 / omega, 100_000);
    for (let i = 0; i < 4; i++) {
      const g = gammaOfU(beam.u[3 * i], beam.u[3 * i + 1], beam.u[3 * i + 2]);
      expect(Math.abs(g / g0[i] - 1)).toBeLessThanOrEqual(1e-12);
    }
  });
});

describe('sideways forces only: p_z stays, γ rises, v_z falls', () => {
  test('100,000 steps with the steered sideways field, a rotating transverse field and B along z', () => {
    const beam = createBeam(4, -E_CHARGE, M_ELECTRON);
    launchAlongZ(beam, 10, 0.01);
    const fields: BorisFields = { B: [0, 0, 0.05], sideE: 2e6, rotE: 5e5, rotOmega: 3e9, rotPhase: 0.3 };
    const steps = 100_000;
    const run = runBoris(beam, fields, { dt: 2e-13, steps });
    const last = run.time.length - 1;
    expect(run.time.length).toBeLessThanOrEqual(2000);
    expect(run.time[last]).toBeCloseTo(steps * 2e-13, 20);
    expect(run.pzDriftMaxRel).toBeLessThanOrEqual(1e-9);
    expect(Math.abs(run.pz[last] / run.pz[0] - 1)).toBeLessThanOrEqual(1e-9);
    expect(run.gamma[last]).toBeGreaterThan(1.2 * run.gamma[0]);
    expect(run.vz[last]).toBeLessThan(0.95 * run.vz[0]);
    // p_z = γ m v_z holds on the record (consistency of the three series)
    expect(Math.abs((run.gamma[last] * M_ELECTRON * run.vz[last]) / run.pz[last] - 1)).toBeLessThan(1e-12);
  });

  test('uniform transverse E: hyperbolic motion from rest, u_x = qEt/m and x = (mc²/qE)(√(1 + (qEt/mc)²) − 1)', () => {
    // Reference: relativistic motion under a constant force (hyperbolic motion; Jackson §12.3 /
    // Rindler, Relativity: Special, General and Cosmological, §3.8 — from memory). The Boris kicks give
    // u_x exactly; the position, advanced with the end-of-step velocity, carries a first-order offset of
    // at most v·Δt, so it is checked to 1/steps relative.
    const E = 1e6;
    const beam = single(E_CHARGE, M_PROTON, [0, 0, 0]);
    const steps = 10_000;
    const t = 1e-5;
    borisAdvance(beam, { E: [E, 0, 0] }, t / steps, steps);
    const a = (E_CHARGE * E) / M_PROTON;
    expect(beam.u[0] / (a * t) - 1).toBeCloseTo(0, 10);
    const xExact = ((C_LIGHT * C_LIGHT) / a) * (Math.sqrt(1 + ((a * t) / C_LIGHT) ** 2) - 1);
    expect(Math.abs(beam.x[0] / xExact - 1)).toBeLessThanOrEqual(1 / steps);
    expect(beam.u[2]).toBe(0);
  });

  test('with E_z present the change of p_z equals the impulse q E_z t', () => {
    // Reference: the z component of the Lorentz force q(E + v × B) is q E_z when B is along z, so
    // dp_z/dt = q E_z (Newton's second law with the Lorentz force, Jackson §12.1 — from memory).
    const q = E_CHARGE;
    const beam = createBeam(6, q, M_PROTON);
    launchAlongZ(beam, 3, 0.2);
    const pz0 = Array.from({ length: 6 }, (_, i) => M_PROTON * beam.u[3 * i + 2]);
    const Ez = -4e7;
    const dt = 1e-11;
    const steps = 20_000;
    const run = runBoris(beam, { E: [1e5, 0, Ez], B: [0, 0, 1.5], sideE: 3e6 }, { dt, steps });
    const impulse = q * Ez * dt * steps;
    expect(run.zForce * dt * steps).toBeCloseTo(impulse, 30);
    for (let i = 0; i < 6; i++) {
      const dpz = M_PROTON * beam.u[3 * i + 2] - pz0[i];
      const scale = Math.max(Math.abs(pz0[i]), Math.abs(impulse));
      expect(Math.abs(dpz - impulse) / scale).toBeLessThanOrEqual(1e-9);
    }
    expect(run.pzDriftMaxRel).toBeLessThanOrEqual(1e-9);
    // the impulse is substantial, so the check is not vacuous
    expect(Math.abs(impulse)).toBeGreaterThan(0.1 * Math.abs(pz0[0]));
  });

  test('a transverse B does push along z (the tracker sees it): the z-force-free claim is not automatic', () => {
    const beam = createBeam(2, -E_CHARGE, M_ELECTRON);
    launchAlongZ(beam, 5, 0.3);
    const run = runBoris(beam, { B: [0.5, 0, 0] }, { dt: 1e-13, steps: 2000 });
    expect(run.pzDriftMaxRel).toBeGreaterThan(1e-3);
  });

  test('property: random fields with no force along z keep p_z constant to 1e-9 relative', () => {
    fc.assert(
      fc.property(
        fc.record({
          ex: fc.double({ min: -1e7, max: 1e7, noNaN: true }),
          ey: fc.double({ min: -1e7, max: 1e7, noNaN: true }),
          bz: fc.double({ min: -20, max: 20, noNaN: true }),
          side: fc.double({ min: 0, max: 1e7, noNaN: true }),
          rotE: fc.double({ min: 0, max: 1e7, noNaN: true }),
          rotOmega: fc.double({ min: 0, max: 1e11, noNaN: true }),
          gamma0: fc.double({ min: 1.0001, max: 1e4, noNaN: true }),
          theta0: fc.double({ min: 0, max: 1.5, noNaN: true }),
          proton: fc.boolean(),
          positive: fc.boolean(),
          dt: fc.double({ min: 1e-14, max: 1e-10, noNaN: true }),
        }),
        (r) => {
          const m = r.proton ? M_PROTON : M_ELECTRON;
          const beam = createBeam(3, r.positive ? E_CHARGE : -E_CHARGE, m);
          launchAlongZ(beam, r.gamma0, r.theta0);
          const run = runBoris(beam, { E: [r.ex, r.ey, 0], B: [0, 0, r.bz], sideE: r.side, rotE: r.rotE, rotOmega: r.rotOmega }, { dt: r.dt, steps: 300 });
          return run.pzDriftMaxRel <= 1e-9;
        },
      ),
      { numRuns: 200 },
    );
  });

  test('property: with a random E_z, Δp_z = q E_z t to 1e-9 relative', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e7, max: 1e7, noNaN: true }),
        fc.double({ min: -20, max: 20, noNaN: true }),
        fc.double({ min: 1.001, max: 1e3, noNaN: true }),
        fc.double({ min: 1e-13, max: 1e-10, noNaN: true }),
        (ez, bz, gamma0, dt) => {
          const beam = createBeam(2, -E_CHARGE, M_ELECTRON);
          launchAlongZ(beam, gamma0, 0.1);
          const pz0 = M_ELECTRON * beam.u[2];
          const steps = 500;
          runBoris(beam, { E: [2e5, 0, ez], B: [0, 0, bz], sideE: 1e6 }, { dt, steps });
          const impulse = -E_CHARGE * ez * dt * steps;
          const scale = Math.max(Math.abs(pz0), Math.abs(impulse));
          return Math.abs(M_ELECTRON * beam.u[2] - pz0 - impulse) / scale <= 1e-9;
        },
      ),
      { numRuns: 200 },
    );
  });

  test('the tracker measures against p_z0 + q E_z t from the moment it is made', () => {
    const beam = createBeam(1, E_CHARGE, M_PROTON);
    launchAlongZ(beam, 2, 0);
    const fields: BorisFields = { E: [0, 0, 1e6] };
    borisAdvance(beam, fields, 1e-12, 100);
    const tr = createPzTracker(beam, fields, 1e-10);
    borisAdvance(beam, fields, 1e-12, 100, tr);
    expect(tr.maxRel).toBeLessThanOrEqual(1e-12);
  });
});
