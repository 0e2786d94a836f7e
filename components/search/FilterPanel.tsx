import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { TaxonomyResponse } from '@/shared/api-types';
import { colors, focusRing, radius, space, type } from '../theme';
import { FilterChips, type LawClassFilters } from './FilterChips';

interface FilterPanelProps {
  taxonomy?: TaxonomyResponse;
  filters: LawClassFilters;
  onChange: (filters: LawClassFilters) => void;
  /** Search facets, shown beside each choice. */
  counts?: { laws: Record<string, number>; mechanisms: Record<string, number> };
  /** On a phone: the chips fold away behind one button (one tab stop) until it is pressed. */
  collapsible: boolean;
  open: boolean;
  onOpenChange: (open: boolean) => void;
}

/** How many filters are set. */
export const activeFilterCount = (filters: LawClassFilters) => (filters.law ? 1 : 0) + (filters.mechanism ? 1 : 0);

/**
 * The law and class filters of the Library: all in view on a wide screen; on a phone behind one
 * "Filters" button that says how many are set, so the results come first and the keyboard passes
 * the whole group in one step.
 */
export function FilterPanel({ taxonomy, filters, onChange, counts, collapsible, open, onOpenChange }: FilterPanelProps) {
  if (!taxonomy || (taxonomy.laws.length === 0 && taxonomy.classes.length === 0)) return null;
  const chips = <FilterChips taxonomy={taxonomy} filters={filters} onChange={onChange} counts={counts} />;
  if (!collapsible) {
    return (
      <View testID="filter-panel" role="group" aria-label="Filters" style={styles.panel}>
        {chips}
      </View>
    );
  }
  const active = activeFilterCount(filters);
  return (
    <View testID="filter-panel" style={styles.panel}>
      <Pressable
        role="button"
        testID="filters-toggle"
        aria-label={`Filters${active ? `, ${active} set` : ''}`}
        aria-expanded={open}
        aria-controls="library-filters"
        onPress={() => onOpenChange(!open)}
        style={({ pressed }) => [styles.toggle, pressed && styles.pressed]}
      >
        <Text style={styles.toggleLabel}>
          {open ? '▾' : '▸'} Filters{active ? ` (${active} set)` : ''}
        </Text>
      </Pressable>
      {open ? (
        <View nativeID="library-filters" testID="filter-chips" role="group" aria-label="Filters" style={styles.panel}>
          {chips}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.sm },
  toggle: {
    ...focusRing,
    alignSelf: 'flex-start',
    justifyContent: 'center',
    minHeight: 44,
    paddingHorizontal: space.md,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
  },
  pressed: { opacity: 0.85 },
  toggleLabel: { ...type.uiStrong, color: colors.teal },
});
