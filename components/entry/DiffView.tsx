import { diffLines, diffWords, type Change } from 'diff';
import { StyleSheet, Text, View } from 'react-native';
import type { EntryContent } from '@/shared/entries/schema';
import { colors, radius, space, type } from '../theme';
import { sectionTexts, sectionTitles } from './sections';

interface DiffViewProps {
  /** The older text, named as the caption says it: "version 2", "the copy saved elsewhere". */
  from: { label: string; content: EntryContent };
  to: { label: string; content: EntryContent };
}

/** Prose is compared word by word; lists and worksheets (one item a line) line by line. */
const byLine = new Set([
  'Other names',
  'Conservation laws',
  sectionTitles.worksheets,
  sectionTitles.questionsToAsk,
  sectionTitles.sources,
  sectionTitles.related,
]);

/** Each line ends in a newline, so that a line added after the last one leaves the last one alone. */
const closed = (text: string) => (text && !text.endsWith('\n') ? `${text}\n` : text);

/**
 * Words as Unicode's word boundaries (UAX #29) find them, which keep a number whole ("3.34", "6,000")
 * where jsdiff's own tokens split it at the point, so "3.3 → 3.34" is one changed word, not "3" and "34".
 */
const segmenter = typeof Intl !== 'undefined' && 'Segmenter' in Intl ? new Intl.Segmenter('en', { granularity: 'word' }) : undefined;

/** Line breaks in the Markdown source are not part of the text a reader sees: runs of white space become one space. */
export const normaliseSpace = (text: string) => text.replace(/\s+/g, ' ').trim();

/** The changes between two texts of one section: word by word for prose, line by line for lists. */
export function compareSection(label: string, older: string, newer: string): Change[] {
  if (byLine.has(label)) return diffLines(closed(older), closed(newer));
  return diffWords(normaliseSpace(older), normaliseSpace(newer), segmenter ? { intlSegmenter: segmenter } : {});
}

/**
 * What changed between two versions of an entry, section by section: added words underlined on a teal wash,
 * removed words struck through in brass. Sections that did not change are listed as such.
 */
export function DiffView({ from, to }: DiffViewProps) {
  const before = new Map(sectionTexts(from.content));
  const changed = sectionTexts(to.content)
    .map(([label, text]) => ({ label, changes: compareSection(label, before.get(label) ?? '', text) }))
    .filter(({ changes }) => changes.some((c) => c.added || c.removed));
  const unchanged = sectionTexts(to.content).length - changed.length;

  return (
    <View testID="diff-view" style={styles.root}>
      <Text style={type.caption}>
        From {from.label} to {to.label}:{' '}
        <Text style={styles.added}>added text is underlined</Text>,{' '}
        <Text style={styles.removed}>removed text is struck through</Text>.
      </Text>
      {changed.length === 0 ? (
        <Text testID="diff-none" style={type.body}>
          Both have the same text in every section.
        </Text>
      ) : (
        changed.map(({ label, changes }) => (
          <View key={label} testID={`diff-section-${label}`} style={styles.section}>
            <Text style={type.uiStrong}>{label}</Text>
            <Text style={type.body}>
              {changes.map((change, i) => (
                <ChangeText key={i} change={change} />
              ))}
            </Text>
          </View>
        ))
      )}
      {changed.length > 0 && unchanged > 0 ? (
        <Text style={type.caption}>
          {unchanged} other {unchanged === 1 ? 'part is' : 'parts are'} the same in both.
        </Text>
      ) : null}
    </View>
  );
}

function ChangeText({ change }: { change: Change }) {
  if (change.added) {
    return (
      <Text testID="diff-added" aria-label={`added: ${change.value}`} style={styles.added}>
        {change.value}
      </Text>
    );
  }
  if (change.removed) {
    return (
      <Text testID="diff-removed" aria-label={`removed: ${change.value}`} style={styles.removed}>
        {change.value}
      </Text>
    );
  }
  return <Text>{change.value}</Text>;
}

const styles = StyleSheet.create({
  root: { gap: space.md },
  section: { gap: space.xxs, paddingTop: space.sm, borderTopColor: colors.rule, borderTopWidth: 1 },
  added: { color: colors.teal, backgroundColor: colors.tealWash, textDecorationLine: 'underline', borderRadius: radius.sm },
  removed: { color: colors.brass, backgroundColor: colors.brassWash, textDecorationLine: 'line-through', borderRadius: radius.sm },
});
