import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import type { FormProblem } from './useForm';

interface FormProps {
  form: { problem: FormProblem | null; submit: () => void; sending: boolean };
  submitLabel: string;
  /** What the button says while the form is on its way ("Signing in…"). */
  busyLabel: string;
  /** The form's TextFields. */
  children: ReactNode;
  /** What the reader can do about the form's problem (send the link again, ask for a new one). */
  problemAction?: (problem: FormProblem) => ReactNode;
  testID?: string;
}

/** A form: its fields, what went wrong with it as a whole, and its one button (`submit`). */
export function Form({ form, submitLabel, busyLabel, children, problemAction, testID }: FormProps) {
  return (
    <View testID={testID} style={styles.form}>
      <View style={styles.fields}>{children}</View>
      <ProblemNotice problem={form.problem} action={form.problem && problemAction?.(form.problem)} />
      <Button testID="submit" label={submitLabel} busyLabel={busyLabel} busy={form.sending} onPress={form.submit} />
    </View>
  );
}

/** The form's problem in the server's words (or ours when there was no answer), read out as it appears. */
export function ProblemNotice({
  problem,
  action,
  testID = 'form-error',
}: {
  problem: FormProblem | null;
  action?: ReactNode;
  testID?: string;
}) {
  if (!problem) return null;
  return (
    <Notice role="alert" testID={testID} title={problem.message} action={action}>
      {problem.code === 'unreachable' ? 'If it keeps failing, check that npm start is running.' : undefined}
    </Notice>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  fields: { gap: space.md },
});
