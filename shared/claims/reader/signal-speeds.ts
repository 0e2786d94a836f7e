/**
 * Speeds a text gives without saying a speed (the claim reader, shared/claims/reader.ts, pass 3): a
 * signal's path over its latency ("1,200 km between our two exchanges with a one-way latency of 3.2 ms"),
 * and a cable's velocity factor as a fraction of c ("Velocity of propagation 83 %"). The light-speed
 * check takes them as it takes a speed said outright.
 */
import { C_LIGHT } from '../../checks/constants';
import { sentenceAround } from './context';
import { insertInOrder, siOf, typedSi, type Draft } from './draft';

/** A length a signal covers: "1,200 km", "750 miles" (NIST SP 811: the international mile is 1,609.344 m). */
const PATH_RE = /(?<![\p{L}\p{N}.,])(\d{1,3}(?:,\d{3})+|\d+(?:\.\d+)?)[^\S\n]*(km|kilometres?|kilometers?|miles?|mi)(?!\p{L})/giu;
const PATH_UNIT: Record<string, number> = { km: 1000, kilometre: 1000, kilometer: 1000, kilometres: 1000, kilometers: 1000, mile: 1609.344, miles: 1609.344, mi: 1609.344 };

/** Just before a time a signal takes: "a one-way latency of", "round-trip delay:", "ping of". */
const LATENCY_BEFORE_RE =
  /(?<!\p{L})(?:(?:one[- ]way|round[- ]trip|end[- ]to[- ]end|guaranteed|typical|measured|total)[^\S\n]+)*(?:latency|delay|ping|RTT|transit[^\S\n]+time|propagation[^\S\n]+(?:time|delay))(?:[^\S\n]+(?:time|figure))?[^\S\n]*(?:of|is|was|:|=|at|under|below|less[^\S\n]+than|just|only|about|around|guaranteed[^\S\n]+(?:at|under|below))?[^\S\n]*(?:(?:under|below|less[^\S\n]+than|just|only|about|around|roughly|of)[^\S\n]+)*$/iu;
/** A signal in the time's sentence: "a pulse launched into the fibre", "the photons", "the message". */
const SIGNAL_RE = /(?<!\p{L})(?:pulses?|signals?|photons?|beams?|messages?|packets?|wave[- ]?fronts?|light)(?!\p{L})/iu;
/** A time a signal is said to take to arrive: "detected at the far end 21 µs later", "arrived after 3 ms", "took 40 ns to cross". */
const ARRIVAL_BEFORE_RE = /(?<!\p{L})(?:arriv\w*|detected|received|registered|reached|reaches|crossed|cross(?:es|ing)?|travell?(?:ed|ing|s)?|propagat\w*|took|takes|taking|emerged|came[^\S\n]+out|carr(?:y|ies|ied|ying)|deliver(?:s|ed|ing)?|transmit(?:s|ted|ting)?|relay(?:s|ed|ing))(?!\p{L})[^.;!?\n]{0,60}?(?:(?:in|within|after|only|just)[^\S\n]+)*$/iu;
const LATER_AFTER_RE = /^[^\S\n]*(?:later|after(?:wards)?|afterwards)(?!\p{L})/iu;
/** The length of a line a signal runs through: "the 12 km fibre spool", "a 3 km coil of cable". */
const LINE_AFTER_RE = /^[^\S\n]*(?:(?:long|length)[^\S\n]+)?(?:of[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+)?(?:fibre|fiber|cable|coax|line|spool|coil|waveguide|link)s?(?!\p{L})/iu;

/** Words that make a time a lower bound or a change, not the time the signal takes: "over 5 ms", "saves 1.6 ms". */
const NOT_THE_TIME_BEFORE_RE =
  /(?<!\p{L})(?:over|above|more[^\S\n]+than|at[^\S\n]+least|saves?|saving|saved|cuts?|cutting|shaves?|shaving|shaved|reduc\w*|lower(?:s|ed)?|less|improv\w*|faster|quicker|by|added|adds?|extra|increase\w*|jitter|variation)[^\S\n]*(?:(?:of|by|just|only|about)[^\S\n]+)*$/iu;
/** A time said to go there and back. */
const ROUND_TRIP_RE = /(?<!\p{L})(?:round[- ]trip|RTT|ping|there[^\S\n]+and[^\S\n]+back|return[^\S\n]+trip)(?!\p{L})/iu;

/** Words of a link between two places, near its length: "between our two exchanges", "away", "route", "apart". */
const LINK_RE =
  /(?<!\p{L})(?:between|apart|away|distant|route|link|path|hop|span|one[- ]way|round[- ]trip|from[^\S\n]+[\p{Lu}\p{L}][^.;!?\n]{0,40}?to|separated|separating|end[- ]to[- ]end|point[- ]to[- ]point)(?!\p{L})/iu;
/** Words of a network's whole length or the ground it covers, near a length: no one signal's path. */
const NETWORK_RE = /(?<!\p{L})(?:network|coverage|covers?|covering|covered|of[^\S\n]+(?:motorways?|roads?|track|coast(?:line)?|cable[^\S\n]+laid|fibre[^\S\n]+laid)|total|in[^\S\n]+all|altogether)(?!\p{L})/iu;
/** A velocity factor: "Velocity of propagation 83 %", "velocity factor 0.66", "NVP: 0.69". */
const VELOCITY_FACTOR_RE =
  /(?<!\p{L})(?:velocity[^\S\n]+(?:of[^\S\n]+propagation|factor)|propagation[^\S\n]+velocity|nominal[^\S\n]+velocity[^\S\n]+of[^\S\n]+propagation|NVP|VoP|VF)(?:[^\S\n]*\([^)\n]{0,10}\))?[^\S\n]*(?:of|is|:|=)?[^\S\n]*(?:(?:about|around|roughly|approx\.?|approximately|typ\.?|typically|nominal)[^\S\n]*)?(\d+(?:\.\d+)?)[^\S\n]*(%|per[^\S\n]?cent|c(?!\p{L}))?/giu;

