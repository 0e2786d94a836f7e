/**
 * The claim’s own rejoinder in the paragraph of a claim check (issue 11, item 4): which reply a text
 * raises, and its answer from the entry. Inputs are built from the
 * real starter entries and from checks run with runCheck on invented claims (test-support.ts); the
 * claim texts are invented.
 */
import { buildParagraph, contentKeys, matchReply } from '../paragraph';
import { all, CAVITY_TEXT, entry, figures, heatPump, photon, slugs } from './test-support';

describe('the claim’s own rejoinder', () => {
  /** Invented texts that raise one of an entry's replies in their own words, with that reply's start. */
  const raised: [slug: string, text: string, reply: string][] = [
    ['resonant-cavity-thruster', CAVITY_TEXT, 'A high Q factor'],
    ['resonant-cavity-thruster', 'The thrust we measure is tiny, only 4 µN, so it could hardly break a law of physics.', 'The measured thrust is tiny'],
    ['overbalanced-wheel', 'On the falling side each weight swings out further from the axle, so its torque is larger than on the rising side.', 'The weights on the descending side'],
    ['over-unity-circuit', 'With 12 V and 3 A at the output, the output voltage times the output current comes to more than the 20 W input power.', 'The output voltage times'],
    ['ambient-heat-engine', 'The module rectifies the random thermal motion of the air molecules, ratchet fashion, into a steady current.', 'Our device rectifies'],
    ['vacuum-energy-generator', 'The Casimir effect is a real, measured force, so the vacuum energy between the plates can do work.', 'The Casimir effect'],
    ['permanent-magnet-motor', 'A magnetic shield swings in at the sticky point and lets the rotor past it.', 'Our shielding or magnet gate'],
  ];

  it.each(raised)('%s: “%s” raises the reply and gets its answer', (slug, text, start) => {
    const e = entry(slug);
    const m = matchReply(text, e.replies);
    expect(m?.reply.startsWith(start)).toBe(true);
    const answer = (m as NonNullable<typeof m>).answer.replace(/\s+/g, ' ');
    const first = answer.split(/(?<=[.!?])\s+(?=[A-Z])/)[0];
    // The referee paragraph (no checks, so there is room) quotes the reply and answers it from the entry.
    const p = buildParagraph({ entries: [e], checks: [], figures: [], style: 'apa', text, variant: 'referee' });
    expect(p.body).toContain(`(“${m?.reply.replace(/[.;:,]+$/, '')}”)`);
    expect(p.body).toContain(first.replace(/[.!?]$/, ''));
  });

  it('is each entry’s own reply when the reply itself is pasted, for every reply of the starter library', () => {
    let n = 0;
    for (const slug of slugs) {
      const e = entry(slug);
      for (const r of e.replies) {
        expect(matchReply(r.reply, e.replies)?.reply).toBe(r.reply);
        n++;
      }
    }
    expect(n).toBeGreaterThanOrEqual(30);
  });

  it('is not raised by a text that only uses the subject’s common words', () => {
    const plainCavity = 'A tapered copper cavity fed with 700 W of microwaves produced 1.2 mN of thrust on a torsion balance in air.';
    expect(matchReply(plainCavity, entry('resonant-cavity-thruster').replies)).toBeNull();
    // Nor by the common words spread over a long text, sentences apart.
    const spread = 'The thrust was recorded. The tiny balance sat on a bench. ' + 'Nothing else changed. '.repeat(3) + 'A law of the lab: log everything. Measured twice.';
    expect(matchReply(spread, entry('resonant-cavity-thruster').replies)).toBeNull();
    for (const slug of slugs) expect(matchReply(entry(slug).match.title, entry(slug).replies)).toBeNull();
    const p = buildParagraph({ entries: [entry('resonant-cavity-thruster')], checks: [photon], figures, style: 'apa', text: plainCavity });
    expect(p.body).not.toMatch(/familiar point/);
  });

  it('reads the trade’s spellings of one idea alike (quality factor, Q factor, a lone Q)', () => {
    const q = contentKeys('the Q factor');
    expect(contentKeys('its quality factor')).toEqual(q);
    expect(contentKeys('its Q-factor')).toEqual(q);
    expect(contentKeys('a Q of 10⁵')).toEqual(q);
    expect(contentKeys('multiplies')).toEqual(contentKeys('multiplied'));
  });

  it('is not answered when the figures are consistent with the law', () => {
    for (const p of all({ entries: [entry('ambient-heat-engine')], checks: [heatPump], text: 'Our device rectifies the random thermal motion of molecules, like a ratchet.' })) {
      expect(p.body).not.toMatch(/familiar point|common reply|standard answer|does not overcome/);
    }
  });
});
