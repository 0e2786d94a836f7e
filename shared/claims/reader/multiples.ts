/**
 * A claim made as a multiple of another machine's figure (the claim reader, shared/claims/reader.ts, pass
 * 3): "a good heat pump runs at around 400 % … the VX is three times more efficient than that", "ten
 * times faster than the 200,000 km/s at which light crosses fibre", "twice the COP of the best
 * cold-climate heat pumps, which top out around 4.5". The multiple of the base is the claim's figure;
 * the base, another machine's, is set aside.
 */
import { FIGURE_SI_UNIT, type FigureKind } from '../types';
import { sentenceAround } from './context';
import { insertInOrder, siOf, typedSi, upperSiOf, type Draft } from './draft';

const COUNT: Record<string, number> = {
  one: 1, two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10, twenty: 20, fifty: 50, hundred: 100, 'a hundred': 100,
  twice: 2, double: 2, triple: 3, thrice: 3, quadruple: 4, twofold: 2, threefold: 3, fourfold: 4, fivefold: 5, tenfold: 10,
};
/** A multiple: "three times", "10 times", "10×", "twice", "fivefold". */
const MULTIPLE_RE =
  /(?<![\p{L}\d.,])(?:(\d+(?:\.\d+)?)[^\S\n]*(?:times(?!\p{L})|×)|(one|two|three|four|five|six|seven|eight|nine|ten|twenty|fifty|a hundred|hundred)[^\S\n]+times(?!\p{L})|(twice|double|triple|thrice|quadruple|two-?fold|three-?fold|four-?fold|five-?fold|ten-?fold)(?!\p{L}))/giu;
/** After the multiple, a base said before it: "that", "this", "more efficient than that", "as fast as that". */
const BACK_RE =
  /^[^\S\n]+(?:(?:more|less)[^\S\n]+[\p{L}-]+[^\S\n]+than[^\S\n]+|[\p{L}]+er[^\S\n]+than[^\S\n]+|as[^\S\n]+[\p{L}-]+[^\S\n]+as[^\S\n]+)?(?:that|this|those|these)(?![\p{L}\d])(?![^\S\n]+of(?!\p{L}))/iu;
