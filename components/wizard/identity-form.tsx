// Step 1, identity: station name (a DOS 8.3 name), station number (next free one suggested), location and kit.
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { space } from '@/constants/theme';
import { stationNameSchema, stationNumberSchema } from '@/db/requests/stations';
import { KIND_LABELS, type StationKind } from '@/db/requests/sites';
import type { Kit } from '@/hooks/use-kits';
import { Choice } from '@/components/ui/choice';
import { TextField } from '@/components/ui/text-field';
import { Small } from '@/components/ui/text';

export const identitySchema = z.object({
  name: stationNameSchema,
  number: z
    .string()
    .trim()
    .min(1, 'Enter the station number.')
    .regex(/^\d+$/, 'Use a whole number.')
    .refine((v) => stationNumberSchema.safeParse(Number(v)).success, 'Station numbers run from 1 to 254.'),
  location: z.string().trim().max(120, 'At most 120 characters.'),
  kitId: z.string(),
});
export type IdentityValues = z.infer<typeof identitySchema>;

type Props = {
  kind: StationKind;
  defaults: IdentityValues;
  kits: Kit[];
  nextNumber: number | null;
  range: [number, number] | null;
  serverFields?: Record<string, string>;
  disabled?: boolean;
  /** Hands the form's submit to the caller (the wizard's "Save and continue"). */
  bindSubmit: (submit: () => Promise<IdentityValues | null>) => void;
};

export function IdentityForm({ kind, defaults, kits, nextNumber, range, serverFields, disabled, bindSubmit }: Props) {
  const { control, handleSubmit, setError } = useForm<IdentityValues>({ resolver: zodResolver(identitySchema), defaultValues: defaults, mode: 'onTouched' });
  useEffect(() => {
    for (const [field, message] of Object.entries(serverFields ?? {})) {
      if (field === 'name' || field === 'number' || field === 'location') setError(field, { message });
    }
  }, [serverFields, setError]);
  useEffect(() => {
    bindSubmit(() => new Promise((resolve) => void handleSubmit((v) => resolve(v), () => resolve(null))()));
  }, [bindSubmit, handleSubmit]);
  return (
    <View style={styles.form}>
      <Controller
        control={control}
        name="name"
        render={({ field, fieldState }) => (
          <TextField label="Station name" testID="station-name" mono autoCapitalize="characters" autoCorrect={false} editable={!disabled} value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} hint="Up to 8 letters or digits, no spaces: it names the PC on the network and its folder in the rollout bundle. Not a DOS device name (CON, PRN, COM1…)." />
        )}
      />
      <Controller
        control={control}
        name="number"
        render={({ field, fieldState }) => (
          <TextField
            label="Station number"
            testID="station-number"
            inputMode="numeric"
            editable={!disabled}
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
            hint={nextNumber !== null ? `Next free ${KIND_LABELS[kind]} number at this site: ${nextNumber}${range ? ` (range ${range[0]}–${range[1]})` : ''}.` : range ? `The ${KIND_LABELS[kind]} range ${range[0]}–${range[1]} is full.` : undefined}
          />
        )}
      />
      <Controller
        control={control}
        name="location"
        render={({ field, fieldState }) => (
          <TextField label="Location or jack" testID="station-location" editable={!disabled} value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} placeholder="Reception desk, jack J-01" />
        )}
      />
      {kind === 'pc' ? (
        <Controller
          control={control}
          name="kitId"
          render={({ field }) => (
            <View style={{ gap: space.xs }}>
              <Choice label="Kit" testID="station-kit" disabled={disabled} value={field.value || null} onChange={field.onChange} options={kits.map((k) => ({ value: String(k.id), label: k.name }))} />
              {kits.length === 0 ? <Small>No kit yet: an admin or technician adds one on the Kits screen.</Small> : null}
            </View>
          )}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
