/**
 * The decision of a queue item, for the moderator holding it (DESIGN.md §5, Queue): accept (link a
 * sighting to entries), turn it into a draft for an editor, ask the submitter for more, or reject
 * with a reason. Sent as `POST /api/submissions/:id/decide` (shared/api/submissions.ts DecideBody).
 */
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { DecideBody, Decision, SubmissionDto, UserDto } from '@/shared/api-types';
import { slugSchema } from '@/shared/entries/schema';
import { can } from '@/shared/policies';
import { ApiError } from '../http/client';
import { serverFieldErrors } from '../http/fieldErrors';
import { useSearch } from '../queries/search';
import { useTaxonomy } from '../queries/taxonomy';
import { useDecide, useEditors } from '../queries/queue';
import { Field } from '../submissions/Field';
import { problemWords } from '../submissions/words';
import { colors, focusRing, radius, space, type } from '../theme';
import { Button } from '../ui/Button';
import { Chip, chipGroupStyle } from '../ui/Chip';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Section } from '../ui/Screen';
import { useDebounced } from '../ui/useDebounced';
import { FieldError } from '../worksheet/QuantityField';

const DECISION_LABEL: Record<Decision, string> = {
  accept: 'Accept',
  draft: 'Turn into a draft',
  ask: 'Ask for more',
  reject: 'Reject',
};

export function DecisionPanel({ submission: s, user, onStale }: { submission: SubmissionDto; user: UserDto; onStale: () => void }) {
  const [decision, setDecision] = useState<Decision | null>(null);
  const decide = useDecide(s.id);
  const options: Decision[] = s.kind === 'sighting' ? ['accept', 'draft', 'ask', 'reject'] : ['accept', 'ask', 'reject'];
  const send = (body: DecideBody) =>
    decide.mutate(body, {
      onError: (error) => {
        if (error instanceof ApiError && error.status === 409) onStale();
      },
    });

  return (
    <Section title="Decide">
      <View style={styles.panel}>
        <View style={styles.choices}>
          {options.map((d) => (
            <Button
              key={d}
              testID={`item-decide-${d}`}
              variant={decision === d ? 'primary' : 'quiet'}
              label={DECISION_LABEL[d]}
              onPress={() => {
                setDecision(d);
                decide.reset();
              }}
            />
          ))}
        </View>
        {decision === 'accept' && s.kind === 'sighting' ? <AcceptSighting busy={decide.isPending} onSend={send} /> : null}
        {decision === 'accept' && s.kind === 'correction' ? (
          <View style={styles.form}>
            <Text style={type.body}>
              Accepting forwards the report to the editors who wrote and reviewed “{s.entry?.title ?? 'the entry'}”; they
              get an e-mail and decide how to revise it. The submitter is told.
            </Text>
            <Button testID="item-confirm" label="Accept and forward" busy={decide.isPending} busyLabel="Forwarding…" onPress={() => send({ decision: 'accept' })} />
          </View>
        ) : null}
        {decision === 'draft' ? <DraftForm isAdmin={can(user, 'users.list')} busy={decide.isPending} onSend={send} /> : null}
        {decision === 'ask' || decision === 'reject' ? (
          <NoteForm key={decision} decision={decision} busy={decide.isPending} serverError={fieldOf(decide.error, 'body.note')} onSend={send} />
        ) : null}
        {decide.error ? (
          <Notice role="alert" testID="item-decide-error" title="The decision was not recorded.">
            {problemWords(decide.error)}
          </Notice>
        ) : null}
      </View>
    </Section>
  );
}

const fieldOf = (error: Error | null, key: string): string | undefined => serverFieldErrors(error)[key];

