/**
 * The planner of shared/claims/plan.ts: which checks a claim's figures allow, in this order —
 * thrust, the rocket equation, Carnot, the first law, speeds against c, then the checks whose
 * figures claims seldom give — each in a module of its own.
 */
import type { Figure } from '../types';
import { basisFor, type PlanResult } from './basis';
import { planCarnot } from './carnot';
import { planFirstLaw } from './first-law';
import { planOtherChecks } from './other-checks';
import { planRocket } from './rocket';
import type { PlanContext } from './signals';
import { planSpeeds } from './speeds';
import { planThrust } from './thrust';

export function planFor(figures: Figure[], ctx: PlanContext = {}): PlanResult {
  const b = basisFor(figures, ctx);
  const thrust = planThrust(b);
  planRocket(b);
  const heat = planCarnot(b);
  planFirstLaw(b, thrust, heat);
  planSpeeds(b);
  planOtherChecks(b);
  return { plans: b.plans, needs: b.needs, notes: b.notes };
}