export function signalSpeeds(text: string, drafts: Draft[]): void {
  // (Only where the text states no speed of its own: a speed said outright is the one the claim makes.)
  if (drafts.some((d) => d.kind === 'speed')) return;
  for (const m of text.matchAll(VELOCITY_FACTOR_RE)) {
    const n = Number(m[1]);
    const fraction = m[2] && /%|cent/iu.test(m[2]) ? n / 100 : n;
    // (A factor is a fraction of c — "0.66", or "1.2" claimed — and "83" with no sign a percentage.)
    const f = !m[2] && n > 2 && n <= 100 ? n / 100 : fraction;
    if (!(f > 0) || f > 10) continue;
    insertInOrder(drafts, { start: m.index!, end: m.index! + m[0].length, kind: 'speed', quantity: typedSi(f * C_LIGHT, 'm/s'), role: null, derived: `speed = velocity factor × c (${m[0].trim()})` });
  }
  if (drafts.some((d) => d.kind === 'speed')) return;
  const paths = [...text.matchAll(PATH_RE)];
  for (const t of drafts.filter((d) => d.kind === 'duration' && !d.upper)) {
    const before = text.slice(Math.max(0, t.start - 60), t.start);
    const sentenceOfTime = sentenceAround(text, t.start, t.end);
    // (Or a signal's arrival: "a pulse launched into the 12 km fibre spool was detected at the far end 21 µs later".)
    const arrival = SIGNAL_RE.test(sentenceOfTime) && (LATER_AFTER_RE.test(text.slice(t.end, t.end + 20)) || ARRIVAL_BEFORE_RE.test(text.slice(Math.max(0, t.start - 60), t.start)));
    if (!(LATENCY_BEFORE_RE.test(before) || arrival) || NOT_THE_TIME_BEFORE_RE.test(text.slice(Math.max(0, t.start - 25), t.start))) continue;
    const seconds = siOf(t);
    if (seconds === null || !(seconds > 0)) continue;
    // One path said in the time's own sentence: two distances leave open which the signal covers.
    const sentence = sentenceAround(text, t.start, t.end);
    const from = text.indexOf(sentence);
    const own = paths.filter((p) => from >= 0 && p.index! >= from && p.index! < from + sentence.length);
    if (own.length !== 1) continue;
    const p = own[0];
    // (The length of a link between two places, not of a network or of the ground it covers: "1 ms latency
    // across our 1,200 km of motorway coverage" gives no path.)
    const around = text.slice(Math.max(0, p.index! - 40), p.index! + p[0].length + 50);
    if (!(LINK_RE.test(around) || (arrival && LINE_AFTER_RE.test(text.slice(p.index! + p[0].length, p.index! + p[0].length + 30)))) || NETWORK_RE.test(around)) continue;
    const metres = Number(p[1].replace(/,/g, '')) * (PATH_UNIT[p[2].toLowerCase()] ?? NaN);
    if (!(metres > 0)) continue;
    // (There and back is twice the path; a time said plainly is taken as one way, the kinder reading.)
    const trips = ROUND_TRIP_RE.test(text.slice(Math.max(0, t.start - 60), t.end + 20)) ? 2 : 1;
    insertInOrder(drafts, {
      start: Math.min(p.index!, t.start),
      end: Math.max(p.index! + p[0].length, t.end),
      kind: 'speed',
      quantity: typedSi((trips * metres) / seconds, 'm/s'),
      role: null,
      derived: `speed = ${trips === 2 ? '2 × ' : ''}path / time (${p[0]} in ${text.slice(t.start, t.end)}${trips === 2 ? ', there and back' : ''})`,
    });
    return;
  }
}
