// A labelled checkbox: a box symbol and the word, never colour alone.
import { Pressable, StyleSheet, Text } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';

export function Tick({ label, checked, onChange, testID, disabled }: { label: string; checked: boolean; onChange: (v: boolean) => void; testID?: string; disabled?: boolean }) {
  return (
    <Pressable
      accessibilityRole="checkbox"
      accessibilityState={{ checked, disabled }}
      aria-checked={checked}
      aria-label={label}
      disabled={disabled}
      testID={testID}
      onPress={() => onChange(!checked)}
      style={(s) => [styles.box, checked && styles.on, (s as { focused?: boolean }).focused && styles.focus, disabled && styles.off]}
    >
      <Text style={[styles.mark, checked && styles.markOn]} aria-hidden>
        {checked ? '☑' : '☐'}
      </Text>
      <Text style={[styles.text, checked && styles.textOn]}>{checked ? 'In' : 'Out'}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  box: { minHeight: 40, minWidth: 64, flexDirection: 'row', alignItems: 'center', gap: space.xs, paddingHorizontal: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.borderStrong, backgroundColor: colors.surface },
  on: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  off: { opacity: 0.55 },
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as object,
  mark: { fontSize: 18, color: colors.textMuted },
  markOn: { color: colors.primary },
  text: { fontFamily: fonts.semibold, fontSize: 14, color: colors.textMuted },
  textOn: { color: colors.primary },
});
