import { StyleSheet, Text, View } from 'react-native';
import { signUpSchema } from '@/shared/schemas/auth';
import { useSignUp } from '../queries/accounts';
import { space, type } from '../theme';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { TextField } from '../ui/TextField';
import { TextLink } from '../ui/TextLink';
import { Form } from './Form';
import { newPasswordHint } from './passwordHint';
import { ResendVerification } from './ResendVerification';
import { useForm } from './useForm';

/** Registration: e-mail, the name others see, a password; then the confirmation link by e-mail. */
export function SignUpScreen() {
  const form = useForm({
    initial: { email: '', displayName: '', password: '' },
    schema: signUpSchema,
    mutation: useSignUp(),
    clearOnSuccess: true,
  });

  if (form.succeeded) {
    const { email } = form.succeeded.user;
    return (
      <Screen testID="screen-sign-up" title="Check your e-mail">
        <Notice tone="success" testID="sign-up-done" title={`A confirmation link is on its way to ${email}.`}>
          Open it within 24 hours to confirm the address; then sign in. Until then the account cannot be used.
        </Notice>
        <View style={styles.more}>
          <Text style={type.caption}>Nothing after a few minutes? Look in the spam folder, or have the link sent again.</Text>
          <ResendVerification email={email} />
        </View>
      </Screen>
    );
  }

  return (
    <Screen
      testID="screen-sign-up"
      title="Create an account"
      lead="With a confirmed e-mail address you can send in sightings and corrections and keep your claim checks. Reading, worksheets and citing need no account."
    >
      <Form form={form} submitLabel="Create the account" busyLabel="Creating the account…">
        <TextField {...form.field('email')} label="E-mail address" kind="email" hint="The confirmation link goes here." />
        <TextField
          {...form.field('displayName')}
          label="Name shown to others"
          kind="name"
          hint="Shown beside what you send in; 2 to 80 characters."
        />
        <TextField {...form.field('password')} label="Password" kind="new-password" hint={newPasswordHint} />
      </Form>
      <View style={styles.more}>
        <Text style={type.caption}>Already have an account?</Text>
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
