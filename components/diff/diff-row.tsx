// One line of a diff: line numbers, the +/- mark and the text, in the shipped monospace font.
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
import type { DiffRow } from './parse-diff';

const SIGN = { add: '+', del: '-', context: ' ' } as const;
const WORD = { add: 'added', del: 'removed', context: 'unchanged' } as const;

/** Words for screen readers: which line, what happened to it, and its text. */
export function rowLabel(row: DiffRow): string {
  const where = row.newNo != null ? `new line ${row.newNo}` : `old line ${row.oldNo}`;
  return `${where}, ${WORD[row.kind]}: ${row.text || 'empty line'}`;
}

type Props = {
  row: DiffRow | null;
  /** Which numbers to show: both (unified) or one side (split). */
  numbers: 'both' | 'old' | 'new';
  onPress?: () => void;
  active?: boolean;
  marker?: ReactNode;
  testID?: string;
};

export function DiffRowView({ row, numbers, onPress, active, marker, testID }: Props) {
  if (!row) return <View style={[styles.row, styles.blank]} aria-hidden />;
  const content = (
    <>
      {numbers !== 'new' ? <Text style={styles.no}>{row.oldNo ?? ''}</Text> : null}
      {numbers !== 'old' ? <Text style={styles.no}>{row.newNo ?? ''}</Text> : null}
      <Text style={[styles.sign, row.kind === 'add' && styles.signAdd, row.kind === 'del' && styles.signDel]}>{SIGN[row.kind]}</Text>
      <Text style={styles.text} selectable>
        {row.text}
        {row.noEol ? <Text style={styles.noEol}> (no line end)</Text> : null}
      </Text>
      {marker ? <View style={styles.marker}>{marker}</View> : null}
    </>
  );
  const style = [styles.row, row.kind === 'add' && styles.add, row.kind === 'del' && styles.del, active && styles.active];
  if (!onPress) {
    return (
      <View style={style} accessible aria-label={rowLabel(row)} testID={testID}>
        {content}
      </View>
    );
  }
  return (
    <Pressable
      accessibilityRole="button"
      aria-label={`${rowLabel(row)}. Press to comment on this line.`}
      onPress={onPress}
      testID={testID}
      style={(s) => [...style, ((s as { hovered?: boolean }).hovered || s.pressed) && styles.hover, (s as { focused?: boolean }).focused && styles.focus]}
    >
      {content}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexGrow: 1, flexDirection: 'row', alignItems: 'flex-start', minHeight: 22, paddingRight: space.sm },
  blank: { backgroundColor: colors.surfaceAlt },
  add: { backgroundColor: colors.added },
  del: { backgroundColor: colors.removed },
  active: { outlineColor: colors.primary, outlineWidth: 2, outlineStyle: 'solid' } as object,
  hover: { opacity: 0.85 },
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as object,
  no: { width: 34, paddingRight: space.xs, textAlign: 'right', fontFamily: fonts.mono, fontSize: 12, lineHeight: 20, color: colors.textMuted, userSelect: 'none' } as object,
  sign: { width: 18, textAlign: 'center', fontFamily: fonts.mono, fontSize: 14, lineHeight: 20, fontWeight: '700', color: colors.textMuted },
  signAdd: { color: colors.success },
  signDel: { color: colors.danger },
  text: { flex: 1, fontFamily: fonts.mono, fontSize: 13, lineHeight: 20, color: colors.text, whiteSpace: 'pre-wrap', overflowWrap: 'anywhere' } as object,
  noEol: { fontFamily: fonts.regular, fontSize: 12, color: colors.textMuted },
  marker: { marginLeft: space.xs },
});
