// The office user's files: paste AUTOEXEC.BAT (and CONFIG.SYS if they have one) or upload them, then check.
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { userEditFormSchema, type Upload, type UserEditForm } from '@/db/requests/plans';
import { space } from '@/constants/theme';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { Small } from '@/components/ui/text';
import { pickStartupFile } from './pick-file';

type Props = {
  onSubmit: (values: UserEditForm) => void;
  busy?: boolean;
  /** The files on record, to start from. */
  onRecord: { autoexec: string | null; config: string | null };
  serverFields?: Record<string, string>;
};

const EMPTY: UserEditForm = { autoexec: '', config: '', autoexecUpload: null, configUpload: null };

export function UserEditForm({ onSubmit, busy, onRecord, serverFields }: Props) {
  const form = useForm<UserEditForm>({ resolver: zodResolver(userEditFormSchema), defaultValues: EMPTY });
  const fill = () => form.reset({ ...EMPTY, autoexec: onRecord.autoexec ?? '', config: onRecord.config ?? '' });
  return (
    <View style={styles.wrap}>
      <Small>On the PC, type TYPE C:\AUTOEXEC.BAT to see the file, then copy it here exactly as it is. Or upload the file itself (for example from a floppy disk).</Small>
      <FileField control={form.control} name="autoexec" uploadName="autoexecUpload" label="AUTOEXEC.BAT" serverError={serverFields?.autoexec} setUpload={(u) => form.setValue('autoexecUpload', u, { shouldValidate: form.formState.isSubmitted })} />
      <FileField control={form.control} name="config" uploadName="configUpload" label="CONFIG.SYS (optional; leave empty to keep the one on record)" serverError={serverFields?.config} setUpload={(u) => form.setValue('configUpload', u)} />
      <View style={styles.actions}>
        <Button label="Check my files" testID="check-files" busy={busy} onPress={form.handleSubmit(onSubmit)} />
        {onRecord.autoexec ? <Button variant="secondary" label="Start from the files on record" testID="fill-on-record" onPress={fill} /> : null}
      </View>
    </View>
  );
}

type FieldProps = {
  control: Control<UserEditForm>;
  name: 'autoexec' | 'config';
  uploadName: 'autoexecUpload' | 'configUpload';
  label: string;
  serverError?: string;
  setUpload: (u: Upload | null) => void;
};

function FileField({ control, name, uploadName, label, serverError, setUpload }: FieldProps) {
  return (
    <Controller
      control={control}
      name={uploadName}
      render={({ field: upload }) => (
        <View style={styles.file}>
          {upload.value ? (
            <View style={styles.uploaded}>
              <Small testID={`${name}-uploaded`}>
                ✓ {label.split(' ')[0]} uploaded: {upload.value.name} ({upload.value.size} bytes). The bytes are sent exactly as they are.
              </Small>
              <Button compact variant="ghost" label="Remove upload" testID={`${name}-remove-upload`} onPress={() => setUpload(null)} />
            </View>
          ) : (
            <Controller
              control={control}
              name={name}
              render={({ field, fieldState, formState }) => (
                <TextField
                  label={label}
                  testID={`${name}-text`}
                  mono
                  multiline
                  numberOfLines={8}
                  autoCapitalize="characters"
                  autoCorrect={false}
                  spellCheck={false}
                  style={styles.area}
                  value={field.value}
                  onChangeText={field.onChange}
                  onBlur={field.onBlur}
                  error={(fieldState.isTouched || formState.isSubmitted ? fieldState.error?.message : undefined) ?? serverError}
                />
              )}
            />
          )}
          {!upload.value ? (
            <View style={styles.row}>
              <Button compact variant="secondary" label={`Upload ${label.split(' ')[0]}`} testID={`${name}-upload`} onPress={() => pickStartupFile().then((u) => u && setUpload(u))} />
            </View>
          ) : null}
        </View>
      )}
    />
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  file: { gap: space.sm },
  uploaded: { gap: space.xs },
  area: { minHeight: 160, textAlignVertical: 'top' },
  row: { flexDirection: 'row' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
