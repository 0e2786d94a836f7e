/** An entry version as a citation: the CSL-JSON item every cite format and the claim check's references start from. */
import type { EntryVersion } from '../models';

const dateParts = (d: Date) => [d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate()];

/**
 * The entry version as a CSL-JSON item: an entry in the reference work "Counterweight", by the
 * version's author, dated by its publication, with its version number and permanent URL. No
 * publisher: it would repeat the work's own name, which APA 7 (§9.29) leaves out.
 */
export function citedItem(slug: string, v: EntryVersion, url: string, accessed = new Date()): Record<string, unknown> & { id: string; type: string; title: string } {
  const name = v.author!.displayName.trim();
  const cut = name.lastIndexOf(' ');
  const author = cut > 0 ? { given: name.slice(0, cut), family: name.slice(cut + 1) } : { literal: name };
  return {
    id: `${slug}-v${v.number}`,
    type: 'entry-encyclopedia',
    title: v.content.title,
    'container-title': 'Counterweight',
    version: String(v.number),
    author: [author],
    issued: { 'date-parts': [dateParts(v.publishedAt!)] },
    accessed: { 'date-parts': [dateParts(accessed)] },
    URL: url,
  };
}
