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

interface Register {
  add(name: string, xml: string): void;
  get(name: string): string;
  has(name: string): boolean;
}
const csl = plugins.config.get('@csl') as { templates: Register; locales: Register };

const TEMPLATE: Record<CitationStyle, string> = { apa: 'apa', vancouver: 'cw-vancouver', harvard: 'harvard1' };
/** Cite Them Right is a British manual (its CSL style's default locale is en-GB); the other two are American. */
const LANG: Record<CitationStyle, string> = { apa: 'en-US', vancouver: 'en-US', harvard: 'en-GB' };

if (!csl.locales.has('en-GB')) {
  // citation-js ships en-US but not en-GB. The CSL project's locales-en-GB.xml differs from en-US in
  // what a reference list shows in three ways, made here: punctuation outside quotation marks
  // (punctuation-in-quote="false"), single quotation marks outside and double inside, and dates as
  // "7 June 2025" (day month year). Cite Them Right's own examples read the same way
  // ("(Accessed: 28 March 2024)", "'Title of chapter', in ...").
  const us = csl.locales.get('en-US');
  const gb = us
    .replace(/xml:lang="en-US"/, 'xml:lang="en-GB"')
    .replace(/punctuation-in-quote="true"/, 'punctuation-in-quote="false"')
    .replace(/<date form="text">[\s\S]*?<\/date>/, '<date form="text"><date-part name="day" suffix=" "/><date-part name="month" suffix=" "/><date-part name="year"/></date>')
    .replace('<term name="open-quote">“</term>', '<term name="open-quote">‘</term>')
    .replace('<term name="close-quote">”</term>', '<term name="close-quote">’</term>')
    .replace('<term name="open-inner-quote">‘</term>', '<term name="open-inner-quote">“</term>')
    .replace('<term name="close-inner-quote">’</term>', '<term name="close-inner-quote">”</term>');
  csl.locales.add('en-GB', gb);
}

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

/**
 * An item as a style's manual wants it, where the CSL style alone does not get there:
 * - a publisher that only repeats the title of the work the item is part of (our own entries:
 *   "Counterweight", published by Counterweight) is left out by APA 7 (§9.29: a publisher that is
 *   the same as the author or the work is omitted) and by Cite Them Right's web-page pattern
 *   ("Author (Year) Title. Available at: URL (Accessed: date)"), which names no publisher;
 * - a version (CSL `version`, which the APA style prints as "(Version 2)") goes where the Vancouver
 *   and Harvard styles print an edition: Citing Medicine (2nd ed., ch. 22 "Books on the Internet",
 *   Edition) takes "Version 2" as given on the site, after "[Internet]";
 * - an entry of a reference work reads "'Title', in Work" in Cite Them Right (entries in reference
 *   works are cited like chapters of edited books), which the Harvard CSL style prints for `chapter`.
 * The item itself (CSL-JSON, BibTeX, RIS) keeps every field.
 */
export function itemForStyle(item: Record<string, unknown>, style: CitationStyle): Record<string, unknown> {
  const out = { ...item };
  if (style !== 'vancouver' && out.publisher !== undefined && out.publisher === out['container-title']) delete out.publisher;
  if (style !== 'apa' && out.version !== undefined && out.edition === undefined) out.edition = `Version ${String(out.version)}`;
  if (style === 'harvard' && out.type === 'entry-encyclopedia') out.type = 'chapter';
  return out;
}

