/**
 * Several devices in one text — a round-up, a catalogue page, a quote with options A to C, a moderator's
 * queue — each on its own line with its own figures: the check is of one of them, and the figures of the
 * others are set aside (a motor's 2.2 kW output on the next catalogue line is no output of the motor whose
 * input the first line gives).
 *
 * Items are lines that open with a bullet ("-", "•", "A)", "2.") or with a name and a colon or a dash
 * ("Vessa 50:", "Thread 'Bench PSU': ", "Serie M90L, 4 poles:") or a model's name with a number and a full
 * stop ("Calderon 24c. 24 kW …"); an item runs to the next item or to a blank line. Field labels of one
 * device ("Input: 2 kW", "Efficiency: 91 %", "Note: …") are no items. Lines before the first item and
 * after the last (a title, a closing remark) belong to all.
 *
 * Which item: one that, read alone, breaks a law on its own figures (a round-up's one impossible device);
 * else one the text names outside the list with a check that runs or one it lacks ("We order two M90L",
 * "The Ochre Cell is the one people ask about"); else the first with a check that runs. Where no item has
 * a check, nothing is set aside unless the whole text would set one item's figure against another's.
 */
import type { Figure } from '../types';
import type { PlanContext } from './signals';

export interface Item {
  /** Offsets in the text: the item's line(s). */
  start: number;
  end: number;
  /** Its name as written (empty for a bare bullet). */
  label: string;
}

