import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import {
  CONTINUITY, readingCreateSchema, readingQuestions, type ContinuityValue, type ReadingCreateInput, type ReadingCreateValues,
} from '@/db/requests/survey';
import { colors, fonts, radius, space } from '@/constants/theme';
import { IN_USE_VAC, IN_USE_VDC } from '@/generators/survey/rules';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Choice } from '@/components/ui/choice';
import { TextField } from '@/components/ui/text-field';
import { QuestionCard, serverProblem, useQuestionGate } from './questions';

type ContinuityChoice = ContinuityValue | 'none';
const CONTINUITY_OPTIONS: Array<{ value: ContinuityChoice; label: string }> = [
  ...CONTINUITY.map((c) => ({ value: c, label: c === 'good' ? 'Good' : c === 'open' ? 'Open' : 'Short' })),
  { value: 'none', label: 'Not tested' },
];

/** What the live pair would say: a hint as the reading is typed (trade practice, no published source). */
function liveHint(vdc: string, vac: string): string | null {
  const dc = Number(vdc);
  const ac = Number(vac);
  if (vdc.trim() && Number.isFinite(dc) && Math.abs(dc) > IN_USE_VDC) return `Over ${IN_USE_VDC} V DC: this pair is probably in use. Treat it as live.`;
  if (vac.trim() && Number.isFinite(ac) && ac > IN_USE_VAC) return `Over ${IN_USE_VAC} V AC: this pair is probably in use. Treat it as live.`;
  return null;
}

/**
 * A meter reading of one pair at a jack, quick to enter: the pair, V DC, V AC and continuity.
 * Values a telephone pair cannot carry are questioned before they are sent.
 */
export function ReadingForm({ pairs, defaultPair, onSubmit }: {
  /** Pairs to offer as one-press choices (those already tested at the site). */
  pairs: string[];
  defaultPair: string;
  onSubmit: (values: ReadingCreateValues, confirmed: boolean) => Promise<unknown>;
}) {
  const { control, handleSubmit, reset, setError, setValue } = useForm<ReadingCreateInput, unknown, ReadingCreateValues>({
    resolver: zodResolver(readingCreateSchema),
    defaultValues: { pair: defaultPair, vdc: '', vac: '', continuity: null },
    mode: 'onTouched',
  });
  const [problem, setProblem] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const gate = useQuestionGate<ReadingCreateValues>(readingQuestions, async (v, confirmed) => {
    setProblem(null);
    await onSubmit(v, confirmed);
    setSaved(`Recorded pair ${v.pair}.`);
    reset({ pair: v.pair, vdc: '', vac: '', continuity: null });
  });
  const [vdc, vac] = useWatch({ control, name: ['vdc', 'vac'] });
  const hint = liveHint(String(vdc ?? ''), String(vac ?? ''));
  const submit = handleSubmit((v) => {
    setSaved(null);
    return gate.submit(v).catch((err) => setProblem(serverProblem(err, setError)));
  });
  return (
    <View style={styles.form} testID="reading-form">
      <Controller
        control={control}
        name="pair"
        render={({ field, fieldState }) => (
          <TextField label="Pair" hint="Number and colours, e.g. 2 (black/yellow)" testID="reading-pair" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />
        )}
      />
      {pairs.length > 0 ? (
        <View style={styles.chips} aria-label="Pairs tested before">
          {pairs.map((p) => (
            <Pressable key={p} accessibilityRole="button" style={styles.chip} onPress={() => setValue('pair', p, { shouldValidate: true })} testID={`reading-pair-pick-${p.split(' ')[0]}`}>
              <Text style={styles.chipText}>{p}</Text>
            </Pressable>
          ))}
        </View>
      ) : null}
      <View style={styles.row}>
        <View style={styles.cell}>
          <Controller
            control={control}
            name="vdc"
            render={({ field, fieldState }) => (
              <TextField label="Voltage DC" unit="V DC" inputMode="decimal" style={styles.input} testID="reading-vdc" value={String(field.value ?? '')} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />
            )}
          />
        </View>
        <View style={styles.cell}>
          <Controller
            control={control}
            name="vac"
            render={({ field, fieldState }) => (
              <TextField label="Voltage AC" unit="V AC" inputMode="decimal" style={styles.input} testID="reading-vac" value={String(field.value ?? '')} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />
            )}
          />
        </View>
      </View>
      {hint ? (
        <Text style={styles.live} testID="reading-live-hint">
          ⚡ {hint}
        </Text>
      ) : null}
      <Controller
        control={control}
        name="continuity"
        render={({ field }) => (
          <Choice<ContinuityChoice> label="Continuity" testID="reading-continuity" options={CONTINUITY_OPTIONS} value={field.value ?? 'none'} onChange={(v) => field.onChange(v === 'none' ? null : v)} />
        )}
      />
      {problem ? <Banner tone="error" testID="reading-error">{problem}</Banner> : null}
      {saved ? <Banner tone="success" testID="reading-saved">{saved}</Banner> : null}
      {gate.pending ? (
        <QuestionCard testID="reading-question" questions={gate.pending.questions} onCancel={gate.cancel} onConfirm={() => gate.confirm().catch((err) => setProblem(serverProblem(err, setError)))} />
      ) : (
        <Button label="Record reading" testID="reading-submit" onPress={submit} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 140, minWidth: 0 },
  // An <input> will not shrink below its intrinsic width unless told to.
  input: { minWidth: 0, width: '100%' },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  chip: { minHeight: 36, justifyContent: 'center', paddingHorizontal: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surfaceAlt },
  chipText: { fontFamily: fonts.regular, fontSize: 13, color: colors.text },
  live: { fontFamily: fonts.semibold, fontSize: 14, color: colors.danger },
});
