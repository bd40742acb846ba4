// Step 4, network: which COM port the adapter is on, serial settings (the kit's by default), which LPT is
// redirected to it, and the options the loader gets for this station.
import { Controller, useWatch, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { space } from '@/constants/theme';
import { PARITY_LABELS } from '@/db/requests/kits';
import { BAUD_RATES } from '@/generators/engine/profile';
import type { Kit } from '@/hooks/use-kits';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Choice } from '@/components/ui/choice';
import { TextField } from '@/components/ui/text-field';
import { Mono, Small } from '@/components/ui/text';
import { COM_PORTS, LPT_PORTS, mergeArgs, type WizardForm } from './wizard-schema';

type Props = { control: Control<WizardForm>; kit: Kit | null; readOnly?: boolean; onUseKit?: (kit: Kit) => void };

export function NetworkStep({ control, kit, readOnly, onUseKit }: Props) {
  const [ports, networkPort, args, baud, parity, dataBits, stopBits] = useWatch({ control, name: ['ports', 'networkPort', 'stationArgs', 'baud', 'parity', 'dataBits', 'stopBits'] });
  // A kit picked (or changed) after the serial fields were filled leaves them as they were; say so and offer the kit's.
  const differsFromKit = !!kit && (baud !== kit.baud || parity !== kit.parity || dataBits !== kit.dataBits || stopBits !== kit.stopBits);
  const present = (name: string) => ports.find((p) => p.name === name)?.present;
  const kitNote = (value: unknown, kitValue: unknown) => (kit && value === kitValue ? ' (kit)' : '');
  return (
    <View style={styles.form}>
      {differsFromKit && !readOnly && onUseKit ? (
        <Banner tone="note" title="Serial settings differ from the kit" testID="net-kit-differs">
          <Small>{`${kit!.name} uses ${kit!.baud} baud, parity ${kit!.parity}, ${kit!.dataBits} data bits, ${kit!.stopBits} stop bit${kit!.stopBits === 1 ? '' : 's'}.`}</Small>
          <View style={{ flexDirection: 'row' }}>
            <Button compact variant="secondary" label="Use the kit's settings" testID="net-use-kit" onPress={() => onUseKit(kit!)} />
          </View>
        </Banner>
      ) : null}
      <Controller
        control={control}
        name="networkPort"
        render={({ field }) => (
          <Choice label="Network adapter on" testID="net-port" disabled={readOnly} value={field.value} onChange={field.onChange} options={COM_PORTS.map((p) => ({ value: p, label: present(p) ? p : `${p} (not present)` }))} />
        )}
      />
      <Controller
        control={control}
        name="baud"
        render={({ field }) => (
          <Choice<string> label="Baud" testID="net-baud" disabled={readOnly} value={String(field.value)} onChange={(v) => field.onChange(Number(v))} options={BAUD_RATES.filter((b) => b >= 1200).map((b) => ({ value: String(b), label: `${b}${kitNote(b, kit?.baud)}` }))} />
        )}
      />
      <Controller control={control} name="parity" render={({ field }) => <Choice label="Parity" testID="net-parity" disabled={readOnly} value={field.value} onChange={field.onChange} options={(['N', 'E', 'O'] as const).map((p) => ({ value: p, label: `${PARITY_LABELS[p]}${kitNote(p, kit?.parity)}` }))} />} />
      <View style={styles.row}>
        <Controller control={control} name="dataBits" render={({ field }) => <Choice<string> label="Data bits" testID="net-data" disabled={readOnly} value={String(field.value)} onChange={(v) => field.onChange(Number(v))} options={['7', '8'].map((d) => ({ value: d, label: `${d}${kitNote(Number(d), kit?.dataBits)}` }))} />} />
        <Controller control={control} name="stopBits" render={({ field }) => <Choice<string> label="Stop bits" testID="net-stop" disabled={readOnly} value={String(field.value)} onChange={(v) => field.onChange(Number(v))} options={['1', '2'].map((d) => ({ value: d, label: `${d}${kitNote(Number(d), kit?.stopBits)}` }))} />} />
      </View>
      <Controller
        control={control}
        name="redirectFrom"
        render={({ field }) => (
          <Choice
            label={`Send printer output to ${networkPort}`}
            testID="net-redirect"
            disabled={readOnly}
            value={field.value}
            onChange={field.onChange}
            options={[{ value: 'none' as const, label: 'No redirection' }, ...LPT_PORTS.map((l) => ({ value: l, label: `${l} → ${networkPort}` }))]}
          />
        )}
      />
      <Controller
        control={control}
        name="stationArgs"
        render={({ field, fieldState }) => (
          <TextField label="Options for this station" testID="net-station-args" mono autoCapitalize="characters" editable={!readOnly} value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} hint={kit?.programArgs ? `Written before the kit’s own options (${kit.programArgs}).` : 'Written after the resident program’s path.'} />
        )}
      />
      {kit ? (
        <View style={{ gap: space.xs }}>
          <Small>The loader line will read:</Small>
          <Mono testID="loader-line">{`${kit.programPath} ${mergeArgs(args, kit.programArgs)}`.trim()}</Mono>
        </View>
      ) : (
        <Small>Choose a kit on the first step to see the loader line.</Small>
      )}
      <Controller
        control={control}
        name="loadHigh"
        render={({ field }) => (
          <Choice label="Load into upper memory" testID="net-load-high" disabled={readOnly} value={field.value} onChange={field.onChange} options={[{ value: 'auto', label: 'Where DOS and CONFIG.SYS allow it' }, { value: 'never', label: 'Never' }]} />
        )}
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg }, row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xl } });
