import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { UserDto } from '@/shared/api-types';
import { changePasswordSchema, updateAccountSchema } from '@/shared/schemas/auth';
import { useChangePassword, useSession, useSignOut, useUpdateAccount } from '../queries/accounts';
import { Form, ProblemNotice } from '../auth/Form';
import { newPasswordHint } from '../auth/passwordHint';
import { problemOf, useForm } from '../auth/useForm';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Screen, Section } from '../ui/Screen';
import { TextField } from '../ui/TextField';
import { TextLink } from '../ui/TextLink';
import { MySubmissions } from '../submissions/SubmissionLists';
import { roleRights } from './roles';

/** A reader's way in (what an account gives, sign in, register); for the signed-in, their account. */
export function AccountScreen() {
  const { data, error, isPending, refetch } = useSession();

  let content;
  if (isPending) content = <Loading testID="session-loading" label="Checking who is signed in…" />;
  else if (error) content = <ErrorNotice testID="session-error" error={error} what="who is signed in" onRetry={() => void refetch()} />;
  else if (data.user) content = <SignedIn key={data.user.id} user={data.user} />;
  else content = <ReaderWelcome />;

  return (
    <Screen testID="screen-account" title="Account">
      {content}
    </Screen>
  );
}

const accountGives = [
  'Send in sightings: claims of impossible machines you meet, with their figures, for moderators to match with entries.',
  'Report corrections against a specific version of an entry.',
  'Keep your claim checks and come back to them.',
];

function ReaderWelcome() {
  return (
    <>
      <Text style={type.reading}>
        Searching and reading entries, running worksheets and claim checks, citing and exporting need no account.
      </Text>
      <Section title="What an account adds">
        <View role="list" style={styles.list}>
          {accountGives.map((line) => (
            <View role="listitem" key={line} style={styles.listItem}>
              <View style={styles.mark} />
              <Text style={[type.body, styles.listText]}>{line}</Text>
            </View>
          ))}
        </View>
        <Text style={[type.caption, styles.after]}>
          Editors, moderators and admins sign in here too; an admin gives them their role.
        </Text>
      </Section>
      <View style={styles.entry}>
        <TextLink href="/sign-in" testID="account-sign-in">
          Sign in
        </TextLink>
        <TextLink href="/sign-up" testID="account-sign-up">
          Create an account
        </TextLink>
      </View>
    </>
  );
}

function SignedIn({ user }: { user: UserDto }) {
  const signOut = useSignOut();
  return (
    <>
      <Section title="You">
        <View style={styles.facts}>
          <Fact label="E-mail address">
            <Text testID="account-email" style={type.mono}>
              {user.email}
            </Text>
          </Fact>
          <Fact label="Role">
            <Text testID="account-role" style={styles.role}>
              {user.role}
            </Text>
            <Text style={type.caption}>{roleRights[user.role]}</Text>
          </Fact>
        </View>
        <DisplayNameForm user={user} />
      </Section>
      <Section title="Your submissions">
        <MySubmissions userId={user.id} />
      </Section>
      <Section title="Password">
        <PasswordForm />
      </Section>
      <Section title="Sign out">
        <View style={styles.signOut}>
          <Text style={type.body}>Ends this session in this browser. Your account and what you sent in stay.</Text>
          <ProblemNotice testID="sign-out-error" problem={signOut.error ? problemOf(signOut.error) : null} />
          <Button
            testID="sign-out"
            variant="quiet"
            label="Sign out"
            busyLabel="Signing out…"
            busy={signOut.isPending}
            onPress={() => signOut.mutate()}
          />
        </View>
      </Section>
    </>
  );
}

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <View style={styles.fact}>
      <Text style={type.caption}>{label}</Text>
      {children}
    </View>
  );
}

function DisplayNameForm({ user }: { user: UserDto }) {
  const form = useForm({ initial: { displayName: user.displayName }, schema: updateAccountSchema, mutation: useUpdateAccount() });
  return (
    <View style={styles.form}>
      <Form testID="form-displayName" form={form} submitLabel="Save the name" busyLabel="Saving…">
        <TextField {...form.field('displayName')} label="Name shown to others" kind="name" hint="2 to 80 characters." />
      </Form>
      {form.succeeded ? (
        <Text testID="account-saved" aria-live="polite" style={type.caption}>
          Saved: others now see you as {form.succeeded.user.displayName}.
        </Text>
      ) : null}
    </View>
  );
}

function PasswordForm() {
  const form = useForm({
    initial: { currentPassword: '', newPassword: '' },
    schema: changePasswordSchema,
    mutation: useChangePassword(),
    clearOnSuccess: true,
  });
  return (
    <View style={styles.form}>
      <Form testID="form-password" form={form} submitLabel="Change the password" busyLabel="Changing…">
        <TextField {...form.field('currentPassword')} label="Current password" kind="current-password" />
        <TextField {...form.field('newPassword')} label="New password" kind="new-password" hint={newPasswordHint} />
      </Form>
      {form.succeeded ? (
        <Text testID="password-changed" aria-live="polite" style={type.caption}>
          Password changed. Use the new one the next time you sign in.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  listItem: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  mark: { width: 6, height: 6, marginTop: 10, borderRadius: radius.pill, backgroundColor: colors.brass },
  listText: { flex: 1 },
  after: { marginTop: space.md },
  entry: { gap: space.sm, marginTop: space.lg },
  facts: { gap: space.md, marginBottom: space.lg },
  fact: { gap: space.xxs },
  role: { ...type.uiStrong, color: colors.teal },
  form: { gap: space.sm },
  signOut: { gap: space.sm },
});
