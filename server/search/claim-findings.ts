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
 * The entry is the one of exactly that class (not its children) that the text's words rank highest
 * in a plain search, else the class's first entry. The hit carries the finding in words
 * (`finding`) and no matched words: it was not picked for its words.
 */
import type { FindingLead } from '../../shared/claims/plan';
import type { ClaimHit } from './claim-match';
import type { SearchIndex } from './index';
import type { IndexedEntry } from './types';

export function withFindingEntries(index: SearchIndex, text: string, hits: ClaimHit[], leads: readonly FindingLead[], limit = 5): ClaimHit[] {
  if (leads.length === 0 || hits.length > 0) return hits;
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
