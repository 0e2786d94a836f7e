import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, focusRing, radius, space, type } from '../theme';

interface ChoiceChipsProps<V extends string> {
  /** The group's name for assistive technology ("Role of Esther Mbeki"). */
  label: string;
  options: readonly { value: V; label: string }[];
  value: V;
  onChange: (value: V) => void;
  /** On the group; each option is `<testID>-<value>`. */
  testID: string;
  disabled?: boolean;
}

/** One choice out of a few, all in view: a row of chips that works as a radio group. */
export function ChoiceChips<V extends string>({ label, options, value, onChange, testID, disabled = false }: ChoiceChipsProps<V>) {
  return (
    <View role="radiogroup" aria-label={label} testID={testID} style={styles.group}>
      {options.map((option) => {
        const checked = option.value === value;
        return (
          <Pressable
            key={option.value}
            role="radio"
            aria-checked={checked}
            aria-label={option.label}
            testID={`${testID}-${option.value}`}
            disabled={disabled}
            onPress={() => onChange(option.value)}
            style={({ pressed }) => [styles.chip, checked && styles.checked, pressed && styles.pressed, disabled && styles.disabled]}
          >
            <Text style={[styles.label, checked && styles.checkedLabel]}>{option.label}</Text>
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
  disabled: { opacity: 0.6 },
  label: { ...type.caption, color: colors.ink },
  checkedLabel: { fontFamily: type.uiStrong.fontFamily, color: colors.teal },
});
