// Step 6, final program: the engine's detected line (the program that may never return) is highlighted in
// AUTOEXEC.BAT; the technician confirms it or picks another line, or says no line keeps the PC.
import { Controller, type Control } from 'react-hook-form';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { space } from '@/constants/theme';
import type { PlanPreview } from '@/hooks/use-stations';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Small } from '@/components/ui/text';
import { FileLines, type LineMark } from '@/components/stations/file-lines';
import type { WizardForm } from './wizard-schema';

type Props = { control: Control<WizardForm>; preview: PlanPreview | undefined; loading: boolean; readOnly?: boolean };

export function FinalStep({ control, preview, loading, readOnly }: Props) {
  if (loading && !preview) return <ActivityIndicator />;
  if (!preview) return <Banner tone="error">The plan could not be computed. Go back and check the earlier steps.</Banner>;
  const before = preview.plan.files.autoexec.beforeText;
  if (before === null) {
    return (
      <Banner tone="note" title="No AUTOEXEC.BAT" testID="final-no-file">
        This machine has no AUTOEXEC.BAT, so nothing runs at boot after CONFIG.SYS. The plan writes a new file with the network lines; there is no final program to pick.
      </Banner>
    );
  }
  const detected = preview.plan.finalProgram?.detected ? preview.plan.finalProgram : null;
  const candidates = preview.plan.candidates;
  return (
    <Controller
      control={control}
      name="finalProgram"
      render={({ field, fieldState }) => {
        const chosen = typeof field.value === 'number' ? field.value : null;
        const marks: Record<number, LineMark> = {};
        if (detected) marks[detected.line] = { mark: '▶', word: chosen === detected.line ? '✓ Confirmed final program' : 'Detected final program', tone: 'final' };
        if (chosen !== null && chosen !== detected?.line) marks[chosen] = { mark: '▶', word: '✓ Your pick', tone: 'pick' };
        return (
          <View style={styles.wrap}>
            {detected ? (
              <Banner tone="note" title={`Detected: line ${detected.line}`} testID="final-detected">
                {`${detected.program} looks like the program this PC stays in (a menu or application that may never return). The network lines go above it, so they run on every boot path.`}
              </Banner>
            ) : (
              <Banner tone="note" title="No final program detected" testID="final-none-detected">
                Every program in this file seems to return. Pick a line if one of them does not, or confirm that none keeps the PC.
              </Banner>
            )}
            {fieldState.error ? <Banner tone="error">{fieldState.error.message}</Banner> : null}
            <FileLines
              text={before}
              marks={marks}
              testID="final-file"
              right={(line) =>
                !readOnly && candidates.some((c) => c.line === line) && line !== chosen ? (
                  <Button compact variant="secondary" label={line === detected?.line ? 'Confirm' : 'Pick'} testID={`final-pick-${line}`} onPress={() => field.onChange(line)} />
                ) : null
              }
            />
            <View style={styles.actions}>
              {detected && chosen !== detected.line ? <Button label={`Confirm line ${detected.line}`} testID="final-confirm" disabled={readOnly} onPress={() => field.onChange(detected.line)} /> : null}
              <Button variant={field.value === 'none' ? 'primary' : 'secondary'} label={field.value === 'none' ? '✓ No line keeps the PC' : 'No line keeps the PC'} testID="final-none" disabled={readOnly} onPress={() => field.onChange('none')} />
            </View>
            <Small testID="final-choice">
              {chosen !== null ? `Final program: line ${chosen}${chosen === detected?.line ? ' (the detected one, confirmed)' : ' (your pick)'}.` : field.value === 'none' ? 'No final program: the network lines go at the end of the file.' : 'Not confirmed yet.'}
            </Small>
          </View>
        );
      }}
    />
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.md }, actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm } });
