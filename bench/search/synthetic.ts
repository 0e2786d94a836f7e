/**
 * A SYNTHETIC library for the search benchmark only (`npm run bench:search`): 10,000 invented
 * entries, generated deterministically from a seeded PRNG and a physics vocabulary (devices,
 * mechanisms, materials, laws, measurement artefacts), so that the index and the queries see text
 * shaped like the real library's. None of it is vetted content and none of it is ever loaded into a
 * real database: every title starts "Synthetic entry NNNNN:", every slug "synthetic-NNNNN-".
 * The model names ("Korvanel", "Tesmiro", …) are made up from syllables; they name no real person,
 * company or product.
 */
import type { EntryContent } from '../../shared/entries/schema';

/** mulberry32: a small, well-known 32-bit PRNG (deterministic for a given seed). */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export type Rand = () => number;
export const pick = <T>(rand: Rand, xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)];
export const int = (rand: Rand, lo: number, hi: number) => lo + Math.floor(rand() * (hi - lo + 1));
export function sample<T>(rand: Rand, xs: readonly T[], n: number): T[] {
  const copy = [...xs];
  for (let i = copy.length - 1; i > 0; i--) {
    const j = Math.floor(rand() * (i + 1));
    [copy[i], copy[j]] = [copy[j], copy[i]];
  }
  return copy.slice(0, Math.min(n, copy.length));
}

interface Family {
  mechanismClass: string;
  laws: string[];
  devices: string[];
  mechanisms: string[];
  /** Why it fails: sentences naming the law and the mechanism ({m}, {d} filled in). */
  failures: string[];
}

