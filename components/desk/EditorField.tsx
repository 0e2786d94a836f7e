import { useId, useState, type ReactNode } from 'react';
import { Platform, StyleSheet, Text, TextInput, View, type TextStyle } from 'react-native';
import { space, type } from '../theme';
import { inputBox } from '../ui/inputBox';
import { FieldError } from '../worksheet/QuantityField';

interface EditorFieldProps {
  /** The field's name: the input is `editor-field-<name>`, its error `editor-error-<name>`. */
  name: string;
  label: string;
  value: string;
  onChangeText: (text: string) => void;
  /** Markdown prose, a list one item a line, or JSON: several lines, the mono face for JSON and slugs. */
  lines?: number;
  mono?: boolean;
  hint?: string;
  error?: string;
  /** Beside the label: a live count, a limit. */
  aside?: ReactNode;
  editable?: boolean;
  /** Called when the field loses focus (the editor shows a field's problem once it has been left). */
  onBlur?: () => void;
}

/**
 * A box of several lines grows with its text instead of scrolling inside itself: on the web by CSS
 * `field-sizing: content` (react-native-web passes the property through), elsewhere by the content
 * size the TextInput reports.
 */
const growOnWeb = { fieldSizing: 'content' } as unknown as TextStyle;

/**
 * One field of the entry editor: a label, a text box of one or several lines, its hint and its
 * error beneath. (The account forms' TextField is for single-line fields with autofill.)
 */
export function EditorField({ name, label, value, onChangeText, lines = 1, mono, hint, error, aside, editable = true, onBlur }: EditorFieldProps) {
  const [focused, setFocused] = useState(false);
  const [contentHeight, setContentHeight] = useState(0);
  const web = Platform.OS === 'web';
  const minHeight = lines * (mono ? type.mono.lineHeight : type.ui.lineHeight) + 2 * space.xs;
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ');
  return (
    <View style={styles.field}>
      <View style={styles.labelRow}>
        <Text style={type.uiStrong}>{label}</Text>
        {aside}
      </View>
      <TextInput
        testID={`editor-field-${name}`}
        aria-label={label}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy || undefined}
        value={value}
        onChangeText={onChangeText}
        multiline={lines > 1}
        numberOfLines={lines}
        editable={editable}
        autoCapitalize={mono ? 'none' : 'sentences'}
        autoCorrect={!mono}
        spellCheck={!mono}
        onFocus={() => setFocused(true)}
        onBlur={() => {
          setFocused(false);
          onBlur?.();
        }}
        onContentSizeChange={lines > 1 && !web ? (e) => setContentHeight(e.nativeEvent.contentSize.height) : undefined}
        style={[
          mono ? type.mono : type.ui,
          styles.input,
          lines > 1 && { minHeight },
          lines > 1 && (web ? growOnWeb : { height: Math.max(minHeight, contentHeight) }),
          error ? styles.inputError : null,
          focused && styles.inputFocused,
        ]}
      />
      {hint ? (
        <Text nativeID={`${id}-hint`} style={type.small}>
          {hint}
        </Text>
      ) : null}
      {error ? <FieldError id={`${id}-error`} testID={`editor-error-${name}`} message={error} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xxs },
  labelRow: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: space.xs },
  input: {
    ...inputBox.box,
    paddingVertical: space.xs,
  },
  inputError: inputBox.error,
  inputFocused: inputBox.focused,
});
