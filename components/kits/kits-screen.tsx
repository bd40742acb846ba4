// /kits: the network software kits and what each needs; admins and technicians create and edit them.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
import { PARITY_LABELS } from '@/db/requests/kits';
import { ApiError } from '@/hooks/api-client';
import { useArchiveKitMutation, useCreateKitMutation, useKitsQuery, useUpdateKitMutation, type Kit } from '@/hooks/use-kits';
import { useSessionQuery } from '@/hooks/use-session';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Body, Heading, Mono, Small } from '@/components/ui/text';
import { KitForm } from './kit-form';

export function KitsScreen() {
  const me = useSessionQuery().data;
  const canEdit = me?.role === 'admin' || me?.role === 'technician';
  const kits = useKitsQuery();
  const [editing, setEditing] = useState<number | 'new' | null>(null);
  const create = useCreateKitMutation();
  const createError = create.error instanceof ApiError ? create.error : null;
  return (
    <Screen title="Kits" subtitle="The network software each PC gets: its resident program, serial settings and needs." testID="kits-screen" actions={canEdit && editing !== 'new' ? <Button label="+ New kit" testID="kit-new" onPress={() => setEditing('new')} /> : null}>
      {editing === 'new' ? (
        <Card style={styles.formCard}>
          <Heading>New kit</Heading>
          {createError && Object.keys(createError.fields).length === 0 ? <Banner tone="error">{createError.message}</Banner> : null}
          <KitForm busy={create.isPending} serverFields={createError?.fields} onCancel={() => setEditing(null)} onSubmit={(v) => create.mutateAsync(v).then(() => setEditing(null)).catch(() => undefined)} />
        </Card>
      ) : null}
      {kits.isError ? <Banner tone="error">{(kits.error as Error).message}</Banner> : null}
      <View style={styles.grid}>
        {kits.data?.items.map((k) => (editing === k.id ? <EditKit key={k.id} kit={k} onDone={() => setEditing(null)} /> : <KitCard key={k.id} kit={k} canEdit={canEdit} onEdit={() => setEditing(k.id)} />))}
      </View>
    </Screen>
  );
}

function KitCard({ kit, canEdit, onEdit }: { kit: Kit; canEdit: boolean; onEdit: () => void }) {
  const archive = useArchiveKitMutation();
  return (
    <Card style={styles.card} testID={`kit-card-${kit.id}`}>
      <Heading>{kit.name}</Heading>
      <Mono>{`${kit.programPath} ${kit.programArgs}`.trim()}</Mono>
      <Body>{`${kit.baud} baud, parity ${PARITY_LABELS[kit.parity].toLowerCase()}, ${kit.dataBits} data bits, ${kit.stopBits} stop bit${kit.stopBits === 1 ? '' : 's'}`}</Body>
      <Body>{`DOS ${kit.minDos} or later · about ${kit.residentKB} KB resident`}</Body>
      <Small>{`CONFIG.SYS: ${[kit.configFiles ? `FILES=${kit.configFiles} or more` : null, kit.configBuffers ? `BUFFERS=${kit.configBuffers} or more` : null, ...kit.configLines].filter(Boolean).join('; ') || 'nothing needed'}`}</Small>
      {archive.error ? <Banner tone="error">{(archive.error as Error).message}</Banner> : null}
      {canEdit ? (
        <View style={styles.actions}>
          <Button compact variant="secondary" label="Edit" testID={`kit-edit-${kit.id}`} onPress={onEdit} />
          <Button compact variant="ghost" label="Archive" testID={`kit-archive-${kit.id}`} busy={archive.isPending} onPress={() => archive.mutate({ id: kit.id, version: kit.version, archived: true })} />
        </View>
      ) : null}
    </Card>
  );
}

function EditKit({ kit, onDone }: { kit: Kit; onDone: () => void }) {
  const update = useUpdateKitMutation();
  const error = update.error instanceof ApiError ? update.error : null;
  return (
    <Card style={styles.card}>
      <Heading>{`Edit ${kit.name}`}</Heading>
      {error && Object.keys(error.fields).length === 0 ? <Banner tone="error">{error.message}</Banner> : null}
      <KitForm kit={kit} busy={update.isPending} serverFields={error?.fields} onCancel={onDone} onSubmit={(v) => update.mutateAsync({ id: kit.id, version: kit.version, ...v }).then(onDone).catch(() => undefined)} />
    </Card>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  card: { flexGrow: 1, flexBasis: 340, maxWidth: 620 },
  formCard: { maxWidth: 720 },
  actions: { flexDirection: 'row', gap: space.sm },
  link: { fontFamily: fonts.semibold, color: colors.primary },
});
