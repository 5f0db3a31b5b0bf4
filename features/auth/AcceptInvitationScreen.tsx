// An invited person opens the link, sees what they were invited as, chooses a password and is
// signed straight in. The role and projects come from the invitation, never from this form.
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { ActivityIndicator, View } from 'react-native';
import { acceptInvitationFormSchema, type AcceptInvitationValues } from '../../shared/people/schemas';
import type { InvitationPreview } from '../../shared/people/types';
import { roleLabels } from '../../shared/roles';
import { ApiError } from '../api/http';
import { placeServerErrors } from '../admin/formErrors';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { space } from '../ui/theme';
import { AuthCard, AuthLink } from './AuthCard';
import { useAcceptInvitation, useInvitationPreview } from './invitationApi';
import { NewPasswordFields } from './NewPasswordFields';
import { useSignIn } from './useActor';

function AcceptForm({ token, invitation }: { token: string; invitation: InvitationPreview }) {
  const router = useRouter();
  const accept = useAcceptInvitation();
  const signIn = useSignIn();
  const [failure, setFailure] = useState<string | null>(null);
  const { control, handleSubmit, formState, setError } = useForm<AcceptInvitationValues>({
    resolver: zodResolver(acceptInvitationFormSchema(invitation.email)),
    defaultValues: { name: invitation.name, password: '', confirm: '' },
  });
  const submit = handleSubmit(({ name, password }) => {
    setFailure(null);
    accept.mutate(
      { token, name, password },
      {
        onSuccess: ({ email }) =>
          signIn.mutate({ email, password }, { onSuccess: () => router.replace('/'), onError: () => router.replace('/sign-in') }),
        onError: (err) => setFailure(placeServerErrors(err, ['name', 'password'], setError)),
      },
    );
  });
  const desk = [roleLabels[invitation.role], invitation.organization].filter(Boolean).join(', ');
  return (
    <>
      <View style={{ gap: space.xs }} testID="accept-invitation-details">
        <Text>{`You are invited as ${desk}.`}</Text>
        <Text variant="muted">{invitation.projects.length ? `Projects: ${invitation.projects.join('; ')}.` : 'An administrator will add you to your projects.'}</Text>
        <Text variant="muted">{`You will sign in as ${invitation.email}.`}</Text>
      </View>
      {failure ? <Notice tone="error" testID="accept-error">{failure}</Notice> : null}
      <Controller
        control={control}
        name="name"
        render={({ field }) => (
          <TextField label="Your name, as others will see it" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} autoComplete="name" error={formState.errors.name?.message} testID="accept-name" />
        )}
      />
      <NewPasswordFields control={control} errors={formState.errors} onSubmit={submit} testIDPrefix="accept" email={invitation.email} />
      <Button label="Make my account" onPress={submit} busy={accept.isPending || signIn.isPending} testID="accept-submit" />
    </>
  );
}

export function AcceptInvitationScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const preview = useInvitationPreview(token);

  if (!token) {
    return (
      <AuthCard title="Invitation">
        <Notice tone="error" testID="accept-no-token">This page needs the link from your invitation e-mail. Open the link in the message again.</Notice>
      </AuthCard>
    );
  }
  if (preview.isPending) {
    return (
      <AuthCard title="Welcome to Spanrelay">
        <ActivityIndicator accessibilityLabel="Reading the invitation" testID="accept-loading" />
      </AuthCard>
    );
  }
  if (preview.error) {
    const final = preview.error instanceof ApiError && preview.error.status >= 400 && preview.error.status < 500;
    return (
      <AuthCard title="Invitation">
        <Notice tone="error" testID="accept-invalid">{preview.error.message}</Notice>
        {final ? (
          <AuthLink href="/sign-in" label="Go to sign-in" testID="accept-sign-in" />
        ) : (
          <Button kind="secondary" label="Try again" busy={preview.isFetching} onPress={() => void preview.refetch()} testID="accept-retry" />
        )}
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Welcome to Spanrelay" intro="Choose the password you will sign in with.">
      <AcceptForm token={token} invitation={preview.data} />
    </AuthCard>
  );
}
