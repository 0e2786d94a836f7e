/**
 * The sighting form's rules, checked in the browser before anything is sent (the server checks
 * the same, and its answer is shown beside the same fields): the lengths of the texts, where the
 * claim was seen, each figure read with parseQuantity for its kind, and the attachments.
 */
import { readQuantityOf, type FigureReading } from '@/shared/claims/figures';
import { FIGURE_KINDS, type FigureKind } from '@/shared/claims/types';
import { ATTACHMENT_MAX_BYTES, ATTACHMENT_TYPES, ATTACHMENTS_MAX } from '@/shared/submissions/types';
import type { PickedFile } from '../queries/submissions';
import { bytesWords } from './words';

export interface FigureRow {
  key: string;
  kind: FigureKind;
  quantity: string;
  label: string;
  /** The reader picked the kind: it no longer follows what is typed. */
  kindPicked?: boolean;
}

export interface SightingValues {
  title: string;
  seenAtUrl: string;
  seenAtCitation: string;
  summary: string;
  figures: FigureRow[];
  files: PickedFile[];
}

export type Reading = FigureReading;

/** The typed figure in its kind's SI unit, or what is wrong with it. */
export const readFigure = readQuantityOf;

/**
 * The kinds of figure a typed quantity can be, from its unit's dimension ("12 N" → thrust; "300 s"
 * → duration or specific impulse); none for a bare number or text that is not a quantity yet, so
 * that typing "3" on the way to "3 kW" changes nothing.
 */
export function kindsFor(quantity: string): FigureKind[] {
  const text = quantity.trim();
  if (!/\d/.test(text) || !/[A-Za-z°%µΩ]/.test(text.replace(/\d[eE][+-]?\d/g, ''))) return [];
  return FIGURE_KINDS.filter((kind) => readFigure(kind, text).ok);
}

/**
 * A row after its quantity was typed: while the reader has not picked a kind, the kind follows the
 * unit (the current kind stays when it still fits, so an ambiguous unit does not flip it).
 */
export function withQuantity(row: FigureRow, quantity: string): FigureRow {
  if (row.kindPicked) return { ...row, quantity };
  const kinds = kindsFor(quantity);
  const kind = kinds.length === 0 || kinds.includes(row.kind) ? row.kind : kinds[0];
  return { ...row, quantity, kind };
}

const TYPE_WORDS: Record<string, string> = {
  'application/pdf': 'PDF',
  'image/png': 'PNG',
  'image/jpeg': 'JPEG',
  'image/webp': 'WebP',
};
export const ALLOWED_WORDS = 'PDF, PNG, JPEG or WebP';

/** What is wrong with one picked file, before it is sent; undefined when nothing is. */
export function fileProblem(file: PickedFile): string | undefined {
  if (file.size > ATTACHMENT_MAX_BYTES) {
    return `This file is ${bytesWords(file.size)}; each file may be at most ${bytesWords(ATTACHMENT_MAX_BYTES)}. Remove it, or send a smaller copy.`;
  }
  if (file.mediaType && !(ATTACHMENT_TYPES as readonly string[]).includes(file.mediaType)) {
    return `This looks like a ${file.mediaType} file; attachments are ${ALLOWED_WORDS} only.`;
  }
  return undefined;
}

export function filesProblem(files: readonly PickedFile[]): string | undefined {
  if (files.length > ATTACHMENTS_MAX) {
    const extra = files.length - ATTACHMENTS_MAX;
    return `${files.length} files are picked; at most ${ATTACHMENTS_MAX} go with one sighting. Remove ${extra === 1 ? 'one' : extra}.`;
  }
  return undefined;
}

export function mediaTypeWords(mediaType: string | undefined): string {
  return (mediaType && TYPE_WORDS[mediaType]) || 'file';
}

function isWebAddress(text: string): boolean {
  if (/\s/.test(text)) return false;
  try {
    const url = new URL(text);
    return (url.protocol === 'http:' || url.protocol === 'https:') && url.hostname !== '';
  } catch {
    return false;
  }
}

/** The form's own objections, keyed like the server's fields (body.title, body.figures.<row key>, files.<i>). */
export function checkSighting(v: SightingValues): Record<string, string> {
  const errors: Record<string, string> = {};
  const title = v.title.trim();
  if (title.length < 3) errors['body.title'] = 'Give the sighting a title of at least 3 characters.';
  else if (title.length > 200) errors['body.title'] = `The title is ${title.length} characters; keep it to 200.`;
  const url = v.seenAtUrl.trim();
  const citation = v.seenAtCitation.trim();
  if (!url && !citation) errors['body.seenAtUrl'] = 'Say where it was seen: a web address, a citation, or both.';
  if (url && !isWebAddress(url)) {
    errors['body.seenAtUrl'] = 'A web address starts with http:// or https:// and has no spaces.';
  }
  if (citation.length > 1000) errors['body.seenAtCitation'] = `The citation is ${citation.length} characters; keep it to 1000.`;
  const summary = v.summary.trim();
  if (summary.length < 10) errors['body.summary'] = 'Say in a sentence or two what is claimed (at least 10 characters).';
  else if (summary.length > 5000) errors['body.summary'] = `The summary is ${summary.length} characters; keep it to 5000.`;
  for (const row of v.figures) {
    if (!row.quantity.trim()) errors[`figure.${row.key}`] = 'Type the figure with its unit, or remove this row.';
    else {
      const reading = readFigure(row.kind, row.quantity);
      if (!reading.ok) errors[`figure.${row.key}`] = reading.message;
    }
  }
  v.files.forEach((file, i) => {
    const problem = fileProblem(file);
    if (problem) errors[`files.${i}`] = problem;
  });
  const many = filesProblem(v.files);
  if (many) errors.files = many;
  return errors;
}
