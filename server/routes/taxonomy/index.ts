/**
 * GET /api/taxonomy: the conservation laws and the tree of mechanism classes.
 * Tests: tests/server/api.test.ts (and the role matrix, the fuzzer).
 */
import { Router } from 'express';
import type { TaxonomyResponse } from '../../../shared/api-types';
import { ConservationLaw, MechanismClass } from '../../models';
import type { Allow } from '../../policies';

export function taxonomyRoutes(allow: Allow): Router {
  const r = Router();
  r.get('/taxonomy', allow('taxonomy.read'), async (_req, res) => {
    const [laws, classes] = await Promise.all([
      ConservationLaw.findAll({ order: [['position', 'ASC']] }),
      MechanismClass.findAll({ order: [['position', 'ASC']] }),
    ]);
    const slugById = new Map(classes.map((c) => [c.id, c.slug]));
    const payload: TaxonomyResponse = {
      laws: laws.map(({ slug, name, quantity, symmetry, summary, position }) => ({
        slug, name, quantity, symmetry, summary, position,
      })),
      classes: classes.map((c) => ({
        slug: c.slug,
        name: c.name,
        parentSlug: c.parentId ? (slugById.get(c.parentId) ?? null) : null,
        summary: c.summary,
        position: c.position,
      })),
    };
    res.json(payload);
  });
  return r;
}
