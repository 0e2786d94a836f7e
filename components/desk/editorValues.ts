/**
 * The editor's working copy of a draft: the entry's content, with the fields typed as text where
 * an editor writes them as text (other names and related entries one a line); worksheets are kept in
 * the content's own shape, as the worksheet form edits them.
 * `readValues` turns it into content checked by the same schema the server uses.
 */
import { entryContentSchema, IN_BRIEF_MAX_WORDS, slugSchema, wordCount, type Citation, type EntryContent } from '@/shared/entries/schema';
import { fieldSentence, ourWords } from '@/shared/schemas/drafts';
import { worksheetSchema, type Worksheet } from '@/shared/worksheet/schema';

export interface EditorValues {
  slug: string;
  title: string;
  aliases: string;
  mechanismClass: string;
  laws: string[];
  inBrief: string;
  howItIsPitched: string;
  whyItFails: string;
  /** As typed in the worksheet form: the saved shape, not yet checked. */
  worksheets: Worksheet[];
  whatFakesTheEffect: string;
  repliesAndAnswers: { reply: string; answer: string }[];
  questionsToAsk: string[];
  cautions: string;
  related: string;
  sources: Citation[];
}

export type EditorField = keyof EditorValues;

const lines = (text: string) =>
  text
    .split('\n')
    .map((line) => line.trim())
    .filter(Boolean);

export function editorValues(slug: string, content?: EntryContent): EditorValues {
  return {
    slug,
    title: content?.title ?? '',
    aliases: content?.aliases.join('\n') ?? '',
    mechanismClass: content?.mechanismClass ?? '',
    laws: content?.laws ?? [],
    inBrief: content?.inBrief ?? '',
    howItIsPitched: content?.howItIsPitched ?? '',
    whyItFails: content?.whyItFails ?? '',
    worksheets: content?.worksheets ?? [],
    whatFakesTheEffect: content?.whatFakesTheEffect ?? '',
    repliesAndAnswers: content?.repliesAndAnswers ?? [],
    questionsToAsk: content?.questionsToAsk ?? [],
    cautions: content?.cautions ?? '',
    related: content?.related.join('\n') ?? '',
    sources: content?.sources ?? [],
  };
}

export interface WorksheetsReading {
  worksheets?: EntryContent['worksheets'];
  /** What is wrong, as a sentence naming where: "Run the numbers, number 1, steps: add at least one." */
  error?: string;
}

/** A problem as the editor shows it: a sentence that starts with a capital and ends with a stop. */
export const asSentence = (message: string) => {
  const text = message.trim().replace(/[.]$/, '');
  return `${text.charAt(0).toUpperCase()}${text.slice(1)}.`;
};

/** The worksheets as the form holds them, each checked by worksheetSchema (in our words, not zod's). */
export function readWorksheets(sheets: Worksheet[]): WorksheetsReading {
  const result = worksheetSchema.array().max(6, 'at most 6 worksheets').safeParse(sheets, { error: ourWords });
  if (!result.success) {
    const issue = result.error.issues[0];
    return { error: fieldSentence(['worksheets', ...issue.path], issue.message) };
  }
  return { worksheets: result.data };
}

export interface Reading {
  /** The content, when every field passes. */
  content?: EntryContent;
  /** What is wrong, by field, as sentences in our words ("Give the title at least 3 characters."). */
  problems: Partial<Record<EditorField, string>>;
}

export function readValues(values: EditorValues): Reading {
  const problems: Partial<Record<EditorField, string>> = {};
  const slug = slugSchema.safeParse(values.slug);
  if (!slug.success) problems.slug = asSentence(values.slug ? slug.error.issues[0].message : 'choose the address, e.g. photon-box-drive');
  const sheets = readWorksheets(values.worksheets);
  if (sheets.error) problems.worksheets = sheets.error;
  const words = wordCount(values.inBrief);
  if (words > IN_BRIEF_MAX_WORDS) problems.inBrief = `${words} words: keep the brief to ${IN_BRIEF_MAX_WORDS} words at most.`;

  const result = entryContentSchema.safeParse({
    title: values.title,
    aliases: lines(values.aliases),
    mechanismClass: values.mechanismClass,
    laws: values.laws,
    inBrief: values.inBrief,
    howItIsPitched: values.howItIsPitched,
    whyItFails: values.whyItFails,
    worksheets: sheets.worksheets ?? [],
    whatFakesTheEffect: values.whatFakesTheEffect,
    repliesAndAnswers: values.repliesAndAnswers,
    questionsToAsk: values.questionsToAsk.map((q) => q.trim()),
    cautions: values.cautions,
    related: lines(values.related),
    sources: values.sources,
  }, { error: ourWords });
  if (!result.success) {
    for (const issue of result.error.issues) {
      const field = issue.path[0] as EditorField;
      // Nested: "Number 2: write the question, or remove it." (the field's own label is beside it).
      problems[field] ??= issue.path.length > 1 ? fieldSentence(issue.path.slice(1), issue.message) : asSentence(issue.message);
    }
  }
  return Object.keys(problems).length === 0 && result.success ? { content: result.data, problems } : { problems };
}

/** The content as typed, without checks, for the live preview: whatever can be shown is shown. */
export function previewContent(values: EditorValues): EntryContent {
  return {
    title: values.title,
    aliases: lines(values.aliases),
    mechanismClass: values.mechanismClass,
    laws: values.laws,
    inBrief: values.inBrief,
    howItIsPitched: values.howItIsPitched,
    whyItFails: values.whyItFails,
    worksheets: values.worksheets.flatMap((ws) => {
      const one = worksheetSchema.safeParse(ws);
      return one.success ? [one.data] : [];
    }),
    whatFakesTheEffect: values.whatFakesTheEffect,
    repliesAndAnswers: values.repliesAndAnswers.filter((r) => r.reply.trim() || r.answer.trim()),
    questionsToAsk: values.questionsToAsk.filter((q) => q.trim()),
    cautions: values.cautions,
    related: lines(values.related),
    sources: values.sources,
  };
}
