/** The standard check kit over HTTP: the same functions the check screens run in the browser. */
import { Router } from 'express';
import { z } from 'zod';
import { checkList } from '../../shared/checks';
import { CheckInputError, isCheckName, runCheck } from '../../shared/checks/run';
import { HttpError } from '../http/errors';
import { validate } from '../http/validate';
import type { Allow } from '../policies';

const rawInput = z.union([
  z.string().max(80),
  z.object({ value: z.number().finite(), unit: z.string().max(40) }).strict(),
]);
export const checkRequestSchema = z.object({ inputs: z.record(z.string().max(40), rawInput).default({}) }).strict();

export function checkRoutes(allow: Allow): Router {
  const r = Router();

  r.get('/checks', allow('checks.list'), (_req, res) => {
    res.json({
      checks: checkList.map(({ name, title, summary, condition, inputs, cautions }) => ({
        name, title, summary, condition, inputs, cautions,
      })),
    });
  });

  r.post('/checks/:check', allow('checks.run'), (req, res) => {
    const name = req.params.check;
    if (!isCheckName(name)) {
      throw new HttpError(404, 'unknown_check', `There is no check "${name}". The kit has: ${checkList.map((c) => c.name).join(', ')}.`);
    }
    const { inputs } = validate(checkRequestSchema, req.body ?? {}, 'body');
    try {
      res.json(runCheck(name, inputs));
    } catch (err) {
      if (err instanceof CheckInputError) {
        const fields = Object.fromEntries(Object.entries(err.fields).map(([k, v]) => [`body.${k}`, v]));
        throw new HttpError(400, 'invalid_input', err.message, fields);
      }
      throw err;
    }
  });
  return r;
}
