// /sites/:id: the site's station directory (sortable, filterable, table or cards), the next free number per
// kind, CSV import and export, and the site's own details.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import { space } from '@/constants/theme';
import { KIND_LABELS, STATION_KINDS, type StationKind } from '@/db/requests/sites';
import { ApiError } from '@/hooks/api-client';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useKitsQuery } from '@/hooks/use-kits';
import { useSessionQuery } from '@/hooks/use-session';
import { siteExportUrl, useSiteQuery, useUpdateSiteMutation } from '@/hooks/use-sites';
import { useStationsQuery } from '@/hooks/use-stations';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Choice } from '@/components/ui/choice';
import { Screen } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';
import { Body, Heading, Small } from '@/components/ui/text';
import { CsvImportPanel } from './csv-import-panel';
import { SiteForm } from './site-form';
import { StationCards, StationTable, type SortState } from './station-directory';

const PAGE = 50;
type KindFilter = 'all' | StationKind;

export function SiteScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const siteId = Number(id) || 0;
  const router = useRouter();
  const me = useSessionQuery().data;
  const canEdit = me?.role === 'admin' || me?.role === 'technician';
  const { wide } = useBreakpoints();
  const site = useSiteQuery(siteId);
  const kits = useKitsQuery();
  const [sort, setSort] = useState<SortState>({ sort: 'number', dir: 'asc' });
  const [kind, setKind] = useState<KindFilter>('all');
  const [q, setQ] = useState('');
  const [offset, setOffset] = useState(0);
  const [panel, setPanel] = useState<'none' | 'import' | 'edit'>('none');
  const stations = useStationsQuery(siteId, { ...sort, kind: kind === 'all' ? undefined : kind, q: q.trim() || undefined, limit: PAGE, offset });
  const s = site.data;
  const list = stations.data;
  const next = list?.nextNumbers ?? s?.nextNumbers;

  function exportCsv() {
    // The server answers with an attachment, so the browser saves it and stays on this page.
    if (Platform.OS === 'web') globalThis.location.assign(siteExportUrl(siteId));
  }

  const actions = canEdit ? (
    <>
      <Button label="+ Add PC" testID="add-pc" onPress={() => router.push(`/sites/${siteId}/new-station?kind=pc` as never)} />
      <Button variant="secondary" label="+ Printer, modem…" testID="add-other" onPress={() => router.push(`/sites/${siteId}/new-station?kind=printer` as never)} />
    </>
  ) : null;

  return (
    <Screen title={s?.name ?? 'Site'} subtitle={s ? [s.address, s.contact].filter(Boolean).join(' · ') : undefined} actions={actions} testID="site-screen">
      {site.isError ? <Banner tone="error">{(site.error as Error).message}</Banner> : null}
      {s && next ? (
        <Card testID="next-numbers">
          <Heading>Next free station numbers</Heading>
          <View style={styles.nextRow}>
            {STATION_KINDS.map((k) => (
              <Body key={k} testID={`next-${k}`}>{`${KIND_LABELS[k]}: ${next[k] ?? 'range full'}  (${s.numberRanges[k][0]}–${s.numberRanges[k][1]})`}</Body>
            ))}
          </View>
          {s.notes ? <Small>{s.notes}</Small> : null}
          <View style={styles.actions}>
            {canEdit ? <Button compact variant="secondary" label="Import CSV" testID="open-import" onPress={() => setPanel(panel === 'import' ? 'none' : 'import')} /> : null}
            {Platform.OS === 'web' ? <Button compact variant="secondary" label="Export CSV" testID="export-csv" onPress={exportCsv} /> : null}
            {canEdit ? <Button compact variant="ghost" label="Edit site details" testID="open-edit-site" onPress={() => setPanel(panel === 'edit' ? 'none' : 'edit')} /> : null}
          </View>
        </Card>
      ) : null}
      {panel === 'import' ? <CsvImportPanel siteId={siteId} kits={kits.data?.items ?? []} onClose={() => setPanel('none')} /> : null}
      {panel === 'edit' && s ? <EditSite siteId={siteId} onDone={() => setPanel('none')} /> : null}

      <View style={[styles.filters, wide && styles.filtersWide]}>
        <View style={wide ? styles.search : undefined}>
          <TextField label="Filter" testID="station-filter" value={q} onChangeText={(t) => { setQ(t); setOffset(0); }} placeholder="Name, location or number" />
        </View>
        <Choice<KindFilter> label="Kind" testID="station-kind-filter" value={kind} onChange={(k) => { setKind(k); setOffset(0); }} options={[{ value: 'all', label: 'All' }, ...STATION_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] }))]} />
        {wide ? null : (
          <Choice<string>
            label="Sort by"
            testID="station-sort"
            value={`${sort.sort}:${sort.dir}`}
            onChange={(v) => setSort({ sort: v.split(':')[0] as SortState['sort'], dir: v.split(':')[1] as SortState['dir'] })}
            options={[
              { value: 'number:asc', label: 'Number' },
              { value: 'name:asc', label: 'Name' },
              { value: 'dos:asc', label: 'DOS' },
              { value: 'status:asc', label: 'Needs work first' },
            ]}
          />
        )}
      </View>
      {stations.isError ? <Banner tone="error">{(stations.error as Error).message}</Banner> : null}
      {list && list.items.length === 0 ? <Body testID="station-empty">No station matches.{canEdit && !q && kind === 'all' ? ' Add a PC or import the office inventory from CSV.' : ''}</Body> : null}
      {list && list.items.length > 0 ? wide ? <StationTable rows={list.items} sort={sort} onSort={(v) => { setSort(v); setOffset(0); }} /> : <StationCards rows={list.items} /> : null}
      {list && list.total > PAGE ? (
        <View style={styles.pager}>
          <Button compact variant="secondary" label="← Previous" disabled={offset === 0} onPress={() => setOffset(Math.max(0, offset - PAGE))} />
          <Small>{`${offset + 1}–${Math.min(offset + PAGE, list.total)} of ${list.total}`}</Small>
          <Button compact variant="secondary" label="Next →" disabled={offset + PAGE >= list.total} onPress={() => setOffset(offset + PAGE)} />
        </View>
      ) : list ? (
        <Small testID="station-count">{`${list.total} station${list.total === 1 ? '' : 's'}`}</Small>
      ) : null}
    </Screen>
  );
}

function EditSite({ siteId, onDone }: { siteId: number; onDone: () => void }) {
  const site = useSiteQuery(siteId).data!;
  const update = useUpdateSiteMutation(siteId);
  const error = update.error instanceof ApiError ? update.error : null;
  return (
    <Card testID="edit-site" style={{ maxWidth: 720 }}>
      <Heading>Site details</Heading>
      {error ? <Banner tone="error">{error.code === 'stale' ? `${error.message}` : error.message}</Banner> : null}
      <SiteForm
        initial={site}
        submitLabel="Save site"
        busy={update.isPending}
        serverFields={error?.fields}
        onCancel={onDone}
        onSubmit={(v) => update.mutateAsync({ ...v, version: site.version }).then(onDone).catch(() => undefined)}
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  nextRow: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xl, rowGap: space.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  filters: { gap: space.md },
  filtersWide: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.xl },
  search: { flexGrow: 1, flexBasis: 240 },
  pager: { flexDirection: 'row', alignItems: 'center', justifyContent: 'center', gap: space.md },
});
