import { router } from 'expo-router';
import { View } from 'react-native';
import { problemOf } from '../auth/useForm';
import { ProblemNotice } from '../auth/Form';
import { openDraftOf, useReviseEntry } from '../queries/drafts';
import { can } from '@/shared/policies';
import { Button } from '../ui/Button';
import { useViewer } from '../viewer';

/**
 * For editors (and admins) on a published entry: start a new draft from its latest version and
 * open it on the Desk; if a draft of it is already open, open that one. Readers keep seeing the
 * published version until the revision is approved.
 */
export function ReviseButton({ slug }: { slug: string }) {
  const { role } = useViewer();
  const revise = useReviseEntry();
  if (!can(role, 'entries.startDraft')) return null;

  const start = () =>
    revise.mutate(slug, {
      onSuccess: ({ draft }) => router.push(`/desk/drafts/${draft.id}`),
      onError: (error) => {
        const open = openDraftOf(error);
        if (open) router.push(`/desk/drafts/${open}`);
      },
    });
  const failed = revise.error && openDraftOf(revise.error) === undefined ? problemOf(revise.error) : null;

  return (
    <View>
      <Button testID="revise" label="Revise" busyLabel="Starting a draft…" busy={revise.isPending} variant="quiet" onPress={start} />
      <ProblemNotice testID="revise-error" problem={failed} />
    </View>
  );
}
