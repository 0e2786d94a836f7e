import { useMemo } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { EntryContent } from '@/shared/entries/schema';
import { renderMarkdown } from '@/shared/markdown';
import type { EntryHtml } from '@/shared/api-types';
import { EntryBody } from '../entry/EntryBody';
import { EntryWorksheets } from '../entry/EntryWorksheets';
import { colors, radius, space, type } from '../theme';

/** The Markdown sections rendered by the same pipeline the server uses for readers. */
function htmlOf(content: EntryContent): EntryHtml {
  return {
    inBrief: renderMarkdown(content.inBrief),
    howItIsPitched: renderMarkdown(content.howItIsPitched),
    whyItFails: renderMarkdown(content.whyItFails),
    whatFakesTheEffect: content.whatFakesTheEffect ? renderMarkdown(content.whatFakesTheEffect) : '',
    cautions: content.cautions ? renderMarkdown(content.cautions) : '',
    replies: content.repliesAndAnswers.map((r) => ({ reply: renderMarkdown(r.reply), answer: renderMarkdown(r.answer) })),
  };
}

/** A draft as readers will see it once published: every section, worksheets running. */
export function EntryPreview({ content }: { content: EntryContent }) {
  const html = useMemo(() => htmlOf(content), [content]);
  return (
    <View testID="editor-preview" style={styles.frame}>
      <Text role="heading" aria-level={2} style={type.title}>
        {content.title || 'Untitled entry'}
      </Text>
      <EntryBody content={content} html={html} Worksheets={EntryWorksheets} />
    </View>
  );
}

const styles = StyleSheet.create({
  frame: {
    gap: space.sm,
    borderColor: colors.rule,
    borderWidth: 1,
    borderStyle: 'dashed',
    borderRadius: radius.md,
    padding: space.md,
  },
});
