import { Link } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, Text } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';

/** A link that looks like a secondary button. Link's asChild slot needs ONE flat style object on web. */
export function LinkButton({ href, label, testID, primary }: { href: string; label: string; testID?: string; primary?: boolean }) {
  const [focused, setFocused] = useState(false);
  return (
    <Link href={href as never} asChild>
      <Pressable
        accessibilityRole="link"
        testID={testID}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={StyleSheet.flatten([styles.base, primary && styles.primary, focused && styles.focus])}
      >
        <Text style={StyleSheet.flatten([styles.label, primary && styles.primaryLabel])}>{label}</Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: 40,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.borderStrong,
    backgroundColor: colors.surface,
    alignItems: 'center',
    justifyContent: 'center',
  },
  primary: { backgroundColor: colors.primary, borderColor: colors.primary },
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 } as object,
  label: { fontFamily: fonts.semibold, fontSize: 14, color: colors.primary },
  primaryLabel: { color: colors.primaryText },
  download: { paddingVertical: 10, textDecorationLine: 'none' },
});

/** A plain browser link to a file the server sends (the CP437 report): not a route of the app. */
export function DownloadLink({ href, label, testID }: { href: string; label: string; testID?: string }) {
  const web = { href, hrefAttrs: { download: '', rel: 'noopener' } } as object;
  return (
    <Text style={StyleSheet.flatten([styles.base, styles.label, styles.download])} testID={testID} accessibilityRole="link" {...web}>
      {label}
    </Text>
  );
}
