import { StyleSheet, Text, View } from 'react-native';
import type { Worksheet } from '@/shared/worksheet/schema';
import { colors, radius, space, type } from '../theme';
import { dataAttributes } from '../worksheet/dataAttributes';
import { WorksheetView } from '../worksheet/WorksheetView';

/** The entry's worksheets, each runnable in place with the reader's own numbers. */
export function EntryWorksheets({ worksheets }: { worksheets: Worksheet[] }) {
  if (worksheets.length === 0) {
    return <Text style={type.caption}>This version has no worksheet.</Text>;
  }
  return (
    <View style={styles.list}>
      {worksheets.map((worksheet) => (
        <View key={worksheet.name} testID={`worksheet-${worksheet.name}`} style={styles.sheet}>
          <Text role="heading" aria-level={3} style={type.heading}>
            {worksheet.title}
          </Text>
          {worksheet.summary ? <Text style={type.body}>{worksheet.summary}</Text> : null}
          <Text style={type.caption} {...dataAttributes({ print: 'hide' })}>
            Change any input; every step and check follows at once, here in your browser.
          </Text>
          <WorksheetView worksheet={worksheet} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.lg },
  sheet: {
    gap: space.xs,
    backgroundColor: colors.surface,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: radius.md,
    padding: space.md,
  },
});
