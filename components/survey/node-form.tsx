import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';
import { NODE_KIND_LABELS, NODE_KINDS, nodeCreateSchema, type NodeKindValue, type SurveyJackRow } from '@/db/requests/survey';
import { space } from '@/constants/theme';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Choice } from '@/components/ui/choice';
import { TextField } from '@/components/ui/text-field';
import { serverProblem } from './questions';

const nodeFormSchema = nodeCreateSchema.omit({ ref: true });
export type NodeFormValues = z.output<typeof nodeFormSchema>;
const KIND_OPTIONS = NODE_KINDS.map((k) => ({ value: k, label: NODE_KIND_LABELS[k] }));

/** A point of the network: the punch-down block, a wall jack, a splitter or a network adapter. */
export function NodeForm({ initial, jacks, submitLabel, onSubmit, testID = 'node-form' }: {
  initial?: Partial<NodeFormValues>;
  jacks: SurveyJackRow[];
  submitLabel: string;
  onSubmit: (values: NodeFormValues) => Promise<unknown>;
  testID?: string;
}) {
  const { control, handleSubmit, reset, setError } = useForm<z.input<typeof nodeFormSchema>, unknown, NodeFormValues>({
    resolver: zodResolver(nodeFormSchema),
    defaultValues: { kind: initial?.kind ?? 'adapter', label: initial?.label ?? '', jackId: initial?.jackId ?? null },
    mode: 'onTouched',
  });
  const kind = useWatch({ control, name: 'kind' });
  const [problem, setProblem] = useState<string | null>(null);
  const submit = handleSubmit(async (v) => {
    setProblem(null);
    try {
      await onSubmit({ ...v, jackId: v.kind === 'jack' ? (v.jackId ?? null) : null });
      if (!initial) reset();
    } catch (err) {
      setProblem(serverProblem(err, setError));
    }
  });
  return (
    <View style={styles.form} testID={testID}>
      <Controller control={control} name="kind" render={({ field }) => <Choice<NodeKindValue> label="Kind" testID={`${testID}-kind`} options={KIND_OPTIONS} value={field.value} onChange={field.onChange} />} />
      <Controller
        control={control}
        name="label"
        render={({ field, fieldState }) => <TextField label="Label" testID={`${testID}-label`} value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />}
      />
      {kind === 'jack' ? (
        <Controller
          control={control}
          name="jackId"
          render={({ field }) => (
            <Choice<string>
              label="Surveyed jack it stands for"
              testID={`${testID}-jack`}
              options={[{ value: '', label: 'None' }, ...jacks.map((j) => ({ value: String(j.id), label: j.label }))]}
              value={field.value == null ? '' : String(field.value)}
              onChange={(v) => field.onChange(v === '' ? null : Number(v))}
            />
          )}
        />
      ) : null}
      {problem ? <Banner tone="error">{problem}</Banner> : null}
      <Button label={submitLabel} testID={`${testID}-submit`} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.md } });
