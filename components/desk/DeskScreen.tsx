import { router } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { RoleGate } from '../account/RoleGate';
import { formatWhen } from '../admin/format';
import { useDesk } from '../queries/drafts';
import type { DraftSummaryDto, PublishedSummaryDto } from '@/shared/api-types';
import { formatDay } from '../entry/format';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { SITE_NAME, usePageTitle } from '../ui/usePageTitle';
import { DeskCorrections } from '../submissions/SubmissionLists';

/** Where editors work: their drafts, the drafts waiting for their review, what was published lately. */
export function DeskScreen() {
  usePageTitle(`Desk — ${SITE_NAME}`, 'Where editors write, review and publish the entries of Counterweight.');
  return (
    <Screen
      testID="screen-desk"
      title="Desk"
      lead="Your drafts, the drafts of other editors waiting for your review, and what was published recently."
    >
      <RoleGate section="desk">
        <Button testID="new-entry" label="New entry" onPress={() => router.push('/desk/new')} />
        <TextLink href="/desk/synonyms" testID="desk-synonyms">
          Synonyms the claim check uses
        </TextLink>
        <DeskLists />
      </RoleGate>
    </Screen>
  );
}

function DeskLists() {
  const { data, error, isPending, refetch } = useDesk();
  if (isPending) return <Loading testID="desk-loading" label="Loading the Desk…" />;
  if (error) return <ErrorNotice testID="desk-error" error={error} what="the Desk" onRetry={() => void refetch()} />;
  return (
    <>
      <Section title="My drafts">
        <DraftList
          testID="desk-mine"
          drafts={data.mine}
          empty="You have no open drafts. Start a new entry, or open a published entry and press Revise."
        />
      </Section>
      <Section title="Waiting for my review">
        <DraftList
          testID="desk-review"
          drafts={data.toReview}
          empty="No other editor's draft is waiting for review. You get an e-mail when one is sent."
        />
      </Section>
      <Section title="Corrections for your entries">
        <DeskCorrections />
      </Section>
      <Section title="Recently published">
        <RecentList entries={data.recent} />
      </Section>
    </>
  );
}

const stateWords = { draft: 'Being written', in_review: 'Waiting for review' } as const;

function DraftList({ testID, drafts, empty }: { testID: string; drafts: DraftSummaryDto[]; empty: string }) {
  if (drafts.length === 0) {
    return (
      <View testID={testID}>
        <Notice tone="empty" testID={`${testID}-empty`} title="Nothing here.">
          {empty}
        </Notice>
      </View>
    );
  }
  return (
    <View role="list" testID={testID} style={styles.list}>
      {drafts.map((draft) => (
        <View role="listitem" key={draft.id} testID={`draft-${draft.id}`} style={styles.row}>
          <TextLink href={`/desk/drafts/${draft.id}`} testID={`draft-link-${draft.id}`}>
            {draft.title || draft.slug}
          </TextLink>
          <Text style={type.caption}>
            {stateWords[draft.state]} · by {draft.author.displayName} · changed {formatWhen(draft.updatedAt)}
          </Text>
        </View>
      ))}
    </View>
  );
}

function RecentList({ entries }: { entries: PublishedSummaryDto[] }) {
  if (entries.length === 0) {
    return (
      <Notice tone="empty" testID="desk-recent-empty" title="Nothing published yet.">
        Approved drafts appear here as they are published.
      </Notice>
    );
  }
  return (
    <View role="list" testID="desk-recent" style={styles.list}>
      {entries.map((entry) => (
        // One entry may be listed once per recent version: the version is part of the key.
        <View role="listitem" key={`${entry.slug}/v/${entry.version}`} style={styles.row}>
          <TextLink href={`/entries/${entry.slug}`} testID={`entry-link-${entry.slug}`}>
            {entry.title}
          </TextLink>
          <Text style={type.caption}>
            Version {entry.version}, {formatDay(entry.publishedAt)}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
});
