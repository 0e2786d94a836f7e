/**
 * Roles from the words around a figure (the claim reader, shared/claims/reader.ts, pass 2): in, out
 * and excess for a power or an energy, hot and cold for a temperature, heating and cooling for a
 * COP, wet, dry and propellant for a mass, exhaust and delta-v for a speed (the role words of
 * figures-vocabulary.ts). A verb right before the figure outweighs the words after it; those after
 * it outweigh those before.
 */
import { COP_COOLING, COP_HEATING, MASS_ROLES, POWER_ENERGY_ROLES, SPEED_ROLES, TEMPERATURE_ROLES, type RoleWords } from '../figures-vocabulary';
import type { FigureKind, FigureRole } from '../types';
import { alt, BEFORE_WINDOW, COOLING_MACHINE_RE, HEAT_PUMP_RE, paragraphAround, sentenceAround, windowStart } from './context';

/** Words that may stand between a figure and the role word after it ("2 kW of electrical input"). */
const AFTER_FILLER =
  '(?:(?:per|each|every|a)[\\s-]+(?:day|hour|week|month|year|minute|second|cycle)[\\s-]+)?(?:(?:of|the|its|electrical|electric|thermal|mechanical|heat|net|total|useful|shaft|continuous|peak|rated|nominal|design|gross|average|mean|power|energy|DC|AC|battery|mains|grid|motor|generator|engine|turbine|alternator|wheel|drive|pump|cell|panel|module|stack|system|device|unit)[\\s-]+){0,3}';

interface CompiledRoles {
  groups: readonly RoleWords[];
  before: RegExp;
  after: RegExp;
  /** Each group's before-words alone, sticky: which group's words run longest at a place ("battery side" over "battery"). */
  beforeAt: RegExp[];
}

function compileRoles(groups: readonly RoleWords[]): CompiledRoles {
  const named = (key: 'before' | 'after') => groups.map((g, i) => `(?<r${i}>${alt(g[key])})`).join('|');
  return {
    groups,
    before: new RegExp(`(?<!\\p{L})(?:${named('before')})(?!\\p{L})`, 'giu'),
    // (Also in brackets: "1.1 kW (output)".)
    after: new RegExp(`[^\\S\\n]*-?[^\\S\\n]*(?:[([][^\\S\\n]*(?=[^)\\]\\n]{0,30}[)\\]]))?${AFTER_FILLER}(?:${named('after')})(?!\\p{L})`, 'iuy'),
    beforeAt: groups.map((g) => new RegExp(`(?:${alt(g.before)})(?!\\p{L})`, 'iuy')),
  };
}

const ROLES: Partial<Record<FigureKind, CompiledRoles>> = {
  power: compileRoles(POWER_ENERGY_ROLES),
  energy: compileRoles(POWER_ENERGY_ROLES),
  temperature: compileRoles(TEMPERATURE_ROLES),
  mass: compileRoles(MASS_ROLES),
  speed: compileRoles(SPEED_ROLES),
};
/** "1.5 kW in, 3 kW out": a bare in/out right after the figure, ending the clause. */
const IN_OUT_AFTER_RE = /[^\S\n]*(?:of[^\S\n]+(?:electricity|electrical power|heat|power|work|energy|light|gas|fuel)[^\S\n]+)?(in|out)(?!\p{L})(?=[^\S\n]*(?:[,;.!?)\]\n:—–]|(?:and|for|from|with|while|against|versus|vs|on|at|to|into|onto|across|through)(?!\p{L})|$))/iuy;
const COP_COOLING_RE = new RegExp(`(?<!\\p{L})(?:${alt(COP_COOLING)})(?!\\p{L})`, 'iu');
const COP_HEATING_RE = new RegExp(`(?<!\\p{L})(?:${alt(COP_HEATING)})(?!\\p{L})`, 'iu');
const COP_WINDOW = 120;

/** "warm end", "cold side", "hot junction" just before a temperature outweigh the words after it. */
const STRONG_SIDE_RE = /(?<!\p{L})(hot|warm|cold|cool|sunlit|sunny|heated|shaded|shady|cooled)(?:er)?[- ](?:end|side|junction|plate|face|reservoir|panel)s?(?:[^\S\n]+(?:\p{L}+))?[^\S\n]+(?:in|at|of|is|sits at|held at|kept at|runs at|near)?[^\S\n]*(?:(?:a|an|the)[^\S\n]+)?$/iu;

/** "hot brine at 85 °C", "cold water at 8 °C": a fluid said hot or cold just before its temperature. */
const STRONG_FLUID_RE =
  /(?<!\p{L})(hot|warm|heated|cold|cool|chilled|cooled)(?:er)?[^\S\n]+(?:brine|water|air|gas|gases|fluid|steam|oil|exhaust|flue gas|coolant)[^\S\n]+(?:at|of|is|near|around)?[^\S\n]*(?:(?:about|around|roughly|some|nearly|only|just)[^\S\n]+)?$/iu;
/** A load the device runs, then what it draws: "ran a chest freezer drawing", "powers two lamps using". */
// (Not "run" the noun: "over a 72-hour run the module, which draws 0.4 kW, …" — what the module draws goes in.)
const LOAD_IT_RUNS_RE =
  /(?<!\p{L})(?<!(?:hours?|days?|weeks?|months?|minutes?|test|trial|a|the|each|every|this|that|whole|long|first|second|full|one)[^\S\n]+)(?:ran|runs|run|running|powered|powers|powering|drove|drives|driving|kept|keeps|keeping|supplied|supplies|supplying|fed|feeds|feeding)[^\S\n]+(?:a|an|the|its|our|their|two|three|four|several)[^\S\n]+(?:[\p{L}-]+,?[^\S\n]+){0,4}?(?:drawing|using|consuming|taking|pulling|rated at|(?:that|which)[^\S\n]+(?:takes|draws|uses|consumes|needs|pulls))[^\S\n]+(?:(?:only|just|about|some|roughly|nearly|around|approximately|up to|between|an average of)[^\S\n]+)*$/iu;
/** People (not a machine) charging a store, right before what they put in. */
const PEOPLE_CHARGED_RE =
  /(?<!\p{L})(?:we|I|they|you|he|she|the team|the authors|researchers|one)[^\S\n]+(?:(?:then|first|had|have|fully)[^\S\n]+)?(?:charged|charge|filled|fill|loaded|load|topped up|pumped)[^\S\n]+(?:the|a|an|its|our|their|my)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:cells?|batter(?:y|ies)|packs?|capacitors?|supercapacitors?|supercaps?|accumulators?|flywheels?|store|bank|tank)[^\S\n]+(?:with|to|at|using)[^\S\n]+(?:(?:about|some|roughly|only|just|exactly)[^\S\n]+)?$/iu;