function AcceptSighting({ busy, onSend }: { busy: boolean; onSend: (body: DecideBody) => void }) {
  const [q, setQ] = useState('');
  const [chosen, setChosen] = useState<{ slug: string; title: string }[]>([]);
  const [tried, setTried] = useState(false);
  const settled = useDebounced(q.trim(), 250);
  const search = useSearch({ q: settled, limit: 8 }, { enabled: settled !== '' });
  const toggle = (entry: { slug: string; title: string }) =>
    setChosen((list) => (list.some((e) => e.slug === entry.slug) ? list.filter((e) => e.slug !== entry.slug) : [...list, entry]));
  const results = settled !== '' ? (search.data?.results ?? []) : [];
  const shown = [...chosen, ...results.filter((r) => !chosen.some((c) => c.slug === r.slug))];

  return (
    <View style={styles.form}>
      <Text style={type.body}>Link the sighting to the entries whose objection answers it (1 to 10). It then shows on their pages under “Seen in the wild”.</Text>
      <Field label="Search the library" testID="item-entries-search" value={q} onChangeText={setQ} placeholder="cavity, perpetual, Carnot…" />
      {search.isFetching && settled ? <Loading testID="item-entries-searching" label="Searching…" /> : null}
      {search.error ? <FieldError testID="item-entries-error" message={problemWords(search.error)} /> : null}
      {settled && search.data && results.length === 0 ? <Text style={type.caption}>No published entry matches “{settled}”.</Text> : null}
      {shown.length > 0 ? (
        <View role="group" aria-label="Entries to link" style={styles.entryList}>
          {shown.map((entry) => (
            <EntryChoice
              key={entry.slug}
              testID={`item-entry-${entry.slug}`}
              entry={entry}
              checked={chosen.some((c) => c.slug === entry.slug)}
              onPress={() => toggle(entry)}
            />
          ))}
        </View>
      ) : null}
      <Text testID="item-entries-chosen" style={type.caption}>
        {chosen.length === 0 ? 'No entry chosen yet.' : `Chosen: ${chosen.map((c) => c.title).join('; ')}.`}
      </Text>
      {tried && chosen.length === 0 ? <FieldError testID="item-entries-needed" message="Choose at least one entry." /> : null}
      {chosen.length > 10 ? <FieldError testID="item-entries-too-many" message="At most 10 entries; untick some." /> : null}
      <Button
        testID="item-confirm"
        label={chosen.length > 1 ? `Accept and link to ${chosen.length} entries` : 'Accept and link'}
        busy={busy}
        busyLabel="Linking…"
        onPress={() => {
          setTried(true);
          if (chosen.length === 0 || chosen.length > 10) return;
          onSend({ decision: 'accept', entries: chosen.map((c) => c.slug) });
        }}
      />
    </View>
  );
}

/** One entry to tick: a full-width row, so that a long title wraps on a phone. */
function EntryChoice({ entry, checked, onPress, testID }: { entry: { slug: string; title: string }; checked: boolean; onPress: () => void; testID: string }) {
  return (
    <Pressable
      role="checkbox"
      aria-checked={checked}
      aria-label={entry.title}
      testID={testID}
      onPress={onPress}
      style={({ pressed }) => [styles.entryRow, checked && styles.entryRowChecked, pressed && styles.pressed]}
    >
      <View style={[styles.box, checked && styles.boxChecked]}>{checked ? <Text style={styles.tick}>✓</Text> : null}</View>
      <View style={styles.entryText}>
        <Text style={type.ui}>{entry.title}</Text>
        <Text style={type.small}>{entry.slug}</Text>
      </View>
    </Pressable>
  );
}

