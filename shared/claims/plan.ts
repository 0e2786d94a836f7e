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
 *
 * The parts, in shared/claims/plan/: signals.ts (what the words say of the device), basis.ts (what
 * every planner starts from), one planner per check or group of checks (thrust.ts, rocket.ts,
 * carnot.ts, first-law.ts, speeds.ts, other-checks.ts), planner.ts (them in order), run.ts
 * (running the plans) and items.ts (a text listing several devices: one item checked, the others'
 * figures set aside — used by the reader, whose extractFigures calls it).
 */
import type { Figure, FigureKind } from './types';
import { runClaimChecks } from './plan/run';
import { readSignals } from './plan/signals';

export { planChecks, runClaimChecks } from './plan/run';
export { readSignals } from './plan/signals';

/**
 * An entry a claim's finding leads to when its words match none: the entry of `mechanismClass`
 * (exactly that class). Where the words match entries they decide, with the class boost.
 */
export interface FindingLead {
  mechanismClass: string;
  /** Why, in words for the reader ("it states a speed above the speed of light"). */
  why: string;
}

/** The classes signalledClasses can return (the matcher boosts them and every class below them). */
export const SIGNALLABLE_CLASSES = ['propellant-free-thrust', 'over-unity', 'single-reservoir-engine', 'converter-beyond-limit', 'faster-than-light'] as const;

/** Converters of light or heat to electricity with no moving parts (their limits are the Carnot, Landsberg and Shockley–Queisser bounds). */
const CONVERTER_RE = /(?<!\p{L})(?:thermoelectric|TEGs?|Seebeck|Peltier|thermophotovoltaic|TPV|thermionic|solar cells?|photovoltaic|PV cells?|PV modules?|(?:of )?the heat (?:flowing|passing) through(?: it)?)(?!\p{L})/iu;

/**
 * The mechanism classes a claim's figures point to, for the matcher:
 *  - a thrust with a power (or a thrust per power) and no word of propellant → the propellant-free classes;
 *  - an energy or power out with an input (or none, for a self-running device), or a gain above 1,
 *    from no heat pump → the over-unity classes;
 *  - and whatever the text's own words and figures already break, run once without any match:
 *    the first law → over-unity; the Carnot bound → engines on one reservoir; the photon bound →
 *    propellant-free thrust.
 */
export function signalledClasses(figures: Figure[], text: string): string[] {
  return claimSignals(figures, text).classes;
}

/**
 * What a claim's figures point to: the classes to boost (signalledClasses), and the entries its
 * findings lead to (FindingLead) whatever its words match.
 */
export function claimSignals(figures: Figure[], text: string): { classes: string[]; leads: FindingLead[] } {
  const leads: FindingLead[] = [];
  const s = readSignals({ text });
  const has = (kind: FigureKind) => figures.some((f) => f.kind === kind);
  const out = new Set<string>();
  if (((has('thrust') && has('power')) || has('thrust-per-power')) && !s.propellant) out.add('propellant-free-thrust');
  const energyOut = figures.some((f) => (f.kind === 'power' || f.kind === 'energy') && f.role === 'out');
  const energyIn = figures.some((f) => (f.kind === 'power' || f.kind === 'energy') && f.role === 'in');
  const gain = figures.some((f) => f.kind === 'efficiency' && f.si > 1);
  if ((energyOut && energyIn) || gain) if (!s.heatPump && !s.cooling && !has('thrust')) out.add('over-unity');
  // A percentage above 100 % said of an efficiency ("250 % efficient", a heat pump's "350 %"), or a
  // quantum efficiency above one: the entry on what such figures mean.
  const percentOver = figures.some((f) => (f.kind === 'efficiency' || f.kind === 'cop' || f.kind === 'quantum-efficiency') && f.si > 1 && /%|per ?cent/iu.test(f.text));
  // (A lead only, not a boost: the entry's words are common enough that a boost would admit it for a long
  // text about something else.)
  if (percentOver || figures.some((f) => f.kind === 'quantum-efficiency' && f.si > 1)) {
    leads.push({ mechanismClass: 'efficiency-above-unity', why: 'a figure above 100 % said of an efficiency' });
  }
  for (const run of runClaimChecks(figures, { text }).checks) {
    // Run at all, whatever it finds, a converter's Carnot check or a speed set against c points to the
    // entry that explains that limit (a boost of its class, no lead: a lawful claim is led to no entry).
    if (run.check === 'carnot' && CONVERTER_RE.test(text)) out.add('converter-beyond-limit');
    if (run.check === 'light-speed') out.add('faster-than-light');
    // A heat pump's or a fridge's COP set against its Carnot bound, whatever it finds: the entry on
    // figures above 100 % is the one that explains it (not the engines that run on ambient heat).
    if (run.check === 'carnot' && run.finding !== 'breaks' && run.outputs.some((o) => o.name === 'cop_heating_ratio' || o.name === 'cop_cooling_ratio') && !run.outputs.some((o) => o.name === 'eta_ratio')) {
      leads.push({ mechanismClass: 'efficiency-above-unity', why: "its own figures give a heat pump's or a refrigerator's COP, set against the Carnot bound" });
    }
    if (run.finding !== 'breaks') continue;
    if (run.check === 'first-law') {
      out.add('over-unity');
      leads.push({ mechanismClass: 'over-unity-circuit', why: 'the first-law ledger of its own figures gives more out than in' });
    }
    // A solar cell's or a thermoelectric converter's efficiency over its limit is its own class.
    if (run.check === 'carnot') {
      // (A heat pump's or a fridge's COP past its bound is what the entry on figures above 100 % answers.)
      const cop = run.outputs.some((o) => o.name === 'cop_heating_ratio' || o.name === 'cop_cooling_ratio') && !run.outputs.some((o) => o.name === 'eta_ratio');
      if (cop) {
        leads.push({ mechanismClass: 'efficiency-above-unity', why: "its own figures put a heat pump's or a refrigerator's COP past the Carnot bound" });
        continue;
      }
      const cls = CONVERTER_RE.test(text) ? 'converter-beyond-limit' : 'single-reservoir-engine';
      out.add(cls);
      leads.push({ mechanismClass: cls, why: 'its own figures go past the Carnot limit' });
    }
    if (run.check === 'light-converter-limits') {
      out.add('converter-beyond-limit');
      leads.push({ mechanismClass: 'converter-beyond-limit', why: 'its own figures go past the limits of a light converter' });
    }
    if (run.check === 'photon-bound') out.add('propellant-free-thrust');
    if (run.check === 'light-speed') {
      out.add('faster-than-light');
      leads.push({ mechanismClass: 'faster-than-light', why: 'it states a speed above the speed of light' });
    }
  }
  return { classes: [...out], leads };
}
