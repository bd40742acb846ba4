import { StyleSheet, Text, View } from 'react-native';
import type { SurveyView } from '@/db/requests/survey';
import { colors, fonts, space } from '@/constants/theme';
import { Card } from '@/components/ui/card';
import { SEVERITY } from './format';

const LAYOUT_WORDS = { star: 'Star', bus: 'Bus', tree: 'Tree', mixed: 'Mixed', empty: 'Nothing wired yet' } as const;

/** The survey at a glance: layout, wire, terminator, and how many errors, warnings and notes. */
export function SurveySummary({ view }: { view: SurveyView }) {
  const r = view.result;
  const centre = view.input.nodes.find((n) => n.id === r.centreNodeId);
  const fitted = view.terminators.map((t) => `${t.ohms} Ω`).join(', ');
  const facts: Array<[string, string]> = [
    ['Layout', `${LAYOUT_WORDS[r.layout]}${centre ? ` from ${centre.label}` : ''}`],
    ['Wire', `${+r.totals.lengthFt.toPrecision(15)} ft in ${r.totals.runsCounted} run(s) · 22 AWG ${+r.totals.byGauge['22'].toPrecision(15)} ft · 24 AWG ${+r.totals.byGauge['24'].toPrecision(15)} ft · 26 AWG ${+r.totals.byGauge['26'].toPrecision(15)} ft`],
    ['Terminator', `${r.terminatorNeeded ? 'needed' : 'not needed'}; fitted: ${fitted || 'none'}`],
    ['Network pair', view.settings.networkPair || 'not chosen'],
  ];
  if (r.endToEnd) facts.push(['End to end', `${+r.endToEnd.lengthFt.toPrecision(15)} ft, loop ${r.endToEnd.loopOhms.toFixed(2)} Ω`]);
  return (
    <Card testID="survey-summary">
      <View style={styles.counts}>
        {(['error', 'warning', 'note'] as const).map((s) => {
          const none = r.counts[s] === 0;
          return (
            <Text key={s} style={[styles.count, none ? styles.none : { color: SEVERITY[s].fg, backgroundColor: SEVERITY[s].bg }]} testID={`survey-count-${s}`}>
              {none ? '✓' : SEVERITY[s].mark} {r.counts[s]} {SEVERITY[s].word.toLowerCase()}
              {r.counts[s] === 1 ? '' : 's'}
            </Text>
          );
        })}
      </View>
      <View style={styles.facts}>
        {facts.map(([k, v]) => (
          <Text key={k} style={styles.fact}>
            <Text style={styles.key}>{k}: </Text>
            {v}
          </Text>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  counts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  count: { fontFamily: fonts.semibold, fontSize: 14, paddingHorizontal: space.md, paddingVertical: space.xs, borderRadius: 6 },
  none: { color: colors.textMuted, backgroundColor: colors.surfaceAlt },
  facts: { gap: 2 },
  fact: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20, color: colors.text },
  key: { fontFamily: fonts.semibold },
});
