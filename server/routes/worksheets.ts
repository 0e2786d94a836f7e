/** Worksheets over HTTP: the starter worksheets, and evaluation of any worksheet with given values. */
import { Router } from 'express';
import { z } from 'zod';
import { computeFor } from '../compute/pool';
import { quantityTextSchema, worksheetSchema } from '../../shared/worksheet/schema';
import { HttpError } from '../http/errors';
import { validate } from '../http/validate';
import type { Allow } from '../policies';
import { starterWorksheets } from '../services/worksheets';
import type { ComputeRouteDeps } from './checks';

export const evaluateRequestSchema = z
  .object({
    worksheet: worksheetSchema,
    values: z.record(z.string().max(40), quantityTextSchema).default({}),
  })
  .strict();

export function worksheetRoutes(allow: Allow, { compute, limit }: ComputeRouteDeps): Router {
  const r = Router();

  r.get('/worksheets', allow('worksheets.list'), (_req, res) => {
    res.json({
      worksheets: [...starterWorksheets().values()].map(({ name, title, summary }) => ({ name, title, summary: summary ?? '' })),
    });
  });

  r.get('/worksheets/:name', allow('worksheets.read'), (req, res) => {
    const ws = starterWorksheets().get(req.params.name);
    if (!ws) throw new HttpError(404, 'unknown_worksheet', `There is no starter worksheet "${req.params.name}".`);
    res.json({ worksheet: ws });
  });

  r.post('/worksheets/evaluate', allow('worksheets.evaluate'), limit, async (req, res) => {
    const { worksheet, values } = validate(evaluateRequestSchema, req.body ?? {}, 'body');
    // In a worker thread, with a hard time limit: a legal worksheet can take many seconds.
    res.json(await computeFor(res, compute, { kind: 'worksheet', worksheet, values }));
  });
  return r;
}
