import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { can } from '@/shared/policies';
import { serverFieldErrors } from '../http/fieldErrors';
import { useRetireEntry } from '../queries/entries';
import { ProblemNotice } from '../auth/Form';
import { problemOf } from '../auth/useForm';
import { Field } from '../submissions/Field';
import { space, type } from '../theme';
import { Button } from '../ui/Button';
import { useViewer } from '../viewer';

/**
 * For editors (and admins) on a published entry: retire it with a reason, optionally naming the
 * published entry that replaces it. A retired entry is not deleted: its pages and every version stay
 * reachable and citable, with a notice (and a link to the successor).
 */
export function RetirePanel({ slug, title }: { slug: string; title: string }) {
  const { role } = useViewer();
  const retire = useRetireEntry(slug);
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const [successor, setSuccessor] = useState('');
  if (!can(role, 'entries.retire')) return null;
  if (!open) return <Button testID="retire-open" variant="quiet" label="Retire…" onPress={() => setOpen(true)} />;

  const fields = serverFieldErrors(retire.error);
  const send = () => retire.mutate({ reason: reason.trim(), ...(successor.trim() ? { successor: successor.trim() } : {}) });
  return (
    <View testID="retire-panel" style={styles.root}>
      <Text style={type.uiStrong}>Retire “{title}”</Text>
      <Text style={type.small}>
        Readers will see a notice with your reason; the entry and its versions stay here and citable. It takes no new drafts once retired.
      </Text>
      <Field label="Why it is retired" testID="retire-reason" value={reason} onChangeText={setReason} multiline error={fields['body.reason']} />
      <Field
        label="Entry that replaces it (optional)"
        testID="retire-successor"
        value={successor}
        onChangeText={setSuccessor}
        kind="mono"
        placeholder="its permalink, e.g. closed-cavity-thrust"
        error={fields['body.successor']}
      />
      <ProblemNotice testID="retire-error" problem={retire.error && !Object.keys(fields).length ? problemOf(retire.error) : null} />
      <View style={styles.actions}>
        <Button testID="retire-confirm" label="Retire this entry" busyLabel="Retiring…" busy={retire.isPending} disabled={!reason.trim()} onPress={send} />
        <Button testID="retire-cancel" variant="quiet" label="Cancel" onPress={() => setOpen(false)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
