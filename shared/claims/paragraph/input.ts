/** What the paragraph of a claim check (shared/claims/paragraph.ts) is built from. */
import type { CitationStyle, CslItem } from '../../entries/citations';
import type { ClaimCheckNeed, ClaimCheckRun, ClaimMatch, Figure, ParagraphVariant } from '../types';

export interface ParagraphEntry {
  match: ClaimMatch;
  /** The entry version as a CSL item (server/routes/entries.ts citedItem). */
  item: CslItem;
  /** The entry's own sources (CSL), cited for the physics. */
  sources: CslItem[];
  /** The entry's questions to ask of a claim. */
  questions: string[];
  /** The names of the conservation laws the entry rests on ("Conservation of linear momentum"). */
  laws: string[];
  /** The entry's common replies and their answers. */
  replies: { reply: string; answer: string }[];
}

export interface ParagraphsInput {
  /** Matched entries, best first: the first is named, up to PARAGRAPH_RELATED more are mentioned. */
  entries: ParagraphEntry[];
  checks: ClaimCheckRun[];
  /** Checks that need a figure the text does not give. */
  needs: ClaimCheckNeed[];
  figures: Figure[];
  /** The pasted text (for the claim's own rejoinders). */
  text: string;
  style: CitationStyle;
}

/** One paragraph; `needs`, `text` and `variant` may be left out (none, '' and 'referee'). */
export interface ParagraphInput extends Omit<ParagraphsInput, 'needs' | 'text'> {
  needs?: ClaimCheckNeed[];
  text?: string;
  variant?: ParagraphVariant;
}
