/**
 * Powers and energies a claim gives only through their factors, multiplied out: a torque at a shaft
 * speed ("2.4 N·m at 1,450 rpm": P = τω), an energy per cycle at a repetition rate ("420 J per
 * discharge at 8 discharges a second": P = E f), a charge at a voltage ("3,000 mAh at 3.7 V": E = QV)
 * and a flow of water against a head or a pressure ("40 L/s at 12 m of head": P = ρgQH; "2 m³/h at 3
 * bar": P = QΔp). The factors themselves are no figure kinds of the reader; the product is added as a
 * derived figure, with its working, where both factors stand in one clause.
 *
 * Conversions: 1 rpm = 2π/60 rad/s; 1 ft·lbf = 1.355 818 J (NIST SP 811 Appendix B.8, "foot
 * pound-force"); 1 US gallon = 3.785 412 × 10⁻³ m³ (SP 811 B.8); 1 bar = 10⁵ Pa, 1 psi = 6.894 757 kPa
 * (SP 811 B.8); g_n = 9.806 65 m/s² (SI Brochure, standard acceleration of gravity); water taken at
 * 1000 kg/m³ (said as an assumption).
 */
import { FIGURE_SI_UNIT, type FigureRole } from '../types';
import { formatQuantity } from '../../worksheet/quantity';
import { sentenceAround } from './context';
import { insertInOrder, siOf, typedSi, type Draft } from './draft';
import { tokenize } from './numbers';
import { roleFor } from './roles';

const G_N = 9.80665;
const FT_LBF_J = 1.355818;
const US_GALLON_M3 = 3.785412e-3;
const PSI_PA = 6894.757;

interface Factor {
  start: number;
  end: number;
  value: number;
  /** What the factor is. */
  is: 'torque' | 'spin' | 'per-cycle-rate' | 'charge' | 'flow' | 'head' | 'pressure' | 'cycle-energy';
}

const sp = '[^\\S\\n]*';
const U = (body: string) => new RegExp(`^${sp}(?:${body})(?![\\p{L}\\d])`, 'u');
const UI = (body: string) => new RegExp(`^${sp}(?:${body})(?![\\p{L}\\d])`, 'iu');

