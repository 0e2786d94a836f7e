import { entryVersionPath } from '@/shared/permalink';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ChoiceChips } from '../admin/ChoiceChips';
import { useEntry, useEntryVersions } from '../queries/entries';
import { colors, space, type } from '../theme';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { TextLink } from '../ui/TextLink';
import { DiffView } from './DiffView';
import { formatDay } from './format';

/** Every published version of the entry, each at its permalink, and what changed between any two. */
export function VersionsPanel({ slug, shown }: { slug: string; shown: number }) {
  const { data, error, isPending, refetch } = useEntryVersions(slug);
  if (isPending) return <Loading testID="versions-loading" label="Loading the versions…" />;
  if (error) return <ErrorNotice testID="versions-error" error={error} what="the list of versions" onRetry={() => void refetch()} />;

  const versions = [...data.versions].sort((a, b) => b.number - a.number);
  return (
    <View style={styles.root}>
      <View role="list" testID="versions-list" style={styles.list}>
        {versions.map((v) => (
          <View role="listitem" key={v.number} testID={`version-${v.number}`} style={styles.row}>
            <TextLink href={entryVersionPath(slug, v.number)} testID={`version-link-${v.number}`}>
              {`Version ${v.number}${v.number === shown ? ' (this page)' : ''}`}
            </TextLink>
            <Text style={type.caption}>
              {formatDay(v.publishedAt)} · written by {v.author.displayName}
              {v.reviewer ? `, vetted by ${v.reviewer.displayName}` : ''}
            </Text>
            <Text style={type.body}>{v.changeNote}</Text>
          </View>
        ))}
      </View>
      {versions.length > 1 ? (
        <VersionCompare slug={slug} numbers={versions.map((v) => v.number)} shown={shown} />
      ) : (
        <Text style={type.caption}>This is the only version so far; once a revision is published, the two can be compared here.</Text>
      )}
    </View>
  );
}

function VersionCompare({ slug, numbers, shown }: { slug: string; numbers: number[]; shown: number }) {
  const [to, setTo] = useState(shown);
  // The version before the one shown, or the one after it when the first is shown.
  const [from, setFrom] = useState(() => (numbers.includes(shown - 1) ? shown - 1 : numbers.find((n) => n !== shown)!));
  const options = numbers.map((n) => ({ value: String(n), label: `Version ${n}` }));

  return (
    <View style={styles.compare}>
      <Text role="heading" aria-level={3} style={type.heading}>
        Compare two versions
      </Text>
      <Text style={type.caption}>From</Text>
      <ChoiceChips label="Compare from version" testID="diff-from" options={options} value={String(from)} onChange={(v) => setFrom(Number(v))} />
      <Text style={type.caption}>To</Text>
      <ChoiceChips label="Compare to version" testID="diff-to" options={options} value={String(to)} onChange={(v) => setTo(Number(v))} />
      {from === to ? (
        <Text style={type.body}>Pick two different versions to see what changed.</Text>
      ) : (
        <VersionDiff slug={slug} from={Math.min(from, to)} to={Math.max(from, to)} />
      )}
    </View>
  );
}

function VersionDiff({ slug, from, to }: { slug: string; from: number; to: number }) {
  const older = useEntry(slug, from);
  const newer = useEntry(slug, to);
  const failed = older.error ?? newer.error;
  if (failed) {
    return (
      <ErrorNotice
        testID="diff-error"
        error={failed}
        what="the versions to compare"
        onRetry={() => void Promise.all([older.refetch(), newer.refetch()])}
      />
    );
  }
  if (!older.data || !newer.data) return <Loading testID="diff-loading" label={`Loading versions ${from} and ${to}…`} />;
  return (
    <DiffView
      from={{ label: `version ${from}`, content: older.data.version.content }}
      to={{ label: `version ${to}`, content: newer.data.version.content }}
    />
  );
}

const styles = StyleSheet.create({
  root: { gap: space.lg },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  compare: { gap: space.xs },
});
