/**
 * The writer's own bound, said beside a claim (the claim reader, shared/claims/reader.ts): "a perfect
 * engine would only reach about 14 %", "the ideal COP for those temperatures is about 11", "no engine
 * can convert more than about 63 % of its heat input", "the Carnot limit between 80 °C and 25 °C is
 * about 16 %", "beating the 29.4 per cent ceiling". A figure of the law's ceiling (or of someone's
 * belief about one), not of the device: kept aside, so that the checks work the bound out themselves
 * from the claim's own figures and never take the writer's ceiling for the device's performance.
 */
import { windowStart } from './context';
import type { Draft } from './draft';

/** A name of the ceiling itself: the ideal, a perfect machine, the Carnot limit, "the best any engine could do". */
const BOUND_NAME =
  String.raw`(?:ideal|perfect|reversible|Carnot|theoretical|thermodynamic|textbook|perfect-engine)[- ](?:\((?:Carnot|reversible)\)[- ])?(?:heating[- ]|cooling[- ]|heat[- ])?(?:heat[- ]pumps?|engines?|machines?|cycles?|coolers?|fridges?|refrigerators?|freezers?|devices?|converters?|modules?|COPs?|coefficients?(?: of performance)?|efficienc(?:y|ies)|limits?|ceilings?|maxim(?:um|a)|bounds?|values?|figures?|case)` +
  String.raw`|(?:the|that|this|its)[^\S\n]+(?:ideal|Carnot|theoretical|thermodynamic)(?:[^\S\n]+(?:one|value|figure|limit|ceiling|maximum))?(?!\p{L})` +
  String.raw`|(?:ideal|Carnot|reversible|theoretical|thermodynamic)[- ]minim(?:um|a)(?:[- ](?:work|power|input|electricity))?(?!\p{L})` +
  String.raw`|η_?(?:ideal|C|Carnot|max)(?!\p{L})|(?:^|[:;\n])[^\S\n]*ideal(?=[^\S\n]+(?:for|between|at|is|would|here))` +
  String.raw`|(?:Shockley[–-]Queisser|detailed[- ]balance|Betz|Landsberg|physical)[^\S\n]+(?:limit|ceiling|maximum|bound)` +
  String.raw`|(?:the|a|that|this|its|their|such)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,3}(?:limit|ceiling|upper bound)` +
  String.raw`|(?:the[^\S\n]+)?(?:most|best)[^\S\n]+(?:any|an?|that|it|one)(?!\p{L})[^.;!?\n]{0,50}?(?:can|could|would|might)(?!\p{L})` +
  String.raw`|at best|at most|in principle` +
  String.raw`|no[^\S\n]+(?:heat[^\S\n]+)?(?:engine|machine|heat pump|cooler|fridge|device|cell|panel|converter|module)s?(?!\p{L})[^.;!?\n]{0,80}?(?:more|better|higher)[^\S\n]+than` +
  String.raw`|(?:can(?:'|’)t|cannot|can not|could(?:n(?:'|’)t| not)|never)[^\S\n]+(?:be|do|get|go|reach|convert|give|manage|exceed|beat|top|turn)(?!\p{L})[^.;!?\n]{0,30}?(?:more|better|higher|above|beyond)(?:[^\S\n]+than)?`;
const BOUND_NAME_RE = new RegExp(`(?<!\\p{L})(?:${BOUND_NAME})`, 'giu');

/** Words of the claim or of a measurement between the ceiling's name and the number: not the ceiling's figure. */
const CLAIM_BETWEEN_RE =
  /(?<!\p{L})(?:claim\w*|report\w*|measur\w*|record\w*|observ\w*|tested|achieved|achieves|achieving|reached|reaches|reaching|deliver\w*|produc\w*|exceed\w*|beat\w*|break\w*|broke|surpass\w*|outperform\w*|promis\w*|advertis\w*|quot\w*|rated|says|said|we|our|ours|it gets|it does|the device|the unit|the module|the prototype)(?!\p{L})/iu;

/** Two sides named: "between -5 and 45", "from 10 °C to 35 °C". */
const SIDES_RE = /(?<!\p{L})(?:between|from|for)[^\S\n]+[-−–]?[\d.,]+[^\S\n]*(?:°[^\S\n]*[CF]?|K|deg(?:rees)?(?:[^\S\n]*[CF])?)?[^\S\n]+(?:and|to)[^\S\n]+[-−–]?[\d.,]+[^\S\n]*(?:°[^\S\n]*[CF]?|K|deg(?:rees)?(?:[^\S\n]*[CF])?)?/giu;

/** A temperature or a lift: "11 K", "40 °C", "a 25-degree lift", "5 → 40 °C". */
const TEMPERATURE_RE = /[-−–]?[\d.,]+[^\S\n]*(?:(?:→|->)[^\S\n]*[-−–]?[\d.,]+[^\S\n]*)?(?:°[^\S\n]*[CF]?|K(?!\p{L})|deg(?:rees)?(?:[^\S\n]*[CF](?!\p{L}))?|-degree)/gu;

