/**
 * A submitter's view of one of their submissions (`/submissions/<id>`): its state in words, the
 * decision and its note, the history; while a moderator waits for an answer, a box to give it.
 * Moderators and admins reach the same submission through the queue, where they can act on it.
 */
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ApiError } from '../http/client';
import { serverFieldErrors } from '../http/fieldErrors';
import { useSession } from '../queries/accounts';
import { useAnswerSubmission, useSubmission } from '../queries/submissions';
import type { SubmissionDto } from '@/shared/api-types';
import { space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { Field } from './Field';
import { DecisionPart, History, StatusMark, SubmissionBody } from './SubmissionDetails';
import { problemWords, STATUS_WORDS } from './words';

export function SubmissionScreen({ id }: { id: number }) {
  const session = useSession();
  const valid = Number.isInteger(id) && id > 0;
  const query = useSubmission(valid ? id : 0);

  if (!valid) {
    return (
      <Screen testID="screen-submission" title="No such submission">
        <Text style={type.reading}>This address names no submission. Your submissions are listed on your account.</Text>
        <TextLink href="/account" testID="submission-account">
          Your account
        </TextLink>
      </Screen>
    );
  }
  if (session.data && !session.data.user) {
    return (
      <Screen testID="screen-submission" title="Submission">
        <Notice
          testID="submission-sign-in"
          title="Sign in to see this submission."
          action={
            <TextLink href={`/sign-in?next=${encodeURIComponent(`/submissions/${id}`)}`} testID="submission-sign-in-link">
              Sign in
            </TextLink>
          }
        >
          A submission is shown to the account that sent it and to the moderators.
        </Notice>
      </Screen>
    );
  }
  if (query.isPending) {
    return (
      <Screen testID="screen-submission" title="Submission">
        <Loading testID="submission-loading" label="Loading the submission…" />
      </Screen>
    );
  }
  if (query.error) {
    const status = query.error instanceof ApiError ? query.error.status : 0;
    return (
      <Screen testID="screen-submission" title={status === 404 ? 'No such submission' : 'Submission'}>
        {status === 404 || status === 403 ? (
          <Text testID="submission-not-found" style={type.reading}>
            {status === 404
              ? 'There is no submission with this number.'
              : 'This submission is not one of yours. Your own are listed on your account.'}
          </Text>
        ) : (
          <ErrorNotice testID="submission-error" error={query.error} what="the submission" onRetry={() => void query.refetch()} />
        )}
        <TextLink href="/account" testID="submission-account">
          Your account
        </TextLink>
      </Screen>
    );
  }
  const { submission } = query.data;
  const mine = session.data?.user?.id === submission.submitter.id;
  return (
    <Screen testID="screen-submission" title={submission.title}>
      <StatusMark testID="submission-status" status={submission.status} words={STATUS_WORDS[submission.status]} />
      <Text style={type.caption}>{statusExplained(submission)}</Text>
      <DecisionPart submission={submission} audience="submitter" />
      {submission.status === 'waiting' && mine ? <AnswerBox submission={submission} /> : null}
      <Section title="What you sent">
        <SubmissionBody submission={submission} />
      </Section>
      <History submission={submission} />
      <TextLink href="/account" testID="submission-account">
        All your submissions
      </TextLink>
    </Screen>
  );
}

function statusExplained(s: SubmissionDto): string {
  switch (s.status) {
    case 'open':
      return 'It is in the moderators’ queue, oldest first. You get an e-mail when it is decided.';
    case 'claimed':
      return 'A moderator has taken it up and is deciding it now.';
    case 'waiting':
      return 'A moderator asked you something. Answer below; it goes back to the queue with your answer.';
    case 'accepted':
      return s.kind === 'sighting'
        ? 'It is linked to the library’s entries below and shows on their pages under “Seen in the wild”.'
        : 'It was forwarded to the editors of the entry, who revise it.';
    case 'drafted':
      return 'An editor is writing a new entry from it.';
    case 'rejected':
      return 'The moderator’s reason is below. You may send it again with more, if the reason allows.';
  }
}

function AnswerBox({ submission }: { submission: SubmissionDto }) {
  const [message, setMessage] = useState('');
  const [tried, setTried] = useState(false);
  const answer = useAnswerSubmission(submission.id);
  const empty = message.trim() === '';
  const fieldError =
    (tried && empty ? 'Write your answer first.' : undefined) ??
    serverFieldErrors(answer.error)['body.message'] ??
    (message.length > 5000 ? `Your answer is ${message.length} characters; keep it to 5000.` : undefined);
  const send = () => {
    setTried(true);
    if (empty || message.length > 5000 || answer.isPending) return;
    answer.mutate(message.trim());
  };
  return (
    <Section title="Your answer">
      <View style={styles.answer}>
        <Field
          label="Answer to the moderator’s question"
          testID="submission-answer"
          value={message}
          onChangeText={setMessage}
          multiline
          error={fieldError}
        />
        {answer.error && !fieldError ? (
          <Notice role="alert" testID="submission-answer-error" title="The answer was not sent.">
            {problemWords(answer.error)}
          </Notice>
        ) : null}
        <Button testID="submission-answer-send" label="Send the answer" busy={answer.isPending} busyLabel="Sending…" onPress={send} />
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  answer: { gap: space.sm },
});
