import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { permalink } from '@/shared/permalink';
import { ApiError } from '../http/client';
import { useEntry } from '../queries/entries';
import type { EntryResponse } from '@/shared/api-types';
import { colors, layout, space, type } from '../theme';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { SITE_NAME, usePageTitle } from '../ui/usePageTitle';
import { dataAttributes } from '../worksheet/dataAttributes';
import { deferred } from '../lazy/deferred';
import { CitePanel } from './CitePanel';
import { EntryBody } from './EntryBody';
import { contentsOf, JumpMenu, scrollToAnchor, TableOfContents } from './EntryContents';
import { EntryMeta } from './EntryMeta';
import { formatDay } from './format';
import { plainText, sectionAnchor } from './sections';

// Loaded with the deferred part of the app (components/lazy/screens.tsx): the worksheets (mathjs), the
// forms (zod), the versions' differences (diff).
const EntryWorksheets = deferred('EntryWorksheets');
const ReportError = deferred('ReportError', 'none');
const SeenInTheWild = deferred('SeenInTheWild');
const VersionsPanel = deferred('VersionsPanel');
const ReviseButton = deferred('ReviseButton', 'none');
const RetirePanel = deferred('RetirePanel', 'none');

interface EntryScreenProps {
  slug: string;
  /** A version number for `/entries/<slug>/v/<n>`; the latest published version when absent. */
  version?: number;
}

/** One entry of the library, at its latest published version or at one version for good. */
export function EntryScreen({ slug, version }: EntryScreenProps) {
  const { data, error, isPending, refetch } = useEntry(slug, version);
  const missing = error instanceof ApiError && error.status === 404;
  usePageTitle(...pageTitle(data, missing));

  if (isPending) {
    return (
      <Screen testID="screen-entry" title="Entry">
        <Loading testID="entry-loading" label="Loading the entry…" />
      </Screen>
    );
  }
  if (error) {
    return (
      <Screen testID="screen-entry" title={missing ? 'No such entry' : 'Entry'}>
        {missing ? (
          <Text testID="entry-not-found" style={type.reading}>
            {version === undefined
              ? `No published entry has the address “${slug}”. It may be mistyped, or the entry may not be published yet.`
              : `The entry “${slug}” has no published version ${version}.`}
          </Text>
        ) : (
          <ErrorNotice testID="entry-error" error={error} what="this entry" onRetry={() => void refetch()} />
        )}
        <TextLink href="/" testID="entry-back">
          Back to the Library
        </TextLink>
      </Screen>
    );
  }
  return <EntryPage data={data} pinned={version !== undefined} />;
}

/** "<entry title> — Counterweight" and the brief as the link-preview description, once the entry is here. */
function pageTitle(data: EntryResponse | undefined, missing: boolean): [string, string?] {
  if (!data) return [`${missing ? 'No such entry' : 'Entry'} — ${SITE_NAME}`];
  return [`${data.version.content.title} — ${SITE_NAME}`, plainText(data.version.content.inBrief)];
}

function EntryPage({ data, pinned }: { data: EntryResponse; pinned: boolean }) {
  const { entry, version } = data;
  const { width } = useWindowDimensions();
  const wide = width >= layout.wideMinWidth;
  const contents = contentsOf(version.content);

  const text = (
    <View testID="entry-text" style={styles.text}>
      <EntryBody content={version.content} html={version.html} Worksheets={EntryWorksheets} />
      <View nativeID={sectionAnchor('report')} {...dataAttributes({ print: 'hide' })}>
        <ReportError key={version.number} slug={entry.slug} version={version.number} title={version.content.title} />
      </View>
      <View nativeID={sectionAnchor('sightings')} {...dataAttributes({ print: 'hide' })}>
        <SeenInTheWild slug={entry.slug} />
      </View>
      <View nativeID={sectionAnchor('versions')} testID="entry-part-versions" {...dataAttributes({ print: 'hide' })}>
        <Section title="Versions">
          <VersionsPanel slug={entry.slug} shown={version.number} />
        </Section>
      </View>
      <View nativeID={sectionAnchor('cite')} testID="entry-part-cite" {...dataAttributes({ print: 'hide' })}>
        <Section title="Cite this version">
          <CitePanel slug={entry.slug} version={version.number} />
        </Section>
      </View>
      <PrintFooter slug={entry.slug} version={version} />
    </View>
  );

  return (
    <Screen testID="screen-entry" title={version.content.title}>
      <EntryMeta slug={entry.slug} version={version} pinned={pinned} onCite={() => scrollToAnchor(sectionAnchor('cite'))} />
      {entry.status === 'retired' && entry.retired ? (
        <Notice
          testID="entry-retired"
          title="This entry is retired."
          action={
            entry.retired.successor ? (
              <TextLink href={`/entries/${entry.retired.successor}`} testID="entry-successor">
                Read the entry that replaces it
              </TextLink>
            ) : undefined
          }
        >
          {entry.retired.reason} It stays here, and citable, as it was.
        </Notice>
      ) : (
        <View style={styles.editorActions} {...dataAttributes({ print: 'hide' })}>
          <ReviseButton slug={entry.slug} />
          {pinned ? null : <RetirePanel slug={entry.slug} title={version.content.title} />}
        </View>
      )}
      {wide ? (
        <View testID="entry-columns" style={styles.columns}>
          {text}
          <View style={styles.aside} {...dataAttributes({ print: 'hide' })}>
            <TableOfContents items={contents} />
          </View>
        </View>
      ) : (
        <>
          <JumpMenu items={contents} />
          {text}
        </>
      )}
    </Screen>
  );
}

/**
 * Seen only on paper (components/print/print.css): which version this is and its permanent address,
 * so that a printout can be traced back to the exact text.
 */
function PrintFooter({ slug, version }: { slug: string; version: EntryResponse['version'] }) {
  const origin = typeof window !== 'undefined' && window.location ? window.location.origin : '';
  return (
    <View testID="entry-print-footer" {...dataAttributes({ print: 'only' })} style={styles.printFooter}>
      <Text style={type.small}>
        {SITE_NAME} · {version.content.title} · version {version.number}, published {formatDay(version.publishedAt)}
      </Text>
      <Text testID="entry-print-permalink" style={type.small}>
        Permanent address: {permalink(origin, slug, version.number)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  editorActions: { gap: space.sm, alignItems: 'flex-start' },
  columns: { flexDirection: 'row', gap: space.xl },
  text: { flex: 1, minWidth: 0, maxWidth: layout.contentMaxWidth + space.xxl },
  aside: { width: 220, flexShrink: 0 },
  printFooter: { gap: 2, marginTop: space.xl, paddingTop: space.sm, borderTopColor: colors.rule, borderTopWidth: 1 },
});
