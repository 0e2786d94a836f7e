/**
 * Citations through citation-js: BibTeX, RIS or CSL-JSON in (one or many items; an item that cannot
 * be read is reported by its position and the others are kept), CSL-JSON kept, and APA, Vancouver
 * and Harvard text or HTML, BibTeX and RIS out.
 *
 * Styles: `@citation-js/plugin-csl` ships the CSL styles `apa` (APA 7th edition), `vancouver` and
 * `harvard1` (Cite Them Right 11th edition — Harvard) from the Zotero style repository. One change is
 * ours: NLM's Citing Medicine (2nd ed., ch. 1, "Location (Pagination)") joins page ranges with a
 * hyphen ("423-8"), where the CSL locale's default is an en dash, so the Vancouver style is registered
 * again as `cw-vancouver` with the page-range delimiter term set to "-".
 *
 * Parsing never touches the network: each format is forced (no DOI or URL look-ups).
 */
import { Cite, logger, plugins } from '@citation-js/core';
import '@citation-js/plugin-bibtex';
import '@citation-js/plugin-ris';
import '@citation-js/plugin-csl';
import { citationSchema, type Citation } from './schema';

// The styles are part of the API contract (declared once in shared/api/constants.ts).
import type { CitationStyle } from '../api/constants';
export { CITATION_STYLES, type CitationStyle } from '../api/constants';
export type CitationFormat = 'text' | 'html';

/** A CSL-JSON item (loosely typed: citation-js accepts the whole CSL-JSON schema). */
export type CslItem = Record<string, unknown> & { id: string; type: string; title: string };

export interface CitationProblem {
  /** Position of the item in the pasted text (0-based, in the order the items appear). */
  index: number;
  /** The item's own text (cut to 500 characters). */
  input: string;
  reason: string;
}

export interface ParsedCitations {
  items: Citation[];
  problems: CitationProblem[];
}

// citation-js logs every odd field to the console; the problems list is how we report them.
(logger as { level?: string }).level = 'silent';

const csl = plugins.config.get('@csl') as {
  templates: { add(name: string, xml: string): void; get(name: string): string; has(name: string): boolean };
};

const TEMPLATE: Record<CitationStyle, string> = { apa: 'apa', vancouver: 'cw-vancouver', harvard: 'harvard1' };

if (!csl.templates.has('cw-vancouver')) {
  const xml = csl.templates.get('vancouver');
  // The style's own in-style locale (CSL 1.0.2, "In-style localization") takes one more term.
  const term = '<term name="page-range-delimiter">-</term>';
  const patched = /<locale[^>]*>[\s\S]*?<terms>/.test(xml)
    ? xml.replace(/(<locale[^>]*>[\s\S]*?<terms>)/, `$1${term}`)
    : xml.replace(/<\/info>/, `</info><locale><terms>${term}</terms></locale>`);
  csl.templates.add('cw-vancouver', patched);
}

const clip = (s: string) => (s.length > 500 ? `${s.slice(0, 500)}…` : s);
const reasonOf = (err: unknown) => {
  const msg = err instanceof Error ? err.message : String(err);
  return msg.split('\n')[0].trim().replace(/:$/, '') || 'could not be read';
};

/** Drops citation-js's bookkeeping (`_graph`) and makes sure of an id. */
function clean(item: Record<string, unknown>, fallbackId: string): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(item)) if (!k.startsWith('_')) out[k] = v;
  if (typeof out.id === 'number') out.id = String(out.id);
  // citation-js makes up `temp_id_<random>` for RIS records without an ID: use a stable one instead.
  if (typeof out.id !== 'string' || !out.id || out.id.startsWith('temp_id_')) {
    const author = (out.author as { family?: string; literal?: string }[] | undefined)?.[0];
    const year = (out.issued as { 'date-parts'?: number[][] } | undefined)?.['date-parts']?.[0]?.[0];
    const name = (author?.family ?? author?.literal ?? '').toLowerCase().replace(/[^a-z0-9]+/g, '');
    out.id = name ? `${name}${year ?? ''}-${fallbackId}` : fallbackId;
  }
  return out;
}

/** One chunk of pasted text → its CSL items, or a reason. */
function readChunk(text: string, forceType: string): Record<string, unknown>[] {
  const data = new Cite(text, { forceType }).data as Record<string, unknown>[];
  if (!data.length) throw new Error('no reference found in this item');
  return data;
}

