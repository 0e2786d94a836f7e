/** The taxonomy as GET /api/taxonomy sends it (shared/api/taxonomy.ts): laws in order, classes with their parent's slug. */
import type { TaxonomyResponse } from '../../shared/api-types';
import type { ConservationLaw, MechanismClass } from '../models';

export function taxonomy(laws: ConservationLaw[], classes: MechanismClass[]): TaxonomyResponse {
  const slugById = new Map(classes.map((c) => [c.id, c.slug]));
  return {
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
}
