import { router } from 'expo-router';
import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { Platform, Pressable, StyleSheet, Text, useWindowDimensions, View, type ViewStyle } from 'react-native';
import { IN_BRIEF_MAX_WORDS, wordCount } from '@/shared/entries/schema';
import { contentTexProblems, texProblemWords } from '@/shared/entries/tex-check';
import { fieldLabel, fieldSentence } from '@/shared/schemas/drafts';
import { ChoiceChips } from '../admin/ChoiceChips';
import { useDebounced } from '../ui/useDebounced';
import { useDraftAction } from '../queries/drafts';
import { useTaxonomy } from '../queries/taxonomy';
import type { DraftDto } from '@/shared/api-types';
import { ProblemNotice } from '../auth/Form';
import { problemOf } from '../auth/useForm';
import { serverFieldErrors } from '../http/fieldErrors';
import { replyLabels, sectionTitles } from '../entry/sections';
import { colors, focusRing, layout, radius, space, type } from '../theme';
import { Button } from '../ui/Button';
import { Section } from '../ui/Screen';
import { EditorField } from './EditorField';
import { asSentence, editorValues, previewContent, readValues, type EditorField as Field, type EditorValues } from './editorValues';
import { EntryPreview } from './EntryPreview';
import { RowsEditor } from './RowsEditor';
import { SaveStatus } from './SaveStatus';
import { SourcesEditor } from './SourcesEditor';
import { ToggleChips } from './ToggleChips';
import { useAutosave } from './useAutosave';
import { WorksheetEditor } from './WorksheetEditor';

/**
 * What a new entry's editor hands to the draft's own screen when the first save has made the draft
 * and the address changes to /desk/drafts/<id>: what was typed meanwhile, and where the caret was.
 */
interface HandOver {
  values: EditorValues;
  focus?: { testID: string; start: number | null; end: number | null };
}
const handOvers = new Map<number, HandOver>();

/** On the web: which field has the caret, to put it back after the screen changes. */
function currentFocus(): HandOver['focus'] {
  if (Platform.OS !== 'web' || typeof document === 'undefined') return undefined;
  const el = document.activeElement as HTMLInputElement | null;
  const testID = el?.getAttribute?.('data-testid');
  if (!el || !testID) return undefined;
  return { testID, start: el.selectionStart ?? null, end: el.selectionEnd ?? null };
}

/** On the web: moves the caret into a field (by test id) and brings it into view. */
function focusField(testID: string, start?: number | null, end?: number | null): void {
  if (Platform.OS !== 'web' || typeof document === 'undefined') return;
  const el = document.querySelector<HTMLInputElement>(`[data-testid="${testID}"]`);
  if (!el) return;
  el.focus();
  el.scrollIntoView?.({ block: 'center' });
  if (start != null && typeof el.setSelectionRange === 'function') el.setSelectionRange(start, end ?? start);
}

/** The test id of the input that holds a field's path ("whyItFails", "repliesAndAnswers.0.answer"). */
function inputOf(path: string): string {
  const m = /^repliesAndAnswers\.(\d+)\.(reply|answer)$/.exec(path);
  if (m) return `editor-field-${m[2]}-${Number(m[1]) + 1}`;
  return `editor-field-${path.split('.')[0]}`;
}

/** "Why it fails, line 4: KaTeX says …": a formula KaTeX cannot read, named by field and line. */
interface TexBlocker {
  path: string;
  sentence: string;
}

/**
 * The editor for a draft of an entry: every section, checked as it is typed by the schema the
 * server uses (a field's problem shows once the field has been left, or after an attempt to send),
 * saved as it goes, previewed as readers will see it — beside the fields on a wide screen, one tap
 * away on a phone — and sent for review when ready. Without a draft it writes a new entry, created
 * on its first save, after which the address becomes the draft's own.
 */
