/**
 * Roles the words leave open, read from the other figures (the claim reader, shared/claims/reader.ts,
 * pass 3): a distance in a time as a speed; the power that drives a thrust; what is turned into
 * what, what comes from what, a store charged and what it then holds; a test stand's mass set aside;
 * a propellant from its mass fraction; and a rocket's masses (wet, dry, propellant, the one missing
 * derived) and speeds.
 */
import { formatQuantity } from '../../worksheet/quantity';
import { formatPrint } from '../print';
import type { FigureRole } from '../types';
import { COOLING_MACHINE_RE, paragraphAround, sentenceAround } from './context';
import { insertInOrder, sentenceOf, siOf, typedSi, type Draft } from './draft';
import { signalSpeeds } from './signal-speeds';
import { vehicleRanges } from './vehicle-ranges';

/** A propellant mass fraction: "propellant is 90 % of the mass", "90 % propellant by mass", "a propellant fraction of 85 %". */
const PROPELLANT_FRACTION_RE =
  /(?<!\p{L})propellant(?:[^\S\n]+mass)?(?:[^\S\n]+fraction)?[^\S\n]+(?:is|of|=|:|makes? up|making up|accounts? for|accounting for|forms?|forming)?[^\S\n]*(\d+(?:\.\d+)?)[^\S\n]*(?:%|per[^\S\n]?cent)[^\S\n]+of|(\d+(?:\.\d+)?)[^\S\n]*(?:%|per[^\S\n]?cent)[^\S\n]+(?:of[^\S\n]+(?:its|the)[^\S\n]+(?:[\p{L}\d-]+[^\S\n]+){0,3})?(?:mass[^\S\n]+)?(?:is[^\S\n]+)?propellant|(?<!\p{L})propellant(?:[^\S\n]+mass)?[^\S\n]+fraction[^\S\n]+(?:of|is|=)[^\S\n]*(\d+(?:\.\d+)?)[^\S\n]*%/iu;

/** A share said in words or as a percentage, of a mass just given, that is propellant: "four-fifths of that is propellant". */
const SHARE_OF_THAT_PROPELLANT_RE =
  /(?<![\p{L}\d.])(?:(a|an|one|two|three|four|five|six|seven|eight|nine)[- ](half|third|quarter|fifth|sixth|seventh|eighth|ninth|tenth)s?|(\d+(?:\.\d+)?)[^\S\n]*(?:%|per[^\S\n]?cent))[^\S\n]+of[^\S\n]+(?:that|it|this|which|(?:the|its)[^\S\n]+(?:(?:whole|total|launch|lift-?off|pad|gross)[^\S\n]+)?(?:mass|weight|total))[^\S\n]+(?:is|was|being|are)[^\S\n]+(?:propellants?|fuel|reaction[^\S\n]+mass)(?!\p{L})/iu;
/** The same share said of the propellant first: "with propellant making up only a tenth of the wet mass". */
const PROPELLANT_MAKING_UP_RE =
  /(?<!\p{L})propellants?(?:[^\S\n]+mass)?[^\S\n]+(?:making[^\S\n]+up|makes?[^\S\n]+up|made[^\S\n]+up|is|being|accounts?[^\S\n]+for|accounting[^\S\n]+for|forms?|forming|comprises?)[^\S\n]+(?:(?:only|just|about|roughly|some|nearly|almost)[^\S\n]+)?(?:(a|an|one|two|three|four|five|six|seven|eight|nine)[- ](half|third|quarter|fifth|sixth|seventh|eighth|ninth|tenth)s?)()[^\S\n]+of[^\S\n]+(?:the|its|that)[^\S\n]+(?:(?:wet|total|launch|lift-?off|gross|fuell?ed|fueled|whole)[^\S\n]+)?(?:mass|weight)(?!\p{L})/iu;
/** A rocket's mass ratio, wet over dry: "a mass ratio of 3", "mass ratio (wet/dry) = 4.2". */
const MASS_RATIO_RE = /(?<!\p{L})mass[^\S\n]+ratio(?:[^\S\n]*\((?:wet|m0|full)[^\S\n]*\/[^\S\n]*(?:dry|mf|empty)\))?(?:[^\S\n]+(?:of|is|was|at))?[^\S\n]*[:=]?[^\S\n]*(?:(?:about|around|roughly|some|nearly|just over|just under|~|≈)[^\S\n]*)?(\d+(?:\.\d+)?)(?![\d.,]*[^\S\n]*(?:%|kg|t\b|g\b|lb|\/|÷|:))/iu;
const COUNT_WORD: Record<string, number> = { a: 1, an: 1, one: 1, two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9 };
const PART_WORD: Record<string, number> = { half: 2, third: 3, quarter: 4, fifth: 5, sixth: 6, seventh: 7, eighth: 8, ninth: 9, tenth: 10 };

export const ROCKET_RE = /(?<!\p{L})(?:rockets?|propellant|Isp|specific impulse|thrusters?|burn(?:out)?|stages?|spacecraft|lander|probe|satellite|CubeSat|delta-?v|Δv|manoeuvres?|maneuvers?|launch(?:er)?|orbit\w*|engines? (?:fire|burn))(?!\p{L})/iu;

/** Words that make a sentence's mass the craft's: the craft itself, its propellant, its engine. */
/** Just before a force of the instrument or of a reckoning: a balance's resolution, a calibration, a bound worked out. */
const REFERENCE_FORCE_BEFORE_RE =
  /(?<!\p{L})(?:resol(?:ves?|ution)(?: (?:is|of|was))?|sensitivity(?: (?:is|of|was))?|noise floor(?: (?:is|of|was))?|calibrat\w*(?: \w+){0,3}? (?:with|against|using|to)(?: an?| the)?(?: [\w-]+)?|reference(?: force| weight| mass)?(?: of)?|P ?\/ ?c(?: [\w ]{0,20}?)?(?:=|≈|of|is|would (?:allow|give)|allows|gives|predicts)|photon (?:pressure|rocket)[\w ]{0,30}?(?:predicts|would (?:allow|give)|allows|gives|limit of|bound of)|would give only(?: about)?)[^\S\n]*(?:about |roughly |around |only |just )?$/iu;

/** Words of a force that holds or presses, said just before it (a label or a phrase): no thrust. */
const STATIC_FORCE_BEFORE_RE =
  /(?<!\p{L})(?:clamping|clamp|contact|holding|hold-down|retaining|gripping|grip|pull-?off|breakaway|preload|pre-load|bolt|spring|mounting|compressive|compression|tensile|tension|bearing|axial|radial|normal|pressing|press|closing|seating|crushing|breaking|burst|peel|shear|insertion|extraction)(?:[^\S\n]+force|[^\S\n]+load|[^\S\n]+strength|[^\S\n]+rating)(?:[^\S\n]+\((?:[^)\n]{0,20})\))?[^\S\n]*(?:of|is|was|:|\||=|at|up to|rated at)?[^\S\n.:|]*[.:|=]*[^\S\n]*(?:about|around|up to|max\.?|min\.?|approx\.?)?[^\S\n]*$/iu;

/** Between two figures of one list: "… on the motorway, and under", "…, or about", "… and up to". */
const SAME_SIDE_LIST_RE =
  /^[^.;!?\n]{0,80}?(?:,[^\S\n]*)?(?<!\p{L})(?:and|or|but|while)[^\S\n]+(?:(?:under|over|about|around|nearly|up to|at most|less than|more than|just|only|some|roughly|barely|below|above)[^\S\n]+)*$/iu;
/** Between two figures of one side in two forms: "… electric and", "… of electricity and". */
const FORM_PAIR_GAP_RE =
  /^[^\S\n]*(?:of[^\S\n]+)?(?:electric(?:al|ity)?|heat|thermal|mechanical|shaft|power|light|cooling|hot[^\S\n]+water|steam|useful[^\S\n]+heat)(?:[^\S\n]+(?:power|output|energy))?[^\S\n]*,?[^\S\n]+(?:and|plus)[^\S\n]+(?:(?:about|around|roughly|some|another|a[^\S\n]+further)[^\S\n]+)?$/iu;
