import { useId, useState } from 'react';
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { colors, space, type } from '../theme';
import { inputBox } from '../ui/inputBox';
import { FieldError } from '../worksheet/QuantityField';

interface FieldProps {
  label: string;
  /** On the input; its error is `<testID>-error`. */
  testID: string;
  value: string;
  onChangeText: (text: string) => void;
  hint?: string;
  error?: string;
  multiline?: boolean;
  placeholder?: string;
  /** `url` for an address: the URL keyboard, no capitals or autocorrect. */
  kind?: 'text' | 'url' | 'mono';
}

const kinds: Record<NonNullable<FieldProps['kind']>, TextInputProps> = {
  text: {},
  url: { inputMode: 'url', keyboardType: 'url', autoCapitalize: 'none', autoCorrect: false, spellCheck: false },
  mono: { autoCapitalize: 'none', autoCorrect: false, spellCheck: false },
};

/** A labelled text box of the submission forms, with its hint and its error beneath it. */
export function Field({ label, testID, value, onChangeText, hint, error, multiline = false, placeholder, kind = 'text' }: FieldProps) {
  const [focused, setFocused] = useState(false);
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ');
  return (
    <View style={styles.field}>
      <Text style={type.uiStrong}>{label}</Text>
      <TextInput
        {...kinds[kind]}
        testID={testID}
        aria-label={label}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy || undefined}
        value={value}
        onChangeText={onChangeText}
        placeholder={placeholder}
        placeholderTextColor={colors.inkMuted}
        multiline={multiline}
        numberOfLines={multiline ? 5 : undefined}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={[
          kind === 'mono' ? styles.mono : styles.input,
          multiline && styles.multiline,
          error ? inputBox.error : null,
          focused && inputBox.focused,
        ]}
      />
      {hint ? (
        <Text nativeID={`${id}-hint`} style={type.small}>
          {hint}
        </Text>
      ) : null}
      {error ? <FieldError id={`${id}-error`} testID={`${testID}-error`} message={error} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xxs },
  input: { ...type.ui, ...inputBox.box },
  mono: { ...type.mono, ...inputBox.box, fontSize: 16, lineHeight: 22 },
  multiline: { minHeight: 120, paddingVertical: space.xs, textAlignVertical: 'top' },
});
