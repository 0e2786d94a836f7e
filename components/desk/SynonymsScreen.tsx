/**
 * Desk → Synonyms (issue 11): the groups of the trade's words that the claim matcher lets stand for
 * one another ("resonator", "cavity", "frustum"). Editors add, change and remove groups; a change
 * reaches the matcher at once. Contract: shared/synonyms.ts, `/api/synonyms`.
 */
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { SynonymGroupDto } from '@/shared/api-types';
import { RoleGate } from '../account/RoleGate';
import { confirmChange } from '../admin/confirm';
import { ApiError } from '../http/client';
import { serverFieldErrors } from '../http/fieldErrors';
import { useRemoveSynonymGroup, useSaveSynonymGroup, useSynonymGroups } from '../queries/synonyms';
import { ProblemNotice } from '../auth/Form';
import { problemOf } from '../auth/useForm';
import { Field } from '../submissions/Field';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { SITE_NAME, usePageTitle } from '../ui/usePageTitle';


/** One word or phrase a line; blank lines dropped. */
export const termsOf = (text: string) =>
  text
    .split('\n')
    .map((t) => t.trim())
    .filter(Boolean);

/**
 * The server's field messages in words beside the form: `body.terms.2` is the third line. Returns
 * the message for the terms box, the one for the note, and whether any was placed.
 */
export function formErrors(error: unknown, terms: string[]): { terms?: string; note?: string; placed: boolean } {
  const fields = serverFieldErrors(error);
  const lines: string[] = [];
  let note: string | undefined;
  for (const [key, message] of Object.entries(fields)) {
    const m = /^body\.terms(?:\.(\d+))?$/.exec(key);
    if (m) lines.push(m[1] === undefined ? message : `Line ${Number(m[1]) + 1} (“${terms[Number(m[1])] ?? ''}”): ${message}.`);
    else if (key === 'body.note') note = message;
  }
  return { terms: lines.length ? lines.join(' ') : undefined, note, placed: lines.length > 0 || note !== undefined };
}

export function SynonymsScreen() {
  usePageTitle(`Synonyms — ${SITE_NAME}`);
  return (
    <Screen
      testID="screen-synonyms"
      title="Synonyms"
      lead="Words and phrases the trade uses for one thing. When a pasted claim uses one of them, the claim check also looks for entries that use another of the same group, at a lower weight than the word itself."
    >
      <RoleGate section="desk">
        <TextLink href="/desk" testID="synonyms-back">
          Back to the Desk
        </TextLink>
        <Section title="New group">
          <GroupForm testID="synonyms-new" />
        </Section>
        <Section title="Groups">
          <GroupList />
        </Section>
      </RoleGate>
    </Screen>
  );
}

function GroupList() {
  const { data, error, isPending, refetch } = useSynonymGroups();
  if (isPending) return <Loading testID="synonyms-loading" label="Loading the synonym groups…" />;
  if (error) return <ErrorNotice testID="synonyms-error" error={error} what="the synonym groups" onRetry={() => void refetch()} />;
  if (!data.groups.length) {
    return (
      <Notice tone="empty" testID="synonyms-empty" title="No groups yet.">
        Add a group above: two or more words or phrases that mean the same thing in a claim.
      </Notice>
    );
  }
  return (
    <View role="list" testID="synonyms-list" style={styles.list}>
      {data.groups.map((g) => (
        <GroupRow key={g.id} group={g} />
      ))}
    </View>
  );
}

