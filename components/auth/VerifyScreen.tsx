import { useEffect, useRef } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { verifySchema } from '@/shared/schemas/auth';
import { ApiError } from '../http/client';
import { useVerify } from '../queries/accounts';
import { space, type } from '../theme';
import { Button } from '../ui/Button';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { ResendVerification } from './ResendVerification';

/** Titles for the ways a link can fail; the server's message says the rest. */
const failures: Record<string, string> = {
  token_expired: 'This link has expired.',
  token_used: 'This link has already been used.',
  token_invalid: 'This link is not valid.',
};

/** Opened from the e-mailed link (`/verify?token=…`): verifies the address at once, then offers sign-in. */
export function VerifyScreen({ token = '' }: { token?: string }) {
  const body = verifySchema.safeParse({ token });
  const verify = useVerify();
  const { mutate } = verify;
  const sent = useRef(false);

  useEffect(() => {
    // The token works once: send it once, however often the screen renders.
    const parsed = verifySchema.safeParse({ token });
    if (sent.current || !parsed.success) return;
    sent.current = true;
    mutate(parsed.data);
  }, [token, mutate]);

  let content;
  if (!body.success) {
    content = <Failure title="This link is incomplete." message={body.error.issues[0].message} />;
  } else if (verify.isSuccess) {
    const { email } = verify.data.user;
    content = (
      <>
        <Notice tone="success" testID="verify-done" title="Your e-mail address is verified.">
          {email} can now sign in and send in sightings and corrections.
        </Notice>
        <TextLink href={`/sign-in?email=${encodeURIComponent(email)}`} testID="verify-sign-in">
          Sign in
        </TextLink>
      </>
    );
  } else if (verify.isError) {
    const error = verify.error;
    const apiError = error instanceof ApiError && error.status < 500;
    content = apiError ? (
      <Failure title={failures[error.code] ?? 'The address could not be verified.'} message={error.message} />
    ) : (
      <Notice
        role="alert"
        testID="verify-error"
        title="The address could not be verified just now."
        action={<Button testID="verify-retry" label="Try again" onPress={() => verify.mutate(body.data)} />}
      >
        {error.message} The link has not been used up; try again in a moment.
      </Notice>
    );
  } else {
    content = <Loading testID="verify-pending" label="Verifying your e-mail address…" />;
  }

  return (
    <Screen testID="screen-verify" title="Verify your e-mail address">
      {content}
    </Screen>
  );
}

/** A link that cannot verify anything: why, and how to get a new one or sign in. */
function Failure({ title, message }: { title: string; message: string }) {
  return (
    <>
      <Notice role="alert" testID="verify-error" title={title}>
        {message}
      </Notice>
      <View style={styles.next}>
        <Text style={type.heading}>Get a new link</Text>
        <Text style={type.body}>Give the address you signed up with and a new verification link is sent to it.</Text>
        <ResendVerification />
      </View>
      <View style={styles.next}>
        <Text style={type.caption}>Verified the address already?</Text>
        <TextLink href="/sign-in" testID="verify-sign-in">
          Sign in
        </TextLink>
      </View>
    </>
  );
}

const styles = StyleSheet.create({
  next: { gap: space.xs, marginTop: space.md },
});
