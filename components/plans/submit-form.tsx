// The technician's last step on a draft: a written reason for each warning, then send it for review.
// The reasons are an array in the order of the warnings (their keys hold dots, so they are not field names).
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { checkKey, reasonsFormSchema, type ReasonsForm } from '@/db/requests/plans';
import { space } from '@/constants/theme';
import type { Check } from '@/hooks/use-plans';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { ChecksList } from './checks-list';

type Props = {
  checks: Check[];
  saved: Record<string, string>;
  busy?: boolean;
  /** Why sending is not possible (an error check, a stale station), or null. */
  blocked: string | null;
  serverFields?: Record<string, string>;
  onSave: (reasons: Record<string, string>) => void;
  onSubmit: (reasons: Record<string, string>) => void;
};

export function SubmitForm({ checks, saved, busy, blocked, serverFields, onSave, onSubmit }: Props) {
  const warnings = checks.filter((c) => c.severity === 'warning');
  const { control, handleSubmit, setError, getValues, formState } = useForm<ReasonsForm>({
    resolver: zodResolver(reasonsFormSchema),
    defaultValues: { reasons: warnings.map((w) => saved[checkKey(w)] ?? '') },
  });
  useEffect(() => {
    for (const [field, message] of Object.entries(serverFields ?? {})) {
      const i = warnings.findIndex((w) => `reasons.${checkKey(w)}` === field);
      if (i >= 0) setError(`reasons.${i}`, { message });
    }
  }, [serverFields]); // eslint-disable-line react-hooks/exhaustive-deps
  const toRecord = (v: ReasonsForm) => Object.fromEntries(warnings.map((w, i) => [checkKey(w), v.reasons[i] ?? '']));
  const byIndex = new Map(warnings.map((w, i) => [w, i]));
  return (
    <View style={styles.wrap}>
      <ChecksList
        checks={checks}
        renderReason={(c) => {
          const i = byIndex.get(c)!;
          return (
            <Controller
              control={control}
              name={`reasons.${i}`}
              render={({ field, fieldState }) => (
                <TextField
                  label="Why this warning is acceptable"
                  testID={`reason-input-${i}`}
                  multiline
                  value={field.value}
                  onChangeText={field.onChange}
                  onBlur={field.onBlur}
                  error={fieldState.isTouched || formState.isSubmitted ? fieldState.error?.message : undefined}
                />
              )}
            />
          );
        }}
      />
      <View style={styles.actions}>
        {warnings.length > 0 ? (
          <Button
            variant="secondary"
            label="Save reasons"
            testID="save-reasons"
            disabled={busy}
            onPress={() => onSave(Object.fromEntries(Object.entries(toRecord(getValues())).filter(([, v]) => v.trim())))}
          />
        ) : null}
        <Button label="Send for review" testID="submit-plan" busy={busy} disabled={!!blocked} onPress={handleSubmit((v) => onSubmit(toRecord(v)))} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
