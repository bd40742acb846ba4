// What the bundle will hold (PCs with an approved, current plan, each one tickable) and what it leaves
// out, each with its reason as a symbol, a word and a sentence.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { LEFT_OUT_LABELS, type LeftOutCode } from '@/db/requests/bundles';
import { colors, fonts, radius, space } from '@/constants/theme';
import type { IncludedPc, LeftOut } from '@/hooks/use-bundles';
import { Heading, Mono, Small } from '@/components/ui/text';
import { formatUtc } from './format';
import { Tick } from './tick';

export function IncludedList({ items, ticked, onTick, disabled }: { items: IncludedPc[]; ticked: Set<number>; onTick: (stationId: number, on: boolean) => void; disabled: boolean }) {
  return (
    <View style={styles.section} testID="bundle-included">
      <Heading>Goes in ({ticked.size} of {items.length})</Heading>
      {items.length === 0 ? <Small>No PC of this site has an approved plan that still matches the station.</Small> : null}
      {items.map((pc) => (
        <View key={pc.stationId} style={[styles.row, !ticked.has(pc.stationId) && styles.unticked]} testID={`bundle-in-${pc.name}`}>
          <Tick label={`Put ${pc.name} in the bundle`} checked={ticked.has(pc.stationId)} onChange={(on) => onTick(pc.stationId, on)} disabled={disabled} testID={`bundle-tick-${pc.name}`} />
          <View style={styles.body}>
            <View style={styles.line}>
              <Text style={styles.name}>
                {pc.name} <Text style={styles.number}>#{pc.number}</Text>
              </Text>
              <Mono style={styles.folder}>{pc.folder}\</Mono>
            </View>
            <Small>
              Rev. {pc.revision} · ✓ approved by {pc.approvedBy}, {formatUtc(pc.approvedAt)}
            </Small>
            <Mono style={styles.hash} numberOfLines={1}>
              plan {pc.planHash.slice(0, 16)}…
            </Mono>
          </View>
        </View>
      ))}
    </View>
  );
}

// Most pressing first: what a lead or technician can fix now, then what needs a plan, then what never goes in.
const ORDER: LeftOutCode[] = ['stale', 'not_approved', 'returned', 'in_review', 'draft', 'no_plan', 'released', 'archived', 'not_pc'];

/** Left-out stations grouped by reason; a reason shared by the whole group is said once. */
export function LeftOutList({ items }: { items: LeftOut[] }) {
  const groups = ORDER.map((code) => ({ code, items: items.filter((s) => s.code === code) })).filter((g) => g.items.length > 0);
  return (
    <View style={styles.section} testID="bundle-left-out">
      <Heading>Left out ({items.length})</Heading>
      {items.length === 0 ? <Small>Nothing is left out.</Small> : null}
      {groups.map((g) => (
        <LeftOutGroup key={g.code} code={g.code} items={g.items} />
      ))}
    </View>
  );
}

function LeftOutGroup({ code, items }: { code: LeftOutCode; items: LeftOut[] }) {
  const label = LEFT_OUT_LABELS[code];
  const shared = items.every((s) => s.reason === items[0].reason) && items.every((s) => !s.planId);
  return (
    <View style={[styles.group, code === 'stale' || code === 'not_approved' ? styles.groupBad : null]} testID={`bundle-out-group-${code}`}>
      <Text style={[styles.groupTitle, code === 'stale' || code === 'not_approved' ? styles.bad : null]}>
        {label.mark} {label.word} ({items.length})
      </Text>
      {shared ? (
        <>
          <Small>{items[0].reason}</Small>
          <View style={styles.names}>
            {items.map((s) => (
              <Text key={s.stationId} style={styles.nameChip} testID={`bundle-out-${s.name}`}>
                {s.name} <Text style={styles.number}>#{s.number}</Text>
              </Text>
            ))}
          </View>
        </>
      ) : (
        items.map((s, i) => (
          <View key={s.stationId} style={[styles.outRow, i > 0 && styles.divider]} testID={`bundle-out-${s.name}`}>
            <Text style={styles.name}>
              {s.name} <Text style={styles.number}>#{s.number}</Text>
            </Text>
            <Small testID={`bundle-out-${s.name}-reason`}>{s.reason}</Small>
            {s.planId ? (
              <Link href={`/plans/${s.planId}` as never} asChild>
                <Pressable accessibilityRole="link" style={styles.link} testID={`bundle-out-${s.name}-plan`}>
                  <Text style={styles.linkText}>Open revision {s.revision} →</Text>
                </Pressable>
              </Link>
            ) : null}
          </View>
        ))
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  row: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start', padding: space.md, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderRadius: radius.md },
  unticked: { backgroundColor: colors.surfaceAlt },
  body: { flex: 1, gap: 2, minWidth: 0 },
  line: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  name: { fontFamily: fonts.semibold, fontSize: 16, color: colors.text },
  number: { fontFamily: fonts.regular, fontSize: 14, color: colors.textMuted },
  folder: { color: colors.textMuted },
  hash: { fontSize: 12, color: colors.textMuted },
  group: { gap: space.sm, padding: space.md, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderRadius: radius.md },
  groupBad: { borderColor: colors.danger, borderLeftWidth: 4 },
  groupTitle: { fontFamily: fonts.semibold, fontSize: 15, color: colors.text },
  bad: { color: colors.danger },
  names: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  nameChip: { fontFamily: fonts.semibold, fontSize: 14, color: colors.text, backgroundColor: colors.surfaceAlt, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 2, overflow: 'hidden' },
  outRow: { gap: 2 },
  divider: { paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.border },
  link: StyleSheet.flatten({ alignSelf: 'flex-start', paddingVertical: space.xs }),
  linkText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.primary, textDecorationLine: 'underline' },
});
