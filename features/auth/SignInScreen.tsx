import { Redirect, useLocalSearchParams } from 'expo-router';
import { Notice } from '../ui/Notice';
import { Text } from '../ui/Text';
import { AuthCard, AuthLink } from './AuthCard';
import { SignInForm } from './SignInForm';
import { useActor, useSignIn } from './useActor';

// Only paths inside the app are followed after sign-in, never another site.
function safeNext(next: unknown): string {
  return typeof next === 'string' && next.startsWith('/') && !next.startsWith('//') ? next : '/';
}

export function SignInScreen() {
  const { next } = useLocalSearchParams<{ next?: string }>();
  const actor = useActor();
  const signIn = useSignIn();

  if (actor.data) return <Redirect href={safeNext(next)} />;

  return (
    <AuthCard title="Spanrelay">
      <Text variant="muted">Approval of departures from sealed bridge plans, desk to desk, on the record.</Text>
      {signIn.error ? <Notice tone="error">{signIn.error.message}</Notice> : null}
      <SignInForm busy={signIn.isPending} onSubmit={(values) => signIn.mutate(values)} />
      <AuthLink href="/forgot-password" label="Forgot your password?" testID="sign-in-forgot" />
    </AuthCard>
  );
}
