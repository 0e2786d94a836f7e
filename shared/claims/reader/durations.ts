/**
 * Durations (the claim reader, shared/claims/reader.ts): times that are not the run's set aside
 * ("took 18 months to build"), an energy "a day" over a longer run read as a power, and the energy
 * of each power over the time said with it (energy = power × time).
 */
import { formatQuantity } from '../../worksheet/quantity';
import { sentenceAround } from './context';
import { insertAfter, sameClause, sentenceOf, siOf, typedSi, upperSiOf, type Draft } from './draft';
import { tokenize } from './numbers';
import { C_LIGHT } from '../../checks/constants';

/** Words of a time that is not how long the device ran. */
const NOT_A_RUN_RE =
  /(?<!\p{L})(?:build|built|develop\w*|design(?:ed|ing)?|research\w*|assembl\w*|construct\w*|ago|warrant\w*|guarantee\w*|founded|old|manufactur\w*|lead time|payback|pays? (?:for )?(?:it|it)self|amorti[sz]\w*|deliver(?:y|ies) (?:time|in)|ship(?:s|ping)? in|funding|grant|contract|project|programme|program|schedule[d]?|planned|deadline|install\w*|fit(?:s|ted|ting)?|bolts?|bolted|retrofit\w*|replac\w*|overhaul\w*|integrat\w*|spent|calibrat\w*|settl\w*|drills?|swings?|period|saves?|saving|savings|bills?|income|earns?|costs?)(?!\p{L})/iu;

/** Right before a time: a payback, a warranty, a guarantee, a life or a lead time ("payback est.", "pays for itself in"). */
const TERM_NOT_RUN_BEFORE_RE =
  /(?<!\p{L})(?:payback(?:[^\S\n]+(?:period|time))?|pays?[^\S\n]+(?:for[^\S\n]+)?(?:it|them)sel(?:f|ves)|warrant(?:y|ied|ee)|guarantee[ds]?|(?:service|design|useful|expected|rated)[^\S\n]+life(?:time)?|lifetime|(?:qualified[^\S\n]+)?life(?=[^\S\n]*(?:[>≥:=]|of(?!\p{L})|is(?!\p{L})))|lead[^\S\n]+time|amorti[sz]\w*)(?!\p{L})[^.;!?\n\d]{0,20}$/iu;
/** Right after a time: "… warranty", "… payback", "… design life". */
const TERM_NOT_RUN_AFTER_RE = /^[^\S\n]*(?:[-–][^\S\n]*)?(?:warrant(?:y|ies)|guarantee|payback|(?:service|design|useful)[^\S\n]+life|lifetime|lifespan|between[^\S\n]+(?:over-?[^\S\n]*hauls?|services|servicing|maintenance|inspections|rebuilds|refills|recharges))(?!\p{L})/iu;

/** Right before the time a rating's surge lasts: "surge for", "peak for about", "Peak: up to 7.5 kW for". */
const SURGE_BEFORE_RE = /(?<!\p{L})(?:surges?|peaks?|bursts?|inrush|overloads?|motor[^\S\n]+starting)(?:[^\S\n]*(?::|of|at)?[^\S\n]*(?:up[^\S\n]+to[^\S\n]+)?[\d.,]+[^\S\n]*[kMG]?W)?[^\S\n]+(?:is[^\S\n]+real[^\S\n]+)?(?:for|of|lasting|during)[^\S\n]+(?:(?:up[^\S\n]+to|about|around|roughly|some|only|just|at[^\S\n]+most)[^\S\n]+)?$/iu;
/** A sentence that is a label of a term: "Duration: five months", "Project duration | 24 months". */
const TERM_LABEL_RE = /^[\s•*-]*(?:(?:project|proposed|planned|total|expected)[^\S\n]+)?(?:duration|term|timescale|time ?frame|period)[^\S\n]*(?:[:|]|\.{2,})/iu;
/** Words of a funder or an application. */
const FUNDING_RE = /(?<!\p{L})(?:grants?|funding|funders?|voucher|proposals?|applicants?|application|requested|budget|award|fund|work packages?|milestones?|backers?|campaign)(?!\p{L})/iu;

