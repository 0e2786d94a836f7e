import { Link, usePathname } from 'expo-router';
import { StyleSheet, Text } from 'react-native';
import { colors, focusRing, type } from '../theme';
import { Screen } from '../ui/Screen';

export function NotFoundScreen() {
  const pathname = usePathname();
  return (
    <Screen testID="screen-not-found" title="Page not found">
      <Text style={type.reading}>
        There is no page at <Text style={styles.path}>{pathname}</Text>. The address may be mistyped, or the page may
        have moved.
      </Text>
      <Link href="/" testID="not-found-home" style={styles.link}>
        Back to the Library
      </Link>
    </Screen>
  );
}

const styles = StyleSheet.create({
  path: { ...type.mono, fontSize: 16 },
  link: { ...type.uiStrong, ...focusRing, alignSelf: 'flex-start', color: colors.teal, textDecorationLine: 'underline' },
});