/** Right before a figure said again: "its rated", "the claimed", "the stated", "their quoted". */
const RESTATED_LEAD_RE = /(?<!\p{L})(?:its|the|their|his|her|this|that)[^\S\n]+(?:(?:rated|stated|claimed|quoted|reported|advertised|alleged|supposed|nominal|said|promised|headline)[^\S\n]+)(?:(?:figure|value|output|input|power|of)[^\S\n]+)?$/iu;
/** Whether the same number and unit were written earlier in the text (as typed: "5 W" … "5 W"). */
function sameFigureEarlier(text: string, start: number, end: number): boolean {
  const said = text.slice(start, end).replace(/\s+/g, ' ').trim();
  return said.length > 0 && text.slice(0, start).replace(/\s+/g, ' ').includes(said);
}
/** Just before a figure that says how well something was measured. */
const PRECISION_LEAD_RE = /(?<!\p{L})(?:to within|within ±?|accurate to|accuracy of|uncertainty of|resolution of|precision of|(?:measurement |calibration )?error of|noise (?:floor )?of|drift of|repeatable to|±)[^\S\n]*(?:(?:about|some|roughly|better than|under|below)[^\S\n]+)?$/iu;
/** Right after a power: the word "load" ("a steady 600 W load", "600 W (resistive load)"). */
const LOAD_AFTER_RE = /^[^\S\n]*[(,]?[^\S\n]*(?:(?:continuous|steady|constant|resistive|dummy|test|base)[^\S\n]+)?loads?(?!\p{L})/iu;
/** Earlier in the sentence: a verb saying the device carried or ran something. */
const LOAD_CARRIED_RE = /(?<!\p{L})(?:carried|carries|carrying|ran|runs|running|powered|powers|powering|supplied|supplies|supplying|fed|feeds|feeding|kept|keeps|held|holds|backed up|backs up|sustained|sustains)(?!\p{L})[^.;!?\n]*$/iu;
/** Right before an appliance's rating: "Plug in your", "connect any", "hook up a". */
const PLUG_IN_LEAD_RE = /(?<!\p{L})(?:plug|plugs|plugged|connect|connects|connected|hook|hooks|hooked)[^\S\n]+(?:(?:in|up)[^\S\n]+)?(?:your|a|an|any|the|our|my)[^\S\n]+$/iu;
/** An appliance named right after its rating. */
const APPLIANCE_AFTER_RE = /^[^\S\n]*(?:[\p{L}-]+[^\S\n]+)?(?:heaters?|kettles?|lamps?|lights?|fridges?|freezers?|TVs?|televisions?|appliances?|tools?|drills?|saws?|hair[^\S\n]?dryers?|microwaves?|fans?|pumps?|laptops?|loads?)(?!\p{L})/iu;
/** Earlier in the clause: a recharge said to take what follows. */
const RECHARGE_TOOK_RE = /(?<!\p{L})(?:recharg\w*|charging it (?:again|back)|refill\w*)(?!\p{L})[^.;!?\n]{0,60}(?<!\p{L})(?:took|takes|needed|needs|used|uses|drew|draws|required|requires|cost|costs|consumed|consumes)(?!\p{L})[^.;!?\n]{0,40}$/iu;
/** Just before a temperature a machine delivers: "to deliver", "supplies", "provides water at". */
const DELIVERS_LEAD_RE =
  /(?<!\p{L})(?:deliver(?:s|ed|ing)?|suppl(?:y|ies|ied|ying)|provid(?:e|es|ed|ing))[^\S\n]+(?:(?:water|air|heat|hot water|warm air)[^\S\n]+at[^\S\n]+)?(?:(?:about|around|roughly|some|nearly|only|just|up to)[^\S\n]+)?$/iu;

/**
 * End of the words after the last figure that gave it its role ("… 3.2 km/s exhaust velocity"): the
 * next figure's words start after them. Reset by each reading (figures.ts).
 */
export const lastRoleWords = { end: 0 };

const IMMEDIATE_HEDGE = '(?:(?:only|just|about|some|roughly|nearly|around|approximately|up to|a mere|a steady|an average of)[^\\S\\n]+)*';
const IMMEDIATE_IN_RE = new RegExp(`(?<!\\p{L})(?:takes|took|draws|drew|consumes|consumed|uses|used|needs|requires|required|absorbs|absorbed|is fed|was fed|pulls|pulled)[^\\S\\n]+${IMMEDIATE_HEDGE}$`, 'iu');
const IMMEDIATE_OUT_RE = new RegExp(`(?<!\\p{L})(?:delivers|delivered|produces|produced|generates|generated|returns|returned|puts out|put out|yields|yielded|outputs)[^\\S\\n]+${IMMEDIATE_HEDGE}$`, 'iu');

/** Just before what a device fills or charges: "charges a 12 V battery", "filled the 5 kWh pack". */
export const FILLS_LEAD_RE = /(?<!\p{L})(?:fill(?:s|ed|ing)?|(?:re)?charg(?:es|ed|ing)|tops? up|topped up)[^\S\n]+(?:up[^\S\n]+)?(?:a|an|the|its|our|their)[^\S\n]+$/iu;

/** People taking a figure: "we pull", "you can draw", "they got". */
const PEOPLE_TAKE_LEAD_RE = new RegExp(`(?<!\\p{L})(?:we|you|they|I|one)[^\\S\\n]+(?:(?:can|could|will|do|did)[^\\S\\n]+)?(?:pull|pulls|pulled|take|takes|took|draw|draws|drew|get|gets|got|extract|extracts|extracted|tap|taps|tapped)[^\\S\\n]+${IMMEDIATE_HEDGE}$`, 'iu');
/** After a figure someone takes: "… off it", "… out of the generator", "… from it" (the device's output). */
const TAKEN_FROM_IT_RE = /^[^\S\n]*(?:of[^\S\n]+(?:power|electricity|energy)[^\S\n]+)?(?:off|out[^\S\n]+of|from)[^\S\n]+(?:it|them|the[^\S\n]+(?:generator|alternator|rotor|wheel|machine|device|unit|coil|output))(?!\p{L})/iu;

function roleFromWords(text: string, roles: CompiledRoles, start: number, end: number, floor: number): FigureRole {
  // "the dry mass, including the payload adapter and residual propellant, is 610 kg", "at burnout, with the
  // landing propellant reserve on board, the stack weighs 148 t": the mass left after the burn, whatever
  // propellant a clause set off between names.
  if (roles === ROLES.mass) {
    const lead = text.slice(Math.max(floor, start - 220), start);
    if (DRY_MASS_LEAD_RE.test(lead) || BURNOUT_LEAD_RE.test(lead)) return 'dry';
    // "burned from a lift-off mass of 540 t down to 190 t (at separation)": what a burn brings it down to.
    if (/(?<!\p{L})(?:burn(?:s|ed|t|ing)?|drops?|dropped|dropping|falls?|fell|falling|goes|went|came)[^.;!?\n]{0,60}(?<!\p{L})down[^\S\n]+to[^\S\n]+(?:(?:about|around|roughly|some|just)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, start - 120), start))) return 'dry';
  }
  if (roles === ROLES.temperature) {
    // "Antifreeze 25 %, freeze point checked at −11 °C", "flash point 62 °C": a property of a fluid, no side of the machine.
    if (/(?<!\p{L})(?:freez(?:e|ing)|boiling|flash|melting|dew|pour|cloud|fire|smoke)[- ]points?(?!\p{L})[^.;!?\n\d]{0,25}$/iu.test(text.slice(Math.max(floor, start - 50), start))) return 'aside';
    // A heat pump's or fridge's source is its cold side and its sink the warm one (the other way round for an engine).
    if (HEAT_PUMP_RE.test(text) || COOLING_MACHINE_RE.test(text)) {
      const lead = text.slice(Math.max(floor, start - 40), start);
      // "lifts 1.5 W at 77 K into a 300 K room", "with rejection to a 300 K room": a cooler's load is taken at its
      // cold side and its heat given up at its warm one.
      if (COOLING_MACHINE_RE.test(text) && /(?<!\p{L})(?:into|(?:reject(?:s|ed|ing|ion)?|dump(?:s|ed|ing)?|shed(?:s|ding)?)(?:[^\S\n]+(?:the|its)[^\S\n]+heat)?[^\S\n]+(?:to|into|at))[^\S\n]+(?:a|an|the)[^\S\n]+$/iu.test(text.slice(Math.max(0, start - 40), start)) && /^[^\S\n]*(?:room|radiator|sink|ambient|environment|surroundings|heat[^\S\n]+sink|air)(?!\p{L})/iu.test(text.slice(end, end + 20))) return 'hot';
      if (COOLING_MACHINE_RE.test(text) && /(?<!\p{L})(?:lifts?|lifting|lifted|removes?|removing|removed|extracts?|extracting|extracted|absorbs?|absorbing)(?!\p{L})[^.;!?\n]{1,40}?(?:W|watts?|mW|milliwatts?)(?:[^\S\n]+of[^\S\n]+heat)?[^\S\n]+at[^\S\n]+$/iu.test(text.slice(Math.max(0, start - 60), start))) return 'cold';
      if (/(?<!\p{L})(?:heat[^\S\n]+)?sink(?:[^\S\n]+(?:water|temperature|side|loop|air))?[^\S\n]*(?:at|of|is|[:=])?[^\S\n]*$/iu.test(lead)) return 'hot';
      if (/(?<!\p{L})(?:(?:air|ground|water|brine|heat|outdoor)[- ])?source(?:[^\S\n]+(?:water|temperature|side|loop|air))?[^\S\n]*(?:at|of|is|[:=])?[^\S\n]*$/iu.test(lead)) return 'cold';
      // A sheet's line labelled with the side: "Source: process cooling water, inlet 10 °C", "Sink | flow 45 °C".
      const line = text.slice(text.lastIndexOf('\n', start - 1) + 1, start);
      const label = /^[^\S\n]*(?:[-•*·][^\S\n]*)?(?:(?:heat|air|ground|water|brine)[^\S\n]+)?(source|sink)(?!\p{L})[^:|\n.]{0,30}(?:[:|]|\.{2,})/iu.exec(line);
      if (label && !/\p{N}/u.test(line.slice(label[0].length))) return label[1].toLowerCase() === 'sink' ? 'hot' : 'cold';
      // "The rooftop condensers run at 30 °C", "evaporating at −25 °C": a refrigerating machine's condenser is
      // its warm side and its evaporator its cold one (the other way round from an engine's condenser).
      // (Only where its own sentence names the refrigerating machine and no engine: a text on several plants
      // may name a power cycle's condenser too.)
      const sentence = sentenceAround(text, start, end);
      if (/(?<!\p{L})(?:chillers?|refrigerat\w*|freezers?|cold[^\S\n]+(?:stores?|rooms?)|heat[- ]pumps?|fridges?|air[- ]condition\w*|compressors?|refrigerants?)(?!\p{L})/iu.test(sentence) && !/(?<!\p{L})(?:engines?|turbines?|steam|Rankine|ORC|binary|expanders?|power[^\S\n]+(?:plants?|stations?|cycles?)|generat\w*|electricity)(?!\p{L})/iu.test(paragraphAround(text, start, end))) {
        // (Not a condensing boiler's water: "condensing boiler … return at 30 °C".)
        if (/(?<!\p{L})(?:condensers?|condensing(?:[^\S\n]+(?:temperature|pressure|side|point))?(?![^\S\n]+(?:boilers?|gas|units?\b[^.]*boiler)))(?!\p{L})[^.;!?\n\d]{0,25}$/iu.test(lead) && !/(?<!\p{L})boilers?(?!\p{L})/iu.test(lead)) return 'hot';
        if (/(?<!\p{L})(?:evaporators?|evaporating(?:[^\S\n]+(?:temperature|pressure|side))?)(?!\p{L})[^.;!?\n\d]{0,25}$/iu.test(lead)) return 'cold';
      }
      // "rejecting heat on deck at 32 °C": where a fridge or a heat pump rejects its heat is its warm side.
      if (/(?<!\p{L})(?:reject(?:s|ed|ing)?|dump(?:s|ed|ing)?|shed(?:s|ding)?|discharg(?:es|ed|ing))[^\S\n]+(?:(?:its|the)[^\S\n]+)?(?:waste[^\S\n]+)?heat(?:[^\S\n]+[\p{L}-]+){0,3}?[^\S\n]+(?:at|of)[^\S\n]*(?:(?:about|around|roughly|some)[^\S\n]+)?$/iu.test(text.slice(Math.max(floor, start - 60), start))) return 'hot';
    }
    else {
      // An engine's sheet: "Heat source ....... surrounding air, 20 °C" is its hot side, "Heat sink" its cold one.
      const line = text.slice(text.lastIndexOf('\n', start - 1) + 1, start);
      const label = /^[^\S\n]*(?:[-•*·][^\S\n]*)?heat[^\S\n]+(source|sink)(?!\p{L})[^:|\n.]{0,30}(?:[:|]|\.{2,})/iu.exec(line);
      if (label && !/\p{N}/u.test(line.slice(label[0].length))) return label[1].toLowerCase() === 'sink' ? 'cold' : 'hot';
    }
    const strong = STRONG_SIDE_RE.exec(text.slice(Math.max(floor, start - 40), start)) ?? STRONG_FLUID_RE.exec(text.slice(Math.max(floor, start - 40), start));
    if (strong) return /^(?:hot|warm|sun|heated)/i.test(strong[1]) ? 'hot' : 'cold';
    // "to deliver 95 °F air", "supplies 55 °C water": what a machine delivers is its hot side (the
    // words after the figure, "air", "water", would say the source).
    if (DELIVERS_LEAD_RE.test(text.slice(Math.max(floor, start - 40), start))) return 'hot';
    // "the heat it draws from 25 °C room air": where the heat comes from is the hot side.
    // (see below for power and energy)
    if (/(?<!\p{L})(?:heat|energy)(?:[^\S\n]+(?:it|that it|they))?[^\S\n]+(?:draws?|takes?|extracts?|absorbs?|gets?|pulls?|harvests?|collects?)[^\S\n]+from[^\S\n]+(?:(?:the|a|an)[^\S\n]+)?$/iu.test(text.slice(Math.max(floor, start - 60), start))) return 'hot';
    // "taking heat from water at 30 °C", "draws its heat from the warm return water at 35 °C": the source
    // of an engine's heat is its hot side; a heat pump's or a fridge's is its cold side.
    if (/(?<!\p{L})(?:draws?|drawing|drew|takes?|taking|took|extracts?|extracting|absorbs?|absorbing|pulls?|pulling|harvests?|harvesting|collects?|collecting)[^\S\n]+(?:(?:its|the|low-grade|waste)[^\S\n]+)?heat[^\S\n]+from[^\S\n]+(?:(?:the|a|an)[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:water|air|brine|gas|gases|steam|exhaust|oil|fluid|ground|soil|river|lake|sea|tank|loop|flue gas)[^\S\n]+(?:at|of)[^\S\n]+(?:(?:about|around|roughly|some|nearly|only|just)[^\S\n]+)?$/iu.test(text.slice(Math.max(floor, start - 80), start))) {
      // (A fridge named as such: "the cooler intake water" is no cooler.)
      return HEAT_PUMP_RE.test(text) || /(?<!\p{L})(?:refrigerators?|fridges?|freezers?|chillers?|air[- ]conditioners?|cryocoolers?)(?!\p{L})/iu.test(text) ? 'cold' : 'hot';
    }
  }
  // "the cooler removes 126 W of heat from the cabinet": what a fridge or cooler removes is its cooling output.
  if (roles.groups === POWER_ENERGY_ROLES && COOLING_MACHINE_RE.test(text) && /(?<!\p{L})(?:removes|removed|removing|can remove|pulls out|pumps out)[^\S\n]+(?:(?:about|around|roughly|some|nearly|up to|only|just)[^\S\n]+)?$/iu.test(text.slice(Math.max(floor, start - 40), start)) && /^[^\S\n]*(?:of[^\S\n]+)?heat(?!\p{L})/iu.test(text.slice(end, end + 20))) return 'out';
  // "filled a 5 kWh battery", "charged the 10 kWh pack": what is filled is what came out.
  // ("We charged the unit with 1.8e4 J": what people put in goes in, whatever it fills.)
  if (roles.groups === POWER_ENERGY_ROLES && /(?<!\p{L})(?:we|I|they|you|the team|the students)[^\S\n]+(?:(?:then|first|had|have|fully)[^\S\n]+)?(?:charged|filled|loaded|topped[^\S\n]+up)[^\S\n]+(?:the|a|an|its|our|their|my)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?with[^\S\n]+(?:(?:about|some|roughly)[^\S\n]+)?$/iu.test(text.slice(Math.max(floor, start - 60), start))) return 'in';
  if (roles.groups === POWER_ENERGY_ROLES && FILLS_LEAD_RE.test(text.slice(Math.max(floor, start - 40), start))) return 'out';
  // A verb right before the figure ("takes 50 PS of shaft power", "generates 40 kW") outweighs the
  // words after it.
  if (roles.groups === POWER_ENERGY_ROLES) {
    const lead = text.slice(Math.max(floor, start - 40), start);
    // "Turning the handle briskly puts about 6 W into the little generator inside": what a person's effort
    // puts into the machine is its input (not "the rotor puts 1.2 kW into the generator on its shaft").
    if (MUSCLE_LEAD_RE.test(text.slice(Math.max(floor, start - 70), start)) && /^[^\S\n]+(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?into[^\S\n]+(?:the|its|a|an)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:generators?|dynamos?|alternators?|machines?|devices?|units?|mechanisms?|flywheels?|springs?)(?!\p{L})/iu.test(text.slice(end, end + 60))) return 'in';
    // "The district network draws roughly 6 MWh out over the winter", "takes 2 kWh out of the store": what is
    // drawn out of a store or a source is what it gives.
    if (/(?<!\p{L})(?:draws?|drew|drawing|takes?|took|taking|pulls?|pulled|pulling)[^\S\n]+(?:(?:about|around|roughly|some|nearly|only|just|up to|over)[^\S\n]+)?$/iu.test(lead) && /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?out(?!\p{L})(?![^\S\n]+of[^\S\n]+(?:the[^\S\n]+)?(?:mains|grid|socket|wall|supply|battery|batteries|pack)(?!\p{L}))/iu.test(text.slice(end, end + 40))) return 'out';
    // "a 1 MW electrolyser": an electrolyser is rated by the electricity it takes; "hydrogen carrying 700 kW of
    // chemical energy" is what it gives.
    if (/^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+){0,2}?electroly[sz](?:er|ers|ing[^\S\n]+(?:plant|unit|stack)s?)(?!\p{L})/iu.test(text.slice(end, end + 40))) return 'in';
    if (/(?<!\p{L})(?:produces?|produced|producing|makes?|made|making|yields?|yielded|gives?|gave)[^\S\n]+hydrogen[^\S\n]+(?:carrying|containing|holding|worth|with)[^\S\n]+(?:(?:about|some|roughly|nearly)[^\S\n]+)?$/iu.test(lead) && /(?<!\p{L})electroly[sz]/iu.test(text)) return 'out';
    // "turns 500 W of DC into 460 W of AC … and 5,000 W of DC into 4,850 W of AC": each pair's first is in, its second out.
    if (/^[^\S\n]*of[^\S\n]+(?:DC|AC|electricity|heat|fuel|light|gas|steam)[^\S\n]+(?:in)?to[^\S\n]+(?:(?:about|some|roughly|nearly)[^\S\n]+)?[\d.,]+/iu.test(text.slice(end, end + 40)) && /(?<!\p{L})(?:turns?|turned|turning|converts?|converted|converting|changes?|changed)(?!\p{L})/iu.test(sentenceAround(text, start, end))) return 'in';
    if (/(?<!\p{L})of[^\S\n]+(?:DC|AC|electricity|heat|fuel|light|gas|steam)[^\S\n]+(?:in)?to[^\S\n]+(?:(?:about|some|roughly|nearly)[^\S\n]+)?$/iu.test(lead) && /(?<!\p{L})(?:turns?|turned|turning|converts?|converted|converting|changes?|changed)(?!\p{L})/iu.test(sentenceAround(text, start, end))) return 'out';
    // "on its 20 W heater supply": what a device runs on is what it takes.
    if (/(?<!\p{L})(?:on|from)[^\S\n]+(?:its|a|an|the|their)[^\S\n]+$/iu.test(lead) && /^[^\S\n]*(?:-[^\S\n]*)?(?:(?:heater|power|mains|bench|DC|AC|drive|input)[^\S\n]+)?supply(?!\p{L})/iu.test(text.slice(end, end + 30))) return 'in';
    // "motor rated 45 kW, measured electrical input 41 kW": a nameplate rating beside a measured input is no
    // output of the run measured.
    if (/(?<!\p{L})(?:motor|engine|unit|machine|drive|generator)[^\S\n]+(?:is[^\S\n]+)?rated(?:[^\S\n]+at)?[^\S\n]*:?[^\S\n]*$/iu.test(lead) && /(?<!\p{L})measured[^\S\n]+(?:electrical[^\S\n]+|electric[^\S\n]+)?(?:input|draw|consumption|power)(?!\p{L})/iu.test(text)) return 'aside';
    // "my e-bike (300 W motor output) plus my own 150 W of pedalling": the rider's effort beside a motor's
    // assistance is another push on the bike, not what the motor takes.
    if (/^[^\S\n]*(?:of[^\S\n]+)?(?:pedall?ing|pedal[^\S\n]+power|leg[^\S\n]+power|my[^\S\n]+own[^\S\n]+effort)(?!\p{L})/iu.test(text.slice(end, end + 25)) && /(?<!\p{L})(?:e-?bikes?|electric[^\S\n]+bikes?|pedelecs?|motor[^\S\n]+(?:output|assist\w*))(?!\p{L})/iu.test(text)) return 'aside';
    // "20 rooftop panels of 400 W each": a solar panel's rating is what it gives in full sun.
    if (/(?<!\p{L})(?:panels?|modules?)[^\S\n]+(?:of|rated(?:[^\S\n]+at)?)[^\S\n]+$/iu.test(lead) && /^[^\S\n]*(?:\(?[^\S\n]*(?:peak|Wp|DC)[^\S\n]*\)?[^\S\n]*)?each(?!\p{L})/iu.test(text.slice(end, end + 20)) && /(?<!\p{L})(?:solar|PV|photovoltaic|rooftop|sun)(?!\p{L})/iu.test(text)) return 'out';
    // "for the main engine to be throttled back by about 1.1 MW", "cuts the load by 3 kW": a saving on another
    // machine, no output of the device.
    if (/(?<!\p{L})(?:throttled|throttle|cut|cuts|reduced|reduces|reduce|lowered|lowers|trimmed|trims|eased|eases)[^\S\n]+(?:back[^\S\n]+|down[^\S\n]+)?by[^\S\n]+(?:(?:about|around|roughly|some|nearly|up to|over)[^\S\n]+)?$/iu.test(lead)) return 'aside';
    // "the fans about 400 W more than they would without the wheel": more drawn than otherwise — an input.
    if (/^[^\S\n]*more[^\S\n]+than[^\S\n]+(?:they|it|we|you|one|the[^\S\n]+[\p{L}-]+)[^\S\n]+would(?!\p{L})/iu.test(text.slice(end, end + 40))) return 'in';
    // "his 13.5 kWh lithium pack ran a 35 W compressor fridge": the rating of what a store or a source ran is
    // what it gave, whatever the load's own name says of its input.
    if (/(?<!\p{L})(?:batter(?:y|ies)|packs?|cells?|stores?|banks?|flywheels?|generators?|gensets?|panels?|arrays?|power[^\S\n]?stations?|inverters?)(?!\p{L})[^.;!?\n]{0,40}?(?<!\p{L})(?:ran|runs|run|powered|powers|kept|keeps|drove|drives|fed|feeds|supplied|supplies)[^\S\n]+(?:a|an|the|its|our|my|their|his|her)[^\S\n]+$/iu.test(text.slice(Math.max(0, start - 70), start))) return 'out';
    // "carried the 75 kW data-hall load for 90 s": a load the device carries is what it gives.
    if (/(?<!\p{L})(?:carr(?:y|ies|ied|ying)|held|holds?|holding|supports?|supported|supporting|picks?[^\S\n]+up|picked[^\S\n]+up)[^\S\n]+(?:the|a|an|its|their|our)[^\S\n]+(?:full[^\S\n]+)?$/iu.test(lead) && /^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+){0,2}?loads?(?!\p{L})/iu.test(text.slice(end, end + 40))) return 'out';
    // "spun up with 2.2 kWh", "charged with 5 kWh", "wound up with 40 J": what it was given is its input.
    if (/(?<!\p{L})(?:spun[^\S\n]+up|spin[^\S\n]+up|wound[^\S\n]+up|charged|filled|primed|loaded)[^\S\n]+(?:(?:over|in)[^\S\n]+[^\S\n\d]{0,12}[^\S\n]+)?with[^\S\n]+(?:(?:about|around|roughly|some|nearly|only|just)[^\S\n]+)?$/iu.test(lead)) return 'in';
    // "the rider puts in about 150 W", "we put in 2 kWh": what is put in is the input.
    if (/(?<!\p{L})(?:puts?|putting)[^\S\n]+in[^\S\n]+(?:(?:about|around|roughly|some|nearly|only|just|up to|over|a steady)[^\S\n]+)?$/iu.test(lead)) return 'in';
    // "the heat meter read 8.4 kW": a heat meter counts the heat delivered — the output.
    // (The figure itself right after the meter's verb: the text up to its end; where words of heat follow
    // it, they say so themselves.)
    const upToFigure = text.slice(Math.max(0, end - 110), end);
    if (/(?<!\p{L})heat[- ]?meters?(?:[^\S\n]+on[^\S\n]+the[^\S\n]+[\p{L}-]+)?(?:[^\S\n]+(?:read|reads|recorded|records|showed|shows|measured|logged|registered|gave|gives|totall?ed|indicated))?[^\S\n]*[:=]?[^\S\n]*(?:(?:about|some|roughly|only|just|nearly|a total of)[^\S\n]+)?[\d.,]+[^\S\n]*[\p{L}/·]+$/iu.test(upToFigure) && !/^[^\S\n]+(?:of[^\S\n]+)?(?:heat|warmth|thermal|useful)(?!\p{L})/iu.test(text.slice(end, end + 20))) return 'out';
    // "Gas meter: 28.4 kWh", "which at the supplier's calorific value comes to about 28.4 kWh": the fuel's energy, the input.
    // (Only what a fuel meter read: the heating value of a fuel a device makes — an electrolyser's hydrogen — is its output.)
    // (Read right after the meter, or a volume it read turned into energy: "Gas meter: 2.61 m³, which … comes to about 28.4 kWh".)
    if (
      /(?<!\p{L})(?:gas|fuel|oil)[- ]meters?(?:[^\S\n]+(?:read|reads|recorded|records|showed|shows|logged|registered|gave))?[^\S\n]*[:=]?[^\S\n]*(?:(?:about|some|roughly|nearly)[^\S\n]+)?[\d.,]+[^\S\n]*[\p{L}/·]+$/iu.test(upToFigure) ||
      /(?<!\p{L})(?:gas|fuel|oil)[- ]meters?[^.!?\n\d]{0,20}?[\d.,]+[^\S\n]*(?:m³|m3|litres?|liters?|l|ft³|cu\.?[^\S\n]?ft|therms?)(?!\p{L})[^.!?\n\d]{0,70}?[\d.,]+[^\S\n]*[\p{L}/·]+$/iu.test(upToFigure)
    )
      return 'in';
    // "(heat meter 11.2 kWh, electricity 2.6 kWh)" of a heat pump: the electricity is its input.
    if (HEAT_PUMP_RE.test(text) && /(?:^|[(,;:][^\S\n]*)(?:electricity|electrical(?:[^\S\n]+(?:input|energy))?|electric(?:[^\S\n]+meter)?|power[^\S\n]+meter)[^\S\n]*[:=]?[^\S\n]*[\d.,]+[^\S\n]*[\p{L}/·]+$/iu.test(upToFigure)) return 'in';
    // "The replacement chiller is sized for 2.4 kW of heat": a size chosen, not a flow of the device.
    if (/(?<!\p{L})sized[^\S\n]+(?:for|at)[^\S\n]+(?:(?:about|around|roughly|some)[^\S\n]+)?$/iu.test(lead)) return 'aside';
    // "putting 1.5 kW back into the ring main", "exports 3 kW to the grid": what goes back to the supply is the output.
    if (/(?<!\p{L})(?:putting|puts?|feeding|feeds|fed|sending|sends|sent|exporting|exports?|exported|pushing|pushes|returning|returns|returned)[^\S\n]+(?:(?:about|around|some|roughly|up to|nearly|over)[^\S\n]+)?$/iu.test(lead) && /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?(?:back[^\S\n]+)?(?:in)?to[^\S\n]+(?:the[^\S\n]+|your[^\S\n]+|its[^\S\n]+)?(?:ring[^\S\n]+main|mains|grid|socket|supply|network|house(?:hold)?|home|wiring|circuit)(?!\p{L})/iu.test(text.slice(end, end + 50))) return 'out';
    // "the inverter alone idles at 25 W", "standby draw 3 W": what a part takes doing nothing is a loss, no side of the run.
    if (/(?<!\p{L})(?:idles?|idling|standby|stand-by|no-load)(?:[^\S\n]+(?:draw|consumption|loss(?:es)?|power))?[^\S\n]+(?:(?:at|of|is|draws?|takes?|uses?)[^\S\n]+)?(?:(?:about|around|roughly|some|only|just)[^\S\n]+)?$/iu.test(lead)) return 'aside';
    // "the calorimeter constant to within 0.3 W", "a resolution of 5 mW": how well it was measured, not a flow.
    if (PRECISION_LEAD_RE.test(lead)) return 'aside';
    // "The energy meter recorded 12.0 kWh", where the methods put the one meter at the output ("power
    // measured by a DC energy meter at the output terminals"): what that meter read is the output.
    if (/(?<!\p{L})meters?[^\S\n]+(?:read|reads|recorded|records|showed|shows|measured|logged|registered)[^\S\n]+(?:(?:about|some|roughly|only|just|a total of)[^\S\n]+)?$/iu.test(lead) && METER_AT_OUTPUT_RE.test(text) && !METER_AT_INPUT_RE.test(text)) return 'out';
    // "drawing far less than its rated 5 W", "the claimed 2 kW": a figure said again, as the claim's, by someone
    // weighing it (its first mention carries its side).
    if (RESTATED_LEAD_RE.test(lead) && sameFigureEarlier(text, start, end)) return 'aside';
    // "We charged the supercapacitor with 500 J": what people put into a store is its input.
    if (PEOPLE_CHARGED_RE.test(text.slice(Math.max(floor, start - 90), start))) return 'in';
    // "we pull 800 W off it", "you can draw 2 kW out of the generator": what people take from the device is its output.
    if (PEOPLE_TAKE_LEAD_RE.test(lead) && TAKEN_FROM_IT_RE.test(text.slice(end, end + 40))) return 'out';
    // "Energy to the driver over a 24-hour run: 0.96 kWh", "Power into the coil: 40 W": a label of what goes in.
    if (/(?:^|[.!?\n])[^\S\n]*(?:(?:electrical|electric|total)[^\S\n]+)?(?:energy|power|electricity)[^\S\n]+(?:(?:supplied|fed|delivered|put|going)[^\S\n]+)?(?:in)?to[^\S\n]+(?:the|its)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:drivers?|drive[^\S\n]+electronics|coils?|devices?|units?|thrusters?|cavit(?:y|ies)|drives?|modules?|boards?|circuits?|electronics|reactors?|cells?|stacks?|magnetrons?|amplifiers?|prototypes?|rigs?|heaters?|elements?)(?!\p{L})[^.!?\n:]{0,50}:[^\S\n]*(?:(?:about|around|roughly|some)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, start - 100), start))) return 'in';
    // "an ordinary 12 V battery, which supplies 8 A to the driver board": what a supply gives the device's
    // parts is the device's input.
    if (SUPPLY_GIVES_LEAD_RE.test(lead) && TO_DEVICE_PART_AFTER_RE.test(text.slice(end, end + 50))) return 'in';
    // "the resistive load bank receives 1.6 kW": what a load receives is what the device gives it.
    if (LOAD_RECEIVES_RE.test(lead)) return 'out';
    // (Not when a supply is the subject: "the bench supply delivers 5 A" is what the device takes.)
    if (!/(?<!\p{L})(?:suppl(?:y|ies)|batter(?:y|ies)|mains|grid|sources?|sockets?|packs?|alternators?|chargers?|PSUs?|adapters?)[^\S\n]+\p{L}+[^\S\n]+[^.;!?\n]{0,12}$/iu.test(lead)) {
      // "the battery ran a chest freezer drawing 300 W": what a load the device runs draws is its output.
      // (Read with the words before the floor in view, so that "a 72-hour run" shows itself a noun.)
      const runsFrom = Math.max(0, start - 70);
      const runs = LOAD_IT_RUNS_RE.exec(text.slice(runsFrom, start));
      if (runs && runsFrom + runs.index >= floor) return 'out';
      // "then carried the telemetry cabinet, a steady 600 W load, for 7 hours": the load a store or a
      // supply carried, named as such right after the figure.
      if (LOAD_AFTER_RE.test(text.slice(end, end + 30)) && LOAD_CARRIED_RE.test(text.slice(Math.max(floor, start - 90), start))) return 'out';
      // "Plug in your 900 W heater and it runs 8 hours": an appliance the reader plugs into the device is its load.
      if (PLUG_IN_LEAD_RE.test(text.slice(Math.max(floor, start - 40), start)) && APPLIANCE_AFTER_RE.test(text.slice(end, end + 30))) return 'out';
      // "Recharging from the mains afterwards took 5 hours 40 minutes and 5.6 kWh": what a recharge took is the input.
      if (RECHARGE_TOOK_RE.test(text.slice(Math.max(floor, start - 90), start))) return 'in';
      // "the engine gave the dynamo about two kilowatts of shaft power": what a generator is given is its input;
      // "the dynamo turned it into one and a half kilowatts": what it is turned into is the output.
      if (GIVEN_TO_GENERATOR_RE.test(lead)) return 'in';
      if (TURNED_INTO_RE.test(lead)) return 'out';
      if (IMMEDIATE_IN_RE.test(lead)) return 'in';
      // "produced 12.5 W of excess heat": an excess said of what it produced.
      // ("puts out about 1.6 kW more heat than it takes from the socket": more than what it takes.)
      if (IMMEDIATE_OUT_RE.test(lead) && (/^[^\S\n]*(?:of[^\S\n]+)?(?:excess|surplus|extra|anomalous)(?!\p{L})/iu.test(text.slice(end, end + 20)) || /^[^\S\n]+more[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,3}?than[^\S\n]+(?:(?:it|they|the[^\S\n]+[\p{L}-]+)[^\S\n]+)?(?:takes|draws|uses|consumes|gets|is[^\S\n]+fed|(?:it[^\S\n]+)?(?:is|was)[^\S\n]+given)(?!\p{L})/iu.test(text.slice(end, end + 60)))) return 'excess';
      if (IMMEDIATE_OUT_RE.test(lead)) return 'out';
    }
  }
  roles.after.lastIndex = end;
  // (Not past a table's column gap: the words there are the next cell's label.)
  // (Nor into a bracket that holds a figure of its own: "Optical output 5.0 kW (draw from the pack about 12 kW)"
  // — its words are that figure's.)
  const a = /^(?:[^\S\n]{3,}|\t)[^\S\n]*\p{Lu}/u.test(text.slice(end, end + 40)) || /^[^\S\n]*\([^()\n]*?\d/u.test(text.slice(end, end + 60)) ? null : roles.after.exec(text);
  if (a?.groups) {
    for (let i = 0; i < roles.groups.length; i++) {
      if (a.groups[`r${i}`] !== undefined) {
        lastRoleWords.end = end + a[0].length;
        return roles.groups[i].role;
      }
    }
  }
  const from = windowStart(text, start, floor, BEFORE_WINDOW);
  const slice = text.slice(from, start);
  roles.before.lastIndex = 0;
  let last: RegExpExecArray | null = null;
  for (let m = roles.before.exec(slice); m; m = roles.before.exec(slice)) last = m;
  if (!last) return null;
  // A role word said to be absent ("needs no supply once started, 2.5 kW continuous", "without any
  // input") names no side for the figure after it.
  if (NEGATED_LEAD_RE.test(slice.slice(Math.max(0, last.index - 20), last.index))) return null;
  let best: FigureRole = null;
  let longest = 0;
  roles.beforeAt.forEach((re, i) => {
    re.lastIndex = last!.index;
    const m = re.exec(slice);
    if (m && m[0].length > longest) {
      longest = m[0].length;
      best = roles.groups[i].role;
    }
  });
  return best;
}

