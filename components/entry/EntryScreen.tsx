import { StyleSheet, Text, View } from 'react-native';
import { ApiError } from '../http/client';
import { useEntry } from '../queries/entries';
import type { EntryResponse } from '@/shared/api-types';
import { space, type } from '../theme';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { ReportError, SeenInTheWild } from '../submissions/EntryParts';
import { CitePanel } from './CitePanel';
import { EntryBody } from './EntryBody';
import { EntryMeta } from './EntryMeta';
import { ReviseButton } from './ReviseButton';
import { RetirePanel } from './RetirePanel';
import { VersionsPanel } from './VersionsPanel';

interface EntryScreenProps {
  slug: string;
  /** A version number for `/entries/<slug>/v/<n>`; the latest published version when absent. */
  version?: number;
}

/** One entry of the library, at its latest published version or at one version for good. */
export function EntryScreen({ slug, version }: EntryScreenProps) {
  const { data, error, isPending, refetch } = useEntry(slug, version);

  if (isPending) {
    return (
      <Screen testID="screen-entry" title="Entry">
        <Loading testID="entry-loading" label="Loading the entry…" />
      </Screen>
    );
  }
  if (error) {
    const missing = error instanceof ApiError && error.status === 404;
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

function EntryPage({ data, pinned }: { data: EntryResponse; pinned: boolean }) {
  const { entry, version } = data;

  return (
    <Screen testID="screen-entry" title={version.content.title}>
      <EntryMeta slug={entry.slug} version={version} pinned={pinned} />
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
        <View style={styles.editorActions}>
          <ReviseButton slug={entry.slug} />
          {pinned ? null : <RetirePanel slug={entry.slug} title={version.content.title} />}
        </View>
      )}
      <EntryBody content={version.content} html={version.html} />
      <ReportError key={version.number} slug={entry.slug} version={version.number} title={version.content.title} />
      <SeenInTheWild slug={entry.slug} />
      <Section title="Versions">
        <VersionsPanel slug={entry.slug} shown={version.number} />
      </Section>
      <Section title="Cite this version">
        <CitePanel slug={entry.slug} version={version.number} />
      </Section>
    </Screen>
  );
}


const styles = StyleSheet.create({
  editorActions: { gap: space.sm, alignItems: 'flex-start' },
});
