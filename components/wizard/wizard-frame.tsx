// The wizard's layout: on a wide screen the step list, the step's form and (for the profile steps) the live
// checks side by side; on a phone one step per screen with "Step n of 7" above it.
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/constants/theme';
import type { WizardStep } from '@/db/requests/stations';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { Heading, Small } from '@/components/ui/text';
import { StepHeader, StepRail } from './step-rail';
import { STEP_HINTS, STEP_TITLES } from './steps';

/** `fullWidth`: the step shows files and diffs and may use the whole column (no side panel). */
type Props = { fullWidth?: boolean; step: WizardStep; reached: WizardStep; onPick: (s: WizardStep) => void; showSteps?: boolean; side?: ReactNode; status?: ReactNode; footer: ReactNode; children: ReactNode };

export function WizardFrame({ fullWidth, step, reached, onPick, showSteps = true, side, status, footer, children }: Props) {
  const { wide, desk } = useBreakpoints();
  const body = (
    <View style={styles.main} testID={`wizard-step-${step}`}>
      {wide || !showSteps ? null : <StepHeader current={step} />}
      <View style={{ gap: space.xs }}>
        <Heading>{STEP_TITLES[step]}</Heading>
        <Small>{STEP_HINTS[step]}</Small>
      </View>
      {status}
      {children}
      {/* On a phone the live checks sit under the form, above the buttons that leave the step. */}
      {wide ? null : side}
      <View style={styles.footer}>{footer}</View>
    </View>
  );
  if (!wide) return <View style={styles.phone}>{body}</View>;
  return (
    <View style={styles.wide}>
      {showSteps ? (
        <View style={styles.railBox}>
          <StepRail current={step} reached={reached} onPick={onPick} />
        </View>
      ) : null}
      <View style={[styles.mainBox, side ? styles.formWidth : fullWidth ? null : styles.readWidth]}>{body}</View>
      {side ? <View style={[styles.side, !desk && styles.sideNarrow]}>{side}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  phone: { gap: space.lg },
  wide: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  railBox: { paddingTop: space.xs, borderRightWidth: 1, borderRightColor: colors.border, paddingRight: space.md },
  mainBox: { flex: 1, minWidth: 0 },
  formWidth: { maxWidth: 560 },
  readWidth: { maxWidth: 680 },
  main: { gap: space.lg, backgroundColor: 'transparent', borderRadius: radius.md },
  footer: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: 'space-between', paddingTop: space.sm },
  side: { width: 340, gap: space.lg },
  sideNarrow: { width: 280 },
});
