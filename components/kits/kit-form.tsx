// A kit's facts: resident program and options, serial settings, lowest DOS, resident size, CONFIG.SYS needs.
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { space } from '@/constants/theme';
import { dosVersionSchema, PARITY_LABELS, programPathSchema, type KitCreateInput } from '@/db/requests/kits';
import { BAUD_RATES } from '@/generators/engine/profile';
import type { Kit } from '@/hooks/use-kits';
import { Button } from '@/components/ui/button';
import { Choice } from '@/components/ui/choice';
import { TextField } from '@/components/ui/text-field';

const optionalInt = (min: number, max: number, what: string) =>
  z.string().trim().refine((v) => v === '' || (/^\d+$/.test(v) && Number(v) >= min && Number(v) <= max), `${what} from ${min} to ${max}, or empty.`);

const formSchema = z.object({
  name: z.string().trim().min(1, 'Enter the kit’s name.').max(60),
  programPath: programPathSchema,
  programArgs: z.string().trim().max(60),
  baud: z.string(),
  parity: z.enum(['N', 'E', 'O', 'M', 'S']),
  dataBits: z.enum(['7', '8']),
  stopBits: z.enum(['1', '2']),
  minDos: dosVersionSchema,
  residentKB: z.string().trim().regex(/^\d{1,3}$/, 'Whole KB, like 38.').refine((v) => Number(v) <= 640, 'At most 640 KB.'),
  configFiles: optionalInt(8, 255, 'FILES='),
  configBuffers: optionalInt(1, 99, 'BUFFERS='),
  configLines: z.string().refine((v) => v.split('\n').every((l) => l.length <= 127), 'A CONFIG.SYS line has at most 127 characters.'),
});
type Values = z.infer<typeof formSchema>;

const toValues = (k?: Kit): Values => ({
  name: k?.name ?? '',
  programPath: k?.programPath ?? '',
  programArgs: k?.programArgs ?? '',
  baud: String(k?.baud ?? 9600),
  parity: (k?.parity ?? 'N') as Values['parity'],
  dataBits: String(k?.dataBits ?? 8) as Values['dataBits'],
  stopBits: String(k?.stopBits ?? 1) as Values['stopBits'],
  minDos: k?.minDos ?? '3.30',
  residentKB: k ? String(k.residentKB) : '',
  configFiles: k?.configFiles != null ? String(k.configFiles) : '',
  configBuffers: k?.configBuffers != null ? String(k.configBuffers) : '',
  configLines: k?.configLines.join('\n') ?? '',
});

const toInput = (v: Values): KitCreateInput => ({
  name: v.name,
  programPath: v.programPath,
  programArgs: v.programArgs,
  baud: Number(v.baud),
  parity: v.parity,
  dataBits: Number(v.dataBits) as 7 | 8,
  stopBits: Number(v.stopBits) as 1 | 2,
  minDos: v.minDos,
  residentKB: Number(v.residentKB),
  configFiles: v.configFiles ? Number(v.configFiles) : null,
  configBuffers: v.configBuffers ? Number(v.configBuffers) : null,
  configLines: v.configLines.split('\n').map((l) => l.trim()).filter(Boolean),
});

type Props = { kit?: Kit; busy?: boolean; serverFields?: Record<string, string>; onSubmit: (v: KitCreateInput) => Promise<unknown>; onCancel: () => void };

export function KitForm({ kit, busy, serverFields, onSubmit, onCancel }: Props) {
  const { control, handleSubmit, setError } = useForm<Values>({ resolver: zodResolver(formSchema), defaultValues: toValues(kit), mode: 'onTouched' });
  useEffect(() => {
    for (const [f, message] of Object.entries(serverFields ?? {})) if (f in toValues()) setError(f as keyof Values, { message });
  }, [serverFields, setError]);
  const text = (name: keyof Values, label: string, extra: object = {}) => (
    <Controller control={control} name={name} render={({ field, fieldState }) => <TextField label={label} testID={`kit-${name}`} value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} {...extra} />} />
  );
  return (
    <View style={styles.form}>
      {text('name', 'Kit name')}
      {text('programPath', 'Resident program', { mono: true, autoCapitalize: 'characters', hint: 'Full DOS path, like C:\\THREAD\\TLRES.COM.' })}
      {text('programArgs', 'Options every station gets', { mono: true, autoCapitalize: 'characters', hint: 'Station-specific options (like its number) are set per PC in the wizard.' })}
      <Controller control={control} name="baud" render={({ field }) => <Choice label="Baud" testID="kit-baud" value={field.value} onChange={field.onChange} options={BAUD_RATES.filter((b) => b >= 1200).map((b) => ({ value: String(b), label: String(b) }))} />} />
      <Controller control={control} name="parity" render={({ field }) => <Choice label="Parity" testID="kit-parity" value={field.value} onChange={field.onChange} options={(['N', 'E', 'O'] as const).map((p) => ({ value: p, label: PARITY_LABELS[p] }))} />} />
      <View style={styles.row}>
        <Controller control={control} name="dataBits" render={({ field }) => <Choice label="Data bits" testID="kit-data" value={field.value} onChange={field.onChange} options={[{ value: '7', label: '7' }, { value: '8', label: '8' }]} />} />
        <Controller control={control} name="stopBits" render={({ field }) => <Choice label="Stop bits" testID="kit-stop" value={field.value} onChange={field.onChange} options={[{ value: '1', label: '1' }, { value: '2', label: '2' }]} />} />
      </View>
      <View style={styles.row}>
        <View style={styles.cell}>{text('minDos', 'Lowest DOS', { inputMode: 'decimal' })}</View>
        <View style={styles.cell}>{text('residentKB', 'Resident size', { unit: 'KB', inputMode: 'numeric' })}</View>
      </View>
      <View style={styles.row}>
        <View style={styles.cell}>{text('configFiles', 'CONFIG.SYS FILES= at least', { inputMode: 'numeric' })}</View>
        <View style={styles.cell}>{text('configBuffers', 'BUFFERS= at least', { inputMode: 'numeric' })}</View>
      </View>
      {text('configLines', 'CONFIG.SYS lines the kit needs', { mono: true, multiline: true, numberOfLines: 3, style: { minHeight: 72, textAlignVertical: 'top' }, hint: 'One per line, for example a DEVICE= line. Leave empty if none.' })}
      <View style={styles.actions}>
        <Button label={kit ? 'Save kit' : 'Create kit'} testID="kit-submit" busy={busy} onPress={handleSubmit((v) => onSubmit(toInput(v)))} />
        <Button variant="ghost" label="Cancel" testID="kit-cancel" onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  cell: { flexGrow: 1, flexBasis: 180 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
