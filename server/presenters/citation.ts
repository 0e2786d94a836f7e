/** An entry version as a citation: the CSL-JSON item every cite format and the claim check's references start from. */
import type { EntryVersion } from '../models';

const dateParts = (d: Date) => [d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate()];

/** The name of the reference work every entry is part of, and its publisher. */
export const REFERENCE_WORK = 'Counterweight';

/** A display name as a CSL name: the last word is the family name; a single word stays whole. */
export function cslName(displayName: string): { given: string; family: string } | { literal: string } {
  const name = displayName.trim().replace(/\s+/g, ' ');
  const cut = name.lastIndexOf(' ');
  return cut > 0 ? { given: name.slice(0, cut), family: name.slice(cut + 1) } : { literal: name };
}

/** Who wrote a version (see Library.versionRow); its reviewer comes with the version itself. */
export interface VersionCredits {
  /** Every editor who wrote a published version up to and including this one, in order of first contribution. */
  authors: { displayName: string }[];
}

/**
 * The entry version as a CSL-JSON item: an entry in the reference work "Counterweight" (also its
 * publisher), by every editor who wrote a published version up to this one, dated by its
 * publication, with its version number, permanent URL and the day it was looked up.
 *
 * The reviewer (the editor who vetted and published this version) is credited in `note` ("Reviewed
 * by …"): CSL 1.0.2's name variables (specification, "Appendix IV – Variables", name variables) have
 * no reviewer role — `reviewed-author` is the author of a work that is reviewed, and `contributor`
 * says nothing of the part taken. BibTeX (`note`) and RIS (`N1`) carry the same note; the text styles
 * print no note, as none of the three manuals has a place for a reviewer of a reference-work entry.
 */
export function citedItem(slug: string, v: EntryVersion, url: string, credits: VersionCredits, accessed = new Date()): Record<string, unknown> & { id: string; type: string; title: string } {
  const reviewer = v.reviewer?.displayName.trim();
  return {
    id: `${slug}-v${v.number}`,
    type: 'entry-encyclopedia',
    title: v.content.title,
    'container-title': REFERENCE_WORK,
    publisher: REFERENCE_WORK,
    version: String(v.number),
    author: credits.authors.map((a) => cslName(a.displayName)),
    issued: { 'date-parts': [dateParts(v.publishedAt!)] },
    accessed: { 'date-parts': [dateParts(accessed)] },
    URL: url,
    ...(reviewer ? { note: `Reviewed by ${reviewer}` } : {}),
  };
}
