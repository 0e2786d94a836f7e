import { StyleSheet, Text } from 'react-native';
import { type } from '../theme';

/** The product's name as it stands at the top of the rail and of a phone's screen. */
export function Wordmark({ size = 'large' }: { size?: 'large' | 'small' }) {
  return <Text style={[styles.base, size === 'small' && styles.small]}>Counterweight</Text>;
}

const styles = StyleSheet.create({
  base: { ...type.title, letterSpacing: 0.2 },
  small: { fontSize: 18, lineHeight: 24 },
});
