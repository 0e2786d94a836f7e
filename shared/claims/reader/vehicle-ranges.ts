/**
 * The energy a vehicle's stated range takes (the claim reader, shared/claims/reader.ts, pass 3): a
 * consumption per distance ("about 6 Wh/km", "19–21 kWh/100 km", "4 miles per kWh") times the range the
 * text claims ("Range: 70–90 km", "between 600 and 700 km per charge") is the energy the drive must give
 * over that range — the output the first law sets against the pack's energy. Read only where the text
 * gives one consumption and one range; ranges multiply end by end (the check takes the end most
 * favourable to the claim and says so).
 */
import { sentenceAround } from './context';
import { insertInOrder, siOf, typedSi, type Draft } from './draft';
import { tokenize } from './numbers';

/** NIST SP 811 Appendix B.8: the international mile is 1,609.344 m. */
const MILE_M = 1609.344;

const NUM = String.raw`\d{1,3}(?:,\d{3})+(?:\.\d+)?(?!,\d)|\d+(?:[.,]\d+)?`;
/** "1,200" groups thousands; "16,8" (a European writer's decimal comma) does not. */
const num = (s: string) => Number(/^\d{1,3}(?:,\d{3})+(?:\.\d+)?$/u.test(s) ? s.replace(/,/g, '') : s.replace(',', '.'));
/** A number or a range of two: "6", "19–21", "between 600 and 700", "70 to 90". */
const SPAN = String.raw`(?:between[^\S\n]+)?(${NUM})(?:[^\S\n]*(?:–|—|-|to|and)[^\S\n]*(${NUM}))?`;

/** A consumption per distance: "6 Wh/km", "19–21 kWh/100 km", "250 Wh per mile", "18 kWh per 100 miles". */
const CONSUMPTION_RE = new RegExp(
  String.raw`(?<![\p{L}\p{N}.,])${SPAN}[^\S\n]*(Wh|kWh|kW·h|kW-h)[^\S\n]*(?:/|per[^\S\n]+|every[^\S\n]+|a[^\S\n]+)[^\S\n]*(100[^\S\n]*)?(km|kilomet(?:re|er)s?|mi|miles?)(?!\p{L})`,
  'giu',
);
/** Distance per energy: "4 miles per kWh", "6.5 km/kWh", "3.8 mi/kWh". */
const DISTANCE_PER_ENERGY_RE = new RegExp(
  String.raw`(?<![\p{L}\p{N}.,])${SPAN}[^\S\n]*(km|kilomet(?:re|er)s?|mi|miles?)[^\S\n]*(?:/|per[^\S\n]+|to[^\S\n]+the[^\S\n]+|a[^\S\n]+)[^\S\n]*(kWh|kW·h|kilowatt[- ]hour)(?!\p{L})`,
  'giu',
);
/** A distance: "70–90 km", "600 and 700 km", "310 miles" (not "25 km/h", "km per hour"). */
const DISTANCE_RE = new RegExp(
  String.raw`(?<![\p{L}\p{N}.,])${SPAN}[^\S\n]*(km|kilomet(?:re|er)s?|mi|miles?)(?!\p{L})(?![^\S\n]*(?:/|per[^\S\n]+(?:hour|h|kWh|litre|liter|gallon)|an?[^\S\n]+(?:hour|kWh)|to[^\S\n]+the[^\S\n]+(?:kWh|gallon|litre)))`,
  'giu',
);
/** Words of a vehicle's range around a distance: "Range:", "per charge", "on one charge", "will do". */
const RANGE_WORDS_RE =
  /(?<!\p{L})(?:range|ranges|per[^\S\n]+charge|(?:on|from)[^\S\n]+(?:a|one|each|every|the|its|a[^\S\n]+single|a[^\S\n]+full)[^\S\n]+(?:full[^\S\n]+)?(?:charge|pack|battery|tank)|will[^\S\n]+do|does|did|goes|went|covers?|covered|travell?ed|drove|driven|ridden|works?[^\S\n]+out[^\S\n]+(?:to|at)|real[- ]world|good[^\S\n]+for)(?!\p{L})/iu;

