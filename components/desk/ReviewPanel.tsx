import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { useDraftAction } from '../queries/drafts';
import { useEntry } from '../queries/entries';
import type { DraftDto, EntryResponse } from '@/shared/api-types';
import { DiffView } from '../entry/DiffView';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { ProblemNotice } from '../auth/Form';
import { problemOf } from '../auth/useForm';
import { space, type } from '../theme';
import { Button } from '../ui/Button';
import { EditorField } from './EditorField';

/**
 * For an editor reviewing someone else's draft: what it changes against the published version (for
 * a revision), then approve it with a change note (publishing the next version, and going to it), or
 * send it back to its author with the reason.
 */
export function ReviewPanel({ draft }: { draft: DraftDto }) {
  const [changeNote, setChangeNote] = useState('');
  const [reason, setReason] = useState('');
  const action = useDraftAction();
  const [missing, setMissing] = useState<'changeNote' | 'reason' | null>(null);

  const approve = () => {
    if (!changeNote.trim()) return setMissing('changeNote');
    setMissing(null);
    // mutateAsync, not mutate's callbacks: the draft is fetched again once approved (its address now
    // answers draft_published), which replaces this panel before a callback of mutate() would run.
    action
      .mutateAsync({ id: draft.id, action: 'approve', changeNote: changeNote.trim() })
      .then((result) => {
        // The answer is the version just published: the reviewer lands on its permanent address.
        const number = (result as Partial<EntryResponse> | undefined)?.version?.number;
        router.replace(number ? `/entries/${draft.slug}/v/${number}` : `/entries/${draft.slug}`);
      })
      .catch(() => undefined); // shown from action.error
  };
  const sendBack = () => {
    if (!reason.trim()) return setMissing('reason');
    setMissing(null);
    action
      .mutateAsync({ id: draft.id, action: 'send-back', reason: reason.trim() })
      .then(() => router.replace('/desk'))
      .catch(() => undefined); // shown from action.error
  };
  const pending = action.isPending ? action.variables?.action : undefined;

  return (
    <View testID="review-panel" style={styles.root}>
      <Text style={type.body}>
        Written by {draft.author.displayName}. Read it through against its sources and run its worksheets; approving
        publishes it as the next version under your name as reviewer.
      </Text>
      <Changes draft={draft} />
      <View testID="change-note" style={styles.group}>
        <EditorField
          name="change-note"
          label="Change note"
          lines={2}
          value={changeNote}
          onChangeText={setChangeNote}
          hint="What this version changes, for readers of the versions list."
          error={missing === 'changeNote' ? 'Say what this version changes.' : undefined}
        />
        <Button testID="approve" label="Approve and publish" busyLabel="Publishing…" busy={pending === 'approve'} disabled={action.isPending} onPress={approve} />
      </View>
      <View style={styles.group}>
        <EditorField
          name="send-back-reason"
          label="Reason for sending it back"
          lines={3}
          value={reason}
          onChangeText={setReason}
          hint="The author gets this by e-mail with the draft."
          error={missing === 'reason' ? 'Tell the author what needs to change.' : undefined}
        />
        <Button testID="send-back" variant="quiet" label="Send back to the author" busyLabel="Sending back…" busy={pending === 'send-back'} disabled={action.isPending} onPress={sendBack} />
      </View>
      <ProblemNotice testID="review-error" problem={action.error ? problemOf(action.error) : null} />
    </View>
  );
}

/** A revision against the version readers see now, section by section; a new entry has nothing to compare with. */
function Changes({ draft }: { draft: DraftDto }) {
  return (
    <View testID="review-changes" style={styles.group}>
      <Text role="heading" aria-level={2} style={type.title}>
        What this draft changes
      </Text>
      {draft.basedOn === null ? (
        <Text testID="review-new-entry" style={type.body}>
          A new entry: nothing of it is published yet, so every section below is new. Read it whole.
        </Text>
      ) : (
        <Published draft={draft} />
      )}
    </View>
  );
}

function Published({ draft }: { draft: DraftDto }) {
  const { data, error, isPending, refetch } = useEntry(draft.slug);
  if (isPending) return <Loading testID="review-diff-loading" label="Loading the published version…" />;
  if (error) return <ErrorNotice testID="review-diff-error" error={error} what="the published version" onRetry={() => void refetch()} />;
  return <DiffView from={{ label: `version ${data.version.number}, as published`, content: data.version.content }} to={{ label: 'this draft', content: draft.content }} />;
}

const styles = StyleSheet.create({
  root: { gap: space.lg },
  group: { gap: space.sm },
});
