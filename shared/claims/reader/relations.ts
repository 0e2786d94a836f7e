/**
 * Relations between figures (the claim reader, shared/claims/reader.ts, pass 3), as derived figures
 * with the words they came from: the roles labels give ("P_out/P_in ="), an amplifier's in and out,
 * an excess over an input, a power from a current and a voltage in one clause (I·V), a "COP" of a
 * device that moves no heat, a thrust per power in words, a change of weight as a force, an output
 * short of the input, out = in + excess, the output of a stated gain or efficiency, a self-running
 * device's zero input and a heat pump's COP; then temperatures.ts and durations.ts.
 */
import { HARVEST_WORDS, QUANTUM_EFFICIENCY_WORDS, SELF_RUNNING_WORDS } from '../figures-vocabulary';
import { formatQuantity } from '../../worksheet/quantity';
import { formatPrint } from '../print';
import { FIGURE_SI_UNIT, type FigureRole } from '../types';
import { alt, BEFORE_WINDOW, COOLING_MACHINE_RE, HEAT_PUMP_RE, NAMED_HEAT_PUMP_RE, paragraphAround, paragraphOfAnotherMachine, sentenceAround, windowStart } from './context';
import { insertAfter, sameClause, siOf, typedSi, upperSiOf, type Draft } from './draft';
import { relateDurations } from './durations';
import { FILLS_LEAD_RE, roleFor, SUPPLY_GIVES_LEAD_RE, TO_DEVICE_PART_AFTER_RE } from './roles';
import { asideControlPowers, asideComparedLamps, asideDenied, asideFutureVersions, asideIdealWork, asideOtherBasis, asideLoadsOfSource, asideStoreSize, asidePassedOn, asideQuotedLightSpeed, asideSpeedGlosses, asideWindSpeeds, COOLED_SPACE_AFTER_RE, COOLING_VERB_BEFORE_RE, ROCKET_RE, rolesByContext, storeAloneIsInput, usableSizeOfFilledStore } from './roles-by-context';
import { relateTemperatures } from './temperatures';

/** A transistor's own currents (base, collector, emitter, gate, drain): "2 mA base current", "300 mA of collector current". */
const TRANSISTOR_CURRENT_AFTER_RE = /^[^\S\n]*(?:of[^\S\n]+)?(?:base|collector|emitter|gate|drain)[^\S\n]+currents?(?!\p{L})/iu;
const TRANSISTOR_CURRENT_BEFORE_RE = /(?<!\p{L})(?:base|collector|emitter|gate|drain)[^\S\n]+currents?[^\S\n]+(?:of|is|was|=|:)?[^\S\n]*(?:about[^\S\n]+|only[^\S\n]+|just[^\S\n]+)?$/iu;