/** A person's effort as the subject: "Turning the handle briskly puts about", "pedalling at a steady pace gives". */
const MUSCLE_LEAD_RE = /(?<!\p{L})(?:turning|cranking|winding|pedall?ing|shaking|pumping|pushing|pulling)[^\S\n]+(?:the[^\S\n]+)?(?:handle|crank|pedals?|lever|key|spring)?[^.;!?\n]{0,30}?(?<!\p{L})(?:puts?|gives?|delivers?|feeds?|sends?)[^\S\n]+(?:(?:about|some|roughly|nearly|around)[^\S\n]+)?$/iu;

/** A meter placed at the output in a text's methods ("measured by a DC energy meter at the output terminals", "a wattmeter on the load"). */
const METER_AT_OUTPUT_RE = /(?<!\p{L})(?:(?:energy|power|watt-?hour|kWh)[^\S\n]*)?(?:wattmeters?|meters?)[^.;!?\n]{0,40}?(?<!\p{L})(?:at|on|across|in)[^\S\n]+the[^\S\n]+(?:output|load)(?:[^\S\n]+(?:terminals|side|circuit|cables?))?(?!\p{L})/iu;
/** A meter placed at the input ("a meter on the supply", "wattmeter at the input"). */
const METER_AT_INPUT_RE = /(?<!\p{L})(?:wattmeters?|meters?)[^.;!?\n]{0,40}?(?<!\p{L})(?:at|on|across|in)[^\S\n]+the[^\S\n]+(?:input|supply|mains|source)(?:[^\S\n]+(?:terminals|side|circuit|cables?))?(?!\p{L})/iu;

