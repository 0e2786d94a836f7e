/**
 * The permanent address of one published entry version: the slug plus the version number
 * (DESIGN.md §6), e.g. `/entries/closed-cavity-thrust/v/2`. Every link to a version, on the server
 * (citations, e-mails, the claim check's references) and in the app, is built here.
 */

/** The path of version `n` of an entry, from the site's root. */
export const entryVersionPath = (slug: string, n: number): string => `/entries/${encodeURIComponent(slug)}/v/${n}`;

/** The full permanent URL of version `n`, given the site's origin (`https://counterweight.example.org`). */
export const permalink = (origin: string, slug: string, n: number): string => `${origin}${entryVersionPath(slug, n)}`;
