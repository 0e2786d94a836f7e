/** The standard check kit over HTTP: the same functions the check screens run in the browser. */
import { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import { checkList } from '../../shared/checks';
import { isCheckName } from '../../shared/checks/run';
import { computeFor, type ComputePool } from '../compute/pool';
import { HttpError } from '../http/errors';
import { validate } from '../http/validate';
import type { Allow } from '../policies';

const rawInput = z.union([
  z.string().max(80),
  z.object({ value: z.number().finite(), unit: z.string().max(40) }).strict(),
]);
export const checkRequestSchema = z.object({ inputs: z.record(z.string().max(40), rawInput).default({}) }).strict();

export interface ComputeRouteDeps {
  /** The worker threads the checks run in. */
  compute: ComputePool;
  /** The per-address limit on computations. */
  limit: RequestHandler;
}

export function checkRoutes(allow: Allow, { compute, limit }: ComputeRouteDeps): Router {
  const r = Router();

  r.get('/checks', allow('checks.list'), (_req, res) => {
    res.json({
      checks: checkList.map(({ name, title, summary, condition, inputs, cautions }) => ({
        name, title, summary, condition, inputs, cautions,
      })),
    });
  });

  r.post('/checks/:check', allow('checks.run'), limit, async (req, res) => {
    const name = String(req.params.check);
    if (!isCheckName(name)) {
      throw new HttpError(404, 'unknown_check', `There is no check "${name}". The kit has: ${checkList.map((c) => c.name).join(', ')}.`);
    }
    const { inputs } = validate(checkRequestSchema, req.body ?? {}, 'body');
    // In a worker thread (a bad input comes back as a 400 naming the field).
    res.json(await computeFor(res, compute, { kind: 'check', check: name, inputs }));
  });
  return r;
}