/**
 * A trip said as one leg on one pack: "our 420 km round trip … arrived with 8 % left". Taken as the range only
 * where the text says the pack carried it alone and names no charging on the way.
 */
const TRIP_WORDS_RE = /(?<!\p{L})(?:round[- ]trips?|trips?|journeys?|loop|leg|(?:test[- ])?drive)(?!\p{L})/iu;
const ONE_PACK_RE = /(?<!\p{L})(?:arrived|finished|got[^\S\n]+(?:home|back)|ended)[^\S\n]+with[^\S\n]+\d|\d[^\S\n]*(?:%|per[^\S\n]*cent)[^\S\n]+(?:left|remaining|to[^\S\n]+spare)|without[^\S\n]+(?:a[^\S\n]+)?(?:re)?charg(?:ing|e)|(?:no|without[^\S\n]+a)[^\S\n]+(?:stop|break)[^\S\n]+to[^\S\n]+(?:re)?charge/iu;
const CHARGED_ON_THE_WAY_RE = /(?<!\p{L})(?<!(?:no|without|never|not|zero|nor)[^\S\n]+(?:a[^\S\n]+|one[^\S\n]+|single[^\S\n]+)?)(?:charg(?:ing|e)[^\S\n]+stops?|stop(?:ped|s)?[^\S\n]+(?:once[^\S\n]+|twice[^\S\n]+)?to[^\S\n]+(?:re)?charge|(?:re)?charged[^\S\n]+(?:on|along|en)[^\S\n]+(?:the[^\S\n]+)?(?:way|route)|top(?:ped)?[- ]?ups?[^\S\n]+(?:on|along|en)[^\S\n]+(?:the[^\S\n]+)?(?:way|route)|(?:one|two|three|four|\d+)[^\S\n]+(?:charges|charging[^\S\n]+sessions|stops))(?!\p{L})/iu;

/** After an energy: "for every hundred kilometres", "per 100 km", "each mile". */
const PER_HUNDRED_AFTER_RE = /^[^\S\n]*(?:for[^\S\n]+every|per|every|each|a)[^\S\n]+(hundred[^\S\n]+|100[^\S\n]*)?(km|kilomet(?:re|er)s?|miles?|mi)(?!\p{L})/iu;
const km = (n: string, unit: string) => num(n) * (/^mi/iu.test(unit) ? MILE_M / 1000 : 1);

/** Sunlight harvested on board: the pack is then not the only source, and a range beyond it is no conflict. */
const SUN_ON_BOARD_RE = /(?<!\p{L})(?:solar|photovoltaic|PV|sun(?:light|shine)?|(?:roof|panel)[^\S\n]+array)(?!\p{L})/iu;

