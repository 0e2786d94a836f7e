/**
 * Whether a text is an address a reader may be sent to. Apart from the schemas (./schema.ts), so that
 * the screens that only show addresses do not load zod.
 */

/** True for an absolute http: or https: address with a host: the only addresses a reader is ever sent to. */
export function isWebAddress(s: string): boolean {
  try {
    const u = new URL(s);
    return (u.protocol === 'http:' || u.protocol === 'https:') && u.hostname !== '';
  } catch {
    return false;
  }
}
