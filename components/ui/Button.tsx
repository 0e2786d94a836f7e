import { ActivityIndicator, Pressable, StyleSheet, Text } from 'react-native';
import { colors, focusRing, radius, space, type } from '../theme';

interface ButtonProps {
  label: string;
  onPress: () => void;
  testID?: string;
  /** `quiet` for the second action of a place (cancel, sign out): outlined, not filled. */
  variant?: 'primary' | 'quiet';
  /** While a request is on its way: the button shows progress, says so, and cannot be pressed again. */
  busy?: boolean;
  /** What the button says while busy, e.g. "Signing in…". */
  busyLabel?: string;
  disabled?: boolean;
}

/** The primary action: teal, one per place; `quiet` for the ones beside it. */
export function Button({ label, onPress, testID, variant = 'primary', busy = false, busyLabel, disabled = false }: ButtonProps) {
  const quiet = variant === 'quiet';
  const inactive = busy || disabled;
  return (
    <Pressable
      role="button"
      onPress={onPress}
      testID={testID}
      disabled={inactive}
      aria-busy={busy || undefined}
      style={({ pressed }) => [styles.button, quiet && styles.quiet, pressed && styles.pressed, inactive && styles.inactive]}
    >
      {busy ? <ActivityIndicator size="small" color={quiet ? colors.teal : colors.paper} /> : null}
      <Text style={[styles.label, quiet && styles.quietLabel]}>{busy && busyLabel ? busyLabel : label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  button: {
    ...focusRing,
    alignSelf: 'flex-start',
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.xs,
    backgroundColor: colors.teal,
    borderColor: colors.teal,
    borderWidth: 1,
    borderRadius: radius.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    // A touch target of 44 px at least (WCAG 2.1, 2.5.5).
    minHeight: 44,
    minWidth: 44,
  },
  quiet: { backgroundColor: colors.surface },
  pressed: { opacity: 0.85 },
  inactive: { opacity: 0.6 },
  label: { ...type.uiStrong, color: colors.paper },
  quietLabel: { color: colors.teal },
});