/** Units that follow a number, with what they make of it (in SI: N·m, rad/s, 1/s, C, m³/s, m, Pa). */
const CYCLE = '[^\\S\\n]*(?:per|a|each|every|/)[^\\S\\n]*(?:cycle|pulse|stroke|shot|discharge|flash|burst|firing|revolution|rev|beat|blow|impact|hit|strike)';
const FACTOR_UNITS: { re: RegExp; is: Factor['is']; si: (n: number) => number }[] = [
  // "2 J per pulse", "0.6 kJ/stroke": an energy said per cycle (the reader keeps no such figure itself).
  { re: U(`J${CYCLE}`), is: 'cycle-energy', si: (n) => n },
  { re: U(`mJ${CYCLE}`), is: 'cycle-energy', si: (n) => n * 1e-3 },
  { re: U(`kJ${CYCLE}`), is: 'cycle-energy', si: (n) => n * 1e3 },
  { re: U(`MJ${CYCLE}`), is: 'cycle-energy', si: (n) => n * 1e6 },
  { re: UI(`joules?${CYCLE}`), is: 'cycle-energy', si: (n) => n },
  { re: U('N[·⋅.\\- ]?m|Nm'), is: 'torque', si: (n) => n },
  { re: UI('newton[- ]?met(?:re|er)s?'), is: 'torque', si: (n) => n },
  { re: U('kN[·⋅.\\- ]?m|kNm'), is: 'torque', si: (n) => n * 1e3 },
  { re: U('mN[·⋅.\\- ]?m|mNm'), is: 'torque', si: (n) => n * 1e-3 },
  { re: UI('lb[·⋅.\\- ]?ft|lbf[·⋅.\\- ]?ft|ft[·⋅.\\- ]?lbf?s?|pound[- ]f(?:ee|oo)t|foot[- ]pounds?'), is: 'torque', si: (n) => n * FT_LBF_J },
  { re: UI('rpm|r/min|rev/min|revs?(?:[^\\S\\n]+per|/|[^\\S\\n]+a)[^\\S\\n]+min(?:ute)?|revolutions?[^\\S\\n]+(?:per|a)[^\\S\\n]+minute|turns[^\\S\\n]+(?:per|a)[^\\S\\n]+minute|min⁻¹|min\\^-1'), is: 'spin', si: (n) => (n * 2 * Math.PI) / 60 },
  { re: UI('rad/s|radians?[^\\S\\n]+(?:per|a)[^\\S\\n]+second'), is: 'spin', si: (n) => n },
  { re: UI('rev/s|rps|revolutions?[^\\S\\n]+(?:per|a)[^\\S\\n]+second'), is: 'spin', si: (n) => n * 2 * Math.PI },
  {
    re: UI('(?:cycles?|pulses?|strokes?|shots?|discharges?|flashes?|bursts?|firings?|times|beats?|blows?|impacts?|hits?|strikes?)[^\\S\\n]+(?:per|a|each|every)[^\\S\\n]+(?:second|sec)|(?:cycles?|pulses?|strokes?|shots?|discharges?)/s'),
    is: 'per-cycle-rate',
    si: (n) => n,
  },
  { re: U('Hz'), is: 'per-cycle-rate', si: (n) => n },
  { re: U('kHz'), is: 'per-cycle-rate', si: (n) => n * 1e3 },
  { re: UI('(?:cycles?|pulses?|strokes?|shots?|discharges?|flashes?|firings?|times|beats?|blows?|impacts?|hits?|strikes?)[^\\S\\n]+(?:per|a|each|every)[^\\S\\n]+minute|(?:cycles?|pulses?|strokes?)/min'), is: 'per-cycle-rate', si: (n) => n / 60 },
  { re: U('mAh|mA·h|mA h'), is: 'charge', si: (n) => n * 3.6 },
  { re: U('Ah|A·h'), is: 'charge', si: (n) => n * 3600 },
  { re: UI('milliamp(?:ere)?[- ]hours?'), is: 'charge', si: (n) => n * 3.6 },
  { re: UI('amp(?:ere)?[- ]hours?'), is: 'charge', si: (n) => n * 3600 },
  { re: UI('L/s|l/s|lps|lit(?:re|er)s?[^\\S\\n]+(?:per|a|each)[^\\S\\n]+second'), is: 'flow', si: (n) => n * 1e-3 },
  { re: UI('L/min|l/min|lpm|lit(?:re|er)s?[^\\S\\n]+(?:per|a|each)[^\\S\\n]+minute'), is: 'flow', si: (n) => (n * 1e-3) / 60 },
  { re: UI('L/h|l/h|lit(?:re|er)s?[^\\S\\n]+(?:per|an|each)[^\\S\\n]+hour'), is: 'flow', si: (n) => (n * 1e-3) / 3600 },
  { re: UI('m³/h|m3/h|m\\^3/h|cubic[^\\S\\n]+met(?:re|er)s?[^\\S\\n]+(?:per|an|each)[^\\S\\n]+hour'), is: 'flow', si: (n) => n / 3600 },
  { re: UI('m³/s|m3/s|m\\^3/s|cubic[^\\S\\n]+met(?:re|er)s?[^\\S\\n]+(?:per|a|each)[^\\S\\n]+second|cumecs?'), is: 'flow', si: (n) => n },
  { re: UI('gpm|(?:US[^\\S\\n]+)?gal(?:lon)?s?[^\\S\\n]+(?:per|a)[^\\S\\n]+minute|gal/min'), is: 'flow', si: (n) => (n * US_GALLON_M3) / 60 },
  { re: UI('(?:m|met(?:re|er)s?)[^\\S\\n]+(?:of[^\\S\\n]+)?(?:total[^\\S\\n]+)?(?:head|lift|water[^\\S\\n]+column)|mWC|m[^\\S\\n]+H2O'), is: 'head', si: (n) => n },
  { re: UI('(?:ft|feet|foot)[^\\S\\n]+(?:of[^\\S\\n]+)?(?:head|lift)'), is: 'head', si: (n) => n * 0.3048 },
  { re: U('bar'), is: 'pressure', si: (n) => n * 1e5 },
  { re: U('kPa'), is: 'pressure', si: (n) => n * 1e3 },
  { re: U('MPa'), is: 'pressure', si: (n) => n * 1e6 },
  { re: UI('psi'), is: 'pressure', si: (n) => n * PSI_PA },
];

