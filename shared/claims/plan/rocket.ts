/**
 * The rocket equation (shared/claims/plan.ts): an exhaust speed or Isp, the masses (wet and dry, or
 * either with the propellant) and a claimed Δv when there is one; what is missing otherwise.
 */
import type { Figure } from '../types';
import { at, need, ofKind, paragraphKey, siAt, typed, uniq, type Basis, type End } from './basis';

/** A craft that carries what it throws out: a stage, a launcher, a spacecraft. */
const CRAFT_WORDS_RE = /(?<!\p{L})(?:stages?|launchers?|rockets?|spacecraft|space probes?|probes?|satellites?|cubesats?|landers?|boosters?|kick motors?|payloads?|tugs?)(?!\p{L})/iu;

export function planRocket(b: Basis): void {
  const { figures, s, plans, needs, text, speeds } = b;
  const masses = ofKind(figures, 'mass');
  // In a text on several craft, each figure from the paragraph that says the claimed Δv (else the one
  // that says most of what the check needs), and only then from elsewhere: "Option 1 … a fuelled mass
  // of 900 kg … Option 3 … fuelled mass 550 kg, empty 410 kg, Δv 1.3 km/s" is checked on 550 and 410.
  const pieces = [...masses.filter((f) => f.role === 'wet' || f.role === 'dry' || f.role === 'propellant'), ...ofKind(figures, 'specific-impulse'), ...speeds.filter((f) => f.role === 'exhaust' || f.role === 'delta-v')];
  const key = (f: Figure) => (f.start === null || !text ? -1 : paragraphKey(text, f.start));
  // (A Δv said as the total — "45 m/s a year for 15 years: 675 m/s in all" — is the claim, not a year's share.)
  const dvs = speeds.filter((f) => f.role === 'delta-v');
  const totalled = dvs.find(
    (f) =>
      f.start !== null &&
      f.end !== null &&
      !!text &&
      (/^[^\S\n]*(?:in[^\S\n]+(?:all|total)|all[^\S\n]+told|altogether|overall|in[^\S\n]+sum|total(?!\p{L})|over[^\S\n]+(?:the|its)[^\S\n]+(?:whole[^\S\n]+)?(?:mission|life|lifetime))/iu.test(text.slice(f.end, f.end + 30)) ||
        /(?<!\p{L})(?:total|cumulative|overall|mission)[^\S\n]+(?:Δv|delta-?v|velocity[^\S\n]+change)[^\S\n]*(?:of|is|was|:|=)?[^\S\n]*(?:(?:about|around|some|roughly)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, f.start - 40), f.start))),
  );
  // (Only the total of the first Δv's own paragraph: a "total Δv" of another design set against it is not the claim.)
  const claimed = totalled && (totalled.start === null || dvs[0].start === null || paragraphKey(text, totalled.start) === paragraphKey(text, dvs[0].start)) ? totalled : dvs[0];
  const counts = new Map<number, number>();
  for (const f of pieces) counts.set(key(f), (counts.get(key(f)) ?? 0) + 1);
  const home = claimed && key(claimed) !== -1 ? key(claimed) : [...counts].sort((a, b) => b[1] - a[1])[0]?.[0];
  const pick = (fs: Figure[]): Figure | undefined => fs.find((f) => key(f) === home) ?? fs[0];
  let wet = pick(masses.filter((f) => f.role === 'wet'));
  let dry = pick(masses.filter((f) => f.role === 'dry'));
  let prop = pick(masses.filter((f) => f.role === 'propellant'));
  // Two masses said together before two said apart: "2.2 t at lift-off, of which 1.6 t is propellant"
  // on a slide, rather than that 2.2 t against "0.6 t once the propellant is spent" in a later memo.
  if (wet && dry && prop && key(wet) !== key(dry)) {
    if (key(wet) === key(prop)) dry = undefined;
    else if (key(dry) === key(prop)) wet = undefined;
  }
  if (wet && dry) prop = undefined;
  const isp = pick(ofKind(figures, 'specific-impulse'));
  const exhaust = pick(speeds.filter((f) => f.role === 'exhaust'));
  const dv = claimed;
  const rocketish = isp || exhaust || dv || wet || dry || prop;
  if (rocketish && (s.propellant || isp || exhaust || prop || (dv && (wet || dry || CRAFT_WORDS_RE.test(text))))) {
    const missing: string[] = [];
    if (!isp && !exhaust) missing.push('the exhaust speed or the specific impulse');
    const twoMasses = [wet, dry, prop].filter(Boolean).length >= 2;
    // (Masses that cannot be one craft's — "a trailer carries 9 tonnes of liquid oxygen" and "a 300 g flight
    // computer" in paragraphs on other companies — are no masses of the craft: they are asked for.)
    const impossible = (wet && prop && siAt(prop, 'low') >= siAt(wet, 'high')) || (wet && dry && siAt(dry, 'low') >= siAt(wet, 'high'));
    if (!twoMasses || impossible) missing.push(!wet && !dry ? 'the masses of the craft with and without its propellant' : impossible ? 'the masses of the craft with and without its propellant (the masses the text gives cannot be one craft\'s)' : 'the propellant mass (or the mass with or without it)');
    if (missing.length) {
      // (A speed change alone, said of a stage or a rocket, names the check too: "gives its payload 11 km/s of Δv".)
      if ([isp, exhaust, wet, dry, prop, dv].filter(Boolean).length >= 2 || (dv && (s.propellant || CRAFT_WORDS_RE.test(text)))) needs.push(need('rocket-equation', missing, 'A craft that throws out propellant can change its speed by at most v_e·ln(m0/m1).', uniq([isp, exhaust, wet, dry, prop, dv])));
    } else {
      const m0 = (e: (f: Figure) => End): string =>
        wet ? at(wet, e(wet)) : typed(siAt(dry!, e(dry!)) + siAt(prop!, e(prop!)), 'kg');
      const m1 = (e: (f: Figure) => End): string =>
        dry ? at(dry, e(dry)) : typed(siAt(wet!, e(wet!)) - siAt(prop!, e(prop!)), 'kg');
      const extra: string[] = [];
      if (!wet) extra.push('Starting mass = dry mass + propellant.');
      if (!dry) extra.push('Final mass = starting mass − propellant.');
      plans.push({
        check: 'rocket-equation',
        uses: uniq([exhaust ? undefined : isp, exhaust, wet, dry, prop, dv]),
        inputs: (e) => ({
          v_e: exhaust ? at(exhaust, e(exhaust)) : '0 m/s',
          Isp: isp && !exhaust ? at(isp, e(isp)) : '0 s',
          m0: m0(e),
          m1: m1(e),
          dv_claimed: dv ? at(dv, e(dv)) : '0 m/s',
        }),
        why: 'The text gives what the rocket equation needs: the exhaust speed (or Isp) and the masses with and without propellant.',
        assumptions: dv ? extra : [...extra, 'No velocity change is claimed: the check gives the Δv the propellant allows.'],
      });
    }
  }
}
