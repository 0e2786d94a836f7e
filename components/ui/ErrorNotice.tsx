import { StyleSheet, Text } from 'react-native';
import { ApiError, ApiUnreachableError } from '../http/client';
import { messageWords } from '../http/fieldErrors';
import { colors, type } from '../theme';
import { Button } from './Button';
import { Notice } from './Notice';

interface ErrorNoticeProps {
  error: Error;
  /** What failed to load, in words: "the conservation laws and mechanism classes". */
  what: string;
  onRetry: () => void;
  testID?: string;
}

/** Says what went wrong with a request and what to do about it, with a way to try again. */
export function ErrorNotice({ error, what, onRetry, testID }: ErrorNoticeProps) {
  const retry = <Button label="Retry" onPress={onRetry} testID={testID && `${testID}-retry`} />;

  if (error instanceof ApiUnreachableError) {
    return (
      <Notice tone="error" role="alert" testID={testID} title="Counterweight's server could not be reached." action={retry}>
        Check that <Text style={type.mono}>npm start</Text> is running, then retry.
      </Notice>
    );
  }
  if (error instanceof ApiError) {
    return (
      <Notice tone="error" role="alert" testID={testID} title={`The server could not send ${what}.`} action={retry}>
        {messageWords(error.message)} <Text style={styles.code}>({error.code}, HTTP {error.status})</Text>{' '}
        If it keeps failing, the server's log says why.
      </Notice>
    );
  }
  return (
    <Notice tone="error" role="alert" testID={testID} title={`Something went wrong while loading ${what}.`} action={retry}>
      {error.message} Retry; if it keeps happening, report it with this message.
    </Notice>
  );
}

const styles = StyleSheet.create({
  code: { ...type.mono, color: colors.inkMuted },
});