/** "a head of 12 m", "lifts it 30 m": a height said before its number, for a flow's head. */
const HEAD_BEFORE_RE = /(?<!\p{L})(?:head(?:[^\S\n]+of)?|lift(?:s|ed|ing)?[^\S\n]+(?:it|them|the[^\S\n]+water)?[^\S\n]*(?:up[^\S\n]+)?(?:to|by|through)?|(?:falls?|falling|drops?|dropping)(?:[^\S\n]+(?:of|through|by))?|height[^\S\n]+of)[^\S\n]*$/iu;
/** After a bare metre: "12 m head", "a 4 m fall", "30 m of head", "8 m total head". */
const HEAD_AFTER_RE = /^[^\S\n]*(?:of[^\S\n]+)?(?:(?:total|net|gross|static|dynamic)[^\S\n]+)?(?:head|fall|drop)(?!\p{L})/iu;
/** Between a flow and a bare metre: "40 L/s through 12 m", "0.5 m³/min of water up 30 m", "against 12 m". */
const FLOW_TO_HEIGHT_RE = /^[^\S\n]*(?:of[^\S\n]+(?:water|brine|fluid)[^\S\n]+)?(?:up(?:[^\S\n]+to)?|through|against|over|to[^\S\n]+a[^\S\n]+height[^\S\n]+of|by)[^\S\n]*(?:(?:about|some|roughly|around|nearly)[^\S\n]+)?$/iu;
/** A bare metre after a number: "12 m". */
const METRE_RE = U('m|met(?:re|er)s?');

/** Per cycle, said after an energy ("420 J per discharge") or before it ("each discharge cycle delivers 420 J"). */
const PER_CYCLE_AFTER_RE = /^[^\S\n]*(?:(?:per|a|each|every|\/)[^\S\n]*(?:cycle|pulse|stroke|shot|discharge|flash|burst|firing|revolution|rev|beat)|(?:laser[^\S\n]+)?(?:pulses|shots|flashes|bursts))(?!\p{L})/iu;
const PER_CYCLE_BEFORE_RE = /(?<!\p{L})(?:each|every|a[^\S\n]+single|one|per)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:cycle|pulse|stroke|shot|discharge|flash|burst|firing|revolution|beat)[^.;!?\n]{0,30}$/iu;

