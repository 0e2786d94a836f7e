/** The admin's screens: users and roles, the audit log, the development outbox (`/api/admin/*`). */
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AuditListResponse, OutboxResponse, PageQuery, Role, UserListQuery, UserListResponse, UserResponse } from '@/shared/api-types';
import { apiGet, apiSend, queryString } from '../http/client';
import { userKey } from './client';

/** Everything only an admin sees, under the signed-in user's scope. */
export const adminKeys = {
  all: userKey('admin'),
  users: userKey('admin', 'users'),
  userList: (query: UserListQuery) => userKey('admin', 'users', query),
  audit: userKey('admin', 'audit'),
  auditPage: (page: PageQuery) => userKey('admin', 'audit', page),
  outbox: userKey('admin', 'outbox'),
};

/** `GET /api/admin/users`: a page of users, searched by e-mail or name and filtered by role. */
export function useUserList(query: UserListQuery) {
  return useQuery({
    queryKey: adminKeys.userList(query),
    queryFn: ({ signal }) => apiGet<UserListResponse>(`/api/admin/users${queryString(query)}`, { signal }),
    placeholderData: keepPreviousData,
  });
}

/**
 * `PATCH /api/admin/users/:id/role`. The user's new role replaces the old one in every list
 * already fetched, and the audit log is fetched again to show the change.
 */
export function useSetRole() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: number; role: Role }) => apiSend<UserResponse>('PATCH', `/api/admin/users/${id}/role`, { role }),
    onSuccess: ({ user }) => {
      client.setQueriesData<UserListResponse>({ queryKey: adminKeys.users }, (list) =>
        list ? { ...list, users: list.users.map((u) => (u.id === user.id ? user : u)) } : list,
      );
      return client.invalidateQueries({ queryKey: adminKeys.audit });
    },
  });
}

/** `GET /api/admin/audit`: the audit log, newest first. */
export function useAuditLog(page: PageQuery) {
  return useQuery({
    queryKey: adminKeys.auditPage(page),
    queryFn: ({ signal }) => apiGet<AuditListResponse>(`/api/admin/audit${queryString(page)}`, { signal }),
    placeholderData: keepPreviousData,
  });
}

/** `GET /api/admin/outbox` (development only): the mail the local fake SMTP server caught, newest first. */
export function useOutbox() {
  return useQuery({
    queryKey: adminKeys.outbox,
    queryFn: ({ signal }) => apiGet<OutboxResponse>('/api/admin/outbox', { signal }),
  });
}