/** A supply as the subject of a verb of giving, right before a figure: "battery, which supplies", "the mains feeds". */
export const SUPPLY_GIVES_LEAD_RE =
  /(?<!\p{L})(?:suppl(?:y|ies)|batter(?:y|ies)|mains|grid|sockets?|packs?|PSUs?|adapters?|chargers?)(?:,?[^\S\n]+(?:which|that))?[^\S\n]+(?:supplies|supplied|delivers|delivered|provides|provided|gives|gave|feeds|fed|puts[^\S\n]+out|sends|sent)[^\S\n]+(?:(?:about|around|roughly|some|only|just|a steady)[^\S\n]+)?$/iu;
/**
 * After a figure: the part of the device it goes to ("to the driver board", "into the motor controller") —
 * not a motor or a machine, which a store may run as its load ("the pack delivered 9.6 kWh to the drive motor").
 */
export const TO_DEVICE_PART_AFTER_RE =
  /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?(?:in)?to[^\S\n]+(?:the|its|our|my|his|her|their)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:boards?|drivers?|units?|devices?|circuits?|circuitry|controllers?|coils?|modules?|electronics|prototypes?|rigs?)(?!\p{L})/iu;

/** A load as the subject that receives a figure: "the load bank receives", "the heater gets". */
const LOAD_RECEIVES_RE =
  /(?<!\p{L})(?:loads?|load[^\S\n]+banks?|dummy[^\S\n]+loads?|resistors?|heaters?|heating[^\S\n]+elements?|lamps?|bulbs?|consumers?|dynamometers?|dynos?|brakes?|brake[- ]bands?)[^\S\n]+(?:receives?|received|receiving|gets|got|sees|saw|absorbs?|absorbed|dissipates?|dissipated)[^\S\n]+(?:(?:about|around|roughly|some|only|just|nearly|a steady|an average of|on average)[^\S\n]+)?$/iu;

