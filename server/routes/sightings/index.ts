/**
 * POST /api/sightings: a claim seen in the wild (issue 7; contract in shared/submissions/types.ts),
 * sent as multipart/form-data. Its files are streamed to temporary files and hashed as they arrive;
 * its text fields are checked first, then each file's type by its content, then the files are
 * copied into the store and the row written in one transaction (the stored files are removed again
 * if that fails); the temporary files are removed before the answer, whatever it is.
 * Tests: tests/server/submissions.test.ts, uploads.test.ts, submissions-s3.test.ts, security.test.ts
 * (and the role matrix, csrf.test.ts).
 */
import { Router, type ErrorRequestHandler, type Request, type RequestHandler } from 'express';
import { HttpError } from '../../http/errors';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import type { Submissions } from '../../services/submissions';
import type { ObjectStore } from '../../storage';
import { acceptFiles, discardUploads, inspectFiles, storeFiles, uploadedFiles } from '../../uploads/attachments';
import { readClaimedFigures, sightingSchema } from './schema';

export interface SubmitRouteDeps {
  allow: Allow;
  submissions: Submissions;
  origin: (req: Request) => string;
  limits: { submitAccount: RequestHandler; submitAddress: RequestHandler };
}

/** 403 for an account whose e-mail address is not confirmed yet. */
const verified: RequestHandler = (req, _res, next) => {
  if (!req.user!.emailVerifiedAt) return next(new HttpError(403, 'email_unverified', 'Confirm your e-mail address first (see the message we sent you); then you can report sightings.'));
  next();
};

/** The form's `figures` field arrives as JSON text: read it into the list the schema wants. */
const figuresFromForm: RequestHandler = (req, _res, next) => {
  const b = { ...((req.body as Record<string, unknown> | undefined) ?? {}) };
  if (typeof b.figures === 'string') {
    try {
      b.figures = b.figures.trim() ? JSON.parse(b.figures) : [];
    } catch {
      return next(new HttpError(400, 'validation_failed', 'Check body.figures: it must be a JSON list of {kind, quantity, label}.', { 'body.figures': 'not valid JSON' }));
    }
  }
  req.body = b;
  next();
};

/** Whatever went wrong on the way (a refusal, a bad field or file), the temporary files go before the error answer. */
const discardOnError: ErrorRequestHandler = (err, req, _res, next) => {
  void discardUploads(req).finally(() => next(err));
};

export function sightingRoutes({ allow, submissions, origin, limits }: SubmitRouteDeps, store: ObjectStore): Router {
  const r = Router();
  r.post(
    '/sightings',
    allow('submissions.sighting'),
    verified,
    limits.submitAddress,
    limits.submitAccount,
    acceptFiles(),
    figuresFromForm,
    validated({ body: sightingSchema }),
    async (req, res) => {
      const input = res.locals.valid.body;
      const figures = readClaimedFigures(input.figures);
      const inspected = await inspectFiles(uploadedFiles(req));
      const stored = await storeFiles(store, inspected);
      const submission = await submissions.sightings.create(req.user!, input, figures, stored, origin(req));
      await discardUploads(req);
      res.status(201).json({ submission });
    },
  );
  r.use(discardOnError);
  return r;
}
