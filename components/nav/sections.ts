/** The app's sections, in navigation order, and which roles are offered each (DESIGN.md §5). */
import type { Role } from '../viewer';

export type SectionKey = 'library' | 'check' | 'checks' | 'desk' | 'queue' | 'admin' | 'account';

export interface NavSection {
  key: SectionKey;
  href: '/' | `/${Exclude<SectionKey, 'library'>}`;
  label: string;
  roles: readonly Role[];
}

const everyone: readonly Role[] = ['reader', 'contributor', 'editor', 'moderator', 'admin'];

export const sections: readonly NavSection[] = [
  { key: 'library', href: '/', label: 'Library', roles: everyone },
  { key: 'check', href: '/check', label: 'Claim check', roles: everyone },
  { key: 'checks', href: '/checks', label: 'Check kit', roles: everyone },
  { key: 'desk', href: '/desk', label: 'Desk', roles: ['editor'] },
  { key: 'queue', href: '/queue', label: 'Queue', roles: ['moderator'] },
  { key: 'admin', href: '/admin', label: 'Admin', roles: ['admin'] },
  { key: 'account', href: '/account', label: 'Account', roles: everyone },
];

export function sectionsFor(role: Role): NavSection[] {
  return sections.filter((section) => section.roles.includes(role));
}

/** The section a path belongs to: `/` only for itself, the others for their own subpaths too. */
export function isInSection(pathname: string, section: NavSection): boolean {
  if (section.href === '/') return pathname === '/';
  return pathname === section.href || pathname.startsWith(`${section.href}/`);
}
