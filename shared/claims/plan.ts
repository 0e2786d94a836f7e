/**
 * Which standard checks a claim's figures allow, and running them (issue 11, item 2): verdicts a
 * referee can stand behind.
 *
 *  - A check runs only on figures the text gives (or derives from them: a power from a current
 *    and a voltage, an output from an excess over the input, energies from powers over a stated
 *    run). A check that would need a figure the text does not give is listed in `needs` with the
 *    words of what is missing — never run on the check's example default and reported as a result.
 *    What a check takes that no claim states (a heat-out term of 0 in the first-law ledger, a
 *    claimed value of 0 for "not claimed") is said in its assumptions.
 *  - Ranges: each range a check uses is tried at both ends, and the check reports the ends most
 *    favourable to the claim (the least severe result), saying so.
 *  - The checks and when they apply:
 *     · photon-bound: a thrust (or thrust per power) and a power, for a device the text or the
 *       matched entry's class says throws out no propellant; break-even-speed too when the text
 *       gives a speed of the craft;
 *     · rocket-equation: an exhaust speed or Isp, the masses (wet and dry, or either with the
 *       propellant), and a claimed Δv when there is one;
 *     · carnot: two temperatures (or one and a difference) with a heat engine's efficiency or a
 *       heat pump's or refrigerator's COP;
 *     · first-law: energies (or powers) in and out; an input of 0 for a self-running device; an
 *       efficiency or gain above 1 that is not a heat pump's COP nor a quantum efficiency;
 *     · light-speed: a stated speed of at least 1 % of c.
 *  - A quantum efficiency above 100 % counts particles, not energy: no check, a note.
 *
 * Every run goes through runCheck, the same function as the check screens.
 */
import { checks } from '../checks';
import { C_LIGHT } from '../checks/constants';
import { CheckInputError, runCheck, type CheckRun } from '../checks/run';
import type { CheckName } from '../checks/types';
import {
  HEAT_ENGINE_WORDS,
  HEAT_PUMP_WORDS,
  COOLING_MACHINE_WORDS,
  PROPELLANT_FREE_WORDS,
  PROPELLANT_WORDS,
} from './figures-vocabulary';
import { formatPrint, printText } from './print';
import type { ClaimCheckNeed, ClaimCheckRun, Figure, FigureKind, PlannedCheck } from './types';

/** Mechanism classes (content/taxonomy.yml) whose devices throw out nothing. */
export const PROPELLANT_FREE_CLASSES = ['propellant-free-thrust', 'internal-mass-motion', 'enclosed-radiation', 'sideways-beams', 'gyroscopic-drive'];
/** Mechanism classes of machines said to give more energy than they take. */
export const OVER_UNITY_CLASSES = ['over-unity', 'overbalanced-wheel', 'magnet-motor', 'over-unity-circuit', 'vacuum-energy'];

/** The law each check rests on, in words. */
export const CHECK_LAW: Record<CheckName, string> = {
  'photon-bound': 'conservation of linear momentum',
  'break-even-speed': 'conservation of energy',
  carnot: 'the second law of thermodynamics',
  'first-law': 'conservation of energy (the first law of thermodynamics)',
  'momentum-ledger': 'conservation of linear momentum',
  'sideways-beam': 'conservation of linear momentum',
  'artifact-budget': 'conservation of linear momentum',
  'rocket-equation': 'conservation of linear momentum (the rocket equation)',
  'light-speed': 'special relativity',
  'faraday-yield': "conservation of charge (Faraday's law of electrolysis)",
  'nuclear-signature': 'conservation of energy (chemistry gives a few electronvolts per atom; more needs nuclear reactions and their radiation)',
  'road-load': 'conservation of energy',
  'light-converter-limits': 'the second law of thermodynamics (the radiative limits of light conversion)',
  landauer: "the second law of thermodynamics (Landauer's bound)",
};

/**
 * Speeds from which the light-speed check is run: 100 km/s, beyond anything on or near the Earth
 * (orbital and escape speeds are about 8–11 km/s), so that ordinary speeds do not clutter the result.
 * A rule of thumb (common practice, no source).
 */
export const LIGHT_SPEED_FROM = 100_000;
/** From 1 km/s, a speed said of a craft itself (not an exhaust or a speed change) is also checked: no wind, train or runner goes so fast. Common practice, no source. */
export const SPACE_SPEED_FROM = 1_000;

/** What the planner knows beyond the figures: the text, and the classes of the entries it matched. */
export interface PlanContext {
  text?: string;
  /** Mechanism class slugs of the matched entries (the best first). */
  classes?: string[];
}

const compile = (words: readonly string[]) => new RegExp(`(?<!\\p{L})(?:${words.join('|')})(?!\\p{L})`, 'iu');
const PROPELLANT_FREE_RE = compile(PROPELLANT_FREE_WORDS);
const PROPELLANT_FREE_ALL_RE = new RegExp(PROPELLANT_FREE_RE.source, 'giu');
const PROPELLANT_RE = compile(PROPELLANT_WORDS);
const HEAT_ENGINE_RE = compile(HEAT_ENGINE_WORDS);
const HEAT_PUMP_RE = compile(HEAT_PUMP_WORDS);
const COOLING_RE = compile(COOLING_MACHINE_WORDS);
const OVER_UNITY_RE =
  /(?<!\p{L})(?:power conversion efficiency|wall-?plug efficiency|conversion efficiency|electrical efficiency|over-?unity|overunity|free energy|self-?running|self-?sustaining|self-?charging|perpetual|more (?:energy|power) (?:out )?than|generators?|alternators?|magnet(?:ic)? motors?|motors?|output exceeds|exceeds (?:the|its) input|circuits?|coils?|lamps?|LEDs?|bulbs?|(?:solar|fuel|photovoltaic) cells?|panels?|batter(?:y|ies)|zero-?point|ZPE|vacuum|electrolys\w*|HHO|oxyhydrogen|wheels?|amplifiers?|converters?|inverters?|electrical (?:output|energy|power))(?!\p{L})/iu;
