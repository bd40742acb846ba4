import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Questions } from '@/db/requests/survey';
import { colors, fonts, space } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';

type Pending<T> = { values: T; questions: Questions };

/**
 * Unlikely values are asked about before they are stored, never silently accepted: `ask` finds them in
 * the browser, and the server's `needs_confirmation` answer (the same rules) opens the same question.
 */
export function useQuestionGate<T>(ask: (v: T) => Questions, send: (v: T, confirmed: boolean) => Promise<unknown>) {
  const [pending, setPending] = useState<Pending<T> | null>(null);
  async function run(values: T, confirmed: boolean) {
    try {
      await send(values, confirmed);
      setPending(null);
    } catch (err) {
      if (err instanceof ApiError && err.code === 'needs_confirmation') setPending({ values, questions: err.fields });
      else {
        setPending(null);
        throw err;
      }
    }
  }
  return {
    pending,
    submit: async (values: T) => {
      const questions = ask(values);
      if (Object.keys(questions).length > 0) setPending({ values, questions });
      else await run(values, false);
    },
    confirm: async () => {
      if (pending) await run(pending.values, true);
    },
    cancel: () => setPending(null),
  };
}

const FIELD_NAMES: Record<string, string> = { vdc: 'V DC', vac: 'V AC', lengthFt: 'Length', ohms: 'Resistance' };

export function QuestionCard({ questions, onConfirm, onCancel, busy, testID }: { questions: Questions; onConfirm: () => void; onCancel: () => void; busy?: boolean; testID: string }) {
  return (
    <View testID={testID} style={styles.wrap}>
      <Banner tone="warning" title="Check before saving">
        <View style={styles.list}>
          {Object.entries(questions).map(([field, message]) => (
            <Text key={field} style={styles.item} testID={`${testID}-${field}`}>
              <Text style={styles.field}>{FIELD_NAMES[field] ?? field}: </Text>
              {message}
            </Text>
          ))}
        </View>
      </Banner>
      <View style={styles.row}>
        <Button compact variant="secondary" label="Change it" testID={`${testID}-change`} onPress={onCancel} />
        <Button compact label="Keep as entered" testID={`${testID}-keep`} busy={busy} onPress={onConfirm} />
      </View>
    </View>
  );
}

/** Puts the server's field errors on the form's fields and returns its message for the rest. */
export function serverProblem(err: unknown, setError: (field: never, e: { message: string }) => void): string {
  if (err instanceof ApiError) {
    for (const [field, message] of Object.entries(err.fields)) setError(field as never, { message });
    return err.message;
  }
  return (err as Error)?.message ?? 'Saving failed.';
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  list: { gap: space.xs },
  item: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20, color: colors.text },
  field: { fontFamily: fonts.semibold },
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
