/** Who is looking at the app, as far as the client needs to know: which sections to offer. */
import type { UserDto } from '@/shared/api-types';
import type { Viewer as ViewerRole } from '@/shared/schemas/auth';
import { useSession } from './queries/accounts';

/** A role, or `reader` for a visitor without an account (shared/schemas/auth.ts). */
export type Role = ViewerRole;

export interface Viewer {
  role: Role;
  /** The signed-in user; null for a reader, and while the session is still being fetched. */
  user: UserDto | null;
}

/**
 * The signed-in user's role from the session, or `reader` when nobody is signed in (or the
 * session cannot be fetched). The server checks rights on every route regardless of what the
 * client shows.
 */
export function useViewer(): Viewer {
  const { data } = useSession();
  const user = data?.user ?? null;
  return { role: user?.role ?? 'reader', user };
}
