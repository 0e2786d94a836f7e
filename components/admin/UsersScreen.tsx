import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { UserDto } from '@/shared/api-types';
import { fieldErrors, ROLES, userListQuerySchema, type Role } from '@/shared/schemas/auth';
import { useSetRole, useUserList } from '../queries/admin';
import { problemOf } from '../auth/useForm';
import { colors, space, type } from '../theme';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { TextField } from '../ui/TextField';
import { useViewer } from '../viewer';
import { FieldError } from '../worksheet/QuantityField';
import { AdminFrame } from './AdminFrame';
import { ChoiceChips } from './ChoiceChips';
import { confirmChange } from './confirm';
import { formatWhen } from './format';
import { Pager } from './Pager';
import { useDebounced } from '../ui/useDebounced';

const PAGE = 25;
type RoleFilter = Role | 'all';
const filterOptions: readonly { value: RoleFilter; label: string }[] = [
  { value: 'all', label: 'all roles' },
  ...ROLES.map((role) => ({ value: role, label: role })),
];
const roleOptions = ROLES.map((role) => ({ value: role, label: role }));

/** Admin: the users, searched by e-mail or name and filtered by role, each with a role to change. */
export function UsersScreen() {
  return (
    <AdminFrame
      testID="screen-admin"
      title="Admin"
      lead="Users and their roles. Every change of role is written to the audit log, with who made it and when."
    >
      <UserList />
    </AdminFrame>
  );
}

function UserList() {
  const [search, setSearch] = useState('');
  const [role, setRole] = useState<RoleFilter>('all');
  const [offset, setOffset] = useState(0);
  const q = useDebounced(search.trim(), 250);

  const raw = { q: q || undefined, role: role === 'all' ? undefined : role, limit: PAGE, offset };
  const parsed = userListQuerySchema.safeParse(raw);
  const searchError = parsed.success ? undefined : fieldErrors(parsed.error).q;
  const query = parsed.success ? parsed.data : userListQuerySchema.parse({ ...raw, q: undefined });
  const { data, error, isPending, isFetching, refetch } = useUserList(query);

  let list;
  if (isPending) list = <Loading testID="users-loading" label="Loading the users…" />;
  else if (error) list = <ErrorNotice testID="users-error" error={error} what="the list of users" onRetry={() => void refetch()} />;
  else if (data.users.length === 0) {
    list =
      query.q || query.role ? (
        <Notice tone="empty" testID="users-empty" title="Nobody matches.">
          {noMatch(query.q, query.role)} Shorten the search or choose all roles.
        </Notice>
      ) : (
        <Notice tone="empty" testID="users-empty" title="No accounts yet.">
          People appear here once they create an account at /sign-up; confirm their address and they can sign in.
        </Notice>
      );
  } else {
    list = (
      <>
        <View role="list" testID="user-list" style={styles.list}>
          {data.users.map((user) => (
            <UserRow key={user.id} user={user} />
          ))}
        </View>
        <Pager
          offset={offset}
          limit={PAGE}
          total={data.total}
          shown={data.users.length}
          noun={data.total === 1 ? 'user' : 'users'}
          onOffset={setOffset}
          busy={isFetching}
        />
      </>
    );
  }

  return (
    <View style={styles.body}>
      <View style={styles.filters}>
        <TextField
          name="q"
          label="Search by e-mail address or name"
          kind="search"
          value={search}
          onChangeText={(text) => {
            setSearch(text);
            setOffset(0);
          }}
          placeholder="e.g. okonkwo or example.org"
          error={searchError}
        />
        <View style={styles.filter}>
          <Text style={type.uiStrong}>Role</Text>
          <ChoiceChips
            label="Show users with the role"
            testID="filter-role"
            options={filterOptions}
            value={role}
            onChange={(next) => {
              setRole(next);
              setOffset(0);
            }}
          />
        </View>
      </View>
      {list}
    </View>
  );
}

/** Why the list is empty when searched or filtered, in one sentence. */
function noMatch(q: string | undefined, role: Role | undefined): string {
  if (q && role) return `No user with “${q}” in the e-mail address or name has the role ${role}.`;
  if (q) return `No user has “${q}” in the e-mail address or name.`;
  return `No user has the role ${role}.`;
}

/** One user: who, since when, and their role, changed only once the admin confirms it. */
function UserRow({ user }: { user: UserDto }) {
  const { user: me } = useViewer();
  const setRole = useSetRole();
  const [changed, setChanged] = useState<Role | null>(null);
  const { error, isPending, variables } = setRole;
  // The server's whole sentence ("You cannot take the admin role away from yourself; …"), beside the picker.
  const roleMessage = error ? problemOf(error).message : null;

  const choose = (role: Role) => {
    if (role === user.role) return;
    confirmChange(
      `Change the role of ${user.displayName} from ${user.role} to ${role}?`,
      'The change takes effect at once and is written to the audit log.',
      `Make ${role}`,
      () => {
        setChanged(null);
        setRole.mutate({ id: user.id, role }, { onSuccess: () => setChanged(role) });
      },
    );
  };

  return (
    <View role="listitem" testID={`user-row-${user.email}`} style={styles.row}>
      <View style={styles.who}>
        <Text style={type.uiStrong}>
          {user.displayName}
          {me?.id === user.id ? <Text style={type.caption}> (you)</Text> : null}
        </Text>
        <Text style={styles.email}>{user.email}</Text>
        <Text style={type.small}>
          Joined {formatWhen(user.createdAt)} · {user.verified ? 'address verified' : 'address not verified yet'}
        </Text>
      </View>
      <ChoiceChips
        label={`Role of ${user.displayName}`}
        testID={`role-${user.email}`}
        options={roleOptions}
        // While the change is on its way, the chosen role already shows.
        value={isPending && variables ? variables.role : user.role}
        disabled={isPending}
        onChange={choose}
      />
      {isPending ? <Loading label="Changing the role…" /> : null}
      {roleMessage ? <FieldError testID={`error-role-${user.email}`} message={roleMessage} /> : null}
      {changed && !isPending && !error ? (
        <Text testID={`role-status-${user.email}`} aria-live="polite" style={type.caption}>
          Role changed to {changed}.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  body: { gap: space.lg },
  filters: { gap: space.md },
  filter: { gap: space.xs },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.sm, paddingVertical: space.md, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  who: { gap: 2 },
  email: { ...type.mono, color: colors.inkMuted },
});
