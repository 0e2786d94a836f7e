/**
 * Report a sighting (DESIGN.md §2–§3, issue 7): a claim of an impossible machine seen in the wild —
 * its title, where it was seen, what it claims, its figures (each read live in SI with the same
 * parseQuantity the server uses) and up to five attachments — sent to the moderators' queue.
 * Only signed-in accounts with a confirmed e-mail address may send one; others learn why and what to do.
 */
import * as DocumentPicker from 'expo-document-picker';
import { useRef, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { UserDto } from '@/shared/api-types';
import { ATTACHMENT_TYPES, ATTACHMENTS_MAX, type SubmissionDto } from '@/shared/submissions/types';
import { messageWords, serverFieldErrors } from '../http/fieldErrors';
import { useSession } from '../queries/accounts';
import { type PickedFile, useSubmitSighting } from '../queries/submissions';
import { ResendVerification } from '../auth/ResendVerification';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { FieldError } from '../worksheet/QuantityField';
import { Field } from './Field';
import { ALLOWED_WORDS, checkSighting, fileProblem, filesProblem, mediaTypeWords, type FigureRow } from './sighting';
import { bytesWords, problemWords } from './words';
import { FigureRowEditor } from './FigureRowEditor';

export function ReportSightingScreen() {
  const { data, error, isPending, refetch } = useSession();
  let content;
  if (isPending) content = <Loading testID="session-loading" label="Checking who is signed in…" />;
  else if (error) content = <ErrorNotice testID="session-error" error={error} what="who is signed in" onRetry={() => void refetch()} />;
  else if (!data.user) {
    content = (
      <Notice
        testID="sighting-sign-in-needed"
        title="Sign in to report a sighting."
        action={
          <View style={styles.actions}>
            <TextLink href={`/sign-in?next=${encodeURIComponent('/report')}`} testID="sighting-sign-in">
              Sign in
            </TextLink>
            <TextLink href="/sign-up" testID="sighting-sign-up">
              Create an account
            </TextLink>
          </View>
        }
      >
        Sightings come from registered accounts with a confirmed e-mail address, so that a moderator can ask you about
        one and tell you what became of it.
      </Notice>
    );
  } else if (!data.user.verified) {
    content = (
      <Notice tone="warning" testID="sighting-unverified" title="Confirm your e-mail address first." action={<ResendVerification email={data.user.email} />}>
        We sent a link to {data.user.email} when you registered. Open it, then come back here. If it has expired or
        gone missing, send it again.
      </Notice>
    );
  } else content = <SightingForm key={data.user.id} user={data.user} />;

  return (
    <Screen
      testID="screen-report"
      title="Report a sighting"
      lead="Met a claim of an impossible machine — a press release, a pitch, a preprint, a video? Send it in. A moderator matches it with the library’s entries or turns it into work for the editors, and you hear what became of it."
    >
      <Notice tone="warning" testID="sighting-caution" title="What to send">
        The claim and its figures, not the people behind it: the library judges mechanisms and claims, never people. No
        personal data of others, please. Attachments are {ALLOWED_WORDS}, at most {ATTACHMENTS_MAX} files of 10 MB each.
      </Notice>
      {content}
    </Screen>
  );
}

let keyCounter = 0;
const nextKey = () => `k${++keyCounter}`;
const blankFigure = (): FigureRow => ({ key: nextKey(), kind: 'thrust', quantity: '', label: '' });

function SightingForm({ user }: { user: UserDto }) {
  const [title, setTitle] = useState('');
  const [seenAtUrl, setUrl] = useState('');
  const [seenAtCitation, setCitation] = useState('');
  const [summary, setSummary] = useState('');
  const [figures, setFigures] = useState<FigureRow[]>([]);
  const [files, setFiles] = useState<PickedFile[]>([]);
  const [tried, setTried] = useState(false);
  const [pickProblem, setPickProblem] = useState<string | null>(null);
  const [done, setDone] = useState<SubmissionDto | null>(null);
  /** The rows and files as sent, to put the server's objection to figures.N or files.N beside the right one. */
  const sent = useRef<{ figures: string[]; files: string[] }>({ figures: [], files: [] });
  const submit = useSubmitSighting();

  const values = { title, seenAtUrl, seenAtCitation, summary, figures, files };
  const local = checkSighting(values);
  // Before the first try, only the live readings show (a figure as typed, each file as picked).
  const shown: Record<string, string> = tried ? local : {};

  // The server's field errors, mapped onto the rows and files they were sent as.
  const server: Record<string, string> = {};
  const leftover: string[] = [];
  for (const [key, message] of Object.entries(serverFieldErrors(submit.error))) {
    const fig = /^body\.figures\.(\d+)(?:\.|$)/.exec(key);
    const file = /^files\.(\d+)$/.exec(key);
    if (fig && sent.current.figures[Number(fig[1])]) server[`figure.${sent.current.figures[Number(fig[1])]}`] = message;
    else if (file) {
      const at = files.findIndex((f) => f.key === sent.current.files[Number(file[1])]);
      if (at >= 0) server[`files.${at}`] = message;
      else leftover.push(message);
    } else if (['body.title', 'body.seenAtUrl', 'body.seenAtCitation', 'body.summary', 'body.figures', 'files'].includes(key)) server[key] = message;
    else leftover.push(message);
  }
  const errorFor = (key: string) => shown[key] ?? server[key];

  const pick = async () => {
    setPickProblem(null);
    try {
      const result = await DocumentPicker.getDocumentAsync({ multiple: true, type: [...ATTACHMENT_TYPES], base64: false });
      if (result.canceled) return;
      const picked: PickedFile[] = result.assets.map((a) => ({
        key: nextKey(),
        name: a.name,
        size: a.size ?? a.file?.size ?? 0,
        mediaType: a.mimeType ?? a.file?.type ?? undefined,
        file: a.file,
        uri: a.file ? undefined : a.uri,
      }));
      setFiles((list) => [...list, ...picked]);
    } catch (err) {
      setPickProblem(`The files could not be read: ${(err as Error).message}. Try picking them again.`);
    }
  };

  const send = () => {
    setTried(true);
    if (Object.keys(local).length > 0 || submit.isPending) return;
    const withQuantity = figures.filter((f) => f.quantity.trim());
    sent.current = { figures: withQuantity.map((f) => f.key), files: files.map((f) => f.key) };
    submit.mutate(
      {
        title,
        seenAtUrl,
        seenAtCitation,
        summary,
        figures: withQuantity.map((f) => ({ kind: f.kind, quantity: f.quantity.trim(), ...(f.label.trim() ? { label: f.label.trim() } : {}) })),
        files,
      },
      { onSuccess: ({ submission }) => setDone(submission) },
    );
  };

  const again = () => {
    setTitle('');
    setUrl('');
    setCitation('');
    setSummary('');
    setFigures([]);
    setFiles([]);
    setTried(false);
    setDone(null);
    submit.reset();
  };

  if (done) {
    return (
      <Notice
        tone="success"
        testID="sighting-done"
        title="Sent. Thank you."
        action={
          <View style={styles.actions}>
            <TextLink href={`/submissions/${done.id}`} testID="sighting-done-link">
              Follow “{done.title}”
            </TextLink>
            <TextLink href="/account" testID="sighting-done-account">
              Your submissions
            </TextLink>
            <Button testID="sighting-again" variant="quiet" label="Report another sighting" onPress={again} />
          </View>
        }
      >
        Your sighting is in the moderators’ queue{done.attachments.length ? ` with ${done.attachments.length} attachment${done.attachments.length === 1 ? '' : 's'}` : ''}.
        You get an e-mail at {user.email} when it is decided, or if a moderator needs to ask you something.
      </Notice>
    );
  }

  const invalidCount = Object.keys(local).length;

  return (
    <View style={styles.form}>
      <Section title="The claim">
        <View style={styles.fields}>
          <Field
            label="Title"
            testID="sighting-title"
            value={title}
            onChangeText={setTitle}
            hint="What the device is called or claims, in a few words. 3 to 200 characters."
            placeholder="Sealed microwave cavity said to give thrust without propellant"
            error={errorFor('body.title')}
          />
          <Field
            label="Summary"
            testID="sighting-summary"
            value={summary}
            onChangeText={setSummary}
            multiline
            hint="What is claimed, and how it is said to work, in your words. 10 to 5000 characters."
            error={errorFor('body.summary')}
          />
        </View>
      </Section>

      <Section title="Where it was seen">
        <View style={styles.fields}>
          <Text style={type.caption}>A web address, a citation (journal, patent, broadcast, leaflet), or both.</Text>
          <Field
            label="Web address"
            testID="sighting-url"
            kind="url"
            value={seenAtUrl}
            onChangeText={setUrl}
            placeholder="https://"
            error={errorFor('body.seenAtUrl')}
          />
          <Field
            label="Citation"
            testID="sighting-citation"
            value={seenAtCitation}
            onChangeText={setCitation}
            multiline
            hint="Up to 1000 characters."
            error={errorFor('body.seenAtCitation')}
          />
        </View>
      </Section>

      <Section title="Claimed figures">
        <Text style={[type.caption, styles.intro]}>
          The numbers the claim gives, each with its unit as written (“0.2 lbf”, “1.5 kW”, “300 degC”). Each is read in SI
          as you type, so a moderator can run the checks on it. Optional.
        </Text>
        {errorFor('body.figures') ? <FieldError testID="sighting-figures-error" message={errorFor('body.figures')!} /> : null}
        <View role="list" aria-label="Claimed figures" style={figures.length ? styles.list : undefined}>
          {figures.map((row, i) => (
            <FigureRowEditor
              key={row.key}
              index={i}
              row={row}
              error={errorFor(`figure.${row.key}`)}
              onChange={(next) => setFigures((list) => list.map((f) => (f.key === row.key ? next : f)))}
              onRemove={() => setFigures((list) => list.filter((f) => f.key !== row.key))}
            />
          ))}
        </View>
        <Button testID="sighting-figure-add" variant="quiet" label="Add a figure" onPress={() => setFigures((list) => [...list, blankFigure()])} />
      </Section>

      <Section title="Attachments">
        <Text style={[type.caption, styles.intro]}>
          The page, paper or photo the claim comes from: {ALLOWED_WORDS}, at most {ATTACHMENTS_MAX} files of 10 MB each.
          Optional. Only moderators (and you) can open them.
        </Text>
        {files.length > 0 ? (
          <View role="list" aria-label="Attachments picked" style={styles.list}>
            {files.map((file, i) => {
              const problem = errorFor(`files.${i}`) ?? fileProblem(file);
              return (
                <View role="listitem" key={file.key} testID={`sighting-file-${i}`} style={styles.fileRow}>
                  <View style={styles.fileText}>
                    <Text style={type.uiStrong}>{file.name}</Text>
                    <Text style={type.caption}>
                      {mediaTypeWords(file.mediaType)}, {bytesWords(file.size)}
                    </Text>
                    {problem ? <FieldError testID={`sighting-file-${i}-error`} message={problem} /> : null}
                  </View>
                  <Button
                    testID={`sighting-file-${i}-remove`}
                    variant="quiet"
                    label="Remove"
                    onPress={() => setFiles((list) => list.filter((f) => f.key !== file.key))}
                  />
                </View>
              );
            })}
          </View>
        ) : null}
        {errorFor('files') ?? filesProblem(files) ? (
          <FieldError testID="sighting-files-error" message={(errorFor('files') ?? filesProblem(files))!} />
        ) : null}
        {pickProblem ? <FieldError testID="sighting-pick-error" message={pickProblem} /> : null}
        <View style={styles.pick}>
          <Button
            testID="sighting-pick-files"
            variant="quiet"
            label={files.length ? 'Add more files' : 'Pick files'}
            disabled={files.length >= ATTACHMENTS_MAX}
            onPress={() => void pick()}
          />
          <Text style={type.small}>
            {files.length} of {ATTACHMENTS_MAX} files
          </Text>
        </View>
      </Section>

      <View style={styles.send}>
        {tried && invalidCount > 0 ? (
          <Notice role="alert" testID="sighting-invalid" title="Some fields need another look.">
            {invalidCount === 1 ? 'One field says' : `${invalidCount} fields say`} what to change, beside the field.
          </Notice>
        ) : null}
        {submit.error ? (
          <Notice role="alert" testID="sighting-error" title="The sighting was not sent.">
            {leftover.length ? leftover.map((m) => messageWords(m)).join(' ') : problemWords(submit.error)}
          </Notice>
        ) : null}
        <Button
          testID="sighting-submit"
          label="Send the sighting"
          busy={submit.isPending}
          busyLabel={files.length ? `Sending with ${files.length} file${files.length === 1 ? '' : 's'}…` : 'Sending…'}
          onPress={send}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.sm },
  fields: { gap: space.md },
  intro: { marginBottom: space.sm },
  list: { borderTopColor: colors.rule, borderTopWidth: 1, marginBottom: space.sm },
  fileRow: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.sm,
    paddingVertical: space.sm,
    borderBottomColor: colors.rule,
    borderBottomWidth: 1,
  },
  fileText: { flexShrink: 1, gap: space.xxs },
  pick: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  send: { gap: space.sm, marginTop: space.lg },
  actions: { gap: space.sm },
});
