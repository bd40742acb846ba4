import { ActivityIndicator, Pressable, StyleSheet, Text, type PressableProps } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';

type Variant = 'primary' | 'secondary' | 'danger' | 'ghost';

type Props = Omit<PressableProps, 'children' | 'style'> & {
  label: string;
  variant?: Variant;
  busy?: boolean;
  compact?: boolean;
};

/** A button with a visible focus ring, a pressed state and a busy spinner. */
export function Button({ label, variant = 'primary', busy, compact, disabled, ...rest }: Props) {
  const off = disabled || busy;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityState={{ disabled: !!off, busy: !!busy }}
      disabled={off}
      style={(state) => {
        const { pressed, focused, hovered } = state as typeof state & { focused?: boolean; hovered?: boolean };
        return [
          styles.base,
          compact && styles.compact,
          styles[variant],
          (hovered || pressed) && !off && styles[`${variant}Active` as const],
          focused && styles.focus,
          off && styles.disabled,
        ];
      }}
      {...rest}
    >
      {busy ? <ActivityIndicator color={variant === 'primary' || variant === 'danger' ? colors.primaryText : colors.primary} /> : null}
      <Text style={[styles.label, variant === 'primary' || variant === 'danger' ? styles.onDark : styles.onLight]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: 44,
    paddingHorizontal: space.lg,
    borderRadius: radius.md,
    borderWidth: 1,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.sm,
  },
  compact: { minHeight: 36, paddingHorizontal: space.md },
  primary: { backgroundColor: colors.primary, borderColor: colors.primary },
  primaryActive: { backgroundColor: '#173B48' },
  secondary: { backgroundColor: colors.surface, borderColor: colors.borderStrong },
  secondaryActive: { backgroundColor: colors.surfaceAlt },
  danger: { backgroundColor: colors.danger, borderColor: colors.danger },
  dangerActive: { backgroundColor: '#861F24' },
  ghost: { backgroundColor: 'transparent', borderColor: 'transparent' },
  ghostActive: { backgroundColor: colors.surfaceAlt },
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 } as object,
  disabled: { opacity: 0.55 },
  label: { fontFamily: fonts.semibold, fontSize: 15 },
  onDark: { color: colors.primaryText },
  onLight: { color: colors.primary },
});
