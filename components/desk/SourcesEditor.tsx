import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Citation } from '@/shared/entries/schema';
import { useParseCitations } from '../queries/drafts';
import { ProblemNotice } from '../auth/Form';
import { problemOf } from '../auth/useForm';
import { citationLine } from '../entry/sections';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/Button';
import { EditorField } from './EditorField';

interface SourcesEditorProps {
  sources: Citation[];
  onChange: (sources: Citation[]) => void;
  error?: string;
}

/**
 * The version's sources: paste BibTeX, RIS or CSL-JSON and the server reads each item into
 * CSL-JSON; items it cannot read are listed with the reason, the rest are added. Each source can be
 * moved, removed and given a note on what it supports.
 */
export function SourcesEditor({ sources, onChange, error }: SourcesEditorProps) {
  const [pasted, setPasted] = useState('');
  const parse = useParseCitations();

  const add = () =>
    parse.mutate(pasted, {
      onSuccess: ({ items }) => {
        onChange([...sources, ...items.map((item) => ({ csl: item.csl, note: item.note ?? '' }))]);
        setPasted('');
      },
    });
  const move = (from: number, to: number) => {
    const next = [...sources];
    const [item] = next.splice(from, 1);
    next.splice(to, 0, item);
    onChange(next);
  };
  const setNote = (index: number, note: string) => onChange(sources.map((s, i) => (i === index ? { ...s, note } : s)));

  return (
    <View testID="editor-field-sources" style={styles.root}>
      <EditorField
        name="sources-paste"
        label="Add sources"
        lines={5}
        mono
        value={pasted}
        onChangeText={setPasted}
        hint="Paste one or more items as BibTeX, RIS or CSL-JSON."
      />
      <Button testID="sources-add" label="Read and add" busyLabel="Reading…" busy={parse.isPending} disabled={!pasted.trim()} onPress={add} />
      <ProblemNotice testID="sources-error" problem={parse.error ? problemOf(parse.error) : null} />
      {parse.data && parse.data.problems.length > 0 ? (
        <View testID="sources-problems" style={styles.problems}>
          <Text style={type.uiStrong}>
            {parse.data.problems.length === 1 ? 'One item could not be read' : `${parse.data.problems.length} items could not be read`}; the
            others were added.
          </Text>
          {parse.data.problems.map((problem) => (
            <View key={problem.index} testID={`sources-problem-${problem.index}`} style={styles.problem}>
              <Text style={type.caption}>
                Item {problem.index + 1}: {problem.reason}
              </Text>
              <Text style={[type.mono, styles.input]} numberOfLines={3}>
                {problem.input}
              </Text>
            </View>
          ))}
        </View>
      ) : null}
      {error ? <Text testID="editor-error-sources" style={[type.caption, styles.error]}>{error}</Text> : null}
      {sources.length === 0 ? (
        <Text style={type.caption}>No sources yet. Every entry needs the textbooks and papers its objection rests on.</Text>
      ) : (
        <View role="list" style={styles.list}>
          {sources.map((source, i) => (
            <View role="listitem" key={`${source.csl.id}-${i}`} testID={`source-item-${i + 1}`} style={styles.item}>
              <Text style={type.body}>
                {i + 1}. {citationLine({ ...source, note: '' })}
              </Text>
              <EditorField
                name={`source-note-${i + 1}`}
                label="What it supports"
                value={source.note}
                onChangeText={(note) => setNote(i, note)}
              />
              <View style={styles.actions}>
                <Button testID={`source-up-${i + 1}`} variant="quiet" label="Move up" disabled={i === 0} onPress={() => move(i, i - 1)} />
                <Button
                  testID={`source-down-${i + 1}`}
                  variant="quiet"
                  label="Move down"
                  disabled={i === sources.length - 1}
                  onPress={() => move(i, i + 1)}
                />
                <Button testID={`source-remove-${i + 1}`} variant="quiet" label="Remove" onPress={() => onChange(sources.filter((_, j) => j !== i))} />
              </View>
            </View>
          ))}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  problems: { gap: space.xs, backgroundColor: colors.brassWash, borderRadius: radius.sm, padding: space.sm },
  problem: { gap: 2 },
  input: { fontSize: 12, color: colors.inkMuted },
  error: { color: colors.ink },
  list: { gap: space.md },
  item: { gap: space.xs, paddingTop: space.sm, borderTopColor: colors.rule, borderTopWidth: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
