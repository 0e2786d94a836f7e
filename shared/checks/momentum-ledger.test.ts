import fc from 'fast-check';
import { G0 } from './constants';
import { CheckRangeError } from './errors';
import { LEDGER_TOLERANCE, momentumLedger, runMomentumLedger, type LedgerParams } from './momentum-ledger';

const base: LedgerParams = {
  M: 1,
  m: 0.25,
  F_peak: 5,
  period: 0.5,
  duty: 0.1,
  mu_s: 0.3,
  mu_k: 0.25,
  cycles: 10,
  steps_per_cycle: 2000,
};

/**
 * Creep per cycle of a frame on a table with Coulomb friction, worked by hand (elementary Newtonian
 * mechanics with static and kinetic friction, e.g. Halliday, Resnick & Walker, Fundamentals of
 * Physics, ch. 6 — from memory). The frame starts each cycle at rest; the hard push F > μs N for τ1
 * accelerates it at (F − μk N)/M; the gentle return Fg ≤ μs N plus kinetic friction then stops it at
 * (Fg + μk N)/M (assumed to happen within the return phase), and static friction holds it.
 */
function creepPerCycleByHand(p: LedgerParams): number {
  const N = (p.M + p.m) * G0;
  const tau1 = p.duty * p.period;
  const Fg = (p.F_peak * p.duty) / (1 - p.duty);
  const a1 = (p.F_peak - p.mu_k * N) / p.M;
  const V1 = a1 * tau1;
  const a2 = (Fg + p.mu_k * N) / p.M;
  expect(V1 / a2).toBeLessThan((1 - p.duty) * p.period); // it stops within the return phase
  return 0.5 * a1 * tau1 * tau1 + (V1 * V1) / (2 * a2);
}

describe('momentum ledger: frictionless support', () => {
  test('total momentum and centre of mass stay put while the parts swing', () => {
    const r = runMomentumLedger(base);
    expect(r.frictionless.pDriftMax / r.strokeImpulse).toBeLessThanOrEqual(LEDGER_TOLERANCE);
    expect(Math.abs(r.frictionless.comDisplacement)).toBeLessThanOrEqual(1e-9 * r.frictionless.stroke);
    // the parts do move: the frame's momentum swings by about one stroke's impulse
    const pf = r.frictionless.pFrame;
    expect(Math.max(...pf) - Math.min(...pf)).toBeGreaterThan(0.9 * r.strokeImpulse);
    expect(r.frictionless.stroke).toBeGreaterThan(0.01);
    // equal and opposite impulses per cycle in the discrete run: n1·F = n2·Fg
    expect(r.n1 * base.F_peak).toBeCloseTo(r.n2 * r.F_return, 12);
    expect(r.frictionless.time.length).toBeLessThanOrEqual(2000);
  });

  test('property: random masses and force profiles keep the total momentum and CoM velocity constant', () => {
    fc.assert(
      fc.property(
        fc.record({
          M: fc.double({ min: 0.01, max: 100, noNaN: true }),
          m: fc.double({ min: 0.01, max: 100, noNaN: true }),
          F_peak: fc.double({ min: 0.001, max: 1000, noNaN: true }),
          period: fc.double({ min: 0.001, max: 10, noNaN: true }),
          duty: fc.double({ min: 0.01, max: 0.99, noNaN: true }),
          cycles: fc.integer({ min: 1, max: 5 }),
          steps_per_cycle: fc.integer({ min: 20, max: 400 }),
        }),
        (p) => {
          const r = runMomentumLedger({ ...p, mu_s: 0.3, mu_k: 0.2 });
          const fl = r.frictionless;
          if (fl.pDriftMax > LEDGER_TOLERANCE * r.strokeImpulse) return false;
          // centre-of-mass velocity constant (zero): the CoM never leaves its start by more than round-off
          for (let i = 0; i < fl.xCom.length; i++) {
            if (Math.abs(fl.xCom[i] - fl.xCom[0]) > 1e-9 * fl.stroke) return false;
          }
          return true;
        },
      ),
      { numRuns: 150 },
    );
  });
});