const FAMILIES: Family[] = [
  {
    mechanismClass: 'overbalanced-wheel',
    laws: ['energy'],
    devices: ['wheel', 'flywheel', 'pendulum wheel', 'rotor', 'chain drive', 'float wheel', 'water wheel', 'lever array'],
    mechanisms: ['shifting weights', 'swinging arms', 'rolling balls', 'mercury channels', 'sliding masses', 'buoyant floats', 'hinged levers', 'tilting trays'],
    failures: [
      'Over one full turn every {m} returns to the height it started at, so gravity does no net work on the {d}.',
      'The torque from the {m} averages to zero over a cycle: the centre of mass settles below the axle and the {d} stops.',
      'Lifting the {m} back up costs exactly the work their fall gave; conservation of energy leaves nothing for a load.',
      'Floats pushed down into the water cost the work that buoyancy later returns, so the {d} gains nothing per cycle.',
    ],
  },
  {
    mechanismClass: 'magnet-motor',
    laws: ['energy'],
    devices: ['magnet motor', 'magnet track', 'rotor', 'magnetic wheel', 'stator ring', 'linear magnet rail'],
    mechanisms: ['magnetic shielding', 'magnetic gradient', 'Halbach arrays', 'angled magnets', 'mu-metal gates', 'sticky-point cancellation', 'repelling stators'],
    failures: [
      'The field of fixed magnets is conservative: the work done on the {d} around any closed path is zero, whatever the {m}.',
      'Moving a shield in and out of the gap takes as much work as the {m} ever gives back, so the {d} cannot run a load.',
      'A static magnetic field stores energy but does not supply it; the {d} finds its sticky point and stays there.',
    ],
  },
  {
    mechanismClass: 'over-unity-circuit',
    laws: ['energy', 'charge'],
    devices: ['coil', 'capacitor bank', 'transformer', 'battery charger', 'pulse motor', 'solid-state generator', 'electrolysis cell', 'toroid'],
    mechanisms: ['radiant charging', 'back-EMF recovery', 'resonant feedback', 'spike capture', 'bifilar windings', 'pulsed electrolysis', 'hydrogen recycling', 'scalar waves'],
    failures: [
      'Kirchhoff\'s laws and conservation of energy hold in every {d}: the energy delivered over a cycle cannot exceed the energy drawn from the supply.',
      'Back-EMF returns at most the energy the field stored; the {m} recovers part of the input, never more than all of it.',
      'Charge is conserved in a closed loop: the {m} moves charge around the circuit but creates none.',
      'Splitting water takes at least the enthalpy that burning the hydrogen gives back, so a {d} on its own gas loses energy every cycle.',
    ],
  },
  {
    mechanismClass: 'single-reservoir-engine',
    laws: ['entropy', 'energy'],
    devices: ['heat engine', 'thermal generator', 'Brownian ratchet', 'vortex tube', 'ambient heat pump', 'thermoelectric plate', 'air engine'],
    mechanisms: ['ambient heat conversion', 'thermal diodes', 'ratchet rectification', 'vortex separation', 'asymmetric membranes', 'molecular sorting', 'infrared rectennas'],
    failures: [
      'The Kelvin–Planck statement of the second law forbids a cycle that turns heat from one reservoir entirely into work, and the {d} has only ambient air.',
      'Carnot efficiency with equal hot and cold temperatures is zero: the {m} cannot make work without a colder body.',
      'A ratchet at the same temperature as its surroundings jiggles both ways; the {m} gives no net rotation.',
    ],
  },
  {
    mechanismClass: 'vacuum-energy',
    laws: ['energy'],
    devices: ['zero-point generator', 'Casimir cell', 'vacuum energy module', 'quantum foam reactor', 'cavity generator'],
    mechanisms: ['zero-point extraction', 'Casimir plates', 'vacuum fluctuations', 'dynamical Casimir pumping', 'spacetime resonance'],
    failures: [
      'The vacuum is the ground state: nothing lies below it to fall into, so the {m} offers no continuous source.',
      'Casimir plates give a one-off attraction, like a spring that can close once; resetting them costs the work gained.',
    ],
  },
  {
    mechanismClass: 'enclosed-radiation',
    laws: ['linear-momentum', 'energy'],
    devices: ['resonant cavity thruster', 'microwave drive', 'tapered cavity', 'photon engine', 'laser cavity thruster'],
    mechanisms: ['asymmetric radiation pressure', 'tapered resonators', 'trapped microwaves', 'dielectric inserts', 'group velocity differences'],
    failures: [
      'Radiation kept inside a closed {d} pushes on every wall; the forces sum to zero and the total momentum is conserved.',
      'A net thrust from a sealed box would violate conservation of linear momentum and Newton\'s third law whatever the {m}.',
      'Momentum conservation follows from Noether\'s theorem and the symmetry of space; the {m} cannot escape it.',
    ],
  },
  {
    mechanismClass: 'internal-mass-motion',
    laws: ['linear-momentum'],
    devices: ['inertial drive', 'oscillation thruster', 'reactionless cart', 'shuttle drive', 'pendulum sled'],
    mechanisms: ['inertial pulses', 'oscillating masses', 'asymmetric strokes', 'sliding weights', 'slosh tanks'],
    failures: [
      'The centre of mass of a closed {d} cannot accelerate without an external force, however the {m} are timed.',
      'What a cart on a table gains from {m} it takes from friction with the floor, not from the {d} itself.',
    ],
  },
  {
    mechanismClass: 'gyroscopic-drive',
    laws: ['linear-momentum', 'angular-momentum'],
    devices: ['gyroscopic thruster', 'precession drive', 'spinning rotor sled', 'gyro lifter', 'twin gyroscope rig'],
    mechanisms: ['precessing gyroscopes', 'tilted rotors', 'forced precession', 'counter-rotating discs', 'nutation cycles'],
    failures: [
      'Precession exchanges angular momentum with whatever applies the torque; the {m} give the {d} no net linear momentum.',
      'Gyroscopic forces come in pairs inside the frame, so the {d} cannot push its own centre of mass.',
    ],
  },
  {
    mechanismClass: 'torque-free-spin',
    laws: ['angular-momentum'],
    devices: ['self-spinning body', 'free rotor', 'spin-up capsule', 'floating turntable'],
    mechanisms: ['internal rotors', 'moving masses', 'shape changes', 'flexing arms'],
    failures: [
      'A free {d} keeps its total angular momentum; the {m} can reorient it but cannot spin it up from rest.',
    ],
  },
  {
    mechanismClass: 'sideways-beams',
    laws: ['linear-momentum'],
    devices: ['beam thruster', 'ion deflector', 'plasma tube', 'electron beam drive', 'magnetic sail rig'],
    mechanisms: ['Lorentz force deflection', 'sideways beams', 'crossed fields', 'transverse magnetic forces'],
    failures: [
      'The Lorentz force on a deflected beam is matched by a force on the magnet; momentum moves into the field and the coils, and the {d} gains nothing.',
      'A Boris pusher simulation of the {m} conserves the total momentum of beam and field to rounding.',
    ],
  },
];

