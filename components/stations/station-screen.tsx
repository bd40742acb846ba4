// /stations/:id: one station's identity (editable with its version), its file revisions when it is a PC,
// and the way into the profile wizard.
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useLocalSearchParams } from 'expo-router';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { colors, fonts, space } from '@/constants/theme';
import { KIND_LABELS } from '@/db/requests/sites';
import { stationNameSchema, stationNumberSchema } from '@/db/requests/stations';
import { ApiError } from '@/hooks/api-client';
import { useSessionQuery } from '@/hooks/use-session';
import { useArchiveStationMutation, useFilesQuery, useLinkUserMutation, useStationQuery, useUpdateStationMutation, type StationDetail } from '@/hooks/use-stations';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';
import { Body, Heading, Small } from '@/components/ui/text';
import { STEP_TITLES } from '@/components/wizard/steps';

const schema = z.object({
  name: stationNameSchema,
  number: z.string().trim().regex(/^\d+$/, 'Use a whole number.').refine((v) => stationNumberSchema.safeParse(Number(v)).success, 'Station numbers run from 1 to 254.'),
  location: z.string().trim().max(120),
  notes: z.string().trim().max(2000),
});
type Values = z.infer<typeof schema>;

export function StationScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const stationId = Number(id) || 0;
  const detail = useStationQuery(stationId);
  const me = useSessionQuery().data;
  const canEdit = me?.role === 'admin' || me?.role === 'technician';
  const d = detail.data;
  return (
    <Screen title={d ? d.station.name : 'Station'} subtitle={d ? `${KIND_LABELS[d.station.kind]} · station ${d.station.number} at ${d.site.name}` : undefined} width={760} testID="station-screen">
      {detail.isError ? <Banner tone="error">{(detail.error as Error).message}</Banner> : null}
      {d ? (
        <>
          <Link href={`/sites/${d.site.id}` as never} style={styles.back}>
            ← {d.site.name}
          </Link>
          {d.station.archivedAt ? <Banner tone="note">This station is archived. Its name and number stay reserved.</Banner> : null}
          {d.station.kind === 'pc' ? (
            <Card>
              <Heading>Machine profile</Heading>
              <Body>{d.profile ? `The wizard has reached step “${STEP_TITLES[d.profile.wizardStep]}”.` : 'No profile yet.'}</Body>
              <Link href={`/stations/${d.station.id}/wizard` as never} style={styles.link} testID="open-wizard">
                Open the profile wizard →
              </Link>
            </Card>
          ) : null}
          <StationForm key={d.station.version} detail={d} canEdit={canEdit} />
          {d.station.kind === 'pc' && canEdit ? <OfficeUser key={`u${d.station.version}`} detail={d} /> : null}
          {d.station.kind === 'pc' ? <Revisions stationId={d.station.id} /> : null}
        </>
      ) : null}
    </Screen>
  );
}

function StationForm({ detail, canEdit }: { detail: StationDetail; canEdit: boolean }) {
  const st = detail.station;
  const update = useUpdateStationMutation(st.id);
  const archive = useArchiveStationMutation(st.id);
  const { control, handleSubmit } = useForm<Values>({ resolver: zodResolver(schema), mode: 'onTouched', defaultValues: { name: st.name, number: String(st.number), location: st.location, notes: st.notes } });
  const error = (update.error ?? archive.error) as ApiError | null;
  const field = (name: keyof Values, label: string, extra: object = {}) => (
    <Controller control={control} name={name} render={({ field: f, fieldState }) => <TextField label={label} testID={`station-edit-${name}`} editable={canEdit} value={f.value} onChangeText={f.onChange} onBlur={f.onBlur} error={fieldState.error?.message ?? error?.fields[name]} {...extra} />} />
  );
  return (
    <Card>
      <Heading>Identity</Heading>
      {error ? <Banner tone="error" title={error.code === 'stale' ? 'Changed by someone else' : 'Not saved'}>{error.message}</Banner> : null}
      {update.isSuccess ? <Banner tone="success">Saved.</Banner> : null}
      {field('name', 'Station name', { mono: true, autoCapitalize: 'characters' })}
      {field('number', 'Station number', { inputMode: 'numeric' })}
      {field('location', 'Location or jack')}
      {field('notes', 'Notes', { multiline: true, numberOfLines: 3, style: { minHeight: 72, textAlignVertical: 'top' } })}
      {canEdit ? (
        <View style={styles.actions}>
          <Button label="Save" testID="station-save" busy={update.isPending} onPress={handleSubmit((v) => update.mutateAsync({ version: st.version, name: v.name, number: Number(v.number), location: v.location, notes: v.notes }).catch(() => undefined))} />
          <Button variant="secondary" label={st.archivedAt ? 'Restore' : 'Archive'} testID="station-archive" busy={archive.isPending} onPress={() => archive.mutate({ version: st.version, archived: !st.archivedAt })} />
        </View>
      ) : null}
    </Card>
  );
}

