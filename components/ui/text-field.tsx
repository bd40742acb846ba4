import { forwardRef, useState } from 'react';
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';

type Props = TextInputProps & {
  label: string;
  error?: string;
  hint?: string;
  /** Unit shown after the field, e.g. "V DC" or "ft". */
  unit?: string;
  mono?: boolean;
};

/** A labelled text input: the label names the field for screen readers, errors show under it. */
export const TextField = forwardRef<TextInput, Props>(function TextField({ label, error, hint, unit, mono, style, onFocus, onBlur, testID, ...rest }, ref) {
  const [focused, setFocused] = useState(false);
  return (
    <View style={styles.wrap}>
      <Text style={styles.label} nativeID={testID ? `${testID}-label` : undefined}>
        {label}
      </Text>
      <View style={styles.row}>
        <TextInput
          ref={ref}
          accessibilityLabel={label}
          aria-invalid={error ? true : undefined}
          testID={testID}
          placeholderTextColor={colors.textMuted}
          style={[styles.input, mono && styles.mono, focused && styles.focused, !!error && styles.invalid, style]}
          onFocus={(e) => {
            setFocused(true);
            onFocus?.(e);
          }}
          onBlur={(e) => {
            setFocused(false);
            onBlur?.(e);
          }}
          {...rest}
        />
        {unit ? <Text style={styles.unit}>{unit}</Text> : null}
      </View>
      {error ? (
        <Text style={styles.error} accessibilityRole="alert" testID={testID ? `${testID}-error` : undefined}>
          {error}
        </Text>
      ) : hint ? (
        <Text style={styles.hint}>{hint}</Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { fontFamily: fonts.semibold, fontSize: 14, color: colors.text },
  input: {
    flex: 1,
    minHeight: 44,
    borderWidth: 1,
    borderColor: colors.borderStrong,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    fontFamily: fonts.regular,
    fontSize: 15,
    color: colors.text,
  },
  mono: { fontFamily: fonts.mono, fontSize: 13 },
  focused: { borderColor: colors.focus, outlineColor: colors.focus, outlineWidth: 2, outlineStyle: 'solid' } as object,
  invalid: { borderColor: colors.danger },
  unit: { fontFamily: fonts.regular, fontSize: 14, color: colors.textMuted },
  error: { fontFamily: fonts.regular, fontSize: 13, color: colors.danger },
  hint: { fontFamily: fonts.regular, fontSize: 13, color: colors.textMuted },
});