/** Right after the number: "the 29.4 per cent ceiling", "a 30 % Carnot limit". */
const BOUND_AFTER_RE = /^[^\S\n]*(?:%|per[^\S\n]*cent|percent)?[^\S\n]+(?:(?:theoretical|Carnot|thermodynamic|ideal|physical)[^\S\n]+)?(?:ceiling|limit|upper bound|maximum)(?!\p{L})/iu;

/** Words of moving heat: a bare number beside them, said as a ceiling, is a COP. */
const COP_CONTEXT_RE = /(?<!\p{L})(?:COPs?|coefficients? of performance|heat[- ]pumps?|fridges?|refrigerat\w*|freezers?|coolers?|chillers?|air[- ]conditioner\w*|units? of heat|heating|cooling)(?!\p{L})/iu;

export interface StatedBound {
  kind: 'efficiency' | 'cop';
}

/**
 * Whether the number at [start, numEnd) (a percentage when `percent`, else a bare number) is a ceiling
 * the writer states, and of which kind; null when it is not one.
 */
export function statedBound(text: string, start: number, end: number, percent: boolean, value: number): StatedBound | null {
  const from = windowStart(text, start, 0, 300);
  const before = text.slice(from, start);
  let said = false;
  BOUND_NAME_RE.lastIndex = 0;
  for (let m = BOUND_NAME_RE.exec(before); m; m = BOUND_NAME_RE.exec(before)) {
    // (The two sides named between are no figure of it: "a perfect heat pump between -5 and 45 would manage about 6.4".)
    const between = before.slice(m.index + m[0].length).replace(SIDES_RE, ' ');
    if (between.length > 160 || CLAIM_BETWEEN_RE.test(between)) continue;
    // No other number between the ceiling's name and this one, unless the writer works it out: "1 − 277.15/299.15 = 7.4 %".
    // (Temperatures and lifts named on the way are no figure of it either: "the Carnot limit across 11 K is only 3.6 %".)
    const plain = between.replace(TEMPERATURE_RE, ' ');
    if (/\p{N}/u.test(plain) && !/(?:=|≈|,?[^\S\n]+or(?:[^\S\n]+(?:about|roughly|around|nearly))?|,[^\S\n]*(?:about|roughly|around|nearly|so|i\.e\.))[^\S\n]*$/u.test(plain)) continue;
    said = true;
    break;
  }
  if (!said && !BOUND_AFTER_RE.test(text.slice(end, end + 40))) return null;
  // (Not a term of the writer's working: the "1" of "1 − 278.15/298.15", a "/ 45".)
  if (/^[^\S\n]*[−–\-/×*÷][^\S\n]*[\p{N}(TQ]/u.test(text.slice(end, end + 6)) || /[/×*÷−][^\S\n]*$/u.test(text.slice(Math.max(0, start - 3), start))) return null;
  // (A bare ceiling ends its clause: "would manage about 6.4;", "is more than six, and"; not "those two temperatures".)
  if (!percent && /^[^\S\n]*\p{L}/u.test(text.slice(end, end + 20)) && !/^[^\S\n]*(?:and|or|so|which|but|for|at|in|on|here|there|units?|times)(?!\p{L})/iu.test(text.slice(end, end + 20))) return null;
  // (Not one end of the two sides: the "-5" of "between -5 and 45".)
  if (!percent && (/(?:between|from)[^\S\n]*$/iu.test(before) || /^[^\S\n]*(?:°|deg|K(?!\p{L})|(?:and|to|–)[^\S\n]*[-−]?\d)/u.test(text.slice(end, end + 12)))) return null;
  const sentence = text.slice(from, end + 200).split(/[.!?](?:\s|$)|\n/u)[0] ?? '';
  // (The sentence before: "The freezer's COP is 1.6. That's nowhere near the ideal, which … is more than six.")
  const ahead = text.slice(Math.max(0, from - 300), from).trimEnd();
  const previous = ahead.slice(windowStart(ahead, Math.max(0, ahead.length - 1), 0, 300));
  if (percent) {
    // (A ceiling above 100 % is a heat mover's, in per cent: "a perfect heat pump would be 1,100 % efficient".)
    return value > 100 && COP_CONTEXT_RE.test(sentence) ? { kind: 'cop' } : { kind: 'efficiency' };
  }
  // A bare ceiling: a fraction of an engine ("1 − 298.15/423.15 = 0.295"), or a heat mover's COP.
  if (value > 0 && value <= 1 && /(?<!\p{L})(?:efficien\w*|Carnot|engines?|turbines?|η)/iu.test(sentence) && !COP_CONTEXT_RE.test(sentence)) return { kind: 'efficiency' };
  return value > 1 && (COP_CONTEXT_RE.test(sentence) || COP_CONTEXT_RE.test(previous) || COP_CONTEXT_RE.test(text)) ? { kind: 'cop' } : null;
}

/**
 * Ceilings read as figures of their kind by the other passes (a percentage after "convert", a COP after
 * "the ideal COP"): set aside whatever those passes made of them. Where the text's only efficiency is
 * the writer's ceiling, no check is run on it: a check on the bound would compare the law with itself.
 */
export function asideStatedBounds(bounds: Set<Draft>): void {
  for (const d of bounds) d.role = 'aside';
}
