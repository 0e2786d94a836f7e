/**
 * Boris pusher throughput: the typed-array pusher of shared/checks/boris.ts against a naive
 * integrator that allocates a vector object for every intermediate of every step, doing the same work
 * (same particles, fields, time step and number of steps) in the same run.
 *
 *   npx tsx bench/boris.ts
 *
 * A top-level bench runner can `import { runBorisBench } from './boris'` and await its lines.
 */
import { borisAdvance, createBeam, launchAlongZ, type Beam, type BorisFields } from '../shared/checks/boris';
import { C_LIGHT, E_CHARGE, M_ELECTRON } from '../shared/checks/constants';

class Vec3 {
  constructor(
    readonly x: number,
    readonly y: number,
    readonly z: number,
  ) {}
  add(o: Vec3): Vec3 {
    return new Vec3(this.x + o.x, this.y + o.y, this.z + o.z);
  }
  scale(k: number): Vec3 {
    return new Vec3(this.x * k, this.y * k, this.z * k);
  }
  cross(o: Vec3): Vec3 {
    return new Vec3(this.y * o.z - this.z * o.y, this.z * o.x - this.x * o.z, this.x * o.y - this.y * o.x);
  }
  dot(o: Vec3): number {
    return this.x * o.x + this.y * o.y + this.z * o.z;
  }
}

interface NaiveParticle {
  x: Vec3;
  u: Vec3;
}

/** The same Boris step, written the obvious way: new vectors for every intermediate. */
function naiveAdvance(ps: NaiveParticle[], q: number, m: number, fields: BorisFields, dt: number, steps: number): void {
  const E0 = new Vec3(...(fields.E ?? [0, 0, 0]));
  const B = new Vec3(...(fields.B ?? [0, 0, 0]));
  const side = fields.sideE ? (q >= 0 ? fields.sideE : -fields.sideE) : 0;
  const h = (q * dt) / (2 * m);
  const gammaOf = (u: Vec3) => Math.sqrt(1 + u.dot(u) / (C_LIGHT * C_LIGHT));
  for (let k = 0; k < steps; k++) {
    for (const p of ps) {
      let E = E0;
      if (side !== 0) {
        const up = Math.hypot(p.u.x, p.u.y);
        E = E.add(up > 0 ? new Vec3(p.u.x / up, p.u.y / up, 0).scale(side) : new Vec3(side, 0, 0));
      }
      const uMinus = p.u.add(E.scale(h));
      const t = B.scale(h / gammaOf(uMinus));
      const s = t.scale(2 / (1 + t.dot(t)));
      const uPrime = uMinus.add(uMinus.cross(t));
      const uPlus = uMinus.add(uPrime.cross(s));
      const u = uPlus.add(E.scale(h));
      p.u = u;
      p.x = p.x.add(u.scale(dt / gammaOf(u)));
    }
  }
}

function naiveFromBeam(beam: Beam): NaiveParticle[] {
  const ps: NaiveParticle[] = [];
  for (let i = 0; i < beam.count; i++) {
    ps.push({
      x: new Vec3(beam.x[3 * i], beam.x[3 * i + 1], beam.x[3 * i + 2]),
      u: new Vec3(beam.u[3 * i], beam.u[3 * i + 1], beam.u[3 * i + 2]),
    });
  }
  return ps;
}

export interface BorisBenchOptions {
  particles?: number;
  steps?: number;
  repeats?: number;
  /** Print each line as it is made (default true). */
  print?: boolean;
}

/** Runs the comparison and returns (and by default prints) its lines. */
export async function runBorisBench(opts: BorisBenchOptions = {}): Promise<string[]> {
  const n = opts.particles ?? 1000;
  const steps = opts.steps ?? 2000;
  const repeats = opts.repeats ?? 3;
  const print = opts.print ?? true;
  const lines: string[] = [];
  const say = (s: string) => {
    lines.push(s);
    if (print) console.log(s);
  };
  const fields: BorisFields = { E: [2e5, -1e5, 0], B: [0, 0, 0.2], sideE: 1e6 };
  const dt = 1e-12;
  const fresh = () => {
    const b = createBeam(n, -E_CHARGE, M_ELECTRON);
    launchAlongZ(b, 10, 0.01);
    return b;
  };
  const work = n * steps;

  // warm-up, so both paths are compiled before they are timed
  borisAdvance(fresh(), fields, dt, 200);
  naiveAdvance(naiveFromBeam(fresh()), -E_CHARGE, M_ELECTRON, fields, dt, 50);

  let bestTyped = Infinity;
  let typedBeam = fresh();
  for (let r = 0; r < repeats; r++) {
    typedBeam = fresh();
    const t0 = performance.now();
    borisAdvance(typedBeam, fields, dt, steps);
    bestTyped = Math.min(bestTyped, performance.now() - t0);
  }
  let bestNaive = Infinity;
  let naive = naiveFromBeam(fresh());
  for (let r = 0; r < repeats; r++) {
    naive = naiveFromBeam(fresh());
    const t0 = performance.now();
    naiveAdvance(naive, -E_CHARGE, M_ELECTRON, fields, dt, steps);
    bestNaive = Math.min(bestNaive, performance.now() - t0);
  }
  // Same work: the two final states agree to round-off.
  let maxDiff = 0;
  for (let i = 0; i < n; i++) {
    const u = naive[i].u;
    const du = Math.hypot(u.x - typedBeam.u[3 * i], u.y - typedBeam.u[3 * i + 1], u.z - typedBeam.u[3 * i + 2]);
    maxDiff = Math.max(maxDiff, du / Math.hypot(u.x, u.y, u.z));
  }
  const typedRate = work / (bestTyped / 1000);
  const naiveRate = work / (bestNaive / 1000);
  const fmtRate = (r: number) => `${(r / 1e6).toFixed(2)} million particle-steps/s`;
  say(`Boris pusher, ${n} particles × ${steps} steps (${work.toLocaleString('en')} particle-steps), best of ${repeats}, one core:`);
  say(`  typed arrays (shared/checks/boris.ts): ${bestTyped.toFixed(1)} ms, ${fmtRate(typedRate)}`);
  say(`  naive, a vector object per intermediate: ${bestNaive.toFixed(1)} ms, ${fmtRate(naiveRate)}`);
  say(`  ratio typed/naive: ${(typedRate / naiveRate).toFixed(2)}×; final momenta agree to ${maxDiff.toExponential(1)} relative`);
  return lines;
}

if (typeof require !== 'undefined' && require.main === module) {
  runBorisBench().catch((e) => {
    console.error(e);
    process.exitCode = 1;
  });
}