/** Just before a role word: a word that says it is absent ("no", "without", "zero"). */
const NEGATED_LEAD_RE = /(?<!\p{L})(?:no|without|zero|never|nor)[^\S\n]+(?:(?:any|external|outside|other|electrical|electric)[^\S\n]+){0,2}$/iu;

/** "dry mass, including …, is", "empty mass:": the words of a craft's mass after the burn, a clause set off by commas allowed between. */
const DRY_MASS_LEAD_RE =
  /(?<!\p{L})(?:dry|empty|burn-?out|final)[^\S\n]+mass(?:[^\S\n]*,[^,;.!?\n]{0,120},|[^\S\n]+(?:incl\.?|including|with|w\/|plus|\+)[^\S\n]+[\p{L}-]+(?:[^\S\n]+[\p{L}-]+){0,2})?[^\S\n]*(?:(?:is|was|of|at|comes to|totals?|totalling|:|=)[^\S\n]*)?(?:(?:about|around|roughly|some|only|just)[^\S\n]+)?$/iu;
/** "at burnout, with …, the stack weighs": the mass at the end of the burn. */
const BURNOUT_LEAD_RE =
  /(?<!\p{L})at[^\S\n]+(?:burn-?out|engine cut-?off|cut-?off|MECO|shut-?down|the end of the burn)(?:[^\S\n]*,[^;.!?\n]{0,160},)?[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,4}?(?:weighs?|weighed|is|was|masses|has a mass of|comes to)[^\S\n]*(?:(?:about|around|roughly|some|only|just)[^\S\n]+)?$/iu;

