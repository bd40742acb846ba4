import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';

type Tone = 'error' | 'warning' | 'note' | 'success' | 'caution';

const tones: Record<Tone, { bg: string; fg: string; mark: string; word: string }> = {
  error: { bg: colors.dangerSoft, fg: colors.danger, mark: '✕', word: 'Error' },
  warning: { bg: colors.warningSoft, fg: colors.warning, mark: '!', word: 'Warning' },
  caution: { bg: colors.warningSoft, fg: colors.warning, mark: '⚠', word: 'Caution' },
  note: { bg: colors.noteSoft, fg: colors.note, mark: 'i', word: 'Note' },
  success: { bg: colors.successSoft, fg: colors.success, mark: '✓', word: 'Done' },
};

/** A message block marked by a symbol and a word, not by colour alone. */
export function Banner({ tone, title, children, testID }: { tone: Tone; title?: string; children?: ReactNode; testID?: string }) {
  const t = tones[tone];
  return (
    <View style={[styles.box, { backgroundColor: t.bg, borderLeftColor: t.fg }]} accessibilityRole={tone === 'error' ? 'alert' : undefined} testID={testID}>
      <Text style={[styles.mark, { color: t.fg }]} aria-hidden>
        {t.mark}
      </Text>
      <View style={styles.body}>
        <Text style={[styles.title, { color: t.fg }]}>{title ?? t.word}</Text>
        {typeof children === 'string' ? <Text style={styles.text}>{children}</Text> : children}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flexDirection: 'row', gap: space.md, padding: space.md, borderRadius: radius.md, borderLeftWidth: 4 },
  mark: { fontFamily: fonts.bold, fontSize: 16, width: 18, textAlign: 'center' },
  body: { flex: 1, gap: space.xs },
  title: { fontFamily: fonts.semibold, fontSize: 14 },
  text: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20, color: colors.text },
});
