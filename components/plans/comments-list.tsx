// Every comment on a plan, oldest first, each saying which file and line it points at.
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
import type { PlanComment } from '@/hooks/use-plans';

export function CommentsList({ comments }: { comments: PlanComment[] }) {
  if (comments.length === 0) return <Text style={styles.none}>No comments yet.</Text>;
  return (
    <View style={styles.list} testID="comments">
      {comments.map((c) => (
        <View key={c.id} style={styles.item} testID={`comment-${c.id}`}>
          <Text style={styles.head}>
            ✎ {c.authorName}
            <Text style={styles.meta}>
              {' '}
              · {c.file ? `${c.file}${c.line ? `, line ${c.line}` : ''}` : 'whole plan'} · {new Date(c.createdAt).toLocaleString()}
            </Text>
          </Text>
          <Text style={styles.body}>{c.body}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  none: { fontFamily: fonts.regular, fontSize: 14, color: colors.textMuted },
  item: { gap: 2, paddingBottom: space.sm, borderBottomWidth: 1, borderBottomColor: colors.border },
  head: { fontFamily: fonts.semibold, fontSize: 14, color: colors.text },
  meta: { fontFamily: fonts.regular, fontSize: 13, color: colors.textMuted },
  body: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20, color: colors.text },
});
