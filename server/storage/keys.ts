/**
 * Object keys and the errors every store raises. Keys are made by the caller (newAttachmentKey) and
 * checked by each store before any file or request is touched, so no key can leave the store's root.
 */
import crypto from 'node:crypto';

/** Segments of letters, digits, "_" and "-", joined by single "/": no ".", no "..", no leading or trailing "/". */
const KEY_PATTERN = /^[A-Za-z0-9_-]+(?:\/[A-Za-z0-9_-]+)*$/;
export const MAX_KEY_LENGTH = 512;

/** A key a store refuses (path traversal, odd characters). A programming error, not bad input. */
export class InvalidKeyError extends Error {
  constructor(readonly key: string, reason: string) {
    super(`Refused object key ${JSON.stringify(key.slice(0, 100))}: ${reason}.`);
    this.name = 'InvalidKeyError';
  }
}

/** get() of a key that is not in the store. */
export class ObjectNotFoundError extends Error {
  constructor(readonly key: string) {
    super(`No stored object has the key "${key}".`);
    this.name = 'ObjectNotFoundError';
  }
}

export function assertKey(key: string): void {
  if (typeof key !== 'string' || key === '') throw new InvalidKeyError(String(key), 'a key must be a non-empty string');
  if (key.length > MAX_KEY_LENGTH) throw new InvalidKeyError(key, `a key is at most ${MAX_KEY_LENGTH} characters`);
  if (key.startsWith('/')) throw new InvalidKeyError(key, 'a key must not start with "/"');
  if (key.includes('..')) throw new InvalidKeyError(key, 'a key must not contain ".."');
  if (!KEY_PATTERN.test(key)) {
    throw new InvalidKeyError(key, 'a key is made of A-Z, a-z, 0-9, "_" and "-" in segments joined by single "/"');
  }
}

/** attachments/<yyyy>/<mm>/<32 random hex digits> (UTC year and month). */
export function newAttachmentKey(now: Date = new Date()): string {
  const yyyy = String(now.getUTCFullYear()).padStart(4, '0');
  const mm = String(now.getUTCMonth() + 1).padStart(2, '0');
  return `attachments/${yyyy}/${mm}/${crypto.randomBytes(16).toString('hex')}`;
}

export const SHA256_HEX = /^[0-9a-f]{64}$/;
