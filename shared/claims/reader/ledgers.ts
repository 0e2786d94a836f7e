/**
 * Ledgers kept over time: a meter's or a counter's two readings ("Output kWh meter: 88,240 -> 89,770
 * kWh", "the meter read 10,412 kWh on 1 March and 10,874 kWh on 31 March", "hour meter 4,118.0 ->
 * 4,236.5 h") are no two energies or times of the device, but one: what the register moved by between
 * them. And an energy said per distance ("Energy per mile from the socket: 0.149 kWh") is a rate of
 * use, no energy of the run.
 */
import { formatQuantity } from '../../worksheet/quantity';
import { formatPrint } from '../print';
import { FIGURE_SI_UNIT } from '../types';
import { sentenceAround } from './context';
import { insertAfter, siOf, typedSi, upperSiOf, type Draft } from './draft';

/** A register named before the first reading: a meter, a counter, a reading, a totaliser. */
const REGISTER_BEFORE_RE =
  /(?<!\p{L})(?:meters?|metres?(?=[^\S\n]+(?:read|reading|showed|shows))|readings?|read|reads|register(?:ed|s)?|counters?|totali[sz]ers?|odometer|index|dial|display(?:ed)?|logger|opening|start(?:ing)?)(?!\p{L})[^\n]{0,60}$/iu;
/** Between two readings: an arrow, "to", "and … on", "then", "closing", "end". */
const BETWEEN_READINGS_RE =
  /^[^\S\n]*(?:->|→|=>|⇒|–>|—>|>|to|until|and(?:[^\S\n]+(?:then|later|now))?|then|,|;|\/|(?:on|at|by)[^\S\n]+[^\n]{1,28}?[^\S\n]*(?:and|to|then|,|->|→)|(?:,|;)?[^\S\n]*(?:at[^\S\n]+the[^\S\n]+)?(?:end|close|closing|finish|final|after)(?:[^\S\n]+(?:reading|read|of[^\S\n]+(?:the[^\S\n]+)?(?:trial|test|run|week|month|period|day)))?[^\S\n]*[:=]?)[^\S\n]*(?:(?:reading|read|reads|it[^\S\n]+read|showed|shows|was|is)[^\S\n]+)?$/iu;
