/**
 * Worksheets over HTTP: the starter worksheets, and evaluation of any worksheet with given values.
 * GET /api/worksheets, GET /api/worksheets/:name, POST /api/worksheets/evaluate.
 * Tests: tests/server/compute-api.test.ts, compute-pool.test.ts, rate-limit.test.ts (and the role
 * matrix, csrf.test.ts, the fuzzer).
 */
import { Router } from 'express';
import { computeFor } from '../../compute/pool';
import { HttpError } from '../../http/errors';
import { validated } from '../../http/validate';
import { worksheetList } from '../../presenters/computations';
import type { Allow } from '../../policies';
import { starterWorksheets } from '../../services/worksheets';
import type { ComputeRouteDeps } from '../checks';
import { evaluateRequestSchema } from './schema';

export function worksheetRoutes(allow: Allow, { compute, limit }: ComputeRouteDeps): Router {
  const r = Router();

  r.get('/worksheets', allow('worksheets.list'), (_req, res) => {
    res.json(worksheetList(starterWorksheets().values()));
  });

  r.get('/worksheets/:name', allow('worksheets.read'), (req, res) => {
    const ws = starterWorksheets().get(req.params.name);
    if (!ws) throw new HttpError(404, 'unknown_worksheet', `There is no starter worksheet "${req.params.name}".`);
    res.json({ worksheet: ws });
  });

  r.post('/worksheets/evaluate', allow('worksheets.evaluate'), limit, validated({ body: evaluateRequestSchema }), async (_req, res) => {
    const { worksheet, values } = res.locals.valid.body;
    // In a worker thread, with a hard time limit: a legal worksheet can take many seconds.
    res.json(await computeFor(res, compute, { kind: 'worksheet', worksheet, values }));
  });
  return r;
}
