/**
 * Sightings, corrections and the moderators' queue over HTTP (issue 7; contract in
 * shared/submissions/types.ts). A sighting is multipart/form-data: its files are streamed to
 * temporary files and hashed as they arrive; its text fields are checked first, then each file's
 * type by its content, then the files are copied into the store and the row written in one
 * transaction (the stored files are removed again if that fails); the temporary files are removed
 * before the answer, whatever it is.
 */
import { Router, type Request, type RequestHandler } from 'express';
import { z } from 'zod';
import { slugSchema } from '../../shared/entries/schema';
import { HttpError } from '../http/errors';
import { validate } from '../http/validate';
import type { Allow } from '../policies';
import type { ObjectStore } from '../storage';
import { acceptFiles, discardUploads, inspectFiles, storeFiles, uploadedFiles } from '../uploads/attachments';
import {
  answerSchema,
  correctionSchema,
  decideSchema,
  queueQuerySchema,
  readClaimedFigures,
  sightingSchema,
  type Submissions,
} from '../services/submissions';

const idParams = z.object({ id: z.coerce.number().int().min(1, 'a submission number').max(4_000_000_000) });
const slugParams = z.object({ slug: slugSchema });

/** The text fields of a multipart sighting, as the schema wants them (figures arrive as JSON text). */
function sightingFields(body: Record<string, unknown> | undefined): unknown {
  const b = { ...(body ?? {}) };
  if (typeof b.figures === 'string') {
    try {
      b.figures = b.figures.trim() ? JSON.parse(b.figures) : [];
    } catch {
      throw new HttpError(400, 'validation_failed', 'Check body.figures: it must be a JSON list of {kind, quantity, label}.', { 'body.figures': 'not valid JSON' });
    }
  }
  return b;
}

export interface SubmissionRouteDeps {
  allow: Allow;
  submissions: Submissions;
  store: ObjectStore;
  origin: (req: Request) => string;
  limits: { submitAccount: RequestHandler; submitAddress: RequestHandler };
}

export function submissionRoutes({ allow, submissions, store, origin, limits }: SubmissionRouteDeps): Router {
  const r = Router();
  const verified: RequestHandler = (req, _res, next) => {
    if (!req.user!.emailVerifiedAt) return next(new HttpError(403, 'email_unverified', 'Confirm your e-mail address first (see the message we sent you); then you can report sightings.'));
    next();
  };

  r.post('/sightings', allow('submissions.sighting'), verified, limits.submitAddress, limits.submitAccount, acceptFiles(), async (req, res) => {
    let submission;
    try {
      const input = validate(sightingSchema, sightingFields(req.body), 'body');
      const figures = readClaimedFigures(input.figures);
      const inspected = await inspectFiles(uploadedFiles(req));
      const stored = await storeFiles(store, inspected);
      submission = await submissions.createSighting(req.user!, input, figures, stored, origin(req));
    } finally {
      await discardUploads(req);
    }
    res.status(201).json({ submission });
  });

  r.post('/corrections', allow('submissions.correction'), limits.submitAddress, limits.submitAccount, async (req, res) => {
    const input = validate(correctionSchema, req.body ?? {}, 'body');
    res.status(201).json({ submission: await submissions.createCorrection(req.user!, input, origin(req)) });
  });

  r.get('/submissions/mine', allow('submissions.mine'), async (req, res) => {
    res.json({ items: await submissions.mine(req.user!) });
  });

  r.get('/submissions/:id', allow('submissions.read'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    res.set('Cache-Control', 'private, no-store');
    res.json({ submission: await submissions.read(req.user!, id) });
  });

  r.post('/submissions/:id/answer', allow('submissions.answer'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    const { message } = validate(answerSchema, req.body ?? {}, 'body');
    res.json({ submission: await submissions.answer(req.user!, id, message, origin(req)) });
  });

  r.get('/attachments/:id', allow('attachments.read'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    const { row, body } = await submissions.attachment(req.user!, id);
    const ascii = row.name.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
    res.set({
      'Content-Type': row.mediaType,
      'Content-Length': String(row.size),
      'Content-Disposition': `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(row.name)}`,
      'X-Content-Type-Options': 'nosniff',
      'Content-Security-Policy': "default-src 'none'; sandbox",
      'Cache-Control': 'private, no-store',
    });
    await new Promise<void>((resolve, reject) => {
      body.on('error', reject);
      res.on('finish', resolve);
      res.on('close', resolve);
      body.pipe(res);
    });
  });

  r.get('/queue', allow('queue.list'), async (req, res) => {
    const q = validate(queueQuerySchema, req.query, 'query');
    res.json(await submissions.queue(req.user!, q));
  });

  r.get('/queue/editors', allow('queue.editors'), async (_req, res) => {
    res.json({ editors: await submissions.editors() });
  });

  r.post('/submissions/:id/claim', allow('queue.claim'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    res.json({ submission: await submissions.claim(req.user!, id) });
  });

  r.post('/submissions/:id/release', allow('queue.release'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    res.json({ submission: await submissions.release(req.user!, id) });
  });

  r.post('/submissions/:id/decide', allow('queue.decide'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    const input = validate(decideSchema, req.body ?? {}, 'body');
    res.json({ submission: await submissions.decide(req.user!, id, input, origin(req)) });
  });

  r.get('/entries/:slug/sightings', allow('entries.sightings'), async (req, res) => {
    const { slug } = validate(slugParams, req.params, 'params');
    res.json({ sightings: await submissions.entrySightings(slug) });
  });

  r.get('/desk/corrections', allow('desk.corrections'), async (req, res) => {
    res.json({ items: await submissions.deskCorrections(req.user!) });
  });

  return r;
}
