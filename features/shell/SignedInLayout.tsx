// Guards every signed-in screen: without a session the user goes to sign-in, and comes back
// to where they were going afterwards.
import { Redirect, Slot, usePathname } from 'expo-router';
import { ActivityIndicator, View } from 'react-native';
import { useActor } from '../auth/useActor';
import { Notice } from '../ui/Notice';
import { colors, space } from '../ui/theme';
import { AppShell } from './AppShell';

export function SignedInLayout() {
  const pathname = usePathname();
  const actor = useActor();
  if (actor.isPending) {
    return (
      <View style={{ flex: 1, justifyContent: 'center', backgroundColor: colors.concrete }}>
        <ActivityIndicator />
      </View>
    );
  }
  if (actor.error) {
    return (
      <View style={{ padding: space.lg }}>
        <Notice tone="error">{actor.error.message}</Notice>
      </View>
    );
  }
  if (!actor.data) return <Redirect href={{ pathname: '/sign-in', params: pathname && pathname !== '/' ? { next: pathname } : {} }} />;
  return (
    <AppShell actor={actor.data}>
      <Slot />
    </AppShell>
  );
}
