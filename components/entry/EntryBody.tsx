import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import type { EntryContent } from '@/shared/entries/schema';
import type { EntryHtml } from '@/shared/api-types';
import { Markdown } from '../markdown/Markdown';
import { colors, layout, space, type } from '../theme';
import { Notice } from '../ui/Notice';
import { TextLink } from '../ui/TextLink';
import { EntrySection } from './EntrySection';
import { EntryWorksheets } from './EntryWorksheets';
import { SourceList } from './SourceList';

interface EntryBodyProps {
  content: EntryContent;
  /** The Markdown sections as sanitised HTML (from the API, or rendered here for the Desk's preview). */
  html: EntryHtml;
}

/**
 * The sections of one version in reading order. From about 960 px wide the worksheets and the
 * sources stand in a column beside the text; on a phone everything is one column.
 */
export function EntryBody({ content, html }: EntryBodyProps) {
  const { width } = useWindowDimensions();
  const wide = width >= layout.wideMinWidth;
  const worksheets = (
    <EntrySection field="worksheets">
      <EntryWorksheets worksheets={content.worksheets} />
    </EntrySection>
  );
  const sources = (
    <EntrySection field="sources">
      <SourceList sources={content.sources} />
    </EntrySection>
  );

  const text = (
    <View style={styles.column}>
      <EntrySection field="inBrief">
        <Markdown html={html.inBrief} />
      </EntrySection>
      <EntrySection field="howItIsPitched">
        <Markdown html={html.howItIsPitched} />
      </EntrySection>
      <EntrySection field="whyItFails">
        <Markdown html={html.whyItFails} />
      </EntrySection>
      {wide ? null : worksheets}
      {html.whatFakesTheEffect ? (
        <EntrySection field="whatFakesTheEffect">
          <Markdown html={html.whatFakesTheEffect} />
        </EntrySection>
      ) : null}
      {html.replies.length > 0 ? (
        <EntrySection field="repliesAndAnswers">
          <View style={styles.replies}>
            {html.replies.map((pair, i) => (
              <View key={i} testID={`reply-${i + 1}`} style={styles.reply}>
                <Text style={type.uiStrong}>“They say”</Text>
                <Markdown html={pair.reply} size="compact" />
                <Text style={type.uiStrong}>The answer</Text>
                <Markdown html={pair.answer} size="compact" />
              </View>
            ))}
          </View>
        </EntrySection>
      ) : null}
      {content.questionsToAsk.length > 0 ? (
        <EntrySection field="questionsToAsk">
          <View role="list" style={styles.questions}>
            {content.questionsToAsk.map((question, i) => (
              <Text role="listitem" key={i} style={type.reading}>
                {i + 1}. {question}
              </Text>
            ))}
          </View>
        </EntrySection>
      ) : null}
      {html.cautions ? (
        <EntrySection field="cautions">
          <Notice tone="warning" testID="entry-cautions" title="Where this work can hurt someone">
            <Markdown html={html.cautions} size="compact" />
          </Notice>
        </EntrySection>
      ) : null}
      {wide ? null : sources}
      {content.related.length > 0 ? (
        <EntrySection field="related">
          <View style={styles.related}>
            {content.related.map((slug) => (
              <TextLink key={slug} href={`/entries/${slug}`} testID={`related-${slug}`}>
                {slug.replace(/-/g, ' ')}
              </TextLink>
            ))}
          </View>
        </EntrySection>
      ) : null}
    </View>
  );

  if (!wide) return text;
  return (
    <View style={styles.columns}>
      {text}
      <View style={styles.side}>
        {worksheets}
        {sources}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  column: { flex: 3, minWidth: 0 },
  side: { flex: 2, minWidth: 0, paddingLeft: space.lg, borderLeftColor: colors.rule, borderLeftWidth: 1 },
  replies: { gap: space.lg },
  reply: { gap: space.xxs },
  questions: { gap: space.xs },
  related: { gap: space.xs },
});
