/**
 * The first paint, before any script runs. The web app is one page that routes on the client; the
 * page template (public/index.html) holds, beside the app's empty #root, a static shell (#cw-shell):
 * the frame and a skeleton of the page, in the app's column, fonts and colours. For an entry page
 * (`/entries/<slug>`, `/entries/<slug>/v/<n>`) and the Library (`/`) the server fills the shell with
 * the page's real content: the entry's title, version and sections rendered by the project's one
 * Markdown pipeline (shared/markdown.ts: sanitised, KaTeX set on the server), the Library's latest
 * published entries. The app hides the shell as soon as its own page is there (CSS in the template).
 *
 * One read of the database per page; rendered versions are kept (they never change) and the
 * Library's list for a few seconds. On any miss or failure the plain template goes out, as for
 * every other route (it still shows the frame's skeleton, never a blank page).
 * Tests: tests/server/page-shell.test.ts, tests/browser/first-paint.test.ts, and the link previews
 * of tests/server/citations.test.ts.
 */
import fs from 'node:fs';
import type { Request, Response } from 'express';
import { SECTION_ORDER, SECTION_TITLES, type SectionField } from '../../shared/api/constants';
import type { EntryHtml } from '../../shared/api-types';
import type { EntryContent } from '../../shared/entries/schema';
import { renderMarkdown } from '../../shared/markdown';
import { entryVersionPath } from '../../shared/permalink';
import { Entry, EntryVersion, User } from '../models';
import { renderHtml } from '../services/render';
import { escapeHtml as esc, plainSummary, withPageMeta } from './page-meta';

const SITE_NAME = 'Counterweight';
const PAGE_START = '<!-- cw-page:start -->';
const PAGE_END = '<!-- cw-page:end -->';
/** How many of the latest entries the Library's first paint lists (the app shows 20 at first). */
const LIBRARY_SIZE = 20;
/** The Library's first paint is reused for this long (a new entry shows in it at most this late). */
const LIBRARY_TTL_MS = 5000;
/** The Library's lead (components/screens/LibraryScreen.tsx, LEAD). */
const LIBRARY_LEAD = 'The standard objections to impossible-machine claims: each written once, checked by a second expert, versioned and citable.';
/** The titles of the two halves of a counterpoint (components/entry/sections.ts, replyLabels). */
const REPLY_LABELS = { reply: 'Counterpoint', answer: 'Why it does not hold' } as const;

/** The template with the shell's page content (between the cw-page markers) replaced; `two` widens the column for a second one. */
export function withShellPage(html: string, body: string, two = false): string {
  const a = html.indexOf(PAGE_START);
  const b = html.indexOf(PAGE_END);
  if (a < 0 || b < a) return html;
  const filled = `${html.slice(0, a)}${PAGE_START}\n${body}\n${html.slice(b)}`;
  return two ? filled.replace('<main class="cw-main">', () => '<main class="cw-main cw-two">') : filled;
}

/** "4 May 2026", in English and UTC (the app writes the reader's locale once it runs). */
function day(d: Date | null | undefined): string {
  return d ? d.toLocaleDateString('en-GB', { dateStyle: 'long', timeZone: 'UTC' }) : '';
}

const md = (html: string, compact = false) => `<div class="cw-prose${compact ? ' compact' : ''}">${html}</div>`;

/** Which sections a version has something in, in reading order (as the app's presentSections). */
function presentSections(c: EntryContent): SectionField[] {
  const has: Record<SectionField, boolean> = {
    inBrief: true,
    howItIsPitched: true,
    whyItFails: true,
    worksheets: c.worksheets.length > 0,
    whatFakesTheEffect: c.whatFakesTheEffect.trim() !== '',
    repliesAndAnswers: c.repliesAndAnswers.length > 0,
    questionsToAsk: c.questionsToAsk.length > 0,
    cautions: c.cautions.trim() !== '',
    sources: true,
    related: c.related.length > 0,
  };
  return SECTION_ORDER.filter((f) => has[f]);
}

/** A source in one line: authors, year, title, and the editor's note (as the app's citationLine). */
function sourceLine({ csl, note }: EntryContent['sources'][number]): string {
  const authors = Array.isArray(csl.author)
    ? (csl.author as { family?: string; literal?: string }[]).map((a) => a.family ?? a.literal ?? '').filter(Boolean).join(', ')
    : '';
  const issued = (csl.issued as { 'date-parts'?: number[][] } | undefined)?.['date-parts']?.[0]?.[0];
  const head = [authors, issued ? `(${issued})` : '', typeof csl.title === 'string' ? csl.title : ''].filter(Boolean).join(' ');
  return note ? `${head} — ${note}` : head;
}