/** A stated difference right after the second reading: "(1,530 kWh)", "(118.5 run hours)", "-> 512 kWh". */
const BRACKET_AFTER_RE = /^(?:[^\S\n]+(?:on|at|by)[^\S\n]+[^\n]{1,25}?)?[^\S\n]*(?:[([]|->|→|=>|=|:|,[^\S\n]*(?:so|i\.e\.|that is|a difference of)|so|i\.e\.)[^\S\n]*$/u;

/** The two readings of one register, in order, where the second is larger (a register only counts up). */
function readingPairs(text: string, drafts: Draft[]): Array<[Draft, Draft]> {
  const pairs: Array<[Draft, Draft]> = [];
  for (let i = 0; i + 1 < drafts.length; i++) {
    const [a, b] = [drafts[i], drafts[i + 1]];
    if (a.kind !== b.kind || (a.kind !== 'energy' && a.kind !== 'duration') || a.derived || b.derived || a.upper || b.upper) continue;
    const [x, y] = [siOf(a), siOf(b)];
    if (x === null || y === null || !(y > x) || x <= 0) continue;
    const gap = text.slice(a.end, b.start);
    if (gap.length > 60 || !BETWEEN_READINGS_RE.test(gap)) continue;
    const lead = text.slice(Math.max(0, a.start - 70), a.start);
    const line = lead.slice(lead.lastIndexOf('\n') + 1);
    if (!REGISTER_BEFORE_RE.test(line)) continue;
    // (A reading is a total the register has counted since it was fitted: far larger than what it moved
    // by in one period. Two figures of like size are no pair of readings: "used 2,900 kWh and delivered
    // 10,150 kWh".)
    if (!((y - x) / y < 0.5)) continue;
    pairs.push([a, b]);
    i++;
  }
  return pairs;
}

/** The register's name says which side it counts: a heat meter or a generation meter what comes out, an electricity sub-meter or an import meter what goes in. */
const REGISTER_OUT_RE = /(?<!\p{L})(?:heat|output|generation|generated|export(?:ed)?|yield|sent[- ]out|delivered|inverter|PV|solar)(?:[^\S\n]+(?:kWh|energy))?[^\S\n]+(?:meter|counter|register|totali[sz]er)(?!\p{L})/iu;
const REGISTER_IN_RE = /(?<!\p{L})(?:(?:electricity|electric|import(?:ed)?|supply|grid|input|consumption)(?:[^\S\n]+(?:kWh|energy))?[^\S\n]+(?:sub-?)?(?:meter|counter|register)|sub-?meter)(?!\p{L})/iu;

/** A bare first reading before an arrow, its unit said only after the second: "88,240 -> 89,770 kWh". */
const BARE_FIRST_READING_RE = /(?<![\p{L}\d.,:])(\d{1,3}(?:,\d{3})+(?:\.\d+)?|\d+(?:\.\d+)?)[^\S\n]*(?:->|→|=>|⇒|–>|—>)[^\S\n]*$/u;
const plain = (s: string) => Number(s.replace(/,/gu, ''));

/** "88,240 -> 89,770 kWh": the first reading made a figure in the unit of the second. */
function bareFirstReadings(text: string, drafts: Draft[]): void {
  for (const b of [...drafts]) {
    if ((b.kind !== 'energy' && b.kind !== 'duration') || b.derived || b.upper) continue;
    const m = BARE_FIRST_READING_RE.exec(text.slice(Math.max(0, b.start - 30), b.start));
    const own = /^(\d{1,3}(?:,\d{3})+(?:\.\d+)?|\d+(?:\.\d+)?)/u.exec(text.slice(b.start, b.end));
    const y = siOf(b);
    if (!m || !own || y === null || plain(own[1]) <= 0) continue;
    const start = b.start - (Math.min(30, b.start) - m.index);
    if (drafts.some((d) => d !== b && d.end > start && d.start < b.start)) continue;
    const x = (plain(m[1]) * y) / plain(own[1]);
    const at = drafts.indexOf(b);
    drafts.splice(at, 0, { start, end: start + m[1].length, kind: b.kind, quantity: typedSi(x, FIGURE_SI_UNIT[b.kind]), role: null });
  }
}

/** Before a register's two readings read as one range: "the inverter counter went from", "meter: from". */
const REGISTER_RANGE_BEFORE_RE =
  /(?<!\p{L})(?:meters?|counters?|register|totali[sz]ers?|readings?|odometer|index|dial)(?!\p{L})[^.;!?\n\d]{0,30}?(?:went|moved|rose|climbed|ticked|ran|read|reads|reading|showed|shows|from|between)[^.;!?\n\d]{0,12}$/iu;

/** "the inverter counter went from 3,112 kWh to 3,598 kWh": a register's two readings read as a range are what it moved by. */
function registerRanges(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if ((d.kind !== 'energy' && d.kind !== 'duration') || d.derived || d.upper === undefined || d.role === 'aside') continue;
    if (!REGISTER_RANGE_BEFORE_RE.test(text.slice(Math.max(0, d.start - 60), d.start))) continue;
    const [x, y] = [siOf(d), upperSiOf(d)];
    if (x === null || y === null || !(y > x) || !((y - x) / y < 0.5)) continue;
    const unit = FIGURE_SI_UNIT[d.kind];
    const label = text.slice(Math.max(0, d.start - 70), d.start);
    const named = REGISTER_OUT_RE.test(label) ? 'out' : REGISTER_IN_RE.test(label) ? 'in' : null;
    d.quantity = typedSi(y - x, unit);
    d.upper = undefined;
    d.hedge = undefined;
    d.derived = `the register's two readings: ${formatQuantity(y, unit)} − ${formatQuantity(x, unit)} = ${formatPrint(y - x)} ${unit}`;
    if (named && d.kind === 'energy') d.role = named;
  }
}

export function meterReadings(text: string, drafts: Draft[]): void {
  registerRanges(text, drafts);
  bareFirstReadings(text, drafts);
  for (const [a, b] of readingPairs(text, drafts)) {
    const [x, y] = [siOf(a)!, siOf(b)!];
    const unit = FIGURE_SI_UNIT[a.kind];
    const label = text.slice(Math.max(0, a.start - 70), a.start);
    const named = REGISTER_OUT_RE.test(label.slice(label.lastIndexOf('\n') + 1)) ? 'out' : REGISTER_IN_RE.test(label.slice(label.lastIndexOf('\n') + 1)) ? 'in' : null;
    const role = a.kind === 'energy' && named ? named : (b.role ?? a.role);
    a.role = 'aside';
    b.role = 'aside';
    const i = drafts.indexOf(b);
    const next = drafts[i + 1];
    // The writer's own difference, right after, in brackets: keep it (with the readings' role) and add nothing.
    if (next && next.kind === a.kind && !next.derived && BRACKET_AFTER_RE.test(text.slice(b.end, next.start)) && next.start - b.end < 40) {
      const z = siOf(next);
      if (z !== null && Math.abs(z - (y - x)) <= 0.01 * (y - x)) {
        if (next.role === null || next.role === 'aside') next.role = role === 'aside' ? null : role;
        continue;
      }
    }
    insertAfter(drafts, b, {
      start: a.start,
      end: b.end,
      kind: a.kind,
      quantity: typedSi(y - x, unit),
      role: role === 'aside' ? null : role,
      derived: `the register's two readings: ${formatQuantity(y, unit)} − ${formatQuantity(x, unit)} = ${formatPrint(y - x)} ${unit}`,
    });
  }
}

/** An energy said per distance or per trip, with its label before it: "Energy per mile from the socket: 0.149 kWh". */
const PER_DISTANCE_LABEL_RE = /(?<!\p{L})(?:per|a|each|every|\/)[^\S\n]*(?:mile|km|kilomet(?:re|er)|100[^\S\n]*km|trip|journey|lap)(?!\p{L})[^\n\d]{0,40}$/iu;
const PER_DISTANCE_AFTER_RE = /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?(?:per|a|each|every|\/)[^\S\n]*(?:mile|km|kilomet(?:re|er)|100[^\S\n]*km|trip|journey|lap)(?!\p{L})/iu;

export function asidePerDistance(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if (d.kind !== 'energy' || d.derived || d.role === 'aside') continue;
    const lead = text.slice(Math.max(0, d.start - 50), d.start);
    const line = lead.slice(lead.lastIndexOf('\n') + 1);
    if (PER_DISTANCE_LABEL_RE.test(line) || PER_DISTANCE_AFTER_RE.test(text.slice(d.end, d.end + 30))) d.role = 'aside';
  }
}

