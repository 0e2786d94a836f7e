/**
 * Constants of the API contract, declared once for the server and the app: the citation formats
 * and styles, and the sections of an entry with their titles and reading order (DESIGN.md §3).
 * Free of runtime dependencies: imported on both sides.
 */

/** The text styles citation-js renders (shared/entries/citations.ts). */
export const CITATION_STYLES = ['apa', 'vancouver', 'harvard'] as const;
export type CitationStyle = (typeof CITATION_STYLES)[number];
export const CITATION_STYLE_LABEL: Record<CitationStyle, string> = { apa: 'APA', vancouver: 'Vancouver', harvard: 'Harvard' };

/** The data formats a version is cited in: files for a reference manager rather than prose. */
export const CITE_DATA_FORMATS = ['bibtex', 'ris', 'csl-json'] as const;
/** What `GET /api/entries/:slug/cite?format=` accepts: the text styles and the data formats. */
export const CITE_FORMATS = [...CITATION_STYLES, ...CITE_DATA_FORMATS] as const;
export type CiteFormat = (typeof CITE_FORMATS)[number];
export const CITE_FORMAT_LABEL: Record<CiteFormat, string> = { ...CITATION_STYLE_LABEL, bibtex: 'BibTeX', ris: 'RIS', 'csl-json': 'CSL-JSON' };
export type CiteDataFormat = (typeof CITE_DATA_FORMATS)[number];
/**
 * The media types `GET /api/entries/:slug/cite` answers a data format with when `Accept` asks for
 * one (the first is the one it sends): BibTeX's customary types, RIS's, and CSL-JSON's registered
 * type (IANA media types, "application/vnd.citationstyles.csl+json").
 */
export const CITE_MEDIA_TYPES: Record<CiteDataFormat, readonly string[]> = {
  bibtex: ['application/x-bibtex', 'text/x-bibtex'],
  ris: ['application/x-research-info-systems'],
  'csl-json': ['application/vnd.citationstyles.csl+json'],
};
/** The file name extension of a downloaded data format: `<slug>-v<n>.<ext>`. */
export const CITE_FILE_EXTENSION: Record<CiteDataFormat, string> = { bibtex: 'bib', ris: 'ris', 'csl-json': 'json' };

/** The sections of an entry version in reading order: the entry page, the diff and the editor go by it. */
export const SECTION_ORDER = [
  'inBrief',
  'howItIsPitched',
  'whyItFails',
  'worksheets',
  'whatFakesTheEffect',
  'repliesAndAnswers',
  'questionsToAsk',
  'cautions',
  'sources',
  'related',
] as const;
export type SectionField = (typeof SECTION_ORDER)[number];

/**
 * The titles readers see. The Markdown sections' titles are also the level-2 headings of a starter
 * file's body (shared/entries/schema.ts BODY_SECTIONS).
 */
export const SECTION_TITLES: Record<SectionField, string> = {
  inBrief: 'In brief',
  howItIsPitched: 'How it is pitched',
  whyItFails: 'Why it fails',
  worksheets: 'Run the numbers',
  whatFakesTheEffect: 'Artifacts that can look like the effect',
  repliesAndAnswers: 'Counterpoints, answered',
  questionsToAsk: 'Questions to ask the claimant',
  cautions: 'Cautions',
  sources: 'Sources',
  related: 'Related entries',
};

/** Sections of an entry version a correction may concern (the keys of EntryContent, plus "other"). */
export const CORRECTION_SECTIONS = [
  'title',
  'inBrief',
  'howItIsPitched',
  'whyItFails',
  'worksheets',
  'whatFakesTheEffect',
  'repliesAndAnswers',
  'questionsToAsk',
  'cautions',
  'sources',
  'other',
] as const;
export type CorrectionSection = (typeof CORRECTION_SECTIONS)[number];

/** A correction's section as a label on a form or a detail page. */
export const CORRECTION_SECTION_LABEL: Record<CorrectionSection, string> = {
  title: 'Title',
  inBrief: SECTION_TITLES.inBrief,
  howItIsPitched: SECTION_TITLES.howItIsPitched,
  whyItFails: SECTION_TITLES.whyItFails,
  worksheets: `${SECTION_TITLES.worksheets} (worksheets)`,
  whatFakesTheEffect: SECTION_TITLES.whatFakesTheEffect,
  repliesAndAnswers: SECTION_TITLES.repliesAndAnswers,
  questionsToAsk: 'Questions to ask',
  cautions: SECTION_TITLES.cautions,
  sources: SECTION_TITLES.sources,
  other: 'Something else',
};

/** A correction's section within a sentence (a submission's title, an editor's e-mail). */
export const CORRECTION_SECTION_WORDS: Record<CorrectionSection, string> = {
  title: 'title',
  inBrief: SECTION_TITLES.inBrief.toLowerCase(),
  howItIsPitched: SECTION_TITLES.howItIsPitched.toLowerCase(),
  whyItFails: SECTION_TITLES.whyItFails.toLowerCase(),
  worksheets: SECTION_TITLES.worksheets.toLowerCase(),
  whatFakesTheEffect: SECTION_TITLES.whatFakesTheEffect.toLowerCase(),
  repliesAndAnswers: SECTION_TITLES.repliesAndAnswers.toLowerCase(),
  questionsToAsk: 'questions to ask',
  cautions: SECTION_TITLES.cautions.toLowerCase(),
  sources: SECTION_TITLES.sources.toLowerCase(),
  other: 'other',
};
