import { useState, type ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import type { SurveyCheck } from '@/generators/survey/types';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { SEVERITY } from './format';

type Props = {
  testID: string;
  title: string;
  details: string[];
  flags: SurveyCheck[];
  canEdit: boolean;
  /** The editing form; `done` closes it. */
  editor?: (done: () => void) => ReactNode;
  onDelete?: () => Promise<unknown>;
};

/** One row of the wiring editor: what it is, its flags (mark + word + slug), and edit / delete in place. */
export function EditableRow({ testID, title, details, flags, canEdit, editor, onDelete }: Props) {
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const flagged = flags.length > 0;
  return (
    <View style={[styles.row, flagged && styles.flagged]} testID={testID}>
      <View style={styles.head}>
        <View style={styles.text}>
          <Text style={styles.title}>{title}</Text>
          {details.map((d) => (
            <Text key={d} style={styles.detail}>
              {d}
            </Text>
          ))}
          {flags.map((c, i) => (
            <Text key={i} style={[styles.flag, { color: SEVERITY[c.severity].fg }]} testID={`${testID}-flag`}>
              {SEVERITY[c.severity].mark} {SEVERITY[c.severity].word}: {c.slug}
            </Text>
          ))}
        </View>
        {canEdit ? (
          <View style={styles.actions}>
            {editor ? <Button compact variant="secondary" label={editing ? 'Close' : 'Edit'} testID={`${testID}-edit`} onPress={() => setEditing(!editing)} /> : null}
            {onDelete ? <Button compact variant="ghost" label="Delete" testID={`${testID}-delete`} onPress={() => setDeleting(true)} /> : null}
          </View>
        ) : null}
      </View>
      {deleting ? (
        <View style={styles.confirm}>
          <Text style={styles.detail}>Delete {title}? This cannot be undone here.</Text>
          <View style={styles.actions}>
            <Button compact variant="secondary" label="Keep it" onPress={() => setDeleting(false)} />
            <Button
              compact
              variant="danger"
              label="Delete"
              testID={`${testID}-delete-confirm`}
              onPress={() => {
                setProblem(null);
                onDelete!().then(() => setDeleting(false), (err: Error) => setProblem(err.message));
              }}
            />
          </View>
        </View>
      ) : null}
      {problem ? <Banner tone="error">{problem}</Banner> : null}
      {editing && editor ? <View style={styles.editor}>{editor(() => setEditing(false))}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderRadius: radius.md, padding: space.md, gap: space.sm },
  flagged: { borderColor: colors.danger, borderWidth: 2, borderStyle: 'dashed' },
  head: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: 'space-between' },
  text: { flexShrink: 1, flexGrow: 1, flexBasis: 220, gap: 2 },
  title: { fontFamily: fonts.semibold, fontSize: 15, color: colors.text },
  detail: { fontFamily: fonts.regular, fontSize: 14, color: colors.text },
  flag: { fontFamily: fonts.semibold, fontSize: 13 },
  actions: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  confirm: { gap: space.sm, padding: space.sm, backgroundColor: colors.dangerSoft, borderRadius: radius.sm },
  editor: { borderTopWidth: 1, borderTopColor: colors.border, paddingTop: space.md },
});
