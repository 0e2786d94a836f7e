/**
 * GET /api/attachments/:id: a sighting's file, for those who may see its submission, as a download
 * that no browser renders in place.
 * Tests: tests/server/submissions.test.ts, submissions-s3.test.ts, security.test.ts (and the role matrix).
 */
import { Router } from 'express';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import type { Submissions } from '../../services/submissions';
import { submissionIdParams } from '../submissions/schema';

export function attachmentRoutes(allow: Allow, submissions: Submissions): Router {
  const r = Router();
  r.get('/attachments/:id', allow('attachments.read'), validated({ params: submissionIdParams }), async (req, res) => {
    const { row, body } = await submissions.items.attachment(req.user!, res.locals.valid.params.id);
    const ascii = row.name.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
    res.set({
      'Content-Type': row.mediaType,
      'Content-Length': String(row.size),
      'Content-Disposition': `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(row.name)}`,
      'X-Content-Type-Options': 'nosniff',
      'Content-Security-Policy': "default-src 'none'; sandbox",
      'Cache-Control': 'private, no-store',
    });
    await new Promise<void>((resolve, reject) => {
      body.on('error', reject);
      res.on('finish', resolve);
      res.on('close', resolve);
      body.pipe(res);
    });
  });
  return r;
}
