import { useId, useState } from 'react';
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { readableText } from '@/shared/format/numbers';
import { colors, focusRing, radius, space, type } from '../theme';
import { inputBox } from '../ui/inputBox';
import { symbolText, VarSymbol } from './Symbolic';

interface QuantityFieldProps {
  /** The input's name: the field is `input-<name>`, its error `input-<name>-error`. */
  name: string;
  label: string;
  /** Show the name after the label as a symbol (a worksheet's `P_in` → P with subscript "in"). */
  showSymbol?: boolean;
  value: string;
  onChangeText: (text: string) => void;
  /** What an empty field stands for, e.g. "1 mN". */
  defaultText: string;
  /** The unit a number typed without one is read in; "" for a pure number. */
  unit: string;
  /** A difference (a temperature rise, a ΔT): "2 degC" is read as 2 K, not as the temperature 275.15 K. */
  difference?: boolean;
  help?: string;
  /** Values the reader can put in with one press, e.g. the electron's mass. */
  presets?: readonly { label: string; value: string }[];
  /** Why the typed value cannot be used, shown beside the field. */
  error?: string;
  /** How the value was read, e.g. "889.6 mN" for "0.2 lbf"; shown when it differs from what was typed. */
  reading?: string;
}

/**
 * One typed quantity — a number and a unit in one field ("0.2 lbf", "450 degC") — with its label,
 * a hint at the unit, presets where there are any, and its error right beneath it.
 */
export function QuantityField({ name, label, showSymbol, value, onChangeText, defaultText, unit, difference, help, presets, error, reading }: QuantityFieldProps) {
  const [focused, setFocused] = useState(false);
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const hint =
    `${unit ? `A number and a unit; a number alone is read in ${readableText(unit)}.` : 'A pure number.'}` +
    `${difference ? ' A difference: °C and °F count only their size (2 °C of rise is 2 K, 3.6 °F is 2 K).' : ''}` +
    ' Left empty, the default applies.';

  return (
    <View style={styles.field}>
      <Text style={type.uiStrong}>
        {label}
        {showSymbol ? (
          <Text style={styles.symbol}>
            {', '}
            <VarSymbol name={name} />
          </Text>
        ) : null}
      </Text>
      {help ? <Text style={type.caption}>{help}</Text> : null}
      <TextInput
        testID={`input-${name}`}
        aria-label={showSymbol ? `${label}, ${symbolText(name)}` : label}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${hintId} ${errorId}` : hintId}
        value={value}
        onChangeText={onChangeText}
        placeholder={defaultText}
        placeholderTextColor={colors.inkMuted}
        autoCapitalize="none"
        autoCorrect={false}
        spellCheck={false}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={[styles.input, error ? styles.inputError : null, focused && styles.inputFocused]}
      />
      {reading && !error && hasUnit(value) && reading !== value.trim() ? (
        <Text testID={`input-${name}-reading`} style={type.small}>
          Read as <Text style={styles.reading}>{readableText(reading)}</Text>
        </Text>
      ) : null}
      <Text nativeID={hintId} style={type.small}>
        {hint}
      </Text>
      {presets?.length ? (
        <View style={styles.presets}>
          {presets.map((preset, i) => (
            <Pressable
              key={preset.label}
              role="button"
              testID={`preset-${name}-${i}`}
              aria-label={`${label}: ${preset.label}, ${preset.value}`}
              aria-pressed={value.trim() === preset.value}
              onPress={() => onChangeText(preset.value)}
              style={({ pressed }) => [styles.preset, value.trim() === preset.value && styles.presetOn, pressed && styles.pressed]}
            >
              <Text style={styles.presetLabel}>{preset.label}</Text>
            </Pressable>
          ))}
        </View>
      ) : null}
      {error ? <FieldError id={errorId} testID={`input-${name}-error`} message={error} /> : null}
    </View>
  );
}

/** Whether the text names a unit: only then is "read as" news to the reader. */
function hasUnit(text: string): boolean {
  return /[^\d\s.,+\-eE×x^]/.test(text);
}

/** What is wrong with a field or a step, in words, next to it: a brass rule, no alarm colours. */
export function FieldError({ id, testID, message }: { id?: string; testID: string; message: string }) {
  return (
    <Text nativeID={id} testID={testID} style={styles.error}>
      {readableText(message)}
    </Text>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xxs },
  symbol: { ...type.ui, color: colors.inkMuted },
  input: {
    ...type.mono,
    ...inputBox.box,
    fontSize: 16,
    lineHeight: 22,
  },
  inputError: inputBox.error,
  inputFocused: inputBox.focused,
  presets: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, marginTop: space.xxs },
  preset: {
    ...focusRing,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.pill,
    paddingHorizontal: space.sm,
    paddingVertical: space.xxs,
    backgroundColor: colors.surface,
  },
  presetOn: { borderColor: colors.teal, backgroundColor: colors.tealWash },
  pressed: { opacity: 0.85 },
  reading: { ...type.mono, fontSize: 12, lineHeight: 17, color: colors.ink },
  presetLabel: { ...type.caption, color: colors.ink },
  error: {
    ...type.caption,
    color: colors.ink,
    backgroundColor: colors.brassWash,
    borderLeftColor: colors.brass,
    borderLeftWidth: 3,
    paddingHorizontal: space.sm,
    paddingVertical: space.xxs,
    marginTop: space.xxs,
  },
});
