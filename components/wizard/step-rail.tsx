// Where the technician is in the wizard: a list of all steps beside the form on a wide screen, a compact
// "Step 3 of 7" line with a progress bar on a phone. Done steps carry a check mark, the current one an arrow.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import type { WizardStep } from '@/db/requests/stations';
import { STEP_TITLES, stepIndex, WIZARD_STEPS } from './steps';

type Props = { current: WizardStep; reached: WizardStep; onPick: (s: WizardStep) => void };

export function StepRail({ current, reached, onPick }: Props) {
  return (
    <View style={styles.rail} role="navigation" aria-label="Wizard steps" testID="step-rail">
      {WIZARD_STEPS.map((s, i) => {
        const on = s === current;
        const done = i < stepIndex(reached) && !on;
        const open = i <= stepIndex(reached);
        return (
          <Pressable key={s} disabled={!open || on} onPress={() => onPick(s)} aria-current={on ? 'step' : undefined} testID={`rail-${s}`} style={[styles.item, on && styles.on]}>
            <Text style={[styles.mark, on && styles.textOn]}>{on ? '▶' : done ? '✓' : String(i + 1)}</Text>
            <Text style={[styles.label, on && styles.textOn, !open && styles.closed]}>{STEP_TITLES[s]}</Text>
          </Pressable>
        );
      })}
    </View>
  );
}

export function StepHeader({ current }: { current: WizardStep }) {
  const i = stepIndex(current);
  return (
    <View style={styles.header} testID="step-header">
      <Text style={styles.count}>{`Step ${i + 1} of ${WIZARD_STEPS.length}`}</Text>
      <View style={styles.bar} aria-hidden>
        <View style={[styles.fill, { width: `${((i + 1) / WIZARD_STEPS.length) * 100}%` }]} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  rail: { gap: 2, width: 200 },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.sm, paddingHorizontal: space.md, borderRadius: radius.md },
  on: { backgroundColor: colors.primarySoft },
  mark: { fontFamily: fonts.semibold, fontSize: 13, width: 18, textAlign: 'center', color: colors.textMuted },
  label: { fontFamily: fonts.regular, fontSize: 14, color: colors.text },
  textOn: { fontFamily: fonts.semibold, color: colors.primary },
  closed: { color: colors.textMuted },
  header: { gap: space.xs },
  count: { fontFamily: fonts.semibold, fontSize: 13, color: colors.textMuted },
  bar: { height: 6, borderRadius: 3, backgroundColor: colors.surfaceAlt, overflow: 'hidden' },
  fill: { height: 6, backgroundColor: colors.primary },
});
