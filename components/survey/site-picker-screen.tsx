import { StyleSheet, View } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
import { useSurveySitesQuery } from '@/hooks/use-survey';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { Body, Heading, Small } from '@/components/ui/text';
import { LinkButton } from './link-button';
import { SurveyFrame } from './survey-frame';

/** The sites whose wiring can be surveyed, with how far each survey has got and what is still open. */
export function SurveySitePickerScreen() {
  const sites = useSurveySitesQuery();
  return (
    <SurveyFrame title="Wiring survey" subtitle="Choose a site to record its jacks, pair readings and cable runs." testID="survey-sites">
      {sites.isError ? <Banner tone="error">{(sites.error as Error).message}</Banner> : null}
      {sites.data?.items.length === 0 ? <Banner tone="note">No sites yet. A technician creates the site first.</Banner> : null}
      <View style={styles.grid}>
        {sites.data?.items.map((s) => (
          <Card key={s.id} style={styles.cell} testID={`survey-site-${s.id}`}>
            <Heading>{s.name}</Heading>
            <Small>
              {s.jacks} jack(s), {s.runs} cable run(s)
            </Small>
            <Body style={s.errors ? styles.bad : s.warnings ? styles.warn : styles.good}>
              {s.jacks + s.runs === 0
                ? '– Not surveyed yet'
                : s.errors
                  ? `✕ ${s.errors} error(s), ${s.warnings} warning(s)`
                  : s.warnings
                    ? `! ${s.warnings} warning(s)`
                    : '✓ No errors or warnings'}
            </Body>
            <View style={styles.row}>
              <LinkButton primary href={`/survey/${s.id}`} label="Open survey" testID={`open-survey-${s.id}`} />
            </View>
          </Card>
        ))}
      </View>
    </SurveyFrame>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  cell: { flexGrow: 1, flexBasis: 300 },
  row: { flexDirection: 'row' },
  bad: { color: colors.danger, fontFamily: fonts.semibold },
  warn: { color: colors.warning, fontFamily: fonts.semibold },
  good: { color: colors.success, fontFamily: fonts.semibold },
});
