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
