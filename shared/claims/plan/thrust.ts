/**
 * The thrust checks (shared/claims/plan.ts): the photon-rocket bound for a thrust and the power that
 * produces it (or a thrust per power), for a device that throws out no propellant; the break-even
 * speed when the text gives the craft's speed; what is missing otherwise.
 */
import type { Figure } from '../types';
import { at, need, ofKind, siAt, typed, uniq, type Basis } from './basis';
import { C_LIGHT } from '../../checks/constants';
import { formatQuantity } from '../../worksheet/quantity';
import { sentenceAround } from '../reader/context';
import { propellantFreeParagraphs, readSignals, type Signals } from './signals';

/** What the first-law planner needs to know of the thrust. */
export interface ThrustReading {
  thrust: Figure | undefined;
  photonApplies: boolean;
}

/**
 * A thrust per power within 1 % of 1/c is the bound itself said in the text ("1/c ≈ 3.34 nN/W"), not a
 * claim; within 5 % ("a lamp's push is about 3.3 µN per kilowatt") it may be either — a perfect photon
 * thruster's claim or the bound rounded — and does not make a paragraph the claim's.
 */
const isTheBound = (f: Figure, within = 0.01, text = '') =>
  f.kind === 'thrust-per-power' &&
  (Math.abs(f.si * C_LIGHT - 1) <= within ||
    // (Within 5 % and said as a limit: "the most any device can get … is about 3.3 µN per kW".)
    (Math.abs(f.si * C_LIGHT - 1) <= 0.05 && f.start !== null && f.end !== null && BOUND_SAID_RE.test(text.slice(windowStartOf(text, f.start), f.start))));
