import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { readableText } from '@/shared/format/numbers';
import { colors, space, type } from '../theme';
import { dataAttributes } from './dataAttributes';
import { FieldError } from './QuantityField';
import { Formula, VarSymbol } from './Symbolic';

interface ResultRowProps {
  /** On the value: `output-<name>` for a check, `step-<name>` for a worksheet step. */
  testID: string;
  label: string;
  /** The value, with its exact SI number on `data-si`; absent when it could not be computed. */
  value?: { si: number; display: string };
  /** How it is computed, e.g. a worksheet step's expression. */
  detail?: string;
  /** The variable's name, shown after the label as a symbol (`P_in` → P with subscript "in"). */
  symbol?: string;
  /** Names in `detail` to show as symbols (a worksheet's inputs, steps and constants). */
  symbols?: ReadonlySet<string>;
  /** Why it could not be computed, shown at this row. */
  error?: string;
}

/** One computed figure: its label, its value in the mono face, and the formula or error beneath. */
export function ResultRow({ testID, label, value, detail, symbol, symbols, error }: ResultRowProps) {
  return (
    <View role="listitem" style={styles.row}>
      <View style={styles.line}>
        <Text style={styles.label}>
          {label}
          {symbol ? (
            <Text style={styles.symbol}>
              {', '}
              <VarSymbol name={symbol} />
            </Text>
          ) : null}
        </Text>
        {value ? (
          <Text testID={testID} {...dataAttributes({ si: String(value.si) })} style={styles.value}>
            {readableText(value.display)}
          </Text>
        ) : null}
      </View>
      {detail ? symbols ? <Formula text={detail} names={symbols} style={styles.detail} /> : <Text style={styles.detail}>{detail}</Text> : null}
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
  symbol: { color: colors.inkMuted },
  value: { ...type.mono, fontSize: 15, textAlign: 'right', marginLeft: 'auto' },
  detail: { ...type.mono, fontSize: 13, lineHeight: 19, color: colors.inkMuted },
});
