/**
 * The synthetic library (synthetic.ts) as the search index reads it from MariaDB (server/search/load.ts),
 * without a database: for the in-process parts of the benches (claim-latency.ts) and for quick runs
 * while tuning the index (`npx tsx --expose-gc bench/search/in-process.ts`).
 */
import fs from 'node:fs';
import path from 'node:path';
import YAML from 'yaml';
import type { LoadedEntry } from '../../server/search/load';
import { plainText } from '../../server/search/normalise';
import { SynonymSet } from '../../server/search/synonyms';
import type { SyntheticEntry } from './synthetic';

const CONTENT = path.join(__dirname, '..', '..', 'content');

interface Taxonomy {
  laws: Map<string, string>;
  classes: Map<string, { name: string; parent: string | null }>;
}

/** The taxonomy's names (content/taxonomy.yml), as load.ts keeps them. */
export function taxonomyNames(): Taxonomy {
  const raw = YAML.parse(fs.readFileSync(path.join(CONTENT, 'taxonomy.yml'), 'utf8')) as {
    laws: { slug: string; name: string }[];
    classes: { slug: string; name: string; parent?: string | null }[];
  };
  return {
    laws: new Map(raw.laws.map((l) => [l.slug, l.name])),
    classes: new Map(raw.classes.map((c) => [c.slug, { name: c.name, parent: c.parent ?? null }])),
  };
}

/** The synonym groups of content/synonyms.yml, numbered in file order. */
export function synonymSet(): SynonymSet {
  const raw = YAML.parse(fs.readFileSync(path.join(CONTENT, 'synonyms.yml'), 'utf8')) as { groups: { terms: string[] }[] } | { terms: string[] }[];
  const groups = Array.isArray(raw) ? raw : raw.groups;
  return new SynonymSet(groups.map((g, i) => ({ id: i + 1, terms: g.terms })));
}

/** Each synthetic entry as load.ts makes it of a published entry (no sightings, no sources). */
export function loadedLibrary(lib: SyntheticEntry[], tax: Taxonomy): LoadedEntry[] {
  const base = Date.UTC(2026, 0, 1);
  return lib.map((e) => {
    const c = e.content;
    const inBrief = plainText(c.inBrief);
    const whyItFails = plainText(c.whyItFails);
    return {
      doc: {
        id: e.n, slug: e.slug, title: c.title, aliases: c.aliases.join(' · '), inBrief,
        howItIsPitched: plainText(c.howItIsPitched), whyItFails, whatFakesTheEffect: plainText(c.whatFakesTheEffect ?? ''),
        mechanism: tax.classes.get(c.mechanismClass)?.name ?? '', laws: c.laws.map((s) => tax.laws.get(s) ?? s).join(' · '),
        citations: '', sightings: '',
      },
      entry: {
        id: e.n, slug: e.slug, title: c.title, version: 1, publishedAt: base + e.n * 60_000, laws: c.laws,
        mechanismClass: c.mechanismClass, inBrief, excerptText: `${inBrief} ${whyItFails}`.trim(),
      },
    };
  });
}
