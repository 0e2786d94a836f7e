/** `GET /api/taxonomy`: conservation laws and mechanism classes. */

/** A conservation law and the symmetry behind it (Noether's theorem), or a second-law/charge rule. */
export interface ConservationLawDto {
  slug: string;
  name: string;
  /** The conserved quantity, e.g. "linear momentum". */
  quantity: string;
  /** The symmetry behind it, e.g. "translation in space"; null where no Noether symmetry applies. */
  symmetry: string | null;
  summary: string;
  position: number;
}

/** A node of the mechanism-class tree. */
export interface MechanismClassDto {
  slug: string;
  name: string;
  parentSlug: string | null;
  summary: string;
  position: number;
}

/** `GET /api/taxonomy` */
export interface TaxonomyResponse {
  laws: ConservationLawDto[];
  classes: MechanismClassDto[];
}
