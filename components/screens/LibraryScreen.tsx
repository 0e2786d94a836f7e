import { router } from 'expo-router';
import { useEffect, useRef, useState } from 'react';
import {
  Platform,
  StyleSheet,
  Text,
  TextInput,
  useWindowDimensions,
  View,
  type NativeSyntheticEvent,
  type TextInputKeyPressEventData,
} from 'react-native';
import type { ConservationLawDto, MechanismClassDto, TaxonomyResponse } from '@/shared/api-types';
import { useSearch } from '../queries/search';
import { useTaxonomy } from '../queries/taxonomy';
import { activeFilterCount, FilterPanel } from '../search/FilterPanel';
import { SearchResults } from '../search/SearchResults';
import { usePageTitle, SITE_NAME } from '../ui/usePageTitle';
import { colors, focusRing, layout, radius, space, type } from '../theme';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { EntryList, type EntryFilters } from './EntryList';

/** A Library search as the address holds it. */
export interface LibrarySearch extends EntryFilters {
  q: string;
}

interface LibraryScreenProps {
  /**
   * The query from the address (`/?q=…`). The field starts from it, and follows it when it changes
   * from outside (Back, Forward, a link followed).
   */
  query?: string;
  /** The filters from the address (`/?law=…&mechanism=…`), followed likewise. */
  filters?: EntryFilters;
  /** Filters to start from when the screen is given no `filters`. */
  initialFilters?: EntryFilters;
  /**
   * Called when the reader changes the search: with `replace` once the typing rests (the address
   * follows the field without a history entry per key), with `push` when a filter is chosen (a new
   * history entry, so Back returns to the search before it).
   */
  onSearchChange?: (search: LibrarySearch, how: 'replace' | 'push') => void;
  /** Called with the filters each time the reader changes them. */
  onFiltersChange?: (filters: EntryFilters) => void;
  /** Opens an entry from the keyboard (Enter on the highlighted result); by default the app's router. */
  onOpenEntry?: (slug: string) => void;
}

/** How long the query must rest before it is sent. */
export const SEARCH_DEBOUNCE_MS = 200;

const LEAD = 'The standard objections to impossible-machine claims: each written once, checked by a second expert, versioned and citable.';

const openWithRouter = (slug: string) => router.push(`/entries/${slug}`);

const searchKey = (s: LibrarySearch) => JSON.stringify([s.q, s.law ?? null, s.mechanism ?? null]);

/**
 * A new history entry shows the Library afresh. What the reader had open (the filters on a phone)
 * and where the keyboard was (the chip just chosen) are carried over to the screen of the search
 * they chose, and to no other.
 */
let carried: { key: string; filtersOpen: boolean; focus?: string } | null = null;

function takeCarried(search: LibrarySearch) {
  const found = carried?.key === searchKey(search) ? carried : null;
  carried = null;
  return found;
}

/**
 * The home: search as you type (ranked results, narrowed by law and class), what was revised lately
 * while the query is empty, and the taxonomy to browse by. On a phone the results come first and the
 * filters fold away behind one button below them; on a wide screen the filters stay in view above.
 */
