import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';
import { runCreateSchema, runQuestions, type SurveyNodeRow } from '@/db/requests/survey';
import { space } from '@/constants/theme';
import { NEW_RUN_GAUGE } from '@/generators/survey/rules';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Choice } from '@/components/ui/choice';
import { TextField } from '@/components/ui/text-field';
import { NodePicker } from './node-picker';
import { QuestionCard, serverProblem, useQuestionGate } from './questions';

const runFormSchema = runCreateSchema;
export type RunFormValues = z.output<typeof runFormSchema>;
type RunFormInput = z.input<typeof runFormSchema>;

const GAUGE_OPTIONS = (['22', '24', '26'] as const).map((g) => ({ value: g, label: `${g} AWG` }));
const YES_NO = [
  { value: 'yes', label: 'Reverses the pair' },
  { value: 'no', label: 'Straight through' },
] as const;
const KIND_OPTIONS = [
  { value: 'auto', label: 'From its ends' },
  { value: 'wall', label: 'Wall wiring' },
  { value: 'cord', label: 'Cord' },
] as const;

/** A cable run between two points: length in feet, wire gauge, and whether it reverses the pair. */
export function RunForm({ initial, nodes, submitLabel, onSubmit, testID = 'run-form' }: {
  initial?: Partial<RunFormInput>;
  nodes: SurveyNodeRow[];
  submitLabel: string;
  onSubmit: (values: RunFormValues, confirmed: boolean) => Promise<unknown>;
  testID?: string;
}) {
  const { control, handleSubmit, reset, setError } = useForm<RunFormInput, unknown, RunFormValues>({
    resolver: zodResolver(runFormSchema),
    defaultValues: {
      fromNodeId: initial?.fromNodeId,
      toNodeId: initial?.toNodeId,
      lengthFt: initial?.lengthFt === undefined ? '' : String(initial.lengthFt),
      gauge: String(initial?.gauge ?? NEW_RUN_GAUGE),
      reverses: initial?.reverses ?? false,
      kind: initial?.kind ?? null,
    },
    mode: 'onTouched',
  });
  const [problem, setProblem] = useState<string | null>(null);
  const gate = useQuestionGate<RunFormValues>((v) => runQuestions(v), async (v, confirmed) => {
    setProblem(null);
    await onSubmit(v, confirmed);
    if (!initial) reset();
  });
  const fail = (err: unknown) => setProblem(serverProblem(err, setError));
  return (
    <View style={styles.form} testID={testID}>
      <Controller
        control={control}
        name="fromNodeId"
        render={({ field, fieldState }) => <NodePicker label="From" testID={`${testID}-from`} nodes={nodes} value={field.value} onChange={field.onChange} error={fieldState.error?.message} />}
      />
      <Controller
        control={control}
        name="toNodeId"
        render={({ field, fieldState }) => <NodePicker label="To" testID={`${testID}-to`} nodes={nodes} value={field.value} onChange={field.onChange} error={fieldState.error?.message} />}
      />
      <Controller
        control={control}
        name="lengthFt"
        render={({ field, fieldState }) => (
          <TextField label="Length" unit="ft" inputMode="decimal" testID={`${testID}-length`} value={String(field.value ?? '')} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />
        )}
      />
      <Controller
        control={control}
        name="gauge"
        render={({ field, fieldState }) => (
          <View>
            <Choice label="Wire gauge (22 AWG for new runs)" testID={`${testID}-gauge`} options={[...GAUGE_OPTIONS]} value={String(field.value) as '22'} onChange={field.onChange} />
            {fieldState.error ? <Banner tone="error">{fieldState.error.message}</Banner> : null}
          </View>
        )}
      />
      <Controller
        control={control}
        name="reverses"
        render={({ field }) => (
          <Choice label="Pair" testID={`${testID}-reverses`} options={[...YES_NO]} value={field.value ? 'yes' : 'no'} onChange={(v) => field.onChange(v === 'yes')} />
        )}
      />
      <Controller
        control={control}
        name="kind"
        render={({ field }) => (
          <Choice label="Kind of run" testID={`${testID}-kind`} options={[...KIND_OPTIONS]} value={field.value ?? 'auto'} onChange={(v) => field.onChange(v === 'auto' ? null : v)} />
        )}
      />
      {problem ? <Banner tone="error" testID={`${testID}-error`}>{problem}</Banner> : null}
      {gate.pending ? (
        <QuestionCard testID={`${testID}-question`} questions={gate.pending.questions} onCancel={gate.cancel} onConfirm={() => gate.confirm().catch(fail)} />
      ) : (
        <Button label={submitLabel} testID={`${testID}-submit`} onPress={handleSubmit((v) => gate.submit(v).catch(fail))} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.md } });