/** Splits BibTeX into entries at each `@type{` that starts a line; @string definitions go with every entry. */
function splitBibtex(text: string): { chunks: string[]; preamble: string } {
  const starts: number[] = [];
  const re = /^[ \t]*@[A-Za-z]+[ \t]*[{(]/gm;
  let m: RegExpExecArray | null;
  while ((m = re.exec(text))) starts.push(m.index);
  const parts = starts.map((s, i) => text.slice(s, starts[i + 1] ?? text.length).trim());
  const isMacro = (p: string) => /^@(string|preamble)\b/i.test(p);
  const isComment = (p: string) => /^@comment\b/i.test(p);
  return { chunks: parts.filter((p) => !isMacro(p) && !isComment(p)), preamble: parts.filter(isMacro).join('\n') };
}

/** Splits RIS at each `ER  -` line. */
function splitRis(text: string): string[] {
  return text
    .split(/^ER {2}-.*$/m)
    .map((p) => p.trim())
    .filter((p) => p.length > 0)
    .map((p) => `${p}\nER  - \n`);
}

/**
 * BibTeX, RIS or CSL-JSON (one item or many) → CSL-JSON citations with an empty note, in the order
 * given; each item that cannot be read is reported with its index and the reason.
 */
export function parseCitations(text: string): ParsedCitations {
  const items: Citation[] = [];
  const problems: CitationProblem[] = [];
  const trimmed = text.trim();
  if (!trimmed) return { items, problems: [{ index: 0, input: '', reason: 'nothing to read: paste BibTeX, RIS or CSL-JSON' }] };

  const accept = (raw: Record<string, unknown>, index: number, input: string) => {
    const item = clean(raw, `item-${index + 1}`);
    const parsed = citationSchema.safeParse({ csl: item, note: '' });
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const field = issue.path.filter((p) => p !== 'csl').join('.');
      problems.push({ index, input: clip(input), reason: field ? `${field}: ${issue.message === 'Invalid input: expected string, received undefined' ? 'missing' : issue.message}` : issue.message });
      return;
    }
    items.push(parsed.data);
  };

  if (trimmed.startsWith('[') || trimmed.startsWith('{')) {
    let json: unknown;
    try {
      json = JSON.parse(trimmed);
    } catch (err) {
      return { items, problems: [{ index: 0, input: clip(trimmed), reason: `not valid JSON: ${reasonOf(err)}` }] };
    }
    const list = Array.isArray(json) ? json : [json];
    list.forEach((el, index) => {
      const input = JSON.stringify(el);
      if (!el || typeof el !== 'object' || Array.isArray(el)) {
        problems.push({ index, input: clip(input), reason: 'not a CSL-JSON item (an object with id, type and title)' });
        return;
      }
      try {
        const [item] = new Cite([el], { forceType: '@csl/list+object' }).data as Record<string, unknown>[];
        if (!item) throw new Error('not a CSL-JSON item');
        accept({ ...(el as Record<string, unknown>), ...item }, index, input);
      } catch (err) {
        problems.push({ index, input: clip(input), reason: reasonOf(err) });
      }
    });
    return { items, problems };
  }

  if (/^[ \t]*@[A-Za-z]+[ \t]*[{(]/m.test(trimmed)) {
    const { chunks, preamble } = splitBibtex(trimmed);
    chunks.forEach((chunk, index) => {
      try {
        for (const item of readChunk(preamble ? `${preamble}\n${chunk}` : chunk, '@biblatex/text')) accept(item, index, chunk);
      } catch (err) {
        problems.push({ index, input: clip(chunk), reason: reasonOf(err) });
      }
    });
    if (!chunks.length) problems.push({ index: 0, input: clip(trimmed), reason: 'no BibTeX entry found' });
    return { items, problems };
  }

  if (/^TY {2}- /m.test(trimmed)) {
    splitRis(trimmed).forEach((chunk, index) => {
      try {
        if (!/^TY {2}- /m.test(chunk)) throw new Error('an RIS record must start with a "TY  - " line');
        for (const item of readChunk(chunk, '@ris/file')) accept(item, index, chunk);
      } catch (err) {
        problems.push({ index, input: clip(chunk), reason: reasonOf(err) });
      }
    });
    return { items, problems };
  }

  return { items, problems: [{ index: 0, input: clip(trimmed), reason: 'not BibTeX, RIS or CSL-JSON' }] };
}

const asList = (items: CslItem | CslItem[] | Record<string, unknown>[]) => (Array.isArray(items) ? items : [items]);

/** The reference list in a style, one entry per item, in the order given (Vancouver numbers them). */
export function formatBibliography(items: Record<string, unknown>[], style: CitationStyle, format: CitationFormat): string {
  if (!items.length) return '';
  const out = new Cite(asList(items), { forceType: '@csl/list+object' }).format('bibliography', {
    template: TEMPLATE[style],
    format,
    lang: 'en-US',
  }) as string;
  return format === 'text'
    ? out
        .split('\n')
        .map((l) => l.trim().replace(/^(\d+\.)\s+/, '$1 '))
        .filter(Boolean)
        .join('\n')
    : out.trim();
}

/** One reference in a style, without the list number Vancouver puts before it. */
export function formatCitation(item: Record<string, unknown>, style: CitationStyle, format: CitationFormat): string {
  const out = formatBibliography([item], style, format);
  if (format === 'text') return out.replace(/^\d+\.\s+/, '');
  return out.replace(/<div class="csl-left-margin">[^<]*<\/div>/, '');
}

/**
 * BibTeX; each entry's key is its citation-key, else its CSL id, with every character citation-js
 * counts unsafe in a key (hyphen, colon, …) turned into "_" (otherwise it makes up an author-year-word key).
 */
export function toBibtex(items: Record<string, unknown>[]): string {
  const keyed = items.map((i) => ({ ...i, 'citation-key': String(i['citation-key'] ?? i.id).replace(/[^A-Za-z0-9_]/g, '_') }));
  return (new Cite(keyed, { forceType: '@csl/list+object' }).format('bibtex', { format: 'text' }) as string).trim() + '\n';
}

export function toRis(items: Record<string, unknown>[]): string {
  return (new Cite(items, { forceType: '@csl/list+object' }).format('ris', { format: 'text' }) as string).trim() + '\n';
}