interface ShownVersion {
  number: number;
  publishedAt: Date | null;
  author: string;
  reviewer: string | null;
  content: EntryContent;
  html: EntryHtml;
}

/** An entry's page: its heading, which version, and its sections in the reading layout of components/entry. */
export function entryPageHtml(slug: string, v: ShownVersion, pinned: boolean, retired: string | null = null): string {
  const { content: c, html } = v;
  const section = (field: SectionField, inner: string) =>
    `<section class="cw-section" id="section-${field}"><h2 class="cw-title">${esc(SECTION_TITLES[field])}</h2>${inner}</section>`;
  const body: Record<SectionField, () => string> = {
    inBrief: () => md(html.inBrief),
    howItIsPitched: () => md(html.howItIsPitched),
    whyItFails: () => md(html.whyItFails),
    worksheets: () => `<ul class="cw-list">${c.worksheets.map((w) => `<li class="cw-lead">${esc(w.title)}</li>`).join('')}</ul>`,
    whatFakesTheEffect: () => md(html.whatFakesTheEffect),
    repliesAndAnswers: () =>
      html.replies
        .map(
          (r) =>
            `<div class="cw-reply"><h3>${REPLY_LABELS.reply}</h3>${md(r.reply, true)}<h3 class="cw-answer">${REPLY_LABELS.answer}</h3>${md(r.answer, true)}</div>`,
        )
        .join(''),
    questionsToAsk: () => `<ol class="cw-list cw-lead">${c.questionsToAsk.map((q, i) => `<li>${i + 1}. ${esc(q)}</li>`).join('')}</ol>`,
    cautions: () => `<div class="cw-note"><p class="cw-strong">Where this work can hurt someone</p>${md(html.cautions, true)}</div>`,
    sources: () => `<ol class="cw-list">${c.sources.map((s) => `<li class="cw-prose compact">${esc(sourceLine(s))}</li>`).join('')}</ol>`,
    related: () => `<ul class="cw-list">${c.related.map((s) => `<li><a class="cw-link" href="/entries/${esc(s)}">${esc(s.replace(/-/g, ' '))}</a></li>`).join('')}</ul>`,
  };
  const fields = presentSections(c);
  const credit = `Version ${v.number}, published ${esc(day(v.publishedAt))} · written by ${esc(v.author)}${v.reviewer ? `, vetted by ${esc(v.reviewer)}` : ''}`;
  const link = pinned
    ? `<a class="cw-link" href="/entries/${esc(slug)}">Read the latest version</a>`
    : `<a class="cw-link" href="${esc(entryVersionPath(slug, v.number))}">Permalink to version ${v.number}</a>`;
  const toc = `<nav class="cw-aside" aria-label="On this page"><ul class="cw-toc">${fields
    .map((f) => `<li><a href="#section-${f}">${esc(SECTION_TITLES[f])}</a></li>`)
    .join('')}</ul></nav>`;
  return [
    '<article class="cw-screen">',
    `<h1 class="cw-display">${esc(c.title)}</h1>`,
    '<div class="cw-meta">',
    c.aliases.length ? `<p class="cw-caption">Also pitched as ${esc(c.aliases.join(', '))}</p>` : '',
    `<p class="cw-caption">${credit}</p>`,
    `<div>${link}</div>`,
    '</div>',
    retired === null ? '' : `<div class="cw-note"><p class="cw-strong">This entry is retired.</p><p>${esc(retired)} It stays here, and citable, as it was.</p></div>`,
    '<div class="cw-columns">',
    `<div class="cw-text">${fields.map((f) => section(f, body[f]())).join('')}</div>`,
    toc,
    '</div>',
    '</article>',
  ].join('');
}

export interface LibraryRow {
  slug: string;
  title: string;
  /** The in-brief, rendered. */
  brief: string;
  version: number;
  publishedAt: Date | null;
}

/** The Library: its heading, a stand-in for the search field, and the latest published entries. */
export function libraryPageHtml(rows: LibraryRow[], total: number): string {
  const list = rows.length
    ? `<p class="cw-caption">${total === 1 ? '1 entry' : `${total} entries`} published, most recently revised first.</p><ul class="cw-entries">${rows
        .map(
          (r) =>
            `<li><a class="cw-link" href="/entries/${esc(r.slug)}">${esc(r.title)}</a>${md(r.brief, true)}<p class="cw-small">Version ${r.version}, ${esc(day(r.publishedAt))}</p></li>`,
        )
        .join('')}</ul>`
    : '<p class="cw-lead">No entries are published yet.</p>';
  return [
    '<div class="cw-screen">',
    '<h1 class="cw-display">Library</h1>',
    `<p class="cw-lead">${esc(LIBRARY_LEAD)}</p>`,
    '<div class="cw-field" aria-hidden="true"></div>',
    list,
    '</div>',
  ].join('');
}

