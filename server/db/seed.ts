/**
 * Loads the starter data from content/ into an empty database, in one transaction: either all of it
 * lands or none does. A database that already has data is left as it is. The trade's synonyms
 * (content/synonyms.yml) go into an empty synonym table the same way, also in a database whose
 * taxonomy was loaded before they existed.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { Sequelize, Transaction } from 'sequelize';
import { Document, isPair, isScalar, parse, visit } from 'yaml';
import { z } from 'zod';
import { synonymFileSchema } from '../../shared/synonyms';
import { HttpError } from '../http/errors';
import { ConservationLaw, MechanismClass, SynonymGroup, SynonymPhrase } from '../models';
import { termKeys } from '../services/synonyms';

const slug = z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'lower-case words joined by hyphens');

export const taxonomyFileSchema = z.object({
  laws: z.array(
    z.object({
      slug,
      name: z.string().min(1).max(160),
      quantity: z.string().min(1).max(160),
      symmetry: z.string().min(1).max(200).nullable(),
      summary: z.string().min(1),
    }),
  ),
  classes: z.array(
    z.object({
      slug,
      parent: slug.optional(),
      name: z.string().min(1).max(160),
      summary: z.string().min(1),
    }),
  ),
});

export function readTaxonomy(contentDir: string) {
  const file = path.join(contentDir, 'taxonomy.yml');
  const parsed = taxonomyFileSchema.safeParse(parse(fs.readFileSync(file, 'utf8')));
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new Error(`${file}: ${issue.path.join('.')}: ${issue.message}`);
  }
  return parsed.data;
}

export interface SynonymFileGroup {
  terms: string[];
  note: string | null;
  /** The match key of each term (server/search/synonyms.ts phraseKey). */
  keys: string[];
}

/**
 * content/synonyms.yml, checked as the API checks a group (each term has a word to match on, none
 * twice in a group) and across groups (a word or phrase belongs to one group). No file: no groups.
 */
export function readSynonyms(contentDir: string): SynonymFileGroup[] {
  const file = path.join(contentDir, 'synonyms.yml');
  if (!fs.existsSync(file)) return [];
  const parsed = synonymFileSchema.safeParse(parse(fs.readFileSync(file, 'utf8')));
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new Error(`${file}: ${issue.path.join('.')}: ${issue.message}`);
  }
  const owner = new Map<string, string>();
  return parsed.data.groups.map((g, i) => {
    let keys: string[];
    try {
      keys = termKeys(g.terms, `groups.${i}.terms`);
    } catch (err) {
      if (err instanceof HttpError) throw new Error(`${file}: ${err.message}`);
      throw err;
    }
    keys.forEach((k, j) => {
      const other = owner.get(k);
      if (other) throw new Error(`${file}: groups.${i}.terms.${j}: “${g.terms[j]}” is already in ${other}; a word or phrase belongs to one group`);
      owner.set(k, `the group of “${g.terms[0]}” (groups.${i})`);
    });
    return { terms: g.terms, note: g.note, keys };
  });
}

/** Loads the synonym groups into an empty synonym table; true when it did. */
async function seedSynonymsIfEmpty(groups: SynonymFileGroup[], transaction: Transaction): Promise<boolean> {
  if (!groups.length || (await SynonymGroup.count({ transaction })) > 0) return false;
  for (const [position, g] of groups.entries()) {
    const row = await SynonymGroup.create({ note: g.note, position }, { transaction });
    await SynonymPhrase.bulkCreate(
      g.terms.map((phrase, i) => ({ groupId: row.id, phrase, matchKey: g.keys[i], position: i })),
      { transaction },
    );
  }
  return true;
}

/** Returns true when it loaded the starter data, false when the database already had some. */
export async function seedIfEmpty(sequelize: Sequelize, contentDir: string): Promise<boolean> {
  const taxonomy = readTaxonomy(contentDir);
  const synonyms = readSynonyms(contentDir);
  return sequelize.transaction(async (transaction) => {
    await seedSynonymsIfEmpty(synonyms, transaction);
    // Lock-free emptiness test is enough on one machine; the unique slugs stop a double load anyway.
    if ((await ConservationLaw.count({ transaction })) > 0) return false;
    await ConservationLaw.bulkCreate(
      taxonomy.laws.map((law, position) => ({ ...law, position })),
      { transaction },
    );
    const ids = new Map<string, number>();
    for (const [position, c] of taxonomy.classes.entries()) {
      const parentId = c.parent ? ids.get(c.parent) : null;
      if (parentId === undefined) throw new Error(`taxonomy.yml: class ${c.slug} names parent ${c.parent}, which is not listed before it`);
      const row = await MechanismClass.create(
        { slug: c.slug, name: c.name, summary: c.summary, parentId, position },
        { transaction },
      );
      ids.set(c.slug, row.id);
    }
    return true;
  });
}

const SYNONYMS_HEADER = `# The trade's synonyms: groups of words and phrases that practitioners use for one thing. The claim
# matcher lets each word or phrase of a group stand for the others, at a lower weight than the word
# itself, so that a claim saying "frustum" finds an entry that says "cavity".
#
# Loaded by \`npm start\` into an empty synonym table; editors change the groups on the Desk
# (Desk → Synonyms); \`npm run content:export\` writes them back here. A word or phrase belongs to one
# group only. Phrases are compared on their words after the index's normalisation (lower case, no
# accents, "the", "of" … left out, plural and -ing forms folded), so "Cavities" is "cavity".
# Keep to words that tell one mechanism from another: a very common word ("energy", "power") in a
# group would lend its weight to every entry.
`;

/** The live synonym groups in the format of content/synonyms.yml (their order kept, ids and versions left out). */
export async function exportSynonyms(): Promise<string> {
  const groups = await SynonymGroup.findAll({ include: [{ model: SynonymPhrase, as: 'phrases' }], order: [['position', 'ASC'], ['id', 'ASC']] });
  const data = {
    groups: groups.map((g) => {
      const terms = [...(g.phrases ?? [])].sort((a, b) => a.position - b.position || a.id - b.id).map((p) => p.phrase);
      return g.note ? { note: g.note, terms } : { terms };
    }),
  };
  const doc = new Document(data);
  // One line per group's terms, as the file is written by hand.
  visit(doc, {
    Seq(_key, node, path) {
      const parent = path[path.length - 1];
      if (isPair(parent) && isScalar(parent.key) && parent.key.value === 'terms') node.flow = true;
    },
  });
  return SYNONYMS_HEADER + doc.toString({ lineWidth: 0, flowCollectionPadding: false });
}

/** Writes the live synonym groups to `file` (content/synonyms.yml); returns how many groups. */
export async function writeSynonymsExport(file: string): Promise<number> {
  const text = await exportSynonyms();
  fs.mkdirSync(path.dirname(file), { recursive: true });
  fs.writeFileSync(file, text);
  return (await SynonymGroup.count()) as number;
}
