// Every PC with its newest plan revision: what to plan next, what waits for review, what is approved and
// what went stale. A technician makes a revision from here.
import { Link, useRouter } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import { useSessionQuery } from '@/hooks/use-session';
import { useCreatePlanMutation, usePlanBoardQuery, type BoardItem } from '@/hooks/use-plans';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Choice } from '@/components/ui/choice';
import { Screen } from '@/components/ui/screen';
import { Small } from '@/components/ui/text';
import { PlanStateBadge } from './plan-state-badge';

export function PlansBoardScreen() {
  const [site, setSite] = useState<string>('all');
  const board = usePlanBoardQuery(site === 'all' ? null : Number(site));
  const create = useCreatePlanMutation();
  const router = useRouter();
  const me = useSessionQuery().data;
  const canPlan = me?.role === 'technician' || me?.role === 'admin';
  const sites = board.data?.sites ?? [];
  return (
    <Screen title="Plans" subtitle="Each PC's newest plan revision. A new revision plans the station's current profile and startup files.">
      {sites.length > 1 ? (
        <Choice label="Site" testID="board-site" value={site} onChange={setSite} options={[{ value: 'all', label: 'All sites' }, ...sites.map((s) => ({ value: String(s.id), label: s.name }))]} />
      ) : null}
      {board.isError ? <Banner tone="error">{(board.error as Error).message}</Banner> : null}
      {create.error ? <Banner tone="error">{(create.error as Error).message}</Banner> : null}
      <View style={styles.list} testID="plan-board">
        {board.data?.items.map((item) => (
          <BoardRow
            key={item.station.id}
            item={item}
            canPlan={canPlan}
            busy={create.isPending && create.variables === item.station.id}
            onPlan={() => create.mutate(item.station.id, { onSuccess: (v) => router.push(`/plans/${v.plan.id}`) })}
          />
        ))}
        {board.data && board.data.items.length === 0 ? <Small>No PCs recorded yet.</Small> : null}
      </View>
    </Screen>
  );
}

function BoardRow({ item, canPlan, busy, onPlan }: { item: BoardItem; canPlan: boolean; busy: boolean; onPlan: () => void }) {
  const { station: s, plan } = item;
  return (
    <View style={styles.row} testID={`board-${s.name}`}>
      <View style={styles.who}>
        <Text style={styles.name}>
          {s.name} <Text style={styles.number}>#{s.number}</Text>
        </Text>
        <Small numberOfLines={1}>
          {s.siteName}
          {s.location ? ` · ${s.location}` : ''}
        </Small>
      </View>
      <View style={styles.state}>
        {plan ? (
          <Link href={`/plans/${plan.id}` as never} asChild>
            <Pressable accessibilityRole="link" aria-label={`Open revision ${plan.revision} of ${s.name}`} testID={`board-open-${s.name}`} style={styles.open}>
              <Text style={styles.openText}>Rev. {plan.revision}</Text>
              <PlanStateBadge state={plan.state} stale={plan.stale} testID={`board-state-${s.name}`} />
            </Pressable>
          </Link>
        ) : (
          <Small>No plan yet</Small>
        )}
      </View>
      {canPlan ? <Button compact variant={plan ? 'secondary' : 'primary'} label={plan ? 'New revision' : 'Make plan'} testID={`board-plan-${s.name}`} busy={busy} onPress={onPlan} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, padding: space.md, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderRadius: radius.md },
  who: { flexGrow: 1, flexBasis: 180, flexShrink: 1 },
  name: { fontFamily: fonts.semibold, fontSize: 16, color: colors.text },
  number: { fontFamily: fonts.regular, fontSize: 14, color: colors.textMuted },
  state: { flexGrow: 1, flexBasis: 160 },
  open: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  openText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.primary, textDecorationLine: 'underline' },
});
