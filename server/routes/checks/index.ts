/**
 * The standard check kit over HTTP: the same functions the check screens run in the browser.
 * GET /api/checks, POST /api/checks/:check.
 * Tests: tests/server/compute-api.test.ts, new-checks.test.ts, compute-pool.test.ts, rate-limit.test.ts
 * (and the role matrix, csrf.test.ts, the fuzzer).
 */
import { Router, type RequestHandler } from 'express';
// isCheckName from the kit's list, not from run.ts, which loads mathjs: the checks run in the compute pool.
import { checkList, isCheckName } from '../../../shared/checks';
import type { CheckName } from '../../../shared/checks/types';
import { computeFor, type ComputePool } from '../../compute/pool';
import { HttpError } from '../../http/errors';
import { validated } from '../../http/validate';
import { checkList as presentCheckList } from '../../presenters/computations';
import type { Allow } from '../../policies';
import { checkRequestSchema } from './schema';

export interface ComputeRouteDeps {
  /** The worker threads the checks run in. */
  compute: ComputePool;
  /** The per-address limit on computations. */
  limit: RequestHandler;
}

/** 404 for a check the kit does not have, before the body is read. */
const knownCheck: RequestHandler = (req, _res, next) => {
  const name = String(req.params.check);
  if (!isCheckName(name)) {
    return next(new HttpError(404, 'unknown_check', `There is no check "${name}". The kit has: ${checkList.map((c) => c.name).join(', ')}.`));
  }
  next();
};

export function checkRoutes(allow: Allow, { compute, limit }: ComputeRouteDeps): Router {
  const r = Router();

  r.get('/checks', allow('checks.list'), (_req, res) => {
    res.json(presentCheckList(checkList));
  });

  r.post('/checks/:check', allow('checks.run'), limit, knownCheck, validated({ body: checkRequestSchema }), async (req, res) => {
    const name = req.params.check as CheckName; // knownCheck let it through
    const { inputs } = res.locals.valid.body;
    // In a worker thread (a bad input comes back as a 400 naming the field).
    res.json(await computeFor(res, compute, { kind: 'check', check: name, inputs }));
  });
  return r;
}
