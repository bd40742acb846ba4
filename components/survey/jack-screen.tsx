import { useLocalSearchParams, useRouter } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { readingRef, type SurveyView } from '@/db/requests/survey';
import { colors, fonts, maxFormWidth, space } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useSessionQuery } from '@/hooks/use-session';
import { canEditSurvey, surveyWrites, useSurveyQuery, useSurveyWrite } from '@/hooks/use-survey';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { Heading, Small } from '@/components/ui/text';
import { EditableRow } from './editable-row';
import { PAIR_STATUS, SEVERITY, volts, when } from './format';
import { JackForm } from './jack-form';
import { LinkButton } from './link-button';
import { ReadingForm } from './reading-form';
import { SurveyFrame, SurveyQueryState } from './survey-frame';

/** The pairs already tested at the site, network pair first: one-press choices in the reading form. */
function knownPairs(view: SurveyView): string[] {
  const seen = new Map<string, string>();
  for (const r of view.readings) seen.set(r.pair.split(' ')[0], r.pair);
  const list = [...seen.values()];
  const network = view.settings.networkPair;
  return network ? [network, ...list.filter((p) => p.split(' ')[0] !== network.split(' ')[0])] : list;
}

/** At one jack: record a reading quickly, see the readings taken there and the checks that name it. */
export function JackScreen() {
  const params = useLocalSearchParams<{ siteId: string; jackId: string }>();
  const router = useRouter();
  const siteId = Number(params.siteId);
  const jackId = Number(params.jackId);
  const survey = useSurveyQuery(siteId);
  const writes = surveyWrites(useSurveyWrite(siteId).mutateAsync);
  const canEdit = canEditSurvey(useSessionQuery().data?.role);
  const { wide } = useBreakpoints();
  const view = survey.data;
  const jack = view?.jacks.find((j) => j.id === jackId);
  if (!view) return <SurveyQueryState error={survey.error} title="Jack" />;
  if (!jack) return <SurveyQueryState error={new ApiError(404, 'not_found', 'No such jack.')} title="Jack" />;

  const checks = view.result.checks.filter((c) => c.jackIds.includes(jack.ref));
  return (
    <SurveyFrame
      title={jack.label}
      subtitle={`${view.site.name} · ${[jack.room, jack.station && `station ${jack.station}`].filter(Boolean).join(' · ') || jack.ref}`}
      testID="jack-screen"
      actions={<LinkButton href={`/survey/${siteId}?tab=jacks`} label="← All jacks" testID="jack-back" />}
    >
      {checks.map((c, i) => (
        <Banner key={i} tone={c.severity === 'note' ? 'note' : c.severity} title={`${SEVERITY[c.severity].word}: ${c.slug}`} testID={`jack-check-${c.slug}`}>
          {c.message}
        </Banner>
      ))}
      <View style={[styles.cols, wide && styles.colsWide]}>
        {canEdit ? (
          <Card style={[styles.form, wide && styles.formWide]}>
            <Heading>Record a reading</Heading>
            <Small>Meter across the pair at this jack. Leave a voltage empty when it was not measured.</Small>
            <ReadingForm
              pairs={knownPairs(view)}
              defaultPair={view.settings.networkPair}
              onSubmit={(v, confirmed) => writes.createReading(jack.id, { ...v, confirmed })}
            />
          </Card>
        ) : null}
        <ReadingsList view={view} jackId={jack.id} canEdit={canEdit} onDelete={(id, version) => writes.deleteReading(id, version)} />
      </View>
      {canEdit ? (
        <Card style={styles.form}>
          <Heading>About this jack</Heading>
          <JackForm initial={jack} submitLabel="Save jack" testID="jack-edit" onSubmit={(v) => writes.updateJack(jack.id, { ...v, version: jack.version })} />
          <EditableRow
            testID="jack-remove"
            title={`Remove ${jack.label}`}
            details={['Removes its readings too; points standing for it keep their place without the link.']}
            flags={[]}
            canEdit
            onDelete={async () => {
              await writes.deleteJack(jack.id, jack.version);
              router.replace(`/survey/${siteId}?tab=jacks`);
            }}
          />
        </Card>
      ) : (
        <Text style={styles.muted}>You can read this survey; a technician or an admin records readings.</Text>
      )}
    </SurveyFrame>
  );
}

/** Every reading taken at the jack, newest first, with its status and whether a later one replaced it. */
function ReadingsList({ view, jackId, canEdit, onDelete }: { view: SurveyView; jackId: number; canEdit: boolean; onDelete: (id: number, version: number) => Promise<unknown> }) {
  const jack = view.jacks.find((j) => j.id === jackId)!;
  const result = view.result.jacks.find((j) => j.jackId === jack.ref);
  const status = new Map((result?.pairs ?? []).map((p) => [p.testId, p]));
  const readings = view.readings.filter((r) => r.jackId === jackId).reverse();
  return (
    <View style={styles.readings}>
      <Heading>Readings at this jack</Heading>
      {readings.length === 0 ? <Small>None yet.</Small> : null}
      <View style={styles.list} testID="jack-readings">
        {readings.map((r) => {
          const p = status.get(readingRef(r.id));
          const s = p ? PAIR_STATUS[p.status] : PAIR_STATUS.untested;
          return (
            <EditableRow
              key={r.id}
              testID={`reading-${r.id}`}
              title={`Pair ${r.pair}`}
              details={[
                `${volts(r.vdc, 'V DC')} · ${volts(r.vac, 'V AC')} · continuity ${r.continuity ?? 'not tested'}`,
                `${s.mark} ${s.word}${p && !p.current ? ' (replaced by a later reading)' : ''} · ${r.testedByName || 'unknown'}, ${when(r.testedAt)} UTC`,
              ]}
              flags={[]}
              canEdit={canEdit}
              onDelete={() => onDelete(r.id, r.version)}
            />
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  form: { maxWidth: maxFormWidth, width: '100%' },
  formWide: { flexShrink: 0 },
  cols: { gap: space.lg },
  colsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  readings: { flex: 1, gap: space.sm, minWidth: 0 },
  muted: { fontFamily: fonts.regular, fontSize: 14, color: colors.textMuted },
});
