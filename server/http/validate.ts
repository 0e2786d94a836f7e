import type { ZodType } from 'zod';
import { validationError } from './errors';

/** Parses `data` with `schema`, or throws a 400 naming each offending field under `where`. */
export function validate<T>(schema: ZodType<T>, data: unknown, where: 'body' | 'query' | 'params'): T {
  const parsed = schema.safeParse(data);
  if (!parsed.success) throw validationError(where, parsed.error);
  return parsed.data;
}
