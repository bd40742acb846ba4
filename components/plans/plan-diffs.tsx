// Both startup files' diffs, each changed block headed by the engine's reason for it and each commented
// line followed by its comments. Lines can be made pressable (the lead comments on them).
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
import type { Change, PlanComment, PlanResultJson } from '@/hooks/use-plans';
import { DiffView } from '@/components/diff';

type FileName = 'AUTOEXEC.BAT' | 'CONFIG.SYS';

type Props = {
  result: Pick<PlanResultJson, 'files' | 'changes'>;
  comments?: PlanComment[];
  onPressLine?: (file: FileName, line: number) => void;
  active?: { file: FileName; line: number } | null;
  /** Shown under the active line (e.g. the comment form). */
  activeSlot?: ReactNode;
};

function reasons(changes: Change[], file: FileName): Record<number, ReactNode> {
  const out: Record<number, ReactNode> = {};
  for (const c of changes.filter((x) => x.file === file)) {
    out[c.line] = (
      <Text style={styles.reason} testID={`reason-${file}-${c.line}`}>
        <Text style={styles.reasonMark}>▸ Why: </Text>
        {c.reason}
      </Text>
    );
  }
  return out;
}

function commentNotes(comments: PlanComment[], file: FileName, active: Props['active'], slot: ReactNode): Record<number, ReactNode> {
  const byLine = new Map<number, PlanComment[]>();
  for (const c of comments) if (c.file === file && c.line) byLine.set(c.line, [...(byLine.get(c.line) ?? []), c]);
  if (active?.file === file && !byLine.has(active.line)) byLine.set(active.line, []);
  const out: Record<number, ReactNode> = {};
  for (const [line, list] of byLine) {
    out[line] = (
      <View style={styles.comments}>
        {list.map((c) => (
          <Text key={c.id} style={styles.comment} testID={`line-comment-${file}-${line}`}>
            <Text style={styles.author}>✎ {c.authorName}: </Text>
            {c.body}
          </Text>
        ))}
        {active?.file === file && active.line === line ? slot : null}
      </View>
    );
  }
  return out;
}

function markers(comments: PlanComment[], file: FileName): Record<number, ReactNode> {
  const count = new Map<number, number>();
  for (const c of comments) if (c.file === file && c.line) count.set(c.line, (count.get(c.line) ?? 0) + 1);
  return Object.fromEntries([...count].map(([line, n]) => [line, <Text style={styles.marker}>✎ {n}</Text>]));
}

export function PlanDiffs({ result, comments = [], onPressLine, active, activeSlot }: Props) {
  const files = [result.files.autoexec, result.files.config].filter((f): f is NonNullable<typeof f> => !!f);
  return (
    <View style={styles.wrap}>
      {files.map((f) => (
        <DiffView
          key={f.name}
          file={f.name}
          diff={f.diff}
          testID={`diff-${f.name === 'AUTOEXEC.BAT' ? 'autoexec' : 'config'}`}
          notesAbove={reasons(result.changes, f.name)}
          notesBelow={commentNotes(comments, f.name, active, activeSlot)}
          markers={markers(comments, f.name)}
          activeLine={active?.file === f.name ? active.line : null}
          onPressLine={onPressLine ? (line) => onPressLine(f.name, line) : undefined}
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  reason: { fontFamily: fonts.regular, fontSize: 13, lineHeight: 19, color: colors.note },
  reasonMark: { fontFamily: fonts.semibold },
  comments: { gap: space.xs },
  comment: { fontFamily: fonts.regular, fontSize: 13, lineHeight: 19, color: colors.text },
  author: { fontFamily: fonts.semibold },
  marker: { fontFamily: fonts.semibold, fontSize: 12, color: colors.primary },
});