/** A bullet, a letter or a number that opens a list line: "-", "•", "*", "A)", "(b)", "2.", "3)". */
const BULLET_RE = /^[^\S\n]*(?:[-•*–·▪◦]|\(?[A-Za-z]\)|\(?\d{1,2}[.)]|[A-H][.)])[^\S\n]+(?=\S)/u;
/** A name and a colon or a dash that opens a line: "Vessa 50: ", "Thread 'Bench PSU recommendations': ". */
const NAMED_RE = /^[^\S\n]*([\p{Lu}\p{N}'‘“"][\p{L}\p{N}&'’‘“”"+/ .,()-]{0,70}?)[^\S\n]*(?::(?!\d)|[^\S\n][—–][^\S\n])[^\S\n]*(?=\S)/u;
/** A model's name with a number and a full stop that opens a line: "Calderon 24c. ", "Merrowby System 18. ". */
const MODEL_STOP_RE = /^[^\S\n]*(\p{Lu}[\p{L}&'’-]*(?:[^\S\n]+[\p{L}\p{N}&'’-]+){0,3}?[^\S\n]+[\p{L}]{0,3}\d[\p{L}\p{N}-]*)\.[^\S\n]+(?=\S)/u;
/** Words of a field of one device, or of a letter or a report, not of another device: "Input:", "Note:", "From:". */
const FIELD_WORDS_RE =
  /(?<!\p{L})(?:input|output|power|efficiency|cop|scop|eer|heat(?:ing)?|cooling|temperature|thrust|mass|weight|speed|voltage|current|energy|flow|pressure|head|rating|rated|measured|claimed|consumption|draw|supply|load|duration|time|date|price|cost|size|dimensions?|notes?|nb|summary|verdict|conclusions?|sources?|updates?|edit|re|subject|from|to|cc|bcc|sent|reply|response|answer|question|q|comments?|disclaimer|tel|phone|e-?mail|web|methods?|results?|abstract|background|aims?|setup|set-up|test|tests|trial|run|day|week|month|year|total|average|mean|peak|max|min|ambient|outdoor|indoor|hot|cold|side|source|sink|battery|pack|motor|engine|pump|fan|panel|cell|stage|step|figure|fig|table|eq|equation|section|page|p|ref|reference|tl;dr|ps|p\.s|edit|status|action|decision|outcome|recommendation|remarks?|caveats?|warning|caution|specs?|specifications?|features?|pros|cons|claims?|isp|Δv|delta-v|dv|eer|seer|scop|hspf|afue|coefficient|conversion|rating|catalogue|catalog|brochure|datasheet|report|memo|minutes|agenda|refrigerant|quantum|excitation|wavelength|sound|noise|warranty|colou?r|finish|material|frequency|resolution|accuracy|range)(?!\p{L})/iu;

function linesOf(text: string): { start: number; end: number; line: string }[] {
  const out: { start: number; end: number; line: string }[] = [];
  let at = 0;
  for (const line of text.split('\n')) {
    out.push({ start: at, end: at + line.length, line });
    at += line.length + 1;
  }
  return out;
}

/** Words that make no device's name alone: a field, a part, a heading. */
const COMMON_WORD_RE = new RegExp(`^(?:${FIELD_WORDS_RE.source.replace(/^\(\?<!\\p\{L\}\)\(\?:/u, '').replace(/\)\(\?!\\p\{L\}\)$/u, '')}|the|a|an|of|for|and|with|my|our|your|its|this|that|what|why|how|who|when|where|which|it|we|i|you|they|prepared|contact|press|title|device|evidence|equipment|manufacturer|laboratory|lab|applicant|address|client|customer|site|location|owner|author|reviewer|editor|moderator|status|thread|post|model|option|unit|series|serie|type|version|item|entry|submission|case|step|part|exercise|homework|problem|appendix|annex|slide|monday|tuesday|wednesday|thursday|friday|saturday|sunday|mon|tue|tues|wed|thu|thurs|fri|sat|sun|january|february|march|april|may|june|july|august|september|october|november|december|jan|feb|mar|apr|jun|jul|aug|sep|sept|oct|nov|dec)$`, 'iu');

/** A first word of a numbered part of one text, or of a speaker: "Slide", "Step", "Section", "Moderator". */
const HEADING_FIRST_RE = /^(?:in|on|at|see|per|slide|step|part|section|chapter|page|p\.?|item|point|question|answer|exercise|problem|day|week|month|year|phase|stage|round|test|run|trial|figure|fig\.?|table|note|appendix|annex|moderator|reviewer|referee|speaker|panel(?:list)?|comment|response|reply|objection|claim|paragraph|para\.?)$/iu;
/** A word anywhere in a label that makes it a person's, a document's or a part's of one text, not a device's. */
const NOT_A_DEVICE_WORD_RE =
  /^(?:support|customer|agent|founder|judge|reply|vendor|consultant|supplier|manager|engineer|moderator|reviewer|translator|traductor|press|prensa|editor|author|inventor|applicant|examiner|memo|report|section|minutes|notes?|nota|release|diary|log|newsletter|deck|transcript|letter|e-?mail|comment|comments|clarification|municipality|city|council|county|ministry|department|agency|milestone|objective|measure|goals?|task|questions?|complaints?|requests?|quer(?:y|ies)|deliverable|pass|fire|round|day|is|are|was|were|has|have|had|launches|sets|reaches|gives|makes|says|said|news)$/iu;
/** A person's name as a label: "J. Arkwright", "Lorcan F.", "K. L. Varga". */
const PERSON_RE = /^(?:\p{Lu}\.[^\S\n]*)+\p{Lu}\p{Ll}+$|^\p{Lu}\p{Ll}+[^\S\n]+\p{Lu}\.$/u;
/** A date in a label: "3 June", "October 3", "14 Jan". */
const DATE_RE = /(?<!\p{L})(?:\d{1,2}[^\S\n]+(?:jan|feb|mar|apr|may|jun|jul|aug|sep|oct|nov|dec)\p{L}*|(?:jan|feb|mar|apr|may|jun|jul|aug|sep|oct|nov|dec)\p{L}*[^\S\n]+\d{1,2})(?![\p{L}\d])/iu;
/** A section's number as a label's first word: "14.1", "3.a", "A3.1", "DR-FW-2.1". */
const SECTION_NUMBER_RE = /^(?:[\p{Lu}-]*\d+\.(?:\d+|\p{Ll})\.?|[\p{Lu}]{1,3}\d+\.\d+)$/u;
/** A first word that is a verb in the third person or a participle: "Heats", "Fits", "Delivers", "Visited", "Recommended". */
const VERB_S_RE = /^(?:heats|cools|fits|draws|uses|takes|gives|runs|works|needs|holds|turns|delivers|limits|arrives|makes|keeps|charges|stores|lasts|weighs|comes|ships|includes|visited|recommended|removable|rated|tested|measured|claimed|supplied|built)$/iu;
/** A last word that makes a label a quantity's, not a device's: "Heating output", "Ion engine Isp". */
const QUANTITY_RE = /^(?:input|output|power|efficiency|cop|scop|eer|seer|heat(?:ing)?|cooling|temperature|thrust|mass|weight|speed|velocity|voltage|current|energy|flow|pressure|head|rating|consumption|draw|supply|load|duration|time|date|price|cost|size|dimensions?|isp|Δv|delta-v|dv|impulse|capacity|range|yield|gain|loss|losses)$/iu;

/**
 * A label that names a device: a word that is no field or heading with a capital and a model number
 * ("Vessa 50", "Serie M90L, 4 poles", "QB-100"), or two capitalised words ("Ochre Cell", "Model A",
 * "Thread 'Bench PSU recommendations'") — not "Input", "Heat output", "Prepared for", "Why we recommend it".
 */
function namesDevice(label: string): boolean {
  const tokens = label.replace(/['‘’“”"(),]/gu, ' ').split(/[^\S\n]+/u).filter(Boolean);
  // "Option 1", "Model B", "Bid A", "Unit 3": an item by its number or letter.
  if (/^(?:option|model|unit|bid|bidder|variant|version|type|entry|submission|candidate|offer|quote|proposal|design|concept|sample|prototype|rig|car|van|truck|pump|engine|motor|boiler|stand|booth|lot)[^\S\n]+(?:[A-Z]|\d{1,3}[a-z]?|[IVX]+)$/iu.test(label.trim())) return true;
  const own = tokens.filter((t) => !COMMON_WORD_RE.test(t));
  // (Not a field's label, "Heating output at A2/W35", "Claimed Δv"; nor a speaker's or an answer's, "A (support)".)
  // (Nor a heading or a speaker in capitals, "CATALOGUE p. 112", "PRESENTER"; nor a numbered part of one
  // text, "Slide 2.", "Step 1", "Moderator 1 (…)"; nor a quantity, "Ion engine Isp", "Planned Δv".)
  if (own.length === 0 || FIELD_WORDS_RE.test(tokens[0]) || /^[QA]$/u.test(tokens[0]) || /^\p{Lu}{3,}$/u.test(tokens[0])) return false;
  if (HEADING_FIRST_RE.test(tokens[0]) || QUANTITY_RE.test(tokens[tokens.length - 1])) return false;
  // (Nor a person's, a document's, a dateline's or a section's label: "Corvane support (Ana Ruiz)",
  // "J. Arkwright", "Technical DD memo, section 5", "Harrowgate Flats test site, 3 June", "14.1 Vendor",
  // "The MK-3 magnet generator is self-running".)
  const unbalanced = (a: RegExp, b: RegExp) => (label.match(a) ?? []).length !== (label.match(b) ?? []).length;
  if (/^['"‘“]/u.test(label.trim()) && !/^['"‘“][^'"’”]+['"’”]/u.test(label.trim())) return false;
  if (unbalanced(/\(/gu, /\)/gu) || unbalanced(/[‘“]/gu, /[’”]/gu) || (label.match(/["]/gu) ?? []).length % 2 === 1) return false;
  if (tokens.some((t) => NOT_A_DEVICE_WORD_RE.test(t)) || PERSON_RE.test(label.trim()) || DATE_RE.test(label) || SECTION_NUMBER_RE.test(tokens[0])) return false;
  // A title in quotes after a word: "Thread 'My solid-state generator, schematic inside'" (not a slogan
  // in quotes alone, "'Up to 70 % cheaper to run!'").
  if (/^[^'‘“"]*\p{L}[^\S\n]*['‘“"][^'’”"]{3,}['’”"]/u.test(label)) return true;
  if (/^['‘“"]/u.test(label.trim())) return false;
  // (Nor a figure with its unit, "Compressor input about 0.5 kW", "Empty weight 92 kg", nor a verb's
  // opening, "Fits most city bikes", "Delivers 2.4 W".)
  if (/(?<![\p{L}\d.,-])\d[\d.,]*[^\S\n]*(?:(?:million|billion|thousand)[^\S\n]+)?(?:[kMGm]?W|[kMG]?Wh|V|A|mA|°[CF]?|K|kg|g|t|mm|cm|km|m|%|[mµk]?N|s|h|min|bar|psi|hp|PS|rpm|L|mph|km\/h|dB|lbs?|lbf|oz|ft|BTU(?:\/h)?)(?![\p{L}\d])/u.test(label)) return false;
  if (VERB_S_RE.test(tokens[0])) return false;
  const caps = tokens.filter((t) => /^\p{Lu}/u.test(t)).length;
  const ownCaps = own.filter((t) => /^\p{Lu}/u.test(t)).length;
  const numbered = own.some((t) => /\d/u.test(t));
  return (numbered && ownCaps >= 1) || (caps >= 2 && ownCaps >= 1);
}

/** A whole device (not a part of one) named by a common noun: "cargo bike", "inverter generator", "water heater". */
const WHOLE_DEVICE_RE =
  /(?<!\p{L})(?:(?:e-?)?bikes?|bicycles?|cars?|vans?|trucks?|scooters?|boats?|drones?|heaters?|boilers?|furnaces?|stoves?|(?:inverter|diesel|petrol|propane|gas|portable|standby|back-?up|camping|solar)[^\S\n]+generators?|gensets?|generator[^\S\n]+sets?|heat[^\S\n]+pumps?|fridges?|freezers?|coolers?|chillers?|dryers?|driers?|kettles?|cookers?|ovens?|kits?|devices?|machines?|rigs?|rockets?|craft|probes?|sails?|landers?|tugs?|satellites?|launchers?|vehicles?|reactors?|prototypes?|demonstrators?|lifters?|showers?|plants?|stations?|power[^\S\n]?banks?|lanterns?|torches?|flashlights?|chargers?)(?!\p{L})/iu;

/** The head of a list line, up to its first comma, colon, bracket, full stop or "with"/"that"/"which". */
function headOf(rest: string): string {
  return rest.split(/(?<!\d),|,(?!\d)|[:;(]|\.(?:\s|$)|[^\S\n](?:with|that|which|who|at|for|from|on|in|running|rated|drawing|giving)[^\S\n]/u)[0].trim();
}

/**
 * A whole device named at a list line's head by a common noun, as a noun phrase of a few words ("Rob's cargo
 * bike", "A member's cavitation water heater", "Propane inverter generator"), or by a name ("The Hearthstar
 * SG") — not a field or a part of one device ("shaft output 1.32 kW", "Drive motor", "Fits most city bikes").
 */
function deviceHead(rest: string): string | null {
  const head = headOf(rest);
  if (!head || /^[\d±~≈<>]/u.test(head)) return null;
  // (Not a part's size cut off at its unit: "Drum 18 in across".)
  if (/\d$/u.test(head) && /^[^\S\n]*(?:in|inch(?:es)?|cm|mm|m|ft|feet)(?!\p{L})/iu.test(rest.slice(rest.indexOf(head) + head.length))) return null;
  const words = head.split(/[^\S\n]+/u);
  if (FIELD_WORDS_RE.test(words[0]) || QUANTITY_RE.test(words[words.length - 1]) || words.some((w) => NOT_A_DEVICE_WORD_RE.test(w))) return null;
  if (namesDevice(head.replace(/^(?:the|a|an)[^\S\n]+/iu, ''))) return head;
  return words.length <= 6 && WHOLE_DEVICE_RE.test(words[words.length - 1]) && (/^(?:a|an|the|one|another|our|my|his|her|their|someone['’]s)$/iu.test(words[0]) || /^(?:\p{Lu}\p{Ll}+['’]s|\p{Lu}[\p{Ll}-]+)$/u.test(words[0])) ? head : null;
}

/** A list line's label: a bullet's ("• Vessa 50:", "A)", "- Rob's cargo bike: …") or a named line's ("Vessa 50: …"). */
type LineKind = { bullet: string | null; label: string | null };

function lineKind(line: string): LineKind {
  const b = BULLET_RE.exec(line);
  if (b) {
    const marker = b[0].trim().replace(/[\dA-Za-z]+/u, 'n');
    const rest = line.slice(b[0].length);
    const named = NAMED_RE.exec(rest);
    if (named && namesDevice(named[1])) return { bullet: marker, label: named[1].trim() };
    // "A) 3-ton heat pump …", "B) 80,000 BTU/h gas furnace …": options by capital letter (not a clause of
    // one claim, "(a) rated electrical output 30 W;").
    const letter = /^[^\S\n]*(?:\(?([A-H])\)|([A-H])\.(?=[^\S\n]+['‘“"]?\p{Lu}))/u.exec(line);
    if (letter && !/(?:;|,[^\S\n]*(?:and|or))[^\S\n]*$/u.test(line)) return { bullet: marker, label: letter[1] ?? letter[2] };
    return { bullet: marker, label: deviceHead(rest) };
  }
  const n = NAMED_RE.exec(line);
  if (n && n[1].trim().split(/\s+/u).length <= 8 && namesDevice(n[1])) return { bullet: null, label: n[1].trim() };
  const m = MODEL_STOP_RE.exec(line);
  if (m && namesDevice(m[1])) return { bullet: null, label: m[1].trim() };
  return { bullet: null, label: null };
}

/** A heading of a list of several things: a digest, a queue, a round-up, a watch, notes on several. */
const LIST_HEADING_RE =
  /(?<!\p{L})(?:digest|queue|round-?up|roundup|watch|batch|submissions?|this[^\S\n]+(?:week|month)|compared|comparison|options|quotes|booths?|(?<!(?:it|that|this|things|matters)[^\S\n]+)stands?|entries|applications|proposals|threads|posts|campaigns|listings|shortlist|line-?up|(?:two|three|four|five|six|several)[^\S\n]+[\p{L}'-]+)(?!\p{L})/iu;

/**
 * The list items of a text, or none where it holds no list of two items or more. Bulleted lines of one
 * list are all items where two of them or more name a device (a queue's other lines, "A question about
 * night-storage heaters", are its items too); named lines are items each.
 */
export function listItems(text: string): Item[] {
  const lines = linesOf(text).map((l) => ({ ...l, kind: /^[^\S\n]*>/u.test(l.line) || l.line.trim() === '' ? { bullet: null, label: null } : lineKind(l.line) }));
  // Bullet groups: lines with one marker, with only continuation or blank lines between.
  const inGroup = new Set<number>();
  for (let i = 0; i < lines.length; i++) {
    const marker = lines[i].kind.bullet;
    if (marker === null || inGroup.has(i)) continue;
    const group = [i];
    for (let j = i + 1; j < lines.length; j++) {
      if (lines[j].kind.bullet === marker) group.push(j);
      else if (lines[j].line.trim() !== '' && !/^(?:[^\S\n]+|[^\S\n]*[\p{Ll}\d(])/u.test(lines[j].line)) break;
    }
    group.forEach((g) => inGroup.add(g));
    // (Not a patent's claims, "The module of claim 1", nor the parts of one device leaning on each other.)
    const claims = group.some((g) => /(?<!\p{L})(?:of[^\S\n]+(?:any[^\S\n]+(?:preceding|previous|one[^\S\n]+of[^\S\n]+the)[^\S\n]+)?claims?|comprising)(?!\p{L})/iu.test(lines[g].line));
    const devices = claims ? 0 : group.filter((g) => lines[g].kind.label !== null).length;
    // (One device named is enough under a heading of a list of several things: "Moderator's digest",
    // "Crowdfunding watch", "three stands worth the walk".)
    // (Bullets only, of a line or two each: numbered sections of a report are no list of devices.)
    const headed = devices >= 1 && group.length >= 3 && /^[-•*–·▪◦]$/u.test(marker) && group.every((g) => lines[g].line.length <= 300) && LIST_HEADING_RE.test(text.slice(0, lines[group[0]].start));
    if (devices < 2 && !headed) for (const g of group) lines[g].kind = { bullet: null, label: null };
    else for (const g of group) lines[g].kind = { bullet: marker, label: lines[g].kind.label ?? '' };
  }
  const items: Item[] = [];
  let open: Item | null = null;
  for (const l of lines) {
    if (l.line.trim() === '') {
      open = null;
      continue;
    }
    const label = l.kind.label;
    if (label !== null) {
      open = { start: l.start, end: l.end, label };
      items.push(open);
    } else if (open && /^(?:[^\S\n]+|[^\S\n]*[\p{Ll}\d(])/u.test(l.line)) {
      // (A line that goes on the item — indented, or opening in lower case — is the item's; one that opens
      // with a capital ends the list: "We order two M90L.")
      open.end = l.end;
    } else {
      open = null;
    }
  }
  // (One label said again and again is a speaker's in a conversation, not a list of devices.)
  const labels = items.map((i) => i.label.toLowerCase()).filter(Boolean);
  if (new Set(labels).size < labels.length) return [];
  // The list is the longest run of items with nothing but blank lines between them (a title line that
  // looks like an item, above a paragraph, is no item of a list further down).
  let best: Item[] = [];
  let run: Item[] = [];
  for (const i of items) {
    if (run.length > 0 && text.slice(run[run.length - 1].end, i.start).trim() !== '') run = [];
    run.push(i);
    if (run.length > best.length) best = [...run];
  }
  return best.length >= 2 ? best : [];
}

/** Words of a text that name one item, outside the list: its name, or "option A". */
function namedOutside(text: string, items: Item[], item: Item): boolean {
  const outside = items.reduce((t, i) => t.slice(0, i.start) + ' '.repeat(i.end - i.start) + t.slice(i.end), text);
  const name = item.label.replace(/['‘’“”"]/gu, '').trim();
  if (!name) return false;
  const esc = name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  if (name.length === 1) return new RegExp(`(?<!\\p{L})(?:option|model|unit|choice|quote|offer|recommend|go with|order|pick|chose|choose|prefer)[^\\S\\n]+${esc}(?![\\p{L}\\p{N}])`, 'iu').test(outside);
  // The name, or its first word where that is a proper name of three letters or more ("the Vessa", "M90L").
  const first = name.split(/[^\S\n]+/u)[0];
  const firstRe = first.length >= 3 && /^\p{Lu}/u.test(first) ? `|(?<![\\p{L}\\p{N}])${first.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}(?![\\p{L}\\p{N}])` : '';
  return new RegExp(`(?<![\\p{L}\\p{N}])${esc}(?![\\p{L}\\p{N}])`, 'iu').test(outside) || (firstRe !== '' && new RegExp(firstRe.slice(1), 'u').test(outside));
}

/** Words of an item that lean on another item's figures: "as above", "same bus", "likewise", "ditto". */
const LEANS_ON_ANOTHER_RE = /(?<!\p{L})(?:as[^\S\n]+above|as[^\S\n]+before|same[^\S\n]+(?:bus|supply|voltage|conditions?|test|rig|set-?up|source|input|load|as)|likewise|ditto|like[^\S\n]+the[^\S\n]+(?:first|last|previous|other|one[^\S\n]+above))(?!\p{L})/iu;

/** The text with the given items blanked out, their places kept (newlines stay). */
function blank(text: string, items: Item[]): string {
  return items.reduce((t, i) => t.slice(0, i.start) + t.slice(i.start, i.end).replace(/[^\n]/gu, ' ') + t.slice(i.end), text);
}

/** Words set on a figure of an item not checked (see focusOneItem). */
const OTHER_ITEM_NOTE = 'Said of another item of the list';

/**
 * The text as the planner should read it for figures focused on one item: the items whose figures were
 * set aside as another item's blanked out, so that their words (a monopropellant thruster on line A) say
 * nothing of the item checked (a sealed drive on line C).
 */
export function textForFocus(text: string, figures: Figure[]): string {
  if (!figures.some((f) => f.assumption?.startsWith(OTHER_ITEM_NOTE))) return text;
  const items = listItems(text);
  const inItem = (f: Figure, i: Item) => f.start !== null && f.start >= i.start && f.start < i.end;
  // The item checked is the one with figures of its own; every other item is blanked (one with no figures
  // at all too: "B. Electrospray array" says nothing of the drive on line C).
  const checked = items.filter((i) => figures.some((f) => inItem(f, i) && !f.assumption?.startsWith(OTHER_ITEM_NOTE)));
  const others = checked.length === 1 ? items.filter((i) => i !== checked[0]) : items.filter((i) => figures.some((f) => inItem(f, i) && f.assumption?.startsWith(OTHER_ITEM_NOTE)));
  return others.length > 0 && others.length < items.length ? blank(text, others) : text;
}

type Runner = (figures: Figure[], ctx: PlanContext) => { checks: { finding: string; uses: string[] }[]; needs: unknown[] };
type Reader = (text: string) => Figure[];

/**
 * The figures with those of every item but one set aside (see the head of this file), or the figures as
 * they were where the text holds no list. Each item is read again with the other items blanked out
 * (their places kept), so that its figures take their roles from its own words and the text around the
 * list, not from another item's (a second machine's 120 °C is no hot side of the first's 95 °C).
 */
export function focusOneItem(text: string, figures: Figure[], read: Reader, run: Runner): Figure[] {
  const items = listItems(text);
  if (items.length < 2) return figures;
  const inItem = (f: { start: number | null }, i: Item) => f.start !== null && f.start >= i.start && f.start < i.end;
  const withFigures = items.filter((i) => figures.some((f) => inItem(f, i) && f.role !== 'aside'));
  if (withFigures.length < 2) return figures;
  const focused = (item: Item): Figure[] => {
    const others = items.filter((i) => i !== item);
    const blanked = blank(text, others);
    const own = read(blanked).filter((f) => !others.some((i) => inItem(f, i)));
    const set = figures
      .filter((f) => others.some((i) => inItem(f, i)))
      .map((f): Figure => {
        if (f.role === 'aside') return f;
        const other = others.find((i) => inItem(f, i))!;
        const name = other.label ? `“${other.label}”` : 'another line of the list';
        return { ...f, role: 'aside', assumption: `${OTHER_ITEM_NOTE} (${name}), not of the one checked: set aside.` };
      });
    return [...own, ...set].sort((a, b) => (a.start ?? 0) - (b.start ?? 0)).map((f, k) => ({ ...f, id: `f${k + 1}`, text: f.start !== null && f.end !== null ? text.slice(f.start, f.end) : f.text }));
  };
  const wholeBreaks = run(figures, { text }).checks.some((c) => c.finding === 'breaks');
  const runs = withFigures.map((item) => {
    const figs = focused(item);
    return { item, figures: figs, ...run(figs, { text: blank(text, items.filter((i) => i !== item)) }) };
  });
  // (An item that leans on another — "same bus", "as above" — is not judged alone to break a law; nor one
  // whose breaking check takes a figure from another item or from below the list: a closing remark's
  // "three times the heat it draws" is the heat pump's on line A, not the furnace's on line B. What the
  // text says above the list, "each unit was fed 2 kW", is said of every item.)
  const leans = (i: Item) => LEANS_ON_ANOTHER_RE.test(text.slice(i.start, i.end));
  const ownBreak = (r: (typeof runs)[number]) =>
    !leans(r.item) &&
    r.checks.some((c) => c.finding === 'breaks' && c.uses.every((id) => { const f = r.figures.find((x) => x.id === id); return !f || inItem(f, r.item) || (f.start !== null && f.start < items[0].start); }));
  const pick =
    runs.find(ownBreak) ??
    runs.find((r) => (r.checks.length > 0 || r.needs.length > 0) && namedOutside(text, items, r.item)) ??
    runs.find((r) => r.checks.length > 0);
  if (pick) return pick.figures;
  // No item has a check of its own: where the whole text has none that breaks either, the figures stay as
  // read; where it breaks a law only by setting one item's figure against another's (a 5 kW wheel in one
  // post against a 200 W panel in the next), the items are kept apart all the same.
  if (!wholeBreaks) return figures;
  const most = (rs: typeof runs) => [...rs].sort((a, b) => b.figures.filter((f) => f.role !== 'aside').length - a.figures.filter((f) => f.role !== 'aside').length)[0];
  return (runs.find((r) => namedOutside(text, items, r.item)) ?? most(runs.filter((r) => r.needs.length > 0)) ?? most(runs)).figures;
}
