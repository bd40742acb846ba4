import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { SurveyView } from '@/db/requests/survey';
import { colors, fonts, radius, space } from '@/constants/theme';
import type { SurveyCheck } from '@/generators/survey/types';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import type { Highlight, Selection } from './drawing-marks';
import { SEVERITY } from './format';

/**
 * The checks, errors first. Pressing one selects it: its runs, jacks and points are highlighted on the
 * drawing. Notes (a pair in use for the telephone, say) are folded away until asked for.
 */
export function ChecksList({ view, highlight, onSelect }: { view: SurveyView; highlight: Highlight; onSelect: (s: Selection) => void }) {
  const [showNotes, setShowNotes] = useState(false);
  const { checks, counts } = view.result;
  const jackLabel = new Map(view.input.jacks.map((j) => [j.id, j.label]));
  const shown = checks.map((c, index) => ({ c, index })).filter(({ c, index }) => showNotes || c.severity !== 'note' || highlight.checks.has(index));
  return (
    <View style={styles.wrap} testID="survey-checks">
      {counts.error + counts.warning === 0 ? (
        <Banner tone="success" title="No errors or warnings" testID="survey-checks-clear">
          {counts.note ? `Every rule passes. ${counts.note} note(s) to read.` : 'Every rule passes.'}
        </Banner>
      ) : null}
      {shown.map(({ c, index }) => (
        <CheckRow key={index} check={c} index={index} selected={highlight.checks.has(index)} jackLabel={jackLabel} onPress={() => onSelect(highlight.checks.has(index) && highlight.checks.size === 1 ? null : { kind: 'check', index })} />
      ))}
      {counts.note > 0 ? (
        <View style={styles.row}>
          <Button compact variant="secondary" testID="survey-checks-notes" label={showNotes ? 'Hide notes' : `Show ${counts.note} note(s)`} onPress={() => setShowNotes(!showNotes)} />
        </View>
      ) : null}
    </View>
  );
}

function refsText(c: SurveyCheck, jackLabel: Map<string, string>): string {
  return [
    c.runIds.length ? `runs ${c.runIds.join(', ')}` : '',
    c.jackIds.length ? `jacks ${c.jackIds.map((j) => jackLabel.get(j) ?? j).join(', ')}` : '',
    c.nodeIds.length ? `points ${c.nodeIds.join(', ')}` : '',
  ].filter(Boolean).join(' · ') || 'the network as a whole';
}

function CheckRow({ check, index, selected, jackLabel, onPress }: { check: SurveyCheck; index: number; selected: boolean; jackLabel: Map<string, string>; onPress: () => void }) {
  const s = SEVERITY[check.severity];
  return (
    <Pressable
      accessibilityRole="button"
      aria-pressed={selected}
      accessibilityLabel={`${s.word}: ${check.message}`}
      testID={`check-${check.slug}`}
      {...({ dataSet: { index: String(index), selected: String(selected) } } as object)}
      onPress={onPress}
      style={(st) => [styles.item, { borderLeftColor: s.fg }, selected && styles.selected, (st as { focused?: boolean }).focused && styles.focus]}
    >
      <View style={styles.head}>
        <Text style={[styles.sev, { color: s.fg, backgroundColor: s.bg }]}>
          {s.mark} {s.word}
        </Text>
        <Text style={styles.slug}>{check.slug}</Text>
        {selected ? <Text style={styles.shown}>◉ shown on the drawing</Text> : null}
      </View>
      <Text style={styles.message}>{check.message}</Text>
      <Text style={styles.refs}>Concerns {refsText(check, jackLabel)}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row' },
  item: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderLeftWidth: 5, borderRadius: radius.md, padding: space.md, gap: space.xs },
  selected: { borderColor: colors.focus, borderWidth: 2, borderLeftWidth: 5, backgroundColor: '#FFF7F0' },
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as object,
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  sev: { fontFamily: fonts.semibold, fontSize: 13, paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.sm },
  slug: { fontFamily: fonts.mono, fontSize: 13, color: colors.text },
  shown: { fontFamily: fonts.semibold, fontSize: 13, color: colors.focus },
  message: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20, color: colors.text },
  refs: { fontFamily: fonts.regular, fontSize: 13, color: colors.textMuted },
});
