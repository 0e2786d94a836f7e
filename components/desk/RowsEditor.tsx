import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';

interface RowsEditorProps<T> {
  /** `editor-field-<name>` on the group; rows are `<name>-<n>`, their remove buttons `<name>-remove-<n>`. */
  name: string;
  label: string;
  rows: T[];
  onChange: (rows: T[]) => void;
  /** A new, empty row. */
  blank: () => T;
  addLabel: string;
  renderRow: (row: T, update: (row: T) => void, index: number) => ReactNode;
  error?: string;
}

/** A list the editor grows and shrinks: replies with their answers, questions for the claimant. */
export function RowsEditor<T>({ name, label, rows, onChange, blank, addLabel, renderRow, error }: RowsEditorProps<T>) {
  return (
    <View testID={`editor-field-${name}`} style={styles.root}>
      <Text style={type.uiStrong}>{label}</Text>
      {rows.map((row, i) => (
        <View key={i} testID={`${name}-${i + 1}`} style={styles.row}>
          {renderRow(row, (next) => onChange(rows.map((r, j) => (j === i ? next : r))), i)}
          <Button testID={`${name}-remove-${i + 1}`} variant="quiet" label="Remove" onPress={() => onChange(rows.filter((_, j) => j !== i))} />
        </View>
      ))}
      {error ? (
        <Text testID={`editor-error-${name}`} style={type.caption}>
          {error}
        </Text>
      ) : null}
      <Button testID={`${name}-add`} variant="quiet" label={addLabel} onPress={() => onChange([...rows, blank()])} />
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  row: { gap: space.xs, paddingLeft: space.sm, borderLeftColor: colors.rule, borderLeftWidth: 2 },
});
