// /stations/:id/wizard: loads the station, its site's next numbers and the kits, then runs the wizard.
import { Link, useLocalSearchParams } from 'expo-router';
import { ActivityIndicator, StyleSheet } from 'react-native';
import { colors, fonts } from '@/constants/theme';
import { WIZARD_STEPS, type WizardStep } from '@/db/requests/stations';
import { useKitsQuery } from '@/hooks/use-kits';
import { useSessionQuery } from '@/hooks/use-session';
import { useSiteQuery } from '@/hooks/use-sites';
import { useStationQuery } from '@/hooks/use-stations';
import { Banner } from '@/components/ui/banner';
import { Screen } from '@/components/ui/screen';
import { ProfileWizard } from './profile-wizard';

export function WizardScreen() {
  const { id, step } = useLocalSearchParams<{ id: string; step?: string }>();
  const stationId = Number(id) || 0;
  const detail = useStationQuery(stationId);
  const siteId = detail.data?.station.siteId ?? 0;
  const site = useSiteQuery(siteId);
  const kits = useKitsQuery();
  const me = useSessionQuery().data;
  const d = detail.data;
  return (
    <Screen title={d ? `${d.station.name} · machine profile` : 'Machine profile'} subtitle={d ? `Station ${d.station.number} at ${d.site.name}` : undefined} width={1240}
      testID="wizard-screen"
      actions={
        d ? (
          <Link href={`/stations/${d.station.id}` as never} style={styles.link} testID="station-details-link">
            Station details and files →
          </Link>
        ) : null
      }
    >
      {detail.isError ? <Banner tone="error">{(detail.error as Error).message}</Banner> : null}
      {d && d.station.kind !== 'pc' ? <Banner tone="note">Only PCs have a machine profile; this station is a {d.station.kind}.</Banner> : null}
      {d && d.station.kind === 'pc' && kits.data ? (
        <ProfileWizard key={`${d.station.id}`} detail={d} openAt={(WIZARD_STEPS as readonly string[]).includes(step ?? '') ? (step as WizardStep) : undefined} kits={kits.data.items} nextNumbers={site.data?.nextNumbers ?? null} readOnly={me?.role === 'lead'} />
      ) : !detail.isError ? (
        <ActivityIndicator />
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({ link: { fontFamily: fonts.semibold, fontSize: 14, color: colors.primary } });
