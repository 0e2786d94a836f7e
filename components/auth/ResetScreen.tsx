import { StyleSheet, Text, View } from 'react-native';
import { resetSchema, tokenSchema } from '@/shared/schemas/auth';
import { useResetPassword } from '../queries/accounts';
import { space, type } from '../theme';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { TextField } from '../ui/TextField';
import { TextLink } from '../ui/TextLink';
import { Form } from './Form';
import { newPasswordHint } from './passwordHint';
import { useForm } from './useForm';

/** Opened from the e-mailed link (`/reset?token=…`): a new password, typed twice, sent once. */
export function ResetScreen({ token = '' }: { token?: string }) {
  const form = useForm({
    initial: { password: '', password2: '' },
    schema: resetSchema,
    body: ({ password }) => ({ token, password }),
    check: ({ password, password2 }) => (password2 === password ? {} : { password2: 'the two passwords differ: type the same one twice' }),
    mutation: useResetPassword(),
    clearOnSuccess: true,
  });
  const link = tokenSchema.safeParse(token);

  if (form.succeeded) {
    return (
      <Screen testID="screen-reset" title="Password changed">
        <Notice tone="success" testID="reset-done" title="Your new password is set.">
          Every session of this account has been signed out, on every device. Sign in with the new password.
        </Notice>
        <TextLink href="/sign-in" testID="reset-sign-in">
          Sign in
        </TextLink>
      </Screen>
    );
  }

  return (
    <Screen testID="screen-reset" title="Set a new password">
      {link.success ? (
        <Form
          form={form}
          submitLabel="Save the new password"
          busyLabel="Saving…"
          // The token's own errors, or a token the server refused as a field: either way, a new link helps.
          problemAction={(problem) =>
            problem.code.startsWith('token_') || problem.code === 'validation_failed' ? <NewLink /> : null
          }
        >
          <TextField {...form.field('password')} label="New password" kind="new-password" hint={newPasswordHint} />
          <TextField {...form.field('password2')} label="The same password again" kind="new-password" />
        </Form>
      ) : (
        <Notice role="alert" testID="form-error" title="This link is incomplete." action={<NewLink />}>
          {link.error.issues[0].message}
        </Notice>
      )}
    </Screen>
  );
}

/** The way to a fresh link when this one cannot be used. */
function NewLink() {
  return (
    <View style={styles.newLink}>
      <Text style={type.caption}>Links to set a password work once, within one hour.</Text>
      <TextLink href="/forgot" testID="reset-new-link">
        Ask for a new link
      </TextLink>
    </View>
  );
}

const styles = StyleSheet.create({
  newLink: { gap: space.xxs },
});
