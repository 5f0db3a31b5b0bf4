// Choosing a new password from the link in a reset mail. A spent or expired link says so and
// offers a new one.
import { useMutation } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useLocalSearchParams } from 'expo-router';
import { newPasswordFormSchema, type NewPasswordValues } from '../../shared/people/password';
import { ApiError } from '../api/http';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { AuthCard, AuthLink } from './AuthCard';
import { loadAuthClient } from './loadAuthClient';
import { NewPasswordFields } from './NewPasswordFields';

const spentLink = 'This link has expired or was already used. Ask for a new one; each link works once, within an hour.';

export function ResetPasswordScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const reset = useMutation({
    mutationFn: async ({ password }: NewPasswordValues) => {
      const authClient = await loadAuthClient('The password was not changed; try again.');
      const { error } = await authClient.resetPassword({ newPassword: password, token: token ?? '' });
      if (!error) return;
      const code = error.code ?? 'reset_failed';
      throw new ApiError(error.status, code, code === 'INVALID_TOKEN' ? spentLink : error.message || 'The password was not changed; try again.');
    },
  });
  const { control, handleSubmit, formState } = useForm<NewPasswordValues>({ resolver: zodResolver(newPasswordFormSchema(null)), defaultValues: { password: '', confirm: '' } });
  const submit = handleSubmit((values) => reset.mutate(values));

  if (!token) {
    return (
      <AuthCard title="Choose a new password">
        <Notice tone="error" testID="reset-no-token">This page needs the link from the reset e-mail. Open the link in the message again, or ask for a new one.</Notice>
        <AuthLink href="/forgot-password" label="Send me a new link" testID="reset-new-link" />
      </AuthCard>
    );
  }
  if (reset.isSuccess) {
    return (
      <AuthCard title="Password changed">
        <Notice tone="ok" testID="reset-done">Your new password is set, and every place you were signed in has been signed out. Sign in with the new password.</Notice>
        <AuthLink href="/sign-in" label="Sign in" testID="reset-sign-in" />
      </AuthCard>
    );
  }
  const spent = reset.error instanceof ApiError && reset.error.code === 'INVALID_TOKEN';
  return (
    <AuthCard title="Choose a new password">
      {reset.error ? <Notice tone="error" testID="reset-error">{reset.error.message}</Notice> : null}
      {spent ? (
        <AuthLink href="/forgot-password" label="Send me a new link" testID="reset-new-link" />
      ) : (
        <>
          <NewPasswordFields control={control} errors={formState.errors} onSubmit={submit} testIDPrefix="reset" />
          <Button label="Set the new password" onPress={submit} busy={reset.isPending} testID="reset-submit" />
        </>
      )}
    </AuthCard>
  );
}
