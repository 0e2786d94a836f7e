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
  'request.size.invalid': [400, 'body_length_mismatch', 'The request body is not as long as its Content-Length header says.'],
};

/** Other 4xx errors raised by Express's own parts (a `status` on the error), in words of our own. */
const clientErrors: Record<number, [string, string]> = {
  400: ['bad_request', 'The request could not be read. Check its address, headers and body.'],
  413: ['body_too_large', 'The request body is larger than the server accepts.'],
  415: ['unsupported_media_type', 'The request body is of a type the server does not accept; send JSON.'],
};

type RouterLayer = { route?: { path: unknown }; handle?: { stack?: unknown }; rawPath?: unknown };
const patternCache = new WeakMap<object, string[][]>();

/** The app's route paths, split into segments, in the order the router tries them. */
function routePatterns(app: object): string[][] {
  const cached = patternCache.get(app);
  if (cached) return cached;
  const out: string[][] = [];
  const walk = (stack: RouterLayer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route && typeof layer.route.path === 'string') out.push((prefix + layer.route.path).split('/'));
      else if (Array.isArray(layer.handle?.stack)) {
        walk(layer.handle.stack as RouterLayer[], prefix + (typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : ''));
      }
    }
  };
  const stack = (app as { router?: { stack?: unknown } }).router?.stack;
  if (Array.isArray(stack)) walk(stack as RouterLayer[], '');
  patternCache.set(app, out);
  return out;
}

const decodes = (s: string) => {
  try {
    decodeURIComponent(s);
    return true;
  } catch {
    return false;
  }
};

/**
 * The path parameters of `path` that are not valid percent-encoded UTF-8, named after the first
 * route (of the simple `/literal/:name` kind) whose pattern the path fits, as the router tries them.
 */
function undecodableParams(app: object, path: string): string[] {
  const segments = path.replace(/\/+$/, '').split('/');
  for (const pattern of routePatterns(app)) {
    if (pattern.length !== segments.length) continue;
    const bad: string[] = [];
    const fits = pattern.every((p, i) => {
      if (/^:[A-Za-z_$][\w$]*$/.test(p)) {
        if (!segments[i]) return false;
        if (!decodes(segments[i])) bad.push(`params.${p.slice(1)}`);
        return true;
      }
      return !/[:*{}()]/.test(p) && p.toLowerCase() === segments[i].toLowerCase();
    });
    if (fits && bad.length) return bad;
  }
  return [];
}

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
    // The router could not decode a path parameter (a % not followed by UTF-8 in %XX form).
    if (err instanceof URIError || err?.name === 'URIError') {
      const names = undecodableParams(req.app, req.path);
      const fields = Object.fromEntries((names.length ? names : ['path']).map((n) => [n, 'is not valid percent-encoding: each % must start a %XX byte of UTF-8 text']));
      res.status(400).json(body('invalid_encoding', `Check ${Object.keys(fields).join(', ')}: it is not valid percent-encoding (each % must start a %XX byte of UTF-8 text).`, fields));
      return;
    }
    const status = err?.status ?? err?.statusCode;
    // A compressed body (Content-Encoding gzip, deflate, br) that does not decompress: zlib's codes.
    if (status === 400 && !err.type && typeof err?.code === 'string' && /^(Z_|ERR__ERROR|ERR_BROTLI)/.test(err.code)) {
      res.status(400).json(body('invalid_body_encoding', 'Check body: it could not be decompressed as its Content-Encoding says.', { body: 'could not be decompressed as its Content-Encoding says' }));
      return;
    }
    if (Number.isInteger(status) && status >= 400 && status < 500) {
      const [code, message] = clientErrors[status] ?? ['bad_request', clientErrors[400][1]];
      res.status(status).json(body(code, message));
      return;
    }
    // (Also a query the server's shutdown cut off: SQLSTATE class 08, connection exception, or a fatal driver error.)
    const lostConnection = err?.name?.startsWith?.('Sequelize') && (/^08/.test(String(err?.parent?.sqlState ?? err?.original?.sqlState ?? '')) || err?.parent?.fatal === true);
    if (lostConnection || (err?.name?.startsWith?.('Sequelize') && /Connection|Timeout|HostNotReachable|AccessDenied/.test(err.name))) {
      res.status(503).json(body('db_unavailable', 'The database cannot be reached right now. Try again in a moment.'));
      return;
    }
    log.error({ err, url: req.originalUrl }, 'unhandled error');
    res.status(500).json(body('internal', 'Something went wrong on the server. It has been logged; try again.'));
  };
}