export function EntryEditor({ draft }: { draft?: DraftDto }) {
  const [values, setValues] = useState<EditorValues>(() => (draft && handOvers.get(draft.id)?.values) || editorValues(draft?.slug ?? '', draft?.content));
  const [touched, setTouched] = useState<ReadonlySet<string>>(() => new Set());
  const [attempted, setAttempted] = useState(false);
  const [mode, setMode] = useState<'edit' | 'preview'>('edit');
  const { width } = useWindowDimensions();
  const wide = width >= layout.wideMinWidth;
  const latest = useRef(values);
  latest.current = values;

  const reading = useMemo(() => readValues(values), [values]);
  const autosave = useAutosave({
    draft,
    slug: values.slug,
    content: reading.content,
    onCreated: (created) => {
      handOvers.set(created.id, { values: latest.current, focus: currentFocus() });
      router.replace(`/desk/drafts/${created.id}`);
    },
  });
  const submit = useDraftAction();
  const { data: taxonomy } = useTaxonomy();
  const shown = useDebounced(values, 300);
  const preview = useMemo(() => previewContent(shown), [shown]);
  const tex = useMemo(() => contentTexProblems(preview), [preview]);
  const texBlockers: TexBlocker[] = Object.entries(tex).map(([path, p]) => ({ path, sentence: `${fieldLabel(path)}, ${texProblemWords(p)}.` }));

  // After the address changed to the draft's own: the caret goes back where it was.
  useEffect(() => {
    if (!draft) return;
    const handed = handOvers.get(draft.id);
    if (!handed) return;
    handOvers.delete(draft.id);
    if (handed.focus) focusField(handed.focus.testID, handed.focus.start, handed.focus.end);
  }, [draft]);

  const touch = (field: string) => setTouched((current) => (current.has(field) ? current : new Set(current).add(field)));
  const set = <K extends Field>(field: K) => (value: EditorValues[K]) => setValues((current) => ({ ...current, [field]: value }));
  const setAndTouch = <K extends Field>(field: K) => (value: EditorValues[K]) => {
    touch(field);
    set(field)(value);
  };

  // The server's word on the last attempt to send, by top-level field, until the field is changed.
  const serverFields = useMemo(() => {
    const byField: Partial<Record<string, string>> = {};
    for (const [path, message] of Object.entries(serverFieldErrors(submit.error))) {
      const field = path.replace(/^(body\.)?content\./, '').split('.')[0];
      byField[field] ??= fieldSentence(path, message);
    }
    return byField;
  }, [submit.error]);

  const texOf = (field: string) => Object.entries(tex).find(([path]) => path === field || path.startsWith(`${field}.`));
  const problem = (field: Field): string | undefined => {
    if (!attempted && !touched.has(field)) return undefined;
    const own = reading.problems[field];
    if (own) return own;
    const t = texOf(field);
    if (t) return asSentence(texProblemWords(t[1]));
    return serverFields[field];
  };
  const text = (field: Exclude<Field, 'laws' | 'worksheets' | 'repliesAndAnswers' | 'questionsToAsk' | 'sources'>, label: string, extra: Partial<Parameters<typeof EditorField>[0]> = {}) => (
    <EditorField name={field} label={label} value={values[field]} onChangeText={set(field)} onBlur={() => touch(field)} error={problem(field)} {...extra} />
  );

  const words = wordCount(values.inBrief);
  const saved = autosave.saved;
  const fieldProblems = Object.entries(reading.problems) as [Field, string][];
  const ready = fieldProblems.length === 0 && texBlockers.length === 0;
  const waitingForSave = !saved || autosave.state.kind !== 'saved';
  const sendForReview = () => {
    if (!ready) {
      setAttempted(true);
      return;
    }
    if (!saved || waitingForSave) return;
    setAttempted(true);
    submit.mutate({ id: saved.id, action: 'submit', lockVersion: saved.lockVersion }, { onSuccess: () => router.replace(`/desk/drafts/${saved.id}`) });
  };
  const goTo = (path: string) => {
    setMode('edit');
    // After the switch back to the fields has rendered.
    setTimeout(() => focusField(inputOf(path)), 0);
  };

  const fields = (
    <View style={styles.column}>
      <Section title="Naming">
        <View style={styles.fields}>
          {text('title', 'Title')}
          {text('slug', 'Address', {
            mono: true,
            editable: !draft && !saved,
            hint: saved ? `The entry lives at /entries/${values.slug}; the address does not change.` : 'Lower-case words joined by hyphens; it becomes the permanent address /entries/<address>.',
          })}
          {text('aliases', 'Other names it goes by', { lines: 2, hint: 'One a line; the box grows as you add names.' })}
        </View>
      </Section>

      <Section title="Classification">
        <View style={styles.fields}>
          <View testID="editor-field-mechanismClass" style={styles.group}>
            <Text style={type.uiStrong}>Mechanism class</Text>
            <ChoiceChips
              label="Mechanism class"
              testID="class-pick"
              options={(taxonomy?.classes ?? []).map((c) => ({ value: c.slug, label: c.name }))}
              value={values.mechanismClass}
              onChange={setAndTouch('mechanismClass')}
            />
            {problem('mechanismClass') ? (
              <Text testID="editor-error-mechanismClass" style={styles.groupError}>
                Pick the class the mechanism belongs to.
              </Text>
            ) : null}
          </View>
          <View testID="editor-field-laws" style={styles.group}>
            <Text style={type.uiStrong}>Conservation laws it breaks</Text>
            <ToggleChips
              label="Conservation laws it breaks"
              testID="law-pick"
              options={(taxonomy?.laws ?? []).map((l) => ({ value: l.slug, label: l.name }))}
              values={values.laws}
              onChange={setAndTouch('laws')}
            />
            {problem('laws') ? (
              <Text testID="editor-error-laws" style={styles.groupError}>
                {problem('laws')}
              </Text>
            ) : null}
          </View>
        </View>
      </Section>

      <Section title="The objection">
        <View style={styles.fields}>
          {text('inBrief', sectionTitles.inBrief, {
            lines: 4,
            hint: 'Plain language for anyone; Markdown.',
            aside: (
              <Text testID="in-brief-count" style={[type.caption, words > IN_BRIEF_MAX_WORDS && styles.over]}>
                {words} of {IN_BRIEF_MAX_WORDS} words
              </Text>
            ),
          })}
          {text('howItIsPitched', sectionTitles.howItIsPitched, { lines: 6, hint: 'The claim pattern and the phrases that give it away.' })}
          {text('whyItFails', sectionTitles.whyItFails, { lines: 12, hint: 'The technical objection: Markdown, with TeX between $…$ or $$…$$.' })}
          <WorksheetEditor label={sectionTitles.worksheets} value={values.worksheets} onChange={setAndTouch('worksheets')} error={problem('worksheets')} />
          {text('whatFakesTheEffect', sectionTitles.whatFakesTheEffect, { lines: 6, hint: 'Experimental artifacts that look like the effect.' })}
          <RowsEditor
            name="repliesAndAnswers"
            label={sectionTitles.repliesAndAnswers}
            rows={values.repliesAndAnswers}
            onChange={set('repliesAndAnswers')}
            blank={() => ({ reply: '', answer: '' })}
            addLabel="Add a reply"
            error={problem('repliesAndAnswers')}
            renderRow={(row, update, i) => (
              <>
                <EditorField name={`reply-${i + 1}`} label={replyLabels.reply} lines={2} value={row.reply} onChangeText={(reply) => update({ ...row, reply })} onBlur={() => touch('repliesAndAnswers')} />
                <EditorField name={`answer-${i + 1}`} label={replyLabels.answer} lines={4} value={row.answer} onChangeText={(answer) => update({ ...row, answer })} onBlur={() => touch('repliesAndAnswers')} />
              </>
            )}
          />
          <RowsEditor
            name="questionsToAsk"
            label={sectionTitles.questionsToAsk}
            rows={values.questionsToAsk}
            onChange={set('questionsToAsk')}
            blank={() => ''}
            addLabel="Add a question"
            error={problem('questionsToAsk')}
            renderRow={(row, update, i) => (
              <EditorField name={`question-${i + 1}`} label={`Question ${i + 1}`} value={row} onChangeText={update} onBlur={() => touch('questionsToAsk')} />
            )}
          />
          {text('cautions', sectionTitles.cautions, { lines: 4, hint: 'Where the work can hurt someone (high voltage, vacuum, rotating machinery); defer to local codes.' })}
          {text('related', sectionTitles.related, { lines: 2, mono: true, hint: 'Addresses of other entries, one a line.' })}
        </View>
      </Section>

      <Section title={sectionTitles.sources}>
        <SourcesEditor sources={values.sources} onChange={setAndTouch('sources')} error={problem('sources')} />
      </Section>

      <View style={styles.submit}>
        {texBlockers.length ? (
          <View testID="submit-blocked" role="alert" style={styles.blocked}>
            <Text style={type.uiStrong}>Not ready to send: KaTeX cannot read {texBlockers.length === 1 ? 'a formula' : `${texBlockers.length} formulas`}.</Text>
            {texBlockers.map((b) => (
              <Blocker key={b.path} testID={`submit-blocked-${b.path}`} onPress={() => goTo(b.path)}>
                {b.sentence}
              </Blocker>
            ))}
          </View>
        ) : null}
        {attempted && fieldProblems.length ? (
          <View testID="submit-missing" role="alert" style={styles.blocked}>
            <Text style={type.uiStrong}>Not sent: {fieldProblems.length === 1 ? 'one part needs' : `${fieldProblems.length} parts need`} your attention.</Text>
            {fieldProblems.map(([field, message]) => (
              <Blocker key={field} testID={`submit-missing-${field}`} onPress={() => goTo(field)}>
                {`${fieldLabel(field)}: ${message}`}
              </Blocker>
            ))}
          </View>
        ) : null}
        <ProblemNotice testID="submit-error" problem={submit.error ? problemOf(submit.error) : null} />
        <Button
          testID="submit-review"
          label="Send for review"
          busyLabel="Sending…"
          busy={submit.isPending}
          disabled={texBlockers.length > 0 || (ready && waitingForSave)}
          onPress={sendForReview}
        />
        <Text testID="submit-why" style={type.caption}>
          {texBlockers.length
            ? 'Send for review is held until KaTeX can read every formula: press a line above to go to it.'
            : ready && waitingForSave
              ? 'Send for review waits until the draft is saved.'
              : 'Another editor checks the draft and approves it or sends it back with a reason. Until then readers see the last published version.'}
        </Text>
      </View>
    </View>
  );

  const previewPane = (
    <View testID="editor-preview-pane" style={[styles.column, wide && styles.previewWide]}>
      <Text role="heading" aria-level={2} style={[type.title, styles.previewTitle]}>
        Preview
      </Text>
      <EntryPreview content={preview} />
    </View>
  );

  return (
    <View testID="entry-editor" style={styles.root}>
      <View style={styles.status}>
        <SaveStatus
          state={autosave.state}
          mine={reading.content}
          onRetry={autosave.retry}
          onKeepMine={autosave.keepMine}
          onTakeTheirs={() => {
            const theirs = autosave.takeTheirs();
            if (theirs) setValues(editorValues(theirs.slug, theirs.content));
          }}
        />
      </View>
      {wide ? (
        <View testID="editor-columns" style={styles.columns}>
          {fields}
          {previewPane}
        </View>
      ) : (
        <>
          <ModeSwitch mode={mode} onChange={setMode} />
          {mode === 'edit' ? fields : previewPane}
        </>
      )}
    </View>
  );
}

