import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Banner } from '@/components/ui/banner';
import { Screen } from '@/components/ui/screen';
import { FullScreenLoading } from '@/components/shell/loading';
import { ApiError } from '@/hooks/api-client';
import { SurveyCaution } from './survey-caution';

type Props = { title: string; subtitle?: string; actions?: ReactNode; children: ReactNode; testID?: string; width?: number };

/** Every survey screen: the caution pinned on top, the page scrolling beneath it. */
export function SurveyFrame({ children, ...screen }: Props) {
  return (
    <View style={styles.root}>
      <SurveyCaution />
      <Screen {...screen}>{children}</Screen>
    </View>
  );
}

/** Loading and failure of the survey query, in the frame (so the caution shows even then). */
export function SurveyQueryState({ error, title }: { error: unknown; title: string }) {
  if (!error) return <FullScreenLoading />;
  const notFound = error instanceof ApiError && error.status === 404;
  return (
    <SurveyFrame title={title}>
      <Banner tone="error" testID="survey-load-error">
        {notFound ? 'There is no such site or survey entry. Go back to the list of sites.' : (error as Error).message}
      </Banner>
    </SurveyFrame>
  );
}

const styles = StyleSheet.create({ root: { flex: 1 } });
