/**
 * Short lists of submissions: the account's own ("Your submissions", with their states) and the
 * Desk's accepted corrections of the editor's entries. Each row links to the submission.
 */
import { StyleSheet, Text, View } from 'react-native';
import { formatWhen } from '../admin/format';
import { colors, space, type } from '../theme';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { TextLink } from '../ui/TextLink';
import { useDeskCorrections, useMySubmissions } from '../queries/submissions';
import type { SubmissionSummaryDto } from '@/shared/api-types';
import { KIND_WORDS, STATUS_WORDS } from './words';

export function MySubmissions({ userId }: { userId: number }) {
  const { data, error, isPending, refetch } = useMySubmissions(userId);
  return (
    <View style={styles.root}>
      <TextLink href="/report" testID="account-report-sighting">
        Report a sighting
      </TextLink>
      {isPending ? <Loading testID="my-submissions-loading" label="Loading your submissions…" /> : null}
      {error ? <ErrorNotice testID="my-submissions-error" error={error} what="your submissions" onRetry={() => void refetch()} /> : null}
      {data && data.items.length === 0 ? (
        <Notice tone="empty" testID="my-submissions-empty" title="Nothing sent in yet.">
          Met a claim of an impossible machine? Report it as a sighting. Found an error in an entry? Open the entry and
          press “Report an error”.
        </Notice>
      ) : null}
      {data && data.items.length > 0 ? (
        <View role="list" testID="my-submissions" style={styles.list}>
          {data.items.map((s) => (
            <View role="listitem" key={s.id} testID={`my-submission-${s.id}`} style={styles.row}>
              <TextLink href={`/submissions/${s.id}`} testID={`my-submission-${s.id}-link`}>
                {s.title}
              </TextLink>
              <Text style={type.caption}>
                {KIND_WORDS[s.kind]}
                {s.entry ? ` on “${s.entry.title}”` : ''} · sent {formatWhen(s.createdAt)}
              </Text>
              <Text testID={`my-submission-${s.id}-status`} {...{ dataSet: { status: s.status } }} style={type.uiStrong}>
                {STATUS_WORDS[s.status]}
              </Text>
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

export function DeskCorrections() {
  const { data, error, isPending, refetch } = useDeskCorrections();
  if (isPending) return <Loading testID="desk-corrections-loading" label="Loading corrections…" />;
  if (error) return <ErrorNotice testID="desk-corrections-error" error={error} what="the corrections" onRetry={() => void refetch()} />;
  if (data.items.length === 0) {
    return (
      <Notice tone="empty" testID="desk-corrections-empty" title="No corrections.">
        When a moderator accepts a reported error in an entry you wrote or reviewed, it is listed here and you get an
        e-mail.
      </Notice>
    );
  }
  return (
    <View role="list" testID="desk-corrections" style={styles.list}>
      {data.items.map((s: SubmissionSummaryDto) => (
        <View role="listitem" key={s.id} testID={`desk-correction-${s.id}`} style={styles.row}>
          <TextLink href={`/submissions/${s.id}`} testID={`desk-correction-${s.id}-link`}>
            {s.title}
          </TextLink>
          <Text style={type.caption}>
            {s.entry ? `${s.entry.title}, version ${s.entry.version} · ` : ''}reported by {s.submitter.displayName},{' '}
            {formatWhen(s.createdAt)}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
});