describe('momentum ledger: on a table with Coulomb friction', () => {
  test('the frame creeps forward by the hand-worked amount per cycle', () => {
    // Semi-implicit Euler overshoots the slide of the hard phase by ½V1Δt and undershoots the stopping
    // slide by ½V1Δt; the first-order errors cancel, leaving O(Δt²) and the step in which the frame
    // stops. Allowed: 1e-4 relative at 2000 steps per cycle (200 in the hard phase), 1e-5 at 20 000
    // (observed about 2e-6 and 6e-8).
    const r = runMomentumLedger(base);
    const expected = creepPerCycleByHand(base) * base.cycles;
    expect(r.friction.creep).toBeGreaterThan(0);
    expect(Math.abs(r.friction.creep / expected - 1)).toBeLessThanOrEqual(1e-4);
    const fine = runMomentumLedger({ ...base, cycles: 2, steps_per_cycle: 20_000 });
    expect(Math.abs(fine.friction.creep / (creepPerCycleByHand(base) * 2) - 1)).toBeLessThanOrEqual(1e-5);
  });

  test('no creep when the hard push never breaks the static grip', () => {
    const grip = base.mu_s * (base.M + base.m) * G0;
    const r = runMomentumLedger({ ...base, F_peak: 0.99 * grip });
    expect(r.friction.creep).toBe(0);
  });

  test('the slider keeps pace with the frame (no net travel along its track) and the momentum returns each run', () => {
    const r = runMomentumLedger(base);
    expect(Math.abs(r.friction.sliderTravel)).toBeLessThanOrEqual(1e-9 * r.frictionless.stroke + 1e-12);
    // The table's friction impulses cancel over whole cycles (frame at rest, slider back to its speed),
    // yet the frame has moved: the creep comes from when the table pushes, not from a net impulse.
    const pt = r.friction.pTotal;
    expect(Math.abs(pt[pt.length - 1] - pt[0])).toBeLessThanOrEqual(1e-9 * r.strokeImpulse);
  });

  test('property: creep is forward whenever the push breaks the grip and the return does not', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1.2, max: 5, noNaN: true }),
        fc.double({ min: 0.05, max: 0.3, noNaN: true }),
        fc.double({ min: 0.1, max: 1, noNaN: true }),
        (over, duty, muRatio) => {
          const mu_s = 0.4;
          const grip = mu_s * (base.M + base.m) * G0;
          const F_peak = over * grip;
          const Fg = (F_peak * duty) / (1 - duty);
          fc.pre(Fg < 0.95 * grip);
          const r = runMomentumLedger({ ...base, F_peak, duty, mu_s, mu_k: muRatio * mu_s, cycles: 3, steps_per_cycle: 500 });
          return r.friction.creep > 0;
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('momentum-ledger check', () => {
  const si = { ...base } as unknown as Record<string, number>;
  test('reports the drift, the creep and three plots', () => {
    const res = momentumLedger.run(si);
    expect(res.verdict.holds).toBe(true);
    const out = Object.fromEntries(res.outputs.map((o) => [o.name, o.si]));
    expect(out.creep).toBeCloseTo(creepPerCycleByHand(base) * 10, 3);
    expect(out.p_drift_rel).toBeLessThanOrEqual(LEDGER_TOLERANCE);
    expect(res.plots.map((p) => p.name)).toEqual(['momentum-frictionless', 'momentum-friction', 'centre-of-mass']);
    expect(res.verdict.message).toMatch(/creeps/);
  });

  test('bad figures name the field', () => {
    expect(() => momentumLedger.run({ ...si, mu_k: 0.5 })).toThrow(CheckRangeError);
    try {
      momentumLedger.run({ ...si, mu_k: 0.5 });
    } catch (e) {
      expect((e as CheckRangeError).field).toBe('mu_k');
    }
    try {
      momentumLedger.run({ ...si, cycles: 1000, steps_per_cycle: 100_000 });
    } catch (e) {
      expect((e as CheckRangeError).field).toBe('steps_per_cycle');
    }
    expect.assertions(3);
  });
});