const MATERIALS = [
  'neodymium', 'ferrite', 'bismuth', 'mercury', 'copper', 'graphite', 'quartz', 'tourmaline', 'aluminium', 'titanium',
  'tungsten', 'lead', 'brass', 'steel', 'silicon', 'germanium', 'graphene', 'mica', 'cobalt', 'nickel', 'permalloy',
  'ceramic', 'beryllium', 'zinc', 'magnesium', 'sapphire', 'basalt', 'borosilicate', 'kevlar', 'carbon-fibre', 'bronze',
  'platinum', 'lithium', 'oak', 'acrylic', 'samarium', 'yttrium', 'manganin', 'constantan', 'invar',
];
const SHAPES = [
  'twin', 'counter-rotating', 'stacked', 'helical', 'toroidal', 'spiral', 'staggered', 'pulsed', 'sealed', 'open-frame',
  'vertical', 'horizontal', 'cascaded', 'tuned', 'asymmetric', 'nested', 'segmented', 'floating', 'submerged', 'tilted',
  'modular', 'compact', 'triple-stage', 'self-starting', 'dual-axis', 'hexagonal', 'octagonal', 'spherical', 'conical', 'layered',
];
const USES = [
  'household power', 'vehicle propulsion', 'satellite station keeping', 'desalination', 'grid backup', 'boat propulsion',
  'home heating', 'street lighting', 'water pumping', 'drone lift', 'battery charging', 'cold storage', 'farm irrigation',
  'data centre cooling', 'space launch', 'electric bicycles', 'off-grid cabins', 'hospital backup',
];
const VENUES = [
  'a workshop demonstration', 'a crowd-funding page', 'a trade-show stand', 'a video series', 'a patent application',
  'an investor brochure', 'a conference poster', 'a hobbyist forum', 'a press release', 'a licensing offer',
];
const ARTEFACTS = [
  'ground loops in the measuring leads', 'thermal drift of the sensors', 'battery recovery after a load is removed',
  'unmeasured input current', 'hidden springs wound before the demonstration', 'air currents from the room',
  'forces from the supply cables', 'outgassing of the adhesives', 'magnetostriction in the cores',
  'vibration coupled through the bench', 'aliasing in a slow meter', 'reactive power counted as real power',
  'probe loading of the circuit', 'electrostatic attraction to nearby walls', 'buoyancy changes from heating',
  'stored charge in the capacitors', 'clock drift in the logger', 'stray capacitance', 'room temperature swings',
  'evaporation from the reservoir', 'a mains supply hidden in the base', 'friction with the table',
];
const PITCHES = [
  'It is said to run {u} with no fuel and no supply once it has been started.',
  'The promoters show {v} in which the {d} turns for hours and a lamp stays lit.',
  'According to {v}, the {shape} {mat} {d} delivers more power than it takes in.',
  'The {name} design is offered for {u}, with a prototype said to have run for months.',
  'Buyers are told that {m} make the {d} independent of any outside source.',
  'The claim is that the {mat} parts make the {m} work where earlier attempts failed.',
];
const GENERAL = [
  'No measurement of the {d} has shown a closed cycle with a net gain once every input was counted.',
  'The claimed output should be compared with the energy stored in the device at the start.',
  'A sealed test with the whole apparatus on a balance or a calorimeter settles the question.',
  'The same objection applies to every variant, whatever the materials or the proportions.',
  'Each added part moves the loss somewhere else but never removes it.',
];
const FAKES = [
  'Apparent gains in the {d} come from {a}.',
  'Demonstrations of the {name} {d} can be explained by {a}.',
  'Careful tests usually find {a} or {a2}.',
];