/** A sentence of a supposition: "if …", "unless …", "should it …", "would", "could". */
// ("were" only as a supposition's inversion, "were it to run a week": not "the lamps were still lit".)
const SUPPOSED_TIME_RE = /(?<!\p{L})(?:if|unless|should|would|could|were[^\S\n]+(?:it|they|we|you|he|she|this|that)(?=[^\S\n]+to(?!\p{L})))(?!\p{L})/iu;

/** Just before a charging time: "charges to 80 % in", "recharged in", "refills in", "back to full in", "a full charge takes", "charging time of". */
export const CHARGING_TIME_RE =
  /(?<!\p{L})(?<!self[- ])(?:(?:re)?charg(?:es|ed|ing|e)|refill(?:s|ed|ing)?|fills?[^\S\n]+up|tops?[^\S\n]+up|topped[^\S\n]+up|(?:back[^\S\n]+)?to[^\S\n]+full)(?!\p{L})[^.;!?\n]{0,35}?(?:in|takes|took|of|within|under|about|around|just|only)?[^\S\n]*(?:(?:about|around|roughly|just|only|under|less than)[^\S\n]+)?$/iu;

/** A duration said as the time a charge takes. */
export const isChargingTime = (text: string, d: { start: number | null | undefined }): boolean =>
  d.start != null && CHARGING_TIME_RE.test(text.slice(Math.max(0, d.start - 50), d.start));

/** Words of an output given only in bursts or as a rating of what it can do at most. */
export const BURST_RE = /(?<!\p{L})(?:for short periods|for a short (?:time|period)|briefly|momentarily|in (?:short )?bursts|at peak|peaks? (?:at|of)|peak (?:power|output)|for (?:a few|several) (?:seconds|minutes)|for a (?:fraction of a second|split second|moment))(?!\p{L})/iu;

/** A length said as a distance covered: "across a 12 km link", "through 1,000 km of fibre". */
/** Small counts in words, as a length is spelt ("a twelve-kilometre test line", "fifty miles"). */
const LENGTH_WORDS: Record<string, number> = { one: 1, two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10, eleven: 11, twelve: 12, fifteen: 15, twenty: 20, thirty: 30, forty: 40, fifty: 50, sixty: 60, eighty: 80, hundred: 100 };
const DISTANCE_RE =
  /(?<![\p{L}\p{N}.,-])(\d{1,3}(?:,\d{3})+|\d+(?:\.\d+)?|one|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve|fifteen|twenty|thirty|forty|fifty|sixty|eighty|hundred)(?:[^\S\n]*|-)(km|kilomet(?:re|er)s?|m|met(?:re|er)s?|miles?|light[- ]?years?|ly|AU|astronomical units?)(?![\p{L}\p{N}/²³])/giu;
const METRES_PER: Record<string, number> = {
  km: 1000, kilometre: 1000, kilometer: 1000, m: 1, metre: 1, meter: 1, mile: 1609.344,
  // The light-year (IAU 2012 Resolution B2, Julian year) and the astronomical unit (IAU 2012 Resolution B2), both exact.
  'light-year': 9460730472580800, 'light year': 9460730472580800, lightyear: 9460730472580800, ly: 9460730472580800, au: 149597870700, 'astronomical unit': 149597870700,
};
/** Words of something that travels at a speed worth setting against c: light, a signal, a pulse, a message. */
const SIGNAL_CONTEXT_RE = /(?<!\p{L})(?:light|superluminal|faster[- ]than[- ]light|FTL|signals?|pulses?|photons?|latency|message|transmission|transmits?|beam|wave(?:front)?|speed of light)(?!\p{L})/iu;
/** A craft travelling between worlds or stars. */
const CRAFT_TRAVEL_RE = /(?<!\p{L})(?:spacecraft|starships?|ships?|craft|probes?|drives?|rockets?|vehicles?)(?!\p{L})[^]*?(?<!\p{L})(?:Earth|Moon|Mars|Venus|Jupiter|Saturn|Sun|stars?|planets?|orbit|light[- ]?years?)(?!\p{L})|(?<!\p{L})(?:Earth|Moon)[^\S\n]+to[^\S\n]+(?:the[^\S\n]+)?(?:Moon|Mars|Venus|Jupiter|Saturn|Sun|Pluto)(?!\p{L})/iu;
/** Just before the time a distance took: "in", "after", "within", "arrived after", "taking". */
const TOOK_BEFORE_RE = /(?<!\p{L})(?:in|after|within|taking|took|takes|in (?:just|only|under|about)|arrives?|arrived|arriving|gets? there|got there)[^\S\n]+(?:(?:just|only|about|around|roughly|some|a mere)[^\S\n]+)?$/iu;