/** One line of what stops the draft going to review, pressable to go to the field. */
function Blocker({ testID, onPress, children }: { testID: string; onPress: () => void; children: ReactNode }) {
  return (
    <Pressable role="link" testID={testID} onPress={onPress} style={styles.blocker}>
      <Text style={[type.ui, styles.blockerText]}>{children}</Text>
    </Pressable>
  );
}

/** On a phone: the fields or the preview, one tap apart; the labels are short and never wrap. */
function ModeSwitch({ mode, onChange }: { mode: 'edit' | 'preview'; onChange: (mode: 'edit' | 'preview') => void }) {
  const options = [
    { value: 'edit', label: 'Edit' },
    { value: 'preview', label: 'Preview' },
  ] as const;
  return (
    <View role="tablist" aria-label="Edit or preview the draft" testID="editor-mode" style={styles.switch}>
      {options.map((o) => {
        const on = mode === o.value;
        return (
          <Pressable
            key={o.value}
            role="tab"
            aria-selected={on}
            testID={`editor-mode-${o.value}`}
            onPress={() => onChange(o.value)}
            style={[styles.tab, on && styles.tabOn]}
          >
            <Text numberOfLines={1} style={[type.uiStrong, styles.tabLabel, on && styles.tabLabelOn]}>
              {o.label}
            </Text>
          </Pressable>
        );
      })}
    </View>
  );
}

