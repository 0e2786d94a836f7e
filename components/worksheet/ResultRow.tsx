import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, space, type } from '../theme';
import { dataAttributes } from './dataAttributes';
import { FieldError } from './QuantityField';

interface ResultRowProps {
  /** On the value: `output-<name>` for a check, `step-<name>` for a worksheet step. */
  testID: string;
  label: string;
  /** The value, with its exact SI number on `data-si`; absent when it could not be computed. */
  value?: { si: number; display: string };
  /** How it is computed, e.g. a worksheet step's expression. */
  detail?: string;
  /** Why it could not be computed, shown at this row. */
  error?: string;
}

/** One computed figure: its label, its value in the mono face, and the formula or error beneath. */
export function ResultRow({ testID, label, value, detail, error }: ResultRowProps) {
  return (
    <View role="listitem" style={styles.row}>
      <View style={styles.line}>
        <Text style={styles.label}>{label}</Text>
        {value ? (
          <Text testID={testID} {...dataAttributes({ si: String(value.si) })} style={styles.value}>
            {value.display}
          </Text>
        ) : null}
      </View>
      {detail ? <Text style={styles.detail}>{detail}</Text> : null}
      {error ? <FieldError testID={`${testID}-error`} message={error} /> : null}
    </View>
  );
}

/** A list of ResultRows between hairlines. */
export function ResultList({ children, label }: { children: ReactNode; label: string }) {
  return (
    <View role="list" aria-label={label} style={styles.list}>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  line: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', columnGap: space.md },
  label: { ...type.ui, flexShrink: 1 },
  value: { ...type.mono, fontSize: 15, textAlign: 'right', marginLeft: 'auto' },
  detail: { ...type.mono, fontSize: 13, lineHeight: 19, color: colors.inkMuted },
});