function DraftForm({ isAdmin, busy, onSend }: { isAdmin: boolean; busy: boolean; onSend: (body: DecideBody) => void }) {
  const [slug, setSlug] = useState('');
  const [mechanismClass, setClass] = useState('');
  const [editorId, setEditorId] = useState('');
  const [tried, setTried] = useState(false);
  const taxonomy = useTaxonomy();
  const editors = useEditors(isAdmin, true);
  const slugOk = slugSchema.safeParse(slug.trim()).success;
  const editorNumber = Number(editorId);
  const editorOk = Number.isInteger(editorNumber) && editorNumber > 0;
  const classes = taxonomy.data?.classes ?? [];

  return (
    <View style={styles.form}>
      <Text style={type.body}>Opens a new draft entry on an editor’s Desk, with this sighting attached. The editor writes it; another editor reviews it before it is published.</Text>
      <Field
        label="Address of the new entry"
        testID="item-draft-slug"
        kind="mono"
        value={slug}
        onChangeText={setSlug}
        hint="Lower-case words joined by hyphens, 3 to 80 characters, e.g. magnet-motor-loop."
        error={tried && !slugOk ? 'Use lower-case letters and digits, words joined by single hyphens (3 to 80 characters).' : undefined}
      />
      <Text style={type.uiStrong}>Mechanism class</Text>
      {taxonomy.isPending ? <Loading label="Loading the mechanism classes…" /> : null}
      {taxonomy.error ? <ErrorNotice error={taxonomy.error} what="the mechanism classes" onRetry={() => void taxonomy.refetch()} /> : null}
      <View role="radiogroup" aria-label="Mechanism class" style={chipGroupStyle}>
        {classes.map((c) => (
          <Chip key={c.slug} role="radio" testID={`item-draft-class-${c.slug}`} label={c.name} checked={mechanismClass === c.slug} onPress={() => setClass(c.slug)} />
        ))}
      </View>
      {tried && !mechanismClass ? <FieldError testID="item-draft-class-needed" message="Choose the mechanism class." /> : null}
      <Text style={type.uiStrong}>Editor who writes it</Text>
      {editors.isPending ? <Loading label="Loading the editors…" /> : null}
      {editors.data?.editors ? (
        editors.data.editors.length === 0 ? (
          <Text style={type.caption}>There are no editors yet; an admin gives the role.</Text>
        ) : (
          <View role="radiogroup" aria-label="Editor" style={chipGroupStyle}>
            {editors.data.editors.map((e) => (
              <Chip key={e.id} role="radio" testID={`item-draft-editor-${e.id}`} label={e.displayName} checked={editorId === String(e.id)} onPress={() => setEditorId(String(e.id))} />
            ))}
          </View>
        )
      ) : editors.data || editors.error ? (
        <Field
          label="Editor’s account number"
          testID="item-draft-editor-id"
          kind="mono"
          value={editorId}
          onChangeText={setEditorId}
          hint="The list of editors could not be had here; an admin can tell you the number."
        />
      ) : null}
      {tried && !editorOk ? <FieldError testID="item-draft-editor-needed" message="Choose the editor who writes the entry." /> : null}
      <Button
        testID="item-confirm"
        label="Open the draft"
        busy={busy}
        busyLabel="Opening the draft…"
        onPress={() => {
          setTried(true);
          if (!slugOk || !mechanismClass || !editorOk) return;
          onSend({ decision: 'draft', slug: slug.trim(), mechanismClass, editorId: editorNumber });
        }}
      />
    </View>
  );
}

function NoteForm({
  decision,
  busy,
  serverError,
  onSend,
}: {
  decision: 'ask' | 'reject';
  busy: boolean;
  serverError: string | undefined;
  onSend: (body: DecideBody) => void;
}) {
  const [note, setNote] = useState('');
  const [tried, setTried] = useState(false);
  const empty = note.trim() === '';
  const local = tried && empty ? (decision === 'ask' ? 'Write the question first.' : 'Give the reason first.') : note.length > 2000 ? `${note.length} characters; keep it to 2000.` : undefined;
  return (
    <View style={styles.form}>
      <Field
        label={decision === 'ask' ? 'Your question to the submitter' : 'The reason, for the submitter'}
        testID="item-note"
        value={note}
        onChangeText={setNote}
        multiline
        hint={
          decision === 'ask'
            ? 'They get it by e-mail and answer on their page; the item comes back to the queue with the answer.'
            : 'They get it by e-mail. Judge the claim, not the person. Up to 2000 characters.'
        }
        error={local ?? serverError}
      />
      <Button
        testID="item-confirm"
        label={decision === 'ask' ? 'Send the question' : 'Reject with this reason'}
        busy={busy}
        busyLabel="Sending…"
        onPress={() => {
          setTried(true);
          if (empty || note.length > 2000) return;
          onSend({ decision, note: note.trim() });
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    gap: space.md,
    padding: space.md,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
  },
  choices: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  form: { gap: space.sm },
  entryList: { gap: space.xs },
  entryRow: {
    ...focusRing,
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: space.sm,
    padding: space.sm,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
  },
  entryRowChecked: { borderColor: colors.teal, backgroundColor: colors.tealWash },
  pressed: { opacity: 0.85 },
  box: {
    width: 20,
    height: 20,
    marginTop: 1,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.ruleStrong,
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: colors.surface,
  },
  boxChecked: { borderColor: colors.teal, backgroundColor: colors.teal },
  tick: { ...type.small, color: colors.paper, fontFamily: type.uiStrong.fontFamily },
  entryText: { flex: 1, gap: 2 },
});
