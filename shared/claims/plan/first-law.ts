/**
 * The first law (shared/claims/plan.ts): energies (or powers) in and out; an input of 0 for a
 * self-running device; an efficiency or gain above 1 that is not a heat pump's COP nor a quantum
 * efficiency; a boiler's efficiency on the net calorific value; what is missing otherwise.
 */
import { HARVEST_WORDS, SELF_RUNNING_WORDS } from '../figures-vocabulary';
import { alt, sentenceAround } from '../reader/context';
import { BURST_RE, isChargingTime } from '../reader/durations';
import type { Figure } from '../types';
import { at, HEAT_SOURCE_AFTER_RE, need, ofKind, paragraphKey, siAt, typed, uniq, type Basis, type End } from './basis';
import type { HeatReading } from './carnot';
import type { ThrustReading } from './thrust';

/** After a heat input: where the heat comes from ("3.6 kW from the borehole"). */
/**
 * A further input named but not measured: "the rest is sunlight", "the remainder comes from the ambient
 * air", "ambient heat supplies the rest", "solar-assisted", "topped up by heat from the ground".
 */
const UNMEASURED_OTHER_INPUT_RE =
  /(?<!\p{L})(?:(?:the[^\S\n]+)?(?:extra|excess|surplus|additional)(?:[^\S\n]+(?:energy|power|light|output))?[^\S\n]+(?:comes?|coming|came|is[^\S\n]+drawn|drawn|taken|supplied)[^\S\n]+from[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:heat|warmth|lattice|phonons|surroundings|room|pump(?:[^\S\n]+(?:laser|diodes?|light))?|sunlight)(?!\p{L})|(?:the[^\S\n]+)?(?:rest|remainder|balance|difference)[^\S\n]+(?:(?:of[^\S\n]+(?:it|the[^\S\n]+[\p{L}-]+)[^\S\n]+)?(?:is|are|comes?|came|coming|being|was)[^\S\n]+)(?:(?:made[^\S\n]+up[^\S\n]+by|made[^\S\n]+up[^\S\n]+from|supplied[^\S\n]+by|provided[^\S\n]+by|drawn[^\S\n]+from|taken[^\S\n]+from|from|by)[^\S\n]+)?(?:the[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:sun|sunlight|solar|ambient|air|ground|earth|fuel|gas|wind|environment|surroundings|waste[^\S\n]+heat|process[^\S\n]+heat|steam)|(?:solar|sun|wind|ambient)[- ]assisted|anti-?Stokes|laser[^\S\n]+cool(?:ing|ed)|optical[^\S\n]+(?:refrigeration|cooling)|(?:crystal|sample|device|LED|diode|chip|emitter)[^\S\n]+(?:cools|is[^\S\n]+cooled|was[^\S\n]+cooled|cooled)|(?:sun|sunlight|solar|ambient|outdoor|outside|air|ground|earth|fuel|gas|wind|environment|surroundings|waste[^\S\n]+heat|process[^\S\n]+heat|steam)(?:[^\S\n]+(?:heat|energy|warmth|air))?[^\S\n]+(?:supplies|supplied|provides|provided|makes[^\S\n]+up|made[^\S\n]+up|covers|covered|contributes|contributed|gives|accounts[^\S\n]+for)[^\S\n]+the[^\S\n]+(?:rest|remainder|balance|difference)|(?:at|on|with)[^\S\n]+(?:the[^\S\n]+)?(?:high|rising|flood)[^\S\n]+tides?|natural[^\S\n]+(?:inflows?|run-?off)|(?:rain(?:fall)?|snow-?melt|river)[^\S\n]+inflows?|(?:plus|together[^\S\n]+with|along[^\S\n]+with|topped[^\S\n]+up[^\S\n]+(?:by|with))[^\S\n]+(?:free[^\S\n]+|unmeasured[^\S\n]+|some[^\S\n]+)?(?:sunlight|solar[^\S\n]+(?:heat|gain|energy)|ambient[^\S\n]+heat|heat[^\S\n]+from[^\S\n]+the[^\S\n]+(?:air|ground|sun)))(?!\p{L})/iu;
/** The device said to take the rest from outside: "taking the rest as heat from the lattice", "draws the difference from the room air". */
const REST_TAKEN_FROM_RE =
  /(?<!\p{L})(?:taking|takes|took|drawing|draws|drew|pulling|pulls|pulled|absorbing|absorbs|absorbed|extracting|extracts|extracted|getting|gets|got)[^\S\n]+(?:the[^\S\n]+)?(?:rest|remainder|balance|difference|extra|excess|shortfall)[^\S\n]+(?:(?:as|in[^\S\n]+the[^\S\n]+form[^\S\n]+of)[^\S\n]+(?:heat|warmth|thermal[^\S\n]+energy)[^\S\n]+)?from[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:heat|warmth|lattice|phonons|surroundings|room|air|ground|earth|environment|sun|sunlight|ambient)(?!\p{L})/iu;
const otherInputNamed = (text: string) => UNMEASURED_OTHER_INPUT_RE.test(text) || REST_TAKEN_FROM_RE.test(text);
/** A machine said to run by itself. */
const SELF_RUNNING_CLAIM_RE = new RegExp(`(?<!\\p{L})(?:${alt(SELF_RUNNING_WORDS)})(?!\\p{L})`, 'iu');
/** A machine that harvests a flow from outside (sunlight, wind, heat) is no self-running one. */
const HARVEST_CLAIM_RE = new RegExp(`(?<!\\p{L})(?:${alt(HARVEST_WORDS)})(?!\\p{L})`, 'iu');
/** Boiler efficiencies on the net (lower) calorific value may exceed 100 % by convention. */
const NET_CALORIFIC_RE = /(?<!\p{L})(?:condensing|net (?:CV|calorific|heating)|LHV|lower heating value|lower calorific)(?!\p{L})/iu;

/** Words of heat or fuel near a figure: what a heat engine takes in. */
const HEAT_IN_NEAR_RE = /(?<!\p{L})(?:heat\w*|thermal|fuel|burn\w*|flames?|combustion|exhaust|gas|diesel|petrol|steam|sun\w*|radiat\w*|calorific|LHV|HHV)(?!\p{L})/iu;

/**
 * A heat engine checked against Carnot (an efficiency between two stated sides), whose only stated
 * input is no heat ("the sensor node needs 25 µW", "under 100 W in town"): that input is not the
 * engine's, and a first-law ledger on it would be no result.
 */
function heatEngineElectricIn(b: Basis, inF: Figure | undefined): boolean {
  if (!inF || !b.s.heatEngine || !b.plans.some((p) => p.check === 'carnot')) return false;
  if (inF.start === null || inF.end === null) return false;
  const near = b.text.slice(Math.max(0, inF.start - 40), inF.end + 40);
  return !HEAT_IN_NEAR_RE.test(near);
}

/** An energy store named: what it gives out over a cycle is bounded, not the rate it gives it at. */
const STORE_RE = /(?<!\p{L})(?:flywheels?|batter(?:y|ies)|accumulators?|supercapacitors?|capacitor banks?|energy stores?|storage units?)(?!\p{L})/iu;

/**
 * A power taken in while a store is filled, said just before the figure ("charged at 2 kW", "charges
 * overnight at 7 kW", "pumps at 300 MW", "wound by hand for a minute at about 20 W") or after it ("takes
 * 100 W from the grid all night", "2 kW to recharge"): a rate of filling, not what goes in while the
 * output is given.
 */
const FILLING_BEFORE_RE =
  /(?<!\p{L})(?:(?:re)?charg(?:ed|es|ing)|trickle[- ]charg\w*|pumps|pumping|pumped|topped[^\S\n]+up|tops[^\S\n]+up|wound(?:[^\S\n]+up)?(?=[^\S\n]+by[^\S\n]+hand)|winding[^\S\n]+(?:it[^\S\n]+)?(?:up[^\S\n]+)?(?=at))(?:[^\S\n]+[\p{L}-]+){0,4}?[^\S\n]+(?:at|with|on|from)[^\S\n]+(?:(?:a|an|the|rate|of|steady|about|around|roughly|some|only|just|up to)[^\S\n]+)*$/iu;
const FILLING_AFTER_RE = /^[^.;!?\n]{0,30}?(?<!\p{L})(?:to[^\S\n]+(?:re)?charge|while[^\S\n]+(?:re)?charging|of[^\S\n]+winding|all[^\S\n]+night|overnight)(?!\p{L})/iu;
/** An average or wall-plug input beside a peak output ("100 MW peak with an average input of 20 kW"). */
const AVERAGE_IN_RE = /(?<!\p{L})(?:average|mean|wall[- ]plug)(?!\p{L})/iu;
/** An output given in pulses, peaks or bursts, or while braking: no steady output beside a steady input. */
const OUT_BURST_RE =
  /(?<!\p{L})(?:bursts?|peaks?|(?:in|per|each)[^\S\n]+pulse|pulses|flash(?:es)?|sprints?|for[^\S\n]+a[^\S\n]+(?:fraction[^\S\n]+of[^\S\n]+a[^\S\n]+second|millisecond|microsecond|moment|few[^\S\n]+seconds)|(?:when|while)[^\S\n]+(?:slowing|braking)|under[^\S\n]+braking)(?!\p{L})/iu;
/** A store of energy named: a battery, a capacitor, a flywheel, a spring, a reservoir. */
const ANY_STORE_RE =
  /(?<!\p{L})(?:flywheels?|batter(?:y|ies)|accumulators?|(?:super|ultra)?capacitors?|capacitor[^\S\n]+banks?|springs?|mainsprings?|clockwork|wind-up|reservoirs?|pumped[- ](?:storage|hydro)|energy[^\S\n]+stores?|storage|Marx|pulse[- ](?:forming|compressors?|compression)|regenerative[^\S\n]+braking)(?!\p{L})/iu;

/**
 * A power taken in and a power given out in two phases of a store's cycle ("charged at 2 kW … delivers 50
 * kW bursts", "pumps at 300 MW and generates at 360 MW", "100 MW peak with an average input of 20 kW"):
 * the rates are not comparable; only the energies over the cycle are bounded.
 */
function phasesApart(text: string, inF: Figure, outF: Figure): boolean {
  if (!text || inF.start === null || inF.end === null || outF.start === null || outF.end === null || inF.derived || outF.derived) return false;
  const before = text.slice(Math.max(0, inF.start - 60), inF.start);
  const after = text.slice(inF.end, inF.end + 40);
  const outAround = text.slice(Math.max(0, outF.start - 40), outF.end + 40);
  const sentence = sentenceAround(text, Math.min(inF.start, outF.start), Math.max(inF.end, outF.end));
  const store = ANY_STORE_RE.test(sentence);
  const charging = /(?<!\p{L})(?:re)?charg(?:ed|es|ing)(?!\p{L})/iu;
  const filling = FILLING_BEFORE_RE.test(before) || FILLING_AFTER_RE.test(after);
  // (A charge verb beside the output is the claim's own: "charges the battery at 5 kW while the motor draws 3 kW".)
  const outCharges = charging.test(text.slice(Math.max(0, outF.start - 60), outF.start));
  const burst = OUT_BURST_RE.test(outAround);
  return (filling && !outCharges && (store || charging.test(before))) || (burst && (store || AVERAGE_IN_RE.test(text.slice(Math.max(0, inF.start - 40), inF.end + 20))));
}

/** What an auxiliary load of a plant is: its controls, fans, pumps, yaw drive, winch, electronics. */
const AUXILIARY_RE =
  /(?<!\p{L})(?:controls?|control[^\S\n]+(?:system|electronics|unit|gear)s?|controllers?|electronics|fans?|blowers?|(?:circulat\w+[^\S\n]+)?pumps?|yaw|pitch[^\S\n]+(?:system|drive)s?|auxiliar\w*|parasitic|house[^\S\n]+load|own[^\S\n]+(?:use|consumption)|standby|winch(?:es)?|sensors?|trackers?|tracking|monitoring|lights?|lighting)(?!\p{L})/iu;
/** An outside flow the plant lives on: wind, sunlight, falling water, fuel burnt, a kite's pull. */
const OUTSIDE_FLOW_RE =
  /(?<!\p{L})(?:wind(?:[- ]?turbines?|mills?|[- ]farms?)?|sun(?:light|shine)?|solar|hydro\w*|water[^\S\n]+turbines?|tidal|waves?|geothermal|CHP|combined[^\S\n]+heat[^\S\n]+and[^\S\n]+power|cogeneration|boilers?|gas|fuel|diesel|petrol|gasoline|biomass|wood|kites?|rivers?|streams?|dams?|compost\w*|manure|decompos\w*|rotting|ferment\w*)(?!\p{L})/iu;

/** Fuel or heat named at a figure: what it measures is burnt or taken in as heat. */
const FUEL_AT_RE = /(?<!\p{L})(?:fuel|burn\w*|heat|gas|diesel|petrol|gasoline|coal|wood|biomass|pellets?)(?!\p{L})/iu;

/**
 * The one input stated is an auxiliary load of a plant that lives on an outside flow ("makes 3 MW with
 * only a 50 kW yaw and pitch system drawing power", "15 kW of heat from the sun while the fans draw 300
 * W"): not what the plant converts, so no ledger.
 */
/** An excess said over an auxiliary's draw: "Extra over pump (kWh)", "gain over the fans". */
const EXCESS_OVER_AUXILIARY_RE =
  /(?<!\p{L})(?:extra|excess|surplus|gain|net)[^\S\n]+(?:over|above|beyond)[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:(?:circulat\w+|circulation|solar|loop)[^\S\n]+)?(?:pumps?|fans?|blowers?|controls?|controllers?|electronics|trackers?|auxiliar\w*|parasitics?)(?!\p{L})/iu;

function auxiliaryInput(text: string, inF: Figure, outF: Figure): boolean {
  if (!text || inF.start === null || inF.end === null || outF.start === null) return false;
  // (An input worked out as output − excess, where the excess is said over a pump's or a fan's draw, in a
  // text on a plant that lives on an outside flow: "Solar thermal | Pump electricity | Heat to tank | Extra over pump".)
  // (Not a flow said to be absent: "with no sun, wind or fuel".)
  if (inF.derived) return /^input = output − excess/u.test(inF.derived) && EXCESS_OVER_AUXILIARY_RE.test(text) && OUTSIDE_FLOW_RE.test(text.replace(/(?<!\p{L})(?:no|without|nor|neither|not)(?!\p{L})[^.;!?\n]{0,40}/giu, ' '));
  // (A store's own energy, "a 12 V, 100 Ah lead-acid battery (1.2 kWh) kept the 3 W river-level sensor
  // running": what the store holds is no auxiliary's draw.)
  if (/(?<!\p{L})(?:batter(?:y|ies)|packs?|cells?|accumulators?|power[^\S\n]+banks?)(?!\p{L})[^\S\n]*(?:\(|[:=,]|holds?|holding|of|with|storing|stores?)?[^\S\n]*(?:(?:about|some|roughly|nearly|just|only)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, inF.start - 60), inF.start))) return false;
  const around = sentenceAround(text, inF.start, inF.end);
  // (Within the figure's own sentence: "Gas to the engine: 780 MWh. Electricity exported plus own use: 301 MWh"
  // names no auxiliary load at its 780 MWh.)
  const local = text.slice(Math.max(0, inF.start - 45), inF.start).split(/[.!?](?:[^\S\n]|$)|\n/u).pop()! + text.slice(inF.start, inF.end + 45).split(/[.!?](?:[^\S\n]|$)|\n/u)[0];
  // (Not fuel or heat said right at the figure: "the standby diesel set burned fuel worth 4,500 kWh" is what the set converts;
  // nor a label's before a colon: "Gas to the engine over the year, by the analyser's count: 780 MWh".)
  // (Read back only to the clause's start: "6 kW of heat while drawing 150 W" names no fuel at its 150 W.)
  const label = /(?:^|[.!?\n])[^.!?\n:]{0,80}:[^\S\n]*$/u.exec(text.slice(Math.max(0, inF.start - 90), inF.start))?.[0] ?? '';
  // (Not back into the output's own words: "2.1 kW of heat from a 45 W pump" names no heat at its 45 W.)
  const clause = label || (text.slice(Math.max(0, inF.start - 25, outF.end !== null && outF.end <= inF.start ? outF.end : 0), inF.start).split(/[,;:]|(?<!\p{L})(?:and|while|but|whereas|with)(?!\p{L})/iu).pop() ?? '');
  // (Up to the clause's end after it: "pump electricity 0.4 kWh, heat to tank 12 kWh" names no heat at its 0.4 kWh.)
  const atFigure = (outF.end !== null && outF.end <= inF.start && inF.start - outF.end < 25 ? clause.replace(/^[^\S\n]*of[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:heat|warmth|hot[^\S\n]+water)(?!\p{L})/iu, ' ') : clause) + text.slice(inF.start, inF.end) + text.slice(inF.end, inF.end + 12).split(/[,;]/u)[0];
  return AUXILIARY_RE.test(local) && !FUEL_AT_RE.test(atFigure) && OUTSIDE_FLOW_RE.test(around + ' ' + sentenceAround(text, outF.start, outF.end ?? outF.start));
}

