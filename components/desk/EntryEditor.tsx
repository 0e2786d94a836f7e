import { router } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { IN_BRIEF_MAX_WORDS, wordCount } from '@/shared/entries/schema';
import { ChoiceChips } from '../admin/ChoiceChips';
import { useDebounced } from '../ui/useDebounced';
import { useDraftAction } from '../queries/drafts';
import { useTaxonomy } from '../queries/taxonomy';
import type { DraftDto } from '@/shared/api-types';
import { ProblemNotice } from '../auth/Form';
import { problemOf } from '../auth/useForm';
import { replyLabels, sectionTitles } from '../entry/sections';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { Section } from '../ui/Screen';
import { EditorField } from './EditorField';
import { editorValues, previewContent, readValues, type EditorField as Field, type EditorValues } from './editorValues';
import { EntryPreview } from './EntryPreview';
import { RowsEditor } from './RowsEditor';
import { SaveStatus } from './SaveStatus';
import { SourcesEditor } from './SourcesEditor';
import { ToggleChips } from './ToggleChips';
import { useAutosave } from './useAutosave';
import { WorksheetEditor } from './WorksheetEditor';

/**
 * The editor for a draft of an entry: every section, checked as it is typed by the schema the
 * server uses, saved as it goes, previewed as readers will see it, and sent for review when ready.
 * Without a draft it writes a new entry, created on its first save.
 */
export function EntryEditor({ draft }: { draft?: DraftDto }) {
  const [values, setValues] = useState<EditorValues>(() => editorValues(draft?.slug ?? '', draft?.content));
  const reading = useMemo(() => readValues(values), [values]);
  const autosave = useAutosave({ draft, slug: values.slug, content: reading.content });
  const submit = useDraftAction();
  const { data: taxonomy } = useTaxonomy();
  const shown = useDebounced(values, 300);
  const preview = useMemo(() => previewContent(shown), [shown]);

  const set = <K extends Field>(field: K) => (value: EditorValues[K]) => setValues((current) => ({ ...current, [field]: value }));
  const problem = (field: Field) => reading.problems[field];
  const text = (field: Exclude<Field, 'laws' | 'worksheets' | 'repliesAndAnswers' | 'questionsToAsk' | 'sources'>, label: string, extra: Partial<Parameters<typeof EditorField>[0]> = {}) => (
    <EditorField name={field} label={label} value={values[field]} onChangeText={set(field)} error={problem(field)} {...extra} />
  );

  const words = wordCount(values.inBrief);
  const saved = autosave.saved;
  const sendForReview = () => {
    if (!saved) return;
    submit.mutate({ id: saved.id, action: 'submit', lockVersion: saved.lockVersion }, { onSuccess: () => router.replace(`/desk/drafts/${saved.id}`) });
  };

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

      <Section title="Naming">
        <View style={styles.fields}>
          {text('title', 'Title')}
          {text('slug', 'Address', {
            mono: true,
            editable: !draft && !saved,
            hint: saved ? `The entry lives at /entries/${values.slug}; the address does not change.` : 'Lower-case words joined by hyphens; it becomes the permanent address /entries/<address>.',
          })}
          {text('aliases', 'Other names it goes by', { lines: 3, hint: 'One a line.' })}
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
              onChange={set('mechanismClass')}
            />
            {problem('mechanismClass') ? <Text style={type.caption}>Pick the class the mechanism belongs to.</Text> : null}
          </View>
          <View testID="editor-field-laws" style={styles.group}>
            <Text style={type.uiStrong}>Conservation laws it breaks</Text>
            <ToggleChips
              label="Conservation laws it breaks"
              testID="law-pick"
              options={(taxonomy?.laws ?? []).map((l) => ({ value: l.slug, label: l.name }))}
              values={values.laws}
              onChange={set('laws')}
            />
            {problem('laws') ? <Text style={type.caption}>{problem('laws')}</Text> : null}
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
          <WorksheetEditor label={sectionTitles.worksheets} value={values.worksheets} onChange={set('worksheets')} error={problem('worksheets')} />
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
                <EditorField name={`reply-${i + 1}`} label={replyLabels.reply} lines={2} value={row.reply} onChangeText={(reply) => update({ ...row, reply })} />
                <EditorField name={`answer-${i + 1}`} label={replyLabels.answer} lines={4} value={row.answer} onChangeText={(answer) => update({ ...row, answer })} />
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
              <EditorField name={`question-${i + 1}`} label={`Question ${i + 1}`} value={row} onChangeText={update} />
            )}
          />
          {text('cautions', sectionTitles.cautions, { lines: 4, hint: 'Where the work can hurt someone (high voltage, vacuum, rotating machinery); defer to local codes.' })}
          {text('related', sectionTitles.related, { lines: 3, mono: true, hint: 'Addresses of other entries, one a line.' })}
        </View>
      </Section>

      <Section title={sectionTitles.sources}>
        <SourcesEditor sources={values.sources} onChange={set('sources')} error={problem('sources')} />
      </Section>

      <Section title="Preview">
        <EntryPreview content={preview} />
      </Section>

      <View style={styles.submit}>
        <ProblemNotice testID="submit-error" problem={submit.error ? problemOf(submit.error) : null} />
        <Button
          testID="submit-review"
          label="Send for review"
          busyLabel="Sending…"
          busy={submit.isPending}
          disabled={!saved || autosave.state.kind !== 'saved'}
          onPress={sendForReview}
        />
        <Text style={type.caption}>
          Another editor checks the draft and approves it or sends it back with a reason. Until then readers see the last
          published version.
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.md },
  status: { gap: space.xs },
  fields: { gap: space.lg },
  group: { gap: space.xs },
  over: { color: colors.brass, fontFamily: type.uiStrong.fontFamily },
  submit: { gap: space.sm, marginTop: space.lg, paddingTop: space.md, borderTopColor: colors.rule, borderTopWidth: 1 },
});
