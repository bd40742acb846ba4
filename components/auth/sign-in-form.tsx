import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { space } from '@/constants/theme';
import { signInSchema, type SignInInput } from '@/db/requests/people';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

type Props = { onSubmit: (values: SignInInput) => Promise<void> | void; error?: string | null; busy?: boolean };

/** E-mail and password, validated by the shared zod schema; errors appear after a field
 * loses focus or on submit (mode onTouched). */
export function SignInForm({ onSubmit, error, busy }: Props) {
  const { control, handleSubmit } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
    mode: 'onTouched',
  });
  const submit = handleSubmit((v) => onSubmit(v));
  return (
    <View style={styles.form}>
      {error ? (
        <Banner tone="error" title="Could not sign in" testID="sign-in-error">
          {error}
        </Banner>
      ) : null}
      <Controller
        control={control}
        name="email"
        render={({ field, fieldState }) => (
          <TextField
            label="E-mail"
            testID="email"
            autoComplete="email"
            keyboardType="email-address"
            autoCapitalize="none"
            inputMode="email"
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        )}
      />
      <Controller
        control={control}
        name="password"
        render={({ field, fieldState }) => (
          <TextField
            label="Password"
            testID="password"
            secureTextEntry
            autoComplete="current-password"
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            onSubmitEditing={submit}
            error={fieldState.error?.message}
          />
        )}
      />
      <Button label="Sign in" testID="sign-in-submit" busy={busy} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