/** The text says the input was not given: a claim of no input cannot be read from it. */
const INPUT_NOT_GIVEN_RE =
  /(?<!\p{L})(?:(?:gives?|gave|states?|stated|reports?|reported|provides?|provided|quotes?|quoted|lists?|listed|offers?|offered)[^\S\n]+no[^\S\n]+(?:figures?|numbers?|values?|data|measurements?|readings?)|(?:does|do|did)[^\S\n]*(?:not|n't)[^\S\n]+(?:say|state|give|report|disclose|quote|list|mention|measure))[^.;!?\n]{0,40}(?:input|takes?(?: in)?|draws?|consumes?|uses?|needs?|supply|feeds? it)(?!\p{L})/iu;
/** A store of energy the text names: a battery, a flywheel, a pack that "stores" or "holds" energy. */
/** A store said to be absent: "no battery", "without any batteries", "no fuel, battery or mains". */
const NO_STORE_RE = /(?<!\p{L})(?:no|without(?:[^\S\n]+any)?|nor|not a)[^\S\n]+(?:[\p{L}-]+,?[^\S\n]+(?:(?:or|nor|and)[^\S\n]+)?){0,3}(?:batter(?:y|ies)|packs?|flywheels?|accumulators?|(?:super)?capacitors?)(?!\p{L})/giu;
const STORE_NAMED_RE = /(?<!\p{L})(?:batter(?:y|ies)|Batter(?:y|ies)|(?:battery |EV |traction )?[Pp]acks?|flywheels?|accumulators?|supercapacitors?|capacitor banks?|(?:stores|stored|holds|held)[^\S\n]+(?:about[^\S\n]+|up[^\S\n]+to[^\S\n]+)?[\d.,]+[^\S\n]*(?:k|M|G)?(?:Wh|J)|(?:[Cc]apacity|[Uu]sable energy|[Ee]nergy capacity|[Rr]ated energy)[^\n\d]{0,25}[\d.,]+[^\S\n]*(?:k|M)?Wh|LiFePO4|LFP|[Ll]ithium[- ](?:ion|iron)|Li-ion|[Pp]ortable power stations?)(?!\p{L})/u;
/** "No input figure was given": the input is not known, not nil. */
const NO_INPUT_FIGURE_RE = /(?<!\p{L})no[^\S\n]+(?:input|supply)[^\S\n]+(?:power[^\S\n]+|energy[^\S\n]+)?(?:figures?|numbers?|values?|data|measurements?|readings?)(?!\p{L})/iu;
const SELF_RUNNING_RE = new RegExp(`(?<!\\p{L})(?:${alt(SELF_RUNNING_WORDS)})(?!\\p{L})`, 'giu');
const HARVEST_RE = new RegExp(`(?<!\\p{L})(?:${alt(HARVEST_WORDS)})(?!\\p{L})`, 'iu');
/** A harvest said to be absent: "no sun, no wind", "without sunlight". */
const NEGATED_HARVEST_RE = new RegExp(`(?<!\\p{L})(?:no|without|nor|not)[^\\S\\n]+(?:any[^\\S\\n]+)?(?:${alt(HARVEST_WORDS)})(?!\\p{L})`, 'giu');

/** Devices whose "COP" is an output-over-input ratio, not a heat pump's. */
const ELECTRICAL_GAIN_RE = /(?<!\p{L})(?:circuits?|coils?|generators?|alternators?|motors?|batter(?:y|ies)|electrical energy|electricity out|electrical output|magnets?|over-?unity|free energy|zero-?point|ZPE|self-charging|self-running|transformers?|capacitors?|resonators?|electrolys\w*|HHO|oxyhydrogen|palladium|deuterium|deuteride|LENR|cold fusion|low-energy nuclear|nickel[–-]hydrogen|excess heat)(?!\p{L})/iu;

/** "P_out/P_in =", "output/input:": a ratio of two labelled figures about to be given. */
const RATIO_LABELS_RE = /(?<!\p{L})([PEW]_?\{?(?:out|in|o|i)\}?|outputs?|inputs?|out|in)[^\S\n]*\/[^\S\n]*([PEW]_?\{?(?:out|in|o|i)\}?|outputs?|inputs?|out|in)(?!\p{L})[^\S\n]*[=:≈~][^\S\n]*/giu;

/** A verb that makes a signal bigger, just before the first of two figures ("amplifies a 1 mW signal to 100 mW"). */
const AMPLIFY_BEFORE_RE = /(?<!\p{L})(?:amplif(?:y|ies|ied|ying)|boost(?:s|ed|ing)?|lift(?:s|ed|ing)?|rais(?:e|es|ed|ing)|steps? up|stepped up|stepping up)[^\S\n]+(?:(?:a|an|the|its|their)[^\S\n]+)?(?:(?:input|incoming|weak|small|faint|signal)[^\S\n]+){0,2}(?:(?:signal|input|power|level)[^\S\n]+)?(?:from[^\S\n]+)?$/iu;

/** A verb of lifting right before a mass: "lifts 3 lbs", "lifted its own 2 kg frame", "levitates a 40 g disc". */
const LIFTS_BEFORE_RE = /(?<!\p{L})(?:lifts?|lifted|lifting|levitat(?:es?|ed|ing)|raises?|raised|hoists?|hoisted|holds? up|held up|hold(?:s|ing)? aloft|carr(?:y|ies|ied) aloft|hover(?:s|ed|ing)? with)[^\S\n]+(?:(?:its|their|his|her|our|my|the|a|an)[^\S\n]+)?(?:own[^\S\n]+)?(?:(?:about|some|roughly|nearly|over|up to|almost)[^\S\n]+)?$/iu;
/** Machines that lift loads lawfully by pushing on the ground (their lifted mass is no thrust). */
const HOIST_RE = /(?<!\p{L})(?:cranes?|hoists?|winch(?:es)?|forklifts?|lift trucks?|elevators?|lifts? (?:shaft|car)|jacks?|pulleys?|block and tackle|levers?|hydraulic|pistons?|arms?|robots?|weightlift\w*|athletes?|balloons?|airships?|blimps?|buoyan\w*|helium|hydrogen|lifters?|ion(?:ic)?[- ]wind|corona|EHD|electrohydrodynamic|drones?|quadcopters?|multicopters?|propellers?|rotor blades?|helicopters?)(?!\p{L})/iu;

/**
 * A heat pump's rating point written as the standards write it (EN 14511): "A7/W35" is source air at
 * 7 °C and water leaving at 35 °C, "B0/W35" brine at 0 °C, "W10/W35" source water at 10 °C. With one
 * such point and no temperature said otherwise, its two temperatures are the cold and the hot side.
 */
const RATING_POINT_RE = /(?<![\p{L}\p{N}])([ABW])[^\S\n]?([-−]?\d{1,2}(?:[.,]\d)?)[^\S\n]*\/[^\S\n]*W[^\S\n]?(\d{2}(?:[.,]\d)?)(?![\p{L}\p{N}])/gu;
const SOURCE_NAME: Record<string, string> = { A: 'source air', B: 'brine', W: 'source water' };
/** Words of the room a test was run in, just before its temperature ("Ambient in test room ...... 20 ± 2 °C", "lab temperature: 22 °C"). */
const TEST_ROOM_BEFORE_RE = /(?<!\p{L})(?:ambient|room|test (?:room|hall|cell|chamber)|laborator(?:y|ies)|lab)(?!\p{L})[^\d\n]{0,40}$/iu;
function ratingPoint(text: string, drafts: Draft[]): void {
  if (!HEAT_PUMP_RE.test(text) && !/(?<!\p{L})(?:S?COP|coefficient of performance)(?!\p{L})/iu.test(text) && !drafts.some((d) => d.kind === 'cop')) return;
  const points = [...text.matchAll(RATING_POINT_RE)];
  const distinct = new Set(points.map((m) => m[0].replace(/\s/g, '').replace('−', '-')));
  if (points.length === 0) return;
  // (With the rating point written, the test room's own temperature is the surroundings, no side.)
  const room = drafts.filter((d) => d.kind === 'temperature' && d.role !== 'aside' && TEST_ROOM_BEFORE_RE.test(text.slice(text.lastIndexOf('\n', d.start - 1) + 1, d.start)));
  const thermal = drafts.filter((d) => (d.kind === 'temperature' || d.kind === 'temperature-difference') && !room.includes(d) && d.role !== 'aside');
  if (distinct.size > 1) {
    // A sheet with a row or a heading for each rating point ("Heating output A7/W35 .... 8,2 kW", "COP A-7/W35 .... 3,1",
    // "Operating point A7/W35" over its rows): each point's temperatures where it is written, a side said
    // before at the same temperature not said again. (Not where temperatures are said in words, except a
    // point's own gloss: "Operating point A-7/W55 (outdoor air −7 °C, flow water 55 °C)".)
    const lineOf = (at: number) => text.slice(text.lastIndexOf('\n', at - 1) + 1, text.indexOf('\n', at) < 0 ? text.length : text.indexOf('\n', at));
    if (!points.every((m) => /\n/u.test(text) && /(?:\.{3,}|…|\||\t|[^\S\n]{3,}|:|^[^\S\n]*(?:operating|test|rating)[^\S\n]+(?:point|condition))/iu.test(lineOf(m.index!)))) return;
    if (thermal.some((d) => !points.some((m) => lineOf(m.index!) === lineOf(d.start)))) return;
  } else if (thermal.length > 0) return;
  for (const d of room) d.role = 'aside';
  const said = (t: number, role: string) => drafts.some((x) => x.kind === 'temperature' && (x.role === role || x.role === null || x.role === undefined) && Math.abs((siOf(x) ?? NaN) - (t + 273.15)) < 0.01);
  for (const m of distinct.size > 1 ? points : points.slice(0, 1)) {
    const cold = Number(m[2].replace('−', '-').replace(',', '.'));
    const hot = Number(m[3].replace(',', '.'));
    if (!(hot > cold)) continue;
    const start = m.index!;
    const end = start + m[0].length;
    const why = `rating point ${m[0].replace(/\s/g, '')}: ${SOURCE_NAME[m[1]]} at ${cold} °C, water out at ${hot} °C`;
    for (const [t, role] of [[cold, 'cold'], [hot, 'hot']] as const) {
      if (distinct.size > 1 && said(t, role)) continue;
      const d: Draft = { start, end, kind: 'temperature', quantity: `${t} degC`, role, derived: why };
      const at = drafts.findIndex((x) => x.start > start);
      if (at < 0) drafts.push(d);
      else drafts.splice(at, 0, d);
    }
  }
}

/** Machines whose specific power is what they put out. */
const POWER_MAKER_RE = /(?<!\p{L})(?:generators?|alternators?|dynamos?|gensets?|engines?|turbines?|fuel cells?|RTGs?|reactors?|motors?)(?!\p{L})/iu;
/** A craft or vehicle, whose mass is not the mass of a part it carries. */
const CRAFT_WORDS_RE = /(?<!\p{L})(?:satellites?|spacecraft|probes?|craft|vehicles?|cars?|rockets?|drones?|aircraft|planes?|ships?|boats?|bikes?|trucks?|landers?|rovers?|stages?)(?!\p{L})/iu;

/** Relations between the figures read, in this order (see the file's comment). */
/**
 * An efficiency worked as a quotient of two powers or energies ("efficiency … It is: 24.1 V × 9.80 A over
 * 48.0 V × 5.20 A", "η = 36 W / 150 W"): the numerator is what comes out, the denominator what goes in,
 * whatever the words around each say.
 */
function efficiencyQuotient(text: string, drafts: Draft[]): void {
  const flows = drafts.filter((d) => d.kind === 'power' || d.kind === 'energy');
  for (let i = 0; i + 1 < flows.length; i++) {
    const [a, b] = [flows[i], flows[i + 1]];
    if (a.kind !== b.kind || b.start < a.end) continue;
    if (!/^[^\S\n]*(?:over|divided[^\S\n]+by|\/|÷)[^\S\n]*$/iu.test(text.slice(a.end, b.start))) continue;
    if (!/(?<!\p{L})(?:efficienc(?:y|ies)|η|eta)(?!\p{L})/iu.test(text.slice(Math.max(0, a.start - 150), a.start))) continue;
    a.role = 'out';
    b.role = 'in';
  }
}

/** After an output: "… for every 100 it takes in", "… for each 10 the battery gives it": how much goes in for it, in its unit. */
const FOR_EVERY_IN_AFTER_RE =
  /^[^\S\n]+(?:(?:back|out)[^\S\n]+)?(?:for|per)[^\S\n]+(?:every|each)[^\S\n]+(\d+(?:\.\d+)?)(?![\p{N}.,]|[^\S\n]*[\p{L}%°])|^[^\S\n]+(?:(?:back|out)[^\S\n]+)?(?:for|per)[^\S\n]+(?:every|each)[^\S\n]+(\d+(?:\.\d+)?)(?=[^\S\n]+(?:(?:it|they|the[^\S\n]+[\p{L}-]+)[^\S\n]+)?(?:takes?|took|draws?|drew|uses?|used|consumes?|consumed|receives?|received|gets?|got|is given|was given|puts? in|goes in|went in|absorbs?|absorbed|stores?|stored)(?!\p{L}))/iu;

/**
 * "returns 86 kilowatt-hours for every 100 it takes in": the input, in the output's unit, said as a bare
 * number after "for every" (a figure of its own where the unit is written: "for every 100 kWh").
 */
function inputForEvery(text: string, drafts: Draft[]): void {
  for (const d of [...drafts]) {
    if ((d.kind !== 'energy' && d.kind !== 'power') || d.role === 'in' || d.role === 'aside' || d.derived) continue;
    const m = FOR_EVERY_IN_AFTER_RE.exec(text.slice(d.end, d.end + 80));
    const n = m?.[1] ?? m?.[2];
    const unit = /^[-\d.e+]+[^\S\n]*(.+)$/u.exec(d.quantity)?.[1];
    if (!m || !n || !unit) continue;
    const start = d.end + m[0].lastIndexOf(n);
    if (drafts.some((o) => o.start <= start && start < o.end)) continue;
    if (d.role === null) d.role = 'out';
    insertAfter(drafts, d, { start, end: start + n.length, kind: d.kind, quantity: `${n} ${unit}`, role: 'in' });
  }
}

/** A text's own words that a figure above 100 % counts particles: "the figure is an external quantum efficiency", "1.3 electrons for each photon". */
const COUNTS_PARTICLES_RE = new RegExp(
  `(?<!\\p{L})(?:${QUANTUM_EFFICIENCY_WORDS.join('|')})(?!\\p{L})|(?<!\\p{L})electrons?(?:[^\\S\\n]+[\\p{L}-]+){0,4}?[^\\S\\n]+(?:for|per)[^\\S\\n]+(?:each|every|one|an?)?[^\\S\\n]*(?:incident[^\\S\\n]+|absorbed[^\\S\\n]+)?photons?(?!\\p{L})`,
  'iu',
);
/** A power conversion efficiency named as such: a figure of energy, whatever else the text counts. */
const POWER_EFFICIENCY_RE = /(?<!\p{L})(?:power[- ]conversion|wall-?plug|energy[- ]conversion)[^\S\n]+efficiency[^.;,!?\n]{0,30}?(\d+(?:\.\d+)?)[^\S\n]*%/iu;

/**
 * "A solar cell with 130 % efficiency … the figure is an external quantum efficiency: 1.3 electrons for
 * each photon": a percentage above 100 said of an efficiency, in a text whose own words say it counts
 * particles (and that gives no power conversion efficiency above 100 %), is a quantum efficiency.
 */
function quantumRestated(text: string, drafts: Draft[]): void {
  if (!COUNTS_PARTICLES_RE.test(text)) return;
  const power = POWER_EFFICIENCY_RE.exec(text);
  if (power && Number(power[1]) > 100) return;
  for (const d of drafts) {
    if (d.kind !== 'efficiency' || d.derived || !/%|per ?cent/iu.test(text.slice(d.start, d.end))) continue;
    const si = siOf(d);
    if (si === null || si <= 1) continue;
    d.kind = 'quantum-efficiency';
    d.assumption = 'A figure above 100 % in a text that says it counts particles (electrons per photon): read as a quantum efficiency, no energy claim.';
  }
}

const COUNT_WORDS: Record<string, number> = { two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10, eleven: 11, twelve: 12, twenty: 20, a: 1, pair: 2, dozen: 12, twin: 2, triple: 3, quad: 4 };
/** Before a power of one of several things: "three 60 W bulbs", "2 x 75 W heaters", "twelve 400-watt panels", "twin 250 hp outboards". */
const COUNT_BEFORE_RE = /(?<![\p{L}\p{N}.,])(two|three|four|five|six|seven|eight|nine|ten|eleven|twelve|twenty|twin|triple|quad|[2-9]|[1-9]\d)[^\S\n]*(?:[x×][^\S\n]*)?$/iu;
/** After it: the things, in the plural. */
const COUNTED_THINGS_AFTER_RE =
  /^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+)?(?:bulbs|lamps|lights|heaters|panels|modules|motors|fans|LEDs|pumps|radiators|elements|units|cells|resistors|loads|speakers|lasers|emitters|thrusters|turbines|generators|engines|strips|tubes|globes|outboards|propellers|props|rotors|compressors|boilers|burners)(?!\p{L})/iu;

/**
 * "lights three 60 W bulbs", "2 x 75 W heaters": a power said for each of several things — the total is
 * the count times it, worked out beside it with the side the words gave; the one thing's power is set aside.
 */
function countedPowers(text: string, drafts: Draft[]): void {
  for (const d of [...drafts]) {
    if (d.kind !== 'power' || d.derived || d.role === 'aside' || d.upper !== undefined) continue;
    const m = COUNT_BEFORE_RE.exec(text.slice(Math.max(0, d.start - 16), d.start));
    if (!m || !COUNTED_THINGS_AFTER_RE.test(text.slice(d.end, d.end + 30))) continue;
    const n = COUNT_WORDS[m[1].toLowerCase()] ?? Number(m[1]);
    const each = siOf(d);
    if (!(n >= 2) || each === null) continue;
    // (Not where the number before is a figure of its own: "at 230 V 60 W bulbs" has no count.)
    if (drafts.some((o) => o !== d && o.end > d.start - 16 && o.end <= d.start)) continue;
    insertAfter(drafts, d, {
      start: d.start - m[0].length,
      end: d.end,
      kind: 'power',
      quantity: typedSi(n * each, 'W'),
      role: d.role,
      derived: `total = ${n} × ${formatQuantity(each, 'W')}`,
    });
    d.role = 'aside';
  }
}

/**
 * "3.2 N per kW in hover tests … the production version will run at 12 kW", "sixty millinewtons per
 * kilowatt at the nominal point, which is one point three five kilowatts": where a text gives a thrust
 * per power and one power in the same paragraph but no thrust, the thrust is the one times the other.
 */
export function thrustFromRatio(text: string, drafts: Draft[]): void {
  if (drafts.some((d) => d.kind === 'thrust' && d.role !== 'aside')) return;
  const ratios = drafts.filter((d) => d.kind === 'thrust-per-power' && d.role !== 'aside' && d.upper === undefined);
  if (ratios.length !== 1) return;
  const r = ratios[0];
  const powers = drafts.filter((d) => d.kind === 'power' && (d.role === 'in' || d.role === null) && d.upper === undefined && paragraphAround(text, d.start, d.end) === paragraphAround(text, r.start, r.end));
  if (powers.length !== 1) return;
  const p = powers[0];
  const [perW, w] = [siOf(r), siOf(p)];
  if (perW === null || w === null || !(w > 0)) return;
  // (Not a push at the photon bound itself, P/c or 2P/c — light absorbed or reflected: there the ratio is
  // the figure the check reads, and which of the two it is rests on the ratio's own words.)
  const ofC = perW * 299_792_458;
  if (ofC >= 0.8 && ofC <= 2.2) return;
  insertAfter(drafts, p.start > r.start ? p : r, {
    start: Math.min(r.start, p.start),
    end: Math.max(r.end, p.end),
    kind: 'thrust',
    quantity: typedSi(perW * w, 'N'),
    role: null,
    derived: `thrust = thrust per power × power (${formatQuantity(perW, 'N/W')} × ${formatQuantity(w, 'W')})`,
  });
}

/** Words of the heat a cooling machine removes, said before its figure ("Refrigerating capacity ....", "cooling output:"). */
const COOLING_DUTY_BEFORE_RE = /(?<!\p{L})(?:cooling|refrigerat(?:ing|ion)|freezing)[^\S\n]+(?:capacity|output|power|duty|effect)[^\n\p{N}]{0,30}$/iu;

/** After a figure: the load or network it goes into ("into the farm's distribution board", "to the grid"). */
const INTO_LOAD_AFTER_RE =
  /^[^\S\n]*,?[^\S\n]*(?:in)?to[^\S\n]+(?:(?:the|a|an|its|our|their)[^\S\n]+)?(?:[\p{L}'’-]+[^\S\n]+){0,2}?(?:grid|distribution board|board|mains|loads?|dump load|battery|batteries|pack|battery pack|heaters?|lamps?|bulbs?|appliances?|network|house|home|consumer unit|resistor|heater element)(?!\p{L})/iu;

/** Right after a voltage: the battery or supply it is of ("9 V PP3 battery", "a 48 V pack", "12 V bench supply"). */
const OF_SUPPLY_AFTER_RE = /^[^\S\n]*(?:[\p{L}\d-]+[^\S\n]+){0,2}?(?:batter(?:y|ies)|packs?|suppl(?:y|ies)|PSUs?|adapters?)(?!\p{L})/iu;
/** A battery or a supply named as what a current is drawn from. */
const SUPPLY_NAMED_RE = /(?<!\p{L})(?:batter(?:y|ies)|packs?|suppl(?:y|ies)|PSUs?|adapters?)(?!\p{L})/iu;

/**
 * "… all running off one 9 V PP3 battery. With the corona wire in place the battery draws 150 to 180 mA":
 * a current drawn from the battery or supply whose voltage the text gives once, in another sentence.
 */
function batteryVoltage(text: string, drafts: Draft[], cur: Draft): Draft | undefined {
  // (Named in the current's own clause, as what it is drawn from: not "it drew far more than 2 A … and the battery was flat".)
  const before = text.slice(Math.max(0, cur.start - 60), cur.start).split(/[.;,!?\n]/u).pop() ?? '';
  const after = text.slice(cur.end, cur.end + 40).split(/[.;,!?\n]/u)[0];
  if (!SUPPLY_NAMED_RE.test(before) && !/(?<!\p{L})(?:from|off|of)[^\S\n]+(?:the|its|a|an)[^\S\n]+(?:[\p{L}\d-]+[^\S\n]+)?(?:batter(?:y|ies)|packs?|suppl(?:y|ies)|PSUs?|adapters?)(?!\p{L})/iu.test(after)) return undefined;
  const volts = drafts.filter((d) => d.kind === 'voltage' && OF_SUPPLY_AFTER_RE.test(text.slice(d.end, d.end + 30)));
  return new Set(volts.map((d) => siOf(d))).size === 1 ? volts[0] : undefined;
}

/** Right before a voltage: what says it is the device's own supply ("runs on 12 V", "is powered from a 24 V", "operates at 48 V"). */
const RUNS_ON_BEFORE_RE =
  /(?<!\p{L})(?:runs?|ran|running|operates?|operated|operating|works?|worked|working|is[^\S\n]+powered|powered|is[^\S\n]+fed|fed|is[^\S\n]+supplied|supplied|is[^\S\n]+rated|rated)[^\S\n]+(?:(?:directly|straight|only)[^\S\n]+)?(?:on|off|from|at|with|by|for)[^\S\n]+(?:(?:a|an|the|its|one|ordinary|plain|standard|nominal|just)[^\S\n]+)?$/iu;
/** Right before a current: that the device draws it ("It takes 3 A", "draws 1.5 A", "a draw of 2 A", "pulls about 4 A"). */
const DRAWS_BEFORE_RE =
  /(?<!\p{L})(?:draws?|drew|drawing|takes?|took|taking|pulls?|pulled|pulling|consumes?|consumed|consuming|uses?|used|using|sips?|sipped|(?:current|draw|consumption|intake)[^\S\n]+(?:is|was|of|at)|(?:current|draw)[^\S\n]*[:=])[^\S\n]+(?:(?:about|around|roughly|some|only|just|nearly|under|a[^\S\n]+steady|a[^\S\n]+mere)[^\S\n]+)?$/iu;

/**
 * "It runs on 12 V. It takes 3 A.": a current the device draws, in a sentence of its own, at the one
 * supply voltage the text gave just before (the only voltage of the text, said as what the device runs
 * on, in the sentence before or the one before that).
 */
function supplyVoltageBefore(text: string, drafts: Draft[], cur: Draft): Draft | undefined {
  if (!DRAWS_BEFORE_RE.test(text.slice(Math.max(0, cur.start - 40), cur.start))) return undefined;
  const volts = drafts.filter((d) => d.kind === 'voltage' && d.role !== 'aside');
  if (new Set(volts.map((d) => siOf(d))).size !== 1) return undefined;
  const volt = volts.find((d) => d.end <= cur.start && cur.start - d.end < 240 && RUNS_ON_BEFORE_RE.test(text.slice(Math.max(0, d.start - 50), d.start)));
  if (!volt || drafts.filter((d) => d.kind === 'current').length !== 1) return undefined;
  // (No more than two sentence ends between, and no paragraph break.)
  const gap = text.slice(volt.end, cur.start);
  if (/\n[^\S\n]*\n/u.test(gap) || (gap.match(/[.!?;](?:\s|$)/gu) ?? []).length > 2) return undefined;
  return volt;
}

/** A sheet's heading line of a side: "INPUT", "Output:", "Input side (DC)". */
const SIDE_HEADING_RE = /^[^\S\n]*(?:electrical[^\S\n]+)?(input|output)(?:[^\S\n]+(?:side|ratings?|data|characteristics))?(?:[^\S\n]*\([^()\n]{0,20}\))?[^\S\n]*:?[^\S\n]*$/iu;

/**
 * A sheet that gives each side under a heading, one figure a line ("INPUT / Voltage .... 36 V DC /
 * Current .... 2.5 A / OUTPUT / Voltage .... 24 V / Current .... 14 A"): the side's voltage and current
 * make its power, on the side the heading names. Only where the section has one of each and no power.
 */
function sectionPowers(text: string, drafts: Draft[]): void {
  const lines = text.split('\n');
  let at = 0;
  const sections: { role: 'in' | 'out'; from: number; to: number }[] = [];
  for (const line of lines) {
    const m = SIDE_HEADING_RE.exec(line);
    if (sections.length && sections[sections.length - 1].to < 0 && (m || line.trim() === '')) sections[sections.length - 1].to = at;
    if (m) sections.push({ role: m[1].toLowerCase() === 'input' ? 'in' : 'out', from: at + line.length, to: -1 });
    at += line.length + 1;
  }
  if (sections.length && sections[sections.length - 1].to < 0) sections[sections.length - 1].to = text.length;
  for (const sec of sections) {
    // (The section ends at the first line that is not indented or labelled like its rows: a new label block.)
    const inside = drafts.filter((d) => d.start >= sec.from && d.end <= sec.to);
    const volts = inside.filter((d) => d.kind === 'voltage');
    const amps = inside.filter((d) => d.kind === 'current');
    if (volts.length !== 1 || amps.length !== 1 || inside.some((d) => d.kind === 'power')) continue;
    const i = siOf(amps[0]);
    const v = siOf(volts[0]);
    if (i === null || v === null) continue;
    const [first, last] = volts[0].start < amps[0].start ? [volts[0], amps[0]] : [amps[0], volts[0]];
    insertAfter(drafts, last, {
      start: first.start,
      end: last.end,
      kind: 'power',
      quantity: typedSi(i * v, 'W'),
      role: sec.role,
      derived: `power = current × voltage (${formatQuantity(i, 'A')} × ${formatQuantity(v, 'V')})`,
    });
  }
}

/** Half the place of a written number's last significant digit, relative to the number ("40" → 5/40, "1" → 0.5, "39.6" → 0.05/39.6). */
function lastDigitHalf(written: string): number {
  const m = /\d[\d,]*(?:\.(\d+))?/u.exec(written);
  if (!m) return 0;
  const value = Number(m[0].replace(/,/gu, ''));
  if (!(value > 0)) return 0;
  const place = m[1] ? 10 ** -m[1].length : 10 ** (/0*$/u.exec(m[0].replace(/,/gu, ''))![0].length);
  return place / 2 / value;
}

/**
 * The side a voltage or a current is labelled with, right before it ("input 0.5 A", "output current
 * 8.5 A", "in: 12 V") or right after it ("230 V in", "12 V out", "5 A input"); else null. ("12 V in the
 * lab" is no label.)
 */
function sideLabel(text: string, d: Draft): 'in' | 'out' | null {
  const after = /^[^\S\n]*(in|out|input|output)(?!\p{L})(?![^\S\n]+(?:the|a|an|its|their|this|that|series|parallel|use|total|all)(?!\p{L}))/iu.exec(text.slice(d.end, d.end + 24));
  const before = /(?:^|[\s,;:(/|])(?:(input|output)(?:[^\S\n]+(?:current|voltage|side))?|(in|out)[^\S\n]*[:=])[^\S\n]*[:=]?[^\S\n]*$/iu.exec(text.slice(Math.max(0, d.start - 30), d.start));
  const word = after?.[1] ?? before?.[1] ?? before?.[2];
  return word ? (/^in/i.test(word) ? 'in' : 'out') : null;
}

/** A supply said to be three-phase: "three-phase", "3-phase", "3~", "three phases", "3 × 16 A". */
const THREE_PHASE_RE = /(?<!\p{L})(?:three[- ]phases?|3[- ]?phases?|3[^\S\n]?~|3[^\S\n]?[×x][^\S\n]?\d+(?:[.,]\d+)?[^\S\n]?A)(?!\p{L})/iu;
const SINGLE_PHASE_RE = /(?<!\p{L})(?:single[- ]phase|one[- ]phase|1[- ]phase|1[^\S\n]?~)(?!\p{L})/iu;

/** A load the device feeds, said just before the pair: "lights a string of mains lamps at", "runs a 40 W heater on". */
const LOAD_LEAD_RE =
  /(?<!\p{L})(?:lights?|lit|lighting|powers|powered|powering|runs|ran|running|feeds|fed|feeding)[^\S\n]+(?:up[^\S\n]+)?(?:a|an|the|its|our|their|two|three|four|five|six|several|\d+)[^\S\n]+(?:[\p{L}'’-]+[^\S\n]+){0,4}?(?:lamps?|bulbs?|lights?|loads?|heaters?|resistors?|appliances?|LEDs?|fans?|kettles?)[^\S\n]+(?:at|on|with|of)[^\S\n]+(?:(?:a|an)[^\S\n]+)?(?:measured[^\S\n]+)?$/iu;
/** A bias voltage: "25 V of reverse bias", "biased at 5 V", "a bias of 30 V". */
const BIAS_RE = /(?<!\p{L})(?:bias(?:ed|ing)?|reverse[- ]bias(?:ed)?)(?!\p{L})/iu;

/** Just before a power or an energy: a share of it ("84.7 % of the 5 kW", "60 per cent of its 200 kJ"); group 1 the percentage. */
const SHARE_OF_BEFORE_RE = /(?<![\d.,])(\d+(?:[.,]\d+)?)[^\S\n]*(?:%|per[^\S\n]?cent|percent)[^\S\n]+of[^\S\n]+(?:(?:the|its|their|this|that|these|those)[^\S\n]+)?(?:(?:about|some|roughly|around|nearly)[^\S\n]+)?$/iu;

/**
 * "So 84.7 % of the 5 kW reaches the wheels, or 4.24 kW": the whole a share is taken of is what goes in,
 * and a figure the text gives as that share (within 2.5 % of it, in the same or the next sentence) is
 * what comes out — whatever the words around them say of the wheels or the load.
 */
function shareOfWhole(text: string, drafts: Draft[]): void {
  for (const whole of drafts) {
    if ((whole.kind !== 'power' && whole.kind !== 'energy') || whole.derived) continue;
    const m = SHARE_OF_BEFORE_RE.exec(text.slice(Math.max(0, whole.start - 40), whole.start));
    const share = m ? Number(m[1].replace(',', '.')) / 100 : NaN;
    const n = siOf(whole);
    if (!(share > 0 && share <= 1) || n === null || !(n > 0)) continue;
    const part = drafts.find((d) => d !== whole && d.kind === whole.kind && !d.derived && d.start > whole.end && d.start - whole.end < 200 && Math.abs((siOf(d) ?? NaN) - share * n) <= 0.025 * share * n);
    if (!part) continue;
    whole.role = 'in';
    part.role = 'out';
  }
}

/** A box said to be shut to every flow: "nothing enters", "no heat, no light, no wires", "sealed, insulated … no heat in". */
const CLOSED_BOX_RE =
  /(?<!\p{L})(?:nothing[^\S\n]+(?:enters|goes[^\S\n]+in|comes[^\S\n]+in|gets[^\S\n]+in)|no[^\S\n]+heat(?:[^\S\n]+(?:in|input))?,[^\S\n]+no[^\S\n]+(?:light|wires|power|fuel|electricity)|(?:sealed|closed),?[^\S\n]+(?:and[^\S\n]+)?(?:thermally[^\S\n]+)?insulated[^.;!?\n]{0,60}?(?:nothing|no[^\S\n]+(?:heat|power|input)))(?!\p{L})/iu;

/** A loop said to feed itself: "closed the loop", "turns its own motor", "pulled the mains plug", "self-running". */
const LOOP_CLAIM_RE =
  /(?<!\p{L})(?:closed[^\S\n]+the[^\S\n]+loop|(?:turns|drives|runs|powers|keeps)[^\S\n]+its[^\S\n]+own[^\S\n]+(?:motor|drive|input)|pull(?:ed|s|ing)?[^\S\n]+(?:out[^\S\n]+)?the[^\S\n]+(?:mains[^\S\n]+)?(?:plug|starter(?:[^\S\n]+cord)?|cord|battery)(?:[^\S\n]+out)?|runs?[^\S\n]+(?:on|off)[^\S\n]+its[^\S\n]+own[^\S\n]+output|self-?(?:running|looped|looping|sustaining|powered)|(?:motor|drive)[^.;!?\n]{0,40}?(?<!\p{L})fed[^\S\n]+(?:back[^\S\n]+)?from[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+|our[^\S\n]+)?(?:[\p{L}\p{N}-]+['’]s[^\S\n]+)?(?:own[^\S\n]+)?(?:output|alternator|generator|dynamo)|feed[^\S\n]+the[^\S\n]+(?:alternator|generator|output)[^\S\n]+back[^\S\n]+(?:in)?to[^\S\n]+the[^\S\n]+motor)(?!\p{L})/iu;
/** A rating said before a motor's name ("1 kW induction motor", "10 HP electric motor", "4 kW drive motor"). */
const MOTOR_AFTER_RE = /^[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,2}?(?:motors?)(?!\p{L})/iu;
/** A rating said before a generator's name ("12 kW alternator head", "a 3 kW generator"). */
const GENERATOR_AFTER_RE = /^[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,2}?(?:alternators?|generators?|dynamos?)(?!\p{L})/iu;

/**
 * "2.2 kW of that goes back to the VFD, so I'm seeing roughly 0.8 to 1.8 kW spare", "keeps the 5 hp motor
 * going with enough left over for a 1,200 W space heater": in a loop said to feed itself, what is fed back
 * is what goes in, and what is said to be spare or left over is the excess.
 */
function loopParts(text: string, drafts: Draft[]): void {
  if (!LOOP_CLAIM_RE.test(text)) return;
  for (const d of drafts) {
    if (d.kind !== 'power' || d.derived) continue;
    const after = text.slice(d.end, d.end + 60);
    const before = text.slice(Math.max(0, d.start - 40), d.start);
    if (/^[^\S\n]*(?:of[^\S\n]+(?:that|it|this)[^\S\n]+)?(?:goes|is[^\S\n]+fed|is[^\S\n]+sent|is[^\S\n]+returned|returns?|feeds?)[^\S\n]+back[^\S\n]+(?:in)?to[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:VFD|motor|drive|input|controller|inverter)(?!\p{L})/iu.test(after)) d.role = 'in';
    else if (/^[^\S\n]*(?:(?:to[^\S\n]+)?spare|left[^\S\n]+over|surplus)(?!\p{L})/iu.test(after) || /(?<!\p{L})(?:left[^\S\n]+over|to[^\S\n]+spare|spare)[^\S\n]+(?:for[^\S\n]+)?(?:(?:a|an|the|our|my)[^\S\n]+)?$/iu.test(before)) d.role = 'excess';
    // (The machine that turns the generator takes what the loop feeds back; the generator gives the
    // output: "A 1 kW induction motor turns our alternator … with the motor fed from the output".)
    else if (MOTOR_AFTER_RE.test(after)) d.role = 'in';
    else if (GENERATOR_AFTER_RE.test(after) || /(?<!\p{L})nameplate[^\S\n]*:?[^\S\n]*$/iu.test(before)) d.role = 'out';
  }
}

/**
 * "Hydrogen peroxide, 18 kg loaded, spacecraft dry mass 62 kg": a mass read as the craft's wet mass that is
 * less than its dry mass cannot be the whole craft — it is the propellant loaded.
 */
function wetBelowDry(drafts: Draft[]): void {
  const wet = drafts.filter((d) => d.kind === 'mass' && d.role === 'wet');
  const dry = drafts.filter((d) => d.kind === 'mass' && d.role === 'dry');
  if (wet.length !== 1 || dry.length !== 1 || drafts.some((d) => d.kind === 'mass' && d.role === 'propellant')) return;
  const [w, dr] = [siOf(wet[0]), siOf(dry[0])];
  if (w !== null && dr !== null && w < dr) wet[0].role = 'propellant';
}

/**
 * The words that label a figure's cell in a row read from a table ("Start cell A 0.78 A" → "start cell"):
 * from the last cell break (";", "|", a line's start) to the figure, less a trailing unit or symbol
 * ("A", "V", "(V)", "[A]", "U", "I"). Empty where the figure has no label of its own.
 */
/** The side a table's column names for the part it measures: "Motor in", "Start cell", "Generator", "Load". */
function stemSide(stem: string): FigureRole {
  if (/(?<!\p{L})(?:in|input|supply|supplied|drive|driving|motor|starter|start|source|primary|mains|grid|draw|drawn)(?!\p{L})/iu.test(stem)) return 'in';
  if (/(?<!\p{L})(?:out|output|load|generator|alternator|dynamo|lamps?|secondary|delivered|harvested)(?!\p{L})/iu.test(stem)) return 'out';
  return null;
}

function cellStem(text: string, d: Draft): string {
  const lead = text.slice(Math.max(0, d.start - 60), d.start);
  const m = /(?:^|[;|\n\t])([^;|\n\t]*)$/u.exec(lead);
  if (!m) return '';
  const words = m[1]
    .trim()
    .replace(/[^\S\n]*(?:[([][^\])]{1,6}[\])]|\b(?:V|A|mA|kV|U|I|volts?|amps?|voltage|current)\b)[^\S\n]*:?$/iu, '')
    .trim()
    .toLowerCase();
  return words.length >= 2 && /\p{L}/u.test(words) ? words : '';
}

/**
 * "A full 2 Ah cell at 3.7 V holds under 27 kJ": what a store holds, its size said between the store and the
 * verb (the words a figure's own window cannot see past the size's figures), is what it has to give — an input.
 */
const STORE_HOLDS_LEAD_RE =
  /(?<!\p{L})(?:batter(?:y|ies)|cells?|packs?|banks?|accumulators?|capacitors?|supercaps?|tanks?|stores?|flywheels?)(?!\p{L})(?:[^.;!?\n]|\.(?=\d)){0,40}?(?<!\p{L})holds?(?:[^\S\n]+(?:about|some|roughly|up[^\S\n]+to|under|just[^\S\n]+under|less[^\S\n]+than|below|at[^\S\n]+most|no[^\S\n]+more[^\S\n]+than|only|just))?[^\S\n]*$/iu;
function storeHolds(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if (d.kind !== 'energy' || d.role !== 'out' || d.derived) continue;
    if (STORE_HOLDS_LEAD_RE.test(text.slice(Math.max(0, d.start - 70), d.start))) d.role = 'in';
  }
}

/**
 * "13.5 kWh went into the battery from the panels, and overnight the house took 12.4 kWh back out of it", "we
 * put 10 kWh into the battery … took 9.2 kWh back out of it": a
 * store's round trip said by where the energy went — into the store is what it took in, back out of it
 * what it gave. Read only where the text says both.
 */
const INTO_STORE_AFTER_RE = /^[^\S\n]*(?:(?:of[^\S\n]+)?(?:energy|charge|electricity|power)[^\S\n]+)?(?:(?:went|goes|go|going|was[^\S\n]+put|were[^\S\n]+put|put|flowed|flows|was[^\S\n]+fed|were[^\S\n]+fed)[^\S\n]+)?in(?:to)?[^\S\n]+(?:the|its|our|my|a)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:batter(?:y|ies)|packs?|stores?|banks?|powerwall|accumulators?|flywheels?)(?!\p{L})/iu;
const OUT_OF_STORE_AFTER_RE = /^[^\S\n]*(?:back[^\S\n]+)?out[^\S\n]+of[^\S\n]+(?:it|them|the[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:batter(?:y|ies)|packs?|stores?|banks?|accumulators?|flywheels?))(?!\p{L})/iu;
function storeRoundTrip(text: string, drafts: Draft[]): void {
  const energies = drafts.filter((d) => d.kind === 'energy' && !d.derived);
  const into = energies.filter((d) => INTO_STORE_AFTER_RE.test(text.slice(d.end, d.end + 60)));
  const outOf = energies.filter((d) => OUT_OF_STORE_AFTER_RE.test(text.slice(d.end, d.end + 40)));
  if (into.length !== 1 || outOf.length !== 1 || into[0] === outOf[0]) return;
  into[0].role = 'in';
  outOf[0].role = 'out';
}

export function relateFigures(text: string, drafts: Draft[]): void {
  storeHolds(text, drafts);
  storeRoundTrip(text, drafts);
  loopParts(text, drafts);
  inputForEvery(text, drafts);
  quantumRestated(text, drafts);
  shareOfWhole(text, drafts);
  // "P_out/P_in = 3.2 kW / 0.8 kW": the roles in the order the labels give them.
  for (const m of text.matchAll(RATIO_LABELS_RE)) {
    const from = m.index! + m[0].length;
    const [a, b] = drafts.filter((d) => (d.kind === 'power' || d.kind === 'energy') && d.start >= from);
    if (!a || !b || a.kind !== b.kind || a.start - from > 12 || !/^[^\S\n]*(?:\/|:|to|vs\.?|versus)[^\S\n]*$/iu.test(text.slice(a.end, b.start))) continue;
    const side = (label: string): FigureRole => (/out|_\{?o\}?$/i.test(label) ? 'out' : 'in');
    a.role = side(m[1]);
    b.role = side(m[2]);
  }

  // "lifts a 1 mW signal to 100 mW", "boosts the input from 2 W to 40 W": what goes in and what comes out.
  for (let i = 0; i + 1 < drafts.length; i++) {
    const [a, b] = [drafts[i], drafts[i + 1]];
    if (!(a.kind === b.kind && (a.kind === 'power' || a.kind === 'energy'))) continue;
    const lead = text.slice(Math.max(0, a.start - 50), a.start);
    if (AMPLIFY_BEFORE_RE.test(lead) && /^[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,3}?(?:in)?to[^\S\n]+(?:about[^\S\n]+|some[^\S\n]+|roughly[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) {
      a.role = 'in';
      b.role = 'out';
    }
  }

  // "the output exceeds the 60 W electrical input by 21 W": the first is the input, the second the excess.
  for (let i = 0; i + 1 < drafts.length; i++) {
    const [a, b] = [drafts[i], drafts[i + 1]];
    if (!(a.kind === b.kind && (a.kind === 'power' || a.kind === 'energy'))) continue;
    const lead = text.slice(Math.max(0, a.start - 40), a.start);
    if (
      /(?<!\p{L})(?:exceeds?|exceeded|exceeding|surpass(?:es|ed|ing)?|outstrips?|outstripped|tops?|topped|beats?|beat)[^\S\n]+(?:(?:the|its|their|an?)[^\S\n]+)?$/iu.test(lead) &&
      /^[^\S\n]*(?:of[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,5}?by[^\S\n]+(?:(?:about|some|roughly|nearly|fully|a full|over|more than)[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))
    ) {
      a.role = 'in';
      b.role = 'excess';
    }
  }

  // "4 W more heat than the 20 W it draws": the first is an excess, the second the input.
  for (let i = 0; i + 1 < drafts.length; i++) {
    const a = drafts[i];
    const b = drafts[i + 1];
    if (!(a.kind === b.kind && (a.kind === 'power' || a.kind === 'energy'))) continue;
    const gap = text.slice(a.end, b.start);
    if (/^[^\S\n]*(?:of[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,3}?(?:more|extra|additional|over and above|above|beyond|in excess of|on top of)(?:[^\S\n]+[\p{L}-]+){0,4}?[^\S\n]+(?:than|over|of|on|above|as(?=[^\S\n]+(?:the|its)[^\S\n]))[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+|an[^\S\n]+|a[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}$/iu.test(gap) ||
      // "1.3 MJ of heat came out beyond the 4.1 MJ supplied"
      /^[^\S\n]*(?:of[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,4}?(?:beyond|over and above|in excess of|on top of)[^\S\n]+(?:the|its|an|a|their)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?$/iu.test(gap) || /^[^\S\n]+(?:more|extra)[^\S\n]+than[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?$/iu.test(gap)) {
      a.role = 'excess';
      b.role = 'in';
    }
  }
  // "4 W more heat into the 50 °C water tank than the 20 W it draws": where the heat goes said between,
  // other figures (a temperature) among those words.
  for (let i = 0; i < drafts.length; i++) {
    const a = drafts[i];
    if (!(a.kind === 'power' || a.kind === 'energy') || a.role === 'excess') continue;
    const b = drafts.slice(i + 1).find((d) => d.kind === a.kind);
    if (!b || sentenceAround(text, a.start, a.end) !== sentenceAround(text, b.start, b.end)) continue;
    const gap = text.slice(a.end, b.start);
    if (
      /^[^\S\n]*(?:of[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:more|extra|additional)[^\S\n]+(?:(?:useful|thermal|electrical)[^\S\n]+)?(?:heat|power|energy|electricity|work)[^\S\n]+(?:into|to|in|for)[^\S\n]+(?:the|its|their|a|an)[^\S\n]+[^.;:!?\n]{1,40}?[^\S\n]+than[^\S\n]+(?:the|its|an?)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}$/iu.test(gap) &&
      /^[^\S\n]*(?:(?:it|the[^\S\n]+\p{L}+)[^\S\n]+)?(?:draws?|drew|takes?|took|uses?|used|consumes?|consumed|is[^\S\n]+fed|needs?|pulls?)(?!\p{L})/iu.test(text.slice(b.end, b.end + 40))
    ) {
      a.role = 'excess';
      b.role = 'in';
    }
  }

  // "Output: 2 × 150 W into 4 Ω", "three 30 kW units", "twin 250 W motors": so many of a rated thing, the
  // total what the device's side is; each one's rating set aside.
  for (const d of [...drafts]) {
    if (!(d.kind === 'power' || d.kind === 'energy' || d.kind === 'thrust') || d.derived || /^10[⁰-⁹⁻^]/u.test(text.slice(d.start, d.end))) continue;
    const lead = text.slice(Math.max(0, d.start - 12), d.start);
    // (Not a factor of a product worked out: "60 × 48 × 3,600 joules".)
    const times = /[×x*·][^\S\n]*\d[\d.,]*[^\S\n]*[×x][^\S\n]*$/u.test(text.slice(Math.max(0, d.start - 24), d.start)) ? null : /(?<![\d.,^⁰-⁹])(\d{1,2})[^\S\n]*[×x][^\S\n]*$/u.exec(lead);
    const word = /(?<!\p{L})(two|three|four|five|six|eight|ten|twelve|twin)[^\S\n]+$/iu.exec(lead);
    const plural = /^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+)?(?:channels|units|modules|panels|motors|heaters|elements|thrusters|engines|turbines|stacks|cells|lamps|fans|generators|compressors|pumps|strings|arrays|inverters|machines)(?!\p{L})/iu.test(text.slice(d.end, d.end + 40));
    const n = times ? Number(times[1]) : word && plural ? { two: 2, twin: 2, three: 3, four: 4, five: 5, six: 6, eight: 8, ten: 10, twelve: 12 }[word[1].toLowerCase()]! : 0;
    if (!(n >= 2)) continue;
    const one = siOf(d);
    if (one === null) continue;
    const unit = FIGURE_SI_UNIT[d.kind];
    insertAfter(drafts, d, { start: d.start - (times ?? word)![0].length, end: d.end, kind: d.kind, quantity: typedSi(n * one, unit), role: d.role, derived: `${n} × ${formatQuantity(one, unit)}` });
    d.role = 'aside';
  }

  // "fuel producing 1,500 W of decay heat … convert 5.0 % of that heat into 75 W of electricity": what the heat
  // is turned into is the output, and the heat said before it the input.
  for (const d of drafts) {
    if (d.kind !== 'power' && d.kind !== 'energy') continue;
    const lead = /(?<!\p{L})(?:convert(?:s|ed|ing)?|turn(?:s|ed|ing)?)(?:[^\S\n]+(?:about|roughly|some|only|just))?[^\S\n]+(?:[\d.,]+[^\S\n]*(?:%|per[^\S\n]?cent)[^\S\n]+)?of[^\S\n]+(?:that|this|the|its)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?heat[^\S\n]+into[^\S\n]+(?:(?:about|roughly|some|only|just)[^\S\n]+)?$/iu.exec(text.slice(Math.max(0, d.start - 80), d.start));
    if (!lead || !/^[^\S\n]*(?:of[^\S\n]+)?(?:electricity|electric(?:al)?[^\S\n]+power|work|mechanical[^\S\n]+power|shaft[^\S\n]+power)(?!\p{L})/iu.test(text.slice(d.end, d.end + 30))) continue;
    const heat = [...drafts].reverse().find((h) => h.kind === d.kind && h.end <= d.start && h !== d && /^[^\S\n]*of[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?heat(?!\p{L})/iu.test(text.slice(h.end, h.end + 30)));
    if (!heat) continue;
    d.role = 'out';
    heat.role = 'in';
  }

  sectionPowers(text, drafts);
  // Power from a current and a voltage in the same clause: "12 A at 24 V", "3 amps from a 48-volt pack".
  const currents = drafts.filter((d) => d.kind === 'current');
  const voltsNear = (cur: Draft) => drafts.filter((d) => d.kind === 'voltage' && sameClause(text, d, cur) && Math.abs(d.start - cur.start) < 120);
  // "0.9 A at 24 V": the voltage said with the current, right after or right before it.
  // ("5 V in at 2 A, 12 V out at 0.75 A": a comma parts two pairs.)
  const saidWith = (cur: Draft, candidates: Draft[]) =>
    candidates.find((d) => d.start >= cur.end && /^[^\S\n]*(?:at|@|from|on|×|x|\*|\/)?[^\S\n]*(?:an?[^\S\n]+)?$/iu.test(text.slice(cur.end, d.start))) ??
    candidates.find((d) => d.end <= cur.start && /^[^\S\n]*(?:(?:in|out|input|output|DC|AC)[^\S\n]+)?(?:at|@|×|x|\*|\/)?[^\S\n]*$/iu.test(text.slice(d.end, cur.start))) ??
    candidates.find((d) => d.start >= cur.end && /^[^\S\n]*,[^\S\n]*(?:an?[^\S\n]+)?$/iu.test(text.slice(cur.end, d.start))) ??
    candidates.find((d) => d.end <= cur.start && /^[^\S\n]*,[^\S\n]*$/iu.test(text.slice(d.end, cur.start)));
  for (const cur of currents) {
    // (Not a transistor's base, collector or gate current, which one controls the other by: "a 2 mA base
    // current controls 300 mA of collector current" — a current gain, no power taken or given.)
    if (TRANSISTOR_CURRENT_AFTER_RE.test(text.slice(cur.end, cur.end + 30)) || TRANSISTOR_CURRENT_BEFORE_RE.test(text.slice(Math.max(0, cur.start - 30), cur.start))) continue;
    // The voltage nearest the current in its sentence ("steps 230 V down to 12 V and delivers 5 A": 12 V).
    const candidates = voltsNear(cur);
    // (Or said just before it across an aside in dashes: "gives 400 V — a 33x gain!! — at 80 mA".)
    if (candidates.length === 0) {
      const dashed = drafts.find((d) => d.kind === 'voltage' && d.end <= cur.start && cur.start - d.end < 60 && /^[^\S\n]*(?:[—–][^—–\n]{1,40}[—–]|\([^()\n]{1,40}\))[^\S\n]*(?:at|@)[^\S\n]*$/iu.test(text.slice(d.end, cur.start)));
      if (dashed) candidates.push(dashed);
    }
    // Else the nearest — not one said with another current ("6.1 A at 36 V into the controller, while
    // 17.2 A goes into the batteries at 12.6 V": 17.2 A is at 12.6 V).
    const taken = new Set(currents.filter((c) => c !== cur).map((c) => saidWith(c, voltsNear(c))));
    const free = candidates.filter((d) => !taken.has(d));
    // (Not a voltage said with another current: "the supply battery delivered 2.5 A while the load took
    // 4.1 A at 9.0 V" — 9.0 V is the load's, and the 2.5 A has no voltage of its own here.)
    // (In a row of a labelled table — "Start cell V 12.4 V; Start cell A 0.78 A; Generator V 13.1 V" — the
    // voltage whose column names the same part as the current's.)
    const stem = cellStem(text, cur);
    const sameColumn = stem ? free.find((d) => cellStem(text, d) === stem) : undefined;
    // Each side labelled apart ("230 V in, 12 V out, input 0.5 A, output 8.5 A"; "12 V in / 96 V out;
    // input current 5 A, output 0.58 A"): the current goes with the one voltage of its own side.
    const side = sideLabel(text, cur);
    const sameSide = side ? candidates.filter((d) => sideLabel(text, d) === side) : [];
    const sideVolt = sameSide.length === 1 && candidates.some((d) => { const o = sideLabel(text, d); return o !== null && o !== side; }) ? sameSide[0] : undefined;
    const volt = sideVolt ?? saidWith(cur, candidates) ?? sameColumn ?? free.sort((a, b) => Math.abs(a.start - cur.start) - Math.abs(b.start - cur.start))[0] ?? batteryVoltage(text, drafts, cur) ?? supplyVoltageBefore(text, drafts, cur);
    if (!volt) continue;
    const i = siOf(cur);
    const v = siOf(volt);
    if (i === null || v === null) continue;
    // The text states that power itself already, in the same sentence (not a rating in a title: "a 500 W
    // converter" beside "an input of 10.5 A at 48 V").
    const pairSentence = sentenceAround(text, cur.start, cur.end);
    // (Said as rounded — "3.3 V at 12 mA (≈40 mW)", "5 V at 190 mA (about 1 W)" — within half its last
    // digit, up to 10 %.)
    const roundedSaid = (d: Draft) => /(?:≈|~|∼|about|around|roughly|approx\.?|approximately|nearly|almost|some|c\.|ca\.)[^\S\n]*$/iu.test(text.slice(Math.max(0, d.start - 16), d.start));
    const tolerance = (d: Draft) => (roundedSaid(d) ? Math.min(0.1, Math.max(0.01, lastDigitHalf(text.slice(d.start, d.end)))) : 0.01);
    const same = drafts.find((d) => d.kind === 'power' && !d.derived && Math.abs((siOf(d) ?? 0) - i * v) <= tolerance(d) * i * v && sentenceAround(text, d.start, d.end) === pairSentence);
    // (Said as rounded: a restatement of the pair's power, which is worked out exactly from the pair.)
    if (same && Math.abs((siOf(same) ?? 0) - i * v) > 0.01 * i * v) same.role = 'aside';
    else if (same) {
      // ("rises on 30 kV at 1.1 mA, just 33 W and no fuel at all": the power said right after the pair is
      // the pair's, what the device is run on, where no words give it a side of its own.)
      const pairEnd = Math.max(cur.end, volt.end);
      if (same.role === null && same.start >= pairEnd && /^[^\S\n]*(?:,|\(|—|–|-)?[^\S\n]*(?:(?:so|i\.e\.|that['’]s|that[^\S\n]+is|or|just|only|about|roughly|some|which[^\S\n]+is|around|approx\.?|approximately|nearly)[^\S\n]+|[≈~∼][^\S\n]*)*$/iu.test(text.slice(pairEnd, same.start))) {
        const first = cur.start < volt.start ? cur : volt;
        same.role = roleFor(text, 'power', first.start, pairEnd, windowStart(text, first.start, 0, BEFORE_WINDOW)) ?? 'in';
        if (same.role === 'excess' || same.role === 'aside') same.role = null;
      }
      // ("Our 30 W lifter (20 kV at 1.5 mA) rises …": the pair in brackets right after the power, or after
      // the name it rates, is what makes it; with no words of a side, it is what the device is run on.)
      const pairStart = Math.min(cur.start, volt.start);
      // (Not of a machine that gives electricity: "a 30 W generator (12 V at 2.5 A)".)
      if (same.role === null && same.end <= pairStart && /^[^\S\n]*(?:[\p{L}-]+[^\S\n]*){0,3}?[([][^\S\n]*$/u.test(text.slice(same.end, pairStart))) {
        const gives = /(?<!\p{L})(?:generat\w*|alternators?|dynamos?|gensets?|outputs?|deliver\w*|gives?|giving|supplies|supplying|produc\w*|makes?|making|charg\w*|cells?|panels?|modules?|harvest\w*)(?!\p{L})/iu.test(pairSentence);
        same.role = roleFor(text, 'power', same.start, pairEnd, windowStart(text, same.start, 0, BEFORE_WINDOW)) ?? (gives ? null : 'in');
        if (same.role === 'excess' || same.role === 'aside') same.role = null;
      }
      continue;
    }
    // A three-phase supply ("400 V 3~, 10.6 A", "400 V three-phase, 19 A running current"): its line voltage
    // and line current give at most √3 × V × I (the power factor is at most 1). Not where the text works
    // out the power itself in that sentence ("≈ √3 × 400 × 28 × 0.86 = 16.7 kW").
    const phases = THREE_PHASE_RE.test(pairSentence) && !SINGLE_PHASE_RE.test(pairSentence) && !/√[^\S\n]?3|(?<![\d.])1\.73|root[- ]?(?:of[^\S\n]+)?(?:3|three)|sqrt/iu.test(pairSentence);
    const k = phases ? Math.sqrt(3) : 1;
    const iu = upperSiOf(cur);
    const vu = upperSiOf(volt);
    const first = cur.start < volt.start ? cur : volt;
    const last = first === cur ? volt : cur;
    // The role: the words around the current or the voltage ("draws 3 A" → in, "delivers 10 A" → out).
    // Words between the two ("12 V supply drawing 2.5 A") are the closest; then those around the pair.
    // "5 V in at 2 A", "12 V out at 0.75 A": in or out said right after either of the two.
    // ("| in: 5 A at 12 V | out: 2.9 A at 19 V": a label just before the pair.)
    const said =
      [volt, cur].map((d) => /^[^\S\n]*(in|out|input|output)(?!\p{L})/iu.exec(text.slice(d.end, d.end + 12))).find((x) => x !== null) ??
      // ("1.1 A at 18 V at the charger's output", "at its input terminals".)
      // ("… gives only 0.8 A at 12 V to the input".)
      /^[^\S\n]*(?:at|on|across|to|into)[^\S\n]+(?:(?:the|its|their)[^\S\n]+)?(?:[\p{L}'’-]+[^\S\n]+){0,2}?(input|output)(?!\p{L})/iu.exec(text.slice(last.end, last.end + 40)) ??
      /(?:^|[|\n•;,(])[^\S\n]*(?:(?:electrical|electric|DC|AC)[^\S\n]+)?(in|out|input|output)[^\S\n]*[:=][^\S\n]*$/iu.exec(text.slice(Math.max(0, first.start - 30), first.start));
    // "the coil charges a 12 V battery at 3 A": what it charges is its output, whatever the words between.
    // ("… which lights a string of mains lamps at 230 V with a measured 0.26 A": the lamps it lights are its load.)
    const fills = !said && (FILLS_LEAD_RE.test(text.slice(Math.max(0, first.start - 40), first.start)) || LOAD_LEAD_RE.test(text.slice(Math.max(0, first.start - 70), first.start)));
    // "from a 24 V supply at 5 A", "a 12 V power supply drawing 2 A": the pair is a supply's, what the device takes.
    // ("a 12 V leisure battery, which supplies 8 A to the driver board": a supply giving the device's parts.)
    const toPart = !said && !fills && SUPPLY_GIVES_LEAD_RE.test(text.slice(first.end, last.start)) && TO_DEVICE_PART_AFTER_RE.test(text.slice(last.end, last.end + 50));
    const supplied = !said && !fills && (toPart || /^[^\S\n]*(?:(?:DC|AC|bench|lab|power)[^\S\n]+)?(?:supply|supplies|PSU|mains|adapter|source|rail)(?!\p{L})/iu.test(text.slice(first.end, last.start)));
    // "5 A at 230 V into the farm's distribution board", "… to the grid": what goes into a load or a grid is given out.
    const intoLoad = !said && !fills && !toPart && INTO_LOAD_AFTER_RE.test(text.slice(last.end, last.end + 60));
    // "25 V of reverse bias … a photocurrent of 0.77 mA": a bias supply's voltage, what the supply gives the device.
    const biased = !said && !fills && BIAS_RE.test(text.slice(Math.max(0, volt.start - 20), volt.end + 25));
    // ("each emitter in its grow light runs at 350 mA and 3.1 V": the pair a device runs at is what it takes,
    // whatever words of light or output stand before the verb.)
    const runsAt = !said && !fills && /(?<!\p{L})(?:runs?|ran|running|operates?|operated|operating|is[^\S\n]+driven|driven|works?|worked|working)[^\S\n]+(?:at|on|with|from)[^\S\n]+(?:(?:about|around|roughly|some|just|only|a[^\S\n]+nominal|a[^\S\n]+steady)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, first.start - 40), first.start));
    const between = said ? (/^in/i.test(said[1]) ? 'in' : 'out') : fills || intoLoad ? 'out' : supplied || biased || runsAt ? 'in' : /[,;]/.test(text.slice(first.end, last.start)) ? null : roleFor(text, 'power', last.start, last.end, first.end);
    // (Two cells of a table's row, "Start cell V 12.4 V; Start cell A 0.78 A": the side only as their column
    // names it, not words from the lines above.)
    const cells = !said && stem !== '' && stem === cellStem(text, volt) && /;/.test(text.slice(first.end, last.start));
    const wordsRole = cells ? stemSide(stem) : (between ?? roleFor(text, 'power', first.start, last.end, windowStart(text, first.start, 0, BEFORE_WINDOW)) ?? roleFor(text, 'power', cur.start, cur.end, 0));
    const others = drafts.filter((d) => (d.kind === 'power' || d.kind === 'energy') && d.role !== null && d.role !== 'aside');
    // (The side of the same power said outright — "7.2 A at 120 V. That's 864 W going in" — before words read
    // further off, where none is said at the pair; where no words give one, beside inputs only, the output.)
    const restated = others.find(
      (d) =>
        d.kind === 'power' &&
        !d.derived &&
        (d.role === 'in' || d.role === 'out') &&
        Math.abs((siOf(d) ?? NaN) - i * v) <= 0.01 * i * v &&
        d.start >= last.end &&
        d.start - last.end < 40 &&
        /(?:that['’]?s|that[^\S\n]+is|that[^\S\n]+makes|which[^\S\n]+is|i\.e\.|so|giving|=)[^\S\n]*(?:(?:about|roughly|some|around|nearly|just[^\S\n]+over|just[^\S\n]+under)[^\S\n]+)?$/iu.test(text.slice(last.end, d.start)),
    );
    const plain = !said && !fills && !intoLoad && !supplied && !biased;
    const role: FigureRole = (plain ? restated?.role : undefined) ?? wordsRole ?? (others.length && others.every((d) => d.role === 'in') ? 'out' : null);
    insertAfter(drafts, last, {
      start: first.start,
      end: last.end,
      kind: 'power',
      quantity: typedSi(k * i * v, 'W'),
      upper: iu !== null || vu !== null ? typedSi(k * (iu ?? i) * (vu ?? v), 'W') : undefined,
      role: role === 'excess' ? 'out' : (role ?? 'in'),
      derived: phases
        ? `power = √3 × current × voltage, three-phase (√3 × ${formatQuantity(i, 'A')} × ${formatQuantity(v, 'V')})`
        : `power = current × voltage (${formatQuantity(i, 'A')} × ${formatQuantity(v, 'V')})`,
      assumption: [
        role === null ? 'The power of this current and voltage is read as the power supplied to the device.' : '',
        phases ? 'Three-phase: √3 × line voltage × line current is the most it can be (at a power factor of 1).' : '',
      ].filter(Boolean).join(' ') || undefined,
    });
  }

  // "the 3 kg flywheel generator … puts out 500 W/kg": a power per mass times the one mass the text
  // gives (not a rocket's wet, dry or propellant mass) is a power on the side the words around the
  // ratio say, when the text states no power on that side.
  {
    const sp = drafts.filter((d) => d.kind === 'specific-power');
    const masses = drafts.filter((d) => d.kind === 'mass');
    if (sp.length === 1 && masses.length === 1 && masses[0].role === null && sp[0].upper === undefined) {
      const [ratio, mass] = [sp[0], masses[0]];
      const w = siOf(ratio);
      const kg = siOf(mass);
      // (Only when words give the ratio a side: "a 500 kg satellite with a 30 W/kg array" says nothing of the array's mass.)
      let role: FigureRole = roleFor(text, 'power', ratio.start, ratio.end, 0);
      // "The generator has a mass of 4.5 kg and a specific power of 800 W/kg": a machine that makes
      // power, its own mass and its specific power in one sentence — its output (not a craft's mass
      // beside the ratio of a part it carries).
      const sentence = sentenceAround(text, Math.min(ratio.start, mass.start), Math.max(ratio.end, mass.end));
      if (role === null && sentence.includes(text.slice(ratio.start, ratio.end)) && sentence.includes(text.slice(mass.start, mass.end)) && POWER_MAKER_RE.test(sentence) && !CRAFT_WORDS_RE.test(sentence)) role = 'out';
      if (w !== null && kg !== null && w > 0 && kg > 0 && (role === 'in' || role === 'out') && !drafts.some((d) => d.kind === 'power' && d.role === role)) {
        const last = ratio.start > mass.start ? ratio : mass;
        insertAfter(drafts, last, {
          start: Math.min(ratio.start, mass.start),
          end: Math.max(ratio.end, mass.end),
          kind: 'power',
          quantity: typedSi(w * kg, 'W'),
          role,
          derived: `power = power per mass × mass (${formatQuantity(w, 'W/kg')} × ${formatQuantity(kg, 'kg')})`,
        });
      }
    }
  }

  // A "COP" of a circuit, a motor or a generator, where nothing moves heat: its output over its input.
  if (!HEAT_PUMP_RE.test(text) && !COOLING_MACHINE_RE.test(text) && ELECTRICAL_GAIN_RE.test(text) && !drafts.some((d) => d.kind === 'temperature')) {
    for (const d of drafts) {
      if (d.kind === 'cop' && d.role === null) {
        d.kind = 'efficiency';
        d.derived = 'a "COP" of a device that moves no heat: output over input';
      }
    }
  }
  countedPowers(text, drafts);
  ratingPoint(text, drafts);
  rolesByContext(text, drafts);
  asideControlPowers(text, drafts);
  asidePassedOn(text, drafts);
  asideLoadsOfSource(text, drafts);
  asideStoreSize(text, drafts);
  storeAloneIsInput(text, drafts);
  wetBelowDry(drafts);
  asideQuotedLightSpeed(text, drafts);
  asideWindSpeeds(text, drafts);
  asideSpeedGlosses(text, drafts);
  asideDenied(text, drafts);
  asideIdealWork(text, drafts);
  asideFutureVersions(text, drafts);
  asideComparedLamps(text, drafts);
  asideOtherBasis(text, drafts);
  usableSizeOfFilledStore(text, drafts);
  efficiencyQuotient(text, drafts);

  // "every kilowatt fed to it gives four hundred millinewtons": a thrust per power.
  for (const d of drafts) {
    if (d.kind !== 'thrust') continue;
    const m = /(?<!\p{L})(?:every|each|per|a)[^\S\n]+(kilowatt|watt|kW|W|megawatt|MW)(?!\p{L})[^.;!?\n]{0,60}?(?:gives?|yields?|produces?|makes?|delivers?|buys?|brings?|returns?)[^\S\n]+(?:(?:about|roughly|some|nearly|over|at least)[^\S\n]+)?$/iu.exec(text.slice(Math.max(0, d.start - 120), d.start));
    if (!m) continue;
    const unit = /^(?:kilowatt|kW)$/i.test(m[1]) ? 'kW' : /^(?:megawatt|MW)$/.test(m[1]) ? 'MW' : 'W';
    d.kind = 'thrust-per-power';
    d.quantity = `${d.quantity} / ${unit}`;
    d.derived = `thrust for each ${unit} of power`;
  }
  // "reduces its weight on the scale by 120 g", "reads 40 g lighter": a force, in grams-force.
  for (const d of drafts) {
    // (Not a load lifted at a stated speed, already a power's factor: "lifts 60 kg at 1 m/s".)
    if (d.kind !== 'mass' || drafts.some((p) => p.start === d.start && p.derived?.startsWith('power = mass × g × speed'))) continue;
    const before = text.slice(Math.max(0, d.start - 60), d.start);
    const after = text.slice(d.end, d.end + 30);
    // "lifts 3 lbs off the scale", "lifted its own 2 kg frame": a weight held up, for a drive (not a rocket's or a crane's load).
    const lifted = LIFTS_BEFORE_RE.test(before) && !ROCKET_RE.test(text) && !HOIST_RE.test(text);
    // ("its weight by 120 g", "a weight loss of 40 g"; not "a gross lift-off weight of 2400 lb", which is a mass.)
    const weightChange =
      /(?:weight|reading|reads|scale|balance)[^.;!?\n:"“”]{0,40}by[^\S\n]*(?:about|some|roughly|nearly|up to)?[^\S\n]*$/iu.test(before) ||
      (/(?:weight|reading|reads|scale|balance)[^.;!?\n:"“”]{0,40}of[^\S\n]*(?:about|some|roughly|nearly|up to)?[^\S\n]*$/iu.test(before) &&
        /(?<!\p{L})(?:reduc\w*|los(?:s|es|t|ing)|drops?|dropped|chang\w*|decreas\w*|lighter|heavier|apparent|shifts?|falls?|fell|difference|deflect\w*)(?!\p{L})/iu.test(before));
    if (lifted || weightChange || /^[^\S\n]*(?:lighter|heavier|less weight|of (?:lift|weight loss|apparent weight)|off (?:its|the) (?:weight|reading))/iu.test(after)) {
      const kg = siOf(d);
      if (kg === null) continue;
      d.kind = 'thrust';
      d.quantity = `${Number(kg.toPrecision(15))} kgf`;
      d.role = null;
      d.derived = lifted ? 'a weight held up, as a force (kilograms-force)' : 'a change of weight on a scale, as a force (kilograms-force)';
    }
  }

  // "It delivers 5 W less than the 65 W it draws": out = in − the shortfall.
  for (let i = 0; i + 1 < drafts.length; i++) {
    const [a, b] = [drafts[i], drafts[i + 1]];
    if (!(a.kind === b.kind && (a.kind === 'power' || a.kind === 'energy'))) continue;
    if (!/^[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,2}?(?:less|lower|short of)[^\S\n]+(?:than[^\S\n]+)?(?:the[^\S\n]+|its[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) continue;
    const x = siOf(a);
    const y = siOf(b);
    if (x === null || y === null || x >= y) continue;
    a.role = null;
    b.role = 'in';
    insertAfter(drafts, b, { start: a.start, end: b.end, kind: a.kind, quantity: typedSi(y - x, FIGURE_SI_UNIT[a.kind]), role: 'out', derived: `output = input − the shortfall (${formatQuantity(y, FIGURE_SI_UNIT[a.kind])} − ${formatQuantity(x, FIGURE_SI_UNIT[a.kind])})` });
  }

  // out = in + excess, when the text gives no output itself.
  for (const kind of ['power', 'energy'] as const) {
    const excess = drafts.find((d) => d.kind === kind && d.role === 'excess' && !d.derived);
    const input = drafts.find((d) => d.kind === kind && d.role === 'in');
    const output = drafts.find((d) => d.kind === kind && d.role === 'out');
    // (An output said in another paragraph than the excess and its input — a calibration run's, an
    // earlier cell's — is not the one they give: "12 W more heat than the 40 W it draws … Section 2:
    // at 40 W the calibration heater was recovered as 39.6 W".)
    const ownOutput = drafts.find((d) => d.kind === kind && d.role === 'out' && excess && paragraphAround(text, d.start, d.end) === paragraphAround(text, excess.start, excess.end));
    if (excess && input && (!output || (!ownOutput && paragraphAround(text, excess.start, excess.end) === paragraphAround(text, input.start, input.end)))) {
      const e = siOf(excess);
      const n = siOf(input);
      if (e === null || n === null) continue;
      const unit = FIGURE_SI_UNIT[kind];
      const eu = upperSiOf(excess);
      const anchor = excess.start > input.start ? excess : input;
      insertAfter(drafts, anchor, {
        start: Math.min(excess.start, input.start),
        end: Math.max(excess.end, input.end),
        kind,
        quantity: typedSi(n + e, unit),
        upper: eu !== null ? typedSi(n + eu, unit) : undefined,
        role: 'out',
        derived: `output = input + excess (${formatQuantity(n, unit)} + ${formatQuantity(e, unit)})`,
      });
    } else if (excess && output && !input && !excess.upper && !output.upper && output.start < excess.start) {
      // "delivers 1.8 kW to the load, which is 0.6 kW more than it consumes": in = out − excess.
      const e = siOf(excess);
      const o = siOf(output);
      if (e === null || o === null || !(o > e)) continue;
      const unit = FIGURE_SI_UNIT[kind];
      insertAfter(drafts, excess, {
        start: output.start,
        end: excess.end,
        kind,
        quantity: typedSi(o - e, unit),
        role: 'in',
        derived: `input = output − excess (${formatQuantity(o, unit)} − ${formatQuantity(e, unit)})`,
      });
    }
  }

  // "25 % more power than its 2 kW input", "five times the 20 W it takes in": with the input stated,
  // the excess and the output as figures.
  const GAINS = ['output = input + the percentage more', 'output as a multiple of the input', 'units out for each unit in'];
  // ("returns 140 % of what it draws": a percentage of the input above 100 %.)
  const more = drafts.find((d) => d.kind === 'efficiency' && ((d.derived !== undefined && GAINS.includes(d.derived)) || (d.ofInput && (siOf(d) ?? 0) > 1)));
  if (more) {
    const g = siOf(more);
    for (const kind of ['power', 'energy'] as const) {
      const inputs = drafts.filter((d) => d.kind === kind && d.role === 'in' && (!d.derived || /^power = (?:√3 × )?current × voltage/.test(d.derived)) && sameClause(text, d, more));
      if (g === null || g <= 1 || inputs.length !== 1 || drafts.some((d) => d.kind === kind && (d.role === 'out' || d.role === 'excess'))) continue;
      const input = inputs[0];
      const n = siOf(input);
      if (n === null) continue;
      const unit = FIGURE_SI_UNIT[kind];
      const anchor = more.start > input.start ? more : input;
      const span = { start: Math.min(more.start, input.start), end: Math.max(more.end, input.end), kind };
      insertAfter(drafts, anchor, { ...span, quantity: typedSi(n * g, unit), role: 'out', derived: `output = input × ${formatPrint(g)} (${formatQuantity(n, unit)} × ${formatPrint(g)})` });
      insertAfter(drafts, anchor, { ...span, quantity: typedSi(n * (g - 1), unit), role: 'excess', derived: `excess = input × ${formatPrint(g - 1)} (${formatQuantity(n, unit)} × ${formatPrint(g - 1)})` });
      break;
    }
  }

  // "96 % of its input … draws 250 W", "80,000 BTU/h input, 95 % efficiency": the output the stated
  // efficiency gives, where the text states only the input.
  const eta = drafts.find((d) => d.kind === 'efficiency' && !d.derived && (siOf(d) ?? 2) <= 1);
  if (eta && !more) {
    for (const kind of ['power', 'energy'] as const) {
      const inputs = drafts.filter((d) => d.kind === kind && d.role === 'in' && !d.derived);
      // (An output already stated, as a power or an energy, is not derived again.)
      if (inputs.length !== 1 || drafts.some((d) => (d.kind === 'power' || d.kind === 'energy') && (d.role === 'out' || d.role === 'excess'))) continue;
      const [input, e, n] = [inputs[0], siOf(eta)!, siOf(inputs[0])];
      if (n === null || n === 0) continue;
      // (Not a store the share goes into: "recovers 70 % of the braking energy back into its 60 kWh pack".)
      if (/(?<!\p{L})into[^\S\n]+(?:(?:the|its|their|a|an)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, input.start - 20), input.start))) continue;
      const unit = FIGURE_SI_UNIT[kind];
      const anchor = eta.start > input.start ? eta : input;
      insertAfter(drafts, anchor, {
        start: Math.min(eta.start, input.start),
        end: Math.max(eta.end, input.end),
        kind,
        quantity: typedSi(n * e, unit),
        role: 'out',
        derived: `output = efficiency × input (${formatPrint(e)} × ${formatQuantity(n, unit)})`,
      });
      break;
    }
  }

  // "Self-running", "needs no supply": the input is 0 (not where the device harvests a flow from outside).
  if (!drafts.some((d) => (d.kind === 'power' || d.kind === 'energy') && d.role === 'in')) {
    // (Not a question: "So it's a perpetual motion machine?" asks; it claims nothing.)
    SELF_RUNNING_RE.lastIndex = 0;
    // (Nor denied: "This is not a perpetual motion", "it is never self-running".)
    const said = (x: RegExpExecArray) =>
      !/\?/.test(text.slice(x.index, x.index + 200).split(/(?<=[.!?])\s|\n/u)[0]) &&
      // (Nor for one purpose only: "needs no battery for start-up", "no fuel to start it".)
      !/^[^\S\n]+(?:for|to)[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:start(?:-?up|ing)?|ignition|cold[- ]start|standby|back-?up|the controller|its controller|memory|the clock)(?!\p{L})/iu.test(text.slice(x.index + x[0].length, x.index + x[0].length + 40)) &&
      !/(?<!\p{L})(?:not|never|no|isn't|isn’t|wasn't|wasn’t|nor|almost|nearly|close to|next to)[^\S\n]+(?:(?:a|an|the|really|quite|truly)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, x.index - 25), x.index)) &&
      // (Nor asked about: "He asked whether we could loop the output back to the motor — told him no".)
      !/(?<!\p{L})(?:asked[^\S\n]+(?:whether|if)|whether[^\S\n]+(?:we|I|they|he|she|you|it)[^\S\n]+(?:could|can|might|would)|if[^\S\n]+(?:we|I|they|you)[^\S\n]+could|could[^\S\n]+(?:we|I|they|you)|can[^\S\n]+(?:we|I|they|you))(?!\p{L})[^.;!?\n]{0,40}$/iu.test(text.slice(Math.max(0, x.index - 80), x.index));
    const matches = [...text.matchAll(SELF_RUNNING_RE)].filter(said);
    // A label alone ("free energy", "perpetual") beside a store the text names ("the bank stores 30 kWh",
    // "the battery holds 2.4 kWh"): the store explains the output, and the label is someone's word for it.
    // ("No fuel!" of a battery pack: a store needs no fuel either.)
    const labelsOnly = matches.length > 0 && matches.every((x) => /^(?:free energy|perpetual|(?:needs? |requires? |takes |uses |with |without )?no (?:external )?fuel(?: at all| ever)?|without (?:any )?fuel)$/iu.test(x[0]));
    const hasThrust = drafts.some((d) => d.kind === 'thrust' || d.kind === 'thrust-per-power');
    // (Not what a store holds, "its flywheel stores 300 J": a capacity is no output.)
    const held = (d: Draft) => d.kind === 'energy' && /(?<!\p{L})(?:holds?|holding|stores?|stored|storing|contains?|capacity(?:[^\S\n]+of)?)[^\S\n]+(?:(?:about|some|roughly|only|just|up[^\S\n]+to)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, d.start - 30), d.start));
    const outLike = (d: Draft) => (d.kind === 'power' || d.kind === 'energy') && (d.role === 'out' || d.role === 'excess' || (d.role === null && !hasThrust && !held(d)));
    // In a text of several paragraphs, the words and the output in one paragraph: "perpetual motion in a
    // box" in a note on one model is no nil input of another model's "stored energy 5 kWh" above it.
    const several = /\n[^\S\n]*\n/u.test(text.trim());
    const inParagraph = (x: RegExpExecArray) => {
      const para = paragraphAround(text, x.index, x.index + x[0].length);
      // (An output of no stated side counts in the same paragraph, as it does in a text of one.)
      return drafts.find((d) => outLike(d) && paragraphAround(text, d.start, d.end) === para);
    };
    // (Else, as in a manuscript whose apparatus section says "needs no supply" and whose results give
    // "delivering 250 W", an output named as such anywhere; not a figure of no side.)
    const paired = several ? matches.find((x) => inParagraph(x)) : undefined;
    const first = paired ?? matches[0] ?? null;
    // (A store said to be absent — "No battery, no mains, no fuel" — explains nothing.)
    // (Nor "No fuel" of a device run on a voltage at a current the text gives: "Our 30 W lifter (20 kV at
    // 1.5 mA) … No fuel, no moving parts!" — what it needs no fuel for, it takes as electricity.)
    const electric = drafts.some((d) => d.kind === 'voltage') && drafts.some((d) => d.kind === 'current');
    const m = labelsOnly && (STORE_NAMED_RE.test(text.replace(NO_STORE_RE, ' ')) || electric) ? null : first;
    const out = m && paired ? inParagraph(m) : several ? drafts.find((d) => outLike(d) && d.role !== null) : drafts.find(outLike);
    const inputUnknown =
      /(?<!\p{L})input(?:[^\S\n]+(?:power|energy|log|logs|data|figure|value|itself|current))*[^\S\n]+(?:was|were|is|are|has|have)[^\S\n]+(?:not|still|never|yet to be)[^\S\n]+(?:been[^\S\n]+)?(?:logged|recorded|measured|stated|given|known|analysed|analyzed|being analysed|being analyzed)/iu.test(text) ||
      // "The seller gives no figure for what it takes in", "does not say how much it draws".
      INPUT_NOT_GIVEN_RE.test(text) ||
      NO_INPUT_FIGURE_RE.test(text);
    // (A machine between a hot and a cold side takes heat in from the hot one: "without fuel" is not "without input".)
    const thermal = drafts.some((d) => d.kind === 'temperature' && d.role === 'hot') && drafts.some((d) => d.kind === 'temperature' && d.role === 'cold');
    // (The harvest is looked for in the paragraph of the claim, with harvests said to be absent — "no
    // sun, no wind" — left out: "The light was on whenever we looked" in a buyer's answer is no harvest.)
    const harvestText = m ? paragraphAround(text, m.index, m.index + m[0].length).replace(/self-?powered/giu, '').replace(NEGATED_HARVEST_RE, ' ') : '';
    // (Unless the text shuts every flow out — "Nothing enters or leaves the box - no heat, no light", "a
    // sealed, insulated box": a difference of temperature it makes inside it is no source from outside.)
    // (Not where it holds a store of heat or charge: "a sealed flask of 90 °C water runs the module for an hour".)
    const closed = CLOSED_BOX_RE.test(text) && !STORE_NAMED_RE.test(text) && !/(?<!\p{L})(?:stor(?:e|ed|es|ing|age)|flasks?|hot[^\S\n]+water|thermal[^\S\n]+mass|phase[- ]change|molten|pre-?heated|charged|batter(?:y|ies)|capacitors?|reservoirs?|tanks?)(?!\p{L})/iu.test(text);
    if (m && out && !inputUnknown && ((!thermal && !HARVEST_RE.test(harvestText)) || closed)) {
      const start = m.index;
      const end = m.index + m[0].length;
      const draft: Draft = { start, end, kind: 'power', quantity: '0 W', role: 'in', derived: `no input: "${m[0]}"` };
      // Keep the drafts in order of their place in the text.
      const at = drafts.findIndex((d) => d.start > start);
      if (at < 0) drafts.push(draft);
      else drafts.splice(at, 0, draft);
      if (out.role === null) out.role = 'out';
    }
  }

  // A heat pump's heat out over its work in: its heating COP, as a figure of its own. A cooling
  // machine's heat removed ("Refrigerating capacity 5,000 BTU/h … Power input 780 W") over its work in:
  // its cooling COP.
  // (Nor where its parts are said to be absent: "no outdoor unit, no refrigerant".)
  const denied = /(?<!\p{L})(?:no|not an?|without an?)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:heat[- ]pumps?|outdoor[^\S\n]+units?|refrigerants?|compressors?|evaporators?)(?!\p{L})/iu.test(text);
  const pump = HEAT_PUMP_RE.test(text) && !denied;
  const coolingOut = (d: Draft) =>
    COOLING_DUTY_BEFORE_RE.test(text.slice(Math.max(0, d.start - 50), d.start)) ||
    // "It removes 2 500 kcal/h of heat from the room".
    (/(?<!\p{L})(?:removes?|removed|removing|extracts?|extracted|takes? (?:away|out)|took (?:away|out)|pumps? out|pulls? out)[^\S\n]+(?:(?:about|around|up to|some|nearly|not less than|no less than|at least|more than|over)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, d.start - 40), d.start)) &&
      /^[^\S\n]*of[^\S\n]+heat(?!\p{L})/iu.test(text.slice(d.end, d.end + 20))) ||
    // "pulls 18,000 BTU/h out of the box".
    (COOLING_VERB_BEFORE_RE.test(text.slice(Math.max(0, d.start - 30), d.start)) && COOLED_SPACE_AFTER_RE.test(text.slice(d.end, d.end + 60)));
  const cooler = !pump && COOLING_MACHINE_RE.test(text);
  if ((pump || cooler) && !drafts.some((d) => d.kind === 'cop' && d.role !== 'aside')) {
    for (const kind of ['energy', 'power'] as const) {
      // (An input of one unit, from "4 kWh of heat for every kWh", counts as stated.)
      let ins = drafts.filter((d) => d.kind === kind && d.role === 'in' && (!d.derived || d.derived.startsWith('one ')));
      // (The heat out may be the input plus a stated excess: "3 kW more heat than the 1 kW it uses".)
      let outs = drafts.filter((d) => d.kind === kind && d.role === 'out' && (!d.derived || d.derived.startsWith('output = input + excess')));
      // ("delivers 3.4 kWh of heat for every kWh of electricity … annual demand 11,200 kWh": the output said
      // with "for every", of one unit in, is the pair, whatever other totals the text gives.)
      const perUnit = drafts.find((d) => d.kind === kind && d.role === 'in' && d.derived?.startsWith('one '));
      const ownOut = perUnit && outs.filter((d) => d.end <= perUnit.start && perUnit.start - d.end < 60).pop();
      if (perUnit && ownOut && (ins.length !== 1 || outs.length !== 1)) {
        ins = [perUnit];
        outs = [ownOut];
      }
      if (ins.length !== 1 || outs.length !== 1) continue;
      // (Not where the figures' paragraph is of another machine, in a text on several.)
      if (paragraphOfAnotherMachine(text, Math.min(ins[0].start, outs[0].start), Math.max(ins[0].end, outs[0].end))) continue;
      const w = siOf(ins[0]);
      const q = siOf(outs[0]);
      if (cooler && !coolingOut(outs[0])) continue;
      if (!w || q === null || q <= 0 || (!cooler && q <= w)) continue;
      const last = ins[0].start > outs[0].start ? ins[0] : outs[0];
      insertAfter(drafts, last, {
        start: Math.min(ins[0].start, outs[0].start),
        end: Math.max(ins[0].end, outs[0].end),
        kind: 'cop',
        quantity: String(Number((q / w).toPrecision(12))),
        role: cooler ? 'cooling' : 'heating',
        derived: `COP = ${cooler ? 'heat removed' : 'heat out'} / work in (${formatQuantity(q, FIGURE_SI_UNIT[kind])} / ${formatQuantity(w, FIGURE_SI_UNIT[kind])})`,
      });
      break;
    }
  }

  relateTemperatures(text, drafts);
  columnTemperatures(text, drafts);
  heatPumpColumns(text, drafts);
  relateDurations(text, drafts);
}

/** A heat pump's log: its columns of electricity and of heat ("Elec kWh", "Heat kWh"). */
const ELECTRICITY_COLUMN_RE = /^(?:elec\.?|electricity|electrical|electric|power[^\S\n]+(?:used|drawn|in)|energy[^\S\n]+used|consumption|compressor)(?:[^\S\n]+(?:used|in|input|drawn|consumed|meter))?$/iu;
const HEAT_COLUMN_RE = /^(?:heat|heat[^\S\n]+(?:out|output|delivered|supplied|meter|to[^\S\n]+\S+)|thermal|heat[^\S\n]+into[^\S\n]+\S+)$/iu;

/**
 * In a heat pump's log read from a table, a column of electricity is what it takes and a column of heat
 * what it gives: "Elec kWh 812; Heat kWh 3,290" (each cell's label, the unit left off).
 */
function heatPumpColumns(text: string, drafts: Draft[]): void {
  const heatPump = NAMED_HEAT_PUMP_RE.test(text);
  for (const d of drafts) {
    if ((d.kind !== 'power' && d.kind !== 'energy') || d.role !== null || d.derived) continue;
    // (A row of a table, "Week 1; Elec 212 kWh; Heat 718 kWh": two cell breaks on its line, a label of a few words.)
    const from = text.lastIndexOf('\n', d.start - 1) + 1;
    const to = text.indexOf('\n', d.end);
    // (Every cell of it a short label and a number: prose with semicolons is no row.)
    const cellsOfLine = text.slice(from, to < 0 ? text.length : to).split(';');
    if (cellsOfLine.length < 3 || cellsOfLine.filter((c) => !/\d/u.test(c)).length > 1 || !cellsOfLine.every((c) => c.trim().split(/\s+/u).length <= 7)) continue;
    const stem = cellStem(text, d).replace(/[^\S\n]+(?:k?wh|[kmg]?w|mj|gj|kj|j)$/iu, '').trim();
    if (stem.split(/\s+/).length > 4) continue;
    if (heatPump && ELECTRICITY_COLUMN_RE.test(stem)) d.role = 'in';
    else if (heatPump && HEAT_COLUMN_RE.test(stem)) d.role = 'out';
    // (Any table: a column said to be what is drawn or what the load takes — "Supply drawn", "Lamp load".)
    else if (TABLE_IN_RE.test(stem) !== TABLE_OUT_RE.test(stem)) d.role = TABLE_IN_RE.test(stem) ? 'in' : 'out';
  }
}
/** A column's label that names what goes in, or what comes out, whatever the machine. */
const TABLE_IN_RE = /(?<!\p{L})(?:in|input|supply|supplied|drawn|draw|consumed|consumption|mains|grid)(?!\p{L})/iu;
const TABLE_OUT_RE = /(?<!\p{L})(?:out|output|load|lamps?|delivered|harvested|exported|yield|generated)(?!\p{L})/iu;

/** A column's label that names the hot side it measures: a receiver, a flow, a heater's head, steam. */
const HOT_COLUMN_RE = /(?<!\p{L})(?:hot|receiver|absorber|collector|flow|supply|head|heater|steam|boiler|furnace|exhaust|flame|combustion|t_?h|th)(?!\p{L})/iu;
/** A column's label that names the cold side: outdoor air, ambient, a sink, brine, the ground. */
const COLD_COLUMN_RE = /(?<!\p{L})(?:cold|ambient|outdoor|outside|air[^\S\n]+in|sink|brine|ground|sea|river|room|t_?c|tc|t_?amb|t_?outdoor|t_?out|oat)(?!\p{L})/iu;

/** A cooling machine's columns: where it rejects heat, and what it cools. */
const COOLER_HOT_COLUMN_RE = /(?<!\p{L})(?:ambient|outdoor|outside|oat|condens\w*|discharge|heat[^\S\n]+rejection)(?!\p{L})/iu;
const COOLER_COLD_COLUMN_RE = /(?<!\p{L})(?:chw\w*|chilled|evaporat\w*|box|cabinet|freezer|fridge|room|space|supply|leaving|product|suction|brine|glycol)(?!\p{L})/iu;

/**
 * Temperatures read from one column of a table ("Receiver 705 °C", "Receiver 720 °C", row after row)
 * are one side measured at several times, never a hot side and a cold side of one another: the column's
 * label gives their side, else the side most of them were given, else none.
 */
function columnTemperatures(text: string, drafts: Draft[]): void {
  const groups = new Map<string, Draft[]>();
  for (const d of drafts) {
    if (d.kind !== 'temperature' || d.role === 'aside') continue;
    const stem = cellStem(text, d);
    if (!stem || !/;/.test(text.slice(d.end, d.end + 60) + text.slice(Math.max(0, d.start - 60), d.start))) continue;
    groups.set(stem, [...(groups.get(stem) ?? []), d]);
  }
  const lineOf = (d: Draft) => (text.slice(0, d.start).match(/\n/g) ?? []).length;
  for (const [stem, ds] of groups) {
    // (Row after row: each on a line of its own.)
    if (ds.length < 2 || new Set(ds.map(lineOf)).size !== ds.length) continue;
    // (A cooling machine rejects its heat to the ambient or outdoor air: that column is its warm side, and
    // the chilled water or the box its cold one.)
    const cooler = COOLING_MACHINE_RE.test(text) && !HEAT_PUMP_RE.test(text);
    const hot = cooler ? COOLER_HOT_COLUMN_RE.test(stem) : HOT_COLUMN_RE.test(stem);
    const cold = cooler ? COOLER_COLD_COLUMN_RE.test(stem) : COLD_COLUMN_RE.test(stem);
    let role: FigureRole;
    if (hot !== cold) role = hot ? 'hot' : 'cold';
    else {
      const hots = ds.filter((d) => d.role === 'hot').length;
      const colds = ds.filter((d) => d.role === 'cold').length;
      role = hots > colds ? 'hot' : colds > hots ? 'cold' : null;
    }
    for (const d of ds) d.role = role;
  }
}
