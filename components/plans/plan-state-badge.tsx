// A plan's state as a symbol and a word (never colour alone); a stale approval says so beside it.
import { StyleSheet, Text, View } from 'react-native';
import { PLAN_STATE_LABELS, type PlanStateValue } from '@/db/requests/plans';
import { colors, fonts, radius, space } from '@/constants/theme';

const TONE: Record<PlanStateValue, { fg: string; bg: string }> = {
  draft: { fg: colors.text, bg: colors.surfaceAlt },
  in_review: { fg: colors.note, bg: colors.noteSoft },
  approved: { fg: colors.success, bg: colors.successSoft },
  returned: { fg: colors.warning, bg: colors.warningSoft },
  released: { fg: colors.primary, bg: colors.primarySoft },
  superseded: { fg: colors.textMuted, bg: colors.surfaceAlt },
};

export function PlanStateBadge({ state, stale, testID = 'plan-state' }: { state: PlanStateValue; stale?: boolean; testID?: string }) {
  const l = PLAN_STATE_LABELS[state];
  const tone = TONE[state];
  return (
    <View style={styles.row}>
      <Text style={[styles.chip, { color: tone.fg, backgroundColor: tone.bg, borderColor: tone.fg }]} testID={testID}>
        {l.mark} {l.word}
      </Text>
      {stale ? (
        <Text style={[styles.chip, styles.stale]} testID={`${testID}-stale`}>
          ⚠ Stale
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.xs, flexWrap: 'wrap' },
  chip: { fontFamily: fonts.semibold, fontSize: 13, paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.sm, borderWidth: 1, overflow: 'hidden' },
  stale: { color: colors.danger, backgroundColor: colors.dangerSoft, borderColor: colors.danger },
});