/** Between two figures of one flow sent to two places: "… to the radiators and", "… into the grid, and". */
const DESTINATION_LIST_GAP_RE = /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?(?:to|into)[^\S\n]+(?:(?:the|its|your|our|my|their)[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}?[\p{L}-]+,?[^\S\n]+and[^\S\n]+(?:(?:about|around|roughly|some|another)[^\S\n]+)?$/iu;
/** Right after a figure: a rating word of its own ("5.5 kW max", "2,400 W surge", "7 kW peak"). */
const RATING_WORD_AFTER_RE = /^[^\S\n]*(?:max(?:imum)?\.?|peak|surge|continuous|cont\.?|rated|nominal|nom\.?|starting|running|boost|burst)(?!\p{L})/iu;
/** Between two figures, a second subject with no verb of its own: "… and the server room" (the verb said once for both). */
const ELIDED_VERB_RE =
  /^[^.;!?\n\d]{0,40}?(?<!\p{L})and[^\S\n]+(?:the|its|our|their|his|her|a|an)[^\S\n]+(?:(?!(?:gives?|gave|puts?|delivers?|makes?|made|produces?|returns?|yields?|out|outputs?|generates?|draws?|uses?|used|takes?|took|consumes?|needs?|is|was|are|were|at|with|from|into|to|for|of|on|in|only|just|about|around|roughly|some|nearly|over|under|up)(?!\p{L}))(?!\p{L}+(?:ed|ly)[^\S\n])\p{L}[\p{L}-]*(?:[^s\W]|ss)[^\S\n]+){1,3}$/iu;
/** Right after a figure: the condition it holds at ("in town traffic", "at idle", "on a cloudy day", "when cold"). */
const CONDITION_AFTER_RE = /^[^\S\n]*(?:in|on|at|during|when|while|under)[^\S\n]+(?!(?:the[^\S\n]+)?(?:output|input|load|battery|grid|water|house|tank|port)(?!\p{L}))\p{L}/iu;
/** Just before a part's own efficiency: "the alternator by itself converts at", "the inverter's efficiency is". */
const PART_EFFICIENCY_BEFORE_RE =
  /(?<!\p{L})(?:alternators?|inverters?|gearbox(?:es)?|transmissions?|rectifiers?|converters?|controllers?|chargers?|(?:electric |drive )?motors?|pumps?|fans?|bearings?|power electronics)(?:'s?)?(?:[^\S\n]+(?:by itself|alone|on its own|itself))?[^.;!?\n]{0,30}?(?<!\p{L})(?:converts?|converting|runs?|reaches|achieves|manages|has|is|of|efficiency(?:[^\S\n]+(?:is|of|was))?)(?:[^\S\n]+(?:at|about|around|roughly|some|an?))*[^\S\n]*$/iu;
/** Machines that are not a drive: a power said of one is not what drives a thrust beside it. */
const ANOTHER_MACHINE_RE =
  /(?<!\p{L})(?:diesels?|petrol|gasoline|locomotives?|tractors?|cars?|trucks?|lorr(?:y|ies)|boilers?|furnaces?|kettles?|heaters?|ovens?|hair ?dryers?|vacuum cleaners?|lawn ?mowers?|motorbikes?|motorcycles?|outboards?|ship's|ships?|ferr(?:y|ies)|generating sets?|gensets?|wind turbines?|power stations?|power plants?)(?!\p{L})/iu;
/** Words of what feeds a drive: its input, its microwave or light source. */
const DRIVE_INPUT_RE =
  /(?<!\p{L})(?:drives?|thrusters?|cavit(?:y|ies)|cones?|frust(?:um|a)|magnetrons?|microwaves?|RF|lasers?|beams?|inputs?|fed|feeds?|draws?|drawn|drawing|supplied|supply|consum\w*|takes|taking|powered|powering)(?!\p{L})/iu;
/** A metal a text about excess heat names beside a mass (plan/other-checks.ts takes that mass). */
const METAL_MASS_RE = /(?<!\p{L})(?:palladium|nickel|titanium|lithium|metal|powder|hydride|deuteride)(?!\p{L})/iu;
const CRAFT_RE =
  /(?<!\p{L})(?:rockets?|propellants?|Isp|specific impulse|thrusters?|burn(?:out)?|stages?|spacecraft|craft|landers?|probes?|satellites?|CubeSats?|smallsats?|microsat\w*|delta-?v|Δv|manoeuvres?|maneuvers?|launch(?:er)?|orbit\w*|engines?|vehicles?|tugs?|stacks?|ships?|modules?|capsules?|boosters?|orbiters?|missiles?|payloads?|tanks?|fuel\w*|oxidi[sz]ers?|xenon|krypton|hydrazine|kerosene|methane|hydrogen|oxygen|nitrogen|argon|exhaust|wet|dry|m[01f]|masses)(?!\p{L})/iu;

/** A distance covered in a time: "4.2 light years in 30 days", "1 AU in 2 hours". */
const TRAVEL_RE = /(?<![\p{L}\p{N}.,])(\d[\d,]*(?:\.\d+)?|an?|one|two|three|four|five|six|seven|eight|nine|ten|twelve|twenty|a hundred)[^\S\n]*(light[- ]years?|lightyears?|parsecs?|astronomical units?|AU)[^\S\n]+in[^\S\n]+(?:(?:just|only|about|under|less than|roughly)[^\S\n]+)?(\d[\d,]*(?:\.\d+)?|an?|one)[^\S\n]*(seconds?|minutes?|hours?|days?|weeks?|months?|years?)(?!\p{L})/giu;
const TRAVEL_LENGTH: Record<string, number> = { lightyear: 9460730472580800, parsec: 3.085677581491367e16, astronomicalunit: 149597870700, au: 149597870700 };
const WORD_COUNT: Record<string, number> = { a: 1, an: 1, one: 1, two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10, twelve: 12, twenty: 20, 'a hundred': 100 };
const TRAVEL_TIME: Record<string, number> = { second: 1, minute: 60, hour: 3600, day: 86400, week: 604800, month: 2629800, year: 31557600 };

/** The apparatus a device is tested on, whose mass is no craft's. */
const APPARATUS_RE = /(?<!\p{L})(?:test[- ]stands?|stands?|test rigs?|rigs?|benches|bench|balances?|pendulums?|mounts?|mounting|tables?|jigs?|fixtures?|housings?|enclosures?|vacuum chambers?|chambers?|counterweights?|scales?)(?!\p{L})/iu;
/** Before the energy a store holds: "the bank holds 50 kJ", "stores 13.5 kWh", "a capacity of 10 kWh". */
const STORE_HOLDS_RE = /(?<!\p{L})(?:holds?|holding|stores?|stored|storing|contains?|capacity(?:[^\S\n]+of)?|rated(?:[^\S\n]+at)?|packs?|(?:stored|storable|usable|nominal)[^\S\n]+energy(?:[^\S\n]*[:=])?|energy[^\S\n]+stored(?:[^\S\n]*[:=])?)[^\S\n]+(?:(?:about|some|roughly|only|just|a mere|up to)[^\S\n]+)?$/iu;
/** Before what a store holds at the end of a charge: "the cell ends up holding 5 Wh". */
const ENDS_UP_HOLDING_RE = /(?<!\p{L})(?:ends?|ended|ending)[^\S\n]+up[^\S\n]+(?:holding|with|storing|containing|at)[^\S\n]+(?:(?:about|some|roughly|only|just|a mere)[^\S\n]+)?$/iu;
/** Before what a store gave back: "the pack delivered 168 kWh", "the cells then returned 40 Wh", "we got back 9 kWh". */
const STORE_GIVES_RE =
  /(?:(?<!\p{L})(?:cells?|batter(?:y|ies)|packs?|capacitors?|supercaps?|supercapacitors?|accumulators?|flywheels?|store|bank|it|they)[^\S\n]+(?:(?:then|later|afterwards|in turn|on discharge)[^\S\n]+)?(?:delivered|delivers|gave(?:[^\S\n]+back)?|gives(?:[^\S\n]+back)?|returned|returns|released|releases|discharged|supplied|supplies|yielded|put out)|(?:got|get|gets|recovered|recovers)[^\S\n]+back|drew[^\S\n]+back[^\S\n]+out)[^\S\n]+(?:(?:about|some|roughly|only|just|a mere)[^\S\n]+)?$/iu;
/** After a power or energy put into a store: "3 W into a little cell", "12 kWh into the pack" (not "back into"). */
const STORE_INTO_RE =
  /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?into[^\S\n]+(?:(?:a|an|the|its|our|my|their)[^\S\n]+)?(?:[\p{L}\d-]+[^\S\n]+){0,2}?(?:cells?|batter(?:y|ies)|packs?|capacitors?|supercaps?|supercapacitors?|accumulators?|flywheels?)(?!\p{L})/iu;

/** Before the heat a cooling machine moves: "pulls", "removes about", "takes". */
export const COOLING_VERB_BEFORE_RE = /(?<!\p{L})(?:pull(?:s|ed|ing)?|remov(?:es?|ed|ing)|extract(?:s|ed|ing)?|tak(?:es?|ing)|took|draw(?:s|ing)?|drew|pump(?:s|ed|ing)?|mov(?:es?|ed|ing)|lift(?:s|ed|ing)?)(?:[^\S\n]+(?:about|around|up[^\S\n]+to|some|nearly|roughly|a[^\S\n]+good))?[^\S\n]*$/iu;
/** After it: the space it is taken out of ("out of the box", "of heat from the cold room"). */
export const COOLED_SPACE_AFTER_RE =
  /^[^\S\n]*(?:of[^\S\n]+heat[^\S\n]+)?(?:out[^\S\n]+of|from)[^\S\n]+(?:the[^\S\n]+|a[^\S\n]+|its[^\S\n]+|your[^\S\n]+|our[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:box|room|space|cabinet|store|freezer|fridge|cooler|building|house|home|office|food|water|air|loop|hall|interior|compartment|enclosure|container|warehouse|rack|load|cellar|van|truck|trailer|product)(?!\p{L})/iu;

/** A store of energy named in the sentence of its energy. */
const STORE_NOUN_RE = /(?<!\p{L})(?:cells?|batter(?:y|ies)|packs?|accumulators?|power banks?|capacitors?|supercaps?|supercapacitors?)(?!\p{L})/iu;
/** Just before what a load draws: "Lamp draw:", "draws", "consumption of". */
const DRAW_LEAD_RE = /(?<!\p{L})(?:draws?|drawing|consumption|consumes|consuming|uses|using|load|(?:compressors?|motors?|fans?|pumps?|heaters?|lamps?)[^\S\n]+averag(?:ing|ed|es))(?!\p{L})[^\d\n]{0,15}$/iu;
/** Right after what a load draws: "5 W average draw", "2 W continuous consumption". */
const DRAW_AFTER_RE = /^[^\S\n]*(?:(?:average|continuous|steady|mean|constant|typical)[^\S\n]+)?(?:draw|consumption|load)(?!\p{L})/iu;
/** Anything else that could feed the load or fill the store. */
const OTHER_SOURCE_RE =
  /(?<!\p{L})(?:solar|sun|panels?|photovoltaic|PV|charg\w*|recharg\w*|generat\w*|harvest\w*|mains|grid|wind|turbines?|dynamos?|alternators?|cranks?|fuel|engines?|topped up|top up|plugged|self-(?!discharg)\w+|free energy|over-?unity)(?!\p{L})/iu;

/** A source said to be absent ("with no sun at all", "without recharging"): no other source. */
const NEGATED_SOURCE_RE =
  /(?<!\p{L})(?:no|without|never any|not any|never (?:needs?|needed|requires?|required|uses?|used)|(?:never|not)(?:[^\S\n]+(?:once|been|once[^\S\n]+been))?(?=[^\S\n]+(?:re)?charged))[^\S\n]+(?:(?:any|direct|further|other|more|energy|external)[^\S\n]+)?(?:sun(?:light|shine)?|solar|charg\w*|recharg\w*|mains|grid|fuel|panels?|harvest\w*)(?!\p{L})|(?<!\p{L})(?:per|on (?:one|a single|a full|each)|between|each|a) (?:full )?charges?(?!\p{L})|(?<!\p{L})(?:fully|freshly|once|already|previously|pre-?)[^\S\n-]*charged(?!\p{L})/giu;

/**
 * A real supply that may feed a load or fill a store, said as one (not denied: "no panel", "never
 * plugged in"): a solar panel, the mains, a charger, a dynamo, "topped up from", "recharged every night".
 * Narrower than OTHER_SOURCE_RE: the charge a claimed cell "renews from the environment" is no supply.
 */
const FEED_RE =
  /(?<!\p{L})(?:solar[^\S\n]+(?:panels?|cells?|chargers?|arrays?|modules?)|photovoltaic|PV[^\S\n]+(?:panels?|modules?|arrays?)|panels?|mains(?:[^\S\n]+(?:power|electricity|supply|socket|charger))?|(?:the[^\S\n]+)?grid(?![^\S\n]*-)|(?:wind|water)[^\S\n]+turbines?|dynamos?|alternators?|hand[- ]?cranks?|chargers?|charging[^\S\n]+(?:stations?|cables?|docks?|points?)|plugged[^\S\n]+in|topped[^\S\n]+up[^\S\n]+(?:by|from|with|off|at)|(?:re)?charged[^\S\n]+(?:every|each|daily|nightly|overnight|from|by|with|off|at)|(?:re)?charg(?:es|ing)[^\S\n]+(?:it|them|itself)?[^\S\n]*(?:every|each|daily|nightly|overnight|from|off))(?!\p{L})/giu;
const namesAFeed = (para: string): boolean => {
  for (const m of para.matchAll(FEED_RE)) {
    if (!/(?<!\p{L})(?:no|without|never|nobody|not|nor|n't|or)(?!\p{L})[^.;!?\n]{0,25}$/iu.test(para.slice(Math.max(0, m.index - 30), m.index))) return true;
  }
  return false;
};

/** Right after a rating: a supply, an adapter or a charger named ("100 W bench supply", "65 W USB-C adapter"). */
const SUPPLY_RATING_AFTER_RE = /^[^\S\n]*(?:-[^\S\n]*)?(?:(?!(?:from|the|a|an|of|by|via|through|at|to|into|on|its|their|our)(?![\p{L}\d-]))[\p{L}\d-]+[^\S\n]+){0,2}?(?:(?:power|bench|lab|laboratory|DC)[^\S\n]+)?(?:supply|supplies|PSUs?|adapters?|chargers?|power bricks?)(?!\p{L})/iu;

/** Roles the words leave open, read from the other figures (see the file's comment). */
/** Between two values of a flattened table of runs: "; Run 2: ", ", run 3, ", "; hour 24, ", ", and ". */
const RUN_TABLE_GAP_RE = /^[^\S\n]*[;,][^\S\n]*(?:(?:and[^\S\n]+)?(?:[Rr]un|[Dd]ay|[Hh]our|[Tt]est|[Ss]ample|[Pp]oint|[Uu]nit|[Ww]eek|[Mm]onth|[Tt]rial)[^\S\n]*[\w.-]{1,4}[^\S\n]*[:,]?[^\S\n]*|and[^\S\n]+)?$/u;

/** A figure said as a machine's rating: "is rated 250 W", "rated at 3 kW", "a rating of 5 kW", "250 W rated", "1.5 kW continuous". */
function ratedAs(text: string, d: Draft): boolean {
  // (Not where one machine drives another — "the motor turning it is rated at just 2 hp", "Rated at 75 PS,
  // the tractor engine drives an alternator" — the driver's rating is the driven one's input; nor a burner's,
  // a heater's or a supply's rating, which is what it feeds in.)
  if (/(?<!\p{L})(?:driv(?:es|ing|en)|drove|turn(?:s|ing|ed)|spin(?:s|ning)|spun|coupled|belted|geared|alternators?|generators?|dynamos?)(?!\p{L})/iu.test(text)) return false;
  if (/(?<!\p{L})(?:burners?|heaters?|boilers?|furnaces?|elements?|supply|supplies|chargers?|adapters?|adaptors?|mains|grid|compressors?)(?!\p{L})[^.;!?\n]{0,30}$/iu.test(text.slice(Math.max(0, d.start - 40), d.start))) return false;
  return (
    /(?<!\p{L})(?:rated|rating(?:[^\S\n]+(?:of|is|was))?|nameplate(?:[^\S\n]+(?:rating|power|output))?(?:[^\S\n]+(?:of|is|was))?|nominal(?:ly)?)[^\S\n]*(?:(?:at|for|to)[^\S\n]+)?[:=]?[^\S\n]*(?:(?:about|around|roughly|some|only|just|up[^\S\n]+to)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, d.start - 40), d.start)) ||
    RATING_WORD_AFTER_RE.test(text.slice(d.end, d.end + 25))
  );
}

export function rolesByContext(text: string, drafts: Draft[]): void {
  // "covers 4.2 light years in 30 days": a speed, distance over time (IAU 2012 B2 astronomical unit,
  // IAU 2015 B2 parsec, the light-year of the Julian year).
  for (const m of text.matchAll(TRAVEL_RE)) {
    const distance = (WORD_COUNT[m[1].toLowerCase()] ?? Number(m[1].replace(/,/g, ''))) * (TRAVEL_LENGTH[m[2].toLowerCase().replace(/s$/, '').replace(/[- ]/g, '')] ?? NaN);
    const count = /^(?:a|an|one)$/i.test(m[3]) ? 1 : Number(m[3].replace(/,/g, ''));
    const time = count * (TRAVEL_TIME[m[4].toLowerCase().replace(/s$/, '')] ?? NaN);
    if (!(distance > 0) || !(time > 0) || drafts.some((d) => d.kind === 'speed' && d.start >= m.index! && d.start < m.index! + m[0].length)) continue;
    const d: Draft = {
      start: m.index!,
      end: m.index! + m[0].length,
      kind: 'speed',
      quantity: typedSi(distance / time, 'm/s'),
      role: null,
      derived: `speed = distance / time (${m[1]} ${m[2]} in ${m[3]} ${m[4]})`,
    };
    insertInOrder(drafts, d);
  }
  signalSpeeds(text, drafts);
  vehicleRanges(text, drafts);
  const energyLike = (d: Draft) => d.kind === 'power' || d.kind === 'energy';
  // "The linear alternator by itself converts at 90 %": the efficiency of a part, beside the machine's
  // own, is not the machine's.
  const efficiencies = drafts.filter((d) => d.kind === 'efficiency' && d.role === null && !d.derived);
  if (efficiencies.length >= 2) {
    for (const d of efficiencies) if (PART_EFFICIENCY_BEFORE_RE.test(text.slice(Math.max(0, d.start - 70), d.start))) d.role = 'aside';
  }
  // A force of the instrument or of a reckoning, not the device's ("the balance resolves 0.05 mN",
  // "calibrated against a 25 µN reference force", "P/c would allow 33 µN"): set aside, when the text
  // gives another thrust or thrust per power.
  for (const d of drafts) {
    if ((d.kind !== 'thrust' && d.kind !== 'thrust-per-power') || d.role !== null) continue;
    if (!REFERENCE_FORCE_BEFORE_RE.test(text.slice(Math.max(0, d.start - 60), d.start))) continue;
    if (drafts.some((o) => o !== d && (o.kind === 'thrust' || o.kind === 'thrust-per-power') && !REFERENCE_FORCE_BEFORE_RE.test(text.slice(Math.max(0, o.start - 60), o.start)))) d.role = 'aside';
  }
  // A force that pushes nothing anywhere: a clamp's, a spring's, a bolt's, a magnet's pull on its keeper,
  // a load on a bearing ("Hot-side clamping force | 2.2 kN", "a holding force of 400 N"). Set aside.
  for (const d of drafts) {
    if (d.kind !== 'thrust' || d.role !== null) continue;
    if (STATIC_FORCE_BEFORE_RE.test(text.slice(Math.max(0, d.start - 50), d.start))) d.role = 'aside';
  }
  // A thrust and a power: the power drives it.
  if (drafts.some((d) => (d.kind === 'thrust' || d.kind === 'thrust-per-power') && d.role !== 'aside')) {
    // (Not a power said of another machine in a sentence of its own, with no thrust and no word of a
    // drive's input: "the exhibition also includes a ship's diesel rated at 400 hp".)
    for (const d of drafts) {
      if (d.kind !== 'power' || d.role !== null) continue;
      const k = sentenceOf(text, d);
      if (drafts.some((o) => (o.kind === 'thrust' || o.kind === 'thrust-per-power') && sentenceOf(text, o) === k)) continue;
      const sentence = sentenceAround(text, d.start, d.end);
      if (ANOTHER_MACHINE_RE.test(sentence) && !DRIVE_INPUT_RE.test(sentence)) d.role = 'aside';
    }
    for (const d of drafts) if (d.kind === 'power' && d.role === null) d.role = 'in';
    // "emits 8 kW as a collimated beam": what a thruster puts out is what drives it.
    if (!drafts.some((d) => d.kind === 'power' && d.role === 'in')) for (const d of drafts) if (d.kind === 'power' && d.role === 'out') d.role = 'in';
  }
  // "turns 3 kW of shaft power into 2.7 kW of electricity": the first goes in, the second comes out.
  const flowsInto = drafts.filter(energyLike);
  for (let i = 0; i + 1 < flowsInto.length; i++) {
    const [a, b] = [flowsInto[i], flowsInto[i + 1]];
    if (a.kind !== b.kind) continue;
    // "640 MJ of fuel for 60 kWh of electricity": what was burnt, and what it gave.
    if (/^[^\S\n]*of[^\S\n]+(?:fuel|diesel|petrol|gasoline|coal|hydrogen|wood|biomass|propane|kerosene|natural gas|gas)(?!\p{L})[^.;!?\n]{0,25}?(?<!\p{L})for[^\S\n]+(?:(?:a|an|the|about|some|roughly)[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) {
      a.role = 'in';
      b.role = 'out';
      continue;
    }
    // "3–5 W of electricity from roughly 100 W of heat": the first came out of the second.
    // (Not a bias supply's volts times the current it passes: "at 25 V of reverse bias the photodiode passes
    // 0.77 mA from 2 mW of light" — that power goes in from the supply.)
    const biasPower = !!a.derived?.match(/^power = (?:√3 × )?current × voltage/) && /(?<!\p{L})bias(?:ed)?(?!\p{L})/iu.test(text.slice(a.start, a.end));
    if (!biasPower && /^[^\S\n]*(?:of[^\S\n]+[\p{L} -]{0,30}?)?[^\S\n]*from[^\S\n]+(?:(?:a|an|the|about|some|roughly|only|just|up to)[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) {
      a.role = 'out';
      b.role = 'in';
      continue;
    }
    if (!/^[^.;!?\n]{0,50}?(?<!\p{L})into[^\S\n]+(?:(?:a|an|the|about|some|roughly|up to)[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) continue;
    if (!/(?<!\p{L})(?:turns?|turning|turned|converts?|converting|converted|transforms?|transforming|transformed|changes?|changing|changed|makes?)[^\S\n]+(?:(?:the|its|their|a|an|about|some|roughly|up to)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, a.start - 40), a.start))) continue;
    a.role = 'in';
    b.role = 'out';
  }
  // "35 kW of electricity plus 50 kW of useful heat": the second takes the first's side.
  const flows = drafts.filter(energyLike);
  for (let i = 0; i + 1 < flows.length; i++) {
    const [a, b] = [flows[i], flows[i + 1]];
    if (a.role !== null && b.role === null && a.kind === b.kind && /^[^\S\n]*(?:(?:of|as)[^\S\n]+[\p{L} -]{0,30}?[^\S\n]*(?:,[^\S\n]*)?(?:plus|as well as|along with|together with|and also|on top of|and)|(?:,[^\S\n]*)?(?:plus|as well as|along with|together with|and also|on top of))[^\S\n]+$/iu.test(text.slice(a.end, b.start))) {
      b.role = a.role;
    }
  }
  // "the engine develops 25 CV at the shaft and the alternator delivers 22 kW": in a generating set (or a
  // motor–generator pair) the driving machine's output is the generator's input.
  const powersOut = drafts.filter((d) => d.kind === 'power' && d.role === 'out' && !d.derived);
  if (powersOut.length === 2 && drafts.filter((d) => d.kind === 'power' && d.role === 'in').length === 0) {
    const [a, b] = powersOut;
    const driver = /(?<!\p{L})(?:engines?|motors?|turbines?|prime movers?|shaft|crank(?:shaft)?)(?!\p{L})/iu;
    const generator = /(?<!\p{L})(?:alternators?|generators?|dynamos?|electrical output|electric(?:al)? power|electricity)(?!\p{L})/iu;
    // (a's own clause: what follows the last comma, colon, semicolon or "and" before it.)
    const aClause = (text.slice(Math.max(0, a.start - 60), a.start).split(/[,;:]|(?<!\p{L})(?:and|while|whereas)(?!\p{L})/iu).pop() ?? '') + text.slice(a.end, a.end + 25);
    const aDrives = driver.test(aClause) && !generator.test(aClause);
    // (b's own clause: what follows the last "and", comma or semicolon after a.)
    const bClause = text.slice(a.end, b.start).split(/[,;]|(?<!\p{L})(?:and|while|whereas)(?!\p{L})/iu).pop() ?? '';
    const bMakes = generator.test(bClause + text.slice(b.end, b.end + 25)) && !/(?<!\p{L})(?:shaft|crank(?:shaft)?)(?!\p{L})/iu.test(bClause);
    if (aDrives && bMakes && /(?<!\p{L})(?:alternators?|generators?|dynamos?|gensets?|generating sets?)(?!\p{L})/iu.test(text)) a.role = 'in';
  }
  // "Cell: 20 Wh lithium pack / Lamp draw: 0.05 W / ran two weeks": a store of energy drained by a
  // load over a run. What the store holds is the input and what the load draws from it the output, so
  // the ledger asks whether the draw over the run fits in the store. Only with one store, one draw, a
  // run and nothing else of energy; the draw not where the store is being charged or something else may feed the load.
  // ("… from a single 7.2 kWh pack, with 0.48 kWh still left in the pack at the end": what a store still holds
  // after the run is no output of it.)
  for (const d of drafts) {
    if (d.kind === 'energy' && !d.derived && d.role !== 'aside' && /^[^\S\n]*(?:(?:was|were|is|are)[^\S\n]+)?(?:still[^\S\n]+)?(?:left|remaining|remained|left[^\S\n]+over|to[^\S\n]+spare|in[^\S\n]+reserve|unused)(?!\p{L})/iu.test(text.slice(d.end, d.end + 30))) d.role = 'aside';
  }
  /** A store's energy that is not the whole input (something else named may feed its load): no side. */
  const partInput = new Set<Draft>();
  const storesSaid = drafts.filter(
    (d) =>
      d.kind === 'energy' &&
      !d.derived &&
      STORE_NOUN_RE.test(sentenceAround(text, d.start, d.end)) &&
      // ("the cell stores 3 Wh": what a store holds, whatever side its verb gave it.)
      (d.role === null || d.role === 'in' || STORE_HOLDS_RE.test(text.slice(Math.max(0, d.start - 40), d.start))),
  );
  // (Or a load's own power said as what it gives while the store runs it — "our twenty watt-hour cell
  // powered a five watt lamp for two weeks" — where nothing else is named that could feed it: see below.)
  const loadsRun = drafts.filter((d) => d.kind === 'power' && d.role === 'out' && !d.derived);
  const draws = drafts.filter(
    (d) =>
      d.kind === 'power' &&
      d.role === 'in' &&
      !d.derived &&
      // (A sheet's label: "Average load on battery (recording, GPS timing on) ... 55 mW".)
      (DRAW_LEAD_RE.test(text.slice(Math.max(0, d.start - 30), d.start)) ||
        DRAW_LEAD_RE.test(text.slice(Math.max(0, d.start - 90), d.start).replace(/\([^()\n]{0,50}\)|\.{2,}|…+/gu, ' ').replace(/[^\S\n]+/gu, ' ')) ||
        DRAW_AFTER_RE.test(text.slice(d.end, d.end + 30))),
  );
  // (Other energies only where they are what the load got: "delivered about 0.6 MJ to the LED".)
  // (Not the draw over the run, said as an energy beside the word of the store: "over two weeks the station
  // uses a little over 2 kWh, which is less than the battery holds".)
  const runs = drafts.filter((d) => d.kind === 'duration' && d.role !== 'aside').map(siOf).filter((x): x is number => x !== null);
  const asLoad = draws.length === 0 && loadsRun.length >= 1 && loadsRun.every((d) => siOf(d) === siOf(loadsRun[0]));
  if (asLoad) draws.push(loadsRun[0]);
  const drawn = draws.length === 1 ? (siOf(draws[0]) ?? NaN) : NaN;
  const drawOverRun = (d: Draft) => d.kind === 'energy' && runs.some((t) => Math.abs((siOf(d) ?? NaN) - drawn * t) <= 0.05 * drawn * t);
  const stores = storesSaid.filter((d) => !drawOverRun(d) || STORE_HOLDS_RE.test(text.slice(Math.max(0, d.start - 40), d.start)));
  // (In a text of several paragraphs, what is said in the store's and the draw's paragraphs: another
  // station's "100 W solar panel" in a paragraph of its own neither feeds this load nor is its energy.)
  const ownParagraphs = new Set([...stores.slice(0, 1), ...draws.slice(0, 1)].map((d) => paragraphAround(text, d.start, d.end)));
  const ofStore = (d: Draft) => ownParagraphs.has(paragraphAround(text, d.start, d.end));
  // (Nor the power that filled the store beforehand, its product with a stated time the store's energy:
  // "a minute of cranking puts about 6 W in … so a minute of cranking stores roughly 360 J".)
  const storeHolds = stores.length === 1 ? (siOf(stores[0]) ?? NaN) : NaN;
  const chargedStore = (d: Draft) =>
    d.kind === 'power' && d.role === 'in' && d !== draws[0] && runs.some((t) => Math.abs((siOf(d) ?? NaN) * t - storeHolds) <= 0.05 * storeHolds);
  // (Nor the store's or the load's figure said again: "Two weeks, five watts, twenty watt-hours".)
  const sameAs = (d: Draft, o: Draft | undefined) => !!o && d.kind === o.kind && d.role !== (o.role === 'in' ? 'out' : 'in') && Math.abs((siOf(d) ?? NaN) - (siOf(o) ?? NaN)) <= 1e-9 * Math.abs(siOf(o) ?? 0);
  const others = drafts.filter((d) => energyLike(d) && d.role !== 'aside' && d !== stores[0] && d !== draws[0] && ofStore(d) && !chargedStore(d) && !(asLoad && (sameAs(d, stores[0]) || sameAs(d, draws[0]))));
  // (Or the draw over the run said as an energy: "6 W … over two weeks the station uses a little over 2 kWh".)
  if (stores.length === 1 && draws.length === 1 && others.every((d) => d.derived || (d.role === 'out' && d.kind === 'energy') || drawOverRun(d)) && drafts.some((d) => d.kind === 'duration')) {
    for (const d of others) if (drawOverRun(d)) d.role = 'out';
    const sideBefore = stores[0].role;
    stores[0].role = 'in';
    // (Not where the energy is itself what was drawn from a supply, "used 1.1 kWh from a battery bank", or
    // what someone charged it with: then it is the input, whatever else is named.)
    const drawnFrom = /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?from(?!\p{L})/iu.test(text.slice(stores[0].end, stores[0].end + 30));
    if (asLoad && sideBefore === null && !drawnFrom) {
      // (A load that the store alone could not have kept going, where a real supply is named that may have
      // fed it — "topped up by a small solar panel": the store is not the whole input, no ledger. One the
      // store covers keeps it: the input was at least that.)
      if (runs.some((t) => drawn * t > (siOf(stores[0]) ?? Infinity)) && [...ownParagraphs].some(namesAFeed)) {
        stores[0].role = null;
        partInput.add(stores[0]);
      }
    }
    // (Where something else may feed the load, a solar panel named, the draw stays an input: no ledger,
    // rather than one with a store that is not the whole input.)
    else if (![...ownParagraphs].some((para) => OTHER_SOURCE_RE.test(para.replace(NEGATED_SOURCE_RE, ' ')))) draws[0].role = 'out';
  }
  // "The 100 W bench supply powers a 12 V, 2 A load": a supply's rating is what it can give, not a flow of
  // the load it feeds, whose own power the text states (current × voltage).
  const pairs = drafts.filter((d) => d.kind === 'power' && d.derived?.match(/^power = (?:√3 × )?current × voltage/));
  if (pairs.length > 0) {
    for (const d of drafts) {
      if (d.kind === 'power' && !d.derived && d.role !== 'aside' && SUPPLY_RATING_AFTER_RE.test(text.slice(d.end, d.end + 40))) d.role = 'aside';
    }
  }
  // "its first silo holds 8 MWh of heat": what a store holds is its capacity, not what it gives out
  // (the run that drains it, or the charge that fills it, is said apart: see below).
  for (const d of drafts) {
    if (d.kind === 'energy' && !d.derived && d.role === 'out' && STORE_HOLDS_RE.test(text.slice(Math.max(0, d.start - 30), d.start)) && !ENDS_UP_HOLDING_RE.test(text.slice(Math.max(0, d.start - 40), d.start))) d.role = null;
  }
  // A flattened table of runs ("(Run 1: 2.85 kW; Run 2: 3.15 kW; Run 3: 3.00 kW)", "hour 1, 251 W; hour 24,
  // 249 W"): its values, each near one stated figure with a side and near no figure of another side, are
  // that figure's runs.
  {
    const flows = drafts.filter((d) => (d.kind === 'power' || d.kind === 'energy') && !d.derived);
    const inList = (d: Draft): boolean =>
      flows.some((o) => o !== d && o.kind === d.kind && o.role === null && Math.abs(o.start - d.start) < 60 && RUN_TABLE_GAP_RE.test(text.slice(Math.min(o.end, d.end), Math.max(o.start, d.start))));
    const members = flows.filter((d) => d.role === null && inList(d));
    for (const d of members) {
      const v = siOf(d);
      if (v === null || v <= 0) continue;
      const near = flows.filter((o) => o.kind === d.kind && (o.role === 'in' || o.role === 'out') && Math.abs((siOf(o) ?? Infinity) - v) <= 0.25 * v);
      const sides = new Set(near.map((o) => o.role));
      if (sides.size === 1) d.role = near[0].role;
    }
  }
  // "the condensing unit pulls 18,000 BTU/h out of the box on 2.2 kW": the heat a cooling machine takes out
  // of the space it cools is its output (whatever its verb said), and then what it runs on goes in.
  if (COOLING_MACHINE_RE.test(text)) {
    for (const d of drafts) {
      if (d.kind !== 'power' || d.derived || d.role === 'aside') continue;
      if (COOLING_VERB_BEFORE_RE.test(text.slice(Math.max(0, d.start - 30), d.start)) && COOLED_SPACE_AFTER_RE.test(text.slice(d.end, d.end + 60))) d.role = 'out';
    }
  }
  // "put out its full rated 24,000 BTU/h on 2,050 W": what a machine gives out on a power is its input.
  for (const d of drafts) {
    if (d.kind !== 'power' || d.derived || d.role !== null) continue;
    if (!/(?<!\p{L})on[^\S\n]+(?:(?:just|only|about|around|some|barely|a[^\S\n]+mere)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, d.start - 20), d.start))) continue;
    const sentence = sentenceOf(text, d);
    if (drafts.some((o) => o !== d && o.kind === 'power' && o.role === 'out' && o.end <= d.start && sentenceOf(text, o) === sentence)) d.role = 'in';
  }
  // "1.0 kW electric and 6.0 kW of heat to your radiators from 7.5 kW of gas": two forms of one side said
  // in a pair, the second's side named — the first's too.
  for (let i = drafts.length - 2; i >= 0; i--) {
    const d = drafts[i];
    if (!energyLike(d) || d.derived) continue;
    const next = drafts.find((o) => o.start >= d.end && o !== d);
    if (!next || next.kind !== d.kind || next.derived || !FORM_PAIR_GAP_RE.test(text.slice(d.end, next.start))) continue;
    // ("Rated output is 1 kW electric and 6 kW of heat": the first's side, the second's too.)
    if (d.role === null && (next.role === 'in' || next.role === 'out')) d.role = next.role;
    else if (next.role === null && (d.role === 'in' || d.role === 'out')) next.role = d.role;
  }
  // "gives 20 kW to the radiators and 4 kW to hot water": a list of where one flow goes, its verb said once.
  for (let i = 1; i < drafts.length; i++) {
    const d = drafts[i];
    const prev = drafts[i - 1];
    if (!energyLike(d) || d.derived || d.role !== null || prev.kind !== d.kind || prev.derived || (prev.role !== 'in' && prev.role !== 'out')) continue;
    if (DESTINATION_LIST_GAP_RE.test(text.slice(prev.end, d.start)) && /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?(?:to|into)[^\S\n]+\p{L}/iu.test(text.slice(d.end, d.end + 30))) d.role = prev.role;
  }
  // One side named, one figure left: the other side.
  const named = drafts.filter((d) => energyLike(d) && (d.role === 'in' || d.role === 'out'));
  const open = drafts.filter((d) => energyLike(d) && d.role === null && !partInput.has(d));
  // (In a text of several paragraphs, only a side named in the open figure's own paragraph: "the
  // lorry's 300 kWh battery has to be charged" is no other side of "its first silo holds 8 MWh" in a
  // paragraph on another holding.)
  const own = (d: Draft) => paragraphAround(text, d.start, d.end) === paragraphAround(text, open[0].start, open[0].end);
  if (named.length && open.length === 1 && named.some(own)) {
    // ("delivers 380 W on the motorway, and under 100 W in town": the same side at another point — a
    // list going on from the named figure of its own sentence, the new one said with its condition —
    // not the other side.)
    const prev = [...named].reverse().find((d) => d.end <= open[0].start && sentenceOf(text, d) === sentenceOf(text, open[0]));
    // ("gives 5 kW rated, 5.5 kW max": a second rating of the same side, said with its rating word.)
    const rating =
      prev !== undefined &&
      prev.kind === open[0].kind &&
      /^[^\S\n]*(?:[\p{L}.]+[^\S\n]*)?[,;/][^\S\n]*(?:(?:and|or)[^\S\n]+)?$/iu.test(text.slice(prev.end, open[0].start)) &&
      RATING_WORD_AFTER_RE.test(text.slice(open[0].end, open[0].end + 25));
    const goesOn = prev !== undefined && ((SAME_SIDE_LIST_RE.test(text.slice(prev.end, open[0].start)) && CONDITION_AFTER_RE.test(text.slice(open[0].end, open[0].end + 30))) || rating);
    // ("14 W of electricity … Fourteen watts from a segment is believable": the named figure said again.)
    const again = named.find((d) => d.kind === open[0].kind && siOf(d) !== null && Math.abs((siOf(d) as number) - (siOf(open[0]) ?? NaN)) <= 1e-9 * Math.abs(siOf(d) as number));
    // ("delivered 2.4 kWh to a resistive load, a mean of 300 W": the named figure's rate, said beside it.)
    const meanOf = prev !== undefined && /,[^\S\n]*(?:(?:a|an|the)[^\S\n]+)?(?:mean|average|steady|rate|equivalent)[^\S\n]+(?:rate[^\S\n]+|power[^\S\n]+)?(?:of[^\S\n]+)?(?:(?:about|around|roughly|some|nearly)[^\S\n]+)?$/iu.test(text.slice(prev.end, open[0].start)) && text.slice(prev.end, open[0].start).length < 60;
    // ("the office uses 40 MWh a year and the server room 12 kW": the verb said once for both — the same side.)
    // (Only where the first figure's side comes from that verb, not from its own label: "the label says
    // 95,000 BTU/h input and the brochure 25.6 kW of heat" elides "says", which gives no side.)
    const elided =
      prev !== undefined &&
      ELIDED_VERB_RE.test(text.slice(prev.end, open[0].start)) &&
      /(?<!\p{L})(?:uses?|used|using|draws?|drew|drawing|takes?|took|taking|consumes?|consumed|consuming|needs?|needed|gives?|gave|delivers?|delivered|produces?|produced|makes?|made|generates?|generated|puts?[^\S\n]+out)(?:[^\S\n]+(?:about|around|roughly|some|nearly|only|just|up[^\S\n]+to))?[^\S\n]*$/iu.test(text.slice(Math.max(0, prev.start - 30), prev.start));
    // ("average output 550 W … 30 days … 396 kWh total": a named power over a stated time, totalled — its side.)
    const e0 = siOf(open[0]);
    const totalOf =
      open[0].kind === 'energy' && e0 !== null
        ? named.find((p) => p.kind === 'power' && drafts.some((t) => t.kind === 'duration' && t.role !== 'aside' && Math.abs((siOf(p) ?? NaN) * (siOf(t) ?? NaN) - e0) <= 0.01 * e0))
        : undefined;
    if (again) open[0].role = 'aside';
    else if (totalOf) open[0].role = totalOf.role;
    else if (goesOn || meanOf || elided) open[0].role = prev.role;
    else if (named.filter(own).every((d) => d.role === 'in')) open[0].role = 'out';
    // ("The e-bike's motor is rated 250 W, but it can deliver 600 W for short climbs": a machine's rating
    // beside what it gives is no input; a rating of what it draws has its own words, read before.)
    else if (named.filter(own).every((d) => d.role === 'out') && !ratedAs(text, open[0])) open[0].role = 'in';
  }
  // "propellant is 90 % of the vehicle's mass", "90 % propellant by mass": the propellant from a fraction.
  const fraction = PROPELLANT_FRACTION_RE.exec(text);
  // "weighs 25 kg on the pad, and four-fifths of that is propellant": the share in words is no mass.
  const shareOfThat = fraction ? null : (SHARE_OF_THAT_PROPELLANT_RE.exec(text) ?? PROPELLANT_MAKING_UP_RE.exec(text));
  if (shareOfThat) {
    for (let i = drafts.length - 1; i >= 0; i--) {
      const d = drafts[i];
      if (d.start >= shareOfThat.index && d.end <= shareOfThat.index + shareOfThat[0].length && d.kind !== 'efficiency') drafts.splice(i, 1);
    }
  }
  // "puts 3 W into a little cell for 2 hours, and the cell ends up holding 5 Wh": a charging ledger,
  // what went into the store is the input and what it holds at the end the output.
  const held = drafts.find((d) => d.kind === 'energy' && ENDS_UP_HOLDING_RE.test(text.slice(Math.max(0, d.start - 40), d.start)));
  if (held) {
    const into = drafts.filter((d) => energyLike(d) && d.start < held.start && !d.derived && STORE_INTO_RE.test(text.slice(d.end, d.end + 80)));
    if (into.length > 0) {
      held.role = 'out';
      for (const d of into) d.role = 'in';
    }
  }
  // "the charger put 190 kWh into the pack and the pack delivered 168 kWh": a round trip through a
  // store, what went in is the input and what the store gave back the output.
  if (!held) {
    const back = drafts.filter((d) => d.kind === 'energy' && !d.derived && STORE_GIVES_RE.test(text.slice(Math.max(0, d.start - 60), d.start)));
    const into = drafts.filter((d) => energyLike(d) && !d.derived && back.length > 0 && d.start < back[0].start && STORE_INTO_RE.test(text.slice(d.end, d.end + 80)));
    if (back.length === 1 && into.length > 0) {
      back[0].role = 'out';
      for (const d of into) d.role = 'in';
    }
  }
  // "The supercap bank holds 50 kJ … it powered a 2 kW heater for five minutes": what a store holds
  // before it runs a load is what it has to give.
  const stored = drafts.filter((d) => d.kind === 'energy' && !d.derived && d.role !== 'in' && STORE_HOLDS_RE.test(text.slice(Math.max(0, d.start - 30), d.start)));
  if (stored.length === 1 && !held && !drafts.some((d) => energyLike(d) && d.role === 'in')) {
    const later = drafts.filter((d) => energyLike(d) && d !== stored[0] && d.start > stored[0].end && d.role === 'out');
    if (later.length > 0) stored[0].role = 'in';
  }
  const massDrafts = drafts.filter((d) => d.kind === 'mass');
  // "the column holds about 6 tonnes of water", "40 kg of fuel in the car's tank": with nothing of a
  // rocket in the text (no exhaust, Isp, Δv, craft or thruster), a mass of some fluid is no propellant.
  if (!ROCKET_RE.test(text) && !drafts.some((d) => d.kind === 'specific-impulse' || (d.kind === 'speed' && (d.role === 'exhaust' || d.role === 'delta-v')))) {
    for (const m of massDrafts) if (m.role === 'propellant' && !/(?<!\p{L})(?:propellants?|reaction mass)(?!\p{L})/iu.test(text.slice(Math.max(0, m.start - 40), m.end + 40))) m.role = null;
  }
  // "a module for 20-kg class satellites": a class of craft, no mass of this one.
  for (const m of massDrafts) if (/^[^\S\n]*(?:-[^\S\n]*)?class(?!\p{L})/iu.test(text.slice(m.end, m.end + 10))) m.role = 'aside';
  // "The test stand itself weighs 85 kg": a mass of the apparatus, in a sentence that names no craft.
  for (const m of massDrafts) {
    const sentence = sentenceAround(text, m.start, m.end);
    if (m.role === null && APPARATUS_RE.test(sentence) && !CRAFT_RE.test(sentence.replace(APPARATUS_RE, ''))) m.role = 'aside';
  }
  const craftMasses = massDrafts.filter((d) => d.role !== 'aside');
  const whole = craftMasses.length === 1 ? craftMasses[0] : craftMasses.find((d) => d.role === null || d.role === 'wet');
  const shareWhole = shareOfThat ? [...craftMasses].reverse().find((d) => d.end <= shareOfThat.index && shareOfThat.index - d.end < 80) : undefined;
  if (shareOfThat && shareWhole && !craftMasses.some((d) => d !== shareWhole && d.role === 'propellant')) {
    const p = shareOfThat[3] ? Number(shareOfThat[3]) / 100 : COUNT_WORD[shareOfThat[1].toLowerCase()] / PART_WORD[shareOfThat[2].toLowerCase()];
    const m = siOf(shareWhole);
    if (p > 0 && p < 1 && m !== null) {
      shareWhole.role = 'wet';
      drafts.splice(drafts.indexOf(shareWhole) + 1, 0, {
        start: shareWhole.start,
        end: shareOfThat.index + shareOfThat[0].length,
        kind: 'mass',
        quantity: typedSi(p * m, 'kg'),
        role: 'propellant',
        derived: `propellant = ${formatPrint(p * 100)} % of ${formatQuantity(m, 'kg')}`,
      });
    }
  }
  if (fraction && whole && !massDrafts.some((d) => d !== whole && d.role === 'propellant')) {
    const p = Number(fraction[1] ?? fraction[2] ?? fraction[3]) / 100;
    const m = siOf(whole);
    if (p > 0 && p < 1 && m !== null) {
      whole.role = 'wet';
      drafts.splice(drafts.indexOf(whole) + 1, 0, {
        start: Math.min(whole.start, fraction.index),
        end: Math.max(whole.end, fraction.index + fraction[0].length),
        kind: 'mass',
        quantity: typedSi(p * m, 'kg'),
        role: 'propellant',
        derived: `propellant = ${formatPrint(p * 100)} % of ${formatQuantity(m, 'kg')}`,
      });
    }
  }

  // "Dry mass 1,150 kg; we load to a mass ratio of 3": the other mass from the ratio (wet over dry).
  const ratio = MASS_RATIO_RE.exec(text);
  const sided = craftMasses.filter((d) => d.role === 'dry' || d.role === 'wet');
  if (ratio && sided.length === 1 && !craftMasses.some((d) => d.role === 'propellant')) {
    const r = Number(ratio[1]);
    const m = siOf(sided[0]);
    if (r > 1 && m !== null) {
      const other = sided[0].role === 'dry' ? m * r : m / r;
      drafts.splice(drafts.indexOf(sided[0]) + 1, 0, {
        start: Math.min(sided[0].start, ratio.index),
        end: Math.max(sided[0].end, ratio.index + ratio[0].length),
        kind: 'mass',
        quantity: typedSi(other, 'kg'),
        role: sided[0].role === 'dry' ? 'wet' : 'dry',
        derived: sided[0].role === 'dry' ? `wet mass = mass ratio ${formatPrint(r)} × ${formatQuantity(m, 'kg')}` : `dry mass = ${formatQuantity(m, 'kg')} / mass ratio ${formatPrint(r)}`,
      });
    }
  }

  // A rocket: masses and speeds.
  const masses = drafts.filter((d) => d.kind === 'mass');
  const rocket =
    drafts.some((d) => d.kind === 'specific-impulse' || (d.kind === 'speed' && (d.role === 'exhaust' || d.role === 'delta-v')) || (d.kind === 'mass' && d.role === 'propellant')) ||
    // (Words of a craft alone — "thruster", "satellite" — with masses but no speed at all, nor a mass
    // said wet or dry, make no rocket: there is nothing the rocket equation could be run on or asked for.)
    (masses.some((m) => m.role !== 'aside') && ROCKET_RE.test(text) && (drafts.some((d) => d.kind === 'speed' && d.role !== 'aside') || masses.some((m) => m.role === 'wet' || m.role === 'dry')));
  if (!rocket) {
    // No rocket in the text: no check uses a mass ("the outdoor unit weighs 96 kg", "a 2 kg test
    // article", "48 kg empty"), so it is kept aside — except a mass of metal in a text about heat from a
    // loaded metal, which the nuclear-signature check takes.
    for (const m of masses) if ((m.role === null || m.role === 'wet' || m.role === 'dry') && !METAL_MASS_RE.test(sentenceAround(text, m.start, m.end))) m.role = 'aside';
    return;
  }
  // "Payload to SSO: 450 kg", "with the full 450 kg payload": the payload's own mass is no mass of the craft
  // with or without its propellant (left out, the check allows the craft more Δv, never less).
  for (const m of masses) {
    if (m.derived) continue;
    if (/^[^\S\n]*(?:of[^\S\n]+)?payloads?(?!\p{L})/iu.test(text.slice(m.end, m.end + 20)) || /(?:^|[\n•·;]|[-–*][^\S\n])[^\S\n]*(?:max(?:imum)?[^\S\n]+)?payloads?(?:[^\S\n]+(?:mass|capacity))?(?:[^\S\n]+(?:to|into)[^\S\n]+[\p{L}\d-]+)?[^\S\n]*[:=][^\S\n]*(?:(?:about|up[^\S\n]+to|~)[^\S\n]*)?$/iu.test(text.slice(Math.max(0, m.start - 40), m.start))) m.role = 'aside';
  }
  // "burns from 25 t to 9 t", "goes from 100 t down to 33 t": the mass at the start and at the end.
  for (let i = 0; i + 1 < masses.length; i++) {
    const [a, b] = [masses[i], masses[i + 1]];
    if (!/(?<!\p{L})from[^\S\n]+$/iu.test(text.slice(Math.max(0, a.start - 6), a.start))) continue;
    if (!/^[^\S\n]*(?:(?:down[^\S\n]+)?to|→|->)[^\S\n]*$/iu.test(text.slice(a.end, b.start))) continue;
    if ((siOf(a) ?? 0) <= (siOf(b) ?? Infinity)) continue;
    a.role = 'wet';
    b.role = 'dry';
  }
  // A mass in a sentence that speaks of no craft and no propellant ("the test stand weighs 85 kg") is
  // not one of the craft's, when the craft's masses are given elsewhere.
  const craftish = masses.filter((m) => m.role !== null || CRAFT_RE.test(sentenceAround(text, m.start, m.end)));
  if (craftish.length > 0) for (const m of masses) if (!craftish.includes(m)) m.role = 'aside';
  const has = (role: FigureRole) => masses.find((m) => m.role === role);
  const nulls = masses.filter((m) => m.role === null);
  if (has('propellant') && !has('wet') && !has('dry') && nulls.length === 1) nulls[0].role = 'wet';
  else if (!has('wet') && !has('dry') && nulls.length === 2) {
    const [a, b] = [...nulls].sort((x, y) => (siOf(y) ?? 0) - (siOf(x) ?? 0));
    a.role = 'wet';
    b.role = 'dry';
  } else if (has('wet') && !has('dry') && !has('propellant') && nulls.length === 1) nulls[0].role = 'dry';
  else if (has('dry') && !has('wet') && !has('propellant') && nulls.length === 1) nulls[0].role = 'wet';
  const wet = has('wet');
  const dry = has('dry');
  const prop = has('propellant');
  if (wet && prop && !dry) {
    const w = siOf(wet);
    const p = siOf(prop);
    if (w !== null && p !== null && p < w) {
      const last = wet.start > prop.start ? wet : prop;
      drafts.splice(drafts.indexOf(last) + 1, 0, {
        start: Math.min(wet.start, prop.start),
        end: Math.max(wet.end, prop.end),
        kind: 'mass',
        quantity: typedSi(w - p, 'kg'),
        role: 'dry',
        derived: `dry mass = starting mass − propellant (${formatQuantity(w, 'kg')} − ${formatQuantity(p, 'kg')})`,
      });
    }
  } else if (dry && prop && !wet) {
    const d = siOf(dry);
    const p = siOf(prop);
    if (d !== null && p !== null) {
      const last = dry.start > prop.start ? dry : prop;
      drafts.splice(drafts.indexOf(last) + 1, 0, {
        start: Math.min(dry.start, prop.start),
        end: Math.max(dry.end, prop.end),
        kind: 'mass',
        quantity: typedSi(d + p, 'kg'),
        role: 'wet',
        derived: `starting mass = dry mass + propellant (${formatQuantity(d, 'kg')} + ${formatQuantity(p, 'kg')})`,
      });
    }
  }
  for (const d of drafts) if (d.kind === 'speed' && d.role === null && (siOf(d) ?? 0) < 299_792_458) d.role = 'delta-v';
}

/** Words that make a power a signal or a control, not what a device is fed with: "a 1 W input signal", "0.5 W of coil power". */
const CONTROL_BEFORE_RE =
  /(?<!\p{L})(?:signal|seed|coil|gate|trigger|control|pilot|drive signal|driving signal|input signal|preamp(?:lifier)?|seed laser)(?:[^\S\n]+(?:power|level|drive|input))?[^\S\n]*(?:of|at|is|was|:|=)?[^\S\n]*(?:(?:only|just|about|some|a mere)[^\S\n]+)?$/iu;
const CONTROL_AFTER_RE =
  /^[^\S\n]*(?:of[^\S\n]+)?(?:(?:input|drive|driving|control|coil|gate|trigger|pilot|audio|RF|radio|optical)[^\S\n]+)?(?:signal|seed(?:[^\S\n]+(?:laser|beam|light|pulse))?|coil(?:[^\S\n]+power)?|gate[^\S\n]+drive|trigger|control(?:[^\S\n]+(?:power|signal|input|current))?)(?!\p{L})|^[^\S\n]*(?:signal|seed)[^\S\n]+from(?!\p{L})/iu;
/** A device that switches or amplifies a supply it draws from apart from its signal. */
const CONTROLLED_DEVICE_RE =
  /(?<!\p{L})(?:amplifiers?|amps?|power stages?|output stages?|relays?|contactors?|transistors?|MOSFETs?|IGBTs?|thyristors?|triacs?|solenoid valves?|servo[- ]?valves?|switch(?:es|ed|ing)?|dimmers?|valves?|gain)(?!\p{L})/iu;
/** Just before a speed that is c itself, quoted: "the speed of light (2.998 × 10^8 m/s)", "where c = 3.00e8 m/s", "light, which travels at". */
const LIGHT_SPEED_QUOTED_BEFORE_RE =
  /(?:(?<!\p{L})(?:speed|velocity)[^\S\n]+of[^\S\n]+light(?:[^\S\n]+in[^\S\n]+(?:a[^\S\n]+)?vacuum)?|(?:where|with|using|taking)[^\S\n]+c(?:_0|₀)?|(?<!\p{L})light[^\S\n]+(?:itself[^\S\n]+)?(?:travels|moves|goes|covers|crosses|runs)(?:[^\S\n]+at)?)[^\S\n]*(?:[(,:=≈~]|is|of|at|being)?[^\S\n]*(?:(?:about|roughly|approximately|some|nearly|ca\.?)[^\S\n]*)?$/iu;

/**
 * "just under the speed of light (2.998 × 10^8 m/s)": the speed of light quoted with its value is the
 * constant, not a speed of the device — set aside (within 0.5 % of c, so a claim said beside it is not
 * taken for it).
 */
export function asideQuotedLightSpeed(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if (d.kind !== 'speed' || d.derived || d.role === 'aside') continue;
    const v = siOf(d);
    if (v === null || Math.abs(v / 299_792_458 - 1) > 0.005) continue;
    if (LIGHT_SPEED_QUOTED_BEFORE_RE.test(text.slice(Math.max(0, d.start - 40), d.start))) d.role = 'aside';
  }
}

/** Just before a speed of the wind: "Wind was light, 8–12 km/h", "wind speeds of about 6 m/s", "a headwind of 20 km/h". */
const WIND_BEFORE_RE =
  /(?<!\p{L})(?:winds?|wind[^\S\n]+speeds?|breezes?|gusts?|head-?winds?|tail-?winds?|cross-?winds?)(?:[^\S\n]+(?:was|were|is|are|of|at|averag(?:ed|ing)|light|strong|gusty|steady|moderate|fresh|blowing|blew|up[^\S\n]+to|gusting(?:[^\S\n]+to)?))*[^\S\n]*[,:]?[^\S\n]*(?:(?:about|around|roughly|some|only|just)[^\S\n]+)?$/iu;
/** Just after one: "in 20 km/h winds", "a 6 m/s breeze", "15 knots of wind". */
const WIND_AFTER_RE = /^[^\S\n]*(?:winds?|wind[^\S\n]+speeds?|breezes?|gusts?|head-?winds?|tail-?winds?|cross-?winds?|of[^\S\n]+wind)(?!\p{L})/iu;

/** Between a speed and its gloss as a multiple of c: " – nearly", ", about", " (roughly", ", which is over". */
const GLOSS_GAP_RE = /^[^\S\n]*(?:[–—-]|,|\(|;)?[^\S\n]*(?:(?:which[^\S\n]+is|that[^\S\n]+is|i\.e\.|or)[^\S\n]+)?(?:(?:nearly|almost|about|around|roughly|some|over|more[^\S\n]+than|just[^\S\n]+(?:under|over)|close[^\S\n]+to)[^\S\n]+)?$/iu;

/**
 * "1.2 billion mph – nearly twice the speed of light": a speed and its gloss as a multiple of c said right
 * after it are one claim; the stated number is the figure, the rounded gloss set aside.
 */
export function asideSpeedGlosses(text: string, drafts: Draft[]): void {
  for (let i = 1; i < drafts.length; i++) {
    const [a, b] = [drafts[i - 1], drafts[i]];
    if (a.kind !== 'speed' || b.kind !== 'speed' || a.role === 'aside' || b.role === 'aside' || a.derived) continue;
    if (!/(?:speed|velocity)[^\S\n]+of[^\S\n]+light|(?<![\p{L}\d])c(?![\p{L}\d])/iu.test(text.slice(b.start, b.end))) continue;
    if (!/^(?:\d|an?[^\S\n]|one|two|three|four|five|six|seven|eight|nine|ten|twice|double|triple|half)/iu.test(text.slice(b.start, b.end))) continue;
    if (!GLOSS_GAP_RE.test(text.slice(a.end, b.start))) continue;
    const [va, vb] = [siOf(a), siOf(b)];
    // (Only where the gloss is near the number: within a half either way.)
    if (va === null || vb === null || !(va > 0) || vb / va > 1.5 || va / vb > 1.5) continue;
    b.role = 'aside';
  }
}

/** The wind's speed is no speed of the craft or of anything it throws out: set aside. */
export function asideWindSpeeds(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if (d.kind !== 'speed' || d.derived || d.role === 'aside') continue;
    if (WIND_BEFORE_RE.test(text.slice(Math.max(0, d.start - 40), d.start)) || WIND_AFTER_RE.test(text.slice(d.end, d.end + 20))) d.role = 'aside';
  }
}

/** Just before a figure said not to be given: "does not give", "never delivered", "no longer claims". */
const DENIED_BEFORE_RE =
  /(?<!\p{L})(?:(?:does|did|do|will|would|can|could)[^\S\n]+not|doesn['’]t|didn['’]t|don['’]t|won['’]t|can['’]t|cannot|never|no[^\S\n]+longer)[^\S\n]+(?:(?:really|actually|in[^\S\n]+fact|ever)[^\S\n]+)?(?:gives?|gave|make|makes|made|produces?|produced|delivers?|delivered|put[^\S\n]+out|puts[^\S\n]+out|generates?|generated|returns?|returned|output|reach(?:es|ed)?|achieves?|achieved|claims?|claimed)[^\S\n]+(?:(?:anything[^\S\n]+like|anywhere[^\S\n]+near|about|some|the)[^\S\n]+)?$/iu;

/**
 * "Contrary to the rumour, the motor does not give 1.5 kW from 1 kW; it gives 0.9 kW": an output said not
 * to be given is no output of the device — set aside (the text may go on to give the real one).
 */
export function asideDenied(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if ((d.kind !== 'power' && d.kind !== 'energy') || d.derived || d.role !== 'out') continue;
    if (!DENIED_BEFORE_RE.test(text.slice(Math.max(0, d.start - 50), d.start))) continue;
    d.role = 'aside';
  }
}

/** An amplifier of a signal named by its kind ("audio amplifier", "erbium-doped fibre amplifier", "op-amp"). */
const AMPLIFIER_RE =
  /(?<!\p{L})(?:(?:audio|RF|radio|microwave|optical|fib(?:re|er)|laser|signal|guitar|bass|instrument(?:ation)?|operational|headphone|hi-?fi|stereo|valve|tube|transistor|class[- ]?[A-DH]|erbium(?:-doped)?|Raman|semiconductor|lock-in|charge|low-noise|doped)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?amplifiers?|op-?amps?|preamps?|preamplifiers?|repeaters?)(?!\p{L})/iu;
/** A claim that nothing else feeds it: then the signal is the only input the claim admits. */
const NOTHING_ELSE_RE =
  /(?<!\p{L})(?:no (?:other |external |separate )?(?:supply|power supply|source|input|mains|battery|batteries)|without (?:any |a )?(?:other |external |separate )?(?:supply|power supply|source|mains|battery)|self-?(?:powered|running|sustaining|looped)|free energy|over-?unity|COP|perpetual|nothing else)(?!\p{L})/iu;

/**
 * "The amplifier boosts a 1 W input signal to 100 W", "a 1 W seed laser", "switches 3 kW with only
 * 0.5 W of coil power": an amplifier, a relay or a switch hands on power from a supply of its own, which
 * the signal that controls it is not. Its signal's power is set aside (no input, so no ledger), unless
 * the text says nothing else feeds it, or gives the supply's draw too (then the signal is counted in
 * beside it).
 */
/** Before a flow a passive part passes on: "the heat pipe carries", "can transfer", "conducts about". */
const PASSES_ON_BEFORE_RE = /(?<!\p{L})(?:carr(?:y|ies|ied|ying)|transfers?|transferr(?:ed|ing)|transports?|transported|transporting|conducts?|conducted|conducting|shifts?|shifted|shifting)(?:[^\S\n]+(?:up[^\S\n]+to|about|around|roughly|some|over|nearly|almost))?[^\S\n]*$/iu;
/** After it: where it is passed from and to ("from the CPU to the fins", "from the collector into the tank"). */
const FROM_TO_AFTER_RE = /^[^\S\n]*(?:of[^\S\n]+(?:heat|power|energy)[^\S\n]+)?from[^\S\n]+[^.;!?\n]{1,50}?[^\S\n](?:to|into|onto)[^\S\n]/iu;

/**
 * "The heat pipe carries 200 W from the CPU to the fins", "the loop transfers 4 kW from the collector into
 * the tank": a flow a passive part passes on from one place to another is neither made by it nor its
 * input — set aside, so "with no power input" beside it makes no claim of output from nothing. So is the
 * heat a heat-recovery ventilator or a recuperator hands back ("returns 3 kW of heat using 40 W of fans").
 */
export function asidePassedOn(text: string, drafts: Draft[]): void {
  const recovery = HEAT_RECOVERY_RE.test(text);
  for (const d of drafts) {
    if (d.kind !== 'power' || d.derived || d.role === 'in') continue;
    if (PASSES_ON_BEFORE_RE.test(text.slice(Math.max(0, d.start - 30), d.start)) && FROM_TO_AFTER_RE.test(text.slice(d.end, d.end + 80))) d.role = 'aside';
    // (Not electricity or work the recovered heat is turned into: "the ORC module returns 14 kW of electricity".)
    // ("That is about 11 kW of heat recovered from the exhaust air", "160 W of heat coming back".)
    else if (recovery && /^[^\S\n]*(?:of[^\S\n]+)?(?:heat|warmth|thermal[^\S\n]+(?:power|energy))[^\S\n]+(?:recovered|reclaimed|recaptured|returned|handed[^\S\n]+back|given[^\S\n]+back|coming[^\S\n]+back|comes?[^\S\n]+back|came[^\S\n]+back|brought[^\S\n]+back)(?!\p{L})/iu.test(text.slice(d.end, d.end + 50))) d.role = 'aside';
    else if (recovery && RECOVERED_BEFORE_RE.test(text.slice(Math.max(0, d.start - 60), d.start).replace(/^[^]*[.!?;\n][^\S\n]/u, '')) && !/^[^\S\n]*(?:e(?![\p{L}])|(?:of[^\S\n]+)?(?:electric\w*|shaft|mechanical|work|net[^\S\n]+electric\w*))/iu.test(text.slice(d.end, d.end + 30))) d.role = 'aside';
  }
}

/** A heat exchanger that hands back heat that would have left: a heat-recovery ventilator, a recuperator. */
const HEAT_RECOVERY_RE =
  /(?<!\p{L})(?:heat[- ]recovery|heat-?recovery[^\S\n]+(?:wheels?|fans?|units?)|energy[- ]recovery[^\S\n]+ventilat\w*|HRVs?|ERVs?|MVHR|recuperators?|regenerators?|heat[^\S\n]+exchangers?|heat[^\S\n]+wheels?|economi[sz]ers?)(?!\p{L})/iu;
/** Before the heat it hands back, in its clause: "returns", "recovers … about 2 kW", "reclaims". */
const RECOVERED_BEFORE_RE =
  /(?<!\p{L})(?:returns?|returned|returning|recovers?|recovered|recovering|reclaims?|reclaimed|recaptures?|recaptured|brings?[^\S\n]+back|hands?[^\S\n]+back|gives?[^\S\n]+back)(?!\p{L})(?:(?!(?<!\p{L})(?:and|generat|produc|electric|makes?|making|deliver|drives?|turns?))[^.;!?\n]){0,45}$/iu;

export function asideControlPowers(text: string, drafts: Draft[]): void {
  if (!CONTROLLED_DEVICE_RE.test(text) || NOTHING_ELSE_RE.test(text)) return;
  // (An amplifier said with its gain — "gain is 30 dB: 1 mW in, 1 W out" — has a signal for its input.)
  const amplifier = AMPLIFIER_RE.test(text) || (/(?<!\p{L})amplifiers?(?!\p{L})/iu.test(text) && /(?<!\p{L})(?:gain|dB)(?!\p{L})/u.test(text));
  // (Not what it draws from its supply: "draws 180 W from the mains".)
  const drawn = (d: Draft) =>
    /(?<!\p{L})(?:draws?|drawing|drew|consum\w*|uses|using|takes|taking|pulls?)(?:[^\S\n]+(?:about|around|up[^\S\n]+to|some|roughly|nearly))?[^\S\n]*$/iu.test(text.slice(Math.max(0, d.start - 25), d.start)) ||
    // ("Mains draw at full power: 420 W", "Power consumption (max): 95 W": a label of what it takes from its supply.)
    /(?<!\p{L})(?:mains|supply|wall|power|AC|electrical)[^\S\n]+(?:draw|consumption|input)(?!\p{L})[^:\n]{0,25}:[^\S\n]*(?:(?:about|approx\.?|~)[^\S\n]*)?$/iu.test(text.slice(Math.max(0, d.start - 50), d.start)) ||
    /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?from[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+|a[^\S\n]+)?(?:mains|supply|wall|socket|grid|batter(?:y|ies)|power[^\S\n]+supply|PSU)(?!\p{L})/iu.test(text.slice(d.end, d.end + 40));
  const control = (d: Draft) =>
    d.kind === 'power' && d.role === 'in' && !d.derived && ((amplifier && !drawn(d)) || CONTROL_BEFORE_RE.test(text.slice(Math.max(0, d.start - 30), d.start)) || CONTROL_AFTER_RE.test(text.slice(d.end, d.end + 40)));
  const signals = drafts.filter(control);
  // (Where the supply's own draw is given too, the signal is part of what goes in, beside it.)
  if (drafts.some((d) => (d.kind === 'power' || d.kind === 'energy') && d.role === 'in' && !signals.includes(d))) return;
  for (const d of signals) d.role = 'aside';
  // ("gives out 100 times the input power": an amplifier's gain, of a signal, is no ratio of energy out to in.)
  if (amplifier) for (const d of drafts) if (d.kind === 'efficiency' && d.derived && (siOf(d) ?? 0) > 1) d.role = 'aside';
}

/** A store's size said as such: "Battery is 58 kWh", "pack capacity: 75 kWh", "a 58 kWh battery". */
const CAPACITY_BEFORE_RE = /(?<!\p{L})(?:batter(?:y|ies)|packs?|banks?)(?:['’]s)?[^\S\n]+(?:is|was|capacity(?:[^\S\n]+(?:is|of))?|size(?:[^\S\n]+(?:is|of))?|rated[^\S\n]+at)[^\S\n]*:?[^\S\n]*(?:(?:about|around|roughly|only|just|a|an)[^\S\n]+)?$/iu;
const CAPACITY_AFTER_RE = /^[^\S\n]*(?:usable[^\S\n]+|nominal[^\S\n]+)?(?:(?:lithium(?:-ion)?|li-ion|LiFePO4|LFP|NMC|lead-acid|AGM|traction|gel|home|house|storage)[^\S\n]+)?(?:batter(?:y|ies)|packs?|capacity)(?!\p{L})/iu;

/**
 * "car says 18.4 kWh used from the battery … Battery is 58 kWh, was at 80 %": where the text gives what was
 * drawn from a store, the store's size is no input of the run (set aside).
 */
export function asideStoreSize(text: string, drafts: Draft[]): void {
  const size = (d: Draft) => CAPACITY_BEFORE_RE.test(text.slice(Math.max(0, d.start - 40), d.start)) || CAPACITY_AFTER_RE.test(text.slice(d.end, d.end + 30));
  // "The 40 kWh traction pack ran the laser array for 20-minute shots", "the 1.2 kWh Li-ion pack is sized for
  // one firing": a store's size read as what it gave is no output of the run either, where the text gives
  // other powers or energies of the device.
  const given = drafts.filter((d) => d.kind === 'energy' && d.role === 'out' && !d.derived && CAPACITY_AFTER_RE.test(text.slice(d.end, d.end + 30)));
  if (given.length && drafts.some((d) => (d.kind === 'power' || d.kind === 'energy') && (d.role === 'in' || d.role === 'out') && !given.includes(d))) for (const d of given) d.role = 'aside';
  const sizes = drafts.filter((d) => d.kind === 'energy' && d.role === 'in' && !d.derived && size(d));
  // ("16 × 430 W panels, one 13.5 kWh battery … annual yield 5,900 kWh": a store beside the source that
  // fills it, where nothing says the store ran alone, is no input of what the source yields.)
  // (The source named in the store's own sentence: "a 200 W panel would refill it", said later, is none.)
  const filled = (d: Draft) => SOURCE_NAMED_RE.test(sentenceAround(text, d.start, d.end)) && !NOTHING_CHARGED_RE.test(text);
  if (sizes.length === 0) return;
  if (!drafts.some((d) => d.kind === 'energy' && d.role === 'in' && !d.derived && !sizes.includes(d))) {
    for (const d of sizes) if (filled(d)) d.role = 'aside';
    return;
  }
  for (const d of sizes) d.role = 'aside';
}
/** A source that fills a store: solar panels, a PV array, a wind turbine, a generator. */
const SOURCE_NAMED_RE = /(?<!\p{L})(?:(?:solar|PV)[^\S\n]+(?:panels?|modules?|arrays?)|\d[^\S\n]*(?:W|Wp)[^\S\n]+panels?|kWp|photovoltaic|wind[^\S\n]+turbines?|gensets?)(?!\p{L})/iu;

/** Before a power or an energy a source gives: "its solar panels give", "the turbine makes about". */
const SOURCE_GIVES_BEFORE_RE =
  /(?<!\p{L})(?:(?:solar[^\S\n]+)?(?:panels?|arrays?|PV|modules?|cells?)|turbines?|generators?|alternators?|dynamos?|RTGs?|gensets?)[^\S\n]+(?:give|gives|gave|make|makes|made|produce|produces|produced|deliver|delivers|delivered|generate|generates|generated|provide|provides|provided|supply|supplies|supplied|put[^\S\n]+out|puts[^\S\n]+out)(?:[^\S\n]+(?:about|around|roughly|some|up[^\S\n]+to|nearly|only|just))?[^\S\n]*$/iu;
/** A generator named. */
const GENERATOR_TEXT_RE = /(?<!\p{L})(?:generators?|gensets?|generating[^\S\n]+sets?)(?!\p{L})/iu;
/** Before what the loads use: "the heaters and radio use about", "the house draws". */
const LOADS_USE_BEFORE_RE =
  /(?<!\p{L})(?:heaters?|radios?|lights?|lighting|lamps?|appliances?|loads?|fridges?|freezers?|instruments?|electronics|avionics|payloads?|house|household|home|building|computers?|routers?|TVs?|pumps?)(?:[^\S\n]+(?:and|&)[^\S\n]+(?:the[^\S\n]+)?[\p{L}-]+)?[^\S\n]+(?:use|uses|used|consume|consumes|consumed|need|needs|needed|draw|draws|drew|take|takes|took)(?:[^\S\n]+(?:about|around|roughly|some|up[^\S\n]+to|nearly|only|just))?[^\S\n]*$/iu;

/**
 * "Its solar panels give 380 W near the Sun; the heaters and radio use about 9 kWh a day": a budget of
 * supply and demand, where what the loads use is drawn from what the source gives — not the input of the
 * machine whose output is the source's. The loads' use is set aside.
 */
export function asideLoadsOfSource(text: string, drafts: Draft[]): void {
  const before = (d: Draft, re: RegExp) => re.test(text.slice(Math.max(0, d.start - 60), d.start).replace(/^[^]*[.!?;\n][^\S\n]/u, ''));
  // (Or a generator's own rating, "your generator is 3,500 W running / 4,000 W starting", beside what its loads need.)
  const rated = (d: Draft) => GENERATOR_TEXT_RE.test(text) && RATING_WORD_AFTER_RE.test(text.slice(d.end, d.end + 25));
  if (!drafts.some((d) => (d.kind === 'power' || d.kind === 'energy') && d.role === 'out' && (before(d, SOURCE_GIVES_BEFORE_RE) || rated(d)))) return;
  for (const d of drafts) if ((d.kind === 'power' || d.kind === 'energy') && d.role === 'in' && !d.derived && before(d, LOADS_USE_BEFORE_RE)) d.role = 'aside';
}


/**
 * The text says nothing charged the store while it ran its load: "without plugging in", "with the panels
 * disconnected … and no generator", "never charge again".
 */
const NOTHING_CHARGED_RE =
  /(?<!\p{L})(?:(?:without|with[^\S\n]+no|no)[^\S\n]+(?:(?:any|a)[^\S\n]+)?(?:plugging[^\S\n]+(?:it[^\S\n]+)?in|charging|re-?charging|charger|recharge|generator|mains|grid[^\S\n]+connection|ever[^\S\n]+(?:going[^\S\n]+back[^\S\n]+on|touching)[^\S\n]+the[^\S\n]+(?:mains|grid))|(?:panels?|PV|array|charger|generator|mains|grid)[^\S\n]+(?:(?:were|was|being|stayed|kept|left)[^\S\n]+)?(?:disconnected|unplugged|switched[^\S\n]+off|turned[^\S\n]+off|covered)|never[^\S\n]+(?:needs?[^\S\n]+(?:to[^\S\n]+be[^\S\n]+)?)?(?:charg\w*|plug\w*[^\S\n]+in)(?:[^\S\n]+again)?|no[^\S\n]+(?:useful[^\S\n]+)?(?:sun|sunshine|sunlight|wind)(?:[^\S\n]+at[^\S\n]+all)?|in[^\S\n]+the[^\S\n]+dark)(?!\p{L})/iu;
/** An energy worked out from a store's charge and voltage ("12 V 100 Ah"). */
const STORE_CHARGE_DERIVED_RE = /^energy = charge × voltage/u;

/**
 * "The pack is only 5 kWh, but over 72 hours it ran the base load … with the panels disconnected and no
 * generator": where the text says nothing charged the store while it gave out an energy, the store's size
 * is all that went in.
 */
export function storeAloneIsInput(text: string, drafts: Draft[]): void {
  if (!NOTHING_CHARGED_RE.test(text)) return;
  if (drafts.some((d) => (d.kind === 'power' || d.kind === 'energy') && d.role === 'in')) return;
  if (!drafts.some((d) => (d.kind === 'energy' || d.kind === 'power') && d.role === 'out')) return;
  const isSize = (d: Draft) =>
    d.kind === 'energy' &&
    (d.role === null || d.role === 'aside') &&
    (d.derived ? STORE_CHARGE_DERIVED_RE.test(d.derived) : CAPACITY_BEFORE_RE.test(text.slice(Math.max(0, d.start - 40), d.start)) || CAPACITY_AFTER_RE.test(text.slice(d.end, d.end + 30)));
  const sizes = drafts.filter(isSize);
  if (sizes.length !== 1) return;
  sizes[0].role = 'in';
  sizes[0].assumption = 'The text says nothing charged the store while it ran: its stored energy is read as all that went in.';
}

/** The least work the law allows, named: "the Carnot minimum work", "the ideal (reversible) input". */
const IDEAL_WORK_RE =
  /(?<!\p{L})(?:(?:Carnot|ideal|reversible|theoretical|thermodynamic)(?:[- ](?:minimum|least|lowest))?|(?:minimum|least|lowest)[^\S\n]+(?:possible[^\S\n]+)?(?:Carnot|ideal|reversible|theoretical|thermodynamic))[- ](?:work|power|input|electricity|electrical[^\S\n]+input)(?!\p{L})/iu;
/** Words of the device's own figures in the same sentence: then the sentence is no bound alone. */
const OWN_FIGURE_WORDS_RE = /(?<!\p{L})(?:claim\w*|measured|we|our|it[^\S\n]+(?:draws?|takes?|uses?|needs?)|the[^\S\n]+(?:unit|device|machine|prototype)[^\S\n]+(?:draws?|takes?|uses?|needs?))(?!\p{L})/iu;

/**
 * "The Carnot minimum work for 1 W at 4.2 K is roughly 70 W": a sentence that works out the least work the
 * law allows is the writer's bound, not the device's figures — its powers set aside, so the checks work the
 * bound out themselves and never take the bound's work for what the device takes.
 */
export function asideIdealWork(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if (!(d.kind === 'power' || d.kind === 'energy') || d.derived) continue;
    const sentence = sentenceAround(text, d.start, d.end);
    if (IDEAL_WORK_RE.test(sentence) && !OWN_FIGURE_WORDS_RE.test(sentence)) d.role = 'aside';
  }
}

/** After a rating, a version to come: "A 5 kW home version is planned for 2027", "a 50 kW model is due next year". */
const FUTURE_VERSION_AFTER_RE =
  /^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:versions?|models?|units?|editions?|variants?|systems?|products?|prototypes?)(?!\p{L})[^\S\n]+(?:is|are|will[^\S\n]+be|would[^\S\n]+be)[^\S\n]+(?:(?:now|also|already)[^\S\n]+)?(?:planned|due|expected|scheduled|promised|coming|in[^\S\n]+(?:development|the[^\S\n]+works|design)|under[^\S\n]+development|to[^\S\n]+follow)(?!\p{L})/iu;
/** Before a rating, a version to come: "a planned 5 kW model", "the upcoming 20 kW version", "next year's 10 kW unit". */
/** Before an accessory's rating: "optional 0.6 kW heater", "an add-on 2 kW booster". */
const ACCESSORY_BEFORE_RE = /(?<!\p{L})(?:optional|add-on|extra-cost|available)[^\S\n]+$/iu;
const FUTURE_VERSION_BEFORE_RE =
  /(?<!\p{L})(?:planned|upcoming|forthcoming|future|proposed|next[^\S\n]+year(?:['’]s)?|next-generation|next[^\S\n]+generation|later)[^\S\n]+(?:(?:home|commercial|industrial|larger|bigger|scaled-up|full-size|production)[^\S\n]+)?$/iu;

/** Right after a rating: a version of the product ("5 kW model", "20 kW home version"), not an operating point. */
const VERSION_NOUN_AFTER_RE = /^[^\S\n]*(?:-[^\S\n]*)?(?:[\p{L}-]+[^\S\n]+)?(?:versions?|models?|editions?|variants?|products?)(?!\p{L})/iu;

/**
 * "A 5 kW home version is planned for 2027", "a planned 50 kW model": the rating of a version to come is
 * no figure of the run the claim reports — set aside.
 */
export function asideFutureVersions(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if (!(d.kind === 'power' || d.kind === 'energy' || d.kind === 'thrust') || d.derived) continue;
    if (ACCESSORY_BEFORE_RE.test(text.slice(Math.max(0, d.start - 20), d.start)) || FUTURE_VERSION_AFTER_RE.test(text.slice(d.end, d.end + 80)) || (FUTURE_VERSION_BEFORE_RE.test(text.slice(Math.max(0, d.start - 40), d.start)) && VERSION_NOUN_AFTER_RE.test(text.slice(d.end, d.end + 40)))) d.role = 'aside';
  }
}

/** Before a lamp set beside the claim's: "the light of a", "as bright as an old", "replaces a", "equivalent to a". */
const COMPARED_LAMP_BEFORE_RE =
  /(?<!\p{L})(?:(?:the[^\S\n]+)?(?:light|brightness|glow|output|lumens)[^\S\n]+of|as[^\S\n]+bright[^\S\n]+as|brighter[^\S\n]+than|replac(?:es|ed|ing)|instead[^\S\n]+of|equivalent[^\S\n]+(?:to|of)|like|matches|matching|rivals?)[^\S\n]+(?:(?:a|an|the|one|two|three|four|old|ordinary|standard|classic|traditional|incandescent|halogen)[^\S\n]+){1,3}$/iu;
const LAMP_AFTER_RE = /^[^\S\n]*(?:-[^\S\n]*)?(?:(?:incandescent|halogen|filament|tungsten|mains|old|household|frosted|clear)[^\S\n]+){0,2}(?:bulbs?|lamps?|light[^\S\n]?bulbs?|globes?)(?!\p{L})/iu;

/**
 * "Twice the light of a 60 W bulb from an 18 W LED lamp": a lamp set beside the claim's is another lamp, its
 * rating no figure of the claim's device — set aside.
 */
export function asideComparedLamps(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if (d.kind !== 'power' || d.derived || d.role === 'aside') continue;
    if (LAMP_AFTER_RE.test(text.slice(d.end, d.end + 40)) && COMPARED_LAMP_BEFORE_RE.test(text.slice(Math.max(0, d.start - 50), d.start))) d.role = 'aside';
  }
}

/**
 * "Battery: 77 kWh usable (82 kWh gross)", "12 kWh nominal (10.8 kWh usable)": the same store's size on another
 * basis, in brackets right after it — no second figure of a side (set aside). (Not a peak or surge rating, a
 * figure of its own: "10 kW continuous (10,5 kW peak)".)
 */
export function asideOtherBasis(text: string, drafts: Draft[]): void {
  for (let i = 1; i < drafts.length; i++) {
    const [prev, d] = [drafts[i - 1], drafts[i]];
    if (d.kind !== prev.kind || !(d.kind === 'power' || d.kind === 'energy') || d.derived || prev.derived) continue;
    if (
      /^[^\S\n]*(?:[\p{L}-]+[^\S\n]*){0,2}\([^\S\n]*$/u.test(text.slice(prev.end, d.start)) &&
      /^[^\S\n]*(?:gross|net|usable|nominal|total|installed|name-?plate)[^\S\n]*\)/iu.test(text.slice(d.end, d.end + 30))
    )
      d.role = 'aside';
  }
}

/** Before a store's usable size: "Usable capacity 13.5 kWh", "usable energy: 9.8 kWh", "delivers back up to". */
const USABLE_SIZE_BEFORE_RE = /(?<!\p{L})(?:usable|useable|available|deliverable|discharge)[^\S\n]+(?:capacity|energy|storage)[^\S\n]*(?:(?:of|is|:|=)[^\S\n]*)?(?:(?:about|approx\.?|~|up[^\S\n]+to)[^\S\n]*)?$/iu;
/** After what a store takes to fill: "from the grid to fill from empty", "to charge it fully", "for a full charge". */
const TO_FILL_AFTER_RE = /^[^.;!?\n]{0,40}?(?<!\p{L})(?:to[^\S\n]+(?:fill|charge|top[^\S\n]+up|recharge)|for[^\S\n]+a[^\S\n]+full[^\S\n]+(?:charge|fill))(?!\p{L})/iu;

/**
 * "Usable capacity 13.5 kWh … Takes ~15.0 kWh from the grid to fill from empty": a store whose filling from
 * empty takes a stated energy gives back its usable size — the size is what comes out of the round trip.
 */
export function usableSizeOfFilledStore(text: string, drafts: Draft[]): void {
  const fill = drafts.filter((d) => d.kind === 'energy' && d.role === 'in' && !d.derived && TO_FILL_AFTER_RE.test(text.slice(d.end, d.end + 60)));
  if (fill.length !== 1 || drafts.some((d) => d.kind === 'energy' && d.role === 'out')) return;
  const sizes = drafts.filter((d) => d.kind === 'energy' && d.role === null && !d.derived && USABLE_SIZE_BEFORE_RE.test(text.slice(Math.max(0, d.start - 40), d.start)));
  if (sizes.length === 1) sizes[0].role = 'out';
}

