/**
 * The published library: `/api/entries` (list, one version, versions, cite, retire) and the
 * citation parser `/api/citations/parse`. Entry content is the shape of shared/entries/schema.ts.
 */
import type { Citation, EntryContent } from '../entries/schema';
import type { CiteFormat } from './constants';

/** A person as entries show them: author or reviewer of a version. */
export interface PersonDto {
  id: number;
  displayName: string;
}

/** The Markdown sections of a version, rendered and sanitised by the server with shared/markdown.ts. */
export interface EntryHtml {
  inBrief: string;
  howItIsPitched: string;
  whyItFails: string;
  whatFakesTheEffect: string;
  cautions: string;
  replies: { reply: string; answer: string }[];
}

/** One published version of an entry, as `GET /api/entries/:slug[/versions/:n]` sends it. */
export interface EntryVersionDto {
  number: number;
  changeNote: string;
  publishedAt: string;
  author: PersonDto;
  reviewer: PersonDto | null;
  content: EntryContent;
  html: EntryHtml;
}

export type EntryStatus = 'draft' | 'in_review' | 'published' | 'retired';

/** An entry's state beside the version being read; also what `POST /api/entries/:slug/retire` sends as `entry`. */
export interface EntryStateDto {
  slug: string;
  status: EntryStatus;
  title: string;
  /** The newest published version's number. */
  latestVersion: number;
  retired?: { reason: string; successor?: string };
}

/** One published entry as `GET /api/entries` lists it. */
export interface EntrySummaryDto {
  slug: string;
  title: string;
  version: number;
  publishedAt: string;
  laws: string[];
  /** The mechanism class's slug; null when the entry's class has been removed from the taxonomy. */
  mechanismClass: string | null;
  /** Markdown source of the brief. */
  inBrief: string;
  /** The brief as sanitised HTML (shared/markdown.ts), so that the list needs no Markdown renderer. */
  inBriefHtml: string;
}

/** The query of `GET /api/entries` (server: entryListQuerySchema). */
export interface EntryListQuery {
  /** A conservation-law slug. */
  law?: string;
  /** A mechanism-class slug: that class and every class below it. */
  mechanism?: string;
  /** 1–100, 20 when not given. */
  limit?: number;
  offset?: number;
}

/** `GET /api/entries` */
export interface EntryListResponse {
  entries: EntrySummaryDto[];
  total: number;
}

/** `GET /api/entries/:slug`, `GET /api/entries/:slug/versions/:n` and `POST /api/drafts/:id/approve`. */
export interface EntryResponse {
  entry: EntryStateDto;
  version: EntryVersionDto;
}

/** One published version as `GET /api/entries/:slug/versions` lists it, newest first. */
export interface VersionSummaryDto {
  number: number;
  changeNote: string;
  publishedAt: string;
  author: PersonDto;
  reviewer: PersonDto | null;
}

/** `GET /api/entries/:slug/versions` */
export interface VersionListResponse {
  versions: VersionSummaryDto[];
}

/**
 * The query of `GET /api/entries/:slug/cite`: a format (apa when not given, or the data format
 * `Accept` names) and a version (the latest when not given); `download` answers with the file itself.
 */
export interface CiteQuery {
  format?: CiteFormat;
  version?: number;
  download?: boolean;
}

/** `GET /api/entries/:slug/cite` */
export interface CiteResponse {
  format: CiteFormat;
  /** The citation as text (a text style) or as the data format's file. */
  text: string;
  /** For the text styles only: the same citation as HTML. */
  html?: string;
  /** The version's permalink (shared/permalink.ts). */
  url: string;
  version: number;
  /** The version's publication date, YYYY-MM-DD. */
  date: string;
  /** The version's authors as cited: every editor who wrote a published version up to it, in order of first contribution. */
  authors: string[];
  /** The editor who reviewed and published this version (credited apart from the authors). */
  reviewer: string | null;
  /** For the data formats: the file's name when downloaded (`<slug>-v<n>.bib`). */
  filename?: string;
}

/** `POST /api/entries/:slug/retire` */
export interface RetireBody {
  reason: string;
  /** A published entry that takes its place. */
  successor?: string;
}

/** `POST /api/entries/:slug/retire` */
export interface RetireResponse {
  entry: EntryStateDto;
}

/** `POST /api/citations/parse` */
export interface CitationParseBody {
  text: string;
}

/** An item of pasted text that could not be read. */
export interface CitationProblem {
  /** Position of the item in the pasted text (0-based, in the order the items appear). */
  index: number;
  /** The item's own text (cut to 500 characters). */
  input: string;
  reason: string;
}

/** `POST /api/citations/parse` (a 400 `citation_unparseable` carries `problems` too). */
export interface CitationParseResponse {
  items: Citation[];
  problems: CitationProblem[];
}
