// The audit trail's filters: what kind of record, which action, who, which site, and a date range.
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { space } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Choice } from '@/components/ui/choice';
import { TextField } from '@/components/ui/text-field';

const day = z
  .string()
  .trim()
  .refine((s) => s === '' || (/^\d{4}-\d{2}-\d{2}$/.test(s) && !Number.isNaN(Date.parse(s))), 'Use a date like 2026-12-01.');

export const auditFilterSchema = z.object({
  entity: z.string(),
  action: z.string().trim().max(64, 'At most 64 characters.'),
  actorId: z.string(),
  siteId: z.string(),
  from: day,
  to: day,
});
export type AuditFilterValues = z.infer<typeof auditFilterSchema>;

export const NO_FILTER: AuditFilterValues = { entity: '', action: '', actorId: '', siteId: '', from: '', to: '' };

const ENTITIES = [
  { value: '', label: 'Everything' },
  { value: 'plan', label: 'Plans' },
  { value: 'station', label: 'Stations' },
  { value: 'startup_file', label: 'Files' },
  { value: 'profile', label: 'Profiles' },
  { value: 'site', label: 'Sites' },
  { value: 'kit', label: 'Kits' },
  { value: 'user', label: 'People' },
];

type Props = {
  people: Array<{ id: string; name: string }>;
  sites: Array<{ id: number; name: string }>;
  onSubmit: (v: AuditFilterValues) => void;
};

export function AuditFilterForm({ people, sites, onSubmit }: Props) {
  const { wide } = useBreakpoints();
  const { control, handleSubmit, reset } = useForm<AuditFilterValues>({ resolver: zodResolver(auditFilterSchema), defaultValues: NO_FILTER });
  const text = (name: 'action' | 'from' | 'to', label: string, placeholder: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <View style={wide ? styles.third : undefined}>
          <TextField label={label} placeholder={placeholder} testID={`audit-${name}`} autoCapitalize="none" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />
        </View>
      )}
    />
  );
  return (
    <View style={styles.wrap}>
      <Controller control={control} name="entity" render={({ field }) => <Choice label="Record" testID="audit-entity" options={ENTITIES} value={field.value} onChange={(v) => { field.onChange(v); handleSubmit(onSubmit)(); }} />} />
      {people.length ? (
        <Controller control={control} name="actorId" render={({ field }) => <Choice label="Who" testID="audit-actor" options={[{ value: '', label: 'Anyone' }, ...people.map((p) => ({ value: p.id, label: p.name }))]} value={field.value} onChange={(v) => { field.onChange(v); handleSubmit(onSubmit)(); }} />} />
      ) : null}
      {sites.length > 1 ? (
        <Controller control={control} name="siteId" render={({ field }) => <Choice label="Site" testID="audit-site" options={[{ value: '', label: 'All sites' }, ...sites.map((s) => ({ value: String(s.id), label: s.name }))]} value={field.value} onChange={(v) => { field.onChange(v); handleSubmit(onSubmit)(); }} />} />
      ) : null}
      <View style={[styles.texts, wide && styles.textsWide]}>
        {text('action', 'Action', 'e.g. plan.approve')}
        {text('from', 'From (day)', 'YYYY-MM-DD')}
        {text('to', 'To (day)', 'YYYY-MM-DD')}
      </View>
      <View style={styles.actions}>
        <Button label="Apply filters" testID="audit-apply" onPress={handleSubmit(onSubmit)} />
        <Button variant="ghost" label="Clear" testID="audit-clear" onPress={() => { reset(NO_FILTER); onSubmit(NO_FILTER); }} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  texts: { gap: space.md },
  textsWide: { flexDirection: 'row' },
  third: { flex: 1 },
  actions: { flexDirection: 'row', gap: space.sm },
});
