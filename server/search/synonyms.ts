/**
 * The trade's synonyms for search (issue 11): groups of words and phrases that practitioners use
 * for one thing ("resonator", "cavity", "frustum"; "exhaust", "propellant", "reaction mass"),
 * kept as data (content/synonyms.yml, the `synonym_groups` table, edited by editors on the Desk).
 *
 * A group becomes one *concept term* of the index. Wherever a text — an entry's field or a pasted
 * claim — holds one of the group's phrases, the concept term is added beside the words themselves,
 * so that a claim saying "frustum" meets an entry saying "cavity" through the concept, and a
 * phrase of several words ("reaction mass") meets a single word ("propellant") both ways.
 *
 * Phrases are compared on their words' *keys*: the index's own normalisation (fold, stop words
 * dropped, light stemmer), then the stemmer once more, because the light stemmer takes off one
 * suffix only ("fluctuations" → "fluctuation", but "fluctuation" → "fluctuat"). Stop words are
 * skipped on both sides, so "perpetual motion of the second kind" is the words perpetual, motion,
 * second, kind. Where phrases overlap at one place the longest wins: "propellant-free" is the
 * propellant-free group's phrase, not also the word "propellant".
 */
import { normaliseTerm, stem } from './normalise';

export interface SynonymGroupData {
  id: number;
  /** The words and phrases, as editors wrote them. */
  terms: string[];
}

/** The index term that stands for a group: marked so that no word of a text can ever equal it or come within two edits of it. */
export const conceptTerm = (groupId: number) => `⟨syn:${groupId}⟩`;
export const isConceptTerm = (t: string) => t.startsWith('⟨syn:');
export const conceptGroupId = (t: string) => Number(t.slice(5, -1));

/** The tokens of a text with their places, split as minisearch's default tokenizer splits (space and punctuation). */
const TOKEN = /[^\n\r\p{Z}\p{P}]+/gu;

export interface Token {
  token: string;
  at: number;
}

export function tokensOf(text: string): Token[] {
  const out: Token[] = [];
  for (const m of text.matchAll(TOKEN)) out.push({ token: m[0], at: m.index! });
  return out;
}

/** A word's key for phrase matching (null: a stop word or nothing, skipped). */
export function wordKey(word: string): string | null {
  const t = normaliseTerm(word);
  return t ? stem(t) : null;
}

/** The keys of a phrase's words, stop words left out. */
export function phraseKeys(phrase: string): string[] {
  return tokensOf(phrase)
    .map((t) => wordKey(t.token))
    .filter((k): k is string => Boolean(k));
}

/** How a phrase is stored for uniqueness: its keys joined by spaces. */
export const phraseKey = (phrase: string) => phraseKeys(phrase).join(' ');

/** One phrase of a group found in a text. */
export interface ConceptHit {
  group: number;
  /** Index of its first and one past its last token (in the token list given). */
  start: number;
  end: number;
}

interface Node {
  next: Map<string, Node>;
  /** Groups whose phrase ends here. */
  groups: number[];
}

const newNode = (): Node => ({ next: new Map(), groups: [] });

/**
 * An immutable set of synonym groups, compiled into a trie of word keys. An index built with one
 * set keeps it: a change of the groups builds a new index (minisearch removes a document by
 * tokenising it again, which must give the tokens it was added with).
 */
export class SynonymSet {
  readonly groups: ReadonlyMap<number, readonly string[]>;
  private readonly root = newNode();
  /** Word → key, for the words of long texts (bounded). */
  private readonly keys = new Map<string, string | null>();

  constructor(groups: SynonymGroupData[] = []) {
    this.groups = new Map(groups.map((g) => [g.id, [...g.terms]]));
    for (const g of groups) {
      for (const phrase of g.terms) {
        const keys = phraseKeys(phrase);
        if (!keys.length) continue;
        let node = this.root;
        for (const k of keys) {
          let child = node.next.get(k);
          if (!child) node.next.set(k, (child = newNode()));
          node = child;
        }
        if (!node.groups.includes(g.id)) node.groups.push(g.id);
      }
    }
  }

  get size(): number {
    return this.groups.size;
  }

  private key(word: string): string | null {
    let k = this.keys.get(word);
    if (k === undefined) {
      k = wordKey(word);
      if (this.keys.size > 50_000) this.keys.clear();
      this.keys.set(word, k);
    }
    return k;
  }

  /**
   * The group phrases found in a token list, left to right, the longest at each place; a phrase
   * found is not searched again inside itself.
   */
  find(tokens: readonly string[]): ConceptHit[] {
    if (!this.root.next.size) return [];
    const keys = tokens.map((t) => this.key(t));
    const out: ConceptHit[] = [];
    let i = 0;
    while (i < keys.length) {
      if (keys[i] === null) {
        i += 1;
        continue;
      }
      let node: Node | undefined = this.root;
      let best: { end: number; groups: number[] } | null = null;
      for (let j = i; j < keys.length && node; j++) {
        const k = keys[j];
        if (k === null) continue; // a stop word inside a phrase
        node = node.next.get(k);
        if (node?.groups.length) best = { end: j + 1, groups: node.groups };
      }
      if (best) {
        for (const group of best.groups) out.push({ group, start: i, end: best.end });
        i = best.end;
      } else {
        i += 1;
      }
    }
    return out;
  }

  /** The concept terms of a text's tokens (one per phrase found, repeated as often as found). */
  conceptTerms(tokens: readonly string[]): string[] {
    return this.find(tokens).map((h) => conceptTerm(h.group));
  }
}