export function LibraryScreen({
  query: addressQuery,
  filters: addressFilters,
  initialFilters = {},
  onSearchChange,
  onFiltersChange,
  onOpenEntry = openWithRouter,
}: LibraryScreenProps) {
  const addressQ = (addressQuery ?? '').slice(0, MAX_QUERY);
  const addressLaw = addressFilters?.law || undefined;
  const addressMechanism = addressFilters?.mechanism || undefined;
  const start = addressFilters ? { law: addressLaw, mechanism: addressMechanism } : initialFilters;
  const [carry] = useState(() => takeCarried({ q: addressQ.trim(), ...start }));
  const [filters, setFilters] = useState<EntryFilters>(start);
  const [pages, setPages] = useState(1);
  const [query, setQuery] = useState(addressQ);
  const [highlighted, setHighlighted] = useState(-1);
  const [filtersOpen, setFiltersOpen] = useState(carry?.filtersOpen ?? false);
  const { width } = useWindowDimensions();
  const wide = width >= layout.wideMinWidth;
  const keyboard = Platform.OS === 'web' && wide;
  const { data: taxonomy } = useTaxonomy();
  /** The search as the address holds it, as far as this screen knows (what it sent, or what came in). */
  const known = useRef<LibrarySearch>({ q: addressQ.trim(), ...start });

  const typed = query.trim().slice(0, MAX_QUERY);
  // The query once the typing has rested (a search as you type without a request per key); a query
  // that comes from the address is searched at once.
  const [settled, setSettled] = useState(typed);
  useEffect(() => {
    if (typed === settled) return;
    const timer = setTimeout(() => setSettled(typed), SEARCH_DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [typed, settled]);
  const searching = settled !== '';
  const search = useSearch({ q: settled, law: filters.law, mechanism: filters.mechanism }, { enabled: searching });
  const results = searching ? (search.data?.results ?? []) : [];

  usePageTitle(settled ? `“${settled}” — Library — ${SITE_NAME}` : `Library — ${SITE_NAME}`, LEAD);

  // A new query or new filters start the keyboard from the field again.
  useEffect(() => setHighlighted(-1), [settled, filters.law, filters.mechanism]);

  // The address changed from outside (Back, Forward, a link): the field and the filters follow it.
  useEffect(() => {
    if (addressQuery === undefined || addressQ.trim() === known.current.q) return;
    known.current = { ...known.current, q: addressQ.trim() };
    setQuery(addressQ);
    setSettled(addressQ.trim());
  }, [addressQuery, addressQ]);
  const hasAddressFilters = addressFilters !== undefined;
  useEffect(() => {
    if (!hasAddressFilters || (addressLaw === known.current.law && addressMechanism === known.current.mechanism)) return;
    known.current = { ...known.current, law: addressLaw, mechanism: addressMechanism };
    setFilters({ law: addressLaw, mechanism: addressMechanism });
    setPages(1);
  }, [hasAddressFilters, addressLaw, addressMechanism]);

  // Once the typing rests, the address follows the field (replacing, not adding, a history entry).
  // Only a new settled query is written: not the one on screen while the address changes under it.
  const lastSettled = useRef(settled);
  useEffect(() => {
    if (settled === lastSettled.current) return;
    lastSettled.current = settled;
    if (settled !== typed || settled === known.current.q) return;
    known.current = { ...known.current, q: settled };
    onSearchChange?.({ q: settled, law: filters.law, mechanism: filters.mechanism }, 'replace');
  }, [settled, typed, filters.law, filters.mechanism, onSearchChange]);

  // After a filter was chosen on the screen before this one, the keyboard stays on that chip.
  useEffect(() => {
    if (!carry?.focus || Platform.OS !== 'web' || typeof document === 'undefined') return;
    const frame = requestAnimationFrame(() => document.querySelector<HTMLElement>(`[data-testid="${carry.focus}"]`)?.focus());
    return () => cancelAnimationFrame(frame);
  }, [carry]);

  const changeFilters = (next: EntryFilters) => {
    const focus =
      next.law !== filters.law ? `filter-law-${next.law ?? 'any'}` : next.mechanism !== filters.mechanism ? `filter-mechanism-${next.mechanism ?? 'any'}` : undefined;
    setFilters(next);
    setPages(1);
    onFiltersChange?.(next);
    const change = { q: typed, law: next.law, mechanism: next.mechanism };
    known.current = change;
    carried = { key: searchKey(change), filtersOpen, focus };
    onSearchChange?.(change, 'push');
  };

  const onKeyPress = (event: NativeSyntheticEvent<TextInputKeyPressEventData>) => {
    if (!keyboard || results.length === 0) return;
    const { key } = event.nativeEvent;
    if (key === 'ArrowDown' || key === 'ArrowUp') {
      event.preventDefault();
      setHighlighted((i) => {
        const at = Math.min(i, results.length - 1);
        return key === 'ArrowDown' ? Math.min(at + 1, results.length - 1) : Math.max(at - 1, -1);
      });
    } else if (key === 'Enter' && highlighted >= 0 && highlighted < results.length) {
      event.preventDefault();
      onOpenEntry(results[highlighted].slug);
    }
  };

  const panel = (
    <FilterPanel
      taxonomy={taxonomy}
      filters={filters}
      onChange={changeFilters}
      counts={searching ? search.data?.facets : undefined}
      collapsible={!wide}
      open={filtersOpen}
      onOpenChange={setFiltersOpen}
    />
  );
  const narrowed = !wide && activeFilterCount(filters) > 0 && taxonomy ? <FiltersSet filters={filters} taxonomy={taxonomy} /> : null;

  const list = searching ? (
    <Section title="Results">
      {narrowed}
      <SearchResults
        query={settled}
        data={search.data}
        error={search.error}
        fetching={search.isFetching}
        onRetry={() => void search.refetch()}
        filters={filters}
        onFiltersChange={changeFilters}
        taxonomy={taxonomy}
        highlighted={highlighted}
        onSuggestion={setQuery}
        showFilters={false}
      />
    </Section>
  ) : (
    <Section title="Recently revised">
      {narrowed}
      <EntryList
        filters={filters}
        onFiltersChange={changeFilters}
        taxonomy={taxonomy}
        pages={pages}
        onMore={() => setPages((n) => n + 1)}
        showFilters={false}
      />
    </Section>
  );

  return (
    <Screen testID="screen-library" title="Library" lead={LEAD}>
      <View style={styles.reading}>
        <SearchField value={query} onChange={setQuery} onKeyPress={onKeyPress} keyboard={keyboard} />
      </View>
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.listColumn}>{list}</View>
          {taxonomy ? (
            <View style={styles.filterColumn}>
              <Section title="Filters">{panel}</Section>
            </View>
          ) : null}
        </View>
      ) : (
        <>
          {list}
          {panel}
        </>
      )}
      <View style={styles.reading}>
        <Taxonomy />
      </View>
    </Screen>
  );
}

