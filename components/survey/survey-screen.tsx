import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMemo, useRef, useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import { maxFormWidth, space } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useSessionQuery } from '@/hooks/use-session';
import { canEditSurvey, reportUrl, surveyWrites, useSurveyQuery, useSurveyWrite } from '@/hooks/use-survey';
import { Card } from '@/components/ui/card';
import { Heading, Small } from '@/components/ui/text';
import { ChecksList } from './checks-list';
import { drawingMarks, highlightOf, type Selection } from './drawing-marks';
import { JackForm } from './jack-form';
import { JacksView } from './jacks-view';
import { DownloadLink, LinkButton } from './link-button';
import { SurveyDrawing } from './survey-drawing';
import { SurveyFrame, SurveyQueryState } from './survey-frame';
import { SurveySummary } from './survey-summary';
import { SURVEY_TABS, SurveyTabs, type SurveyTab } from './survey-tabs';
import { WiringEditor } from './wiring-editor';

/** One site's wiring survey: summary, then checks with the drawing, jacks and readings, or the wiring. */
export function SurveyScreen() {
  const params = useLocalSearchParams<{ siteId: string; tab?: string }>();
  const router = useRouter();
  const siteId = Number(params.siteId);
  const tab: SurveyTab = SURVEY_TABS.some((t) => t.value === params.tab) ? (params.tab as SurveyTab) : 'checks';
  const survey = useSurveyQuery(siteId);
  const write = useSurveyWrite(siteId);
  const writes = surveyWrites(write.mutateAsync);
  const me = useSessionQuery().data;
  const canEdit = canEditSurvey(me?.role);
  const { wide } = useBreakpoints();
  const [selection, setSelection] = useState<Selection>(null);
  const [drawWidth, setDrawWidth] = useState(360);
  const drawingBox = useRef<View>(null);
  const view = survey.data;
  const marks = useMemo(() => (view ? drawingMarks(view.result.checks, view.input.nodes) : null), [view]);
  const highlight = useMemo(() => highlightOf(selection, view?.result.checks ?? [], view?.input.nodes ?? []), [selection, view]);

  if (!view || !marks) return <SurveyQueryState error={survey.error} title="Wiring survey" />;

  const select = (s: Selection) => {
    setSelection(s);
    // A check chosen below the drawing brings the drawing back into view (web only; native keeps its place).
    if (s?.kind === 'check' && Platform.OS === 'web') (drawingBox.current as unknown as HTMLElement | null)?.scrollIntoView?.({ block: 'nearest', behavior: 'smooth' });
  };

  return (
    <SurveyFrame
      title="Wiring survey"
      subtitle={view.site.name}
      testID="survey-screen"
      actions={
        <>
          <LinkButton href={`/survey/${siteId}/report`} label="Printable report" testID="survey-report-link" />
          <DownloadLink href={reportUrl(siteId, true)} label="Download .TXT (CP437)" testID="survey-report-download" />
        </>
      }
    >
      <SurveySummary view={view} />
      <SurveyTabs value={tab} short={!wide} onChange={(t) => router.setParams({ tab: t })} />
      {tab === 'checks' ? (
        <View style={styles.stack}>
          <View ref={drawingBox} onLayout={(e) => setDrawWidth(e.nativeEvent.layout.width)}>
            <SurveyDrawing view={view} marks={marks} highlight={highlight} onSelect={setSelection} width={drawWidth} />
          </View>
          <Heading>Checks</Heading>
          <Small>Press a check to show what it concerns on the drawing; press a part of the drawing to find its checks.</Small>
          <ChecksList view={view} highlight={highlight} onSelect={select} />
        </View>
      ) : null}
      {tab === 'jacks' ? (
        <View style={styles.stack}>
          <JacksView view={view} wide={wide} />
          {canEdit ? (
            <Card style={styles.form}>
              <Heading>Add a jack</Heading>
              <JackForm submitLabel="Add jack" testID="jack-new" onSubmit={(v) => writes.createJack(v)} />
            </Card>
          ) : null}
        </View>
      ) : null}
      {tab === 'wiring' ? <WiringEditor view={view} canEdit={canEdit} writes={writes} wide={wide} /> : null}
    </SurveyFrame>
  );
}

const styles = StyleSheet.create({ stack: { gap: space.md }, form: { maxWidth: maxFormWidth, width: '100%' } });
