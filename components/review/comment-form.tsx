// A comment on one line of a file (or on the whole plan when no line is given).
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { commentFormSchema, type CommentForm as Values } from '@/db/requests/plans';
import { space } from '@/constants/theme';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

type Props = { label: string; busy?: boolean; onSubmit: (body: string) => Promise<unknown> | void; onCancel?: () => void; testID?: string };

export function CommentForm({ label, busy, onSubmit, onCancel, testID = 'comment' }: Props) {
  const { control, handleSubmit, reset } = useForm<Values>({ resolver: zodResolver(commentFormSchema), defaultValues: { body: '' } });
  const send = handleSubmit(async (v) => {
    await onSubmit(v.body);
    reset({ body: '' });
  });
  return (
    <View style={styles.wrap}>
      <Controller
        control={control}
        name="body"
        render={({ field, fieldState, formState }) => (
          <TextField
            label={label}
            testID={`${testID}-input`}
            multiline
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.isTouched || formState.isSubmitted ? fieldState.error?.message : undefined}
          />
        )}
      />
      <View style={styles.actions}>
        <Button compact label="Add comment" testID={`${testID}-send`} busy={busy} onPress={send} />
        {onCancel ? <Button compact variant="ghost" label="Cancel" testID={`${testID}-cancel`} onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm, paddingVertical: space.sm },
  actions: { flexDirection: 'row', gap: space.sm },
});
