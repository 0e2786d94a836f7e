/** Random tokens for e-mailed links and CSRF, and the SHA-256 under which link tokens are stored. */
import crypto from 'node:crypto';

/** 32 random bytes as 43 base64url characters (the shape `tokenSchema` accepts). */
export const newToken = (): string => crypto.randomBytes(32).toString('base64url');

export const sha256 = (token: string): string => crypto.createHash('sha256').update(token, 'utf8').digest('hex');

/** Constant-time comparison of two strings. */
export function sameToken(a: string, b: string): boolean {
  const x = Buffer.from(a, 'utf8');
  const y = Buffer.from(b, 'utf8');
  return x.length === y.length && crypto.timingSafeEqual(x, y);
}
