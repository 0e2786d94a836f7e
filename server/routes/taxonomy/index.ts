/**
 * GET /api/taxonomy: the conservation laws and the tree of mechanism classes.
 * Tests: tests/server/api.test.ts (and the role matrix, the fuzzer).
 */
import { Router } from 'express';
import type { TaxonomyResponse } from '../../../shared/api-types';
import { ConservationLaw, MechanismClass } from '../../models';
import type { Allow } from '../../policies';
import { taxonomy } from '../../presenters/taxonomy';

export function taxonomyRoutes(allow: Allow): Router {
  const r = Router();
  r.get('/taxonomy', allow('taxonomy.read'), async (_req, res) => {
    const [laws, classes] = await Promise.all([
      ConservationLaw.findAll({ order: [['position', 'ASC']] }),
      MechanismClass.findAll({ order: [['position', 'ASC']] }),
    ]);
    const payload: TaxonomyResponse = taxonomy(laws, classes);
    res.json(payload);
  });
  return r;
}
