/**
 * Tiny number formatting for verdict messages (plain text, pasted into referee reports).
 * The UI formats outputs itself; this is only for the words.
 */

/** Decimal exponent of |x| after rounding to `digits` significant figures (9.996 → 1, not 0). */
function exponentOf(a: number, digits: number): number {
  let e = Math.floor(Math.log10(a));
  if (Number((a / Math.pow(10, e)).toFixed(digits - 1)) >= 10) e += 1;
  return e;
}

/** A number to `digits` significant figures: "3.34", "0.00120", "3.34 × 10^-6", "1.20 × 10^9". */
export function fmt(x: number, digits = 3): string {
  if (Number.isNaN(x)) return 'not a number';
  if (!Number.isFinite(x)) return x > 0 ? 'infinity' : 'minus infinity';
  if (x === 0) return '0';
  const sign = x < 0 ? '-' : '';
  const a = Math.abs(x);
  const e = exponentOf(a, digits);
  if (e >= -3 && e < 6) return sign + a.toFixed(Math.max(0, digits - 1 - e));
  return `${sign}${(a / Math.pow(10, e)).toFixed(digits - 1)} × 10^${e}`;
}

const PREFIXES: Record<string, string> = {
  '-24': 'y', '-21': 'z', '-18': 'a', '-15': 'f', '-12': 'p', '-9': 'n', '-6': 'µ', '-3': 'm',
  '0': '', '3': 'k', '6': 'M', '9': 'G', '12': 'T', '15': 'P', '18': 'E', '21': 'Z', '24': 'Y',
};

/** Units that take an SI prefix in messages, and the largest prefix exponent that reads naturally. */
const PREFIXABLE: Record<string, number> = {
  N: 24, W: 24, J: 24, m: 3, s: 0, A: 24, T: 24, C: 24, V: 24, eV: 24, Hz: 24,
  'N s': 24, 'm / s': 3, 'N / K': 24, 'V / m': 24,
};

/** Compact spelling of our mathjs unit strings for prose ("m / s" → "m/s"). */
function spell(unit: string): string {
  return unit.replace(/ \/ /g, '/');
}

/**
 * A quantity in words: the value to `digits` significant figures with an SI prefix where the unit
 * takes one ("3.34 µN", "1.00 kW", "30.0 km/s"), otherwise the plain number and unit ("300 K",
 * "1000 kg", "1.00 × 10^-9 kg/s").
 */
export function fmtQ(x: number, unit: string, digits = 3): string {
  const u = spell(unit);
  const maxExp = PREFIXABLE[unit];
  if (maxExp === undefined || x === 0 || !Number.isFinite(x)) return u ? `${fmt(x, digits)} ${u}` : fmt(x, digits);
  const a = Math.abs(x);
  const e = exponentOf(a, digits);
  const e3 = Math.max(-24, Math.min(maxExp, Math.floor(e / 3) * 3));
  const m = x / Math.pow(10, e3);
  const em = e - e3; // 0, 1 or 2 inside the prefix range; larger when capped (e.g. 5000 s)
  if (em > 5) return `${fmt(x, digits)} ${u}`;
  return `${m.toFixed(Math.max(0, digits - 1 - em))} ${PREFIXES[String(e3)]}${u}`;
}

/** A ratio in words: "300 times", "0.0120 times". */
export function fmtRatio(r: number): string {
  return `${fmt(r)} times`;
}