/** Lifting verbs before a mass: "lifts 60 kg", "raises a 150 kg load", "hoists". */
const LIFT_BEFORE_RE = /(?<!\p{L})(?:lifts?|lifted|lifting|raises?|raised|raising|hoists?|hoisted|hoisting|hauls?[^\S\n]+up|winch(?:es|ed)?[^\S\n]+up)[^\S\n]+(?:(?:a|an|the|its)[^\S\n]+)?$/iu;
/** A lift said around a mass: "takes a 250 kg pallet … up", "winds a bag up", "lifts", "raises", "hoists". */
const LIFT_IN_SENTENCE_RE = /(?<!\p{L})(?:lifts?|lifted|lifting|raises?|raised|raising|hoists?|hoisted|hoisting|winds?[^.;!?\n]{0,40}?up|wound[^.;!?\n]{0,40}?up|hauls?[^.;!?\n]{0,40}?up|takes?[^.;!?\n]{0,50}?up[^\S\n]+(?:to|the|a|an|one|\d))(?!\p{L})/iu;
/** A height after a number: "9 m", "one metre", "12 feet" (group 1 set for feet). */
const HEIGHT_RE = /^[^\S\n]*(?:m|met(?:re|er)s?|(ft|feet|foot))(?![\p{L}\d/²³])/iu;
/** A counterweight or a balanced load ("counterweighted", "counterbalance"), or a lift or elevator, which nearly always has one. */
const COUNTERWEIGHT_RE = /(?<!\p{L})(?:counter-?weight\w*|counter-?balanc\w*|balanced[^\S\n]+by|balance[^\S\n]+weights?|elevators?|(?:passenger|goods|service|platform|stair)[^\S\n]+lifts?|lift[^\S\n]+(?:cars?|cabins?|shafts?)|the[^\S\n]+lift(?![^\S\n]+(?:off|of|force)))(?!\p{L})/iu;
/** A torque said as a rating: "peak torque", "max. torque", "rated", "stall", "holding". */
const RATED_TORQUE_BEFORE_RE = /(?<!\p{L})(?:peak|max(?:imum|\.)?|rated|nominal|continuous|stall|holding|starting|breakaway|up[^\S\n]+to)(?:[^\S\n]+torque)?[^\S\n]*[:=]?[^\S\n]*(?:of[^\S\n]+)?$/iu;
/** A speed said as part of a range or a bound: "0–4,000 rpm", "from 1,500 rpm", "up to 3,000 rpm", "below 2,000 rpm", "1,000 to 3,000 rpm". */
const SPEED_SPAN_RE = /(?:[–-][^\S\n]*|\d[^\S\n]*(?:to|and|or)[^\S\n]+|(?<!\p{L})(?:from|up[^\S\n]+to|below|above|under|over|between|beyond)[^\S\n]+)$/iu;
/** A maximum said before a factor: "max flow", "maximum head", "shut-off head", "up to", "peak". */
const MAX_BEFORE_RE = /(?<!\p{L})(?:max(?:imum|\.)?|peak|shut-?off|up[^\S\n]+to|no[^\S\n]+more[^\S\n]+than|at[^\S\n]+most)(?:[^\S\n]+(?:flow|head|lift|pressure|delivery|output))?[^\S\n]*[:=]?[^\S\n]*(?:of[^\S\n]+)?$/iu;
/** Words joining a flow and its head or pressure as one working point: "at", "against", "to", "through", "with", "into". */
const POINT_JOIN_RE = /^[^\S\n]*(?:(?:of[^\S\n]+)?(?:water|oil|air|fluid|brine)[^\S\n]+)?(?:at|against|to|through|with|into|up(?:[^\S\n]+to)?|over|on|@|falling|dropping|down|from)(?!\p{L})/iu;
function workingPoint(text: string, a: { start: number; end: number }, b: { start: number; end: number }): boolean {
  const [x, y] = a.start < b.start ? [a, b] : [b, a];
  return POINT_JOIN_RE.test(text.slice(x.end, y.start).replace(/^[^\S\n]*[)\]]/u, ' ').replace(/^[^\S\n]*(?:of[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?=(?:at|against|to|through|with|into|up|over|on|@|falling|dropping|down|from)(?!\p{L}))/iu, ' '));
}
/** A store's size: "48 V 14 Ah frame battery", "pack is 48 V 17.5 Ah", "a 3,000 mAh cell", "capacity". */
const STORE_SIZE_RE = /(?<!\p{L})(?:batter(?:y|ies)|packs?|cells?|banks?|capacity|rated|nominal|power[- ]?banks?|accumulators?)(?!\p{L})/iu;
/** A pump (its water power is what it gives) or a turbine or wheel (what it takes). */
const PUMP_RE = /(?<!\p{L})(?:pumps?|pumping|pumped|circulators?|boosters?|fire[- ]pumps?|lifts?|lifting|raises?|raising)(?!\p{L})/iu;
const TURBINE_RE = /(?<!\p{L})(?:turbines?|water[- ]?wheels?|wheels?|Peltons?|Kaplans?|runners?|penstocks?|weirs?|falls?|falling)(?!\p{L})/iu;