/** "gave the dynamo about", "fed the generator with": right before what a generator is given. */
const GIVEN_TO_GENERATOR_RE = /(?<!\p{L})(?:gave|gives|give|delivered|delivers|supplied|supplies|fed|feeds|feeding)[^\S\n]+(?:the|its|a|an)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:dynamos?|generators?|alternators?)(?:[^\S\n]+with)?(?:[^\S\n]+(?:about|some|roughly|nearly|around))?[^\S\n]*$/iu;
/** "turned it into about": right before what a machine turns its input into. */
const TURNED_INTO_RE = /(?<!\p{L})(?:turn(?:s|ed|ing)?|convert(?:s|ed|ing)?)[^\S\n]+(?:it|this|that|them|these|those)[^\S\n]+into(?:[^\S\n]+(?:about|some|roughly|nearly|around))?[^\S\n]*$/iu;

/** A rating condition, not a role: "Fuel energy input (LHV) at rated output | 2.6 kW", "input at full load". */
const RATING_CONDITION_RE = /(?<!\p{L})(?:at|under)[^\S\n]+(?:the[^\S\n]+)?(?:rated|full|nominal|maximum|max\.?|peak|continuous|part)[^\S\n]+(?:output|load|power|capacity)(?!\p{L})(?![^\S\n]*(?:of|is|was|=|:)?[^\S\n]*(?:about|around|roughly|some)?[^\S\n]*\p{N})/giu;

/** Right after a figure: a source that gives nothing ("of power from the quantum vacuum", "out of the aether"). */
const FROM_NOTHING_AFTER_RE =
  /^[^\S\n]*(?:of[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:power|energy|electricity)[^\S\n]+)?(?:from|out[^\S\n]+of)[^\S\n]+(?:the[^\S\n]+)?(?:(?:quantum|physical)[^\S\n]+)?(?:vacuum(?:[^\S\n]+(?:field|fluctuations?|energy))?|zero[- ]point(?:[^\S\n]+(?:field|energy|fluctuations?))?|a?ether|aether|void|space[- ]time|fabric[^\S\n]+of[^\S\n]+space)(?!\p{L})/iu;
/** Right before the work a machine does: "does", "did", "performs", "doing". */
const DOES_WORK_BEFORE_RE = /(?<!\p{L})(?:does|did|doing|performs?|performed|performing)[^\S\n]+(?:(?:about|some|roughly|nearly|only|just|a[^\S\n]+total[^\S\n]+of)[^\S\n]+)?$/iu;
/** Idioms with "in" or "out" that name no side: "out of curiosity", "in fact", "in short". */
const NO_SIDE_IDIOM_RE = /(?<!\p{L})(?:out[^\S\n]+of[^\S\n]+(?:curiosity|interest|habit|caution|respect)|in[^\S\n]+(?:fact|short|theory|practice|turn|particular))(?!\p{L})/giu;

