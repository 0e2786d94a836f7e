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
  /** The label in the phone's bottom bar, short enough for one line in a fifth of a phone's width. */
  short: string;
  /** The route action whose policy decides who is offered the section; none: everyone. */
  action?: Action;
  /** The roles offered it (from the policy), for words such as "Editors and admins only". */
  roles: readonly Role[];
}

const everyone: readonly Role[] = ['reader', 'contributor', 'editor', 'moderator', 'admin'];

export const sections: readonly NavSection[] = [
  { key: 'library', href: '/', label: 'Library', short: 'Library', roles: everyone },
  { key: 'check', href: '/check', label: 'Claim check', short: 'Claims', roles: everyone },
  { key: 'checks', href: '/checks', label: 'Check kit', short: 'Kit', roles: everyone },
  { key: 'desk', href: '/desk', label: 'Desk', short: 'Desk', action: 'desk.read', roles: rolesOf('desk.read') },
  { key: 'queue', href: '/queue', label: 'Queue', short: 'Queue', action: 'queue.list', roles: rolesOf('queue.list') },
  { key: 'admin', href: '/admin', label: 'Admin', short: 'Admin', action: 'users.list', roles: rolesOf('users.list') },
  { key: 'account', href: '/account', label: 'Account', short: 'Account', roles: everyone },
];

/** The most destinations the phone's bottom bar holds, "More" included. */
export const BAR_MAX = 5;

/**
 * How a role's sections share the phone's bottom bar: all of them when they fit in `BAR_MAX`, otherwise
 * the first ones in navigation order and a "More" that lists the rest.
 */
export function barSectionsFor(role: Role): { bar: NavSection[]; more: NavSection[] } {
  const offered = sectionsFor(role);
  if (offered.length <= BAR_MAX) return { bar: offered, more: [] };
  return { bar: offered.slice(0, BAR_MAX - 1), more: offered.slice(BAR_MAX - 1) };
}

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
