/**
 * A saved claim check, opened from its share link (`/check/<token>`): the result as saved, read
 * only (the paragraph first, its four variants at hand), with a way to open it in the claim check
 * and re-run it; its owner may delete it.
 */
import { useState } from 'react';
import type { ParagraphVariant } from '@/shared/claims/types';
import { StyleSheet, Text, View } from 'react-native';
import { confirmChange } from '../admin/confirm';
import { useSession } from '../queries/accounts';
import { CITATION_STYLE_LABEL } from '@/shared/api-types';
import { useDeleteSavedClaimCheck, useSavedClaimCheck } from '../queries/claimChecks';
import { formatDay } from '../entry/format';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { ClaimCaution } from './ClaimCheckParts';
import { CheckRuns, ClaimNotes, FigureTable, MatchList, NEEDS_TITLE, NeedsList, ParagraphPanel } from './ResultParts';
import { isNotFound, SignInToSave } from './Saving';
import { WhereInText } from './WhereInText';

export function SavedClaimCheckScreen({ token }: { token: string }) {
  const query = useSavedClaimCheck(token);
  const remove = useDeleteSavedClaimCheck();
  const session = useSession();
  const [deleted, setDeleted] = useState(false);
  /** The variant chosen here; until then, the one it was saved with. */
  const [variant, setVariant] = useState<ParagraphVariant | null>(null);

  if (query.isPending) {
    return (
      <Screen testID="screen-claim-saved" title="Saved claim check">
        <Loading testID="claim-saved-loading" label="Opening the saved check…" />
      </Screen>
    );
  }
  if (query.error) {
    if (isNotFound(query.error)) {
      return (
        <Screen testID="screen-claim-saved-not-found" title="No saved check here">
          {deleted ? (
            <Text testID="claim-deleted" role="status" style={type.uiStrong}>
              Deleted. This link now answers “not found” for everyone.
            </Text>
          ) : null}
          <Notice tone="error" testID="claim-saved-not-found" title="There is no saved claim check at this link.">
            It was deleted by the account that saved it, or the link is mistyped. Check the link with whoever sent it.
          </Notice>
          <TextLink href="/check" testID="claim-saved-new">
            Check a claim yourself
          </TextLink>
        </Screen>
      );
    }
    return (
      <Screen testID="screen-claim-saved" title="Saved claim check">
        <ErrorNotice testID="claim-saved-error" error={query.error} what="the saved check" onRetry={() => void query.refetch()} />
      </Screen>
    );
  }

  const { saved } = query.data;
  const { result } = saved;
  const shownVariant = variant ?? (result.variant as ParagraphVariant | undefined) ?? 'referee';
  const needs = (result.needs as typeof result.needs | undefined) ?? [];
  const onDelete = () =>
    confirmChange('Delete this saved check?', 'Its link will stop working for everyone you shared it with.', 'Delete', () =>
      remove.mutate(token, { onSuccess: () => setDeleted(true) }),
    );

  return (
    <Screen
      testID="screen-claim-saved"
      title="Saved claim check"
      lead={`Saved ${formatDay(saved.createdAt)}. The result as it was computed then, with the paragraph in ${CITATION_STYLE_LABEL[saved.style]}.`}
    >
      <ClaimCaution />
      <View style={styles.actions}>
        <TextLink href={`/check?from=${encodeURIComponent(token)}`} testID="claim-open">
          Open in the claim check
        </TextLink>
        {saved.mine ? (
          <Button testID="claim-saved-delete" variant="quiet" label="Delete" busy={remove.isPending} busyLabel="Deleting…" onPress={onDelete} />
        ) : null}
      </View>
      {remove.error ? <ErrorNotice testID="claim-delete-error" error={remove.error} what="the deletion" onRetry={onDelete} /> : null}
      {!session.data?.user ? <SignInToSave next={`/check/${token}`} /> : null}

      <View testID="claim-result">
        <Section title="Paragraph to paste">
          <ParagraphPanel result={result} variant={shownVariant} onVariant={setVariant} />
        </Section>
        <Section title="The claim">
          <Text testID="claim-saved-text" selectable numberOfLines={12} style={[type.body, styles.text]}>
            {saved.text}
          </Text>
        </Section>
        <ClaimNotes notes={result.notes} />
        <Section title="Matching entries">
          <MatchList matches={result.matches} />
        </Section>
        <Section title="Figures found">
          <FigureTable figures={result.figures} />
          <WhereInText text={saved.text} figures={result.figures} />
        </Section>
        <Section title="Checks run">
          <CheckRuns runs={result.checks} />
        </Section>
        {needs.length > 0 ? (
          <Section title={NEEDS_TITLE}>
            <NeedsList needs={needs} editable={false} />
          </Section>
        ) : null}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  text: {
    backgroundColor: colors.surface,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: radius.sm,
    padding: space.sm,
  },
});