export function roleFor(text: string, kind: FigureKind, start: number, end: number, floor: number): FigureRole {
  // (Blanked, places kept.)
  if ((kind === 'power' || kind === 'energy') && RATING_CONDITION_RE.test(text)) text = text.replace(RATING_CONDITION_RE, (m) => ' '.repeat(m.length));
  // ("Out of curiosity I put the clamp meter on it": no side.)
  if ((kind === 'power' || kind === 'energy') && NO_SIDE_IDIOM_RE.test(text)) text = text.replace(NO_SIDE_IDIOM_RE, (m) => ' '.repeat(m.length));
  // "gas energy out (HHV, inventor's calc from his flowmeter) = 5.9E+03 W": an aside in brackets between a
  // label and its value is no word of it (blanked, places kept).
  const from = Math.max(0, start - 120);
  const aside = /\([^()\n]{1,100}\)(?=[^\S\n]*[=:][^\S\n]*(?:(?:about|approx\.?|~|≈)[^\S\n]*)?$)/u.exec(text.slice(from, start));
  if (aside && (kind === 'power' || kind === 'energy')) text = text.slice(0, from + aside.index) + ' '.repeat(aside[0].length) + text.slice(from + aside.index + aside[0].length);
  // "draws 3.2 × 10⁴ W of continuous power from the quantum vacuum": what a device is said to take from a
  // source that gives nothing (the vacuum, a zero-point field, the aether) is the output it claims, whatever
  // verb of taking comes before it.
  if ((kind === 'power' || kind === 'energy') && FROM_NOTHING_AFTER_RE.test(text.slice(end, end + 80))) return 'out';
  // "A small motor does 2.7 × 10¹¹ erg of work each minute": the work a machine is said to do is its output.
  if ((kind === 'power' || kind === 'energy') && /^[^\S\n]+of[^\S\n]+(?:useful[^\S\n]+|mechanical[^\S\n]+)?work(?!\p{L})/iu.test(text.slice(end, end + 30)) && DOES_WORK_BEFORE_RE.test(text.slice(Math.max(floor, start - 30), start))) return 'out';
  // "720 kJ from the socket for roughly 570 kJ in the water": what ends up in the heated water or vessel is the output.
  if ((kind === 'power' || kind === 'energy') && /^[^\S\n]*(?:of[^\S\n]+heat[^\S\n]+)?(?:(?:ends?|ended)[^\S\n]+up[^\S\n]+|stored[^\S\n]+|(?:is|was)[^\S\n]+)?in[^\S\n]+the[^\S\n]+(?:(?:hot|heated|bath|tank|kettle)[^\S\n]+)?(?:water|tank|bath|pot|pan|kettle|cup|mug|drum|cylinder)(?!\p{L})/iu.test(text.slice(end, end + 50))) return 'out';
  if (kind === 'power' || kind === 'energy') {
    IN_OUT_AFTER_RE.lastIndex = end;
    const io = IN_OUT_AFTER_RE.exec(text);
    if (io) return io[1].toLowerCase() === 'in' ? 'in' : 'out';
  }
  const roles = ROLES[kind];
  if (roles) return roleFromWords(text, roles, start, end, floor);
  if (kind === 'cop') {
    // "a heating COP of 4.1", "cooling COP 5.0": said right before it.
    const near = /(heating|cooling)[^\S\n]+(?:COP|coefficient of performance)[^.;!?\n]{0,25}$/iu.exec(text.slice(Math.max(0, start - 60), start));
    if (near) return near[1].toLowerCase() === 'cooling' ? 'cooling' : 'heating';
    // "COP_h ≈ 4.5", "COP_c = 3".
    const symbol = /COP_?\{?(h|c|heat|heating|cool|cooling)\}?(?!\p{L})[^.;!?\n]{0,12}$/iu.exec(text.slice(Math.max(0, start - 30), start));
    if (symbol) return /^c/i.test(symbol[1]) ? 'cooling' : 'heating';
    // The nearer of a word of cooling and one of heating ("COP 2.9, heating water to 60 °C … it will also
    // cool the kitchen a bit": heating).
    const from = Math.max(0, start - COP_WINDOW);
    const around = text.slice(from, Math.min(text.length, end + COP_WINDOW));
    const nearest = (re: RegExp): number => {
      let best = Infinity;
      for (const m of around.matchAll(new RegExp(re.source, 'giu'))) {
        const at = from + m.index!;
        best = Math.min(best, at < start ? start - (at + m[0].length) : at - end);
      }
      return best;
    };
    const [cool, heat] = [nearest(COP_COOLING_RE), nearest(COP_HEATING_RE)];
    if (cool < Infinity && cool <= heat) return 'cooling';
    if (heat < Infinity || HEAT_PUMP_RE.test(text)) return 'heating';
    // (A cooler's sheet with its COP far below the name: "Frostline thermoelectric cooler module … COP …… 0.35".)
    if (COOLING_MACHINE_RE.test(text)) return 'cooling';
  }
  return null;
}

/** A machine named right after a power, with at most two words between ("150 PS engine", "1 hp rotary compressor"). */
const RATED_ENGINE_AFTER_RE = /^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:engines?|motors?|turbines?)(?!\p{L})(?![^.;!?\n]{0,40}(?<!\p{L})(?:drives?|driving|drove|driven|turns?|turning|turned|powers?|powering|powered|spins?|spinning|spun|runs?|running|ran|pumps?|pumping|feeds?|feeding|coupled|connected|attached|linked)(?!\p{L}))/iu;
/** "… motor is a" / "… engine was an" right before a rating (no compressor or cooler word in the name). */
const RATED_SUBJECT_BEFORE_RE = /(?<!(?:compressor|cooler|fridge|freezer|chiller|conditioner|heat[^\S\n]+pumps?)[^\S\n]+)(?<!\p{L})(?:engine|motor|turbine)[^\S\n]+(?:is|was)[^\S\n]+(?:a|an)[^\S\n]+$/iu;
/** A rating followed by a word for the machine itself ("unit", "model"), and no word that it drives something. */
const RATED_UNIT_AFTER_RE = /^[^\S\n]*(?:-[^\S\n]*)?(?:unit|machine|model|design|frame|motor|engine|turbine)(?!\p{L})(?![^.;!?\n]{0,40}(?<!\p{L})(?:drives?|driving|turns?|turning|powers?|powering|spins?|spinning|feeds?|feeding|coupled|connected|attached|linked)(?!\p{L}))/iu;
const RATED_DRIVEN_AFTER_RE = /^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:cryocoolers?|compressors?|fridges?|refrigerators?|freezers?|chillers?|air[- ]conditioners?|heat pumps?|coolers?)(?!\p{L})/iu;

/** A generator named as the subject of its paragraph (near its start). */
const GENERATOR_NAMED_RE = /(?<!\p{L})(?:generators?|gensets?|generating[^\S\n]+sets?|alternators?)(?!\p{L})/iu;
/** Right after a power: its rating word and nothing else ("5 kW rated,", "5.5 kW max.", "2,800 W running"). */
const GENERATOR_RATING_AFTER_RE =
  /^[^\S\n]*(?:rated|continuous|cont\.?|max(?:imum)?\.?|peak|surge|running|starting|prime|standby|nominal|nom\.?)(?:[^\S\n]+(?:power|output))?[^\S\n]*(?:[,.;()\n]|$|and(?!\p{L}))/iu;
