/**
 * The app's sections, in navigation order, and which roles are offered each (DESIGN.md §5):
 * Desk to editors, Queue to moderators, Admin to admins; admins are offered Desk and Queue too.
 * Who is offered a section is the policy of the route its screen opens with (shared/policies.ts),
 * the same table the server checks on every route; this list only decides what is shown.
 */
import { can, rolesOf, type Action } from '@/shared/policies';
import type { Role } from '../viewer';

export type SectionKey = 'library' | 'check' | 'checks' | 'desk' | 'queue' | 'admin' | 'account';

export interface NavSection {
  key: SectionKey;
  href: '/' | `/${Exclude<SectionKey, 'library'>}`;
  label: string;
  /** The route action whose policy decides who is offered the section; none: everyone. */
  action?: Action;
  /** The roles offered it (from the policy), for words such as "Editors and admins only". */
  roles: readonly Role[];
}

const everyone: readonly Role[] = ['reader', 'contributor', 'editor', 'moderator', 'admin'];

export const sections: readonly NavSection[] = [
  { key: 'library', href: '/', label: 'Library', roles: everyone },
  { key: 'check', href: '/check', label: 'Claim check', roles: everyone },
  { key: 'checks', href: '/checks', label: 'Check kit', roles: everyone },
  { key: 'desk', href: '/desk', label: 'Desk', action: 'desk.read', roles: rolesOf('desk.read') },
  { key: 'queue', href: '/queue', label: 'Queue', action: 'queue.list', roles: rolesOf('queue.list') },
  { key: 'admin', href: '/admin', label: 'Admin', action: 'users.list', roles: rolesOf('users.list') },
  { key: 'account', href: '/account', label: 'Account', roles: everyone },
];

/** Sections that only some roles are offered. */
export type RoleSectionKey = 'desk' | 'queue' | 'admin';

export function sectionFor(key: SectionKey): NavSection {
  return sections.find((section) => section.key === key)!;
}

export function sectionsFor(role: Role): NavSection[] {
  return sections.filter((section) => !section.action || can(role, section.action));
}

/** The section a path belongs to: the Library holds `/` and the entry pages, the others their own subpaths. */
export function isInSection(pathname: string, section: NavSection): boolean {
  if (section.href === '/') return pathname === '/' || pathname.startsWith('/entries/');
  return pathname === section.href || pathname.startsWith(`${section.href}/`);
}
