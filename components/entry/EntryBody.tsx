import type { ComponentType, ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { EntryContent } from '@/shared/entries/schema';
import type { EntryHtml } from '@/shared/api-types';
import type { Worksheet } from '@/shared/worksheet/schema';
import { Markdown } from '../markdown/Markdown';
import { useEntryList } from '../queries/entries';
import { colors, space, type } from '../theme';
import { Notice } from '../ui/Notice';
import { TextLink } from '../ui/TextLink';
import { EntrySection } from './EntrySection';
import { presentSections, replyLabels, type SectionField } from './sections';
import { SourceList } from './SourceList';

interface EntryBodyProps {
  content: EntryContent;
  /** The Markdown sections as sanitised HTML (from the API, or rendered here for the Desk's preview). */
  html: EntryHtml;
  /**
   * What shows the worksheets (components/entry/EntryWorksheets.tsx, which computes with mathjs):
   * given by the caller, so that the entry's page can load it apart from the text and the Desk's
   * preview at once.
   */
  Worksheets: ComponentType<{ worksheets: Worksheet[] }>;
}

/**
 * The sections of one version in reading order, in one column at every width: the worksheets right
 * after the reasoning they run the numbers of ("Why it fails"), at the full width of the text, and
 * the sources at the end, as references are in print. Sections a version leaves empty are left out.
 */
export function EntryBody({ content, html, Worksheets }: EntryBodyProps) {
  const body: Record<SectionField, () => ReactNode> = {
    inBrief: () => <Markdown html={html.inBrief} />,
    howItIsPitched: () => <Markdown html={html.howItIsPitched} />,
    whyItFails: () => <Markdown html={html.whyItFails} />,
    worksheets: () => <Worksheets worksheets={content.worksheets} />,
    whatFakesTheEffect: () => <Markdown html={html.whatFakesTheEffect} />,
    repliesAndAnswers: () => (
      <View style={styles.replies}>
        {html.replies.map((pair, i) => (
          <View key={i} testID={`reply-${i + 1}`} style={styles.reply}>
            <Text role="heading" aria-level={3} style={styles.replyLabel}>
              {replyLabels.reply}
            </Text>
            <Markdown html={pair.reply} size="compact" />
            <Text role="heading" aria-level={3} style={[styles.replyLabel, styles.answerLabel]}>
              {replyLabels.answer}
            </Text>
            <Markdown html={pair.answer} size="compact" />
          </View>
        ))}
      </View>
    ),
    questionsToAsk: () => (
      <View role="list" style={styles.questions}>
        {content.questionsToAsk.map((question, i) => (
          <Text role="listitem" key={i} style={type.reading}>
            {i + 1}. {question}
          </Text>
        ))}
      </View>
    ),
    cautions: () => (
      <Notice tone="warning" testID="entry-cautions" title="Where this work can hurt someone">
        <Markdown html={html.cautions} size="compact" />
      </Notice>
    ),
    sources: () => <SourceList sources={content.sources} />,
    related: () => <RelatedEntries slugs={content.related} />,
  };

  return (
    <View testID="entry-body" style={styles.column}>
      {presentSections(content).map((field) => (
        <EntrySection key={field} field={field}>
          {body[field]()}
        </EntrySection>
      ))}
    </View>
  );
}

/**
 * Related entries by their titles, linked. The titles come from the library's list (one query,
 * shared with the Library screen's cache); a related entry the list does not hold (retired, or not
 * published yet) is named by its address.
 */
function RelatedEntries({ slugs }: { slugs: string[] }) {
  const { data } = useEntryList({ limit: 100 });
  const titleOf = (slug: string) => data?.entries.find((e) => e.slug === slug)?.title;
  return (
    <View role="list" style={styles.related}>
      {slugs.map((slug) => (
        <View role="listitem" key={slug}>
          <TextLink href={`/entries/${slug}`} testID={`related-${slug}`}>
            {titleOf(slug) ?? slug.replace(/-/g, ' ')}
          </TextLink>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  column: { minWidth: 0 },
  replies: { gap: space.lg },
  reply: { gap: space.xxs, paddingLeft: space.md, borderLeftColor: colors.rule, borderLeftWidth: 3 },
  replyLabel: { ...type.uiStrong },
  answerLabel: { marginTop: space.xs, color: colors.teal },
  questions: { gap: space.xs },
  related: { gap: space.xs },
});
