// The engine's checks: severity by symbol and word (error blocks approval, warning needs a reason, note informs).
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import type { Check } from '@/generators/engine/check';
import { Small } from '@/components/ui/text';

const SEVERITY = {
  error: { mark: '✕', word: 'Error', fg: colors.danger, bg: colors.dangerSoft },
  warning: { mark: '!', word: 'Warning', fg: colors.warning, bg: colors.warningSoft },
  note: { mark: 'i', word: 'Note', fg: colors.note, bg: colors.noteSoft },
} as const;

const ORDER = { error: 0, warning: 1, note: 2 } as const;

export function ChecksList({ checks, empty = 'No checks fired.', testID }: { checks: Check[]; empty?: string; testID?: string }) {
  if (checks.length === 0) return <Small testID={testID ? `${testID}-empty` : undefined}>{empty}</Small>;
  const sorted = [...checks].sort((a, b) => ORDER[a.severity] - ORDER[b.severity]);
  return (
    <View style={styles.list} testID={testID}>
      {sorted.map((c, i) => {
        const s = SEVERITY[c.severity];
        return (
          <View key={`${c.slug}-${c.line}-${i}`} style={[styles.item, { backgroundColor: s.bg, borderLeftColor: s.fg }]} testID={`check-${c.slug}`}>
            <Text style={[styles.head, { color: s.fg }]}>
              {s.mark} {s.word}
              {c.file ? ` · ${c.file}${c.line ? ` line ${c.line}` : ''}` : ''}
              <Text style={styles.slug}>  {c.slug}</Text>
            </Text>
            <Text style={styles.message}>{c.message}</Text>
          </View>
        );
      })}
    </View>
  );
}

/** "2 errors · 1 warning · 3 notes". */
export function checkCounts(checks: Check[]): string {
  const n = (s: Check['severity']) => checks.filter((c) => c.severity === s).length;
  const part = (k: number, one: string) => `${k} ${one}${k === 1 ? '' : 's'}`;
  return [part(n('error'), 'error'), part(n('warning'), 'warning'), part(n('note'), 'note')].join(' · ');
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { borderLeftWidth: 4, borderRadius: radius.sm, padding: space.sm, gap: 2 },
  head: { fontFamily: fonts.semibold, fontSize: 13 },
  slug: { fontFamily: fonts.mono, fontSize: 12, color: colors.textMuted },
  message: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20, color: colors.text },
});
