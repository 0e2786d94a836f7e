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
import { insertAfter, siOf, typedSi, type Draft } from './draft';

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
const REGISTER_OUT_RE = /(?<!\p{L})(?:heat|output|generation|generated|export(?:ed)?|yield|sent[- ]out|delivered)(?:[^\S\n]+(?:kWh|energy))?[^\S\n]+(?:meter|counter|register|totali[sz]er)(?!\p{L})/iu;
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

export function meterReadings(text: string, drafts: Draft[]): void {
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
