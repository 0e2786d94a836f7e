/**
 * The search engine's fuzzy look-up (near) against a plain Levenshtein distance worked out in the
 * test (the textbook dynamic programme, Wagner & Fischer 1974): near() must return exactly the
 * vocabulary terms with the word's first letter within the distance, whatever its letter test skips.
 */
import { Engine, editDistance, letterMask } from './engine';

/** Levenshtein distance, the full table (no early exit, no band). */
function levenshtein(a: string, b: string): number {
  const d = Array.from({ length: a.length + 1 }, (_, i) => [i, ...Array(b.length).fill(0)]);
  for (let j = 1; j <= b.length; j++) d[0][j] = j;
  for (let i = 1; i <= a.length; i++)
    for (let j = 1; j <= b.length; j++) d[i][j] = Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1, d[i - 1][j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
  return d[a.length][b.length];
}

// A seeded vocabulary of invented words, with near neighbours made on purpose.
function vocabulary(): string[] {
  let seed = 7;
  const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
  const letters = 'abcdeilmnorstuvyz-é0';
  const words = new Set<string>();
  while (words.size < 1200) {
    const len = 3 + Math.floor(rnd() * 9);
    let w = 's';
    for (let i = 1; i < len; i++) w += letters[Math.floor(rnd() * letters.length)];
    words.add(w);
    // A neighbour: one letter changed, dropped or doubled.
    const at = 1 + Math.floor(rnd() * (w.length - 1));
    words.add(w.slice(0, at) + letters[Math.floor(rnd() * letters.length)] + w.slice(at + 1));
    words.add(w.slice(0, at) + w.slice(at + 1));
    words.add(w.slice(0, at) + w[at] + w.slice(at));
  }
  return [...words];
}

describe('Engine.near', () => {
  const words = vocabulary();
  const engine = new Engine([1]);
  words.forEach((w, i) => engine.add(i + 1, [{ tokens: [w], terms: [w] }]));

  it.each([1, 2])('returns exactly the terms within %i edits that share the first letter', (max) => {
    for (const word of words.slice(0, 40)) {
      const want = words
        .filter((t) => t !== word && t[0] === word[0] && levenshtein(word, t) <= max)
        .map((t) => [t, levenshtein(word, t)])
        .sort();
      expect(engine.near(word, max).sort()).toEqual(want);
    }
  });

  it('editDistance agrees with the full table, or says "more than max"', () => {
    for (let i = 0; i < 300; i++) {
      const [a, b] = [words[i], words[(i * 7 + 3) % words.length]];
      const d = levenshtein(a, b);
      expect(editDistance(a, b, 2)).toBe(d <= 2 ? d : 3);
    }
  });

  it('the letter mask is a set of letters: order and repeats do not change it', () => {
    expect(letterMask('stone')).toBe(letterMask('notes'));
    expect(letterMask('see')).toBe(letterMask('es'));
    expect(letterMask('a')).not.toBe(letterMask('b'));
  });
});
