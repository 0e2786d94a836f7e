import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { colors, space, type } from '../theme';

/** Progress for a wait the reader can see: a spinner and what is being fetched. */
export function Loading({ label, testID }: { label: string; testID?: string }) {
  return (
    <View testID={testID} style={styles.row}>
      <ActivityIndicator color={colors.teal} aria-label={label} />
      <Text style={type.caption}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.sm },
});