/** An engine that burns fuel: its cylinders, crankshaft, fuel, exhaust, a supercharger or turbocharger. */
const COMBUSTION_ENGINE_RE =
  /(?<!\p{L})(?:crank(?:shaft)?s?|cylinders?|combustion|petrol|diesel|gasoline|fuel|exhaust|intake|turbo\w*|supercharg\w*|V[68]|V1[02]|ICE|cc|litre[- ]engine|liter[- ]engine|carburett?or|injectors?|alternators?)(?!\p{L})/iu;
/** An output said as a fuel engine's own ("raises the engine's output from 300 hp to 420 hp", "at the crank", "wheel horsepower"). */
const ENGINE_OUTPUT_BEFORE_RE =
  /(?:(?<!\p{L})engine(?:['’]s)?[^\S\n]+(?:output|power)|(?<!\p{L})(?:brake|crank|wheel)[^\S\n]+(?:horse)?power|(?<!\p{L})at[^\S\n]+the[^\S\n]+(?:crank|flywheel|wheels))[^.;!?\n]{0,40}$/iu;
/** An engine's accessory, or power taken off the engine: "the supercharger takes 60 hp from the crankshaft", "the kit draws 100 W from the alternator". */
const ACCESSORY_RE =
  /(?<!\p{L})(?:supercharg\w*|blowers?|compressors?|alternators?|kits?|boosters?|add-?ons?|(?:from|off)[^\S\n]+the[^\S\n]+(?:crank(?:shaft)?|engine|alternator|battery|belt))(?!\p{L})/iu;
/** A device said to have no fuel ("burns no fuel", "without fuel"): its engine is no fuel engine. */
const NO_FUEL_RE = /(?<!\p{L})(?:(?:no|without|zero|free[^\S\n]+of)[^\S\n]+(?:extra[^\S\n]+)?fuel|fuel[- ]?(?:free|less))(?!\p{L})/iu;

/**
 * The output is a fuel engine's ("takes 60 hp from the crankshaft but raises the engine's output from 300
 * hp to 420 hp"), the only stated input an accessory's drive power: the engine's fuel is its input, and
 * the text does not measure it, so no ledger.
 */
function engineOutputBesideAccessory(text: string, inF: Figure, outF: Figure): boolean {
  if (!text || inF.start === null || inF.end === null || outF.start === null || inF.derived) return false;
  if (!COMBUSTION_ENGINE_RE.test(text) || NO_FUEL_RE.test(text) || SELF_RUNNING_CLAIM_RE.test(text)) return false;
  const beforeOut = text.slice(Math.max(0, outF.start - 60), outF.start);
  const aroundIn = text.slice(Math.max(0, inF.start - 50), inF.end + 40);
  return ENGINE_OUTPUT_BEFORE_RE.test(beforeOut) && ACCESSORY_RE.test(aroundIn) && !HEAT_IN_NEAR_RE.test(aroundIn);
}

/** A harvester of an outside flow named beside an output: solar panels, an inverter, a wind turbine, a water wheel. */
const HARVESTER_RE =
  /(?<!\p{L})(?:solar|sun(?:light|shine|ny)?|PV|photovoltaic|panels?|arrays?|inverters?|wind[- ]?turbines?|turbines?|windmills?|hydro\w*|water[- ]?wheels?|collectors?|tidal|wave)(?!\p{L})/iu;

/**
 * "the inverter counter went from 3,112 to 3,598 kWh. The house used 410 kWh from the grid": what a
 * harvester of sunlight, wind or water gives, beside an input of something else (the house's import), is
 * no ledger of one machine.
 */
function harvestedOut(text: string, inF: Figure, outF: Figure): boolean {
  if (!text || inF.start === null || inF.end === null || outF.start === null || outF.end === null) return false;
  const outNear = text.slice(Math.max(0, outF.start - 50), outF.end + 30);
  const inSentence = sentenceAround(text, inF.start, inF.end);
  // ("… while their house used 2,400 kWh from the grid", "the village uses 60 kW at peak": a household's or a
  // community's own use, said of it by name, may share the harvester's sentence.)
  const consumerSaid = CONSUMER_USE_BEFORE_RE.test(text.slice(Math.max(0, inF.start - 45), inF.start));
  // ("Turbine output 12 kWh; Load 9 kWh; Battery change 3 kWh": a harvester's output beside what its
  // battery took or gave — a store it charges, no supply of it.)
  // ("| PV generation (kWh) | House consumption (kWh) |": a site's own use beside what its array gave.)
  if (RENEWABLE_RE.test(text) && (HARVESTER_RE.test(clauseBefore(text, outF)) || GENERATION_RE.test(clauseBefore(text, outF)))) {
    const inClause = clauseBefore(text, inF);
    const storeAfter = /^[^\S\n]*(?:[\p{L}-]+[^\S\n]+)?(?:batter(?:y|ies)|packs?|accumulators?)(?!\p{L})/iu.test(text.slice(inF.end, inF.end + 30));
    if ((STORE_NAMED_RE.test(inClause) || SITE_USE_RE.test(inClause) || storeAfter) && !HARVESTER_RE.test(inClause)) return true;
  }
  return (
    RENEWABLE_RE.test(text) &&
    HARVESTER_RE.test(outNear) &&
    (consumerSaid || HOUSEHOLD_IMPORT_RE.test(text.slice(Math.max(0, inF.start - 50), inF.end + 40))) &&
    (consumerSaid || (!HARVESTER_RE.test(text.slice(Math.max(0, inF.start - 40), inF.end + 30)) && !sameSentence(text, inF, outF) && !HARVESTER_RE.test(inSentence)))
  );
}
/** The words of a figure's own clause before it: back to a full stop, semicolon, pipe, comma or line's end. */
function clauseBefore(text: string, f: Figure): string {
  const before = text.slice(Math.max(0, f.start! - 35), f.start!);
  return before.split(/[;|,\n]|[.!?](?=\s)/u).pop() ?? '';
}
/** A store named as the thing a figure is of: "Battery change", "battery charged", "storage in/out". */
const STORE_NAMED_RE = /(?<!\p{L})(?:batter(?:y|ies)|accumulators?|storage|store|state[^\S\n]+of[^\S\n]+charge|SoC)(?!\p{L})/iu;
/** What a harvesting site gave, as a label: "Generation", "Yield", "Production". */
const GENERATION_RE = /(?<!\p{L})(?:generation|generated|yield|yields|production|produced)(?!\p{L})/iu;
/** What a site or household used, as a label: "Consumption", "House use", "Site load", "Demand". */
const SITE_USE_RE = /(?<!\p{L})(?:consumption|usage|use|load|loads|demand)(?!\p{L})/iu;
/** Sunlight, wind or water harvested, named anywhere in the text. */
const RENEWABLE_RE = /(?<!\p{L})(?:solar|rooftop|PV|photovoltaic|sun(?:light|shine)?|wind[- ]?turbines?|windmills?|hydro\w*|water[- ]?wheels?|tidal|wave[- ]power)(?!\p{L})/iu;
/** A household's or a community's own use, said of it just before the figure: "their house used", "the village uses". */
const CONSUMER_USE_BEFORE_RE =
  /(?<!\p{L})(?:the|their|our|my|your|his|her|a|each)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:village|town|house|home|homes|household|households|farm|school|site|community|island|cabin|cottage|building|office|factory|hamlet|flat)[^\S\n]+(?:uses|used|consumes|consumed|needs|needed|takes|took|draws|drew)(?:[^\S\n]+(?:about|some|roughly|only|just|up[^\S\n]+to|around))?[^\S\n]*$/iu;
/** What a household takes from the grid: "the house used 410 kWh from the grid", "import 3.2 kWh". */
const HOUSEHOLD_IMPORT_RE = /(?<!\p{L})(?:from[^\S\n]+the[^\S\n]+(?:grid|mains|network)|grid[^\S\n]+import|imports?|imported|the[^\S\n]+(?:house|home|household|building|farm|site|cabin|cottage|flat|shed|boat|van|caravan|camper|barn|office|workshop|school|loads?)[^\S\n]+(?:used|uses|took|takes|drew|draws|consumed|consumes|needed|needs))(?!\p{L})/iu;
const sameSentence = (text: string, a: Figure, b: Figure) => sentenceAround(text, a.start!, a.end!) === sentenceAround(text, b.start!, b.end!);

/** An item's label: "Model A", "Fan B", "Unit 2", "Option III". */
const ITEM_LABEL_RE = /(?<![\p{L}\d])(?:Model|Fan|Unit|Option|Version|Type|Heater|Pump|Device|Product|Sample|Prototype|Panel|Motor|Brand|Design|System|Kit|Rig|Variant|Candidate|Bid|Offer|Quote)[^\S\n]+([A-Z]|\d{1,2}|[IVX]{1,4})(?![\p{L}\d])/gu;
/** The last item label before a figure in its sentence or line, if any. */
function itemOf(text: string, f: Figure): string | null {
  if (f.start === null) return null;
  const from = Math.max(0, f.start - 80, text.lastIndexOf('\n', f.start - 1) + 1);
  const before = text.slice(from, f.start).split(/[.!?](?=\s)/u).pop() ?? '';
  let last: string | null = null;
  for (const m of before.matchAll(ITEM_LABEL_RE)) last = m[0].replace(/\s+/gu, ' ');
  return last;
}
/** The input and the output are two labelled items' ("Model A uses 1.2 kW …; Model B gives 1.5 kW"): no one device's ledger. */
function twoItems(text: string, inF: Figure, outF: Figure): boolean {
  if (!text || inF.derived || outF.derived) return false;
  const [a, b] = [itemOf(text, inF), itemOf(text, outF)];
  return a !== null && b !== null && a !== b;
}

/** Words that put an energy over a year: "annual yield 5,900 kWh", "3,100 kWh a year". */
const YEARLY_RE = /(?<!\p{L})(?:annual(?:ly)?|yearly|per[^\S\n]+(?:year|annum)|a[^\S\n]+year|each[^\S\n]+year|every[^\S\n]+year|\/[^\S\n]?(?:yr|year|a))(?!\p{L})/iu;
/**
 * An energy said over a year on one side and, on the other, a power times a time of the text that is no
 * year ("16 × 430 W panels … scaffold two days … annual yield 5,900 kWh"): no ledger of one period.
 */
function periodsApart(text: string, inF: Figure, outF: Figure): boolean {
  const yearly = (f: Figure) => f.kind === 'energy' && !f.derived && f.start !== null && f.end !== null && YEARLY_RE.test(text.slice(Math.max(0, f.start - 40), f.end + 25).split(/[.;!?\n]/u).filter(Boolean).join(' '));
  const shortRun = (f: Figure) => f.kind === 'energy' && !!f.derived?.startsWith('energy = power × time') && !YEARLY_RE.test(f.text);
  return (yearly(outF) && shortRun(inF)) || (yearly(inF) && shortRun(outF));
}

/** Line voltages of three-phase AC supplies (V). */
const THREE_PHASE_LINE_VOLTS = [380, 400, 415, 440, 460, 480, 690];
/** Words that settle a supply's phases or say it is direct current. */
const PHASES_SAID_RE = /(?<!\p{L})(?:single[- ]phase|one[- ]phase|1[- ]phase|three[- ]phases?|3[- ]?phases?|[13][^\S\n]?~|DC|d\.c\.|direct[^\S\n]+current|batter(?:y|ies)|packs?|bus|rails?|(?:super)?capacitors?|cells?)(?!\p{L})/iu;
/**
 * An input worked out as current × voltage at a three-phase line voltage ("FLA of 4.8 A at 400 V"), with
 * nothing said of the phases, that falls short of the output by no more than √3: a three-phase supply
 * gives up to √3 × V × I, so the shortfall is no claim of more out than in.
 */
function phasesUnsaid(text: string, inF: Figure, outF: Figure): boolean {
  const m = /^power = current × voltage \([^×]+× ([\d.]+) (k?)V\)/u.exec(inF.derived ?? '');
  if (!m || PHASES_SAID_RE.test(text)) return false;
  const v = parseFloat(m[1]) * (m[2] ? 1000 : 1);
  if (!THREE_PHASE_LINE_VOLTS.some((x) => Math.abs(x - v) < 0.5)) return false;
  if (inF.kind !== outF.kind) return false;
  const most = inF.upper?.si ?? inF.si;
  return outF.si > most && outF.si <= Math.sqrt(3) * most;
}

/** A machine's rating said at a figure: "a 9 kW motor", "the 750 W pump", "rated 1.1 kW", "motor: 3 kW". */
const RATING_AT_RE = /^[^\S\n]*(?:[\p{L}-]+[^\S\n]+)?(?:motors?|pumps?|drives?|engines?|compressors?|units?|hoists?|winch(?:es)?)(?!\p{L})/iu;
const RATED_BEFORE_RE = /(?<!\p{L})(?:rated(?:[^\S\n]+(?:at|for))?|nameplate|plate[^\S\n]+says|(?:motor|pump|drive)[^\S\n]*[:=]?)[^\S\n]*$/iu;
/**
 * A power worked out from factors (a torque at a speed, a flow at a head, a mass lifted) beside a motor's
 * or a pump's rating ("a 9 kW motor"): a rating is not what the machine draws at that working point (it
 * may run over it for a while), so no ledger is drawn from the two.
 */
function productBesideRating(text: string, figures: readonly Figure[], inF: Figure, outF: Figure): boolean {
  if (!text) return false;
  // (An energy worked out from a power over a run stands for that power.)
  const base = (f: Figure) => (f.kind === 'energy' && f.derived ? (figures.find((g) => g.kind === 'power' && g.role === f.role && (g.start === f.start || g.end === f.end)) ?? f) : f);
  const [i, o] = [base(inF), base(outF)];
  if (i.start === null || i.end === null || i.derived || i.kind !== 'power' || o.kind !== 'power') return false;
  if (!/^power = (?:torque|ρ g|flow|mass|energy per cycle)/u.test(o.derived ?? '')) return false;
  // (Only where the product passes the rating by less than twice: below it there is no conflict to doubt,
  // and far above it no motor runs for a working point.)
  if (!(o.si > i.si && o.si <= 2 * i.si)) return false;
  return RATING_AT_RE.test(text.slice(i.end, i.end + 25)) || RATED_BEFORE_RE.test(text.slice(Math.max(0, i.start - 25), i.start));
}

/** An output said as a burst or a peak ("can deliver 2 MW for short periods"): no steady output over a run. */
function saidInBursts(text: string, f: Figure): boolean {
  return f.start !== null && f.end !== null && !!text && BURST_RE.test(sentenceAround(text, f.start, f.end));
}

/**
 * The time said with a power as its own ("up to 500 kW for 1.5–2 seconds"): a duration right after "for",
 * "over" or "during" in its clause, other than the run the ledger takes.
 */
function ownTimeOf(text: string, f: Figure, figures: Figure[], run: Figure): Figure | undefined {
  if (f.end === null || !text) return undefined;
  return figures.find(
    (d) =>
      d.kind === 'duration' &&
      d !== run &&
      d.role !== 'aside' &&
      d.start !== null &&
      d.start >= f.end! &&
      d.start - f.end! < 30 &&
      /^[^\S\n]*(?:,[^\S\n]*)?(?:for|over|during|lasting)[^\S\n]+(?:(?:about|around|roughly|some|just|up to|nearly)[^\S\n]+)?$/iu.test(text.slice(f.end!, d.start)),
  );
}

/** A power said right beside a time, with no other figure between ("200 W for 5 ms", "a 5 ms pulse of 200 W"). */
function pulseOf(text: string, f: Figure, d: Figure): boolean {
  if (f.start === null || f.end === null || d.start === null || d.end === null) return false;
  const gap = f.end <= d.start ? text.slice(f.end, d.start) : d.end <= f.start ? text.slice(d.end, f.start) : '';
  return gap.length < 40 && !/\d/u.test(gap);
}

/**
 * Volts and amps on both sides ("takes 12 volts at 8 amps … turns it into 48 volts at up to 1.9 amps for
 * the compressor fridge"): an electrical converter's ledger, whatever machine its output feeds.
 */
/** "Overnight it runs the compressor fridge, which pulls about 150 W": the machine that moves heat is a load the device runs. */
function heatMoverIsLoad(text: string, out: Figure | undefined): boolean {
  if (!out || out.start === null || out.end === null) return false;
  // (The output is the load's own rating or what it used, said in the phrase: "ran a 35 W compressor fridge for
  // two weeks" — not heat the load delivers, "runs a 700 W heat pump …, delivering about 30 kWh of heat".)
  const sentence = sentenceAround(text, out.start, out.end);
  const from = text.indexOf(sentence);
  const m = /(?<!\p{L})(?:runs?|ran|running|powers?|powered|powering|drives?|drove|keeps?|kept)[^\S\n]+(?:the|a|an|our|my|its|your)[^\S\n]+(?:[\p{L}\d.,-]+,?[^\S\n]+){0,4}?(?:fridges?|freezers?|refrigerators?|air[- ]conditioners?|heat[- ]pumps?|chillers?|coolers?)(?!\p{L})/iu.exec(sentence);
  if (m === null) return false;
  if (from < 0) return true;
  const heat = /^[^\S\n]*(?:of[^\S\n]+)?(?:useful[^\S\n]+)?(?:heat|warmth|cooling)(?!\p{L})/iu.test(text.slice(out.end, out.end + 25)) || /(?<!\p{L})(?:heat|heating|cooling)(?:[^\S\n]+(?:output|delivered|capacity))?[^\S\n]*[:=]?[^\S\n]*$/iu.test(text.slice(Math.max(0, out.start - 25), out.start));
  return out.start >= from + m.index && !heat;
}

function electricOnBothSides(inF: Figure | undefined, outF: Figure | undefined): boolean {
  const vi = (f: Figure | undefined) => !!f?.derived?.match(/^power = (?:√3 × )?current × voltage/);
  return vi(inF) && vi(outF);
}

export function planFirstLaw(b: Basis, { thrust, photonApplies }: ThrustReading, { efficiency, movesHeat, gain, share, cop, acrossDifference, copForCarnot }: HeatReading): void {
  const { figures, s, plans, needs, notes, power, energy, text, pIn, pOut, eIn, eOut, duration, temps } = b;
  const firstLawWhy = 'The text gives the energy put in and the energy got out.';
  // An energy on one side and a power on the other with no time to join them, where the text states the
  // ratio itself ("gives back 0.91 units for every unit it takes … stores 13.5 kWh, up to 5 kW"): the ratio
  // is the claim, not a ledger that needs a duration.
  const mixedWithoutTime = !duration && ((!!eIn && !eOut && !pIn && !!pOut) || (!!pIn && !pOut && !eIn && !!eOut));
  // A heat pump that states the heat it draws from its source beside the work it takes: its whole
  // balance is a first-law ledger (what it delivers is at most the two added up).
  const sourceHeatIn =
    movesHeat &&
    [...power, ...energy].filter((f) => f.role === 'in').length >= 2 &&
    [...power, ...energy].some((f) => f.role === 'in' && HEAT_SOURCE_AFTER_RE.test(text.slice(f.end ?? 0, (f.end ?? 0) + 50)));
  // "… only 300 W comes from the wall, the rest is sunlight": a further input the text names but does not
  // measure; the one stated input is not all that goes in.
  const otherInput = (eIn || pIn) && (eOut || pOut) && !sourceHeatIn && otherInputNamed(text) && [...power, ...energy].filter((f) => f.role === 'in').length === 1;
  if (otherInput) {
    needs.push(
      need(
        'first-law',
        ['the energy of the other input the text names (sunlight, ambient heat, fuel), measured'],
        'The text says part of what goes in comes from a source it does not measure: the stated input is not the whole input.',
        [(eIn ?? pIn)!, (eOut ?? pOut)!],
      ),
    );
  } else if (movesHeat && (eIn || pIn) && (eOut || pOut) && !sourceHeatIn && !electricOnBothSides(eIn ?? pIn, eOut ?? pOut) && !heatMoverIsLoad(text, pOut ?? eOut)) {
    notes.push('A heat pump or refrigerator moves heat rather than making it: the heat it delivers may exceed the work it takes without breaking any law. Its bound is the Carnot COP of the temperatures it works between.');
  } else if (heatEngineElectricIn(b, eIn ?? pIn)) {
    notes.push("A heat engine's input is the heat it takes in: the electrical power the text gives beside its output is a load's or a part's, not what the engine converts. Its bound is the Carnot efficiency between its two sides.");
  } else if ((eIn || pIn) && (eOut || pOut) && !(thrust && photonApplies && !eOut && !pOut) && !(mixedWithoutTime && (gain || share))) {
    // (Powers in and out said in one paragraph, where the energies are not and one of them is stated in
    // another paragraph: "Takes in two kilowatts, puts out three point one kilowatts" beside a
    // listener's "battery of five kilowatt-hours" elsewhere.)
    const together = (a: Figure | undefined, c: Figure | undefined) => !!a && !!c && (a.start === null || c.start === null || paragraphKey(text, a.start) === paragraphKey(text, c.start));
    const statedApart = [eIn, eOut].some((e) => e && !e.derived && !together(e, pIn) && !together(e, pOut));
    const powersOnly = !!text && together(pIn, pOut) && statedApart && !together(eIn ?? pIn, eOut ?? pOut);
    const inF = powersOnly ? pIn! : (eIn ?? pIn!);
    const outF = powersOnly ? pOut! : (eOut ?? pOut!);
    const bothPower = !eIn && !eOut;
    const t = duration?.si;
    const extra: string[] = ['Heat out: counted in the output (0 J apart; any heat rejected only adds to the output).'];
    const toEnergy = (f: Figure, e: End): string | null => {
      if (f.kind === 'energy') return at(f, e);
      if (siAt(f, e) === 0) return '0 J'; // no input at all, however long it ran
      // (A power said with a time of its own other than the run — "takes ~2 kW for 10 minutes … gives up to
      // 500 kW for 1.5–2 seconds" — over that time: the shortest for what comes out, the longest for what goes in.)
      const own = duration ? ownTimeOf(text, f, figures, duration) : undefined;
      if (own && !bothPower) return typed(siAt(f, e) * (f.role === 'out' ? own.si : (own.upper?.si ?? own.si)), 'J');
      // A charging time is no run of what the device puts out ("a 150 kW motor … charges in 40 minutes");
      // nor is any run the time of an output given only in bursts ("can deliver 2 MW for short periods").
      // Nor is a pulse's length (under a second) the run of a power said apart from it ("emits 2 J in 10 ns
      // … from a supply that draws 1.5 kW").
      const pulseApart = t !== undefined && t < 1 && !bothPower && duration !== undefined && !pulseOf(text, f, duration);
      if (t !== undefined && !pulseApart && !(f.role === 'out' && !bothPower && duration && isChargingTime(text, duration)) && !(f.role === 'out' && !bothPower && saidInBursts(text, f))) return typed(siAt(f, e) * t, 'J');
      if (bothPower) return typed(siAt(f, e), 'J'); // one second of steady running
      return null;
    };
    const ownTimes = duration && !bothPower ? [inF, outF].flatMap((f) => (f.kind === 'power' ? [ownTimeOf(text, f, figures, duration)].filter((d): d is Figure => !!d) : [])) : [];
    for (const f of [inF, outF]) {
      const own = f.kind === 'power' && duration && !bothPower ? ownTimeOf(text, f, figures, duration) : undefined;
      if (own) extra.push(`“${f.text}” over the time said with it, ${own.display}${own.upper ? (f.role === 'out' ? ' (its shortest end)' : ' (its longest end)') : ''}.`);
    }
    if (duration && !bothPower) extra.push(`Over the stated ${duration.display}: power × time.`);
    else if (bothPower && !duration) extra.push('Powers compared over one second of steady running: the ratio does not depend on how long.');
    else if (bothPower && duration) extra.push(`Powers over the stated ${duration.display}.`);
    // (One figure said twice, read once as what goes in and once as what comes out — "a total optical
    // output of 2.0e3 W … Table 2: optical power 2.0e3 W" — is no ledger.)
    const saidTwice = !inF.derived && !outF.derived && inF.text === outF.text && inF.si === outF.si && inF.start !== outF.start;
    // A store (a flywheel, a battery) gives out what it took in at any rate: its discharge power above its
    // charge power ("charged overnight at 20 kW … can release it at 250 kW") is no claim of more out than in.
    const storeRates = bothPower && !duration && ((STORE_RE.test(text) && energy.some((f) => f.role !== 'aside')) || phasesApart(text, inF, outF));
    const auxIn = ((bothPower ? !duration : !!eIn && !!eOut) && auxiliaryInput(text, inF, outF)) || harvestedOut(text, inF, outF) || engineOutputBesideAccessory(text, inF, outF);
    if (twoItems(text, inF, outF)) {
      notes.push(`The input (“${inF.text}”) and the output (“${outF.text}”) are said of two different items the text names; no ledger of one device is drawn from them.`);
    } else if (productBesideRating(text, figures, inF, outF)) {
      needs.push(need('first-law', ['the power the machine draws at that working point, measured'], 'The input the text gives is a rating of the machine, not what it draws while giving the output worked out from its factors.', [inF, outF]));
    } else if (periodsApart(text, inF, outF)) {
      needs.push(need('first-law', ['the energy put in over the same period as the energy got out'], 'The text gives one side over a year and the other over a shorter time of its own.', [inF, outF]));
    } else if (phasesUnsaid(text, inF, outF)) {
      needs.push(
        need(
          'first-law',
          ['the power the machine draws, measured (or whether its supply is single- or three-phase, and the power factor)'],
          `At ${/× ([\d.]+ k?V)\)/u.exec(inF.derived ?? '')?.[1] ?? 'that voltage'} a supply is most often three-phase, and then a current at that line voltage gives up to √3 times current × voltage.`,
          [inF, outF],
        ),
      );
    } else if (auxIn) {
      needs.push(need('first-law', ['the power of the outside flow the plant converts (wind, sunlight, water, fuel)'], 'The input the text gives feeds only the plant’s own controls, fans or pumps, not what it converts.', [inF, outF]));
    } else if (storeRates) {
      needs.push(need('first-law', ['the energy put into the store and the energy got out of it (or how long it charged and how long it gave out power)'], 'A store can give out power faster than it takes it in; only the energies over a full cycle are bounded.', [inF, outF]));
    } else if (saidTwice) {
      notes.push(`The same figure, “${inF.text}”, is read both as what goes in and as what comes out; check the part it plays before comparing the two.`);
    } else if (toEnergy(inF, 'low') === null || toEnergy(outF, 'low') === null) {
      needs.push(need('first-law', ['how long the device ran (to compare a power with an energy)'], 'The text gives a power on one side and an energy on the other.', [inF, outF]));
    } else {
      // An efficiency of at most 100 % that the text states itself ("Efficiency 94.6 %", "a charging
      // efficiency of about 95 %"), where no efficiency above 100 % is stated: the text says its device
      // gives back less than it takes, so figures read as its input and output that give more are more
      // likely another device's or a misreading than the claim (see run.ts).
      // (Said in the paragraph of the input or the output: one in a paragraph on devices the text cites
      // beside the claim — "a grid transformer whose efficiency the authors give as 98.6 %" — is theirs.)
      const near = (f: Figure) => [inF, outF].some((g) => g.start === null || f.start === null || paragraphKey(text, g.start) === paragraphKey(text, f.start));
      const effs = ofKind(figures, 'efficiency').filter((f) => !f.derived && f.start !== null && near(f));
      const within = effs.some((f) => (f.upper?.si ?? f.si) > 1) ? undefined : effs.find((f) => f.si > 0 && (f.upper?.si ?? f.si) <= 1);
      plans.push({
        within,
        check: 'first-law',
        uses: uniq([inF, outF, t !== undefined && !bothPower && (inF.kind === 'power' || outF.kind === 'power') ? duration : undefined, ...ownTimes]),
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
  } else if (!plans.some((p) => p.check === 'carnot') && (efficiency?.si ?? 0) > 1 && !cop && otherInputNamed(text)) {
    // "120 % electrical efficiency, the rest of the energy coming from waste heat": an efficiency over one
    // input of several, the others unmeasured.
    needs.push(need('first-law', ['the energy of the other input the text names (heat, sunlight, fuel), measured'], 'The text says part of what goes in comes from a source its efficiency leaves out: over all its inputs the device may give back less than it takes.', [efficiency!]));
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
  } else if ((eOut || pOut) && !(eIn || pIn) && !thrust) {
    // Only what comes out ("the tidal kite should supply 300 to 500 kW", "the stack supplies 12 kW"): the
    // check applies and wants the input, whether or not the text sounds like a claim of gain.
    needs.push(need('first-law', ['the energy or power put in (all of it: electrical, mechanical, chemical, heat)'], 'Over a full cycle a machine delivers no more energy than it is given.', uniq([eOut, pOut])));
  } else if ((eIn || pIn) && !(eOut || pOut) && s.overUnity && !thrust) {
    needs.push(need('first-law', ['the energy or power got out'], 'Over a full cycle a machine delivers no more energy than it is given.', uniq([eIn, pIn])));
  } else if (!(eIn || pIn || eOut || pOut) && !thrust && !plans.some((p) => p.check === 'first-law' || p.check === 'carnot') && [...power, ...energy].some((f) => f.role === 'excess')) {
    // "excess heat of about 35 W during the loading phase", "puts out about 1.6 kW more heat than it takes from
    // the socket": an excess alone, with neither side given.
    const excess = [...power, ...energy].filter((f) => f.role === 'excess');
    if (movesHeat || s.heatPump || s.cooling) {
      needs.push(need('carnot', ['the power the machine draws', 'the temperatures of the heat source and of where the heat goes'], 'A machine that moves heat may give out more heat than the work it takes, up to its Carnot COP for its two temperatures.', excess));
    } else {
      needs.push(need('first-law', ['the energy or power put in (all of it: electrical, mechanical, chemical, heat)', 'the energy or power got out, measured'], 'Over a full cycle a machine delivers no more energy than it is given.', excess));
    }
  } else if (power.length === 0 && energy.length === 0 && !thrust && SELF_RUNNING_CLAIM_RE.test(text) && !HARVEST_CLAIM_RE.test(text)) {
    // "The weighted wheel is self-running and has turned for three weeks; no output figure is given."
    needs.push(need('first-law', ['the energy or power got out, measured', 'everything that goes in (a self-running machine is said to take nothing)'], 'Over a full cycle a machine delivers no more energy than it is given.', []));
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
}
