/**
 * Comparisons set aside (the claim reader, shared/claims/reader.ts, pass 3): figures said of
 * something the claim is compared with — a sentence given over to a comparison or a reference value,
 * an earlier prototype, "35 % for conventional engines", "compared with …" — are set aside before
 * the relations are read, so that no check and no derived figure uses them.
 */
import { HEAT_PUMP_RE, sentenceAround, windowStart } from './context';
import { insertInOrder, siOf, type Draft } from './draft';
import type { PercentReading } from './kinds';
import { relateFigures } from './relations';

/**
 * Figures said of something the claim is compared with ("For comparison, conventional designs reach
 * about 35 % efficiency.", "A typical household kettle, by comparison, draws 2 kW.", "45 %, against
 * 35 % for conventional engines"): set aside before the relations are read, so that no check and no
 * derived figure uses them.
 */
export function relate(text: string, drafts: Draft[]): void {
  let compared = drafts.filter((d) => d.role !== 'aside' && saidInComparison(text, d));
  // "It gives 4 W more heat than the 20 W it draws … always the same four watts": a figure said again as
  // "the same" is the earlier one (of the claim's own), not one more. ("makes 8 mN from the same 1 kW", "on
  // the same 10 W": what another device, or this one, is run on again — not a restatement.)
  for (const d of drafts) {
    const before = text.slice(Math.max(0, d.start - 40), d.start);
    if (d.role === 'aside' || d.derived || !/(?<!\p{L})(?:the|that|those|this)[^\S\n]+(?:very[^\S\n]+)?same[^\S\n]+(?:(?:about|roughly|some|nearly)[^\S\n]+)?$/iu.test(before)) continue;
    if (/(?<!\p{L})(?:from|with|on|at|for|using|of|by|to|into|in|under|over)[^\S\n]+(?:(?:exactly|just|precisely)[^\S\n]+)?(?:the|that|those|this)[^\S\n]+(?:very[^\S\n]+)?same[^\S\n]+(?:(?:about|roughly|some|nearly)[^\S\n]+)?$/iu.test(before)) continue;
    const si = siOf(d);
    if (si !== null && drafts.some((e) => e !== d && e.start < d.start && e.kind === d.kind && e.role !== 'aside' && siOf(e) === si)) d.role = 'aside';
  }
  // "The old mill engine worked between 400 °F and 100 °F at 18 %": when every figure is of an earlier
  // device, there is no other: the text is about that one.
  const own = drafts.filter((d) => !d.derived && d.role !== 'aside');
  if (own.length > 0 && own.every((d) => compared.includes(d) && earlierDeviceSaid(text, d))) compared = [];
  // "Even if all 900 W left as a beam, the recoil would be about 3 µN; the thruster, measured at 2.9 µN
  // on 900 W, …": figures of a supposition, where the text also states figures of the same kind plainly.
  const supposed = drafts.filter((d) => {
    if (d.role === 'aside' || d.derived || compared.includes(d)) return false;
    const clause = clauseAround(text, d);
    // ("… if it … would", or an expert's "a heater turning 1 kW into 4 kW would break the first law".)
    if ((SUPPOSITION_RE.test(clause) && CONDITIONAL_RE.test(clause)) || SUPPOSED_OUTCOME_RE.test(clause) || OTHERS_CLAIM_RE.test(clause)) return true;
    // ("Suppose a motor drew 1 kW and gave 1.2 kW; that would break the first law": a sentence that opens
    // with a supposition and says what it would do.)
    const sentence = sentenceAround(text, d.start, d.end);
    if (SUPPOSITION_OPENS_RE.test(sentence) && SUPPOSED_OUTCOME_RE.test(sentence + text.slice(d.end, d.end + 120).split(/[.!?\n]/u)[0])) return true;
    // "Prof. L. proposed repeating it at 5 kW", "a reader asked whether it could do 10 km/s instead",
    // "to build a 2 kW version": a figure proposed or asked about, not one measured or claimed.
    const before = text.slice(windowStart(text, d.start, 0, 80), d.start);
    // "The original report, with a calorimeter of the isoperibolic type, had found an output of 57 W",
    // "Ref. [3] reported 2.4 mN": a cited work's finding, beside the text's own measurement.
    // "the bath was calibrated beforehand with a 25.0 W reference heater", "A control with the switch held
    // open drew 1.9 W", "With the cavity replaced by a water-cooled dummy load absorbing 1.2 kW": a
    // calibration's or a control run's figure, beside the runs' own.
    const sentenceBefore = text.slice(windowStart(text, d.start, 0, 200), d.start);
    // ("Explain why no accelerator, however powerful, could ever make the label read 3.1 × 10⁸ m/s": a figure
    // said to be out of reach.)
    return PROPOSED_BEFORE_RE.test(before) || SCALED_UP_BEFORE_RE.test(before) || ASKED_BEFORE_RE.test(before) || CITED_FINDING_BEFORE_RE.test(sentenceBefore) || CALIBRATION_BEFORE_RE.test(before) || CONTROL_RUN_BEFORE_RE.test(sentenceBefore) || OUT_OF_REACH_BEFORE_RE.test(sentenceBefore);
  });
  // ("The heater takes 140 W; the tube gives off 175 W. If that held for a month, it would have delivered
  // 91 MJ more": an energy or a run supposed over powers stated plainly is the writer's sum, not a figure.)
  const plain = (role: string) => drafts.some((o) => o.kind === 'power' && o.role === role && !o.derived && !supposed.includes(o) && !compared.includes(o));
  const powerLedger = plain('in') && (plain('out') || plain('excess'));
  for (const d of supposed) {
    if (drafts.some((o) => o !== d && o.kind === d.kind && !o.derived && !supposed.includes(o) && !compared.includes(o))) compared.push(d);
    else if (powerLedger && (d.kind === 'energy' || d.kind === 'duration') && CONDITIONAL_RE.test(clauseAround(text, d))) compared.push(d);
  }
  // A unit conversion said in passing ("One BTU per hour is about 0.293 W, so …"): no figure of the device.
  for (const m of text.matchAll(UNIT_CONVERSION_RE)) {
    const from = m.index!;
    const to = from + m[0].length;
    for (const d of drafts) if (!d.derived && d.start >= from && d.end <= to && !compared.includes(d)) compared.push(d);
  }
  // Errata and corrections: the figure put right is superseded, the correct one takes its side where
  // its own words give none.
  for (const [wrong, right] of corrections(text, drafts)) {
    if (!compared.includes(wrong)) compared.push(wrong);
    if (right.role === null && wrong.role !== null && wrong.role !== 'aside') right.role = wrong.role;
  }
  // "so read 3.2 A not 0.32 A", "2.86 × 10⁸ m/s rather than 3.33 × 10⁸": the figure put aside just after the right one.
  for (const d of drafts) {
    if (d.role === 'aside' || d.derived || compared.includes(d)) continue;
    const prev = [...drafts].reverse().find((x) => x.end <= d.start && x.kind === d.kind && !x.derived);
    if (prev && d.start - prev.end <= 30 && NOT_THIS_BETWEEN_RE.test(text.slice(prev.end, d.start))) compared.push(d);
  }
  // "The 3.5 kgf on the swing arm was the stand creeping on its rollers", "the 40 mN turned out to be a
  // thermal artefact": a figure explained away as an artefact of the set-up.
  for (const d of drafts) {
    if (d.role === 'aside' || d.derived || compared.includes(d)) continue;
    const after = EXPLAINED_AWAY_AFTER_RE.exec(text.slice(d.end, d.end + 120));
    if (after && !/(?<!\p{L})(?:not|no|never|nor|rule[sd]?[^\S\n]+out|ruling[^\S\n]+out|excluded?)(?!\p{L})|n[’']t(?!\p{L})/iu.test(after[0])) compared.push(d);
  }
  // "Electricity used this year: 2,840 kWh (last year 3,120 kWh)": an earlier period's figure, in brackets.
  for (const d of drafts) {
    if (d.role === 'aside' || d.derived || compared.includes(d)) continue;
    if (EARLIER_PERIOD_BEFORE_RE.test(text.slice(Math.max(0, d.start - 40), d.start))) compared.push(d);
  }
  // "Dashed line: the 2019 unit it replaces (COP 2.6)": the figure of a machine the claim's replaces.
  for (const d of drafts) {
    if (d.role === 'aside' || d.derived || compared.includes(d)) continue;
    if (/(?<!\p{L})(?:it|they|which|that|this one)[^\S\n]+(?:replaces|replaced|will replace|supersedes|superseded|succeeds)[^\S\n]*[(:,][^\S\n]*(?:[\p{L}-]+[^\S\n]*){0,2}[:=]?[^\S\n]*$/iu.test(text.slice(Math.max(0, d.start - 60), d.start))) compared.push(d);
  }
  // "An earlier version of this story gave the output as 32 kW": a figure withdrawn. ("Readers pointed out
  // that the printed figure was nearly ten times faster than light": what the wrong figure amounts to.)
  for (const d of drafts) {
    if (d.role === 'aside' || compared.includes(d)) continue;
    if (!d.derived && EARLIER_VERSION_BEFORE_RE.test(text.slice(windowStart(text, d.start, 0, 160), d.start))) compared.push(d);
    else if (WRONG_FIGURE_SUBJECT_RE.test(text.slice(windowStart(text, d.start, 0, 160), d.start)) && ERRATUM_CONTEXT_RE.test(text)) compared.push(d);
  }
  // "the shaft output … was printed as 105 hp. It should read 150 hp": the figure put in place of a
  // superseded one takes its side where its own words give none.
  for (const d of compared) {
    if (d.role === null || d.role === 'aside' || !SUPERSEDED_AFTER_RE.test(text.slice(d.end, d.end + 60))) continue;
    const next = drafts.find((y) => y.start >= d.end && y.start - d.end < 120 && y.kind === d.kind && !compared.includes(y));
    if (next && next.role === null) next.role = d.role;
  }
  if (compared.length === 0) return relateFigures(text, drafts);
  const rest = drafts.filter((d) => !compared.includes(d));
  relateFigures(text, rest);
  drafts.length = 0;
  drafts.push(...rest);
  for (const d of compared) {
    d.role = 'aside';
    insertInOrder(drafts, d);
  }
}

/** In brackets before a figure of an earlier period: "(last year 3,120 kWh)", "(previous winter: 4,100 kWh)", "(2023: 2.9)". */
const EARLIER_PERIOD_BEFORE_RE =
  /\([^\S\n]*(?:(?:last|previous|prior|the[^\S\n]+previous|the[^\S\n]+prior)[^\S\n]+(?:year|month|week|winter|summer|season|quarter|heating[^\S\n]+season)(?:['’]s)?|(?:a|one)[^\S\n]+year[^\S\n]+(?:ago|earlier|before)|(?:19|20)\d\d(?:\/\d\d)?)[^\S\n]*(?:[:=]|was|were|it[^\S\n]+was)?[^\S\n]*(?:(?:about|around|roughly|some|nearly)[^\S\n]+)?$/iu;

/** Before a cited work's finding: the work named ("the original report", "ref. [3]", "Bergsten et al. (2019)"), then a verb of finding. */
const CITED_FINDING_BEFORE_RE =
  /(?:(?<!\p{L})(?:[Tt]he|[Tt]heir|[Ii]ts|[Tt]hat)[^\S\n]+(?:original|earlier|previous|first|prior|cited)[^\S\n]+(?:reports?|papers?|stud(?:y|ies)|publications?|articles?|work|experiments?|measurements?|authors?|team|group)(?!\p{L})|(?<!\p{L})[Rr]ef(?:erence)?s?\.?[^\S\n]*\[?\d+\]?|\[\d+(?:[,–-][^\S\n]*\d+)*\]|(?<!\p{L})\p{Lu}\p{L}+(?:[^\S\n]+(?:and|&)[^\S\n]+\p{Lu}\p{L}+|[^\S\n]+et[^\S\n]+al\.?)[^\S\n]*(?:\(\d{4}\)|\[\d+\]))[^.;!?\n]{0,90}?(?<!\p{L})(?:(?:had|have|has)[^\S\n]+)?(?:found|reported|claimed|gave|measured|observed|obtained|quoted|stated|saw|recorded|reached|achieved)(?!\p{L})[^.;!?\n]{0,60}$/u;
/** Just before a calibration's figure: "calibrated beforehand with a", "calibrated with an electrostatic comb delivering". */
const CALIBRATION_BEFORE_RE =
  /(?<!\p{L})(?:calibrat(?:ed|ing|ion)|cross-checked|checked|verified)(?:[^\S\n]+[\p{L}-]+){0,5}?[^\S\n]+(?:with|against|using|by)[^\S\n]+(?:an?|the|its)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,4}?(?:(?:delivering|giving|producing|dissipating|of|rated at|at)[^\S\n]+)?(?:(?:about|some|exactly|nominally)[^\S\n]+)?$/iu;
/** Before a control run's figure: "A control with the switch held open drew", "replaced by a water-cooled dummy load absorbing". */
const CONTROL_RUN_BEFORE_RE =
  /(?<!\p{L})(?:(?:an?|the|in[^\S\n]+(?:an?|the))[^\S\n]+(?:control|blank|null|sham)(?!\p{L})(?:[^\S\n]+(?:run|test|experiment|measurement|series|cell)(?!\p{L}))?(?![^\S\n]+(?:electronics|units?|boards?|circuits?|box(?:es)?|systems?|panels?|valves?|loops?|modules?|software|logic|room|stick|signals?|lines?)(?!\p{L}))|(?:replaced|substituted|swapped)[^\S\n]+(?:by|with|for)[^\S\n]+(?:an?|the)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,3}?(?:dummy|blank|inactive|inert|control|sham)(?!\p{L}))[^.;!?\n]{0,90}$/iu;
/** Before a figure said to be out of reach: "no accelerator, however powerful, could ever make it read", "can never reach". */
const OUT_OF_REACH_BEFORE_RE =
  /(?:(?<!\p{L})(?:no|nothing)(?:[^\S\n]+[\p{L}-]+){0,3}?(?:[^\S\n]*,[^,;.!?\n]{1,40},)?[^\S\n]+(?:can|could|will|would)(?:[^\S\n]+ever)?|(?<!\p{L})(?:can|could|will)[^\S\n]+never)(?!\p{L})[^.;!?\n]{0,50}?(?<!\p{L})(?:reach|read|exceed|achieve|attain|hit|travel(?:[^\S\n]+at)?|go|surpass|beat|top)(?:[^\S\n]+(?:as[^\S\n]+(?:high|fast|far)[^\S\n]+as|beyond|past|above|over))?[^\S\n]*$/iu;
/** A unit conversion: "One BTU per hour is about 0.293 W", "1 kWh equals 3.6 MJ", "a horsepower is roughly 746 W". */
const UNIT_CONVERSION_RE =
  /(?<![\p{L}\p{N}])(?:[Oo]ne|1|[Aa](?:[^\S\n]+single)?)[^\S\n]+(?:BTUs?|British thermal units?|kWh|kilowatt-hours?|calories?|kcal|horsepower|hp|PS|therms?|watt-hours?|Wh|foot-pounds?|pounds?-force|lbf|electronvolts?|eV)(?:[^\S\n]+(?:per|an?|each)[^\S\n]+(?:hour|second|minute))?[^\S\n]+(?:is|equals|=|≈|is equal to|corresponds to|comes to)[^\S\n]+(?:(?:about|roughly|around|approximately|some|close to)[^\S\n]+)?[\d.,]+(?:[^\S\n]*[×x][^\S\n]*10[⁰-⁹⁻]+)?[^\S\n]*[\p{L}/·°]+/gu;
/** A text that corrects itself: an erratum, a correction notice, an update, or its writer owning an error. */
const ERRATUM_CONTEXT_RE =
  /(?<!\p{L})(?:errat(?:um|a)|corrections?|clarifications?|updated?|amended|(?:an?|the)[^\S\n]+(?:earlier|previous|original)[^\S\n]+version|(?:our|my)[^\S\n]+(?:error|mistake|typo|misprint)|we[^\S\n]+(?:wrongly|mistakenly|incorrectly|erroneously))(?!\p{L})/iu;
/** Just before a corrected figure: "The correct average load was", "the correct figure is", "should have read", "corrected to". */
const CORRECT_BEFORE_RE =
  /(?<!\p{L})(?:(?:the[^\S\n]+)?correct(?:ed)?(?:[^\S\n]+[\p{L}-]+){0,3}?[^\S\n]*(?:is|was|were|are|reads?|should be|of|:)|the[^\S\n]+(?:real|actual|true)[^\S\n]+(?:output|input|figure|value|power|reading|result|draw|efficiency|speed|thrust)s?[^\S\n]+(?:is|was|were|are|came[^\S\n]+to)|should(?:[^\S\n]+have)?[^\S\n]+(?:read|been|be)|(?:corrected|revised|amended|changed)(?:[^\S\n]+(?:down|up))?[^\S\n]+to)[^\S\n]*(?:[:"“'‘][^\S\n]*)?(?:(?:about|around|roughly|some|only|just)[^\S\n]+)?$/iu;
/** Between a wrong figure and the right one: the error owned ("That was our error.", "That is wrong by a factor of a thousand:"). */
const ERROR_SAID_RE =
  /(?<!\p{L})(?:(?:was|is|were|are)[^\S\n]+(?:our|my|an?|the)[^\S\n]+(?:error|mistake|typo|misprint|slip(?:-up)?)|(?:was|is|were|are)[^\S\n]+(?:wrong|incorrect|in error|mistaken)|wrong[^\S\n]+by[^\S\n]+a[^\S\n]+factor|(?:our|my)[^\S\n]+(?:error|mistake)|wrongly|mistakenly|incorrectly|erroneously|in error|correction[^\S\n]*[:—–-]|(?:I|we|had|they|he|she)[^\S\n]+(?:forgot|overlooked|misread|left[^\S\n]+out)|(?:on|read[^\S\n]+off)[^\S\n]+the[^\S\n]+wrong[^\S\n]+(?:range|scale|setting|channel))(?!\p{L})/iu;
/** Between the right figure and the one it replaces, said just after: "3.2 A not 0.32 A", ", instead of". */
const NOT_THIS_BETWEEN_RE = /^[^\S\n]*[,;(]?[^\S\n]*(?:and[^\S\n]+)?(?:not|instead[^\S\n]+of|rather[^\S\n]+than|in[^\S\n]+place[^\S\n]+of)[^\S\n]+(?:the[^\S\n]+)?$/iu;
/** After a figure, in its sentence: the figure explained away ("was the stand creeping", "turned out to be a thermal artefact"). */
const EXPLAINED_AWAY_AFTER_RE =
  /^[^.;!?\n]{0,60}?(?<!\p{L})(?:was|were|is|are|turned[^\S\n]+out[^\S\n]+to[^\S\n]+be|came[^\S\n]+from|was[^\S\n]+caused[^\S\n]+by|was[^\S\n]+due[^\S\n]+to|(?:was|were)[^\S\n]+traced[^\S\n]+to|traced[^\S\n]+to)[^\S\n]+(?:(?:just|only|simply|all|entirely|really|actually|in[^\S\n]+fact)[^\S\n]+)?(?:(?:an?|the|our|its)[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,3}?(?:artefacts?|artifacts?|spurious|creep(?:ing|s)?|drift(?:ing|s)?|thermal[^\S\n]+(?:expansion|drift|bowing)|air[^\S\n]+currents?|convection|buoyancy|interference|pick-?up|(?:cable|lead|wire)[^\S\n]+(?:forces?|drag|tension|pull)|magnetic[^\S\n]+(?:interaction|coupling)|misreading|mis-?calibration|(?:air|gas)[^\S\n]+(?:heating|moving|flow(?:ing)?|movement|expanding)|heating[^\S\n]+(?:of[^\S\n]+)?(?:the[^\S\n]+)?(?:air|gas|balance|arm|stand)|vibrations?|noise|(?:a|the)[^\S\n]+loose[^\S\n]+(?:cable|wire|lead|connector|fibre|fiber))(?!\p{L})/iu;
/** Before what a wrong figure amounts to, in its sentence: "the printed figure was nearly", "the misprinted value implied". */
const WRONG_FIGURE_SUBJECT_RE =
  /(?<!\p{L})(?:the|that|this)[^\S\n]+(?:printed|misprinted|wrong|erroneous|incorrect|mistaken|withdrawn|original|earlier)[^\S\n]+(?:figure|value|number|speed|reading|result)s?(?!\p{L})[^.;!?\n]{0,80}$/iu;
/** Before a figure withdrawn: "An earlier version of this story gave the output as". */
const EARLIER_VERSION_BEFORE_RE =
  /(?<!\p{L})(?:an?|the)[^\S\n]+(?:earlier|previous|original|first)[^\S\n]+(?:version|edition|draft)(?:[^\S\n]+of[^\S\n]+(?:this|the)[^\S\n]+[\p{L}-]+)?[^\S\n]+(?:gave|said|stated|put|reported|had|listed|quoted|printed|showed|(?:incorrectly|wrongly|mistakenly)[^\S\n]+\p{L}+)(?:[^.;!?\n]|(?<=(?<!\p{L})(?:Mr|Mrs|Ms|Dr|Prof|St|Mt|No|Co|Inc|Ltd|vs|approx|ca))\.){0,80}$/iu;

/**
 * Pairs of a wrong figure and the figure that puts it right, of the same kind and another value, the
 * right one after: "stated … an average load of 4 kW …. The correct average load was 400 W" (the words
 * of a correction just before the right one), or in a text that corrects itself "said … 310,000 km/s.
 * That was our error. The preprint reports 299,700 km/s" (the error owned between the two).
 */
function corrections(text: string, drafts: Draft[]): [Draft, Draft][] {
  const pairs: [Draft, Draft][] = [];
  const erratum = ERRATUM_CONTEXT_RE.test(text);
  for (const right of drafts) {
    if (right.derived || right.role === 'aside') continue;
    // (Of the figures before it of its kind, the last with its side, where it has one: "a 2 kW output from a
    // 500 W input … the real output was 450 W" corrects the output.)
    const before = [...drafts].reverse().filter((x) => x.end <= right.start && x.kind === right.kind && !x.derived && x.role !== 'aside');
    const wrong = (right.role !== null && before.find((x) => x.role === right.role)) || before[0];
    if (!wrong || right.start - wrong.end > 400) continue;
    const a = siOf(wrong);
    const b = siOf(right);
    if (a === null || b === null || Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b))) continue;
    const between = text.slice(wrong.end, right.start);
    // (An error asked about is none owned: "asked whether this was a misprint".)
    const owned = ERROR_SAID_RE.exec(between);
    const asked = owned !== null && /(?<!\p{L})(?:whether|if)(?!\p{L})[^.;!?\n]{0,30}$/iu.test(between.slice(0, owned.index));
    // ("Correction from the team: 26 hours, not 36": the figure put right named by its bare number after "not".)
    const not = /^[^\S\n]*(?:,|\(|—|–|[^\S\n]-)?[^\S\n]*not[^\S\n]+(?:the[^\S\n]+)?(?:(?:stated|reported|original|published|printed|quoted)[^\S\n]+)?(\d[\d,.]*\d|\d)(?![\d.,]*[^\S\n]*[\p{L}%°])/iu.exec(text.slice(right.end, right.end + 40));
    const wrongNumber = /^[^\d]{0,3}(\d[\d,.]*\d|\d)/u.exec(text.slice(wrong.start, wrong.end))?.[1];
    const notThat = not !== null && wrongNumber !== undefined && not[1] === wrongNumber;
    if (CORRECT_BEFORE_RE.test(text.slice(windowStart(text, right.start, wrong.end, 80), right.start)) || (erratum && owned && !asked) || notThat) pairs.push([wrong, right]);
  }
  return pairs;
}

/** A sentence that speaks of the claim's own device (so its figures are not merely a comparison). */
/** Words that set the claim's device against what was said before it. */
const CONTRAST_RE = /(?<!\p{L})(?:in contrast|by contrast|on the other hand|instead|whereas|by comparison|in comparison)(?!\p{L})/iu;

/**
 * "For a 10 kW laser the photon thrust is 33 µN; our drive, in contrast, gave 4 mN": a figure in a
 * clause that does not speak of the claim's own device, when another clause of the sentence sets the
 * claim's device against it.
 */
function inContrastedClause(text: string, d: Draft): boolean {
  const head = text.slice(windowStart(text, d.start, 0, 400), d.start).split(/[.!?]["”’')\]]*\s|\n/u).pop()!;
  const stop = /[.!?]["”’')\]]*(?:\s|$)|\n/.exec(text.slice(d.end, d.end + 400));
  const full = head + text.slice(d.start, stop ? d.end + stop.index : d.end + 400);
  const cuts = [0, ...[...full.matchAll(/[;:]|,[^\S\n]*(?=(?:whereas|while|but)(?!\p{L}))/gu)].map((m) => m.index!), full.length];
  const clauses = cuts.slice(1).map((e, k) => full.slice(cuts[k], e));
  const mine = clauses.find((_, k) => cuts[k] <= head.length && head.length < cuts[k + 1]);
  return clauses.length > 1 && mine !== undefined && !OWN_DEVICE_RE.test(mine) && clauses.some((c) => c !== mine && OWN_DEVICE_RE.test(c) && CONTRAST_RE.test(c));
}

/** Before a percentage, in its clause: a comparison with the percentage said just before ("38 %, against 33 % for"). */
const COMPARED_PERCENT_BETWEEN_RE = /(?<!\p{L})(?:against|compared (?:with|to)|in comparison (?:with|to)|as against|versus|vs(?:\.|(?![-\d]))|whereas|while|unlike|than)(?!\p{L})/iu;

/**
 * A percentage with no word of its own that is the other side of a comparison with a percentage read
 * just before ("a power-conversion efficiency of 24.6 %, against 22 % for the reference cell";
 * "… 38 % efficient. For comparison, the baseline engine reaches 33 %."): the same kind of figure. A
 * heat pump's COP compared with another machine's percentage of 100 % or less is that machine's
 * efficiency. (The comparison itself is set aside in `relate`.)
 */
export function comparedPercent(text: string, start: number, end: number, drafts: Draft[]): PercentReading {
  const partner = [...drafts].reverse().find((d) => (d.kind === 'efficiency' || d.kind === 'cop' || d.kind === 'quantum-efficiency') && !d.derived && /%/.test(text.slice(d.start, d.end)));
  if (!partner) return null;
  const sentence = sentenceAround(text, start, end);
  const between = text.slice(partner.end, start);
  const sameSentence = sentenceAround(text, partner.start, partner.end) === sentence;
  const compared = sameSentence
    ? COMPARED_PERCENT_BETWEEN_RE.test(between) || OTHERS_AFTER_RE.test(text.slice(end, end + 60))
    : COMPARISON_SENTENCE_RE.test(sentence) && !/[.!?]\s[^.!?]*[.!?]\s/.test(between);
  if (!compared) return null;
  const value = Number((/^[\d.,]+/.exec(text.slice(start, end))?.[0] ?? '').replace(',', '.'));
  if (partner.kind === 'cop') {
    if (HEAT_PUMP_RE.test(text.slice(end, end + 60)) || value > 100) return { kind: 'cop', role: partner.role === 'cooling' ? 'cooling' : 'heating', factor: 0.01, unit: '' };
    return { kind: 'efficiency', factor: 1, unit: '%' };
  }
  return partner.kind === 'quantum-efficiency' ? { kind: 'quantum-efficiency', factor: 0.01, unit: '' } : { kind: 'efficiency', factor: 1, unit: '%' };
}

const OWN_DEVICE_RE = /(?<!\p{L})(?:our|we|us|my|this (?:device|machine|unit|engine|motor|generator|design|cell|module|drive|thruster|system|invention|prototype)|the (?:claimed|invention|inventors?|applicants?|authors?|prototype)|claims?|claimed|invention)(?!\p{L})/iu;
/** A sentence given over to a comparison or a reference value. */
const COMPARISON_SENTENCE_RE =
  /(?<!\p{L})(?:for|by|in) comparison(?!\p{L})|(?<!\p{L})for reference(?!\p{L})|(?<!\p{L})as (?:a )?(?:reference|benchmark|yardstick)(?!\p{L})|^[\s"“(]*(?:(?:a|an|the)[^\S\n]+)?(?:typical|conventional|ordinary|standard(?![^\S\n]+(?:test|conditions?|deviation|atmosphere|temperature|pressure|rating))|commercial|existing|competing|comparable|today's|older|earlier|previous|mainstream|off-the-shelf|state-of-the-art|best commercial|best available)(?!\p{L})/iu;
/** Right after a figure: whose it is, when it is another machine's ("35 % for conventional engines"). */
const OTHERS_AFTER_RE =
  /^[^\S\n]*(?:\p{L}+[^\S\n]+){0,2}?(?:for|of|in|from|by)[^\S\n]+(?:(?:a|an|the|most|many|all)[^\S\n]+)?(?:typical|conventional|ordinary|standard|commercial|existing|competing|comparable|today's|current|older|earlier|previous|mainstream|off-the-shelf|state-of-the-art|other|rival|reference|baseline|benchmark|control)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:engines?|motors?|units?|designs?|models?|devices?|machines?|thrusters?|cells?|panels?|modules?|pumps?|fridges?|refrigerators?|freezers?|systems?|generators?|turbines?|plants?|cars?|vehicles?|batter(?:y|ies)|boilers?|lamps?|bulbs?|LEDs?|rockets?|drives?|ones|counterparts?|technolog(?:y|ies)|products?|heaters?|chargers?|converters?|inverters?|coolers?|chillers?|conditioners?)(?!\p{L})/iu;
/** Right before a figure, in its clause: "compared with", "against", "versus", "whereas typical ones reach". */
/** Before a figure of what the device stands in for: "as much light as a", "replacing the", "instead of a", "equivalent to a". */
const STANDS_IN_BEFORE_RE = new RegExp(
  '(?<!\\p{L})(?:' +
    // ("as much as 5 kW" is a hedge, "a rate equivalent to 60 kW" a restatement: the thing compared with needs its article.)
    '(?:as[^\\S\\n]+(?:much|bright|strong|warm|powerful|well)(?:[^\\S\\n]+(?:light|heat|warmth|output|brightness|air|lift|thrust))?[^\\S\\n]+as|(?:the[^\\S\\n]+)?same[^\\S\\n]+(?:light|heat|brightness|output|light output|push|thrust|pull|lift|power|torque|performance|speed|range|punch|acceleration|results?|effect|work|cooling|heating)[^\\S\\n]+as|equivalent to)[^\\S\\n]+(?:(?:a|an|the|its|their|our|one)[^\\S\\n]+)' +
    '|(?:replac(?:es|ed|ing|e)|in place of|instead of|stands? in for|does the (?:job|work) of|matches|rivals)[^\\S\\n]+(?:(?:a|an|the|its|their|our|one)[^\\S\\n]+)?' +
    // ("more push than a 9.9 hp petrol outboard", "quieter than any 2 kW genset", "beats a 40 % diesel": another machine.)
    '|(?:(?:more|less|[\\p{L}]+er)(?:[^\\S\\n]+[\\p{L}-]+)?[^\\S\\n]+than|beats?|beating|outperforms?|outperforming|outpaces?|outdoes|outruns?)[^\\S\\n]+(?:a|an|any)[^\\S\\n]+' +
    ')(?:(?:old|older|typical|standard|conventional|ordinary)[^\\S\\n]+)?(?:[\\p{L}-]+[^\\S\\n]+)?$',
  'iu',
);
/** Right after such a figure: "60 W-equivalent", "60 W equivalent", "a 100 W equiv. bulb". */
const EQUIVALENT_AFTER_RE = /^[^\S\n]*[-–]?[^\S\n]*(?:equivalent|equiv\.?|replacement)(?!\p{L})/iu;
const COMPARED_BEFORE_RE =
  /(?<!\p{L})(?:compared (?:with|to)|in comparison (?:with|to)|as against|as opposed to|versus|vs(?:\.|(?![-\d]))|whereas|while (?:typical|conventional|ordinary|standard|commercial|existing)|unlike)(?!\p{L})[^.;!?\n]{0,50}$/iu;
/**
 * "Our previous prototype reached 35 % at 800 W": an earlier device, not the one claimed; in a sentence
 * that names both ("the earlier box gave 500 W from 100 W; the new unit gave 90 W"), the clause of the
 * earlier one.
 */
/** Right before old machines: someone keeps them ("restores", "collects", "repairs", "rebuilds"). */
const KEEPER_VERB_BEFORE_RE = /(?<!\p{L})(?:restor(?:es|ed|ing|e)|collect(?:s|ed|ing)?|repair(?:s|ed|ing)?|rebuild(?:s|ing)?|rebuilt|fix(?:es|ed|ing)?|maintain(?:s|ed|ing)?|restorer[^\S\n]+of|collector[^\S\n]+of)[^\S\n]+(?:(?:the|some|a[^\S\n]+few|many)[^\S\n]+)?$/iu;
/** Between a figure and the earlier device after it: the figure is the earlier device's ("the 88 % of its", "2 kW for the", "(the"). */
const ATTACHED_TO_EARLIER_RE = /^[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,2}?(?:of|for|from|on|by|in|with)[^\S\n]+(?:(?:its|the|their|our|my|an?|this|that)[^\S\n]+)?$|^[^\S\n]*(?:\(|[-–—:])?[^\S\n]*(?:(?:its|the|their|our|my|an?)[^\S\n]+)?$/iu;
/** The earlier device is the sentence's subject, named before its figures ("Our previous prototype reached 35 % at 800 W"), or its figures are said to be its ("… were measured on the old unit"). */
const EARLIER_SUBJECT_RE = /(?<!\p{L})(?:were|was|are|is)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,3}?(?:on|of|for|from|with|by)[^\S\n]+(?:(?:its|the|their|our|my|an?|this|that)[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+)?(?:previous|earlier|older|former|first-generation|last year's|original|old|predecessor)(?!\p{L})/iu;
function earlierDeviceSaid(text: string, d: Draft): boolean {
  const sentence = sentenceAround(text, d.start, d.end);
  // "85 mN …, far more than earlier devices of the same kind": the earlier devices are what the
  // claim's figure, said before them, is set above; they have no figure of their own here.
  let earlier = EARLIER_DEVICE_RE.exec(sentence);
  // ("My grandad restores old steam engines and says the launch engine he is rebuilding is 9 % efficient":
  // old machines someone restores or collects are a pastime, not an earlier device the figures are of.)
  if (earlier && KEEPER_VERB_BEFORE_RE.test(sentence.slice(Math.max(0, earlier.index - 25), earlier.index))) earlier = null;
  // ("the magnetron out of an old microwave oven (running at about 20 watts)": an old machine parts were taken
  // from is no earlier version of the device.)
  if (earlier && /(?<!\p{L})(?:out[^\S\n]+of|(?:salvaged|taken|pulled|scavenged|stripped|removed|recovered|robbed)[^\S\n]+(?:out[^\S\n]+of|from|off)|off)[^\S\n]+(?:an?|the|my|our|some)[^\S\n]+$/iu.test(sentence.slice(Math.max(0, earlier.index - 25), earlier.index))) earlier = null;
  const at = text.lastIndexOf(sentence, d.start);
  // ("replaced the old oil boiler … with a ground-source heat pump, … it delivers 3.2": the new one's figure.)
  const replacedWith = /(?<!\p{L})replac(?:ed|es|ing)[^\S\n]+(?:the|its|their|our|my|an?)[^\S\n]+(?:old|previous|earlier|former|original)(?!\p{L})[^.;!?\n]*?[^\S\n]with[^\S\n]/iu.exec(sentence);
  if (replacedWith && at >= 0 && d.start - at > replacedWith.index + replacedWith[0].length) return false;
  if (earlier && at >= 0 && d.start - at < earlier.index && ABOVE_BEFORE_RE.test(sentence.slice(0, earlier.index)) && !/\d/u.test(sentence.slice(earlier.index))) return false;
  // ("The new inverter takes 48 V at 25 A and delivers 1,140 W, a conversion that beats the 88 % of its
  // previous model": a figure said well before the earlier device, and not of it, is the claim's own.)
  if (earlier && at >= 0 && d.end - at <= earlier.index && !ATTACHED_TO_EARLIER_RE.test(sentence.slice(d.end - at, earlier.index)) && !EARLIER_SUBJECT_RE.test(sentence.slice(0, earlier.index + earlier[0].length))) return false;
  if (earlier && !LATEST_DEVICE_RE.test(sentence)) return true;
  const clause = clauseAround(text, d);
  return EARLIER_DEVICE_RE.test(clause) && !LATEST_DEVICE_RE.test(clause) && LATEST_DEVICE_RE.test(sentence);
}
/** The clause of a figure: its sentence cut at semicolons, colons and ", but / while / whereas". */
function clauseAround(text: string, d: Draft): string {
  const sentence = sentenceAround(text, d.start, d.end);
  const at = sentence.indexOf(text.slice(d.start, d.end));
  const cuts = [0, ...[...sentence.matchAll(/[;:]|,[^\S\n]*(?=(?:but|while|whereas|yet)(?!\p{L}))/gu)].map((m) => m.index! + 1), sentence.length];
  for (let k = 0; k + 1 < cuts.length; k++) if (at >= cuts[k] && at < cuts[k + 1]) return sentence.slice(cuts[k], cuts[k + 1]);
  return sentence;
}
/**
 * Right after a figure: it was corrected to another ("was corrected to 4.5 %", "since revised down to 2 mN"),
 * or an erratum puts another in its place ("the value 2.4 W in Table 2 should read 4.2 W", "was printed as
 * 0.30. It should read 3.0").
 */
const SUPERSEDED_AFTER_RE =
  /^(?:[^.;!?\n]{0,30}?(?<!\p{L})(?:was|were|has been|have been|had been|since|later|then)?[^\S\n]*(?:corrected|revised|amended|lowered|reduced|cut|changed)[^\S\n]+(?:down[^\S\n]+)?to(?!\p{L})|(?:[^.;!?\n\d]|(?:Table|Fig\.?|Figure|Eq\.?|row|line|page|p\.)[^\S\n]*[\dA-Z]+){0,30}?(?:[.;][^\S\n]+(?:it|this|that|the (?:value|figure|number))[^\S\n]+)?(?<!\p{L})should(?:[^\S\n]+have)?[^\S\n]+(?:read|been|be)(?!\p{L}))/iu;
/**
 * Right after a figure: the writer puts it right in the same sentence ("a Δv of 7.2 km/s in the spring, or
 * rather 6.1 km/s once we redid the sums", "5 kW — make that 4.6 kW", "3 kW, I mean 3.5"): the later figure
 * is the claim's.
 */
const PUT_RIGHT_AFTER_RE =
  /^[^.;!?\n\d]{0,40}?(?:,|—|–|\(|[^\S\n]-)[^\S\n]*(?:or[^\S\n]+(?:rather|more[^\S\n]+(?:exactly|precisely|accurately))|make[^\S\n]+that|I[^\S\n]+mean|sorry|correction)(?!\p{L})[^\S\n]*[,:]?[^\S\n]*(?:(?:about|around|roughly|some|only|just|nearer|closer to)[^\S\n]+)?\d/iu;
/** Just before a figure: a verb denied ("does not produce", "is not", "never gave"), with the figure perhaps in quotes. */
const DENIED_BEFORE_RE = /(?<!\p{L})(?:(?:does|did|do|is|was|were|are|has|have|had)(?:n['’]t|[^\S\n]+not)|not|never)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?["“‘']?(?:about[^\S\n]+)?$/iu;
/** Right after a denied figure: the right one follows ('", it produces 3.3 µN', "but 300 W", "; rather …", "— only …"). */
const RIGHTED_AFTER_RE = /^["”’']?[^\S\n]*(?:[,;:—–]|[^\S\n]-)?[^\S\n]*(?:but|rather|instead|only|it(?:['’]s)?|it[^\S\n]+(?:is|was|produces|produced|gives|gave|makes|made|delivers|delivered))(?!\p{L})[^.;!?\n]{0,30}?\d/iu;
/** Just before a figure put right by the one before it: "300 W, not 3 kW", "3.3 µN — not 3.3 mN". */
const RIGHTED_BEFORE_RE = /\d[^\S\n]*\p{L}{0,5}[^\S\n]*(?:,|—|–|[^\S\n]-)[^\S\n]*not[^\S\n]+["“‘']?$/iu;
/** Just before a figure: what a wrong figure said earlier would be ("the first figure is four times"). */
const WRONG_FIGURE_BEFORE_RE = /(?<!\p{L})(?:the|that|this)[^\S\n]+(?:first|original|earlier|old|printed|wrong|erroneous|incorrect|mistaken|misprinted|published|uncorrected)[^\S\n]+(?:figure|number|value|speed|claim|version|reading)[^\S\n]+(?:is|was|would[^\S\n]+be|would[^\S\n]+have[^\S\n]+been|came[^\S\n]+to|amounts?[^\S\n]+to|equals?)[^\S\n]+(?:(?:about|some|roughly|nearly|over|more[^\S\n]+than)[^\S\n]+)?$/iu;
/** A supposition: "if", "even if", "were it", "suppose", "supposing". */
const SUPPOSITION_RE = /(?<!\p{L})(?:if|even if|were it|suppose|supposing|assuming|had it)(?!\p{L})/iu;
/** A sentence that opens with a supposition: "Suppose …", "Imagine …", "Say …", "Let's say …". */
const SUPPOSITION_OPENS_RE = /^[^\S\n]*(?:[-–—•*"“‘'(][^\S\n]*)?(?:suppose|supposing|imagine|say|assume|assuming|let(?:'s|’s| us) (?:say|suppose|assume|imagine)|picture|consider)(?!\p{L})/iu;
/** What a supposed case would do to a law or a bound: "would break the first law", "would beat a photon rocket". */
const SUPPOSED_OUTCOME_RE = /(?<!\p{L})(?:would|could only)[^\S\n]+(?:(?:clearly|plainly|certainly|then|also)[^\S\n]+)?(?:break|violate|beat|exceed|contradict|defy|outdo|be impossible|need|require|mean)(?!\p{L})/iu;
/** Others' claims beside the one weighed: "Competitors claim their boxes give …", "rival makers advertise …". */
const OTHERS_CLAIM_RE = /(?<!\p{L})(?:competitors?|rivals?|rival (?:makers?|firms?|companies|designs?)|other (?:makers?|firms?|companies|inventors?|sellers?|designs?)|others)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:claim|claims|advertise|advertises|promise|promises|say|says|quote|quotes|sell|sells)(?!\p{L})/iu;
/** Just before a figure proposed, planned or suggested for a later test or build. */
const PROPOSED_BEFORE_RE =
  /(?<!\p{L})(?:(?:target(?:ed)?[^\S\n]+(?:product|market|version|model)|planned[^\S\n]+(?:product|version|model)|roadmap|next[^\S\n]+product)[^\S\n]*:[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,2}|(?:propos\w*|suggest\w*|offer\w*|plans?|planned|planning|intends?|hopes?|wants?|raising [^.;!?\n]{0,40}?)[^\S\n]+(?:to[^\S\n]+)?(?:repeat\w*|build\w*|test\w*|try\w*|tried|run\w*|scal\w*|mak\w*|develop\w*|launch\w*|offer\w*|sell\w*)(?:[^\S\n]+(?:it|them|the[^\S\n]+[\p{L}-]+))?(?:[^\S\n]+up)?(?:[^\S\n]+(?:at|with|to|on))?(?:[^\S\n]+(?:an?|the))?|(?:plans?|planned|planning|promis\w*|announc\w*|is preparing|prepares)[^\S\n]+(?:an?|the)(?:[^\S\n]+(?:larger|bigger|smaller|new|later|future|next|second|home|commercial))?)[^\S\n]*$/iu;
/** Just before a figure asked about: "asked whether 3 km/s … was possible", "whether a reduced power of 50 W had been tried". */
/** Just before a size the device is to be scaled up to: "asks for £250,000 to scale it up to 50 hp", "will scale the design up to a". */
const SCALED_UP_BEFORE_RE = /(?<!\p{L})(?:to|will|would|could|can|should|and|then|plans?[^\S\n]+to|hopes?[^\S\n]+to)[^\S\n]+scale[^\S\n]+(?:(?:it|them|this|that|production|output|(?:the|its|their)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?[\p{L}-]+)[^\S\n]+)?up[^\S\n]+(?:to|into)[^\S\n]+(?:(?:an?|some|about|around|roughly)[^\S\n]+)?$/iu;
const ASKED_BEFORE_RE = /(?<!\p{L})(?:asked|asks|asking|wondered|wonders|wanted to know)[^\S\n]+(?:(?:us|them|him|her|me|the \p{L}+)[^\S\n]+)?(?:whether|if)(?!\p{L})[^.;!?\n]{0,50}$/iu;
/** Right after a figure: the device it belongs to was replaced by the one claimed ("the 9 kW oil boiler it replaced"). */
const REPLACED_AFTER_RE =
  /^[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,3}?(?:(?:that|which)[^\S\n]+)?(?:it|they|the (?:new|present) [\p{L}-]+)[^\S\n]+(?:replaced|replaces|will replace|is (?:meant|designed|intended|due) to replace|is to replace|succeeds|supersedes|superseded)(?!\p{L})/iu;
/** Right after a figure: "of its predecessor", "of the model it succeeds". */
const PREDECESSOR_AFTER_RE = /^[^\S\n]*(?:of|for|from)[^\S\n]+(?:its|their|the)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:predecessors?|forerunners?)(?!\p{L})/iu;
/** Just before a figure set against the claim's: "next to the", "against about", "than the", "short of the". */
const SET_AGAINST_BEFORE_RE = /(?<!\p{L})(?:next to|against|than|beside|alongside|short of|unlike)(?:[^\S\n]+(?:the|about|roughly|some|around|nearly|only|just))*[^\S\n]*$/iu;
/** Right after such a figure: another device's ("for a petrol outboard", "of a Hall thruster", "for the production engine"). */
const ANOTHER_DEVICE_AFTER_RE = new RegExp(
  `^[^\\S\\n]*(?:for|of|from|in)[^\\S\\n]+(?:a|an|the|any)[^\\S\\n]+(?:[\\p{L}-]+[^\\S\\n]+){0,2}?(?:${'(?:engines?|motors?|outboards?|thrusters?|pumps?|boilers?|turbines?|rockets?|cells?|panels?|lamps?|bulbs?|batter(?:y|ies)|generators?|heaters?|fridges?|cars?|vehicles?|aircraft|drones?|chargers?|amplifiers?|converters?|lasers?)'})(?!\\p{L})`,
  'iu',
);
/** A conditional outcome: "would", "could", "might". */
const CONDITIONAL_RE = /(?<!\p{L})(?:would|could|might)(?!\p{L})/iu;

/** Right after a comparison's figure: what it was compared with is the input or output of the claim itself ("compared with 1 kW of input"). */
const OWN_FLOW_AFTER_RE = /^[^\S\n]*(?:of[^\S\n]+)?(?:(?:electrical|electric|mechanical|thermal|heat|shaft)[^\S\n]+)?(?:input|output|in|out|consumed|drawn|supplied|delivered|it (?:draws|takes|uses|consumes|needs|gives|delivers))(?!\p{L})/iu;

const DEVICE_NOUNS = '(?:prototypes?|models?|versions?|designs?|generations?|units?|builds?|rigs?|devices?|machines?|iterations?|systems?|box(?:es)?|cells?|modules?|engines?|motors?|generators?|drives?|thrusters?|heaters?|coils?|wheels?|dryers?|driers?|boilers?|furnaces?|fridges?|freezers?|coolers?|kettles?|stoves?|ovens?|heat[- ]pumps?|chargers?|cars?|vans?|e-?bikes?)';
const EARLIER_DEVICE_RE = new RegExp(
  `(?<![\\p{L}\\p{N}])(?:(?:previous|earlier|older|former|first-generation|last year's|original|old|predecessor)[^\\S\\n]+(?:[\\p{L}-]+[^\\S\\n]+)?|(?:1[89]\\d0s|20[0-2]0s|decades?[- ]old|historic(?:al)?)[^\\S\\n]+(?:claims?[^\\S\\n]+(?:of|for|about)[^\\S\\n]+(?:an?|the)[^\\S\\n]+)?(?:[\\p{L}-]+[^\\S\\n]+)?)${DEVICE_NOUNS}(?!\\p{L})`,
  'iu',
);
/** Right before a device the claim is set above: "far more than", "better than any", "outperforming the". */
const ABOVE_BEFORE_RE = /(?<!\p{L})(?:than|over|beyond|outperform\w*|beat\w*|surpass\w*|exceed\w*)[^\S\n]+(?:(?:all|any|the|most|its|their)[^\S\n]+)?$/iu;
const LATEST_DEVICE_RE = new RegExp(`(?<!\\p{L})(?:new|this|latest|present|current|improved|second|next)[^\\S\\n]+(?:[\\p{L}-]+[^\\S\\n]+)?${DEVICE_NOUNS}(?!\\p{L})`, 'iu');
const OWN_FLOW_BETWEEN_RE = /(?<!\p{L})(?:input|output|inputs|outputs|in|out|consumption|supply|P_?\{?(?:in|out)\}?|E_?\{?(?:in|out)\}?)(?!\p{L})/iu;

function saidInComparison(text: string, d: Draft): boolean {
  if (d.derived) return false;
  const sentence = sentenceAround(text, d.start, d.end);
  if (COMPARISON_SENTENCE_RE.test(sentence) && !OWN_DEVICE_RE.test(sentence)) return true;
  // "Our previous prototype reached 35 % at 800 W": an earlier device, not the one claimed.
  if (earlierDeviceSaid(text, d)) return true;
  // "The claimed 45 % efficiency was corrected to 4.5 %": a figure superseded by the one after it.
  if (SUPERSEDED_AFTER_RE.test(text.slice(d.end, d.end + 60)) || PUT_RIGHT_AFTER_RE.test(text.slice(d.end, d.end + 70))) return true;
  // 'Our demonstrator does not produce "3.3 mN", it produces 3.3 µN', 'not 3 kW but 300 W', '300 W, not 3 kW':
  // a figure denied and put right in the same breath.
  if ((DENIED_BEFORE_RE.test(text.slice(Math.max(0, d.start - 40), d.start)) && RIGHTED_AFTER_RE.test(text.slice(d.end, d.end + 40))) || RIGHTED_BEFORE_RE.test(text.slice(Math.max(0, d.start - 12), d.start))) return true;
  // ("… the first figure is four times the speed of light": what the wrong figure would have been.)
  if (WRONG_FIGURE_BEFORE_RE.test(text.slice(windowStart(text, d.start, 0, 80), d.start))) return true;
  if (OTHERS_AFTER_RE.test(text.slice(d.end, d.end + 60))) return true;
  // "the 9 kW oil boiler it replaced", "the 58 mN per kW of its predecessor", "next to the 50 mN/kW of
  // a Hall thruster", "against 38 % for the production engine": another device's figure.
  const after = text.slice(d.end, d.end + 80);
  if (REPLACED_AFTER_RE.test(after) || PREDECESSOR_AFTER_RE.test(after)) return true;
  if (SET_AGAINST_BEFORE_RE.test(text.slice(windowStart(text, d.start, 0, 50), d.start)) && ANOTHER_DEVICE_AFTER_RE.test(after)) return true;
  if (inContrastedClause(text, d)) return true;
  const clauseBefore = text.slice(windowStart(text, d.start, 0, 120), d.start);
  // "as much light as a 60 W bulb", "replacing a 6 kW heater", "a 60 W-equivalent lamp": what the
  // device stands in for.
  if (STANDS_IN_BEFORE_RE.test(clauseBefore) || EQUIVALENT_AFTER_RE.test(text.slice(d.end, d.end + 16))) return true;
  const m = COMPARED_BEFORE_RE.exec(clauseBefore);
  // ("Output 1.5 kW vs input 1.2 kW": the claim's own input, named between.)
  return m !== null && !OWN_FLOW_BETWEEN_RE.test(m[0]) && !OWN_FLOW_AFTER_RE.test(text.slice(d.end, d.end + 40));
}
