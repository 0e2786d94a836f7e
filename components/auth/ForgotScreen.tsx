import { StyleSheet, Text, View } from 'react-native';
import { emailOnlySchema } from '@/shared/schemas/auth';
import { useForgotPassword } from '../queries/accounts';
import { space, type } from '../theme';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { TextField } from '../ui/TextField';
import { TextLink } from '../ui/TextLink';
import { Form } from './Form';
import { useForm } from './useForm';

/** Asks for a link to set a new password; says the same whether or not the address has an account. */
export function ForgotScreen() {
  const form = useForm({ initial: { email: '' }, schema: emailOnlySchema, mutation: useForgotPassword() });

  return (
    <Screen
      testID="screen-forgot"
      title="Forgot the password"
      lead="Give the e-mail address of your account and a link to set a new password is sent to it. The link works once, within one hour."
    >
      {form.succeeded ? (
        <Notice tone="success" testID="forgot-done" title="Look in your inbox.">
          If an account uses {form.values.email.trim()}, a link to set a new password is on its way. Nothing after a
          few minutes? Check the address and the spam folder, then send it again.
        </Notice>
      ) : null}
      <Form form={form} submitLabel={form.succeeded ? 'Send it again' : 'Send the link'} busyLabel="Sending…">
        <TextField {...form.field('email')} label="E-mail address" kind="email" />
      </Form>
      <View style={styles.more}>
        <Text style={type.caption}>Remembered it?</Text>
        <TextLink href="/sign-in" testID="link-sign-in">
          Sign in
        </TextLink>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  more: { gap: space.xs, marginTop: space.md },
});