/** Before a change of a figure just given: "down 0.8 W since launch", "up by 12 kWh", "fell by 3 W", "a drop of 5 W". */
const CHANGE_BEFORE_RE =
  /(?<!\p{L})(?:(?:down|up)(?:[^\S\n]+by)?|(?:fell|falls?|falling|dropped|drops?|dropping|declined|declines?|decreased|decreases?|increased|increases?|rose|rises?|rising|grew|grows?|slipped|climbed|degraded|lost|gained)[^\S\n]+(?:by[^\S\n]+)?(?:(?:only|just|about|some|roughly|a[^\S\n]+further)[^\S\n]+)?|(?:a|an)[^\S\n]+(?:drop|fall|decline|decrease|loss|increase|rise|gain|change)[^\S\n]+of)[^\S\n]*$/iu;
/** After it: "… since launch", "… on last month", "… from last year", "… over the year". */
const CHANGE_AFTER_RE = /^[^\S\n]*(?:since|on[^\S\n]+(?:last|the[^\S\n]+previous)|from[^\S\n]+(?:last|the[^\S\n]+previous|a[^\S\n]+year)|compared[^\S\n]+(?:with|to)|year[- ]on[- ]year|over[^\S\n]+the[^\S\n]+(?:year|month|mission)|a[^\S\n]+year)(?!\p{L})/iu;