/** On a phone, above the results: which filters narrow them (the filters themselves are below). */
function FiltersSet({ filters, taxonomy }: { filters: EntryFilters; taxonomy: TaxonomyResponse }) {
  const names = [
    filters.law ? (taxonomy.laws.find((l) => l.slug === filters.law)?.name ?? filters.law) : null,
    filters.mechanism ? (taxonomy.classes.find((c) => c.slug === filters.mechanism)?.name ?? filters.mechanism) : null,
  ].filter(Boolean);
  return (
    <Text testID="filters-set" style={type.caption}>
      Narrowed to {names.join(' and ')}; change it under Filters, below the list.
    </Text>
  );
}

/** The API answers 400 beyond this. */
const MAX_QUERY = 500;

function SearchField(props: {
  value: string;
  onChange: (value: string) => void;
  onKeyPress: (event: NativeSyntheticEvent<TextInputKeyPressEventData>) => void;
  keyboard: boolean;
}) {
  const [focused, setFocused] = useState(false);
  return (
    <View style={styles.search}>
      <Text style={type.uiStrong}>Search the library</Text>
      <TextInput
        testID="library-search"
        aria-label="Search the library"
        role="searchbox"
        placeholder="A device, a claim, a phrase from a pitch"
        placeholderTextColor={colors.inkMuted}
        value={props.value}
        onChangeText={props.onChange}
        onKeyPress={props.onKeyPress}
        maxLength={MAX_QUERY}
        autoCorrect={false}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={[styles.input, focused && styles.inputFocused]}
      />
      <Text testID="library-search-hint" style={type.caption}>
        Results come as you type, best match first; narrow them by conservation law and mechanism class.
        {props.keyboard ? ' ↓ and ↑ move through the results, Enter opens one.' : ''}
      </Text>
    </View>
  );
}