/** The reference list in a style, one entry per item, in the order given (Vancouver numbers them). */
export function formatBibliography(items: Record<string, unknown>[], style: CitationStyle, format: CitationFormat): string {
  if (!items.length) return '';
  const out = new Cite(asList(items).map((i) => itemForStyle(i, style)), { forceType: '@csl/list+object' }).format('bibliography', {
    template: TEMPLATE[style],
    format,
    lang: LANG[style],
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

type DateParts = { 'date-parts'?: (number | string)[][] } | undefined;
const partsOf = (d: unknown): number[] => ((d as DateParts)?.['date-parts']?.[0] ?? []).map(Number).filter((n) => Number.isFinite(n));
const pad2 = (n: number) => String(n).padStart(2, '0');
const isoDay = (p: number[]) => [String(p[0]), ...p.slice(1, 3).map(pad2)].join('-');
const MONTHS = ['jan', 'feb', 'mar', 'apr', 'may', 'jun', 'jul', 'aug', 'sep', 'oct', 'nov', 'dec'];

/**
 * One online source (a CSL item with a URL, e.g. an entry version as `server/presenters/citation.ts`
 * makes it) as a BibTeX `@misc` entry with the fields both BibTeX and biblatex read: author, title,
 * organization (the CSL publisher), version, year and month, url, urldate (the access date,
 * YYYY-MM-DD) and note. biblatex's manual (§2.1.1, entry type `misc`) lists exactly these optional
 * fields for `@misc` (organization, version, url, urldate, note); classic BibTeX styles print author,
 * title, year, month and note and leave the others, and the natbib styles print url. `@online` would
 * be biblatex's own type, but BibTeX styles do not know it and would drop the year.
 *
 * Values are escaped by citation-js (its biblatex output: TeX specials, accented letters, capitals
 * kept in braces); citation-js's own BibTeX output is not used as it is, because it writes the day
 * into `month` ("mar 4") and leaves out urldate and version.
 */
export function toOnlineBibtex(item: Record<string, unknown>): string {
  const key = String(item['citation-key'] ?? item.id).replace(/[^A-Za-z0-9_]/g, '_');
  const { 'container-title': _container, issued: _issued, ...rest } = item;
  const latex = (new Cite([{ ...rest, type: 'webpage', 'citation-key': key }], { forceType: '@csl/list+object' }).format('biblatex', { format: 'text' }) as string).split('\n');
  const fields = new Map<string, string>();
  for (const line of latex) {
    const m = /^\s*([a-z]+) = \{(.*)\},?$/.exec(line);
    if (m) fields.set(m[1], m[2]);
  }
  const issued = partsOf(item.issued);
  const accessed = partsOf(item.accessed);
  const lines: string[] = [];
  const add = (name: string, value: string | undefined, braced = true) => {
    if (value !== undefined && value !== '') lines.push(`\t${name} = ${braced ? `{${value}}` : value},`);
  };
  add('author', fields.get('author'));
  add('title', fields.get('title'));
  add('organization', fields.get('organization') ?? fields.get('publisher'));
  add('version', fields.get('version'));
  add('year', issued[0] ? String(issued[0]) : undefined);
  // The month as BibTeX's predefined macro (jan … dec), which biblatex reads too.
  add('month', issued[1] ? MONTHS[issued[1] - 1] : undefined, false);
  add('url', fields.get('url'));
  add('urldate', accessed.length ? isoDay(accessed) : undefined);
  add('note', fields.get('note'));
  return `@misc{${key},\n${lines.join('\n')}\n}\n`;
}

/**
 * One online source as an RIS record of type ELEC (the 2011 RIS specification's "Web Page"), tags
 * as that specification's table for ELEC gives them (transcribed in @citation-js/plugin-ris,
 * lib/spec/new.json): AU once per author in order ("Family, Given"), TI title, PB publisher, PY year,
 * DA date (YYYY/MM/DD/), ET edition (here the version, "Version 2"), UR the URL, Y2 the access date,
 * N1 notes (the reviewer), ID the record's id. citation-js writes ELEC's access date in M1 and leaves
 * the version out, so the record is written here; it reads back through citation-js (tested).
 */
export function toOnlineRis(item: Record<string, unknown>): string {
  const one = (v: unknown) => String(v ?? '').replace(/\s+/g, ' ').trim();
  const lines: string[] = ['TY  - ELEC'];
  const add = (tag: string, v: unknown) => {
    const s = one(v);
    if (s) lines.push(`${tag}  - ${s}`);
  };
  for (const a of (item.author as { family?: string; given?: string; literal?: string }[] | undefined) ?? []) {
    add('AU', a.literal ?? [a.family, a.given].filter(Boolean).join(', '));
  }
  add('TI', item.title);
  add('PB', item.publisher ?? item['container-title']);
  const issued = partsOf(item.issued);
  if (issued.length) {
    add('PY', issued[0]);
    add('DA', `${[String(issued[0]), ...issued.slice(1, 3).map(pad2)].join('/')}/`);
  }
  if (item.version !== undefined) add('ET', `Version ${one(item.version)}`);
  add('UR', item.URL);
  const accessed = partsOf(item.accessed);
  if (accessed.length) add('Y2', `${[String(accessed[0]), ...accessed.slice(1, 3).map(pad2)].join('/')}/`);
  add('N1', item.note);
  add('ID', item.id);
  lines.push('ER  - ');
  return `${lines.join('\n')}\n`;
}
