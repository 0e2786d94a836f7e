import { usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import type { Role } from '@/shared/schemas/auth';
import { useSession } from '../queries/accounts';
import { can } from '@/shared/policies';
import { sectionFor, type RoleSectionKey } from '../nav/sections';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { TextLink } from '../ui/TextLink';

const plural: Record<Role, string> = {
  contributor: 'contributors',
  editor: 'editors',
  moderator: 'moderators',
  admin: 'admins',
};

/** "Admins only", "Editors and admins only": the roles a section is for, from the navigation table. */
function onlyFor(roles: readonly Role[]): string {
  const words = roles.map((role) => plural[role]).join(' and ');
  return `${words.charAt(0).toUpperCase()}${words.slice(1)} only`;
}

/**
 * Shows its children only to the roles the section is offered to (components/nav/sections.ts);
 * anyone else learns who the section is for and what to do. The server checks the same on every route.
 */
export function RoleGate({ section, children }: { section: RoleSectionKey; children: ReactNode }) {
  const pathname = usePathname();
  const { data, error, isPending, refetch } = useSession();
  const roles = sectionFor(section).roles.filter((role): role is Role => role !== 'reader');

  if (isPending) return <Loading testID="session-loading" label="Checking who is signed in…" />;
  if (error) return <ErrorNotice testID="session-error" error={error} what="who is signed in" onRetry={() => void refetch()} />;

  const { user } = data;
  const { action } = sectionFor(section);
  if (user && action && can(user, action)) return <>{children}</>;
  if (!user) {
    return (
      <Notice
        testID="role-required"
        title={onlyFor(roles)}
        action={
          <TextLink href={`/sign-in?next=${encodeURIComponent(pathname)}`} testID="role-sign-in">
            Sign in
          </TextLink>
        }
      >
        Sign in with an account that has this role to open it.
      </Notice>
    );
  }
  return (
    <Notice testID="role-required" title={onlyFor(roles)}>
      You are signed in as {user.displayName}, whose role is {user.role}. An admin can change roles if you need this
      section.
    </Notice>
  );
}
