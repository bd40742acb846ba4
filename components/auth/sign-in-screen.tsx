import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, maxFormWidth, space } from '@/constants/theme';
import { useSignInMutation, signInMessage } from '@/hooks/use-session';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Body, Small, Title } from '@/components/ui/text';
import { SignInForm } from './sign-in-form';

export function SignInScreen() {
  const signIn = useSignInMutation();
  const router = useRouter();
  return (
    <Screen width={maxFormWidth} testID="sign-in-screen">
      <View style={styles.brand}>
        <Title>Bootwright</Title>
        <Body style={styles.tagline}>Reviewed startup-file changes for every PC on an office's serial network.</Body>
      </View>
      <Card>
        <SignInForm
          busy={signIn.isPending}
          error={signIn.error ? signInMessage(signIn.error) : null}
          onSubmit={async (v) => {
            await signIn.mutateAsync(v).then(
              () => router.replace('/'),
              () => undefined,
            );
          }}
        />
      </Card>
      <Small>New here? Your admin sends you an invitation by e-mail with a link to choose your password.</Small>
    </Screen>
  );
}

const styles = StyleSheet.create({
  brand: { gap: space.sm, marginTop: space.xxl },
  tagline: { color: colors.textMuted },
});
