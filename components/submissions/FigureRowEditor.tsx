/** One claimed figure of the sighting form: its kind, the quantity as typed (read live) and a label. */
import { StyleSheet, Text, View } from 'react-native';
import { FIGURE_KIND_LABEL, FIGURE_KIND_SHORT, FIGURE_KINDS } from '@/shared/claims/types';
import { ChoiceChips } from '../admin/ChoiceChips';
import { EXAMPLE_FOR } from '../claims/figures';
import { readableText } from '@/shared/format/numbers';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { dataAttributes } from '../worksheet/dataAttributes';
import { Field } from './Field';
import { kindsFor, readFigure, withQuantity, type FigureRow } from './sighting';

const KIND_CHIP = FIGURE_KIND_SHORT;

interface FigureRowEditorProps {
  index: number;
  row: FigureRow;
  error: string | undefined;
  onChange: (row: FigureRow) => void;
  onRemove: () => void;
}

export function FigureRowEditor({ index, row, error, onChange, onRemove }: FigureRowEditorProps) {
  const testID = `sighting-figure-${index}`;
  const reading = row.quantity.trim() ? readFigure(row.kind, row.quantity) : null;
  const problem = error ?? (reading && !reading.ok ? reading.message : undefined);
  // When the unit fits more than one kind and the reader has not picked, say which others it could be.
  const others = row.kindPicked ? [] : kindsFor(row.quantity).filter((k) => k !== row.kind);
  return (
    <View role="listitem" testID={testID} style={styles.row}>
      <View style={styles.head}>
        <Text style={type.uiStrong}>
          Figure {index + 1} · {FIGURE_KIND_LABEL[row.kind]}
        </Text>
        <Button testID={`${testID}-remove`} variant="quiet" label="Remove" onPress={onRemove} />
      </View>
      <Text style={type.ui}>Kind</Text>
      <ChoiceChips
        label={`Figure ${index + 1}: kind`}
        testID={`${testID}-kind`}
        options={FIGURE_KINDS.map((value) => ({ value, label: KIND_CHIP[value] }))}
        value={row.kind}
        onChange={(kind) => onChange({ ...row, kind, kindPicked: true })}
      />
      {others.length ? (
        <Text testID={`${testID}-kind-question`} style={type.small}>
          Read as {FIGURE_KIND_LABEL[row.kind].toLowerCase()}; “{row.quantity.trim()}” could also be{' '}
          {others.map((k) => FIGURE_KIND_LABEL[k].toLowerCase()).join(' or ')}. Pick the kind above if it is.
        </Text>
      ) : null}
      <Field
        label="Quantity with its unit"
        testID={`${testID}-quantity`}
        kind="mono"
        value={row.quantity}
        onChangeText={(quantity) => onChange(withQuantity(row, quantity))}
        placeholder={EXAMPLE_FOR[row.kind]}
        error={problem}
      />
      {reading?.ok ? (
        <Text style={type.small}>
          In SI:{' '}
          <Text testID={`${testID}-si`} {...dataAttributes({ si: String(reading.si) })} style={styles.mono}>
            {readableText(reading.display)}
          </Text>
        </Text>
      ) : null}
      <Field
        label="What it is (optional)"
        testID={`${testID}-label`}
        value={row.label}
        onChangeText={(label) => onChange({ ...row, label })}
        placeholder="claimed thrust"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs, paddingVertical: space.md, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'center', gap: space.xs },
  mono: { ...type.mono, fontSize: 13, color: colors.ink },
});
