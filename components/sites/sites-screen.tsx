// /sites: every client office, newest work first or by name; technicians and admins add new ones.
import { Link } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useSessionQuery } from '@/hooks/use-session';
import { useCreateSiteMutation, useSitesQuery } from '@/hooks/use-sites';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Choice } from '@/components/ui/choice';
import { Screen } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';
import { Body, Heading, Small } from '@/components/ui/text';
import { SiteForm } from './site-form';

type Sort = 'name' | 'updatedAt' | 'stations';

export function SitesScreen() {
  const me = useSessionQuery().data;
  const canEdit = me?.role === 'admin' || me?.role === 'technician';
  const [sort, setSort] = useState<Sort>('name');
  const [q, setQ] = useState('');
  const [archived, setArchived] = useState<'no' | 'yes'>('no');
  const sites = useSitesQuery({ sort, dir: sort === 'name' ? 'asc' : 'desc', q: q.trim() || undefined, archived: archived === 'yes' });
  const create = useCreateSiteMutation();
  const [adding, setAdding] = useState(false);
  const { wide } = useBreakpoints();
  const error = create.error instanceof ApiError ? create.error : null;
  return (
    <Screen title="Sites" subtitle="The client offices and their stations." testID="sites-screen" actions={canEdit && !adding ? <Button label="+ New site" testID="site-new" onPress={() => setAdding(true)} /> : null}>
      {adding ? (
        <Card style={{ maxWidth: 720 }}>
          <Heading>New site</Heading>
          {error && Object.keys(error.fields).length === 0 ? <Banner tone="error">{error.message}</Banner> : null}
          <SiteForm submitLabel="Create site" busy={create.isPending} serverFields={error?.fields} onCancel={() => setAdding(false)} onSubmit={(v) => create.mutateAsync(v).then(() => setAdding(false)).catch(() => undefined)} />
        </Card>
      ) : null}
      <View style={[styles.filters, wide && styles.filtersWide]}>
        <View style={wide ? styles.search : undefined}>
          <TextField label="Find a site" testID="sites-search" value={q} onChangeText={setQ} placeholder="Name, address or contact" />
        </View>
        <Choice<Sort> label="Sort by" testID="sites-sort" value={sort} onChange={setSort} options={[{ value: 'name', label: 'Name' }, { value: 'updatedAt', label: 'Recently changed' }, { value: 'stations', label: 'Most stations' }]} />
        <Choice<'no' | 'yes'> label="Show" testID="sites-archived" value={archived} onChange={setArchived} options={[{ value: 'no', label: 'Active' }, { value: 'yes', label: 'Archived' }]} />
      </View>
      {sites.isError ? <Banner tone="error">{(sites.error as Error).message}</Banner> : null}
      {sites.data && sites.data.items.length === 0 ? <Body>No site matches. {canEdit ? 'Add one with “New site”.' : ''}</Body> : null}
      <View style={styles.grid}>
        {sites.data?.items.map((s) => (
          <Link key={s.id} href={`/sites/${s.id}` as never} asChild>
            <Pressable style={StyleSheet.flatten([styles.card, wide && styles.cardWide])} testID={`site-card-${s.id}`} accessibilityRole="link">
              <Heading>{s.name}</Heading>
              {s.address ? <Small>{s.address}</Small> : null}
              <Body>{`${s.stations} station${s.stations === 1 ? '' : 's'}${s.archivedAt ? ' · archived' : ''}`}</Body>
              <Small style={styles.open}>Open the station directory →</Small>
            </Pressable>
          </Link>
        ))}
      </View>
      {sites.data ? <Small>{`${sites.data.total} site${sites.data.total === 1 ? '' : 's'}`}</Small> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  filters: { gap: space.md },
  filtersWide: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.xl },
  search: { flexGrow: 1, flexBasis: 260 },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  card: { flexGrow: 1, flexBasis: '100%', backgroundColor: colors.surface, borderColor: colors.border, borderWidth: 1, borderRadius: 12, padding: space.lg, gap: space.xs },
  cardWide: { flexBasis: 320 },
  open: { fontFamily: fonts.semibold, color: colors.primary },
});
