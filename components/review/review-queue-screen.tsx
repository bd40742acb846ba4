// The lead's queue: plans waiting for review, oldest first, filterable by site.
import { Link } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import { useReviewQueueQuery, type QueueItem } from '@/hooks/use-review';
import { Banner } from '@/components/ui/banner';
import { Choice } from '@/components/ui/choice';
import { Screen } from '@/components/ui/screen';
import { Small } from '@/components/ui/text';

export function ReviewQueueScreen() {
  const [site, setSite] = useState('all');
  const queue = useReviewQueueQuery(site === 'all' ? null : Number(site));
  const sites = queue.data?.sites ?? [];
  const total = sites.reduce((n, s) => n + s.waiting, 0);
  return (
    <Screen title="Review" subtitle="Plans waiting for a lead, oldest first. Approve the exact change, or return it with comments.">
      <Choice
        label="Site"
        testID="queue-site"
        value={site}
        onChange={setSite}
        options={[{ value: 'all', label: `All sites (${total})` }, ...sites.map((s) => ({ value: String(s.id), label: `${s.name} (${s.waiting})` }))]}
      />
      {queue.isError ? <Banner tone="error">{(queue.error as Error).message}</Banner> : null}
      {queue.data && queue.data.items.length === 0 ? (
        <Banner tone="success" title="Nothing waiting" testID="queue-empty">
          No plan waits for review here.
        </Banner>
      ) : null}
      <View style={styles.list} testID="review-queue">
        {queue.data?.items.map((item) => <QueueRow key={item.id} item={item} />)}
      </View>
    </Screen>
  );
}

function QueueRow({ item }: { item: QueueItem }) {
  return (
    <Link href={`/review/${item.id}` as never} asChild>
      <Pressable accessibilityRole="link" testID={`queue-${item.stationName}`} style={styles.row}>
        <View style={styles.main}>
          <Text style={styles.name}>
            {item.stationName} <Text style={styles.muted}>· revision {item.revision}</Text>
          </Text>
          <Small>
            {item.siteName} · sent by {item.submittedByName}
            {item.submittedAt ? ` on ${new Date(item.submittedAt).toLocaleString()}` : ''}
          </Small>
        </View>
        <View style={styles.tags}>
          {item.warnings ? <Text style={[styles.tag, styles.warn]}>! {item.warnings} warning{item.warnings === 1 ? '' : 's'}</Text> : null}
          {item.stale ? <Text style={[styles.tag, styles.stale]}>⚠ Stale</Text> : null}
          <Text style={styles.open}>Open →</Text>
        </View>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, padding: space.md, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderRadius: radius.md },
  main: { flexGrow: 1, flexBasis: 220, flexShrink: 1, gap: 2 },
  name: { fontFamily: fonts.semibold, fontSize: 16, color: colors.text },
  muted: { fontFamily: fonts.regular, color: colors.textMuted },
  tags: { flexDirection: 'row', gap: space.sm, alignItems: 'center', flexWrap: 'wrap' },
  tag: { fontFamily: fonts.semibold, fontSize: 13, paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.sm, borderWidth: 1, overflow: 'hidden' },
  warn: { color: colors.warning, backgroundColor: colors.warningSoft, borderColor: colors.warning },
  stale: { color: colors.danger, backgroundColor: colors.dangerSoft, borderColor: colors.danger },
  open: { fontFamily: fonts.semibold, fontSize: 14, color: colors.primary },
});
