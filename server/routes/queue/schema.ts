/** Requests of /api/queue (moderators). */
import { z } from 'zod';
import { SUBMISSION_KINDS } from '../../../shared/submissions/types';
import { paging } from '../common-schema';

/** GET /api/queue */
export const queueQuerySchema = z.object({
  /** Only sightings or only corrections. */
  kind: z.enum(SUBMISSION_KINDS).optional(),
  /** Only items in this open state. */
  status: z.enum(['open', 'claimed', 'waiting']).optional(),
  /** Only the items this moderator holds. */
  mine: z.enum(['1', 'true']).optional(),
  ...paging(100, 50),
});

export type QueueQueryInput = z.infer<typeof queueQuerySchema>;
