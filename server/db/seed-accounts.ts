/**
 * The demo accounts (content/demo/accounts.yml): seeded by `npm start` in development into an empty
 * users table, verified, so that each role can be tried at once. Production refuses.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { parse } from 'yaml';
import { z } from 'zod';
import { displayNameSchema, emailSchema, passwordSchema, ROLES, type Role } from '../../shared/schemas/auth';
import { hashPassword } from '../auth/passwords';
import { User } from '../models';

export const demoAccountsFileSchema = z.object({
  password: passwordSchema,
  accounts: z.array(z.object({ email: emailSchema, displayName: displayNameSchema, role: z.enum(ROLES) })).min(1),
});
export type DemoAccounts = z.infer<typeof demoAccountsFileSchema>;

export function readDemoAccounts(contentDir: string): DemoAccounts {
  const file = path.join(contentDir, 'demo', 'accounts.yml');
  const parsed = demoAccountsFileSchema.safeParse(parse(fs.readFileSync(file, 'utf8')));
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new Error(`${file}: ${issue.path.join('.')}: ${issue.message}`);
  }
  return parsed.data;
}

export class RefusedInProduction extends Error {
  override readonly name = 'RefusedInProduction';
}

/**
 * Seeds the demo accounts when the users table is empty; returns them, or null when there were
 * users already. Throws RefusedInProduction when env is production.
 */
export async function seedDemoAccounts(
  sequelize: Sequelize,
  contentDir: string,
  env: string = process.env.NODE_ENV ?? 'development',
): Promise<{ password: string; accounts: { email: string; displayName: string; role: Role }[] } | null> {
  if (env === 'production') {
    throw new RefusedInProduction('Demo accounts are never seeded when NODE_ENV=production (their password is published in the README).');
  }
  const demo = readDemoAccounts(contentDir);
  if ((await User.count()) > 0) return null;
  const hashes = await Promise.all(demo.accounts.map(() => hashPassword(demo.password)));
  return sequelize.transaction(async (transaction) => {
    if ((await User.count({ transaction })) > 0) return null;
    const now = new Date();
    await User.bulkCreate(
      demo.accounts.map((a, i) => ({ ...a, passwordHash: hashes[i], emailVerifiedAt: now })),
      { transaction },
    );
    return demo;
  });
}