/** The office user whose own PC this is: they see this station and its files, nothing else. */
function OfficeUser({ detail }: { detail: StationDetail }) {
  const st = detail.station;
  const link = useLinkUserMutation(st.id);
  const { control, handleSubmit } = useForm<{ email: string }>({ defaultValues: { email: '' }, resolver: zodResolver(z.object({ email: z.string().trim().pipe(z.email('Enter an e-mail address.')) })), mode: 'onTouched' });
  const error = link.error instanceof ApiError ? link.error : null;
  return (
    <Card testID="office-user">
      <Heading>Office user</Heading>
      <Body testID="office-user-state">{st.linkedUser ? '● An office user is linked to this PC and can read its station and files.' : '○ No office user is linked to this PC.'}</Body>
      {error ? <Banner tone="error">{error.fields.email ?? error.message}</Banner> : null}
      <Controller control={control} name="email" render={({ field, fieldState }) => <TextField label="Office user’s e-mail" testID="office-user-email" autoCapitalize="none" inputMode="email" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />} />
      <View style={styles.actions}>
        <Button compact label="Link" testID="office-user-link" busy={link.isPending} onPress={handleSubmit((v) => link.mutateAsync({ version: st.version, email: v.email }).catch(() => undefined))} />
        {st.linkedUser ? <Button compact variant="secondary" label="Unlink" testID="office-user-unlink" onPress={() => link.mutate({ version: st.version, email: null })} /> : null}
      </View>
    </Card>
  );
}

function Revisions({ stationId }: { stationId: number }) {
  const files = useFilesQuery(stationId);
  return (
    <Card testID="file-revisions">
      <Heading>Startup-file revisions</Heading>
      <Small>Every upload, paste or “none” is kept; the newest of each file is the one the plan uses.</Small>
      {files.data?.items.length === 0 ? <Body>None yet.</Body> : null}
      {files.data?.items.map((f, i) => {
        const current = files.data!.items.findIndex((x) => x.kind === f.kind) === i;
        return (
          <View key={f.id} style={styles.rev}>
            <Body style={styles.mono}>{`${f.kind}  #${f.id}`}</Body>
            <Small>{`${current ? '● current · ' : ''}${f.absent ? 'none on this PC' : `${f.size} bytes · ${f.source}`} · ${new Date(f.uploadedAt).toLocaleString()}${f.absent ? '' : ` · SHA-256 ${f.sha256.slice(0, 12)}…`}`}</Small>
          </View>
        );
      })}
    </Card>
  );
}

const styles = StyleSheet.create({
  back: { fontFamily: fonts.semibold, color: colors.primary },
  link: { fontFamily: fonts.semibold, fontSize: 15, color: colors.primary },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  rev: { gap: 2, paddingVertical: space.xs, borderTopWidth: 1, borderTopColor: colors.border },
  mono: { fontFamily: fonts.mono },
});