function factorsOf(text: string): Factor[] {
  const out: Factor[] = [];
  for (const t of tokenize(text)) {
    if (t.skip || t.plusMinus) continue;
    const n = Number(t.num);
    if (!Number.isFinite(n)) continue;
    const rest = text.slice(t.numEnd, t.numEnd + 50);
    let hit = false;
    for (const u of FACTOR_UNITS) {
      const m = u.re.exec(rest);
      if (!m) continue;
      out.push({ start: t.start, end: t.numEnd + m[0].length, value: u.si(n), is: u.is });
      hit = true;
      break;
    }
    // "a head of 12 m", "lifts the water 30 m": a bare metre read as a head where the words before say so.
    if (!hit) {
      const m = METRE_RE.exec(rest);
      const last = out[out.length - 1];
      // ("lifts 40 L/s through 12 m", "0.5 m³/min up 30 m", "a 12 m head", "a 4 m fall": a height said with a
      // flow just before it, or named after it.)
      const afterFlow = last?.is === 'flow' && FLOW_TO_HEIGHT_RE.test(text.slice(last.end, t.start));
      if (m && (afterFlow || HEAD_BEFORE_RE.test(text.slice(Math.max(0, t.start - 40), t.start)) || HEAD_AFTER_RE.test(rest.slice(m[0].length)))) out.push({ start: t.start, end: t.numEnd + m[0].length, value: n, is: 'head' });
    }
  }
  return out;
}

const clauseGap = (text: string, a: { end: number }, b: { start: number }) => text.slice(a.end, b.start);
const joined = (text: string, a: { start: number; end: number }, b: { start: number; end: number }) => {
  const [x, y] = a.start < b.start ? [a, b] : [b, a];
  const gap = clauseGap(text, x, y);
  return gap.length <= 70 && !/[.!?](?:\s|$)|\n|;/u.test(gap);
};

const overlaps = (drafts: Draft[], start: number, end: number, kind: Draft['kind']) => drafts.some((d) => d.kind === kind && d.start < end && start < d.end);