/** Just before a multiple: a count it belongs to ("five hundred times", "10-"). */
const COUNT_BEFORE_RE = /(?:\d|(?<!\p{L})(?:one|two|three|four|five|six|seven|eight|nine|ten|several|many|few))[^\S\n]*-?$/iu;
/** Just before a multiple: a bound ("more than double", "over ten times", "at least twice", "up to"). */
const BOUND_BEFORE_RE = /(?<!\p{L})(?:(?:more|less|fewer)[^\S\n]+than|at[^\S\n]+(?:most|least)|up[^\S\n]+to|over|under|much|nearly|almost|only|just)[^\S\n]*$/iu;
/** In the clause before a multiple: an expectation or a supposition ("we expect", "could", "would"). */
const MODAL_BEFORE_RE = /(?<!\p{L})(?:could|would|might|may|can|cannot|can't|will|shall|should|expects?|expected|expecting|aims?|aiming|hopes?|hoping|plans?|planned|targets?|predicts?|predicted|projects?|projected|if)(?!\p{L})[^.;!?\n]{0,45}$/iu;
/** Between a figure and a multiple that restates it: "… would be more than", "…, which is about", "… is". */
const RESTATED_GAP_RE = /(?<!\p{L})(?:would[^\S\n]+be|is|was|are|were|which[^\S\n]+is|i\.e\.|or)[^\S\n]+(?:(?:more|less)[^\S\n]+than|over|under|about|around|roughly|nearly|almost|some|at[^\S\n]+least|only|just|merely|barely)?[^\S\n]*$/iu;
/** After the multiple, a base said after it: "faster than the", "the COP of the best …", "as efficient as a". */
const FORWARD_RE =
  /^[^\S\n]+(?:(?:(?:more|less)[^\S\n]+[\p{L}-]+|[\p{L}]+er)[^\S\n]+than|as[^\S\n]+[\p{L}-]+[^\S\n]+as|the[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:of|from))[^\S\n]+/iu;
/** Kinds a multiple may be claimed of. */
const MULTIPLIABLE: FigureKind[] = ['cop', 'efficiency', 'speed', 'thrust', 'thrust-per-power', 'power', 'energy'];

export function multiplesOfABase(text: string, drafts: Draft[]): void {
  for (const m of text.matchAll(MULTIPLE_RE)) {
    const start = m.index!;
    const end = start + m[0].length;
    // (A count word read as a bare figure — "five" of "five times that" taken for a COP — is the multiple's.)
    const counted = drafts.findIndex((d) => d.start === start && d.end <= end && m[2] !== undefined && (d.kind === 'cop' || d.kind === 'efficiency') && !d.derived && text.slice(d.start, d.end).toLowerCase() === m[2].toLowerCase());
    if (drafts.some((d, i) => i !== counted && d.start < end && start < d.end)) continue;
    const key = (m[2] ?? m[3] ?? '').toLowerCase().replace('-', '');
    const n = m[1] !== undefined ? Number(m[1]) : COUNT[key];
    if (!(n > 1) || n > 1000) continue;
    const lead = text.slice(Math.max(0, start - 60), start);
    // (Not part of a larger count, "five hundred times"; not a bound, "more than double that", "over ten
    // times"; not an expectation or a supposition, "we expect ten times that", "no engine could convert …".)
    if (COUNT_BEFORE_RE.test(lead) || BOUND_BEFORE_RE.test(lead) || MODAL_BEFORE_RE.test(lead)) continue;
    const after = text.slice(end, end + 160);
    const sentence = sentenceAround(text, start, end);
    const from = text.indexOf(sentence);
    let base: Draft | undefined;
    if (BACK_RE.test(after)) {
      // The nearest figure before, in this sentence or the one before it.
      base = [...drafts].reverse().find((d) => d.end <= start && start - d.end < 300 && MULTIPLIABLE.includes(d.kind) && !d.derived);
      // ("A speed of 1.9 million km/s would be more than six times that": the figure before restated as a
      // multiple of something said earlier, not a multiple of it.)
      if (base && RESTATED_GAP_RE.test(text.slice(base.end, start))) continue;
    } else {
      const fw = FORWARD_RE.exec(after);
      if (!fw) continue;
      // The first figure after, in the same sentence ("… heat pumps, which top out around 4.5").
      base = drafts.find((d) => d.start >= end && d.start - end < 140 && (from < 0 || d.start < from + sentence.length) && MULTIPLIABLE.includes(d.kind) && !d.derived);
    }
    if (!base) continue;
    // ("Twice the light of a 60 W bulb": light set against a lamp's rating, which is what the lamp takes — no
    // power of the claim's device.)
    if ((base.kind === 'power' || base.kind === 'energy') && /(?<!\p{L})(?:light|brightness|illumination|lumens?|glow)(?!\p{L})/iu.test(text.slice(Math.min(start, base.start), Math.max(end, base.start)))) continue;
    const si = siOf(base);
    if (si === null || !(si > 0)) continue;
    const up = upperSiOf(base);
    const unit = FIGURE_SI_UNIT[base.kind];
    const d: Draft = {
      start,
      end,
      kind: base.kind,
      quantity: typedSi(n * si, unit),
      role: base.role === 'aside' ? null : base.role,
      derived: `${n} × another's figure (${text.slice(base.start, base.end).trim()})`,
    };
    // (Of a range, the lower end: the end kinder to the claim.)
    if (up !== null && up > si) d.assumption = `the lower end of ${text.slice(base.start, base.end).trim()} taken`;
    base.role = 'aside';
    if (counted >= 0) drafts.splice(counted, 1);
    insertInOrder(drafts, d);
  }
}
