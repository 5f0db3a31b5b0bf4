// Asking for a reset link. The answer is the same whether or not the address has an account, so
// nobody can use this screen to find out who does.
import { useMutation } from '@tanstack/react-query';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { forgotPasswordSchema, type ForgotPasswordValues } from '../../shared/people/schemas';
import { ApiError } from '../api/http';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { TextField } from '../ui/TextField';
import { AuthCard, AuthLink } from './AuthCard';
import { loadAuthClient } from './loadAuthClient';

export function ForgotPasswordScreen() {
  const request = useMutation({
    mutationFn: async ({ email }: ForgotPasswordValues) => {
      const authClient = await loadAuthClient('The request did not go through; try again.');
      const { error } = await authClient.requestPasswordReset({ email });
      if (error) throw new ApiError(error.status, error.code ?? 'reset_request_failed', error.message || 'The request did not go through; try again.');
    },
  });
  const { control, handleSubmit, formState, getValues } = useForm<ForgotPasswordValues>({ resolver: zodResolver(forgotPasswordSchema), defaultValues: { email: '' } });
  const submit = handleSubmit((values) => request.mutate(values));

  if (request.isSuccess) {
    return (
      <AuthCard title="Check your e-mail">
        <Notice tone="ok" testID="forgot-sent">{`If an account uses ${getValues('email').trim().toLowerCase()}, a link to choose a new password is on its way. It works once, within an hour. Nothing arriving? Check the address, or ask your administrator.`}</Notice>
        <AuthLink href="/sign-in" label="Back to sign-in" testID="forgot-back" />
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Forgot your password?" intro="Enter the e-mail address of your account and we will send a link to choose a new password.">
      {request.error ? <Notice tone="error" testID="forgot-error">{request.error.message}</Notice> : null}
      <Controller
        control={control}
        name="email"
        render={({ field }) => (
          <TextField label="E-mail" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} autoCapitalize="none" autoComplete="email" keyboardType="email-address" inputMode="email" onSubmitEditing={submit} error={formState.errors.email?.message} testID="forgot-email" />
        )}
      />
      <Button label="Send the link" onPress={submit} busy={request.isPending} testID="forgot-submit" />
      <AuthLink href="/sign-in" label="Back to sign-in" testID="forgot-back" />
    </AuthCard>
  );
}
