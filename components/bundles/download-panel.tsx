// The download: what the zip will hold in one line, the button, then "stations done of total" while the
// server builds and streams it, and how it ended (recorded with its SHA-256, or failed with nothing released).
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import type { BundlePreview, DownloadState } from '@/hooks/use-bundles';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Body, Heading, Mono, Small } from '@/components/ui/text';
import { splitHash } from './bundle-history';
import { formatSize, plural } from './format';

type Props = { preview: BundlePreview; count: number; state: DownloadState; onStart: () => void; onCancel: () => void };

export function DownloadPanel({ preview, count, state, onStart, onCancel }: Props) {
  const running = state.step === 'running';
  return (
    <Card testID="bundle-download-panel">
      <Heading>Download</Heading>
      <Body testID="bundle-summary">
        {plural(count, 'PC')} with approved plans · {plural(preview.leftOut.length, 'station')} left out · {plural(preview.directoryCount, 'station')} in STATIONS.TXT
      </Body>
      <Small>SURVEY.TXT: {preview.survey ? 'the wiring survey report' : 'a placeholder (no survey recorded yet)'}. MANIFEST.CSV ties every file to its plan revision, approver and SHA-256.</Small>
      <View style={styles.actions}>
        <Button label={count ? `Download bundle (${plural(count, 'PC')})` : 'Nothing to download'} disabled={count === 0 || running} busy={running && !state.again} onPress={onStart} testID="bundle-download" />
        {running ? <Button variant="secondary" label="Cancel" onPress={onCancel} testID="bundle-cancel" /> : null}
      </View>
      {running ? <ProgressLine state={state} /> : null}
      {state.step === 'done' ? (
        <Banner tone="success" title={state.again ? `Bundle #${state.record.id} fetched again` : `Bundle #${state.record.id} downloaded`} testID="bundle-done">
          <Body>
            Saved as {state.record.fileName} ({formatSize(state.record.zipSize)}).{' '}
            {state.again ? 'Same bytes as recorded.' : `${plural(state.record.plans.length, 'plan')} released; the leads were told by mail.`}
          </Body>
          <Mono style={styles.hash} selectable testID="bundle-done-sha">
            SHA-256 {splitHash(state.record.zipSha256 ?? '')}
          </Mono>
        </Banner>
      ) : null}
      {state.step === 'failed' ? (
        <Banner tone="error" title="The download did not complete" testID="bundle-failed">
          {state.message}
        </Banner>
      ) : null}
    </Card>
  );
}

function ProgressLine({ state }: { state: Extract<DownloadState, { step: 'running' }> }) {
  const p = state.progress;
  const total = p?.total ?? 0;
  const done = p?.done ?? 0;
  const share = total ? Math.min(1, done / total) : 0;
  const verb = p?.phase === 'checking' ? 'Checking the rebuilt zip' : state.again ? 'Sending it again' : 'Building and sending';
  const text = p && total ? `${verb}: ${done} of ${plural(total, 'station')}` : state.recordId ? 'Starting the build…' : 'Recording the bundle…';
  return (
    <View style={styles.progress}>
      <View style={styles.track} accessibilityRole="progressbar" aria-valuemin={0} aria-valuemax={total} aria-valuenow={done} aria-label="Stations done" testID="bundle-progress">
        <View style={[styles.bar, { width: `${Math.round(share * 100)}%` }]} />
      </View>
      <Text style={styles.progressText} testID="bundle-progress-text">
        {text}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  progress: { gap: space.xs },
  track: { height: 12, borderRadius: radius.sm, backgroundColor: colors.surfaceAlt, borderWidth: 1, borderColor: colors.borderStrong, overflow: 'hidden' },
  bar: { height: '100%', backgroundColor: colors.primary },
  progressText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.text },
  hash: { fontSize: 12, flexShrink: 1 },
});
