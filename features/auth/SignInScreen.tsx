import { Redirect, useLocalSearchParams } from 'expo-router';
import { View, StyleSheet } from 'react-native';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, radius, space } from '../ui/theme';
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
    <Screen>
      <View style={styles.card}>
        <Text variant="title">Spanrelay</Text>
        <Text variant="muted">Approval of departures from sealed bridge plans, desk to desk, on the record.</Text>
        {signIn.error ? <Notice tone="error">{signIn.error.message}</Notice> : null}
        <SignInForm busy={signIn.isPending} onSubmit={(values) => signIn.mutate(values)} />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderRadius: radius,
    borderWidth: 1,
    borderColor: colors.line,
    padding: space.xl,
    gap: space.lg,
    width: '100%',
    maxWidth: 440,
    alignSelf: 'center',
    marginTop: space.xxl,
  },
});
