import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, focusRing, radius, space, type } from '../theme';

interface ToggleChipsProps {
  label: string;
  options: readonly { value: string; label: string }[];
  values: readonly string[];
  onChange: (values: string[]) => void;
  /** On the group; each option is `<testID>-<value>`. */
  testID: string;
}

/** Several choices out of a few, all in view: chips that each switch on and off (the laws an entry breaks). */
export function ToggleChips({ label, options, values, onChange, testID }: ToggleChipsProps) {
  const toggle = (value: string) =>
    onChange(values.includes(value) ? values.filter((v) => v !== value) : options.map((o) => o.value).filter((v) => v === value || values.includes(v)));
  return (
    <View role="group" aria-label={label} testID={testID} style={styles.group}>
      {options.map((option) => {
        const checked = values.includes(option.value);
        return (
          <Pressable
            key={option.value}
            role="checkbox"
            aria-checked={checked}
            aria-label={option.label}
            testID={`${testID}-${option.value}`}
            onPress={() => toggle(option.value)}
            style={({ pressed }) => [styles.chip, checked && styles.checked, pressed && styles.pressed]}
          >
            <Text style={[styles.label, checked && styles.checkedLabel]}>
              {checked ? '✓ ' : ''}
              {option.label}
            </Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  chip: {
    ...focusRing,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.pill,
    paddingHorizontal: space.sm,
    paddingVertical: space.xxs,
    minHeight: 32,
    justifyContent: 'center',
    backgroundColor: colors.surface,
  },
  checked: { borderColor: colors.teal, backgroundColor: colors.tealWash },
  pressed: { opacity: 0.85 },
  label: { ...type.caption, color: colors.ink },
  checkedLabel: { fontFamily: type.uiStrong.fontFamily, color: colors.teal },
});
