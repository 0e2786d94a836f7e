/**
 * Saving a claim check and sharing it by link, and the account's own saved checks with a way to
 * delete each. Signed out, Save goes by the sign-in screen and comes back to the same check.
 */
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { confirmChange } from '../admin/confirm';
import { ApiError } from '../http/client';
import { useDeleteSavedClaimCheck, useMySavedClaimChecks, useSaveClaimCheck } from '../queries/claimChecks';
import type { ClaimCheckRequest } from '@/shared/api-types';
import { formatDay } from '../entry/format';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { TextLink } from '../ui/TextLink';
import { CopyButton } from './CopyButton';

/** Signed out: where saving would be. */
export function SignInToSave({ next = '/check' }: { next?: string }) {
  return (
    <Text testID="claim-sign-in-to-save" style={type.caption}>
      <TextLink inline href={`/sign-in?next=${encodeURIComponent(next)}`} testID="claim-sign-in">
        Sign in
      </TextLink>{' '}
      to save this check and share it by link.
    </Text>
  );
}

interface SavePanelProps {
  /** What produced the result on screen: saved exactly so (the server computes it again). */
  request: ClaimCheckRequest;
  /** The figures were changed since that result; saving keeps the result on screen. */
  unsavedEdits: boolean;
  signedIn: boolean;
  /**
   * Signed out: keep the check and go to the sign-in screen, which comes back here. Answers false
   * when the browser would not keep it (storage turned off), and nothing happens.
   */
  onSignInToSave: () => boolean;
  /** Saved: the kept copy is no longer needed. */
  onSaved?: () => void;
  /** The reader just came back from signing in to save this check. */
  resumed?: boolean;
}

/** "Save and get a link", then the link with a copy button; signed out, the same button goes by the sign-in screen. */
export function SavePanel({ request, unsavedEdits, signedIn, onSignInToSave, onSaved, resumed = false }: SavePanelProps) {
  const save = useSaveClaimCheck();
  const [notKept, setNotKept] = useState(false);
  const saved = save.data?.saved;
  // A link for another request than the one on screen is not this check's.
  const current = saved && save.variables === request ? saved : undefined;
  const onSave = () => {
    if (!signedIn) {
      setNotKept(!onSignInToSave());
      return;
    }
    save.mutate(request, { onSuccess: () => onSaved?.() });
  };

  return (
    <View style={styles.root}>
      {resumed && signedIn && !current ? (
        <Text testID="claim-resumed" role="status" style={type.uiStrong}>
          You are signed in, and your check is as you left it. Save it to get its link.
        </Text>
      ) : null}
      <Text style={type.caption}>
        Saving stores the text, the figures and this result under a link that only those you give it to can find.
        {signedIn ? '' : ' It needs an account: you sign in, and come back to this check to save it.'}
        {unsavedEdits ? ' It saves the result shown; the figures you are changing are not in it until the checks have run again.' : ''}
      </Text>
      <Button
        testID="claim-save"
        label={signedIn ? 'Save and get a link' : 'Sign in and save'}
        busy={save.isPending}
        busyLabel="Saving…"
        onPress={onSave}
      />
      {notKept ? (
        <Text testID="claim-save-not-kept" role="alert" style={type.body}>
          This browser would not keep the check while you sign in (its site storage is turned off), so it would be lost.
          Copy the paragraph first, or{' '}
          <TextLink inline href="/sign-in?next=%2Fcheck" testID="claim-sign-in">
            sign in
          </TextLink>{' '}
          and run the check again.
        </Text>
      ) : null}
      {save.error && save.variables === request ? (
        <ErrorNotice testID="claim-save-error" error={save.error} what="the saved check" onRetry={onSave} />
      ) : null}
      {current ? (
        <View testID="claim-share" style={styles.share}>
          <Text role="status" style={type.uiStrong}>
            Saved. Anyone with this link sees this check:
          </Text>
          <Text testID="claim-share-url" selectable style={styles.url}>
            {current.url}
          </Text>
          <CopyButton testID="claim-share-copy" label="Copy link" text={current.url} fallback="the link above" />
        </View>
      ) : null}
    </View>
  );
}

/** "Your saved checks", newest first, each with its link and Delete. */
export function SavedList() {
  const list = useMySavedClaimChecks(true);
  const remove = useDeleteSavedClaimCheck();

  if (list.isPending) return <Loading testID="claim-saved-loading" label="Loading your saved checks…" />;
  if (list.error) {
    return <ErrorNotice testID="claim-saved-error" error={list.error} what="your saved checks" onRetry={() => void list.refetch()} />;
  }
  const saved = list.data.saved;
  if (saved.length === 0) {
    return (
      <Text testID="claim-saved-none" style={type.caption}>
        None yet. Run a check and save it to get a link you can share.
      </Text>
    );
  }
  const onDelete = (token: string, preview: string) =>
    confirmChange(
      'Delete this saved check?',
      `“${preview}” — its link will stop working for everyone you shared it with.`,
      'Delete',
      () => remove.mutate(token),
    );

  return (
    <View style={styles.root}>
      {remove.error ? (
        <ErrorNotice
          testID="claim-saved-delete-error"
          error={remove.error}
          what="the deletion"
          onRetry={() => remove.variables && remove.mutate(remove.variables)}
        />
      ) : null}
      <View role="list" aria-label="Your saved checks" testID="claim-saved-list" style={styles.list}>
        {saved.map((s) => (
          <View role="listitem" key={s.token} testID={`claim-saved-${s.token}`} style={styles.row}>
            <Text style={type.body} numberOfLines={2}>
              {s.preview}
            </Text>
            <Text style={type.caption}>
              Saved {formatDay(s.createdAt)}
              {s.topMatch ? ` · best match: ${s.topMatch}` : ''}
            </Text>
            <View style={styles.actions}>
              <TextLink href={`/check/${s.token}`} testID={`claim-saved-${s.token}-open`}>
                Open
              </TextLink>
              <Button
                testID={`claim-saved-${s.token}-delete`}
                variant="quiet"
                label="Delete"
                busy={remove.isPending && remove.variables === s.token}
                busyLabel="Deleting…"
                onPress={() => onDelete(s.token, s.preview)}
              />
            </View>
          </View>
        ))}
      </View>
    </View>
  );
}

/** Whether an error is the server's "no such saved check". */
export const isNotFound = (error: unknown) => error instanceof ApiError && error.status === 404;

const styles = StyleSheet.create({
  root: { gap: space.sm },
  share: { gap: space.xs },
  url: { ...type.mono, fontSize: 13, color: colors.ink },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, marginTop: space.xxs },
});
