/**
 * Entries a claim's own findings lead to, beside the entries its words match (issue 11).
 *
 * The matcher (claim-match.ts) ranks entries by the words a claim shares with them, the classes the
 * figures point to boosted; a claim can say little in words and everything in figures ("Probe
 * reaches 450,000 km/s."). When its words match no entry and the check kit's finding on its own
 * figures points to a class (a speed above c, a light converter past its limits, a first-law ledger
 * with more out than in, a figure above 100 % said of an efficiency, the Carnot limit passed), the
 * entry of that class is offered. Where the words match entries they decide: a drive claim whose
 * speed runs past c is answered by the drive's entry, with the class boost lifting the
 * faster-than-light entry where the words are about the speed.
 * Where the words do match entries, the one of exactly the finding's class is lifted (LEAD_BOOST):
 * the words choose the family, the figures the member of it.
 * The entry is the one of exactly that class (not its children) that the text's words rank highest
 * in a plain search, else the class's first entry. The hit carries the finding in words
 * (`finding`) and no matched words: it was not picked for its words.
 */
import type { FindingLead } from '../../shared/claims/plan';
import type { ClaimHit } from './claim-match';
import type { SearchIndex } from './index';
import type { IndexedEntry } from './types';

/**
 * Score factor (1 + LEAD_BOOST) for a matched entry of the class a finding points to. Chosen on the
 * tuning part of the claim corpus (0.3 / 0.6 / 1.0 tried: 0.6 ranked the most entries right).
 */
export const LEAD_BOOST = 0.6;

export function withFindingEntries(index: SearchIndex, text: string, hits: ClaimHit[], leads: readonly FindingLead[], limit = 5): ClaimHit[] {
  if (leads.length === 0) return hits;
  if (hits.length > 0) {
    // Where the words match entries, an entry of exactly the class a finding points to (a ledger with
    // more out than in → the over-unity circuits, not the self-charging vehicles beside them in the
    // same family) is lifted by LEAD_BOOST; the words still decide between entries far apart.
    const led = new Set(leads.map((l) => l.mechanismClass));
    return hits
      .map((h) => (h.entry.mechanismClass !== null && led.has(h.entry.mechanismClass) ? { ...h, score: h.score * (1 + LEAD_BOOST) } : h))
      .sort((a, b) => b.score - a.score);
  }
  let out: ClaimHit[] = [];
  let ranked: IndexedEntry[] | null = null;
  const entryOf = (cls: string): IndexedEntry | null => {
    const all = index.entriesOfClass(cls);
    if (all.length <= 1) return all[0] ?? null;
    ranked ??= index.query(text).map((h) => h.entry);
    return ranked.find((e) => e.mechanismClass === cls) ?? all[0];
  };
  for (const lead of leads) {
    const entry = entryOf(lead.mechanismClass);
    if (entry && !out.some((h) => h.entry.slug === entry.slug)) out = [...out, findingHit(entry, lead)];
  }
  return out.slice(0, limit);
}

const findingHit = (entry: IndexedEntry, lead: FindingLead): ClaimHit => ({
  entry,
  score: 0,
  terms: [],
  words: [],
  synonyms: [],
  classSignalled: true,
  finding: lead.why,
});