/** Just before a power: a rating's label ("Rated:", "Max output", "Surge power:", "Running watts"). */
const GENERATOR_RATING_BEFORE_RE =
  /(?:^|[.;,(\n|][^\S\n]*)(?:rated|continuous|max(?:imum)?|peak|surge|running|starting|prime|standby)(?:[^\S\n]+(?:power|output|watts|rating))?[^\S\n]*[:=]?[^\S\n]*$/iu;

/**
 * A machine's rating said before its name, where the name settles which side it is: the rating of an
 * engine, motor or turbine that is the claim's subject ("The 150 PS engine is 36 % efficient") is its
 * output; a horsepower rating of a compressor or a cooler ("the 1 hp cryocooler") is its drive, the
 * input. (A cooler's rating in watts or BTU/h is usually its capacity, a pump's horsepower its motor's
 * output, and an engine that drives something else is that thing's input: all left to the other rules.)
 */
export function ratingRole(text: string, start: number, end: number): FigureRole {
  const after = text.slice(end, end + 60);
  const horsepower = /(?:hp|horsepower|PS|CV|bhp)\s*$/iu.test(text.slice(start, end));
  if (horsepower && RATED_DRIVEN_AFTER_RE.test(after)) return 'in';
  // "The main engine … is rated at 12,000 PS": an engine, a turbine or a generator is rated by what it gives.
  if (/(?<!\p{L})(?:engines?|turbines?|generators?|gensets?|generating sets?|alternators?)(?!\p{L})[^.;!?\n]{0,80}?(?<!\p{L})(?:is|was|are|were)[^\S\n]+rated[^\S\n]+(?:at|for)[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 120), start))) return 'out';
  // "The restored compound engine now runs on steam …; at its rated 10 hp it turns …": an engine's own rating.
  if (/(?<!\p{L})(?:engines?|turbines?|generators?|gensets?|alternators?)(?!\p{L})[^.!?\n]{0,120}?(?<!\p{L})(?:its|their)[^\S\n]+rated[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 160), start))) return 'out';
  // "An immersion heater rated at 2 kW": a heater, a kettle or a lamp is rated by the electricity it takes.
  if (/(?<!\p{L})(?:heaters?|kettles?|heating elements?|elements?|toasters?|hobs?|lamps?|bulbs?)(?!\p{L})[^.;!?\n]{0,20}?(?<!\p{L})rated[^\S\n]+(?:at|for)[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 60), start))) return 'in';
  // "a 3 kW kettle", "the 2 kW fan heater", "a 60 W bulb": an appliance that turns electricity into heat or
  // light is sized by what it takes. (Not a heat pump, a boiler or a stove, sized by what they give; not a
  // microwave oven or a laser, sized by their output; not "a 100 W-equivalent LED".)
  if (
    !horsepower &&
    /(?:W|watts?)[^\S\n]*$/iu.test(text.slice(start, end)) &&
    /^[^\S\n]*(?:-[^\S\n]*)?(?:(?:LED|electric|electrical|immersion|fan|oil-filled|radiant|infrared|panel|convector|bar|ceramic|halogen|incandescent|filament|quartz|tungsten|mains|kitchen|travel|cordless|resistive|resistance|storage|water|space|patio|towel|bench|old|new|ordinary|plain|standard|cheap)[^\S\n]+){0,2}(?:kettles?|heaters?|heating[^\S\n]+elements?|elements?|toasters?|hobs?|hotplates?|hot[^\S\n]+plates?|irons?|hair[^\S\n]?dryers?|soldering[^\S\n]+irons?|(?:light[^\S\n]+)?bulbs?|lamps?|downlights?|spotlights?|floodlights?|light[^\S\n]+fittings?|luminaires?|LED[^\S\n]+(?:panels?|strips?|tubes?|fittings?))(?!\p{L})(?![^\S\n]*-?[^\S\n]*equivalent)/iu.test(after) &&
    !/^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:heat[- ]pumps?|lasers?)/iu.test(after) &&
    !/(?<!\p{L})equivalent[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 15), start)) &&
    // (Nor a heater it is set beside: "heating like a 2 kW heater and more", "as much as a 3 kW fan heater".)
    !/(?<!\p{L})(?:like|as|than|unlike|versus|vs\.?|rivals?|matches|equivalent[^\S\n]+(?:of|to)|comparable[^\S\n]+(?:to|with)|instead[^\S\n]+of|replaces?|replacing)[^\S\n]+(?:(?:a|an|the|any|your|my|our|their)[^\S\n]+)?(?:(?:ordinary|standard|normal|plain|old|typical|conventional|cheap|regular)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, start - 40), start)) &&
    // (Nor one run on or off something named after it, or on an output: "A 100 W lamp ran for 30 hours on a
    // battery box", "a 60 W bulb on the output side glows".)
    !/^[^.;!?\n]{0,80}?(?<!\p{L})(?:(?:ran|runs?|running|lit|glow(?:s|ed|ing)?|shone|shines?|burn(?:s|ed|ing)?|powered|fed|kept[^\S\n]+going)(?:[^\S\n]+for[^\S\n]+[^.;!?\n]{1,25}?)?[^\S\n]+(?:on|off|from|by)[^\S\n]+(?:a|an|the|its|our|my|their|this|that)[^\S\n]|on[^\S\n]+the[^\S\n]+(?:output|load|secondary))/iu.test(after) &&
    // (Nor an appliance in a text about another source of energy — a box, a coil, a pack, a generator — which
    // it is the load of: "I connected a 5 W LED panel" to a pack, "A sixty-watt mains bulb" the box lights.)
    !/(?<!\p{L})(?:box(?:es)?|coils?|generators?|alternators?|dynamos?|modules?|circuits?|packs?|batter(?:y|ies)|capacitors?|toroids?|reactors?|inverters?|motors?|engines?|magnets?|flywheels?|regenerators?|converters?|panels?[^\S\n]+(?:of[^\S\n]+)?solar|solar[^\S\n]+panels?)(?!\p{L})/iu.test(text) &&
    // (Not the load of the device the claim is about: "kept a 2 kW heater going", "runs a 3 kW kettle off it".)
    !/(?<!\p{L})(?:lights?|lit|lighting|powers?|powered|powering|runs?|running|ran|drives?|driving|drove|feeds?|fed|feeding|keeps?|kept|keeping|heats?|supplies|supplying|into|to|with|on|off|boils?|boiling)[^\S\n]+(?:up[^\S\n]+)?(?:a|an|the|its|our|their|two|three|four|several|\d+)[^\S\n]+(?:(?:[\p{L}-]+|×)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, start - 50), start))
  ) return 'in';
  // "from an 8 kW helium compressor", "the 3 kW scroll compressor": a compressor is rated by what its motor takes.
  if (!horsepower && /(?:W|watts?)[^\S\n]*$/iu.test(text.slice(start, end)) && /^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+){0,2}?compressors?(?!\p{L})/iu.test(after)) return 'in';
  // "a 9 kW ground-source heat pump": a heat pump is rated by the heat it gives.
  if (!horsepower && /^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+){0,2}?heat[- ]pumps?(?!\p{L})/iu.test(after) && /(?:W|watts?)[^\S\n]*$/iu.test(text.slice(start, end))) return 'out';
  // "The 400 kW machine, he said, replaced two oil boilers" in a text on a heat pump, "The 800 MW block" in one
  // on a power plant: a machine's rating is what it gives, where the text's machine gives heat it moves or
  // electricity it generates and the sentence says nothing of what it takes.
  if (
    !horsepower &&
    /(?:W|watts?)[^\S\n]*$/iu.test(text.slice(start, end)) &&
    /(?:^|[.!?:;\n][^\S\n]*)(?:the|this|that|our|its|their)[^\S\n]+$/iu.test(text.slice(Math.max(0, start - 12), start)) &&
    /^[^\S\n]*(?:-[^\S\n]*)?(?:machine|unit|block|plant|station|installation)(?!\p{L})/iu.test(after) &&
    !/(?<!\p{L})(?:draws?|drew|drawing|takes?|took|consum\w*|uses?|used|input|needs?|fed|supplied|electricity[^\S\n]+(?:in|use))(?!\p{L})/iu.test(sentenceAround(text, start, end)) &&
    ((HEAT_PUMP_RE.test(text) && !COOLING_MACHINE_RE.test(text.replace(HEAT_PUMP_RE, ' '))) || /(?<!\p{L})(?:power[^\S\n]+(?:plant|station)s?|supercritical|combined[- ]cycle|steam[^\S\n]+turbines?|gas[^\S\n]+turbines?|coal[- ]fired|nuclear[^\S\n]+plant)(?!\p{L})/iu.test(text))
  ) return 'out';
  // "the 12 kW ground-source unit", "Our 7,5 kW air-to-water unit": a heat pump named by the source it draws on.
  if (
    !horsepower &&
    /(?:W|watts?)[^\S\n]*$/iu.test(text.slice(start, end)) &&
    /^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+)?(?:(?:ground|air|water|brine|exhaust[- ]air|geothermal)[- ]source|air[- ]to[- ](?:water|air)|water[- ]to[- ]water|brine[- ]to[- ]water)(?!\p{L})(?![^\S\n]+(?:heat[^\S\n]+)?(?:collectors?|loops?|boreholes?|arrays?|probes?))/iu.test(after)
  ) return 'out';
  // "(air-source heat pump, 7 kW)", "a 450 kW screw chiller": a machine that moves heat is sized by the heat it
  // moves. (Not "the unit is rated 2 kW", which in a shop's or a backer's text is as often what it draws.)
  if (!horsepower && /(?:W|watts?)[^\S\n]*$/iu.test(text.slice(start, end))) {
    if (/^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:chillers?|heat[- ]pumps?|air[- ]conditioners?|(?:cooling|refrigeration)[^\S\n]+(?:units?|plants?|machines?))(?!\p{L})/iu.test(after)) return 'out';
    if (/(?<!\p{L})(?:heat[- ]pumps?|chillers?|air[- ]conditioners?)(?!\p{L})[^\S\n]*,[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 40), start)) && /^[^\S\n]*\)/u.test(after)) return 'out';
  }
  // "Portmane G5000 open-frame generator. 5 kW rated, 5.5 kW max.": a generator's ratings in a list of its
  // own (the figure with its rating word and nothing else said of it) are what it gives.
  if (GENERATOR_RATING_AFTER_RE.test(after) || GENERATOR_RATING_BEFORE_RE.test(text.slice(Math.max(0, start - 30), start))) {
    const para = paragraphAround(text, start, end);
    const head = para.slice(0, 160);
    if (GENERATOR_NAMED_RE.test(head) && !/(?<!\p{L})(?:motors?|inputs?|draws?|drawing|consum\w*|takes)(?!\p{L})/iu.test(text.slice(Math.max(0, start - 30), end + 30))) return 'out';
  }
  if (RATED_ENGINE_AFTER_RE.test(after) && /(?:^|[.!?:\n][^\S\n]*)(?:the|a|an|our|this|its|their|each)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?$/iu.test(text.slice(Math.max(0, start - 40), start))) return 'out';
  // "The pump motor is a 10 hp unit drawing 8.2 kW": the rating of the motor, engine or turbine the
  // sentence is about (not a compressor's or a cooler's drive, not one that drives something named).
  if (RATED_SUBJECT_BEFORE_RE.test(text.slice(Math.max(0, start - 60), start)) && RATED_UNIT_AFTER_RE.test(after)) return 'out';
  return null;
}