/** The preview beside the fields stays in view while the fields scroll (the Shell's scroll view is the scroller). */
const sticky = (Platform.OS === 'web' ? { position: 'sticky', top: space.md, maxHeight: `calc(100vh - ${2 * space.md}px)`, overflowY: 'auto' } : {}) as unknown as ViewStyle;

const styles = StyleSheet.create({
  root: { gap: space.md },
  status: { gap: space.xs },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  column: { flex: 1, minWidth: 0, gap: space.md },
  previewWide: { ...sticky, alignSelf: 'flex-start' },
  previewTitle: { marginTop: space.lg },
  fields: { gap: space.lg },
  group: { gap: space.xs },
  groupError: { ...type.caption, color: colors.ink },
  over: { color: colors.brass, fontFamily: type.uiStrong.fontFamily },
  submit: { gap: space.sm, marginTop: space.lg, paddingTop: space.md, borderTopColor: colors.rule, borderTopWidth: 1 },
  blocked: {
    gap: space.xs,
    backgroundColor: colors.brassWash,
    borderLeftColor: colors.brass,
    borderLeftWidth: 3,
    borderRadius: radius.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
  },
  blocker: { ...focusRing, minHeight: 44, justifyContent: 'center' },
  blockerText: { color: colors.teal, textDecorationLine: 'underline' },
  switch: {
    flexDirection: 'row',
    alignSelf: 'flex-start',
    borderColor: colors.teal,
    borderWidth: 1,
    borderRadius: radius.sm,
    overflow: 'hidden',
  },
  tab: { ...focusRing, minHeight: 44, minWidth: 96, paddingHorizontal: space.md, alignItems: 'center', justifyContent: 'center', flexShrink: 0 },
  tabOn: { backgroundColor: colors.teal },
  tabLabel: { color: colors.teal },
  tabLabelOn: { color: colors.paper },
});
