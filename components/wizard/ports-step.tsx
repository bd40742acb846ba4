// Step 3, ports: COM1-COM4 and LPT1-LPT3, each either not present or present with what is attached; one
// choice per port keeps the list short on a phone. The engine's checks run live beside it.
import { Controller, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/constants/theme';
import type { Attached } from '@/generators/engine/profile';
import { Choice } from '@/components/ui/choice';
import { Small } from '@/components/ui/text';
import type { WizardForm } from './wizard-schema';

type PortChoice = 'absent' | Attached;

const COM_OPTIONS: Array<{ value: PortChoice; label: string }> = [
  { value: 'absent', label: 'Not present' },
  { value: 'none', label: 'Free' },
  { value: 'adapter', label: 'Network adapter' },
  { value: 'mouse', label: 'Mouse' },
  { value: 'modem', label: 'Modem' },
  { value: 'printer', label: 'Printer' },
  { value: 'other', label: 'Other' },
];
const LPT_OPTIONS = COM_OPTIONS.filter((o) => ['absent', 'none', 'printer', 'other'].includes(o.value));

export function PortsStep({ control, readOnly }: { control: Control<WizardForm>; readOnly?: boolean }) {
  return (
    <Controller
      control={control}
      name="ports"
      render={({ field }) => (
        <View style={styles.list}>
          <Small>Look at the back of the PC or at its BIOS setup screen. COM1 and COM3 share an interrupt, as do COM2 and COM4, so a mouse on COM3 can disturb an adapter on COM1.</Small>
          {field.value.map((p, i) => (
            <View key={p.name} style={styles.port} testID={`port-${p.name}`}>
              <Choice<PortChoice>
                label={p.name}
                testID={`port-${p.name}-state`}
                disabled={readOnly}
                value={p.present ? p.attached : 'absent'}
                onChange={(v) => field.onChange(field.value.map((q, j) => (j === i ? { ...q, present: v !== 'absent', attached: v === 'absent' ? 'none' : v } : q)))}
                options={p.name.startsWith('LPT') ? LPT_OPTIONS : COM_OPTIONS}
              />
            </View>
          ))}
        </View>
      )}
    />
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  port: { padding: space.md, borderWidth: 1, borderColor: colors.border, borderRadius: radius.md, backgroundColor: colors.surface },
});
