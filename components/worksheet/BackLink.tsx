import { Link } from 'expo-router';
import { StyleSheet } from 'react-native';
import { colors, focusRing, type } from '../theme';

/** The way back from a check or a worksheet to the Check kit. */
export function BackLink({ testID, label = 'All checks and worksheets' }: { testID: string; label?: string }) {
  return (
    <Link href="/checks" testID={testID} style={styles.back}>
      {label}
    </Link>
  );
}

const styles = StyleSheet.create({
  back: { ...type.uiStrong, ...focusRing, alignSelf: 'flex-start', color: colors.teal, textDecorationLine: 'underline' },
});