/** Words of a limit said before a figure in its sentence. */
const BOUND_SAID_RE = /(?<!\p{L})(?:the most|at most|at best|the best|limit|bound|maximum|ceiling|ideal|perfect|can only|could only|a lamp|a flashlight|a torch|light beam|beam of light|the push of light|push like)(?!\p{L})/iu;
/** Where the sentence around a place begins. */
const windowStartOf = (text: string, at: number) => {
  const head = text.slice(0, at);
  const m = /[\s\S]*(?:[.!?]["”’')\]]*\s|\n)/u.exec(head);
  return m ? m[0].length : 0;
};

/**
 * In a document on several devices whose words of propellant stop the photon bound, the paragraph that
 * says plainly a device throws out nothing and gives its thrust: that paragraph's figures and words, read
 * on their own (its propellant words still count).
 */
function propellantFreeParagraph(b: Basis): { figures: Figure[]; s: Signals } | null {
  if (b.s.propellantFree && !b.s.propellant) return null;
  const inside = (f: Figure, [from, to]: [number, number]) => f.start !== null && f.start >= from && f.start < to;
  for (const span of propellantFreeParagraphs(b.text)) {
    const figures = b.figures.filter((f) => inside(f, span));
    if (!figures.some((f) => (f.kind === 'thrust' || f.kind === 'thrust-per-power') && f.role !== 'aside' && !isTheBound(f, 0.05))) continue;
    // (A text on light's push, whose beam's words count as propellant, is read whole where the paragraph
    // lacks the power of the light.)
    if (b.s.lightPush && !figures.some((f) => f.kind === 'power' || f.kind === 'thrust-per-power')) return null;
    return { figures, s: readSignals({ ...b.ctx, text: b.text.slice(span[0], span[1]) }) };
  }
  return null;
}

/** A mirror, a sail or a reflector named as what light falls on and pushes (not a source of light). */
const REFLECTOR_RE = /(?<!\p{L})(?:mirrors?|(?:solar |light |laser )?sails?|reflectors?|reflecting (?:foil|film|membrane|surface|plate)|lightsails?)(?!\p{L})/iu;
const LIGHT_FALLS_RE = /(?<!\p{L})(?:sunlight|light|laser|beam|radiation pressure|light pressure|photons?|illuminat\w*|shines?|shone|falls? on|falling on|hits?|strikes?)(?!\p{L})/iu;
function reflectorPushed(text: string, thrust: Figure): boolean {
  if (!text || thrust.start === null || thrust.end === null) return false;
  const sentence = sentenceAround(text, thrust.start, thrust.end);
  return REFLECTOR_RE.test(sentence) && LIGHT_FALLS_RE.test(sentence) && !/(?<!\p{L})(?:emits?|emitting|emitters?|lamps?|bulbs?|sources?|behind|thrusters?|drives?|engines?|cavit(?:y|ies)|resonat\w*|sealed|closed|enclosed|tubes?|round[- ]trips?|inside)(?!\p{L})/iu.test(sentence);
}

/** What light may fall on and be sent back from; a black or absorbing one takes only the light's own momentum. */
const LIT_TARGET_RE = /(?<!\p{L})(?:vanes?|foils?|targets?|(?:light |solar |laser )?sails?|lightsails?|mirrors?|reflect\w*|membranes?|films?)(?!\p{L})/iu;
/** Light recycled between mirrors: "bounces back and forth 500 times between two mirrors", "photon recycling". */
const RECYCLED_BETWEEN_MIRRORS_RE =
  /(?<!\p{L})(?:recycl\w+|(?:back and forth|to and fro|\d+ times|many times|(?:multiple|repeated) (?:reflections|bounces|passes))[^.;!?\n]{0,40}between[^.;!?\n]{0,30}mirrors?|(?:bounc\w+|reflect\w+|pass\w*|sen[dt]s?|sending)[^.;!?\n]{0,40}between[^.;!?\n]{0,30}mirrors?[^.;!?\n]{0,20}?(?:back and forth|to and fro|\d[\d,]* times|many times|hundreds of times|thousands of times))(?!\p{L})/iu;
/** A closed device: light recycled inside it pushes nothing out. */
const CLOSED_RE = /(?<!\p{L})(?:sealed|closed|enclosed|cavit(?:y|ies)|resonat\w*|box(?:es)?|frustum|inside (?:the|a|its) (?:device|drive|case|housing))(?!\p{L})/iu;
/** A push said at P/c or 2P/c, in print rounded ("6.7 µN for 1 kW, twice P/c"): the bound said, no claim beyond it. */
const atLightsBound = (thrust: Figure, power: Figure): boolean =>
  power.si > 0 && [1, 2].some((k) => Math.abs((thrust.si * C_LIGHT) / (k * power.si) - 1) <= 0.01);
const EMITTER_RE = /(?<!\p{L})(?:recoil\w*|emit\w*|puts? out|shed\w*|radiat(?:es?|ing|ed)|beaming|transmitters?|torch(?:es)?|flashlights?|LEDs?)(?!\p{L})/iu;
const BLACK_TARGET_RE = /(?<!\p{L})(?:black\w*|flat-black|absorb\w*|soot\w*)(?!\p{L})/iu;

/** "Energy to the driver over a 24-hour run: 0.96 kWh": the power that drives it, the energy in over the run. */
function powerOverRun(b: Basis): Figure | undefined {
  const { eIn, duration } = b;
  if (!eIn || eIn.kind !== 'energy' || !duration || duration.role === 'aside' || !(duration.si > 0)) return undefined;
  const si = eIn.si / duration.si;
  const up = eIn.upper ? eIn.upper.si / duration.si : undefined;
  return {
    ...eIn,
    kind: 'power',
    unit: 'W',
    si,
    quantity: typed(si, 'W'),
    display: formatQuantity(si, 'W'),
    upper: up === undefined ? undefined : { quantity: typed(up, 'W'), si: up, display: formatQuantity(up, 'W') },
    derived: `power = energy in over the run (${eIn.display} / ${duration.display})`,
  };
}

export function planThrust(b: Basis): ThrustReading {
  const { plans, needs, notes, text, pIn, pOut, speeds } = b;
  const scoped = propellantFreeParagraph(b);
  const s = scoped?.s ?? b.s;
  const figures = scoped?.figures ?? b.figures;
  const power = scoped ? ofKind(figures, 'power') : b.power;
  // (A thrust within 1 % of P/c for a power said in its sentence is the bound worked out — "for one
  // kilowatt this is 3.34 µN" — not a claim, where the text gives the claim another way.)
  const thrusts = ofKind(figures, 'thrust');
  const worked = (t: Figure) =>
    t.start !== null &&
    t.end !== null &&
    power.some((p) => p.start !== null && p.si > 0 && Math.abs((t.si * C_LIGHT) / p.si - 1) <= 0.01 && windowStartOf(text, p.start) === windowStartOf(text, t.start!));
  const claimedThrusts = thrusts.filter((t) => !worked(t));
  // (And where the text works out the bound so, a thrust per power it gives is the claim before any other thrust.)
  const boundWorked = claimedThrusts.length < thrusts.length && ofKind(figures, 'thrust-per-power').some((f) => !isTheBound(f));
  const thrust = boundWorked ? undefined : (claimedThrusts[0] ?? thrusts[0]);
  // (A figure at the bound and said as one is passed over for another thrust per power the text gives;
  // alone, it may be a perfect photon thruster's claim: "the ideal is 3.3 µN per kW, and our array reaches it".)
  const perPowers = ofKind(figures, 'thrust-per-power').filter((f) => !isTheBound(f));
  const perPower = perPowers.find((f) => !isTheBound(f, 0.01, text)) ?? perPowers[0];
  // The power that drives the thrust: the input nearest the thrust in the text (not a reference lamp's).
  const thrustAt = ofKind(figures, 'thrust')[0]?.start ?? null;
  const nearThrust = (fs: Figure[]) => (thrustAt === null ? fs[0] : [...fs].sort((a, b) => Math.abs((a.start ?? 0) - thrustAt) - Math.abs((b.start ?? 0) - thrustAt))[0]);
  const drivePower =
    nearThrust(power.filter((f) => f.role === 'in')) ?? power.find((f) => f.role === null) ?? power.find((f) => f.role !== 'out' && f.role !== 'excess') ?? pOut ?? (thrustAt !== null ? powerOverRun(b) : undefined);
  const craftSpeed = speeds.find((f) => f.role === null);
  const photonApplies = s.propellantFree && !s.propellant;
  if ((thrust && drivePower) || perPower) {
    if (photonApplies && RECYCLED_BETWEEN_MIRRORS_RE.test(text) && !CLOSED_RE.test(text)) {
      // Light sent back and forth between mirrors on two bodies pushes them apart at each pass (lawfully
      // many times P/c); between mirrors on one body it gains nothing. The text must say which.
      needs.push(
        need(
          'photon-bound',
          ['whether the mirrors the light passes between are on the device alone (then nothing is gained) or one of them is elsewhere (then each pass pushes)'],
          'Light recycled between mirrors pushes at each pass only where one mirror is on another body.',
          uniq([thrust, drivePower, perPower]),
        ),
      );
    } else if (photonApplies) {
      if (thrust && drivePower) {
        // A mirror, a sail or a reflector that light falls on is pushed by it twice over when it sends the
        // light back: its bound is 2P/c, not the P/c of a source that only emits.
        const reflected = reflectorPushed(text, thrust);
        plans.push({
          check: 'photon-bound',
          uses: [thrust, drivePower],
          inputs: (e) => ({ F_claimed: at(thrust, e(thrust)), P: reflected ? typed(2 * siAt(drivePower, e(drivePower)), 'W') : at(drivePower, e(drivePower)) }),
          why: 'The text gives a thrust and the power that produces it, for a device that throws out no propellant.',
          assumptions: reflected ? ['The light falls on a mirror, a sail or a reflector that sends it back: it passes on at most twice its momentum, so the bound is 2P/c (P doubled here).'] : [],
        });
        if (craftSpeed) {
          plans.push({
            check: 'break-even-speed',
            uses: [thrust, drivePower, craftSpeed],
            inputs: (e) => ({ F: at(thrust, e(thrust)), P: at(drivePower, e(drivePower)), v: at(craftSpeed, e(craftSpeed)), m: '0 kg' }),
            why: 'A constant thrust on a constant power: the kinetic power F·v passes the input power at v = P/F.',
            assumptions: ['Mass of the craft: not used (the text gives none; only the time to reach the break-even speed would need it).'],
          });
        } else {
          needs.push(need('break-even-speed', ['a speed of the craft in some inertial frame'], 'A constant thrust on a constant power gains kinetic energy faster than it is fed above v = P/F.', [thrust, drivePower]));
        }
      } else if (perPower) {
        plans.push({
          check: 'photon-bound',
          uses: [perPower],
          inputs: (e) => ({ F_claimed: typed(siAt(perPower, e(perPower)), 'N'), P: '1 W' }),
          why: 'The text gives the thrust per unit power of a device that throws out no propellant.',
          assumptions: ['Run per watt of input: the ratio to the bound does not depend on the power.'],
        });
      }
    } else if (s.lightPush && thrust && drivePower && !atLightsBound(thrust, drivePower)) {
      // Light falling on a vane, a foil or a sail, or shone out by a source: its push is at most P/c, or
      // 2P/c where it may be sent back (a target not said to be black is given the benefit).
      // (A source's own recoil — a torch, a transmitter, a radiating panel — is P/c whatever the text's other targets.)
      const said = thrust.start !== null && thrust.end !== null ? sentenceAround(text, thrust.start, thrust.end) : '';
      const emitter = EMITTER_RE.test(said) && !LIT_TARGET_RE.test(said);
      const doubled = LIT_TARGET_RE.test(text) && !BLACK_TARGET_RE.test(text) && !emitter;
      plans.push({
        check: 'photon-bound',
        uses: [thrust, drivePower],
        inputs: (e) => ({ F_claimed: at(thrust, e(thrust)), P: doubled ? typed(2 * siAt(drivePower, e(drivePower)), 'W') : at(drivePower, e(drivePower)) }),
        why: 'The text gives a push of light and the power of the light.',
        assumptions: doubled
          ? ['The light falls on a target the text does not say is black: it may send the light back and take at most twice its momentum, so the bound is 2P/c (P doubled here).']
          : [],
      });
    } else if (s.propellant) {
      notes.push('The text says the device expels propellant, so the photon-rocket bound (for devices that throw out nothing) does not apply; the rocket equation does.');
    } else {
      needs.push(
        need(
          'photon-bound',
          ['whether the device throws out propellant or anything else (the photon-rocket bound applies only if it does not)'],
          'The text gives a thrust and a power but does not say whether the device expels anything.',
          uniq([thrust, drivePower, perPower]),
        ),
      );
    }
  } else if (thrust && photonApplies) {
    needs.push(need('photon-bound', ['the input power'], 'A propellant-free thrust is bounded by the power that produces it (F ≤ P/c).', [thrust]));
  } else if (!thrust && photonApplies && power.length > 0 && /(?<!\p{L})(?:thrust|push|force|propulsion|thruster|drive)(?!\p{L})/iu.test(text)) {
    // "Sealed thruster, 1 kW input. Thrust figures to follow."
    needs.push(need('photon-bound', ['the thrust measured'], 'A propellant-free thrust is bounded by the power that produces it (F ≤ P/c).', uniq([pIn ?? power[0], pOut])));
  }
  return { thrust, photonApplies };
}