/** Adds the powers and energies the text gives through their factors (see the head of this file). */
export function multipliedOut(text: string, drafts: Draft[]): void {
  const factors = factorsOf(text);
  const used = new Set<Factor>();
  const pairOf = (f: Factor, is: Factor['is'][]) => factors.filter((g) => g !== f && !used.has(g) && is.includes(g.is) && joined(text, f, g)).sort((a, b) => Math.abs(a.start - f.start) - Math.abs(b.start - f.start))[0];
  const add = (a: { start: number; end: number }, b: { start: number; end: number }, kind: 'power' | 'energy', si: number, derived: string, role: FigureRole, assumption?: string) => {
    const start = Math.min(a.start, b.start);
    const end = Math.max(a.end, b.end);
    if (overlaps(drafts, start, end, kind)) return;
    // A stated figure within 10 % of the product, on no other side by its words, is the same flow said
    // outright ("1.65 N·m at 1,850 rpm … that's 319.7 W on the shaft"; "the display shows about 630 W";
    // "rated 1.1 kW"): the product is set aside as its working, and the stated one takes its side.
    const same = drafts.find((d) => d.kind === kind && !d.derived && d.role !== 'aside' && (d.role === null || d.role === role) && Math.abs((siOf(d) ?? NaN) - si) <= 0.1 * Math.max(si, siOf(d) ?? 0));
    if (same) {
      if (same.role === null && role !== 'aside') same.role = role;
      role = 'aside';
    }
    insertInOrder(drafts, { start, end, kind, quantity: typedSi(si, FIGURE_SI_UNIT[kind]), role, derived, assumption });
  };
  const roleAround = (start: number, end: number): FigureRole => {
    const r = roleFor(text, 'power', start, end, Math.max(0, start - 80));
    return r === 'excess' ? 'out' : r;
  };

  // ("30 lb-ft": a torque, not a mass of 30 lb; "2.4 N·m", not a force of 2.4 N.)
  for (const f of factors.filter((g) => g.is === 'torque')) {
    for (let i = drafts.length - 1; i >= 0; i--) if ((drafts[i].kind === 'mass' || drafts[i].kind === 'thrust') && drafts[i].start >= f.start && drafts[i].end <= f.end) drafts.splice(i, 1);
  }

  // Torque at a shaft speed: P = τω.
  // (Not a spec sheet's peak or rated torque, nor a speed said as a range or a bound — "peak torque 250 N·m
  // (0–4,000 rpm)", "400 N·m from 1,500 rpm": those are no one working point.)
  for (const f of factors) {
    if (f.is !== 'torque' || used.has(f)) continue;
    if (RATED_TORQUE_BEFORE_RE.test(text.slice(Math.max(0, f.start - 30), f.start))) continue;
    const w = pairOf(f, ['spin']);
    if (!w || SPEED_SPAN_RE.test(text.slice(Math.max(0, w.start - 12), w.start)) || /^[^\S\n]*(?:rpm|r\/min|rev\/min)?[^\S\n]*(?:(?:–|-|to)[^\S\n]*[\d.]|and up|upwards|or more)/iu.test(text.slice(w.end, w.end + 16))) continue;
    used.add(f).add(w);
    const role = roleAround(Math.min(f.start, w.start), Math.max(f.end, w.end)) ?? 'out';
    add(f, w, 'power', f.value * w.value, `power = torque × angular speed (${formatQuantity(f.value, 'N m')} × ${formatQuantity(w.value, 'rad/s')})`, role);
  }

  // A charge at a voltage: E = QV.
  for (const f of factors) {
    if (f.is !== 'charge' || used.has(f)) continue;
    const v = drafts.filter((d) => d.kind === 'voltage' && joined(text, f, d)).sort((a, b) => Math.abs(a.start - f.start) - Math.abs(b.start - f.start))[0];
    if (!v) continue;
    const volts = Number.parseFloat(v.quantity);
    if (!Number.isFinite(volts) || !/(?:^|\s)V$/u.test(v.quantity.trim())) continue;
    used.add(f);
    // ("Removable 48 V 14 Ah frame battery", "Pack is 48 V 17.5 Ah": a store's size, not a flow in or out.)
    const near = text.slice(Math.max(0, Math.min(f.start, v.start) - 30), Math.max(f.end, v.end) + 30);
    const role = STORE_SIZE_RE.test(near) ? 'aside' : roleAround(Math.min(f.start, v.start), Math.max(f.end, v.end));
    add(f, v, 'energy', f.value * volts, `energy = charge × voltage (${formatQuantity(f.value, 'C')} × ${formatQuantity(volts, 'V')})`, role ?? 'in');
  }

  // A flow against a head or a pressure: P = ρgQH, P = QΔp.
  for (const f of factors) {
    if (f.is !== 'flow' || used.has(f)) continue;
    // (Said as one working point — "40 L/s against 12 m", "at a head of 4 m", "2 m³/h at 3 bar" — not a
    // list's two entries: "Flow 60 L/min, head 40 m" on a pump's plate gives each at its own extreme.)
    const h = factors
      .filter((g) => g !== f && !used.has(g) && (g.is === 'head' || g.is === 'pressure') && joined(text, f, g) && workingPoint(text, f, g))
      .sort((a, b) => Math.abs(a.start - f.start) - Math.abs(b.start - f.start))[0];
    // (Not a spec's maximum flow and maximum head, which a pump never gives at once: "max flow 60 L/min, max head 40 m".)
    // ("Delivers up to 1.8 L/s at 25 m total head" is still one working point: its "up to" bounds the flow there.)
    if (!h || [f, h].some((g) => MAX_BEFORE_RE.test(text.slice(Math.max(0, g.start - 25), g.start)) && !/up[^\S\n]+to[^\S\n]*$/iu.test(text.slice(Math.max(0, g.start - 10), g.start)))) continue;
    used.add(f).add(h);
    const sentence = sentenceAround(text, Math.min(f.start, h.start), Math.max(f.end, h.end));
    const pump = PUMP_RE.test(sentence);
    const turbine = TURBINE_RE.test(sentence);
    const role: FigureRole = pump && !turbine ? 'out' : turbine && !pump ? 'in' : roleAround(Math.min(f.start, h.start), Math.max(f.end, h.end));
    if (role === null) continue;
    if (h.is === 'head') {
      add(f, h, 'power', 1000 * G_N * f.value * h.value, `power = ρ g × flow × head (1000 kg/m³ × 9.80665 m/s² × ${formatQuantity(f.value, 'm^3/s')} × ${formatQuantity(h.value, 'm')})`, role, 'Water taken at 1000 kg/m³.');
    } else {
      add(f, h, 'power', f.value * h.value, `power = flow × pressure (${formatQuantity(f.value, 'm^3/s')} × ${formatQuantity(h.value, 'Pa')})`, role);
    }
  }

  // (Not where a counterweight carries the load: a lift's motor lifts only the imbalance.)
  const balanced = COUNTERWEIGHT_RE.test(text);
  // A mass lifted at a speed: P = m g v ("lifts 60 kg at 1 m/s"); the mass is the load's, set aside.
  for (const m of drafts.filter((d) => !balanced && d.kind === 'mass' && !d.derived && d.role !== 'aside')) {
    if (!LIFT_BEFORE_RE.test(text.slice(Math.max(0, m.start - 40), m.start))) continue;
    const v = drafts.find((d) => d.kind === 'speed' && !d.derived && d.start > m.end && joined(text, m, d) && /^[^\S\n]*(?:at|,)[^\S\n]+(?:(?:about|some|roughly|a[^\S\n]+steady)[^\S\n]+)?$/iu.test(text.slice(m.end, d.start).replace(/^[^\S\n]+(?:load|weight|mass|crate|block|pallet|bucket)s?/iu, '')));
    const kg = siOf(m);
    const ms = v ? siOf(v) : null;
    if (!v || kg === null || ms === null) continue;
    const role = roleAround(m.start, v.end) ?? 'out';
    const start = m.start;
    const end = v.end;
    if (overlaps(drafts, start, end, 'power')) continue;
    m.role = 'aside';
    v.role = 'aside';
    insertInOrder(drafts, { start, end, kind: 'power', quantity: typedSi(kg * G_N * ms, 'W'), role: role === 'in' ? 'out' : role, derived: `power = mass × g × speed (${formatQuantity(kg, 'kg')} × 9.80665 m/s² × ${formatQuantity(ms, 'm/s')})` });
  }

  // A mass lifted through a height in a time: P = m g h / t ("takes a 250 kg pallet up about 9 m in roughly
  // 40 seconds", "winds a two-kilogram bag up one metre in one second").
  for (const m of drafts.filter((d) => !balanced && d.kind === 'mass' && !d.derived && !drafts.some((p) => p.start === d.start && p.derived))) {
    const sentence = sentenceAround(text, m.start, m.end);
    const sStart = text.indexOf(sentence);
    if (sStart < 0 || !LIFT_IN_SENTENCE_RE.test(text.slice(Math.max(sStart, m.start - 60), m.end + 80))) continue;
    const height = tokenize(sentence)
      .map((t) => ({ t, u: HEIGHT_RE.exec(sentence.slice(t.numEnd, t.numEnd + 12)) }))
      .find(({ t, u }) => u !== null && sStart + t.start > m.end && !t.skip);
    const time = drafts.find((d) => d.kind === 'duration' && d.start > m.end && d.start < sStart + sentence.length && /(?<!\p{L})(?:in|every|each|within|taking)[^\S\n]+(?:(?:about|roughly|some|around|just|under|over|a[^\S\n]+bit[^\S\n]+(?:over|under))[^\S\n]+)?$/iu.test(text.slice(Math.max(0, d.start - 25), d.start)));
    const [kg, s_] = [siOf(m), time ? siOf(time) : null];
    if (!height || !time || kg === null || s_ === null || !(s_ > 0)) continue;
    const h = Number(height.t.num) * (height.u![1] ? 0.3048 : 1);
    if (!(h > 0)) continue;
    const end = Math.max(time.end, sStart + height.t.numEnd + height.u![0].length);
    if (overlaps(drafts, m.start, end, 'power')) continue;
    m.role = 'aside';
    insertInOrder(drafts, { start: m.start, end, kind: 'power', quantity: typedSi((kg * G_N * h) / s_, 'W'), role: 'out', derived: `power = mass × g × height ÷ time (${formatQuantity(kg, 'kg')} × 9.80665 m/s² × ${formatQuantity(h, 'm')} ÷ ${formatQuantity(s_, 's')})` });
  }

  // An energy said per cycle that the reader did not keep ("2 J per pulse at 50 Hz"): P = E f.
  for (const f of factors) {
    if (f.is !== 'cycle-energy' || used.has(f) || drafts.some((d) => d.kind === 'energy' && d.start === f.start)) continue;
    const r = pairOf(f, ['per-cycle-rate']);
    if (!r || [f, r].some((g) => MAX_BEFORE_RE.test(text.slice(Math.max(0, g.start - 25), g.start)))) continue;
    used.add(f).add(r);
    const role = roleAround(Math.min(f.start, r.start), Math.max(f.end, r.end)) ?? 'out';
    add(f, r, 'power', f.value * r.value, `power = energy per cycle × cycles per second (${formatQuantity(f.value, 'J')} × ${formatQuantity(r.value, 'Hz')})`, role);
  }

  // An energy per cycle at a repetition rate: P = E f; the energy itself is the cycle's, set aside.
  for (const e of drafts.filter((d) => d.kind === 'energy' && !d.derived && d.role !== 'aside')) {
    const perCycle = PER_CYCLE_AFTER_RE.test(text.slice(e.end, e.end + 30)) || PER_CYCLE_BEFORE_RE.test(text.slice(Math.max(0, e.start - 60), e.start));
    if (!perCycle) continue;
    const r = factors.filter((g) => g.is === 'per-cycle-rate' && !used.has(g) && joined(text, e, g)).sort((a, b) => Math.abs(a.start - e.start) - Math.abs(b.start - e.start))[0];
    if (!r || [e, r].some((g) => MAX_BEFORE_RE.test(text.slice(Math.max(0, g.start - 25), g.start)))) continue;
    used.add(r);
    const si = siOf(e);
    if (si === null) continue;
    const start = Math.min(e.start, r.start);
    const end = Math.max(e.end, r.end);
    // (As said of the energy, else of the pair, else what the pulses give: "35 mJ per pulse at 20 Hz".)
    const role = e.role ?? roleAround(start, end) ?? 'out';
    if (overlaps(drafts, start, end, 'power')) continue;
    e.role = 'aside';
    insertInOrder(drafts, { start, end, kind: 'power', quantity: typedSi(si * r.value, 'W'), role, derived: `power = energy per cycle × cycles per second (${formatQuantity(si, 'J')} × ${formatQuantity(r.value, 'Hz')})` });
  }
}
