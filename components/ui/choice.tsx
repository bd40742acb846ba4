import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';

type Option<T extends string> = { value: T; label: string };

/** A labelled row of options (a radio group); the chosen one is marked by a check and bold text, not colour alone. */
export function Choice<T extends string>({ label, options, value, onChange, testID, disabled }: { label: string; options: Option<T>[]; value: T | null; onChange: (v: T) => void; testID?: string; disabled?: boolean }) {
  return (
    <View style={styles.wrap}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.row} accessibilityRole="radiogroup" aria-label={label} testID={testID}>
        {options.map((o) => {
          const on = o.value === value;
          return (
            <Pressable
              key={o.value}
              accessibilityRole="radio"
              accessibilityState={{ checked: on, disabled }}
              aria-checked={on}
              disabled={disabled}
              testID={testID ? `${testID}-${o.value}` : undefined}
              onPress={() => onChange(o.value)}
              style={(s) => [styles.opt, on && styles.on, (s as { focused?: boolean }).focused && styles.focus]}
            >
              <Text style={[styles.text, on && styles.textOn]}>{on ? `✓ ${o.label}` : o.label}</Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  label: { fontFamily: fonts.semibold, fontSize: 14, color: colors.text },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  opt: { minHeight: 40, justifyContent: 'center', paddingHorizontal: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.borderStrong, backgroundColor: colors.surface },
  on: { backgroundColor: colors.primarySoft, borderColor: colors.primary, borderWidth: 2 },
  text: { fontFamily: fonts.regular, fontSize: 14, color: colors.text },
  textOn: { fontFamily: fonts.semibold, color: colors.primary },
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as object,
});
