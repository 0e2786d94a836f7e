/**
 * What issue 7 adds to an entry page: "Seen in the wild" (accepted sightings linked to the entry,
 * hidden while there are none) and "Report an error" (a correction against the version on screen).
 */
import { entryVersionPath } from '@/shared/permalink';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { CORRECTION_SECTIONS, type CorrectionSection, type SubmissionDto } from '@/shared/submissions/types';
import { ChoiceChips } from '../admin/ChoiceChips';
import { serverFieldErrors } from '../http/fieldErrors';
import { useSession } from '../queries/accounts';
import { useEntrySightings, useSubmitCorrection } from '../queries/submissions';
import { formatDay } from '../entry/format';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { Field } from './Field';
import { OutLink } from './SubmissionDetails';
import { problemWords, SECTION_LABEL } from './words';

export function SeenInTheWild({ slug }: { slug: string }) {
  const { data, error, refetch } = useEntrySightings(slug);
  if (error) {
    return (
      <Section title="Seen in the wild">
        <Text testID="entry-sightings-error" style={type.caption}>
          The sightings linked to this entry could not be loaded ({problemWords(error)}){' '}
          <Text role="button" onPress={() => void refetch()} style={styles.retry}>
            Try again
          </Text>
        </Text>
      </Section>
    );
  }
  if (!data || data.sightings.length === 0) return null;
  return (
    <Section title="Seen in the wild">
      <Text style={[type.caption, styles.intro]}>
        Claims of this kind that readers reported and a moderator linked to this entry, newest first.
      </Text>
      <View role="list" testID="entry-sightings" style={styles.list}>
        {data.sightings.map((s) => (
          <View role="listitem" key={s.id} testID={`entry-sighting-${s.id}`} style={styles.row}>
            <Text style={type.uiStrong}>{s.title}</Text>
            {s.seenAtUrl ? (
              <OutLink href={s.seenAtUrl} testID={`entry-sighting-${s.id}-url`}>
                {s.seenAtUrl}
              </OutLink>
            ) : null}
            {s.seenAtCitation ? <Text style={type.body}>{s.seenAtCitation}</Text> : null}
            <Text style={type.caption}>
              Reported {formatDay(s.submittedAt)} · linked {formatDay(s.linkedAt)}
            </Text>
          </View>
        ))}
      </View>
    </Section>
  );
}

/** "Report an error": opens a correction form against this entry version (signed-in accounts). */
export function ReportError({ slug, version, title }: { slug: string; version: number; title: string }) {
  const [open, setOpen] = useState(false);
  const [done, setDone] = useState<SubmissionDto | null>(null);
  const session = useSession();
  const user = session.data?.user ?? null;

  if (done) {
    return (
      <Notice
        tone="success"
        testID="correction-done"
        title="Thank you: the error is reported."
        action={
          <TextLink href={`/submissions/${done.id}`} testID="correction-done-link">
            Follow your report
          </TextLink>
        }
      >
        A moderator reads it and, if it holds, forwards it to the editors of “{title}”. You get an e-mail when it is
        decided.
      </Notice>
    );
  }
  if (!open) {
    return (
      <View style={styles.opener}>
        <Button testID="correction-open" variant="quiet" label="Report an error" onPress={() => setOpen(true)} />
      </View>
    );
  }
  if (!user) {
    return (
      <Notice
        testID="correction-sign-in"
        title="Sign in to report an error."
        action={
          <TextLink href={`/sign-in?next=${encodeURIComponent(entryVersionPath(slug, version))}`} testID="correction-sign-in-link">
            Sign in
          </TextLink>
        }
      >
        Corrections come from registered accounts, so that a moderator can tell you what became of yours.
      </Notice>
    );
  }
  return <CorrectionForm slug={slug} version={version} title={title} onDone={setDone} onCancel={() => setOpen(false)} />;
}

interface CorrectionFormProps {
  slug: string;
  version: number;
  title: string;
  onDone: (submission: SubmissionDto) => void;
  onCancel: () => void;
}

function CorrectionForm({ slug, version, title, onDone, onCancel }: CorrectionFormProps) {
  const [section, setSection] = useState<CorrectionSection>('whyItFails');
  const [whatIsWrong, setWrong] = useState('');
  const [suggestedFix, setFix] = useState('');
  const [sources, setSources] = useState('');
  const [tried, setTried] = useState(false);
  const submit = useSubmitCorrection();

  const local: Record<string, string> = {};
  if (whatIsWrong.trim().length < 10) local['body.whatIsWrong'] = 'Say what is wrong in at least 10 characters.';
  else if (whatIsWrong.length > 5000) local['body.whatIsWrong'] = 'Keep it to 5000 characters.';
  if (suggestedFix.trim().length < 1) local['body.suggestedFix'] = 'Say how it should read instead.';
  else if (suggestedFix.length > 5000) local['body.suggestedFix'] = 'Keep it to 5000 characters.';
  if (sources.length > 3000) local['body.sources'] = `The sources are ${sources.length} characters; keep them to 3000.`;
  const server = serverFieldErrors(submit.error);
  const errorFor = (key: string) => (tried ? local[key] : undefined) ?? server[key];

  const send = () => {
    setTried(true);
    if (Object.keys(local).length > 0 || submit.isPending) return;
    submit.mutate(
      {
        entry: slug,
        version,
        section,
        whatIsWrong: whatIsWrong.trim(),
        suggestedFix: suggestedFix.trim(),
        ...(sources.trim() ? { sources: sources.trim() } : {}),
      },
      { onSuccess: ({ submission }) => onDone(submission) },
    );
  };

  return (
    <View testID="correction-form" style={styles.form}>
      <Text role="heading" aria-level={2} style={type.title}>
        Report an error in version {version}
      </Text>
      <Text style={type.caption}>
        About “{title}”, version {version} as shown on this page. Say what is wrong and how it should read; sources help
        the editors check it.
      </Text>
      <Text style={type.uiStrong}>Which part</Text>
      <ChoiceChips
        label="Which part of the entry"
        testID="correction-section"
        options={CORRECTION_SECTIONS.map((value) => ({ value, label: SECTION_LABEL[value] }))}
        value={section}
        onChange={setSection}
      />
      <Field label="What is wrong" testID="correction-wrong" value={whatIsWrong} onChangeText={setWrong} multiline error={errorFor('body.whatIsWrong')} />
      <Field label="Suggested fix" testID="correction-fix" value={suggestedFix} onChangeText={setFix} multiline error={errorFor('body.suggestedFix')} />
      <Field
        label="Sources (optional)"
        testID="correction-sources"
        value={sources}
        onChangeText={setSources}
        multiline
        hint="Papers, handbooks, standards: whatever shows the fix is right. Up to 3000 characters."
        error={errorFor('body.sources')}
      />
      {submit.error ? (
        <Notice role="alert" testID="correction-error" title="The report was not sent.">
          {problemWords(submit.error)}
        </Notice>
      ) : null}
      <View style={styles.buttons}>
        <Button testID="correction-submit" label="Send the report" busy={submit.isPending} busyLabel="Sending…" onPress={send} />
        <Button testID="correction-cancel" variant="quiet" label="Cancel" onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  intro: { marginBottom: space.sm },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  retry: { color: colors.teal, textDecorationLine: 'underline' },
  opener: { marginTop: space.lg },
  form: {
    gap: space.sm,
    marginTop: space.lg,
    padding: space.md,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: 4,
    backgroundColor: colors.surface,
  },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
