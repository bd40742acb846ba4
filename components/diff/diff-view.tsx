// A reusable diff view of one startup file: unified on a phone, side by side from 900 px, line numbers of
// both files, added and removed lines marked by a +/- glyph and words as well as colour. Notes (the engine's
// reason for a change, a lead's comment) can sit above or below any line of the new file.
import { Fragment, useMemo, type ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { DiffRowView } from './diff-row';
import { countChanges, parseUnifiedDiff, sideBySide, type DiffHunk } from './parse-diff';

export type DiffViewProps = {
  file: string;
  /** The file's unified diff ('' when it does not change). */
  diff: string;
  /** Content shown above the row of a new-file line (e.g. why the engine made that change). */
  notesAbove?: Record<number, ReactNode>;
  /** Content shown below the row of a new-file line (e.g. comments on it). */
  notesBelow?: Record<number, ReactNode>;
  /** Makes each line of the new file pressable (to comment on it). */
  onPressLine?: (newLine: number) => void;
  activeLine?: number | null;
  /** A small mark beside a new-file line, e.g. a comment count. */
  markers?: Record<number, ReactNode>;
  layout?: 'auto' | 'unified' | 'split';
  testID?: string;
};

export function DiffView(props: DiffViewProps) {
  const { file, diff, layout = 'auto', testID = 'diff' } = props;
  const { wide } = useBreakpoints();
  const hunks = useMemo(() => parseUnifiedDiff(diff), [diff]);
  const split = layout === 'split' || (layout === 'auto' && wide);
  const { added, removed } = countChanges(hunks);
  return (
    <View style={styles.box} testID={testID}>
      <View style={styles.head}>
        <Text style={styles.file}>{file}</Text>
        <Text style={styles.counts} testID={`${testID}-counts`}>
          {hunks.length ? `+ ${added} added · - ${removed} removed` : 'no change'}
        </Text>
      </View>
      {hunks.length === 0 ? (
        <Text style={styles.empty}>{file} stays exactly as it is.</Text>
      ) : (
        <>
          <Legend split={split} />
          {hunks.map((h, i) => (
            <Fragment key={i}>
              <HunkHeader hunk={h} />
              {split ? <SplitHunk hunk={h} {...props} testID={testID} /> : <UnifiedHunk hunk={h} {...props} testID={testID} />}
            </Fragment>
          ))}
        </>
      )}
    </View>
  );
}

function Legend({ split }: { split: boolean }) {
  return (
    <View style={styles.legend}>
      <Text style={styles.legendText}>
        <Text style={[styles.legendSign, { color: colors.success }]}>+</Text> added line   <Text style={[styles.legendSign, { color: colors.danger }]}>-</Text> removed line   unmarked lines stay.{' '}
        {split ? 'Left: the file now; right: the file after the change.' : 'Numbers: line in the file now, then in the file after the change.'}
      </Text>
    </View>
  );
}

function HunkHeader({ hunk }: { hunk: DiffHunk }) {
  const first = hunk.rows[0];
  const from = first?.oldNo ?? hunk.oldStart;
  const to = first?.newNo ?? hunk.newStart;
  return (
    <Text style={styles.hunk} accessibilityRole="header" aria-level={4}>
      From line {from} (now) / {to} (after) <Text style={styles.hunkRaw}>{hunk.header}</Text>
    </Text>
  );
}

type HunkProps = DiffViewProps & { hunk: DiffHunk; testID: string };

function Note({ children }: { children: ReactNode }) {
  return <View style={styles.note}>{children}</View>;
}

function UnifiedHunk({ hunk, notesAbove, notesBelow, onPressLine, activeLine, markers, testID }: HunkProps) {
  return (
    <View>
      {hunk.rows.map((row, i) => {
        const n = row.newNo;
        return (
          <Fragment key={i}>
            {n != null && notesAbove?.[n] ? <Note>{notesAbove[n]}</Note> : null}
            <DiffRowView
              row={row}
              numbers="both"
              active={n != null && n === activeLine}
              marker={n != null ? markers?.[n] : undefined}
              onPress={n != null && onPressLine ? () => onPressLine(n) : undefined}
              testID={n != null ? `${testID}-line-${n}` : `${testID}-old-${row.oldNo}`}
            />
            {n != null && notesBelow?.[n] ? <Note>{notesBelow[n]}</Note> : null}
          </Fragment>
        );
      })}
    </View>
  );
}

function SplitHunk({ hunk, notesAbove, notesBelow, onPressLine, activeLine, markers, testID }: HunkProps) {
  const rows = useMemo(() => sideBySide(hunk.rows), [hunk]);
  return (
    <View>
      {rows.map(({ left, right }, i) => {
        const n = right?.newNo ?? null;
        return (
          <Fragment key={i}>
            {n != null && notesAbove?.[n] ? <Note>{notesAbove[n]}</Note> : null}
            <View style={styles.pair}>
              <View style={styles.half}>
                <DiffRowView row={left} numbers="old" testID={left ? `${testID}-old-${left.oldNo}` : undefined} />
              </View>
              <View style={[styles.half, styles.rightHalf]}>
                <DiffRowView
                  row={right}
                  numbers="new"
                  active={n != null && n === activeLine}
                  marker={n != null ? markers?.[n] : undefined}
                  onPress={n != null && onPressLine ? () => onPressLine(n) : undefined}
                  testID={n != null ? `${testID}-line-${n}` : undefined}
                />
              </View>
            </View>
            {n != null && notesBelow?.[n] ? <Note>{notesBelow[n]}</Note> : null}
          </Fragment>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderColor: colors.border, borderRadius: radius.md, backgroundColor: colors.surface, overflow: 'hidden' },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: space.sm, padding: space.sm, paddingHorizontal: space.md, backgroundColor: colors.surfaceAlt, borderBottomWidth: 1, borderBottomColor: colors.border },
  file: { fontFamily: fonts.mono, fontSize: 14, fontWeight: '700', color: colors.text },
  counts: { fontFamily: fonts.mono, fontSize: 13, color: colors.textMuted },
  empty: { padding: space.md, fontFamily: fonts.regular, fontSize: 14, color: colors.textMuted },
  legend: { paddingHorizontal: space.md, paddingVertical: space.xs, borderBottomWidth: 1, borderBottomColor: colors.border },
  legendText: { fontFamily: fonts.regular, fontSize: 12, lineHeight: 18, color: colors.textMuted },
  legendSign: { fontFamily: fonts.mono, fontSize: 13, fontWeight: '700' },
  hunk: { paddingHorizontal: space.md, paddingVertical: space.xs, backgroundColor: colors.noteSoft, fontFamily: fonts.regular, fontSize: 12, color: colors.note },
  hunkRaw: { fontFamily: fonts.mono, fontSize: 12, color: colors.note },
  note: { paddingHorizontal: space.md, paddingVertical: space.xs, backgroundColor: colors.surface, borderTopWidth: 1, borderBottomWidth: 1, borderColor: colors.border },
  pair: { flexDirection: 'row' },
  half: { flex: 1, flexBasis: 0, minWidth: 0 },
  rightHalf: { borderLeftWidth: 1, borderLeftColor: colors.border },
});