function GroupRow({ group }: { group: SynonymGroupDto }) {
  const [editing, setEditing] = useState(false);
  const remove = useRemoveSynonymGroup(group.id);
  if (editing) {
    return (
      <View role="listitem" testID={`synonyms-group-${group.id}`} style={styles.row}>
        <GroupForm testID={`synonyms-edit-${group.id}`} group={group} onDone={() => setEditing(false)} />
      </View>
    );
  }
  return (
    <View role="listitem" testID={`synonyms-group-${group.id}`} style={styles.row}>
      <Text style={type.ui} testID={`synonyms-terms-${group.id}`}>
        {group.terms.join(' · ')}
      </Text>
      {group.note ? <Text style={type.caption}>{group.note}</Text> : null}
      <ProblemNotice testID={`synonyms-remove-error-${group.id}`} problem={remove.error ? problemOf(remove.error) : null} />
      <View style={styles.actions}>
        <Button testID={`synonyms-edit-open-${group.id}`} variant="quiet" label="Edit" onPress={() => setEditing(true)} />
        <Button
          testID={`synonyms-remove-${group.id}`}
          variant="quiet"
          label="Remove"
          busy={remove.isPending}
          busyLabel="Removing…"
          onPress={() =>
            confirmChange(
              'Remove this group?',
              `${group.terms.join(', ')}: the claim check stops treating these as one thing.`,
              'Remove',
              () => remove.mutate(),
            )
          }
        />
      </View>
    </View>
  );
}

/** The form for a new group, or for changing `group`. */
function GroupForm({ testID, group, onDone }: { testID: string; group?: SynonymGroupDto; onDone?: () => void }) {
  const [text, setText] = useState(group ? group.terms.join('\n') : '');
  const [note, setNote] = useState(group?.note ?? '');
  const [version, setVersion] = useState(group?.version ?? 1);
  const [saved, setSaved] = useState(false);
  const terms = termsOf(text);
  const save = useSaveSynonymGroup(group?.id, {
    onSaved: () => {
      if (group) onDone?.();
      else {
        setText('');
        setNote('');
        setSaved(true);
      }
    },
    onError: (error) => {
      // Another editor changed the group: take their version up, keep what this editor typed.
      if (error instanceof ApiError && error.code === 'edit_conflict') {
        const current = (error.payload as { group?: SynonymGroupDto } | undefined)?.group;
        if (current) setVersion(current.version);
      }
    },
  });
  const errors = formErrors(save.error, terms);
  const conflict = save.error instanceof ApiError && save.error.code === 'edit_conflict' ? (save.error.payload as { group?: SynonymGroupDto }).group : undefined;
  return (
    <View testID={testID} style={styles.form}>
      <Field
        label="Words and phrases, one a line"
        testID={`${testID}-terms`}
        value={text}
        onChangeText={(t) => {
          setText(t);
          setSaved(false);
        }}
        multiline
        kind="mono"
        hint="At least two. Case, plurals and words such as “the” or “of” do not matter; a word or phrase can be in one group only."
        placeholder={'resonator\ncavity\nfrustum'}
        error={errors.terms}
      />
      <Field label="Note for editors (optional)" testID={`${testID}-note`} value={note} onChangeText={setNote} error={errors.note} />
      {conflict ? (
        <Notice tone="error" testID={`${testID}-conflict`} title="Another editor changed this group.">
          It now reads: {conflict.terms.join(' · ')}. Your lines are kept; save again to replace it with them.
        </Notice>
      ) : (
        <ProblemNotice testID={`${testID}-error`} problem={save.error && !errors.placed ? problemOf(save.error) : null} />
      )}
      {saved ? (
        <Text testID={`${testID}-saved`} style={[type.caption, styles.saved]}>
          Added. The claim check uses it from now on.
        </Text>
      ) : null}
      <View style={styles.actions}>
        <Button
          testID={`${testID}-save`}
          label={group ? 'Save group' : 'Add group'}
          busyLabel="Saving…"
          busy={save.isPending}
          disabled={terms.length < 2}
          onPress={() => save.mutate({ terms, note: note.trim() || null, ...(group ? { version } : {}) })}
        />
        {group ? <Button testID={`${testID}-cancel`} variant="quiet" label="Cancel" onPress={() => onDone?.()} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xs, paddingVertical: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  form: { gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  saved: { color: colors.teal },
});