const SYLLABLES = ['kor', 'van', 'tel', 'mir', 'sol', 'dra', 'ven', 'ith', 'bral', 'quen', 'zo', 'ar', 'pel', 'tor', 'gal', 'ris', 'ond', 'ul', 'esk', 'far', 'lum', 'nex', 'ost', 'rhe', 'sab', 'tiv', 'yor', 'wen', 'cal', 'dor', 'mek', 'sul'];

const fill = (t: string, vars: Record<string, string>) => t.replace(/\{(\w+)\}/g, (_, k: string) => vars[k] ?? k);
const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
const slugify = (s: string) => s.toLowerCase().normalize('NFD').replace(/\p{M}+/gu, '').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');

export interface SyntheticEntry {
  /** 1-based, also the database id. */
  n: number;
  slug: string;
  title: string;
  content: EntryContent;
}

export const SYNTHETIC_SEED = 20260601;

/** The n-th entry's number as it appears in titles and slugs (five digits: 00001 … 10000). */
export const label = (n: number) => String(n).padStart(5, '0');

export function generateLibrary(count: number, seed = SYNTHETIC_SEED): SyntheticEntry[] {
  const rand = prng(seed);
  // About one invented model name per four entries, so that names are distinctive but not unique.
  const names = new Set<string>();
  while (names.size < Math.ceil(count / 4)) {
    const parts = Array.from({ length: int(rand, 2, 3) }, () => pick(rand, SYLLABLES));
    names.add(cap(parts.join('')));
  }
  const nameList = [...names];
  const out: SyntheticEntry[] = [];
  for (let n = 1; n <= count; n++) {
    const fam = pick(rand, FAMILIES);
    const d = pick(rand, fam.devices);
    const m = pick(rand, fam.mechanisms);
    const mat = pick(rand, MATERIALS);
    const mat2 = pick(rand, MATERIALS);
    const shape = pick(rand, SHAPES);
    const name = pick(rand, nameList);
    const u = pick(rand, USES);
    const v = pick(rand, VENUES);
    const [a, a2] = sample(rand, ARTEFACTS, 2);
    const vars = { d, m, mat, shape, name, u, v, a, a2 };
    const title = `Synthetic entry ${label(n)}: the ${name} ${shape} ${mat} ${d} that claims ${u} from ${m}`.slice(0, 160);
    const laws = fam.laws.slice(0, int(rand, 1, fam.laws.length));
    const failures = sample(rand, fam.failures, int(rand, 1, fam.failures.length));
    const inBrief = `The ${name} ${d} is pitched as a ${shape} ${mat} machine that gives ${u} from ${m}. It cannot work. ${fill(failures[0], vars)}`;
    const content: EntryContent = {
      title,
      aliases: sample(rand, [`${name} ${d}`, `${mat} ${d}`, `${m} ${d}`, `${shape} ${d}`], int(rand, 1, 3)),
      mechanismClass: fam.mechanismClass,
      laws,
      inBrief,
      howItIsPitched: sample(rand, PITCHES, int(rand, 2, 3)).map((t) => fill(t, vars)).join(' ') + ` Parts are said to be made of ${mat2} and ${mat}.`,
      whyItFails: [...failures.map((t) => fill(t, vars)), ...sample(rand, GENERAL, int(rand, 1, 3)).map((t) => fill(t, vars))].join('\n\n'),
      worksheets: [],
      whatFakesTheEffect: sample(rand, FAKES, int(rand, 1, 2)).map((t) => fill(t, vars)).join(' '),
      repliesAndAnswers: [],
      questionsToAsk: [`Has the ${d} run a measured load in a sealed enclosure, with every input counted?`],
      cautions: '',
      related: [],
      sources: [],
    };
    out.push({ n, slug: `synthetic-${label(n)}-${slugify(`${name} ${d}`)}`.slice(0, 80).replace(/-$/, ''), title, content });
  }
  return out;
}

