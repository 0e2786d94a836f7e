/**
 * Link previews of entry pages: the web app is one page that routes on the client, so a crawler
 * that reads no JavaScript would see the same generic title and description for every entry. For
 * `/entries/<slug>` and `/entries/<slug>/v/<n>` the server puts the entry's title and a short
 * description (its "in brief") into the page it sends: `<title>`, `<meta name="description">`,
 * Open Graph's `og:title`, `og:description`, `og:url` and `og:type` (ogp.me), and a canonical link.
 * http/page-shell.ts reads the entry (one small read of the database) and sends the page; on any
 * miss (no such entry or version, a database error) the plain page goes out, as for every other route.
 * Tests: tests/server/citations.test.ts ("link previews").
 */
/** Link-preview descriptions are cut near this length (common practice for search snippets, no source). */
const DESCRIPTION_MAX = 200;

/** Text for an HTML attribute value or element content: the five characters HTML gives meaning to. */
export const escapeHtml = (s: string): string =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** Plain text of a short Markdown/TeX paragraph, on one line, cut at a word near `max` characters. */
export function plainSummary(markdown: string, max = DESCRIPTION_MAX): string {
  const text = markdown
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, '$1') // links and images: their text
    .replace(/^[ \t]*(?:#{1,6}|>)[ \t]*/gm, '') // headings and quotes at the start of a line
    .replace(/[*`~]+|(?<!\w)_+|_+(?!\w)/g, '') // emphasis and code marks (an underscore inside a word stays)
    .replace(/\$\$?([^$]*)\$\$?/g, '$1') // TeX delimiters
    .replace(/\s+/g, ' ')
    .trim();
  if (text.length <= max) return text;
  const cut = text.slice(0, max - 1);
  const space = cut.lastIndexOf(' ');
  return `${(space > max / 2 ? cut.slice(0, space) : cut).replace(/[\s,;:.]+$/, '')}…`;
}

export interface PageMeta {
  title: string;
  description: string;
  /** The page's own absolute URL. */
  url: string;
}

/** The page with this title, description and address in its head (replacing the generic ones). */
export function withPageMeta(html: string, meta: PageMeta): string {
  const title = escapeHtml(meta.title);
  const description = escapeHtml(meta.description);
  const url = escapeHtml(meta.url);
  const tags = [
    `<meta name="description" content="${description}" />`,
    `<meta property="og:type" content="article" />`,
    `<meta property="og:title" content="${title}" />`,
    `<meta property="og:description" content="${description}" />`,
    `<meta property="og:url" content="${url}" />`,
    `<link rel="canonical" href="${url}" />`,
  ].join('\n    ');
  return (
    html
      // Replacer functions throughout: a `$` in an entry's title must not read as a pattern.
      .replace(/<title>[\s\S]*?<\/title>/i, () => `<title>${title}</title>`)
      .replace(/<meta\s+(?:name|property)="(?:description|og:type|og:title|og:description|og:url)"[^>]*>\s*/gi, () => '')
      .replace(/<link\s+rel="canonical"[^>]*>\s*/gi, () => '')
      .replace(/<\/head>/i, () => `    ${tags}\n  </head>`)
  );
}
