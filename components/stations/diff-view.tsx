// A unified diff, line by line in a monospace font: old and new line numbers, then `+`, `-` or a space,
// so an added or removed line reads as such without colour.
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import { Small } from '@/components/ui/text';
import { parseUnifiedDiff } from './unified-diff';

const SIGN = { add: '+', del: '-', same: ' ', hunk: '', file: '' } as const;
const WORD = { add: 'added', del: 'removed', same: 'unchanged', hunk: '', file: '' } as const;

export function DiffView({ diff, testID }: { diff: string; testID?: string }) {
  const lines = parseUnifiedDiff(diff);
  if (lines.length === 0) return <Small testID={testID ? `${testID}-empty` : undefined}>No change: the files stay as they are.</Small>;
  return (
    <ScrollView horizontal style={styles.box} contentContainerStyle={styles.inner} testID={testID}>
      <View>
        {lines.map((l, i) =>
          l.type === 'file' ? (
            <Text key={i} style={styles.file}>
              {l.text}
            </Text>
          ) : l.type === 'hunk' ? (
            <Text key={i} style={styles.hunk}>
              {l.text}
            </Text>
          ) : (
            <View key={i} style={[styles.row, l.type === 'add' && styles.add, l.type === 'del' && styles.del]} aria-label={`${WORD[l.type]} line ${l.newNo ?? l.oldNo}: ${l.text}`} testID={`diff-${l.type}`}>
              <Text style={styles.no}>{l.oldNo ?? ''}</Text>
              <Text style={styles.no}>{l.newNo ?? ''}</Text>
              <Text style={[styles.sign, l.type === 'add' && styles.signAdd, l.type === 'del' && styles.signDel]}>{SIGN[l.type]}</Text>
              <Text style={styles.code}>{l.text === '' ? ' ' : l.text}</Text>
            </View>
          ),
        )}
      </View>
    </ScrollView>
  );
}

const mono = { fontFamily: fonts.mono, fontSize: 13, lineHeight: 20 };
const styles = StyleSheet.create({
  box: { borderWidth: 1, borderColor: colors.border, borderRadius: radius.md, backgroundColor: colors.surface },
  inner: { padding: space.sm, minWidth: '100%' },
  row: { flexDirection: 'row' },
  add: { backgroundColor: colors.added },
  del: { backgroundColor: colors.removed },
  no: { ...mono, width: 34, textAlign: 'right', color: colors.textMuted, paddingRight: space.xs },
  sign: { ...mono, width: 18, textAlign: 'center', fontFamily: fonts.mono },
  signAdd: { color: colors.success },
  signDel: { color: colors.danger },
  code: { ...mono, color: colors.text, paddingRight: space.md },
  hunk: { ...mono, color: colors.note, paddingVertical: 2 },
  file: { ...mono, fontFamily: fonts.mono, color: colors.text, paddingTop: space.sm, textDecorationLine: 'underline' },
});
