/**
 * Submissions from the public (issue 7), by workflow step: sightings (sightings.ts) and
 * corrections (corrections.ts) as they are sent, one item once sent — who sees it, its files, the
 * submitter's answer (items.ts) — the moderators' queue with claim and release (queue.ts), the
 * four decisions (decisions.ts) and the moderators' digest mail (digest.ts). The state changes
 * are one table, SUBMISSION_STEPS (common.ts).
 */
import type { SubmissionsDeps } from './common';
import { Corrections } from './corrections';
import { Decisions } from './decisions';
import { Digest } from './digest';
import { Items } from './items';
import { Queue } from './queue';
import { Sightings } from './sightings';

export { CLAIM_TTL_MS, SUBMISSION_STEPS, type SubmissionsDeps } from './common';

export interface Submissions {
  sightings: Sightings;
  corrections: Corrections;
  items: Items;
  queue: Queue;
  decisions: Decisions;
  digest: Digest;
}

export function createSubmissions(deps: SubmissionsDeps): Submissions {
  const digest = new Digest(deps);
  return {
    sightings: new Sightings(deps, digest),
    corrections: new Corrections(deps, digest),
    items: new Items(deps, digest),
    queue: new Queue(deps),
    decisions: new Decisions(deps),
    digest,
  };
}
