import type { Role } from '@/shared/schemas/auth';

/** What each role may do, in the words of the product brief (DESIGN.md §2). */
export const roleRights: Record<Role, string> = {
  contributor: 'Send in sightings and corrections and keep saved claim checks, besides everything a reader can do.',
  editor: "Write and revise entries, review other editors' drafts and approve them (never your own), retire entries, edit the taxonomy.",
  moderator: 'Decide on sightings and corrections sent in by contributors, and hide abuse.',
  admin: 'Manage users and their roles, read the audit log and the development outbox, run backups.',
};
