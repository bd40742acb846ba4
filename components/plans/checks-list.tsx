// The engine's checks: severity as a symbol and a word, where it points, the message in plain words, and
// (for warnings) the technician's reason or a slot to write one.
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import type { Check, Severity } from '@/hooks/use-plans';

export const SEVERITY: Record<Severity, { mark: string; word: string; fg: string; bg: string; plain: string }> = {
  error: { mark: '✕', word: 'Error', fg: colors.danger, bg: colors.dangerSoft, plain: 'must be fixed before anything changes' },
  warning: { mark: '!', word: 'Warning', fg: colors.warning, bg: colors.warningSoft, plain: 'the technician must say why it is acceptable' },
  note: { mark: 'i', word: 'Note', fg: colors.note, bg: colors.noteSoft, plain: 'for your information' },
};

export function where(c: Check): string | null {
  if (!c.file) return null;
  return c.line ? `${c.file}, line ${c.line}` : c.file;
}

type Props = {
  checks: Check[];
  /** Shown under a warning: the written reason, or a field to write it (index into `checks`). */
  renderReason?: (check: Check, index: number) => ReactNode;
  /** Adds the plain meaning of each severity (for the office user). */
  plain?: boolean;
  testID?: string;
};

export function ChecksList({ checks, renderReason, plain, testID = 'checks' }: Props) {
  if (checks.length === 0) return <Text style={styles.none}>No checks fired.</Text>;
  const order: Severity[] = ['error', 'warning', 'note'];
  const sorted = checks.map((c, i) => ({ c, i })).sort((a, b) => order.indexOf(a.c.severity) - order.indexOf(b.c.severity));
  return (
    <View style={styles.list} testID={testID}>
      {sorted.map(({ c, i }) => {
        const s = SEVERITY[c.severity];
        const at = where(c);
        return (
          <View key={i} style={[styles.item, { borderLeftColor: s.fg, backgroundColor: s.bg }]} testID={`${testID}-${c.severity}-${c.slug}`}>
            <Text style={[styles.head, { color: s.fg }]}>
              {s.mark} {s.word}
              {plain ? <Text style={styles.plain}> ({s.plain})</Text> : null}
              {at ? <Text style={styles.where}> · {at}</Text> : null}
            </Text>
            <Text style={styles.message}>{c.message}</Text>
            <Text style={styles.slug}>{c.slug}</Text>
            {renderReason && c.severity === 'warning' ? renderReason(c, i) : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  none: { fontFamily: fonts.regular, fontSize: 14, color: colors.textMuted },
  item: { borderLeftWidth: 4, borderRadius: radius.md, padding: space.md, gap: space.xs },
  head: { fontFamily: fonts.semibold, fontSize: 14 },
  plain: { fontFamily: fonts.regular, color: colors.text },
  where: { fontFamily: fonts.regular, color: colors.textMuted },
  message: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20, color: colors.text },
  slug: { fontFamily: fonts.mono, fontSize: 12, color: colors.textMuted },
});
