/**
 * Request validation. Each route declares what it takes with `validated({ params, query, body })`
 * (the zod schemas live in the route folder's schema.ts); the middleware parses each part in that
 * order and stores the parsed values on `res.locals.valid`, typed for the handler that follows:
 *
 *   r.post('/drafts/:id/submit', allow('drafts.submit'), validated({ params: idParams, body: submitSchema }), async (req, res) => {
 *     const { params, body } = res.locals.valid;
 *
 * (Express 5 makes `req.query` a getter, so the parsed values never replace the request's own.)
 * A part that fails answers 400 `validation_failed` naming each field as `<part>.<path>`; with
 * `tooLarge: true`, a field over its size limit answers 413 `too_large` instead.
 */
import type { NextFunction, Request, Response } from 'express';
import type { core, ZodType } from 'zod';
import { HttpError, validationError } from './errors';

type Where = 'body' | 'query' | 'params';

/** Parses `data` with `schema`, or throws a 400 naming each offending field under `where`. */
export function validate<T>(schema: ZodType<T>, data: unknown, where: Where, error?: core.$ZodErrorMap): T {
  const parsed = schema.safeParse(data, error && { error });
  if (!parsed.success) throw validationError(where, parsed.error);
  return parsed.data;
}

/**
 * Like validate(), but a field over its size limit answers 413 (too_large) naming the field; any
 * other problem 400 naming each field.
 */
export function validateSized<T>(schema: ZodType<T>, data: unknown, where: Where, error?: core.$ZodErrorMap): T {
  const parsed = schema.safeParse(data, error && { error });
  if (parsed.success) return parsed.data;
  const big = parsed.error.issues.filter((i) => i.code === 'too_big');
  if (big.length) {
    const fields: Record<string, string> = {};
    for (const i of big) fields[[where, ...i.path.map(String)].join('.')] ??= i.message;
    const names = Object.keys(fields);
    throw new HttpError(413, 'too_large', `Too large: ${names.join(', ')} (${fields[names[0]]}).`, fields);
  }
  throw validationError(where, parsed.error);
}

export interface Schemas<P = unknown, Q = unknown, B = unknown> {
  params?: ZodType<P>;
  query?: ZodType<Q>;
  body?: ZodType<B>;
  /** A body field over its size limit answers 413 too_large (drafts, citations, retiring). */
  tooLarge?: boolean;
  /** Words for the checks that carry no message of their own (e.g. `ourWords` of shared/schemas/drafts.ts). */
  error?: core.$ZodErrorMap;
}

type Out<S, K extends 'params' | 'query' | 'body'> = S extends { [k in K]: ZodType<infer T> } ? T : undefined;

/** What `validated(schemas)` leaves on `res.locals.valid`. */
export interface Valid<S> {
  params: Out<S, 'params'>;
  query: Out<S, 'query'>;
  body: Out<S, 'body'>;
}

/** The middleware `validated()` returns; it carries its schemas (e.g. for the OpenAPI document). */
// `Request<any>`: so that the route's own handler still gets its path parameters typed from the path.
export type ValidatedMiddleware<S> = ((
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  req: Request<any>,
  res: Response<unknown, { valid: Valid<S> }>,
  next: NextFunction,
) => void) & { schemas: S };

/** Parses params, query and body (those given), in that order, into `res.locals.valid`. */
export function validated<const S extends Schemas>(schemas: S): ValidatedMiddleware<S> {
  const middleware = (req: Request, res: Response, next: NextFunction) => {
    try {
      const valid = {
        params: schemas.params ? validate(schemas.params, req.params, 'params', schemas.error) : undefined,
        query: schemas.query ? validate(schemas.query, req.query, 'query', schemas.error) : undefined,
        body: schemas.body ? (schemas.tooLarge ? validateSized : validate)(schemas.body, req.body ?? {}, 'body', schemas.error) : undefined,
      };
      res.locals.valid = valid;
      next();
    } catch (err) {
      next(err);
    }
  };
  return Object.assign(middleware, { schemas }) as unknown as ValidatedMiddleware<S>;
}
