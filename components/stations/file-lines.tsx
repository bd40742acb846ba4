// A startup file shown with its line numbers in a monospace font; chosen lines carry a marker and a word.
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import { splitDosLines } from './dos-lines';

export { splitDosLines };

export type LineMark = { mark: string; word: string; tone: 'final' | 'pick' | 'loader' };

type Props = { text: string; marks?: Record<number, LineMark>; right?: (line: number) => ReactNode; testID?: string };

export function FileLines({ text, marks = {}, right, testID }: Props) {
  const lines = splitDosLines(text);
  return (
    <ScrollView horizontal style={styles.box} contentContainerStyle={styles.inner} testID={testID}>
      <View style={{ minWidth: '100%' }}>
        {lines.map((l, i) => {
          const no = i + 1;
          const m = marks[no];
          return (
            <View key={no} style={[styles.row, m && styles[m.tone]]} testID={`${testID}-line-${no}`}>
              <Text style={styles.no}>{no}</Text>
              <Text style={styles.mark}>{m ? m.mark : ' '}</Text>
              <Text style={styles.code}>{l === '' ? ' ' : l}</Text>
              {m ? <Text style={styles.word}>{m.word}</Text> : null}
              {right ? <View style={styles.right}>{right(no)}</View> : null}
            </View>
          );
        })}
      </View>
    </ScrollView>
  );
}

const mono = { fontFamily: fonts.mono, fontSize: 13, lineHeight: 22 };
const styles = StyleSheet.create({
  box: { borderWidth: 1, borderColor: colors.border, borderRadius: radius.md, backgroundColor: colors.surface },
  inner: { padding: space.sm, minWidth: '100%' },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.xs, minHeight: 24 },
  final: { backgroundColor: colors.warningSoft, borderLeftWidth: 3, borderLeftColor: colors.warning },
  pick: { backgroundColor: colors.primarySoft, borderLeftWidth: 3, borderLeftColor: colors.primary },
  loader: { backgroundColor: colors.added },
  no: { ...mono, width: 28, textAlign: 'right', color: colors.textMuted },
  mark: { ...mono, width: 16, textAlign: 'center', color: colors.text },
  code: { ...mono, color: colors.text },
  word: { fontFamily: fonts.semibold, fontSize: 12, color: colors.text, marginLeft: space.sm },
  right: { marginLeft: 'auto', paddingLeft: space.md },
});
