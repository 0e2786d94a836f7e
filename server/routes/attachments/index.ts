/**
 * GET /api/attachments/:id: a sighting's file, for those who may see its submission, as a download
 * that no browser renders in place; with `?view=inline`, an image (PNG, JPEG, WebP) or a PDF is sent
 * to be previewed in place. The type is the one read from the file's bytes at upload (never what the
 * sender claimed), so nothing else (no SVG, no HTML) is ever sent inline, and every answer carries
 * `nosniff` and a Content-Security-Policy that runs no script.
 * Tests: tests/server/submissions.test.ts, submissions-s3.test.ts, security.test.ts (and the role matrix).
 */
import { Router } from 'express';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import type { Submissions } from '../../services/submissions';
import { submissionIdParams } from '../submissions/schema';
import { attachmentQuerySchema } from './schema';

/** Types a browser may show in place: raster images and PDF. */
const PREVIEWABLE = new Set(['image/png', 'image/jpeg', 'image/webp', 'application/pdf']);

/**
 * The policy of a preview. An image needs nothing (shown alone it is an image document; in the app,
 * an <img>), so it is also sandboxed; Chromium's PDF viewer is a plugin frame that a sandbox
 * blocks, so a PDF gets no sandbox but may load nothing and run no script of its own page.
 */
const PREVIEW_CSP: Record<string, string> = {
  image: "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox",
  pdf: "default-src 'none'; object-src 'self'; style-src 'unsafe-inline'",
};

export function attachmentRoutes(allow: Allow, submissions: Submissions): Router {
  const r = Router();
  r.get('/attachments/:id', allow('attachments.read'), validated({ params: submissionIdParams, query: attachmentQuerySchema }), async (req, res) => {
    const { row, body } = await submissions.items.attachment(req.user!, res.locals.valid.params.id);
    const ascii = row.name.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
    const inline = res.locals.valid.query.view === 'inline' && PREVIEWABLE.has(row.mediaType);
    res.set({
      'Content-Type': row.mediaType,
      'Content-Length': String(row.size),
      'Content-Disposition': `${inline ? 'inline' : 'attachment'}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(row.name)}`,
      'X-Content-Type-Options': 'nosniff',
      'Content-Security-Policy': inline ? PREVIEW_CSP[row.mediaType === 'application/pdf' ? 'pdf' : 'image'] : "default-src 'none'; sandbox",
      'Cross-Origin-Resource-Policy': 'same-origin',
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