// ---------------------------------------------------------------------------------------------
// Queries

export interface BenchQuery {
  q: string;
  target: number;
  typo: boolean;
}

/** One typing error in a word: a dropped, swapped (adjacent) or substituted letter, never the first. */
export function typo(rand: Rand, word: string): string {
  const i = int(rand, 1, word.length - 1);
  const kind = int(rand, 0, 2);
  if (kind === 0) return word.slice(0, i) + word.slice(i + 1);
  if (kind === 1 && i < word.length - 1) return word.slice(0, i) + word[i + 1] + word[i] + word.slice(i + 2);
  const letters = 'abcdefghijklmnopqrstuvwxyz';
  let c = word[i];
  while (c === word[i]) c = pick(rand, letters.split(''));
  return word.slice(0, i) + c + word.slice(i + 1);
}

/**
 * `count` queries of 2–5 words, each drawn from the distinctive words of one target entry's title
 * (what a reader remembers: the model name, device, material, shape, use, mechanism; the rarest
 * first, df computed on normalised terms), chosen so that the target is the only entry whose title
 * holds every query word (a query two entries answer equally well measures nothing). A share of
 * the queries gets a typing error in one or two words of four letters or more.
 */
export function makeQueries(
  lib: SyntheticEntry[],
  normalise: (w: string) => string | null,
  count: number,
  typoShare: number,
  seed = SYNTHETIC_SEED + 1,
): BenchQuery[] {
  const rand = prng(seed);
  const words = (s: string) => s.match(/[\p{L}\p{N}]+(?:['’-][\p{L}\p{N}]+)*/gu) ?? [];
  const TEMPLATE = new Set(['that', 'claims', 'from', 'the']);
  const titleWords = (e: SyntheticEntry) => {
    const out = new Map<string, string>();
    for (const w of words(e.title.replace(/^Synthetic entry \d+:\s*/, ''))) {
      const t = normalise(w);
      if (t && t.length >= 3 && !TEMPLATE.has(w.toLowerCase()) && !out.has(t)) out.set(t, w.toLowerCase());
    }
    return out;
  };
  const titles = lib.map(titleWords);
  const postings = new Map<string, Set<number>>();
  titles.forEach((ws, i) => {
    for (const t of ws.keys()) {
      if (!postings.has(t)) postings.set(t, new Set());
      postings.get(t)!.add(i);
    }
  });
  const unique = (terms: string[]) => {
    let hits: number[] | null = null;
    for (const t of terms) {
      const p = postings.get(t)!;
      hits = hits ? hits.filter((i) => p.has(i)) : [...p];
    }
    return (hits ?? []).length === 1;
  };
  const out: BenchQuery[] = [];
  const typoCount = Math.round(count * typoShare);
  for (let k = 0; k < count; ) {
    const i = Math.floor(rand() * lib.length);
    const e = lib[i];
    const ranked = [...titles[i].entries()].sort((x, y) => postings.get(x[0])!.size - postings.get(y[0])!.size);
    const pool = ranked.slice(0, 6);
    const picked = sample(rand, pool, int(rand, 2, 5));
    // Too vague to name one entry: add the rarest words left, up to five.
    for (const w of ranked) {
      if (unique(picked.map(([t]) => t)) || picked.length >= 5) break;
      if (!picked.includes(w)) picked.push(w);
    }
    if (!unique(picked.map(([t]) => t))) continue;
    const chosen = sample(rand, picked, picked.length).map(([, w]) => w);
    const clean = chosen.join(' ');
    if (k < typoCount) {
      const long = chosen.map((w, i) => [w, i] as const).filter(([w]) => w.length >= 4);
      for (const [w, i] of sample(rand, long, int(rand, 1, 2))) chosen[i] = typo(rand, w);
    }
    const q = chosen.join(' ');
    // A typo query whose words were all too short to mistype is counted as clean.
    out.push({ q, target: e.n, typo: q !== clean });
    k++;
  }
  // Typo and clean queries interleaved, deterministically.
  return sample(prng(seed + 1), out, out.length);
}