/** A unit of length right after a number said in words. */
const SPOKEN_LENGTH_UNIT_RE = /^(?:[^\S\n]*|-)(km|kilomet(?:re|er)s?|miles?|light[- ]?years?)(?!\p{L})/iu;
/** Lengths said in words ("fifty-six million kilometres"), as matches shaped like DISTANCE_RE's: [whole, number, unit]. */
function spokenLengths(text: string): RegExpMatchArray[] {
  const found: RegExpMatchArray[] = [];
  for (const t of tokenize(text)) {
    if (!t.words || t.skip) continue;
    const u = SPOKEN_LENGTH_UNIT_RE.exec(text.slice(t.numEnd));
    if (!u) continue;
    const m = Object.assign([text.slice(t.start, t.numEnd + u[0].length), String(Number(t.num)), u[1]], { index: t.start, input: text }) as RegExpMatchArray;
    found.push(m);
  }
  return found;
}

/**
 * A distance covered in a stated time, in a text about light or a signal ("sends a pulse across a 12 km
 * link in 20 µs"): the speed it implies, as a figure of its own (speed = distance / time), for the
 * light-speed check. The time is the claim's, not set aside.
 */
function speedsFromDistances(text: string, drafts: Draft[]): Set<Draft> {
  const used = new Set<Draft>();
  const signal = SIGNAL_CONTEXT_RE.test(text);
  // (Or a craft said to cover a distance between worlds: "Earth to Mars … fifty-six million kilometres … in
  // ninety seconds" — taken only where the speed it implies is a sizeable part of c, worth setting against it.)
  if (!signal && !CRAFT_TRAVEL_RE.test(text)) return used;
  for (const d of [...drafts]) {
    if (d.kind !== 'duration' || d.role === 'aside' || d.derived) continue;
    const sentenceStart = Math.max(text.lastIndexOf('\n', d.start - 1) + 1, ...['. ', '! ', '? '].map((p) => { const i = text.lastIndexOf(p, d.start - 1); return i < 0 ? 0 : i + 2; }));
    const before = text.slice(sentenceStart, d.start);
    if (!TOOK_BEFORE_RE.test(before)) continue;
    let lengths: RegExpMatchArray[] = [...before.matchAll(DISTANCE_RE)];
    // ("Earth to Mars — fifty-six million kilometres — in ninety seconds": a length said in words.)
    if (lengths.length === 0) lengths = spokenLengths(before);
    let from = sentenceStart;
    // ("• 1,200 km between the two stations / • first bit arrives 2.1 ms after sending": a list's item before
    // gives the length of the link.)
    if (lengths.length === 0 && /^[^\S\n]*[•*·–-][^\S\n]/u.test(before) && /(?<!\p{L})(?:arriv\w*|reach\w*|receiv\w*|detect\w*|travel\w*|signals?|bits?|pulses?|messages?|packets?|photons?)(?!\p{L})/iu.test(before)) {
      const prevStart = text.lastIndexOf('\n', sentenceStart - 2) + 1;
      const prev = text.slice(prevStart, Math.max(prevStart, sentenceStart - 1));
      if (/^[^\S\n]*[•*·–-][^\S\n]/u.test(prev) && /(?<!\p{L})(?:between|apart|away|link|distance|separat\w*)(?!\p{L})/iu.test(prev)) {
        lengths = [...prev.matchAll(DISTANCE_RE)];
        from = prevStart;
      }
    }
    const last = lengths[lengths.length - 1];
    if (!last) continue;
    const unit = last[2].toLowerCase().replace(/s$/u, '').replace(/^lightyear$/u, 'lightyear').replace(/^light[- ]year$/u, 'light-year');
    const per = METRES_PER[unit] ?? METRES_PER[unit.replace(/-/gu, ' ')];
    const t = siOf(d);
    if (per === undefined || !t) continue;
    const metres = (LENGTH_WORDS[last[1].toLowerCase()] ?? Number(last[1].replace(/,/gu, ''))) * per;
    const start = from + last.index!;
    if (drafts.some((o) => o !== d && o.start < start + last[0].length && start < o.end)) continue; // (read as something else)
    const v = metres / t;
    if (!signal && !(v >= 0.01 * C_LIGHT)) continue;
    insertAfter(drafts, d, {
      start,
      end: d.end,
      kind: 'speed',
      quantity: typedSi(v, 'm/s'),
      role: null,
      derived: `speed = distance / time (${formatQuantity(metres, 'm')} / ${formatQuantity(t, 's')})`,
    });
    used.add(d);
  }
  return used;
}

