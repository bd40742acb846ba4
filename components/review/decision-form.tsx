// The lead's decision on the exact revision shown: approve (the comment is optional) or return (a comment
// saying what must change is required).
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { decisionFormSchema, returnPlanSchema, type DecisionForm as Values } from '@/db/requests/plans';
import { space } from '@/constants/theme';
import type { Allowed } from '@/hooks/use-plans';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { Small } from '@/components/ui/text';

type Props = {
  approve: Allowed;
  ret: Allowed;
  busy?: boolean;
  onApprove: (comment: string) => void;
  onReturn: (comment: string) => void;
};

export function DecisionForm({ approve, ret, busy, onApprove, onReturn }: Props) {
  const { control, handleSubmit, setError } = useForm<Values>({ resolver: zodResolver(decisionFormSchema), defaultValues: { comment: '' } });
  const doReturn = handleSubmit((v) => {
    const ok = returnPlanSchema.shape.comment.safeParse(v.comment);
    if (!ok.success) return setError('comment', { message: ok.error.issues[0]?.message ?? 'Say what needs to change.' });
    onReturn(ok.data);
  });
  return (
    <View style={styles.wrap}>
      <Controller
        control={control}
        name="comment"
        render={({ field, fieldState }) => (
          <TextField
            label="Comment for the technician"
            hint="Needed to return the plan; optional when you approve."
            testID="decision-comment"
            multiline
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        )}
      />
      <View style={styles.actions}>
        <Button label="✓ Approve this revision" testID="approve" busy={busy} disabled={!approve.ok} onPress={handleSubmit((v) => onApprove(v.comment))} />
        <Button variant="secondary" label="↩ Return with comment" testID="return" disabled={busy || !ret.ok} onPress={doReturn} />
      </View>
      {!approve.ok && approve.why ? <Small testID="approve-why">Approve: {approve.why}</Small> : null}
      {!ret.ok && ret.why && ret.why !== approve.why ? <Small>Return: {ret.why}</Small> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