function Taxonomy() {
  const { data, error, isPending, refetch } = useTaxonomy();

  if (isPending) {
    return <Loading testID="taxonomy-loading" label="Loading the conservation laws and mechanism classes…" />;
  }
  if (error) {
    return (
      <ErrorNotice
        testID="taxonomy-error"
        error={error}
        what="the conservation laws and mechanism classes"
        onRetry={() => void refetch()}
      />
    );
  }
  if (data.laws.length === 0 && data.classes.length === 0) {
    return (
      <Notice tone="empty" testID="taxonomy-empty" title="The taxonomy is empty.">
        <Text style={type.mono}>npm start</Text> loads the starter laws and classes from{' '}
        <Text style={type.mono}>content/taxonomy.yml</Text> into an empty database. Restart it against a fresh
        database, or ask an editor to add them.
      </Notice>
    );
  }
  return (
    <>
      <Section title="Conservation laws">
        <LawList laws={data.laws} />
      </Section>
      <Section title="Mechanism classes">
        <ClassList classes={data.classes} />
      </Section>
    </>
  );
}

function LawList({ laws }: { laws: ConservationLawDto[] }) {
  if (laws.length === 0) {
    return <Notice tone="empty" title="No conservation laws are listed yet.">An editor can add them to the taxonomy.</Notice>;
  }
  return (
    <View role="list" testID="law-list" style={styles.list}>
      {[...laws]
        .sort((a, b) => a.position - b.position)
        .map((law) => (
          <View role="listitem" key={law.slug} testID={`law-${law.slug}`} style={styles.row}>
            <Text style={type.uiStrong}>{law.name}</Text>
            <Text style={type.caption}>
              {law.symmetry ? (
                <>
                  Symmetry: <Text style={styles.value}>{law.symmetry}</Text>
                </>
              ) : (
                'Not tied to a symmetry'
              )}
            </Text>
            <Text style={type.body}>{law.summary}</Text>
          </View>
        ))}
    </View>
  );
}

function ClassList({ classes }: { classes: MechanismClassDto[] }) {
  if (classes.length === 0) {
    return <Notice tone="empty" title="No mechanism classes are listed yet.">An editor can add them to the taxonomy.</Notice>;
  }
  const ordered = [...classes].sort((a, b) => a.position - b.position);
  const known = new Set(ordered.map((c) => c.slug));
  const roots = ordered.filter((c) => c.parentSlug === null || !known.has(c.parentSlug));
  return (
    <View role="list" testID="class-list" style={styles.list}>
      {roots.map((root) => (
        <View role="listitem" key={root.slug} style={styles.row}>
          <ClassNode node={root} all={ordered} depth={0} />
        </View>
      ))}
    </View>
  );
}

/** A class, then the classes beneath it, each level set in from its parent. */
function ClassNode({ node, all, depth }: { node: MechanismClassDto; all: MechanismClassDto[]; depth: number }) {
  const children = all.filter((c) => c.parentSlug === node.slug);
  return (
    <View testID={`class-${node.slug}`} style={depth > 0 ? styles.child : styles.node}>
      <Text style={depth > 0 ? type.ui : type.uiStrong}>{node.name}</Text>
      <Text style={depth > 0 ? type.caption : type.body}>{node.summary}</Text>
      {children.length > 0 ? (
        <View role="list" style={styles.children}>
          {children.map((child) => (
            <View role="listitem" key={child.slug}>
              <ClassNode node={child} all={all} depth={depth + 1} />
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  reading: { maxWidth: layout.contentMaxWidth, gap: space.md },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  listColumn: { flex: 1, minWidth: 0, maxWidth: layout.contentMaxWidth },
  filterColumn: { width: 340, flexShrink: 0 },
  search: { gap: space.xs, marginTop: space.sm },
  input: {
    ...type.ui,
    ...focusRing,
    backgroundColor: colors.surface,
    borderColor: colors.ruleStrong,
    borderRadius: radius.sm,
    borderWidth: 1,
    minHeight: 44,
    paddingHorizontal: space.sm,
  },
  inputFocused: { borderColor: colors.brass },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: {
    gap: space.xxs,
    paddingVertical: space.md,
    borderBottomColor: colors.rule,
    borderBottomWidth: 1,
  },
  value: { color: colors.ink },
  children: { gap: space.sm, marginTop: space.xs },
  node: { gap: space.xxs },
  child: { gap: 2, paddingLeft: space.md, borderLeftColor: colors.rule, borderLeftWidth: 2 },
});