/** Times, rates and energies over a run, among the figures read (see the file's comment). */
export function relateDurations(text: string, drafts: Draft[]): void {
  joinCompoundDurations(text, drafts);
  hoursADayOverDays(text, drafts);
  const timed = speedsFromDistances(text, drafts);
  // "24 hours a day", "round the clock": how it runs, not how long.
  for (const d of drafts) if (d.kind === 'duration' && d.role === null && (siOf(d) ?? 0) === 86400 && /^[^\S\n]*(?:a|per|each|every)[^\S\n]+day(?!\p{L})/iu.test(text.slice(d.end, d.end + 10))) d.role = 'aside';
  // Times that are not the run's ("took 18 months to build", "pays for itself in 3 years"), said in a
  // sentence with no power or energy: set aside.
  for (const d of drafts) {
    if (d.kind !== 'duration' || d.role !== null || timed.has(d)) continue;
    const sentence = sentenceAround(text, d.start, d.end);
    // ("6 kW surge for 3 s", "2000 W peak for about a second": how long a rating's surge lasts, no run.)
    if (SURGE_BEFORE_RE.test(text.slice(Math.max(0, d.start - 40), d.start))) {
      d.role = 'aside';
      continue;
    }
    // (Nor a time of a supposition: "if the panels are covered in snow for a week it will be empty".)
    // ("Amount requested: EUR 7,200. Duration: five months.": the length of the work a funder pays for.)
    const termOfWork = TERM_LABEL_RE.test(sentence) && FUNDING_RE.test(text);
    if ((NOT_A_RUN_RE.test(sentence) || SUPPOSED_TIME_RE.test(sentence) || termOfWork) && !drafts.some((e) => (e.kind === 'power' || e.kind === 'energy') && sentenceOf(text, e) === sentenceOf(text, d))) d.role = 'aside';
    // ("Replacement payback est. 6–7 years", "the 5 kW unit pays for itself in 6 years", "a 10-year warranty"):
    // a time named right before or after as a payback, a warranty or a life is none, whatever else its sentence holds.
    else if (/(?<!\p{L})(?:each|every)[^\S\n]+(?:(?:under|over|about|around|lasting|of|taking|for)[^\S\n]+)?(?:(?:about|around|roughly)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, d.start - 30), d.start))) d.role = 'aside'; // ("Defrost cycles: 3–5 a day, each under four minutes": one cycle's length, no run.)
    else if (TERM_NOT_RUN_BEFORE_RE.test(text.slice(Math.max(0, d.start - 45), d.start).replace(/(?<!\p{L})(?:est|approx|ca|abt)\./giu, ' ')) || TERM_NOT_RUN_AFTER_RE.test(text.slice(d.end, d.end + 30))) d.role = 'aside';
  }

  // "30 kWh a day … over a fortnight": an energy per day, where the text states a longer run, is a
  // rate (a power) over that run; the "a day" is no run of its own.
  for (let i = 0; i + 1 < drafts.length; i++) {
    const [e, per] = [drafts[i], drafts[i + 1]];
    if (e.kind !== 'energy' || e.derived || per.kind !== 'duration' || per.role !== null) continue;
    if (!/^[^\S\n]*(?:a|an|per|each|every|\/)[^\S\n]*$/iu.test(text.slice(e.end, per.start)) && !/^(?:a|an|per|each|every)(?!\p{L})/iu.test(text.slice(per.start, per.end))) continue;
    if (!/^[^\S\n]*(?:(?:a|an|per|each|every)[^\S\n]+)?(?:day|hour|week|month|year|minute)s?(?!\p{L})/iu.test(text.slice(e.end, per.end + 1).replace(/^[^\S\n]*\//, ' per '))) continue;
    const unitTime = siOf(per);
    const run = drafts.filter((d) => d.kind === 'duration' && d !== per && d.role !== 'aside' && (siOf(d) ?? 0) > (unitTime ?? Infinity));
    const energy = siOf(e);
    if (run.length === 0 || !unitTime || energy === null) continue;
    e.kind = 'power';
    e.quantity = typedSi(energy / unitTime, 'W');
    if (e.upper !== undefined) {
      const u = upperSiOf(e);
      e.upper = u !== null ? typedSi(u / unitTime, 'W') : undefined;
    }
    e.derived = `power = energy per ${formatQuantity(unitTime, 's')} (${formatQuantity(energy, 'J')} / ${formatQuantity(unitTime, 's')})`;
    per.role = 'aside';
  }

  // "burns 40,000 BTU of pellets an hour": an energy of something per hour is a power, run or no run
  // ("3.4 kWh of heat on a day with 6 kWh of sunlight": a total on one day, not a rate).
  for (const e of drafts) {
    if (e.kind !== 'energy' || e.derived) continue;
    const m = /^[^\S\n]+of[^\S\n]+(?:(?!(?:on|in|over|during|for|across|within|throughout|that|which|one|the)[^\S\n])[\p{L}-]+[^\S\n]+){1,2}?(?:an?|per|each|every)[^\S\n]+(hour|minute|day)(?!\p{L})/iu.exec(text.slice(e.end, e.end + 50));
    const energy = siOf(e);
    if (!m || energy === null) continue;
    const unitTime = { hour: 3600, minute: 60, day: 86400 }[m[1].toLowerCase() as 'hour' | 'minute' | 'day'];
    e.kind = 'power';
    e.quantity = typedSi(energy / unitTime, 'W');
    e.derived = `power = energy per ${m[1].toLowerCase()} (${formatQuantity(energy, 'J')} / ${formatQuantity(unitTime, 's')})`;
    for (const d of drafts) if (d.kind === 'duration' && d.start >= e.end && d.start < e.end + m[0].length) d.role = 'aside';
  }

  // Powers and energies over a stated run: energy = power × time.
  const durations = drafts.filter((d) => d.kind === 'duration' && d.role !== 'aside');
  const longest = [...durations].sort((a, b) => (siOf(b) ?? 0) - (siOf(a) ?? 0))[0];
  if (longest) {
    const powers = drafts.filter((d) => d.kind === 'power' && (d.role === 'in' || d.role === 'out'));
    // Each power over the time said with it ("charged at 2 kW for 5 hours, then discharged at 1.5 kW
    // for 6 hours"): the nearest duration in its clause, before the next power; else the longest run.
    const ownOf = (p: Draft): Draft | undefined => {
      const nextPower = powers.find((q) => q.start > p.start);
      const prevPower = [...powers].reverse().find((q) => q.start < p.start);
      // (Not a time said after "after", "before" or "then": "releases 1 kW for a fraction of a second after 30 s".)
      // ("twenty watts of effort, gives forty minutes of listening at a quarter of a watt": the forty
      // minutes are the next power's, said right before it.)
      const nextPowers = (d: Draft) => nextPower !== undefined && nextPower.start > d.end && nextPower.start - d.end < 40 && /^[^\S\n]+of[^\S\n]+[\p{L}-]+(?:[^\S\n]+[\p{L}-]+)?[^\S\n]+(?:at|drawing|using)[^\S\n]+(?:(?:about|around|roughly|some|just|only|a steady)[^\S\n]+)?$/iu.test(text.slice(d.end, nextPower.start));
      return (
        durations.find((d) => d.start > p.end && (!nextPower || d.start < nextPower.start) && !nextPowers(d) && !/(?<!\p{L})(?:after|before|then|until)(?!\p{L})/iu.test(text.slice(p.end, d.start)) && sameClause(text, d, p) && d.start - p.end < 80) ??
        [...durations].reverse().find((d) => d.end <= p.start && (!prevPower || d.start > prevPower.end) && sameClause(text, d, p) && p.start - d.end < 60)
      );
    };
    // (Powers said with their own time first: "At full output of 1.1 kW, the H-1100 runs for 15 hours"
    // is the run's energy, not the "500 W" of another model listed above it, taken over those hours.)
    const ordered = [...powers.filter((p) => ownOf(p)), ...powers.filter((p) => !ownOf(p))];
    for (const p of ordered) {
      const own = ownOf(p);
      const duration = durations.length > 1 && own ? own : longest;
      // "can deliver 2 MW for short periods", "peaks at 3 kW": a rating or a burst, not what it gave over the run.
      if (p.role === 'out' && BURST_RE.test(sentenceAround(text, p.start, p.end))) continue;
      // "… a 150 kW motor, and charges to 80 % in 40 minutes": a charging time is no run of what the
      // device puts out.
      // (Nor of a power drawn but not to charge: "charges in 5–6 h … Controller limits the draw to 15 A at 48 V".)
      if (isChargingTime(text, duration) && (p.role === 'out' || !/(?<!\p{L})(?:re)?charg\w*/iu.test(sentenceAround(text, p.start, p.end)))) continue;
      // "can deliver up to 5 kW at once": the most it can give, not what it gave over the run (the
      // least output, the end favourable to a claim, is not stated).
      if (p.role === 'out' && (p.hedge === 'up-to' || p.hedge === 'at-most' || p.hedge === 'less-than')) continue;
      // (A time said with another power, in another paragraph: "a short surge of 3.6 kW for ten seconds" is no
      // run of the "1.92 kW" an adviser works out three paragraphs further on.)
      if (duration !== own && siOf(p) !== 0 && powers.some((q) => q !== p && ownOf(q) === duration)) {
        const [a, b] = p.start < duration.start ? [p.end, duration.start] : [duration.end, p.start];
        if (/\n[^\S\n]*\n/u.test(text.slice(a, b)) || b - a > 400) continue;
      }
      const tRun = siOf(duration);
      if (!tRun) continue;
      // "emits 2 J in 10 ns … from a supply that draws 1.5 kW": a pulse's length is no run of a power said apart from it.
      if (tRun < 1 && (duration !== own || drafts.some((o) => o !== p && o !== duration && o.start > Math.min(p.end, duration.end) && o.end < Math.max(p.start, duration.start)))) continue;
      const w = siOf(p);
      if (w === null || (w === 0 && p.role !== 'in')) continue;
      if (drafts.some((d) => d.kind === 'energy' && d.role === p.role && !d.derived)) continue;
      if (drafts.some((d) => d.kind === 'energy' && d.role === p.role && d.derived?.startsWith('energy = power'))) continue;
      const wu = upperSiOf(p);
      const last = p.start > duration.start ? p : duration;
      insertAfter(drafts, last, {
        start: Math.min(p.start, duration.start),
        end: Math.max(p.end, duration.end),
        kind: 'energy',
        quantity: typedSi(w * tRun, 'J'),
        upper: wu !== null ? typedSi(wu * tRun, 'J') : undefined,
        role: p.role,
        derived: `energy = power × time (${formatQuantity(w, 'W')} × ${formatQuantity(tRun, 's')})`,
      });
    }
  }
  // With no power or energy in the text, no check takes a time ("the drill took 6 minutes", "the
  // pendulum swings once every 2 seconds"): it is set aside.
  if (!drafts.some((d) => (d.kind === 'power' || d.kind === 'energy') && d.role !== 'aside')) {
    for (const d of drafts) if (d.kind === 'duration' && d.role === null && !timed.has(d)) d.role = 'aside';
  }
}

/** After a time of each day: "6 h a day", "8 hours per day", "4 h/day", "10 hours daily". */
const EACH_DAY_AFTER_RE = /^[^\S\n]*(?:(?:a|per|each|every)[^\S\n]+day|\/[^\S\n]*day|daily)(?!\p{L})/iu;

/**
 * "Runs 6 h a day … say 120 days": the run is the hours of each day times the days (720 h), not the 120
 * days round the clock. The two are set aside for the run worked out from them.
 */
function hoursADayOverDays(text: string, drafts: Draft[]): void {
  const daily = drafts.find((d) => d.kind === 'duration' && d.role === null && !d.derived && (siOf(d) ?? Infinity) < 86400 && EACH_DAY_AFTER_RE.test(text.slice(d.end, d.end + 12)));
  if (!daily) return;
  const days = drafts.find(
    (d) =>
      d !== daily &&
      d.kind === 'duration' &&
      d.role === null &&
      !d.derived &&
      (siOf(d) ?? 0) >= 2 * 86400 &&
      Math.abs(d.start - daily.start) < 200 &&
      !/^[^\S\n]*(?:a|per|each|every)[^\S\n]+(?:week|month|year)(?!\p{L})/iu.test(text.slice(d.end, d.end + 12)),
  );
  const [t, n] = [siOf(daily), siOf(days ?? daily)];
  if (!days || t === null || n === null) return;
  const run = t * (n / 86400);
  const last = days.start > daily.start ? days : daily;
  insertAfter(drafts, last, {
    start: Math.min(daily.start, days.start),
    end: Math.max(daily.end, days.end),
    kind: 'duration',
    quantity: typedSi(run, 's'),
    role: null,
    derived: `run = hours each day × days (${formatQuantity(t, 's')} × ${formatQuantity(n / 86400, '')})`,
  });
  daily.role = 'aside';
  days.role = 'aside';
}

/**
 * "1 h 40 min", "3 hours 20 minutes", "2 days and 6 hours": one run said in two units is one duration
 * (the larger unit first, the smaller part less than one of the larger).
 */
function joinCompoundDurations(text: string, drafts: Draft[]): void {
  for (let i = 0; i + 1 < drafts.length; i++) {
    const [a, b] = [drafts[i], drafts[i + 1]];
    if (a.kind !== 'duration' || b.kind !== 'duration' || a.derived || b.derived || a.upper !== undefined || b.upper !== undefined) continue;
    if (!/^[^\S\n]*(?:,[^\S\n]*|and[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) continue;
    const [x, y] = [siOf(a), siOf(b)];
    if (x === null || y === null || !(y < x)) continue;
    // The larger part's unit: a whole number of hours, days or minutes, and the smaller part less than one of it.
    const unit = [86400, 3600, 60].find((u) => x >= u && Math.abs(x / u - Math.round(x / u)) < 1e-9);
    if (unit === undefined || !(y < unit)) continue;
    a.quantity = typedSi(x + y, 's');
    a.end = b.end;
    drafts.splice(i + 1, 1);
  }
}
