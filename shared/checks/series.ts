/** Small helpers for plot series. */

/** n evenly spaced values from a to b inclusive (n ≥ 2). */
export function linspace(a: number, b: number, n: number): Float64Array {
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = a + ((b - a) * i) / (n - 1);
  return out;
}

/** The same function applied to every value. */
export function mapSeries(xs: ArrayLike<number>, fn: (x: number) => number): Float64Array {
  const out = new Float64Array(xs.length);
  for (let i = 0; i < xs.length; i++) out[i] = fn(xs[i]);
  return out;
}

/** A constant series as long as xs (a claim drawn as a flat line). */
export function constantSeries(n: number, v: number): Float64Array {
  return new Float64Array(n).fill(v);
}
