import { Pressable, StyleSheet, Text } from 'react-native';
import { colors, focusRing, radius, space, type } from '../theme';

interface ButtonProps {
  label: string;
  onPress: () => void;
  testID?: string;
}

/** The primary action: teal, one per place. */
export function Button({ label, onPress, testID }: ButtonProps) {
  return (
    <Pressable
      role="button"
      onPress={onPress}
      testID={testID}
      style={({ pressed }) => [styles.button, pressed && styles.pressed]}
    >
      <Text style={styles.label}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  button: {
    ...focusRing,
    alignSelf: 'flex-start',
    backgroundColor: colors.teal,
    borderRadius: radius.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
  },
  pressed: { opacity: 0.85 },
  label: { ...type.uiStrong, color: colors.paper },
});
