import { useId, useState } from 'react';
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { colors, space, type } from '../theme';
import { inputBox } from './inputBox';
import { FieldError } from '../worksheet/QuantityField';

/** What a field holds, which sets the keyboard, autofill and whether the text is hidden. */
export type TextFieldKind = 'email' | 'name' | 'current-password' | 'new-password' | 'search';

const kinds: Record<TextFieldKind, TextInputProps> = {
  email: { autoComplete: 'email', inputMode: 'email', keyboardType: 'email-address', autoCapitalize: 'none', autoCorrect: false },
  name: { autoComplete: 'name', autoCapitalize: 'words' },
  'current-password': { autoComplete: 'current-password', secureTextEntry: true, autoCapitalize: 'none', autoCorrect: false },
  'new-password': { autoComplete: 'new-password', secureTextEntry: true, autoCapitalize: 'none', autoCorrect: false },
  search: { role: 'searchbox', autoCapitalize: 'none', autoCorrect: false, inputMode: 'search' },
};

export interface TextFieldProps {
  /** The field's name: the input is `field-<name>`, its error `error-<name>`. */
  name: string;
  label: string;
  kind: TextFieldKind;
  value: string;
  onChangeText: (text: string) => void;
  /** Pressing Enter in the field sends its form. */
  onSubmitEditing?: () => void;
  /** A rule the value must meet, said before anything goes wrong ("at least 12 characters"). */
  hint?: string;
  placeholder?: string;
  /** What is wrong with the value, beside the field. */
  error?: string;
}

/** One labelled text field of a form, with its hint and its error right beneath it. */
export function TextField({ name, label, kind, value, onChangeText, onSubmitEditing, hint, placeholder, error }: TextFieldProps) {
  const [focused, setFocused] = useState(false);
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ');

  return (
    <View style={styles.field}>
      <Text style={type.uiStrong}>{label}</Text>
      <TextInput
        {...kinds[kind]}
        testID={`field-${name}`}
        aria-label={label}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy || undefined}
        value={value}
        onChangeText={onChangeText}
        onSubmitEditing={onSubmitEditing}
        placeholder={placeholder}
        placeholderTextColor={colors.inkMuted}
        spellCheck={false}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={[styles.input, error ? styles.inputError : null, focused && styles.inputFocused]}
      />
      {hint ? (
        <Text nativeID={hintId} style={type.small}>
          {hint}
        </Text>
      ) : null}
      {error ? <FieldError id={errorId} testID={`error-${name}`} message={error} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xxs },
  input: {
    ...type.ui,
    ...inputBox.box,
  },
  inputError: inputBox.error,
  inputFocused: inputBox.focused,
});
