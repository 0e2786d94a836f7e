/**
 * Words of the paragraph (shared/claims/paragraph.ts): sentences and lists, a law's name inside a
 * sentence and in plain words (for the journalist), Markdown and TeX taken off an entry's text.
 */

export const sentence = (s: string) => {
  const t = s.trim();
  return /[.!?…]["”’)]?$/.test(t) ? t : `${t}.`;
};
export const unstop = (s: string) => s.trim().replace(/[.;:,]+$/, '');
export const list = (items: string[]) => (items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`);
export const quoteTitle = (t: string) => `“${t}”`;
/** A marker placed before the sentence's last stop: "… stays inside [1]." */
export const withCite = (s: string, cite: string) => (cite ? sentence(s).replace(/([.!?…]["”’)]?)$/, ` ${cite}$1`) : sentence(s));
/** "Photon-rocket bound" → "photon-rocket bound"; "P/c" and "COP" stay as they are. */
export const lowerFirst = (s: string) => (/^[A-Z][a-z\s]/.test(s) ? s[0].toLowerCase() + s.slice(1) : s);
export const upperFirst = (s: string) => (s ? s[0].toUpperCase() + s.slice(1) : s);

/**
 * A law's name as it reads inside a sentence: "Conservation of linear momentum" → "conservation of
 * linear momentum", "Second law of thermodynamics" → "the second law of thermodynamics".
 */
export function lawInProse(name: string): string {
  const t = lowerFirst(unstop(name));
  return /^(zeroth|first|second|third) law\b/i.test(t) ? `the ${t}` : t;
}

export const sameLaw = (a: string) => lawInProse(a).replace(/^the /, '').replace(/\s*\(.*\)$/, '').toLowerCase();
export function uniqueLaws(names: string[]): string[] {
  const seen = new Set<string>();
  const out: string[] = [];
  for (const n of names) {
    if (!n?.trim()) continue;
    const k = sameLaw(n);
    if (seen.has(k)) continue;
    seen.add(k);
    out.push(lawInProse(n));
  }
  return out;
}

/** Each law in a few plain words, for the journalist's note (no jargon unexplained). */
const LAW_PLAINLY: [RegExp, string][] = [
  [/angular momentum/i, 'nothing can set itself spinning on its own'],
  [/momentum/i, 'nothing can push itself along without pushing something else back'],
  [/second law|entropy|thermodynamics/i, 'heat does work only while it flows from hot to cold'],
  [/energy|first law/i, 'no machine gives out more energy than it takes in'],
  [/charge/i, 'electric charge is never made or destroyed'],
];
const plainly = (law: string) => LAW_PLAINLY.find(([re]) => re.test(law))?.[1];

/** Markdown and TeX delimiters off (the words and symbols kept), whitespace folded. */
export const plain = (md: string) =>
  md
    .replace(/\$\$?([^$]+?)\$\$?/g, '$1')
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/[*`]+/g, '')
    .replace(/\s+/g, ' ')
    .trim();

export const sentencesOf = (text: string) =>
  plain(text)
    .split(/(?<=[.!?])\s+(?=[A-Z“"‘'(])/)
    .map((s) => s.trim())
    .filter(Boolean);

export const lawsPhrase = (laws: string[]) => list(laws.length ? laws : ['the conservation laws of physics']);

/** The laws with their plain words (journalist): every law, the first only, none. */
export function lawsExplained(laws: string[]): string[] {
  // "conservation of energy (first law)" → "conservation of energy (no machine gives out …)".
  const explain = (l: string) => (plainly(l) ? `${l.replace(/\s*\([^)]*\)$/, '')} (${plainly(l)})` : l);
  return [list(laws.map(explain)), list(laws.map((l, i) => (i === 0 ? explain(l) : l))), list(laws)];
}
