import { View } from 'react-native';
import { Chip, chipGroupStyle } from '../ui/Chip';

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
    <View role="radiogroup" aria-label={label} testID={testID} style={chipGroupStyle}>
      {options.map((option) => (
        <Chip
          key={option.value}
          role="radio"
          label={option.label}
          checked={option.value === value}
          testID={`${testID}-${option.value}`}
          disabled={disabled}
          onPress={() => onChange(option.value)}
        />
      ))}
    </View>
  );
}
