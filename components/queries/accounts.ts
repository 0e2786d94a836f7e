/**
 * The session and the signed-in user's account: `/api/session`, `/api/auth/*`, `/api/account*`
 * (the contract in shared/api/accounts.ts and shared/schemas/auth.ts).
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  ChangePasswordBody,
  EmailOnlyBody,
  ResetBody,
  SessionResponse,
  SignInBody,
  SignUpBody,
  UpdateAccountBody,
  UserResponse,
  VerifyBody,
} from '@/shared/api-types';
import { apiSend, fetchSession } from '../http/client';
import { sessionChanged as dropUserData } from './client';
import { staleTimes } from './staleTimes';

export const sessionKeys = { all: ['session'] as const };

/** `GET /api/session`: who is signed in (null for a reader), and the CSRF token it keeps. */
export function useSession() {
  return useQuery({
    queryKey: sessionKeys.all,
    queryFn: ({ signal }) => fetchSession(signal),
    staleTime: staleTimes.session,
  });
}

const sessionChanged = (client: ReturnType<typeof useQueryClient>) => dropUserData(client, sessionKeys.all);

/** `POST /api/auth/sign-up`: 201 with the new (unverified, not signed-in) user. */
export function useSignUp() {
  return useMutation({ mutationFn: (body: SignUpBody) => apiSend<UserResponse>('POST', '/api/auth/sign-up', body) });
}

/** `POST /api/auth/verify`: confirms the e-mail address with the token from the link. */
export function useVerify() {
  return useMutation({ mutationFn: (body: VerifyBody) => apiSend<UserResponse>('POST', '/api/auth/verify', body) });
}

/** `POST /api/auth/resend-verification`: 202 whether or not the address has an account. */
export function useResendVerification() {
  return useMutation({ mutationFn: (body: EmailOnlyBody) => apiSend<object>('POST', '/api/auth/resend-verification', body) });
}

/** `POST /api/auth/sign-in`; the session is fetched again once it succeeds. */
export function useSignIn() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => apiSend<UserResponse>('POST', '/api/auth/sign-in', body),
    onSuccess: () => sessionChanged(client),
  });
}

/** `POST /api/auth/sign-out`; the session is fetched again once it succeeds. */
export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => apiSend('POST', '/api/auth/sign-out'),
    onSuccess: () => sessionChanged(client),
  });
}

/** `POST /api/auth/forgot`: 202 whether or not the address has an account. */
export function useForgotPassword() {
  return useMutation({ mutationFn: (body: EmailOnlyBody) => apiSend<object>('POST', '/api/auth/forgot', body) });
}

/** `POST /api/auth/reset`: a new password with the token from the link; every session of that user ends. */
export function useResetPassword() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: ResetBody) => apiSend<object>('POST', '/api/auth/reset', body),
    onSuccess: () => sessionChanged(client),
  });
}

/** `PATCH /api/account`: a new display name, shown at once wherever the session is read. */
export function useUpdateAccount() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateAccountBody) => apiSend<UserResponse>('PATCH', '/api/account', body),
    onSuccess: ({ user }) => {
      client.setQueryData<SessionResponse>(sessionKeys.all, (session) => (session ? { ...session, user } : session));
    },
  });
}

/** `POST /api/account/password`. */
export function useChangePassword() {
  return useMutation({ mutationFn: (body: ChangePasswordBody) => apiSend<object>('POST', '/api/account/password', body) });
}
