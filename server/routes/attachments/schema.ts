/** The query of GET /api/attachments/:id. */
import { z } from 'zod';

export const attachmentQuerySchema = z.object({
  /** `inline` asks for a preview: a PNG, JPEG, WebP or PDF is sent to be shown in place (any other type still downloads). */
  view: z.enum(['download', 'inline'], { error: 'view is download or inline' }).default('download'),
});
