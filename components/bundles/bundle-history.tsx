// A site's past bundles, newest first: who, when, which PCs, the zip's SHA-256 and size, and "download
// again" for a completed one (rebuilt from the same plan revisions and checked against that hash).
import { StyleSheet, Text, View } from 'react-native';
import { BUNDLE_STATE_LABELS, type BundleStateValue } from '@/db/requests/bundles';
import { colors, fonts, radius, space } from '@/constants/theme';
import type { BundleRecord } from '@/hooks/use-bundles';
import { Button } from '@/components/ui/button';
import { Heading, Mono, Small } from '@/components/ui/text';
import { formatSize, formatUtc, plural } from './format';

const TONE: Record<BundleStateValue, { fg: string; bg: string }> = {
  building: { fg: colors.note, bg: colors.noteSoft },
  done: { fg: colors.success, bg: colors.successSoft },
  failed: { fg: colors.danger, bg: colors.dangerSoft },
};

/** 64 hex digits as two groups of 32, so the hash wraps cleanly on a phone. */
export const splitHash = (hash: string) => `${hash.slice(0, 32)} ${hash.slice(32)}`;

type Props = { items: BundleRecord[]; busy: boolean; onAgain: (r: BundleRecord) => void };

export function BundleHistory({ items, busy, onAgain }: Props) {
  return (
    <View style={styles.section} testID="bundle-history">
      <Heading>Past bundles</Heading>
      {items.length === 0 ? <Small>No bundle of this site has been downloaded yet.</Small> : null}
      {items.map((r) => (
        <HistoryRow key={r.id} record={r} busy={busy} onAgain={() => onAgain(r)} />
      ))}
    </View>
  );
}

function HistoryRow({ record: r, busy, onAgain }: { record: BundleRecord; busy: boolean; onAgain: () => void }) {
  const label = BUNDLE_STATE_LABELS[r.state];
  const tone = TONE[r.state];
  const names = r.plans.map((p) => p.stationName ?? `plan ${p.planId}`);
  return (
    <View style={styles.row} testID={`bundle-record-${r.id}`}>
      <View style={styles.line}>
        <Text style={styles.name}>
          #{r.id} <Text style={styles.file}>{r.fileName}</Text>
        </Text>
        <Text style={[styles.chip, { color: tone.fg, backgroundColor: tone.bg, borderColor: tone.fg }]} testID={`bundle-record-${r.id}-state`}>
          {label.mark} {label.word}
        </Text>
      </View>
      <Small>
        {r.createdBy.name}, {formatUtc(r.generatedAt)} · {plural(names.length, 'PC')}
        {r.selection ? ' (chosen stations)' : ''}
        {r.zipSize !== null ? ` · ${formatSize(r.zipSize)}` : ''}
      </Small>
      <Small numberOfLines={2}>{names.join(', ')}</Small>
      {r.zipSha256 ? (
        <Mono style={styles.hash} selectable testID={`bundle-record-${r.id}-sha`}>
          SHA-256 {splitHash(r.zipSha256)}
        </Mono>
      ) : null}
      {r.failure ? <Small style={styles.failure}>✕ {r.failure}</Small> : null}
      {r.state === 'done' ? (
        <View style={styles.actions}>
          <Button compact variant="secondary" label="Download again" disabled={busy} onPress={onAgain} testID={`bundle-again-${r.id}`} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  row: { gap: space.xs, padding: space.md, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderRadius: radius.md },
  line: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  name: { fontFamily: fonts.semibold, fontSize: 16, color: colors.text },
  file: { fontFamily: fonts.mono, fontSize: 14, color: colors.textMuted },
  chip: { fontFamily: fonts.semibold, fontSize: 13, paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.sm, borderWidth: 1, overflow: 'hidden' },
  hash: { fontSize: 12, color: colors.text },
  failure: { color: colors.danger },
  actions: { flexDirection: 'row', marginTop: space.xs },
});
