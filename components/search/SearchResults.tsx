import { StyleSheet, Text, View } from 'react-native';
import type { TaxonomyResponse } from '@/shared/api-types';
import type { SearchResponse, SearchResult } from '@/shared/api-types';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { TextLink } from '../ui/TextLink';
import { Excerpt } from './Excerpt';
import { FilterChips, type LawClassFilters } from './FilterChips';

/** Example queries offered when nothing matches. */
export const SEARCH_SUGGESTIONS = ['sealed box that pushes itself', 'magnet motor', 'heat engine on one reservoir'] as const;

interface SearchResultsProps {
  query: string;
  data?: SearchResponse;
  error: Error | null;
  /** The next answer is on its way (the results shown are the previous ones, or none yet). */
  fetching: boolean;
  onRetry: () => void;
  filters: LawClassFilters;
  onFiltersChange: (filters: LawClassFilters) => void;
  taxonomy?: TaxonomyResponse;
  /** The result the keyboard is on, or -1. */
  highlighted: number;
  onSuggestion: (query: string) => void;
  /** The law and class chips above the results (default); false when the screen places them itself. */
  showFilters?: boolean;
}

/** Ranked results of a query: chips with facet counts, the count, each result with its excerpt and matched terms. */
export function SearchResults(props: SearchResultsProps) {
  const { data, error, fetching, filters, taxonomy } = props;
  const lawName = (slug: string) => taxonomy?.laws.find((l) => l.slug === slug)?.name ?? slug;
  const className = (slug: string | null) => (slug === null ? '' : (taxonomy?.classes.find((c) => c.slug === slug)?.name ?? slug));
  const filtered = Boolean(filters.law || filters.mechanism);

  return (
    <View style={styles.root} aria-busy={fetching || undefined}>
      {props.showFilters !== false ? <FilterChips taxonomy={taxonomy} filters={filters} onChange={props.onFiltersChange} counts={data?.facets} /> : null}
      {!data && !error ? <Loading testID="search-loading" label="Searching the library…" /> : null}
      {error ? <ErrorNotice testID="search-error" error={error} what="the search results" onRetry={props.onRetry} /> : null}
      {data ? (
        <>
          <Text testID="search-count" role="status" style={type.caption}>
            {data.total === 1 ? '1 entry' : `${data.total} entries`}
            {data.results.length < data.total ? `, the first ${data.results.length} shown` : ''}
            {fetching ? ' · searching…' : ''}
          </Text>
          {data.results.length === 0 ? (
            <View testID="search-empty" style={styles.empty}>
              <Notice tone="empty" title={`Nothing in the library matches “${data.query || props.query}”${filtered ? ' with these filters' : ''}.`}>
                {filtered ? 'Choose “Any” for the law or the class under Filters, or try' : 'Try other words: the device, what it is said to do, or'} one
                of these:
              </Notice>
              <View style={styles.suggestions}>
                {SEARCH_SUGGESTIONS.map((suggestion, i) => (
                  <Button
                    key={suggestion}
                    testID={`search-suggestion-${i}`}
                    variant="quiet"
                    label={suggestion}
                    onPress={() => props.onSuggestion(suggestion)}
                  />
                ))}
              </View>
            </View>
          ) : (
            <View role="list" testID="search-results" style={styles.list}>
              {data.results.map((result, i) => (
                <ResultRow
                  key={result.slug}
                  result={result}
                  highlighted={i === props.highlighted}
                  lawName={lawName}
                  className={className}
                />
              ))}
            </View>
          )}
        </>
      ) : null}
    </View>
  );
}

function ResultRow(props: {
  result: SearchResult;
  highlighted: boolean;
  lawName: (slug: string) => string;
  className: (slug: string | null) => string;
}) {
  const { result } = props;
  return (
    <View
      role="listitem"
      testID={`search-result-${result.slug}`}
      aria-selected={props.highlighted || undefined}
      style={[styles.row, props.highlighted && styles.highlighted]}
    >
      <TextLink href={`/entries/${result.slug}`} testID={`entry-link-${result.slug}`}>
        {result.title}
      </TextLink>
      <Excerpt excerpt={result.excerpt} testID={`search-excerpt-${result.slug}`} />
      <Text style={type.caption}>
        {result.laws.map(props.lawName).join(' · ')} · {props.className(result.mechanismClass)}
      </Text>
      {result.matched.length > 0 ? (
        <Text testID={`search-terms-${result.slug}`} style={type.small}>
          Matched: <Text style={type.mono}>{result.matched.join(', ')}</Text>
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.md },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: {
    gap: space.xxs,
    paddingVertical: space.md,
    paddingLeft: space.sm,
    borderBottomColor: colors.rule,
    borderBottomWidth: 1,
    borderLeftColor: 'transparent',
    borderLeftWidth: 3,
  },
  highlighted: { backgroundColor: colors.brassWash, borderLeftColor: colors.brass },
  empty: { gap: space.sm },
  suggestions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
