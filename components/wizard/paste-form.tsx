// Pasted startup-file text. The server encodes it to code page 437 and names the line and column of any
// character that page cannot hold; that message lands under the field.
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { space } from '@/constants/theme';
import type { FileKind } from '@/db/requests/stations';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

const schema = z.object({ text: z.string().min(1, 'Paste the file’s text first.').max(128 * 1024, 'That is more than a startup file holds.') });

type Props = { kind: FileKind; onSubmit: (text: string) => Promise<unknown>; onCancel: () => void; busy?: boolean; serverError?: string };

export function PasteForm({ kind, onSubmit, onCancel, busy, serverError }: Props) {
  const { control, handleSubmit, setError } = useForm<{ text: string }>({ resolver: zodResolver(schema), defaultValues: { text: '' }, mode: 'onTouched' });
  useEffect(() => {
    if (serverError) setError('text', { message: serverError });
  }, [serverError, setError]);
  const id = kind === 'AUTOEXEC.BAT' ? 'autoexec' : 'config';
  return (
    <View style={styles.form}>
      <Controller
        control={control}
        name="text"
        render={({ field, fieldState }) => (
          <TextField
            label={`${kind} text`}
            testID={`paste-${id}-text`}
            mono
            multiline
            numberOfLines={8}
            autoCapitalize="none"
            autoCorrect={false}
            spellCheck={false}
            style={styles.area}
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
            hint="Lines get DOS line ends (CR LF). Only characters of code page 437, the DOS character set, are accepted."
          />
        )}
      />
      <View style={styles.actions}>
        <Button label={`Save pasted ${kind}`} testID={`paste-${id}-save`} busy={busy} onPress={handleSubmit((v) => onSubmit(v.text))} />
        <Button label="Cancel" variant="ghost" onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.md }, area: { minHeight: 160, textAlignVertical: 'top' }, actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm } });
