// A unified diff, line by line in a monospace font: old and new line numbers, then `+`, `-` or a space,
// so an added or removed line reads as such without colour.
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import { Small } from '@/components/ui/text';

export type DiffLine = { type: 'add' | 'del' | 'same' | 'hunk' | 'file'; text: string; oldNo: number | null; newNo: number | null };

/** Reads `diff` output into lines with their numbers in the old and new file. */
export function parseUnifiedDiff(diff: string): DiffLine[] {
  const out: DiffLine[] = [];
  let oldNo = 0;
  let newNo = 0;
  for (const raw of diff.split('\n')) {
    const line = raw.replace(/\r$/, '');
    if (line.startsWith('--- ') || line.startsWith('+++ ') || line.startsWith('Index: ') || line.startsWith('====')) {
      if (line.startsWith('+++ ')) out.push({ type: 'file', text: line.slice(4).replace(/^b\//, ''), oldNo: null, newNo: null });
      continue;
    }
    const hunk = /^@@ -(\d+)(?:,\d+)? \+(\d+)(?:,\d+)? @@/.exec(line);
    if (hunk) {
      oldNo = Number(hunk[1]);
      newNo = Number(hunk[2]);
      out.push({ type: 'hunk', text: line, oldNo: null, newNo: null });
    } else if (line.startsWith('+')) out.push({ type: 'add', text: line.slice(1), oldNo: null, newNo: newNo++ });
    else if (line.startsWith('-')) out.push({ type: 'del', text: line.slice(1), oldNo: oldNo++, newNo: null });
    else if (line.startsWith(' ')) out.push({ type: 'same', text: line.slice(1), oldNo: oldNo++, newNo: newNo++ });
  }
  return out;
}

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
