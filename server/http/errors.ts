/**
 * One JSON error shape for every error the API sends:
 *   {"error":{"code":"…","message":"…","fields":{…}}}
 */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ZodError } from 'zod';
import type { ApiErrorBody } from '../../shared/api-types';

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    /** More top-level members of the answer beside `error` (e.g. the current draft on a 409 edit_conflict). */
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const body = (code: string, message: string, fields?: Record<string, string>): ApiErrorBody => ({
  error: fields ? { code, message, fields } : { code, message },
});

/** Turns a zod error on `where` (body, query, params) into a 400 naming each field. */
export function validationError(where: string, err: ZodError): HttpError {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key = [where, ...issue.path.map(String)].join('.');
    fields[key] ??= issue.message;
  }
  return fieldsError('validation_failed', fields);
}

/** A 400 naming each field (keys like `body.figures.2.quantity`) with the first one's message. */
export function fieldsError(code: string, fields: Record<string, string>): HttpError {
  const names = Object.keys(fields);
  return new HttpError(400, code, `Check ${names.join(', ')}: ${fields[names[0]]}.`, fields);
}

export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json(body('not_found', `There is no API route ${req.method} ${req.baseUrl}${req.path}.`));
};

/** Errors raised by body-parser carry a `type`; map them to 4xx instead of 500. */
const parserErrors: Record<string, [number, string, string]> = {
  'entity.parse.failed': [400, 'invalid_json', 'The request body is not valid JSON. Check quotes, commas and brackets.'],
  'entity.too.large': [413, 'body_too_large', 'The request body is larger than the server accepts.'],
  'encoding.unsupported': [415, 'unsupported_encoding', 'The request body uses a character encoding the server does not accept; send UTF-8.'],
  'charset.unsupported': [415, 'unsupported_charset', 'The request body uses a character set the server does not accept; send UTF-8.'],
  'request.aborted': [400, 'request_aborted', 'The request was cut off before its body arrived.'],
};

export function errorHandler(log: { error: (obj: unknown, msg?: string) => void }): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) return next(err);
    if (err instanceof HttpError) {
      res.status(err.status).json({ ...err.extra, ...body(err.code, err.message, err.fields) });
      return;
    }
    const mapped = typeof err?.type === 'string' ? parserErrors[err.type] : undefined;
    if (mapped) {
      const [status, code, message] = mapped;
      res.status(status).json(body(code, message));
      return;
    }
    if (err?.name?.startsWith?.('Sequelize') && /Connection|Timeout|HostNotReachable|AccessDenied/.test(err.name)) {
      res.status(503).json(body('db_unavailable', 'The database cannot be reached right now. Try again in a moment.'));
      return;
    }
    log.error({ err, url: req.originalUrl }, 'unhandled error');
    res.status(500).json(body('internal', 'Something went wrong on the server. It has been logged; try again.'));
  };
}
