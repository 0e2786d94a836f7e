/**
 * The query client and the one rule for caches that belong to a signed-in user: every query key of
 * data that depends on who is signed in (their account's lists, the Desk, drafts, the queue, the
 * admin's screens, saved claim checks) starts with `USER_SCOPE`, and a change of session (sign-in,
 * sign-out, a password reset) removes them all, so that the next account never sees the last one's.
 */
import { QueryClient } from '@tanstack/react-query';
import { ApiError, ApiUnreachableError, forgetCsrfToken } from '../http/client';

/** The first element of every query key whose answer belongs to the signed-in user. */
export const USER_SCOPE = 'user' as const;

/** A key under the signed-in user's scope: `userKey('desk')` → `['user', 'desk']`. */
export const userKey = <T extends readonly unknown[]>(...rest: T) => [USER_SCOPE, ...rest] as const;

/** Retry once, and only what may pass on a second try: no answer at all, or a 5xx. */
function shouldRetry(failureCount: number, error: Error): boolean {
  if (failureCount >= 1) return false;
  return error instanceof ApiUnreachableError || (error instanceof ApiError && error.status >= 500);
}

export function createQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: { queries: { retry: shouldRetry } } });
}

/** After sign-in, sign-out or a reset the session is another one: new CSRF token, new user, none of the last user's data. */
export async function sessionChanged(client: QueryClient, sessionKey: readonly unknown[]) {
  forgetCsrfToken();
  client.removeQueries({ queryKey: [USER_SCOPE] });
  await client.invalidateQueries({ queryKey: sessionKey });
}