export function vehicleRanges(text: string, drafts: Draft[]): void {
  // (A solar car in sun: what came in from the sun over the day is an input the range may rest on.)
  if (SUN_ON_BOARD_RE.test(text)) return;
  // The consumption: Wh per km (low and high ends), from a per-distance or a per-energy form.
  const rates: { start: number; end: number; low: number; high: number; words: string; of?: Draft }[] = [];
  for (const m of text.matchAll(CONSUMPTION_RE)) {
    const wh = /^k/iu.test(m[3]) ? 1000 : 1;
    const per = km(m[4] ? '100' : '1', m[5]);
    const a = (num(m[1]) * wh) / per;
    const b = m[2] !== undefined ? (num(m[2]) * wh) / per : a;
    rates.push({ start: m.index!, end: m.index! + m[0].length, low: Math.min(a, b), high: Math.max(a, b), words: m[0].trim() });
  }
  for (const m of text.matchAll(DISTANCE_PER_ENERGY_RE)) {
    const a = 1000 / km(m[1], m[3]);
    const b = m[2] !== undefined ? 1000 / km(m[2], m[3]) : a;
    rates.push({ start: m.index!, end: m.index! + m[0].length, low: Math.min(a, b), high: Math.max(a, b), words: m[0].trim() });
  }
  // (Said in words: "eleven kilowatt-hours for every hundred kilometres" — an energy read already, then its distance.)
  if (rates.length === 0) {
    for (const d of drafts) {
      if (d.kind !== 'energy' || d.derived || d.upper) continue;
      const per = PER_HUNDRED_AFTER_RE.exec(text.slice(d.end, d.end + 40));
      const si = siOf(d);
      if (!per || si === null) continue;
      const wh = si / 3600 / km(per[1] ? '100' : '1', per[2]);
      rates.push({ start: d.start, end: d.end + per[0].length, low: wh, high: wh, words: text.slice(d.start, d.end + per[0].length).trim(), of: d });
    }
  }
  // (Charged on the way: the distance rests on more than the pack.)
  if (rates.length !== 1 || CHARGED_ON_THE_WAY_RE.test(text)) return;
  const rate = rates[0];
  // The range: a distance said with words of a range, outside the consumption's own words.
  const spelled = tokenize(text)
    .filter((t) => !t.skip && !/^\d/u.test(text.slice(t.start, t.numEnd)))
    .flatMap((t) => {
      const unit = /^[^\S\n]*(km|kilomet(?:re|er)s?|miles?)(?!\p{L})(?![^\S\n]*(?:\/|per[^\S\n]+|an?[^\S\n]+hour))/iu.exec(text.slice(t.numEnd, t.numEnd + 20));
      if (!unit) return [];
      const m = Object.assign([text.slice(t.start, t.numEnd + unit[0].length), t.num, undefined, unit[1]], { index: t.start, input: text }) as unknown as RegExpMatchArray;
      return [m];
    });
  const ranges = [...text.matchAll(DISTANCE_RE), ...spelled].filter((m) => {
    const [s, e] = [m.index!, m.index! + m[0].length];
    if (s < rate.end && rate.start < e) return false;
    const around = text.slice(Math.max(0, s - 40), Math.min(text.length, e + 25));
    const trip = TRIP_WORDS_RE.test(text.slice(Math.max(0, s - 40), Math.min(text.length, e + 40))) && ONE_PACK_RE.test(text);
    return (RANGE_WORDS_RE.test(around) || trip) && !/(?<!\p{L})(?:speed|km\/h|mph|top|from[^\S\n]+\d)/iu.test(text.slice(Math.max(0, s - 15, text.lastIndexOf('\n', s - 1) + 1), s));
  });
  if (ranges.length !== 1) return;
  const r = ranges[0];
  const lowKm = km(r[1], r[3]);
  const highKm = r[2] !== undefined ? km(r[2], r[3]) : lowKm;
  if (!(lowKm > 0) || !(rate.low > 0)) return;
  // (Both in one sentence or one list: a distance said far from the consumption may be another trip's.)
  const together = sentenceAround(text, r.index!, r.index! + r[0].length) === sentenceAround(text, rate.start, rate.end) || Math.abs(r.index! - rate.start) < 400;
  if (!together) return;
  const low = rate.low * Math.min(lowKm, highKm) * 3600;
  const high = rate.high * Math.max(lowKm, highKm) * 3600;
  // (The energy of the consumption's words is a rate, no energy of its own: set aside.)
  if (rate.of) rate.of.role = 'aside';
  // (The figure points at the consumption's words; the range is said in how it was got.)
  const [start, end] = [rate.start, rate.end];
  insertInOrder(drafts, {
    start,
    end,
    kind: 'energy',
    quantity: typedSi(low, 'J'),
    ...(high > low ? { upper: typedSi(high, 'J') } : {}),
    role: 'out',
    derived: `energy the drive gives over the range = consumption × distance (${rate.words} over ${r[0].trim()})`,
  });
}
