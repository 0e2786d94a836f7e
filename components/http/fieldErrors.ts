/**
 * The one way a form reads the server's field errors. A 400 (or 409, 413) names each field it
 * refuses in the ApiError's `fields`, keyed by the field's path in the request (`body.title`,
 * `body.figures.0.quantity`); a form shows each message beside the field of that name.
 */
import { ApiError } from './client';

/** The server's field messages of a failed request, keyed as sent (`body.title`, `files.0`); empty for any other error or none. */
export function serverFieldErrors(error: unknown): Record<string, string> {
  return error instanceof ApiError ? (error.fields ?? {}) : {};
}

/**
 * Splits field messages (keyed `body.<field>` or `<field>`) into those a form shows beside one of its fields
 * and the rest (`leftover`), which it shows with the form as a whole.
 */
export function placeFieldErrors<K extends string>(names: readonly K[], messages: Record<string, string>) {
  const fields: Partial<Record<K, string>> = {};
  const leftover: string[] = [];
  for (const [key, message] of Object.entries(messages)) {
    const name = key.replace(/^body\./, '');
    if ((names as readonly string[]).includes(name)) fields[name as K] ??= message;
    else leftover.push(message);
  }
  return { fields, leftover };
}

const ORDINALS = ['first', 'second', 'third', 'fourth', 'fifth', 'sixth', 'seventh', 'eighth', 'ninth', 'tenth', 'eleventh', 'twelfth'];

/** 0 → "first", 2 → "third"; past the twelfth, "number 13". */
export function ordinalWord(index: number): string {
  return ORDINALS[index] ?? `number ${index + 1}`;
}

/** What the request's fields are called in any form (a form passes its own to add or override). */
const FIELD_WORDS: Readonly<Record<string, string>> = {
  title: 'the title',
  summary: 'the summary',
  seenAtUrl: 'the address where it was seen',
  seenAtCitation: 'the citation',
  figures: 'the figures',
  files: 'the files',
  entries: 'the entries',
  email: 'the e-mail address',
  displayName: 'the display name',
  password: 'the password',
  currentPassword: 'the current password',
  newPassword: 'the new password',
  role: 'the role',
  note: 'the note',
  reason: 'the reason',
  editorId: 'the editor',
  slug: 'the web address name',
  decision: 'the decision',
  mechanismClass: 'the mechanism class',
  terms: 'the terms',
  text: 'the text',
  q: 'the search',
  limit: 'the page size',
  offset: 'the page',
  inputs: 'the figures',
};

/** The singular of a list field, for "the third file", "the first figure". */
const ITEM_WORDS: Readonly<Record<string, string>> = { files: 'file', figures: 'figure', entries: 'entry', terms: 'term', sources: 'source', inputs: 'figure' };

const camelWords = (name: string) => name.replace(/([a-z])([A-Z])/g, '$1 $2').replace(/_/g, ' ').toLowerCase();

/**
 * A field's path as words a reader knows: `files.2` → "the third file", `body.figures.0.value` →
 * "the first figure's value", `inputs.P_in` → the input's label (from `labels`, e.g. "the input
 * power"), `body.seenAtUrl` → "the address where it was seen". Never the raw path: an unknown name is
 * written out in plain words ("the other names").
 */
export function fieldWords(path: string, labels: Readonly<Record<string, string>> = {}): string {
  const parts = path.replace(/^(body|query|params|files(?=\.|$))\.?/, (m, part: string) => (part === 'files' ? 'files.' : '')).split('.').filter(Boolean);
  if (parts.length === 0) return 'the request';
  const [head, ...rest] = parts;
  const named = (name: string) => labels[name] ?? FIELD_WORDS[name] ?? `the ${camelWords(name)}`;
  if (rest.length === 0) return named(head);
  if (/^\d+$/.test(rest[0])) {
    const item = `the ${ordinalWord(Number(rest[0]))} ${ITEM_WORDS[head] ?? camelWords(head).replace(/s$/, '')}`;
    if (rest.length === 1) return item;
    return `${item}'s ${rest.slice(1).map(camelWords).join(' ')}`;
  }
  // A named member: an input or a section by its label when the form knows it.
  const member = rest.join('.');
  if (labels[member]) return labels[member];
  if (head === 'inputs') return `the figure ${member}`;
  return `${named(head).replace(/^the /, 'the ')} ${rest.map(camelWords).join(' ')}`;
}

/** Field paths written inside a message ("Check body.entries: …", "files.2: the file is empty") put into words. */
const PATH_IN_TEXT = /(?<![\w/.:@-])(?:(?:body|query|params)\.[A-Za-z_]\w*(?:\.\w+)*|(?:files|figures)\.\d+(?:\.[A-Za-z_]\w*)*|inputs\.[A-Za-z_]\w*)(?![\w/@-]|\.\w)/g;

export function messageWords(message: string, labels: Readonly<Record<string, string>> = {}): string {
  return message.replace(PATH_IN_TEXT, (path) => fieldWords(path, labels));
}
