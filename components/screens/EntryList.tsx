import { StyleSheet, Text, View } from 'react-native';
import type { TaxonomyResponse } from '@/shared/api-types';
import { useEntryList } from '../queries/entries';
import type { EntrySummaryDto } from '@/shared/api-types';
import { formatDay } from '../entry/format';
import { Markdown } from '../markdown/Markdown';
import { FilterChips, type LawClassFilters } from '../search/FilterChips';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { TextLink } from '../ui/TextLink';

/** Which published entries to list: by the conservation law they break and their mechanism class. */
export type EntryFilters = LawClassFilters;

const PAGE = 20;

interface EntryListProps {
  filters: EntryFilters;
  onFiltersChange: (filters: EntryFilters) => void;
  /** For the chips and the names of laws and classes; the list works without it. */
  taxonomy?: TaxonomyResponse;
  pages: number;
  onMore: () => void;
  /** The law and class chips above the list (default); false when the screen places them itself. */
  showFilters?: boolean;
}

/** Published entries, most recently revised first, with chips to narrow them by law and by class. */
export function EntryList({ filters, onFiltersChange, taxonomy, pages, onMore, showFilters = true }: EntryListProps) {
  const { data, error, isPending, isFetching, refetch } = useEntryList({ ...filters, limit: PAGE * pages });
  const lawName = (slug: string) => taxonomy?.laws.find((l) => l.slug === slug)?.name ?? slug;
  const className = (slug: string | null) => (slug === null ? '' : (taxonomy?.classes.find((c) => c.slug === slug)?.name ?? slug));
  const filtered = Boolean(filters.law || filters.mechanism);

  return (
    <View style={styles.root}>
      {showFilters ? <FilterChips taxonomy={taxonomy} filters={filters} onChange={onFiltersChange} /> : null}
      {isPending ? <Loading testID="entries-loading" label="Loading the published entries…" /> : null}
      {error ? <ErrorNotice testID="entries-error" error={error} what="the published entries" onRetry={() => void refetch()} /> : null}
      {data && data.entries.length === 0 ? (
        filtered ? (
          <Notice tone="empty" testID="entries-none" title="No published entry matches these filters.">
            Choose “Any” for the law or the class under Filters to see more.
          </Notice>
        ) : (
          <Notice tone="empty" testID="recent-empty" title="No entries are published yet.">
            When editors publish entries and their revisions, the latest appear here, newest first.
          </Notice>
        )
      ) : null}
      {data && data.entries.length > 0 ? (
        <>
          <Text testID="entries-count" style={type.caption}>
            {data.total === 1 ? '1 entry' : `${data.total} entries`}
            {filtered ? ' match' : ' published'}, most recently revised first.
          </Text>
          <View role="list" testID="entry-list" style={styles.list}>
            {data.entries.map((entry) => (
              <EntryRow key={entry.slug} entry={entry} lawName={lawName} className={className} />
            ))}
          </View>
          {data.entries.length < data.total ? (
            <Button testID="entries-more" variant="quiet" label="Show more entries" busyLabel="Loading…" busy={isFetching} onPress={onMore} />
          ) : null}
        </>
      ) : null}
    </View>
  );
}

function EntryRow({ entry, lawName, className }: { entry: EntrySummaryDto; lawName: (s: string) => string; className: (s: string | null) => string }) {
  return (
    <View role="listitem" testID={`entry-${entry.slug}`} style={styles.row}>
      <TextLink href={`/entries/${entry.slug}`} testID={`entry-link-${entry.slug}`}>
        {entry.title}
      </TextLink>
      <Markdown html={entry.inBriefHtml} size="compact" />
      <Text style={type.caption}>
        {entry.laws.map(lawName).join(' · ')} · {className(entry.mechanismClass)}
      </Text>
      <Text style={type.small}>
        Version {entry.version}, {formatDay(entry.publishedAt)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.md },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.md, borderBottomColor: colors.rule, borderBottomWidth: 1 },
});
