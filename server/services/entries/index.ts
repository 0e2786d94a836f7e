/**
 * Entries, by workflow step: the published library (library.ts), drafts as they are written
 * (drafts.ts), vetting — submit, approve, send back, retire (vetting.ts) — and the Desk (desk.ts).
 *
 * Drafts are saved as the editor types, so a draft may be incomplete (empty sections, no law yet);
 * the full schema (entryContentSchema), the taxonomy, the 120-word brief and every worksheet are
 * checked when the draft is submitted.
 */
import type { EntriesDeps } from './common';
import { Desk } from './desk';
import { Drafts } from './drafts';
import { Library } from './library';
import { Vetting } from './vetting';

export type { EntriesDeps } from './common';
export { Desk, Drafts, Library, Vetting };

export interface Entries {
  library: Library;
  drafts: Drafts;
  vetting: Vetting;
  desk: Desk;
}

export function createEntries(deps: EntriesDeps): Entries {
  return { library: new Library(), drafts: new Drafts(deps), vetting: new Vetting(deps), desk: new Desk() };
}
