/**
 * Speeds against c (shared/claims/plan.ts): the light-speed check on a stated speed from 100 km/s
 * (from 1 km/s for a craft's own speed); a phase velocity or an apparent motion noted, not judged.
 */
import { C_LIGHT } from '../../checks/constants';
import type { Figure } from '../types';
import { at, largest, need, type Basis } from './basis';

/** A claim of going or signalling faster than light, in words: "superluminal transfer", "before light could", "FTL link". */
const FASTER_THAN_LIGHT_WORDS_RE =
  /(?<!\p{L})(?:superluminal|faster[- ]than[- ]light|FTL|warp[- ]?(?:drive|speed|field|bubble)s?|before[^\S\n]+light[^\S\n]+(?:could|would|can|does|did|gets?|got)|outrun(?:s|ning)?[^\S\n]+light|beats?[^\S\n]+light|quicker[^\S\n]+than[^\S\n]+light|outpaces?[^\S\n]+light)(?!\p{L})/iu;
/** Just before such words, a denial: "nothing travels", "no signal can go", "not", "never". */
const DENIED_BEFORE_RE = /(?<!\p{L})(?:nothing|no|not|cannot|can['’]t|never|isn['’]t|aren['’]t|doesn['’]t|don['’]t|won['’]t|without|nor|neither|impossible|forbid\w*|rules?[^\S\n]+out)(?!\p{L})[^.;!?\n]{0,40}$/iu;

/**
 * Speeds from which the light-speed check is run: 100 km/s, beyond anything on or near the Earth
 * (orbital and escape speeds are about 8–11 km/s), so that ordinary speeds do not clutter the result.
 * A rule of thumb (common practice, no source).
 */
const LIGHT_SPEED_FROM = 100_000;
/** From 1 km/s, a speed said of a craft itself (not an exhaust or a speed change) is also checked: no wind, train or runner goes so fast. Common practice, no source. */
const SPACE_SPEED_FROM = 1_000;

/** Before a speed that is no signal's: a phase velocity, a spot or shadow swept across a screen, a galaxy's recession (space expanding, nothing moving through it). */
const NO_SIGNAL_SPEED_RE = /(?<!\p{L})(?:phase (?:velocity|speed)|phase front|spot|shadow|sweep(?:s|ing)?|apparent (?:velocity|speed|motion)|appears? to (?:move|travel|go|run)|seems? to (?:move|travel|go)|recedes?|receding|recession(?: (?:speed|velocity))?)(?!\p{L})[^.;!?\n]{0,25}$/iu;

/** Just before the speed of light said as such: "light travels at about", "the speed of light is", "c ≈". */
const LIGHT_ITSELF_BEFORE_RE =
  /(?<!\p{L})(?:light(?:[^\S\n]+(?:in[^\S\n]+(?:a[^\S\n]+)?vacuum|itself))?[^\S\n]+(?:travels|moves|goes|propagates|runs)|(?:speed|velocity)[^\S\n]+of[^\S\n]+light(?:[^\S\n]+in[^\S\n]+(?:a[^\S\n]+)?vacuum)?(?:,?[^\S\n]*(?:which|that)[^\S\n]+is|[^\S\n]+(?:is|of|=|,|:))?|(?<!\p{L})c[^\S\n]*(?:=|≈|~|is))[^\S\n]*(?:(?:at|of)[^\S\n]+)?(?:(?:about|roughly|some|nearly|almost|approximately|around|just under|just over|a little under|close to)[^\S\n]+)?$/iu;

export function planSpeeds(b: Basis): void {
  const { plans, notes, text, speeds } = b;
  // A phase velocity (or a spot swept across a screen) above c carries no signal: not a speed to judge.
  const noSignal = (f: Figure) => NO_SIGNAL_SPEED_RE.test(text.slice(Math.max(0, (f.start ?? 0) - 40), f.start ?? 0));
  for (const f of speeds.filter((x) => noSignal(x) && (x.upper?.si ?? x.si) >= C_LIGHT)) {
    notes.push(`${f.display.trim()} is said of a phase velocity, an apparent motion or a recession with the expansion of space: such speeds may exceed c without anything carrying a signal or energy through space faster than light, so special relativity does not forbid them.`);
  }
  // "In a vacuum light travels at about 300,000 km/s": the speed of light itself said (within 0.5 % of c), a
  // reference for the figures around it, not a claim to judge.
  const lightItself = (f: Figure) =>
    f.start !== null && Math.abs(f.si / C_LIGHT - 1) <= 0.005 && !f.upper && LIGHT_ITSELF_BEFORE_RE.test(text.slice(Math.max(0, f.start - 60), f.start));
  const signalSpeeds = speeds.filter((f) => !noSignal(f) && !lightItself(f));
  const fastest = signalSpeeds.filter((f) => f.role !== 'delta-v' || f.si >= C_LIGHT).sort((a, b) => b.si - a.si)[0] ?? largest(signalSpeeds);
  // (A craft's own speed from 1 km/s, where the text is about a speed and not a rocket's budget: "a probe at 17 km/s".)
  const speedFrom = fastest && fastest.role === null && !plans.some((p) => p.check === 'rocket-equation') ? SPACE_SPEED_FROM : LIGHT_SPEED_FROM;
  // ("We report superluminal transfer of information …", "gets your message there before light could", with no
  // speed, distance or time given: the check the claim calls for, and what it needs.)
  if (!(fastest && (fastest.upper?.si ?? fastest.si) >= speedFrom)) {
    const m = FASTER_THAN_LIGHT_WORDS_RE.exec(text);
    if (m && !DENIED_BEFORE_RE.test(text.slice(Math.max(0, m.index - 60), m.index)) && !b.needs.some((n) => n.check === 'light-speed')) {
      b.needs.push(need('light-speed', ['the speed claimed, or a distance and the time taken to cover it'], 'The text claims something goes or signals faster than light but gives no speed, distance or time to set against c.', []));
    }
  }
  if (fastest && (fastest.upper?.si ?? fastest.si) >= speedFrom) {
    plans.push({
      check: 'light-speed',
      uses: [fastest],
      inputs: (e) => ({ v: at(fastest, e(fastest)) }),
      why: 'The text states a speed that is a sizeable fraction of the speed of light, or more.',
      assumptions: [],
    });
  }
}
