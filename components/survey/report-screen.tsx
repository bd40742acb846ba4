import { useLocalSearchParams } from 'expo-router';
import { useEffect, useMemo } from 'react';
import { Platform, ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
// The browser-safe half of the report (no iconv-lite, no Buffer): the same lines the CP437 file has.
import { renderSurveyText } from '@/generators/survey/report-text';
import { reportUrl, useSurveyQuery } from '@/hooks/use-survey';
import { Button } from '@/components/ui/button';
import { DownloadLink, LinkButton } from './link-button';
import { SurveyFrame, SurveyQueryState } from './survey-frame';

/** When printed, only the report: the app's frame, the pinned caution (the report prints its own) and the buttons go. */
const PRINT_CSS = `@media print {
  [data-testid="side-nav"], [data-testid="bottom-tabs"], [data-testid="survey-caution"], [data-testid="survey-report-actions"],
  div:has(> a[aria-label="Bootwright home"]) { display: none !important; }
  html, body, #root, #root div { height: auto !important; min-height: 0 !important; overflow: visible !important; }
  [data-testid="survey-report-text"] { border: none !important; padding: 0 !important; }
}`;

function usePrintStyle() {
  useEffect(() => {
    if (Platform.OS !== 'web' || typeof document === 'undefined') return;
    const el = document.createElement('style');
    el.setAttribute('data-survey-print', '');
    el.textContent = PRINT_CSS;
    document.head.appendChild(el);
    return () => el.remove();
  }, []);
}

const stamp = () => `${new Date().toISOString().slice(0, 16).replace('T', ' ')} UTC`;

/** The survey report as a printable page: 80 monospace columns, the same text as the CP437 download. */
export function SurveyReportScreen() {
  const siteId = Number(useLocalSearchParams<{ siteId: string }>().siteId);
  const survey = useSurveyQuery(siteId);
  usePrintStyle();
  const view = survey.data;
  const text = useMemo(() => (view ? renderSurveyText(view.input, view.result, { generatedAt: stamp() }) : ''), [view]);
  if (!view) return <SurveyQueryState error={survey.error} title="Survey report" />;
  return (
    <SurveyFrame title="Survey report" subtitle={view.site.name} testID="survey-report-screen">
      <View style={styles.actions} testID="survey-report-actions">
        <LinkButton href={`/survey/${siteId}`} label="← Survey" testID="survey-report-back" />
        {Platform.OS === 'web' ? <Button compact label="Print" testID="survey-report-print" onPress={() => window.print()} /> : null}
        <DownloadLink href={reportUrl(siteId, true)} label="Download .TXT (CP437)" testID="survey-report-file" />
      </View>
      <ScrollView horizontal style={styles.paper}>
        <Text style={styles.text} testID="survey-report-text" selectable>
          {text}
        </Text>
      </ScrollView>
    </SurveyFrame>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  paper: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderRadius: 8 },
  // 80 columns of a monospace font; the page scrolls sideways on a phone rather than rewrap the report.
  text: { fontFamily: fonts.mono, fontSize: 12, lineHeight: 17, color: colors.text, padding: space.lg, width: 80 * 7.3 + 2 * space.lg },
});
