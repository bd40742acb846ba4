import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';
import { jackCreateSchema } from '@/db/requests/survey';
import { space } from '@/constants/theme';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { serverProblem } from './questions';

const jackFormSchema = jackCreateSchema.omit({ ref: true });
export type JackFormValues = z.output<typeof jackFormSchema>;

/** A wall jack: its label, the room, and the station(s) that sit at it. */
export function JackForm({ initial, submitLabel, onSubmit, testID = 'jack-form' }: {
  initial?: Partial<JackFormValues>;
  submitLabel: string;
  onSubmit: (values: JackFormValues) => Promise<unknown>;
  testID?: string;
}) {
  const { control, handleSubmit, reset, setError } = useForm<z.input<typeof jackFormSchema>, unknown, JackFormValues>({
    resolver: zodResolver(jackFormSchema),
    defaultValues: { label: initial?.label ?? '', room: initial?.room ?? '', station: initial?.station ?? '' },
    mode: 'onTouched',
  });
  const [problem, setProblem] = useState<string | null>(null);
  const submit = handleSubmit(async (v) => {
    setProblem(null);
    try {
      await onSubmit(v);
      if (!initial) reset();
    } catch (err) {
      setProblem(serverProblem(err, setError));
    }
  });
  const field = (name: 'label' | 'room' | 'station', label: string, hint?: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field: f, fieldState }) => (
        <TextField label={label} hint={hint} testID={`${testID}-${name}`} value={f.value ?? ''} onChangeText={f.onChange} onBlur={f.onBlur} error={fieldState.error?.message} />
      )}
    />
  );
  return (
    <View style={styles.form} testID={testID}>
      {field('label', 'Jack label', 'As marked on the wall plate, e.g. J-13 Kitchen')}
      {field('room', 'Room')}
      {field('station', 'Station(s) at this jack', 'Station names, separated by commas')}
      {problem ? <Banner tone="error">{problem}</Banner> : null}
      <Button label={submitLabel} testID={`${testID}-submit`} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.md } });
