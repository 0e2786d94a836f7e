/**
 * One item of the queue (`/queue/<id>`): everything that was sent in (plain text only), its
 * attachments as downloads, its figures and history; taking it up and putting it back; and, while
 * the moderator holds it, the four decisions: accept (link a sighting to entries, or forward a
 * correction to the entry's editors), turn into a draft, ask for more, or reject with a reason.
 */
import { StyleSheet, Text, View } from 'react-native';
import type { SubmissionDto, UserDto } from '@/shared/api-types';
import { can } from '@/shared/policies';
import { RoleGate } from '../account/RoleGate';
import { ApiError } from '../http/client';
import { useSession } from '../queries/accounts';
import { useSubmission } from '../queries/submissions';
import { useClaim, useRelease } from '../queries/queue';
import { DecisionPart, History, StatusMark, SubmissionBody } from '../submissions/SubmissionDetails';
import { HANDLING_WORDS, problemWords, QUEUE_STATUS_WORDS } from '../submissions/words';
import { space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { DecisionPanel } from './DecisionPanel';

export function QueueItemScreen({ id }: { id: number }) {
  const { data } = useSession();
  const role = data?.user?.role;
  if (role && can(role, 'queue.claim')) return <SignedInItem id={id} />;
  // Anyone else (or while the session loads): the gate says who the queue is for and what to do.
  return (
    <Screen testID="screen-queue-item" title="Queue item">
      <RoleGate section="queue">{null}</RoleGate>
    </Screen>
  );
}

function SignedInItem({ id }: { id: number }) {
  const { data } = useSession();
  const query = useSubmission(id);
  if (!data?.user) return null;
  if (query.isPending) {
    return (
      <Screen testID="screen-queue-item" title="Queue item">
        <Loading testID="item-loading" label="Loading the item…" />
      </Screen>
    );
  }
  if (query.error) {
    const missing = query.error instanceof ApiError && query.error.status === 404;
    return (
      <Screen testID="screen-queue-item" title={missing ? 'No such item' : 'Queue item'}>
        {missing ? (
          <Text testID="item-not-found" style={type.reading}>
            There is no submission with the number {id}.
          </Text>
        ) : (
          <ErrorNotice testID="item-error" error={query.error} what="the item" onRetry={() => void query.refetch()} />
        )}
        <TextLink href="/queue" testID="item-back">
          Back to the queue
        </TextLink>
      </Screen>
    );
  }
  return <Item submission={query.data.submission} user={data.user} onStale={() => void query.refetch()} />;
}

const DECIDED = ['accepted', 'drafted', 'rejected'];

function Item({ submission: s, user, onStale }: { submission: SubmissionDto; user: UserDto; onStale: () => void }) {
  const claim = useClaim(s.id);
  const release = useRelease(s.id);
  const own = s.submitter.id === user.id;
  const heldByMe = s.status === 'claimed' && s.claimedBy?.id === user.id;
  const decided = DECIDED.includes(s.status);
  const actionError = claim.error ?? release.error;
  // What the server says of someone else's claim holds more than what this page last showed.
  const onError = (error: Error) => {
    if (error instanceof ApiError && error.status === 409) onStale();
  };

  return (
    <Screen testID="screen-queue-item" title={s.title}>
      <TextLink href="/queue" testID="item-back">
        Back to the queue
      </TextLink>
      <View style={styles.state}>
        <StatusMark testID="item-status" status={s.status} words={QUEUE_STATUS_WORDS[s.status]} />
        {s.claimedBy && s.status === 'claimed' ? (
          <Text testID="item-holder" style={type.caption}>
            {heldByMe ? 'It is in your hands: decide it, or hand it back.' : `${s.claimedBy.displayName} has it in hand and is deciding it.`}
          </Text>
        ) : null}
      </View>

      {own ? (
        <Notice testID="item-own" title="You sent this in.">
          A moderator never decides their own submission: another moderator (or an admin) picks it up.
        </Notice>
      ) : null}

      {!own && !decided ? (
        <View style={styles.actions}>
          {s.status === 'open' || s.status === 'waiting' ? (
            <>
              {s.status === 'waiting' ? (
                <Text style={type.caption}>Waiting for the submitter’s answer; you can still pick it up and decide it now.</Text>
              ) : null}
              <Button testID="item-claim" label={HANDLING_WORDS.pickUp} busy={claim.isPending} busyLabel={HANDLING_WORDS.pickingUp} onPress={() => claim.mutate(undefined, { onError })} />
            </>
          ) : null}
          {s.status === 'claimed' && s.claimedBy && can(user, 'queue.releaseHeld', { userId: user.id, ownerId: s.claimedBy.id }) ? (
            <Button
              testID="item-release"
              variant="quiet"
              label={heldByMe ? HANDLING_WORDS.handBack : HANDLING_WORDS.handBackFor(s.claimedBy!.displayName)}
              busy={release.isPending}
              busyLabel={HANDLING_WORDS.handingBack}
              onPress={() => release.mutate(undefined, { onError })}
            />
          ) : null}
        </View>
      ) : null}
      {actionError ? (
        <Notice role="alert" testID="item-action-error" title="That did not go through.">
          {problemWords(actionError)}
        </Notice>
      ) : null}

      {heldByMe ? <DecisionPanel key={s.updatedAt} submission={s} user={user} onStale={onStale} /> : null}
      {decided ? <DecisionPart submission={s} audience="moderator" /> : null}
      {s.status === 'waiting' && s.decisionNote ? (
        <Notice testID="item-question" title="The question asked">
          {s.decisionNote}
        </Notice>
      ) : null}

      <Section title="What was sent">
        <SubmissionBody submission={s} />
      </Section>
      <History submission={s} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  state: { gap: space.xxs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
});