const HEAT_SOURCE_RE = /(?<!\p{L})(?:(?:outdoor|outside|ambient) air|ground loop|brine|well water|borehole|source temperature|outdoors?)(?!\p{L})/iu;
const COMPRESSOR_RE = /(?<!\p{L})(?:compressors?|vapou?r[- ]compression)(?!\p{L})/iu;
/** A device whose output is heat (a solar collector, a boiler, a heater): its efficiency is heat over heat. */
const HEAT_ONLY_RE = /(?<!\p{L})(?:(?:delivered|given|supplied|collected|recovered|available|comes? out|output) as (?:useful )?heat|heat output|thermal output|(?:solar|flat-?plate|evacuated-?tube) (?:thermal )?collectors?|solar thermal|collector efficiency|water heaters?|boilers?|furnaces?|space heaters?)(?!\p{L})/iu;
/** A converter of electricity (its operating temperatures are no reservoirs). */
const ELECTRICAL_CONVERTER_RE = /(?<!\p{L})(?:DC\/DC|DC-DC|AC\/DC|converters?|inverters?|chargers?|power supply|power supplies|PSUs?|transformers?|regulators?|LED drivers?|rectifiers?)(?!\p{L})/iu;
/** Before a speed that is no signal's: a phase velocity, a spot or shadow swept across a screen. */
const NO_SIGNAL_SPEED_RE = /(?<!\p{L})(?:phase (?:velocity|speed)|phase front|spot|shadow|sweep(?:s|ing)?|apparent (?:velocity|speed|motion)|appears? to (?:move|travel|go|run)|seems? to (?:move|travel|go))(?!\p{L})[^.;!?\n]{0,25}$/iu;
/** A converter of sunlight to electricity. */
/** A craft that carries what it throws out: a stage, a launcher, a spacecraft. */
const CRAFT_WORDS_RE = /(?<!\p{L})(?:stages?|launchers?|rockets?|spacecraft|space probes?|probes?|satellites?|cubesats?|landers?|boosters?|kick motors?|payloads?|tugs?)(?!\p{L})/iu;
const SOLAR_CELL_RE = /(?<!\p{L})(?:solar (?:cells?|panels?|modules?|films?|arrays?)|(?:rooftop|roof-?top|home|residential) solar|solar(?:[^\S\n]+[\p{L}-]+){0,3}[^\S\n]*[,:;–—-][^\S\n]*(?:the[^\S\n]+)?(?:panels?|modules?)|PV (?:panels?|modules?|arrays?)|photovoltaic\w*|PV|perovskites?|(?:silicon|GaAs|gallium arsenide|CdTe|CIGS|organic) (?:cells?|films?|modules?)|single-junction|multi-junction|tandem cells?|(?:of|from) (?:plain |the )?sunlight (?:in)?to electricity)(?!\p{L})/iu;
/** "single-junction", "triple-junction", "a 4-junction cell". */
const JUNCTIONS_RE = /(?<!\p{L})(single|one|double|dual|two|triple|three|four|five|six|\d{1,2})[- ]junction(?!\p{L})|(?<!\p{L})(tandem)(?!\p{L})/iu;
const JUNCTION_COUNT: Record<string, number> = { single: 1, one: 1, double: 2, dual: 2, two: 2, tandem: 2, triple: 3, three: 3, four: 4, five: 5, six: 6 };
/** "under 500 suns", "at 1,000× concentration". */
const SUNS_RE = /(\d[\d,]*(?:\.\d+)?)[^\S\n]*(?:suns|×[^\S\n]*concentrat\w*|x[^\S\n]+concentrat\w*|-sun(?!\p{L}))/iu;
const ONE_SUN_RE = /(?<!\p{L})(?:one sun|1 sun|unconcentrated|no concentrators?|non-concentrat\w*|plain sunlight|AM ?1\.5|standard test conditions|STC)(?!\p{L})/iu;
/** The most concentrated sunlight (the sun filling the whole sky), as the light-converter check takes it. */
const MAX_SUNS = 46200;
/** Splitting water by a current. */
const ELECTROLYSIS_RE = /(?<!\p{L})(?:electroly[sz]\w*|HHO|oxyhydrogen|Brown'?s gas|hydroxy gas|hydrogen-on-demand|water cells?|water-splitting)(?!\p{L})/iu;
/** "a 6-cell stack", "eight cells in series", "a single cell". */
const CELLS_RE = /(?<!\p{L})(\d{1,3}|single|one|two|three|four|five|six|seven|eight|nine|ten|twelve)[- ](?:cells?|plates? pairs?)(?!\p{L})(?:[^.;!?\n]{0,20}in series)?/iu;
const CELL_WORDS: Record<string, number> = { single: 1, one: 1, two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10, twelve: 12 };
/** The flow is hydrogen alone (a cell that separates the gases). */
const HYDROGEN_ONLY_RE = /(?<!\p{L})(?:of (?:pure |separated )?hydrogen(?! and)|hydrogen only|H2 only|hydrogen alone)(?!\p{L})/iu;
/** Cells of hydrogen or deuterium in a metal. */
const EXCESS_HEAT_CELL_RE = /(?<!\p{L})(?:palladium|deuterium|deuteride|LENR|cold fusion|low-energy nuclear|nickel[–-]hydrogen|metal hydrides?|heavy water|loaded with (?:hydrogen|deuterium)|lattice-assisted|lattice[- ]enabled)(?!\p{L})/iu;
/** The metals of metal–hydrogen cells, and their standard atomic weights (IUPAC, CIAAW 2021). */
const METAL_RE = /(?<!\p{L})(palladium|nickel|titanium|lithium)(?!\p{L})/iu;
const MOLAR_MASS: Record<string, number> = { palladium: 106.42, nickel: 58.6934, titanium: 47.867, lithium: 6.94 };
/** A vehicle said to charge itself. */
const SELF_CHARGING_VEHICLE_RE = /(?<!\p{L})(?:self-?(?:re)?charging|charges? (?:it|them)sel(?:f|ves)|never needs? (?:to be )?(?:charging|charged|plugging in)|infinite range|unlimited range)(?!\p{L})[^.;!?\n]{0,80}(?<!\p{L})(?:cars?|vehicles?|EVs?|trucks?|lorr(?:y|ies)|bus(?:es)?|scooters?|bikes?|sedans?|saloons?|hatchbacks?|SUVs?|vans?)(?!\p{L})|(?<!\p{L})(?:cars?|vehicles?|EVs?|trucks?|bus(?:es)?|scooters?|sedans?|saloons?|hatchbacks?|SUVs?|vans?)(?!\p{L})[^.;!?\n]{0,80}(?<!\p{L})(?:self-?(?:re)?charging|charges? itself|recharges? itself|never needs? (?:to be )?(?:charging|charged|plugging in)|infinite range|unlimited range)(?!\p{L})/iu;
/** "… J per bit", "for each bit erased", "per logic operation". */
/** "Each switching event in the chip dissipates 1e-18 J": the operation named before the energy. */
const PER_BIT_BEFORE_RE = /(?<!\p{L})(?:each|every|per|a single|one)[^\S\n]+(?:erased[^\S\n]+|logical[^\S\n]+|logic[^\S\n]+)?(?:bit|operation|erasure|switching event|switch|gate operation|logic operation|flip)(?:[^\S\n]+(?:erasure|flip))?(?!\p{L})[^.;!?\n]{0,70}$/iu;
const PER_BIT_RE = /^[^\S\n]*(?:(?:of energy|of work)[^\S\n]+)?(?:per|for each|for every|each|a)[^\S\n]+(?:erased[^\S\n]+|logical[^\S\n]+|logic[^\S\n]+)?(?:bit|bits|operation|erasure|switching event|gate operation|flip)(?!\p{L})/iu;
/** An engine said to work on one reservoir: nothing colder to reject heat to. */
const SINGLE_RESERVOIR_RE = /(?<!\p{L})(?:no (?:cold|colder|cooler) (?:sink|side|reservoir|body|end)|(?:single|one|a single) (?:heat )?reservoir|(?:air|heat|water|sea|ocean|atmosphere|room air|ambient air|ambient heat) alone|nothing colder|without (?:a |any )?(?:cold|colder|cooler) (?:sink|side|reservoir|body))(?!\p{L})/iu;
/** After a heat input: where the heat comes from ("3.6 kW from the borehole"). */
const HEAT_SOURCE_AFTER_RE = /^[^\S\n]*(?:(?:is|are|was|were|being)[^\S\n]+)?(?:of[^\S\n]+(?:low-grade[^\S\n]+|ambient[^\S\n]+)?heat[^\S\n]+)?(?:from|out of|drawn from|taken from|extracted from)[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+)?(?:borehole|ground|earth|soil|outside|outdoor|ambient|air|source|environment|surroundings|well|river|lake|sea|brine|loop)(?!\p{L})/iu;
/** Boiler efficiencies on the net (lower) calorific value may exceed 100 % by convention. */
const NET_CALORIFIC_RE = /(?<!\p{L})(?:condensing|net (?:CV|calorific|heating)|LHV|lower heating value|lower calorific)(?!\p{L})/iu;
/** A machine that moves heat is said to: cooling words name a fridge or chiller the text may only mention as a load. */
const COOLING_ACTION_RE = /(?<!\p{L})(?:(?:removes?|extracts?|pumps?|draws?|takes?|moves?|lifts?|rejects?)(?: \S+){0,3} (?:of )?heat|cooling (?:capacity|power|output|load|duty|COP)|refrigeration (?:capacity|effect)|cooling COP|(?:of|for) (?:cooling|refrigeration)(?! (?:water|fans?|fluids?|oil|air|towers?|jackets?|loops?|circuits?)))(?!\p{L})/iu;

/** What the words of the text (and the matched classes) say about the device. */
export interface Signals {
  propellantFree: boolean;
  propellant: boolean;
  heatEngine: boolean;
  heatPump: boolean;
  /** A machine that cools is said to do so (not only named as a load). */
  cooling: boolean;
  /** A refrigerator, chiller or cooler is named. */
  coolingWords: boolean;
  overUnity: boolean;
}

export function readSignals(ctx: PlanContext): Signals {
  const text = ctx.text ?? '';
  const classes = ctx.classes ?? [];
  const top = classes[0];
  const withoutFree = text.replace(PROPELLANT_FREE_ALL_RE, ' ');
  // "no heat pump, no outdoor coil": a machine said not to be one.
  const notDenied = text.replace(/(?<!\p{L})(?:no|not an?|without an?|isn't an?|is not an?)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:heat[- ]pumps?|refrigerators?|chillers?|compressors?)(?!\p{L})/giu, ' ');
  return {
    propellantFree: PROPELLANT_FREE_RE.test(text) || (top !== undefined && PROPELLANT_FREE_CLASSES.includes(top)),
    propellant: PROPELLANT_RE.test(withoutFree),
    heatEngine: HEAT_ENGINE_RE.test(text),
    heatPump: HEAT_PUMP_RE.test(notDenied),
    cooling: COOLING_RE.test(notDenied) && COOLING_ACTION_RE.test(notDenied),
    coolingWords: COOLING_RE.test(notDenied),
    overUnity: OVER_UNITY_RE.test(text) || (top !== undefined && OVER_UNITY_CLASSES.includes(top)),
  };
}

/**
 * The mechanism classes a claim's figures point to, for the matcher:
 *  - a thrust with a power (or a thrust per power) and no word of propellant → the propellant-free classes;
 *  - an energy or power out with an input (or none, for a self-running device), or a gain above 1,
 *    from no heat pump → the over-unity classes;
 *  - and whatever the text's own words and figures already break, run once without any match:
 *    the first law → over-unity; the Carnot bound → engines on one reservoir; the photon bound →
 *    propellant-free thrust.
 */
/** The classes signalledClasses can return (the matcher boosts them and every class below them). */
export const SIGNALLABLE_CLASSES = ['propellant-free-thrust', 'over-unity', 'single-reservoir-engine'] as const;

export function signalledClasses(figures: Figure[], text: string): string[] {
  const s = readSignals({ text });
  const has = (kind: FigureKind) => figures.some((f) => f.kind === kind);
  const out = new Set<string>();
  if (((has('thrust') && has('power')) || has('thrust-per-power')) && !s.propellant) out.add('propellant-free-thrust');
  const energyOut = figures.some((f) => (f.kind === 'power' || f.kind === 'energy') && f.role === 'out');
  const energyIn = figures.some((f) => (f.kind === 'power' || f.kind === 'energy') && f.role === 'in');
  const gain = figures.some((f) => f.kind === 'efficiency' && f.si > 1);
  if ((energyOut && energyIn) || gain) if (!s.heatPump && !s.cooling && !has('thrust')) out.add('over-unity');
  for (const run of runClaimChecks(figures, { text }).checks) {
    if (run.finding !== 'breaks') continue;
    if (run.check === 'first-law') out.add('over-unity');
    if (run.check === 'carnot') out.add('single-reservoir-engine');
    if (run.check === 'photon-bound') out.add('propellant-free-thrust');
  }
  return [...out];
}

// ---------------------------------------------------------------------------------------------
// Figures at one end of their range

type End = 'low' | 'high';
/** A figure's typed quantity at one end of its range (the figure itself when it is no range). */
const at = (f: Figure, end: End) => (end === 'high' && f.upper ? f.upper.quantity : f.quantity);
const siAt = (f: Figure, end: End) => (end === 'high' && f.upper ? f.upper.si : f.si);
/** A typed quantity for an SI value, exact enough to read back (15 significant figures). */
const typed = (si: number, unit: string) => `${Number(si.toPrecision(15))} ${unit}`.trim();

interface Plan {
  check: CheckName;
  /** The figures used; those with an upper end are tried at both ends. */
  uses: Figure[];
  /** The inputs for one choice of ends. */
  inputs: (end: (f: Figure) => End) => Record<string, string>;
  why: string;
  assumptions: string[];
}

/** The figures of one kind that are the device's (a figure set aside is of something else). */
const ofKind = (figures: Figure[], kind: FigureKind) => figures.filter((f) => f.kind === kind && f.role !== 'aside');
const largest = (fs: Figure[]) => [...fs].sort((a, b) => (b.upper?.si ?? b.si) - (a.upper?.si ?? a.si))[0];

function uniq<T>(xs: (T | undefined)[]): T[] {
  return [...new Set(xs.filter((x): x is T => x !== undefined))];
}

/** Heat out over work in, for a machine that moves heat: a COP (heating, or cooling with cooling words), as a figure of its own. */
function heatMoverCop(input: Figure | undefined, output: Figure | undefined, s: Signals): Figure | undefined {
  if (!input || !output || input.kind !== output.kind || !(input.si > 0)) return undefined;
  const value = output.si / input.si;
  const cooling = s.cooling && !s.heatPump;
  return {
    id: output.id,
    kind: 'cop',
    quantity: String(Number(value.toPrecision(12))),
    text: output.text,
    start: output.start,
    end: output.end,
    si: value,
    unit: '',
    display: formatPrint(value),
    role: cooling ? 'cooling' : 'heating',
    derived: `COP = heat out / work in (${output.display} / ${input.display})`,
  };
}

/** The form of an energy said right after a figure ("35 kW of electricity", "50 kW of useful heat"). */
function formOf(f: Figure, text: string): string | null {
  if (f.end === null) return null;
  const after = text.slice(f.end, f.end + 40).toLowerCase();
  if (/^[^.;,]{0,25}?(?:heat|thermal)/.test(after)) return 'heat';
  if (/^[^.;,]{0,25}?(?:electric|electricity|\bdc\b|\bac\b|\bac\b|kwe|we\b)/.test(after)) return 'electric';
  if (/^[^.;,]{0,25}?(?:shaft|mechanical|work)/.test(after)) return 'mechanical';
  if (/^[^.;,]{0,25}?(?:signal)/.test(after)) return 'signal';
  return null;
}

/**
 * Several figures on one side: all that goes in is added up (a supply and a signal; counting more in is
 * kinder to the claim); what comes out is added up only where the text names different forms of it
 * (electricity and heat), else the largest is taken (a repeated figure is not counted twice).
 */
function combine(figs: Figure[], side: 'in' | 'out', text: string): Figure | undefined {
  const distinct = figs.filter((f, i) => !figs.slice(0, i).some((g) => Math.abs(g.si - f.si) <= 0.01 * Math.max(Math.abs(g.si), Math.abs(f.si))));
  if (distinct.length <= 1) return distinct[0];
  let parts = distinct;
  if (side === 'out') {
    const forms = distinct.map((f) => formOf(f, text));
    const allNamed = forms.every((x) => x !== null) && new Set(forms).size === forms.length;
    if (!allNamed) return [...distinct].sort((a, b) => b.si - a.si)[0];
  } else {
    // A derived input (a power from a current and a voltage) that equals the others added up repeats them.
    parts = distinct.filter((f) => !(f.derived && Math.abs(f.si - distinct.filter((g) => g !== f).reduce((a, g) => a + g.si, 0)) <= 0.01 * f.si));
  }
  const si = parts.reduce((a, f) => a + f.si, 0);
  const up = parts.reduce((a, f) => a + (f.upper?.si ?? f.si), 0);
  const first = parts[0];
  const sum: Figure = {
    ...first,
    quantity: typed(si, first.unit),
    si,
    text: parts.map((f) => f.text).join(' + '),
    display: parts.map((f) => f.display).join(' + '),
    derived: `${side === 'in' ? 'all that goes in' : 'all that comes out'}, added up (${parts.map((f) => f.display).join(' + ')})`,
  };
  if (parts.some((f) => f.upper)) sum.upper = { quantity: typed(up, first.unit), si: up, display: formatPrint(up) };
  else delete sum.upper;
  return sum;
}

export interface PlanResult {
  plans: Plan[];
  needs: ClaimCheckNeed[];
  notes: string[];
}

function need(check: CheckName, missing: string[], why: string, uses: Figure[]): ClaimCheckNeed {
  return { check, title: checks[check].title, missing, why, uses: uses.map((f) => f.id) };
}

export function planFor(figures: Figure[], ctx: PlanContext = {}): PlanResult {
  const s = readSignals(ctx);
  const plans: Plan[] = [];
  const needs: ClaimCheckNeed[] = [];
  const notes: string[] = [];

  const power = ofKind(figures, 'power');
  const energy = ofKind(figures, 'energy');
  const text = ctx.text ?? '';
  const pIn = combine(power.filter((f) => f.role === 'in'), 'in', text);
  const pOut = combine(power.filter((f) => f.role === 'out'), 'out', text);
  const eIn = combine(energy.filter((f) => f.role === 'in'), 'in', text);
  const eOut = combine(energy.filter((f) => f.role === 'out'), 'out', text);
  const duration = largest(ofKind(figures, 'duration'));

  // ---- Thrust
  const thrust = ofKind(figures, 'thrust')[0];
  const perPower = ofKind(figures, 'thrust-per-power')[0];
  // The power that drives the thrust: the input nearest the thrust in the text (not a reference lamp's).
  const thrustAt = ofKind(figures, 'thrust')[0]?.start ?? null;
  const nearThrust = (fs: Figure[]) => (thrustAt === null ? fs[0] : [...fs].sort((a, b) => Math.abs((a.start ?? 0) - thrustAt) - Math.abs((b.start ?? 0) - thrustAt))[0]);
  const drivePower =
    nearThrust(power.filter((f) => f.role === 'in')) ?? power.find((f) => f.role === null) ?? power.find((f) => f.role !== 'out' && f.role !== 'excess') ?? pOut;
  const speeds = ofKind(figures, 'speed');
  const craftSpeed = speeds.find((f) => f.role === null);
  const photonApplies = s.propellantFree && !s.propellant;
  if ((thrust && drivePower) || perPower) {
    if (photonApplies) {
      if (thrust && drivePower) {
        plans.push({
          check: 'photon-bound',
          uses: [thrust, drivePower],
          inputs: (e) => ({ F_claimed: at(thrust, e(thrust)), P: at(drivePower, e(drivePower)) }),
          why: 'The text gives a thrust and the power that produces it, for a device that throws out no propellant.',
          assumptions: [],
        });
        if (craftSpeed) {
          plans.push({
            check: 'break-even-speed',
            uses: [thrust, drivePower, craftSpeed],
            inputs: (e) => ({ F: at(thrust, e(thrust)), P: at(drivePower, e(drivePower)), v: at(craftSpeed, e(craftSpeed)), m: '0 kg' }),
            why: 'A constant thrust on a constant power: the kinetic power F·v passes the input power at v = P/F.',
            assumptions: ['Mass of the craft: not used (the text gives none; only the time to reach the break-even speed would need it).'],
          });
        } else {
          needs.push(need('break-even-speed', ['a speed of the craft in some inertial frame'], 'A constant thrust on a constant power gains kinetic energy faster than it is fed above v = P/F.', [thrust, drivePower]));
        }
      } else if (perPower) {
        plans.push({
          check: 'photon-bound',
          uses: [perPower],
          inputs: (e) => ({ F_claimed: typed(siAt(perPower, e(perPower)), 'N'), P: '1 W' }),
          why: 'The text gives the thrust per unit power of a device that throws out no propellant.',
          assumptions: ['Run per watt of input: the ratio to the bound does not depend on the power.'],
        });
      }
    } else if (s.propellant) {
      notes.push('The text says the device expels propellant, so the photon-rocket bound (for devices that throw out nothing) does not apply; the rocket equation does.');
    } else {
      needs.push(
        need(
          'photon-bound',
          ['whether the device throws out propellant or anything else (the photon-rocket bound applies only if it does not)'],
          'The text gives a thrust and a power but does not say whether the device expels anything.',
          uniq([thrust, drivePower, perPower]),
        ),
      );
    }
  } else if (thrust && photonApplies) {
    needs.push(need('photon-bound', ['the input power'], 'A propellant-free thrust is bounded by the power that produces it (F ≤ P/c).', [thrust]));
  } else if (!thrust && photonApplies && (pIn || pOut) && /(?<!\p{L})(?:thrust|push|force|propulsion|thruster|drive)(?!\p{L})/iu.test(text)) {
    // "Sealed thruster, 1 kW input. Thrust figures to follow."
    needs.push(need('photon-bound', ['the thrust measured'], 'A propellant-free thrust is bounded by the power that produces it (F ≤ P/c).', uniq([pIn, pOut])));
  }

  // ---- Rocket equation
  const masses = ofKind(figures, 'mass');
  const wet = masses.find((f) => f.role === 'wet');
  const dry = masses.find((f) => f.role === 'dry');
  const prop = masses.find((f) => f.role === 'propellant');
  const isp = ofKind(figures, 'specific-impulse')[0];
  const exhaust = speeds.find((f) => f.role === 'exhaust');
  const dv = speeds.find((f) => f.role === 'delta-v');
  const rocketish = isp || exhaust || dv || wet || dry || prop;
  if (rocketish && (s.propellant || isp || exhaust || prop || (dv && (wet || dry || CRAFT_WORDS_RE.test(text))))) {
    const missing: string[] = [];
    if (!isp && !exhaust) missing.push('the exhaust speed or the specific impulse');
    const twoMasses = [wet, dry, prop].filter(Boolean).length >= 2;
    if (!twoMasses) missing.push(!wet && !dry ? 'the masses of the craft with and without its propellant' : 'the propellant mass (or the mass with or without it)');
    if (missing.length) {
      // (A speed change alone, said of a stage or a rocket, names the check too: "gives its payload 11 km/s of Δv".)
      if ([isp, exhaust, wet, dry, prop, dv].filter(Boolean).length >= 2 || (dv && (s.propellant || CRAFT_WORDS_RE.test(text)))) needs.push(need('rocket-equation', missing, 'A craft that throws out propellant can change its speed by at most v_e·ln(m0/m1).', uniq([isp, exhaust, wet, dry, prop, dv])));
    } else {
      const m0 = (e: (f: Figure) => End): string =>
        wet ? at(wet, e(wet)) : typed(siAt(dry!, e(dry!)) + siAt(prop!, e(prop!)), 'kg');
      const m1 = (e: (f: Figure) => End): string =>
        dry ? at(dry, e(dry)) : typed(siAt(wet!, e(wet!)) - siAt(prop!, e(prop!)), 'kg');
      const extra: string[] = [];
      if (!wet) extra.push('Starting mass = dry mass + propellant.');
      if (!dry) extra.push('Final mass = starting mass − propellant.');
      plans.push({
        check: 'rocket-equation',
        uses: uniq([isp, exhaust, wet, dry, prop, dv]),
        inputs: (e) => ({
          v_e: exhaust ? at(exhaust, e(exhaust)) : '0 m/s',
          Isp: isp && !exhaust ? at(isp, e(isp)) : '0 s',
          m0: m0(e),
          m1: m1(e),
          dv_claimed: dv ? at(dv, e(dv)) : '0 m/s',
        }),
        why: 'The text gives what the rocket equation needs: the exhaust speed (or Isp) and the masses with and without propellant.',
        assumptions: dv ? extra : [...extra, 'No velocity change is claimed: the check gives the Δv the propellant allows.'],
      });
    }
  }

  // ---- Carnot
  const temps = ofKind(figures, 'temperature');
  // A stated efficiency, or one stated as a share of the Carnot efficiency of the stated temperatures.
  const efficiency = ofKind(figures, 'efficiency').find((f) => !f.derived || / of the Carnot efficiency /.test(f.derived));
  // A heat pump or refrigerator moves heat: its heat out over its work in is a COP, not an over-unity ratio.
  const cooling = s.coolingWords && (s.cooling || COMPRESSOR_RE.test(text) || ofKind(figures, 'cop').length > 0 || temps.length >= 2);
  // Heat delivered by a machine that names an outdoor, ground or brine source: a heat pump.
  const heatFromSource = HEAT_SOURCE_RE.test(text) && !/(?<!\p{L})no[^\S\n]+(?:heat[- ]pump|outdoor (?:coil|unit))/iu.test(text) && [...power, ...energy].some(
      (f) =>
        f.role === 'out' &&
        (/^[^.;,]{0,30}?(?:heat|heating)/i.test(text.slice(f.end ?? 0, (f.end ?? 0) + 40)) || /(?:heat|heating)(?:[^\S\n]+(?:output|delivered|capacity))?[^.;,]{0,12}$/i.test(text.slice(Math.max(0, (f.start ?? 0) - 40), f.start ?? 0))),
    );
  const statedCop = ofKind(figures, 'cop').some((f) => !f.derived && (f.role === 'heating' || f.role === 'cooling'));
  const movesHeat = s.heatPump || cooling || heatFromSource || statedCop || (COMPRESSOR_RE.test(text) && !s.overUnity && /(?<!\p{L})(?:heat|cool\w*|refrigerant|chill\w*|warm\w*)(?!\p{L})/iu.test(text) && !/no[^\S\n]+compressor/iu.test(text)) || (ofKind(figures, 'cop').length > 0 && !s.overUnity);
  const inOut = movesHeat ? heatMoverCop(pIn ?? eIn, pOut ?? eOut, { ...s, cooling }) : undefined;
  const gain = ofKind(figures, 'efficiency').find((f) => f.derived && !movesHeat);
  /** Any efficiency or output-over-input ratio the text states (for one at most 1: a consistent balance). */
  const share = efficiency ?? ofKind(figures, 'efficiency')[0];
  const cop = ofKind(figures, 'cop')[0] ?? inOut ?? (movesHeat ? ofKind(figures, 'efficiency').find((f) => f.derived && f.si > 1) : undefined);
  // An efficiency is a heat engine's only where the text speaks of work or electricity got from heat:
  // a collector, boiler or heater that delivers heat, or a converter of electricity, is not bounded by Carnot.
  const notAnEngine = !s.heatEngine && (HEAT_ONLY_RE.test(text) || ELECTRICAL_CONVERTER_RE.test(text));
  // An efficiency said with a temperature difference is one of a machine working across it.
  const acrossDifference = ofKind(figures, 'temperature-difference').length > 0;
  const engineEfficiency = efficiency && !notAnEngine && (s.heatEngine || temps.length >= 2 || acrossDifference) && !(efficiency.si > 1 && temps.length < 2);
  const copForCarnot = cop && (cop.role !== null || s.heatPump || s.cooling || temps.length >= 2 || !s.overUnity);
  if (engineEfficiency && temps.length === 1 && SINGLE_RESERVOIR_RE.test(text)) {
    // "15 % efficiency from 20 °C room air alone, no cold sink": an engine on one reservoir (Th = Tc).
    const only = temps[0];
    plans.push({
      check: 'carnot',
      uses: uniq([only, efficiency]),
      inputs: (e) => ({ Th: at(only, e(only)), Tc: at(only, e(only)), eta_claimed: at(efficiency!, e(efficiency!)), cop_heating_claimed: '0', cop_cooling_claimed: '0' }),
      why: 'The text gives an engine working on one reservoir, with nothing colder to reject heat to.',
      assumptions: [`Both sides at ${only.display}: the text names no colder body.`],
    });
  } else if ((engineEfficiency || copForCarnot) && temps.length >= 2) {
    const hot = temps.find((t) => t.role === 'hot') ?? [...temps].sort((a, b) => b.si - a.si)[0];
    const cold = temps.find((t) => t.role === 'cold' && t !== hot) ?? [...temps].filter((t) => t !== hot).sort((a, b) => a.si - b.si)[0];
    const extra: string[] = [];
    if (hot.role !== 'hot' || cold.role !== 'cold') extra.push(`The higher temperature (${hot.display}) is taken as the hot side and ${cold.display} as the cold side.`);
    const cooling = cop?.role === 'cooling' || (cop?.role === null && s.cooling && !s.heatPump);
    if (cop && cop.role === null) extra.push(cooling ? 'The COP is read as a cooling COP (heat drawn out over work in).' : 'The COP is read as a heating COP (heat delivered over work in); mark it as cooling if the machine is a refrigerator or chiller.');
    const claimed = [engineEfficiency ? efficiency : undefined, copForCarnot ? cop : undefined];
    plans.push({
      check: 'carnot',
      uses: uniq([hot, cold, ...claimed]),
      inputs: (e) => ({
        Th: at(hot, e(hot)),
        Tc: at(cold, e(cold)),
        eta_claimed: engineEfficiency ? at(efficiency!, e(efficiency!)) : '0',
        cop_heating_claimed: copForCarnot && !cooling ? at(cop!, e(cop!)) : '0',
        cop_cooling_claimed: copForCarnot && cooling ? at(cop!, e(cop!)) : '0',
      }),
      why: 'The text gives the temperatures the machine works between and what it claims to achieve there.',
      assumptions: extra,
    });
  } else if ((engineEfficiency || (copForCarnot && (cop.role !== null || s.heatPump || s.cooling))) && temps.length < 2) {
    const missing = temps.length === 0 ? ['the temperature of the hot side', 'the temperature of the cold side'] : [temps[0].role === 'hot' ? 'the temperature of the cold side' : temps[0].role === 'cold' ? 'the temperature of the hot side' : 'the temperature of the other side'];
    needs.push(
      need(
        'carnot',
        missing,
        cop ? 'A heat pump or refrigerator is bounded by the Carnot COP of the temperatures it works between.' : 'A heat engine is bounded by the Carnot efficiency of the temperatures it works between.',
        uniq([efficiency, cop, ...temps]),
      ),
    );
    if (cop && cop.si > 1) notes.push('A heat pump or refrigerator moves more heat than the work it takes (a COP above 1) without breaking any law; whether its COP is possible depends on the temperatures.');
  }

  // ---- First law
  const firstLawWhy = 'The text gives the energy put in and the energy got out.';
  // A heat pump that states the heat it draws from its source beside the work it takes: its whole
  // balance is a first-law ledger (what it delivers is at most the two added up).
  const sourceHeatIn =
    movesHeat &&
    [...power, ...energy].filter((f) => f.role === 'in').length >= 2 &&
    [...power, ...energy].some((f) => f.role === 'in' && HEAT_SOURCE_AFTER_RE.test(text.slice(f.end ?? 0, (f.end ?? 0) + 50)));
  if (movesHeat && (eIn || pIn) && (eOut || pOut) && !sourceHeatIn) {
    notes.push('A heat pump or refrigerator moves heat rather than making it: the heat it delivers may exceed the work it takes without breaking any law. Its bound is the Carnot COP of the temperatures it works between.');
  } else if ((eIn || pIn) && (eOut || pOut) && !(thrust && photonApplies && !eOut && !pOut)) {
    const inF = eIn ?? pIn!;
    const outF = eOut ?? pOut!;
    const bothPower = !eIn && !eOut;
    const t = duration?.si;
    const extra: string[] = ['Heat out: counted in the output (0 J apart; any heat rejected only adds to the output).'];
    const toEnergy = (f: Figure, e: End): string | null => {
      if (f.kind === 'energy') return at(f, e);
      if (siAt(f, e) === 0) return '0 J'; // no input at all, however long it ran
      if (t !== undefined) return typed(siAt(f, e) * t, 'J');
      if (bothPower) return typed(siAt(f, e), 'J'); // one second of steady running
      return null;
    };
    if (duration && !bothPower) extra.push(`Over the stated ${duration.display}: power × time.`);
    else if (bothPower && !duration) extra.push('Powers compared over one second of steady running: the ratio does not depend on how long.');
    else if (bothPower && duration) extra.push(`Powers over the stated ${duration.display}.`);
    if (toEnergy(inF, 'low') === null || toEnergy(outF, 'low') === null) {
      needs.push(need('first-law', ['how long the device ran (to compare a power with an energy)'], 'The text gives a power on one side and an energy on the other.', [inF, outF]));
    } else {
      plans.push({
        check: 'first-law',
        uses: uniq([inF, outF, t !== undefined && !bothPower ? duration : undefined]),
        inputs: (e) => ({ E_in: toEnergy(inF, e(inF))!, W_out: toEnergy(outF, e(outF))!, Q_out: '0 J', dE_stored: '0 J' }),
        why: bothPower ? 'The text gives the power drawn and the power delivered.' : firstLawWhy,
        assumptions: [...extra, 'Stored energy: unchanged over the run (the text does not say it ran down).'],
      });
    }
  } else if (!plans.some((p) => p.check === 'carnot') && (efficiency?.si ?? 0) > 1 && !cop && NET_CALORIFIC_RE.test(text)) {
    needs.push(
      need(
        'first-law',
        ['the efficiency on the gross (higher) calorific value, or the fuel energy and the heat delivered, measured'],
        'A condensing boiler\'s efficiency on the net (lower) calorific value can exceed 100 % by that convention without more energy out than in.',
        [efficiency!],
      ),
    );
  } else if (!plans.some((p) => p.check === 'carnot') && (efficiency?.si ?? 0) > 1 && !cop && !s.overUnity && !s.heatEngine) {
    // "480 % efficient" with nothing said of the machine: a heat pump can say that lawfully.
    needs.push(
      need(
        'carnot',
        ['what the machine is (an efficiency above 100 % is a heat pump\'s COP, or a claim of more energy out than in)', 'the temperatures it works between'],
        'An efficiency above 100 % is lawful for a heat pump (it moves heat) and impossible for anything that converts energy.',
        [efficiency!],
      ),
    );
  } else if (!plans.some((p) => p.check === 'carnot') && (efficiency?.si ?? 0) > 1 && !cop) {
    plans.push({
      check: 'first-law',
      uses: [efficiency!],
      inputs: (e) => ({ E_in: '1 J', W_out: typed(siAt(efficiency!, e(efficiency!)), 'J'), Q_out: '0 J', dE_stored: '0 J' }),
      why: 'An efficiency above 1 claims more energy out than in.',
      assumptions: ['Run on 1 J supplied: the over-unity ratio does not depend on the amount.'],
    });
  } else if ((gain?.si ?? 0) > 1 && !cop) {
    plans.push({
      check: 'first-law',
      uses: [gain!],
      inputs: (e) => ({ E_in: '1 J', W_out: typed(siAt(gain!, e(gain!)), 'J'), Q_out: '0 J', dE_stored: '0 J' }),
      why: 'The text gives the output as a multiple of the input.',
      assumptions: ['Run on 1 J supplied: the over-unity ratio does not depend on the amount.'],
    });
  } else if (share && (share.upper?.si ?? share.si) <= 1 && !s.heatEngine && !acrossDifference && !movesHeat && temps.length < 2 && !plans.some((p) => p.check === 'carnot')) {
    plans.push({
      check: 'first-law',
      uses: [share],
      inputs: (e) => ({ E_in: '1 J', W_out: typed(siAt(share, e(share)), 'J'), Q_out: '0 J', dE_stored: '0 J' }),
      why: 'An efficiency is the energy got out over the energy put in.',
      assumptions: ['Run on 1 J supplied: the ratio does not depend on the amount.'],
    });
  } else if (cop && !copForCarnot && cop.si > 1 && temps.length < 2) {
    plans.push({
      check: 'first-law',
      uses: [cop],
      inputs: (e) => ({ E_in: '1 J', W_out: typed(siAt(cop, e(cop)), 'J'), Q_out: '0 J', dE_stored: '0 J' }),
      why: 'The text gives a "COP" for a device that is no heat pump: its output over its input.',
      assumptions: ['The COP is read as electrical or mechanical output over input, since the text describes no heat pump; run on 1 J supplied.'],
    });
  } else if ((eOut || pOut) && !(eIn || pIn) && s.overUnity) {
    needs.push(need('first-law', ['the energy or power put in (all of it: electrical, mechanical, chemical, heat)'], 'Over a full cycle a machine delivers no more energy than it is given.', uniq([eOut, pOut])));
  } else if ((eIn || pIn) && !(eOut || pOut) && s.overUnity && !thrust) {
    needs.push(need('first-law', ['the energy or power got out'], 'Over a full cycle a machine delivers no more energy than it is given.', uniq([eIn, pIn])));
  } else if (!(eIn || pIn || eOut || pOut) && s.overUnity && !thrust && (ofKind(figures, 'current').length > 0 || ofKind(figures, 'voltage').length > 0)) {
    // "returns more energy than it takes while drawing 1.8 A": a current alone is no power.
    needs.push(
      need(
        'first-law',
        ['the voltage with each current (or the powers themselves)', 'the energy or power got out'],
        'Over a full cycle a machine delivers no more energy than it is given.',
        uniq([...ofKind(figures, 'current'), ...ofKind(figures, 'voltage')]),
      ),
    );
  }

  // ---- Speeds against c
  // A phase velocity (or a spot swept across a screen) above c carries no signal: not a speed to judge.
  const noSignal = (f: Figure) => NO_SIGNAL_SPEED_RE.test(text.slice(Math.max(0, (f.start ?? 0) - 40), f.start ?? 0));
  for (const f of speeds.filter((x) => noSignal(x) && (x.upper?.si ?? x.si) >= C_LIGHT)) {
    notes.push(`${f.display.trim()} is said of a phase velocity or an apparent motion: such speeds may exceed c without carrying a signal or energy, so special relativity does not forbid them.`);
  }
  const signalSpeeds = speeds.filter((f) => !noSignal(f));
  const fastest = signalSpeeds.filter((f) => f.role !== 'delta-v' || f.si >= C_LIGHT).sort((a, b) => b.si - a.si)[0] ?? largest(signalSpeeds);
  // (A craft's own speed from 1 km/s, where the text is about a speed and not a rocket's budget: "a probe at 17 km/s".)
  const speedFrom = fastest && fastest.role === null && !plans.some((p) => p.check === 'rocket-equation') ? SPACE_SPEED_FROM : LIGHT_SPEED_FROM;
  if (fastest && (fastest.upper?.si ?? fastest.si) >= speedFrom) {
    plans.push({
      check: 'light-speed',
      uses: [fastest],
      inputs: (e) => ({ v: at(fastest, e(fastest)) }),
      why: 'The text states a speed that is a sizeable fraction of the speed of light, or more.',
      assumptions: [],
    });
  }

  // ---- Converters of sunlight: the Landsberg and Carnot bounds, and Shockley–Queisser for one junction
  const solarEfficiency = ofKind(figures, 'efficiency').find((f) => !f.derived);
  if (solarEfficiency && SOLAR_CELL_RE.test(text) && !s.heatEngine && !HEAT_ONLY_RE.test(text)) {
    const junction = JUNCTIONS_RE.exec(text);
    const junctions = junction ? (JUNCTION_COUNT[junction[1].toLowerCase()] ?? Number(junction[1])) : 0;
    const suns = SUNS_RE.exec(text);
    const oneSun = ONE_SUN_RE.test(text);
    const X = suns ? Math.min(Number(suns[1].replace(',', '')), MAX_SUNS) : oneSun ? 1 : MAX_SUNS;
    const extra: string[] = ['The sun as a 6000 K blackbody and the cell at 300 K, as Shockley and Queisser took them.'];
    if (!junction) extra.push('The text does not say how many junctions the cell has: only the Landsberg and Carnot bounds, which hold for any converter, are applied.');
    if (!suns && !oneSun) extra.push('The text does not say how concentrated the sunlight is: the most concentrated (the sun filling the whole sky), the end most favourable to the claim.');
    plans.push({
      check: 'light-converter-limits',
      uses: [solarEfficiency],
      inputs: (e) => ({ eta_claimed: at(solarEfficiency, e(solarEfficiency)), junctions: String(junctions), X: String(X) }),
      why: 'The text gives the efficiency of a converter of sunlight.',
      assumptions: extra,
    });
  }

  // ---- Checks whose figures claims seldom give: say what they need
  const flows = [...power, ...energy];
  const gasFlow = ofKind(figures, 'gas-flow')[0];
  const current = ofKind(figures, 'current')[0];
  const cellCount = CELLS_RE.exec(text);
  const cellsIn = cellCount ? (CELL_WORDS[cellCount[1].toLowerCase()] ?? Number(cellCount[1])) : undefined;
  if (gasFlow && (current || pIn) && cellsIn && cellsIn > 0) {
    // Faraday's law: at most N·I/(2F) moles of hydrogen a second, 1.5 times that of mixed gas.
    const drive = current ?? pIn!;
    plans.push({
      check: 'faraday-yield',
      uses: uniq([gasFlow, drive]),
      inputs: (e) => ({
        I: current ? at(current, e(current)) : '0 A',
        P: current ? '0 W' : at(pIn!, e(pIn!)),
        cells: String(cellsIn),
        gas: HYDROGEN_ONLY_RE.test(text) ? '1' : '1.5',
        flow_claimed: at(gasFlow, e(gasFlow)),
      }),
      why: 'The text gives a gas flow from an electrolyser and the current (or power) that drives it.',
      assumptions: [
        'The gas volume is read at 25 °C and one standard atmosphere (101.325 kPa): the text does not say where it was measured.',
        ...(HYDROGEN_ONLY_RE.test(text) ? [] : ['The gas is counted as the oxyhydrogen mixture (1.5 times the hydrogen), the reading most favourable to the claim.']),
      ],
    });
  } else if (ELECTROLYSIS_RE.test(text) && (current || gasFlow || flows.length)) {
    needs.push(
      need(
        'faraday-yield',
        [
          ...(gasFlow ? [] : ['the gas flow measured (litres per minute, at a stated temperature and pressure)']),
          ...(current || pIn ? [] : ['the current through the cells (or the power drawn)']),
          ...(cellsIn ? [] : ['how many cells are in series']),
        ],
        "Faraday's law sets the most gas a current can split from water: a claimed flow above it was not made by electrolysis.",
        uniq([gasFlow, current, pIn]),
      ),
    );
  }
  const excessHeat = (ctx.classes ?? []).includes('excess-heat-cell') || EXCESS_HEAT_CELL_RE.test(text);
  const metal = METAL_RE.exec(text);
  const excessEnergy = ofKind(figures, 'energy').find((f) => f.role === 'excess' || f.role === 'out') ?? ofKind(figures, 'energy').find((f) => f.role === null);
  const metalMass = ofKind(figures, 'mass')[0];
  if (excessHeat && metal && excessEnergy && metalMass) {
    // The claimed energy per atom of the named metal, against the few electronvolts chemistry gives.
    const molar = MOLAR_MASS[metal[1].toLowerCase()];
    plans.push({
      check: 'nuclear-signature',
      uses: [excessEnergy, metalMass],
      inputs: (e) => ({ E_excess: at(excessEnergy, e(excessEnergy)), mass: at(metalMass, e(metalMass)), molar_mass: `${molar} g/mol`, atoms: '0', P_excess: '0 W' }),
      why: `The text gives the excess energy and the mass of ${metal[1].toLowerCase()} it came from.`,
      assumptions: [`Every atom of the ${formatPrint(metalMass.si * 1000)} g of ${metal[1].toLowerCase()} (${molar} g/mol, IUPAC standard atomic weight) takes part, the reading most favourable to the claim.`],
    });
  } else if (excessHeat && flows.length) {
    needs.push(
      need(
        'nuclear-signature',
        ['the reaction proposed (its energy per reaction)', 'the mass of metal and hydrogen taking part'],
        'Chemistry gives a few electronvolts per atom; more needs nuclear reactions, whose rate and radiation follow from the power claimed.',
        uniq(flows.filter((f) => f.role === 'excess' || f.role === 'out')),
      ),
    );
  }
  if ((ctx.classes ?? []).includes('self-charging-loop') || SELF_CHARGING_VEHICLE_RE.test(text)) {
    needs.push(
      need(
        'road-load',
        ["the vehicle's mass and speed", 'its drag coefficient and frontal area', "the generator's power"],
        'A generator driven by the vehicle adds at least its power over the speed to the drag the motor must overcome.',
        uniq([pOut, pIn, ...speeds]),
      ),
    );
  }
  const perBit = ofKind(figures, 'energy').find((f) => PER_BIT_RE.test(text.slice(f.end ?? 0, (f.end ?? 0) + 40)) || PER_BIT_BEFORE_RE.test(text.slice(Math.max(0, (f.start ?? 0) - 90), f.start ?? 0)));
  if (perBit) {
    const temp = temps.length === 1 ? temps[0] : undefined;
    if (temp) {
      plans.push({
        check: 'landauer',
        uses: [perBit, temp],
        inputs: (e) => ({ T: at(temp, e(temp)), E_op: at(perBit, e(perBit)), bits: '1' }),
        why: 'The text gives the energy of one operation on a bit and the temperature it works at.',
        assumptions: ['One bit erased per operation.'],
      });
    } else {
      needs.push(need('landauer', ['the temperature at which it works'], "Erasing a bit costs at least k_B·T·ln 2 (Landauer's bound).", [perBit]));
    }
  }

  // ---- Quantum efficiency
  const qe = ofKind(figures, 'quantum-efficiency').find((f) => (f.upper?.si ?? f.si) > 1);
  if (qe) {
    notes.push(
      `A quantum efficiency of ${qe.display.trim() || formatPrint(qe.si)} counts particles (photons per electron, or electrons per photon), not energy: above 1 it is not by itself a claim of more energy out than in (carrier multiplication and similar effects give it lawfully). The energy balance needs the power in and the power out.`,
    );
  }
  return { plans, needs, notes };
}

// ---------------------------------------------------------------------------------------------
// Running

/** How bad a run is for the claim (larger is worse): the check's ratio of claim to bound. */
function severity(run: CheckRun): number {
  const o = (name: string) => run.outputs.find((x) => x.name === name)?.si;
  switch (run.check) {
    case 'photon-bound':
    case 'light-speed':
      return o('ratio') ?? 0;
    case 'break-even-speed':
      return o('power_ratio') ?? 0;
    case 'carnot':
      return Math.max(0, ...run.outputs.filter((x) => x.name.endsWith('_ratio')).map((x) => x.si));
    case 'first-law': {
      const r = o('over_unity');
      if (r !== undefined) return r;
      return -(o('balance') ?? 0);
    }
    case 'rocket-equation':
      return o('dv_ratio') ?? -(o('dv') ?? 0);
    default:
      return run.verdict.holds ? 0 : 1;
  }
}

/** The first sentence of a verdict, numbers as in print, headed by the finding and its law. */
function sentenceOf(check: CheckName, run: CheckRun): string {
  const law = CHECK_LAW[check];
  const head = run.verdict.holds ? `Consistent with ${law}` : `Conflicts with ${law}`;
  const first = /^(.*?[.:;])(?:\s+[A-Z]|$)/s.exec(run.verdict.message)?.[1] ?? run.verdict.message;
  return `${head}: ${printText(first.replace(/[:;]$/, '.'), { bigIntegers: true })}`;
}

/** Plans, run: each at the ends of its ranges most favourable to the claim. */
export function runClaimChecks(figures: Figure[], ctx: PlanContext = {}): { checks: ClaimCheckRun[]; needs: ClaimCheckNeed[]; notes: string[] } {
  const { plans, needs, notes } = planFor(figures, ctx);
  const out: ClaimCheckRun[] = [];
  for (const p of plans) {
    const def = checks[p.check];
    const ranged = p.uses.filter((f) => f.upper);
    let best: { run: CheckRun; inputs: Record<string, string>; ends: Map<Figure, End> } | null = null;
    let lastError: CheckInputError | null = null;
    const combos = 1 << Math.min(ranged.length, 5);
    for (let mask = 0; mask < combos; mask++) {
      const ends = new Map<Figure, End>(ranged.map((f, i) => [f, mask & (1 << i) ? 'high' : 'low']));
      const inputs = p.inputs((f) => ends.get(f) ?? 'low');
      try {
        const run = runCheck(p.check, inputs);
        if (!best || severity(run) < severity(best.run)) best = { run, inputs, ends };
      } catch (err) {
        if (!(err instanceof CheckInputError)) throw err;
        lastError = err;
      }
    }
    if (!best) {
      notes.push(`${def.title} could not be run on these figures: ${lastError?.message ?? 'the inputs are not valid'}`);
      continue;
    }
    const assumptions = [...p.assumptions];
    for (const [f, end] of best.ends) {
      const chosen = end === 'high' ? f.upper!.display : f.display;
      assumptions.push(`The text gives a range, ${f.display} to ${f.upper!.display} ("${f.text}"); the end most favourable to the claim, ${chosen}, is used.`);
    }
    const { run, inputs } = best;
    out.push({
      check: p.check,
      inputs,
      uses: p.uses.map((f) => f.id),
      why: p.why,
      assumptions,
      title: def.title,
      outputs: run.outputs.map(({ name, label, si, unit, display }) => ({ name, label, si, unit, display })),
      verdict: run.verdict,
      inputsUsed: run.inputs,
      permalink: `/checks/${p.check}?${Object.entries(inputs).map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&')}`,
      law: CHECK_LAW[p.check],
      finding: run.verdict.holds ? 'consistent' : 'breaks',
      sentence: sentenceOf(p.check, run),
    });
  }
  return { checks: out, needs, notes };
}

/** The plans as the contract's PlannedCheck (inputs at the lower ends): for tests and the screen. */
export function planChecks(figures: Figure[], ctx: PlanContext = {}): { planned: PlannedCheck[]; needs: ClaimCheckNeed[]; notes: string[] } {
  const { plans, needs, notes } = planFor(figures, ctx);
  return {
    planned: plans.map((p) => ({ check: p.check, inputs: p.inputs(() => 'low'), uses: p.uses.map((f) => f.id), why: p.why, assumptions: p.assumptions })),
    needs,
    notes,
  };
}
