import { View } from 'react-native';
import { Chip, chipGroupStyle } from '../ui/Chip';

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
    <View role="group" aria-label={label} testID={testID} style={chipGroupStyle}>
      {options.map((option) => (
        <Chip
          key={option.value}
          role="checkbox"
          tick
          label={option.label}
          checked={values.includes(option.value)}
          testID={`${testID}-${option.value}`}
          onPress={() => toggle(option.value)}
        />
      ))}
    </View>
  );
}
