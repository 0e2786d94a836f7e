/** Small helpers for tests of values that settle as a page computes. */

/** Polls `probe` until it returns true (10 s at most), then resolves; throws naming `what` on time-out. */
export async function until(what: string, probe: () => Promise<boolean>, timeoutMs = 10_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await probe())) {
    if (Date.now() > deadline) throw new Error(`timed out waiting until ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Equal to 1e-12 relative: the browser and the server run the same code, so they must agree this closely. */
export const relClose = (a: number, b: number) => a === b || Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));
