/**
 * The trade's synonym groups (issue 11; contract in shared/synonyms.ts): read by anyone, edited by
 * editors. /api/synonyms/*.
 * Tests: tests/server/synonyms.test.ts (and the role matrix, csrf.test.ts, the fuzzer).
 */
import { Router } from 'express';
import type { SynonymGroupResponse, SynonymListResponse } from '../../../shared/api/synonyms';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import type { Synonyms } from '../../services/synonyms';
import { groupIdParams, synonymGroupCreateSchema, synonymGroupUpdateSchema } from './schema';

export function synonymRoutes(allow: Allow, synonyms: Synonyms): Router {
  const r = Router();
  r.get('/synonyms', allow('synonyms.list'), async (_req, res) => {
    const payload: SynonymListResponse = { groups: await synonyms.list() };
    res.set('Cache-Control', 'no-cache').json(payload);
  });
  r.post('/synonyms', allow('synonyms.create'), validated({ body: synonymGroupCreateSchema }), async (req, res) => {
    const input = res.locals.valid.body;
    const payload: SynonymGroupResponse = { group: await synonyms.create(req.user!, input) };
    res.status(201).json(payload);
  });
  r.put('/synonyms/:id', allow('synonyms.update'), validated({ params: groupIdParams, body: synonymGroupUpdateSchema }), async (req, res) => {
    const { params: { id }, body: input } = res.locals.valid;
    const payload: SynonymGroupResponse = { group: await synonyms.update(req.user!, id, input) };
    res.json(payload);
  });
  r.delete('/synonyms/:id', allow('synonyms.delete'), validated({ params: groupIdParams }), async (req, res) => {
    const { id } = res.locals.valid.params;
    await synonyms.remove(req.user!, id);
    res.status(204).end();
  });
  return r;
}
