import { Pressable, StyleSheet, Text } from 'react-native';
import { colors, focusRing, radius, space, type } from '../theme';

interface ChipProps {
  label: string;
  checked: boolean;
  /** "radio" in a one-of group, "checkbox" in a several-of group. */
  role: 'radio' | 'checkbox';
  onPress: () => void;
  testID: string;
  disabled?: boolean;
  /** Show a tick on a checked chip (several-of groups). */
  tick?: boolean;
}

/** One chip of a choice group: outlined when off, teal when on. */
export function Chip({ label, checked, role, onPress, testID, disabled = false, tick = false }: ChipProps) {
  return (
    <Pressable
      role={role}
      aria-checked={checked}
      aria-label={label}
      testID={testID}
      disabled={disabled}
      onPress={onPress}
      style={({ pressed }) => [styles.chip, checked && styles.checked, pressed && styles.pressed, disabled && styles.disabled]}
    >
      <Text style={[styles.label, checked && styles.checkedLabel]}>
        {tick && checked ? '✓ ' : ''}
        {label}
      </Text>
    </Pressable>
  );
}

export const chipGroupStyle = StyleSheet.create({ group: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs } }).group;

const styles = StyleSheet.create({
  chip: {
    ...focusRing,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.pill,
    paddingHorizontal: space.sm,
    paddingVertical: space.xxs,
    // A touch target of 44 px at least (WCAG 2.1, 2.5.5).
    minHeight: 44,
    minWidth: 44,
    justifyContent: 'center',
    backgroundColor: colors.surface,
  },
  checked: { borderColor: colors.teal, backgroundColor: colors.tealWash },
  pressed: { opacity: 0.85 },
  disabled: { opacity: 0.6 },
  label: { ...type.caption, color: colors.ink },
  checkedLabel: { fontFamily: type.uiStrong.fontFamily, color: colors.teal },
});
