// The admin's audit trail: every create, update, upload, plan, review, download and role change, newest
// first, with who, what, when, which ids and hashes. It can be read and filtered, never edited.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import { useAuditQuery, type AuditEvent, type AuditFilter } from '@/hooks/use-audit';
import { usePeopleQuery } from '@/hooks/use-people';
import { useSitesQuery } from '@/hooks/use-sites';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Small } from '@/components/ui/text';
import { AuditFilterForm, type AuditFilterValues } from './audit-filter-form';

function toFilter(v: AuditFilterValues): AuditFilter {
  return {
    entity: v.entity || undefined,
    action: v.action || undefined,
    actorId: v.actorId || undefined,
    siteId: v.siteId ? Number(v.siteId) : undefined,
    from: v.from ? new Date(`${v.from}T00:00:00`).toISOString() : undefined,
    to: v.to ? new Date(`${v.to}T23:59:59.999`).toISOString() : undefined,
  };
}

export function AuditScreen() {
  const [filter, setFilter] = useState<AuditFilter>({});
  const audit = useAuditQuery(filter);
  const people = usePeopleQuery().data?.items ?? [];
  const sites = useSitesQuery({ limit: 200 }).data?.items ?? [];
  const events = audit.data?.pages.flatMap((p) => p.items) ?? [];
  return (
    <Screen title="Audit trail" subtitle="Who did what and when. Nothing here can be edited or deleted, by anyone.">
      <Card>
        <AuditFilterForm people={people} sites={sites} onSubmit={(v) => setFilter(toFilter(v))} />
      </Card>
      {audit.isError ? <Banner tone="error">{(audit.error as Error).message}</Banner> : null}
      <View style={styles.list} testID="audit-list">
        {events.map((e) => <EventRow key={e.id} event={e} siteName={sites.find((s) => s.id === e.siteId)?.name} />)}
        {audit.data && events.length === 0 ? <Small testID="audit-empty">No events match these filters.</Small> : null}
      </View>
      {audit.hasNextPage ? <Button variant="secondary" label="Show older events" testID="audit-more" busy={audit.isFetchingNextPage} onPress={() => audit.fetchNextPage()} /> : null}
    </Screen>
  );
}

function EventRow({ event: e, siteName }: { event: AuditEvent; siteName?: string }) {
  const [open, setOpen] = useState(false);
  const details = Object.keys(e.details).length > 0;
  return (
    <View style={styles.row} testID={`audit-event-${e.id}`}>
      <View style={styles.head}>
        <Text style={styles.action}>{e.action}</Text>
        <Text style={styles.when}>{new Date(e.at).toLocaleString()}</Text>
      </View>
      <Text style={styles.meta}>
        {e.actorEmail ?? 'system'} · {e.entity}
        {e.entityId ? ` #${e.entityId}` : ''}
        {siteName ? ` · ${siteName}` : e.siteId ? ` · site ${e.siteId}` : ''}
      </Text>
      {details ? (
        <Pressable accessibilityRole="button" aria-expanded={open} onPress={() => setOpen((o) => !o)} testID={`audit-details-${e.id}`}>
          <Text style={styles.toggle}>{open ? '▾ Hide details' : '▸ Details'}</Text>
        </Pressable>
      ) : null}
      {open ? <Text style={styles.json} selectable>{JSON.stringify(e.details, null, 2)}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { padding: space.md, gap: 2, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderRadius: radius.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: space.sm },
  action: { fontFamily: fonts.mono, fontSize: 14, fontWeight: '700', color: colors.text },
  when: { fontFamily: fonts.regular, fontSize: 13, color: colors.textMuted },
  meta: { fontFamily: fonts.regular, fontSize: 13, color: colors.text },
  toggle: { fontFamily: fonts.semibold, fontSize: 13, color: colors.primary, paddingVertical: space.xs },
  json: { fontFamily: fonts.mono, fontSize: 12, color: colors.text, backgroundColor: colors.surfaceAlt, padding: space.sm, borderRadius: radius.sm, whiteSpace: 'pre-wrap', wordBreak: 'break-all' } as object,
});
