import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { space } from '@/constants/theme';
import { inviteSchema, type InviteInput } from '@/db/requests/people';
import { ROLE_LABELS } from '@/constants/navigation';
import { Button } from '@/components/ui/button';
import { Choice } from '@/components/ui/choice';
import { TextField } from '@/components/ui/text-field';

const ROLE_OPTIONS = (['technician', 'lead', 'user', 'admin'] as const).map((r) => ({ value: r, label: ROLE_LABELS[r] }));

export function InviteForm({ onSubmit, busy, serverFields }: { onSubmit: (v: InviteInput) => Promise<unknown>; busy?: boolean; serverFields?: Record<string, string> }) {
  const { control, handleSubmit, reset } = useForm<InviteInput>({ resolver: zodResolver(inviteSchema), defaultValues: { email: '', name: '', role: 'technician' }, mode: 'onTouched' });
  return (
    <View style={styles.form}>
      <Controller control={control} name="name" render={({ field, fieldState }) => <TextField label="Name" testID="invite-name" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message ?? serverFields?.name} />} />
      <Controller
        control={control}
        name="email"
        render={({ field, fieldState }) => <TextField label="E-mail" testID="invite-email" autoCapitalize="none" inputMode="email" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message ?? serverFields?.email} />}
      />
      <Controller control={control} name="role" render={({ field }) => <Choice label="Role" testID="invite-role" options={ROLE_OPTIONS} value={field.value} onChange={field.onChange} />} />
      <Button label="Send invitation" testID="invite-submit" busy={busy} onPress={handleSubmit(async (v) => { await onSubmit(v); reset(); })} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
