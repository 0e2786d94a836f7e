import { router } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { signInSchema } from '@/shared/schemas/auth';
import { useSignIn } from '../queries/accounts';
import { space, type } from '../theme';
import { Screen } from '../ui/Screen';
import { TextField } from '../ui/TextField';
import { TextLink } from '../ui/TextLink';
import { useViewer } from '../viewer';
import { Form } from './Form';
import { ResendVerification } from './ResendVerification';
import { useForm } from './useForm';

/**
 * Where to go after signing in: the app's own page the reader came from (path, query and hash kept),
 * else the account. Only a path of this site is followed: it is read as the browser would read it
 * (which ignores tabs and line breaks and takes a backslash for a slash), and anything that would
 * leave the site, or lead back to the sign-in screen, goes to the account instead.
 */
export function afterSignIn(next: string | undefined): string {
  if (next === undefined || !next.startsWith('/')) return '/account';
  const here = 'https://counterweight.invalid';
  let url: URL;
  try {
    url = new URL(next, here);
  } catch {
    return '/account';
  }
  if (url.origin !== here || url.pathname === '/sign-in' || url.pathname.startsWith('/sign-in/')) return '/account';
  return `${url.pathname}${url.search}${url.hash}`;
}

interface SignInScreenProps {
  /** The page to return to (`/sign-in?next=/admin`). */
  next?: string;
  /** The address to start with (`/sign-in?email=…`, from a confirmed link). */
  email?: string;
}

export function SignInScreen({ next, email = '' }: SignInScreenProps) {
  const { user } = useViewer();
  const form = useForm({
    initial: { email, password: '' },
    schema: signInSchema,
    mutation: useSignIn(),
    onSuccess: () => router.replace(afterSignIn(next)),
  });

  return (
    <Screen testID="screen-sign-in" title="Sign in">
      {user ? (
        <Text testID="signed-in-as" style={type.caption}>
          You are signed in as {user.displayName}. Signing in with another account replaces that.
        </Text>
      ) : null}
      {afterSignIn(next) !== '/account' ? (
        <Text testID="sign-in-returns" style={type.caption}>
          Once you are signed in, you go back to the page you came from.
        </Text>
      ) : null}
      <Form
        form={form}
        submitLabel="Sign in"
        busyLabel="Signing in…"
        problemAction={(problem) =>
          problem.code === 'email_unverified' ? <ResendVerification email={form.values.email.trim()} /> : null
        }
      >
        <TextField {...form.field('email')} label="E-mail address" kind="email" />
        <TextField {...form.field('password')} label="Password" kind="current-password" />
      </Form>
      <View style={styles.more}>
        <TextLink href="/forgot" testID="link-forgot">
          Forgot the password?
        </TextLink>
        <Text style={type.caption}>No account yet? Reading needs none; sending in sightings and corrections does.</Text>
        <TextLink href="/sign-up" testID="link-sign-up">
          Create an account
        </TextLink>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  more: { gap: space.xs, marginTop: space.md },
});
