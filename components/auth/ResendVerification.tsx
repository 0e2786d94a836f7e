import { StyleSheet, Text, View } from 'react-native';
import { emailOnlySchema } from '@/shared/schemas/auth';
import { useResendVerification } from '../queries/accounts';
import { space, type } from '../theme';
import { Button } from '../ui/Button';
import { TextField } from '../ui/TextField';
import { ProblemNotice } from './Form';
import { useForm } from './useForm';

/**
 * Sends the confirmation link again: one button when the address is known (after sign-up, or a
 * sign-in refused for an unconfirmed address), the address and a button when it is not.
 */
export function ResendVerification({ email }: { email?: string }) {
  const form = useForm({ initial: { email: email ?? '' }, schema: emailOnlySchema, mutation: useResendVerification() });
  return (
    <View style={styles.box}>
      {email ? null : <TextField {...form.field('email')} label="E-mail address of the account" kind="email" />}
      <ProblemNotice testID="resend-error" problem={form.problem} />
      <Button
        testID="resend"
        variant={email ? 'quiet' : 'primary'}
        label="Send the link again"
        busyLabel="Sending…"
        busy={form.sending}
        onPress={form.submit}
      />
      {form.succeeded ? (
        <Text testID="resend-status" aria-live="polite" style={type.caption}>
          If {form.values.email.trim()} belongs to an account that still needs confirming, a new link is on its way. It
          works once, within 24 hours.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
});