/** index.html, read again only when the file changes (a rebuild of dist/ while the server runs). */
function templateReader(file: string): () => Promise<string> {
  let cached: { mtimeMs: number; html: string } | null = null;
  return async () => {
    const { mtimeMs } = await fs.promises.stat(file);
    if (!cached || cached.mtimeMs !== mtimeMs) cached = { mtimeMs, html: await fs.promises.readFile(file, 'utf8') };
    return cached.html;
  };
}

const ENTRY_PAGE = /^\/entries\/([a-z0-9][a-z0-9-]{0,79})(?:\/v\/([1-9]\d{0,6}))?\/?$/;
const PERSON = { model: User, attributes: ['displayName'] };

/**
 * Sends the page for `req` with its first paint filled in (an entry page with its title and
 * description in the head for link previews, as http/page-meta.ts did, and its text in the shell;
 * the Library with its latest entries); answers false (and sends nothing) otherwise, so the caller
 * sends the plain page.
 */
export function shellPageSender(indexFile: string, origin: (req: Request) => string): (req: Request, res: Response) => Promise<boolean> {
  const template = templateReader(indexFile);
  const htmlCache = new Map<number, EntryHtml>();
  const briefCache = new Map<number, string>();
  let library: { at: number; rows: LibraryRow[]; total: number } | null = null;

  const entryPage = async (req: Request, slug: string, n: string | undefined): Promise<string | null> => {
    const entry = await Entry.findOne({
      where: { slug },
      attributes: ['id', 'currentVersionId', 'status', 'retiredReason'],
      include: n
        ? []
        : [{ model: EntryVersion, as: 'currentVersion', include: [{ ...PERSON, as: 'author' }, { ...PERSON, as: 'reviewer' }] }],
    });
    if (!entry?.currentVersionId) return null;
    const version = n
      ? await EntryVersion.findOne({
          where: { entryId: entry.id, number: Number(n), state: 'published' },
          include: [{ ...PERSON, as: 'author' }, { ...PERSON, as: 'reviewer' }],
        })
      : entry.currentVersion;
    if (!version?.number) return null;
    const { title, inBrief } = version.content;
    const html = withPageMeta(await template(), {
      title: n ? `${title} (version ${version.number}) — ${SITE_NAME}` : `${title} — ${SITE_NAME}`,
      description: plainSummary(inBrief ?? '') || `${title}: an entry of ${SITE_NAME}.`,
      url: n ? `${origin(req)}${entryVersionPath(slug, version.number)}` : `${origin(req)}/entries/${slug}`,
    });
    const shown: ShownVersion = {
      number: version.number,
      publishedAt: version.publishedAt,
      author: version.author?.displayName ?? '',
      reviewer: version.reviewer?.displayName ?? null,
      content: version.content,
      html: renderHtml(htmlCache, version.id, version.content),
    };
    const retired = entry.status === 'retired' ? (entry.retiredReason ?? '') : null;
    return withShellPage(html, entryPageHtml(slug, shown, Boolean(n), retired), true);
  };

  const libraryPage = async (): Promise<string> => {
    if (!library || Date.now() - library.at > LIBRARY_TTL_MS) {
      const { rows, count } = await Entry.findAndCountAll({
        where: { status: 'published' },
        attributes: ['id', 'slug'],
        include: [{ model: EntryVersion, as: 'currentVersion', attributes: ['id', 'number', 'content', 'publishedAt'] }],
        order: [
          ['lastPublishedAt', 'DESC'],
          ['id', 'DESC'],
        ],
        limit: LIBRARY_SIZE,
        distinct: true,
      });
      const brief = (v: EntryVersion) => {
        let html = briefCache.get(v.id);
        if (html === undefined) {
          html = renderMarkdown(v.content.inBrief);
          if (briefCache.size >= 500) briefCache.delete(briefCache.keys().next().value!);
          briefCache.set(v.id, html);
        }
        return html;
      };
      library = {
        at: Date.now(),
        total: count,
        rows: rows
          .filter((e) => e.currentVersion?.number)
          .map((e) => ({
            slug: e.slug,
            title: e.currentVersion!.content.title,
            brief: brief(e.currentVersion!),
            version: e.currentVersion!.number!,
            publishedAt: e.currentVersion!.publishedAt,
          })),
      };
    }
    return withShellPage(await template(), libraryPageHtml(library.rows, library.total), true);
  };

  return async (req, res) => {
    try {
      const m = ENTRY_PAGE.exec(req.path);
      const html = m ? await entryPage(req, m[1], m[2]) : req.path === '/' ? await libraryPage() : null;
      if (html === null) return false;
      res.type('html').send(html);
      return true;
    } catch {
      return false;
    }
  };
}
