import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';
import { terminatorCreateSchema, terminatorQuestions, type SurveyNodeRow } from '@/db/requests/survey';
import { space } from '@/constants/theme';
import { TERMINATOR_OHMS } from '@/generators/survey/rules';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { NodePicker } from './node-picker';
import { QuestionCard, serverProblem, useQuestionGate } from './questions';

export type TerminatorFormValues = z.output<typeof terminatorCreateSchema>;
type TerminatorFormInput = z.input<typeof terminatorCreateSchema>;

/** The terminating resistor: where it is fitted and its value in ohms (the trade uses one of 150 Ω). */
export function TerminatorForm({ initial, nodes, submitLabel, onSubmit, testID = 'terminator-form' }: {
  initial?: Partial<TerminatorFormInput>;
  nodes: SurveyNodeRow[];
  submitLabel: string;
  onSubmit: (values: TerminatorFormValues, confirmed: boolean) => Promise<unknown>;
  testID?: string;
}) {
  const { control, handleSubmit, reset, setError } = useForm<TerminatorFormInput, unknown, TerminatorFormValues>({
    resolver: zodResolver(terminatorCreateSchema),
    defaultValues: { nodeId: initial?.nodeId, ohms: String(initial?.ohms ?? TERMINATOR_OHMS) },
    mode: 'onTouched',
  });
  const [problem, setProblem] = useState<string | null>(null);
  const gate = useQuestionGate<TerminatorFormValues>((v) => terminatorQuestions(v), async (v, confirmed) => {
    setProblem(null);
    await onSubmit(v, confirmed);
    if (!initial) reset();
  });
  const fail = (err: unknown) => setProblem(serverProblem(err, setError));
  return (
    <View style={styles.form} testID={testID}>
      <Controller
        control={control}
        name="nodeId"
        render={({ field, fieldState }) => <NodePicker label="Fitted at" testID={`${testID}-node`} nodes={nodes} value={field.value} onChange={field.onChange} error={fieldState.error?.message} />}
      />
      <Controller
        control={control}
        name="ohms"
        render={({ field, fieldState }) => (
          <TextField label="Resistance" unit="Ω" inputMode="decimal" testID={`${testID}-ohms`} value={String(field.value ?? '')} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />
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
