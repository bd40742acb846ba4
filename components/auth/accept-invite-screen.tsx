import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery } from '@tanstack/react-query';
import { Link, useLocalSearchParams } from 'expo-router';
import { Controller, useForm } from 'react-hook-form';
import { maxFormWidth } from '@/constants/theme';
import { acceptInviteSchema, type AcceptInviteInput } from '@/db/requests/people';
import { api, ApiError } from '@/hooks/api-client';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Body } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';

type Invitation = { email: string; name: string; role: string };

export function AcceptInviteScreen() {
  const { token = '' } = useLocalSearchParams<{ token?: string }>();
  const invitation = useQuery({ queryKey: ['invitation', token], queryFn: () => api<Invitation>(`/api/invitations/${encodeURIComponent(token)}`), enabled: token.length > 0 });
  const accept = useMutation({ mutationFn: (v: AcceptInviteInput) => api('/api/invitations/accept', { body: v }) });
  const { control, handleSubmit } = useForm<AcceptInviteInput>({
    resolver: zodResolver(acceptInviteSchema),
    defaultValues: { token, password: '', confirm: '' },
    mode: 'onTouched',
  });

  if (!token || invitation.isError) {
    const msg = invitation.error instanceof ApiError ? invitation.error.message : 'This invitation link is not complete.';
    return (
      <Screen title="Invitation" width={maxFormWidth}>
        <Banner tone="error" title="The link does not work" testID="invite-invalid">
          {msg}
        </Banner>
        <Link href="/sign-in">Go to sign-in</Link>
      </Screen>
    );
  }
  if (accept.isSuccess) {
    return (
      <Screen title="Password set" width={maxFormWidth}>
        <Banner tone="success" title="You can sign in now" testID="invite-done">
          {`Sign in as ${invitation.data?.email ?? 'you'} with your new password.`}
        </Banner>
        <Link href="/sign-in" testID="go-sign-in">
          Go to sign-in
        </Link>
      </Screen>
    );
  }
  return (
    <Screen title="Choose your password" subtitle={invitation.data ? `${invitation.data.name} · ${invitation.data.email} · ${invitation.data.role}` : 'Checking the invitation…'} width={maxFormWidth}>
      <Card>
        <Body>The link works once. Use at least 10 characters; a short sentence is easy to remember.</Body>
        {accept.error ? <Banner tone="error">{accept.error instanceof ApiError ? accept.error.message : 'Could not set the password.'}</Banner> : null}
        <Controller
          control={control}
          name="password"
          render={({ field, fieldState }) => (
            <TextField label="New password" testID="new-password" secureTextEntry autoComplete="new-password" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />
          )}
        />
        <Controller
          control={control}
          name="confirm"
          render={({ field, fieldState }) => (
            <TextField label="Repeat the password" testID="confirm-password" secureTextEntry autoComplete="new-password" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />
          )}
        />
        <Button label="Set password" testID="set-password" busy={accept.isPending} onPress={handleSubmit((v) => accept.mutate({ ...v, token }))} />
      </Card>
    </Screen>
  );
}
