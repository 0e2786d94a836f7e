/**
 * Limits on nesting, so that deeply nested input is a 400 naming the field instead of a stack
 * overflow in a recursive parser or renderer, or a refusal by MariaDB (its JSON columns take at most
 * 32 levels). Real requests nest far less: an entry draft's deepest field (a citation's
 * `issued.date-parts`) is 8 levels into the body.
 */
import type { RequestHandler } from 'express';
import { fieldsError } from './errors';

/** Levels of arrays and objects a JSON body may nest. */
export const MAX_BODY_DEPTH = 20;
/** Levels of brackets and braces in pasted citation text (CSL-JSON, BibTeX). */
export const MAX_TEXT_NESTING = 32;
/** Levels of Markdown containers (block quotes, lists) on one line. */
export const MAX_MARKDOWN_NESTING = 16;

/** The path (at most `show` keys) to the first place where `value` nests deeper than `max`, or null. */
export function tooDeep(value: unknown, max: number, show = 5): string[] | null {
  const stack: { v: unknown; depth: number; path: string[] }[] = [{ v: value, depth: 0, path: [] }];
  while (stack.length) {
    const { v, depth, path } = stack.pop()!;
    if (v === null || typeof v !== 'object') continue;
    if (depth >= max) return path.slice(0, show);
    for (const [k, child] of Object.entries(v)) {
      if (child !== null && typeof child === 'object') stack.push({ v: child, depth: depth + 1, path: path.length < show ? [...path, k] : path });
    }
  }
  return null;
}

/** Refuses a JSON body nested deeper than `max` levels: 400 naming the field where it happens. */
export function bodyDepthLimit(max = MAX_BODY_DEPTH): RequestHandler {
  return (req, _res, next) => {
    const path = tooDeep(req.body, max);
    if (!path) return next();
    next(fieldsError('too_deep', { [['body', ...path].join('.')]: `nested more than ${max} levels deep` }));
  };
}

/** The deepest nesting of brackets and braces in `text`, outside double-quoted strings. */
export function bracketDepth(text: string): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (inString) {
      if (c === '\\') i++;
      else if (c === '"') inString = false;
    } else if (c === '"') inString = true;
    else if (c === '{' || c === '[') deepest = Math.max(deepest, ++depth);
    else if ((c === '}' || c === ']') && depth > 0) depth--;
  }
  return deepest;
}

/**
 * The most Markdown containers opened at the start of one line: block-quote markers and list
 * markers ("> > - 1. x" is four). Lists nested by indentation need two or more spaces a level, which
 * the fields' length limits keep shallow.
 */
export function markdownNesting(text: string): number {
  let deepest = 0;
  for (const line of text.split('\n')) {
    const m = /^(?:[ \t]*(?:>|[-*+](?=[ \t])|\d{1,9}[.)](?=[ \t])))+/.exec(line);
    if (!m) continue;
    const n = (m[0].match(/>|[-*+]|\d{1,9}[.)]/g) ?? []).length;
    deepest = Math.max(deepest, n);
  }
  return deepest;
}
