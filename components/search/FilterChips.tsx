import { StyleSheet, Text, View } from 'react-native';
import type { TaxonomyResponse } from '@/shared/api-types';
import { ChoiceChips } from '../admin/ChoiceChips';
import { space, type } from '../theme';

/** Which entries to show: by the conservation law they break and their mechanism class. */
export interface LawClassFilters {
  law?: string;
  mechanism?: string;
}

const ANY = 'any';

interface FilterChipsProps {
  taxonomy?: TaxonomyResponse;
  filters: LawClassFilters;
  onChange: (filters: LawClassFilters) => void;
  /** Search facets: how many results each choice would give, shown beside its name. */
  counts?: { laws: Record<string, number>; mechanisms: Record<string, number> };
}

/** The law and class chips (`filter-law-<slug>`, `filter-mechanism-<slug>`), with counts when searching. */
export function FilterChips({ taxonomy, filters, onChange, counts }: FilterChipsProps) {
  if (!taxonomy) return null;
  const withCount = (name: string, count: number | undefined) => (counts ? `${name} (${count ?? 0})` : name);
  return (
    <>
      {taxonomy.laws.length > 0 ? (
        <FilterRow
          label="Conservation law broken"
          testID="filter-law"
          options={[...taxonomy.laws]
            .sort((a, b) => a.position - b.position)
            .map((l) => ({ value: l.slug, label: withCount(l.name, counts?.laws[l.slug]) }))}
          value={filters.law}
          onChange={(law) => onChange({ ...filters, law })}
        />
      ) : null}
      {taxonomy.classes.length > 0 ? (
        <FilterRow
          label="Mechanism class"
          testID="filter-mechanism"
          options={[...taxonomy.classes]
            .sort((a, b) => a.position - b.position)
            .map((c) => ({ value: c.slug, label: withCount(c.name, counts?.mechanisms[c.slug]) }))}
          value={filters.mechanism}
          onChange={(mechanism) => onChange({ ...filters, mechanism })}
        />
      ) : null}
    </>
  );
}

function FilterRow(props: {
  label: string;
  testID: string;
  options: { value: string; label: string }[];
  value?: string;
  onChange: (value: string | undefined) => void;
}) {
  return (
    <View style={styles.filter}>
      <Text style={type.caption}>{props.label}</Text>
      <ChoiceChips
        label={props.label}
        testID={props.testID}
        options={[{ value: ANY, label: 'Any' }, ...props.options]}
        value={props.value ?? ANY}
        onChange={(value) => props.onChange(value === ANY ? undefined : value)}
      />
    </View>
  );
}

const styles = StyleSheet.create({ filter: { gap: space.xxs } });
