/** The trade's synonym groups (issue 11; contract in shared/synonyms.ts): read by anyone, edited by editors. */
import { Router } from 'express';
import { z } from 'zod';
import { synonymGroupCreateSchema, synonymGroupUpdateSchema, type SynonymGroupResponse, type SynonymListResponse } from '../../shared/synonyms';
import { validate } from '../http/validate';
import type { Allow } from '../policies';
import type { Synonyms } from '../services/synonyms';

const idParams = z.object({ id: z.coerce.number({ error: 'a group number' }).int().min(1, 'a group number').max(4_000_000_000, 'a group number') });

export function synonymRoutes(allow: Allow, synonyms: Synonyms): Router {
  const r = Router();
  r.get('/synonyms', allow('synonyms.list'), async (_req, res) => {
    const payload: SynonymListResponse = { groups: await synonyms.list() };
    res.set('Cache-Control', 'no-cache').json(payload);
  });
  r.post('/synonyms', allow('synonyms.create'), async (req, res) => {
    const input = validate(synonymGroupCreateSchema, req.body ?? {}, 'body');
    const payload: SynonymGroupResponse = { group: await synonyms.create(req.user!, input) };
    res.status(201).json(payload);
  });
  r.put('/synonyms/:id', allow('synonyms.update'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    const input = validate(synonymGroupUpdateSchema, req.body ?? {}, 'body');
    const payload: SynonymGroupResponse = { group: await synonyms.update(req.user!, id, input) };
    res.json(payload);
  });
  r.delete('/synonyms/:id', allow('synonyms.delete'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    await synonyms.remove(req.user!, id);
    res.status(204).end();
  });
  return r;
}
