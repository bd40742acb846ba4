// A site's details and its station-number ranges per kind (the next free number is suggested from these).
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { space } from '@/constants/theme';
import { DEFAULT_RANGES, KIND_LABELS, STATION_KINDS, type NumberRangesInput, type SiteCreateInput } from '@/db/requests/sites';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { Small } from '@/components/ui/text';

const num = z.string().trim().regex(/^\d{1,3}$/, 'A number from 1 to 254.').refine((v) => Number(v) >= 1 && Number(v) <= 254, 'A number from 1 to 254.');
const formSchema = z.object({
  name: z.string().trim().min(1, 'Enter the office’s name.').max(120),
  address: z.string().trim().max(300),
  contact: z.string().trim().max(200),
  notes: z.string().trim().max(4000),
  ranges: z.object(Object.fromEntries(STATION_KINDS.map((k) => [k, z.object({ from: num, to: num })])) as Record<(typeof STATION_KINDS)[number], z.ZodObject<{ from: typeof num; to: typeof num }>>),
});
type FormValues = z.infer<typeof formSchema>;

export type SiteFormValues = Required<Pick<SiteCreateInput, 'name' | 'address' | 'contact' | 'notes'>> & { numberRanges: NumberRangesInput };

type Props = {
  initial?: SiteFormValues;
  submitLabel: string;
  busy?: boolean;
  serverFields?: Record<string, string>;
  onSubmit: (v: SiteFormValues) => Promise<unknown>;
  onCancel?: () => void;
};

export function SiteForm({ initial, submitLabel, busy, serverFields, onSubmit, onCancel }: Props) {
  const ranges = initial?.numberRanges ?? DEFAULT_RANGES;
  const { control, handleSubmit, setError } = useForm<FormValues>({
    resolver: zodResolver(formSchema),
    mode: 'onTouched',
    defaultValues: {
      name: initial?.name ?? '',
      address: initial?.address ?? '',
      contact: initial?.contact ?? '',
      notes: initial?.notes ?? '',
      ranges: Object.fromEntries(STATION_KINDS.map((k) => [k, { from: String(ranges[k][0]), to: String(ranges[k][1]) }])) as FormValues['ranges'],
    },
  });
  useEffect(() => {
    for (const [field, message] of Object.entries(serverFields ?? {})) {
      const m = /^numberRanges\.(\w+)/.exec(field);
      if (m && (STATION_KINDS as readonly string[]).includes(m[1])) setError(`ranges.${m[1] as 'pc'}.from`, { message });
      else if (field === 'name' || field === 'address' || field === 'contact' || field === 'notes') setError(field, { message });
    }
  }, [serverFields, setError]);
  const submit = handleSubmit((v) =>
    onSubmit({
      name: v.name,
      address: v.address,
      contact: v.contact,
      notes: v.notes,
      numberRanges: Object.fromEntries(STATION_KINDS.map((k) => [k, [Number(v.ranges[k].from), Number(v.ranges[k].to)]])) as NumberRangesInput,
    }),
  );
  const text = (name: 'name' | 'address' | 'contact' | 'notes', label: string, extra: object = {}) => (
    <Controller control={control} name={name} render={({ field, fieldState }) => <TextField label={label} testID={`site-${name}`} value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} {...extra} />} />
  );
  return (
    <View style={styles.form}>
      {text('name', 'Office name')}
      {text('address', 'Address')}
      {text('contact', 'Contact at the office')}
      {text('notes', 'Notes', { multiline: true, numberOfLines: 3, style: { minHeight: 72, textAlignVertical: 'top' } })}
      <Small>Station numbers by kind: each new station is offered the lowest free number of its kind’s range.</Small>
      {STATION_KINDS.map((k) => (
        <View key={k} style={styles.range}>
          <View style={styles.rangeField}>
            <Controller control={control} name={`ranges.${k}.from`} render={({ field, fieldState }) => <TextField label={`${KIND_LABELS[k]} from`} testID={`site-range-${k}-from`} inputMode="numeric" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />} />
          </View>
          <View style={styles.rangeField}>
            <Controller control={control} name={`ranges.${k}.to`} render={({ field, fieldState }) => <TextField label="to" testID={`site-range-${k}-to`} inputMode="numeric" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />} />
          </View>
        </View>
      ))}
      <View style={styles.actions}>
        <Button label={submitLabel} testID="site-submit" busy={busy} onPress={submit} />
        {onCancel ? <Button variant="ghost" label="Cancel" testID="site-cancel" onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  range: { flexDirection: 'row', gap: space.md },
  rangeField: { flex: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
