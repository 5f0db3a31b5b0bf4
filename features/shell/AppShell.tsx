// The signed-in frame: a bar with the product name, who is signed in, and sign-out.
import type { ReactNode } from 'react';
import { Link, useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { roleLabels } from '../../shared/roles';
import type { Actor } from '../../shared/requests/types';
import { useSignOut } from '../auth/useActor';
import { Button } from '../ui/Button';
import { Text } from '../ui/Text';
import { colors, fonts, space } from '../ui/theme';

export function AppShell({ actor, children }: { actor: Actor; children: ReactNode }) {
  const router = useRouter();
  const signOut = useSignOut();
  return (
    <View style={styles.frame}>
      <View style={styles.bar}>
        <Link href="/" style={styles.brand}>Spanrelay</Link>
        <View style={styles.who}>
          <Text style={styles.whoText} numberOfLines={1} testID="shell-actor">{actor.name} · {roleLabels[actor.role]}</Text>
          <Button
            kind="inverse"
            label="Sign out"
            testID="shell-sign-out"
            onPress={() => signOut.mutate(undefined, { onSuccess: () => router.replace('/sign-in') })}
          />
        </View>
      </View>
      <View style={styles.body}>{children}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { flex: 1, backgroundColor: colors.concrete },
  bar: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', paddingHorizontal: space.lg, paddingVertical: space.sm, backgroundColor: colors.slate, gap: space.md },
  brand: { color: colors.surface, fontFamily: fonts.semibold, fontSize: 20 },
  who: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexShrink: 1 },
  whoText: { color: colors.slateLight, fontSize: 14, flexShrink: 1 },
  body: { flex: 1 },
});