/** Before a saving: "saving 300 kWh a day of gas", "saves about 40 W", "savings of 2 MWh", "cutting its use by 3 kWh". */
const SAVING_BEFORE_RE =
  /(?<![\p{L}-])(?:sav(?:es|ed|ing)|(?:a|the|annual|yearly|daily|net|total)?[^\S\n]*savings?[^\S\n]+(?:of|is|was|were|are|:)|(?:cut(?:s|ting)?|reduc(?:es|ed|ing)|lower(?:s|ed|ing)?|trim(?:s|med|ming)?)[^\S\n]+(?:[\p{L}’'-]+[^\S\n]+){0,3}?by)[^\S\n]+(?:(?:about|around|roughly|some|nearly|almost|up[^\S\n]+to|over|a[^\S\n]+further|an[^\S\n]+estimated|a[^\S\n]+good|at[^\S\n]+least)[^\S\n]+)?$/iu;

/**
 * A power or an energy said as the change of one just given ("RTG output 212 W, down 0.8 W since
 * launch"): no side of its own.
 */
export function asideChanges(text: string, drafts: Draft[]): void {
  for (let i = 0; i < drafts.length; i++) {
    const d = drafts[i];
    if ((d.kind !== 'power' && d.kind !== 'energy') || d.derived || d.role === 'aside') continue;
    const before = text.slice(Math.max(0, d.start - 30), d.start);
    // (A saving is a difference between two devices or two periods, not what either takes or gives.)
    if (SAVING_BEFORE_RE.test(text.slice(Math.max(0, d.start - 50), d.start))) {
      d.role = 'aside';
      continue;
    }
    if (i === 0 || !CHANGE_BEFORE_RE.test(before)) continue;
    // (The figure it changes is said just before, of the same kind: "212 W, down 0.8 W".)
    const prev = drafts[i - 1];
    const joined = prev.kind === d.kind && d.start - prev.end < 40 && !/[.;!?\n]/u.test(text.slice(prev.end, d.start));
    if (joined || CHANGE_AFTER_RE.test(text.slice(d.end, d.end + 30))) d.role = 'aside';
  }
}

/** A store's size, then its state of charge moved: "the 75 kWh pack from 10 % to 80 %", "a 13.5 kWh battery, 20–90 %". */
const STORE_AFTER_RE = /^[^\S\n]*(?:[\p{L}-]+[^\S\n]+)?(?:packs?|batter(?:y|ies)|banks?|stores?|cells?|accumulators?)(?!\p{L})/iu;
const CHARGE_SPAN_RE = /^[^.;!?\n]{0,40}?(?<!\p{L})(?:from[^\S\n]+)?(\d{1,3}(?:[.,]\d+)?)[^\S\n]*%?[^\S\n]*(?:to|–|-|—)[^\S\n]*(\d{1,3}(?:[.,]\d+)?)[^\S\n]*%/u;

/**
 * "Charging the 75 kWh pack from 10 % to 80 % took 52.5 kWh at the meter": the energy that went into or
 * out of the store is its size times the change of its state of charge (here 70 % of 75 kWh), not its size.
 */
export function storeChargeSpans(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if (d.kind !== 'energy' || d.derived || d.role === 'aside' || d.upper !== undefined) continue;
    if (!STORE_AFTER_RE.test(text.slice(d.end, d.end + 30))) continue;
    const m = CHARGE_SPAN_RE.exec(text.slice(d.end, d.end + 70));
    if (!m) continue;
    const [a, b] = [Number(m[1].replace(',', '.')), Number(m[2].replace(',', '.'))];
    const si = siOf(d);
    if (si === null || !(a >= 0 && a <= 100 && b >= 0 && b <= 100) || a === b) continue;
    d.quantity = typedSi((Math.abs(b - a) / 100) * si, 'J');
    d.derived = `energy moved = ${Math.abs(b - a)} % of the store's ${text.slice(d.start, d.end)} (state of charge from ${a} % to ${b} %)`;
  }
}

const TIMES_WORDS: Record<string, number> = { once: 1, twice: 2, two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10, eleven: 11, twelve: 12 };
const timesValue = (w: string | undefined): number | null => (w === undefined ? null : /^\d+(?:[.,]\d+)?$/u.test(w) ? Number(w.replace(',', '.')) : (TIMES_WORDS[w.toLowerCase()] ?? null));
/** Before a store filled: "refilled a phone with a", "charges a 15 Wh tablet". */
const REFILL_BEFORE_RE = /(?<!\p{L})(?:re)?(?:fill(?:s|ed|ing)?|charg(?:es|ed|ing))[^\S\n]+(?:up[^\S\n]+)?(?:a|an|the|my|your|our|its)[^\S\n]+[^.;!?\n]{0,30}$/iu;
/** After it: "… between three and four times", "… about 4.5 times", "… twice". */
const TIMES_AFTER_RE = /^[^.;!?\n\d]{0,30}?(?<!\p{L})(?:(?:between|about|roughly|around|some|nearly|almost|up[^\S\n]+to)[^\S\n]+)?(\d+(?:[.,]\d+)?|once|twice|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve)(?:[^\S\n]*(?:and|to|or|–|-)[^\S\n]*(\d+(?:[.,]\d+)?|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve))?(?:[^\S\n]+times)?(?!\p{L})/iu;

/**
 * "refilled a phone with a 15 Wh battery between three and four times": what the store gave is the
 * other battery's size times the refills (here 45–60 Wh), not the size itself.
 */
export function refills(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if (d.kind !== 'energy' || d.derived || d.role === 'aside' || d.upper !== undefined) continue;
    if (!REFILL_BEFORE_RE.test(text.slice(Math.max(0, d.start - 50), d.start))) continue;
    const m = TIMES_AFTER_RE.exec(text.slice(d.end, d.end + 70));
    if (!m || !(/times/iu.test(m[0]) || /^(?:once|twice)$/iu.test(m[1]))) continue;
    const [a, b] = [timesValue(m[1]), timesValue(m[2])];
    const si = siOf(d);
    if (a === null || si === null || a <= 0) continue;
    d.quantity = typedSi(a * si, 'J');
    if (b !== null && b > a) d.upper = typedSi(b * si, 'J');
    d.role = 'out';
    d.derived = `energy given = ${text.slice(d.start, d.end)} × ${b !== null && b > a ? `${a} to ${b}` : a} refills`;
  }
}

/** Before an energy spent making a device: "its embodied energy of 1,500 kWh", "grey energy", "the energy used to build it". */
const EMBODIED_BEFORE_RE =
  /(?<!\p{L})(?:embodied|embedded|grey|gray|manufactur\w*|production|construction)[^\S\n]+(?:energy|carbon|emissions)(?:[^\S\n]+(?:of|is|was|at|:|about|around|roughly|some|nearly)){0,2}[^\S\n]*$|(?:energy|it)[^\S\n]+(?:(?:used|needed|spent|it[^\S\n]+took|that[^\S\n]+went)[^\S\n]+)?(?:to|in)[^\S\n]+(?:build(?:ing)?|manufactur\w*|construct(?:ing)?|fabricat\w*)[^\S\n]+(?:it|them|the[^\S\n]+[\p{L}-]+)(?:[^\S\n]+(?:was|is|of|:|about|around|roughly|some|nearly)){0,2}[^\S\n]*$/iu;
/** After it: "1,500 kWh to manufacture", "1,500 kWh of embodied energy", "to build it". */
const EMBODIED_AFTER_RE = /^[^\S\n]*(?:of[^\S\n]+(?:embodied|embedded|grey|gray)[^\S\n]+energy|(?:to|in)[^\S\n]+(?:(?:build|manufacture|construct|fabricate)(?:[^\S\n]+(?:it|them|the|a|an|one|each))?|make[^\S\n]+(?:it|them))(?!\p{L}))/iu;

/**
 * An energy spent making the device, against which its lifetime output is set as a payback ("pays back its
 * embodied energy of 1,500 kWh in two years and then makes 9,000 kWh"): not what the device converts.
 */
export function asideEmbodied(text: string, drafts: Draft[]): void {
  for (const d of drafts) {
    if (d.kind !== 'energy' || d.derived || d.role === 'aside') continue;
    if (EMBODIED_BEFORE_RE.test(text.slice(Math.max(0, d.start - 50), d.start)) || EMBODIED_AFTER_RE.test(text.slice(d.end, d.end + 30))) d.role = 'aside';
  }
}

/** Between a power and a time in a worked line ("60 W for 18 h is 1.08 kWh", "60 W × 18 h = 1.08 kWh"). */
const WORKED_POWER_TIME_RE = /^[^\S\n]*(?:for|over|×|x|\*|times)[^\S\n]*$/iu;
/** Between the time and the energy it makes: "is", "=", "makes", "comes to", "gives". */
const WORKED_RESULT_RE = /^[^\S\n]*(?:is|=|≈|makes|gives|comes[^\S\n]+to|equals|works[^\S\n]+out[^\S\n]+(?:at|to))[^\S\n]*(?:(?:about|around|roughly|only|just)[^\S\n]+)?$/iu;

/**
 * "It stores 1.2 kWh; 60 W for 18 h is 1.08 kWh": someone working the claim's own power and time (said
 * again, the same figures as before) into an energy. The line is their arithmetic, not further flows of
 * the device: all three set aside.
 */
export function workedLines(text: string, drafts: Draft[]): void {
  for (let k = 0; k + 2 < drafts.length; k++) {
    const [p, t, e] = [drafts[k], drafts[k + 1], drafts[k + 2]];
    if (p.kind !== 'power' || t.kind !== 'duration' || e.kind !== 'energy' || p.derived || t.derived || e.derived) continue;
    // (A line whose words give it a side — "in = 2 kW × 2400 s = 4.8 MJ", "Energy delivered to the load: 150 W × 72 h" — is the writer's own ledger: left to it.)
    if (p.role !== null || e.role !== null) continue;
    if (!WORKED_POWER_TIME_RE.test(text.slice(p.end, t.start)) || !WORKED_RESULT_RE.test(text.slice(t.end, e.start))) continue;
    const [w, s, j] = [siOf(p), siOf(t), siOf(e)];
    if (w === null || s === null || j === null || !(j > 0) || Math.abs(w * s - j) > 0.03 * j) continue;
    // (Only the claim's figures said again: a power and a time given before, in their own words.)
    const before = drafts.slice(0, k);
    const again = (d: Draft, x: number) => before.some((o) => o.kind === d.kind && !o.derived && siOf(o) === x);
    if (!again(p, w) || !again(t, s)) continue;
    for (const d of [p, t, e]) d.role = 'aside';
  }
}

/** Before an energy worked out from a power just given: "so about", "that is", "i.e.", "which makes". */
const WORKED_OUT_BEFORE_RE = /(?<!\p{L})(?:so|that(?:'s|’s|[^\S\n]+is)|i\.e\.|which[^\S\n]+(?:is|makes|gives|comes[^\S\n]+to)|making|giving|or)[^\S\n]+(?:(?:about|around|roughly|some|nearly|almost|just[^\S\n]+(?:over|under)|a[^\S\n]+total[^\S\n]+of)[^\S\n]+)?$/iu;

/**
 * "Average beam power at the dump 45 kW, so about 345 kWh into the dump this shift": an energy the
 * writer works out from a power and a time the text gives (within 3 %) is that power's flow again: read
 * on the other side, it is set aside rather than counted as a second flow against the first.
 */
export function restatedEnergies(text: string, drafts: Draft[]): void {
  const durations = drafts.filter((d) => d.kind === 'duration' && d.role !== 'aside').map(siOf).filter((t): t is number => t !== null && t > 0);
  for (const e of drafts) {
    if (e.kind !== 'energy' || e.derived || !WORKED_OUT_BEFORE_RE.test(text.slice(Math.max(0, e.start - 25), e.start))) continue;
    const j = siOf(e);
    if (j === null || j <= 0) continue;
    const p = [...drafts].reverse().find((d) => d.kind === 'power' && !d.derived && d.end <= e.start && e.start - d.end < 120 && (d.role === 'in' || d.role === 'out'));
    const w = p && siOf(p);
    if (!p || !w || !durations.some((t) => Math.abs(w * t - j) <= 0.03 * j)) continue;
    // (Read on the other side from the power it restates, it is the same flow counted twice: set aside.)
    if ((e.role === 'in' || e.role === 'out') && e.role !== p.role) e.role = 'aside';
  }
}

/** A measurement's stated error as a percentage: "the meter's error is ±15 %", "accurate to ±5 %", "uncertainty of 10 %". */
const STATED_ERROR_RE =
  /(?<!\p{L})(?:errors?|uncertaint(?:y|ies)|accuracy|accurate|tolerance|precision|good)(?:[^\S\n]+(?:is|was|of|to|within|about|around|roughly|some|bars?|band))*[^\S\n]*[:=]?[^\S\n]*(?:±|\+\/-|\+-|plus[^\S\n]+or[^\S\n]+minus[^\S\n]+)[^\S\n]*(\d+(?:\.\d+)?)[^\S\n]*(?:%|per[^\S\n]?cent)/iu;

/**
 * "We measured 1.1 kW out against 1 kW in, but the meter's error is ±15 %": a stated error of the
 * measurement widens each power and energy the text gives without a range of its own, so the check takes
 * the end most favourable to the claim.
 */
export function statedError(text: string, drafts: Draft[]): void {
  const m = STATED_ERROR_RE.exec(text);
  if (!m) return;
  const u = Number(m[1]) / 100;
  if (!(u > 0 && u < 1)) return;
  for (const d of drafts) {
    if ((d.kind !== 'power' && d.kind !== 'energy') || (d.role !== 'in' && d.role !== 'out') || d.upper !== undefined || d.derived) continue;
    const x = siOf(d);
    if (x === null || x <= 0) continue;
    const unit = FIGURE_SI_UNIT[d.kind];
    d.quantity = typedSi(x * (1 - u), unit);
    d.upper = typedSi(x * (1 + u), unit);
    d.assumption = `The text states an error of ±${formatPrint(u * 100)} % for its measurements (“${m[0].trim()}”): ${formatQuantity(x, unit)} is read as ${formatQuantity(x * (1 - u), unit)} to ${formatQuantity(x * (1 + u), unit)}.`;
  }
}

/** Words that put a figure right as a slip: "typo", "should read", "I meant", "correction", "sorry". */
const SLIP_WORDS_RE = /(?<!\p{L})(?:typo|misprint|slip|should(?:[^\S\n]+have)?[^\S\n]+(?:read|been|be|say)|I[^\S\n]+meant|meant[^\S\n]+to[^\S\n]+(?:write|type|say)|correction|corrected|sorry)(?!\p{L})/iu;

/**
 * "Sorry, typo — that should read 2.1 A, not 21 A": a figure put right as a slip is set aside wherever it
 * is said (the quoted "21 A at 12 V" above), with what was worked out from it (its 252 W, as a product
 * or as a figure someone wrote down from it).
 */
export function asideSlips(text: string, drafts: Draft[]): void {
  const wrong = drafts.filter(
    (d) =>
      d.role === 'aside' &&
      !d.derived &&
      /(?:,|—|–|[^\S\n]-)[^\S\n]*not[^\S\n]+["“‘']?$/u.test(text.slice(Math.max(0, d.start - 10), d.start)) &&
      SLIP_WORDS_RE.test(sentenceAround(text, d.start, d.end)),
  );
  if (wrong.length === 0) return;
  const same = (a: Draft, b: Draft) => a.kind === b.kind && siOf(a) !== null && siOf(a) === siOf(b);
  const slipped = drafts.filter((d) => wrong.some((w) => same(w, d) && (d === w || d.start < w.start)));
  for (const d of slipped) d.role = 'aside';
  // What was worked out from a slip: a product whose words hold it, and a figure of that product's value.
  const products = drafts.filter((d) => d.derived && slipped.some((w) => w !== d && w.start >= d.start && w.end <= d.end));
  for (const p of products) {
    p.role = 'aside';
    for (const d of drafts) if (!d.derived && same(d, p) && d.start < wrong[0].start) d.role = 'aside';
  }
}
