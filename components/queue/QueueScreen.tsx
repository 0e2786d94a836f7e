/**
 * The moderators' queue (DESIGN.md §5): sightings and corrections waiting for a decision, oldest
 * first, with how many there are, filters by kind, state and "in my hands", and for each item its
 * kind, title, age, who sent it, its attachments and in whose hands it is.
 */
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { UserDto } from '@/shared/api-types';
import type { SubmissionKind } from '@/shared/submissions/types';
import { RoleGate } from '../account/RoleGate';
import { useSession } from '../queries/accounts';
import { type QueueFilters, useQueue } from '../queries/queue';
import { ageWords, HANDLING_WORDS, KIND_WORDS, QUEUE_STATUS_WORDS } from '../submissions/words';
import { colors, space, type } from '../theme';
import { Chip, chipGroupStyle } from '../ui/Chip';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';

export function QueueScreen() {
  return (
    <Screen
      testID="screen-queue"
      title="Queue"
      lead="Sightings and corrections sent in by contributors, oldest first. Take one up, read it, and decide: link it to entries, turn it into a draft for an editor, ask the sender for more, or say why not."
    >
      <RoleGate section="queue">
        <SignedInQueue />
      </RoleGate>
    </Screen>
  );
}

function SignedInQueue() {
  const { data } = useSession();
  return data?.user ? <QueueList user={data.user} /> : null;
}

type Status = NonNullable<QueueFilters['status']>;
const KINDS: readonly SubmissionKind[] = ['sighting', 'correction'];
const STATUSES: readonly Status[] = ['open', 'claimed', 'waiting'];
const KIND_FILTER: Record<SubmissionKind, string> = { sighting: 'Sightings', correction: 'Corrections' };

const plural = (n: number, one: string, many: string) => `${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;

function QueueList({ user }: { user: UserDto }) {
  const [filters, setFilters] = useState<QueueFilters>({});
  const { data, error, isPending, isFetching, refetch } = useQueue(user.id, filters);
  const set = (next: Partial<QueueFilters>) => setFilters((f) => ({ ...f, ...next }));
  const filtered = Boolean(filters.kind || filters.status || filters.mine);

  return (
    <View style={styles.root}>
      <View style={styles.filters}>
        <View role="radiogroup" aria-label="Kind" style={chipGroupStyle}>
          <Chip role="radio" testID="queue-filter-any-kind" label="Any kind" checked={!filters.kind} onPress={() => set({ kind: undefined })} />
          {KINDS.map((kind) => (
            <Chip
              key={kind}
              role="radio"
              testID={`queue-filter-${kind}`}
              label={data ? `${KIND_FILTER[kind]} (${data.counts[kind]})` : KIND_FILTER[kind]}
              checked={filters.kind === kind}
              onPress={() => set({ kind })}
            />
          ))}
        </View>
        <View role="radiogroup" aria-label="State" style={chipGroupStyle}>
          <Chip role="radio" testID="queue-filter-any-status" label={HANDLING_WORDS.undecided} checked={!filters.status} onPress={() => set({ status: undefined })} />
          {STATUSES.map((status) => (
            <Chip
              key={status}
              role="radio"
              testID={`queue-filter-${status}`}
              label={data ? `${QUEUE_STATUS_WORDS[status]} (${data.counts[status]})` : QUEUE_STATUS_WORDS[status]}
              checked={filters.status === status}
              onPress={() => set({ status })}
            />
          ))}
        </View>
        <View style={chipGroupStyle}>
          <Chip role="checkbox" tick testID="queue-filter-mine" label={HANDLING_WORDS.mine} checked={Boolean(filters.mine)} onPress={() => set({ mine: !filters.mine })} />
        </View>
      </View>

      {isPending ? <Loading testID="queue-loading" label="Loading the queue…" /> : null}
      {error ? <ErrorNotice testID="queue-error" error={error} what="the queue" onRetry={() => void refetch()} /> : null}
      {data ? (
        <>
          <Text testID="queue-count" role="status" {...{ dataSet: { total: String(data.total) } }} style={type.uiStrong}>
            {filtered ? `${plural(data.total, 'item', 'items')} match` : `${plural(data.total, 'item', 'items')} waiting`}
            {isFetching ? ' (updating…)' : ''}
          </Text>
          <Text style={type.caption}>
            In all: {data.counts.open} open, {data.counts.claimed} being decided, {data.counts.waiting} waiting for the submitter.
          </Text>
          {data.items.length === 0 ? (
            <Notice tone="empty" testID="queue-empty" title={filtered ? 'Nothing matches these filters.' : 'The queue is empty.'}>
              {filtered
                ? 'Clear a filter to see the other items.'
                : 'New sightings and corrections appear here as they are sent in; you get an e-mail digest when they do.'}
            </Notice>
          ) : (
            <View role="list" style={styles.list}>
              {data.items.map((item) => {
                const mine = item.claimedBy?.id === user.id;
                return (
                  <View role="listitem" key={item.id} testID={`queue-item-${item.id}`} {...{ dataSet: { status: item.status } }} style={styles.row}>
                    <Text style={type.small}>
                      {KIND_WORDS[item.kind].toUpperCase()} · {QUEUE_STATUS_WORDS[item.status]}
                    </Text>
                    <TextLink href={`/queue/${item.id}`} testID={`queue-item-${item.id}-link`}>
                      {item.title}
                    </TextLink>
                    <Text style={type.caption}>
                      Sent {ageWords(item.createdAt)} ago by {item.submitter.displayName}
                      {item.submitter.id === user.id ? ' (you)' : ''}
                      {item.kind === 'sighting' ? ` · ${plural(item.attachments, 'attachment', 'attachments')}` : ''}
                      {item.entry ? ` · on “${item.entry.title}”, version ${item.entry.version}` : ''}
                    </Text>
                    {item.claimedBy ? (
                      <Text testID={`queue-item-${item.id}-holder`} style={mine ? styles.mine : type.caption}>
                        {mine ? HANDLING_WORDS.heldByMe : HANDLING_WORDS.heldBy(item.claimedBy.displayName)}
                      </Text>
                    ) : null}
                  </View>
                );
              })}
            </View>
          )}
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  filters: { gap: space.xs, marginBottom: space.sm },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  mine: { ...type.caption, fontFamily: type.uiStrong.fontFamily, color: colors.teal },
});
