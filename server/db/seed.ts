/**
 * Loads the starter data from content/ into an empty database, in one transaction: either all of it
 * lands or none does. A database that already has data is left as it is.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { parse } from 'yaml';
import { z } from 'zod';
import { ConservationLaw, MechanismClass } from '../models';

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

/** Returns true when it loaded the starter data, false when the database already had some. */
export async function seedIfEmpty(sequelize: Sequelize, contentDir: string): Promise<boolean> {
  const taxonomy = readTaxonomy(contentDir);
  return sequelize.transaction(async (transaction) => {
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
